/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * Nonlinear solves on a {@link Mesh} in a uniform applied axial field B0, where some
 * materials follow a magnetization curve H(B) instead of a constant permeability.
 *
 * <p>Static field: Newton's method. The solution minimises the magnetic energy
 * Π(A) = 2π ∫ w(|B|) r dr dz (w = ∫ H dB, the curve's energy density, convex; ½ν|B|² in the
 * linear materials) over the A that equal B0·r/2 on the far boundary and 0 on the axis,
 * with |B|² = (∂A/∂z)² + (∂A/∂r + A/r)². Its gradient is the Galerkin residual with ν(|B|) =
 * H/|B|, and its Hessian, the Newton matrix, is per Gauss point
 * ν·(gᵀg) + (dH/dB − ν)·(n·g)ᵀ(n·g), n = B/|B| the field direction: the tangent reluctivity
 * ν(I − nnᵀ) + (dH/dB)·nnᵀ, whose eigenvalues ν and dH/dB are both positive for a monotone
 * curve, so the Newton matrix is symmetric positive definite and the real band LDLᵀ of
 * {@link BandedLdlt} applies without pivoting (the argument of {@link HarmonicSolve}). This
 * is the Newton–Raphson method of P. Silvester and M. V. K. Chari, "Finite element
 * solution of saturable magnetic field problems", IEEE Trans. PAS 89 (1970) 1642–1651,
 * written for the axisymmetric A_φ form. Departures: the step length is chosen by a line
 * search on the energy: where the full step misses the minimum along the Newton direction by
 * more than the strong Wolfe curvature condition allows (|Π'(λ)| ≤ 0.07·|Π'(0)|), the step is
 * lengthened or shortened to that minimum (on the steep top of a curve the full step falls
 * short, since the tangent reluctivity there is the largest on the way), then checked by
 * backtracking under Armijo's condition (Nocedal &amp; Wright, <i>Numerical Optimization</i>,
 * 2006, §3.1); with a convex energy this makes the iteration converge
 * from any start: A = 0 inside (whose first Newton step is exactly the linear solve with the
 * curves' initial permeabilities), or the solution on a coarser mesh interpolated to this one
 * (what a refinement pair uses for its fine mesh: fewer steps, the same minimum); the energy change of the linear elements is
 * computed from its exact quadratic form, not as a difference of two large totals, so that
 * the test is not lost in rounding. The iteration stops when the largest nodal update is
 * below the tolerance relative to the largest nodal value; it converges quadratically near
 * the solution, and the history of updates is kept so that tests can show it.
 *
 * <p>Alternating field: effective permeability by fixed point. Each Gauss point of a
 * saturable material gets the secant reluctivity H(B̂)/B̂ of its peak flux density over
 * a period, B̂² = (|B|² + |B·B|)/2 for the phasor B (the semi-major axis of its ellipse),
 * times µ'(0)/µr(f) of the material's permeability model so that its frequency dependence
 * (and loss) is kept: ν = ν_sec(B̂)·µ'(0)/(µ'(f) − jµ''(f)). The reluctivities are iterated
 * to self-consistency with under-relaxation (halved whenever the largest relative change
 * grows, from 1 down to 1/8). This is the usual first-harmonic (effective-permeability)
 * approximation: it ignores the higher harmonics that a saturating wall generates and the
 * hysteresis loop beyond the loss part of µr(f), so it is sound while the wall is below
 * the knee of its curve and an estimate of the fundamental only once it is past it. At
 * f → 0 with a real B it reduces to the static equations above.
 *
 * <p>Hot loops on primitives: the Gauss-point geometry of the saturable elements is
 * tabulated once per instance, nothing is allocated per point. Immutable after
 * construction and safe to share between threads; each solve allocates its own arrays.
 */
public final class SaturableSolve {

    private static final double G = 1 / Math.sqrt(3);
    /** The smallest relaxation factor of the fixed point. */
    private static final double MIN_RELAXATION = 1.0 / 16;
    /** The line search's curvature factor: a step is exact enough once |Π'(λ)| ≤ this·|Π'(0)|. */
    private static final double CURVATURE = 0.07;
    /** The longest step along a Newton direction the line search tries, in Newton steps. */
    private static final double MAX_STRETCH = 16;

