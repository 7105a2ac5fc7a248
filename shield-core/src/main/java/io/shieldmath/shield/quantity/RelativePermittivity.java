/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Text;

/**
 * A real relative permittivity εr (dielectric constant). Conduction loss is carried by
 * the conductivity, not here.
 *
 * <p>Allowed values: from 1 (passive media at the frequencies this library covers) to
 * {@value #MAX}. Immutable and thread-safe; equality is by value. The text form is
 * the plain number, for example {@code "2.1"}.
 */
public final class RelativePermittivity {

    /**
     * The largest εr accepted, 1e6: above the dielectric constant of any solid in use (a few
     * times 1e4 for barium titanate ceramics; CRC Handbook of Chemistry and Physics,
     * "Permittivity (dielectric constant) of inorganic solids"), and small enough that every
     * model of this library evaluates it without overflow.
     */
    public static final double MAX = 1e6;

    /** The permittivity of free space, εr = 1. */
    public static final RelativePermittivity ONE = new RelativePermittivity(1);

    private final double value;

    private RelativePermittivity(double value) {
        this.value = value;
    }

    /**
     * Obtains a relative permittivity.
     *
     * @param epsilon εr, from 1 to {@value #MAX}
     * @return the permittivity
     * @throws InvalidQuantityException if εr is NaN or out of range
     */
    public static RelativePermittivity of(double epsilon) {
        if (!(epsilon >= 1 && epsilon <= MAX)) {
            throw new InvalidQuantityException("relative permittivity",
                    Text.show(epsilon, "(relative)"), "from 1 to " + Text.number(MAX) + " (relative)");
        }
        return epsilon == 1 ? ONE : new RelativePermittivity(epsilon);
    }

    /**
     * Reads a plain number such as {@code "2.1"} (the number grammar of
     * {@link ScalarQuantity}, spaces around it allowed).
     *
     * @param text the text, not null, at most 256 characters
     * @return the permittivity
     * @throws InvalidQuantityException if the text is not a decimal number or the value is out of range
     */
    public static RelativePermittivity parse(CharSequence text) {
        return of(Text.parseNumber("relative permittivity", text, "a number such as \"2.1\""));
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

    /**
     * The text form, the plain number with the shortest decimal that reads back exactly.
     *
     * @return for example {@code "2.1"}, read back by {@link #parse(CharSequence)}
     */
    @Override
    public String toString() {
        return Text.exact(value);
    }
}
