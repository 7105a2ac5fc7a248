/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.internal.Require;
import java.util.Arrays;
import java.util.Locale;

/**
 * A finite, non-magnetic (µr = 1) conducting disc coaxial with two coils, solved by the
 * coupled-circuit (filament) method: the reference model the axisymmetric finite-element
 * solver is checked against. Built fluently:
 *
 * <pre>{@code
 * DiscCouplingResult r = CoupledCircuitDisc.of(0.2, 0.5e-3, 0, 5.8e7)   // R, t, z0 in m; σ in S/m
 *         .gradedCells(48, 6, 4, 1.5)
 *         .between(Winding.loop(0.01, -0.01, 1), Winding.loop(0.01, 0.01, 1))
 *         .at(10e3);
 * r.shieldingEffectivenessDb();
 * }</pre>
 *
 * <p>The model (the coupled circuits of Miller &amp; Bridges 1968; J. C. Maxwell and F. W.
 * Grover 1946 for the inductances): the disc of radius R, thickness t, centre plane z0 and
 * conductivity σ is cut into nr × nz annular cells of rectangular section; each carries a
 * uniform azimuthal current density, so cell k has resistance R_k = 2π·r̄_k/(σ·Δr_k·Δz_k)
 * (exact for uniform density, r̄ the mean radius) and the cells' inductances are those of
 * {@link SectionInductance}. Displacement current is neglected (quasi-static), and the current
 * is purely azimuthal by symmetry, so the rim needs no boundary condition: cut cells simply end.
 *
 * <p>Cell index k = i + nr·j, i the radial and j the axial cell, from the axis and from the
 * lower face. Ranges: R 100 µm to 10 m; t 100 nm to 1 m; |z0| ≤ 100 m; σ 0 to 1e10 S/m;
 * 1 to {@value #MAX_RADIAL} radial and 1 to {@value #MAX_AXIAL} axial cells, at most
 * {@value #MAX_CELLS} in all (the solve is a dense LU of order 2·cells).
 *
 * <p>Immutable and thread-safe; every {@code with…}/{@code …Cells} method returns a new disc.
 */
public final class CoupledCircuitDisc {

    /** The most radial cells. */
    public static final int MAX_RADIAL = 400;
    /** The most axial cells. */
    public static final int MAX_AXIAL = 64;
    /** The most cells in all. */
    public static final int MAX_CELLS = 1600;

    private final double radius;
    private final double thickness;
    private final double zCentre;
    private final double sigma;
    private final double[] rEdges;
    private final double[] zEdges;

    private CoupledCircuitDisc(double radius, double thickness, double zCentre, double sigma, double[] rEdges,
                               double[] zEdges) {
        this.radius = radius;
        this.thickness = thickness;
        this.zCentre = zCentre;
        this.sigma = sigma;
        this.rEdges = rEdges;
        this.zEdges = zEdges;
    }

    /**
     * A disc, with one cell until {@link #cells}, {@link #gradedCells} or {@link #withEdges} divides it.
     *
     * @param discRadius the radius R in m, 100 µm to 10 m
     * @param thickness  the thickness t in m, 100 nm to 1 m
     * @param zCentre    the axial position of the centre plane in m, |z0| ≤ 100 m
     * @param sigma      the conductivity in S/m, 0 to 1e10 (0: the disc is not there electrically)
     * @return the disc
     * @throws InvalidQuantityException if a value is out of range
     */
    public static CoupledCircuitDisc of(double discRadius, double thickness, double zCentre, double sigma) {
        Require.inRange("disc radius", discRadius, 1e-4, 10, "m");
        Require.inRange("disc thickness", thickness, 1e-7, 1, "m");
        Require.inRange("disc centre z", zCentre, -100, 100, "m");
        Require.inRange("disc conductivity", sigma, 0, 1e10, "S/m");
        return new CoupledCircuitDisc(discRadius, thickness, zCentre, sigma, new double[] {0, discRadius},
                new double[] {zCentre - 0.5 * thickness, zCentre + 0.5 * thickness});
    }

    /**
     * This disc cut into cells of equal width and equal height.
     *
     * @param nr radial cells, 1 to {@value #MAX_RADIAL}
     * @param nz axial cells, 1 to {@value #MAX_AXIAL}; nr·nz at most {@value #MAX_CELLS}
     * @return the new disc; this one is unchanged
     * @throws InvalidQuantityException if a count is out of range
     */
    public CoupledCircuitDisc cells(int nr, int nz) {
        return gradedCells(nr, nz, 0, 0);
    }

