/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Marching squares against contours known in closed form. */
class ContourTracerTest {

    private static double[] axis(int n, double from, double to) {
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = from + (to - from) * i / (n - 1);
        }
        return a;
    }

    @Test
    void aPlaneGivesItsStraightLineExactly() {
        // v = 2x + 3y: linear interpolation is exact, so every crossing lies on 2x + 3y = level.
        double[] x = axis(13, -1, 2);
        double[] y = axis(9, 0, 1.5);
        double[][] v = new double[y.length][x.length];
        for (int k = 0; k < y.length; k++) {
            for (int i = 0; i < x.length; i++) {
                v[k][i] = 2 * x[i] + 3 * y[k];
            }
        }
        List<double[]> seg = new ArrayList<>();
        ContourTracer.trace(x, y, v, 1.7, (x0, y0, x1, y1) -> seg.add(new double[] {x0, y0, x1, y1}), new double[4]);
        assertTrue(seg.size() > 5);
        double length = 0;
        for (double[] s : seg) {
            assertEquals(1.7, 2 * s[0] + 3 * s[1], 1e-12);
            assertEquals(1.7, 2 * s[2] + 3 * s[3], 1e-12);
            length += Math.hypot(s[2] - s[0], s[3] - s[1]);
        }
        // The line 2x + 3y = 1.7 crosses the box from (−1, 1.2333) to (0.85, 0): length by hand.
        assertEquals(Math.hypot(1.85, 3.7 / 3), length, 1e-9);
    }

    @Test
    void aConeGivesACircleWithinTheGridError() {
        // v = √(x² + y²) is linear along rays, so crossings sit on the circle of radius level
        // to within the chord error of the grid; the traced length approaches 2πR.
        double[] x = axis(81, -1, 1);
        double[] y = axis(81, -1, 1);
        double[][] v = new double[y.length][x.length];
        for (int k = 0; k < y.length; k++) {
            for (int i = 0; i < x.length; i++) {
                v[k][i] = Math.hypot(x[i], y[k]);
            }
        }
        List<double[]> seg = new ArrayList<>();
        ContourTracer.trace(x, y, v, 0.6, (x0, y0, x1, y1) -> seg.add(new double[] {x0, y0, x1, y1}), new double[4]);
        double length = 0;
        for (double[] s : seg) {
            assertEquals(0.6, Math.hypot(s[0], s[1]), 2e-3);
            length += Math.hypot(s[2] - s[0], s[3] - s[1]);
        }
        assertEquals(2 * Math.PI * 0.6, length, 5e-3 * 2 * Math.PI * 0.6);
    }

    @Test
    void aSaddleIsSplitByTheCentreValue() {
        // One cell with a = c = 1 (above) and b = d = 0, level 0.6: the centre (0.5) is below,
        // so a and c are cut off by two pieces; at level 0.4 the centre is above, b and d are.
        double[] x = {0, 1};
        double[] y = {0, 1};
        double[][] v = {{1, 0}, {0, 1}};
        List<double[]> high = new ArrayList<>();
        ContourTracer.trace(x, y, v, 0.6, (x0, y0, x1, y1) -> high.add(new double[] {x0, y0, x1, y1}), new double[4]);
        assertEquals(2, high.size());
        for (double[] s : high) {
            // each piece stays near a (0,0) or c (1,1): both ends on the same side of x + y = 1
            assertTrue((s[0] + s[1] - 1) * (s[2] + s[3] - 1) > 0);
        }
        List<double[]> low = new ArrayList<>();
        ContourTracer.trace(x, y, v, 0.4, (x0, y0, x1, y1) -> low.add(new double[] {x0, y0, x1, y1}), new double[4]);
        assertEquals(2, low.size());
        for (double[] s : low) {
            // each piece stays near b (1,0) or d (0,1): both ends on the same side of y = x
            assertTrue((s[1] - s[0]) * (s[3] - s[2]) > 0);
        }
    }
}
