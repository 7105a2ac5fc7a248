/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.axisymmetric.SensorRegion;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Length;
import java.util.Objects;

/**
 * Where the shielded field is read in a design in an applied field, as a file holds it: a
 * point on the axis or a cylinder on the axis, with its lengths as given and its place. Built
 * at once with the factories of {@link SensorRegion}.
 *
 * <p>Immutable and thread-safe; equality is by value; the {@code shifted…} methods return a
 * new sensor.
 */
public final class DesignSensor {

    private static final DesignSensor CENTRE = new DesignSensor(null, null, null, false);

    final Length radius;
    final Length length;
    final Length shift;
    final boolean back;
    private final SensorRegion region;

    private DesignSensor(Length radius, Length length, Length shift, boolean back) {
        this.radius = radius;
        this.length = length;
        this.shift = shift;
        this.back = back;
        SensorRegion r = radius == null ? SensorRegion.centrePoint() : SensorRegion.cylinder(radius, length);
        this.region = shift == null ? r : back ? r.shiftedBackBy(shift) : r.shiftedBy(shift);
    }

    /**
     * A single point on the axis at z = 0.
     *
     * @return the sensor
     */
    public static DesignSensor point() {
        return CENTRE;
    }

    /**
     * A cylinder on the axis centred at z = 0, as {@link SensorRegion#cylinder(Length, Length)}.
     *
     * @param radius the radius, 1 µm to 100 m, not null
     * @param length the axial length, 1 µm to 100 m, not null
     * @return the sensor
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     */
    public static DesignSensor cylinder(Length radius, Length length) {
        return new DesignSensor(Require.nonNull("sensor radius", radius), Require.nonNull("sensor length", length),
                null, false);
    }

    /**
     * This sensor centred at z = +distance; replaces any earlier move.
     *
     * @param distance the distance, up to 100 m, not null
     * @return the new sensor; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public DesignSensor shiftedBy(Length distance) {
        return new DesignSensor(radius, length, Require.nonNull("distance", distance), false);
    }

    /**
     * This sensor centred at z = −distance; replaces any earlier move.
     *
     * @param distance the distance, up to 100 m, not null
     * @return the new sensor; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public DesignSensor shiftedBackBy(Length distance) {
        return new DesignSensor(radius, length, Require.nonNull("distance", distance), true);
    }

    /**
     * The region for the solver.
     *
     * @return the region
     */
    public SensorRegion region() {
        return region;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DesignSensor s && Objects.equals(s.radius, radius) && Objects.equals(s.length, length)
                && Objects.equals(s.shift, shift) && s.back == back;
    }

    @Override
    public int hashCode() {
        return Objects.hash(radius, length, shift, back);
    }

    @Override
    public String toString() {
        return region.toString();
    }
}
