/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A self or mutual inductance. Negative values are allowed: the sign of a mutual inductance follows the winding senses of the two coils.
 *
 * <p>Allowed values: finite. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it (the grammar of
 * {@link ScalarQuantity}); {@code parse(toString())} gives an equal object.
 */
public final class Inductance extends ScalarQuantity<Inductance, InductanceUnit> {

    private static final Unit[] UNITS = InductanceUnit.values();
    private static final Unit[] DISPLAY = {InductanceUnit.NANOHENRY, InductanceUnit.MICROHENRY, InductanceUnit.MILLIHENRY, InductanceUnit.HENRY};

    private Inductance(double si) {
        super(si);
    }

    /**
     * Obtains an inductance from a value in a unit.
     *
     * @param value the value in {@code unit}: finite
     * @param unit  the unit, not null
     * @return the inductance
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Inductance of(double value, InductanceUnit unit) {
        Require.nonNull("unit", unit);
        Require.finite("inductance", value, unit.symbol());
        return new Inductance(Require.finite("inductance", value * unit.toSi(), InductanceUnit.HENRY.symbol()));
    }

    /**
     * Reads the text form, for example {@code "1.5 µH"}: a decimal number, optional
     * white space and a unit of {@link InductanceUnit}.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the inductance
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static Inductance parse(CharSequence text) {
        double si = Text.parse("inductance", text, UNITS);
        return new Inductance(Require.finite("inductance", si, InductanceUnit.HENRY.symbol()));
    }

    /**
     * Obtains a value in henries.
     *
     * @param value the value in henries
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Inductance ofHenries(double value) {
        return of(value, InductanceUnit.HENRY);
    }

    /**
     * Obtains a value in millihenries.
     *
     * @param value the value in millihenries
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Inductance ofMillihenries(double value) {
        return of(value, InductanceUnit.MILLIHENRY);
    }

    /**
     * Obtains a value in microhenries.
     *
     * @param value the value in microhenries
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Inductance ofMicrohenries(double value) {
        return of(value, InductanceUnit.MICROHENRY);
    }

    /**
     * Obtains a value in nanohenries.
     *
     * @param value the value in nanohenries
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Inductance ofNanohenries(double value) {
        return of(value, InductanceUnit.NANOHENRY);
    }

    /**
     * The inductance in henries.
     *
     * @return the value, finite
     */
    public double toHenries() {
        return toSi();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return InductanceUnit.HENRY;
    }
}
