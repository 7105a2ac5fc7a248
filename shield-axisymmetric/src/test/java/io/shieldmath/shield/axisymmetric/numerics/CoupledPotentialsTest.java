/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.PermeabilityModel;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The coupled vector/scalar-potential solve with eddy currents ({@link TransverseEddySolve})
 * against the vector potential carried through the whole mesh ({@link EdgeEverywhereSolve},
 * the formulation it replaced, kept here as a second, differently discretised solve of the
 * same problem), on the same meshes. The two discretisations differ in the air, so they agree
 * only in the limit: their difference must shrink under refinement. The physics checks
 * against exact solutions are in {@code TransverseEddyCurrentTest}.
 */
class CoupledPotentialsTest {

    private static final double RADIUS = 0.010;
    private static final double WALL = 0.001;
    private static final double LENGTH = 0.352;

    /** A copper tube (58 MS/m, µr 1), a = 10 mm, wall 1 mm, 352 mm long, keyed at the centre. */
    private static Layout copperTube() {
        return new Layout(new double[] {RADIUS}, new double[] {RADIUS + WALL}, new double[] {-LENGTH / 2},
                new double[] {LENGTH / 2}, new int[] {1}, new double[] {0, 58e6},
                new PermeabilityModel[] {PermeabilityModel.constant(1), PermeabilityModel.constant(1)},
                new double[0], new double[0], new double[0], new double[0], new double[0], new double[0],
                new double[] {0});
    }

    private static double centreFactor(TransverseField f) {
        double[] out = new double[6];
        f.evaluate(0, 0, out);
        return 1 / Math.hypot(out[0], out[1]);
    }

    @Test
    void bothFormulationsConvergeToOneAnother() {
        // Observed ratios of successive differences about 0.5 (first order in h for the point
        // values of the edge-element field); 0.75 leaves room, a non-shrinking difference fails.
        double[] q = {0.35, 0.5, 0.5 * Math.sqrt(2), 1};
        double[] diff = new double[q.length];
        StringBuilder table = new StringBuilder("copper tube, 10 kHz: q   coupled   vector everywhere   unknowns\n");
        for (int k = 0; k < q.length; k++) {
            Mesh mesh = new Mesh(copperTube(), new double[] {1e4}, q[k], 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
            TransverseEddySolve coupled = new TransverseEddySolve(mesh, 1e4, false, Integer.MAX_VALUE, Long.MAX_VALUE);
            EdgeEverywhereSolve edges = new EdgeEverywhereSolve(mesh, 1e4, false, Integer.MAX_VALUE, Long.MAX_VALUE);
            double a = centreFactor(coupled.uniformField());
            double b = centreFactor(edges.uniformField());
            diff[k] = Math.abs(a - b);
            table.append(String.format(Locale.ROOT, "  %5.3f   %.5f   %.5f   %d / %d%n", q[k], a, b, coupled.unknowns(),
                    edges.unknowns()));
            assertTrue(coupled.unknowns() < 0.7 * edges.unknowns(), table.toString());
        }
        System.out.print(table);
        for (int k = 1; k < q.length; k++) {
            assertTrue(diff[k] < 0.75 * diff[k - 1], table.toString());
        }
    }

    @Test
    void aHighPermeabilityConductingCanSolvesToRounding() {
        // µr 20 000, 1.6 MS/m, a = 20 mm, wall 1 mm, 42 mm, both caps, at 50 Hz: entries of the
        // matrix span many decades (1/µr and the graded wall's small elements against the air);
        // the quasi-definite
        // factorisation and one refinement step must still leave a residual near rounding.
        double zc = 0.021 - 0.001;
        Layout can = new Layout(new double[] {0.020, 0, 0}, new double[] {0.021, 0.021, 0.021},
                new double[] {-zc, -0.021, zc}, new double[] {zc, -zc, 0.021}, new int[] {1, 1, 1},
                new double[] {0, 1.6e6},
                new PermeabilityModel[] {PermeabilityModel.constant(1), PermeabilityModel.constant(20_000)},
                new double[0], new double[0], new double[0], new double[0], new double[0], new double[] {0.005},
                new double[] {-0.005, 0.005});
        Mesh mesh = new Mesh(can, new double[] {50}, 0.7, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
        TransverseEddySolve s = new TransverseEddySolve(mesh, 50, false, Integer.MAX_VALUE, Long.MAX_VALUE);
        TransverseField f = s.uniformField();
        System.out.printf(Locale.ROOT, "high-µ can at 50 Hz: %d unknowns (axial %d), %d entries (axial band %d),"
                + " residual %.2e -> %.2e, pivot ratio %.2e%n", s.unknowns(), mesh.n, s.storedEntries(),
                (long) mesh.n * (mesh.band + 1), f.residualBeforeRefinement(), f.residualAfterRefinement(),
                s.pivotRatio());
        assertTrue(f.residualAfterRefinement() < 1e-10, "residual " + f.residualAfterRefinement());
        assertTrue(s.pivotRatio() > 0);
        // Every body as air: the applied field to rounding, everywhere (the scalar potential
        // −r lies in the discrete space); B0 along φ = 0 has b_r = 1, b_φ = −1, b_z = 0.
        TransverseField air = new TransverseEddySolve(mesh, 50, true, Integer.MAX_VALUE, Long.MAX_VALUE).uniformField();
        double[] out = new double[6];
        for (double[] p : new double[][] {{0, 0}, {0.0205, 0}, {0.01, 0.0205}, {0.03, -0.05}}) {
            air.evaluate(p[0], p[1], out);
            assertEquals(1, out[0], 1e-9);
            assertEquals(-1, out[2], 1e-9);
            assertEquals(0, out[4], 1e-9);
        }
    }
}
