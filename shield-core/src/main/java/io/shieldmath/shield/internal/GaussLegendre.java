/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

/**
 * Gauss–Legendre nodes and weights on [−1, 1], computed once by Newton's method on the
 * Legendre polynomial P_n from the starting guesses cos(π(i − 1/4)/(n + 1/2))
 * (G. H. Golub and J. H. Welsch, Math. Comp. 23 (1969) 221, give the same rule by
 * eigenvalues; Abramowitz and Stegun, table 25.4, tabulates it). Immutable.
 */
public final class GaussLegendre {

    /** The nodes on [−1, 1], increasing (do not modify). */
    public final double[] x;
    /** The weights, summing to 2 (do not modify). */
    public final double[] w;

    /**
     * The n-point rule.
     *
     * @param n the number of nodes, 1 or more
     */
    public GaussLegendre(int n) {
        x = new double[n];
        w = new double[n];
        for (int i = 0; i < (n + 1) / 2; i++) {
            double z = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            for (int iter = 0; iter < 100; iter++) {
                double[] pd = legendre(n, z);
                double dz = pd[0] / pd[1];
                z -= dz;
                if (Math.abs(dz) < 1e-16) {
                    break;
                }
            }
            // The derivative at the converged node gives the weight.
            double dp = legendre(n, z)[1];
            double weight = 2 / ((1 - z * z) * dp * dp);
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = weight;
            w[n - 1 - i] = weight;
        }
        if (n % 2 == 1) {
            x[n / 2] = 0;
        }
    }

    /** P_n(z) and P_n'(z) by the three-term recurrence (A&S 22.7.10, 22.8.5). */
    private static double[] legendre(int n, double z) {
        double p0 = 1;
        double p1 = z;
        for (int k = 2; k <= n; k++) {
            double p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k;
            p0 = p1;
            p1 = p2;
        }
        return new double[] {p1, n * (z * p1 - p0) / (z * z - 1)};
    }
}
