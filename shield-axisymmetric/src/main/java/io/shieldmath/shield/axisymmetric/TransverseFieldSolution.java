/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.TransverseField;
import io.shieldmath.shield.internal.Elliptic;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.ShieldingFactor;
import java.util.Locale;

/**
 * The finite-element result for bodies of revolution in a uniform applied field across the
 * axis, at one frequency (0 Hz for a static field). A point (r, z) of the half-plane stands
 * for the ring of all azimuths φ around the axis (φ = 0 along the applied field): the field
 * there is B = (b_r·cos φ, b_φ·sin φ, b_z·cos φ)·B0 in cylindrical components (complex
 * amplitudes at frequency), so its magnitude varies around the ring.
 *
 * <ul>
 *   <li>The shielding factor at a point is B0/|B| at the worst azimuth of its ring,
 *       1/max(√(|b_r|² + |b_z|²), |b_φ|), B0 = µ0·H0 the applied (peak) flux density (in air, where a sensor normally sits, this is
 *       H0/|H|).</li>
 *   <li>The worst factor over the sensor region is the smallest of these over its samples.</li>
 *   <li>The mean factor is B0 over the volume mean of |B|: around each ring the mean of
 *       √(a·cos²φ + b·sin²φ) is (2/π)·√a·E(k), k² = 1 − b/a for a ≥ b, with E the complete
 *       elliptic integral of the second kind (Abramowitz and Stegun, 17.3); across the rings the
 *       weights of {@link AxialFieldSolution}.</li>
 * </ul>
 * As a {@link ShieldingResult} its shielding effectiveness is the worst factor in dB.
 * Immutable and thread-safe.
 */
public final class TransverseFieldSolution implements ShieldingResult {

    private final TransverseFieldShielding evaluation;
    private final double hertz;
    private final TransverseField fine;
    private final TransverseField coarse;
    private final double fineness;
    private final String what;

    TransverseFieldSolution(TransverseFieldShielding evaluation, double hertz, TransverseField fine,
                            TransverseField coarse, double fineness, String what) {
        this.evaluation = evaluation;
        this.hertz = hertz;
        this.fine = fine;
        this.coarse = coarse;
        this.fineness = fineness;
        this.what = what;
    }

    /** |B|/B0 at the worst azimuth of the ring through p (mean = false), or its mean around the ring. */
    private static double magnitude(TransverseField f, Point p, boolean mean) {
        double[] v = new double[6];
        double r = p.radiusMetres();
        double z = p.axialMetres();
        f.evaluate(r, z, v);
        double a = v[0] * v[0] + v[1] * v[1] + v[4] * v[4] + v[5] * v[5];
        double b = v[2] * v[2] + v[3] * v[3];
        double hi = Math.max(a, b);
        double lo = Math.min(a, b);
        double around = 1;
        if (mean && hi > 0) {
            // (2/π)·E(k), k² = 1 − lo/hi: the mean of √(cos²φ + (lo/hi)·sin²φ) over a period.
            double k = Math.sqrt(1 - lo / hi);
            around = k < 1 ? 2 / Math.PI * Elliptic.secondKind(k) : 2 / Math.PI;
        }
        return Math.sqrt(hi) * around;
    }

    private static double factor(double b, Point p, String what) {
        double s = 1 / b;
        if (!(s > 0) || Double.isInfinite(s)) {
            throw new ArithmeticException("the field at " + p + " in " + what + " is " + b
                    + " T per tesla applied; its shielding factor is not finite");
        }
        return s;
    }

    static double worstDb(TransverseField f, SensorRegion sensor, String what) {
        double worst = 0;
        Point at = null;
        for (Point p : sensor.samples()) {
            double b = magnitude(f, p, false);
            if (b >= worst) {
                worst = b;
                at = p;
            }
        }
        return 20 * Math.log10(factor(worst, at, what));
    }

    private static double meanField(TransverseField f, SensorRegion sensor) {
        return Sampling.volumeMean(sensor, p -> magnitude(f, p, true));
    }

    /**
     * The frequency.
     *
     * @return f in Hz, 0 for a static field
     */
    public double hertz() {
        return hertz;
    }

    /**
     * The shielding factor B0/|B| at the worst azimuth of the ring through a point.
     *
     * @param point the point, inside the solved region, not null
     * @return S with its estimate (as a plain number)
     * @throws IllegalArgumentException if the point is outside the far boundary
     * @throws ArithmeticException if the field vanishes at the point (S would be infinite)
     */
    public EstimatedValue shieldingFactorAt(Point point) {
        Require.nonNull("point", point);
        Sampling.checkInside(fine.mesh(), point);
        double f = factor(magnitude(fine, point, false), point, what);
        double c = factor(magnitude(coarse, point, false), point, what);
        return new EstimatedValue(f, Math.abs(f - c));
    }

