/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The symbolic part of a solve, built once and shared by every frequency of a sweep: the
 * tensor grid, the material of each element, the numbering of the unknowns, the band
 * layout, the geometric element matrices and the coils' load vectors. Immutable after
 * construction and safe to share between threads.
 *
 * <p>Unknown: A = A_φ(r, z), bilinear on each rectangle of the grid. The weak form per
 * radian (Galerkin, test function v from the same space) is
 * ∫ ν[(∂A/∂z)(∂v/∂z) + (∂A/∂r + A/r)(∂v/∂r + v/r)] r dr dz + jω ∫ σ A v r dr dz
 * = ∫ J v r dr dz, with B_r = −∂A/∂z and B_z = (1/r)∂(rA)/∂r. A = 0 on the axis (symmetry)
 * and a prescribed value on the far boundary. Why A and not ψ = rA: with A = 0 on the axis
 * every basis function that survives is ∝ r near the axis, so A/r stays bounded, and the
 * 2×2 Gauss points never sit on r = 0; and A = B0·r/2 (a uniform axial field) lies in the
 * bilinear space, so the uniform-field case is exact in air. Element matrices use 2×2
 * Gauss–Legendre points per element.
 *
 * <p>Grid (see {@link GridLines}): lines on every body face, coil winding and sensor end;
 * the first element at a conductor face is at most δ/(10q) (δ the skin depth at the mesh's
 * design frequency, q the fineness), at most a quarter of the body's thickness, and grows by
 * at most 1 + 0.2/q per element into metal and air; through a conductor's thickness no
 * element exceeds δ/(12q); coils ask for a/(24q) (a their radius);
 * the near region is capped at E/(15q) with E the geometry's half-extent, the sensor region
 * at a quarter of that; the far boundary
 * is a box of {@code boxFactor}·E about the geometry's centre.
 *
 * <p>Numbering: interior nodes only, along the grid's shorter side first, so the
 * half-bandwidth is the shorter side's node count + 1 (a node couples to its 8 neighbours).
 */
public final class Mesh {

    /** Elements per skin depth asked for at a conductor face: the first element is δ/10 at fineness 1. */
    public static final double FACE_PER_DEPTH = 10;
    /** Elements per skin depth kept through a conductor's thickness (the largest element there is δ/12 at fineness 1). */
    public static final double INTERIOR_PER_DEPTH = 12;

    /** Elements per coil radius at a coil's winding: the element there is a/24 at fineness 1. */
    public static final double COIL_DIVISIONS = 24;

    /** Gauss–Legendre abscissa on [−1, 1] of the 2-point rule, 1/√3. */
    private static final double G = 1 / Math.sqrt(3);

    final double[] rl;
    final double[] zl;
    final int nr;
    final int nz;
    final int[] elementMaterial;
    final double[] kGeo;
    final double[] mGeo;
    final int n;
    final int band;
    final boolean rFirst;
    final int materials;
    final double boxR;
    final double boxZ0;
    final double boxZ1;
    final double extent;
    private final double[][] loads;
    final Layout layout;

    /**
     * Builds the mesh.
     *
     * @param layout        the geometry
     * @param designHertz   the frequencies whose smallest skin depth per body sets the grading (0 Hz: static)
     * @param fineness      q: 1 is the standard mesh, larger is finer (sizes ∝ 1/q)
     * @param boxFactor     the far boundary's distance in units of the geometry's half-extent
     * @param shortSideFirst number along the shorter grid side (true) or the longer (false, a slow baseline)
     * @param maxUnknowns   the largest number of unknowns allowed
     * @param maxBandEntries the largest band storage allowed, n·(b+1) per part
     * @throws MeshLimitException if the grid would exceed either limit (checked before any large array is made)
     */
    public Mesh(Layout layout, double[] designHertz, double fineness, double boxFactor, boolean shortSideFirst,
                int maxUnknowns, long maxBandEntries) {
        this.layout = layout;
        this.materials = layout.materialCount();
        double rMax = 0;
        double zMin = Double.POSITIVE_INFINITY;
        double zMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < layout.r0.length; i++) {
            rMax = Math.max(rMax, layout.r1[i]);
            zMin = Math.min(zMin, layout.z0[i]);
            zMax = Math.max(zMax, layout.z1[i]);
        }
        for (int i = 0; i < layout.coilR0.length; i++) {
            rMax = Math.max(rMax, layout.coilR1[i]);
            zMin = Math.min(zMin, layout.coilZ0[i]);
            zMax = Math.max(zMax, layout.coilZ1[i]);
        }
        for (double r : layout.keyR) {
            rMax = Math.max(rMax, r);
        }
        for (double z : layout.keyZ) {
            zMin = Math.min(zMin, z);
            zMax = Math.max(zMax, z);
        }
        double e = Math.max(rMax, 0.5 * (zMax - zMin));
        this.extent = e;
        double zc = 0.5 * (zMin + zMax);
        this.boxR = boxFactor * e;
        this.boxZ0 = zc - boxFactor * e;
        this.boxZ1 = zc + boxFactor * e;
        double q = fineness;
        double growth = 1 + 0.2 / q;
        double hNear = e / 15 / q;

