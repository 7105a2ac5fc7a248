/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Inductances of annular cells of rectangular cross-section carrying uniform current
 * density: the mean of Maxwell's filament mutual inductance ({@link CoaxialFilaments}) over
 * both cross-sections with uniform (area) weights, which is the exact inductance of uniform-
 * density cells in the energy sense. With uniform density J = i/(Δr·Δz) the cell is a sheaf of
 * filaments each carrying dA/A of the current, and both the flux it links and the flux it
 * produces average over dA/A (not over r·dA): this is the Galerkin form of the coupled-circuit
 * method (Miller &amp; Bridges 1968 use cell-centre filaments and GMD self-inductances; the averages
 * here tend to those for small cells).
 *
 * <p>Quadrature rules (Gauss–Legendre product rules from Commons Math, n points in each
 * direction of each section), chosen by the centre distance D over the larger side s of
 * the two sections:
 * <ul>
 *   <li>near pairs, D &lt; {@value #NEAR}·s, and a cell with itself: singularity subtraction. For
 *       close filaments M = −µ0·c·ln ρ + (smooth), with c → sqrt(ab) as ρ → 0 (from the k → 1
 *       expansion K ≈ ln(4/k′), E ≈ 1 of Maxwell's bracket). The mean of ln ρ over the two
 *       rectangles is exact ({@link RectangleGmd}); only the remainder M + µ0·c·ln ρ is integrated,
 *       by 4 points on one section and 5 on the other (node sets that share no point, so ρ &gt; 0).
 *       For two sections with the same radial span (a cell with itself, or cells of one column)
 *       c = (a + b)/2, whose mean against ln ρ is exactly r̄·ln g by the reflection r → 2r̄ − r of
 *       both sections; then the remainder is singular only as ρ²·ln ρ. Otherwise c = sqrt(r̄_p·r̄_q),
 *       and the remainder keeps a weak (sqrt(ab) − c)·ln ρ part of relative size (Δr/r)².
 *       For a small cell the result tends to Maxwell's µ0·r̄·(ln(8r̄/g) − 2).</li>
 *   <li>other pairs: in each direction of each section, with h that section's side in that
 *       direction, 6 points for D &lt; 5h, 4 for D &lt; 10h, 3 for D &lt; 25h, 2 beyond (a thin cell
 *       needs few points across its thickness). The n-point rule's error for a kernel singular at
 *       distance D from an interval of half-width h/2 falls roughly as (h/(2D))^{2n}.</li>
 *   <li>a filament (a loop, or one ring of a winding) against a section: the section is halved
 *       (along its longer side, or both ways if it is near square) while the filament is closer
 *       than 2s to its centre, up to 16 times; then 6, 4, 3 or 2 points in each direction as above.</li>
 * </ul>
 * The rules are checked against finer quadrature and subdivision in {@code SectionInductanceTest}.
 *
 * <p>Stateless and thread-safe.
 */
public final class SectionInductance {

    /** Pairs whose centre distance is below this many times the larger side use subtraction. */
    public static final double NEAR = 3;

    private static final double MU0 = PhysicalConstants.MU_0;
    private static final int MAX_ORDER = 8;
    /** NODES[n][i] in [0, 1], WEIGHTS[n][i] summing to 1: the n-point rule on the unit interval. */
    private static final double[][] NODES = new double[MAX_ORDER + 1][];
    private static final double[][] WEIGHTS = new double[MAX_ORDER + 1][];

    static {
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        for (int n = 1; n <= MAX_ORDER; n++) {
            GaussIntegrator g = factory.legendre(n);
            NODES[n] = new double[n];
            WEIGHTS[n] = new double[n];
            for (int i = 0; i < n; i++) {
                NODES[n][i] = 0.5 * (1 + g.getPoint(i));
                WEIGHTS[n][i] = 0.5 * g.getWeight(i);
            }
        }
    }

    private SectionInductance() {
    }

    /**
     * The self-inductance of a cell with uniform current density.
     *
     * @param p the cell's section, not null
     * @return L in henries, greater than 0
     */
    public static double self(Section p) {
        return near(p, p);
    }

    /**
     * The mutual inductance of two cells with uniform current densities.
     *
     * @param p the first section, not null
     * @param q the second section, not null; equal to {@code p} gives {@link #self(Section)}
     * @return M in henries
     * @throws InvalidQuantityException if the sections overlap without being equal
     */
    public static double mutual(Section p, Section q) {
        if (p.equals(q)) {
            return near(p, p);
        }
        if (p.rInner() < q.rOuter() && q.rInner() < p.rOuter() && p.zLow() < q.zHigh() && q.zLow() < p.zHigh()) {
            throw new InvalidQuantityException("cell sections", p + " and " + q, "equal or not overlapping");
        }
        double s = Math.max(p.size(), q.size());
        double d = Math.hypot(p.meanRadius() - q.meanRadius(), p.centreZ() - q.centreZ());
        if (d < NEAR * s) {
            return near(p, q);
        }
        return gauss(p, order(d / p.width()), order(d / p.height()), q, order(d / q.width()), order(d / q.height()));
    }

    /**
     * The mutual inductance of a cell with uniform current density and a coaxial circular
     * filament: Maxwell's M averaged over the section.
     *
     * @param p      the section, not null
     * @param radius the filament's radius in m, greater than 0
     * @param z      the filament's axial position in m, finite
     * @return M in henries, 0 or more
     * @throws InvalidQuantityException if the filament lies in the closed section
     */
    public static double mutualWithFilament(Section p, double radius, double z) {
        if (p.contains(radius, z)) {
            throw new InvalidQuantityException("filament position", "r = " + radius + " m, z = " + z + " m",
                    "outside the conducting cell " + p);
        }
        return filament(p.rInner(), p.rOuter(), p.zLow(), p.zHigh(), radius, z, 0);
    }

    private static int order(double ratio) {
        return ratio < 5 ? 6 : ratio < 10 ? 4 : ratio < 25 ? 3 : 2;
    }

    private static double filament(double r0, double r1, double z0, double z1, double a, double za, int depth) {
        double w = r1 - r0;
        double h = z1 - z0;
        double s = Math.max(w, h);
        double d = Math.hypot(0.5 * (r0 + r1) - a, 0.5 * (z0 + z1) - za);
        if (d < 2 * s && depth < 16) {
            double rm = 0.5 * (r0 + r1);
            double zm = 0.5 * (z0 + z1);
            if (w > 2 * h) {
                return 0.5 * (filament(r0, rm, z0, z1, a, za, depth + 1) + filament(rm, r1, z0, z1, a, za, depth + 1));
            }
            if (h > 2 * w) {
                return 0.5 * (filament(r0, r1, z0, zm, a, za, depth + 1) + filament(r0, r1, zm, z1, a, za, depth + 1));
            }
            return 0.25 * (filament(r0, rm, z0, zm, a, za, depth + 1) + filament(rm, r1, z0, zm, a, za, depth + 1)
                    + filament(r0, rm, zm, z1, a, za, depth + 1) + filament(rm, r1, zm, z1, a, za, depth + 1));
        }
        int nr = order(d / w);
        int nz = order(d / h);
        double[] xr = NODES[nr];
        double[] wr = WEIGHTS[nr];
        double[] xz = NODES[nz];
        double[] wz = WEIGHTS[nz];
        double sum = 0;
        for (int i = 0; i < nr; i++) {
            double r = r0 + w * xr[i];
            for (int j = 0; j < nz; j++) {
                double dz = z0 + h * xz[j] - za;
                double rho = Math.hypot(r - a, dz);
                sum += wr[i] * wz[j] * CoaxialFilaments.unchecked(r, a, dz, rho);
            }
        }
        return sum;
    }

    /**
     * Product Gauss rule: npr × npz points on p (radial × axial), nqr × nqz on q; p and q must
     * not share points.
     */
    static double gauss(Section p, int npr, int npz, Section q, int nqr, int nqz) {
        double[] xpr = NODES[npr];
        double[] wpr = WEIGHTS[npr];
        double[] xpz = NODES[npz];
        double[] wpz = WEIGHTS[npz];
        double[] xqr = NODES[nqr];
        double[] wqr = WEIGHTS[nqr];
        double[] xqz = NODES[nqz];
        double[] wqz = WEIGHTS[nqz];
        double sum = 0;
        for (int i = 0; i < npr; i++) {
            double a = p.rInner() + p.width() * xpr[i];
            for (int j = 0; j < npz; j++) {
                double za = p.zLow() + p.height() * xpz[j];
                double wij = wpr[i] * wpz[j];
                for (int k = 0; k < nqr; k++) {
                    double b = q.rInner() + q.width() * xqr[k];
                    double wijk = wij * wqr[k];
                    for (int l = 0; l < nqz; l++) {
                        double dz = za - (q.zLow() + q.height() * xqz[l]);
                        double rho = Math.hypot(a - b, dz);
                        sum += wijk * wqz[l] * CoaxialFilaments.unchecked(a, b, dz, rho);
                    }
                }
            }
        }
        return sum;
    }

    /** Singularity subtraction, see the class comment. */
    private static double near(Section p, Section q) {
        boolean sameColumn = p.rInner() == q.rInner() && p.rOuter() == q.rOuter();
        double rc = sameColumn ? p.meanRadius() : Math.sqrt(p.meanRadius() * q.meanRadius());
        double lnG = RectangleGmd.meanLogDistance(p, q);
        double[] xp = NODES[4];
        double[] wp = WEIGHTS[4];
        double[] xq = NODES[5];
        double[] wq = WEIGHTS[5];
        double sum = 0;
        for (int i = 0; i < 4; i++) {
            double a = p.rInner() + p.width() * xp[i];
            for (int j = 0; j < 4; j++) {
                double za = p.zLow() + p.height() * xp[j];
                double wij = wp[i] * wp[j];
                for (int k = 0; k < 5; k++) {
                    double b = q.rInner() + q.width() * xq[k];
                    double c = sameColumn ? 0.5 * (a + b) : rc;
                    for (int l = 0; l < 5; l++) {
                        double dz = za - (q.zLow() + q.height() * xq[l]);
                        double rho = Math.hypot(a - b, dz);
                        double m = CoaxialFilaments.unchecked(a, b, dz, rho);
                        sum += wij * wq[k] * wq[l] * (m + MU0 * c * Math.log(rho));
                    }
                }
            }
        }
        return sum - MU0 * rc * lnG;
    }
}
