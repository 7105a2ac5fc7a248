/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;

/**
 * Where the sensitive part sits: a cylinder on the axis (radius and length, centred at
 * z = 0 unless moved), or a single point on the axis. Results over a region are sampled on
 * {@value #RADIAL_SAMPLES} × {@value #AXIAL_SAMPLES} points spread evenly over its (r, z)
 * rectangle, edges included.
 *
 * <pre>{@code
 * SensorRegion probe = SensorRegion.cylinder(mm(4), mm(10));
 * SensorRegion chip = SensorRegion.cylinder(mm(2), mm(1)).shiftedBy(mm(3));
 * }</pre>
 *
 * <p>Ranges: radius and length 1 µm to 100 m. Immutable and thread-safe.
 */
public final class SensorRegion {

    /** Samples across the radius, the axis and the rim included. */
    public static final int RADIAL_SAMPLES = 9;
    /** Samples along the length, both ends included. */
    public static final int AXIAL_SAMPLES = 17;

    private final double radius;
    private final double length;
    private final double centre;

    private SensorRegion(double radius, double length, double centre) {
        this.radius = radius;
        this.length = length;
        this.centre = centre;
    }

    /**
     * A cylinder on the axis, centred at z = 0.
     *
     * @param radius the radius, 1 µm to 100 m
     * @param length the axial length, 1 µm to 100 m
     * @return the region
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     */
    public static SensorRegion cylinder(Length radius, Length length) {
        double r = Require.inRange("sensor radius", Require.nonNull("sensor radius", radius).toMetres(), 1e-6, 100, "m");
        double l = Require.inRange("sensor length", Require.nonNull("sensor length", length).toMetres(), 1e-6, 100, "m");
        return new SensorRegion(r, l, 0);
    }

    /**
     * A single point on the axis at z = 0.
     *
     * @return the region
     */
    public static SensorRegion centrePoint() {
        return new SensorRegion(0, 0, 0);
    }

    /**
     * This region moved towards larger z.
     *
     * @param distance the distance, not null, at most 100 m
     * @return the moved region; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is negative or above 100 m
     */
    public SensorRegion shiftedBy(Length distance) {
        return new SensorRegion(radius, length,
                centre + Require.inRange("sensor shift", Require.nonNull("distance", distance).toMetres(), 0, 100, "m"));
    }

    /**
     * This region moved towards smaller z.
     *
     * @param distance the distance, not null, at most 100 m
     * @return the moved region; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is negative or above 100 m
     */
    public SensorRegion shiftedBackBy(Length distance) {
        return new SensorRegion(radius, length,
                centre - Require.inRange("sensor shift", Require.nonNull("distance", distance).toMetres(), 0, 100, "m"));
    }

    /**
     * Whether this region is a single point.
     *
     * @return true for {@link #centrePoint()} and its shifted copies
     */
    public boolean isPoint() {
        return radius == 0;
    }

    /**
     * The sample points, the axis first, then outwards, row by row from the lower end.
     *
     * @return a new array of points
     */
    Point[] samples() {
        if (isPoint()) {
            return new Point[] {new Point(0, centre)};
        }
        Point[] p = new Point[RADIAL_SAMPLES * AXIAL_SAMPLES];
        for (int j = 0; j < AXIAL_SAMPLES; j++) {
            double z = centre - length / 2 + length * j / (AXIAL_SAMPLES - 1);
            for (int i = 0; i < RADIAL_SAMPLES; i++) {
                p[i + RADIAL_SAMPLES * j] = new Point(radius * i / (RADIAL_SAMPLES - 1), z);
            }
        }
        return p;
    }

    double radiusMetres() {
        return radius;
    }

    double lowerMetres() {
        return centre - length / 2;
    }

    double upperMetres() {
        return centre + length / 2;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SensorRegion s && s.radius == radius && s.length == length && s.centre == centre;
    }

    @Override
    public int hashCode() {
        return (Double.hashCode(radius) * 31 + Double.hashCode(length)) * 31 + Double.hashCode(centre);
    }

    @Override
    public String toString() {
        if (isPoint()) {
            return String.format(Locale.ROOT, "sensor point on the axis at z %.6g mm", centre * 1e3);
        }
        return String.format(Locale.ROOT, "sensor cylinder r %.6g mm, %.6g mm long, centred at z %.6g mm",
                radius * 1e3, length * 1e3, centre * 1e3);
    }
}
