/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * A solve by substitution with the factors, its relative residual measured, and one step of
 * iterative refinement in working precision (N. J. Higham, <i>Accuracy and Stability of
 * Numerical Algorithms</i>, 2nd ed., SIAM, 2002, §12.2): it repairs the effect of growth in
 * factors made without pivoting. Shared by every linear solve of this package; the residual
 * is computed matrix-free from the element matrices by each solve itself.
 */
final class RefinedSolve {

    /** Substitution with a solve's factors, in place on a right-hand side. */
    interface Substitution {
        void apply(double[] xr, double[] xi);
    }

    /** r = f − S·x into (rr, ri); returns ‖r‖₂. */
    interface Residual {
        double apply(double[] fr, double[] fi, double[] xr, double[] xi, double[] rr, double[] ri);
    }

    private RefinedSolve() {
    }

    /**
     * Solves S·x = f and refines once.
     *
     * @param fr  the right-hand side's real parts
     * @param fi  the right-hand side's imaginary parts
     * @param xr  receives the solution's real parts (length of f)
     * @param xi  receives the solution's imaginary parts
     * @param sub the substitution
     * @param res the residual
     * @return the relative residuals ‖f − S·x‖/‖f‖ before and after the refinement
     */
    static double[] run(double[] fr, double[] fi, double[] xr, double[] xi, Substitution sub, Residual res) {
        int n = fr.length;
        System.arraycopy(fr, 0, xr, 0, n);
        System.arraycopy(fi, 0, xi, 0, n);
        sub.apply(xr, xi);
        double[] rr = new double[n];
        double[] ri = new double[n];
        double fNorm = norm(fr, fi);
        double before = res.apply(fr, fi, xr, xi, rr, ri) / fNorm;
        sub.apply(rr, ri);
        for (int k = 0; k < n; k++) {
            xr[k] += rr[k];
            xi[k] += ri[k];
        }
        double after = res.apply(fr, fi, xr, xi, rr, ri) / fNorm;
        return new double[] {before, after};
    }

    /**
     * The Euclidean norm of a complex vector given by its parts.
     *
     * @param a the real parts
     * @param b the imaginary parts
     * @return ‖a + jb‖₂
     */
    static double norm(double[] a, double[] b) {
        double s = 0;
        for (int k = 0; k < a.length; k++) {
            s += a[k] * a[k] + b[k] * b[k];
        }
        return Math.sqrt(s);
    }
}
