/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

/**
 * Gaussian elimination with partial pivoting (row interchanges by largest modulus) for a
 * dense complex system A·x = b, on primitive arrays: the textbook algorithm (e.g. G. H. Golub
 * &amp; C. F. Van Loan, <i>Matrix Computations</i>, alg. 3.4.1), nothing more. It exists because
 * Commons Math's real {@code LUDecomposition} of the equivalent 2n × 2n real system took
 * 4 s for 624 cells (it walks the matrix by columns), about ten times this; the two are
 * compared in {@code ComplexLuTest}.
 *
 * <p>Not thread-safe while solving (it overwrites its inputs); create one per solve.
 */
final class ComplexLu {

    private ComplexLu() {
    }

    /**
     * Solves A·x = b in place.
     *
     * @param ar real parts of A, n rows of n, row-major in one array of n², overwritten
     * @param ai imaginary parts of A, likewise, overwritten
     * @param br real parts of b, overwritten by those of x
     * @param bi imaginary parts of b, overwritten by those of x
     * @return false if a pivot is exactly zero (A singular), true otherwise
     */
    static boolean solve(double[] ar, double[] ai, double[] br, double[] bi) {
        int n = br.length;
        for (int col = 0; col < n; col++) {
            int pivot = col;
            double best = -1;
            for (int row = col; row < n; row++) {
                double m = Math.abs(ar[row * n + col]) + Math.abs(ai[row * n + col]);
                if (m > best) {
                    best = m;
                    pivot = row;
                }
            }
            if (best == 0) {
                return false;
            }
            if (pivot != col) {
                swapRows(ar, n, pivot, col);
                swapRows(ai, n, pivot, col);
                double t = br[pivot];
                br[pivot] = br[col];
                br[col] = t;
                t = bi[pivot];
                bi[pivot] = bi[col];
                bi[col] = t;
            }
            int c = col * n;
            double pr = ar[c + col];
            double pi = ai[c + col];
            double den = pr * pr + pi * pi;
            // 1/pivot
            double qr = pr / den;
            double qi = -pi / den;
            for (int row = col + 1; row < n; row++) {
                int r = row * n;
                double er = ar[r + col];
                double ei = ai[r + col];
                if (er == 0 && ei == 0) {
                    continue;
                }
                // factor f = A[row][col] / pivot
                double fr = er * qr - ei * qi;
                double fi = er * qi + ei * qr;
                for (int k = col + 1; k < n; k++) {
                    double ur = ar[c + k];
                    double ui = ai[c + k];
                    ar[r + k] -= fr * ur - fi * ui;
                    ai[r + k] -= fr * ui + fi * ur;
                }
                br[row] -= fr * br[col] - fi * bi[col];
                bi[row] -= fr * bi[col] + fi * br[col];
            }
        }
        for (int row = n - 1; row >= 0; row--) {
            int r = row * n;
            double sr = br[row];
            double si = bi[row];
            for (int k = row + 1; k < n; k++) {
                sr -= ar[r + k] * br[k] - ai[r + k] * bi[k];
                si -= ar[r + k] * bi[k] + ai[r + k] * br[k];
            }
            double pr = ar[r + row];
            double pi = ai[r + row];
            double den = pr * pr + pi * pi;
            br[row] = (sr * pr + si * pi) / den;
            bi[row] = (si * pr - sr * pi) / den;
        }
        return true;
    }

    private static void swapRows(double[] a, int n, int i, int j) {
        for (int k = 0; k < n; k++) {
            double t = a[i * n + k];
            a[i * n + k] = a[j * n + k];
            a[j * n + k] = t;
        }
    }
}
