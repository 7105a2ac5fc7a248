/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.internal.Require;
import java.util.function.ToDoubleFunction;

/** Point and grid sampling of solved fields, shared by both kinds of evaluation. */
final class Sampling {

    private Sampling() {
    }

    /**
     * The volume mean over a sensor region of a quantity given at its sample points: samples
     * weighted by the ring area 2πr·Δr and the trapezoid rule along z; a point region gives
     * its one value.
     */
    static double volumeMean(SensorRegion sensor, ToDoubleFunction<Point> value) {
        Point[] p = sensor.samples();
        if (p.length == 1) {
            return value.applyAsDouble(p[0]);
        }
        int nr = SensorRegion.RADIAL_SAMPLES;
        int nz = SensorRegion.AXIAL_SAMPLES;
        double dr = sensor.radiusMetres() / (nr - 1);
        double sum = 0;
        double weights = 0;
        for (int j = 0; j < nz; j++) {
            double wz = j == 0 || j == nz - 1 ? 0.5 : 1;
            for (int i = 0; i < nr; i++) {
                // Ring areas: the axis sample stands for the disc of radius Δr/2 (area πΔr²/4 =
                // 2π·(Δr/8)·Δr), the rim sample for the half ring inside the rim.
                double wr = i == 0 ? dr / 8 : i == nr - 1 ? 0.5 * i * dr : i * dr;
                double w = wz * wr;
                sum += w * value.applyAsDouble(p[i + nr * j]);
                weights += w;
            }
        }
        return sum / weights;
    }

    static void checkInside(Field f, Point p) {
        checkInside(f.mesh(), p);
    }

    static void checkInside(Mesh mesh, Point p) {
        double r = mesh.boxRadius();
        double z0 = mesh.boxLower();
        double z1 = mesh.boxUpper();
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
