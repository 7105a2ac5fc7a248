/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarEvaluation;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One frequency point (10 kHz) of the 1-, 3- and 5-layer stacks of {@link Scenarios}, in a
 * plane wave and in a loop's magnetic near field: the library's
 * {@link PlanarEvaluation#shieldingEffectivenessDb(double)} beside the straightforward
 * Commons Math implementation ({@link CommonsMathPlanar}) of the same formulas. The setup
 * checks that both give the same SE.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(2)
public class PlanarPointBenchmark {

    /** The number of layers. */
    @Param({"1", "3", "5"})
    public int layers;

    /** The incident field. */
    @Param({"plane-wave", "magnetic-near-field"})
    public String field;

    Barrier barrier;
    IncidentField incident;
    PlanarEvaluation evaluation;
    /** The frequency in Hz, read from a field so that it is not a constant. */
    double hz;

    /** Builds the stack and checks that library and baseline agree at the point. */
    @Setup
    public void setUp() {
        barrier = Scenarios.stack(layers);
        incident = Scenarios.field(field);
        evaluation = barrier.facing(incident);
        hz = Scenarios.POINT_HZ;
        Scenarios.requireAgreement(layers + " layers, " + field, shield(), commonsMath());
    }

    /**
     * The library, one point.
     *
     * @return SE in dB
     */
    @Benchmark
    public double shield() {
        return evaluation.shieldingEffectivenessDb(hz);
    }

    /**
     * The Commons Math baseline, one point.
     *
     * @return SE in dB
     */
    @Benchmark
    public double commonsMath() {
        return CommonsMathPlanar.shieldingEffectivenessDb(barrier, incident, hz);
    }
}
