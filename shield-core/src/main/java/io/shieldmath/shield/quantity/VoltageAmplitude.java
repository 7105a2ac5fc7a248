/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * The amplitude of a sinusoidal voltage in volts. Whether it is a peak, peak-to-peak or RMS value is stated beside it by the model that takes it. Zero is allowed (an induced voltage may underflow to 0 behind a thick shield).
 *
 * <p>Allowed values: finite and 0 V or more. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it (the grammar of
 * {@link ScalarQuantity}); {@code parse(toString())} gives an equal object.
 */
public final class VoltageAmplitude extends ScalarQuantity<VoltageAmplitude, VoltageUnit> {

    private static final Unit[] UNITS = VoltageUnit.values();
    private static final Unit[] DISPLAY = {VoltageUnit.MICROVOLT, VoltageUnit.MILLIVOLT, VoltageUnit.VOLT};

    private VoltageAmplitude(double si) {
        super(si);
    }

    /**
     * Obtains a voltage amplitude from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and 0 V or more
     * @param unit  the unit, not null
     * @return the voltage amplitude
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static VoltageAmplitude of(double value, VoltageUnit unit) {
        Require.nonNull("unit", unit);
        Require.nonNegative("voltage amplitude", value, unit.symbol());
        return new VoltageAmplitude(Require.nonNegative("voltage amplitude", value * unit.toSi(), VoltageUnit.VOLT.symbol()));
    }

    /**
     * Reads the text form, for example {@code "2.5 mV"}: a decimal number, optional
     * white space and a unit of {@link VoltageUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the voltage amplitude
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static VoltageAmplitude parse(CharSequence text) {
        double si = Text.parse("voltage amplitude", text, UNITS);
        return new VoltageAmplitude(Require.nonNegative("voltage amplitude", si, VoltageUnit.VOLT.symbol()));
    }

    /**
     * Obtains a value in volts.
     *
     * @param value the value in volts
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static VoltageAmplitude ofVolts(double value) {
        return of(value, VoltageUnit.VOLT);
    }

    /**
     * Obtains a value in millivolts.
     *
     * @param value the value in millivolts
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static VoltageAmplitude ofMillivolts(double value) {
        return of(value, VoltageUnit.MILLIVOLT);
    }

    /**
     * Obtains a value in microvolts.
     *
     * @param value the value in microvolts
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static VoltageAmplitude ofMicrovolts(double value) {
        return of(value, VoltageUnit.MICROVOLT);
    }

    /**
     * The amplitude in volts.
     *
     * @return the value, finite and 0 or more
     */
    public double toVolts() {
        return toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return VoltageUnit.VOLT;
    }
}
