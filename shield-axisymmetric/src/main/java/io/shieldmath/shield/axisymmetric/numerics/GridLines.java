/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import java.util.Arrays;

/**
 * One axis of the tensor grid: graded grid lines through every key coordinate (body faces,
 * coil windings, sensor region ends), built from a size function.
 *
 * <p>Method. Each feature f asks for an element size h_f at its coordinate x_f; away from it
 * the size may grow geometrically by the factor g per element. A geometric progression
 * h, hg, hg², ... has its k-th element at distance ≈ h(g^k − 1)/(g − 1), so its size grows
 * linearly with distance, h + (g − 1)·d. The size function is therefore
 * s(x) = min_f [h_f + (g − 1)·|x − x_f|].
 * A feature may also be a zone [a, b] (the inside of a metal wall, the near region) with
 * the distance measured to the zone, so the size stays capped all through it., and an interval between two key coordinates gets
 * n = ceil(∫ dx/s) elements whose ends equidistribute the integral of 1/s. That puts a line on
 * every key, keeps neighbouring elements within about the factor g of each other, and grades
 * into the far field without any special case for "metal" or "air". (The usual textbook
 * recipe is a separate geometric progression per interval, which needs a case for intervals
 * that are too short for the progression to reach its cap; the size function has none.)
 *
 * <p>Not thread-confined: it has no state; every call builds new arrays.
 */
public final class GridLines {

    private GridLines() {
    }

    /**
     * Builds the lines of one axis.
     *
     * @param lo     the first line (the axis, or the lower far boundary)
     * @param hi     the last line (the far boundary)
     * @param keys   coordinates that must be lines (unsorted, duplicates allowed; outside [lo, hi] ignored)
     * @param zoneLo the start of each zone (a face is a zone of zero width)
     * @param zoneHi the end of each zone, {@code zoneLo[i]} or more
     * @param zoneH  the largest element asked for inside each zone, greater than 0; outside it
     *               the allowed size grows by {@code growth} per element
     * @param growth the largest ratio of neighbouring element sizes, greater than 1
     * @return the lines, strictly increasing, first {@code lo} and last {@code hi}
     */
    public static double[] build(double lo, double hi, double[] keys, double[] zoneLo, double[] zoneHi,
                                 double[] zoneH, double growth) {
        double[] k = new double[keys.length + 2];
        int nk = 0;
        k[nk++] = lo;
        k[nk++] = hi;
        for (double x : keys) {
            if (x > lo && x < hi) {
                k[nk++] = x;
            }
        }
        k = Arrays.copyOf(k, nk);
        Arrays.sort(k);
        // Merge keys closer than a part in 1e12 of the box: they are the same face written twice.
        double tiny = 1e-12 * (hi - lo);
        double[] u = new double[k.length];
        int nu = 0;
        for (double x : k) {
            if (nu == 0 || x - u[nu - 1] > tiny) {
                u[nu++] = x;
            } else if (x == hi) {
                u[nu - 1] = hi;
            }
        }
        double gm1 = growth - 1;
        double[] out = new double[64];
        int n = 0;
        out[n++] = u[0];
        double[] xs = new double[256];
        double[] cum = new double[256];
        for (int s = 0; s + 1 < nu; s++) {
            double a = u[s];
            double b = u[s + 1];
            // March with steps of a quarter of the local size; the trapezoid rule on 1/s is then
            // accurate to a few per cent, far better than the ceil() below needs.
            int m = 0;
            double x = a;
            double c = 0;
            double inv = 1 / size(x, zoneLo, zoneHi, zoneH, gm1);
            xs[m] = x;
            cum[m++] = 0;
            while (x < b) {
                double step = Math.min(0.25 / inv, b - x);
                double xn = x + step;
                if (b - xn < 1e-9 * (b - a)) {
                    xn = b;
                }
                double invN = 1 / size(xn, zoneLo, zoneHi, zoneH, gm1);
                c += 0.5 * (inv + invN) * (xn - x);
                x = xn;
                inv = invN;
                if (m == xs.length) {
                    xs = Arrays.copyOf(xs, 2 * m);
                    cum = Arrays.copyOf(cum, 2 * m);
                }
                xs[m] = x;
                cum[m++] = c;
            }
            int elements = Math.max(1, (int) Math.ceil(c - 1e-9));
            // Invert the cumulative integral at equal steps (linear interpolation between marches).
            int p = 1;
            for (int e = 1; e < elements; e++) {
                double target = c * e / elements;
                while (cum[p] < target) {
                    p++;
                }
                double t = (target - cum[p - 1]) / (cum[p] - cum[p - 1]);
                double xe = xs[p - 1] + t * (xs[p] - xs[p - 1]);
                if (n == out.length) {
                    out = Arrays.copyOf(out, 2 * n);
                }
                out[n++] = xe;
            }
            if (n == out.length) {
                out = Arrays.copyOf(out, 2 * n);
            }
            out[n++] = b;
        }
        return Arrays.copyOf(out, n);
    }

    private static double size(double x, double[] lo, double[] hi, double[] h, double gm1) {
        double s = Double.POSITIVE_INFINITY;
        for (int i = 0; i < lo.length; i++) {
            double d = x < lo[i] ? lo[i] - x : x > hi[i] ? x - hi[i] : 0;
            s = Math.min(s, h[i] + gm1 * d);
        }
        return s;
    }
}
