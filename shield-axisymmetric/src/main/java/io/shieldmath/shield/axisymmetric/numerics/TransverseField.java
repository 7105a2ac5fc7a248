/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * A solved first-mode scalar potential Φ1 (see {@link TransverseSolve}) per unit applied
 * field H0 across the axis: nodal values of the unknowns plus the boundary rule (0 on the
 * axis, −r on the far boundary). The field is H = −∇(Φ1·cos φ):
 * H_r = −(∂Φ1/∂r)·cos φ, H_φ = (Φ1/r)·sin φ, H_z = −(∂Φ1/∂z)·cos φ, so far away
 * H = H0 along φ = 0. Immutable and thread-safe; evaluation works on primitives.
 */
public final class TransverseField {

    private final Mesh mesh;
    private final double[] muRe;
    private final double[] muIm;
    private final double[] xr;
    private final double[] xi;
    private final double residualBefore;
    private final double residualAfter;

    TransverseField(TransverseSolve solve, double[] xr, double[] xi, double before, double after) {
        this.mesh = solve.mesh;
        this.muRe = solve.muRe;
        this.muIm = solve.muIm;
        this.xr = xr;
        this.xi = xi;
        this.residualBefore = before;
        this.residualAfter = after;
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

    private double nodeRe(int i, int j) {
        int k = mesh.unknown(i, j);
        return k >= 0 ? xr[k] : -mesh.rl[i];
    }

    private double nodeIm(int i, int j) {
        int k = mesh.unknown(i, j);
        return k >= 0 ? xi[k] : 0;
    }

    /**
     * Evaluates the field's azimuthal amplitudes at a point inside the box, per unit H0.
     *
     * @param r   radius in m, 0 to the box radius
     * @param z   axial coordinate in m, within the box
     * @param out receives [h_r re, h_r im, h_φ re, h_φ im, h_z re, h_z im], where
     *            H = (h_r·cos φ, h_φ·sin φ, h_z·cos φ)·H0
     */
    public void evaluate(double r, double z, double[] out) {
        int i = Field.cell(mesh.rl, r);
        int j = Field.cell(mesh.zl, z);
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
            double p = a0 * u0 * v0 + a1 * u1 * v0 + a2 * u1 * v1 + a3 * u0 * v1;
            double dPdr = ((a1 - a0) * v0 + (a2 - a3) * v1) / hR;
            double dPdz = ((a3 - a0) * u0 + (a2 - a1) * u1) / hZ;
            // Φ1/r: next to the axis the nodes at r = 0 hold Φ1 = 0, so Φ1 = (r/h)(v0·a1 + v1·a2)
            // and Φ1/r = (v0·a1 + v1·a2)/h exactly, finite on the axis itself (where it equals
            // ∂Φ1/∂r, so H is single-valued there).
            double pOverR = i == 0 ? (v0 * a1 + v1 * a2) / hR : p / r;
            out[part] = -dPdr;
            out[2 + part] = pOverR;
            out[4 + part] = -dPdz;
        }
    }

    /**
     * The modulus of the relative permeability of the element holding a point (the upper or
     * outer element on a grid line), to turn H into B = µ0·µr·H.
     *
     * @param r radius in m, 0 to the box radius
     * @param z axial coordinate in m, within the box
     * @return |µr|, 1 in air
     */
    public double permeabilityModulus(double r, double z) {
        int i = Field.cell(mesh.rl, r);
        int j = Field.cell(mesh.zl, z);
        int mat = mesh.elementMaterial[i + (mesh.nr - 1) * j];
        return Math.hypot(muRe[mat], muIm[mat]);
    }
}
