/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * The amplitude of a sinusoidal current in amperes. Whether it is a peak, peak-to-peak or RMS value is stated beside it by the model that takes it.
 *
 * <p>Allowed values: finite and 0 A or more. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it (the grammar of
 * {@link ScalarQuantity}); {@code parse(toString())} gives an equal object.
 */
public final class CurrentAmplitude extends ScalarQuantity<CurrentAmplitude, CurrentUnit> {

    private static final Unit[] UNITS = CurrentUnit.values();
    private static final Unit[] DISPLAY = {CurrentUnit.MILLIAMPERE, CurrentUnit.AMPERE};

    private CurrentAmplitude(double si) {
        super(si);
    }

    /**
     * Obtains a current amplitude from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and 0 A or more
     * @param unit  the unit, not null
     * @return the current amplitude
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static CurrentAmplitude of(double value, CurrentUnit unit) {
        Require.nonNull("unit", unit);
        Require.nonNegative("current amplitude", value, unit.symbol());
        return new CurrentAmplitude(Require.nonNegative("current amplitude", value * unit.toSi(), CurrentUnit.AMPERE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "100 mA"}: a decimal number, optional
     * white space and a unit of {@link CurrentUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the current amplitude
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static CurrentAmplitude parse(CharSequence text) {
        double si = Text.parse("current amplitude", text, UNITS);
        return new CurrentAmplitude(Require.nonNegative("current amplitude", si, CurrentUnit.AMPERE.symbol()));
    }

    /**
     * Obtains a value in amperes.
     *
     * @param value the value in amperes
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static CurrentAmplitude ofAmperes(double value) {
        return of(value, CurrentUnit.AMPERE);
    }

    /**
     * Obtains a value in milliamperes.
     *
     * @param value the value in milliamperes
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static CurrentAmplitude ofMilliamperes(double value) {
        return of(value, CurrentUnit.MILLIAMPERE);
    }

    /**
     * The amplitude in amperes.
     *
     * @return the value, finite and 0 or more
     */
    public double toAmperes() {
        return toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return CurrentUnit.AMPERE;
    }
}