    /**
     * This disc cut into graded cells. Radial edges r_i = R·sinh(β·i/nr)/sinh(β): fine cells
     * near the axis (where small coaxial coils sit), growing outward by about e^{β/nr} per
     * cell; β = 0 gives equal widths. Axial edges
     * z_j = z0 − t/2 + t·[1 + tanh(γ·(j/nz − 1/2))/tanh(γ/2)]/2: thin cells at both faces (where
     * the skin effect crowds the current), thicker in the middle; γ = 0 gives equal heights.
     * Doubling nr and nz keeps every old edge (the grids nest), which a convergence study needs.
     *
     * @param nr             radial cells, 1 to {@value #MAX_RADIAL}
     * @param nz             axial cells, 1 to {@value #MAX_AXIAL}; nr·nz at most {@value #MAX_CELLS}
     * @param radialStretch  β, 0 to 10
     * @param faceClustering γ, 0 to 10
     * @return the new disc; this one is unchanged
     * @throws InvalidQuantityException if a value is out of range
     */
    public CoupledCircuitDisc gradedCells(int nr, int nz, double radialStretch, double faceClustering) {
        Require.inRange("radial cells", nr, 1, MAX_RADIAL, "cells");
        Require.inRange("axial cells", nz, 1, MAX_AXIAL, "cells");
        Require.inRange("cells in all", (double) nr * nz, 1, MAX_CELLS, "cells");
        double beta = Require.inRange("radial stretch", radialStretch, 0, 10, "");
        double gamma = Require.inRange("face clustering", faceClustering, 0, 10, "");
        double[] r = new double[nr + 1];
        for (int i = 0; i <= nr; i++) {
            double u = i / (double) nr;
            r[i] = beta == 0 ? radius * u : radius * Math.sinh(beta * u) / Math.sinh(beta);
        }
        r[nr] = radius;
        double[] z = new double[nz + 1];
        double low = zCentre - 0.5 * thickness;
        for (int j = 0; j <= nz; j++) {
            double u = j / (double) nz;
            double s = gamma == 0 ? u : 0.5 * (1 + Math.tanh(gamma * (u - 0.5)) / Math.tanh(0.5 * gamma));
            z[j] = low + thickness * s;
        }
        z[0] = low;
        z[nz] = zCentre + 0.5 * thickness;
        return new CoupledCircuitDisc(radius, thickness, zCentre, sigma, r, z);
    }

    /**
     * This disc cut at the given edges, for matching another model's mesh.
     *
     * @param radialEdges strictly increasing radii in m from 0 to R (the last within 1e-12·R of
     *                    R), 2 to {@value #MAX_RADIAL} + 1 values, not null
     * @param axialEdges  strictly increasing axial positions in m from z0 − t/2 to z0 + t/2 (each
     *                    end within 1e-12·t), 2 to {@value #MAX_AXIAL} + 1 values, not null
     * @return the new disc; this one is unchanged
     * @throws InvalidQuantityException if the edges do not fit the disc
     */
    public CoupledCircuitDisc withEdges(double[] radialEdges, double[] axialEdges) {
        double[] r = Require.nonNull("radial edges", radialEdges).clone();
        double[] z = Require.nonNull("axial edges", axialEdges).clone();
        Require.inRange("radial edges", r.length, 2, MAX_RADIAL + 1, "values");
        Require.inRange("axial edges", z.length, 2, MAX_AXIAL + 1, "values");
        Require.inRange("cells in all", (double) (r.length - 1) * (z.length - 1), 1, MAX_CELLS, "cells");
        checkEdges("radial edge", r, 0, radius, radius);
        checkEdges("axial edge", z, zCentre - 0.5 * thickness, zCentre + 0.5 * thickness, thickness);
        r[0] = 0;
        r[r.length - 1] = radius;
        z[0] = zCentre - 0.5 * thickness;
        z[z.length - 1] = zCentre + 0.5 * thickness;
        return new CoupledCircuitDisc(radius, thickness, zCentre, sigma, r, z);
    }

    private static void checkEdges(String name, double[] e, double first, double last, double scale) {
        double tol = 1e-12 * scale;
        if (!(Math.abs(e[0] - first) <= tol)) {
            throw new InvalidQuantityException("first " + name, e[0] + " m", first + " m (to " + tol + " m)");
        }
        if (!(Math.abs(e[e.length - 1] - last) <= tol)) {
            throw new InvalidQuantityException("last " + name, e[e.length - 1] + " m", last + " m (to " + tol + " m)");
        }
        for (int i = 1; i < e.length; i++) {
            if (!(e[i] > e[i - 1]) || !Double.isFinite(e[i])) {
                throw new InvalidQuantityException(name + " " + i, e[i] + " m",
                        "finite and greater than the previous edge " + e[i - 1] + " m");
            }
        }
    }

