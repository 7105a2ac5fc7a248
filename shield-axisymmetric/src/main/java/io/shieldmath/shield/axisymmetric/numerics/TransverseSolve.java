/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * The magnetic scalar potential of the first azimuthal mode on a {@link Mesh}: bodies of
 * revolution in a uniform applied field across the axis, with no current anywhere.
 *
 * <p>Formulation. With no current, H = −∇Φ and ∇·(µ∇Φ) = 0. A uniform applied field H0
 * along x = r·cos φ has the potential −H0·r·cos φ, and a body of revolution couples no other
 * azimuthal mode to it, so Φ = Φ1(r, z)·cos φ exactly. Putting that into the energy
 * ∫ µ|∇Φ|² dV and integrating over φ leaves, per π,
 * <pre>
 *   W(Φ1) = ∫ µ [ (∂Φ1/∂r)² + (∂Φ1/∂z)² + Φ1²/r² ] r dr dz,
 * </pre>
 * whose Galerkin form with bilinear elements on the mesh's tensor grid is assembled here.
 * Φ1 = 0 on the axis (the mode-one part of a smooth function vanishes there), and
 * Φ1 = −r per unit H0 on the far boundary. This is the Fourier (r, z)-finite-element
 * method for axisymmetric domains with non-axisymmetric data of B. Mercier and G. Raugel,
 * RAIRO Analyse numérique 16 (1982) 405–461, and of C. Bernardi, M. Dauge and Y. Maday,
 * <i>Spectral Methods for Axisymmetric Domains</i>, Gauthier-Villars, 1999, applied to the
 * magnetic scalar potential; C. G. Albert, O. Bíró and P. Lainer (arXiv:2008.13681) give the
 * vector-potential counterpart for magnetostatics.
 *
 * <p>Why it is exact in air: Φ1 = −r lies in the bilinear space and satisfies the mode-one
 * equation (1/r)∂(r∂Φ1/∂r)/∂r − Φ1/r² = 0; with Φ1 = r the element integrand of every test
 * function is ∂(r·N)/∂r, a polynomial of degree two in r that the 2×2 Gauss rule integrates
 * exactly, and whose integral over a test function's support vanishes. So with every body
 * set to air the computed field is the applied one to rounding.
 *
 * <p>Quadrature: 2×2 Gauss–Legendre per element, as the axial solver. Next to the axis the
 * surviving shape functions are ∝ r, so Φ1²/r² stays bounded and no Gauss point sits on
 * r = 0.
 *
 * <p>Solve: per element the matrix is (µ' − jµ'')·K with µ' &gt; 0 and K the element's
 * geometric matrix, so its real part is symmetric positive definite and LDLᵀ without
 * pivoting exists (see {@link HarmonicSolve}); a static solve (µ'' = 0) is real and takes the
 * real factorisation. One step of iterative
 * refinement follows, as in {@link HarmonicSolve}.
 *
 * <p>Immutable after construction; one instance may serve several threads.
 */
public final class TransverseSolve {

    /** Gauss–Legendre abscissa on [−1, 1] of the 2-point rule, 1/√3. */
    private static final double G = 1 / Math.sqrt(3);

    final Mesh mesh;
    final double[] muRe;
    final double[] muIm;
    private final double[] kGeo;
    private final double[] re;
    private final double[] im;
    private final boolean real;
    private final double pivotRatio;

    /**
     * Assembles and factors.
     *
     * @param mesh        the mesh
     * @param hertz       the frequency at which each body's permeability is taken, 0 or more;
     *                    the caller guarantees that no body conducts when it is above 0
     * @param bodiesAsAir true to give every body the permeability of air (the reference solve)
     */
    public TransverseSolve(Mesh mesh, double hertz, boolean bodiesAsAir) {
        this.mesh = mesh;
        muRe = new double[mesh.materials];
        muIm = new double[mesh.materials];
        permeabilities(mesh, hertz, bodiesAsAir, muRe, muIm);
        boolean isReal = true;
        for (double v : muIm) {
            isReal &= v == 0;
        }
        real = isReal;
        kGeo = elementMatrices(mesh);
        int n = mesh.n;
        int b = mesh.band;
        int w = b + 1;
        re = new double[Math.multiplyExact(n, w)];
        im = real ? null : new double[n * w];
        int[] g = new int[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                int el = i + (mesh.nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                mesh.elementUnknowns(i, j, g);
                for (int p = 0; p < 4; p++) {
                    int gp = g[p];
                    if (gp < 0) {
                        continue;
                    }
                    for (int q = 0; q < 4; q++) {
                        int gq = g[q];
                        if (gq < 0 || gq > gp) {
                            continue;
                        }
                        double k = kGeo[16 * el + 4 * p + q];
                        int slot = gp * w + gq - gp + b;
                        re[slot] += muRe[mat] * k;
                        if (!real) {
                            im[slot] += muIm[mat] * k;
                        }
                    }
                }
            }
        }
        pivotRatio = real ? BandedLdlt.factorReal(n, b, re) : BandedLdlt.factor(n, b, re, im);
    }

    /**
     * Every material's relative permeability µr = µ' − jµ'' at the frequency (1 for air, and
     * for every body when they are taken as air): the coefficient of the scalar energy.
     * Shared with {@link TransverseEddySolve}.
     */
    static void permeabilities(Mesh mesh, double hertz, boolean bodiesAsAir, double[] muRe, double[] muIm) {
        for (int k = 0; k < mesh.materials; k++) {
            if (k == 0 || bodiesAsAir) {
                muRe[k] = 1;
            } else {
                muRe[k] = mesh.layout.mu[k].real(hertz);
                muIm[k] = -mesh.layout.mu[k].loss(hertz);
            }
        }
    }

    /** ∫ [∂N_a/∂r·∂N_b/∂r + ∂N_a/∂z·∂N_b/∂z + N_a·N_b/r²] r dr dz of every element, 16 per element. */
    static double[] elementMatrices(Mesh mesh) {
        int ne = (mesh.nr - 1) * (mesh.nz - 1);
        double[] k = new double[16 * ne];
        double[] nv = new double[4];
        double[] dr = new double[4];
        double[] dz = new double[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                int el = i + (mesh.nr - 1) * j;
                double ra = mesh.rl[i];
                double rb = mesh.rl[i + 1];
                double za = mesh.zl[j];
                double zb = mesh.zl[j + 1];
                double hR = rb - ra;
                double hZ = zb - za;
                for (int gi = 0; gi < 2; gi++) {
                    double r = 0.5 * (ra + rb) + (gi == 0 ? -G : G) * 0.5 * hR;
                    for (int gj = 0; gj < 2; gj++) {
                        double z = 0.5 * (za + zb) + (gj == 0 ? -G : G) * 0.5 * hZ;
                        double w = 0.25 * hR * hZ * r;
                        Mesh.shape(r, z, ra, rb, za, zb, nv, dr, dz);
                        for (int a = 0; a < 4; a++) {
                            for (int b = 0; b < 4; b++) {
                                k[16 * el + 4 * a + b] += w * (dr[a] * dr[b] + dz[a] * dz[b] + nv[a] * nv[b] / (r * r));
                            }
                        }
                    }
                }
            }
        }
        return k;
    }

    /**
     * The smallest pivot modulus over the largest diagonal modulus, a health indicator.
     *
     * @return the ratio, greater than 0 for a non-singular factorisation
     */
    public double pivotRatio() {
        return pivotRatio;
    }

    /**
     * The potential of a uniform applied field of 1 A/m across the axis (Φ1 = −r on the far
     * boundary, 0 on the axis).
     *
     * @return the field
     */
    public TransverseField uniformField() {
        // Move the known boundary values to the right-hand side: f_p = −Σ_q S_pq·g_q, g_q = −r_q.
        double[] fr = new double[mesh.n];
        double[] fi = new double[mesh.n];
        int[] g = new int[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                mesh.elementUnknowns(i, j, g);
                if (g[0] >= 0 && g[1] >= 0 && g[2] >= 0 && g[3] >= 0) {
                    continue;
                }
                int el = i + (mesh.nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                for (int p = 0; p < 4; p++) {
                    if (g[p] < 0) {
                        continue;
                    }
                    for (int q = 0; q < 4; q++) {
                        if (g[q] >= 0) {
                            continue;
                        }
                        // Local nodes 1 and 2 sit on line i + 1, nodes 0 and 3 on line i.
                        double value = -mesh.rl[q == 1 || q == 2 ? i + 1 : i];
                        double k = kGeo[16 * el + 4 * p + q];
                        fr[g[p]] -= muRe[mat] * k * value;
                        fi[g[p]] -= muIm[mat] * k * value;
                    }
                }
            }
        }
        int n = mesh.n;
        double[] xr = fr.clone();
        double[] xi = fi.clone();
        substitute(xr, xi);
        double[] rr = new double[n];
        double[] ri = new double[n];
        double fNorm = Math.sqrt(dot(fr, fr) + dot(fi, fi));
        double before = residual(fr, fi, xr, xi, rr, ri) / fNorm;
        // One step of iterative refinement in working precision (N. J. Higham, Accuracy and
        // Stability of Numerical Algorithms, 2002, §12.2), as in the axial solve.
        substitute(rr, ri);
        for (int k = 0; k < n; k++) {
            xr[k] += rr[k];
            xi[k] += ri[k];
        }
        double after = residual(fr, fi, xr, xi, rr, ri) / fNorm;
        return new ScalarTransverseField(this, xr, xi, before, after);
    }

    private void substitute(double[] xr, double[] xi) {
        if (real) {
            BandedLdlt.solveReal(mesh.n, mesh.band, re, xr, xi);
        } else {
            BandedLdlt.solve(mesh.n, mesh.band, re, im, xr, xi);
        }
    }

    /** r = f − S·x, matrix-free from the element matrices; returns ‖r‖₂. */
    private double residual(double[] fr, double[] fi, double[] xr, double[] xi, double[] rr, double[] ri) {
        System.arraycopy(fr, 0, rr, 0, fr.length);
        System.arraycopy(fi, 0, ri, 0, fi.length);
        int[] g = new int[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                int el = i + (mesh.nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                double a = muRe[mat];
                double c = muIm[mat];
                mesh.elementUnknowns(i, j, g);
                for (int p = 0; p < 4; p++) {
                    if (g[p] < 0) {
                        continue;
                    }
                    double sr = 0;
                    double si = 0;
                    for (int q = 0; q < 4; q++) {
                        if (g[q] < 0) {
                            continue;
                        }
                        double k = kGeo[16 * el + 4 * p + q];
                        sr += k * (a * xr[g[q]] - c * xi[g[q]]);
                        si += k * (a * xi[g[q]] + c * xr[g[q]]);
                    }
                    rr[g[p]] -= sr;
                    ri[g[p]] -= si;
                }
            }
        }
        return Math.sqrt(dot(rr, rr) + dot(ri, ri));
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int k = 0; k < a.length; k++) {
            s += a[k] * b[k];
        }
        return s;
    }
}
