/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

/** The primitive complex LU against Commons Math's real LU of the equivalent 2n × 2n system. */
class ComplexLuTest {

    /** Solves (A + jB)(x + jy) = (c + jd) as [[A, −B], [B, A]]·[x; y] = [c; d] with Commons Math. */
    static double[][] commonsMath(double[][] a, double[][] b, double[] c, double[] d) {
        int n = c.length;
        double[][] m = new double[2 * n][2 * n];
        double[] rhs = new double[2 * n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                m[i][k] = a[i][k];
                m[i][n + k] = -b[i][k];
                m[n + i][k] = b[i][k];
                m[n + i][n + k] = a[i][k];
            }
            rhs[i] = c[i];
            rhs[n + i] = d[i];
        }
        RealVector s = new LUDecomposition(new Array2DRowRealMatrix(m, false), 1e-300).getSolver()
                .solve(new ArrayRealVector(rhs, false));
        double[][] out = new double[2][n];
        for (int i = 0; i < n; i++) {
            out[0][i] = s.getEntry(i);
            out[1][i] = s.getEntry(n + i);
        }
        return out;
    }

    @Test
    void randomSystemsNeedingRowInterchangesAgreeWithCommonsMath() {
        Random r = new Random(20261202);
        for (int trial = 0; trial < 20; trial++) {
            int n = 1 + r.nextInt(30);
            double[][] a = new double[n][n];
            double[][] b = new double[n][n];
            double[] ar = new double[n * n];
            double[] ai = new double[n * n];
            double[] c = new double[n];
            double[] d = new double[n];
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < n; k++) {
                    // Every other row has a zero diagonal, so the pivot search must swap rows.
                    boolean zero = i == k && i % 2 == 1;
                    a[i][k] = zero ? 0 : r.nextGaussian();
                    b[i][k] = zero ? 0 : r.nextGaussian();
                    ar[i * n + k] = a[i][k];
                    ai[i * n + k] = b[i][k];
                }
                c[i] = r.nextGaussian();
                d[i] = r.nextGaussian();
            }
            double[] xr = c.clone();
            double[] xi = d.clone();
            assertTrue(ComplexLu.solve(ar, ai, xr, xi));
            double[][] ref = commonsMath(a, b, c, d);
            double size = 0;
            for (int i = 0; i < n; i++) {
                size = Math.max(size, Math.hypot(ref[0][i], ref[1][i]));
            }
            for (int i = 0; i < n; i++) {
                assertEquals(ref[0][i], xr[i], 1e-9 * size, "trial " + trial);
                assertEquals(ref[1][i], xi[i], 1e-9 * size, "trial " + trial);
            }
        }
    }

    @Test
    void singularSystemIsReported() {
        double[] ar = {1, 2, 2, 4};
        double[] ai = {0, 0, 0, 0};
        assertFalse(ComplexLu.solve(ar, ai, new double[] {1, 1}, new double[] {0, 0}));
    }

    @Test
    void discCellCurrentsAgreeWithCommonsMath() {
        // (R + jωL)·i = −jω·m for a real disc case, solved both ways.
        DiscCoupling c = CoupledCircuitDisc.of(0.05, 0.8e-3, 0, 2.5e7).gradedCells(12, 3, 2, 1.5)
                .between(Winding.loop(0.015, -0.012, 1), Winding.loop(0.01, 0.006, 1));
        double hz = 2e4;
        double w = 2 * Math.PI * hz;
        double[][] l = c.cellInductances();
        double[] res = c.cellResistances();
        double[] m = c.transmitterCouplings();
        int n = m.length;
        double[][] a = new double[n][n];
        double[][] b = new double[n][n];
        double[] rhsRe = new double[n];
        double[] rhsIm = new double[n];
        for (int i = 0; i < n; i++) {
            a[i][i] = res[i];
            for (int k = 0; k < n; k++) {
                b[i][k] = w * l[i][k];
            }
            rhsIm[i] = -w * m[i];
        }
        double[][] ref = commonsMath(a, b, rhsRe, rhsIm);
        DiscCouplingResult r = c.at(hz);
        for (int k = 0; k < n; k++) {
            double size = Math.hypot(ref[0][k], ref[1][k]);
            assertEquals(0, r.cellCurrentPerAmpere(k).subtract(new org.apache.commons.math3.complex.Complex(ref[0][k],
                    ref[1][k])).abs(), 1e-9 * size + 1e-15, "cell " + k);
        }
    }
}