        Zones zr = new Zones();
        Zones zz = new Zones();
        zr.add(0, rMax, hNear);
        zz.add(zMin, zMax, hNear);
        double[] kr = new double[2 * (layout.r0.length + layout.coilR0.length) + layout.keyR.length];
        double[] kz = new double[2 * (layout.r0.length + layout.coilR0.length) + layout.keyZ.length];
        int nkr = 0;
        int nkz = 0;
        for (int i = 0; i < layout.r0.length; i++) {
            int m = layout.material[i];
            double s = layout.sigma[m];
            double delta = Double.POSITIVE_INFINITY;
            boolean inert = !(s > 0);
            for (double f : designHertz) {
                double mur = Math.hypot(layout.mu[m].real(f), layout.mu[m].loss(f));
                inert &= mur == 1;
                if (s > 0 && f > 0) {
                    delta = Math.min(delta, 1 / Math.sqrt(Math.PI * f * PhysicalConstants.MU_0 * mur * s));
                }
            }
            double tr = layout.r1[i] - layout.r0[i];
            double tz = layout.z1[i] - layout.z0[i];
            double div = inert ? 2 : 4;
            double faceR = Math.min(delta / FACE_PER_DEPTH, tr / div) / q;
            double faceZ = Math.min(delta / FACE_PER_DEPTH, tz / div) / q;
            kr[nkr++] = layout.r0[i];
            kr[nkr++] = layout.r1[i];
            kz[nkz++] = layout.z0[i];
            kz[nkz++] = layout.z1[i];
            if (layout.r0[i] > 0) {
                zr.add(layout.r0[i], layout.r0[i], faceR);
            }
            zr.add(layout.r1[i], layout.r1[i], faceR);
            zz.add(layout.z0[i], layout.z0[i], faceZ);
            zz.add(layout.z1[i], layout.z1[i], faceZ);
            // Through the thickness (the short direction, or both for a squarish section) the
            // field decays as e^{-x/δ} all the way, so the size stays capped inside the metal;
            // along the long direction it varies on the scale of the coils, not of δ.
            if (tz <= 4 * tr) {
                zz.add(layout.z0[i], layout.z1[i], Math.min(delta / INTERIOR_PER_DEPTH, tz / div) / q);
            }
            if (tr <= 4 * tz) {
                zr.add(layout.r0[i], layout.r1[i], Math.min(delta / INTERIOR_PER_DEPTH, tr / div) / q);
            }
        }
        for (int i = 0; i < layout.coilR0.length; i++) {
            double a = 0.5 * (layout.coilR0[i] + layout.coilR1[i]);
            double w = layout.coilR1[i] - layout.coilR0[i];
            double l = layout.coilZ1[i] - layout.coilZ0[i];
            double h = a / COIL_DIVISIONS;
            if (w > 0) {
                h = Math.min(h, w / 3);
            }
            if (l > 0) {
                h = Math.min(h, l / 3);
            }
            h /= q;
            kr[nkr++] = layout.coilR0[i];
            kr[nkr++] = layout.coilR1[i];
            kz[nkz++] = layout.coilZ0[i];
            kz[nkz++] = layout.coilZ1[i];
            zr.add(layout.coilR0[i], layout.coilR1[i], h);
            zz.add(layout.coilZ0[i], layout.coilZ1[i], h);
        }
        // The sensor region (the span of the extra lines) is meshed at a quarter of the near-region size.
        double sensorR = 0;
        for (double r : layout.keyR) {
            kr[nkr++] = r;
            sensorR = Math.max(sensorR, r);
        }
        if (sensorR > 0) {
            zr.add(0, sensorR, hNear / 4);
        }
        double sensorLo = Double.POSITIVE_INFINITY;
        double sensorHi = Double.NEGATIVE_INFINITY;
        for (double z : layout.keyZ) {
            kz[nkz++] = z;
            sensorLo = Math.min(sensorLo, z);
            sensorHi = Math.max(sensorHi, z);
        }
        if (layout.keyZ.length > 0) {
            zz.add(sensorLo, sensorHi, hNear / 4);
        }
        rl = GridLines.build(0, boxR, java.util.Arrays.copyOf(kr, nkr), zr.lo(), zr.hi(), zr.h(), growth);
        zl = GridLines.build(boxZ0, boxZ1, java.util.Arrays.copyOf(kz, nkz), zz.lo(), zz.hi(), zz.h(), growth);
        nr = rl.length;
        nz = zl.length;

