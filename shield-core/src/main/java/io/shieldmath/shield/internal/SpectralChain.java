/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The chain-matrix product of a planar stack for quasi-static TE spectral waves, summed
 * against a {@link SpectralRule}: the hot path of the coil-coupling model, on primitives,
 * with no allocation per node (the per-layer constants of one frequency go in a scratch
 * array supplied by the caller).
 *
 * <p>A spectral wave of radial wavenumber λ has, in layer i, γ_i = sqrt(λ² + jωµ_iσ_i) and
 * wave impedance Z_i = jωµ_i/γ_i; in air γ0 = λ, Z0 = jωµ0/λ (J. R. Moser, IEEE Trans. EMC
 * 9 (1967) 6, for one layer; Schelkunoff's chain-matrix product for a stack).
 * Displacement current is neglected (quasi-static), so εr does not enter. Impedances are
 * normalised by Z0: z_i = µr_i·λ/γ_i with µr = µ' − jµ''. The stack's transmission between
 * Z0 on both sides is T = 2/(A + B + C + D) of the normalised chain matrix, and the
 * integrand factor is F(λ) = e^{λt}·T(λ) (t the total thickness), so that
 * M = Σ W_k·F(λ_k) with the free-space kernel e^{−λd} inside W.
 *
 * <p>Numerics, as in the planar engine: each layer's matrix is divided by e^{γt}/2, giving
 * [[1+E, z(1−E)], [(1−E)/z, 1+E]] with E = e^{−2γt} and 1 − E = −expm1(−2γt); the factors
 * 2·e^{−γt} are kept as a log-magnitude and a unit phasor. In addition the whole sum is
 * scaled by e^{+Λ0}, Λ0 = Σ Re γ_i(0)·t_i (the absorption at λ → 0, the smallest over λ),
 * and then kept relative to its largest term so far (within e^{300}), so thick stacks and
 * stacks with hundreds of reflecting interfaces neither underflow nor overflow; the total
 * scale is returned separately. The running product is brought back by an
 * exact power of two whenever it leaves 2^±300, after every layer, so any number of layers
 * stays finite.
 *
 * <p>The per-layer step (scaled layer matrix, product, rescale) is the same as in
 * {@link ChainMatrix}, with the spectral impedances in place of the plane-wave ones. The two
 * loops are kept apart by measurement (JMH {@code LayerStepBenchmark}, 2026-12-03, shared
 * 2-core machine): with the step as one shared method keeping the product in a
 * {@code double[8]}, this sum took 1.85 ± 0.51 times as long for 5 layers (1.22 ± 0.84 for
 * one) in one run, within noise in a re-run, and the planar kernel would have needed a
 * scratch array from every caller to stay free of allocation (80 bytes per call otherwise);
 * the reasons are given in full in {@link ChainMatrix}. One difference remains: this loop
 * calls {@link Math#expm1} for every layer and node, the planar one the cheaper
 * {@link ChainMatrix#expm1Fast}; both are accurate to a few units in the last place.
 * Change one, change the other: both are tested against the same arbitrary-precision
 * reference product.
 */
public final class SpectralChain {

    /** Slots per layer in the scratch array. */
    public static final int SLOTS = 6;
    private static final double LN2 = Numerics.LN2;
    private static final double RESCALE_ABOVE = Numerics.RESCALE_ABOVE;
    private static final double RESCALE_BELOW = Numerics.RESCALE_BELOW;
    /** The sum is rescaled when a term exceeds e^{SUM_RANGE} times its current scale. */
    private static final double SUM_RANGE = 300;

    private SpectralChain() {
    }

    /**
     * Σ W_k·F(λ_k), scaled, for one frequency.
     *
     * @param rule    the nodes and weights
     * @param t       layer thicknesses in m
     * @param sigma   conductivities in S/m
     * @param mu      permeability models
     * @param hz      frequency in Hz
     * @param scratch at least SLOTS·n doubles, overwritten
     * @param out     receives [0] Re, [1] Im of the scaled sum in H, [2] the scale in nepers (the
     *                sum is Σ W_k·F(λ_k)·e^{out[2]}), [3] the free-space sum over the same nodes
     *                in H (the reference for insertion loss)
     */
    public static void sum(SpectralRule rule, double[] t, double[] sigma, PermeabilityModel[] mu, double hz,
                    double[] scratch, double[] out) {
        final int n = t.length;
        final double wMu0 = 2 * Math.PI * hz * PhysicalConstants.MU_0;
        double lambda0 = 0;
        double total = 0;
        // The smallest wavenumber scale at which the stack's F(λ) has a feature (a branch point
        // at |λ| = |κ|, the thin-sheet pole near ωµ0σt/2, the magnetic pole near 2/(µr·t),
        // poles near 1/t, the width sqrt(|κ|/t) of a thick layer's spectrum).
        double feature = Double.POSITIVE_INFINITY;
        boolean transparent = true;
        for (int i = 0; i < n; i++) {
            double mr = mu[i].real(hz);
            double ml = mu[i].loss(hz);
            if (Numerics.breaksContract(mr, ml)) {
                // A user model outside finite µ' > 0, µ'' ≥ 0: a NaN sum, which the caller names.
                java.util.Arrays.fill(out, 0, 4, Double.NaN);
                return;
            }
            // jωµσ = ωµ0σ·(µ'' + jµ')
            double kr = wMu0 * sigma[i] * ml;
            double ki = wMu0 * sigma[i] * mr;
            int o = SLOTS * i;
            scratch[o] = kr;
            scratch[o + 1] = ki;
            scratch[o + 2] = mr;
            scratch[o + 3] = ml;
            scratch[o + 4] = 1 / (mr * mr + ml * ml);
            scratch[o + 5] = t[i];
            double mod = Math.sqrt(kr * kr + ki * ki);
            lambda0 += Math.sqrt(0.5 * (mod + kr)) * t[i];
            total += t[i];
            double mu2 = mr * mr + ml * ml;
            boolean magnetic = Math.abs(mr - 1) > 1e-9 || ml > 0;
            if (sigma[i] > 0 || magnetic) {
                transparent = false;
            }
            feature = Math.min(feature, 1 / t[i]);
            if (sigma[i] > 0) {
                double kappa = Math.sqrt(mod);
                feature = Math.min(feature, Math.min(kappa, 0.5 * wMu0 * sigma[i] * t[i]));
                if (kappa * t[i] > 1) {
                    feature = Math.min(feature, Math.sqrt(kappa / t[i]));
                }
            }
            if (magnetic) {
                double m = Math.sqrt(mu2);
                feature = Math.min(feature, 2 / (Math.max(m, 1 / m) * t[i]));
            }
        }
        if (transparent) {
            feature = Double.POSITIVE_INFINITY;
        }
        final boolean smooth = feature >= rule.smoothScale;
        final double[] lam = rule.lambda;
        final double[] wt = rule.weight;
        final double logPrefactor = (n + 1) * LN2 + lambda0;
        double sumR = 0;
        double sumI = 0;
        double ref = Double.NEGATIVE_INFINITY;
        final int skipFrom = smooth ? rule.gradedFrom : 0;
        final int skipTo = smooth ? rule.uniformFrom : rule.gradedFrom;
        for (int k = 0; k < lam.length; k++) {
            if (k == skipFrom) {
                k = skipTo;
            }
            final double l = lam[k];
            final double l2 = l * l;
            double ar = 1, ai = 0, br = 0, bi = 0, cr = 0, ci = 0, dr = 1, di = 0;
            double logMag = l * total + logPrefactor;
            double phr = 1, phi = 0;
            for (int i = 0; i < n; i++) {
                final int o = SLOTS * i;
                final double g2r = l2 + scratch[o];
                final double g2i = scratch[o + 1];
                final double mr = scratch[o + 2];
                final double ml = scratch[o + 3];
                final double mod = Math.sqrt(g2r * g2r + g2i * g2i);
                final double gr = Math.sqrt(0.5 * (mod + g2r));
                final double gi = g2i / (2 * gr);
                // z = µr·λ/γ, y = 1/z = γ/(µr·λ)
                final double u = l / (gr * gr + gi * gi);
                final double zr = u * (mr * gr - ml * gi);
                final double zi = -u * (mr * gi + ml * gr);
                final double v = scratch[o + 4] / l;
                final double yr = v * (gr * mr - gi * ml);
                final double yi = v * (gr * ml + gi * mr);
                final double th = scratch[o + 5];
                final double ta = gr * th;
                final double tb = gi * th;
                final double half = Math.sin(tb);
                final double cosHalf = Math.cos(tb);
                final double sinY = -2 * half * cosHalf;
                final double cosY = 1 - 2 * half * half;
                final double em1 = Math.expm1(-2 * ta);
                final double omr = -(em1 * cosY - 2 * half * half);
                final double omi = -((em1 + 1) * sinY);
                final double opr = 2 - omr;
                final double opi = -omi;
                final double lbr = zr * omr - zi * omi;
                final double lbi = zr * omi + zi * omr;
                final double lcr = yr * omr - yi * omi;
                final double lci = yr * omi + yi * omr;
                final double nar = ar * opr - ai * opi + br * lcr - bi * lci;
                final double nai = ar * opi + ai * opr + br * lci + bi * lcr;
                final double nbr = ar * lbr - ai * lbi + br * opr - bi * opi;
                final double nbi = ar * lbi + ai * lbr + br * opi + bi * opr;
                final double ncr = cr * opr - ci * opi + dr * lcr - di * lci;
                final double nci = cr * opi + ci * opr + dr * lci + di * lcr;
                final double ndr = cr * lbr - ci * lbi + dr * opr - di * opi;
                final double ndi = cr * lbi + ci * lbr + dr * opi + di * opr;
                ar = nar;
                ai = nai;
                br = nbr;
                bi = nbi;
                cr = ncr;
                ci = nci;
                dr = ndr;
                di = ndi;
                logMag -= ta;
                // phasor ← phasor·e^{−j·tb}
                final double pr = phr * cosHalf + phi * half;
                phi = phi * cosHalf - phr * half;
                phr = pr;
                // The same rescale as ChainMatrix's layer loop (exact powers of two, the bounds of
                // Numerics.RESCALE_ABOVE): a stack of good conductors and gaps grows the product by
                // about 1/|z| per layer, so deep stacks would overflow without it.
                final double size = Math.abs(ar) + Math.abs(ai) + Math.abs(br) + Math.abs(bi)
                        + Math.abs(cr) + Math.abs(ci) + Math.abs(dr) + Math.abs(di);
                if (size > RESCALE_ABOVE || size < RESCALE_BELOW) {
                    final int e = Math.getExponent(size);
                    ar = Math.scalb(ar, -e);
                    ai = Math.scalb(ai, -e);
                    br = Math.scalb(br, -e);
                    bi = Math.scalb(bi, -e);
                    cr = Math.scalb(cr, -e);
                    ci = Math.scalb(ci, -e);
                    dr = Math.scalb(dr, -e);
                    di = Math.scalb(di, -e);
                    logMag -= e * LN2;
                }
            }
            // F·e^{Λ0} = 2^{n+1}·e^{λt − Σγt + Λ0} / S, S = A + B + C + D. S is first brought
            // near 1 by an exact power of two, so that x is ln |F·e^{Λ0}| to within ln 2.
            final int g = Math.getExponent(Math.abs(ar + br + cr + dr) + Math.abs(ai + bi + ci + di));
            final double sr = Math.scalb(ar + br + cr + dr, -g);
            final double si = Math.scalb(ai + bi + ci + di, -g);
            final double ss = sr * sr + si * si;
            final double x = logMag - g * LN2;
            if (x > ref + SUM_RANGE) {
                // The sum is kept relative to e^{ref}, ref within SUM_RANGE of the largest term so
                // far: deep stacks whose every term is below e^{−745} (reflections at hundreds of
                // interfaces) do not underflow, and no term overflows.
                final double f = Math.exp(ref - x);
                sumR *= f;
                sumI *= f;
                ref = x;
            }
            final double mag = Math.exp(x - ref) / ss;
            // (phasor / S)·mag
            final double fr = (phr * sr + phi * si) * mag;
            final double fi = (phi * sr - phr * si) * mag;
            sumR += wt[k] * fr;
            sumI += wt[k] * fi;
        }
        out[0] = sumR;
        out[1] = sumI;
        out[2] = ref == Double.NEGATIVE_INFINITY ? lambda0 : lambda0 - ref;
        out[3] = smooth ? rule.freeSpaceCoarse : rule.freeSpace;
    }
}
