/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * Test reference: the formulation {@link TransverseEddySolve} replaced, kept to cross-check it
 * on the same meshes ({@code CoupledPotentialsTest}). The first azimuthal mode of the magnetic
 * vector potential through the whole mesh with eddy currents: bodies of revolution, some of
 * them conducting, in a uniform alternating field across the axis.
 *
 * <p>Formulation. In the conductors the modified vector potential A (E = −jωA, no separate
 * electric scalar potential; C. R. I. Emson and J. Simkin, IEEE Trans. Magn. 19 (1983)
 * 2450) solves ∇×(ν∇×A) + jωσA = 0, and the same A is continued through the air. A uniform
 * B0 along x = r·cos φ has A = B0·r·sin φ·ẑ, and a body of revolution couples no other
 * azimuthal mode to it, so A = (a_r·sin φ, (u/r)·cos φ, a_z·sin φ) exactly, with
 * u = r·A_φ-amplitude. Then B = (b_r·cos φ, b_φ·sin φ, b_z·cos φ) with
 * <pre>
 *   b_r = (a_z − ∂u/∂z)/r,   b_φ = ∂a_r/∂z − ∂a_z/∂r,   b_z = (∂u/∂r − a_r)/r,
 * </pre>
 * and the Galerkin form, per π, is
 * ∫ ν (b_r b_r' + b_φ b_φ' + b_z b_z') r dr dz + jω ∫ σ (a_r a_r' + u u'/r² + a_z a_z') r dr dz,
 * the Fourier finite-element reduction of B. Mercier and G. Raugel (RAIRO Anal. Numér. 16
 * (1982) 405–461) applied to the curl–curl operator, as C. G. Albert, O. Bíró and P. Lainer do
 * for magnetostatics (arXiv:2008.13681): (a_r, a_z) lowest-order edge elements of the (r, z)
 * rectangles (tangential value per edge), u bilinear nodal elements. The mode-one gradients
 * ∇(χ·sin φ) are then exactly (∂χ/∂r, χ, ∂χ/∂z) in (a_r, u, a_z): the discrete spaces form
 * an exact sequence, so the gradient null space is known.
 *
 * <p>Gauge. Where no current flows the system is singular on those gradients. Because a
 * gradient's u equals χ at every node, fixing u = 0 at every node not touching a conductor
 * removes them exactly (a tree gauge whose tree is every node's u), while every B stays
 * representable: A − ∇χ with χ = u at those nodes has u = 0 there. After the gauge the
 * matrix is B + jC with B = K(ν') and C = K(ν'') + ωM(σ) both positive semidefinite and B + C
 * positive definite, so xᴴSx ≠ 0 for x ≠ 0, no leading block is singular and LDLᵀ without
 * pivoting exists; the solve measures its residual and refines once, as {@link HarmonicSolve}.
 * (No topological field is lost: a mode-one field has no circulation around the axis.)
 *
 * <p>Axis. Finite energy needs u = 0 and a_z = 0 on the axis, and in the first column of
 * elements (0 ≤ r ≤ r1) b_z = (∂u/∂r − a_r)/r finite, i.e. a_r = ∂u/∂r = u(r1, z)/r1 there:
 * the a_r of that column are not unknowns but u(r1, z)/r1. So b_z = 0 in the first column,
 * an O(h) error next to the axis only.
 *
 * <p>Far boundary: the tangential components of the applied potential, u = 0, a_r = 0 on
 * the ends and a_z = B0·R on the cylinder r = R. The applied field lies in the discrete
 * space, so with every body set to air the solve returns B0 to rounding.
 *
 * <p>Unknowns: up to three per grid node (u where it is not gauged, the a_r of the edge to its
 * outer neighbour, the a_z of the edge to its upper neighbour), numbered node by node along
 * the grid's shorter side, so the half-bandwidth is two to three times that of the axial solve
 * (measured: a solve about ten times as long). Immutable after construction.
 */
final class EdgeEverywhereSolve {

    /** Gauss–Legendre abscissa on [−1, 1] of the 2-point rule, 1/√3. */
    private static final double G = 1 / Math.sqrt(3);

    final Mesh mesh;
    private final double[] nuRe;
    private final double[] nuIm;
    private final double[] wSigma;
    private final int nr;
    private final int nz;
    /** Global index of u per node i + nr·j, or −1 (fixed at 0). */
    private final int[] uIndex;
    /** Global index of a_r per horizontal edge i + (nr−1)·j, or −1 (fixed at 0, or the first column). */
    private final int[] arIndex;
    /** Global index of a_z per vertical edge i + nr·j, or −1 (fixed: 0 on the axis, R on the far cylinder). */
    private final int[] azIndex;
    private final int n;
    private final int band;
    private final double[] kE;
    private final double[] mE;
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
     * @param maxBandEntries the largest band storage allowed, n·(b+1) per part
     * @throws MeshLimitException if the system would exceed either limit
     */
    EdgeEverywhereSolve(Mesh mesh, double hertz, boolean bodiesAsAir, int maxUnknowns, long maxBandEntries) {
        this.mesh = mesh;
        int m = mesh.materials;
        nuRe = new double[m];
        nuIm = new double[m];
        wSigma = new double[m];
        HarmonicSolve.coefficients(mesh, hertz, bodiesAsAir, nuRe, nuIm, wSigma);
        nr = mesh.nr;
        nz = mesh.nz;
        // Nodes touching a conducting element keep their u; all others are gauged to u = 0.
        boolean[] conducting = new boolean[nr * nz];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                if (wSigma[mesh.elementMaterial[i + (nr - 1) * j]] > 0) {
                    conducting[i + nr * j] = true;
                    conducting[i + 1 + nr * j] = true;
                    conducting[i + nr * (j + 1)] = true;
                    conducting[i + 1 + nr * (j + 1)] = true;
                }
            }
        }
        uIndex = new int[nr * nz];
        arIndex = new int[(nr - 1) * nz];
        azIndex = new int[nr * (nz - 1)];
        java.util.Arrays.fill(uIndex, -1);
        java.util.Arrays.fill(arIndex, -1);
        java.util.Arrays.fill(azIndex, -1);
        int count = 0;
        int outer = mesh.rFirst ? nz : nr;
        int inner = mesh.rFirst ? nr : nz;
        for (int a = 0; a < outer; a++) {
            for (int b = 0; b < inner; b++) {
                int i = mesh.rFirst ? b : a;
                int j = mesh.rFirst ? a : b;
                boolean interiorJ = j > 0 && j < nz - 1;
                if (i > 0 && i < nr - 1 && interiorJ && conducting[i + nr * j]) {
                    uIndex[i + nr * j] = count++;
                }
                if (i > 0 && i < nr - 1 && interiorJ) {
                    arIndex[i + (nr - 1) * j] = count++;
                }
                if (i > 0 && i < nr - 1 && j < nz - 1) {
                    azIndex[i + nr * j] = count++;
                }
            }
        }
        n = count;
        int[] g = new int[8];
        double[] c = new double[8];
        double[] fixed = new double[8];
        int b = 0;
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                map(i, j, g, c, fixed);
                for (int p = 0; p < 8; p++) {
                    for (int q = 0; q < 8; q++) {
                        if (g[p] >= 0 && g[q] >= 0) {
                            b = Math.max(b, g[p] - g[q]);
                        }
                    }
                }
            }
        }
        band = b;
        if (n > maxUnknowns || (long) n * (band + 1) > maxBandEntries) {
            throw new MeshLimitException(n, (long) n * (band + 1), maxUnknowns, maxBandEntries);
        }
        int ne = (nr - 1) * (nz - 1);
        kE = new double[64 * ne];
        mE = new double[64 * ne];
        elementMatrices();
        int w = band + 1;
        re = new double[Math.multiplyExact(n, w)];
        im = new double[n * w];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                int el = i + (nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                map(i, j, g, c, fixed);
                for (int p = 0; p < 8; p++) {
                    int gp = g[p];
                    if (gp < 0) {
                        continue;
                    }
                    for (int q = 0; q < 8; q++) {
                        int gq = g[q];
                        if (gq < 0 || gq > gp) {
                            continue;
                        }
                        double cc = c[p] * c[q];
                        double k = kE[64 * el + 8 * p + q];
                        int slot = gp * w + gq - gp + band;
                        re[slot] += cc * nuRe[mat] * k;
                        im[slot] += cc * (nuIm[mat] * k + wSigma[mat] * mE[64 * el + 8 * p + q]);
                    }
                }
            }
        }
        pivotRatio = BandedLdlt.factor(n, band, re, im);
    }

    /**
     * The local-to-global map of element (i, j): local dofs u at the nodes (i,j), (i+1,j),
     * (i+1,j+1), (i,j+1), then a_r of the lower and upper edges, then a_z of the inner and
     * outer edges. Each gets its global index (or −1), the coefficient of that unknown, and
     * the fixed value when it has none (per unit B0).
     */
    private void map(int i, int j, int[] g, double[] c, double[] fixed) {
        g[0] = uIndex[i + nr * j];
        g[1] = uIndex[i + 1 + nr * j];
        g[2] = uIndex[i + 1 + nr * (j + 1)];
        g[3] = uIndex[i + nr * (j + 1)];
        for (int k = 0; k < 8; k++) {
            c[k] = 1;
            fixed[k] = 0;
        }
        if (i == 0) {
            // First column: a_r = u(r1, z)/r1 (finite b_z on the axis).
            g[4] = g[1];
            g[5] = g[2];
            c[4] = 1 / mesh.rl[1];
            c[5] = 1 / mesh.rl[1];
        } else {
            g[4] = arIndex[i + (nr - 1) * j];
            g[5] = arIndex[i + (nr - 1) * (j + 1)];
        }
        g[6] = azIndex[i + nr * j];
        g[7] = azIndex[i + 1 + nr * j];
        if (i + 1 == nr - 1) {
            fixed[7] = mesh.rl[nr - 1];
        }
    }

    /** The curl (K) and mass (M) matrices of every element, 64 entries each, 2×2 Gauss points. */
    private void elementMatrices() {
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
                int el = i + (nr - 1) * j;
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
                        TransverseEddySolve.localBasis(r, (zb - z) / hZ, (z - za) / hZ, (rb - r) / hR, (r - ra) / hR, hR, hZ, nv, dr, dz,
                                q1, q2, q3, mr, mp, mz);
                        for (int a = 0; a < 8; a++) {
                            for (int b = 0; b < 8; b++) {
                                kE[64 * el + 8 * a + b] += w * (q1[a] * q1[b] + q2[a] * q2[b] + q3[a] * q3[b]);
                                mE[64 * el + 8 * a + b] += w * (mr[a] * mr[b] + mp[a] * mp[b] + mz[a] * mz[b]);
                            }
                        }
                    }
                }
            }
        }
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
     * The unknowns of this system (up to three per grid node).
     *
     * @return n
     */
    public int unknowns() {
        return n;
    }

    /**
     * The field of a uniform applied flux density of 1 T across the axis.
     *
     * @return the field
     */
    public TransverseField uniformField() {
        double[] fr = new double[n];
        double[] fi = new double[n];
        int[] g = new int[8];
        double[] c = new double[8];
        double[] fixed = new double[8];
        for (int j = 0; j < nz - 1; j++) {
            // Only the outermost column carries a non-zero fixed value (a_z = R on the far cylinder).
            int i = nr - 2;
            int el = i + (nr - 1) * j;
            int mat = mesh.elementMaterial[el];
            map(i, j, g, c, fixed);
            for (int p = 0; p < 8; p++) {
                if (g[p] < 0) {
                    continue;
                }
                for (int q = 0; q < 8; q++) {
                    if (g[q] >= 0 || fixed[q] == 0) {
                        continue;
                    }
                    double k = kE[64 * el + 8 * p + q];
                    double mm = mE[64 * el + 8 * p + q];
                    fr[g[p]] -= c[p] * nuRe[mat] * k * fixed[q];
                    fi[g[p]] -= c[p] * (nuIm[mat] * k + wSigma[mat] * mm) * fixed[q];
                }
            }
        }
        double[] xr = new double[n];
        double[] xi = new double[n];
        double[] r = RefinedSolve.run(fr, fi, xr, xi, (yr, yi) -> BandedLdlt.solve(n, band, re, im, yr, yi),
                this::residual);
        return new EddyTransverseField(this, xr, xi, r[0], r[1]);
    }

    /** r = f − S·x, matrix-free from the element matrices; returns ‖r‖₂. */
    private double residual(double[] fr, double[] fi, double[] xr, double[] xi, double[] rr, double[] ri) {
        System.arraycopy(fr, 0, rr, 0, n);
        System.arraycopy(fi, 0, ri, 0, n);
        int[] g = new int[8];
        double[] c = new double[8];
        double[] fixed = new double[8];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                int el = i + (nr - 1) * j;
                int mat = mesh.elementMaterial[el];
                map(i, j, g, c, fixed);
                for (int p = 0; p < 8; p++) {
                    if (g[p] < 0) {
                        continue;
                    }
                    double sr = 0;
                    double si = 0;
                    for (int q = 0; q < 8; q++) {
                        if (g[q] < 0) {
                            continue;
                        }
                        double k = kE[64 * el + 8 * p + q];
                        double er = nuRe[mat] * k;
                        double ei = nuIm[mat] * k + wSigma[mat] * mE[64 * el + 8 * p + q];
                        double yr = c[q] * xr[g[q]];
                        double yi = c[q] * xi[g[q]];
                        sr += er * yr - ei * yi;
                        si += er * yi + ei * yr;
                    }
                    rr[g[p]] -= c[p] * sr;
                    ri[g[p]] -= c[p] * si;
                }
            }
        }
        return RefinedSolve.norm(rr, ri);
    }

    /** The solved vector potential; B from its eight local dofs per element. */
    private static final class EddyTransverseField extends TransverseField {

        private final EdgeEverywhereSolve s;
        private final double[] xr;
        private final double[] xi;

        EddyTransverseField(EdgeEverywhereSolve s, double[] xr, double[] xi, double before, double after) {
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
            int[] g = new int[8];
            double[] c = new double[8];
            double[] fixed = new double[8];
            s.map(i, j, g, c, fixed);
            double[] val = new double[16];
            for (int k = 0; k < 8; k++) {
                val[k] = g[k] >= 0 ? c[k] * xr[g[k]] : fixed[k];
                val[8 + k] = g[k] >= 0 ? c[k] * xi[g[k]] : 0;
            }
            TransverseEddySolve.fluxFromVectorPotential(mesh, i, j, r, z, val, out, new double[4], new double[4],
                    new double[4]);
        }
    }
}
