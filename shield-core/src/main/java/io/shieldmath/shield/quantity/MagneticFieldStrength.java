/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * The amplitude of a magnetic field strength H.
 *
 * <p>Allowed values: finite and 0 A/m or more. Immutable and thread-safe; equality is by value (see
 * {@link ScalarQuantity}). The text form is a number and a unit, as {@link #toString()}
 * prints it and {@link #parse(CharSequence)} reads it.
 */
public final class MagneticFieldStrength extends ScalarQuantity<MagneticFieldStrength, MagneticFieldUnit> {

    private static final Unit[] UNITS = MagneticFieldUnit.values();
    private static final Unit[] DISPLAY = {MagneticFieldUnit.AMPERE_PER_METRE, MagneticFieldUnit.KILOAMPERE_PER_METRE};

    private MagneticFieldStrength(double si) {
        super(si);
    }

    /**
     * Obtains a magnetic field strength from a value in a unit.
     *
     * @param value the value in {@code unit}: finite and 0 A/m or more
     * @param unit  the unit, not null
     * @return the magnetic field strength
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFieldStrength of(double value, MagneticFieldUnit unit) {
        Require.nonNull("unit", unit);
        Require.nonNegative("magnetic field strength", value, unit.symbol());
        return new MagneticFieldStrength(Require.nonNegative("magnetic field strength", value * unit.toSi(), MagneticFieldUnit.AMPERE_PER_METRE.symbol()));
    }

    /**
     * Reads the text form, for example {@code "40 A/m"}: a decimal number, optional
     * white space and a unit of {@link MagneticFieldUnit} (both micro signs, non-breaking spaces and
     * the usual ASCII spellings are accepted).
     *
     * @param text the text, not null
     * @return the magnetic field strength
     * @throws InvalidQuantityException if the text is empty, has no number or no known unit,
     *                                  or the value is out of range
     */
    public static MagneticFieldStrength parse(CharSequence text) {
        double si = Text.parse("magnetic field strength", text, UNITS);
        return new MagneticFieldStrength(Require.nonNegative("magnetic field strength", si, MagneticFieldUnit.AMPERE_PER_METRE.symbol()));
    }

    /**
     * Obtains a value in amperes per metre.
     *
     * @param value the value in amperes per metre
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFieldStrength ofAmperesPerMetre(double value) {
        return of(value, MagneticFieldUnit.AMPERE_PER_METRE);
    }

    /**
     * Obtains a value in oersteds (1000/(4π) A/m).
     *
     * @param value the value in oersteds (1000/(4π) A/m)
     * @return the quantity
     * @throws InvalidQuantityException if the value is NaN, infinite or out of range
     */
    public static MagneticFieldStrength ofOersteds(double value) {
        return of(value, MagneticFieldUnit.OERSTED);
    }

    /**
     * The field strength in A/m.
     *
     * @return the value
     */
    public double toAmperesPerMetre() {
        return toSi();
    }

    /**
     * The field strength that gives this flux density in free space, H = B/µ0.
     *
     * @param b the flux density in air, not null
     * @return the field strength
     * @throws NullPointerException if the flux density is null
     * @throws InvalidQuantityException if the field strength is out of range
     */
    public static MagneticFieldStrength from(MagneticFluxDensity b) {
        return ofAmperesPerMetre(Require.nonNull("flux density", b).toSi() / PhysicalConstants.MU_0);
    }

    /**
     * The flux density of this field in free space, B = µ0·H.
     *
     * @return the flux density
     */
    public MagneticFluxDensity toFluxDensityInAir() {
        return MagneticFluxDensity.ofTesla(toSi() * PhysicalConstants.MU_0);
    }

    @Override
    Unit[] displayUnits() {
        return DISPLAY;
    }

    @Override
    Unit siUnit() {
        return MagneticFieldUnit.AMPERE_PER_METRE;
    }
}
