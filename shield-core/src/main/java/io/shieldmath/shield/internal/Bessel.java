/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

/**
 * The Bessel function of the first kind of order one, J1(x), for x ≥ 0, on primitives and
 * without allocation. Three ranges, each used where it keeps close to full double precision
 * (checked against Commons Math {@code BesselJ} in the tests):
 * <ul>
 *   <li>x &lt; 8: the power series J1(x) = Σ (−1)^m (x/2)^{2m+1} / (m!·(m+1)!) (DLMF 10.2.2),
 *       summed by Horner's rule in (x/2)²; the largest term is below 100, so at most two
 *       digits are lost to cancellation;</li>
 *   <li>8 ≤ x &lt; 20: Miller's backward recurrence J_{k−1} = (2k/x)·J_k − J_{k+1} from an
 *       order well above x, normalised by J0 + 2·(J2 + J4 + …) = 1 (DLMF 10.74(iv), 10.12.4);</li>
 *   <li>x ≥ 20: Hankel's asymptotic expansion J1(x) = sqrt(2/(πx))·(P·cos χ − Q·sin χ),
 *       χ = x − 3π/4 (DLMF 10.17.3), summed until the terms fall below 1e-17; the error of
 *       the truncated series is then of the order of e^{−2x} &lt; 1e-17.</li>
 * </ul>
 * Stateless and thread-safe.
 */
public final class Bessel {

    private static final int SERIES_TERMS = 24;
    /** Series coefficients c_m = (−1)^m / (m!·(m+1)!), for J1(x) = (x/2)·Σ c_m·((x/2)²)^m. */
    private static final double[] SERIES = new double[SERIES_TERMS];

    static {
        double f = 1;
        for (int m = 0; m < SERIES_TERMS; m++) {
            SERIES[m] = (m % 2 == 0 ? 1 : -1) / f;
            f *= (m + 1) * (double) (m + 2);
        }
    }

    private Bessel() {
    }

    /**
     * J1(x).
     *
     * @param x the argument, 0 or more and finite
     * @return J1(x)
     */
    public static double j1(double x) {
        if (x < 8) {
            double h = 0.5 * x;
            double y = h * h;
            double s = SERIES[SERIES_TERMS - 1];
            for (int m = SERIES_TERMS - 2; m >= 0; m--) {
                s = s * y + SERIES[m];
            }
            return h * s;
        }
        if (x < 20) {
            return miller(x);
        }
        return hankel(x);
    }

    private static double miller(double x) {
        // Start at an even order well above x; the recurrence is stable downwards.
        int top = 2 * (((int) x + 40) / 2);
        double inv = 2 / x;
        double next = 0;        // J_{k+1}
        double cur = 1e-300;    // J_k, arbitrary scale
        double even = 0;        // Σ J_{2k}, k ≥ 1 (unnormalised)
        double j1 = 0;
        for (int k = top; k > 0; k--) {
            double prev = k * inv * cur - next; // J_{k-1}
            next = cur;
            cur = prev;
            if (Math.abs(cur) > 1e250) {
                // Rescale to stay in range; only the ratio matters.
                cur *= 1e-250;
                next *= 1e-250;
                even *= 1e-250;
                j1 *= 1e-250;
            }
            int order = k - 1;
            if (order == 1) {
                j1 = cur;
            } else if (order > 0 && (order & 1) == 0) {
                even += cur;
            }
        }
        // cur is now J0.
        return j1 / (cur + 2 * even);
    }

    private static double hankel(double x) {
        // a_k(1) = ((4 − 1²)(4 − 3²)…(4 − (2k−1)²)) / (k!·8^k); P = Σ (−1)^k a_{2k}/x^{2k},
        // Q = Σ (−1)^k a_{2k+1}/x^{2k+1}.
        double inv = 1 / x;
        double p = 1;
        double q = 0;
        double term = 1;
        for (int k = 1; k < 40; k++) {
            int odd = 2 * k - 1;
            term *= (4.0 - odd * (double) odd) / (8.0 * k) * inv;
            if ((k & 1) == 1) {
                // k = 2m + 1: sign (−1)^m
                q += ((k >> 1) % 2 == 0) ? term : -term;
            } else {
                p += ((k >> 1) % 2 == 0) ? term : -term;
            }
            if (Math.abs(term) < 1e-17) {
                break;
            }
        }
        double chi = x - 0.75 * Math.PI;
        return Math.sqrt(2 / (Math.PI * x)) * (p * Math.cos(chi) - q * Math.sin(chi));
    }
}