    private final Mesh mesh;
    private final MagnetizationCurve[] curves;
    /** Element indices of saturable materials. */
    private final int[] nl;
    /** Per saturable element, 4 Gauss points × 4 nodes: ∂N/∂z and ∂N/∂r + N/r. */
    private final double[] gz;
    private final double[] gr;
    /** Per saturable element, 4 Gauss points: the weight r·dr·dz/4 (per radian). */
    private final double[] wq;

    /**
     * Prepares the saturable elements.
     *
     * @param mesh   the mesh
     * @param curves one entry per material of the mesh's layout (index 0 is air): the curve, or
     *               null for a material of constant permeability
     */
    public SaturableSolve(Mesh mesh, MagnetizationCurve[] curves) {
        this.mesh = mesh;
        this.curves = curves.clone();
        int ne = (mesh.nr - 1) * (mesh.nz - 1);
        int count = 0;
        for (int e = 0; e < ne; e++) {
            if (curves[mesh.elementMaterial[e]] != null) {
                count++;
            }
        }
        nl = new int[count];
        gz = new double[16 * count];
        gr = new double[16 * count];
        wq = new double[4 * count];
        double[] nv = new double[4];
        double[] dr = new double[4];
        double[] dz = new double[4];
        int c = 0;
        for (int e = 0; e < ne; e++) {
            if (curves[mesh.elementMaterial[e]] == null) {
                continue;
            }
            nl[c] = e;
            int i = e % (mesh.nr - 1);
            int j = e / (mesh.nr - 1);
            double ra = mesh.rl[i];
            double rb = mesh.rl[i + 1];
            double za = mesh.zl[j];
            double zb = mesh.zl[j + 1];
            for (int gi = 0; gi < 2; gi++) {
                double r = 0.5 * (ra + rb) + (gi == 0 ? -G : G) * 0.5 * (rb - ra);
                for (int gj = 0; gj < 2; gj++) {
                    double z = 0.5 * (za + zb) + (gj == 0 ? -G : G) * 0.5 * (zb - za);
                    int g = 2 * gi + gj;
                    Mesh.shape(r, z, ra, rb, za, zb, nv, dr, dz);
                    for (int a = 0; a < 4; a++) {
                        gz[16 * c + 4 * g + a] = dz[a];
                        gr[16 * c + 4 * g + a] = dr[a] + nv[a] / r;
                    }
                    wq[4 * c + g] = 0.25 * (rb - ra) * (zb - za) * r;
                }
            }
            c++;
        }
    }

    /** The result of a nonlinear solve. Immutable once returned. */
    public static final class Outcome {
        private final Field field;
        private final double[] history;
        private final boolean converged;
        private final double[] peak;
        private final double[] volume;
        private final double[] above;

        Outcome(Field field, double[] history, boolean converged, double[] peak, double[] volume, double[] above) {
            this.field = field;
            this.history = history;
            this.converged = converged;
            this.peak = peak;
            this.volume = volume;
            this.above = above;
        }

        /**
         * The field per tesla of applied flux density (so that shielding factors read as for a linear solve).
         *
         * @return the field
         */
        public Field field() {
            return field;
        }

        /**
         * The convergence history: per iteration, the largest nodal update over the largest
         * nodal value (Newton step, or change between two fixed-point iterations).
         *
         * @return a copy
         */
        public double[] history() {
            return history.clone();
        }

        /**
         * The number of iterations taken (each one factorisation).
         *
         * @return the count
         */
        public int iterations() {
            return history.length;
        }

        /**
         * Whether the iteration met its tolerance.
         *
         * @return true if converged
         */
        public boolean converged() {
            return converged;
        }

        /**
         * The largest |B| (peak over a period at frequency) at the Gauss points of a saturable material.
         *
         * @param material the material index
         * @return B in T for the applied field of the solve, 0 for a material without a curve
         */
        public double peakTesla(int material) {
            return peak[material];
        }

