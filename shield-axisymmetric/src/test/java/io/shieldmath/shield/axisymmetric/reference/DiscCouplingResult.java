/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.internal.Require;
import java.util.Locale;
import org.apache.commons.math3.complex.Complex;

/**
 * The coupled-circuit solution at one frequency: the cell currents per ampere of drive,
 * the receiver's shielded mutual inductance, the insertion loss, the eddy-current loss and
 * the change of the transmitter's impedance.
 *
 * <p>Conventions: time dependence e^{jωt}; currents are peak phasors (so a power is
 * ½·|i|²·R); the drive current I is real. M_shielded = M0 + Σ_k n_k·i_k/I is complex (the eddy
 * currents lag); the insertion loss is 20·log10|M0/M_shielded| (0 dB without the disc).
 *
 * <p>Immutable and thread-safe.
 */
public final class DiscCouplingResult {

    private final double hz;
    private final double freeSpace;
    private final double[] re;
    private final double[] im;
    private final double[] resistance;
    private final double shieldedRe;
    private final double shieldedIm;
    private final double lossPerAmpSquared;
    private final double deltaR;
    private final double deltaX;

    DiscCouplingResult(double hz, double freeSpace, double[] re, double[] im, double[] resistance, double[] tx,
                       double[] rx) {
        this.hz = hz;
        this.freeSpace = freeSpace;
        this.re = re;
        this.im = im;
        this.resistance = resistance;
        double w = 2 * Math.PI * hz;
        double mr = freeSpace;
        double mi = 0;
        double loss = 0;
        double sx = 0;
        double sy = 0;
        for (int k = 0; k < re.length; k++) {
            mr += rx[k] * re[k];
            mi += rx[k] * im[k];
            loss += 0.5 * resistance[k] * (re[k] * re[k] + im[k] * im[k]);
            sx += tx[k] * re[k];
            sy += tx[k] * im[k];
        }
        this.shieldedRe = mr;
        this.shieldedIm = mi;
        this.lossPerAmpSquared = loss;
        // ΔZ = jω·Σ m_k·(x_k + j·y_k) = −ω·Σ m_k·y_k + j·ω·Σ m_k·x_k
        this.deltaR = -w * sy;
        this.deltaX = w * sx;
        if (!(Double.isFinite(mr) && Double.isFinite(mi) && Double.isFinite(loss) && Double.isFinite(deltaR)
                && Double.isFinite(deltaX))) {
            throw new IllegalStateException("the coupled-circuit result is not finite at " + hz + " Hz");
        }
    }

    /**
     * The frequency.
     *
     * @return f in Hz
     */
    public double frequencyHertz() {
        return hz;
    }

    /**
     * The coils' mutual inductance without the disc.
     *
     * @return M0 in henries
     */
    public double freeSpaceMutualInductance() {
        return freeSpace;
    }

    /**
     * The real part of the shielded mutual inductance.
     *
     * @return Re M_shielded in henries
     */
    public double shieldedMutualInductanceRe() {
        return shieldedRe;
    }

    /**
     * The imaginary part of the shielded mutual inductance (negative: the eddy currents lag).
     *
     * @return Im M_shielded in henries
     */
    public double shieldedMutualInductanceIm() {
        return shieldedIm;
    }

    /**
     * The shielded mutual inductance as a Commons Math complex number.
     *
     * @return M_shielded in henries
     */
    public Complex shieldedMutualInductance() {
        return new Complex(shieldedRe, shieldedIm);
    }

    /**
     * The insertion loss 20·log10|M0/M_shielded|.
     *
     * @return the insertion loss in dB
     * @throws IllegalStateException if the shielded coupling is exactly zero (the loss would be infinite)
     */
    public double shieldingEffectivenessDb() {
        double mag = Math.hypot(shieldedRe, shieldedIm);
        if (mag == 0) {
            throw new IllegalStateException("the shielded mutual inductance is 0 H: the insertion loss is infinite");
        }
        return 20 * Math.log10(freeSpace / mag);
    }

    /**
     * The time-averaged eddy-current loss in the disc, Σ ½·|i_k|²·R_k.
     *
     * @param peakAmps the drive current's peak amplitude in A, 0 to 1e6
     * @return the loss in W
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the current is out of range
     */
    public double eddyLossWatts(double peakAmps) {
        Require.inRange("drive current (peak)", peakAmps, 0, 1e6, "A");
        return lossPerAmpSquared * peakAmps * peakAmps;
    }

    /**
     * The increase of the transmitter's input resistance caused by the disc, Re ΔZ.
     *
     * @return ΔR in ohms
     */
    public double driveResistanceChangeOhms() {
        return deltaR;
    }

    /**
     * The change of the transmitter's input reactance caused by the disc, Im ΔZ (negative: the
     * eddy currents expel flux).
     *
     * @return ΔX in ohms
     */
    public double driveReactanceChangeOhms() {
        return deltaX;
    }

    /**
     * The number of cells.
     *
     * @return n
     */
    public int cellCount() {
        return re.length;
    }

    /**
     * One cell's current per ampere of drive.
     *
     * @param k the cell index i + nr·j
     * @return i_k/I, dimensionless
     * @throws IndexOutOfBoundsException if there is no such cell
     */
    public Complex cellCurrentPerAmpere(int k) {
        return new Complex(re[k], im[k]);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s Hz: M0 %.6e H, M %.6e %+.6ej H, IL %.4f dB", hz, freeSpace,
                shieldedRe, shieldedIm, Math.hypot(shieldedRe, shieldedIm) == 0 ? Double.NaN : shieldingEffectivenessDb());
    }
}
