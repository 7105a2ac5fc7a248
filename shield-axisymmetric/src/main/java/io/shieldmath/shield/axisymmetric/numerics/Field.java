/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * A solved field A_φ on a mesh: nodal values of the unknowns plus the boundary rule
 * (A = scale·r/2 on the axis and the far boundary; scale 0 for coil sources, 1 T for the
 * uniform applied field). Post-processing on primitives: flux linkage, B at a point, ψ = r·A
 * and the eddy-current loss per material. Immutable and thread-safe.
 */
public final class Field {

    private final Mesh mesh;
    private final double omega;
    private final double[] wSigma;
    private final double[] xr;
    private final double[] xi;
    private final double scale;
    private final double residualBefore;
    private final double residualAfter;

    Field(HarmonicSolve solve, double[] xr, double[] xi, double scale, double before, double after) {
        this(solve.mesh, solve.omega, solve.wSigma, xr, xi, scale, before, after);
    }

    /** A field from another solver on the same mesh (the nonlinear solves of {@link SaturableSolve}). */
    Field(Mesh mesh, double omega, double[] wSigma, double[] xr, double[] xi, double scale, double before,
          double after) {
        this.mesh = mesh;
        this.omega = omega;
        this.wSigma = wSigma;
        this.xr = xr;
        this.xi = xi;
        this.scale = scale;
        this.residualBefore = before;
        this.residualAfter = after;
    }

    /**
     * The relative residual ‖f − S·x‖/‖f‖ of the first solve, before refinement.
     *
     * @return the residual
     */
    public double residualBeforeRefinement() {
        return residualBefore;
    }

    /**
     * The relative residual after one step of iterative refinement.
     *
     * @return the residual
     */
    public double residualAfterRefinement() {
        return residualAfter;
    }

    /**
     * The mesh this field lives on.
     *
     * @return the mesh
     */
    public Mesh mesh() {
        return mesh;
    }

    /**
     * The flux linkage of a coil per ampere of this field's source, 2π·fᵀA.
     *
     * @param coil the coil's index
     * @param out  receives [re, im] in Wb per A (henries)
     */
    public void linkage(int coil, double[] out) {
        double[] f = mesh.load(coil);
        double sr = 0;
        double si = 0;
        for (int k = 0; k < f.length; k++) {
            sr += f[k] * xr[k];
            si += f[k] * xi[k];
        }
        out[0] = 2 * Math.PI * sr;
        out[1] = 2 * Math.PI * si;
    }

    private double nodeRe(int i, int j) {
        int k = mesh.unknown(i, j);
        return k >= 0 ? xr[k] : 0.5 * scale * mesh.rl[i];
    }

    private double nodeIm(int i, int j) {
        int k = mesh.unknown(i, j);
        return k >= 0 ? xi[k] : 0;
    }

    /** The index of the grid cell holding x (the upper one on a line); shared with the transverse fields. */
    static int cell(double[] lines, double x) {
        int lo = 0;
        int hi = lines.length - 2;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (lines[mid] <= x) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /**
     * Evaluates A and B at a point inside the box.
     *
     * @param r   radius in m, 0 to the box radius
     * @param z   axial coordinate in m, within the box
     * @param out receives [A re, A im, B_r re, B_r im, B_z re, B_z im] (Wb/m and T)
     */
    public void evaluate(double r, double z, double[] out) {
        int i = cell(mesh.rl, r);
        int j = cell(mesh.zl, z);
        double ra = mesh.rl[i];
        double rb = mesh.rl[i + 1];
        double za = mesh.zl[j];
        double zb = mesh.zl[j + 1];
        double hR = rb - ra;
        double hZ = zb - za;
        double u0 = (rb - r) / hR;
        double u1 = (r - ra) / hR;
        double v0 = (zb - z) / hZ;
        double v1 = (z - za) / hZ;
        for (int part = 0; part < 2; part++) {
            double a0 = part == 0 ? nodeRe(i, j) : nodeIm(i, j);
            double a1 = part == 0 ? nodeRe(i + 1, j) : nodeIm(i + 1, j);
            double a2 = part == 0 ? nodeRe(i + 1, j + 1) : nodeIm(i + 1, j + 1);
            double a3 = part == 0 ? nodeRe(i, j + 1) : nodeIm(i, j + 1);
            double a = a0 * u0 * v0 + a1 * u1 * v0 + a2 * u1 * v1 + a3 * u0 * v1;
            double dAdr = ((a1 - a0) * v0 + (a2 - a3) * v1) / hR;
            double dAdz = ((a3 - a0) * u0 + (a2 - a1) * u1) / hZ;
            // A/r: next to the axis the nodes at r = 0 hold A = 0, so A = (r/h)(v0·a1 + v1·a2)
            // and A/r = (v0·a1 + v1·a2)/h exactly, finite on the axis itself.
            double aOverR = i == 0 ? (v0 * a1 + v1 * a2) / hR : a / r;
            out[part] = a;
            out[2 + part] = -dAdz;
            out[4 + part] = dAdr + aOverR;
        }
    }

    /**
     * The time-averaged eddy-current loss in the elements of one material for a 1 A peak
     * source: P = ½∫|J|²/σ dV = ½·ω²·2π·Σ_e A_eᴴ·σ·M_e·A_e (J = −jωσA, peak phasors). The
     * same 2×2 Gauss rule as the mass matrix integrates the bilinear product exactly.
     *
     * @param material the material index, 1 or more
     * @return the loss in W per A² (peak)
     */
    public double jouleLoss(int material) {
        double p = 0;
        double ws = wSigma[material];
        if (ws == 0) {
            return 0;
        }
        double[] ar = new double[4];
        double[] ai = new double[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                int el = i + (mesh.nr - 1) * j;
                if (mesh.elementMaterial[el] != material) {
                    continue;
                }
                ar[0] = nodeRe(i, j);
                ar[1] = nodeRe(i + 1, j);
                ar[2] = nodeRe(i + 1, j + 1);
                ar[3] = nodeRe(i, j + 1);
                ai[0] = nodeIm(i, j);
                ai[1] = nodeIm(i + 1, j);
                ai[2] = nodeIm(i + 1, j + 1);
                ai[3] = nodeIm(i, j + 1);
                for (int a = 0; a < 4; a++) {
                    for (int b = 0; b < 4; b++) {
                        p += mesh.mGeo[16 * el + 4 * a + b] * (ar[a] * ar[b] + ai[a] * ai[b]);
                    }
                }
            }
        }
        // ωσ·ω = ω²σ; ws is ω·σ.
        return 0.5 * ws * omega * 2 * Math.PI * p;
    }
}
