/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The numeric part of a solve at one frequency on a {@link Mesh}: the matrix
 * S = K(ν) + jω·M(σ), assembled into band storage, factored once by {@link BandedLdlt},
 * then used for any number of right-hand sides.
 *
 * <p>Why no pivoting is needed. Per element, ν = 1/(µ0·µr) with µr = µ' − jµ'' (µ' &gt; 0,
 * µ'' ≥ 0 by the permeability model's contract), so ν = (µ' + jµ'')/(µ0|µr|²) has ν' &gt; 0
 * and ν'' ≥ 0. Hence S = B + jC with B = K(ν') and C = K(ν'') + ω·M(σ), both real symmetric.
 * B is the stiffness of a positive coefficient with A fixed on the axis and the far boundary:
 * xᵀBx = ∫ ν'[(∂u/∂z)² + (∂(ru)/∂r / r)²] r dr dz &gt; 0 for every non-zero nodal vector x of the
 * interpolant u, because a u with zero energy has ru constant along r and u constant along z,
 * hence u ≡ 0 once it vanishes on the axis. C is positive semidefinite (M is a mass matrix,
 * K(ν'') a stiffness with ν'' ≥ 0). S is complex symmetric (Sᵀ = S), so its Hermitian part
 * (S + Sᴴ)/2 is B, positive definite: every leading principal block S_k satisfies
 * Re(xᴴS_k x) = xᴴB_k x &gt; 0, so none is singular and LDLᵀ without pivoting exists. N. J.
 * Higham, Math. Comp. 67 (1998) 1591–1599, proves the growth factor of this factorisation
 * small when C is definite as well; C is only semidefinite here (no eddy current in air),
 * so the solve measures the residual and applies one step of iterative refinement, and
 * reports the residual before and after.
 *
 * <p>Immutable after construction (the factors are only read), so one instance may serve
 * several threads; every solve allocates its own vectors.
 */
public final class HarmonicSolve {

    final Mesh mesh;
    final double omega;
    final double[] nuRe;
    final double[] nuIm;
    final double[] wSigma;
    private final double[] re;
    private final double[] im;
    private final boolean real;
    private final double pivotRatio;

    /**
     * Assembles and factors.
     *
     * @param mesh       the mesh
     * @param hertz      the frequency, 0 or more (0: magnetostatic)
     * @param bodiesAsAir true to give every body the properties of air (the reference solve)
     */
    public HarmonicSolve(Mesh mesh, double hertz, boolean bodiesAsAir) {
        this(mesh, hertz, bodiesAsAir, true);
    }

    /**
     * The assembled matrix S = K(ν) + jω·M(σ) before factorisation, in the band storage of
     * {@link BandedLdlt} (half-bandwidth {@link Mesh#bandwidth()}): element 0 the real parts,
     * element 1 the imaginary parts (all zero for a real static system). The solver never
     * needs it; baselines and tests do.
     *
     * @param mesh        the mesh
     * @param hertz       the frequency, 0 or more
     * @param bodiesAsAir true for the reference solve with every body as air
     * @return {real parts, imaginary parts}, each n·(b+1) entries
     */
    public static double[][] assembledBand(Mesh mesh, double hertz, boolean bodiesAsAir) {
        HarmonicSolve s = new HarmonicSolve(mesh, hertz, bodiesAsAir, false);
        return new double[][] {s.re, s.im != null ? s.im : new double[s.re.length]};
    }

    /**
     * The right-hand side of a coil carrying 1 A peak (the load vector of {@link #coilField}).
     *
     * @param mesh the mesh
     * @param coil the coil's index in the layout
     * @return a new array of the mesh's unknowns
     */
    public static double[] coilLoad(Mesh mesh, int coil) {
        return mesh.load(coil).clone();
    }

    private HarmonicSolve(Mesh mesh, double hertz, boolean bodiesAsAir, boolean factor) {
        this.mesh = mesh;
        this.omega = 2 * Math.PI * hertz;
        int m = mesh.materials;
        nuRe = new double[m];
        nuIm = new double[m];
        wSigma = new double[m];
        coefficients(mesh, hertz, bodiesAsAir, nuRe, nuIm, wSigma);
        int n = mesh.n;
        int b = mesh.band;
        int w = b + 1;
        // A static solve without magnetic loss is real: factor it with a quarter of the work.
        boolean isReal = omega == 0;
        for (double v : nuIm) {
            isReal &= v == 0;
        }
        real = isReal;
        re = new double[Math.multiplyExact(n, w)];
        im = real ? null : new double[n * w];
        int[] g = new int[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                int el = i + (mesh.nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                double a = nuRe[mat];
                double c = nuIm[mat];
                double s = wSigma[mat];
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
                        double k = mesh.kGeo[16 * el + 4 * p + q];
                        int slot = gp * w + gq - gp + b;
                        re[slot] += a * k;
                        if (!real) {
                            im[slot] += c * k + s * mesh.mGeo[16 * el + 4 * p + q];
                        }
                    }
                }
            }
        }
        if (!factor) {
            pivotRatio = 0;
            return;
        }
        pivotRatio = real ? BandedLdlt.factorReal(n, b, re) : BandedLdlt.factor(n, b, re, im);
    }

    /**
     * Each material's coefficients at a frequency: ν = 1/(µ0·µr) = (µ' + jµ'')/(µ0|µr|²) into
     * nuRe and nuIm, and ω·σ into wSigma; air (material 0), or every body when
     * {@code bodiesAsAir}, gets ν0 and no conductivity. Shared with {@link TransverseEddySolve}.
     */
    static void coefficients(Mesh mesh, double hertz, boolean bodiesAsAir, double[] nuRe, double[] nuIm,
                             double[] wSigma) {
        double omega = 2 * Math.PI * hertz;
        double nu0 = 1 / PhysicalConstants.MU_0;
        for (int k = 0; k < mesh.materials; k++) {
            if (k == 0 || bodiesAsAir) {
                nuRe[k] = nu0;
                continue;
            }
            double mr = mesh.layout.mu[k].real(hertz);
            double mi = mesh.layout.mu[k].loss(hertz);
            double mod2 = mr * mr + mi * mi;
            nuRe[k] = nu0 * mr / mod2;
            nuIm[k] = nu0 * mi / mod2;
            wSigma[k] = omega * mesh.layout.sigma[k];
        }
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
     * The field of a coil carrying 1 A peak, the far boundary at A = 0.
     *
     * @param coil the coil's index in the layout
     * @return the field
     */
    public Field coilField(int coil) {
        double[] f = mesh.load(coil);
        return solve(f.clone(), new double[mesh.n], 0);
    }

    /**
     * The field of a uniform axial flux density of 1 T applied on the far boundary (A = r/2 there).
     *
     * @return the field
     */
    public Field uniformField() {
        // Move the known boundary values to the right-hand side: f_p = −Σ_q S_pq·g_q, g_q = r_q/2.
        double[] fr = new double[mesh.n];
        double[] fi = new double[mesh.n];
        int[] g = new int[4];
        int[] ii = new int[4];
        int[] jj = new int[4];
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < mesh.nr - 1; i++) {
                mesh.elementUnknowns(i, j, g);
                if (g[0] >= 0 && g[1] >= 0 && g[2] >= 0 && g[3] >= 0) {
                    continue;
                }
                int el = i + (mesh.nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                ii[0] = i;
                ii[1] = i + 1;
                ii[2] = i + 1;
                ii[3] = i;
                jj[0] = j;
                jj[1] = j;
                jj[2] = j + 1;
                jj[3] = j + 1;
                for (int p = 0; p < 4; p++) {
                    if (g[p] < 0) {
                        continue;
                    }
                    for (int q = 0; q < 4; q++) {
                        if (g[q] >= 0) {
                            continue;
                        }
                        double val = 0.5 * mesh.rl[ii[q]];
                        double k = mesh.kGeo[16 * el + 4 * p + q];
                        fr[g[p]] -= nuRe[mat] * k * val;
                        fi[g[p]] -= (nuIm[mat] * k + wSigma[mat] * mesh.mGeo[16 * el + 4 * p + q]) * val;
                    }
                }
            }
        }
        return solve(fr, fi, 1);
    }

    private Field solve(double[] fr, double[] fi, double boundaryScale) {
        double[] xr = new double[mesh.n];
        double[] xi = new double[mesh.n];
        double[] r = RefinedSolve.run(fr, fi, xr, xi, this::substitute, this::residual);
        return new Field(this, xr, xi, boundaryScale, r[0], r[1]);
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
                double a = nuRe[mat];
                double c = nuIm[mat];
                double s = wSigma[mat];
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
                        double k = mesh.kGeo[16 * el + 4 * p + q];
                        double er = a * k;
                        double ei = c * k + s * mesh.mGeo[16 * el + 4 * p + q];
                        sr += er * xr[g[q]] - ei * xi[g[q]];
                        si += er * xi[g[q]] + ei * xr[g[q]];
                    }
                    rr[g[p]] -= sr;
                    ri[g[p]] -= si;
                }
            }
        }
        return RefinedSolve.norm(rr, ri);
    }
}
