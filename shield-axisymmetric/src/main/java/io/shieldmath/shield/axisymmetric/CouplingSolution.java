/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingResult;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The finite-element result for a coil pair with bodies at one frequency, each number with
 * its discretisation estimate (the change from the previous, coarser mesh).
 *
 * <p>Conventions: phasors e^{jωt}; per ampere of transmitter current unless a
 * {@link DriveCurrent} is given; a {@code DriveCurrent} is taken at its peak amplitude and
 * losses are time averages, P = ½·I_pk²·R (so an RMS current gives the same watts as
 * I_rms²·R). The mutual inductance M is complex (the bodies' eddy currents shift its phase)
 * and the mutual impedance is jωM. As a {@link ShieldingResult} its shielding effectiveness is
 * the insertion loss. Immutable and thread-safe.
 */
public final class CouplingSolution implements ShieldingResult {

    private final CoilCoupling evaluation;
    private final CoilSnapshot fine;
    private final CoilSnapshot coarse;
    private final double fineness;
    private final String what;

    CouplingSolution(CoilCoupling evaluation, CoilSnapshot fine, CoilSnapshot coarse, double fineness, String what) {
        this.evaluation = evaluation;
        this.fine = fine;
        this.coarse = coarse;
        this.fineness = fineness;
        this.what = what;
    }

    /**
     * The frequency.
     *
     * @return f in Hz, 0 for the magnetostatic case
     */
    public double hertz() {
        return fine.hertz;
    }

    /**
     * The insertion loss 20·log10|M0/M|, M0 the coupling with every body set to air on the
     * same mesh.
     *
     * @return the loss in dB (negative if the bodies raise the coupling, as a permeable
     *         plate can)
     */
    public Decibels insertionLoss() {
        return Decibels.of(insertionLossDb());
    }

    /**
     * The insertion loss as a number.
     *
     * @return the loss in dB, finite
     */
    public double insertionLossDb() {
        return fine.insertionLossDb(what);
    }

    /**
     * The insertion loss with its discretisation estimate.
     *
     * @return the loss and its change from the coarser mesh, in dB
     */
    public EstimatedValue insertionLossEstimated() {
        return new EstimatedValue(insertionLossDb(), insertionLossEstimateDb());
    }

    /**
     * The discretisation estimate of the insertion loss.
     *
     * @return |IL(fine) − IL(coarse)| in dB
     */
    public double insertionLossEstimateDb() {
        return Math.abs(fine.insertionLossDb(what) - coarse.insertionLossDb(what));
    }

    /**
     * The shielding effectiveness in dB: the insertion loss, for the common evaluation contract.
     *
     * @return the loss in dB, finite
     */
    @Override
    public double shieldingEffectivenessDb() {
        return insertionLossDb();
    }

    /**
     * The complex mutual inductance with the bodies, transmitter driven, receiver read.
     *
     * @return M in H
     */
    public ComplexValue mutualInductance() {
        return new ComplexValue(fine.mRe, fine.mIm);
    }

    /**
     * The mutual inductance the other way round on the same mesh: receiver driven,
     * transmitter read. By reciprocity it equals {@link #mutualInductance()}; on one mesh the
     * discrete system is symmetric, so the two agree to rounding.
     *
     * @return M in H
     */
    public ComplexValue reverseMutualInductance() {
        return new ComplexValue(fine.revRe, fine.revIm);
    }

    /**
     * The mutual inductance with the bodies set to air, on the same mesh.
     *
     * @return M0 in H (real)
     */
    public double freeSpaceMutualInductanceHenries() {
        return fine.m0;
    }

    /**
     * The complex mutual impedance jωM: the open-circuit receiver voltage per ampere.
     *
     * @return Z in Ω (zero at 0 Hz)
     */
    public ComplexValue mutualImpedance() {
        double w = 2 * Math.PI * fine.hertz;
        return new ComplexValue(-w * fine.mIm, w * fine.mRe);
    }

    /**
     * The relative discretisation estimate of the mutual impedance.
     *
     * @return |M(fine) − M(coarse)|/|M(fine)|
     */
    public double mutualImpedanceRelativeEstimate() {
        return Math.hypot(fine.mRe - coarse.mRe, fine.mIm - coarse.mIm) / Math.hypot(fine.mRe, fine.mIm);
    }

    /**
     * The transmitter's input impedance jω·L, L its complex self-inductance with the bodies
     * (wire resistance not included).
     *
     * @return Z in Ω
     */
    public ComplexValue transmitterImpedance() {
        double w = 2 * Math.PI * fine.hertz;
        return new ComplexValue(-w * fine.selfIm, w * fine.selfRe);
    }

    /**
     * The rise of the transmitter's input resistance that the bodies cause, ΔR = −ω·Im L
     * (air has no loss, so the reference is 0 Ω on the same mesh). It contains the eddy loss
     * of every body and any magnetic loss (µ'' &gt; 0): ½·I²·ΔR is the power the bodies draw.
     *
     * @return ΔR in Ω with its estimate
     */
    public EstimatedValue inputResistanceChange() {
        double w = 2 * Math.PI * fine.hertz;
        double f = -w * fine.selfIm;
        double c = -w * coarse.selfIm;
        return new EstimatedValue(f, Math.abs(f - c));
    }

    /**
     * The time-averaged eddy-current loss in one body, P = ½∫|J|²/σ dV with J = −jωσA
     * (J and A peak phasors), at a drive current.
     *
     * @param bodyName the body's name, not null
     * @param current  the transmitter current, at this solution's frequency, not null
     * @return P in W with its estimate
     * @throws IllegalArgumentException if no body has that name or the current's frequency differs
     */
    public EstimatedValue eddyLoss(String bodyName, DriveCurrent current) {
        int k = evaluation.bodyIndex(Require.nonNull("body name", bodyName));
        double i2 = square(current);
        double f = i2 * fine.field.jouleLoss(k + 1);
        double c = i2 * coarse.field.jouleLoss(k + 1);
        return new EstimatedValue(f, Math.abs(f - c));
    }

    /**
     * The eddy-current loss of every body at a drive current, in the arrangement's order.
     *
     * @param current the transmitter current, at this solution's frequency, not null
     * @return body name to P in W with its estimate, an unmodifiable map
     * @throws IllegalArgumentException if the current's frequency differs
     */
    public Map<String, EstimatedValue> eddyLosses(DriveCurrent current) {
        Map<String, EstimatedValue> m = new LinkedHashMap<>();
        List<Body> bodies = evaluation.arrangement().bodies();
        for (Body b : bodies) {
            m.put(b.name(), eddyLoss(b.name(), current));
        }
        return java.util.Collections.unmodifiableMap(m);
    }

    private double square(DriveCurrent current) {
        Require.nonNull("drive current", current);
        double hz = current.frequency().toHertz();
        if (Math.abs(hz - fine.hertz) > 1e-9 * Math.max(hz, fine.hertz)) {
            throw new IllegalArgumentException("the drive current is at " + current.frequency() + " but this solution is at "
                    + fine.hertz + " Hz");
        }
        double i = current.amperes(AmplitudeMeasure.PEAK);
        return i * i;
    }

    /**
     * The flux density at a point for 1 A peak in the transmitter (for the static case too).
     *
     * @param point the point, inside the solved region, not null
     * @return B in T per ampere, with its estimate
     * @throws IllegalArgumentException if the point is outside the far boundary
     */
    public FluxDensitySample fluxDensityPerAmpere(Point point) {
        return Sampling.sample(fine.field, coarse.field, Require.nonNull("point", point), 1);
    }

    /**
     * The flux density at a point at a drive current.
     *
     * @param point   the point, inside the solved region, not null
     * @param current the transmitter current, at this solution's frequency, not null
     * @return B in T (peak phasors, phase relative to the current), with its estimate
     * @throws IllegalArgumentException if the point is outside the far boundary or the frequency differs
     */
    public FluxDensitySample fluxDensityAt(Point point, DriveCurrent current) {
        return Sampling.sample(fine.field, coarse.field, Require.nonNull("point", point), Math.sqrt(square(current)));
    }

    /**
     * Field samples on a grid for plotting, at a drive current.
     *
     * @param from    one corner of the (r, z) rectangle, not null
     * @param to      the opposite corner, not null
     * @param columns the points along r, 2 to 2000
     * @param rows    the points along z, 2 to 2000
     * @param current the transmitter current, at this solution's frequency, not null
     * @return the map
     * @throws IllegalArgumentException if a corner is outside the far boundary, the corners do
     *                                  not span a rectangle, or the frequency differs
     */
    public FieldMap fieldMap(Point from, Point to, int columns, int rows, DriveCurrent current) {
        return Sampling.map(fine.field, from, to, columns, rows, Math.sqrt(square(current)));
    }

    /**
     * The unknowns of the finer mesh.
     *
     * @return the count
     */
    public int unknowns() {
        return fine.unknowns;
    }

    /**
     * The half-bandwidth of the finer mesh's matrix.
     *
     * @return b
     */
    public int bandwidth() {
        return fine.bandwidth;
    }

    /**
     * The mesh fineness q of the finer mesh (1 by default; higher after refinement).
     *
     * @return q
     */
    public double fineness() {
        return fineness;
    }

    /**
     * The relative residual ‖f − S·x‖/‖f‖ of the finer mesh's solves after iterative refinement.
     *
     * @return the residual
     */
    public double relativeResidual() {
        return fine.residual;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.6g Hz: insertion loss %.4f dB ± %.2g dB, M %s H, %d unknowns", fine.hertz,
                insertionLossDb(), insertionLossEstimateDb(), mutualInductance(), fine.unknowns);
    }
}
