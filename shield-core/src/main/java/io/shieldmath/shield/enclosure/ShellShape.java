/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.Objects;

/**
 * The shape of a shell before its walls are given: a geometry and the inner radius of
 * the innermost wall. Start a shell here and add walls outwards:
 *
 * <pre>{@code
 * Shell can = Shell.sphere(cm(10)).wall(nickelIron, mm(1)).thenGap(cm(2)).then(nickelIron, mm(1));
 * }</pre>
 *
 * <p>Inner radius range: {@value #MIN_RADIUS_METRES} m to {@value #MAX_RADIUS_METRES} m.
 * Immutable and thread-safe; equality is by value.
 */
public final class ShellShape {

    /** The smallest inner radius, in metres (1 µm). */
    public static final double MIN_RADIUS_METRES = 1e-6;
    /** The largest inner radius, in metres. */
    public static final double MAX_RADIUS_METRES = 100;
    /** The largest ratio of the longest to the shortest side of a box, for its equivalent sphere. */
    public static final double MAX_BOX_ASPECT = 3;

    private final ShellGeometry geometry;
    private final Length innerRadius;
    private final String description;
    /** A box's inner sides, shortest first, in metres; null for a sphere or a cylinder. */
    private final double[] boxSides;

    private ShellShape(ShellGeometry geometry, Length innerRadius, String description, double[] boxSides) {
        this.geometry = geometry;
        this.innerRadius = innerRadius;
        this.description = description;
        this.boxSides = boxSides;
    }

    static ShellShape of(ShellGeometry geometry, Length innerRadius) {
        Require.nonNull("geometry", geometry);
        checkRadius(innerRadius);
        return new ShellShape(geometry, innerRadius, describe(geometry, innerRadius), null);
    }

    private static void checkRadius(Length r) {
        Require.nonNull("inner radius", r);
        Require.inRange("shell inner radius", r.toMetres(), MIN_RADIUS_METRES, MAX_RADIUS_METRES, "m");
    }

    private static String describe(ShellGeometry g, Length r) {
        switch (g) {
            case SPHERE:
                return "sphere of inner radius " + r;
            case CYLINDER_TRANSVERSE:
                return "long cylinder of inner radius " + r + ", field across the axis";
            default:
                return "long cylinder of inner radius " + r + ", field along the axis";
        }
    }

    /**
     * A closed box of inner sides x, y, z, computed as its equivalent sphere: a sphere
     * whose inner radius is half the box's longest inner side.
     *
     * <p>The approximation (common practice, no source): a roughly cubic box shields like
     * a sphere of about its size, and taking the radius as half the longest side, the
     * larger of the usual choices (half the longest side, or the radius of the sphere of
     * equal volume), gives the lower shielding factor, since the thin-shell factors fall
     * as 1/R. It ignores the flux crowding at edges and corners. Valid for boxes whose
     * longest side is at most {@value #MAX_BOX_ASPECT} times the shortest; for a long box
     * use a long cylinder of the box's larger cross-section side as its diameter.
     *
     * @param x one inner side, not null
     * @param y the second inner side, not null
     * @param z the third inner side, not null
     * @return the shape
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if half the longest side is out of the
     *                                  radius range or the aspect ratio is above {@value #MAX_BOX_ASPECT}
     */
    static ShellShape box(Length x, Length y, Length z) {
        double a = Require.nonNull("box side x", x).toMetres();
        double b = Require.nonNull("box side y", y).toMetres();
        double c = Require.nonNull("box side z", z).toMetres();
        double max = Math.max(a, Math.max(b, c));
        double min = Math.min(a, Math.min(b, c));
        Require.inRange("box aspect ratio (longest side over shortest)", max / min, 1, MAX_BOX_ASPECT,
                "(plain number)");
        Length r = Length.ofMetres(max / 2);
        checkRadius(r);
        double[] sides = {a, b, c};
        java.util.Arrays.sort(sides);
        return new ShellShape(ShellGeometry.SPHERE, r,
                "box " + x + " × " + y + " × " + z + " as its equivalent sphere of inner radius " + r, sides);
    }

