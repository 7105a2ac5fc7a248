/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

/**
 * Constants and small functions that every model shares: one definition each, so the
 * models cannot drift apart. Stateless and thread-safe.
 */
public final class Numerics {

    /** ln 2. */
    public static final double LN2 = 0.6931471805599453;
    /** Decibels per neper of field amplitude, 20/ln 10 = 8.686. */
    public static final double DB_PER_NEPER = 8.685889638065035;
    /**
     * The fraction of the saturation flux density at which a wall is flagged as near
     * saturation (common practice, no source: a margin of two against the alloy's
     * saturation, since permeability already falls well before it).
     */
    public static final double SATURATION_WARNING_FRACTION = 0.5;

    /**
     * The running chain-matrix products ({@link ChainMatrix}, {@link SpectralChain}) are
     * rescaled when the sum of the magnitudes of their eight real entries leaves
     * [{@code RESCALE_BELOW}, {@code RESCALE_ABOVE}] = [2^−300, 2^300], by an exact power of two
     * whose exponent is carried in the product's log-scale. One layer's scaled matrix has
     * entries of size 2, 2|η| and 2/|η|, and |η| stays between about 1e-35 and 1e7 for every
     * medium and frequency the layer types accept, far inside the 2^±700 that one step may
     * add before the product would overflow; so it never overflows, whatever the number of
     * layers, and is checked after every layer.
     */
    public static final double RESCALE_ABOVE = 0x1p300;
    /** The lower end of the range kept by the running products; see {@link #RESCALE_ABOVE}. */
    public static final double RESCALE_BELOW = 0x1p-300;

    private Numerics() {
    }

    /**
     * ln |x + jy| without overflow or underflow of the squares.
     *
     * @param x the real part
     * @param y the imaginary part
     * @return ln |x + jy|; negative infinity for 0
     */
    public static double logAbs(double x, double y) {
        double s = x * x + y * y;
        if (s > Double.MIN_NORMAL && s < Double.POSITIVE_INFINITY) {
            return 0.5 * Math.log(s);
        }
        double m = Math.max(Math.abs(x), Math.abs(y));
        if (m == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        double u = x / m;
        double v = y / m;
        return Math.log(m) + 0.5 * Math.log(u * u + v * v);
    }

    /**
     * Whether a permeability value breaks the models' contract, finite µ' &gt; 0 and µ'' ≥ 0
     * (NaN included). The engines check each layer's value with it and give NaN for the
     * result, so that a broken user model is reported by the caller ({@link #notFinite})
     * instead of giving a finite but meaningless number. Two comparisons, no allocation.
     *
     * @param real µ'
     * @param loss µ''
     * @return true if the value is outside the contract
     */
    public static boolean breaksContract(double real, double loss) {
        return !(real > 0 && real < Double.POSITIVE_INFINITY && loss >= 0 && loss < Double.POSITIVE_INFINITY);
    }

    /**
     * The exception for a result that came out NaN or infinite: what was computed, of what
     * (its description clipped to a few dozen characters, never the whole stack), at which
     * frequency, and the cause found by {@link #permeabilityFault} or the caller; with no
     * cause found, it says the inputs were valid and the engine overflowed. Cold path: call
     * it only after the failure.
     *
     * @param what    what was computed, such as "shielding effectiveness"
     * @param subject what it was computed of (its {@code toString} is clipped)
     * @param hz      the frequency in Hz
     * @param cause   the cause in words, or null if none was found
     * @return the exception, to be thrown by the caller
     */
    public static ArithmeticException notFinite(String what, Object subject, double hz, String cause) {
        return new ArithmeticException(what + " of " + Text.clip(String.valueOf(subject)) + " at " + Text.number(hz)
                + " Hz is not finite: " + (cause != null ? cause
                : "every layer's permeability is valid there and every input is in range, so the computation "
                        + "overflowed; please report this case"));
    }

    /**
     * The first layer whose permeability model breaks its contract (finite µ' &gt; 0 and
     * µ'' ≥ 0) at a frequency, in words with the values it returned, or null if none does.
     * Cold path, for the message of {@link #notFinite}.
     *
     * @param mu    the layers' models; a null entry (a gap) is skipped
     * @param label what layer i is called, such as "layer 3"
     * @param hz    the frequency in Hz
     * @return the fault in words, or null
     */
    public static String permeabilityFault(io.shieldmath.shield.medium.PermeabilityModel[] mu,
                                           java.util.function.IntFunction<String> label, double hz) {
        for (int i = 0; i < mu.length; i++) {
            if (mu[i] == null) {
                continue;
            }
            double re = mu[i].real(hz);
            double im = mu[i].loss(hz);
            if (breaksContract(re, im)) {
                return "the permeability model of " + label.apply(i) + " (" + Text.clip(String.valueOf(mu[i]))
                        + ") returns µ' = " + Text.number(re) + ", µ'' = " + Text.number(im)
                        + " there, and a permeability model must return finite µ' > 0 and µ'' >= 0";
            }
        }
        return null;
    }
}
