/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CoilCoupling;
import io.shieldmath.shield.axisymmetric.numerics.BandedLdlt;
import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.axisymmetric.numerics.HarmonicSolve;
import io.shieldmath.shield.axisymmetric.numerics.Layout;
import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.infra.Blackhole;

/**
 * The axisymmetric finite-element solver on an invented coil–plate–coil bench: two one-turn
 * loops of 10 mm radius, 20 mm apart, a 0.5 mm copper disc of 25 mm radius midway, 10 kHz.
 * <ul>
 *   <li>{@link #convergedPoint}: one frequency refined until two meshes agree to 0.1 dB;</li>
 *   <li>{@link #sweep20}: 20 frequencies from 100 Hz to 100 kHz on one mesh pair;</li>
 *   <li>{@link #banded}: one assembly, factorisation and solve at several mesh finenesses, for
 *       the time against unknowns (the table fits the exponent);</li>
 *   <li>{@link #baseline}: the same system at fineness 1, numbered along the grid's longer
 *       side, so the band is as wide as the long side: a slower ordering;</li>
 *   <li>{@link #dense}: the system at fineness {@value #DENSE_FINENESS} factored as a dense
 *       matrix (the same LDLᵀ with the band as wide as the matrix), the obvious slow way,
 *       against {@link #banded} at the same fineness.</li>
 * </ul>
 *
 * <p>Every fork runs with a 512 MiB heap ({@code -Xmx512m}), the solver's memory target: a
 * case that needed more would fail with {@link OutOfMemoryError}. At the end of each fork
 * the peak heap use (the sum of the heap pools' peaks, an upper bound) is printed to the
 * JMH log.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(jvmArgsAppend = "-Xmx512m")
public class AxisymmetricBenchmark {

    /** The fineness of the dense comparison: about 1 400 unknowns, 16 MiB per dense part. */
    public static final double DENSE_FINENESS = 0.4;

    static final double RADIUS = 0.010;
    static final double SPACING = 0.020;
    static final double DISC = 0.025;
    static final double THICKNESS = 0.5e-3;
    static final double SIGMA = 58e6;
    static final double HERTZ = 1e4;

    private CoilCoupling bench;
    private Mesh longSide;
    private Mesh denseMesh;

    /** The scaling meshes: only {@link #banded} uses this state, so only it runs per fineness. */
    @State(Scope.Benchmark)
    public static class Scaling {
        /** Mesh fineness; unknowns grow about as its square. */
        @Param({"0.4", "0.5", "0.707", "1", "1.414", "2"})
        public double fineness;

        private Mesh mesh;

        /** Builds the mesh of this fineness once. */
        @Setup
        public void setUp() {
            mesh = new Mesh(layout(), new double[] {HERTZ}, fineness, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
        }
    }

    /** The bench's layout as the mesher sees it (disc as material 1, two loops). */
    static Layout layout() {
        return new Layout(new double[] {0}, new double[] {DISC}, new double[] {-THICKNESS / 2},
                new double[] {THICKNESS / 2}, new int[] {1}, new double[] {0, SIGMA},
                new PermeabilityModel[] {PermeabilityModel.constant(1), PermeabilityModel.constant(1)},
                new double[] {RADIUS, RADIUS}, new double[] {RADIUS, RADIUS}, new double[] {-SPACING / 2, SPACING / 2},
                new double[] {-SPACING / 2, SPACING / 2}, new double[] {1, 1}, new double[0], new double[0]);
    }

    /** The unknowns of the scaling mesh at a fineness. */
    static int unknowns(double q) {
        return new Mesh(layout(), new double[] {HERTZ}, q, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE).unknowns();
    }

    /** Builds the evaluation and the meshes once. */
    @Setup
    public void setUp() {
        Medium copper = Medium.conductor("copper", Conductivity.ofSiemensPerMetre(SIGMA), 1);
        CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(RADIUS), 1), Coil.loop(Length.ofMetres(RADIUS), 1),
                Length.ofMetres(SPACING));
        bench = Arrangement.of(Body.disc("plate", copper, Length.ofMetres(DISC), Length.ofMetres(THICKNESS)))
                .between(pair);
        longSide = new Mesh(layout(), new double[] {HERTZ}, 1, 40, false, Integer.MAX_VALUE, Long.MAX_VALUE);
        denseMesh = new Mesh(layout(), new double[] {HERTZ}, DENSE_FINENESS, 40, true, Integer.MAX_VALUE,
                Long.MAX_VALUE);
        // The dense baseline must solve the same system: compare its solution with the banded one.
        double[][] x = denseSolve(denseMesh);
        Field f = new HarmonicSolve(denseMesh, HERTZ, false).coilField(0);
        double[] a = new double[2];
        double[] b = new double[2];
        f.linkage(1, a);
        double[] receiver = HarmonicSolve.coilLoad(denseMesh, 1);
        for (int k = 0; k < receiver.length; k++) {
            b[0] += 2 * Math.PI * receiver[k] * x[0][k];
            b[1] += 2 * Math.PI * receiver[k] * x[1][k];
        }
        if (Math.abs(a[0] - b[0]) > 1e-8 * Math.abs(a[0]) || Math.abs(a[1] - b[1]) > 1e-8 * Math.hypot(a[0], a[1])) {
            throw new IllegalStateException("dense and banded solves differ: " + a[0] + " " + a[1] + " / " + b[0]
                    + " " + b[1]);
        }
    }

    /** Prints the fork's peak heap use, the sum of the heap pools' peaks (an upper bound). */
    @TearDown(Level.Trial)
    public void peakHeap() {
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.getPeakUsage() != null) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf(Locale.ROOT, "%nAxisymmetricBenchmark peak heap (sum of pool peaks, -Xmx512m): %.0f MiB%n",
                peak / 1048576.0);
    }

    /**
     * Assembles the system of a coil at fineness {@value #DENSE_FINENESS}, copies it into
     * dense storage (the band as wide as the matrix) and factors and solves it there.
     */
    static double[][] denseSolve(Mesh mesh) {
        int n = mesh.unknowns();
        int b = mesh.bandwidth();
        double[][] band = HarmonicSolve.assembledBand(mesh, HERTZ, false);
        int w = b + 1;
        double[] re = new double[Math.multiplyExact(n, n)];
        double[] im = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int k = Math.max(0, i - b); k <= i; k++) {
                re[i * n + k - i + n - 1] = band[0][i * w + k - i + b];
                im[i * n + k - i + n - 1] = band[1][i * w + k - i + b];
            }
        }
        BandedLdlt.factor(n, n - 1, re, im);
        double[] xr = HarmonicSolve.coilLoad(mesh, 0);
        double[] xi = new double[n];
        BandedLdlt.solve(n, n - 1, re, im, xr, xi);
        return new double[][] {xr, xi};
    }

    /**
     * One frequency converged to 0.1 dB (meshes, free-space reference, solves, refinement).
     *
     * @return the insertion loss in dB
     */
    @Benchmark
    public double convergedPoint() {
        return bench.withTolerance(Decibels.of(0.1)).at(Frequency.ofHertz(HERTZ)).shieldingEffectivenessDb();
    }

    /**
     * Twenty frequencies on one mesh pair, with their estimates.
     *
     * @param bh consumes every result
     */
    @Benchmark
    public void sweep20(Blackhole bh) {
        bench.sweep(FrequencyBand.of(Frequency.ofHertz(100), Frequency.ofHertz(1e5)), 20)
                .results().forEach(s -> bh.consume(s.shieldingEffectivenessDb()));
    }

    /**
     * Assembly, banded LDLᵀ (shorter side first) and one solve with refinement on the scaling mesh.
     *
     * @param scaling the mesh of the fineness under test
     * @return the receiver's flux linkage per ampere
     */
    @Benchmark
    public double banded(Scaling scaling) {
        Field f = new HarmonicSolve(scaling.mesh, HERTZ, false).coilField(0);
        double[] out = new double[2];
        f.linkage(1, out);
        return out[0];
    }

    /**
     * The system of {@link #banded} at fineness {@value #DENSE_FINENESS} as a dense matrix:
     * assembly, copy into dense storage, LDLᵀ over the whole lower triangle and one solve.
     *
     * @param bh consumes the solution
     */
    @Benchmark
    public void dense(Blackhole bh) {
        double[][] x = denseSolve(denseMesh);
        bh.consume(x[0]);
        bh.consume(x[1]);
    }

    /**
     * The same system as {@link #banded} at fineness 1, numbered along the longer side.
     *
     * @return the receiver's flux linkage per ampere
     */
    @Benchmark
    public double baseline() {
        Field f = new HarmonicSolve(longSide, HERTZ, false).coilField(0);
        double[] out = new double[2];
        f.linkage(1, out);
        return out[0];
    }
}
