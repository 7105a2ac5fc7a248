/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * The amplitude of a magnetic flux density B.
 *
 * <p>Allowed values: finite and 0 T or more. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class MagneticFluxDensity extends ScalarQuantity<MagneticFluxDensity, FluxDensityUnit> {

    private static final Unit[] UNITS = FluxDensityUnit.values();
    private static final Unit[] DISPLAY = {FluxDensityUnit.NANOTESLA, FluxDensityUnit.MICROTESLA, FluxDensityUnit.MILLITESLA, FluxDensityUnit.TESLA};

    private MagneticFluxDensity(double si) {
        super(si);
    }

    /**
     * Obtains a magnetic flux density from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and 0 T or more
     * @param unit  the unit, not null
     * @return the magnetic flux density
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFluxDensity of(double value, FluxDensityUnit unit) {
        Require.nonNull("unit", unit);
        Require.nonNegative("magnetic flux density", value, unit.symbol());
        return new MagneticFluxDensity(Require.nonNegative("magnetic flux density", value * unit.toSi(), FluxDensityUnit.TESLA.symbol()));
    }

    /**
     * Reads the text form, for example {@code "40 µT"}: a decimal number, optional
     * white space and a unit of {@link FluxDensityUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the magnetic flux density
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static MagneticFluxDensity parse(CharSequence text) {
        double si = Text.parse("magnetic flux density", text, UNITS);
        return new MagneticFluxDensity(Require.nonNegative("magnetic flux density", si, FluxDensityUnit.TESLA.symbol()));
    }

    /**
     * Obtains a value in tesla.
     *
     * @param value the value in tesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFluxDensity ofTesla(double value) {
        return of(value, FluxDensityUnit.TESLA);
    }

    /**
     * Obtains a value in millitesla.
     *
     * @param value the value in millitesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFluxDensity ofMillitesla(double value) {
        return of(value, FluxDensityUnit.MILLITESLA);
    }

    /**
     * Obtains a value in microtesla.
     *
     * @param value the value in microtesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFluxDensity ofMicrotesla(double value) {
        return of(value, FluxDensityUnit.MICROTESLA);
    }

    /**
     * Obtains a value in nanotesla.
     *
     * @param value the value in nanotesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFluxDensity ofNanotesla(double value) {
        return of(value, FluxDensityUnit.NANOTESLA);
    }

    /**
     * Obtains a value in gauss (1e-4 T).
     *
     * @param value the value in gauss (1e-4 T)
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFluxDensity ofGauss(double value) {
        return of(value, FluxDensityUnit.GAUSS);
    }

    /**
     * The flux density in tesla.
     *
     * @return the value
     */
    public double toTesla() {
        return toSi();
    }

    /**
     * The flux density in free space of a field strength, B = µ0·H.
     *
     * @param h the field strength, not null
     * @return the flux density
     * @throws NullPointerException if the field strength is null
     * @throws InvalidQuantityException if the flux density is out of range
     */
    public static MagneticFluxDensity from(MagneticFieldStrength h) {
        return Require.nonNull("field strength", h).toFluxDensityInAir();
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return FluxDensityUnit.TESLA;
    }
}
