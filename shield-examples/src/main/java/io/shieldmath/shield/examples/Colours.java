/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import java.awt.Color;

/**
 * The colours of our plots, and the colour arithmetic they are designed and checked with.
 *
 * <h2>Series palette</h2>
 * Eight colours for the curves of a chart, {@link #SERIES}, designed for this project as a
 * ladder of CIE 1976 L* lightness (CIE 15:2004) from 26 to 75 in steps of 7. The rungs take
 * their hues alternately from the blue side (navy, violet, teal, sky) and the warm side
 * (wine, olive, orange, yellow) of the colour circle, because the blue–yellow contrast is the
 * one that red–green colour-blind viewers keep; so rungs next to each other differ in hue
 * as well as in lightness. The ladder is walked out of order (rungs 0, 4, 1, 5, 2, 6, 3, 7),
 * so that curves next to each other in a legend differ by at least 21 in L*, and any two by
 * at least 7: the curves stay apart when printed in grey. Each colour was turned from its
 * L*, chroma and hue into sRGB by the formulas below (chroma lowered where the colour left
 * the sRGB gamut). The tests check the lightness steps, the contrast of the palest colour
 * on white, and that all pairs stay apart under simulated protanopia, deuteranopia and
 * tritanopia.
 *
 * <h2>Field colour map</h2>
 * {@link #field(double)} maps 0 (weakest) to 1 (strongest) on a path of our own through
 * CIELAB: L* rises linearly from 16 to 96, so the map is ordered by lightness and reads the
 * same in grey, while the hue turns from a dark moss green through slate blue and a muted
 * orchid to a warm cream, with moderate chroma. Weak field is dark, strong field is light.
 * Colours outside the sRGB gamut keep their L* and hue and lose chroma until they fit, so the
 * lightness ramp is exact.
 *
 * <h2>Formulas</h2>
 * sRGB transfer function and the linear-sRGB to CIE XYZ matrix (D65 white): IEC 61966-2-1:1999;
 * relative luminance Y = 0.2126 R + 0.7152 G + 0.0722 B of the linearised components, as
 * also used by WCAG 2; CIELAB: CIE 15:2004, white point D65 (Xn 0.95047, Zn 1.08883).
 *
 * <p>Immutable constants and pure functions; thread-safe. Not for use outside this package.
 */
final class Colours {

    /**
     * The series palette in legend order (see the class comment): navy, teal, wine, orange,
     * violet, sky, olive, yellow.
     */
    static final Color[] SERIES = {
        new Color(0x00406b), new Color(0x009093), new Color(0x8d293d), new Color(0xd87b44),
        new Color(0x6750a2), new Color(0x62afd6), new Color(0x886c2a), new Color(0xdcb438)};

    /** The canvas colour of our pictures, a warm off-white. */
    static final Color PAPER = new Color(0xF7F5F0);
    /** The colour of words and axes. */
    static final Color INK = new Color(0x23262B);
    /** The colour of secondary words, ticks and leaders. */
    static final Color QUIET_INK = new Color(0x5C6168);

    /** Steps of the field colour map's table. */
    static final int FIELD_STEPS = 256;

    /** L* of the weakest field colour. */
    static final double FIELD_LIGHTNESS_LOW = 16;
    /** L* of the strongest field colour. */
    static final double FIELD_LIGHTNESS_HIGH = 96;

    /** Control points of the field map: position, CIELAB chroma, hue in degrees (unwrapped). */
    private static final double[][] FIELD_PATH = {
        {0.00, 20, 160},     // moss green
        {0.34, 38, 262},     // slate blue
        {0.68, 42, 332},     // orchid
        {1.00, 16, 435},     // cream (75° plus a turn)
    };

    private static final int[] FIELD_TABLE = fieldTable();

    private Colours() {
    }

    /**
     * The field colour for a position on the scale.
     *
     * @param t 0 for the weakest field to 1 for the strongest; clamped to [0, 1], NaN gives 0
     * @return the colour as 0xRRGGBB
     */
    static int field(double t) {
        double c = t >= 0 ? Math.min(t, 1) : 0;
        return FIELD_TABLE[(int) Math.round(c * (FIELD_STEPS - 1))];
    }

    /**
     * The relative luminance of an sRGB colour (IEC 61966-2-1; WCAG 2).
     *
     * @param rgb the colour as 0xRRGGBB
     * @return Y from 0 (black) to 1 (white)
     */
    static double luminance(int rgb) {
        return 0.2126 * linear((rgb >> 16) & 0xff) + 0.7152 * linear((rgb >> 8) & 0xff) + 0.0722 * linear(rgb & 0xff);
    }

    /**
     * CIE 1976 lightness L* of an sRGB colour.
     *
     * @param rgb the colour as 0xRRGGBB
     * @return L* from 0 (black) to 100 (white)
     */
    static double lightness(int rgb) {
        return 116 * labF(luminance(rgb)) - 16;
    }

