/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import java.util.Locale;

/**
 * A complex phasor value in Cartesian form, re + j·im, time convention e^{jωt}: the unit
 * is stated by the method that returns it. A small value of this module's own so that no
 * third-party complex type appears in its signatures. Immutable and thread-safe.
 *
 * @param re the real part
 * @param im the imaginary part
 */
public record ComplexValue(double re, double im) {

    /**
     * The modulus, computed without overflow or underflow of the squares.
     *
     * @return |re + j·im|
     */
    public double abs() {
        return Math.hypot(re, im);
    }

    /**
     * The argument.
     *
     * @return atan2(im, re) in radians, −π to π
     */
    public double arg() {
        return Math.atan2(im, re);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.9g %s j%.9g", re, im < 0 ? "-" : "+", Math.abs(im));
    }
}
