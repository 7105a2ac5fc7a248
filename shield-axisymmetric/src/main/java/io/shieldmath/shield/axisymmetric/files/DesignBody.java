/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.quantity.Length;
import java.util.Objects;

/**
 * A shield body of an axisymmetric design as a file holds it: its shape, the lengths as
 * given, its catalogue material or medium, and its place on the axis. Each is built at once
 * with the public factories of {@link Body}, so a body that {@link Body} refuses is refused
 * here with the same message.
 *
 * <pre>{@code
 * DesignBody can = DesignBody.can("sensor can", catalogue.get("nickel-iron-80"), mm(20), mm(1), mm(60))
 *         .withCapHole(CanEnd.UPPER, mm(3));
 * DesignBody plate = DesignBody.disc("plate", catalogue.get("copper-annealed"), mm(50), mm(0.5))
 *         .shiftedBy(mm(5));
 * }</pre>
 *
 * <p>A catalogue {@link Material} is written by its identifier and read back from the
 * catalogue; any other material is given as a {@link Medium} (for a catalogue material at
 * another temperature use {@link Material#atTemperature}). Immutable and thread-safe;
 * equality is by value; the {@code with…} and {@code shifted…} methods return a new body.
 */
public final class DesignBody {

    /** The shapes a body can have. */
    public enum Shape {
        /** A solid circular plate. */
        DISC,
        /** A circular plate with a central hole. */
        ANNULAR_PLATE,
        /** A disc meant to close a tube, optionally with a central hole. */
        CAP,
        /** An open tube. */
        TUBE,
        /** A tube with zero, one or two caps, each optionally with a hole. */
        CAN
    }

    final Shape shape;
    final String name;
    final MediumSource material;
    /** Outer radius (disc, annular plate, cap) or inner radius (tube, can). */
    final Length radius;
    /** Thickness (disc, annular plate, cap) or wall (tube, can). */
    final Length thickness;
    /** Overall length (tube, can), else null. */
    final Length length;
    /** Hole of an annular plate or cap, else null. */
    final Length hole;
    final boolean lowerCap;
    final boolean upperCap;
    final Length lowerHole;
    final Length upperHole;
    /** Shift along the axis, or null for none. */
    final Length shift;
    /** Whether the shift is towards smaller z. */
    final boolean back;
    private final Body body;

    private DesignBody(Shape shape, String name, MediumSource material, Length radius, Length thickness,
                       Length length, Length hole, boolean lowerCap, boolean upperCap, Length lowerHole,
                       Length upperHole, Length shift, boolean back) {
        this.shape = shape;
        this.name = name;
        this.material = material;
        this.radius = radius;
        this.thickness = thickness;
        this.length = length;
        this.hole = hole;
        this.lowerCap = lowerCap;
        this.upperCap = upperCap;
        this.lowerHole = lowerHole;
        this.upperHole = upperHole;
        this.shift = shift;
        this.back = back;
        this.body = build();
    }

    private Body build() {
        Body b = switch (shape) {
            case DISC -> Body.disc(name, material, radius, thickness);
            case ANNULAR_PLATE -> Body.annularPlate(name, material, radius, hole, thickness);
            case CAP -> hole == null ? Body.cap(name, material, radius, thickness)
                    : Body.cap(name, material, radius, thickness).withHole(hole);
            case TUBE -> Body.tube(name, material, radius, thickness, length);
            case CAN -> can();
        };
        if (shift == null) {
            return b;
        }
        return back ? b.shiftedBackBy(shift) : b.shiftedBy(shift);
    }

    private Body can() {
        Body b = Body.can(name, material, radius, thickness, length);
        if (!lowerCap) {
            b = b.withoutCap(CanEnd.LOWER);
        }
        if (!upperCap) {
            b = b.withoutCap(CanEnd.UPPER);
        }
        if (lowerHole != null) {
            b = b.withCapHole(CanEnd.LOWER, lowerHole);
        }
        if (upperHole != null) {
            b = b.withCapHole(CanEnd.UPPER, upperHole);
        }
        return b;
    }

    private static MediumSource material(MediumSource m) {
        Require.nonNull("material", m);
        if (!(m instanceof Material) && !(m instanceof Medium)) {
            throw new IllegalArgumentException("a design file holds a catalogue Material or a Medium; got a "
                    + m.getClass().getName() + " (give its medium())");
        }
        return m;
    }

