/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A shield body of revolution about the common axis: a disc (plate), an annular plate, a
 * tube, a cap, or a can (a tube with zero, one or two caps, each optionally with an axial
 * hole), made of one medium or catalogue material.
 *
 * <pre>{@code
 * Body plate = Body.disc("plate", copper, mm(50), mm(0.5));             // centred at z = 0
 * Body washer = Body.annularPlate("washer", brass, mm(40), mm(10), mm(1)).shiftedBy(mm(5));
 * Body sleeve = Body.tube("sleeve", mumetal, mm(20), mm(1), mm(80));
 * Body can = Body.can("sensor can", mumetal, mm(20), mm(1), mm(60))
 *         .withCapHole(CanEnd.UPPER, mm(3));                          // a cable hole
 * }</pre>
 *
 * <p>Coordinates: r from the axis, z along it. Every body is created centred at z = 0 of its
 * arrangement (midway between the coils' centre planes, or the centre of the uniform field)
 * and moved with {@link #shiftedBy(Length)} and {@link #shiftedBackBy(Length)}. A can's length
 * is its overall outside length, caps included; its caps are as thick as its wall.
 *
 * <p>Ranges: every length from 1 µm to 100 m; a hole smaller than the radius it is cut in;
 * a can longer than its two caps. A name must not be blank; bodies of one arrangement must
 * have different names. Immutable and thread-safe; the {@code with…} and {@code shifted…}
 * methods return a new body and leave this one untouched.
 */
public final class Body {

    private enum Kind { DISC, ANNULAR_PLATE, TUBE, CAP, CAN }

    private static final double MIN = 1e-6;
    private static final double MAX = 100;

    private final Kind kind;
    private final String name;
    private final Medium medium;
    private final double a;       // disc/cap/annulus outer radius; tube/can inner radius
    private final double b;       // annulus/cap hole radius (0: none); tube/can wall
    private final double t;       // thickness (disc, annulus, cap) or overall length (tube, can)
    private final double centre;  // z of the centre, m
    private final boolean lowerCap;
    private final boolean upperCap;
    private final double lowerHole;
    private final double upperHole;

    private Body(Kind kind, String name, Medium medium, double a, double b, double t, double centre,
                 boolean lowerCap, boolean upperCap, double lowerHole, double upperHole) {
        this.kind = kind;
        this.name = name;
        this.medium = medium;
        this.a = a;
        this.b = b;
        this.t = t;
        this.centre = centre;
        this.lowerCap = lowerCap;
        this.upperCap = upperCap;
        this.lowerHole = lowerHole;
        this.upperHole = upperHole;
    }

    private static String checkName(String name) {
        Require.nonNull("body name", name);
        if (name.isBlank()) {
            throw new IllegalArgumentException("body name must not be blank");
        }
        return name.strip();
    }

    private static double len(String name, String what, Length value) {
        return Require.inRange(what + " of '" + name + "'", Require.nonNull(what, value).toMetres(), MIN, MAX, "m");
    }

    private static Medium medium(MediumSource material) {
        return Require.nonNull("medium", Require.nonNull("material", material).medium());
    }

    /**
     * A solid circular plate (disc) on the axis.
     *
     * @param name      a name for reports and messages, not blank
     * @param material  the medium or catalogue material, not null
     * @param radius    the outer radius, 1 µm to 100 m
     * @param thickness the axial thickness, 1 µm to 100 m
     * @return the disc, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank
     */
    public static Body disc(String name, MediumSource material, Length radius, Length thickness) {
        String n = checkName(name);
        return new Body(Kind.DISC, n, medium(material), len(n, "radius", radius), 0, len(n, "thickness", thickness),
                0, false, false, 0, 0);
    }

    /**
     * A circular plate with a central hole (a washer).
     *
     * @param name        a name for reports and messages, not blank
     * @param material    the medium or catalogue material, not null
     * @param outerRadius the outer radius, 1 µm to 100 m
     * @param holeRadius  the hole's radius, 1 µm or more and smaller than the outer radius
     * @param thickness   the axial thickness, 1 µm to 100 m
     * @return the plate, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     *                                  (the hole as large as the plate leaves nothing: refused)
     * @throws IllegalArgumentException if the name is blank
     */
    public static Body annularPlate(String name, MediumSource material, Length outerRadius, Length holeRadius,
                                    Length thickness) {
        String n = checkName(name);
        double ro = len(n, "outer radius", outerRadius);
        double h = Require.inRange("hole radius of '" + n + "'", Require.nonNull("hole radius", holeRadius).toMetres(),
                MIN, ro * (1 - 1e-9), "m");
        return new Body(Kind.ANNULAR_PLATE, n, medium(material), ro, h, len(n, "thickness", thickness), 0,
                false, false, 0, 0);
    }

    /**
     * A cap: a disc meant to close a tube end, here a body of its own (use {@link #can} for a
     * tube with its caps in one body). Give it a hole with {@link #withHole(Length)}.
     *
     * @param name      a name for reports and messages, not blank
     * @param material  the medium or catalogue material, not null
     * @param radius    the outer radius, 1 µm to 100 m
     * @param thickness the axial thickness, 1 µm to 100 m
     * @return the cap, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank
     */
    public static Body cap(String name, MediumSource material, Length radius, Length thickness) {
        String n = checkName(name);
        return new Body(Kind.CAP, n, medium(material), len(n, "radius", radius), 0, len(n, "thickness", thickness),
                0, false, false, 0, 0);
    }

    /**
     * An open tube (a cylinder wall) on the axis.
     *
     * @param name        a name for reports and messages, not blank
     * @param material    the medium or catalogue material, not null
     * @param innerRadius the inner radius, 1 µm to 100 m
     * @param wall        the wall thickness, 1 µm to 100 m
     * @param length      the axial length, 1 µm to 100 m
     * @return the tube, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the name is blank
     */
    public static Body tube(String name, MediumSource material, Length innerRadius, Length wall, Length length) {
        String n = checkName(name);
        return new Body(Kind.TUBE, n, medium(material), len(n, "inner radius", innerRadius), len(n, "wall", wall),
                len(n, "length", length), 0, false, false, 0, 0);
    }

    /**
     * A can: a tube closed at both ends by caps as thick as its wall. Open an end with
     * {@link #withoutCap(CanEnd)} and drill a cap with {@link #withCapHole(CanEnd, Length)}.
     *
     * @param name        a name for reports and messages, not blank
     * @param material    the medium or catalogue material, not null
     * @param innerRadius the inner radius, 1 µm to 100 m
     * @param wall        the wall (and cap) thickness, 1 µm to 100 m
     * @param length      the overall outside length, caps included, 1 µm to 100 m and more than two walls
     * @return the can, centred at z = 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     *                                  (a can no longer than its two caps has no inside: refused)
     * @throws IllegalArgumentException if the name is blank
     */
    public static Body can(String name, MediumSource material, Length innerRadius, Length wall, Length length) {
        String n = checkName(name);
        double w = len(n, "wall", wall);
        double l = len(n, "length", length);
        Require.inRange("length of can '" + n + "'", l, 2 * w * (1 + 1e-9) + MIN, MAX, "m");
        return new Body(Kind.CAN, n, medium(material), len(n, "inner radius", innerRadius), w, l, 0,
                true, true, 0, 0);
    }

    /**
     * This can with one end open (no cap there).
     *
     * @param end the end to open, not null
     * @return the new can; this one is unchanged
     * @throws IllegalStateException if this body is not a can
     */
    public Body withoutCap(CanEnd end) {
        requireCan("withoutCap");
        Require.nonNull("can end", end);
        return new Body(kind, name, medium, a, b, t, centre, lowerCap && end != CanEnd.LOWER,
                upperCap && end != CanEnd.UPPER, end == CanEnd.LOWER ? 0 : lowerHole,
                end == CanEnd.UPPER ? 0 : upperHole);
    }

    /**
     * This can with an axial hole in one cap (for a cable or a sensor's stem).
     *
     * @param end        the capped end, not null
     * @param holeRadius the hole's radius, 1 µm or more and smaller than the can's inner radius
     * @return the new can; this one is unchanged
     * @throws IllegalStateException if this body is not a can or that end has no cap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public Body withCapHole(CanEnd end, Length holeRadius) {
        requireCan("withCapHole");
        Require.nonNull("can end", end);
        if (end == CanEnd.LOWER ? !lowerCap : !upperCap) {
            throw new IllegalStateException("can '" + name + "' has no cap at its " + end.name().toLowerCase(Locale.ROOT)
                    + " end to drill");
        }
        double h = Require.inRange("cap hole radius of '" + name + "'",
                Require.nonNull("hole radius", holeRadius).toMetres(), MIN, a * (1 - 1e-9), "m");
        return new Body(kind, name, medium, a, b, t, centre, lowerCap, upperCap,
                end == CanEnd.LOWER ? h : lowerHole, end == CanEnd.UPPER ? h : upperHole);
    }

    /**
     * This disc or cap with a central hole: an annular plate.
     *
     * @param holeRadius the hole's radius, 1 µm or more and smaller than the radius
     * @return the new body; this one is unchanged
     * @throws IllegalStateException if this body is not a disc or a cap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public Body withHole(Length holeRadius) {
        if (kind != Kind.DISC && kind != Kind.CAP) {
            throw new IllegalStateException("withHole applies to a disc or a cap; '" + name + "' is a "
                    + kind.name().toLowerCase(Locale.ROOT).replace('_', ' '));
        }
        double h = Require.inRange("hole radius of '" + name + "'", Require.nonNull("hole radius", holeRadius).toMetres(),
                MIN, a * (1 - 1e-9), "m");
        return new Body(Kind.ANNULAR_PLATE, name, medium, a, h, t, centre, false, false, 0, 0);
    }

    /**
     * This body with another medium (the same shape and place).
     *
     * @param material the medium or catalogue material, not null
     * @return the new body; this one is unchanged
     */
    public Body withMaterial(MediumSource material) {
        return new Body(kind, name, medium(material), a, b, t, centre, lowerCap, upperCap, lowerHole, upperHole);
    }

    /**
     * This body moved along the axis towards larger z (towards the receiver coil).
     *
     * @param distance the distance, not null, at most 100 m
     * @return the moved body; this one is unchanged
     */
    public Body shiftedBy(Length distance) {
        double d = Require.inRange("shift of '" + name + "'", Require.nonNull("distance", distance).toMetres(), 0, MAX, "m");
        return new Body(kind, name, medium, a, b, t, centre + d, lowerCap, upperCap, lowerHole, upperHole);
    }

    /**
     * This body moved along the axis towards smaller z (towards the transmitter coil).
     *
     * @param distance the distance, not null, at most 100 m
     * @return the moved body; this one is unchanged
     */
    public Body shiftedBackBy(Length distance) {
        double d = Require.inRange("shift of '" + name + "'", Require.nonNull("distance", distance).toMetres(), 0, MAX, "m");
        return new Body(kind, name, medium, a, b, t, centre - d, lowerCap, upperCap, lowerHole, upperHole);
    }

    private void requireCan(String what) {
        if (kind != Kind.CAN) {
            throw new IllegalStateException(what + " applies to a can; '" + name + "' is a "
                    + kind.name().toLowerCase(Locale.ROOT).replace('_', ' '));
        }
    }

    /**
     * The name.
     *
     * @return the name given at creation
     */
    public String name() {
        return name;
    }

    /**
     * The medium the body is made of.
     *
     * @return the medium
     */
    public Medium medium() {
        return medium;
    }

    /**
     * The axial coordinate of the body's centre in its arrangement.
     *
     * @return z in m (negative towards the transmitter)
     */
    public double centreMetres() {
        return centre;
    }

    /**
     * The body's cross-section in the (r, z) half-plane, for drawing it: non-overlapping
     * rectangles that together make up the body, each {@code {r0, r1, z0, z1}} in m with
     * r0 &lt; r1 and z0 &lt; z1, in this body's place in its arrangement. A disc, cap or annular
     * plate is one rectangle; a tube is one; a can is its wall and one rectangle per cap (the
     * caps lie inside the wall's radius, so rectangles of one can touch but never overlap).
     *
     * @return a new list of new arrays, at least one
     */
    public List<double[]> crossSectionMetres() {
        return rectangles();
    }

    /**
     * The body's cross-section in the (r, z) half-plane as non-overlapping rectangles, each
     * {r0, r1, z0, z1} in m.
     *
     * @return a new list of new arrays
     */
    List<double[]> rectangles() {
        List<double[]> out = new ArrayList<>();
        switch (kind) {
            case DISC, CAP -> out.add(new double[] {0, a, centre - t / 2, centre + t / 2});
            case ANNULAR_PLATE -> out.add(new double[] {b, a, centre - t / 2, centre + t / 2});
            case TUBE -> out.add(new double[] {a, a + b, centre - t / 2, centre + t / 2});
            case CAN -> {
                double z0 = centre - t / 2;
                double z1 = centre + t / 2;
                out.add(new double[] {a, a + b, z0, z1});
                if (lowerCap) {
                    out.add(new double[] {lowerHole, a, z0, z0 + b});
                }
                if (upperCap) {
                    out.add(new double[] {upperHole, a, z1 - b, z1});
                }
            }
            default -> throw new AssertionError(kind);
        }
        return out;
    }

    /**
     * The largest linear dimension (diameter or length), for the quasi-static limit.
     *
     * @return the size in m
     */
    double size() {
        double rOut = kind == Kind.TUBE || kind == Kind.CAN ? a + b : a;
        return Math.max(2 * rOut, t);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Body x && x.kind == kind && x.name.equals(name) && x.medium.equals(medium)
                && x.a == a && x.b == b && x.t == t && x.centre == centre && x.lowerCap == lowerCap
                && x.upperCap == upperCap && x.lowerHole == lowerHole && x.upperHole == upperHole;
    }

    @Override
    public int hashCode() {
        int h = kind.hashCode() * 31 + name.hashCode();
        h = h * 31 + medium.hashCode();
        h = h * 31 + Double.hashCode(a);
        h = h * 31 + Double.hashCode(b);
        h = h * 31 + Double.hashCode(t);
        h = h * 31 + Double.hashCode(centre);
        h = h * 31 + Boolean.hashCode(lowerCap) * 2 + Boolean.hashCode(upperCap);
        return h * 31 + Double.hashCode(lowerHole) * 7 + Double.hashCode(upperHole);
    }

    @Override
    public String toString() {
        String where = String.format(Locale.ROOT, " centred at z = %.6g mm", centre * 1e3);
        String m = " of " + medium.name();
        return switch (kind) {
            case DISC -> String.format(Locale.ROOT, "disc '%s' r %.6g mm, %.6g mm thick", name, a * 1e3, t * 1e3) + m + where;
            case CAP -> String.format(Locale.ROOT, "cap '%s' r %.6g mm, %.6g mm thick", name, a * 1e3, t * 1e3) + m + where;
            case ANNULAR_PLATE -> String.format(Locale.ROOT, "annular plate '%s' r %.6g mm, hole r %.6g mm, %.6g mm thick",
                    name, a * 1e3, b * 1e3, t * 1e3) + m + where;
            case TUBE -> String.format(Locale.ROOT, "tube '%s' inner r %.6g mm, wall %.6g mm, %.6g mm long",
                    name, a * 1e3, b * 1e3, t * 1e3) + m + where;
            case CAN -> String.format(Locale.ROOT, "can '%s' inner r %.6g mm, wall %.6g mm, %.6g mm long, %s", name,
                    a * 1e3, b * 1e3, t * 1e3, ends()) + m + where;
        };
    }

    private String ends() {
        return end("lower", lowerCap, lowerHole) + ", " + end("upper", upperCap, upperHole);
    }

    private static String end(String which, boolean cap, double hole) {
        if (!cap) {
            return which + " end open";
        }
        return hole > 0 ? String.format(Locale.ROOT, "%s cap with a hole r %.6g mm", which, hole * 1e3) : which + " cap";
    }
}
