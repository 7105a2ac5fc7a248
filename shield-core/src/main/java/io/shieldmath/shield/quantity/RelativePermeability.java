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
 * <p>Allowed values: µ' greater than 0 (diamagnetic metals such as copper have µ'
 * slightly below 1) and at most {@value #MAX}; µ'' from 0 to {@value #MAX}. Immutable and thread-safe;
 * equality is exact on both parts. The text form is {@code "25000"} for a real value and
 * {@code "1200 - j 800"} for a complex one; {@link #parse(CharSequence)} reads both.
 */
public final class RelativePermeability {

    /**
     * The largest real or loss part accepted, 1e7: above the highest static permeability of
     * any known soft magnetic material (about 1e6 for annealed amorphous and nanocrystalline
     * alloys; ASM Handbook Vol. 2, "Magnetically soft materials"), and small enough that
     * every model of this library evaluates it without overflow.
     */
    public static final double MAX = 1e7;

    /**
     * The smallest real part a constant or tabulated permeability model accepts, 1e-6: far
     * below µ' of any material the models of this library describe (superconductors, µ' → 0,
     * are not among them; common practice, no source), and large enough that every model
     * evaluates it without underflow (a constant µ' of 1e-300 made the layer's impedance 0/0
     * in the planar and coil engines; issue 15 item 11). A value itself, such as a model's
     * value far above its corner frequency, may be smaller.
     */
    public static final double MIN = 1e-6;

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
     * @param mu the relative permeability µ', greater than 0 and at most {@value #MAX}
     * @return the permeability
     * @throws InvalidQuantityException if µ' is NaN, infinite or out of range
     */
    public static RelativePermeability of(double mu) {
        return ofComplex(mu, 0);
    }

    /**
     * Obtains a complex relative permeability µ' − j·µ''.
     *
     * @param real the real part µ', greater than 0 and at most {@value #MAX}
     * @param loss the loss part µ'', from 0 to {@value #MAX}
     * @return the permeability
     * @throws InvalidQuantityException if either part is out of range
     */
    public static RelativePermeability ofComplex(double real, double loss) {
        Require.positive("relative permeability (real part)", real, "(relative)");
        Require.inRange("relative permeability (real part)", real, 0, MAX, "(relative)");
        Require.inRange("relative permeability (loss part)", Require.nonNegative(
                "relative permeability (loss part)", loss, "(relative)"), 0, MAX, "(relative)");
        if (real == 1 && loss == 0) {
            return ONE;
        }
        return new RelativePermeability(real, loss + 0.0);
    }

    /**
     * Reads {@code "25000"}, {@code "1200 - j 800"} or {@code "1200-j800"}: a decimal number,
     * optionally followed by a minus sign, {@code j} and a second decimal number, with
     * optional spaces between the parts (the grammar of {@link ScalarQuantity}; no spaces
     * inside a number: {@code "1200 800"} is refused).
     *
     * @param text the text, not null, at most 256 characters
     * @return the permeability
     * @throws InvalidQuantityException if the text does not read or a part is out of range
     */
    public static RelativePermeability parse(CharSequence text) {
        double[] parts = Text.parseComplex("relative permeability", text,
                "a number such as \"25000\" or \"1200 - j 800\"");
        return ofComplex(parts[0], parts[1]);
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
     * The text form, {@code "25000"} or {@code "1200 - j 800"}, with the shortest decimals
     * that read back exactly.
     *
     * @return the text form, read back by {@link #parse(CharSequence)}
     */
    @Override
    public String toString() {
        String r = Text.exact(real);
        return loss == 0 ? r : r + " - j " + Text.exact(loss);
    }
}
