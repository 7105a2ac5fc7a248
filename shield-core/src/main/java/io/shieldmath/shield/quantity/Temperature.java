/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A temperature, such as the operating temperature of a shield. Held in degrees Celsius,
 * so values given in °C (as material data and design files are) keep every digit;
 * {@link #toSi()} returns °C, {@link #toKelvin()} the value in kelvin (°C + 273.15).
 *
 * <p>Allowed values: finite and at least absolute zero, −273.15 °C (0 K). Immutable and
 * thread-safe; equality is by value (see {@link ScalarQuantity}). The text form is a
 * number and a unit, {@code "60 °C"}, as {@link #toString()} prints it (always in °C) and
 * {@link #parse(CharSequence)} reads it ({@code "333.15 K"} and {@code "60 degC"} are read
 * too); {@code parse(toString())} gives an equal object.
 */
public final class Temperature extends ScalarQuantity<Temperature, TemperatureUnit> {

    /** Absolute zero in degrees Celsius. */
    private static final double ABSOLUTE_ZERO = -273.15;

    private static final Unit[] UNITS = TemperatureUnit.values();
    private static final Unit[] DISPLAY = {TemperatureUnit.CELSIUS};

    /** 20 °C, the reference temperature of conductivity data (IEC 60028). */
    public static final Temperature ROOM = new Temperature(20);

    private Temperature(double celsius) {
        super(celsius);
    }

    /**
     * Obtains a temperature from a value in a unit.
     *
     * @param value the value in {@code unit}: finite, −273.15 °C (0 K) or more
     * @param unit  the unit, not null
     * @return the temperature
     * @throws InvalidQuantityException if the value is NaN, infinite or below absolute zero
     */
    public static Temperature of(double value, TemperatureUnit unit) {
        Require.nonNull("unit", unit);
        Require.finite("temperature", value, unit.symbol());
        double celsius = value + unit.offset();
        if (!(celsius >= ABSOLUTE_ZERO)) {
            throw new InvalidQuantityException("temperature", Text.show(value, unit.symbol()),
                    "finite and " + Text.show(ABSOLUTE_ZERO, unit) + " (absolute zero) or more");
        }
        return new Temperature(celsius + 0.0);
    }

    /**
     * Reads the text form, for example {@code "60 °C"}: a decimal number, optional white
     * space and a unit of {@link TemperatureUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the temperature
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is below absolute zero
     */
    public static Temperature parse(CharSequence text) {
        double celsius = Text.parse("temperature", text, UNITS);
        if (!(celsius >= ABSOLUTE_ZERO)) {
            throw new InvalidQuantityException("temperature", Text.show(celsius, TemperatureUnit.CELSIUS),
                    "finite and -273.15 °C (absolute zero) or more");
        }
        return new Temperature(celsius + 0.0);
    }

    /**
     * Obtains a value in degrees Celsius.
     *
     * @param value the value in °C, −273.15 or more
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or below absolute zero
     */
    public static Temperature ofCelsius(double value) {
        return of(value, TemperatureUnit.CELSIUS);
    }

    /**
     * Obtains a value in kelvin.
     *
     * @param value the value in K, 0 or more
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or negative
     */
    public static Temperature ofKelvin(double value) {
        return of(value, TemperatureUnit.KELVIN);
    }

    /**
     * The temperature in degrees Celsius.
     *
     * @return the value, −273.15 or more
     */
    public double toCelsius() {
        return toSi();
    }

    /**
     * The temperature in kelvin, °C + 273.15.
     *
     * @return the value, 0 or more
     */
    public double toKelvin() {
        return toSi() + 273.15;
    }

    /**
     * The difference {@code this − other} in kelvin (equal to the difference in °C).
     *
     * @param other the other temperature, not null
     * @return the difference in K, finite
     * @throws NullPointerException if {@code other} is null
     */
    public double kelvinAbove(Temperature other) {
        return toSi() - Require.nonNull("other", other).toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return TemperatureUnit.CELSIUS;
    }
}
