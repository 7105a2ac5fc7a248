/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.Sweep;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Finite bodies between two coaxial coils, solved by axisymmetric finite elements: the
 * coupling between the coils with the bodies, against the same coils with the bodies set to
 * air on the same mesh.
 *
 * <pre>{@code
 * CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 20), Coil.loop(mm(15), 20), mm(30));
 * CoilCoupling bench = Arrangement.of(Body.disc("plate", copper, mm(45), mm(0.5))).between(pair);
 * CouplingSolution r = bench.at(kHz(10));
 * r.insertionLoss();                       // e.g. 13 dB, with r.insertionLossEstimateDb() beside it
 * bench.withTolerance(Decibels.of(0.1)).at(kHz(10));     // refine until two meshes agree to 0.1 dB
 * }</pre>
 *
 * <p>Model: quasi-static, time-harmonic (e^{jωt}) A_φ(r, z) by Galerkin finite elements (see
 * the package documentation for the method, its grid and its sources). The transmitter
 * carries 1 A peak unless a {@link io.shieldmath.shield.coupling.DriveCurrent} is given; the
 * coils' own wire resistance and capacitance are not modelled; a coil with a winding section
 * carries a uniform current density over the section: the limit of {@code Coil}'s ring grid as
 * the rings become many, so its ring count is not used (the coil is taken as uniformly wound;
 * with few rings the filament model of the coupling package differs from it by the midpoint
 * rule's error over the winding section, about 1/n²: measured for 100 turns on a 6 mm × 6 mm
 * section of 15 mm radius, 12 mm from a 10 mm loop, the free-space M of one ring is 0.38 %
 * below the many-ring limit, 2 × 2 rings 0.099 %, 4 × 4 rings 0.025 %).
 * Insertion loss: 20·log10|M0/M| with M0 from the same mesh with every body set to
 * air, so most discretisation and truncation error cancels.
 *
 * <p>Frequencies: 0 Hz (magnetostatic, {@link #magnetostatic()}) up to the quasi-static
 * limit k0·D ≤ 0.1, D the largest dimension of the bodies and coils together (for D = 0.1 m
 * about 48 MHz). Options return a new evaluation; this one is unchanged. Immutable and
 * thread-safe: concurrent calls share only immutable data; equal evaluations (equal
 * arrangement, coils and options) give bit-identical results.
 *
 * <p>This is one {@link ShieldingModel} of the library: its shielding effectiveness is the
 * insertion loss, so the design tools ({@code BandSearch}, {@code ThicknessSolver.resizing},
 * {@code Requirement.marginOf}, ...) take it as it is. Every call solves on fresh meshes
 * (a tenth of a second to a second each), so a band search costs tens of solves.
 */
public final class CoilCoupling implements ShieldingModel<CouplingSolution> {

    /** The lower end of {@link #validBand()} in Hz; 0 Hz is {@link #magnetostatic()}. */
    public static final double LOWEST_HERTZ = 1e-6;

    /** The default cap on the unknowns of one mesh. */
    public static final int DEFAULT_MAX_UNKNOWNS = 400_000;
    /** The default distance of the far boundary, in half-extents of the geometry. */
    public static final double DEFAULT_FAR_BOUNDARY = 40;
    /** The most frequencies in one {@link #sweep(FrequencyBand, int)} on one mesh. */
    public static final int MAX_SWEEP_POINTS = 1000;

    private final Arrangement arrangement;
    private final CoilPair pair;
    private final Scene scene;
    private final double fineness;
    private final double tolerance;
    private final double farBoundary;
    private final int maxUnknowns;

    CoilCoupling(Arrangement arrangement, CoilPair pair) {
        this(arrangement, pair, build(arrangement, pair), 1, Double.NaN, DEFAULT_FAR_BOUNDARY, DEFAULT_MAX_UNKNOWNS);
    }

    private CoilCoupling(Arrangement arrangement, CoilPair pair, Scene scene, double fineness, double tolerance,
                         double farBoundary, int maxUnknowns) {
        this.arrangement = arrangement;
        this.pair = pair;
        this.scene = scene;
        this.fineness = fineness;
        this.tolerance = tolerance;
        this.farBoundary = farBoundary;
        this.maxUnknowns = maxUnknowns;
    }

    private static Scene build(Arrangement arrangement, CoilPair pair) {
        double d = pair.separation().toMetres();
        double[][] coils = {Scene.section(pair.transmitter(), -d / 2), Scene.section(pair.receiver(), d / 2)};
        return Scene.of(arrangement, coils, new String[] {"transmitter", "receiver"}, SensorRegion.centrePoint());
    }

    /**
     * This evaluation refining the mesh until two successive meshes give insertion losses
     * within the tolerance (each step makes elements √2 smaller). The result on the finer
     * of the last two meshes is returned, the change as its estimate.
     *
     * @param tolerance the largest change allowed between the last two meshes, 0.001 dB to 10 dB, not null
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the tolerance is out of range
     */
    public CoilCoupling withTolerance(Decibels tolerance) {
        double t = Require.inRange("tolerance", Require.nonNull("tolerance", tolerance).toDb(), 0.001, 10, "dB");
        return new CoilCoupling(arrangement, pair, scene, fineness, t, farBoundary, maxUnknowns);
    }

    /**
     * This evaluation on a finer or coarser starting mesh: element sizes scale as 1/q and the
     * growth factor as 1 + 0.2/q. The default is 1 (first element δ/10 at conductor faces,
     * growth 1.2).
     *
     * @param q the fineness, 0.25 to 16
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if q is out of range
     */
    public CoilCoupling withFineness(double q) {
        Require.inRange("mesh fineness", q, 0.25, 16, "(plain number)");
        return new CoilCoupling(arrangement, pair, scene, q, tolerance, farBoundary, maxUnknowns);
    }

    /**
     * This evaluation with the far boundary (A = 0) at another distance, in half-extents of
     * the geometry about its centre. The default {@value #DEFAULT_FAR_BOUNDARY} keeps the
     * truncation error of the free-space coupling below 1e-4 (measured in the tests).
     *
     * @param halfExtents the distance, 5 to 200
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public CoilCoupling withFarBoundaryAt(double halfExtents) {
        Require.inRange("far boundary distance", halfExtents, 5, 200, "half-extents");
        return new CoilCoupling(arrangement, pair, scene, fineness, tolerance, halfExtents, maxUnknowns);
    }

    /**
     * This evaluation with another cap on the unknowns of one mesh.
     *
     * @param unknowns the cap, 1000 to {@value #DEFAULT_MAX_UNKNOWNS}
     * @return the new evaluation; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the cap is out of range
     */
    public CoilCoupling withMaxUnknowns(int unknowns) {
        Require.inRange("unknowns cap", unknowns, 1000, DEFAULT_MAX_UNKNOWNS, "unknowns");
        return new CoilCoupling(arrangement, pair, scene, fineness, tolerance, farBoundary, unknowns);
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
     * The coils.
     *
     * @return the pair
     */
    public CoilPair pair() {
        return pair;
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
     * The frequencies {@link #at(Frequency)} and {@link #sweep(FrequencyBand, int)} accept:
     * {@value #LOWEST_HERTZ} Hz up to the {@link #quasiStaticLimit()}.
     *
     * @return the band
     */
    @Override
    public FrequencyBand validBand() {
        return FrequencyBand.of(Frequency.ofHertz(LOWEST_HERTZ), quasiStaticLimit());
    }

    /**
     * The result at one frequency.
     *
     * @param frequency the frequency, within {@link #validBand()}, not null
     * @return the result with its discretisation estimates
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside the valid band
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public CouplingSolution at(Frequency frequency) {
        double hz = scene.checkBand("frequency", Require.nonNull("frequency", frequency).toHertz(), LOWEST_HERTZ);
        return solve(new double[] {hz}).get(0);
    }

    /**
     * The magnetostatic result (0 Hz): only permeable bodies act; conductors without
     * permeability give 0 dB.
     *
     * @return the result with its discretisation estimates
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    public CouplingSolution magnetostatic() {
        return solve(new double[] {0}).get(0);
    }

    /**
     * The results at log-spaced frequencies across a band, both ends included, all on one
     * mesh pair graded for the smallest skin depth of the band: the grid, the numbering, the
     * band layout, the element matrices and the free-space reference are built once and
     * reused at every frequency; only assembly, factorisation and solves repeat. With a
     * tolerance, the whole sweep is refined until the largest change over its frequencies is
     * within it.
     *
     * @param band   the band, within {@link #validBand()}, not null
     * @param points the number of frequencies, 1 to {@value #MAX_SWEEP_POINTS}
     * @return the results, lowest frequency first ({@link Sweep#results()} for the list)
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the band leaves the valid band or points is out of range
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public Sweep<CouplingSolution> sweep(FrequencyBand band, int points) {
        Require.nonNull("band", band);
        Require.inRange("points", points, 1, MAX_SWEEP_POINTS, "points");
        scene.checkBand("band lower frequency", band.low().toHertz(), LOWEST_HERTZ);
        scene.checkBand("band upper frequency", band.high().toHertz(), LOWEST_HERTZ);
        double[] hz = band.logSpacedHertz(points);
        return Sweep.ofResults(hz, solve(hz));
    }

    /**
     * The insertion loss at one frequency in dB, the primitive form of {@link #at(Frequency)}
     * for design tools: the same solve, only the number returned. Besides the valid band it
     * accepts 0 Hz, the magnetostatic case.
     *
     * @param hertz the frequency in Hz, 0 up to the quasi-static limit
     * @return the insertion loss 20·log10|M0/M| in dB, finite
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        double hz = scene.checkHertz("frequency", hertz);
        return solve(new double[] {hz}).get(0).insertionLossDb();
    }

    private List<CouplingSolution> solve(double[] hz) {
        String what = toString();
        Refinement.Outcome<CoilSnapshot[]> o = Refinement.run(q -> stage(hz, q),
                s -> s[s.length - 1].insertionLossDb(what), (a, b) -> {
                    double worst = 0;
                    for (int i = 0; i < a.length; i++) {
                        worst = Math.max(worst, Math.abs(a[i].insertionLossDb(what) - b[i].insertionLossDb(what)));
                    }
                    return worst;
                }, fineness, tolerance, what);
        List<CouplingSolution> out = new ArrayList<>(hz.length);
        for (int i = 0; i < hz.length; i++) {
            out.add(new CouplingSolution(this, o.fine()[i], o.coarse()[i], o.fineness(), what));
        }
        return List.copyOf(out);
    }

    private CoilSnapshot[] stage(double[] hz, double q) {
        Mesh mesh = scene.mesh(hz, q, farBoundary, true, maxUnknowns, toString());
        double m0 = CoilSnapshot.freeSpace(mesh);
        CoilSnapshot[] s = new CoilSnapshot[hz.length];
        for (int i = 0; i < hz.length; i++) {
            s[i] = CoilSnapshot.solve(mesh, m0, hz[i]);
        }
        return s;
    }

    int bodyIndex(String name) {
        List<Body> b = arrangement.bodies();
        for (int i = 0; i < b.size(); i++) {
            if (b.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no body named '" + name + "' in " + arrangement);
    }

    /**
     * Two evaluations are equal when their arrangements, coil pairs and options (fineness,
     * tolerance, far boundary, unknowns cap) are equal; equal evaluations give bit-identical
     * results.
     *
     * @param o the other object
     * @return whether it is an equal evaluation
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof CoilCoupling c && c.arrangement.equals(arrangement) && c.pair.equals(pair)
                && Double.compare(c.fineness, fineness) == 0 && Double.compare(c.tolerance, tolerance) == 0
                && Double.compare(c.farBoundary, farBoundary) == 0 && c.maxUnknowns == maxUnknowns;
    }

    @Override
    public int hashCode() {
        return Objects.hash(arrangement, pair, fineness, tolerance, farBoundary, maxUnknowns);
    }

    @Override
    public String toString() {
        return arrangement + " between " + pair;
    }
}
