/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import java.util.ArrayList;
import java.util.List;

/**
 * A shell with openings: the wall and every opening are leakage paths, combined as field
 * amplitudes (see {@link PathSum}), so an enclosure is only as good as its worst path.
 *
 * <pre>{@code
 * Enclosure box = Enclosure.of(Shell.box(cm(30), cm(20), cm(15)).wall(aluminium, mm(1.5)))
 *         .withOpening(Opening.holes(mm(4), 120).named("vent"))
 *         .withOpening(Opening.seam(cm(8)).named("lid seam"));
 * EnclosureResult r = box.facing(IncidentField.planeWave()).at(MHz(300));
 * r.shieldingEffectivenessDb();       // SE of the enclosure
 * r.limitingPath();  // the path that lets most field in
 * }</pre>
 *
 * <p>Three questions, three entry points:
 * <ul>
 *   <li>{@link #facing(IncidentField)}: an incident wave (plane wave, or an electric or
 *       magnetic near field) at radio frequencies. The wall is the flat planar barrier of
 *       the shell's layers in that field (the transmission-line model of the planar
 *       package), the openings follow the aperture rules.</li>
 *   <li>{@link #inUniformField()}: a uniform alternating magnetic field, enclosure small
 *       against the wavelength. The wall is the shell model, the holes leak by Bethe's
 *       polarizability.</li>
 *   <li>{@link #staticShielding()}: the same for a static field.</li>
 * </ul>
 * See {@link Opening} for the opening models and their assumptions.
 *
 * <p>Immutable and thread-safe; {@code with…} return a new enclosure and leave this one untouched.
 */
public final class Enclosure {

    /** The most openings on one enclosure. */
    public static final int MAX_OPENINGS = 256;

    private final Shell shell;
    private final List<Opening> openings;
    private final PathSum sum;

    private Enclosure(Shell shell, List<Opening> openings, PathSum sum) {
        this.shell = shell;
        this.openings = List.copyOf(openings);
        this.sum = sum;
    }

    /**
     * A closed enclosure of a shell, no openings yet, worst-case path sum.
     *
     * @param shell the shell, not null
     * @return the enclosure
     */
    public static Enclosure of(Shell shell) {
        return new Enclosure(Require.nonNull("shell", shell), List.of(), PathSum.MAGNITUDES);
    }

    /**
     * This enclosure with one more opening. The opening must fit the shell: one opening may
     * not be larger than the face it sits on (for a box its largest face, sides p ≥ q: a hole
     * up to q across, a slot up to the face's diagonal by q, a seam up to its perimeter; for a
     * sphere its wall, 2R across: a hole or slot up to 2R, a seam up to 2πR; for a long
     * cylinder a hole up to 2R, a slot up to 2R wide and of any length, any seam), and
     * the open area of all openings together (holes nπD²/4, slots nLW; a seam counts no
     * area) may not exceed the wall's inner area (2(xy + yz + zx) for a box, 4πR² for a
     * sphere; a long cylinder has no stated length and no area limit).
     *
     * @param opening the opening, not null
     * @return the new enclosure
     * @throws NullPointerException if the opening is null
     * @throws IllegalArgumentException if it would have more than {@value #MAX_OPENINGS} openings,
     *         if the opening is larger than the face it sits on, or if the openings' total area
     *         would exceed the wall's; the message names the opening, its size, the face and its size
     */
    public Enclosure withOpening(Opening opening) {
        Require.nonNull("opening", opening);
        if (openings.size() >= MAX_OPENINGS) {
            throw new IllegalArgumentException("an enclosure has at most " + MAX_OPENINGS + " openings");
        }
        ShellShape shape = shell.shape();
        String misfit = shape.misfit(opening);
        if (misfit != null) {
            throw new IllegalArgumentException("opening \"" + Text.clip(opening.name()) + "\" ("
                    + opening.sizeText() + ") is larger than the face it sits on: " + shape.description() + ": "
                    + misfit);
        }
        double area = opening.totalArea();
        for (Opening o : openings) {
            area += o.totalArea();
        }
        if (area > shape.wallArea()) {
            throw new IllegalArgumentException("opening \"" + Text.clip(opening.name()) + "\" ("
                    + (opening.count() > 1 ? opening.count() + " openings of " : "") + opening.sizeText() + ", "
                    + Text.number(opening.totalArea()) + " m² open) brings the open area of the enclosure to "
                    + Text.number(area) + " m², more than the inner wall area of " + shape.description() + ", "
                    + Text.number(shape.wallArea()) + " m²");
        }
        List<Opening> l = new ArrayList<>(openings);
        l.add(opening);
        return new Enclosure(shell, l, sum);
    }

    /**
     * This enclosure with another way of combining the paths.
     *
     * @param pathSum the combination, not null
     * @return the new enclosure, or this one if unchanged
     */
    public Enclosure withPathSum(PathSum pathSum) {
        Require.nonNull("path sum", pathSum);
        return pathSum == sum ? this : new Enclosure(shell, openings, pathSum);
    }

    /**
     * The shell.
     *
     * @return the shell
     */
    public Shell shell() {
        return shell;
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
     * How the paths are combined.
     *
     * @return the path sum
     */
    public PathSum pathSum() {
        return sum;
    }

    /**
     * This enclosure facing an incident wave: planar wall, aperture rules.
     *
     * @param field the incident field, not null
     * @return the evaluation
     */
    public EnclosureEvaluation facing(IncidentField field) {
        return EnclosureEvaluation.facing(this, Require.nonNull("field", field));
    }

    /**
     * This enclosure in a uniform alternating magnetic field: shell wall, Bethe holes.
     *
     * @return the evaluation
     */
    public EnclosureEvaluation inUniformField() {
        return EnclosureEvaluation.inUniformField(this);
    }

    /**
     * This enclosure in a uniform static magnetic field: the exact static shell (µ'(0))
     * and Bethe holes.
     *
     * @return the result
     */
    public EnclosureResult staticShielding() {
        return EnclosureEvaluation.combine(this, null, shell.staticShielding().shieldingEffectivenessDb(), "static shell, exact",
                0, false);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Enclosure e && e.shell.equals(shell) && e.openings.equals(openings) && e.sum == sum;
    }

    @Override
    public int hashCode() {
        return (shell.hashCode() * 31 + openings.hashCode()) * 31 + sum.hashCode();
    }

    @Override
    public String toString() {
        return shell + " with " + openings.size() + " openings";
    }
}
