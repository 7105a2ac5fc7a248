/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

/**
 * Field samples on a rectangular grid of the (r, z) half-plane, for plotting: the peak
 * magnitude |B| and the flux function ψ = r·A_φ, whose contours are the flux lines (the flux
 * through the circle of radius r at height z is 2π·ψ). Row k holds the points at z[k],
 * column i those at r[i]. All getters return copies. Immutable and thread-safe.
 */
public final class FieldMap {

    private final double[] r;
    private final double[] z;
    private final double[][] b;
    private final double[][] psiRe;
    private final double[][] psiIm;

    FieldMap(double[] r, double[] z, double[][] b, double[][] psiRe, double[][] psiIm) {
        this.r = r;
        this.z = z;
        this.b = b;
        this.psiRe = psiRe;
        this.psiIm = psiIm;
    }

    /**
     * The column radii.
     *
     * @return r in m, ascending
     */
    public double[] radiiMetres() {
        return r.clone();
    }

    /**
     * The row axial coordinates.
     *
     * @return z in m, ascending
     */
    public double[] axialMetres() {
        return z.clone();
    }

    /**
     * |B| at every grid point.
     *
     * @return [row][column] in T (peak)
     */
    public double[][] fluxDensityTesla() {
        return copy(b);
    }

    /**
     * Re ψ = Re(r·A_φ) at every grid point.
     *
     * @return [row][column] in Wb/rad (webers per radian)
     */
    public double[][] fluxFunctionReal() {
        return copy(psiRe);
    }

    /**
     * Im ψ = Im(r·A_φ) at every grid point (zero for a static field).
     *
     * @return [row][column] in Wb/rad
     */
    public double[][] fluxFunctionImaginary() {
        return copy(psiIm);
    }

    private static double[][] copy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }

    @Override
    public String toString() {
        return "field map " + r.length + " × " + z.length + " points, r " + r[0] + " to " + r[r.length - 1]
                + " m, z " + z[0] + " to " + z[z.length - 1] + " m";
    }
}
