/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.ShieldingFactor;
import java.util.Locale;

/**
 * The finite-element result for bodies in a uniform applied axial field at one frequency.
 * The shielding factor at a point is S = B0/|B| with B0 the applied (peak) flux density; over
 * the sensor region the worst factor is the smallest S among its sample points, and the
 * mean factor is B0 over the volume mean of |B| (samples weighted by the ring area 2πr·Δr
 * and the trapezoid rule along z). Field values are per tesla of applied field unless an
 * applied field is given. As a {@link ShieldingResult} its shielding effectiveness is the
 * worst factor in dB. Immutable and thread-safe.
 */
public final class AxialFieldSolution implements ShieldingResult {

    private final AxialFieldShielding evaluation;
    private final double hertz;
    private final Field fine;
    private final Field coarse;
    private final double fineness;
    private final String what;

    AxialFieldSolution(AxialFieldShielding evaluation, double hertz, Field fine, Field coarse, double fineness,
                       String what) {
        this.evaluation = evaluation;
        this.hertz = hertz;
        this.fine = fine;
        this.coarse = coarse;
        this.fineness = fineness;
        this.what = what;
    }

    private static double magnitude(Field f, Point p) {
        double[] v = new double[6];
        f.evaluate(p.radiusMetres(), p.axialMetres(), v);
        return Math.hypot(Math.hypot(v[2], v[3]), Math.hypot(v[4], v[5]));
    }

    private static double factor(double b, Point p, String what) {
        double s = 1 / b;
        if (!(s > 0) || Double.isInfinite(s)) {
            throw new ArithmeticException("the field at " + p + " in " + what + " is " + b
                    + " T per tesla applied; its shielding factor is not finite");
        }
        return s;
    }

    static double worstDb(Field f, SensorRegion sensor, String what) {
        double worst = 0;
        Point at = null;
        for (Point p : sensor.samples()) {
            double b = magnitude(f, p);
            if (b >= worst) {
                worst = b;
                at = p;
            }
        }
        return 20 * Math.log10(factor(worst, at, what));
    }

    private static double meanField(Field f, SensorRegion sensor) {
        return Sampling.volumeMean(sensor, p -> magnitude(f, p));
    }

    /** The evaluation this result came from. */
    AxialFieldShielding evaluation() {
        return evaluation;
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
     * The shielding factor B0/|B| at a point.
     *
     * @param point the point, inside the solved region, not null
     * @return S with its estimate (as a plain number)
     * @throws IllegalArgumentException if the point is outside the far boundary
     * @throws ArithmeticException if the field vanishes at the point (S would be infinite)
     */
    public EstimatedValue shieldingFactorAt(Point point) {
        Require.nonNull("point", point);
        Sampling.checkInside(fine, point);
        double f = factor(magnitude(fine, point), point, what);
        double c = factor(magnitude(coarse, point), point, what);
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
     * The flux density at a point for an applied field.
     *
     * @param point   the point, inside the solved region, not null
     * @param applied the applied peak flux density B0, not null
     * @return B in T (peak phasors, phase relative to the applied field), with its estimate
     * @throws IllegalArgumentException if the point is outside the far boundary
     */
    public FluxDensitySample fluxDensityAt(Point point, MagneticFluxDensity applied) {
        double b0 = Require.nonNull("applied flux density", applied).toTesla();
        return Sampling.sample(fine, coarse, Require.nonNull("point", point), b0);
    }

    /**
     * Field samples on a grid for plotting, for an applied field.
     *
     * @param from    one corner of the (r, z) rectangle, not null
     * @param to      the opposite corner, not null
     * @param columns the points along r, 2 to 2000
     * @param rows    the points along z, 2 to 2000
     * @param applied the applied peak flux density B0, not null
     * @return the map
     * @throws IllegalArgumentException if a corner is outside the far boundary or the corners
     *                                  do not span a rectangle
     */
    public FieldMap fieldMap(Point from, Point to, int columns, int rows, MagneticFluxDensity applied) {
        return Sampling.map(fine, from, to, columns, rows, Require.nonNull("applied flux density", applied).toTesla());
    }

    /**
     * The time-averaged eddy-current loss in one body for an applied alternating field,
     * P = ½∫|J|²/σ dV (peak phasors).
     *
     * @param bodyName the body's name, not null
     * @param applied  the applied peak flux density B0, not null
     * @return P in W with its estimate
     * @throws IllegalArgumentException if no body has that name
     */
    public EstimatedValue eddyLoss(String bodyName, MagneticFluxDensity applied) {
        int k = evaluation.bodyIndex(Require.nonNull("body name", bodyName));
        double b0 = Require.nonNull("applied flux density", applied).toTesla();
        double f = b0 * b0 * fine.jouleLoss(k + 1);
        double c = b0 * b0 * coarse.jouleLoss(k + 1);
        return new EstimatedValue(f, Math.abs(f - c));
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
        return String.format(Locale.ROOT, "%.6g Hz: worst shielding %.4f dB ± %.2g dB over the %s, %d unknowns", hertz,
                w.value(), w.estimate(), evaluation.sensor(), unknowns());
    }
}
