/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

/**
 * Contour lines of a function sampled on a rectangular grid, by marching squares: each grid
 * cell is classified by which of its four corners lie above the level, and the contour
 * crosses each edge whose ends lie on opposite sides, at the point found by linear
 * interpolation along that edge (W. E. Lorensen and H. E. Cline, "Marching cubes: a high
 * resolution 3D surface construction algorithm", Computer Graphics 21 (1987) 163, in its
 * two-dimensional form). The two saddle cases, where diagonal corners lie on the same side,
 * are decided by the mean of the four corners, taken as the value at the cell's centre.
 *
 * <p>Stateless; allocates nothing per cell. Not for use outside this package.
 */
final class ContourTracer {

    /** Receives one straight piece of a contour, in the grid's coordinates. */
    @FunctionalInterface
    interface Segments {
        /**
         * One piece from (x0, y0) to (x1, y1).
         *
         * @param x0 start, first coordinate
         * @param y0 start, second coordinate
         * @param x1 end, first coordinate
         * @param y1 end, second coordinate
         */
        void segment(double x0, double y0, double x1, double y1);
    }

    private ContourTracer() {
    }

    /**
     * Traces one level.
     *
     * @param x       the column coordinates, ascending, at least 2
     * @param y       the row coordinates, ascending, at least 2
     * @param v       the values, [row][column]
     * @param level   the contour level
     * @param sink    receives the pieces
     * @param scratch at least 4 doubles of working space
     */
    static void trace(double[] x, double[] y, double[][] v, double level, Segments sink, double[] scratch) {
        for (int k = 0; k + 1 < y.length; k++) {
            for (int i = 0; i + 1 < x.length; i++) {
                double a = v[k][i];          // (x[i],   y[k])
                double b = v[k][i + 1];      // (x[i+1], y[k])
                double c = v[k + 1][i + 1];  // (x[i+1], y[k+1])
                double d = v[k + 1][i];      // (x[i],   y[k+1])
                int index = (a > level ? 1 : 0) | (b > level ? 2 : 0) | (c > level ? 4 : 0) | (d > level ? 8 : 0);
                if (index == 0 || index == 15) {
                    continue;
                }
                boolean centreAbove = (a + b + c + d) / 4 > level;
                switch (index) {
                    case 1, 14 -> piece(sink, x, y, i, k, a, b, c, d, level, 3, 0, scratch);
                    case 2, 13 -> piece(sink, x, y, i, k, a, b, c, d, level, 0, 1, scratch);
                    case 3, 12 -> piece(sink, x, y, i, k, a, b, c, d, level, 3, 1, scratch);
                    case 4, 11 -> piece(sink, x, y, i, k, a, b, c, d, level, 1, 2, scratch);
                    case 6, 9 -> piece(sink, x, y, i, k, a, b, c, d, level, 0, 2, scratch);
                    case 7, 8 -> piece(sink, x, y, i, k, a, b, c, d, level, 3, 2, scratch);
                    case 5, 10 -> {
                        // Saddle. Case 5 (a, c above) with the centre above: the joined region
                        // cuts off b and d; case 10 (b, d above) with the centre below: the same
                        // two pieces. Otherwise a and c are cut off.
                        if (centreAbove == (index == 5)) {
                            piece(sink, x, y, i, k, a, b, c, d, level, 0, 1, scratch);
                            piece(sink, x, y, i, k, a, b, c, d, level, 2, 3, scratch);
                        } else {
                            piece(sink, x, y, i, k, a, b, c, d, level, 3, 0, scratch);
                            piece(sink, x, y, i, k, a, b, c, d, level, 1, 2, scratch);
                        }
                    }
                    default -> throw new AssertionError(index);
                }
            }
        }
    }

    /** One piece between the crossings of two cell edges (0 bottom a–b, 1 right b–c, 2 top c–d, 3 left d–a). */
    private static void piece(Segments sink, double[] x, double[] y, int i, int k, double a, double b, double c,
                              double d, double level, int from, int to, double[] s) {
        crossing(x, y, i, k, a, b, c, d, level, from, s, 0);
        crossing(x, y, i, k, a, b, c, d, level, to, s, 2);
        sink.segment(s[0], s[1], s[2], s[3]);
    }

    private static void crossing(double[] x, double[] y, int i, int k, double a, double b, double c, double d,
                                 double level, int edge, double[] s, int at) {
        switch (edge) {
            case 0 -> {
                s[at] = x[i] + (x[i + 1] - x[i]) * (level - a) / (b - a);
                s[at + 1] = y[k];
            }
            case 1 -> {
                s[at] = x[i + 1];
                s[at + 1] = y[k] + (y[k + 1] - y[k]) * (level - b) / (c - b);
            }
            case 2 -> {
                s[at] = x[i + 1] + (x[i] - x[i + 1]) * (level - c) / (d - c);
                s[at + 1] = y[k + 1];
            }
            default -> {
                s[at] = x[i];
                s[at + 1] = y[k + 1] + (y[k] - y[k + 1]) * (level - d) / (a - d);
            }
        }
    }
}