        /**
         * The fraction of a saturable material's volume whose Gauss points are above the
         * threshold (each Gauss point standing for its quarter of the element, weighted by r).
         *
         * @param material the material index
         * @return the fraction, 0 to 1
         */
        public double fractionAbove(int material) {
            return volume[material] > 0 ? above[material] / volume[material] : 0;
        }
    }

    private double nodal(double[] x, int k, int i, double b0) {
        return k >= 0 ? x[k] : 0.5 * b0 * mesh.rl[i];
    }

    /**
     * The static nonlinear solve by damped Newton iteration.
     *
     * @param b0        the applied flux density in T, greater than 0
     * @param tolerance the largest relative nodal update accepted as converged
     * @param maxSteps  the most Newton steps
     * @param threshold the fraction of each curve's saturation flux density counted by {@link Outcome#fractionAbove}
     * @return the outcome
     */
    public Outcome magnetostatic(double b0, double tolerance, int maxSteps, double threshold) {
        return magnetostatic(b0, tolerance, maxSteps, threshold, null);
    }

    /**
     * The static nonlinear solve by damped Newton iteration from a given start: the potential
     * of an earlier solve at the same applied field (normally on the coarser mesh of a
     * refinement pair), interpolated to this mesh's nodes. Newton's method needs fewer steps
     * from a start near the solution; the energy it minimises, and so the converged answer,
     * do not depend on the start (the energy is strictly convex on the unknowns).
     *
     * @param b0        the applied flux density in T, greater than 0
     * @param tolerance the largest relative nodal update accepted as converged
     * @param maxSteps  the most Newton steps
     * @param threshold the fraction of each curve's saturation flux density counted by {@link Outcome#fractionAbove}
     * @param start     an earlier solution per unit B0 (any mesh of the same box), or null to start from A = 0
     * @return the outcome
     */
    public Outcome magnetostatic(double b0, double tolerance, int maxSteps, double threshold, Field start) {
        int n = mesh.n;
        int b = mesh.band;
        int w = b + 1;
        int nr1 = mesh.nr - 1;
        double nu0 = 1 / PhysicalConstants.MU_0;
        double[] nuLin = new double[mesh.materials];
        for (int m = 0; m < nuLin.length; m++) {
            nuLin[m] = m == 0 ? nu0 : nu0 / mesh.layout.mu[m].real(0);
        }
        double[] x = new double[n];
        if (start != null) {
            double[] out = new double[6];
            for (int j = 1; j < mesh.nz - 1; j++) {
                for (int i = 1; i < mesh.nr - 1; i++) {
                    int k = mesh.unknown(i, j);
                    if (k >= 0) {
                        start.evaluate(mesh.rl[i], mesh.zl[j], out);
                        x[k] = b0 * out[0];
                    }
                }
            }
        }
        double[] grad = new double[n];
        double[] band = new double[n * w];
        double[] delta = new double[n];
        double[] hist = new double[maxSteps];
        int[] g = new int[4];
        double[] a = new double[4];
        double[] s = new double[4];
        boolean converged = false;
        int steps = 0;
        double grad0 = 0;
        double gradLast = 0;
        while (steps < maxSteps) {
            java.util.Arrays.fill(grad, 0);
            java.util.Arrays.fill(band, 0);
            // Linear elements: gradient ν·K·a and matrix ν·K.
            for (int j = 0; j < mesh.nz - 1; j++) {
                for (int i = 0; i < nr1; i++) {
                    int el = i + nr1 * j;
                    int mat = mesh.elementMaterial[el];
                    if (curves[mat] != null) {
                        continue;
                    }
                    if (!gather(i, j, x, b0, g, a)) {
                        continue;
                    }
                    double nu = nuLin[mat];
                    for (int p = 0; p < 4; p++) {
                        int gp = g[p];
                        if (gp < 0) {
                            continue;
                        }
                        double sum = 0;
                        for (int q = 0; q < 4; q++) {
                            double k = nu * mesh.kGeo[16 * el + 4 * p + q];
                            sum += k * a[q];
                            int gq = g[q];
                            if (gq >= 0 && gq <= gp) {
                                band[gp * w + gq - gp + b] += k;
                            }
                        }
                        grad[gp] += sum;
                    }
                }
            }
            // Saturable elements: gradient Σ w·ν(b)·(u·gz + v·gr) and the tangent.
            for (int c = 0; c < nl.length; c++) {
                int el = nl[c];
                int i = el % nr1;
                int j = el / nr1;
                MagnetizationCurve curve = curves[mesh.elementMaterial[el]];
                gather(i, j, x, b0, g, a);
                for (int gp4 = 0; gp4 < 4; gp4++) {
                    int o = 16 * c + 4 * gp4;
                    double u = 0;
                    double v = 0;
                    for (int q = 0; q < 4; q++) {
                        u += gz[o + q] * a[q];
                        v += gr[o + q] * a[q];
                    }
                    double bb = Math.sqrt(u * u + v * v);
                    double nu = curve.reluctivity(bb);
                    double extra = 0;
                    if (bb > 0) {
                        extra = (curve.slope(bb) - nu) / (bb * bb);
                    }
                    double wt = wq[4 * c + gp4];
                    for (int q = 0; q < 4; q++) {
                        s[q] = u * gz[o + q] + v * gr[o + q];
                    }
                    for (int p = 0; p < 4; p++) {
                        int gpp = g[p];
                        if (gpp < 0) {
                            continue;
                        }
                        grad[gpp] += wt * nu * s[p];
                        for (int q = 0; q < 4; q++) {
                            int gq = g[q];
                            if (gq >= 0 && gq <= gpp) {
                                band[gpp * w + gq - gpp + b] += wt * (nu * (gz[o + p] * gz[o + q]
                                        + gr[o + p] * gr[o + q]) + extra * s[p] * s[q]);
                            }
                        }
                    }
                }
            }
            double gn = 0;
            for (int k = 0; k < n; k++) {
                delta[k] = -grad[k];
                gn += grad[k] * grad[k];
            }
            gn = Math.sqrt(gn);
            if (steps == 0) {
                grad0 = gn;
            }
            gradLast = grad0 > 0 ? gn / grad0 : 0;
            BandedLdlt.factorReal(n, b, band);
            double[] dummy = new double[n];
            BandedLdlt.solveReal(n, b, band, delta, dummy);
            double slope0 = 0;
            double dMax = 0;
            for (int k = 0; k < n; k++) {
                slope0 += grad[k] * delta[k];
                dMax = Math.max(dMax, Math.abs(delta[k]));
            }
            double lambda = lineSearch(x, delta, b0, nuLin, slope0, dMax);
            double xMax = 0;
            for (int k = 0; k < n; k++) {
                x[k] += lambda * delta[k];
                xMax = Math.max(xMax, Math.abs(x[k]));
            }
            double rel = xMax > 0 ? lambda * dMax / xMax : 0;
            hist[steps++] = rel;
            if (rel <= tolerance) {
                converged = true;
                break;
            }
        }
        double[] xs = new double[n];
        for (int k = 0; k < n; k++) {
            xs[k] = x[k] / b0;
        }
        double[] peak = new double[mesh.materials];
        double[] vol = new double[mesh.materials];
        double[] above = new double[mesh.materials];
        statistics(x, null, b0, threshold, peak, vol, above);
        // The residual recorded is the energy gradient's norm at the start of the last step over its
        // norm at the start (a relative residual of the nonlinear equations, before the last update).
        Field f = new Field(mesh, 0, new double[mesh.materials], xs, new double[n], 1, gradLast, gradLast);
        return new Outcome(f, java.util.Arrays.copyOf(hist, steps), converged, peak, vol, above);
    }

