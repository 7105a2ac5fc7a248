/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * LDLᵀ factorisation without pivoting of a complex symmetric band matrix, on primitive
 * arrays: the real and imaginary parts are separate {@code double[]}, no object is created
 * per entry, and the factors overwrite the matrix.
 *
 * <p>Storage. Row i keeps the entries A(i, k) for k = i − b … i at offsets 0 … b of the
 * block {@code [i·(b+1), (i+1)·(b+1))}; the diagonal sits at offset b. Entries left of the
 * first column are zero. Because a row's band is contiguous and ascending in k, the inner
 * loop of the factorisation is a dot product of two contiguous runs, which the JIT streams.
 *
 * <p>Algorithm (row-oriented Crout form of Golub &amp; Van Loan, <i>Matrix Computations</i>,
 * alg. 4.1.2, restricted to the band as in their §4.3): for each row i, the unscaled
 * multipliers u_ik = L_ik·D_k = A_ik − Σ_{m&lt;k} u_im·L_km are formed left to right, then
 * D_i = A_ii − Σ_m u_im·L_im and finally L_im = u_im/D_m. Departures from the textbook:
 * <ul>
 *   <li>the transpose is the plain transpose, not the conjugate one: the matrix is complex
 *       symmetric (A = Aᵀ), not Hermitian, and LDLᵀ keeps that symmetry, so only the lower
 *       band is stored and the work is half of a general LU;</li>
 *   <li>no pivoting. It is safe here because the real part of the matrix is symmetric
 *       positive definite (see {@link HarmonicSolve}): then for every leading block A_k and
 *       every x ≠ 0, Re(xᴴA_k x) = xᴴ(Re A_k)x &gt; 0, so no leading block is singular and
 *       every pivot D_k is non-zero; N. J. Higham, "Factorizing complex symmetric matrices
 *       with positive definite real and imaginary parts", Math. Comp. 67 (1998) 1591–1599,
 *       bounds the growth when the imaginary part is definite too. Ours is only semidefinite
 *       (air carries no eddy current), so the caller measures the residual and refines;</li>
 *   <li>the reciprocal of each pivot is kept, so the inner loops multiply and never divide;</li>
 *   <li>the dot products run two accumulators per part (see the comment in {@link #factor}).</li>
 * </ul>
 * Cost: about n·b²/2 complex multiply-adds (4 real multiplications and 4 additions each)
 * for n unknowns and half-bandwidth b, and n·(b+1) storage per part.
 *
 * <p>Envelope form. The same algorithm also runs on envelope (profile) storage, where each
 * row keeps only the entries from its own first non-zero column to the diagonal (George and
 * Liu, 1981, ch. 4; the band is the special case first[i] = i − b, and the band methods use
 * it). A system whose rows reach back unevenly, such as the transverse eddy-current system
 * whose rows through a conductor carry three unknowns per node and the others one, then
 * costs Σ (i − first[i])²/2 instead of n·b²/2.
 *
 * <p>Stateless; every method works only on the arrays it is given.
 */
public final class BandedLdlt {

    private BandedLdlt() {
    }

    /**
     * Factors in place. On return the strictly lower band holds L (unit diagonal implied)
     * and the diagonal slot holds 1/D_i.
     *
     * @param n  the order
     * @param b  the half-bandwidth (sub-diagonals)
     * @param re the real parts, n·(b+1) entries
     * @param im the imaginary parts, n·(b+1) entries
     * @return the smallest |D_i| relative to the largest |A_ii|, a pivot-size indicator
     */
    public static double factor(int n, int b, double[] re, double[] im) {
        int[] first = new int[n];
        int[] diag = new int[n];
        bandLayout(n, b, first, diag);
        return factor(n, first, diag, re, im);
    }

    /**
     * Solves A·x = f with the factors from {@link #factor}, in place.
     *
     * @param n  the order
     * @param b  the half-bandwidth
     * @param re the factored real parts
     * @param im the factored imaginary parts
     * @param xr on entry the right-hand side's real parts, on return the solution's
     * @param xi on entry the right-hand side's imaginary parts, on return the solution's
     */
    public static void solve(int n, int b, double[] re, double[] im, double[] xr, double[] xi) {
        int[] first = new int[n];
        int[] diag = new int[n];
        bandLayout(n, b, first, diag);
        solve(n, first, diag, re, im, xr, xi);
    }

    /** The band as an envelope: first column max(0, i − b), diagonal at i·(b+1) + b. */
    private static void bandLayout(int n, int b, int[] first, int[] diag) {
        for (int i = 0; i < n; i++) {
            first[i] = Math.max(0, i - b);
            diag[i] = i * (b + 1) + b;
        }
    }

    /**
     * The envelope layout of a symmetric matrix whose row i holds entries only from column
     * first[i] to the diagonal: rows stored one after another, row i's entries A(i, k) for
     * k = first[i] … i at consecutive offsets ending at its diagonal.
     *
     * @param first the first stored column of every row, 0 ≤ first[i] ≤ i; the envelope must
     *              hold every non-zero of L too, which it does because fill stays inside each
     *              row's envelope (A. George and J. W. H. Liu, <i>Computer Solution of Large
     *              Sparse Positive Definite Systems</i>, Prentice-Hall, 1981, §4.2)
     * @return the offsets of the diagonals; the storage has {@code diag[n − 1] + 1} entries
     */
    public static int[] envelopeDiagonals(int[] first) {
        int[] diag = new int[first.length];
        long end = -1;
        for (int i = 0; i < first.length; i++) {
            end += i - first[i] + 1;
            diag[i] = Math.toIntExact(end);
        }
        return diag;
    }

    /**
     * {@link #factor(int, int, double[], double[])} on envelope storage (see
     * {@link #envelopeDiagonals}): the same algorithm, each row's run starting at its own
     * first column, so rows with a short reach cost only what they reach. Work about
     * Σ (i − first[i])²/2 complex multiply-adds.
     *
     * @param n     the order
     * @param first the first stored column of every row
     * @param diag  the offset of every row's diagonal
     * @param re    the real parts; on return L and 1/D
     * @param im    the imaginary parts; on return L and 1/D
     * @return the smallest |D_i| relative to the largest |A_ii|, a pivot-size indicator
     */
    public static double factor(int n, int[] first, int[] diag, double[] re, double[] im) {
        double minPivot = Double.POSITIVE_INFINITY;
        double maxDiag = 0;
        for (int i = 0; i < n; i++) {
            final int ri = diag[i] - i;       // row i's column k sits at ri + k
            final int k0 = first[i];
            for (int k = k0; k < i; k++) {
                final int rk = diag[k] - k;
                // u_ik = A_ik − Σ_{m = max(k0, first[k])}^{k−1} u_im · L_km
                final int m0 = Math.max(k0, first[k]);
                // Two independent accumulators per part: a single running sum is bound by the
                // latency of one floating-point add per term; two halve that (the JIT does not
                // reassociate floating-point sums itself). The order of summation changes, not
                // the count of operations, so the rounding error bound is the same.
                double sr0 = re[ri + k];
                double si0 = im[ri + k];
                double sr1 = 0;
                double si1 = 0;
                int pi = ri + m0;
                int pk = rk + m0;
                final int len = k - m0;
                final int end = pi + (len & ~1);
                for (; pi < end; pi += 2, pk += 2) {
                    final double ar = re[pi];
                    final double ai = im[pi];
                    final double br = re[pk];
                    final double bi = im[pk];
                    final double cr = re[pi + 1];
                    final double ci = im[pi + 1];
                    final double dr = re[pk + 1];
                    final double di = im[pk + 1];
                    sr0 -= ar * br - ai * bi;
                    si0 -= ar * bi + ai * br;
                    sr1 -= cr * dr - ci * di;
                    si1 -= cr * di + ci * dr;
                }
                if ((len & 1) != 0) {
                    final double ar = re[pi];
                    final double ai = im[pi];
                    final double br = re[pk];
                    final double bi = im[pk];
                    sr0 -= ar * br - ai * bi;
                    si0 -= ar * bi + ai * br;
                }
                re[ri + k] = sr0 + sr1;
                im[ri + k] = si0 + si1;
            }
            // D_i = A_ii − Σ_m u_im · (u_im / D_m), and L_im = u_im / D_m (1/D_m is stored).
            final int d = diag[i];
            double dr = re[d];
            double di = im[d];
            for (int m = k0; m < i; m++) {
                final int p = ri + m;
                final int q = diag[m];
                final double ur = re[p];
                final double ui = im[p];
                final double lr = ur * re[q] - ui * im[q];
                final double li = ur * im[q] + ui * re[q];
                dr -= ur * lr - ui * li;
                di -= ur * li + ui * lr;
                re[p] = lr;
                im[p] = li;
            }
            maxDiag = Math.max(maxDiag, Math.hypot(re[d], im[d]));
            final double mod2 = dr * dr + di * di;
            minPivot = Math.min(minPivot, Math.sqrt(mod2));
            re[d] = dr / mod2;
            im[d] = -di / mod2;
        }
        return maxDiag > 0 ? minPivot / maxDiag : 0;
    }

    /**
     * {@link #solve(int, int, double[], double[], double[], double[])} with envelope factors
     * from {@link #factor(int, int[], int[], double[], double[])}, in place.
     *
     * @param n     the order
     * @param first the first stored column of every row
     * @param diag  the offset of every row's diagonal
     * @param re    the factored real parts
     * @param im    the factored imaginary parts
     * @param xr    on entry the right-hand side's real parts, on return the solution's
     * @param xi    on entry the right-hand side's imaginary parts, on return the solution's
     */
    public static void solve(int n, int[] first, int[] diag, double[] re, double[] im, double[] xr, double[] xi) {
        // L·y = f (forward), rows of L are contiguous.
        for (int i = 0; i < n; i++) {
            final int ri = diag[i] - i;
            double sr = xr[i];
            double si = xi[i];
            for (int k = first[i]; k < i; k++) {
                final int p = ri + k;
                sr -= re[p] * xr[k] - im[p] * xi[k];
                si -= re[p] * xi[k] + im[p] * xr[k];
            }
            xr[i] = sr;
            xi[i] = si;
        }
        // z = D⁻¹ y
        for (int i = 0; i < n; i++) {
            final int q = diag[i];
            final double yr = xr[i];
            final double yi = xi[i];
            xr[i] = yr * re[q] - yi * im[q];
            xi[i] = yr * im[q] + yi * re[q];
        }
        // Lᵀ·x = z (backward): column i of Lᵀ is row i of L, so scatter row i once x_i is final.
        for (int i = n - 1; i >= 0; i--) {
            final int ri = diag[i] - i;
            final double vr = xr[i];
            final double vi = xi[i];
            for (int k = first[i]; k < i; k++) {
                final int p = ri + k;
                xr[k] -= re[p] * vr - im[p] * vi;
                xi[k] -= re[p] * vi + im[p] * vr;
            }
        }
    }

    /**
     * {@link #factor} for a real matrix (a static solve without magnetic loss): the same
     * algorithm on one array, a quarter of the arithmetic of the complex form.
     *
     * @param n  the order
     * @param b  the half-bandwidth
     * @param re the entries, n·(b+1); on return L and 1/D
     * @return the smallest |D_i| relative to the largest |A_ii|
     */
    public static double factorReal(int n, int b, double[] re) {
        final int w = b + 1;
        double minPivot = Double.POSITIVE_INFINITY;
        double maxDiag = 0;
        for (int i = 0; i < n; i++) {
            final int ri = i * w;
            final int k0 = Math.max(0, i - b);
            for (int k = k0; k < i; k++) {
                final int m0 = Math.max(k0, k - b);
                double s0 = re[ri + k - i + b];
                double s1 = 0;
                int pi = ri + m0 - i + b;
                int pk = k * w + m0 - k + b;
                final int len = k - m0;
                final int end = pi + (len & ~1);
                for (; pi < end; pi += 2, pk += 2) {
                    s0 -= re[pi] * re[pk];
                    s1 -= re[pi + 1] * re[pk + 1];
                }
                if ((len & 1) != 0) {
                    s0 -= re[pi] * re[pk];
                }
                re[ri + k - i + b] = s0 + s1;
            }
            double d = re[ri + b];
            for (int m = k0; m < i; m++) {
                final int p = ri + m - i + b;
                final double u = re[p];
                final double l = u * re[m * w + b];
                d -= u * l;
                re[p] = l;
            }
            maxDiag = Math.max(maxDiag, Math.abs(re[ri + b]));
            minPivot = Math.min(minPivot, Math.abs(d));
            re[ri + b] = 1 / d;
        }
        return maxDiag > 0 ? minPivot / maxDiag : 0;
    }

    /**
     * {@link #solve} with real factors from {@link #factorReal}; the real and imaginary parts
     * of the right-hand side are solved together.
     *
     * @param n  the order
     * @param b  the half-bandwidth
     * @param re the factors
     * @param xr on entry the right-hand side's real parts, on return the solution's
     * @param xi on entry the right-hand side's imaginary parts, on return the solution's
     */
    public static void solveReal(int n, int b, double[] re, double[] xr, double[] xi) {
        final int w = b + 1;
        for (int i = 0; i < n; i++) {
            final int k0 = Math.max(0, i - b);
            double sr = xr[i];
            double si = xi[i];
            int p = i * w + k0 - i + b;
            for (int k = k0; k < i; k++, p++) {
                sr -= re[p] * xr[k];
                si -= re[p] * xi[k];
            }
            xr[i] = sr;
            xi[i] = si;
        }
        for (int i = 0; i < n; i++) {
            xr[i] *= re[i * w + b];
            xi[i] *= re[i * w + b];
        }
        for (int i = n - 1; i >= 0; i--) {
            final int k0 = Math.max(0, i - b);
            final double vr = xr[i];
            final double vi = xi[i];
            int p = i * w + k0 - i + b;
            for (int k = k0; k < i; k++, p++) {
                xr[k] -= re[p] * vr;
                xi[k] -= re[p] * vi;
            }
        }
    }
}
