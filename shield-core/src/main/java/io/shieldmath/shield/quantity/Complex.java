/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Text;

/**
 * A complex number, as results give it: a transmission coefficient, a mutual inductance,
 * a mutual impedance, a complex shielding factor. A small value of this library's own, so
 * that no third-party type appears in the API.
 *
 * <p>Conventions: time dependence e^{jωt}, so a phasor's angle leads with j; {@code j} is
 * the imaginary unit. Parts are finite (a result never carries NaN or infinity). Immutable
 * and thread-safe; {@link #equals(Object)} compares both parts exactly (with
 * {@link Double#compare}), {@link #isCloseTo(Complex, double)} within a tolerance.
 *
 * <p>Text form: {@code "3 + j4"}, {@code "3 - j4"}, {@code "-j2"} style as
 * {@link #toString()} prints it (12 significant digits); it is for reading, not parsing.
 */
public final class Complex {

    /** Zero. */
    public static final Complex ZERO = new Complex(0, 0);
    /** One. */
    public static final Complex ONE = new Complex(1, 0);

    private final double re;
    private final double im;

    private Complex(double re, double im) {
        this.re = re + 0.0;
        this.im = im + 0.0;
    }

    /**
     * A complex number from its real and imaginary parts.
     *
     * @param real      the real part, finite
     * @param imaginary the imaginary part, finite
     * @return the number
     * @throws InvalidQuantityException if a part is NaN or infinite
     */
    public static Complex ofCartesian(double real, double imaginary) {
        if (!Double.isFinite(real) || !Double.isFinite(imaginary)) {
            throw new InvalidQuantityException("complex number", real + " + j" + imaginary,
                    "finite real and imaginary parts");
        }
        return new Complex(real, imaginary);
    }

    /**
     * A complex number from its magnitude and angle.
     *
     * @param magnitude the magnitude, finite and 0 or more
     * @param radians   the angle in radians, finite
     * @return the number
     * @throws InvalidQuantityException if the magnitude is negative or a value is not finite
     */
    public static Complex ofPolar(double magnitude, double radians) {
        if (!(magnitude >= 0) || !Double.isFinite(magnitude) || !Double.isFinite(radians)) {
            throw new InvalidQuantityException("complex number", magnitude + " at " + radians + " rad",
                    "a finite magnitude of 0 or more and a finite angle");
        }
        return new Complex(magnitude * Math.cos(radians), magnitude * Math.sin(radians));
    }

    /**
     * The real part.
     *
     * @return Re z
     */
    public double real() {
        return re;
    }

    /**
     * The imaginary part.
     *
     * @return Im z
     */
    public double imaginary() {
        return im;
    }

    /**
     * The magnitude |z|, without overflow of the squares ({@link Math#hypot}).
     *
     * @return |z|
     */
    public double abs() {
        return Math.hypot(re, im);
    }

    /**
     * The angle in radians, in (−π, π] ({@link Math#atan2}; 0 for zero).
     *
     * @return arg z
     */
    public double arg() {
        return Math.atan2(im, re);
    }

    /**
     * Whether both parts are within a tolerance of another number's.
     *
     * @param other     the other number, not null
     * @param tolerance the largest allowed difference of each part, 0 or more
     * @return true if |Re a − Re b| ≤ tolerance and |Im a − Im b| ≤ tolerance
     */
    public boolean isCloseTo(Complex other, double tolerance) {
        return Math.abs(re - other.re) <= tolerance && Math.abs(im - other.im) <= tolerance;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Complex c && Double.compare(c.re, re) == 0 && Double.compare(c.im, im) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(re) * 31 + Double.hashCode(im);
    }

    @Override
    public String toString() {
        String r = Text.number(re);
        if (im == 0) {
            return r;
        }
        String i = Text.number(Math.abs(im));
        String sign = im < 0 ? " - j" : " + j";
        return re == 0 ? (im < 0 ? "-j" : "j") + i : r + sign + i;
    }
}
