/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.internal.Require;

/**
 * A coupled-circuit disc between a transmitting and a receiving coil, with its
 * frequency-independent parts assembled: the cells' inductance matrix L (symmetric; the upper
 * triangle is computed and mirrored), the geometric resistance factors 2π·r̄/(Δr·Δz), the
 * transmitter-to-cell and receiver-to-cell mutual inductances m and n, and the free-space
 * coupling M0 = Maxwell's M summed over the coils' rings.
 *
 * <p>At angular frequency ω, with drive current I in the transmitter (peak phasor, e^{jωt}),
 * the cell currents solve (R + jωL)·i = −jω·m·I (Kirchhoff's voltage law around each cell, no
 * source but the induced e.m.f.), the receiver links M_shielded·I = M0·I + nᵀ·i, and the
 * transmitter's impedance changes by ΔZ = jω·mᵀ·i/I. The complex system (per ampere, divided by
 * its largest diagonal modulus) is solved by Gaussian elimination with partial pivoting
 * ({@link ComplexLu}, checked against Commons Math's real LU of the equivalent system
 * [[R, −ωL], [ωL, R]]·[x; y] = [0; −ω·m] in {@code ComplexLuTest}).
 *
 * <p>Immutable and thread-safe (the arrays are never exposed, only copies).
 */
public final class DiscCoupling {

    /** The lowest frequency evaluated, in Hz. */
    public static final double MIN_HERTZ = 1e-3;
    /** The highest frequency evaluated, in Hz (quasi-static: the coils must stay small against the wavelength). */
    public static final double MAX_HERTZ = 1e8;

    private final CoupledCircuitDisc disc;
    private final Winding transmitter;
    private final Winding receiver;
    private final Section[] cells;
    private final double[][] inductance;
    private final double[] resistanceFactor;
    private final double[] txCoupling;
    private final double[] rxCoupling;
    private final double freeSpace;

    private DiscCoupling(CoupledCircuitDisc disc, Winding transmitter, Winding receiver, Section[] cells,
                         double[][] inductance, double[] resistanceFactor, double[] txCoupling, double[] rxCoupling,
                         double freeSpace) {
        this.disc = disc;
        this.transmitter = transmitter;
        this.receiver = receiver;
        this.cells = cells;
        this.inductance = inductance;
        this.resistanceFactor = resistanceFactor;
        this.txCoupling = txCoupling;
        this.rxCoupling = rxCoupling;
        this.freeSpace = freeSpace;
    }