    /**
     * The unknowns of element (i, j) into g and its nodal values into a (the boundary value
     * B0·r/2 where a node is not an unknown); false if the element has no unknown at all.
     */
    private boolean gather(int i, int j, double[] x, double b0, int[] g, double[] a) {
        mesh.elementUnknowns(i, j, g);
        a[0] = nodal(x, g[0], i, b0);
        a[1] = nodal(x, g[1], i + 1, b0);
        a[2] = nodal(x, g[2], i + 1, b0);
        a[3] = nodal(x, g[3], i, b0);
        return g[0] >= 0 || g[1] >= 0 || g[2] >= 0 || g[3] >= 0;
    }

    /** Node column indices of element column i in local node order. */
    private static void corners(int i, int[] ii) {
        ii[0] = i;
        ii[1] = i + 1;
        ii[2] = i + 1;
        ii[3] = i;
    }

    /**
     * The step length: the minimum along δ when the full step misses it (see the class
     * comment), then Armijo backtracking from there: the largest λ·2^−k with
     * Π(x + λδ) − Π(x) ≤ 1e−4·λ·∇Π·δ. The change of the linear part is its exact quadratic
     * λ·gᵀδ + ½λ²·δᵀKδ; only the saturable elements are re-evaluated per trial. A step that
     * is already tiny (below 1e−7 of the solution) is taken whole: there the test is at the
     * rounding level and Newton's quadratic convergence needs no damping.
     */
    private double lineSearch(double[] x, double[] delta, double b0, double[] nuLin, double slope0, double dMax) {
        double xMax = 0;
        for (double v : x) {
            xMax = Math.max(xMax, Math.abs(v));
        }
        if (xMax > 0 && dMax < 1e-7 * xMax) {
            return 1;
        }
        int nr1 = mesh.nr - 1;
        int[] g = new int[4];
        double[] a = new double[4];
        double[] d = new double[4];
        // Linear part: gᵀδ and δᵀKδ.
        double lin1 = 0;
        double lin2 = 0;
        for (int j = 0; j < mesh.nz - 1; j++) {
            for (int i = 0; i < nr1; i++) {
                int el = i + nr1 * j;
                int mat = mesh.elementMaterial[el];
                if (curves[mat] != null) {
                    continue;
                }
                if (!gather(i, j, x, b0, g, a)) {
                    continue;
                }
                for (int q = 0; q < 4; q++) {
                    d[q] = g[q] >= 0 ? delta[g[q]] : 0;
                }
                double nu = nuLin[mat];
                for (int p = 0; p < 4; p++) {
                    if (d[p] == 0) {
                        continue;
                    }
                    for (int q = 0; q < 4; q++) {
                        double k = nu * mesh.kGeo[16 * el + 4 * p + q];
                        lin1 += d[p] * k * a[q];
                        lin2 += d[p] * k * d[q];
                    }
                }
            }
        }
        double lambda = 1;
        double d1 = slopeAt(1, x, delta, b0, lin1, lin2, g, a, d);
        if (Math.abs(d1) > -slope0 * CURVATURE) {
            // The full step misses the minimum along δ (short of it where the curve steepens
            // ahead, past it where it flattens): the minimiser of the convex Π(x + λδ), the root
            // of its increasing derivative, bracketed by doubling λ and found by the Illinois
            // variant of regula falsi (G. Dahlquist and Å. Björck, Numerical Methods, 1974,
            // §6.2.2) to |Π'(λ)| ≤ CURVATURE·|Π'(0)|, the strong Wolfe condition (Nocedal &amp;
            // Wright §3.1).
            double lo = 0;
            double flo = slope0;
            double hi = 1;
            double fhi = d1;
            while (fhi < 0 && hi < MAX_STRETCH) {
                lo = hi;
                flo = fhi;
                hi *= 2;
                fhi = slopeAt(hi, x, delta, b0, lin1, lin2, g, a, d);
            }
            lambda = hi;
            int side = 0;
            for (int it = 0; it < 60 && fhi > 0 && Math.abs(fhi) > -slope0 * CURVATURE; it++) {
                lambda = (lo * fhi - hi * flo) / (fhi - flo);
                if (!(lambda > lo && lambda < hi)) {
                    lambda = 0.5 * (lo + hi);
                }
                double f = slopeAt(lambda, x, delta, b0, lin1, lin2, g, a, d);
                if (Math.abs(f) <= -slope0 * CURVATURE) {
                    break;
                }
                if (f < 0) {
                    lo = lambda;
                    flo = f;
                    if (side == -1) {
                        fhi *= 0.5;
                    }
                    side = -1;
                } else {
                    hi = lambda;
                    fhi = f;
                    if (side == 1) {
                        flo *= 0.5;
                    }
                    side = 1;
                }
            }
        }
        for (int trial = 0; trial < 40; trial++) {
            double change = lambda * lin1 + 0.5 * lambda * lambda * lin2
                    + alongStep(lambda, false, x, delta, b0, g, a, d);
            if (change <= 1e-4 * lambda * slope0) {
                return lambda;
            }
            lambda *= 0.5;
        }
        return lambda;
    }

