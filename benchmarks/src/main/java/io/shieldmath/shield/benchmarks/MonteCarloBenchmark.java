/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.design.ToleranceResult;
import io.shieldmath.shield.design.ToleranceStudy;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.SplittableRandom;
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
 * 100 000 Monte Carlo samples of a two-layer planar case (copper and steel in a loop's
 * near field, thickness, conductivity and permeability varied), against a baseline that
 * draws the same random numbers and evaluates nothing. Target: the whole run under one
 * second on the project's 2-core machine.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class MonteCarloBenchmark {

    private static final int SAMPLES = 100_000;

    private ToleranceStudy study;
    private Frequency frequency;

    /** Builds the study. */
    @Setup
    public void setUp() {
        Medium copper = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);
        Medium steel = Medium.conductor("steel", Conductivity.ofMegasiemensPerMetre(7),
                PermeabilityModel.relaxation(300, Frequency.ofKilohertz(50)));
        Barrier b = Barrier.of(copper, Length.ofMillimetres(0.3)).then(steel, Length.ofMillimetres(0.5));
        IncidentField f = IncidentField.magneticNearField(Length.ofCentimetres(5), ImpedanceForm.EXACT_DIPOLE);
        study = ToleranceStudy.of(b, f)
                .thickness(0.05, ToleranceStudy.Spread.NORMAL)
                .conductivity(0.10, ToleranceStudy.Spread.UNIFORM)
                .permeability(0.30, ToleranceStudy.Spread.NORMAL);
        frequency = Frequency.ofKilohertz(20);
    }

    /**
     * Baseline: the random draws alone (six per sample, as the study makes for two layers).
     *
     * @return a sum of the draws
     */
    @Benchmark
    public double baselineDraws() {
        SplittableRandom r = new SplittableRandom(42);
        double s = 0;
        for (int i = 0; i < SAMPLES * 6; i++) {
            s += r.nextDouble();
        }
        return s;
    }

    /**
     * The full study: 100 000 samples, parallel, sorted, with percentiles.
     *
     * @return the 5th percentile
     */
    @Benchmark
    public double hundredThousandSamples() {
        ToleranceResult r = study.at(frequency).toMeet(Decibels.of(40)).samples(SAMPLES).seed(42L).run();
        return r.percentileDb(5);
    }
}
