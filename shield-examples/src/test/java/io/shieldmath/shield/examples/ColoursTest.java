/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The colour formulas, the series palette and the field colour map. */
class ColoursTest {

    @Test
    void luminanceAndLightnessFollowTheirStandards() {
        // Relative luminance of white and black: 1 and 0 (WCAG 2 definition, IEC 61966-2-1).
        assertEquals(1.0, Colours.luminance(0xFFFFFF), 1e-12);
        assertEquals(0.0, Colours.luminance(0x000000), 1e-12);
        // #777777: component 119/255 = 0.46667, ((0.46667 + 0.055)/1.055)^2.4 = 0.18447, worked by hand
        // from the IEC 61966-2-1 transfer function; its L* = 116·0.18447^(1/3) − 16 = 50.04 (CIE 15:2004).
        assertEquals(0.18447, Colours.luminance(0x777777), 2e-5);
        assertEquals(50.04, Colours.lightness(0x777777), 0.02);
        // The D65 white is L* 100, a* 0, b* 0 (CIE 15:2004), up to the 4-digit sRGB matrix.
        double[] white = Colours.lab(0xFFFFFF);
        assertEquals(100, white[0], 1e-9);
        assertEquals(0, white[1], 0.05);
        assertEquals(0, white[2], 0.05);
        // A grey made from L*, chroma 0 comes back at that L* (round trip through sRGB, 8-bit steps).
        for (int l = 5; l <= 95; l += 10) {
            assertEquals(l, Colours.lightness(Colours.fromLch(l, 0, 0)), 0.4, "L* " + l);
        }
    }

    @Test
    void theFieldColourMapRisesInLightnessEvenlyFromDarkToLight() {
        double first = Colours.lightness(Colours.field(0));
        double last = Colours.lightness(Colours.field(1));
        assertEquals(Colours.FIELD_LIGHTNESS_LOW, first, 0.5);
        assertEquals(Colours.FIELD_LIGHTNESS_HIGH, last, 0.5);
        double step = (last - first) / (Colours.FIELD_STEPS - 1);
        double previous = -1;
        double previousY = -1;
        for (int i = 0; i < Colours.FIELD_STEPS; i++) {
            int rgb = Colours.field(i / (Colours.FIELD_STEPS - 1.0));
            double l = Colours.lightness(rgb);
            // Monotone in luminance, hence readable in grey (8-bit rounding may repeat a value
            // at the dark end, never lower it); each step within 8-bit rounding of even.
            assertTrue(Colours.luminance(rgb) >= previousY, "luminance must not fall at step " + i);
            assertEquals(first + i * step, l, 0.8, "L* at step " + i);
            previous = l;
            previousY = Colours.luminance(rgb);
        }
        assertTrue(previous > 90);
    }

    @Test
    void theFieldColourMapHasColourNotJustGrey() {
        // It is a colour map, not a grey ramp: the middle of the scale carries chroma.
        double[] mid = Colours.lab(Colours.field(0.5));
        assertTrue(Math.hypot(mid[1], mid[2]) > 25, "chroma at the middle " + Math.hypot(mid[1], mid[2]));
    }

    @Test
    void seriesNextToEachOtherDifferInGreyAndAnyTwoStayApart() {
        int n = Colours.SERIES.length;
        assertEquals(8, n);
        for (int i = 0; i < n; i++) {
            double li = Colours.lightness(Colours.SERIES[i].getRGB() & 0xffffff);
            if (i + 1 < n) {
                double lj = Colours.lightness(Colours.SERIES[i + 1].getRGB() & 0xffffff);
                // Stated in Colours' javadoc: neighbours differ by at least 21 in L*
                // (grey-print distinguishability: common practice, no source, for the amount).
                assertTrue(Math.abs(li - lj) >= 20.5, "series " + i + " and " + (i + 1) + ": " + li + ", " + lj);
            }
            for (int j = i + 1; j < n; j++) {
                double lj = Colours.lightness(Colours.SERIES[j].getRGB() & 0xffffff);
                assertTrue(Math.abs(li - lj) >= 6.5, "series " + i + " and " + j + " alike in grey");
            }
            // The palest series must still stand off a white background by 1.9:1 (the WCAG 2
            // contrast ratio (Y1 + 0.05)/(Y2 + 0.05); the amount is our choice for lines, not WCAG's).
            double y = Colours.luminance(Colours.SERIES[i].getRGB() & 0xffffff);
            assertTrue(1.05 / (y + 0.05) >= 1.9, "series " + i + " too pale on white");
        }
    }

    @Test
    void seriesStayApartForDichromats() {
        // Simulated protanopia, deuteranopia and tritanopia (severity 1) by the linear-RGB
        // matrices of G. M. Machado, M. M. Oliveira and L. A. F. Fernandes, IEEE Trans. Vis.
        // Comput. Graph. 15 (2009) 1291, table values from memory. Every pair of series
        // colours must stay at least 10 apart in CIE 1976 ΔE*ab after the simulation.
        double[][][] sims = {
            {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216}, {-0.003882, -0.048116, 1.051998}},
            {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413}, {-0.011820, 0.042940, 0.968881}},
            {{1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602}, {0.004733, 0.691367, 0.303900}}};
        int n = Colours.SERIES.length;
        for (double[][] m : sims) {
            double[][] lab = new double[n][];
            for (int i = 0; i < n; i++) {
                int rgb = Colours.SERIES[i].getRGB();
                double r = Colours.linear((rgb >> 16) & 0xff);
                double g = Colours.linear((rgb >> 8) & 0xff);
                double b = Colours.linear(rgb & 0xff);
                lab[i] = Colours.labOfLinear(clamp(m[0][0] * r + m[0][1] * g + m[0][2] * b),
                        clamp(m[1][0] * r + m[1][1] * g + m[1][2] * b), clamp(m[2][0] * r + m[2][1] * g + m[2][2] * b));
            }
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    double de = Math.sqrt(sq(lab[i][0] - lab[j][0]) + sq(lab[i][1] - lab[j][1]) + sq(lab[i][2] - lab[j][2]));
                    assertTrue(de >= 10, "series " + i + " and " + j + " only ΔE " + de + " apart");
                }
            }
        }
    }

    private static double clamp(double v) {
        return Math.max(0, Math.min(1, v));
    }

    private static double sq(double v) {
        return v * v;
    }
}
