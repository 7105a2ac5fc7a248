/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * Common behaviour of the real-valued quantities: a value held in SI units, comparison,
 * equality by value and the one text form.
 *
 * <p>Subclasses are final, immutable and thread-safe; they can only be made by the
 * static factories of this package. Equality is exact on the SI value ({@code 1 mm}
 * equals {@code 1000 µm} when both give the same double); use
 * {@link #isCloseTo(ScalarQuantity, double)} for a tolerance.
 *
 * @param <Q> the quantity type itself
 * @param <U> its unit type
 */
public abstract class ScalarQuantity<Q extends ScalarQuantity<Q, U>, U extends Enum<U> & Unit>
        implements Comparable<Q> {

    private final double si;

    ScalarQuantity(double si) {
        this.si = si;
    }

    /**
     * The value in the SI unit of this kind (Hz, m, S/m, Ω·m, Ω/sq, A/m, T).
     *
     * @return the SI value, finite
     */
    public final double toSi() {
        return si;
    }

    /**
     * The value expressed in the given unit.
     *
     * @param unit the unit, not null
     * @return the value in {@code unit}
     */
    public final double in(U unit) {
        return si / Require.nonNull("unit", unit).toSi();
    }

    /**
     * Whether this and {@code other} agree within a relative tolerance of their larger
     * magnitude.
     *
     * @param other     the other quantity, not null
     * @param relative  the relative tolerance, zero or more
     * @return true if {@code |a − b| ≤ relative·max(|a|, |b|)}
     */
    public final boolean isCloseTo(Q other, double relative) {
        double b = Require.nonNull("other", other).toSi();
        return Math.abs(si - b) <= relative * Math.max(Math.abs(si), Math.abs(b));
    }

    @Override
    public final int compareTo(Q other) {
        return Double.compare(si, other.toSi());
    }

    @Override
    public final boolean equals(Object o) {
        return o != null && o.getClass() == getClass()
                && Double.compare(((ScalarQuantity<?, ?>) o).si, si) == 0;
    }

    @Override
    public final int hashCode() {
        return getClass().hashCode() * 31 + Double.hashCode(si);
    }

    /**
     * The value and unit in engineering form, for example {@code "533.4 µm"} or
     * {@code "10 kHz"}, with the fewest digits (at most 12 significant) that read back to
     * the same value. {@code parse} of this text gives an equal object, or, where no
     * 12-digit decimal in the display unit is exact (a length made in mils shown in µm),
     * one within 1e-12 relative.
     *
     * @return the text form
     */
    @Override
    public final String toString() {
        return Text.format(si, displayUnits(), siUnit());
    }

    /** The units {@code toString} may choose from, smallest first. */
    abstract Unit[] displayUnits();

    /** The SI unit of this kind. */
    abstract Unit siUnit();
}