    private DesignBody with(Shape newShape, Length newHole, boolean lc, boolean uc, Length lh, Length uh,
                            Length newShift, boolean newBack) {
        return new DesignBody(newShape, name, material, radius, thickness, length, newHole, lc, uc, lh, uh,
                newShift, newBack);
    }

    /**
     * A solid circular plate, as {@link Body#disc}.
     *
     * @param name      a name for reports and messages, not blank, unique in its design
     * @param material  a catalogue material or a medium, not null
     * @param radius    the outer radius, 1 µm to 100 m, not null
     * @param thickness the axial thickness, 1 µm to 100 m, not null
     * @return the body, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank or the material is neither kind
     */
    public static DesignBody disc(String name, MediumSource material, Length radius, Length thickness) {
        return new DesignBody(Shape.DISC, name, material(material), radius, thickness, null, null, false, false,
                null, null, null, false);
    }

    /**
     * A circular plate with a central hole, as {@link Body#annularPlate}.
     *
     * @param name        a name, not blank, unique in its design
     * @param material    a catalogue material or a medium, not null
     * @param outerRadius the outer radius, 1 µm to 100 m, not null
     * @param holeRadius  the hole's radius, 1 µm or more and smaller than the outer radius, not null
     * @param thickness   the axial thickness, 1 µm to 100 m, not null
     * @return the body, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank or the material is neither kind
     */
    public static DesignBody annularPlate(String name, MediumSource material, Length outerRadius,
                                          Length holeRadius, Length thickness) {
        return new DesignBody(Shape.ANNULAR_PLATE, name, material(material), outerRadius, thickness, null,
                Require.nonNull("hole radius", holeRadius), false, false, null, null, null, false);
    }

    /**
     * A cap, as {@link Body#cap}; give it a hole with {@link #withHole(Length)}.
     *
     * @param name      a name, not blank, unique in its design
     * @param material  a catalogue material or a medium, not null
     * @param radius    the outer radius, 1 µm to 100 m, not null
     * @param thickness the axial thickness, 1 µm to 100 m, not null
     * @return the body, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank or the material is neither kind
     */
    public static DesignBody cap(String name, MediumSource material, Length radius, Length thickness) {
        return new DesignBody(Shape.CAP, name, material(material), radius, thickness, null, null, false, false,
                null, null, null, false);
    }

    /**
     * An open tube, as {@link Body#tube}.
     *
     * @param name        a name, not blank, unique in its design
     * @param material    a catalogue material or a medium, not null
     * @param innerRadius the inner radius, 1 µm to 100 m, not null
     * @param wall        the wall thickness, 1 µm to 100 m, not null
     * @param length      the axial length, 1 µm to 100 m, not null
     * @return the body, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank or the material is neither kind
     */
    public static DesignBody tube(String name, MediumSource material, Length innerRadius, Length wall,
                                  Length length) {
        return new DesignBody(Shape.TUBE, name, material(material), innerRadius, wall,
                Require.nonNull("length", length), null, false, false, null, null, null, false);
    }

    /**
     * A can closed at both ends by caps as thick as its wall, as {@link Body#can}.
     *
     * @param name        a name, not blank, unique in its design
     * @param material    a catalogue material or a medium, not null
     * @param innerRadius the inner radius, 1 µm to 100 m, not null
     * @param wall        the wall and cap thickness, 1 µm to 100 m, not null
     * @param length      the overall outside length, caps included, more than two walls, not null
     * @return the body, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank or the material is neither kind
     */
    public static DesignBody can(String name, MediumSource material, Length innerRadius, Length wall,
                                 Length length) {
        return new DesignBody(Shape.CAN, name, material(material), innerRadius, wall,
                Require.nonNull("length", length), null, true, true, null, null, null, false);
    }

    /**
     * This can with one end open, as {@link Body#withoutCap(CanEnd)}; a hole in that cap goes too.
     *
     * @param end the end to open, not null
     * @return the new body; this one is unchanged
     * @throws IllegalStateException if this body is not a can
     */
    public DesignBody withoutCap(CanEnd end) {
        requireShape(Shape.CAN, "withoutCap");
        boolean lower = Require.nonNull("can end", end) == CanEnd.LOWER;
        return with(shape, hole, lowerCap && !lower, upperCap && lower, lower ? null : lowerHole,
                lower ? upperHole : null, shift, back);
    }

