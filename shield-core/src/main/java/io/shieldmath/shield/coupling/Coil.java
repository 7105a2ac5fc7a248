/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;
import java.util.Optional;

/**
 * A circular coil on the common axis of a coil pair: a thin loop of N turns, or a winding of
 * finite radial width and axial length modelled as a grid of coaxial rings, each carrying an
 * equal share of the turns and placed at the centre of its cell (the midpoint rule over the
 * winding cross-section; more rings approach the uniformly wound coil).
 *
 * <pre>{@code
 * Coil small = Coil.loop(mm(15), 20);
 * Coil bobbin = Coil.loop(mm(15), 200).withWinding(mm(4), mm(6), 4, 6);
 * }</pre>
 *
 * <p>Ranges: mean radius 100 µm to 10 m; turns 1 to 1 000 000; winding width below twice the
 * mean radius; axial length 0 to 10 m; 1 to {@value #MAX_RINGS_PER_DIRECTION} rings in each
 * direction. Immutable and thread-safe; the {@code with…} methods return a new coil.
 */
public final class Coil {

    /** The largest number of rings across or along a winding. */
    public static final int MAX_RINGS_PER_DIRECTION = 64;

    private final double radius;
    private final int turns;
    private final double width;
    private final double length;
    private final int radialRings;
    private final int axialRings;

    private Coil(double radius, int turns, double width, double length, int radialRings, int axialRings) {
        this.radius = radius;
        this.turns = turns;
        this.width = width;
        this.length = length;
        this.radialRings = radialRings;
        this.axialRings = axialRings;
    }

    /**
     * A thin circular loop (all turns on one circle).
     *
     * @param radius the loop radius, 100 µm to 10 m, not null
     * @param turns  the number of turns, 1 to 1 000 000
     * @return the coil
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public static Coil loop(Length radius, int turns) {
        double r = Require.inRange("coil radius", Require.nonNull("coil radius", radius).toMetres(), 1e-4, 10, "m");
        Require.inRange("turns", turns, 1, 1_000_000, "turns");
        return new Coil(r, turns, 0, 0, 1, 1);
    }

    /**
     * This coil with a rectangular winding cross-section about its mean radius, modelled
     * as {@code radialRings × axialRings} rings.
     *
     * @param radialWidth the winding's radial width, less than twice the mean radius
     * @param axialLength the winding's axial length, up to 10 m
     * @param radialRings the rings across the width, 1 to {@value #MAX_RINGS_PER_DIRECTION}
     * @param axialRings  the rings along the length, 1 to {@value #MAX_RINGS_PER_DIRECTION}
     * @return the new coil; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public Coil withWinding(Length radialWidth, Length axialLength, int radialRings, int axialRings) {
        double w = Require.nonNull("winding width", radialWidth).toMetres();
        Require.inRange("winding width", w, 0, 2 * radius * (1 - 1e-9), "m");
        double l = Require.inRange("winding length", Require.nonNull("winding length", axialLength).toMetres(),
                0, 10, "m");
        Require.inRange("radial rings", radialRings, 1, MAX_RINGS_PER_DIRECTION, "rings");
        Require.inRange("axial rings", axialRings, 1, MAX_RINGS_PER_DIRECTION, "rings");
        return new Coil(radius, turns, w, l, radialRings, axialRings);
    }

    /**
     * This coil with another number of turns.
     *
     * @param newTurns the number of turns, 1 to 1 000 000
     * @return the new coil; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the number of turns is out of range
     */
    public Coil withTurns(int newTurns) {
        Require.inRange("turns", newTurns, 1, 1_000_000, "turns");
        return new Coil(radius, newTurns, width, length, radialRings, axialRings);
    }

    /**
     * The mean radius.
     *
     * @return the radius
     */
    public Length radius() {
        return Length.ofMetres(radius);
    }

    /**
     * The number of turns.
     *
     * @return N
     */
    public int turns() {
        return turns;
    }

    /**
     * The axial length of the winding.
     *
     * @return the length, or empty for a thin loop
     */
    public Optional<Length> axialLength() {
        return length > 0 ? Optional.of(Length.ofMetres(length)) : Optional.empty();
    }

    /**
     * The radial width of the winding.
     *
     * @return the width, or empty for a thin loop
     */
    public Optional<Length> radialWidth() {
        return width > 0 ? Optional.of(Length.ofMetres(width)) : Optional.empty();
    }

    /**
     * The number of rings the coil is modelled by.
     *
     * @return radial rings × axial rings
     */
    public int ringCount() {
        return radialRings * axialRings;
    }

    /** Ring radii in m, ring index = radial + radialRings·axial. */
    double[] ringRadii() {
        double[] r = new double[ringCount()];
        for (int j = 0; j < axialRings; j++) {
            for (int i = 0; i < radialRings; i++) {
                r[i + radialRings * j] = radius + width * ((i + 0.5) / radialRings - 0.5);
            }
        }
        return r;
    }

    /** Ring offsets along the axis from the coil's centre plane, in m. */
    double[] ringOffsets() {
        double[] z = new double[ringCount()];
        for (int j = 0; j < axialRings; j++) {
            for (int i = 0; i < radialRings; i++) {
                z[i + radialRings * j] = length * ((j + 0.5) / axialRings - 0.5);
            }
        }
        return z;
    }

    /** Turns carried by each ring. */
    double turnsPerRing() {
        return turns / (double) ringCount();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Coil c && c.radius == radius && c.turns == turns && c.width == width
                && c.length == length && c.radialRings == radialRings && c.axialRings == axialRings;
    }

    @Override
    public int hashCode() {
        int h = Double.hashCode(radius);
        h = 31 * h + turns;
        h = 31 * h + Double.hashCode(width);
        h = 31 * h + Double.hashCode(length);
        return 31 * (31 * h + radialRings) + axialRings;
    }

    @Override
    public String toString() {
        if (ringCount() == 1 && width == 0 && length == 0) {
            return String.format(Locale.ROOT, "loop r %s, %d turns", radius(), turns);
        }
        return String.format(Locale.ROOT, "coil r %s, %d turns, winding %s m × %s m as %d×%d rings", radius(),
                turns, width, length, radialRings, axialRings);
    }
}