    /** The derivative of the energy along the step, dΠ(x + λδ)/dλ (lin1 + λ·lin2 its linear part's). */
    private double slopeAt(double lambda, double[] x, double[] delta, double b0, double lin1, double lin2, int[] g,
                           double[] a, double[] d) {
        return lin1 + lambda * lin2 + alongStep(lambda, true, x, delta, b0, g, a, d);
    }

    /**
     * The saturable elements' part along the step x + λδ: their energy change
     * Σ w·(W(|B(λ)|) − W(|B(0)|)), or with derivative set its derivative Σ w·ν(|B(λ)|)·(B(λ)·δB).
     */
    private double alongStep(double lambda, boolean derivative, double[] x, double[] delta, double b0, int[] g,
                             double[] a, double[] d) {
        int nr1 = mesh.nr - 1;
        double sum = 0;
        for (int c = 0; c < nl.length; c++) {
            int el = nl[c];
            MagnetizationCurve curve = curves[mesh.elementMaterial[el]];
            gather(el % nr1, el / nr1, x, b0, g, a);
            for (int q = 0; q < 4; q++) {
                d[q] = g[q] >= 0 ? delta[g[q]] : 0;
            }
            for (int gp4 = 0; gp4 < 4; gp4++) {
                int o = 16 * c + 4 * gp4;
                double u0 = 0;
                double v0 = 0;
                double du = 0;
                double dv = 0;
                for (int q = 0; q < 4; q++) {
                    u0 += gz[o + q] * a[q];
                    v0 += gr[o + q] * a[q];
                    du += gz[o + q] * d[q];
                    dv += gr[o + q] * d[q];
                }
                double u1 = u0 + lambda * du;
                double v1 = v0 + lambda * dv;
                double b1 = Math.sqrt(u1 * u1 + v1 * v1);
                sum += wq[4 * c + gp4] * (derivative ? curve.reluctivity(b1) * (u1 * du + v1 * dv)
                        : curve.energyDensity(b1) - curve.energyDensity(Math.sqrt(u0 * u0 + v0 * v0)));
            }
        }
        return sum;
    }

