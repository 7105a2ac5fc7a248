/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.internal.ChainMatrix;
import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.internal.SpectralChain;
import io.shieldmath.shield.internal.SpectralRule;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The two layer-product kernels of the library ({@link ChainMatrix#logTransmission} and
 * {@link SpectralChain#sum}) rewritten so that their per-layer step is one shared static
 * method, {@link #step}, which keeps the running 2×2 complex product in a caller-provided
 * {@code double[8]} instead of eight local variables. Everything else is the kernels' code
 * unchanged, operation for operation, so that the results are bit-identical and
 * {@link LayerStepBenchmark} times only the cost of sharing the step. Not used by the
 * library; it exists to decide whether the library should share the step.
 */
final class SharedStepKernels {

    /** The doubles the running product takes in the scratch array: a, b, c, d as (re, im). */
    static final int PRODUCT_SLOTS = 8;

    private static final double LN2 = Numerics.LN2;

    private SharedStepKernels() {
    }

    /**
     * One layer: M ← M·L with the layer's scaled chain matrix L = [[1+E, z(1−E)], [(1−E)/z, 1+E]],
     * E = e^{−2γt}, then the exact power-of-two rescale of the product when it leaves 2^±300.
     *
     * @param m       holds the running product [ar, ai, br, bi, cr, ci, dr, di] from {@code at},
     *                updated in place
     * @param at      the index of ar in {@code m}
     * @param em1     expm1(−2·Re γt)
     * @param half    sin(Im γt)
     * @param cosHalf cos(Im γt)
     * @param zr      Re z, the layer's (normalised) impedance
     * @param zi      Im z
     * @param yr      Re 1/z
     * @param yi      Im 1/z
     * @return the exponent e by which the product was divided by 2^e (0 if it was not)
     */
    static int step(double[] m, int at, double em1, double half, double cosHalf, double zr, double zi, double yr,
                    double yi) {
        final double sinY = -2 * half * cosHalf;
        final double cosY = 1 - 2 * half * half;
        final double omr = -(em1 * cosY - 2 * half * half);
        final double omi = -((em1 + 1) * sinY);
        final double opr = 2 - omr;
        final double opi = -omi;
        final double lbr = zr * omr - zi * omi;
        final double lbi = zr * omi + zi * omr;
        final double lcr = yr * omr - yi * omi;
        final double lci = yr * omi + yi * omr;
        final double ar = m[at], ai = m[at + 1], br = m[at + 2], bi = m[at + 3];
        final double cr = m[at + 4], ci = m[at + 5], dr = m[at + 6], di = m[at + 7];
        double nar = ar * opr - ai * opi + br * lcr - bi * lci;
        double nai = ar * opi + ai * opr + br * lci + bi * lcr;
        double nbr = ar * lbr - ai * lbi + br * opr - bi * opi;
        double nbi = ar * lbi + ai * lbr + br * opi + bi * opr;
        double ncr = cr * opr - ci * opi + dr * lcr - di * lci;
        double nci = cr * opi + ci * opr + dr * lci + di * lcr;
        double ndr = cr * lbr - ci * lbi + dr * opr - di * opi;
        double ndi = cr * lbi + ci * lbr + dr * opi + di * opr;
        final double size = Math.abs(nar) + Math.abs(nai) + Math.abs(nbr) + Math.abs(nbi)
                + Math.abs(ncr) + Math.abs(nci) + Math.abs(ndr) + Math.abs(ndi);
        int e = 0;
        if (size > Numerics.RESCALE_ABOVE || size < Numerics.RESCALE_BELOW) {
            e = Math.getExponent(size);
            nar = Math.scalb(nar, -e);
            nai = Math.scalb(nai, -e);
            nbr = Math.scalb(nbr, -e);
            nbi = Math.scalb(nbi, -e);
            ncr = Math.scalb(ncr, -e);
            nci = Math.scalb(nci, -e);
            ndr = Math.scalb(ndr, -e);
            ndi = Math.scalb(ndi, -e);
        }
        m[at] = nar;
        m[at + 1] = nai;
        m[at + 2] = nbr;
        m[at + 3] = nbi;
        m[at + 4] = ncr;
        m[at + 5] = nci;
        m[at + 6] = ndr;
        m[at + 7] = ndi;
        return e;
    }

    /**
     * {@link ChainMatrix#logTransmission} (without the optional parts) with the shared step.
     *
     * @param t       thicknesses in m
     * @param sigma   conductivities in S/m
     * @param eps     relative permittivities
     * @param mu      permeability models
     * @param hz      frequency in Hz
     * @param zr      Re of the terminating impedance, Ω
     * @param zi      Im of the terminating impedance, Ω
     * @param scratch null (a new {@code double[8]} is made, as the library's single-point call
     *                would have to), or at least {@value #PRODUCT_SLOTS} doubles, overwritten
     * @return ln |T|
     */
    static double logTransmission(double[] t, double[] sigma, double[] eps, PermeabilityModel[] mu, double hz,
                                  double zr, double zi, double[] scratch) {
        final double w = 2 * Math.PI * hz;
        final double wMu0 = w * PhysicalConstants.MU_0;
        final double wEps0 = w * PhysicalConstants.EPSILON_0;
        final double[] m = scratch != null ? scratch : new double[PRODUCT_SLOTS];
        m[0] = 1;
        m[1] = 0;
        m[2] = 0;
        m[3] = 0;
        m[4] = 0;
        m[5] = 0;
        m[6] = 1;
        m[7] = 0;
        double logScale = 0;
        for (int i = 0; i < t.length; i++) {
            final double p = wMu0 * mu[i].loss(hz);
            final double q = wMu0 * mu[i].real(hz);
            final double s = sigma[i];
            final double we = wEps0 * eps[i];
            final double g2r = p * s - q * we;
            final double g2i = p * we + q * s + 0.0;
            final double mod = Math.sqrt(g2r * g2r + g2i * g2i);
            double gr, gi;
            if (g2r >= 0) {
                gr = Math.sqrt(0.5 * (mod + g2r));
                gi = gr > 0 ? g2i / (2 * gr) : 0;
            } else {
                gi = Math.sqrt(0.5 * (mod - g2r));
                gr = g2i / (2 * gi);
            }
            final double invGg = 1 / (gr * gr + gi * gi);
            final double etaR = (p * gr + q * gi) * invGg;
            final double etaI = (q * gr - p * gi) * invGg;
            final double invPq = 1 / (p * p + q * q);
            final double invR = (gr * p + gi * q) * invPq;
            final double invI = (gi * p - gr * q) * invPq;
            final double ta = gr * t[i];
            final double tb = gi * t[i];
            final double em1 = ChainMatrix.expm1Fast(-2 * ta);
            final int e = step(m, 0, em1, Math.sin(tb), Math.cos(tb), etaR, etaI, invR, invI);
            logScale += LN2 - ta;
            logScale -= e * LN2;
        }
        final double invZz = 1 / (zr * zr + zi * zi);
        final double sr = m[0] + m[6] + (m[2] * zr + m[3] * zi) * invZz + (m[4] * zr - m[5] * zi);
        final double si = m[1] + m[7] + (m[3] * zr - m[2] * zi) * invZz + (m[4] * zi + m[5] * zr);
        return LN2 - Numerics.logAbs(sr, si) + logScale;
    }

    /**
     * {@link SpectralChain#sum} with the shared step: the same arguments and results (the
     * scratch array needs {@value #PRODUCT_SLOTS} more doubles after the SLOTS·n of the
     * kernel).
     *
     * @param rule    the nodes and weights
     * @param t       layer thicknesses in m
     * @param sigma   conductivities in S/m
     * @param mu      permeability models
     * @param hz      frequency in Hz
     * @param scratch at least SLOTS·n + {@value #PRODUCT_SLOTS} doubles, overwritten
     * @param out     as for {@link SpectralChain#sum}
     */
    static void spectralSum(SpectralRule rule, double[] t, double[] sigma, PermeabilityModel[] mu, double hz,
                            double[] scratch, double[] out) {
        final int slots = SpectralChain.SLOTS;
        final int n = t.length;
        final double wMu0 = 2 * Math.PI * hz * PhysicalConstants.MU_0;
        double lambda0 = 0;
        double total = 0;
        double feature = Double.POSITIVE_INFINITY;
        boolean transparent = true;
        for (int i = 0; i < n; i++) {
            double mr = mu[i].real(hz);
            double ml = mu[i].loss(hz);
            double kr = wMu0 * sigma[i] * ml;
            double ki = wMu0 * sigma[i] * mr;
            int o = slots * i;
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
        final int p0 = slots * n;
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
            scratch[p0] = 1;
            scratch[p0 + 1] = 0;
            scratch[p0 + 2] = 0;
            scratch[p0 + 3] = 0;
            scratch[p0 + 4] = 0;
            scratch[p0 + 5] = 0;
            scratch[p0 + 6] = 1;
            scratch[p0 + 7] = 0;
            double logMag = l * total + logPrefactor;
            double phr = 1, phi = 0;
            for (int i = 0; i < n; i++) {
                final int o = slots * i;
                final double g2r = l2 + scratch[o];
                final double g2i = scratch[o + 1];
                final double mr = scratch[o + 2];
                final double ml = scratch[o + 3];
                final double mod = Math.sqrt(g2r * g2r + g2i * g2i);
                final double gr = Math.sqrt(0.5 * (mod + g2r));
                final double gi = g2i / (2 * gr);
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
                final double em1 = Math.expm1(-2 * ta);
                final int e = step(scratch, p0, em1, half, cosHalf, zr, zi, yr, yi);
                logMag -= ta;
                logMag -= e * LN2;
                final double pr = phr * cosHalf + phi * half;
                phi = phi * cosHalf - phr * half;
                phr = pr;
            }
            final double ar = scratch[p0], ai = scratch[p0 + 1], br = scratch[p0 + 2], bi = scratch[p0 + 3];
            final double cr = scratch[p0 + 4], ci = scratch[p0 + 5], dr = scratch[p0 + 6], di = scratch[p0 + 7];
            final int g = Math.getExponent(Math.abs(ar + br + cr + dr) + Math.abs(ai + bi + ci + di));
            final double sr = Math.scalb(ar + br + cr + dr, -g);
            final double si = Math.scalb(ai + bi + ci + di, -g);
            final double ss = sr * sr + si * si;
            final double x = logMag - g * LN2;
            if (x > ref + 300) {
                final double f = Math.exp(ref - x);
                sumR *= f;
                sumI *= f;
                ref = x;
            }
            final double mag = Math.exp(x - ref) / ss;
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
