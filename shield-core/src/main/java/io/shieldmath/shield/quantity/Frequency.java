/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A frequency of an alternating field. Static fields are not frequencies here: models that take a static field say so in their own methods.
 *
 * <p>Allowed values: finite and greater than 0 Hz. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class Frequency extends ScalarQuantity<Frequency, FrequencyUnit> {

    private static final Unit[] UNITS = FrequencyUnit.values();
    private static final Unit[] DISPLAY = {FrequencyUnit.MILLIHERTZ, FrequencyUnit.HERTZ, FrequencyUnit.KILOHERTZ, FrequencyUnit.MEGAHERTZ, FrequencyUnit.GIGAHERTZ};

    private Frequency(double si) {
        super(si);
    }

    /**
     * Obtains a frequency from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and greater than 0 Hz
     * @param unit  the unit, not null
     * @return the frequency
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Frequency of(double value, FrequencyUnit unit) {
        Require.nonNull("unit", unit);
        Require.positive("frequency", value, unit.symbol());
        return new Frequency(Require.positive("frequency", value * unit.toSi(), FrequencyUnit.HERTZ.symbol()));
    }

    /**
     * Reads the text form, for example {@code "10 kHz"}: a decimal number, optional
     * white space and a unit of {@link FrequencyUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the frequency
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static Frequency parse(CharSequence text) {
        double si = Text.parse("frequency", text, UNITS);
        return new Frequency(Require.positive("frequency", si, FrequencyUnit.HERTZ.symbol()));
    }

    /**
     * Reads the text form, or a bare number as a value in {@code bare}: {@code "50"} with
     * {@code bare} Hz is 50 Hz, {@code "2 kHz"} is 2 kHz. For tables of frequencies where a
     * column's unit is stated once.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @param bare the unit of a number written without one, not null
     * @return the frequency
     * @throws InvalidQuantityException if the text does not read or the value is out of range
     */
    public static Frequency parse(CharSequence text, FrequencyUnit bare) {
        double si = Text.parse("frequency", text, UNITS, Require.nonNull("unit", bare));
        return new Frequency(Require.positive("frequency", si, FrequencyUnit.HERTZ.symbol()));
    }

    /**
     * Obtains a value in hertz.
     *
     * @param value the value in hertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Frequency ofHertz(double value) {
        return of(value, FrequencyUnit.HERTZ);
    }

    /**
     * Obtains a value in kilohertz.
     *
     * @param value the value in kilohertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Frequency ofKilohertz(double value) {
        return of(value, FrequencyUnit.KILOHERTZ);
    }

    /**
     * Obtains a value in megahertz.
     *
     * @param value the value in megahertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Frequency ofMegahertz(double value) {
        return of(value, FrequencyUnit.MEGAHERTZ);
    }

    /**
     * Obtains a value in gigahertz.
     *
     * @param value the value in gigahertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Frequency ofGigahertz(double value) {
        return of(value, FrequencyUnit.GIGAHERTZ);
    }

    /**
     * The frequency in hertz.
     *
     * @return the value
     */
    public double toHertz() {
        return toSi();
    }

    /**
     * The angular frequency ω = 2πf in rad/s.
     *
     * @return the value
     */
    public double angular() {
        return 2 * Math.PI * toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return FrequencyUnit.HERTZ;
    }
}
