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
 * <h2>The text form</h2>
 * Every {@code parse} of this package reads one grammar: a decimal number, optional spaces,
 * a unit symbol of the kind, for example {@code "21 mil"}, {@code "61 % IACS"},
 * {@code "1.5e3 Hz"}. The number is ASCII digits with an optional sign ({@code +},
 * {@code -} or the minus sign U+2212), decimal point and exponent; no inner spaces, no
 * thousands separators, no {@code NaN} or {@code Infinity}. A number that is not zero but
 * underflows to 0, or that overflows, in its unit or in SI units, is refused. The spaces
 * are the space, the tab, the no-break space U+00A0, the thin space U+2009 and the narrow
 * no-break space U+202F. The only other non-ASCII characters read are µ (U+00B5) and μ
 * (U+03BC) for micro, Ω (U+03A9) and the ohm sign U+2126, °, ², ³, the middle dot and dot
 * operator in compound units, and □ in {@code Ω/□}; any other (Greek capital Mu, the Kelvin
 * sign, dotless i, long s, full-width forms) is refused by name. One quantity's text is at
 * most 256 characters, and reading takes time linear in its length.
 *
 * <p>Case matters in prefixes and one-letter symbols: {@code "5 mS/m"} is never read as
 * MS/m, {@code "1 Mm"} never as mm, {@code "1 mhz"} is refused as ambiguous. Only the
 * letters of a unit word of two or more letters ({@code Hz}, {@code Oe}, {@code sq},
 * {@code mil}, {@code gauss}, {@code IACS}, ...) may be in another case, where that matches
 * one unit of the kind only: {@code "10 khz"} and {@code "10 HZ"} read as 10 kHz and 10 Hz.
 * In compound units the separators {@code ·}, {@code ⋅}, {@code *}, {@code .} and a space
 * are one separator and may be left out ({@code "µΩcm"}), but not added ({@code "k Hz"}).
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
     * The value in the SI unit of this kind (Hz, m, S/m, Ω·m, Ω/sq, A/m, T, kg/m³,
     * kg/m², /K, V, A, H; for a temperature the degree Celsius, an SI derived unit).
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
     * @throws NullPointerException if the unit is null
     */
    public final double in(U unit) {
        return (si - Require.nonNull("unit", unit).offset()) / unit.toSi();
    }

    /**
     * Whether this and {@code other} agree within a relative tolerance of their larger
     * magnitude.
     *
     * @param other     the other quantity, not null
     * @param relative  the relative tolerance, zero or more
     * @return true if {@code |a − b| ≤ relative·max(|a|, |b|)}
     * @throws NullPointerException if {@code other} is null
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
     * {@code "10 kHz"}: the value in the display unit that puts it between 1 and 1000, with
     * the fewest significant digits (at most 15) that read back to exactly the same value.
     * {@code parse} of this text gives an equal object whenever a decimal of at most 15
     * digits in that unit is exact (every value made from such a decimal in a display unit),
     * and always one within 1e-14 relative (a length made in mils, shown in µm, may come
     * back 1 ulp away).
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
