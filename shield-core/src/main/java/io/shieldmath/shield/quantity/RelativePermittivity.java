/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A real relative permittivity εr (dielectric constant). Conduction loss is carried by
 * the conductivity, not here.
 *
 * <p>Allowed values: finite and 1 or more (passive media at the frequencies this
 * library covers). Immutable and thread-safe; equality is by value. The text form is
 * the plain number, for example {@code "2.1"}.
 */
public final class RelativePermittivity {

    /** The permittivity of free space, εr = 1. */
    public static final RelativePermittivity ONE = new RelativePermittivity(1);

    private final double value;

    private RelativePermittivity(double value) {
        this.value = value;
    }

    /**
     * Obtains a relative permittivity.
     *
     * @param epsilon εr, finite and 1 or more
     * @return the permittivity
     * @throws InvalidQuantityException if εr is NaN, infinite or below 1
     */
    public static RelativePermittivity of(double epsilon) {
        if (!(epsilon >= 1) || epsilon == Double.POSITIVE_INFINITY) {
            throw new InvalidQuantityException("relative permittivity",
                    Text.number(epsilon) + " (relative)", "finite and 1 or more");
        }
        return epsilon == 1 ? ONE : new RelativePermittivity(epsilon);
    }

    /**
     * Reads a plain number such as {@code "2.1"}.
     *
     * @param text the text, not null
     * @return the permittivity
     * @throws InvalidQuantityException if the text is not a decimal number or the value is out of range
     */
    public static RelativePermittivity parse(CharSequence text) {
        String s = Require.nonNull("relative permittivity text", text).toString().strip();
        if (!s.matches("[+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?")) {
            throw InvalidQuantityException.unreadable("relative permittivity", text.toString(),
                    "not a decimal number", "a number such as \"2.1\"");
        }
        return of(Double.parseDouble(s));
    }

    /**
     * The value εr.
     *
     * @return εr, 1 or more
     */
    public double value() {
        return value;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RelativePermittivity p && Double.compare(p.value, value) == 0;
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
