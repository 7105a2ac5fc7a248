/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingEvaluation;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.BesselJ;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.infra.Blackhole;

/**
 * One coil-to-coil frequency point through a single layer: two 20 mm loops 40 mm apart with
 * 0.5 mm of copper between them at 10 kHz (an invented bench case). The library's fixed
 * spectral rule ({@link #spectralRule}) against the straightforward way ({@link #baseline}):
 * Commons Math's adaptive Gauss–Legendre integration of the same integral, Commons Math
 * Bessel functions and a Complex transmission coefficient, to 1e-8 relative per interval.
 * {@link #spectralRuleWithGeometry} adds the one-off cost of building the rule for a new
 * coil pair.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class CoilCouplingBenchmark {

    private static final double RADIUS = 0.02;
    private static final double SPACING = 0.04;
    private static final double THICKNESS = 0.5e-3;
    private static final double SIGMA = 58e6;
    private static final double HERTZ = 1e4;

    private Coil coil;
    private Barrier barrier;
    private CouplingEvaluation evaluation;
    private double baselineFree;

    /** Builds the coils, the barrier and the evaluation once. */
    @Setup
    public void setUp() {
        coil = Coil.loop(Length.ofMetres(RADIUS), 10);
        barrier = Barrier.of(Medium.conductor("copper", Conductivity.ofSiemensPerMetre(SIGMA), 1),
                Length.ofMetres(THICKNESS));
        evaluation = CoilCouplingBenchmark.pair(coil).through(barrier);
        baselineFree = integrate(l -> kernel(l));
    }

    private static CoilPair pair(Coil c) {
        return CoilPair.coaxial(c, c, Length.ofMetres(SPACING));
    }

    /**
     * The library: one frequency point on the coil pair's precomputed rule.
     *
     * @param bh the sink
     */
    @Benchmark
    public void spectralRule(Blackhole bh) {
        bh.consume(evaluation.shieldingEffectivenessDb(HERTZ));
    }

    /**
     * The library including the rule for a new geometry (nodes and Bessel products).
     *
     * @param bh the sink
     */
    @Benchmark
    public void spectralRuleWithGeometry(Blackhole bh) {
        bh.consume(pair(coil).through(barrier).shieldingEffectivenessDb(HERTZ));
    }

    /**
     * The baseline: adaptive Commons Math quadrature of the same integral.
     *
     * @param bh the sink
     */
    @Benchmark
    public void baseline(Blackhole bh) {
        double re = integrate(l -> kernel(l) * transmission(l).getReal());
        double im = integrate(l -> kernel(l) * transmission(l).getImaginary());
        bh.consume(20 * Math.log10(baselineFree / Math.hypot(re, im)));
    }

    private static double kernel(double l) {
        double j = BesselJ.value(1, l * RADIUS);
        return PhysicalConstants.MU_0 * Math.PI * RADIUS * RADIUS * j * j * Math.exp(-l * SPACING);
    }

    /** e^{λt}·T(λ) of one layer: T = 2/(2·cosh γt + (z + 1/z)·sinh γt), z = λ/γ. */
    private static Complex transmission(double l) {
        double w = 2 * Math.PI * HERTZ;
        Complex gamma = new Complex(l * l, w * PhysicalConstants.MU_0 * SIGMA).sqrt();
        Complex z = new Complex(l).divide(gamma);
        Complex gt = gamma.multiply(THICKNESS);
        Complex s = gt.cosh().multiply(2).add(z.add(z.reciprocal()).multiply(gt.sinh()));
        return new Complex(2 * Math.exp(l * THICKNESS)).divide(s);
    }

    /** ∫0^{26/d} f dλ on intervals of a quarter oscillation period, each adaptive to 1e-8. */
    private static double integrate(UnivariateFunction f) {
        IterativeLegendreGaussIntegrator g = new IterativeLegendreGaussIntegrator(8, 1e-8, 1e-30, 2, 64);
        double top = 26 / SPACING;
        double step = Math.PI / (2 * RADIUS);
        double sum = 0;
        for (double lo = 0; lo < top; lo += step) {
            sum += g.integrate(Integer.MAX_VALUE, f, lo, Math.min(lo + step, top));
        }
        return sum;
    }
}
