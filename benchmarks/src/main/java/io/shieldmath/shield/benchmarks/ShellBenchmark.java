/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * One alternating-field point of a shell: a single thin nickel-iron sphere and a
 * two-wall cylinder at 1 kHz, through the primitive path (no allocation per point),
 * against a baseline of the permeability model call alone. Illustrative materials.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ShellBenchmark {

    private PermeabilityModel model;
    private Shell sphere;
    private Shell nested;
    private double hertz;

    /** Builds the shells. */
    @Setup
    public void setUp() {
        model = PermeabilityModel.relaxation(40_000, Frequency.ofHertz(1000));
        Medium alloy = Medium.conductor("nickel-iron", Conductivity.ofMegasiemensPerMetre(1.7), model);
        sphere = Shell.sphere(Length.ofCentimetres(5)).wall(alloy, Length.ofMillimetres(1));
        nested = Shell.cylinderTransverse(Length.ofCentimetres(4)).wall(alloy, Length.ofMillimetres(1))
                .thenGap(Length.ofCentimetres(1)).then(alloy, Length.ofMillimetres(1));
        hertz = 1000;
    }

    /**
     * Baseline: the permeability model at the frequency, which every wall evaluation calls.
     *
     * @return µ' + µ''
     */
    @Benchmark
    public double baseline() {
        return model.real(hertz) + model.loss(hertz);
    }

    /**
     * A single thin sphere at 1 kHz.
     *
     * @return |S| in dB
     */
    @Benchmark
    public double sphereOneWall() {
        return sphere.shieldingEffectivenessDb(hertz);
    }

    /**
     * Two nested cylinders across the field at 1 kHz.
     *
     * @return |S| in dB
     */
    @Benchmark
    public double cylinderTwoWalls() {
        return nested.shieldingEffectivenessDb(hertz);
    }
}
