/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A mass density ρ, used with a thickness to rank plates by mass per area.
 *
 * <p>Allowed values: finite and greater than 0 kg/m³. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it (the grammar of
 * {@link ScalarQuantity}); {@code parse(toString())} gives an equal object.
 */
public final class Density extends ScalarQuantity<Density, DensityUnit> {

    private static final Unit[] UNITS = DensityUnit.values();
    private static final Unit[] DISPLAY = {DensityUnit.KILOGRAM_PER_CUBIC_METRE};

    private Density(double si) {
        super(si);
    }

    /**
     * Obtains a density from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and greater than 0 kg/m³
     * @param unit  the unit, not null
     * @return the density
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Density of(double value, DensityUnit unit) {
        Require.nonNull("unit", unit);
        Require.positive("density", value, unit.symbol());
        return new Density(Require.positive("density", value * unit.toSi(), DensityUnit.KILOGRAM_PER_CUBIC_METRE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "8890 kg/m³"}: a decimal number, optional
     * white space and a unit of {@link DensityUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the density
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static Density parse(CharSequence text) {
        double si = Text.parse("density", text, UNITS);
        return new Density(Require.positive("density", si, DensityUnit.KILOGRAM_PER_CUBIC_METRE.symbol()));
    }

    /**
     * Obtains a value in kilograms per cubic metre.
     *
     * @param value the value in kilograms per cubic metre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Density ofKilogramsPerCubicMetre(double value) {
        return of(value, DensityUnit.KILOGRAM_PER_CUBIC_METRE);
    }

    /**
     * Obtains a value in grams per cubic centimetre.
     *
     * @param value the value in grams per cubic centimetre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Density ofGramsPerCubicCentimetre(double value) {
        return of(value, DensityUnit.GRAM_PER_CUBIC_CENTIMETRE);
    }

    /**
     * The density in kg/m³.
     *
     * @return ρ, finite and greater than 0
     */
    public double toKilogramsPerCubicMetre() {
        return toSi();
    }

    /**
     * The mass per area of a plate of this density, ρ·t.
     *
     * @param thickness the plate thickness, not null
     * @return the areal mass
     * @throws InvalidQuantityException if the product overflows
     */
    public ArealMass arealMass(Length thickness) {
        return ArealMass.ofKilogramsPerSquareMetre(toSi() * Require.nonNull("thickness", thickness).toMetres());
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return DensityUnit.KILOGRAM_PER_CUBIC_METRE;
    }
}
