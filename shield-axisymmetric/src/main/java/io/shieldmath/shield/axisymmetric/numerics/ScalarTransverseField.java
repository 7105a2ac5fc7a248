/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * The first-mode scalar potential Φ1 (see {@link TransverseSolve}) per unit applied field
 * H0: nodal values of the unknowns plus the boundary rule (0 on the axis, −r on the far
 * boundary). H = −∇(Φ1·cos φ): H_r = −(∂Φ1/∂r)·cos φ, H_φ = (Φ1/r)·sin φ,
 * H_z = −(∂Φ1/∂z)·cos φ, so far away H = H0 along φ = 0; B = µr·H per unit B0 = µ0·H0.
 */
final class ScalarTransverseField extends TransverseField {

    private final Mesh mesh;
    private final double[] muRe;
    private final double[] muIm;
    private final double[] xr;
    private final double[] xi;

    ScalarTransverseField(TransverseSolve solve, double[] xr, double[] xi, double before, double after) {
        super(solve.mesh, before, after);
        this.mesh = solve.mesh;
        this.muRe = solve.muRe;
        this.muIm = solve.muIm;
        this.xr = xr;
        this.xi = xi;
    }

    private double nodeRe(int i, int j) {
        int k = mesh.unknown(i, j);
        return k >= 0 ? xr[k] : -mesh.rl[i];
    }

    private double nodeIm(int i, int j) {
        int k = mesh.unknown(i, j);
        return k >= 0 ? xi[k] : 0;
    }

    @Override
    public void evaluate(double r, double z, double[] out) {
        int i = Field.cell(mesh.rl, r);
        int j = Field.cell(mesh.zl, z);
        int mat = mesh.elementMaterial[i + (mesh.nr - 1) * j];
        fluxDensity(mesh, i, j, r, z, nodeRe(i, j), nodeRe(i + 1, j), nodeRe(i + 1, j + 1), nodeRe(i, j + 1),
                nodeIm(i, j), nodeIm(i + 1, j), nodeIm(i + 1, j + 1), nodeIm(i, j + 1), muRe[mat], muIm[mat], out);
    }

    /**
     * B = µr·H with H = −∇(Φ1·cos φ) in element (i, j) of the mesh, from the potential's
     * values at its four nodes (local order (i,j), (i+1,j), (i+1,j+1), (i,j+1)): shared by the
     * scalar solve and the non-conducting region of {@link TransverseEddySolve}.
     *
     * (the four nodes' real parts, then their imaginary parts: no array per point).
     *
     * @param mr  µr′ of the element
     * @param mi  the imaginary part of µr (−µr″)
     * @param out receives [b_r re, b_r im, b_φ re, b_φ im, b_z re, b_z im]
     */
    static void fluxDensity(Mesh mesh, int i, int j, double r, double z, double p0, double p1, double p2, double p3,
                            double q0, double q1, double q2, double q3, double mr, double mi, double[] out) {
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
            double a0 = part == 0 ? p0 : q0;
            double a1 = part == 0 ? p1 : q1;
            double a2 = part == 0 ? p2 : q2;
            double a3 = part == 0 ? p3 : q3;
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
        // B = µr·H, µr of the element holding the point (the upper or outer one on a grid line).
        for (int c = 0; c < 6; c += 2) {
            double hr = out[c];
            double hi = out[c + 1];
            out[c] = mr * hr - mi * hi;
            out[c + 1] = mr * hi + mi * hr;
        }
    }
}
