/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.axisymmetric.numerics.SaturableSolve;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.ArrayList;
import java.util.List;

/**
 * Bodies in a uniform applied axial field with their walls allowed to saturate: each body
 * given a magnetization curve follows it instead of a constant permeability, and the field
 * is solved to self-consistency. The question it answers: how much applied field can this
 * can take before its wall saturates and its shielding falls?
 *
 * <pre>{@code
 * MagnetizationCurve mu = MagnetizationCurves.builtIn().get("nickel-iron-80");
 * SaturationStudy study = SaturationStudy.of(Arrangement.of(Body.can("can", mumetal, mm(20), mm(1), mm(60)))
 *         .inUniformAxialField().sensing(SensorRegion.cylinder(mm(5), mm(10))))
 *         .withCurve("can", mu);
 * SaturationSolution s = study.magnetostatic(MagneticFieldStrength.ofAmperesPerMetre(400));
 * s.peakFluxDensity("can");              // the largest |B| in the wall
 * study.sweep(amperesPerMetre(1), amperesPerMetre(10_000), 13).onset();  // the body and the field at which it saturates
 * }</pre>
 *
 * <p>Method: static fields by Newton's method on the convex
 * magnetic energy with a line search (Silvester &amp; Chari 1970), converged to a relative
 * nodal update of {@value #NEWTON_TOLERANCE}; alternating fields by the effective-permeability
 * (first-harmonic) approximation, the secant permeability at each point's peak flux density
 * iterated until the relative nodal change between two iterations is below
 * {@value #FIXED_POINT_TOLERANCE}. Its limits: the harmonics
 * a saturating wall generates and the hysteresis loop are not represented, so past the knee
 * the alternating result is an estimate of the fundamental only. Both solves run on two
 * meshes (fineness q/√2 and q), and the change between them is the discretisation estimate
 * given beside the shielding factor. A body's flux density is "near saturation" above
 * {@value #THRESHOLD} of its curve's saturation flux density.
 *
 * <p>Cautions: saturation curves depend on the anneal, the mechanical stress and the
 * temperature; the built-in curves are typical estimates, and a design that matters needs the
 * measured curve of the actual material after its last heat treatment. Degaussing and
 * annealing follow the supplier's instructions. Strong fields near transformers and mains
 * equipment come with hazardous voltages and currents and exposure limits (ICNIRP, IEEE
 * C95.1); such work defers to local codes and qualified practice.
 *
 * <p>Immutable and thread-safe; every option returns a new study.
 */
public final class SaturationStudy {

    /** The fraction of the saturation flux density from which a wall counts as near saturation. */
    public static final double THRESHOLD = 0.8;
    /** The relative nodal update at which the Newton iteration stops. */
    public static final double NEWTON_TOLERANCE = 1e-9;
    /** The relative nodal change between two iterations at which the fixed-point iteration stops. */
    public static final double FIXED_POINT_TOLERANCE = 1e-5;
    /** The most Newton steps of one static solve. */
    public static final int MAX_NEWTON_STEPS = 60;
    /** The most fixed-point iterations of one alternating-field solve. */
    public static final int MAX_FIXED_POINT_STEPS = 200;

    private final AxialFieldShielding evaluation;
    private final MagnetizationCurve[] curves;
    private final double fineness;
    private final Scene scene;

    private SaturationStudy(AxialFieldShielding evaluation, MagnetizationCurve[] curves, double fineness) {
        this.evaluation = evaluation;
        this.curves = curves;
        this.fineness = fineness;
        this.scene = Scene.of(evaluation.arrangement(), new double[0][], new String[0], evaluation.sensor());
    }

    /**
     * A study of an axial-field evaluation, with no curve yet (every body linear).
     *
     * @param evaluation the bodies, the field and the sensor region, not null
     * @return the study
     */
    public static SaturationStudy of(AxialFieldShielding evaluation) {
        Require.nonNull("axial-field evaluation", evaluation);
        return new SaturationStudy(evaluation, new MagnetizationCurve[evaluation.arrangement().bodies().size() + 1],
                1);
    }

    /**
     * This study with one body following a magnetization curve. The body's permeability model
     * still sets the mesh grading and, at frequency, the frequency dependence (see the class
     * description).
     *
     * @param bodyName the body's name, not null
     * @param curve    its magnetization curve, not null
     * @return the new study; this one is unchanged
     * @throws IllegalArgumentException if no body has that name
     */
    public SaturationStudy withCurve(String bodyName, MagnetizationCurve curve) {
        int k = evaluation.bodyIndex(Require.nonNull("body name", bodyName));
        MagnetizationCurve[] c = curves.clone();
        c[k + 1] = Require.nonNull("magnetization curve", curve);
        return new SaturationStudy(evaluation, c, fineness);
    }

    /**
     * This study on a finer or coarser mesh (see {@link CoilCoupling#withFineness(double)}).
     *
     * @param q the fineness, 0.25 to 16
     * @return the new study; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if q is out of range
     */
    public SaturationStudy withFineness(double q) {
        Require.inRange("mesh fineness", q, 0.25, 16, "(plain number)");
        return new SaturationStudy(evaluation, curves, q);
    }

    /**
     * The evaluation studied.
     *
     * @return the axial-field evaluation
     */
    public AxialFieldShielding evaluation() {
        return evaluation;
    }

    private void requireCurve() {
        for (MagnetizationCurve c : curves) {
            if (c != null) {
                return;
            }
        }
        throw new IllegalStateException("no body of " + evaluation.arrangement()
                + " has a magnetization curve; give one with withCurve(body, curve)");
    }

