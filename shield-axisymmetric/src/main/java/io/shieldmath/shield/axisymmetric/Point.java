/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;

/**
 * A point of the (r, z) half-plane of an arrangement: the distance r from the axis and the
 * axial coordinate z (signed; z = 0 is midway between the coils' centre planes, or the centre
 * of the uniform field).
 *
 * <pre>{@code
 * Point centre = Point.ORIGIN;
 * Point p = Point.ofMillimetres(5, -12.5);
 * Point q = Point.onAxis(mm(10));
 * }</pre>
 *
 * <p>Ranges: r from 0 to 1000 m, z from −1000 m to 1000 m. Immutable and thread-safe.
 *
 * @param radiusMetres the distance from the axis in m
 * @param axialMetres  the axial coordinate in m
 */
public record Point(double radiusMetres, double axialMetres) {

    /** The origin: on the axis at z = 0. */
    public static final Point ORIGIN = new Point(0, 0);

    /**
     * Validates the coordinates.
     *
     * @param radiusMetres the distance from the axis in m, 0 to 1000
     * @param axialMetres  the axial coordinate in m, −1000 to 1000
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a coordinate is out of range
     */
    public Point {
        Require.inRange("point radius", radiusMetres, 0, 1000, "m");
        Require.inRange("point axial coordinate", axialMetres, -1000, 1000, "m");
        radiusMetres += 0.0;
        axialMetres += 0.0;
    }

    /**
     * A point from coordinates in metres.
     *
     * @param r the distance from the axis in m, 0 to 1000
     * @param z the axial coordinate in m, −1000 to 1000
     * @return the point
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a coordinate is out of range
     */
    public static Point ofMetres(double r, double z) {
        return new Point(r, z);
    }

    /**
     * A point from coordinates in millimetres.
     *
     * @param r the distance from the axis in mm, 0 to 1e6
     * @param z the axial coordinate in mm, −1e6 to 1e6
     * @return the point
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a coordinate is out of range
     */
    public static Point ofMillimetres(double r, double z) {
        return new Point(r * 1e-3, z * 1e-3);
    }

    /**
     * A point on the axis at positive z (towards the receiver).
     *
     * @param z the axial coordinate, not null
     * @return the point
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if z is outside −1000 m to 1000 m
     */
    public static Point onAxis(Length z) {
        return new Point(0, Require.nonNull("axial coordinate", z).toMetres());
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "(r %.6g mm, z %.6g mm)", radiusMetres * 1e3, axialMetres * 1e3);
    }
}
