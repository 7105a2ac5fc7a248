/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A mass per area of a plate or a stack, ρ·t summed over the layers. Zero is allowed (a stack of gaps).
 *
 * <p>Allowed values: finite and 0 kg/m² or more. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it (the grammar of
 * {@link ScalarQuantity}); {@code parse(toString())} gives an equal object.
 */
public final class ArealMass extends ScalarQuantity<ArealMass, ArealMassUnit> {

    private static final Unit[] UNITS = ArealMassUnit.values();
    private static final Unit[] DISPLAY = {ArealMassUnit.GRAM_PER_SQUARE_METRE, ArealMassUnit.KILOGRAM_PER_SQUARE_METRE};

    private ArealMass(double si) {
        super(si);
    }

    /**
     * Obtains an areal mass from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and 0 kg/m² or more
     * @param unit  the unit, not null
     * @return the areal mass
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static ArealMass of(double value, ArealMassUnit unit) {
        Require.nonNull("unit", unit);
        Require.nonNegative("areal mass", value, unit.symbol());
        return new ArealMass(Require.nonNegative("areal mass", value * unit.toSi(), ArealMassUnit.KILOGRAM_PER_SQUARE_METRE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "4.45 kg/m²"}: a decimal number, optional
     * white space and a unit of {@link ArealMassUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the areal mass
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static ArealMass parse(CharSequence text) {
        double si = Text.parse("areal mass", text, UNITS);
        return new ArealMass(Require.nonNegative("areal mass", si, ArealMassUnit.KILOGRAM_PER_SQUARE_METRE.symbol()));
    }

    /**
     * Obtains a value in kilograms per square metre.
     *
     * @param value the value in kilograms per square metre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static ArealMass ofKilogramsPerSquareMetre(double value) {
        return of(value, ArealMassUnit.KILOGRAM_PER_SQUARE_METRE);
    }

    /**
     * Obtains a value in grams per square metre.
     *
     * @param value the value in grams per square metre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static ArealMass ofGramsPerSquareMetre(double value) {
        return of(value, ArealMassUnit.GRAM_PER_SQUARE_METRE);
    }

    /** Zero mass per area. */
    public static final ArealMass ZERO = new ArealMass(0);

    /**
     * The mass per area in kg/m².
     *
     * @return the value, finite and 0 or more
     */
    public double toKilogramsPerSquareMetre() {
        return toSi();
    }

    /**
     * The sum of two areal masses, as of two layers of a stack.
     *
     * @param other the areal mass to add, not null
     * @return the sum; this object is unchanged
     * @throws InvalidQuantityException if the sum overflows
     */
    public ArealMass plus(ArealMass other) {
        return ofKilogramsPerSquareMetre(toSi() + Require.nonNull("other", other).toSi());
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return ArealMassUnit.KILOGRAM_PER_SQUARE_METRE;
    }
}
