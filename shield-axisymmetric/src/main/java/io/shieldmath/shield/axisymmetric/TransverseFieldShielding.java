/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.axisymmetric.numerics.MeshLimitException;
import io.shieldmath.shield.axisymmetric.numerics.TransverseEddySolve;
import io.shieldmath.shield.axisymmetric.numerics.TransverseField;
import io.shieldmath.shield.axisymmetric.numerics.TransverseSolve;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.util.Objects;

/**
 * Bodies of revolution in a uniform applied field across their axis (static or
 * alternating), read at a sensor region on the axis.
 *
 * <pre>{@code
 * TransverseFieldShielding can = Arrangement.of(Body.can("can", alloy, mm(20), mm(1), mm(60)))
 *         .inUniformTransverseField().sensing(SensorRegion.cylinder(mm(5), mm(10)));
 * TransverseFieldSolution s = can.magnetostatic();
 * s.worstShieldingFactor();                       // the smallest B0/|B| in the sensor region
 * s.worstDirection(arrangementInAxialField.magnetostatic());   // AXIAL or TRANSVERSE
 * can.at(Hz(50)).worstShieldingFactor();          // with eddy currents
 * }</pre>
 *
 * <p>Model. A uniform field across the axis is the first azimuthal mode of the 3-D field,
 * and a body of revolution couples no other mode to it, so the problem reduces exactly to
 * the (r, z) half-plane, solved on the same graded mesh as the axial case (the Fourier
 * finite-element method for axisymmetric domains of B. Mercier and G. Raugel, RAIRO Analyse
 * numérique 16 (1982) 405–461; C. Bernardi, M. Dauge, Y. Maday, <i>Spectral Methods for
 * Axisymmetric Domains</i>, 1999).
 * <ul>
 *   <li>Statically, and at frequency when no body conducts: the magnetic scalar potential
 *       Φ = Φ1(r, z)·cos φ, H = −∇Φ, minimising ∫ µ[(∂Φ1/∂r)² + (∂Φ1/∂z)² + Φ1²/r²] r dr dz with
 *       Φ1 = 0 on the axis and Φ1 = −H0·r on the far box (bilinear elements; complex µr(f) for a
 *       non-conducting body at frequency).</li>
 *   <li>At frequency with a conducting body: the A–ψ method of C. R. I. Emson and J. Simkin
 *       ("An optimal method for 3-D eddy currents", IEEE Trans. Magn. 19 (1983) 2450): the
 *       modified vector potential in its first mode, A = (a_r·sin φ, (u/r)·cos φ, a_z·sin φ),
 *       inside the conductors only, with edge elements for (a_r, a_z) and nodal ones for u, as
 *       C. G. Albert, O. Bíró and P. Lainer (arXiv:2008.13681) use for magnetostatics, and the
 *       scalar potential above everywhere else, coupled on the conductors' surfaces. One unknown
 *       per grid node outside the conductors and three to four inside, so on a can whose wall
 *       is many skin depths thick the solve costs about three times an axial one on the same
 *       mesh (less for thin walls), and a very fine mesh may need {@link #withFineness(double)}
 *       below 1 to stay within the size cap.</li>
 * </ul>
 * The far box lies {@value CoilCoupling#DEFAULT_FAR_BOUNDARY} half-extents of the geometry
 * away. The applied field is exact on both discretisations, so with the bodies set to air the
 * computed field is the applied one to rounding. The box leaves a truncation error of order
 * (extent/distance)³ (measured: 2e-5 relative for a closed high-µ can).
 *
 * <p>Permeability: each body's µr at the frequency (µ'(0) statically). Linear media only. The
 * result is an estimate for idealised geometry; seams, joints and the alloy's handling limit
 * real shields, which must be verified by measurement.
 *
 * <p>Options return a new evaluation. Immutable and thread-safe; equal evaluations give
 * bit-identical results.
 *
 * <p>This is one {@link ShieldingModel} of the library (its shielding effectiveness is the
 * worst factor over the sensor region, in dB), so the design tools take it as it is.
 */
