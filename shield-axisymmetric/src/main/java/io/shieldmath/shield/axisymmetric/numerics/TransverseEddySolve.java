/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The first azimuthal mode with eddy currents: bodies of revolution, some of them conducting,
 * in a uniform alternating field across the axis. A vector potential in the conductors, a
 * scalar potential everywhere else, coupled on their common surface.
 *
 * <p>Formulation: the A–ψ method of C. R. I. Emson and J. Simkin, "An optimal method for 3-D
 * eddy currents", IEEE Trans. Magn. 19 (1983) 2450–2452. In the conducting region Ωc the
 * modified vector potential A (E = −jωA, no separate electric scalar potential) solves
 * ∇×(ν∇×A) + jωσA = 0; in the rest Ωn, air and non-conducting bodies, H = −∇ψ and
 * ∇·(µ∇ψ) = 0. On their interface Γ the tangential H and the normal B are continuous, which
 * the weak form keeps as the surface terms ∮Γ (n×∇ψ)·A'. The system is symmetric:
 * <pre>
 *   [ K(ν) + jωM(σ)    C  ] [A]   [0]
 *   [ Cᵀ            −K(µ) ] [ψ] = [f],     C(A', ψ) = ∫Ωc ∇ψ̃ · ∇×A' dV,
 * </pre>
 * where ψ̃ is ψ on Γ continued into Ωc by the interface nodes' shape functions. The surface
 * integral equals this volume integral exactly, for any such continuation, because
 * ∇·(A'×∇ψ̃) = ∇ψ̃·∇×A' and the tangential traces of both discrete fields are continuous
 * between elements; so no surface quadrature is needed and the coupling uses the same element
 * loops as the rest.
 *
 * <p>First mode. A body of revolution couples no other azimuthal mode to a uniform field
 * along x = r·cos φ, so A = (a_r·sin φ, (u/r)·cos φ, a_z·sin φ) and ψ = ψ1·cos φ exactly, and
 * B = (b_r·cos φ, b_φ·sin φ, b_z·cos φ) with, from A,
 * <pre>
 *   b_r = (a_z − ∂u/∂z)/r,   b_φ = ∂a_r/∂z − ∂a_z/∂r,   b_z = (∂u/∂r − a_r)/r,
 * </pre>
 * and from ψ, B = µ·(−∂ψ1/∂r, ψ1/r, −∂ψ1/∂z). Integrating over φ leaves, per π, the Fourier
 * finite-element reduction of B. Mercier and G. Raugel (RAIRO Anal. Numér. 16 (1982) 405–461):
 * ∫ ν (b_r b_r' + b_φ b_φ' + b_z b_z') r dr dz + jω ∫ σ (a_r a_r' + u u'/r² + a_z a_z') r dr dz
 * in Ωc, ∫ µ (∂ψ1/∂r ∂ψ1'/∂r + ψ1 ψ1'/r² + ∂ψ1/∂z ∂ψ1'/∂z) r dr dz in Ωn (the scalar form of
 * {@link TransverseSolve}), and C = ∫Ωc (∂ψ̃1/∂r·b_r' − (ψ̃1/r)·b_φ' + ∂ψ̃1/∂z·b_z') r dr dz.
 * (a_r, a_z) are lowest-order edge elements of the (r, z) rectangles, u and ψ1 bilinear
 * nodal elements, as C. G. Albert, O. Bíró and P. Lainer (arXiv:2008.13681) use for the
 * vector potential. The coupling integrand is a polynomial, so the 2×2 Gauss rule is exact
 * for it. ψ is scaled by µ0 (in T·m), so every block carries the factor ν0 = 1/µ0.
 *
 * <p>Why this is solvable without pivoting: for x = (a, p) ≠ 0, Im(xᴴSx) = aᴴ(K(ν'') + ωM)a +
 * pᴴK(µ'')p ≥ 0, and it vanishes only for a = 0 (M is positive definite on the conductors'
 * unknowns, every one of which lives on a conducting element), where Re(xᴴSx) = −pᴴK(µ')p
 * &lt; 0. So xᴴSx ≠ 0, no leading block is singular, and LDLᵀ without pivoting exists; its
 * real part is quasi-definite (positive on A, negative on ψ), so the Schur complements add
 * rather than cancel. The solve measures its residual and refines once, as
 * {@link HarmonicSolve}. A needs no gauge: ωσ &gt; 0 wherever it lives. The scalar potential
 * is single-valued in Ωn because a first-mode current has no net azimuthal part through any
 * (r, z) cross-section of a conductor (∂(r j_r)/∂r + r·∂j_z/∂z = j_φ integrates to the normal
 * current on the conductor's surface, which is zero).
 *
 * <p>Axis: u = 0 and ψ1 = 0 on the axis, and in the first column of conducting elements
 * a_r = u(r1, z)/r1 (finite b_z), so b_z = 0 there, an O(h) error next to the axis only.
 * Far boundary: ψ1 = −r per unit B0 (the applied field); conductors never reach it. With
 * every body set to air the solve returns B0 to rounding, as the scalar solve does.
 *
 * <p>Unknowns: ψ1 at every node touching a non-conducting element, u at every node touching a
 * conducting one (both on the interface), a_r and a_z on every edge of a conducting element;
 * numbered node by node along one grid direction, whichever of the two makes the smaller
 * factorisation. Away from conductors that is one unknown per node, as in the axial solve;
 * rows through a conductor carry three or four per node, so the matrix is kept in envelope
 * storage ({@link BandedLdlt#factor(int, int[], int[], double[], double[])}), where each row
 * costs only as far back as it reaches. Immutable after construction.
 */
public final class TransverseEddySolve {

    /** Gauss–Legendre abscissa on [−1, 1] of the 2-point rule, 1/√3. */
    private static final double G = 1 / Math.sqrt(3);
    /** Local unknowns of an element: eight of A (used in conductors), four of ψ. */
    private static final int LOCAL = 12;

    final Mesh mesh;
    private final double nu0;
    private final double[] nuRe;
    private final double[] nuIm;
    private final double[] wSigma;
    private final double[] muRe;
    private final double[] muIm;
    private final int nr;
    private final int nz;
    /** Per element: its index into the conductor arrays, or −1 when it does not conduct. */
    private final int[] conductor;
    /** The unknowns' numbering (the cheaper of the two sweep directions). */
    private final Numbering num;
    private final int n;
    /** Per unknown: the first column its row of the matrix reaches. */
    private final int[] first;
    /** Per unknown: the offset of its diagonal in the envelope storage. */
    private final int[] diag;
    /** Per conducting element: the curl matrix (64), the mass matrix (64), the coupling (4 × 8). */
    private final double[] kE;
    private final double[] mE;
    private final double[] cE;
    /** Per element: the scalar first-mode matrix (16). */
    private final double[] kPsi;
    private final double[] re;
    private final double[] im;
    private final double pivotRatio;

    /**
     * Numbers, assembles and factors.
     *
     * @param mesh           the mesh (graded for this frequency)
     * @param hertz          the frequency, greater than 0
     * @param bodiesAsAir    true to give every body the properties of air
     * @param maxUnknowns    the largest number of unknowns allowed
     * @param maxBandEntries the largest matrix storage allowed, entries per part
     * @throws MeshLimitException if the system would exceed either limit
     * @throws IllegalStateException if a conducting element touches the mesh's outer boundary
     */
    public TransverseEddySolve(Mesh mesh, double hertz, boolean bodiesAsAir, int maxUnknowns, long maxBandEntries) {
        this.mesh = mesh;
        nu0 = 1 / PhysicalConstants.MU_0;
        int m = mesh.materials;
        nuRe = new double[m];
        nuIm = new double[m];
        wSigma = new double[m];
        HarmonicSolve.coefficients(mesh, hertz, bodiesAsAir, nuRe, nuIm, wSigma);
        muRe = new double[m];
        muIm = new double[m];
        TransverseSolve.permeabilities(mesh, hertz, bodiesAsAir, muRe, muIm);
        nr = mesh.nr;
        nz = mesh.nz;
        int ne = (nr - 1) * (nz - 1);
        conductor = new int[ne];
        boolean[] touchesC = new boolean[nr * nz];
        boolean[] touchesN = new boolean[nr * nz];
        int conducting = 0;
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                int el = i + (nr - 1) * j;
                boolean c = wSigma[mesh.elementMaterial[el]] > 0;
                if (c && (i + 1 == nr - 1 || j == 0 || j + 1 == nz - 1)) {
                    throw new IllegalStateException("a conducting body reaches the mesh's outer boundary");
                }
                conductor[el] = c ? conducting++ : -1;
                boolean[] touches = c ? touchesC : touchesN;
                touches[i + nr * j] = true;
                touches[i + 1 + nr * j] = true;
                touches[i + 1 + nr * (j + 1)] = true;
                touches[i + nr * (j + 1)] = true;
            }
        }
        Numbering along = new Numbering(mesh.rFirst, nr, nz, touchesN, touchesC, conductor);
        Numbering across = new Numbering(!mesh.rFirst, nr, nz, touchesN, touchesC, conductor);
        int[] firstAlong = firstColumns(along);
        int[] firstAcross = firstColumns(across);
        boolean alongBetter = work(firstAlong) <= work(firstAcross);
        num = alongBetter ? along : across;
        first = alongBetter ? firstAlong : firstAcross;
        n = num.count;
        diag = BandedLdlt.envelopeDiagonals(first);
        long entries = storedEntries();
        if (n > maxUnknowns || entries > maxBandEntries) {
            throw new MeshLimitException(n, entries, maxUnknowns, maxBandEntries);
        }
        kE = new double[64 * conducting];
        mE = new double[64 * conducting];
        cE = new double[32 * conducting];
        conductorMatrices();
        kPsi = TransverseSolve.elementMatrices(mesh);
        re = new double[Math.toIntExact(entries)];
        im = new double[re.length];
        int[] g = new int[LOCAL];
        double[] c = new double[LOCAL];
        double[] lr = new double[LOCAL * LOCAL];
        double[] li = new double[LOCAL * LOCAL];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                map(i, j, g, c);
                int lo = local(i, j, c, lr, li);
                for (int p = lo; p < LOCAL; p++) {
                    int gp = g[p];
                    if (gp < 0) {
                        continue;
                    }
                    for (int q = lo; q < LOCAL; q++) {
                        int gq = g[q];
                        if (gq < 0 || gq > gp) {
                            continue;
                        }
                        int slot = diag[gp] - gp + gq;
                        re[slot] += lr[LOCAL * p + q];
                        im[slot] += li[LOCAL * p + q];
                    }
                }
            }
        }
        pivotRatio = BandedLdlt.factor(n, first, diag, re, im);
    }

    private boolean isConductor(int i, int j) {
        return conducts(conductor, nr, nz, i, j);
    }

    /**
     * The local-to-global map of element (i, j): local 0–3 are u at the nodes (i,j), (i+1,j),
     * (i+1,j+1), (i,j+1), 4–5 a_r of the lower and upper edges, 6–7 a_z of the inner and
     * outer edges (only in a conducting element), 8–11 ψ1 at the four nodes (in a conducting
     * element only those on the interface). Each gets its global index or −1, and the
     * coefficient of that unknown.
     */
    private void map(int i, int j, int[] g, double[] c) {
        map(num, i, j, g, c);
    }

    private void map(Numbering num, int i, int j, int[] g, double[] c) {
        java.util.Arrays.fill(c, 1);
        java.util.Arrays.fill(g, -1);
        int n0 = i + nr * j;
        int n3 = n0 + nr;
        g[8] = num.psi[n0];
        g[9] = num.psi[n0 + 1];
        g[10] = num.psi[n3 + 1];
        g[11] = num.psi[n3];
        if (!isConductor(i, j)) {
            return;
        }
        g[0] = num.u[n0];
        g[1] = num.u[n0 + 1];
        g[2] = num.u[n3 + 1];
        g[3] = num.u[n3];
        if (i == 0) {
            // First column: a_r = u(r1, z)/r1 (finite b_z on the axis).
            g[4] = g[1];
            g[5] = g[2];
            c[4] = 1 / mesh.rl[1];
            c[5] = 1 / mesh.rl[1];
        } else {
            g[4] = num.ar[i + (nr - 1) * j];
            g[5] = num.ar[i + (nr - 1) * (j + 1)];
        }
        g[6] = num.az[i + nr * j];
        g[7] = num.az[i + 1 + nr * j];
    }

    /**
     * The complex 12 × 12 element matrix of element (i, j) in the local order of
     * {@link #map}, the coefficients c applied. Only the block from the returned local index
     * on is written: all of it in a conducting element (the ψ–ψ block zero), the ψ–ψ block
     * alone elsewhere.
     *
     * @return the first local index in use, 0 or 8
     */
    private int local(int i, int j, double[] c, double[] lr, double[] li) {
        int el = i + (nr - 1) * j;
        int mat = mesh.elementMaterial[el];
        int s = conductor[el];
        if (s < 0) {
            double ar = -nu0 * muRe[mat];
            double ai = -nu0 * muIm[mat];
            for (int p = 0; p < 4; p++) {
                for (int q = 0; q < 4; q++) {
                    double k = kPsi[16 * el + 4 * p + q];
                    lr[LOCAL * (8 + p) + 8 + q] = ar * k;
                    li[LOCAL * (8 + p) + 8 + q] = ai * k;
                }
            }
            return 8;
        }
        for (int p = 8; p < LOCAL; p++) {
            java.util.Arrays.fill(lr, LOCAL * p + 8, LOCAL * p + LOCAL, 0);
            java.util.Arrays.fill(li, LOCAL * p + 8, LOCAL * p + LOCAL, 0);
        }
        for (int p = 0; p < 8; p++) {
            for (int q = 0; q < 8; q++) {
                double cc = c[p] * c[q];
                double k = kE[64 * s + 8 * p + q];
                lr[LOCAL * p + q] = cc * nuRe[mat] * k;
                li[LOCAL * p + q] = cc * (nuIm[mat] * k + wSigma[mat] * mE[64 * s + 8 * p + q]);
            }
        }
        for (int a = 0; a < 4; a++) {
            for (int p = 0; p < 8; p++) {
                double v = nu0 * c[p] * cE[32 * s + 8 * a + p];
                lr[LOCAL * (8 + a) + p] = v;
                lr[LOCAL * p + 8 + a] = v;
                li[LOCAL * (8 + a) + p] = 0;
                li[LOCAL * p + 8 + a] = 0;
            }
        }
        return 0;
    }

    /** The curl (K), mass (M) and coupling (C) matrices of every conducting element, 2×2 Gauss points. */
    private void conductorMatrices() {
        double[] nv = new double[4];
        double[] dr = new double[4];
        double[] dz = new double[4];
        double[] q1 = new double[8];
        double[] q2 = new double[8];
        double[] q3 = new double[8];
        double[] mr = new double[8];
        double[] mp = new double[8];
        double[] mz = new double[8];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                int s = conductor[i + (nr - 1) * j];
                if (s < 0) {
                    continue;
                }
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
                        localBasis(r, (zb - z) / hZ, (z - za) / hZ, (rb - r) / hR, (r - ra) / hR, hR, hZ, nv, dr, dz,
                                q1, q2, q3, mr, mp, mz);
                        for (int a = 0; a < 8; a++) {
                            for (int b = 0; b < 8; b++) {
                                kE[64 * s + 8 * a + b] += w * (q1[a] * q1[b] + q2[a] * q2[b] + q3[a] * q3[b]);
                                mE[64 * s + 8 * a + b] += w * (mr[a] * mr[b] + mp[a] * mp[b] + mz[a] * mz[b]);
                            }
                        }
                        for (int a = 0; a < 4; a++) {
                            for (int p = 0; p < 8; p++) {
                                cE[32 * s + 8 * a + p] += w * (dr[a] * q1[p] - nv[a] / r * q2[p] + dz[a] * q3[p]);
                            }
                        }
                    }
                }
            }
        }
    }

    /**
     * The eight local A basis functions at a point r &gt; 0: their contributions to (b_r, b_φ,
     * b_z) and to (a_r, u/r, a_z). v0, v1 are the lower and upper z weights, s0, s1 the inner
     * and outer r weights of the point in its element.
     */
    static void localBasis(double r, double v0, double v1, double s0, double s1, double hR, double hZ,
                                   double[] nv, double[] dr, double[] dz, double[] q1, double[] q2, double[] q3,
                                   double[] mr, double[] mp, double[] mz) {
        for (int a = 0; a < 4; a++) {
            q1[a] = -dz[a] / r;
            q2[a] = 0;
            q3[a] = dr[a] / r;
            mr[a] = 0;
            mp[a] = nv[a] / r;
            mz[a] = 0;
        }
        java.util.Arrays.fill(q1, 4, 6, 0);
        q2[4] = -1 / hZ;
        q2[5] = 1 / hZ;
        q3[4] = -v0 / r;
        q3[5] = -v1 / r;
        q1[6] = s0 / r;
        q1[7] = s1 / r;
        q2[6] = 1 / hR;
        q2[7] = -1 / hR;
        java.util.Arrays.fill(q3, 6, 8, 0);
        mr[4] = v0;
        mr[5] = v1;
        mr[6] = 0;
        mr[7] = 0;
        java.util.Arrays.fill(mp, 4, 8, 0);
        mz[4] = 0;
        mz[5] = 0;
        mz[6] = s0;
        mz[7] = s1;
    }


    /** Per unknown of a numbering, the first column of its matrix row (the envelope). */
    private int[] firstColumns(Numbering numbering) {
        int[] f = new int[numbering.count];
        for (int k = 0; k < f.length; k++) {
            f[k] = k;
        }
        int[] g = new int[LOCAL];
        double[] c = new double[LOCAL];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                map(numbering, i, j, g, c);
                int low = Integer.MAX_VALUE;
                for (int p = 0; p < LOCAL; p++) {
                    if (g[p] >= 0) {
                        low = Math.min(low, g[p]);
                    }
                }
                for (int p = 0; p < LOCAL; p++) {
                    if (g[p] >= 0) {
                        f[g[p]] = Math.min(f[g[p]], low);
                    }
                }
            }
        }
        return f;
    }

    /** The factorisation's work on an envelope, Σ (i − first[i])², up to a constant factor. */
    private static double work(int[] first) {
        double w = 0;
        for (int k = 0; k < first.length; k++) {
            w += (double) (k - first[k]) * (k - first[k]);
        }
        return w;
    }

    /** The fixed value of ψ1 per unit B0 at a node without an unknown: −r on the box, 0 on the axis. */
    private double fixedPsi(int i) {
        return -mesh.rl[i];
    }

    /**
     * The smallest pivot modulus over the largest diagonal modulus, a health indicator.
     *
     * @return the ratio
     */
    public double pivotRatio() {
        return pivotRatio;
    }

    /**
     * The unknowns of this system.
     *
     * @return n
     */
    public int unknowns() {
        return n;
    }

    /**
     * The matrix entries stored per part (real or imaginary), the envelope's size.
     *
     * @return the count
     */
    public long storedEntries() {
        return n == 0 ? 0 : diag[n - 1] + 1L;
    }

    /**
     * The field of a uniform applied flux density of 1 T across the axis.
     *
     * @return the field
     */
    public TransverseField uniformField() {
        double[] fr = new double[n];
        double[] fi = new double[n];
        int[] g = new int[LOCAL];
        double[] c = new double[LOCAL];
        double[] lr = new double[LOCAL * LOCAL];
        double[] li = new double[LOCAL * LOCAL];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                if (i + 1 < nr - 1 && j > 0 && j + 1 < nz - 1) {
                    continue; // only elements on the box carry fixed values other than 0
                }
                map(i, j, g, c);
                local(i, j, c, lr, li);
                for (int p = 8; p < LOCAL; p++) {
                    if (g[p] < 0) {
                        continue;
                    }
                    for (int q = 8; q < LOCAL; q++) {
                        if (g[q] >= 0) {
                            continue;
                        }
                        // Local nodes 1 and 2 sit on line i + 1, nodes 0 and 3 on line i.
                        double value = fixedPsi(q == 9 || q == 10 ? i + 1 : i);
                        fr[g[p]] -= lr[LOCAL * p + q] * value;
                        fi[g[p]] -= li[LOCAL * p + q] * value;
                    }
                }
            }
        }
        double[] xr = new double[n];
        double[] xi = new double[n];
        double[] r = RefinedSolve.run(fr, fi, xr, xi, (yr, yi) -> BandedLdlt.solve(n, first, diag, re, im, yr, yi),
                this::residual);
        return new CoupledTransverseField(this, xr, xi, r[0], r[1]);
    }

    /** r = f − S·x, matrix-free from the element matrices; returns ‖r‖₂. */
    private double residual(double[] fr, double[] fi, double[] xr, double[] xi, double[] rr, double[] ri) {
        System.arraycopy(fr, 0, rr, 0, n);
        System.arraycopy(fi, 0, ri, 0, n);
        int[] g = new int[LOCAL];
        double[] c = new double[LOCAL];
        double[] lr = new double[LOCAL * LOCAL];
        double[] li = new double[LOCAL * LOCAL];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                map(i, j, g, c);
                int lo = local(i, j, c, lr, li);
                for (int p = lo; p < LOCAL; p++) {
                    if (g[p] < 0) {
                        continue;
                    }
                    double sr = 0;
                    double si = 0;
                    for (int q = lo; q < LOCAL; q++) {
                        if (g[q] < 0) {
                            continue;
                        }
                        double er = lr[LOCAL * p + q];
                        double ei = li[LOCAL * p + q];
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

    /**
     * B in element (i, j) from the eight local values of A (local order of {@link #map}, the
     * coefficients applied): real parts at 0–7, imaginary parts at 8–15. Shared with the
     * reference formulation in the tests.
     *
     * @param out receives [b_r re, b_r im, b_φ re, b_φ im, b_z re, b_z im]
     * @param nv  work array of 4
     * @param dr  work array of 4
     * @param dz  work array of 4
     */
    static void fluxFromVectorPotential(Mesh mesh, int i, int j, double r, double z, double[] values, double[] out,
                                        double[] nv, double[] dr, double[] dz) {
        double ra = mesh.rl[i];
        double rb = mesh.rl[i + 1];
        double za = mesh.zl[j];
        double zb = mesh.zl[j + 1];
        double hR = rb - ra;
        double hZ = zb - za;
        double v0 = (zb - z) / hZ;
        double v1 = (z - za) / hZ;
        double s0 = (rb - r) / hR;
        double s1 = (r - ra) / hR;
        if (i > 0) {
            Mesh.shape(r, z, ra, rb, za, zb, nv, dr, dz);
        }
        for (int part = 0; part < 2; part++) {
            int o = 8 * part;
            double bPhi = (values[o + 5] - values[o + 4]) / hZ - (values[o + 7] - values[o + 6]) / hR;
            double bR;
            double bZ;
            if (i == 0) {
                // First column, closed forms valid on the axis itself: u and a_z vanish at
                // r = 0, so a_z/r = a_z(r1)/r1 and (∂u/∂z)/r = (u2 − u1)/(hZ·r1); b_z ≡ 0.
                bR = values[o + 7] / hR - (values[o + 2] - values[o + 1]) / (hZ * hR);
                bZ = 0;
            } else {
                double az = values[o + 6] * s0 + values[o + 7] * s1;
                double ar = values[o + 4] * v0 + values[o + 5] * v1;
                double dudr = 0;
                double dudz = 0;
                for (int k = 0; k < 4; k++) {
                    dudr += values[o + k] * dr[k];
                    dudz += values[o + k] * dz[k];
                }
                bR = (az - dudz) / r;
                bZ = (dudr - ar) / r;
            }
            out[part] = bR;
            out[2 + part] = bPhi;
            out[4 + part] = bZ;
        }
    }

    /** The solved potentials: B from A in a conducting element, from ψ elsewhere. */
    private static final class CoupledTransverseField extends TransverseField {

        private final TransverseEddySolve s;
        private final double[] xr;
        private final double[] xi;

        CoupledTransverseField(TransverseEddySolve s, double[] xr, double[] xi, double before, double after) {
            super(s.mesh, before, after);
            this.s = s;
            this.xr = xr;
            this.xi = xi;
        }

        @Override
        public void evaluate(double r, double z, double[] out) {
            Mesh mesh = s.mesh;
            int i = Field.cell(mesh.rl, r);
            int j = Field.cell(mesh.zl, z);
            Scratch w = SCRATCH.get();
            int[] g = w.g;
            double[] c = w.c;
            s.map(i, j, g, c);
            if (!s.isConductor(i, j)) {
                int mat = mesh.elementMaterial[i + (mesh.nr - 1) * j];
                ScalarTransverseField.fluxDensity(mesh, i, j, r, z, psi(g[8], i, xr), psi(g[9], i + 1, xr),
                        psi(g[10], i + 1, xr), psi(g[11], i, xr), psi(g[8], -1, xi), psi(g[9], -1, xi),
                        psi(g[10], -1, xi), psi(g[11], -1, xi), s.muRe[mat], s.muIm[mat], out);
                return;
            }
            double[] val = w.values;
            for (int k = 0; k < 8; k++) {
                val[k] = g[k] >= 0 ? c[k] * xr[g[k]] : 0;
                val[8 + k] = g[k] >= 0 ? c[k] * xi[g[k]] : 0;
            }
            fluxFromVectorPotential(mesh, i, j, r, z, val, out, w.nv, w.dr, w.dz);
        }

        /** ψ1 at a node: the unknown, or the fixed value on grid line i (−1: the imaginary part, 0). */
        private double psi(int index, int line, double[] x) {
            return index >= 0 ? x[index] : line < 0 ? 0 : s.fixedPsi(line);
        }
    }

    /** Per-thread work arrays of the field evaluation, so that it allocates nothing per point. */
    private static final class Scratch {
        final int[] g = new int[LOCAL];
        final double[] c = new double[LOCAL];
        final double[] values = new double[16];
        final double[] nv = new double[4];
        final double[] dr = new double[4];
        final double[] dz = new double[4];
    }

    private static final ThreadLocal<Scratch> SCRATCH = ThreadLocal.withInitial(Scratch::new);

    /**
     * The global index of every unknown, node by node along one grid direction: at each node
     * ψ1 (if it touches a non-conducting element and is not on the axis or the box), u (if it
     * touches a conducting element and is not on the axis), then a_r of the edge to its outer
     * neighbour and a_z of the edge to its upper neighbour (if they border a conducting
     * element and are not on the axis). −1 means no unknown.
     */
    private static final class Numbering {

        final int[] psi;
        final int[] u;
        final int[] ar;
        final int[] az;
        final int count;

        Numbering(boolean alongR, int nr, int nz, boolean[] touchesN, boolean[] touchesC, int[] conductor) {
            psi = new int[nr * nz];
            u = new int[nr * nz];
            ar = new int[(nr - 1) * nz];
            az = new int[nr * (nz - 1)];
            java.util.Arrays.fill(psi, -1);
            java.util.Arrays.fill(u, -1);
            java.util.Arrays.fill(ar, -1);
            java.util.Arrays.fill(az, -1);
            int k = 0;
            int outer = alongR ? nz : nr;
            int inner = alongR ? nr : nz;
            for (int a = 0; a < outer; a++) {
                for (int b = 0; b < inner; b++) {
                    int i = alongR ? b : a;
                    int j = alongR ? a : b;
                    int node = i + nr * j;
                    boolean interior = i > 0 && i < nr - 1 && j > 0 && j < nz - 1;
                    if (interior && touchesN[node]) {
                        psi[node] = k++;
                    }
                    if (interior && touchesC[node]) {
                        u[node] = k++;
                    }
                    if (i > 0 && i < nr - 1 && (conducts(conductor, nr, nz, i, j) || conducts(conductor, nr, nz, i, j - 1))) {
                        ar[i + (nr - 1) * j] = k++;
                    }
                    if (i > 0 && j < nz - 1 && (conducts(conductor, nr, nz, i, j) || conducts(conductor, nr, nz, i - 1, j))) {
                        az[i + nr * j] = k++;
                    }
                }
            }
            count = k;
        }
    }

    private static boolean conducts(int[] conductor, int nr, int nz, int i, int j) {
        return i >= 0 && j >= 0 && i < nr - 1 && j < nz - 1 && conductor[i + (nr - 1) * j] >= 0;
    }
}
