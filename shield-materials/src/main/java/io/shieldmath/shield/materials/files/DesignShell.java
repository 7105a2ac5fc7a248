/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.enclosure.ShellShape;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Length;
import java.util.List;
import java.util.Objects;

/**
 * The closed shell of a {@link Design} as the user wrote it: its shape and sizes, its walls
 * (innermost first, as {@link ShellShape#wall} and {@link Shell#then} take them), its
 * openings, and whether it sits in a locally uniform field or faces the design's incident
 * field. Unlike a core {@link Enclosure} it remembers the catalogue references of its walls.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class DesignShell {

    /** The shape of a shell. */
    public enum Form {
        /** A rectangular box, three inner sides. */
        BOX,
        /** A sphere, one inner radius. */
        SPHERE,
        /** A long cylinder with the field across its axis, one inner radius. */
        CYLINDER_TRANSVERSE,
        /** A long cylinder with the field along its axis, one inner radius. */
        CYLINDER_AXIAL
    }

    private final Form form;
    private final List<Length> sizes;
    private final List<DesignLayer> walls;
    private final List<Opening> openings;
    private final boolean uniformField;
    private final Enclosure enclosure;

    private DesignShell(Form form, List<Length> sizes, List<DesignLayer> walls, List<Opening> openings,
                        boolean uniformField) {
        this.form = form;
        this.sizes = sizes;
        this.walls = walls;
        this.openings = openings;
        this.uniformField = uniformField;
        if (walls.isEmpty() || walls.size() > Shell.MAX_WALLS) {
            throw new IllegalArgumentException("a shell has 1 to " + Shell.MAX_WALLS + " walls; got " + walls.size());
        }
        if (walls.get(0).kind() == DesignLayer.Kind.GAP) {
            throw new IllegalArgumentException("the innermost wall of a shell must not be a gap");
        }
        if (openings.size() > Enclosure.MAX_OPENINGS) {
            throw new IllegalArgumentException("a shell has at most " + Enclosure.MAX_OPENINGS + " openings; got "
                    + openings.size());
        }
        ShellShape shape = switch (form) {
            case BOX -> Shell.box(sizes.get(0), sizes.get(1), sizes.get(2));
            case SPHERE -> Shell.sphere(sizes.get(0));
            case CYLINDER_TRANSVERSE -> Shell.cylinderTransverse(sizes.get(0));
            case CYLINDER_AXIAL -> Shell.cylinderAxial(sizes.get(0));
        };
        DesignLayer first = walls.get(0);
        Shell shell = shape.wall(first.medium(), first.thickness());
        for (DesignLayer l : walls.subList(1, walls.size())) {
            shell = l.kind() == DesignLayer.Kind.GAP ? shell.thenGap(l.thickness()) : shell.then(l.medium(),
                    l.thickness());
        }
        Enclosure e = Enclosure.of(shell);
        for (Opening o : openings) {
            e = e.withOpening(o);
        }
        this.enclosure = e;
    }

    /**
     * A box-shaped shell in a locally uniform field, without openings.
     *
     * @param x     the first inner side, not null
     * @param y     the second inner side, not null
     * @param z     the third inner side, not null
     * @param walls the walls, innermost first, 1 to {@value Shell#MAX_WALLS}, the first not a gap
     * @return the shell
     * @throws IllegalArgumentException if the walls are empty, too many, or start with a gap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a side is out of range
     */
    public static DesignShell box(Length x, Length y, Length z, List<DesignLayer> walls) {
        return new DesignShell(Form.BOX, List.of(Require.nonNull("x", x), Require.nonNull("y", y),
                Require.nonNull("z", z)), List.copyOf(Require.nonNull("walls", walls)), List.of(), true);
    }

    /**
     * A round shell (sphere or long cylinder) in a locally uniform field, without openings.
     *
     * @param form        {@link Form#SPHERE}, {@link Form#CYLINDER_TRANSVERSE} or {@link Form#CYLINDER_AXIAL}
     * @param innerRadius the inner radius, not null
     * @param walls       the walls, innermost first, 1 to {@value Shell#MAX_WALLS}, the first not a gap
     * @return the shell
     * @throws IllegalArgumentException if the form is {@link Form#BOX} or the walls are not acceptable
     */
    public static DesignShell round(Form form, Length innerRadius, List<DesignLayer> walls) {
        Require.nonNull("form", form);
        if (form == Form.BOX) {
            throw new IllegalArgumentException("a box has three sides: use DesignShell.box");
        }
        return new DesignShell(form, List.of(Require.nonNull("innerRadius", innerRadius)),
                List.copyOf(Require.nonNull("walls", walls)), List.of(), true);
    }

    /**
     * A copy with one more opening.
     *
     * @param opening the opening, not null
     * @return the new shell; this one is unchanged
     * @throws IllegalArgumentException if there would be more than {@value Enclosure#MAX_OPENINGS} openings,
     *         or the opening does not fit the shell ({@link Enclosure#withOpening(Opening)})
     */
    public DesignShell withOpening(Opening opening) {
        Require.nonNull("opening", opening);
        List<Opening> more = new java.util.ArrayList<>(openings);
        more.add(opening);
        return new DesignShell(form, sizes, walls, List.copyOf(more), uniformField);
    }

    /**
     * A copy that faces the design's incident field instead of a locally uniform field.
     *
     * @param uniform true for a locally uniform field, false to face the design's field
     * @return the new shell; this one is unchanged
     */
    public DesignShell inUniformField(boolean uniform) {
        return uniform == uniformField ? this : new DesignShell(form, sizes, walls, openings, uniform);
    }

    /**
     * The shape.
     *
     * @return the form
     */
    public Form form() {
        return form;
    }

    /**
     * The sizes: three inner sides of a box, or one inner radius.
     *
     * @return an unmodifiable list
     */
    public List<Length> sizes() {
        return sizes;
    }

    /**
     * The walls, innermost first.
     *
     * @return an unmodifiable list
     */
    public List<DesignLayer> walls() {
        return walls;
    }

    /**
     * The openings.
     *
     * @return an unmodifiable list
     */
    public List<Opening> openings() {
        return openings;
    }

    /**
     * Whether the shell sits in a locally uniform field (else it faces the design's field).
     *
     * @return true for a uniform field
     */
    public boolean uniformField() {
        return uniformField;
    }

    /**
     * The enclosure for the core engine.
     *
     * @return the enclosure, with every opening
     */
    public Enclosure toEnclosure() {
        return enclosure;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DesignShell d && d.form == form && d.sizes.equals(sizes) && d.walls.equals(walls)
                && d.openings.equals(openings) && d.uniformField == uniformField;
    }

    @Override
    public int hashCode() {
        return Objects.hash(form, sizes, walls, openings, uniformField);
    }

    @Override
    public String toString() {
        return form.name().toLowerCase(java.util.Locale.ROOT) + " " + sizes + ", walls " + walls + ", openings "
                + openings + (uniformField ? ", in a uniform field" : "");
    }
}
