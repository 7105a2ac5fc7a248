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
}
