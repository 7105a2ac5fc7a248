/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.ArrayFieldVector;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldVector;
import org.junit.jupiter.api.Test;

/**
 * The banded complex LDLᵀ against an independent implementation, Commons Math's dense LU
 * with partial pivoting over its Complex field, on random complex symmetric band matrices
 * with the structure of the finite-element matrix: real part symmetric positive definite,
 * imaginary part symmetric positive semidefinite (some rows without eddy current); and the
 * envelope form on random quasi-definite matrices with the structure of the coupled
 * vector/scalar-potential system (a block positive in its real part, a block negative, any
 * coupling between them).
 */
class BandedLdltProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 300);

    @Test
    void bandedLdltSolvesLikeDenseLuWithPivoting() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random rnd = new Random(seed);
            int n = 1 + rnd.nextInt(40);
            int b = rnd.nextInt(Math.min(n, 9));
            int w = b + 1;
            double[] re = new double[n * w];
            double[] im = new double[n * w];
            Complex[][] dense = new Complex[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    dense[i][j] = Complex.ZERO;
                }
            }
            // Off-diagonal entries in the band; the real diagonal dominates (so Re A is SPD) and
            // the imaginary part is a sum of PSD 2×2 blocks on random pairs, zero on some rows.
            double scale = Math.pow(10, rnd.nextInt(9) - 4);
            for (int i = 0; i < n; i++) {
                for (int k = Math.max(0, i - b); k < i; k++) {
                    double a = rnd.nextGaussian();
                    re[i * w + k - i + b] = a;
                    re[k * w + b] += Math.abs(a) + 0.1;
                    re[i * w + b] += Math.abs(a) + 0.1;
                    if (rnd.nextBoolean()) {
                        double c = scale * Math.abs(rnd.nextGaussian());
                        im[i * w + k - i + b] -= c;
                        im[i * w + b] += c;
                        im[k * w + b] += c;
                    }
                }
                re[i * w + b] += 0.5;
            }
            for (int i = 0; i < n; i++) {
                for (int k = Math.max(0, i - b); k <= i; k++) {
                    Complex v = new Complex(re[i * w + k - i + b], im[i * w + k - i + b]);
                    dense[i][k] = v;
                    dense[k][i] = v;
                }
            }
            double[] xr = new double[n];
            double[] xi = new double[n];
            Complex[] f = new Complex[n];
            for (int i = 0; i < n; i++) {
                xr[i] = rnd.nextGaussian();
                xi[i] = rnd.nextGaussian();
                f[i] = new Complex(xr[i], xi[i]);
            }
            FieldVector<Complex> ref = new FieldLUDecomposition<>(
                    new Array2DRowFieldMatrix<>(ComplexField.getInstance(), dense)).getSolver()
                    .solve(new ArrayFieldVector<>(f));
            double pivot = BandedLdlt.factor(n, b, re, im);
            BandedLdlt.solve(n, b, re, im, xr, xi);
            double diff = 0;
            double norm = 0;
            for (int i = 0; i < n; i++) {
                diff += Math.pow(xr[i] - ref.getEntry(i).getReal(), 2) + Math.pow(xi[i] - ref.getEntry(i).getImaginary(), 2);
                norm += Math.pow(ref.getEntry(i).abs(), 2);
            }
            assertTrue(pivot > 0, "pivot ratio " + pivot);
            assertTrue(Math.sqrt(diff / norm) < 1e-10, "seed " + seed + " n " + n + " b " + b + ": " + Math.sqrt(diff / norm));
        });
    }

    @Test
    void realFactorisationMatchesTheComplexOneOnRealMatrices() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random rnd = new Random(seed);
            int n = 1 + rnd.nextInt(40);
            int b = rnd.nextInt(Math.min(n, 9));
            int w = b + 1;
            double[] re = new double[n * w];
            for (int i = 0; i < n; i++) {
                for (int k = Math.max(0, i - b); k < i; k++) {
                    double a = rnd.nextGaussian();
                    re[i * w + k - i + b] = a;
                    re[k * w + b] += Math.abs(a) + 0.1;
                    re[i * w + b] += Math.abs(a) + 0.1;
                }
                re[i * w + b] += 0.5;
            }
            double[] re2 = re.clone();
            double[] im2 = new double[n * w];
            double[] xr = new double[n];
            double[] xi = new double[n];
            for (int i = 0; i < n; i++) {
                xr[i] = rnd.nextGaussian();
                xi[i] = rnd.nextGaussian();
            }
            double[] yr = xr.clone();
            double[] yi = xi.clone();
            BandedLdlt.factorReal(n, b, re);
            BandedLdlt.solveReal(n, b, re, xr, xi);
            BandedLdlt.factor(n, b, re2, im2);
            BandedLdlt.solve(n, b, re2, im2, yr, yi);
            for (int i = 0; i < n; i++) {
                assertTrue(Math.abs(xr[i] - yr[i]) <= 1e-12 * (1 + Math.abs(yr[i])), "seed " + seed);
                assertTrue(Math.abs(xi[i] - yi[i]) <= 1e-12 * (1 + Math.abs(yi[i])), "seed " + seed);
            }
        });
    }

    @Test
    void envelopeLdltSolvesQuasiDefiniteSystemsLikeDenseLuWithPivoting() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random rnd = new Random(seed);
            int n = 1 + rnd.nextInt(40);
            int[] first = new int[n];
            boolean[] potentialA = new boolean[n];
            for (int i = 0; i < n; i++) {
                first[i] = i - rnd.nextInt(Math.min(i, 12) + 1);
                potentialA[i] = rnd.nextBoolean();
            }
            int[] diag = BandedLdlt.envelopeDiagonals(first);
            double[] re = new double[diag[n - 1] + 1];
            double[] im = new double[re.length];
            double scale = Math.pow(10, rnd.nextInt(7) - 3);
            // The positive block (vector potential) and the negative one (scalar potential)
            // are each diagonally dominant; couplings between the blocks are free; the
            // imaginary part is a sum of PSD 2×2 blocks within the positive block.
            for (int i = 0; i < n; i++) {
                for (int k = first[i]; k < i; k++) {
                    double a = rnd.nextGaussian();
                    re[diag[i] - i + k] = a;
                    if (potentialA[i] == potentialA[k]) {
                        double sign = potentialA[i] ? 1 : -1;
                        re[diag[i]] += sign * (Math.abs(a) + 0.1);
                        re[diag[k]] += sign * (Math.abs(a) + 0.1);
                        if (potentialA[i] && rnd.nextBoolean()) {
                            double c = scale * Math.abs(rnd.nextGaussian());
                            im[diag[i] - i + k] -= c;
                            im[diag[i]] += c;
                            im[diag[k]] += c;
                        }
                    }
                }
                re[diag[i]] += potentialA[i] ? 0.5 : -0.5;
            }
            Complex[][] dense = new Complex[n][n];
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < n; k++) {
                    dense[i][k] = Complex.ZERO;
                }
            }
            for (int i = 0; i < n; i++) {
                for (int k = first[i]; k <= i; k++) {
                    Complex v = new Complex(re[diag[i] - i + k], im[diag[i] - i + k]);
                    dense[i][k] = v;
                    dense[k][i] = v;
                }
            }
            double[] xr = new double[n];
            double[] xi = new double[n];
            Complex[] f = new Complex[n];
            for (int i = 0; i < n; i++) {
                xr[i] = rnd.nextGaussian();
                xi[i] = rnd.nextGaussian();
                f[i] = new Complex(xr[i], xi[i]);
            }
            FieldVector<Complex> ref = new FieldLUDecomposition<>(
                    new Array2DRowFieldMatrix<>(ComplexField.getInstance(), dense)).getSolver()
                    .solve(new ArrayFieldVector<>(f));
            double pivot = BandedLdlt.factor(n, first, diag, re, im);
            BandedLdlt.solve(n, first, diag, re, im, xr, xi);
            double diff = 0;
            double norm = 0;
            for (int i = 0; i < n; i++) {
                diff += Math.pow(xr[i] - ref.getEntry(i).getReal(), 2) + Math.pow(xi[i] - ref.getEntry(i).getImaginary(), 2);
                norm += Math.pow(ref.getEntry(i).abs(), 2);
            }
            assertTrue(pivot > 0, "pivot ratio " + pivot);
            assertTrue(Math.sqrt(diff / norm) < 1e-9, "seed " + seed + " n " + n + ": " + Math.sqrt(diff / norm));
        });
    }
}