    /**
     * The shell with its first (innermost) wall.
     *
     * @param medium    the wall's medium or catalogue material, not null
     * @param thickness the wall thickness, from 1 pm to 100 m
     * @return the shell
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m or the conductivity
     *         is above 1e10 S/m
     */
    public Shell wall(MediumSource medium, Length thickness) {
        return Shell.start(this, medium, thickness);
    }

    /**
     * The geometry.
     *
     * @return the geometry
     */
    public ShellGeometry geometry() {
        return geometry;
    }

    /**
     * The inner radius of the innermost wall (for a box, of its equivalent sphere).
     *
     * @return the radius
     */
    public Length innerRadius() {
        return innerRadius;
    }

    /**
     * A description of the shape, naming an equivalent shape where one is used.
     *
     * @return the description
     */
    public String description() {
        return description;
    }

    /**
     * The inner wall area an enclosure's openings share, m²: 2(xy + yz + zx) for a box, 4πR²
     * for a sphere, and no limit (infinity) for a long cylinder, whose length is not given.
     */
    double wallArea() {
        if (boxSides != null) {
            return 2 * (boxSides[0] * boxSides[1] + boxSides[1] * boxSides[2] + boxSides[2] * boxSides[0]);
        }
        double r = innerRadius.toMetres();
        return geometry == ShellGeometry.SPHERE ? 4 * Math.PI * r * r : Double.POSITIVE_INFINITY;
    }

    /**
     * Why one opening (of an array, the single opening) is larger than the face it sits on,
     * or null if it fits. The largest face decides: for a box its two longer sides p ≥ q; a
     * sphere's or a cylinder's face is its curved wall, whose straight extent across is the
     * diameter 2R (and, along a long cylinder's axis, unbounded). A hole of diameter D fits
     * if D ≤ q (box) or D ≤ 2R; a slot L × W if W ≤ q and L ≤ sqrt(p² + q²), the face's
     * diagonal (box), or L, W ≤ 2R (sphere), W ≤ 2R (cylinder); a seam of length L, which
     * runs along a joint, if L ≤ 2(p + q), the face's perimeter (box), or L ≤ 2πR (sphere).
     */
    String misfit(Opening o) {
        double l = o.largestDimension().toMetres();
        double w = o.width().map(Length::toMetres).orElse(0.0);
        if (boxSides != null) {
            double q = boxSides[1];
            double p = boxSides[2];
            String face = "its largest face, " + Length.ofMetres(p) + " × " + Length.ofMetres(q) + ",";
            switch (o.kind()) {
                case HOLE:
                    return l <= q ? null : face + " holds a hole of at most " + Length.ofMetres(q) + " across";
                case SLOT:
                    return w <= q && l <= Math.hypot(p, q) ? null : face + " holds a slot of at most "
                            + Length.ofMetres(Math.hypot(p, q)) + " (its diagonal) × " + Length.ofMetres(q);
                default:
                    return l <= 2 * (p + q) ? null : face + " has a perimeter of " + Length.ofMetres(2 * (p + q));
            }
        }
        double d = 2 * innerRadius.toMetres();
        String face = "its wall, of diameter " + Length.ofMetres(d) + ",";
        boolean sphere = geometry == ShellGeometry.SPHERE;
        switch (o.kind()) {
            case HOLE:
                return l <= d ? null : face + " holds a hole of at most " + Length.ofMetres(d) + " across";
            case SLOT:
                return w <= d && (!sphere || l <= d) ? null : face + " holds a slot of at most "
                        + (sphere ? Length.ofMetres(d) + " × " : "any length × ") + Length.ofMetres(d);
            default:
                return !sphere || l <= Math.PI * d ? null : face + " has a circumference of "
                        + Length.ofMetres(Math.PI * d);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ShellShape s && s.geometry == geometry && s.innerRadius.equals(innerRadius)
                && s.description.equals(description);
    }

    @Override
    public int hashCode() {
        return Objects.hash(geometry, innerRadius, description);
    }

    @Override
    public String toString() {
        return description;
    }
}
