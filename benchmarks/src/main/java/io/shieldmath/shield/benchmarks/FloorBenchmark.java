/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * The floor: the transcendental work that one layer at one frequency cannot avoid, one
 * complex square root (γ = sqrt(γ²)) and one complex exponential (e^{γt}), written with
 * {@link Math} calls on the values of the 1-layer stack at 10 kHz. Every other benchmark is
 * reported as a multiple of this one.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(2)
public class FloorBenchmark {

    /** Re γ² of 0.5 mm copper at 10 kHz, 1/m² (read from a field so it is not a constant). */
    double g2r;
    /** Im γ² of the same, 1/m². */
    double g2i;
    /** The thickness, m. */
    double t;

    /** Fills in the inputs: γ² = jωµ0·(σ + jωε0) for copper at 10 kHz, t = 0.5 mm. */
    @Setup
    public void setUp() {
        double w = 2 * Math.PI * Scenarios.POINT_HZ;
        double sigma = Scenarios.COPPER.conductivity().toSiemensPerMetre();
        g2r = -w * PhysicalConstants.MU_0 * w * PhysicalConstants.EPSILON_0;
        g2i = w * PhysicalConstants.MU_0 * sigma;
        t = 0.5e-3;
    }

    /**
     * One principal complex square root and one complex exponential, both parts consumed.
     *
     * @param bh the sink
     */
    @Benchmark
    public void floor(Blackhole bh) {
        work(bh);
    }

    /**
     * The same work on two threads at once: the scaling this machine gives to perfectly
     * parallel work during the run, beside which the sweep's thread scaling is read.
     *
     * @param bh the sink
     */
    @Benchmark
    @Threads(2)
    public void floorTwoThreads(Blackhole bh) {
        work(bh);
    }

    private void work(Blackhole bh) {
        double mod = Math.sqrt(g2r * g2r + g2i * g2i);
        double gr = Math.sqrt(0.5 * (mod + g2r));
        double gi = Math.copySign(Math.sqrt(0.5 * (mod - g2r)), g2i);
        double e = Math.exp(gr * t);
        bh.consume(e * Math.cos(gi * t));
        bh.consume(e * Math.sin(gi * t));
    }
}
