/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A relative permeability, possibly complex: µr = µ' − j·µ'' with the time convention
 * e^{jωt} used throughout this library, so magnetic loss makes µ'' positive.
 *
 * <p>Allowed values: µ' finite and greater than 0 (diamagnetic metals such as copper
 * have µ' slightly below 1); µ'' finite and 0 or more. Immutable and thread-safe;
 * equality is exact on both parts. The text form is {@code "25000"} for a real value and
 * {@code "1200 - j 800"} for a complex one; {@link #parse(CharSequence)} reads both.
 */
public final class RelativePermeability {

    /** The permeability of free space and of non-magnetic materials, µr = 1. */
    public static final RelativePermeability ONE = new RelativePermeability(1, 0);

    private final double real;
    private final double loss;

    private RelativePermeability(double real, double loss) {
        this.real = real;
        this.loss = loss;
    }

    /**
     * Obtains a real relative permeability.
     *
     * @param mu the relative permeability µ', finite and greater than 0
     * @return the permeability
     * @throws InvalidQuantityException if µ' is NaN, infinite, zero or negative
     */
    public static RelativePermeability of(double mu) {
        return ofComplex(mu, 0);
    }

    /**
     * Obtains a complex relative permeability µ' − j·µ''.
     *
     * @param real the real part µ', finite and greater than 0
     * @param loss the loss part µ'', finite and 0 or more
     * @return the permeability
     * @throws InvalidQuantityException if either part is out of range
     */
    public static RelativePermeability ofComplex(double real, double loss) {
        Require.positive("relative permeability (real part)", real, "(relative)");
        Require.nonNegative("relative permeability (loss part)", loss, "(relative)");
        if (real == 1 && loss == 0) {
            return ONE;
        }
        return new RelativePermeability(real, loss + 0.0);
    }

    /**
     * Reads {@code "25000"}, {@code "1200 - j 800"} or {@code "1200-j800"}.
     *
     * @param text the text, not null
     * @return the permeability
     * @throws InvalidQuantityException if the text does not read or a part is out of range
     */
    public static RelativePermeability parse(CharSequence text) {
        String q = "relative permeability";
        String s = Require.nonNull(q + " text", text).toString().replace('\u2212', '-').replaceAll("\\s+", "");
        String expected = "a number such as \"25000\" or \"1200 - j 800\"";
        try {
            int j = s.indexOf("-j");
            if (j < 0) {
                return of(Double.parseDouble(requireDecimal(s)));
            }
            return ofComplex(Double.parseDouble(requireDecimal(s.substring(0, j))),
                    Double.parseDouble(requireDecimal(s.substring(j + 2))));
        } catch (NumberFormatException e) {
            throw InvalidQuantityException.unreadable(q, text.toString(), "not a decimal number", expected);
        }
    }

    private static String requireDecimal(String s) {
        if (!s.matches("[+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?")) {
            throw new NumberFormatException(s);
        }
        return s;
    }

    /**
     * The real part µ'.
     *
     * @return µ', greater than 0
     */
    public double real() {
        return real;
    }

    /**
     * The loss part µ'' (µr = µ' − j·µ'').
     *
     * @return µ'', 0 or more
     */
    public double loss() {
        return loss;
    }

    /**
     * The magnitude |µr|.
     *
     * @return sqrt(µ'² + µ''²)
     */
    public double magnitude() {
        return Math.hypot(real, loss);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RelativePermeability p
                && Double.compare(p.real, real) == 0 && Double.compare(p.loss, loss) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(real) * 31 + Double.hashCode(loss);
    }

    /**
     * The text form, {@code "25000"} or {@code "1200 - j 800"}.
     *
     * @return the text form, read back by {@link #parse(CharSequence)}
     */
    @Override
    public String toString() {
        String r = Text.number(real);
        return loss == 0 ? r : r + " - j " + Text.number(loss);
    }
}
