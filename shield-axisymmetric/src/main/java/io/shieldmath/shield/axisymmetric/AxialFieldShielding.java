/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.axisymmetric.numerics.HarmonicSolve;
import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingModel;
import java.util.Objects;

/**
 * Finite bodies in a uniform applied axial field (static or alternating), solved by
 * axisymmetric finite elements, read at a sensor region on the axis.
 *
 * <pre>{@code
 * AxialFieldShielding can = Arrangement.of(Body.can("can", mumetal, mm(20), mm(1), mm(60)))
 *         .inUniformAxialField().sensing(SensorRegion.cylinder(mm(5), mm(10)));
 * AxialFieldSolution s = can.magnetostatic();
 * s.worstShieldingFactor();     // the smallest B0/|B| over the sensor region
 * }</pre>
 *
 * <p>Model: the applied field B0 enters as the boundary value A = B0·r/2 on a far box of
 * {@value CoilCoupling#DEFAULT_FAR_BOUNDARY} half-extents of the geometry (a uniform field is
 * exactly representable on the mesh, so with the bodies set to air the computed field is B0
 * to rounding and the shielding factor is B0/|B| directly). For a tube that is long against
 * the box this fixes the total flux instead of the applied H; keep tubes much shorter than
 * the box (they always are at the default distance). The shielding factor converges with
 * the mesh like the coil case; the tolerance is applied to the worst factor in dB.
 *
 * <p>Frequencies: 0 Hz up to the quasi-static limit (k0·D ≤ 0.1). Options return a new
 * evaluation. Immutable and thread-safe; equal evaluations (equal arrangement, sensor region
 * and options) give bit-identical results.
 *
 * <p>This is one {@link ShieldingModel} of the library: its shielding effectiveness is the
 * worst shielding factor over the sensor region, in dB, so the design tools take it as it is.
 * Every call solves on fresh meshes; the default {@link #sweep} solves once per frequency.
 */
public final class AxialFieldShielding implements ShieldingModel<AxialFieldSolution> {

    private final Arrangement arrangement;
    private final SensorRegion sensor;
    private final Scene scene;
    private final double fineness;
    private final double tolerance;
    private final int maxUnknowns;

    AxialFieldShielding(Arrangement arrangement, SensorRegion sensor) {
        this(arrangement, sensor, Scene.of(arrangement, new double[0][], new String[0], sensor), 1, Double.NaN,
                CoilCoupling.DEFAULT_MAX_UNKNOWNS);
    }

    private AxialFieldShielding(Arrangement arrangement, SensorRegion sensor, Scene scene, double fineness,
                                double tolerance, int maxUnknowns) {
        this.arrangement = arrangement;
        this.sensor = sensor;
        this.scene = scene;
        this.fineness = fineness;
        this.tolerance = tolerance;
        this.maxUnknowns = maxUnknowns;
    }

    /**
     * This evaluation read over another sensor region; its ends and radius become grid lines.
     *
     * @param region the region, not null
     * @return the new evaluation; this one is unchanged
     * @throws IllegalArgumentException if the arrangement has no body and the region is a single point, so that
     *         there is nothing of any size to mesh
     */
    public AxialFieldShielding sensing(SensorRegion region) {
        Require.nonNull("sensor region", region);
        return new AxialFieldShielding(arrangement, region,
                Scene.of(arrangement, new double[0][], new String[0], region), fineness, tolerance, maxUnknowns);
    }

    /**
     * This evaluation refining the mesh until two successive meshes give worst shielding
     * factors within the tolerance (in dB).
     *
     * @param tolerance the tolerance, 0.001 dB to 10 dB, not null
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the tolerance is out of range
     */
    public AxialFieldShielding withTolerance(Decibels tolerance) {
        double t = Require.inRange("tolerance", Require.nonNull("tolerance", tolerance).toDb(), 0.001, 10, "dB");
        return new AxialFieldShielding(arrangement, sensor, scene, fineness, t, maxUnknowns);
    }

    /**
     * This evaluation on a finer or coarser starting mesh (see {@link CoilCoupling#withFineness(double)}).
     *
     * @param q the fineness, 0.25 to 16
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if q is out of range
     */
    public AxialFieldShielding withFineness(double q) {
        Require.inRange("mesh fineness", q, 0.25, 16, "(plain number)");
        return new AxialFieldShielding(arrangement, sensor, scene, q, tolerance, maxUnknowns);
    }

