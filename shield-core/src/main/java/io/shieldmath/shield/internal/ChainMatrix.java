/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The transmission-line (Schelkunoff) chain-matrix product for a planar stack, on
 * primitives: no objects are created per call, so it is the hot path of every planar
 * evaluation and of the spectral coil-coupling integral.
 *
 * <p>Layer i has propagation constant γ = sqrt(jωµ(σ + jωε)) and intrinsic impedance
 * η = jωµ/γ; its chain matrix is [[cosh γt, η sinh γt], [sinh γt / η, cosh γt]]. Between
 * equal terminating impedances Z on both sides, T = 2 / (A + B/Z + C·Z + D).
 *
 * <p>Numerics (the departure from the textbook product): cosh and sinh overflow long
 * before the shielding effectiveness stops being meaningful, so each layer's matrix is
 * divided by e^{γt}/2 and the factor is carried as a logarithm. The scaled matrix is
 * [[1+E, η(1−E)], [(1−E)/η, 1+E]] with E = e^{−2γt}, |E| ≤ 1; 1 − E is computed as
 * −expm1(−2γt) so that electrically thin layers lose no digits. The running product is
 * brought back by an exact power of two whenever it leaves 2^±300 (see
 * {@link Numerics#RESCALE_ABOVE}), so any number of layers stays finite.
 *
 * <p>{@link SpectralChain} runs the same per-layer step (scaled layer matrix, product,
 * rescale) for the spectral waves of the coil-coupling model, with its own impedances. The
 * two are kept as separate loops, by measurement (JMH {@code LayerStepBenchmark} in
 * {@code benchmarks}, 2026-12-03, on a 2-core machine shared with other builds): the step
 * shared as one static method that keeps the running product in a {@code double[8]}
 * allocated 80 bytes per evaluation when the array was made per call (escape analysis did
 * not remove it), which would break the no-allocation promise of the single-point and batch
 * calls unless every caller handed a scratch array down; the time ratios, shared over
 * inline, were 0.96 ± 0.20 (planar, 5 layers) and 1.85 ± 0.51 (spectral sum, 5 layers) in
 * one run and within noise in a re-run, so no gain was seen to pay for that. Change one,
 * change the other: both are tested against the same arbitrary-precision reference product.
 *
 * <p>Speed (measured by the JMH benchmarks in {@code benchmarks}): per layer two square
 * roots, one sine and cosine, one exponential and three divisions. {@link Math#expm1} is
 * not a compiler intrinsic on JDK 17 and costs about three times {@link Math#exp}, so it
 * is called only where it is needed for accuracy (see {@link #expm1Fast}). The free-space
 * reference of the insertion loss has a closed form ({@link #logFreeSpaceTransmission})
 * instead of a second pass through the layer loop.
 */
public final class ChainMatrix {

    private static final double LN2 = Numerics.LN2;
    private static final double DB_PER_NEPER = Numerics.DB_PER_NEPER;
    private static final double RESCALE_ABOVE = Numerics.RESCALE_ABOVE;
    private static final double RESCALE_BELOW = Numerics.RESCALE_BELOW;

    /**
     * Below this |x|, {@link #expm1Fast} calls {@link Math#expm1}; at or above it,
     * e^x − 1 has a relative error under 4e-16 (|e^x − 1| ≥ 0.39 there, and the rounding
     * of e^x is below 1.2e-16 in absolute terms).
     */
    public static final double EXPM1_CUTOFF = 0.5;
    /** sqrt(µ0·ε0) in s/m: k0 = ω·sqrt(µ0·ε0) for free space. */
    private static final double SQRT_MU0_EPS0 = Math.sqrt(PhysicalConstants.MU_0 * PhysicalConstants.EPSILON_0);

    private ChainMatrix() {
    }

    /**
     * The natural log of |T| of a stack between equal impedances.
     *
     * @param t     thicknesses in m
     * @param sigma conductivities in S/m
     * @param eps   relative permittivities
     * @param mu    permeability models
     * @param hz    frequency in Hz
     * @param zr    Re of the terminating impedance, Ω
     * @param zi    Im of the terminating impedance, Ω
     * @param parts null, or an array of at least n + 2 slots that receives: [0] arg T in
     *              radians, [1] the reflection loss R in dB (each layer that is not free
     *              space against the terminating impedance on both of its faces, see
     *              {@code PlanarResult}), [2 + i] the absorption of layer i in dB
     * @return ln |T|
     */
    public static double logTransmission(double[] t, double[] sigma, double[] eps, PermeabilityModel[] mu,
                                  double hz, double zr, double zi, double[] parts) {
        final double w = 2 * Math.PI * hz;
        final double wMu0 = w * PhysicalConstants.MU_0;
        final double wEps0 = w * PhysicalConstants.EPSILON_0;
        // Running product M = [[a, b], [c, d]], complex entries as (re, im).
        double ar = 1, ai = 0, br = 0, bi = 0, cr = 0, ci = 0, dr = 1, di = 0;
        double logScale = 0;
        double phase = 0;
        double reflection = 0;
        final int n = t.length;
        for (int i = 0; i < n; i++) {
            // jωµ = ωµ0µ'' + j ωµ0µ'   (µr = µ' − jµ'')
            final double mLoss = mu[i].loss(hz);
            final double mReal = mu[i].real(hz);
            if (Numerics.breaksContract(mReal, mLoss)) {
                return Double.NaN;      // a user model outside finite µ' > 0, µ'' ≥ 0: the caller names it
            }
            final double p = wMu0 * mLoss;
            final double q = wMu0 * mReal;
            final double s = sigma[i];
            final double we = wEps0 * eps[i];
            // γ² = jωµ·(σ + jωε); its imaginary part is ≥ 0 for a passive medium.
            final double g2r = p * s - q * we;
            final double g2i = p * we + q * s + 0.0;
            // Principal square root, written to avoid cancellation on either sign of Re.
            final double mod = Math.sqrt(g2r * g2r + g2i * g2i);
            double gr, gi;
            if (g2r >= 0) {
                gr = Math.sqrt(0.5 * (mod + g2r));
                gi = gr > 0 ? g2i / (2 * gr) : 0;
            } else {
                gi = Math.sqrt(0.5 * (mod - g2r));
                gr = g2i / (2 * gi);
            }
            // η = jωµ/γ and 1/η = γ/(jωµ), each through one reciprocal of a squared modulus.
            final double invGg = 1 / (gr * gr + gi * gi);
            final double etaR = (p * gr + q * gi) * invGg;
            final double etaI = (q * gr - p * gi) * invGg;
            final double invPq = 1 / (p * p + q * q);
            final double invR = (gr * p + gi * q) * invPq;
            final double invI = (gi * p - gr * q) * invPq;
            final double ta = gr * t[i];
            final double tb = gi * t[i];
            // 1 − E = −expm1(−2a − 2jb); expm1(x + jy) = expm1(x)cos y − 2sin²(y/2) + j e^x sin y.
            final double half = Math.sin(tb);     // sin(y/2) with y = −2b, up to sign
            final double cosHalf = Math.cos(tb);
            final double sinY = -2 * half * cosHalf;
            final double cosY = 1 - 2 * half * half;
            final double em1 = expm1Fast(-2 * ta);
            final double omr = -(em1 * cosY - 2 * half * half);
            final double omi = -((em1 + 1) * sinY);
            final double opr = 2 - omr;
            final double opi = -omi;
            // Scaled layer matrix L = [[op, η·om], [om/η, op]].
            final double lbr = etaR * omr - etaI * omi;
            final double lbi = etaR * omi + etaI * omr;
            final double lcr = invR * omr - invI * omi;
            final double lci = invR * omi + invI * omr;
            // M ← M·L
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
            logScale += LN2 - ta;
            phase -= tb;
            // Keep the running product in range for any number of layers: the scaled layer
            // matrices have entries up to 2/|η| (a good conductor against free space grows the
            // product by |η0/η| per layer, 1e4 for copper at 45 GHz), so 80 such layers would
            // overflow. The rescale is by an exact power of two, so it changes no digit; the same
            // rule, with the same bounds, is in SpectralChain's layer loop.
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
                logScale -= e * LN2;
            }
            if (parts != null) {
                parts[2 + i] = DB_PER_NEPER * ta;
                // R counts each layer that is not free space once, as if it stood alone between
                // the terminating impedances: 2 × 10·log10|(Z + η)²/(4Zη)|. A free-space layer (an
                // air gap) adds nothing, so R does not jump when a gap is inserted or shrinks to
                // zero; the coupling between layers through the gaps is left to B.
                if (!(s == 0 && we == wEps0 && p == 0 && q == wMu0)) {
                    reflection += 2 * interfaceLossDb(zr, zi, etaR, etaI);
                }
            }
        }
        // S = A + B/Z + C·Z + D
        final double invZz = 1 / (zr * zr + zi * zi);
        final double sr = ar + dr + (br * zr + bi * zi) * invZz + (cr * zr - ci * zi);
        final double si = ai + di + (bi * zr - br * zi) * invZz + (cr * zi + ci * zr);
        final double logS = logAbs(sr, si);
        if (parts != null) {
            parts[0] = phase - Math.atan2(si, sr);
            parts[1] = reflection;
        }
        return LN2 - logS + logScale;
    }

    /**
     * ln |T| of free space of thickness {@code metres} between the impedances Z: the
     * reference for insertion loss, in closed form. With x = k0·t the slab's
     * chain matrix is [[cos x, jη0 sin x], [j sin x/η0, cos x]], which gives
     *
     * <pre>
     *   T = 4Zη0·e^{−jx} / (4Zη0 + (Z − η0)²·(1 − e^{−2jx})),   1 − e^{−2jx} = 2 sin x·(sin x + j cos x)
     * </pre>
     *
     * (written so that neither Z ≪ η0 nor small x loses digits). k0 = ω·sqrt(µ0ε0), as
     * the layer product computes it for an air gap (the CODATA µ0 and ε0 give c to about
     * 1e-10, not exactly). For a plane wave
     * (Z = η0 exactly) nothing is reflected, |T| = 1 and the result is exactly 0.
     *
     * @param metres the thickness of free space, m
     * @param hz     the frequency in Hz
     * @param zr     Re of the terminating impedance, Ω
     * @param zi     Im of the terminating impedance, Ω
     * @return ln |T_free|
     */
    public static double logFreeSpaceTransmission(double metres, double hz, double zr, double zi) {
        final double eta0 = PhysicalConstants.ETA_0;
        final double dr = zr - eta0;
        final double di = zi;
        if (dr == 0 && di == 0) {
            return 0;
        }
        final double x = 2 * Math.PI * hz * SQRT_MU0_EPS0 * metres;
        final double sx = Math.sin(x);
        final double cx = Math.cos(x);
        // w = 1 − e^{−2jx}, d² = (Z − η0)², q = 4Zη0
        final double wr = 2 * sx * sx;
        final double wi = 2 * sx * cx;
        final double d2r = dr * dr - di * di;
        final double d2i = 2 * dr * di;
        final double qr = 4 * eta0 * zr;
        final double qi = 4 * eta0 * zi;
        return logAbs(qr, qi) - logAbs(qr + d2r * wr - d2i * wi, qi + d2r * wi + d2i * wr);
    }

    /**
     * e^x − 1 for x ≤ 0, accurate to a few units in the last place: exactly 0 at x = 0 (a
     * lossless layer), {@link Math#expm1} where |x| &lt; {@value #EXPM1_CUTOFF} (where
     * e^x − 1 would cancel), and the cheaper {@code Math.exp(x) - 1} elsewhere.
     *
     * @param x the exponent, 0 or less
     * @return e^x − 1
     */
    public static double expm1Fast(double x) {
        if (x == 0) {
            return 0;
        }
        return x > -EXPM1_CUTOFF ? Math.expm1(x) : Math.exp(x) - 1;
    }

    /**
     * 10·log10 |(Za + Zb)² / (4·Za·Zb)|: the loss of one interface, symmetric in Za and Zb.
     *
     * @param ar Re Za, Ω
     * @param ai Im Za, Ω
     * @param br Re Zb, Ω
     * @param bi Im Zb, Ω
     * @return the loss in dB
     */
    public static double interfaceLossDb(double ar, double ai, double br, double bi) {
        double sumLog = logAbs(ar + br, ai + bi);
        double prodLog = 0.5 * (logAbs(ar, ai) + logAbs(br, bi));
        return DB_PER_NEPER * (sumLog - LN2 - prodLog);
    }

    private static double logAbs(double x, double y) {
        return Numerics.logAbs(x, y);
    }
}
