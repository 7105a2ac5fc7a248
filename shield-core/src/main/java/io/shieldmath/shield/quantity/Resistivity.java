/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * An electrical resistivity ρ.
 *
 * <p>Allowed values: finite and greater than 0 Ω·m. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class Resistivity extends ScalarQuantity<Resistivity, ResistivityUnit> {

    private static final Unit[] UNITS = ResistivityUnit.values();
    private static final Unit[] DISPLAY = {ResistivityUnit.NANOHM_METRE, ResistivityUnit.MICROHM_METRE, ResistivityUnit.OHM_METRE};

    private Resistivity(double si) {
        super(si);
    }

    /**
     * Obtains a resistivity from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and greater than 0 Ω·m
     * @param unit  the unit, not null
     * @return the resistivity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Resistivity of(double value, ResistivityUnit unit) {
        Require.nonNull("unit", unit);
        Require.positive("resistivity", value, unit.symbol());
        return new Resistivity(Require.positive("resistivity", value * unit.toSi(), ResistivityUnit.OHM_METRE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "1.724 µΩ·cm"}: a decimal number, optional
     * white space and a unit of {@link ResistivityUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the resistivity
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static Resistivity parse(CharSequence text) {
        double si = Text.parse("resistivity", text, UNITS);
        return new Resistivity(Require.positive("resistivity", si, ResistivityUnit.OHM_METRE.symbol()));
    }

    /**
     * Obtains a value in ohm metres.
     *
     * @param value the value in ohm metres
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Resistivity ofOhmMetres(double value) {
        return of(value, ResistivityUnit.OHM_METRE);
    }

    /**
     * Obtains a value in µΩ·cm.
     *
     * @param value the value in µΩ·cm
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Resistivity ofMicrohmCentimetres(double value) {
        return of(value, ResistivityUnit.MICROHM_CENTIMETRE);
    }

    /**
     * Obtains a value in µΩ·m.
     *
     * @param value the value in µΩ·m
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Resistivity ofMicrohmMetres(double value) {
        return of(value, ResistivityUnit.MICROHM_METRE);
    }

    /**
     * The resistivity in Ω·m.
     *
     * @return the value
     */
    public double toOhmMetres() {
        return toSi();
    }

    /**
     * The resistivity of a conductor, ρ = 1/σ.
     *
     * @param conductivity a conductivity greater than zero, not null
     * @return the resistivity
     * @throws InvalidQuantityException if the conductivity is zero
     */
    public static Resistivity from(Conductivity conductivity) {
        double sigma = Require.nonNull("conductivity", conductivity).toSi();
        Require.positive("conductivity", sigma, "S/m");
        return ofOhmMetres(1 / sigma);
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return ResistivityUnit.OHM_METRE;
    }
}
