/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.AxialFieldShielding;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.SaturationStudy;
import io.shieldmath.shield.materials.MagnetizationCurves;
import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * The nonlinear (saturation) static solve against the linear one on the same meshes, on an
 * invented sensor can: 80 % nickel-iron (the built-in curve), inner radius 20 mm, wall 1 mm,
 * 42 mm long, both caps, in a uniform axial field. Every method solves the same mesh pair
 * (fineness 1/√2 and 1, about 3 400 and 6 400 unknowns).
 * <ul>
 *   <li>{@link #baseline}: the linear solve, µr the curve's initial value;</li>
 *   <li>{@link #lowField}: 1 A/m, the wall far below the knee (Newton from the linear start);</li>
 *   <li>{@link #belowKnee}: 6 kA/m, the wall at about half of its saturation flux density;</li>
 *   <li>{@link #pastKnee}: 20 kA/m, most of the wall above 80 % of saturation.</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SaturationBenchmark {

    private AxialFieldShielding linear;
    private SaturationStudy study;

    /** Builds the can and its study. */
    @Setup
    public void setUp() {
        MagnetizationCurve curve = MagnetizationCurves.builtIn().get("nickel-iron-80");
        Medium alloy = Medium.conductor("alloy", Conductivity.ZERO, curve.initialPermeability());
        linear = Arrangement.of(Body.can("can", alloy, Length.ofMillimetres(20), Length.ofMillimetres(1),
                Length.ofMillimetres(42))).inUniformAxialField();
        study = SaturationStudy.of(linear).withCurve("can", curve);
    }

    /**
     * The linear static solve on the same meshes.
     *
     * @return the worst shielding in dB
     */
    @Benchmark
    public double baseline() {
        return linear.magnetostatic().worstShieldingDb().value();
    }

    /**
     * The nonlinear solve at 1 A/m.
     *
     * @return the worst shielding in dB
     */
    @Benchmark
    public double lowField() {
        return study.magnetostatic(MagneticFieldStrength.ofAmperesPerMetre(1)).worstShieldingDb().value();
    }

    /**
     * The nonlinear solve at 6 kA/m.
     *
     * @return the worst shielding in dB
     */
    @Benchmark
    public double belowKnee() {
        return study.magnetostatic(MagneticFieldStrength.ofAmperesPerMetre(6000)).worstShieldingDb().value();
    }

    /**
     * The nonlinear solve at 20 kA/m.
     *
     * @return the worst shielding in dB
     */
    @Benchmark
    public double pastKnee() {
        return study.magnetostatic(MagneticFieldStrength.ofAmperesPerMetre(20000)).worstShieldingDb().value();
    }
}