    private static double appliedTesla(MagneticFieldStrength applied) {
        double h = Require.inRange("applied field strength", Require.nonNull("applied field strength", applied)
                .toAmperesPerMetre(), 1e-6, 1e7, "A/m");
        return PhysicalConstants.MU_0 * h;
    }

    /**
     * The static solution in an applied field.
     *
     * @param applied the applied field strength H0 far from the bodies, 1e-6 A/m to 1e7 A/m, not null
     * @return the solution
     * @throws IllegalStateException if no body has a curve
     * @throws ArithmeticException   if the iteration does not converge (the body, field and last update are named)
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     */
    public SaturationSolution magnetostatic(MagneticFieldStrength applied) {
        return solve(0, applied);
    }

    /**
     * The alternating-field solution (effective permeability, first harmonic) in an applied
     * peak field.
     *
     * @param frequency the frequency, greater than 0 and up to the quasi-static limit, not null
     * @param applied   the applied peak field strength H0, 1e-6 A/m to 1e7 A/m, not null
     * @return the solution
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     * @throws IllegalStateException if no body has a curve
     * @throws ArithmeticException   if the iteration does not converge
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     */
    public SaturationSolution at(Frequency frequency, MagneticFieldStrength applied) {
        double hz = scene.checkHertz("frequency", Require.nonNull("frequency", frequency).toHertz());
        Require.positive("frequency", hz, "Hz");
        return solve(hz, applied);
    }

    /**
     * Static solutions over a geometric series of applied fields: the shielding factor is
     * flat at low fields and falls where a wall saturates.
     *
     * @param from   the lowest applied field strength, not null
     * @param to     the highest, above {@code from}, not null
     * @param points the number of fields, 2 to 200
     * @return the sweep
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a field or the count is out of range
     * @throws IllegalArgumentException if {@code to} is not above {@code from}
     */
    public SaturationSweep sweep(MagneticFieldStrength from, MagneticFieldStrength to, int points) {
        double lo = appliedTesla(from) / PhysicalConstants.MU_0;
        double hi = appliedTesla(to) / PhysicalConstants.MU_0;
        Require.inRange("sweep points", points, 2, 200, "(count)");
        if (!(hi > lo)) {
            throw new IllegalArgumentException("the sweep must rise: " + from + " to " + to);
        }
        requireCurve();
        List<SaturationSolution> list = new ArrayList<>(points);
        for (int i = 0; i < points; i++) {
            double h = lo * Math.pow(hi / lo, i / (double) (points - 1));
            list.add(solve(0, MagneticFieldStrength.ofAmperesPerMetre(h)));
        }
        return new SaturationSweep(this, list);
    }

    private SaturationSolution solve(double hz, MagneticFieldStrength applied) {
        double b0 = appliedTesla(applied);
        requireCurve();
        String what = evaluation + ", saturable, in " + applied + (hz > 0 ? " at " + hz + " Hz" : " (static)");
        // Each static stage starts Newton from the previous (coarser) stage's solution.
        SaturableSolve.Outcome[] previous = new SaturableSolve.Outcome[1];
        Refinement.Outcome<SaturableSolve.Outcome> o = Refinement.run(q -> previous[0] = stage(hz, b0, q, what,
                        previous[0]),
                r -> AxialFieldSolution.worstDb(r.field(), evaluation.sensor(), what),
                (x, y) -> Math.abs(AxialFieldSolution.worstDb(x.field(), evaluation.sensor(), what)
                        - AxialFieldSolution.worstDb(y.field(), evaluation.sensor(), what)),
                fineness, Double.NaN, what);
        return new SaturationSolution(this, applied, hz, o.fine(), o.coarse(), what);
    }

    private SaturableSolve.Outcome stage(double hz, double b0, double q, String what, SaturableSolve.Outcome start) {
        Mesh mesh = scene.mesh(new double[] {hz}, q, CoilCoupling.DEFAULT_FAR_BOUNDARY, true,
                CoilCoupling.DEFAULT_MAX_UNKNOWNS, what);
        SaturableSolve solver = new SaturableSolve(mesh, curves);
        SaturableSolve.Outcome r = hz == 0
                ? solver.magnetostatic(b0, NEWTON_TOLERANCE, MAX_NEWTON_STEPS, THRESHOLD,
                        start == null ? null : start.field())
                : solver.harmonic(hz, b0, FIXED_POINT_TOLERANCE, MAX_FIXED_POINT_STEPS, THRESHOLD);
        if (!r.converged()) {
            double[] h = r.history();
            throw new ArithmeticException(what + ": the " + (hz == 0 ? "Newton" : "fixed-point") + " iteration did not "
                    + "converge in " + h.length + " steps (last relative change " + h[h.length - 1] + ")");
        }
        return r;
    }

    /** The curve of body k, or null. */
    MagnetizationCurve curve(int body) {
        return curves[body + 1];
    }

    int bodyIndex(String name) {
        return evaluation.bodyIndex(name);
    }

    List<Body> bodies() {
        return evaluation.arrangement().bodies();
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder();
        for (int k = 0; k < bodies().size(); k++) {
            if (curves[k + 1] != null) {
                s.append(s.length() == 0 ? "" : ", ").append('\'').append(bodies().get(k).name()).append('\'');
            }
        }
        return "saturation study of " + evaluation + (s.length() == 0 ? ", no body saturable"
                : ", saturable: " + s);
    }
}