    /**
     * CIELAB coordinates of an sRGB colour (D65).
     *
     * @param rgb the colour as 0xRRGGBB
     * @return {L*, a*, b*}
     */
    static double[] lab(int rgb) {
        return labOfLinear(linear((rgb >> 16) & 0xff), linear((rgb >> 8) & 0xff), linear(rgb & 0xff));
    }

    /**
     * CIELAB coordinates (D65) of linear sRGB components.
     *
     * @param r linear red, 0 to 1
     * @param g linear green, 0 to 1
     * @param b linear blue, 0 to 1
     * @return {L*, a*, b*}
     */
    static double[] labOfLinear(double r, double g, double b) {
        double x = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
        double y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
        double z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
        double fy = labF(y);
        return new double[] {116 * fy - 16, 500 * (labF(x) - fy), 200 * (fy - labF(z))};
    }

    /**
     * The linear value of an 8-bit sRGB component (IEC 61966-2-1).
     *
     * @param component 0 to 255
     * @return 0 to 1
     */
    static double linear(int component) {
        double c = component / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    /**
     * The sRGB colour of a CIELAB lightness, chroma and hue, with the chroma lowered by
     * bisection until the colour lies in the sRGB gamut (L* and hue kept).
     *
     * @param l     L*, 0 to 100
     * @param c     chroma, 0 or more
     * @param hueDeg hue angle in degrees
     * @return the colour as 0xRRGGBB
     */
    static int fromLch(double l, double c, double hueDeg) {
        double cos = Math.cos(Math.toRadians(hueDeg));
        double sin = Math.sin(Math.toRadians(hueDeg));
        double[] rgb = new double[3];
        if (!linearOfLab(l, c * cos, c * sin, rgb)) {
            double lo = 0;
            double hi = c;
            for (int i = 0; i < 40; i++) {
                double mid = 0.5 * (lo + hi);
                if (linearOfLab(l, mid * cos, mid * sin, rgb)) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            linearOfLab(l, lo * cos, lo * sin, rgb);
        }
        return encode(rgb[0]) << 16 | encode(rgb[1]) << 8 | encode(rgb[2]);
    }

    /** Linear sRGB of a CIELAB colour into {@code rgb}; true when it lies in the gamut. */
    private static boolean linearOfLab(double l, double a, double b, double[] rgb) {
        double fy = (l + 16) / 116;
        double x = 0.95047 * labFInverse(fy + a / 500);
        double y = labFInverse(fy);
        double z = 1.08883 * labFInverse(fy - b / 200);
        rgb[0] = 3.2406 * x - 1.5372 * y - 0.4986 * z;
        rgb[1] = -0.9689 * x + 1.8758 * y + 0.0415 * z;
        rgb[2] = 0.0557 * x - 0.2040 * y + 1.0570 * z;
        double eps = 1e-9;
        return rgb[0] >= -eps && rgb[0] <= 1 + eps && rgb[1] >= -eps && rgb[1] <= 1 + eps
                && rgb[2] >= -eps && rgb[2] <= 1 + eps;
    }

    private static int encode(double linear) {
        double v = Math.max(0, Math.min(1, linear));
        double e = v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055;
        return (int) Math.round(255 * e);
    }

    private static double labF(double t) {
        double d = 6.0 / 29;
        return t > d * d * d ? Math.cbrt(t) : t / (3 * d * d) + 4.0 / 29;
    }

    private static double labFInverse(double t) {
        double d = 6.0 / 29;
        return t > d ? t * t * t : 3 * d * d * (t - 4.0 / 29);
    }

    private static int[] fieldTable() {
        int[] table = new int[FIELD_STEPS];
        for (int i = 0; i < FIELD_STEPS; i++) {
            double t = i / (FIELD_STEPS - 1.0);
            int k = 0;
            while (k < FIELD_PATH.length - 2 && t > FIELD_PATH[k + 1][0]) {
                k++;
            }
            double[] p = FIELD_PATH[k];
            double[] q = FIELD_PATH[k + 1];
            double u = (t - p[0]) / (q[0] - p[0]);
            int rgb = fromLch(FIELD_LIGHTNESS_LOW + (FIELD_LIGHTNESS_HIGH - FIELD_LIGHTNESS_LOW) * t,
                    p[1] + u * (q[1] - p[1]), p[2] + u * (q[2] - p[2]));
            // Rounding to 8 bits can leave a dark step a hair below the one before it; raise its
            // green (the component that weighs most in luminance) until the ramp does not fall.
            while (i > 0 && luminance(rgb) < luminance(table[i - 1]) && (rgb & 0xff00) != 0xff00) {
                rgb += 0x100;
            }
            table[i] = rgb;
        }
        return table;
    }
}
