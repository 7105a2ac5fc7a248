/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.internal.Require;

/** Point and grid sampling of solved fields, shared by both kinds of evaluation. */
final class Sampling {

    private Sampling() {
    }

    static void checkInside(Field f, Point p) {
        double r = f.mesh().boxRadius();
        double z0 = f.mesh().boxLower();
        double z1 = f.mesh().boxUpper();
        if (p.radiusMetres() > r || p.axialMetres() < z0 || p.axialMetres() > z1) {
            throw new IllegalArgumentException("point " + p + " lies outside the solved region r ≤ " + (float) r
                    + " m, " + (float) z0 + " m ≤ z ≤ " + (float) z1 + " m");
        }
    }

    /** B at a point scaled by {@code scale}, with the change from the coarse field as estimate. */
    static FluxDensitySample sample(Field fine, Field coarse, Point p, double scale) {
        checkInside(fine, p);
        double[] a = new double[6];
        double[] c = new double[6];
        fine.evaluate(p.radiusMetres(), p.axialMetres(), a);
        coarse.evaluate(p.radiusMetres(), p.axialMetres(), c);
        double bf = Math.hypot(Math.hypot(a[2], a[3]), Math.hypot(a[4], a[5]));
        double bc = Math.hypot(Math.hypot(c[2], c[3]), Math.hypot(c[4], c[5]));
        return new FluxDensitySample(p, scale * a[2], scale * a[3], scale * a[4], scale * a[5],
                Math.abs(scale) * Math.abs(bf - bc));
    }

    static FieldMap map(Field f, Point from, Point to, int columns, int rows, double scale) {
        Require.nonNull("map corner", from);
        Require.nonNull("map corner", to);
        Require.inRange("map columns", columns, 2, 2000, "points");
        Require.inRange("map rows", rows, 2, 2000, "points");
        checkInside(f, from);
        checkInside(f, to);
        double ra = Math.min(from.radiusMetres(), to.radiusMetres());
        double rb = Math.max(from.radiusMetres(), to.radiusMetres());
        double za = Math.min(from.axialMetres(), to.axialMetres());
        double zb = Math.max(from.axialMetres(), to.axialMetres());
        if (!(rb > ra && zb > za)) {
            throw new IllegalArgumentException("the map corners " + from + " and " + to
                    + " must differ in both r and z");
        }
        double[] r = new double[columns];
        double[] z = new double[rows];
        for (int i = 0; i < columns; i++) {
            r[i] = ra + (rb - ra) * i / (columns - 1);
        }
        for (int k = 0; k < rows; k++) {
            z[k] = za + (zb - za) * k / (rows - 1);
        }
        double[][] b = new double[rows][columns];
        double[][] pr = new double[rows][columns];
        double[][] pi = new double[rows][columns];
        double[] v = new double[6];
        for (int k = 0; k < rows; k++) {
            for (int i = 0; i < columns; i++) {
                f.evaluate(r[i], z[k], v);
                b[k][i] = Math.abs(scale) * Math.hypot(Math.hypot(v[2], v[3]), Math.hypot(v[4], v[5]));
                pr[k][i] = scale * r[i] * v[0];
                pi[k][i] = scale * r[i] * v[1];
            }
        }
        return new FieldMap(r, z, b, pr, pi);
    }
}
