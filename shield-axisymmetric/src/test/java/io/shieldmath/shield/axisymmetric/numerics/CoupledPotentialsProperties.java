/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.PermeabilityModel;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The coupled solve with eddy currents on random arrangements of rings (some touching the
 * axis, some touching each other, conducting or not, magnetic or not) at random frequencies,
 * against the reference formulation on the same mesh: both must return a finite field whose
 * residual is at rounding, and agree at the centre within the discretisation difference of
 * two formulations on a coarse mesh, and change little from a coarser mesh to this one.
 * Random data, invented; the sequence of cases is fixed (checked over its first 400: none
 * failed).
 */
class CoupledPotentialsProperties {

    static final int TRIES = Math.max(5, Integer.getInteger("shield.tries", 10_000) / 250);

    /** Grids above this many nodes are skipped (the reference formulation's band is wide). */
    private static final int MAX_NODES = 6000;

    @Test
    void randomArrangementsSolveLikeTheReferenceFormulation() {
        java.util.concurrent.atomic.AtomicInteger checked = new java.util.concurrent.atomic.AtomicInteger();
        // A fixed sequence of cases, not QuickTheories' random draw: a failure names its seed and
        // reproduces, and no shrinking (each case solves three systems) can stall the build.
        Random seeds = new Random(11);
        for (int trial = 0; trial < TRIES; trial++) {
            long seed = seeds.nextLong();
            Random rnd = new Random(seed);
            int bodies = 1 + rnd.nextInt(3);
            double[] r0 = new double[bodies];
            double[] r1 = new double[bodies];
            double[] z0 = new double[bodies];
            double[] z1 = new double[bodies];
            int[] material = new int[bodies];
            double[] sigma = new double[bodies + 1];
            PermeabilityModel[] mu = new PermeabilityModel[bodies + 1];
            mu[0] = PermeabilityModel.constant(1);
            boolean conducts = false;
            double z = -0.02;
            StringBuilder what = new StringBuilder("seed " + seed + ":");
            for (int k = 0; k < bodies; k++) {
                // Stacked along z, touching the one below half of the time; from the axis or not.
                r0[k] = rnd.nextBoolean() ? 0 : 0.001 + 0.01 * rnd.nextDouble();
                r1[k] = r0[k] + 0.0005 + 0.01 * rnd.nextDouble();
                z0[k] = z + (rnd.nextBoolean() ? 0 : 0.001 + 0.005 * rnd.nextDouble());
                z1[k] = z0[k] + 0.0005 + 0.01 * rnd.nextDouble();
                z = z1[k];
                material[k] = k + 1;
                sigma[k + 1] = rnd.nextInt(4) == 0 ? 0 : Math.pow(10, 5 + 2.8 * rnd.nextDouble());
                conducts |= sigma[k + 1] > 0;
                double mur = rnd.nextBoolean() ? 1 : Math.pow(10, 3.3 * rnd.nextDouble());
                mu[k + 1] = PermeabilityModel.constant(mur);
                what.append(String.format(Locale.ROOT, " [r %.4f–%.4f z %.4f–%.4f σ %.3g µr %.4g]", r0[k], r1[k],
                        z0[k], z1[k], sigma[k + 1], mur));
            }
            if (!conducts) {
                sigma[1] = 1e6;
            }
            double hz = Math.pow(10, 4 * rnd.nextDouble());
            // Keep every conductor within five skin depths of thickness, so that the reference
            // formulation's mesh and band stay small (a test-time limit, not a solver one).
            for (int k = 0; k < bodies; k++) {
                double t = Math.min(r1[k] - r0[k], z1[k] - z0[k]);
                double muSigma = 4e-7 * Math.PI * mu[k + 1].real(0) * sigma[k + 1];
                if (muSigma > 0) {
                    hz = Math.min(hz, 25 / (Math.PI * muSigma * t * t));
                }
            }
            what.append(String.format(Locale.ROOT, " at %.4g Hz", hz));
            Layout layout = new Layout(r0, r1, z0, z1, material, sigma, mu, new double[0], new double[0],
                    new double[0], new double[0], new double[0], new double[0], new double[0]);
            Mesh coarse = new Mesh(layout, new double[] {hz}, 0.35, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
            Mesh mesh = new Mesh(layout, new double[] {hz}, 0.5, 40, true, Integer.MAX_VALUE, Long.MAX_VALUE);
            if (mesh.nr * mesh.nz > MAX_NODES) {
                continue; // too slow for the reference's band solve in a unit test; counted below
            }
            checked.incrementAndGet();
            TransverseField before = new TransverseEddySolve(coarse, hz, false, Integer.MAX_VALUE, Long.MAX_VALUE)
                    .uniformField();
            TransverseField coupled = new TransverseEddySolve(mesh, hz, false, Integer.MAX_VALUE, Long.MAX_VALUE)
                    .uniformField();
            TransverseField edges = new EdgeEverywhereSolve(mesh, hz, false, Integer.MAX_VALUE, Long.MAX_VALUE)
                    .uniformField();
            assertTrue(coupled.residualAfterRefinement() < 1e-8, what + " residual " + coupled.residualAfterRefinement());
            // Points in air a little away from the bodies (next to a high-µ corner the point
            // values of both discretisations scatter with the mesh). The coupled solve must be
            // steady from fineness 0.35 to 0.5 (5 %) and agree with the reference within 15 %: the
            // reference's point values in air are those of edge elements, which jump by several
            // per cent from mesh to mesh on grids this coarse (seen: 1.22, 1.05, 1.16, 1.10
            // where the coupled solve gives 1.117, 1.124, 1.121, 1.122 at fineness 0.35 to 1).
            // Over 561 random arrangements the largest changes seen were 3.4 % and 13 %.
            double zp = 0.5 * (z0[0] + z);
            double[] a = new double[6];
            double[] b = new double[6];
            double[] c = new double[6];
            for (double[] p : new double[][] {{0.05, zp}, {0.03, zp + 0.02}, {0.004, z + 0.012}}) {
                coupled.evaluate(p[0], p[1], a);
                before.evaluate(p[0], p[1], c);
                edges.evaluate(p[0], p[1], b);
                double ma = magnitude(a);
                double mb = magnitude(b);
                double mc = magnitude(c);
                String at = String.format(Locale.ROOT, " at (%.3f, %.3f) m: |B| %.6f, coarser %.6f, reference %.6f",
                        p[0], p[1], ma, mc, mb);
                assertTrue(Double.isFinite(ma) && ma > 0, what + at);
                assertTrue(Math.abs(ma - mc) < 0.05 * ma, what + at);
                assertTrue(Math.abs(ma - mb) < 0.15 * mb, what + at);
            }
        }
        assertTrue(checked.get() >= TRIES / 2, checked.get() + " of " + TRIES + " arrangements small enough to check");
    }

    private static double magnitude(double[] v) {
        return Math.hypot(Math.hypot(v[0], v[1]), Math.hypot(Math.hypot(v[2], v[3]), Math.hypot(v[4], v[5])));
    }
}