    /**
     * The smallest shielding factor over the sensor region.
     *
     * @return S
     * @throws ArithmeticException if the computed field at a sensor point is zero or not finite, so that the
     *         shielding factor is not finite (not seen for a valid arrangement)
     */
    public ShieldingFactor worstShieldingFactor() {
        return ShieldingFactor.of(Math.pow(10, worstDb(fine, evaluation.sensor(), what) / 20));
    }

    /**
     * The shielding effectiveness for the common evaluation contract: the worst shielding
     * factor over the sensor region, in dB.
     *
     * @return 20·log10(S_worst) in dB, finite
     * @throws ArithmeticException if the computed field at a sensor point is zero or not finite, so that the
     *         shielding factor is not finite (not seen for a valid arrangement)
     */
    @Override
    public double shieldingEffectivenessDb() {
        return worstDb(fine, evaluation.sensor(), what);
    }

    /**
     * The worst shielding factor as a level with its discretisation estimate.
     *
     * @return 20·log10(S_worst) in dB and its change from the coarser mesh
     * @throws ArithmeticException if the computed field at a sensor point is zero or not finite, so that the
     *         shielding factor is not finite (not seen for a valid arrangement)
     */
    public EstimatedValue worstShieldingDb() {
        double f = worstDb(fine, evaluation.sensor(), what);
        double c = worstDb(coarse, evaluation.sensor(), what);
        return new EstimatedValue(f, Math.abs(f - c));
    }

    /**
     * The mean shielding factor over the sensor region, B0 over the volume mean of |B|.
     *
     * @return S
     * @throws ArithmeticException if the computed field at a sensor point is zero or not finite, so that the
     *         shielding factor is not finite (not seen for a valid arrangement)
     */
    public ShieldingFactor meanShieldingFactor() {
        return ShieldingFactor.of(factor(meanField(fine, evaluation.sensor()), Point.ORIGIN, what));
    }

    /**
     * The mean shielding factor as a level with its discretisation estimate.
     *
     * @return 20·log10(S_mean) in dB and its change from the coarser mesh
     */
    public EstimatedValue meanShieldingDb() {
        double f = -20 * Math.log10(meanField(fine, evaluation.sensor()));
        double c = -20 * Math.log10(meanField(coarse, evaluation.sensor()));
        return new EstimatedValue(f, Math.abs(f - c));
    }

    /**
     * The direction of applied field that the sensor region is worse shielded against: the
     * one with the smaller worst shielding factor (axial on a tie). A field at an angle θ to
     * the axis is the sum of cos θ times the axial case and sin θ times this one.
     *
     * @param axial the axial result for the same arrangement, sensor region and frequency, not null
     * @return {@link FieldDirection#TRANSVERSE} if this result's worst factor is the smaller
     * @throws IllegalArgumentException if the axial result is for another arrangement, sensor
     *                                  region or frequency
     */
    public FieldDirection worstDirection(AxialFieldSolution axial) {
        Require.nonNull("axial result", axial);
        AxialFieldShielding other = axial.evaluation();
        if (!other.arrangement().equals(evaluation.arrangement()) || !other.sensor().equals(evaluation.sensor())
                || Double.compare(axial.hertz(), hertz) != 0) {
            throw new IllegalArgumentException("the axial result (" + other + " at " + axial.hertz()
                    + " Hz) is not for the same arrangement, sensor region and frequency as " + what + " at " + hertz
                    + " Hz");
        }
        return shieldingEffectivenessDb() < axial.shieldingEffectivenessDb() ? FieldDirection.TRANSVERSE
                : FieldDirection.AXIAL;
    }

    /**
     * The unknowns of the finer mesh.
     *
     * @return the count
     */
    public int unknowns() {
        return fine.mesh().unknowns();
    }

    /**
     * The mesh fineness q of the finer mesh.
     *
     * @return q
     */
    public double fineness() {
        return fineness;
    }

    /**
     * The relative residual of the finer mesh's solve after iterative refinement.
     *
     * @return ‖f − S·x‖/‖f‖
     */
    public double relativeResidual() {
        return fine.residualAfterRefinement();
    }

    @Override
    public String toString() {
        EstimatedValue w = worstShieldingDb();
        return String.format(Locale.ROOT, "%.6g Hz: worst transverse shielding %.4f dB ± %.2g dB over the %s, %d unknowns",
                hertz, w.value(), w.estimate(), evaluation.sensor(), unknowns());
    }
}
