/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CoilCoupling;
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
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
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
 *       side, so the band is as wide as the long side: the obvious slow way.</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class AxisymmetricBenchmark {

    static final double RADIUS = 0.010;
    static final double SPACING = 0.020;
    static final double DISC = 0.025;
    static final double THICKNESS = 0.5e-3;
    static final double SIGMA = 58e6;
    static final double HERTZ = 1e4;

    private CoilCoupling bench;
    private Mesh longSide;

    /** The scaling meshes: only {@link #banded} uses this state, so only it runs per fineness. */
    @State(Scope.Benchmark)
    public static class Scaling {
        /** Mesh fineness; unknowns grow about as its square. */
        @Param({"0.5", "0.707", "1", "1.414", "2"})
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
