/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.RelativePermeability;

/**
 * A permeability that is the same at every frequency. Immutable and thread-safe;
 * equality is by value.
 */
public final class ConstantPermeability implements PermeabilityModel {

    /** µr = 1 at every frequency: free space and non-magnetic materials. */
    public static final ConstantPermeability ONE = new ConstantPermeability(RelativePermeability.ONE);

    private final RelativePermeability value;
    private final double real;
    private final double loss;

    private ConstantPermeability(RelativePermeability value) {
        this.value = value;
        this.real = value.real();
        this.loss = value.loss();
    }

    /**
     * Obtains the model.
     *
     * @param value the permeability, not null, with µ' from {@value RelativePermeability#MIN} to
     *              {@value RelativePermeability#MAX}
     * @return the model
     * @throws NullPointerException if the value is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if µ' is below
     *         {@value RelativePermeability#MIN}
     */
    public static ConstantPermeability of(RelativePermeability value) {
        Require.inRange("constant relative permeability (real part)", Require.nonNull("permeability", value).real(),
                RelativePermeability.MIN, RelativePermeability.MAX, "(relative)");
        return value.equals(RelativePermeability.ONE) ? ONE : new ConstantPermeability(value);
    }

    /**
     * The permeability.
     *
     * @return µr
     */
    public RelativePermeability value() {
        return value;
    }

    @Override
    public double real(double hertz) {
        return real;
    }

    @Override
    public double loss(double hertz) {
        return loss;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ConstantPermeability c && c.value.equals(value);
    }

    @Override
    public int hashCode() {
        return value.hashCode();
    }

    /**
     * A description such as {@code "µr 25000"} or {@code "µr 1200 - j 800"}, the numbers to
     * six significant digits.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return "µr " + Text.number(real) + (loss == 0 ? "" : " - j " + Text.number(loss));
    }
}