    /**
     * This can with an axial hole in one cap, as {@link Body#withCapHole(CanEnd, Length)}.
     *
     * @param end        the capped end, not null
     * @param holeRadius the hole's radius, 1 µm or more and smaller than the inner radius, not null
     * @return the new body; this one is unchanged
     * @throws IllegalStateException if this body is not a can or that end has no cap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public DesignBody withCapHole(CanEnd end, Length holeRadius) {
        requireShape(Shape.CAN, "withCapHole");
        boolean lower = Require.nonNull("can end", end) == CanEnd.LOWER;
        Require.nonNull("hole radius", holeRadius);
        if (lower ? !lowerCap : !upperCap) {
            throw new IllegalStateException("can '" + name + "' has no cap at its " + (lower ? "lower" : "upper")
                    + " end to drill");
        }
        return with(shape, hole, lowerCap, upperCap, lower ? holeRadius : lowerHole, lower ? upperHole : holeRadius,
                shift, back);
    }

    /**
     * This cap with a central hole, or this disc as an annular plate, as {@link Body#withHole(Length)}.
     *
     * @param holeRadius the hole's radius, 1 µm or more and smaller than the radius, not null
     * @return the new body; this one is unchanged
     * @throws IllegalStateException if this body is not a disc or a cap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public DesignBody withHole(Length holeRadius) {
        if (shape != Shape.DISC && shape != Shape.CAP) {
            throw new IllegalStateException("withHole applies to a disc or a cap; '" + name + "' is a "
                    + shape.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        }
        Require.nonNull("hole radius", holeRadius);
        return with(shape == Shape.DISC ? Shape.ANNULAR_PLATE : Shape.CAP, holeRadius, false, false, null, null,
                shift, back);
    }

    /**
     * This body with its centre moved along the axis to z = +distance (towards the receiver
     * coil); replaces any earlier move.
     *
     * @param distance the distance, up to 100 m, not null
     * @return the new body; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public DesignBody shiftedBy(Length distance) {
        return with(shape, hole, lowerCap, upperCap, lowerHole, upperHole, Require.nonNull("distance", distance),
                false);
    }

    /**
     * This body with its centre moved along the axis to z = −distance (towards the transmitter
     * coil); replaces any earlier move.
     *
     * @param distance the distance, up to 100 m, not null
     * @return the new body; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public DesignBody shiftedBackBy(Length distance) {
        return with(shape, hole, lowerCap, upperCap, lowerHole, upperHole, Require.nonNull("distance", distance),
                true);
    }

    private void requireShape(Shape s, String what) {
        if (shape != s) {
            throw new IllegalStateException(what + " applies to a can; '" + name + "' is a "
                    + shape.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        }
    }

    /**
     * The shape.
     *
     * @return the shape
     */
    public Shape shape() {
        return shape;
    }

    /**
     * The name.
     *
     * @return the name as given
     */
    public String name() {
        return name;
    }

    /**
     * The catalogue material or medium.
     *
     * @return a {@link Material} or a {@link Medium}
     */
    public MediumSource material() {
        return material;
    }

    /**
     * The body for the solver, built with the factories of {@link Body}.
     *
     * @return the body
     */
    public Body body() {
        return body;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DesignBody d && d.shape == shape && d.name.equals(name) && d.material.equals(material)
                && d.radius.equals(radius) && d.thickness.equals(thickness) && Objects.equals(d.length, length)
                && Objects.equals(d.hole, hole) && d.lowerCap == lowerCap && d.upperCap == upperCap
                && Objects.equals(d.lowerHole, lowerHole) && Objects.equals(d.upperHole, upperHole)
                && Objects.equals(d.shift, shift) && d.back == back;
    }

    @Override
    public int hashCode() {
        return Objects.hash(shape, name, material, radius, thickness, length, hole, lowerCap, upperCap, lowerHole,
                upperHole, shift, back);
    }

    @Override
    public String toString() {
        return body.toString();
    }
}
