/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * The sheet resistance Rs of a thin film, plating or coating (Rs = 1/(σ·t)).
 *
 * <p>Allowed values: finite and greater than 0 Ω/sq. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class SheetResistance extends ScalarQuantity<SheetResistance, SheetResistanceUnit> {

    private static final Unit[] UNITS = SheetResistanceUnit.values();
    private static final Unit[] DISPLAY = {SheetResistanceUnit.MILLIOHM_PER_SQUARE, SheetResistanceUnit.OHM_PER_SQUARE};

    private SheetResistance(double si) {
        super(si);
    }

    /**
     * Obtains a sheet resistance from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and greater than 0 Ω/sq
     * @param unit  the unit, not null
     * @return the sheet resistance
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static SheetResistance of(double value, SheetResistanceUnit unit) {
        Require.nonNull("unit", unit);
        Require.positive("sheet resistance", value, unit.symbol());
        return new SheetResistance(Require.positive("sheet resistance", value * unit.toSi(), SheetResistanceUnit.OHM_PER_SQUARE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "0.05 Ω/sq"}: a decimal number, optional
     * white space and a unit of {@link SheetResistanceUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the sheet resistance
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static SheetResistance parse(CharSequence text) {
        double si = Text.parse("sheet resistance", text, UNITS);
        return new SheetResistance(Require.positive("sheet resistance", si, SheetResistanceUnit.OHM_PER_SQUARE.symbol()));
    }

    /**
     * Obtains a value in ohms per square.
     *
     * @param value the value in ohms per square
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static SheetResistance ofOhmsPerSquare(double value) {
        return of(value, SheetResistanceUnit.OHM_PER_SQUARE);
    }

    /**
     * Obtains a value in milliohms per square.
     *
     * @param value the value in milliohms per square
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static SheetResistance ofMilliohmsPerSquare(double value) {
        return of(value, SheetResistanceUnit.MILLIOHM_PER_SQUARE);
    }

    /**
     * The sheet resistance in Ω/sq.
     *
     * @return the value
     */
    public double toOhmsPerSquare() {
        return toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return SheetResistanceUnit.OHM_PER_SQUARE;
    }
}