    /**
     * This evaluation with another cap on the unknowns of one mesh.
     *
     * @param unknowns the cap, 1000 to {@value CoilCoupling#DEFAULT_MAX_UNKNOWNS}
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the cap is out of range
     */
    public AxialFieldShielding withMaxUnknowns(int unknowns) {
        Require.inRange("unknowns cap", unknowns, 1000, CoilCoupling.DEFAULT_MAX_UNKNOWNS, "unknowns");
        return new AxialFieldShielding(arrangement, sensor, scene, fineness, tolerance, unknowns);
    }

    /**
     * The highest frequency this geometry accepts, the quasi-static limit k0·D = 0.1.
     *
     * @return the limit
     */
    public Frequency quasiStaticLimit() {
        return Frequency.ofHertz(scene.maxHertz);
    }

    /**
     * The sensor region.
     *
     * @return the region
     */
    public SensorRegion sensor() {
        return sensor;
    }

    /**
     * The frequencies {@link #at(Frequency)} accepts: {@value CoilCoupling#LOWEST_HERTZ} Hz up
     * to the {@link #quasiStaticLimit()}.
     *
     * @return the band
     */
    @Override
    public FrequencyBand validBand() {
        return FrequencyBand.of(Frequency.ofHertz(CoilCoupling.LOWEST_HERTZ), quasiStaticLimit());
    }

    /**
     * The result in an alternating field.
     *
     * @param frequency the frequency, within {@link #validBand()}, not null
     * @return the result with its estimates
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside the valid band
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public AxialFieldSolution at(Frequency frequency) {
        return solve(scene.checkBand("frequency", Require.nonNull("frequency", frequency).toHertz(),
                CoilCoupling.LOWEST_HERTZ));
    }

    /**
     * The result in a static field (0 Hz): only permeable bodies act.
     *
     * @return the result with its estimates
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    public AxialFieldSolution magnetostatic() {
        return solve(0);
    }

    /**
     * The worst shielding factor over the sensor region in dB, the primitive form for design
     * tools. Besides the valid band it accepts 0 Hz, the static case.
     *
     * @param hertz the frequency in Hz, 0 up to the quasi-static limit
     * @return 20·log10 of the worst factor, in dB, finite
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        return solve(scene.checkHertz("frequency", hertz)).shieldingEffectivenessDb();
    }

    private AxialFieldSolution solve(double hz) {
        String what = toString();
        Refinement.Outcome<Field> o = Refinement.run(q -> stage(hz, q), f -> AxialFieldSolution.worstDb(f, sensor, what),
                (a, b) -> Math.abs(AxialFieldSolution.worstDb(a, sensor, what) - AxialFieldSolution.worstDb(b, sensor, what)),
                fineness, tolerance, what);
        return new AxialFieldSolution(this, hz, o.fine(), o.coarse(), o.fineness(), what);
    }

    private Field stage(double hz, double q) {
        Mesh mesh = scene.mesh(new double[] {hz}, q, CoilCoupling.DEFAULT_FAR_BOUNDARY, true, maxUnknowns, toString());
        return new HarmonicSolve(mesh, hz, false).uniformField();
    }

    int bodyIndex(String name) {
        for (int i = 0; i < arrangement.bodies().size(); i++) {
            if (arrangement.bodies().get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no body named '" + name + "' in " + arrangement);
    }

    Arrangement arrangement() {
        return arrangement;
    }

    /**
     * Two evaluations are equal when their arrangements, sensor regions and options
     * (fineness, tolerance, unknowns cap) are equal; equal evaluations give bit-identical
     * results.
     *
     * @param o the other object
     * @return whether it is an equal evaluation
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof AxialFieldShielding a && a.arrangement.equals(arrangement) && a.sensor.equals(sensor)
                && Double.compare(a.fineness, fineness) == 0 && Double.compare(a.tolerance, tolerance) == 0
                && a.maxUnknowns == maxUnknowns;
    }

    @Override
    public int hashCode() {
        return Objects.hash(arrangement, sensor, fineness, tolerance, maxUnknowns);
    }

    @Override
    public String toString() {
        return arrangement + " in a uniform axial field, " + sensor;
    }
}
