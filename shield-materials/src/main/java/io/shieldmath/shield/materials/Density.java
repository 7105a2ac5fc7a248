/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A mass density ρ, held in kg/m³; used to rank designs by mass per area.
 *
 * <p>Allowed values: finite and greater than 0 kg/m³. Immutable and thread-safe; equality
 * is exact on the value in kg/m³. The text form is {@code "8890 kg/m3"}, as
 * {@link #toString()} prints it; {@link #parse(CharSequence)} reads it and also
 * {@code "kg/m³"}, {@code "g/cm3"}, {@code "g/cm³"} and {@code "g/cc"}.
 */
public final class Density implements Comparable<Density> {

    private static final Pattern TEXT =
            Pattern.compile("\\s*([+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\\s*(\\S.*?)\\s*");
    private static final String EXPECTED = "a number and a unit such as \"8890 kg/m3\"; units: kg/m3, g/cm3";

    private final double kgPerCubicMetre;

    private Density(double kgPerCubicMetre) {
        this.kgPerCubicMetre = kgPerCubicMetre;
    }

    /**
     * Obtains a density in kilograms per cubic metre.
     *
     * @param value ρ in kg/m³, finite and greater than 0
     * @return the density
     * @throws InvalidQuantityException if the value is NaN, infinite, zero or negative
     */
    public static Density ofKilogramsPerCubicMetre(double value) {
        return new Density(Require.positive("density", value, "kg/m3"));
    }

    /**
     * Obtains a density in grams per cubic centimetre (1 g/cm³ = 1000 kg/m³).
     *
     * @param value ρ in g/cm³, finite and greater than 0
     * @return the density
     * @throws InvalidQuantityException if the value is NaN, infinite, zero or negative
     */
    public static Density ofGramsPerCubicCentimetre(double value) {
        return new Density(Require.positive("density", Require.positive("density", value, "g/cm3") * 1000, "kg/m3"));
    }

    /**
     * Reads the text form, for example {@code "8890 kg/m3"} or {@code "8.89 g/cm3"}.
     *
     * @param text the text, not null
     * @return the density
     * @throws InvalidQuantityException if the text has no number, no unit or an unknown unit, or
     *                                  the value is out of range
     */
    public static Density parse(CharSequence text) {
        String s = Require.nonNull("density text", text).toString();
        Matcher m = TEXT.matcher(s.replace('\u00a0', ' ').replace('\u2212', '-'));
        if (!m.matches()) {
            String problem = s.isBlank() ? "empty text" : "no number followed by a unit";
            throw InvalidQuantityException.unreadable("density", s, problem, EXPECTED);
        }
        double number = Double.parseDouble(m.group(1));
        String unit = m.group(2).replace(" ", "").replace('\u00b3', '3').replace("^3", "3");
        double factor;
        switch (unit) {
            case "kg/m3":
                factor = 1;
                break;
            case "g/cm3":
            case "g/cc":
                factor = 1000;
                break;
            default:
                throw InvalidQuantityException.unreadable("density", s, "unknown unit \"" + m.group(2) + "\"", EXPECTED);
        }
        return new Density(Require.positive("density", number * factor, "kg/m3"));
    }

    /**
     * The density in kg/m³.
     *
     * @return ρ, finite and greater than 0
     */
    public double toKilogramsPerCubicMetre() {
        return kgPerCubicMetre;
    }

    /**
     * The mass per area of a plate of this density, ρ·t.
     *
     * @param thickness the plate thickness, not null
     * @return the areal mass in kg/m²
     */
    public double arealMass(io.shieldmath.shield.quantity.Length thickness) {
        return kgPerCubicMetre * Require.nonNull("thickness", thickness).toMetres();
    }

    @Override
    public int compareTo(Density other) {
        return Double.compare(kgPerCubicMetre, other.kgPerCubicMetre);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Density d && Double.compare(d.kgPerCubicMetre, kgPerCubicMetre) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(kgPerCubicMetre);
    }

    /**
     * The text form in kg/m³, with the shortest digits that read back to the same value.
     *
     * @return for example {@code "8890 kg/m3"}
     */
    @Override
    public String toString() {
        return plain(kgPerCubicMetre) + " kg/m3";
    }

    /** The shortest decimal text of a double that reads back exactly, without exponent where short. */
    static String plain(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return String.format(Locale.ROOT, "%d", (long) v);
        }
        return Double.toString(v);
    }
}
