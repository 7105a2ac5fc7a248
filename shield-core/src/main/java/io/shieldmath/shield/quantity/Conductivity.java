/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * An electrical conductivity σ. Zero is allowed (insulators, air).
 *
 * <p>Allowed values: finite and 0 S/m or more. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class Conductivity extends ScalarQuantity<Conductivity, ConductivityUnit> {

    private static final Unit[] UNITS = ConductivityUnit.values();
    private static final Unit[] DISPLAY = {ConductivityUnit.SIEMENS_PER_METRE, ConductivityUnit.MEGASIEMENS_PER_METRE};

    private Conductivity(double si) {
        super(si);
    }

    /**
     * Obtains a conductivity from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and 0 S/m or more
     * @param unit  the unit, not null
     * @return the conductivity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Conductivity of(double value, ConductivityUnit unit) {
        Require.nonNull("unit", unit);
        Require.nonNegative("conductivity", value, unit.symbol());
        return new Conductivity(Require.nonNegative("conductivity", value * unit.toSi(), ConductivityUnit.SIEMENS_PER_METRE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "61 %IACS"}: a decimal number, optional
     * white space and a unit of {@link ConductivityUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the conductivity
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static Conductivity parse(CharSequence text) {
        double si = Text.parse("conductivity", text, UNITS);
        return new Conductivity(Require.nonNegative("conductivity", si, ConductivityUnit.SIEMENS_PER_METRE.symbol()));
    }

    /**
     * Obtains a value in siemens per metre.
     *
     * @param value the value in siemens per metre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Conductivity ofSiemensPerMetre(double value) {
        return of(value, ConductivityUnit.SIEMENS_PER_METRE);
    }

    /**
     * Obtains a value in megasiemens per metre.
     *
     * @param value the value in megasiemens per metre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Conductivity ofMegasiemensPerMetre(double value) {
        return of(value, ConductivityUnit.MEGASIEMENS_PER_METRE);
    }

    /**
     * Obtains a value in % IACS (100 % IACS = 58.0 MS/m, IEC 60028).
     *
     * @param value the value in % IACS (100 % IACS = 58.0 MS/m, IEC 60028)
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static Conductivity ofPercentIacs(double value) {
        return of(value, ConductivityUnit.PERCENT_IACS);
    }

    /**
     * The conductivity in S/m.
     *
     * @return the value
     */
    public double toSiemensPerMetre() {
        return toSi();
    }

    /**
     * The conductivity in % IACS (relative to 58.0 MS/m).
     *
     * @return the value
     */
    public double toPercentIacs() {
        return toSi() / ConductivityUnit.PERCENT_IACS.toSi();
    }

    /** Zero conductivity: an insulator or free space. */
    public static final Conductivity ZERO = new Conductivity(0);

    /**
     * The conductivity of a material of the given resistivity, σ = 1/ρ.
     *
     * @param resistivity the resistivity, not null
     * @return the conductivity
     * @throws NullPointerException if the resistivity is null
     * @throws InvalidQuantityException if the conductivity 1/ρ is out of range
     */
    public static Conductivity from(Resistivity resistivity) {
        return ofSiemensPerMetre(1 / Require.nonNull("resistivity", resistivity).toSi());
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return ConductivityUnit.SIEMENS_PER_METRE;
    }
}