        int ne = (nr - 1) * (nz - 1);
        elementMaterial = new int[ne];
        for (int j = 0; j < nz - 1; j++) {
            double zcen = 0.5 * (zl[j] + zl[j + 1]);
            for (int i = 0; i < nr - 1; i++) {
                double rcen = 0.5 * (rl[i] + rl[i + 1]);
                int mat = 0;
                for (int k = 0; k < layout.r0.length; k++) {
                    if (rcen > layout.r0[k] && rcen < layout.r1[k] && zcen > layout.z0[k] && zcen < layout.z1[k]) {
                        mat = layout.material[k];
                        break;
                    }
                }
                elementMaterial[i + (nr - 1) * j] = mat;
            }
        }
        int ir = nr - 2;
        int iz = nz - 2;
        n = ir * iz;
        rFirst = shortSideFirst == (ir <= iz);
        band = (rFirst ? ir : iz) + 1;
        if (n > maxUnknowns || (long) n * (band + 1) > maxBandEntries) {
            throw new MeshLimitException(n, (long) n * (band + 1), maxUnknowns, maxBandEntries);
        }

        kGeo = new double[16 * ne];
        mGeo = new double[16 * ne];
        double[] nv = new double[4];
        double[] dr = new double[4];
        double[] dz = new double[4];
        for (int j = 0; j < nz - 1; j++) {
            for (int i = 0; i < nr - 1; i++) {
                int el = i + (nr - 1) * j;
                double ra = rl[i];
                double rb = rl[i + 1];
                double za = zl[j];
                double zb = zl[j + 1];
                double hR = rb - ra;
                double hZ = zb - za;
                for (int gi = 0; gi < 2; gi++) {
                    double r = 0.5 * (ra + rb) + (gi == 0 ? -G : G) * 0.5 * hR;
                    for (int gj = 0; gj < 2; gj++) {
                        double z = 0.5 * (za + zb) + (gj == 0 ? -G : G) * 0.5 * hZ;
                        double w = 0.25 * hR * hZ * r;
                        shape(r, z, ra, rb, za, zb, nv, dr, dz);
                        for (int a = 0; a < 4; a++) {
                            double ca = dr[a] + nv[a] / r;
                            for (int b = 0; b < 4; b++) {
                                kGeo[16 * el + 4 * a + b] += w * (dz[a] * dz[b] + ca * (dr[b] + nv[b] / r));
                                mGeo[16 * el + 4 * a + b] += w * nv[a] * nv[b];
                            }
                        }
                    }
                }
            }
        }
        loads = new double[layout.coilR0.length][];
        for (int c = 0; c < loads.length; c++) {
            loads[c] = coilLoad(layout.coilR0[c], layout.coilR1[c], layout.coilZ0[c], layout.coilZ1[c],
                    layout.coilTurns[c]);
        }
    }

    /** A growable list of size zones for one axis. */
    private static final class Zones {
        private double[] lo = new double[16];
        private double[] hi = new double[16];
        private double[] h = new double[16];
        private int n;

        void add(double a, double b, double size) {
            if (n == lo.length) {
                lo = java.util.Arrays.copyOf(lo, 2 * n);
                hi = java.util.Arrays.copyOf(hi, 2 * n);
                h = java.util.Arrays.copyOf(h, 2 * n);
            }
            lo[n] = a;
            hi[n] = b;
            h[n++] = size;
        }

        double[] lo() {
            return java.util.Arrays.copyOf(lo, n);
        }

        double[] hi() {
            return java.util.Arrays.copyOf(hi, n);
        }

        double[] h() {
            return java.util.Arrays.copyOf(h, n);
        }
    }

    /** Bilinear shape functions and their derivatives at (r, z); node order (i,j), (i+1,j), (i+1,j+1), (i,j+1). */
    static void shape(double r, double z, double ra, double rb, double za, double zb,
                      double[] nv, double[] dr, double[] dz) {
        double hR = rb - ra;
        double hZ = zb - za;
        double r0 = (rb - r) / hR;
        double r1 = (r - ra) / hR;
        double z0 = (zb - z) / hZ;
        double z1 = (z - za) / hZ;
        nv[0] = r0 * z0;
        nv[1] = r1 * z0;
        nv[2] = r1 * z1;
        nv[3] = r0 * z1;
        dr[0] = -z0 / hR;
        dr[1] = z0 / hR;
        dr[2] = z1 / hR;
        dr[3] = -z1 / hR;
        dz[0] = -r0 / hZ;
        dz[1] = -r1 / hZ;
        dz[2] = r1 / hZ;
        dz[3] = r0 / hZ;
    }

    /** The unknown index of node (i, j), or −1 on the axis or the far boundary. */
    int unknown(int i, int j) {
        if (i <= 0 || j <= 0 || i >= nr - 1 || j >= nz - 1) {
            return -1;
        }
        return rFirst ? (i - 1) + (nr - 2) * (j - 1) : (j - 1) + (nz - 2) * (i - 1);
    }

    /** Global unknowns of element (i, j) in local node order. */
    void elementUnknowns(int i, int j, int[] g) {
        g[0] = unknown(i, j);
        g[1] = unknown(i + 1, j);
        g[2] = unknown(i + 1, j + 1);
        g[3] = unknown(i, j + 1);
    }

    private int lineIndex(double[] lines, double x) {
        int lo = 0;
        int hi = lines.length - 1;
        int best = 0;
        double bestD = Double.POSITIVE_INFINITY;
        // The coil coordinates are grid lines by construction; find the nearest one.
        while (lo <= hi) {
            int mid = (lo + hi) >>> 1;
            double d = Math.abs(lines[mid] - x);
            if (d < bestD) {
                bestD = d;
                best = mid;
            }
            if (lines[mid] < x) {
                lo = mid + 1;
            } else {
                hi = mid - 1;
            }
        }
        for (int k = Math.max(0, best - 1); k <= Math.min(lines.length - 1, best + 1); k++) {
            if (Math.abs(lines[k] - x) < Math.abs(lines[best] - x)) {
                best = k;
            }
        }
        return best;
    }

    /** f_i = ∫ J N_i r dr dz per ampere of coil current (J = N/(w·l) over the section, or its sheet and loop limits). */
    private double[] coilLoad(double ra, double rb, double za, double zb, double turns) {
        double[] f = new double[n];
        int i0 = lineIndex(rl, ra);
        int i1 = lineIndex(rl, rb);
        int j0 = lineIndex(zl, za);
        int j1 = lineIndex(zl, zb);
        double w = rb - ra;
        double l = zb - za;
        if (i0 == i1 && j0 == j1) {
            add(f, unknown(i0, j0), turns * rl[i0]);
        } else if (i0 == i1) {
            // Current sheet on the cylinder r = a: (N/l) ∫ N_i(a, z) a dz, a hat in z.
            double a = rl[i0];
            for (int j = j0; j < j1; j++) {
                double h = zl[j + 1] - zl[j];
                add(f, unknown(i0, j), turns / l * a * h / 2);
                add(f, unknown(i0, j + 1), turns / l * a * h / 2);
            }
        } else if (j0 == j1) {
            // Flat sheet z = z0: (N/w) ∫ N_i(r, z0) r dr; ∫ hat·r is h(2r_k + r_{k+1})/6 at node k.
            for (int i = i0; i < i1; i++) {
                double h = rl[i + 1] - rl[i];
                add(f, unknown(i, j0), turns / w * h * (2 * rl[i] + rl[i + 1]) / 6);
                add(f, unknown(i + 1, j0), turns / w * h * (rl[i] + 2 * rl[i + 1]) / 6);
            }
        } else {
            double jDensity = turns / (w * l);
            double[] nv = new double[4];
            double[] dr = new double[4];
            double[] dz = new double[4];
            int[] g = new int[4];
            for (int j = j0; j < j1; j++) {
                for (int i = i0; i < i1; i++) {
                    elementUnknowns(i, j, g);
                    double hR = rl[i + 1] - rl[i];
                    double hZ = zl[j + 1] - zl[j];
                    for (int gi = 0; gi < 2; gi++) {
                        double r = 0.5 * (rl[i] + rl[i + 1]) + (gi == 0 ? -G : G) * 0.5 * hR;
                        for (int gj = 0; gj < 2; gj++) {
                            double z = 0.5 * (zl[j] + zl[j + 1]) + (gj == 0 ? -G : G) * 0.5 * hZ;
                            shape(r, z, rl[i], rl[i + 1], zl[j], zl[j + 1], nv, dr, dz);
                            for (int a = 0; a < 4; a++) {
                                add(f, g[a], jDensity * 0.25 * hR * hZ * r * nv[a]);
                            }
                        }
                    }
                }
            }
        }
        return f;
    }

    private static void add(double[] f, int k, double v) {
        if (k >= 0) {
            f[k] += v;
        }
    }

    /**
     * The load vector of a coil per ampere: f_i = ∫ J N_i r dr dz. The coil's flux linkage
     * per radian is fᵀA, so its flux linkage is 2π·fᵀA and the mutual inductance from coil
     * p to coil s is 2π·f_sᵀ·S⁻¹·f_p, symmetric in p and s because S is.
     *
     * @param coil the coil's index in the layout
     * @return the vector (shared; do not modify)
     */
    double[] load(int coil) {
        return loads[coil];
    }

    /**
     * The far boundary's radius.
     *
     * @return r in m
     */
    public double boxRadius() {
        return boxR;
    }

    /**
     * The lower far boundary.
     *
     * @return z in m
     */
    public double boxLower() {
        return boxZ0;
    }

    /**
     * The upper far boundary.
     *
     * @return z in m
     */
    public double boxUpper() {
        return boxZ1;
    }

    /**
     * The number of unknowns.
     *
     * @return n
     */
    public int unknowns() {
        return n;
    }

    /**
     * The half-bandwidth of the matrix in this numbering.
     *
     * @return b
     */
    public int bandwidth() {
        return band;
    }

    /**
     * The number of radial grid lines.
     *
     * @return the count, axis and far boundary included
     */
    public int radialLines() {
        return nr;
    }

    /**
     * The number of axial grid lines.
     *
     * @return the count, both far boundaries included
     */
    public int axialLines() {
        return nz;
    }

    /**
     * The smallest element edge anywhere in the grid.
     *
     * @return the size in m
     */
    public double smallestElement() {
        double h = Double.POSITIVE_INFINITY;
        for (int i = 0; i + 1 < nr; i++) {
            h = Math.min(h, rl[i + 1] - rl[i]);
        }
        for (int j = 0; j + 1 < nz; j++) {
            h = Math.min(h, zl[j + 1] - zl[j]);
        }
        return h;
    }

    /**
     * The number of band entries one factorisation holds per part (real or imaginary).
     *
     * @return n·(b+1)
     */
    public long bandEntries() {
        return (long) n * (band + 1);
    }
}
