/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

/**
 * Geometric mean distances of rectangles (J. C. Maxwell, <i>Treatise</i>, art. 691–692;
 * F. W. Grover, <i>Inductance Calculations</i>, 1946): the logarithm of the GMD of two
 * areas is the mean of ln ρ over all pairs of points, one in each.
 *
 * <p>Method (derived here, checked in {@code RectangleGmdTest}): for two rectangles with
 * sides parallel to the axes the four-fold integral ∫∫∫∫ ln ρ is a 16-term corner sum of one
 * function F with ∂⁴F/∂x²∂y² = ln sqrt(x² + y²):
 * F(x, y) = −(x⁴ − 6x²y² + y⁴)·ln(x² + y²)/48 + (x³y/6)·atan(y/x) + (xy³/6)·atan(x/y) − 25x²y²/48.
 * In one variable ∫_{x1}^{x2} ∫_{x3}^{x4} g(x − x′) dx′ dx = G(x2 − x3) − G(x1 − x3) − G(x2 − x4) + G(x1 − x4)
 * for G″ = g; the two variables multiply. For a square of side a this gives
 * ln(g/a) = (1/3)·ln 2 + π/3 − 25/12, g = 0.447049·a, and for a rectangle flattened to a line
 * segment of length a, g → a·e^{−3/2} = 0.22313·a (Maxwell's values).
 *
 * <p>Precision: the corner sum cancels the terms of size (larger side)⁴ down to a result of
 * size (area)², so about 2·log10(aspect ratio) digits are lost: 1e-12 relative at aspect 100.
 * Meant for near pairs (distance a few sizes); far pairs use quadrature instead.
 * Stateless and thread-safe.
 */
public final class RectangleGmd {

    private RectangleGmd() {
    }

    /**
     * The mean of ln ρ (ρ in metres) over all pairs of points, one in each section.
     *
     * @param p the first section, not null
     * @param q the second section, not null (may be {@code p} itself, or overlap it)
     * @return ln(GMD / 1 m)
     */
    public static double meanLogDistance(Section p, Section q) {
        // Shift the origin to p's corner so that the corner values stay of the cells' size.
        double x1 = 0;
        double x2 = p.rOuter() - p.rInner();
        double x3 = q.rInner() - p.rInner();
        double x4 = q.rOuter() - p.rInner();
        double y1 = 0;
        double y2 = p.zHigh() - p.zLow();
        double y3 = q.zLow() - p.zLow();
        double y4 = q.zHigh() - p.zLow();
        double[] u = {x2 - x3, x1 - x3, x2 - x4, x1 - x4};
        double[] v = {y2 - y3, y1 - y3, y2 - y4, y1 - y4};
        double[] s = {1, -1, -1, 1};
        double sum = 0;
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 4; j++) {
                sum += s[i] * s[j] * corner(u[i], v[j]);
            }
        }
        double areas = (p.width() * p.height()) * (q.width() * q.height());
        return sum / areas;
    }

    /**
     * The geometric mean distance of a rectangle from itself.
     *
     * @param width  one side in m, finite and greater than 0
     * @param height the other side in m, finite and greater than 0
     * @return g in m
     */
    public static double selfGmd(double width, double height) {
        Section s = new Section(0, width, 0, height);
        return Math.exp(meanLogDistance(s, s));
    }

    /** F(x, y) above; even in x and in y, with its limits on the axes (x·ln x → 0). */
    static double corner(double x, double y) {
        x = Math.abs(x);
        y = Math.abs(y);
        double x2 = x * x;
        double y2 = y * y;
        if (x == 0 && y == 0) {
            return 0;
        }
        if (x == 0) {
            return -y2 * y2 * Math.log(y2) / 48;
        }
        if (y == 0) {
            return -x2 * x2 * Math.log(x2) / 48;
        }
        double lnR2 = 2 * Math.log(Math.hypot(x, y));
        return -(x2 * x2 - 6 * x2 * y2 + y2 * y2) * lnR2 / 48
                + x2 * x * y * Math.atan2(y, x) / 6
                + x * y2 * y * Math.atan2(x, y) / 6
                - 25 * x2 * y2 / 48;
    }
}
