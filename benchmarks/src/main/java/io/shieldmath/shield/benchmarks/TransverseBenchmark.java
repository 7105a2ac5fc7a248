/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.SensorRegion;
import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.axisymmetric.numerics.HarmonicSolve;
import io.shieldmath.shield.axisymmetric.numerics.Layout;
import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.axisymmetric.numerics.TransverseEddySolve;
import io.shieldmath.shield.axisymmetric.numerics.TransverseField;
import io.shieldmath.shield.axisymmetric.numerics.TransverseSolve;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * A static field across the axis against one along it, on the same invented sensor can:
 * µr 20 000, no conductivity, inner radius 20 mm, wall 1 mm, 42 mm long, both caps, sensor
 * cylinder 5 mm by 10 mm at the centre. The target: a transverse solve at most 3× an axial one.
 * <ul>
 *   <li>{@link #baseline}: the axial static result through the public API (two meshes,
 *       fineness 1/√2 and 1, worst factor over the sensor region);</li>
 *   <li>{@link #transverse}: the transverse static result, the same way;</li>
 *   <li>{@link #axialSolve} and {@link #transverseSolve}: assembly, factorisation and one
 *       solve with refinement on one prebuilt mesh (fineness 1), the numerical core alone;</li>
 *   <li>{@link #axialEddySolve} and {@link #transverseEddySolve}: the same at 50 Hz with the
 *       can conducting (1.6 MS/m), on one prebuilt mesh graded for 50 Hz (fineness 0.7): the
 *       axial solve against the transverse vector-potential solve with eddy currents.</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class TransverseBenchmark {

    static final double MU = 20_000;
    static final double RADIUS = 0.020;
    static final double WALL = 0.001;
    static final double LENGTH = 0.042;
    static final double SIGMA = 1.6e6;
    static final double HERTZ = 50;

    private Arrangement can;
    private SensorRegion region;
    private Mesh mesh;
    private Mesh eddyMesh;

    /** Builds the can and one mesh. */
    @Setup
    public void setUp() {
        Medium alloy = Medium.conductor("alloy", Conductivity.ZERO, MU);
        can = Arrangement.of(Body.can("can", alloy, Length.ofMetres(RADIUS), Length.ofMetres(WALL),
                Length.ofMetres(LENGTH)));
        region = SensorRegion.cylinder(Length.ofMillimetres(5), Length.ofMillimetres(10));
        // The can as the mesher sees it: side wall and two caps, one material.
        double zc = LENGTH / 2 - WALL;
        Layout layout = new Layout(new double[] {RADIUS, 0, 0}, new double[] {RADIUS + WALL, RADIUS + WALL, RADIUS + WALL},
                new double[] {-zc, -LENGTH / 2, zc}, new double[] {zc, -zc, LENGTH / 2}, new int[] {1, 1, 1},
                new double[] {0, 0}, new PermeabilityModel[] {PermeabilityModel.constant(1), PermeabilityModel.constant(MU)},
                new double[0], new double[0], new double[0], new double[0], new double[0], new double[] {0.005},
                new double[] {-0.005, 0.005});
        mesh = new Mesh(layout, new double[] {0}, 1, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
        Layout conducting = new Layout(new double[] {RADIUS, 0, 0},
                new double[] {RADIUS + WALL, RADIUS + WALL, RADIUS + WALL}, new double[] {-zc, -LENGTH / 2, zc},
                new double[] {zc, -zc, LENGTH / 2}, new int[] {1, 1, 1}, new double[] {0, SIGMA},
                new PermeabilityModel[] {PermeabilityModel.constant(1), PermeabilityModel.constant(MU)},
                new double[0], new double[0], new double[0], new double[0], new double[0], new double[] {0.005},
                new double[] {-0.005, 0.005});
        eddyMesh = new Mesh(conducting, new double[] {HERTZ}, 0.7, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
    }

    /**
     * The axial static result over the sensor region.
     *
     * @return the worst shielding in dB
     */
    @Benchmark
    public double baseline() {
        return can.inUniformAxialField().sensing(region).magnetostatic().shieldingEffectivenessDb();
    }

    /**
     * The transverse static result over the sensor region.
     *
     * @return the worst shielding in dB
     */
    @Benchmark
    public double transverse() {
        return can.inUniformTransverseField().sensing(region).magnetostatic().shieldingEffectivenessDb();
    }

    /**
     * The axial numerical core on the prebuilt mesh.
     *
     * @return B_z at the centre, per tesla applied
     */
    @Benchmark
    public double axialSolve() {
        Field f = new HarmonicSolve(mesh, 0, false).uniformField();
        double[] out = new double[6];
        f.evaluate(0, 0, out);
        return out[4];
    }

    /**
     * The transverse numerical core on the prebuilt mesh.
     *
     * @return h_r at the centre, per unit applied field
     */
    @Benchmark
    public double transverseSolve() {
        TransverseField f = new TransverseSolve(mesh, 0, false).uniformField();
        double[] out = new double[6];
        f.evaluate(0, 0, out);
        return out[0];
    }

    /**
     * The axial solve at 50 Hz with eddy currents on the prebuilt 50 Hz mesh.
     *
     * @return B_z at the centre, per tesla applied
     */
    @Benchmark
    public double axialEddySolve() {
        Field f = new HarmonicSolve(eddyMesh, HERTZ, false).uniformField();
        double[] out = new double[6];
        f.evaluate(0, 0, out);
        return out[4];
    }

    /**
     * The transverse solve at 50 Hz with eddy currents on the same mesh.
     *
     * @return b_r at the centre, per tesla applied
     */
    @Benchmark
    public double transverseEddySolve() {
        TransverseField f = new TransverseEddySolve(eddyMesh, HERTZ, false, Integer.MAX_VALUE, Long.MAX_VALUE)
                .uniformField();
        double[] out = new double[6];
        f.evaluate(0, 0, out);
        return out[0];
    }
}
