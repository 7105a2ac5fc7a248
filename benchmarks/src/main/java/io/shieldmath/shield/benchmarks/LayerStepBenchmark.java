/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.internal.ChainMatrix;
import io.shieldmath.shield.internal.SpectralChain;
import io.shieldmath.shield.internal.SpectralRule;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import java.util.List;
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
 * Should the planar and the coil-coupling kernels share their per-layer step? The library's
 * kernels, which keep the running 2×2 complex product in eight local variables
 * ({@link #planarInline}, baseline, and {@link #spectralInline}, baseline), against the same
 * kernels with the step moved into one shared static method that keeps the product in a
 * {@code double[8]} ({@link SharedStepKernels}): with the array made per call, as the
 * library's single-point call would have to ({@link #planarSharedNewArray}), with an array
 * handed in by the caller ({@link #planarSharedScratch}), and in the spectral sum with the
 * product in the kernel's scratch array ({@link #spectralShared}). Same inputs (the stacks of
 * {@link Scenarios} in a plane wave at 10 kHz; for the spectral sum two 20 mm loops 40 mm
 * apart at 10 kHz, an invented bench case); the setup checks that each variant gives
 * bit-identical results to its baseline.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(2)
public class LayerStepBenchmark {

    /** The number of layers of the {@link Scenarios} stack. */
    @Param({"1", "3", "5"})
    public int layers;

    private double[] t;
    private double[] sigma;
    private double[] eps;
    private PermeabilityModel[] mu;
    private double zr;
    private double zi;
    /** The frequency in Hz, read from a field so that it is not a constant. */
    private double hz;
    private double[] product;
    private SpectralRule rule;
    private double[] spectralScratch;
    private double[] sharedScratch;
    private double[] out;

    /** Builds the arrays and checks that every shared variant is bit-identical to its baseline. */
    @Setup
    public void setUp() {
        Barrier barrier = Scenarios.stack(layers);
        List<Layer> ls = barrier.layers();
        int n = ls.size();
        t = new double[n];
        sigma = new double[n];
        eps = new double[n];
        mu = new PermeabilityModel[n];
        for (int i = 0; i < n; i++) {
            t[i] = ls.get(i).thickness().toMetres();
            sigma[i] = ls.get(i).medium().conductivity().toSiemensPerMetre();
            eps[i] = ls.get(i).medium().permittivity().value();
            mu[i] = ls.get(i).medium().permeability();
        }
        hz = Scenarios.POINT_HZ;
        IncidentField field = IncidentField.planeWave();
        zr = field.impedanceReal(hz);
        zi = field.impedanceImaginary(hz);
        product = new double[SharedStepKernels.PRODUCT_SLOTS];
        double[] loop = {0.02};
        double[] depth = {0};
        rule = new SpectralRule(loop, depth, 10, loop, depth, 10, 0.04);
        spectralScratch = new double[SpectralChain.SLOTS * n];
        sharedScratch = new double[SpectralChain.SLOTS * n + SharedStepKernels.PRODUCT_SLOTS];
        out = new double[4];
        same("planar, new array", planarInline(), planarSharedNewArray());
        same("planar, scratch", planarInline(), planarSharedScratch());
        same("spectral", spectralInline(), spectralShared());
    }

    private static void same(String what, double baseline, double shared) {
        if (Double.doubleToLongBits(baseline) != Double.doubleToLongBits(shared)) {
            throw new IllegalStateException(what + ": inline step gives " + baseline + ", shared step " + shared);
        }
    }

    /**
     * Baseline: the library's planar kernel, product in local variables.
     *
     * @return ln |T|
     */
    @Benchmark
    public double planarInline() {
        return ChainMatrix.logTransmission(t, sigma, eps, mu, hz, zr, zi, null);
    }

    /**
     * The planar kernel with the shared step, a new {@code double[8]} per call.
     *
     * @return ln |T|
     */
    @Benchmark
    public double planarSharedNewArray() {
        return SharedStepKernels.logTransmission(t, sigma, eps, mu, hz, zr, zi, null);
    }

    /**
     * The planar kernel with the shared step, the caller's {@code double[8]}.
     *
     * @return ln |T|
     */
    @Benchmark
    public double planarSharedScratch() {
        return SharedStepKernels.logTransmission(t, sigma, eps, mu, hz, zr, zi, product);
    }

    /**
     * Baseline: the library's spectral sum (one frequency of the coil coupling).
     *
     * @return the real part of the scaled sum
     */
    @Benchmark
    public double spectralInline() {
        SpectralChain.sum(rule, t, sigma, mu, hz, spectralScratch, out);
        return out[0] + out[1] + out[2];
    }

    /**
     * The spectral sum with the shared step.
     *
     * @return the real part of the scaled sum
     */
    @Benchmark
    public double spectralShared() {
        SharedStepKernels.spectralSum(rule, t, sigma, mu, hz, sharedScratch, out);
        return out[0] + out[1] + out[2];
    }
}
