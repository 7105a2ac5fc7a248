/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.m;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Static nested shells against the exact boundary-value solution, solved here independently of the
 * engine as one linear system with Commons Math LU decomposition. In every region the scalar
 * potential is Φ = (A·r + B/r^m)·cos θ (m = 2 sphere, m = 1 cylinder across the field); Φ and
 * µr·∂Φ/∂r are continuous at every boundary; the cavity has B = 0 and the outside A = 1; the
 * shielding factor is S = 1/A_cavity (standard magnetostatic boundary-value problem, e.g.
 * J. D. Jackson, Classical Electrodynamics, 3rd ed., §5.12, extended to several shells).
 */
class NestedShellExactTest {

    /** S of walls [r_i, r_i + t_i] of permeability mu_i, air between them. */
    static double exact(int m, double[] inner, double[] outer, double[] mu) {
        int walls = inner.length;
        // Regions: 0 cavity, then wall, gap, wall, ..., wall, outside. Boundaries: 2 per wall.
        int regions = 2 * walls + 1;
        double[] boundary = new double[2 * walls];
        double[] regionMu = new double[regions];
        for (int w = 0; w < walls; w++) {
            boundary[2 * w] = inner[w];
            boundary[2 * w + 1] = outer[w];
            regionMu[2 * w + 1] = mu[w];
        }
        for (int k = 0; k < regions; k += 2) {
            regionMu[k] = 1;
        }
        // Unknowns: A0, then (A_k, B_k) for k = 1 .. regions−2, then B_last (A_last = 1).
        int unknowns = 1 + 2 * (regions - 2) + 1;
        RealMatrix a = new Array2DRowRealMatrix(unknowns, unknowns);
        RealVector rhs = new ArrayRealVector(unknowns);
        int row = 0;
        for (int j = 0; j < boundary.length; j++) {
            double r = boundary[j];
            int left = j;
            int right = j + 1;
            // Φ continuity: A_l r + B_l r^-m − A_r r − B_r r^-m = 0
            // flux: µ_l (A_l − m B_l r^-(m+1)) − µ_r (A_r − m B_r r^-(m+1)) = 0
            double rm = Math.pow(r, -m);
            double rm1 = m * Math.pow(r, -(m + 1));
            put(a, rhs, row, left, regions, r, rm, 1);
            put(a, rhs, row + 1, left, regions, regionMu[left], -regionMu[left] * rm1, 1);
            put(a, rhs, row, right, regions, r, rm, -1);
            put(a, rhs, row + 1, right, regions, regionMu[right], -regionMu[right] * rm1, -1);
            row += 2;
        }
        RealVector x = new LUDecomposition(a).getSolver().solve(rhs);
        return 1 / x.getEntry(0);
    }

    /** Adds sign·(cA·A_k + cB·B_k) to the row; known A of the outside goes to the right-hand side. */
    private static void put(RealMatrix a, RealVector rhs, int row, int region, int regions, double cA, double cB,
                            double sign) {
        if (region == 0) {
            a.addToEntry(row, 0, sign * cA);          // the cavity has no B term
        } else if (region == regions - 1) {
            rhs.addToEntry(row, -sign * cA);           // A_outside = 1
            a.addToEntry(row, a.getColumnDimension() - 1, sign * cB);
        } else {
            int base = 1 + 2 * (region - 1);
            a.addToEntry(row, base, sign * cA);
            a.addToEntry(row, base + 1, sign * cB);
        }
    }

    @ParameterizedTest
    @CsvSource({
        // geometry, inner radius (m), wall thickness (m), gap (m), µr of the two walls (demo values)
        "SPHERE,              0.10, 0.001, 0.05,  30000, 30000",
        "SPHERE,              0.05, 0.002, 0.003, 5000,  200",
        "SPHERE,              0.20, 0.0005, 0.1,  80,    40000",
        "CYLINDER_TRANSVERSE, 0.05, 0.001, 0.02,  40000, 40000",
        "CYLINDER_TRANSVERSE, 0.03, 0.002, 0.004, 300,   9000",
    })
    void twoWallsMatchTheBoundaryValueSolution(ShellGeometry g, double a, double t, double gap, double mu1,
                                               double mu2) {
        Shell s = (g == ShellGeometry.SPHERE ? Shell.sphere(m(a)) : Shell.cylinderTransverse(m(a)))
                .wall(ShellStaticTest.magnetic(mu1), m(t)).thenGap(m(gap)).then(ShellStaticTest.magnetic(mu2), m(t));
        double expected = exact(g == ShellGeometry.SPHERE ? 2 : 1, new double[] {a, a + t + gap},
                new double[] {a + t, a + 2 * t + gap}, new double[] {mu1, mu2});
        assertEquals(expected, s.staticShielding().factor(), 1e-6 * expected, s::toString);
    }

    @ParameterizedTest
    @CsvSource({"SPHERE", "CYLINDER_TRANSVERSE"})
    void threeWallsAndTheSingleWallReduction(ShellGeometry g) {
        int m = g == ShellGeometry.SPHERE ? 2 : 1;
        Shell three = (g == ShellGeometry.SPHERE ? Shell.sphere(m(0.04)) : Shell.cylinderTransverse(m(0.04)))
                .wall(ShellStaticTest.magnetic(20_000), m(0.001)).thenGap(m(0.01))
                .then(ShellStaticTest.magnetic(5_000), m(0.0015)).thenGap(m(0.02))
                .then(ShellStaticTest.magnetic(50_000), m(0.001));
        double expected = exact(m, new double[] {0.04, 0.051, 0.0725}, new double[] {0.041, 0.0525, 0.0735},
                new double[] {20_000, 5_000, 50_000});
        assertEquals(expected, three.staticShielding().factor(), 1e-6 * expected);
        // One wall: Jackson's closed forms (the reference itself checked against them).
        double sphere = ShellStaticTest.jacksonSphere(1000, 0.1, 0.102);
        assertEquals(sphere, exact(2, new double[] {0.1}, new double[] {0.102}, new double[] {1000}), 1e-9 * sphere);
    }
}
