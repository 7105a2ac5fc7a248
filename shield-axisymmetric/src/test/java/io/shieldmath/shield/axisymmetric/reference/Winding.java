/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.internal.Require;

/**
 * A coaxial coil as filaments: a thin loop of N turns, or a winding of rectangular section
 * (radial width w, axial length h about its mean radius and centre plane) modelled as
 * nr × nh rings at the centres of equal sub-rectangles, each carrying N/(nr·nh) turns (the
 * midpoint rule over the winding section; more rings approach the uniformly wound coil). The
 * winding's own current distribution is imposed (a filamentary coil), not solved for.
 *
 * @param meanRadius  the mean radius in m, 100 µm to 10 m
 * @param zCentre     the axial position of the centre plane in m, finite, |z| ≤ 100 m
 * @param turns       the number of turns, 1 to 1 000 000
 * @param width       the radial width of the winding in m, 0 or more and below twice the mean radius
 * @param length      the axial length of the winding in m, 0 to 10 m
 * @param radialRings rings across the width, 1 to 64
 * @param axialRings  rings along the length, 1 to 64
 */
public record Winding(double meanRadius, double zCentre, int turns, double width, double length,
                      int radialRings, int axialRings) {

    /**
     * Checks the ranges.
     *
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public Winding {
        Require.inRange("winding mean radius", meanRadius, 1e-4, 10, "m");
        Require.inRange("winding centre z", zCentre, -100, 100, "m");
        Require.inRange("turns", turns, 1, 1_000_000, "turns");
        Require.inRange("winding width", width, 0, 2 * meanRadius * (1 - 1e-9), "m");
        Require.inRange("winding length", length, 0, 10, "m");
        Require.inRange("radial rings", radialRings, 1, 64, "rings");
        Require.inRange("axial rings", axialRings, 1, 64, "rings");
    }

    /**
     * A thin loop: all turns on one circle.
     *
     * @param radius the loop radius in m, 100 µm to 10 m
     * @param z      the loop's axial position in m, |z| ≤ 100 m
     * @param turns  the number of turns, 1 to 1 000 000
     * @return the loop
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public static Winding loop(double radius, double z, int turns) {
        return new Winding(radius, z, turns, 0, 0, 1, 1);
    }

    /**
     * This coil with a rectangular winding section, as {@code radialRings × axialRings} rings.
     *
     * @param newWidth       the radial width in m, 0 or more and below twice the mean radius
     * @param newLength      the axial length in m, 0 to 10 m
     * @param newRadialRings rings across the width, 1 to 64
     * @param newAxialRings  rings along the length, 1 to 64
     * @return the new coil; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public Winding withSection(double newWidth, double newLength, int newRadialRings, int newAxialRings) {
        return new Winding(meanRadius, zCentre, turns, newWidth, newLength, newRadialRings, newAxialRings);
    }

    /**
     * The number of rings.
     *
     * @return radialRings × axialRings
     */
    public int ringCount() {
        return radialRings * axialRings;
    }

    /**
     * The ring radii in m, index = radial + radialRings·axial.
     *
     * @return a new array
     */
    public double[] ringRadii() {
        double[] r = new double[ringCount()];
        for (int j = 0; j < axialRings; j++) {
            for (int i = 0; i < radialRings; i++) {
                r[i + radialRings * j] = meanRadius + width * ((i + 0.5) / radialRings - 0.5);
            }
        }
        return r;
    }

    /**
     * The ring positions along the axis in m, indexed like {@link #ringRadii()}.
     *
     * @return a new array
     */
    public double[] ringZ() {
        double[] z = new double[ringCount()];
        for (int j = 0; j < axialRings; j++) {
            for (int i = 0; i < radialRings; i++) {
                z[i + radialRings * j] = zCentre + length * ((j + 0.5) / axialRings - 0.5);
            }
        }
        return z;
    }

    /**
     * The turns each ring carries.
     *
     * @return turns / ringCount()
     */
    public double turnsPerRing() {
        return turns / (double) ringCount();
    }

    /**
     * The free-space mutual inductance with another coil: Maxwell's M summed over both coils'
     * rings, weighted by their turns.
     *
     * @param other the other coil, not null; no ring of it may coincide with a ring of this one
     * @return M in henries
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if two rings coincide
     */
    public double mutualInductance(Winding other) {
        double[] ra = ringRadii();
        double[] za = ringZ();
        double[] rb = other.ringRadii();
        double[] zb = other.ringZ();
        double m = 0;
        for (int i = 0; i < ra.length; i++) {
            for (int j = 0; j < rb.length; j++) {
                m += CoaxialFilaments.mutualInductance(ra[i], rb[j], zb[j] - za[i]);
            }
        }
        return m * turnsPerRing() * other.turnsPerRing();
    }

    /**
     * The mutual inductance with a cell of uniform current density (one ampere in the cell,
     * one in the coil's terminals).
     *
     * @param cell the cell's section, not null; no ring may lie in it
     * @return M in henries
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a ring lies in the cell
     */
    public double mutualInductance(Section cell) {
        double[] r = ringRadii();
        double[] z = ringZ();
        double m = 0;
        for (int i = 0; i < r.length; i++) {
            m += SectionInductance.mutualWithFilament(cell, r[i], z[i]);
        }
        return m * turnsPerRing();
    }
}
