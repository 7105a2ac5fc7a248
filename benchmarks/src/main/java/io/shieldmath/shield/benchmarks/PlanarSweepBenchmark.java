/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.planar.PlanarEvaluation;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The 1 000-point log sweep (10 Hz to 10 MHz) of the 3-layer stack of {@link Scenarios} in
 * the loop's magnetic near field, through the primitive-array batch API
 * {@link PlanarEvaluation#shieldingEffectivenessDb(double[], double[])}, on one and on two
 * threads sharing one evaluation. Scores are points per second (one operation is one
 * frequency point), summed over the threads; run with {@code -prof gc} the
 * {@code gc.alloc.rate.norm} line is the bytes allocated per point.
 * {@code numpy_sweep.py} times the same sweep with NumPy.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(2)
public class PlanarSweepBenchmark {

    /** The evaluation and the frequencies, shared by all threads. */
    @State(Scope.Benchmark)
    public static class Sweep {
        PlanarEvaluation evaluation;
        double[] hz;

        /** Builds the stack and the frequencies. */
        @Setup
        public void setUp() {
            evaluation = Scenarios.stack(3).facing(Scenarios.field("magnetic-near-field"));
            hz = Scenarios.SWEEP_BAND.logSpacedHertz(Scenarios.SWEEP_POINTS);
        }
    }

    /** Each thread's own output array. */
    @State(Scope.Thread)
    public static class Output {
        double[] db;

        /** Allocates the output once. */
        @Setup
        public void setUp() {
            db = new double[Scenarios.SWEEP_POINTS];
        }
    }

    /**
     * The sweep on one thread.
     *
     * @param sweep the shared sweep
     * @param out   this thread's output
     * @return the output array
     */
    @Benchmark
    @Threads(1)
    @OperationsPerInvocation(Scenarios.SWEEP_POINTS)
    public double[] sweepOneThread(Sweep sweep, Output out) {
        return sweep.evaluation.shieldingEffectivenessDb(sweep.hz, out.db);
    }

    /**
     * The same sweep on two threads at once, each with its own output.
     *
     * @param sweep the shared sweep
     * @param out   this thread's output
     * @return the output array
     */
    @Benchmark
    @Threads(2)
    @OperationsPerInvocation(Scenarios.SWEEP_POINTS)
    public double[] sweepTwoThreads(Sweep sweep, Output out) {
        return sweep.evaluation.shieldingEffectivenessDb(sweep.hz, out.db);
    }
}