    static DiscCoupling assemble(CoupledCircuitDisc disc, Winding tx, Winding rx) {
        int n = disc.cellCount();
        Section[] cells = new Section[n];
        for (int k = 0; k < n; k++) {
            cells[k] = disc.cell(k);
        }
        double[][] l = new double[n][n];
        for (int k = 0; k < n; k++) {
            for (int q = k; q < n; q++) {
                double m = SectionInductance.mutual(cells[k], cells[q]);
                l[k][q] = m;
                l[q][k] = m;
            }
        }
        double[] g = new double[n];
        double[] m = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            Section c = cells[k];
            g[k] = 2 * Math.PI * c.meanRadius() / (c.width() * c.height());
            m[k] = tx.mutualInductance(c);
            v[k] = rx.mutualInductance(c);
        }
        return new DiscCoupling(disc, tx, rx, cells, l, g, m, v, tx.mutualInductance(rx));
    }

    /**
     * The same disc and coils with another conductivity, reusing the assembled inductances.
     *
     * @param sigma σ in S/m, 0 to 1e10
     * @return the new coupling; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if σ is out of range
     */
    public DiscCoupling withConductivity(double sigma) {
        return new DiscCoupling(disc.withConductivity(sigma), transmitter, receiver, cells, inductance,
                resistanceFactor, txCoupling, rxCoupling, freeSpace);
    }

    /**
     * The same disc with transmitter and receiver exchanged (no reassembly of the cell matrix).
     *
     * @return the swapped coupling; this one is unchanged
     */
    public DiscCoupling swapped() {
        return new DiscCoupling(disc, receiver, transmitter, cells, inductance, resistanceFactor, rxCoupling,
                txCoupling, receiver.mutualInductance(transmitter));
    }

    /**
     * The result at one frequency.
     *
     * @param hz the frequency in Hz, {@value #MIN_HERTZ} to {@value #MAX_HERTZ}
     * @return the result
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     * @throws IllegalStateException if the solve fails (a singular or non-finite system)
     */
    public DiscCouplingResult at(double hz) {
        Require.inRange("frequency", hz, MIN_HERTZ, MAX_HERTZ, "Hz");
        int n = cells.length;
        double sigma = disc.conductivity();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] r = new double[n];
        if (sigma > 0) {
            double w = 2 * Math.PI * hz;
            double scale = 0;
            for (int k = 0; k < n; k++) {
                r[k] = resistanceFactor[k] / sigma;
                scale = Math.max(scale, r[k] + w * inductance[k][k]);
            }
            double[] ar = new double[n * n];
            double[] ai = new double[n * n];
            double[] br = new double[n];
            double[] bi = new double[n];
            for (int k = 0; k < n; k++) {
                for (int q = 0; q < n; q++) {
                    ai[k * n + q] = w * inductance[k][q] / scale;
                }
                ar[k * n + k] = r[k] / scale;
                bi[k] = -w * txCoupling[k] / scale;
            }
            if (!ComplexLu.solve(ar, ai, br, bi)) {
                throw new IllegalStateException("the cell equations are singular at " + hz + " Hz for " + disc);
            }
            for (int k = 0; k < n; k++) {
                x[k] = br[k];
                y[k] = bi[k];
                if (!Double.isFinite(x[k]) || !Double.isFinite(y[k])) {
                    throw new IllegalStateException("the cell currents are not finite at " + hz + " Hz for " + disc);
                }
            }
        }
        return new DiscCouplingResult(hz, freeSpace, x, y, r, txCoupling, rxCoupling);
    }

    /**
     * The free-space mutual inductance of the coils (the disc absent): Maxwell's M over their rings.
     *
     * @return M0 in henries
     */
    public double freeSpaceMutualInductance() {
        return freeSpace;
    }

    /**
     * The disc.
     *
     * @return the disc with its cells and conductivity
     */
    public CoupledCircuitDisc disc() {
        return disc;
    }

    /**
     * The driven coil.
     *
     * @return the transmitter
     */
    public Winding transmitter() {
        return transmitter;
    }

    /**
     * The receiving coil.
     *
     * @return the receiver
     */
    public Winding receiver() {
        return receiver;
    }

    /**
     * The cells' inductance matrix.
     *
     * @return a copy, n × n in henries, symmetric
     */
    public double[][] cellInductances() {
        double[][] c = new double[inductance.length][];
        for (int k = 0; k < c.length; k++) {
            c[k] = inductance[k].clone();
        }
        return c;
    }

    /**
     * The cells' resistances at the disc's conductivity, 2π·r̄/(σ·Δr·Δz).
     *
     * @return a new array in ohms
     * @throws IllegalStateException if σ = 0 (the resistances are infinite)
     */
    public double[] cellResistances() {
        double sigma = disc.conductivity();
        if (sigma == 0) {
            throw new IllegalStateException("a disc of conductivity 0 S/m has infinite cell resistances");
        }
        double[] r = new double[resistanceFactor.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = resistanceFactor[k] / sigma;
        }
        return r;
    }

    /**
     * The transmitter-to-cell mutual inductances m_k.
     *
     * @return a copy in henries
     */
    public double[] transmitterCouplings() {
        return txCoupling.clone();
    }

    /**
     * The receiver-to-cell mutual inductances n_k.
     *
     * @return a copy in henries
     */
    public double[] receiverCouplings() {
        return rxCoupling.clone();
    }

    @Override
    public String toString() {
        return disc + " between " + transmitter + " and " + receiver;
    }
}
