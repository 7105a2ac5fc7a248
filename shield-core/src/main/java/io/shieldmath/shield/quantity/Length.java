/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A length: a thickness, a distance, a radius or an opening size. Mil and inch are exact (25.4 µm, 25.4 mm).
 *
 * <p>Allowed values: finite and greater than 0 m. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class Length extends ScalarQuantity<Length, LengthUnit> {

    private static final Unit[] UNITS = LengthUnit.values();
    private static final Unit[] DISPLAY = {LengthUnit.NANOMETRE, LengthUnit.MICROMETRE, LengthUnit.MILLIMETRE, LengthUnit.METRE};

    private Length(double si) {
        super(si);
    }

    /**
     * Obtains a length from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and greater than 0 m
     * @param unit  the unit, not null
     * @return the length
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length of(double value, LengthUnit unit) {
        Require.nonNull("unit", unit);
        Require.positive("length", value, unit.symbol());
        return new Length(Require.positive("length", value * unit.toSi(), LengthUnit.METRE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "21 mil"}: a decimal number, optional
     * white space and a unit of {@link LengthUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the length
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static Length parse(CharSequence text) {
        double si = Text.parse("length", text, UNITS);
        return new Length(Require.positive("length", si, LengthUnit.METRE.symbol()));
    }

    /**
     * Obtains a value in metres.
     *
     * @param value the value in metres
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofMetres(double value) {
        return of(value, LengthUnit.METRE);
    }

    /**
     * Obtains a value in centimetres.
     *
     * @param value the value in centimetres
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofCentimetres(double value) {
        return of(value, LengthUnit.CENTIMETRE);
    }

    /**
     * Obtains a value in millimetres.
     *
     * @param value the value in millimetres
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofMillimetres(double value) {
        return of(value, LengthUnit.MILLIMETRE);
    }

    /**
     * Obtains a value in micrometres.
     *
     * @param value the value in micrometres
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofMicrometres(double value) {
        return of(value, LengthUnit.MICROMETRE);
    }

    /**
     * Obtains a value in nanometres.
     *
     * @param value the value in nanometres
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofNanometres(double value) {
        return of(value, LengthUnit.NANOMETRE);
    }

    /**
     * Obtains a value in mils (25.4 µm).
     *
     * @param value the value in mils (25.4 µm)
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofMils(double value) {
        return of(value, LengthUnit.MIL);
    }

    /**
     * Obtains a value in inches (25.4 mm).
     *
     * @param value the value in inches (25.4 mm)
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Length ofInches(double value) {
        return of(value, LengthUnit.INCH);
    }

    /**
     * The length in metres.
     *
     * @return the value
     */
    public double toMetres() {
        return toSi();
    }

    /**
     * Returns this length plus another.
     *
     * @param other the length to add, not null
     * @return the sum; this object is unchanged
     * @throws NullPointerException if {@code other} is null
     * @throws InvalidQuantityException if the sum is out of range
     */
    public Length plus(Length other) {
        return ofMetres(toSi() + Require.nonNull("other", other).toSi());
    }

    /**
     * Returns this length multiplied by a factor.
     *
     * @param factor a finite factor greater than zero
     * @return the product; this object is unchanged
     * @throws InvalidQuantityException if the factor is not finite and positive
     */
    public Length multipliedBy(double factor) {
        Require.positive("length factor", factor, "(plain number)");
        return ofMetres(toSi() * factor);
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return LengthUnit.METRE;
    }
}