    /** Peak |B|, volume and volume above the threshold per saturable material (x real, xi imaginary or null). */
    private void statistics(double[] x, double[] xi, double b0, double threshold, double[] peak, double[] vol,
                            double[] above) {
        int nr1 = mesh.nr - 1;
        int[] g = new int[4];
        double[] a = new double[4];
        double[] ai = new double[4];
        for (int c = 0; c < nl.length; c++) {
            int el = nl[c];
            int i = el % nr1;
            int j = el / nr1;
            int mat = mesh.elementMaterial[el];
            double limit = threshold * curves[mat].saturationTesla();
            gather(i, j, x, b0, g, a);
            for (int q = 0; q < 4; q++) {
                ai[q] = xi == null || g[q] < 0 ? 0 : xi[g[q]];
            }
            for (int gp4 = 0; gp4 < 4; gp4++) {
                double bb = peakAt(c, gp4, a, ai);
                double wt = wq[4 * c + gp4];
                peak[mat] = Math.max(peak[mat], bb);
                vol[mat] += wt;
                if (bb > limit) {
                    above[mat] += wt;
                }
            }
        }
    }

    /** The peak |B| over a period at a Gauss point: B̂² = (|B|² + |B·B|)/2 (real fields: |B|). */
    private double peakAt(int c, int gp4, double[] a, double[] ai) {
        int o = 16 * c + 4 * gp4;
        double ur = 0;
        double ui = 0;
        double vr = 0;
        double vi = 0;
        for (int q = 0; q < 4; q++) {
            ur += gz[o + q] * a[q];
            ui += gz[o + q] * ai[q];
            vr += gr[o + q] * a[q];
            vi += gr[o + q] * ai[q];
        }
        double mod2 = ur * ur + ui * ui + vr * vr + vi * vi;
        double dotRe = ur * ur - ui * ui + vr * vr - vi * vi;
        double dotIm = 2 * (ur * ui + vr * vi);
        return Math.sqrt(0.5 * (mod2 + Math.hypot(dotRe, dotIm)));
    }