    /**
     * The same disc and cells with another conductivity.
     *
     * @param newSigma σ in S/m, 0 to 1e10
     * @return the new disc; this one is unchanged
     * @throws InvalidQuantityException if σ is out of range
     */
    public CoupledCircuitDisc withConductivity(double newSigma) {
        Require.inRange("disc conductivity", newSigma, 0, 1e10, "S/m");
        return new CoupledCircuitDisc(radius, thickness, zCentre, newSigma, rEdges, zEdges);
    }

    /**
     * The disc between two coaxial coils: assembles the frequency-independent inductances
     * (cell matrix, coil-to-cell couplings, free-space coil coupling) once, for any number of
     * frequencies.
     *
     * @param transmitter the driven coil, not null; no ring inside or on the disc
     * @param receiver    the receiving coil, not null; no ring inside or on the disc, none on a
     *                    transmitter ring
     * @return the coupling, ready for frequencies
     * @throws InvalidQuantityException if a ring lies in the disc or two rings coincide
     */
    public DiscCoupling between(Winding transmitter, Winding receiver) {
        checkOutside("transmitter", Require.nonNull("transmitter", transmitter));
        checkOutside("receiver", Require.nonNull("receiver", receiver));
        return DiscCoupling.assemble(this, transmitter, receiver);
    }

    private void checkOutside(String name, Winding w) {
        double[] r = w.ringRadii();
        double[] z = w.ringZ();
        Section disc = new Section(0, radius, zCentre - 0.5 * thickness, zCentre + 0.5 * thickness);
        for (int i = 0; i < r.length; i++) {
            if (disc.contains(r[i], z[i])) {
                throw new InvalidQuantityException(name + " ring " + i + " position",
                        String.format(Locale.ROOT, "r = %s m, z = %s m", r[i], z[i]),
                        "outside the disc r ≤ " + radius + " m, " + disc.zLow() + " m ≤ z ≤ " + disc.zHigh() + " m");
            }
        }
    }

    /**
     * The number of cells.
     *
     * @return nr·nz
     */
    public int cellCount() {
        return radialCells() * axialCells();
    }

    /**
     * The number of radial cells.
     *
     * @return nr
     */
    public int radialCells() {
        return rEdges.length - 1;
    }

    /**
     * The number of axial cells.
     *
     * @return nz
     */
    public int axialCells() {
        return zEdges.length - 1;
    }

    /**
     * The section of one cell.
     *
     * @param k the cell index i + nr·j, 0 to cellCount() − 1
     * @return the section
     * @throws IndexOutOfBoundsException if there is no such cell
     */
    public Section cell(int k) {
        int nr = radialCells();
        if (k < 0 || k >= cellCount()) {
            throw new IndexOutOfBoundsException("cell " + k + " of " + cellCount());
        }
        int i = k % nr;
        int j = k / nr;
        return new Section(rEdges[i], rEdges[i + 1], zEdges[j], zEdges[j + 1]);
    }

    /**
     * The radial cell edges.
     *
     * @return a copy, from 0 to R in m
     */
    public double[] radialEdges() {
        return rEdges.clone();
    }

    /**
     * The axial cell edges.
     *
     * @return a copy, from z0 − t/2 to z0 + t/2 in m
     */
    public double[] axialEdges() {
        return zEdges.clone();
    }

    /**
     * The disc radius.
     *
     * @return R in m
     */
    public double radius() {
        return radius;
    }

    /**
     * The thickness.
     *
     * @return t in m
     */
    public double thickness() {
        return thickness;
    }

    /**
     * The centre plane.
     *
     * @return z0 in m
     */
    public double zCentre() {
        return zCentre;
    }

    /**
     * The conductivity.
     *
     * @return σ in S/m
     */
    public double conductivity() {
        return sigma;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "disc R %s m, t %s m at z %s m, σ %s S/m, %d×%d cells", radius, thickness,
                zCentre, sigma, radialCells(), axialCells());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CoupledCircuitDisc d && d.radius == radius && d.thickness == thickness
                && d.zCentre == zCentre && d.sigma == sigma && Arrays.equals(d.rEdges, rEdges)
                && Arrays.equals(d.zEdges, zEdges);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(new double[] {radius, thickness, zCentre, sigma}) * 31 * 31
                + Arrays.hashCode(rEdges) * 31 + Arrays.hashCode(zEdges);
    }
}
