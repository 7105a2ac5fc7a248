/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield;

import java.math.BigDecimal;
import java.math.MathContext;
import org.apache.commons.math3.complex.Complex;

/**
 * An independent reference for the chain-matrix product of a deep stack: each layer's
 * textbook matrix [[cosh γt, η sinh γt], [sinh γt / η, cosh γt]] (Schelkunoff's
 * transmission-line form) is computed with Commons Math {@link Complex}, unscaled, and the
 * product of all layers is taken in {@link BigDecimal} with 34 significant digits, whose
 * exponent range does not overflow. So it shares neither the log-scaling nor the rescaling
 * of the library's engines; the only limit is that each single layer's cosh must be finite
 * in double (Re γt below about 700).
 */
public final class WideRangeChainProduct {

    private static final MathContext MC = MathContext.DECIMAL128;
    private static final double LN10 = Math.log(10);

    /** A complex number with BigDecimal parts. */
    private record Big(BigDecimal re, BigDecimal im) {

        static Big of(Complex z) {
            if (!Double.isFinite(z.getReal()) || !Double.isFinite(z.getImaginary())) {
                throw new IllegalArgumentException("layer matrix entry not finite in double: " + z);
            }
            return new Big(new BigDecimal(z.getReal()), new BigDecimal(z.getImaginary()));
        }

        Big plus(Big o) {
            return new Big(re.add(o.re, MC), im.add(o.im, MC));
        }

        Big times(Big o) {
            return new Big(re.multiply(o.re, MC).subtract(im.multiply(o.im, MC), MC),
                    re.multiply(o.im, MC).add(im.multiply(o.re, MC), MC));
        }

        /** ln |this|. */
        double logAbs() {
            BigDecimal s = re.multiply(re, MC).add(im.multiply(im, MC), MC).round(new MathContext(17));
            return 0.5 * (Math.log(s.unscaledValue().doubleValue()) - s.scale() * LN10);
        }

        /** arg this, in (−π, π]. */
        double arg() {
            // Scale both parts by the same power of ten so that atan2 sees finite doubles.
            int shift = Math.max(re.precision() - re.scale(), im.precision() - im.scale());
            return Math.atan2(im.movePointLeft(shift).doubleValue(), re.movePointLeft(shift).doubleValue());
        }
    }

    private WideRangeChainProduct() {
    }

    /**
     * ln T and arg T of a stack between equal terminating impedances Z on both sides,
     * T = 2 / (A + B/Z + C·Z + D).
     *
     * @param gammaT γ_i·t_i of each layer (dimensionless)
     * @param eta    the impedance η_i of each layer, in the same unit as {@code z}
     * @param z      the terminating impedance
     * @return {ln |T|, arg T}
     */
    public static double[] logTransmission(Complex[] gammaT, Complex[] eta, Complex z) {
        Big a = Big.of(Complex.ONE);
        Big b = Big.of(Complex.ZERO);
        Big c = Big.of(Complex.ZERO);
        Big d = Big.of(Complex.ONE);
        for (int i = 0; i < gammaT.length; i++) {
            Big ch = Big.of(gammaT[i].cosh());
            Big lb = Big.of(eta[i].multiply(gammaT[i].sinh()));
            Big lc = Big.of(gammaT[i].sinh().divide(eta[i]));
            Big na = a.times(ch).plus(b.times(lc));
            Big nb = a.times(lb).plus(b.times(ch));
            Big nc = c.times(ch).plus(d.times(lc));
            Big nd = c.times(lb).plus(d.times(ch));
            a = na;
            b = nb;
            c = nc;
            d = nd;
        }
        Big s = a.plus(b.times(Big.of(z.reciprocal()))).plus(c.times(Big.of(z))).plus(d);
        return new double[] {Math.log(2) - s.logAbs(), -s.arg()};
    }
}