    /**
     * The alternating-field solve with effective (secant, peak) permeabilities iterated to
     * self-consistency.
     *
     * @param hertz     the frequency in Hz, greater than 0
     * @param b0        the applied peak flux density in T, greater than 0
     * @param tolerance the largest relative nodal change between two iterations accepted as converged
     * @param maxSteps  the most iterations
     * @param threshold the fraction of each curve's saturation flux density counted by {@link Outcome#fractionAbove}
     * @return the outcome
     */
    public Outcome harmonic(double hertz, double b0, double tolerance, int maxSteps, double threshold) {
        int n = mesh.n;
        int b = mesh.band;
        int w = b + 1;
        int nr1 = mesh.nr - 1;
        double omega = 2 * Math.PI * hertz;
        int m = mesh.materials;
        double nu0 = 1 / PhysicalConstants.MU_0;
        double[] nuRe = new double[m];
        double[] nuIm = new double[m];
        double[] facRe = new double[m];
        double[] facIm = new double[m];
        double[] wSigma = new double[m];
        for (int k = 0; k < m; k++) {
            if (k == 0) {
                nuRe[k] = nu0;
                continue;
            }
            double mr = mesh.layout.mu[k].real(hertz);
            double mi = mesh.layout.mu[k].loss(hertz);
            double mod2 = mr * mr + mi * mi;
            nuRe[k] = nu0 * mr / mod2;
            nuIm[k] = nu0 * mi / mod2;
            // µ'(0)/µr(f) = µ'(0)·(µ' + jµ'')/|µr|²
            double m0 = mesh.layout.mu[k].real(0);
            facRe[k] = m0 * mr / mod2;
            facIm[k] = m0 * mi / mod2;
            wSigma[k] = omega * mesh.layout.sigma[k];
        }
        // Per Gauss point of the saturable elements, the current secant reluctivity (real).
        double[] sec = new double[4 * nl.length];
        for (int c = 0; c < nl.length; c++) {
            double v = curves[mesh.elementMaterial[nl[c]]].reluctivity(0);
            for (int q = 0; q < 4; q++) {
                sec[4 * c + q] = v;
            }
        }
        double[] xr = new double[n];
        double[] xi = new double[n];
        double[] hist = new double[maxSteps];
        double theta = 1;
        double prev = Double.POSITIVE_INFINITY;
        boolean converged = false;
        int steps = 0;
        int[] g = new int[4];
        int[] ii = new int[4];
        double[] a = new double[4];
        double[] ai = new double[4];
        while (steps < maxSteps) {
            double[] re = new double[n * w];
            double[] im = new double[n * w];
            double[] fr = new double[n];
            double[] fi = new double[n];
            for (int j = 0; j < mesh.nz - 1; j++) {
                for (int i = 0; i < nr1; i++) {
                    int el = i + nr1 * j;
                    int mat = mesh.elementMaterial[el];
                    if (curves[mat] != null) {
                        continue;
                    }
                    mesh.elementUnknowns(i, j, g);
                    corners(i, ii);
                    for (int p = 0; p < 4; p++) {
                        int gp = g[p];
                        if (gp < 0) {
                            continue;
                        }
                        for (int q = 0; q < 4; q++) {
                            double k = mesh.kGeo[16 * el + 4 * p + q];
                            double er = nuRe[mat] * k;
                            double ei = nuIm[mat] * k + wSigma[mat] * mesh.mGeo[16 * el + 4 * p + q];
                            int gq = g[q];
                            if (gq < 0) {
                                double val = 0.5 * b0 * mesh.rl[ii[q]];
                                fr[gp] -= er * val;
                                fi[gp] -= ei * val;
                            } else if (gq <= gp) {
                                re[gp * w + gq - gp + b] += er;
                                im[gp * w + gq - gp + b] += ei;
                            }
                        }
                    }
                }
            }
            for (int c = 0; c < nl.length; c++) {
                int el = nl[c];
                int i = el % nr1;
                int j = el / nr1;
                int mat = mesh.elementMaterial[el];
                mesh.elementUnknowns(i, j, g);
                corners(i, ii);
                for (int p = 0; p < 4; p++) {
                    int gp = g[p];
                    if (gp < 0) {
                        continue;
                    }
                    for (int q = 0; q < 4; q++) {
                        double kr = 0;
                        double ki = 0;
                        for (int gp4 = 0; gp4 < 4; gp4++) {
                            int o = 16 * c + 4 * gp4;
                            double geo = wq[4 * c + gp4] * (gz[o + p] * gz[o + q] + gr[o + p] * gr[o + q]);
                            double nu = sec[4 * c + gp4];
                            kr += geo * nu * facRe[mat];
                            ki += geo * nu * facIm[mat];
                        }
                        ki += wSigma[mat] * mesh.mGeo[16 * el + 4 * p + q];
                        int gq = g[q];
                        if (gq < 0) {
                            double val = 0.5 * b0 * mesh.rl[ii[q]];
                            fr[gp] -= kr * val;
                            fi[gp] -= ki * val;
                        } else if (gq <= gp) {
                            re[gp * w + gq - gp + b] += kr;
                            im[gp * w + gq - gp + b] += ki;
                        }
                    }
                }
            }
            BandedLdlt.factor(n, b, re, im);
            BandedLdlt.solve(n, b, re, im, fr, fi);
            double dMax = 0;
            double xMax = 0;
            for (int k = 0; k < n; k++) {
                dMax = Math.max(dMax, Math.hypot(fr[k] - xr[k], fi[k] - xi[k]));
                xMax = Math.max(xMax, Math.hypot(fr[k], fi[k]));
            }
            xr = fr;
            xi = fi;
            // New secant reluctivities at the peak flux densities; the largest relative change.
            double change = 0;
            for (int c = 0; c < nl.length; c++) {
                int el = nl[c];
                MagnetizationCurve curve = curves[mesh.elementMaterial[el]];
                gather(el % nr1, el / nr1, xr, b0, g, a);
                for (int q = 0; q < 4; q++) {
                    ai[q] = g[q] >= 0 ? xi[g[q]] : 0;
                }
                for (int gp4 = 0; gp4 < 4; gp4++) {
                    double target = curve.reluctivity(peakAt(c, gp4, a, ai));
                    double old = sec[4 * c + gp4];
                    change = Math.max(change, Math.abs(target - old) / old);
                    // Relaxed in log ν: the reluctivity spans orders of magnitude between the
                    // knee and saturation, and a linear blend would jump to θ·ν_target at once.
                    sec[4 * c + gp4] = old * Math.pow(target / old, theta);
                }
            }
            double update = xMax > 0 ? dMax / xMax : 0;
            hist[steps++] = update;
            if (steps > 1 && update <= tolerance) {
                converged = true;
                break;
            }
            if (change > prev) {
                theta = Math.max(MIN_RELAXATION, 0.5 * theta);
            } else {
                theta = Math.min(1, 1.25 * theta);
            }
            prev = change;
        }
        double[] sr = new double[n];
        double[] si = new double[n];
        for (int k = 0; k < n; k++) {
            sr[k] = xr[k] / b0;
            si[k] = xi[k] / b0;
        }
        double[] peak = new double[m];
        double[] vol = new double[m];
        double[] above = new double[m];
        statistics(xr, xi, b0, threshold, peak, vol, above);
        // The residual recorded is the last relative nodal change (the fixed point's measure).
        double last = steps > 0 ? hist[steps - 1] : 0;
        Field f = new Field(mesh, omega, wSigma, sr, si, 1, last, last);
        return new Outcome(f, java.util.Arrays.copyOf(hist, steps), converged, peak, vol, above);
    }
}