public final class TransverseFieldShielding implements ShieldingModel<TransverseFieldSolution> {

    private final Arrangement arrangement;
    private final SensorRegion sensor;
    private final Scene scene;
    private final double fineness;
    private final double tolerance;
    private final double farBoundary;
    private final int maxUnknowns;

    TransverseFieldShielding(Arrangement arrangement, SensorRegion sensor) {
        this(arrangement, sensor, Scene.of(arrangement, new double[0][], new String[0], sensor), 1, Double.NaN,
                CoilCoupling.DEFAULT_FAR_BOUNDARY, CoilCoupling.DEFAULT_MAX_UNKNOWNS);
    }

    private TransverseFieldShielding(Arrangement arrangement, SensorRegion sensor, Scene scene, double fineness,
                                     double tolerance, double farBoundary, int maxUnknowns) {
        this.arrangement = arrangement;
        this.sensor = sensor;
        this.scene = scene;
        this.fineness = fineness;
        this.tolerance = tolerance;
        this.farBoundary = farBoundary;
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
    public TransverseFieldShielding sensing(SensorRegion region) {
        Require.nonNull("sensor region", region);
        return new TransverseFieldShielding(arrangement, region,
                Scene.of(arrangement, new double[0][], new String[0], region), fineness, tolerance, farBoundary,
                maxUnknowns);
    }

    /**
     * This evaluation refining the mesh until two successive meshes give worst shielding
     * factors within the tolerance (in dB).
     *
     * @param tolerance the tolerance, 0.001 dB to 10 dB, not null
     * @return the new evaluation; this one is unchanged
     * @throws InvalidQuantityException if the tolerance is out of range
     */
    public TransverseFieldShielding withTolerance(Decibels tolerance) {
        double t = Require.inRange("tolerance", Require.nonNull("tolerance", tolerance).toDb(), 0.001, 10, "dB");
        return new TransverseFieldShielding(arrangement, sensor, scene, fineness, t, farBoundary, maxUnknowns);
    }

    /**
     * This evaluation on a finer or coarser starting mesh (see {@link CoilCoupling#withFineness(double)}).
     *
     * @param q the fineness, 0.25 to 16
     * @return the new evaluation; this one is unchanged
     * @throws InvalidQuantityException if q is out of range
     */
    public TransverseFieldShielding withFineness(double q) {
        Require.inRange("mesh fineness", q, 0.25, 16, "(plain number)");
        return new TransverseFieldShielding(arrangement, sensor, scene, q, tolerance, farBoundary, maxUnknowns);
    }

    /**
     * This evaluation with the far boundary (Φ1 = −H0·r) at another distance, in half-extents
     * of the geometry about its centre (default {@value CoilCoupling#DEFAULT_FAR_BOUNDARY}).
     *
     * @param halfExtents the distance, 5 to 200
     * @return the new evaluation; this one is unchanged
     * @throws InvalidQuantityException if the distance is out of range
     */
    public TransverseFieldShielding withFarBoundaryAt(double halfExtents) {
        Require.inRange("far boundary distance", halfExtents, 5, 200, "half-extents");
        return new TransverseFieldShielding(arrangement, sensor, scene, fineness, tolerance, halfExtents, maxUnknowns);
    }

    /**
     * This evaluation with another cap on the unknowns of one mesh (grid nodes); the eddy
     * solve, with up to four unknowns per node inside a conductor, is capped at three times
     * this. Either solve is also capped at {@value MeshTooLargeException#MAX_BAND_ENTRIES}
     * stored matrix entries.
     *
     * @param unknowns the cap, 1000 to {@value CoilCoupling#DEFAULT_MAX_UNKNOWNS}
     * @return the new evaluation; this one is unchanged
     * @throws InvalidQuantityException if the cap is out of range
     */
    public TransverseFieldShielding withMaxUnknowns(int unknowns) {
        Require.inRange("unknowns cap", unknowns, 1000, CoilCoupling.DEFAULT_MAX_UNKNOWNS, "unknowns");
        return new TransverseFieldShielding(arrangement, sensor, scene, fineness, tolerance, farBoundary, unknowns);
    }

    /**
     * The bodies.
     *
     * @return the arrangement
     */
    public Arrangement arrangement() {
        return arrangement;
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
     * The highest frequency this geometry accepts, the quasi-static limit k0·D = 0.1.
     *
     * @return the limit
     */
    public Frequency quasiStaticLimit() {
        return Frequency.ofHertz(scene.maxHertz);
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
     * The result in an alternating field across the axis, eddy currents included.
     *
     * @param frequency the frequency, within {@link #validBand()}, not null
     * @return the result with its estimates
     * @throws InvalidQuantityException if the frequency is outside the valid band
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public TransverseFieldSolution at(Frequency frequency) {
        double hz = scene.checkBand("frequency", Require.nonNull("frequency", frequency).toHertz(),
                CoilCoupling.LOWEST_HERTZ);
        return solve(hz);
    }

    /**
     * The result in a static field across the axis (0 Hz): only permeable bodies act.
     *
     * @return the result with its estimates
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    public TransverseFieldSolution magnetostatic() {
        return solve(0);
    }

    /**
     * The worst shielding factor over the sensor region in dB, the primitive form for design
     * tools. Besides the valid band it accepts 0 Hz, the static case.
     *
     * @param hertz the frequency in Hz, 0 up to the quasi-static limit
     * @return 20·log10 of the worst factor, in dB, finite
     * @throws InvalidQuantityException if the frequency is out of range
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        return solve(scene.checkHertz("frequency", hertz)).shieldingEffectivenessDb();
    }

    private TransverseFieldSolution solve(double hz) {
        String what = toString();
        Refinement.Outcome<TransverseField> o = Refinement.run(q -> stage(hz, q),
                f -> TransverseFieldSolution.worstDb(f, sensor, what),
                (a, b) -> Math.abs(TransverseFieldSolution.worstDb(a, sensor, what)
                        - TransverseFieldSolution.worstDb(b, sensor, what)),
                fineness, tolerance, what);
        return new TransverseFieldSolution(this, hz, o.fine(), o.coarse(), o.fineness(), what);
    }

    private TransverseField stage(double hz, double q) {
        Mesh mesh = scene.mesh(new double[] {hz}, q, farBoundary, true, maxUnknowns, toString());
        if (hz > 0 && conducts()) {
            try {
                return new TransverseEddySolve(mesh, hz, false, 3 * maxUnknowns, MeshTooLargeException.MAX_BAND_ENTRIES)
                        .uniformField();
            } catch (MeshLimitException e) {
                throw new MeshTooLargeException(toString(), e.unknowns, e.bandEntries, 3 * maxUnknowns, q);
            }
        }
        return new TransverseSolve(mesh, hz, false).uniformField();
    }

    private boolean conducts() {
        for (Body b : arrangement.bodies()) {
            if (b.medium().conductivity().toSiemensPerMetre() > 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * Two evaluations are equal when their arrangements, sensor regions and options
     * (fineness, tolerance, far boundary, unknowns cap) are equal; equal evaluations give
     * bit-identical results.
     *
     * @param o the other object
     * @return whether it is an equal evaluation
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof TransverseFieldShielding a && a.arrangement.equals(arrangement) && a.sensor.equals(sensor)
                && Double.compare(a.fineness, fineness) == 0 && Double.compare(a.tolerance, tolerance) == 0
                && Double.compare(a.farBoundary, farBoundary) == 0 && a.maxUnknowns == maxUnknowns;
    }

    @Override
    public int hashCode() {
        return Objects.hash(arrangement, sensor, fineness, tolerance, farBoundary, maxUnknowns);
    }

    @Override
    public String toString() {
        return arrangement + " in a uniform transverse field, " + sensor;
    }
}
