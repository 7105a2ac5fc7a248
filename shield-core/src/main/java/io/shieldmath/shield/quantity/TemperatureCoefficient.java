/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A temperature coefficient α, such as that of resistivity at 20 °C (IEC 60028: 0.00393 /K for annealed copper). Negative values are allowed.
 *
 * <p>Allowed values: finite. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it (the grammar of
 * {@link ScalarQuantity}); {@code parse(toString())} gives an equal object.
 */
public final class TemperatureCoefficient extends ScalarQuantity<TemperatureCoefficient, TemperatureCoefficientUnit> {

    private static final Unit[] UNITS = TemperatureCoefficientUnit.values();
    private static final Unit[] DISPLAY = {TemperatureCoefficientUnit.PER_KELVIN};

    private TemperatureCoefficient(double si) {
        super(si);
    }

    /**
     * Obtains a temperature coefficient from a value in a unit.
     *
     * @param value the value in {@code unit}: finite
     * @param unit  the unit, not null
     * @return the temperature coefficient
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static TemperatureCoefficient of(double value, TemperatureCoefficientUnit unit) {
        Require.nonNull("unit", unit);
        Require.finite("temperature coefficient", value, unit.symbol());
        return new TemperatureCoefficient(Require.finite("temperature coefficient", value * unit.toSi(), TemperatureCoefficientUnit.PER_KELVIN.symbol()));
    }

    /**
     * Reads the text form, for example {@code "0.00393 /K"}: a decimal number, optional
     * white space and a unit of {@link TemperatureCoefficientUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the temperature coefficient
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static TemperatureCoefficient parse(CharSequence text) {
        double si = Text.parse("temperature coefficient", text, UNITS);
        return new TemperatureCoefficient(Require.finite("temperature coefficient", si, TemperatureCoefficientUnit.PER_KELVIN.symbol()));
    }

    /**
     * Obtains a value in per kelvin.
     *
     * @param value the value in per kelvin
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static TemperatureCoefficient ofPerKelvin(double value) {
        return of(value, TemperatureCoefficientUnit.PER_KELVIN);
    }

    /**
     * Obtains a value in parts per million per kelvin.
     *
     * @param value the value in parts per million per kelvin
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static TemperatureCoefficient ofPpmPerKelvin(double value) {
        return of(value, TemperatureCoefficientUnit.PPM_PER_KELVIN);
    }

    /** A coefficient of zero. */
    public static final TemperatureCoefficient ZERO = new TemperatureCoefficient(0);

    /**
     * The coefficient in 1/K.
     *
     * @return α, finite
     */
    public double toPerKelvin() {
        return toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return TemperatureCoefficientUnit.PER_KELVIN;
    }
}
