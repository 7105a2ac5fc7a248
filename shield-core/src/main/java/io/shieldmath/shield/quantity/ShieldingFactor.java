/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A shielding factor S: the field at the victim without the shield over the field with
 * it, as a plain number (S = 10^(SE/20)).
 *
 * <p>Allowed values: finite and greater than 0 (below 1 means the shield raises the
 * field). Immutable and thread-safe; equality is by value. The text form is the plain
 * number, for example {@code "316.2"}.
 */
public final class ShieldingFactor implements Comparable<ShieldingFactor> {

    private final double value;

    private ShieldingFactor(double value) {
        this.value = value;
    }

    /**
     * Obtains a shielding factor.
     *
     * @param s the factor, finite and greater than 0
     * @return the factor
     * @throws InvalidQuantityException if the factor is not finite and positive
     */
    public static ShieldingFactor of(double s) {
        return new ShieldingFactor(Require.positive("shielding factor", s, "(plain number)"));
    }

    /**
     * The shielding factor of a level, S = 10^(SE/20).
     *
     * @param se the shielding effectiveness, not null
     * @return the factor
     * @throws InvalidQuantityException if the factor overflows (SE above about 6160 dB)
     */
    public static ShieldingFactor from(Decibels se) {
        return of(Require.nonNull("shielding effectiveness", se).toFieldRatio());
    }

    /**
     * The factor as a plain number.
     *
     * @return S
     */
    public double value() {
        return value;
    }

    /**
     * The factor as a level, 20·log10(S).
     *
     * @return the shielding effectiveness
     */
    public Decibels toDecibels() {
        return Decibels.ofFieldRatio(value);
    }

    @Override
    public int compareTo(ShieldingFactor o) {
        return Double.compare(value, o.value);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ShieldingFactor f && Double.compare(f.value, value) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(value);
    }

    @Override
    public String toString() {
        return Text.number(value);
    }
}
