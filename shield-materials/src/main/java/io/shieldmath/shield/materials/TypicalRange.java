/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * The range a published, supplier-neutral reference gives for a property beside its
 * typical value, for example the low-field permeability of annealed 80 % nickel-iron.
 * The bounds are in the SI unit of the property ({@link #unit(MaterialProperty)}); for
 * {@link MaterialProperty#PERMEABILITY} they bound the static (low-frequency) relative
 * permeability. The typical value of the material lies within the range (checked when the
 * material is built). Use it for a tolerance study with {@link RangeTolerance}.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class TypicalRange {

    private final MaterialProperty property;
    private final double low;
    private final double high;
    private final String source;

    private TypicalRange(MaterialProperty property, double low, double high, String source) {
        this.property = property;
        this.low = low;
        this.high = high;
        this.source = source;
    }

    /**
     * A range of a property.
     *
     * @param property the property, not null, any but {@link MaterialProperty#SHEET_RESISTANCE}
     * @param low      the lower bound in the property's SI unit, within the values a
     *                 material accepts for the property (σ 0 to 1e9 S/m, α −0.01 to 0.01 /K,
     *                 µr 0 to 1e7, εr 1 to 1e6, density 0.01 to 30 000 kg/m³, Bs 0.01 to 3 T)
     * @param high     the upper bound, in the same unit and limits, above {@code low}
     * @param source   where the range comes from, not blank, at most 1000 characters, in the
     *                 forms {@link Provenance} reads (a text that starts with "checked
     *                 against" must name the source and where it was read)
     * @return the range
     * @throws IllegalArgumentException if the property takes no range, the bounds are out
     *                                  of those limits or not increasing, or the source is
     *                                  not acceptable
     */
    public static TypicalRange of(MaterialProperty property, double low, double high, String source) {
        String unit = unit(Require.nonNull("property", property));
        double[] allowed = allowed(property);
        Require.inRange(property.key() + " range low end", low, allowed[0], allowed[1], unit);
        Require.inRange(property.key() + " range high end", high, allowed[0], allowed[1], unit);
        if (!(low < high)) {
            throw new IllegalArgumentException(property.key() + " range " + Text.number(low) + " to "
                    + Text.number(high) + " " + unit + " is not acceptable; allowed: a low end below the high end");
        }
        String what = property.key() + " range source";
        String text = Provenance.requireWellFormed(what, Require.text(what, source, 1000));
        return new TypicalRange(property, low, high, text);
    }

    /** The values a material accepts for the property (see {@link Material}), in its SI unit. */
    private static double[] allowed(MaterialProperty property) {
        switch (property) {
            case CONDUCTIVITY:
                return new double[] {0, 1e9};
            case TEMPERATURE_COEFFICIENT:
                return new double[] {-0.01, 0.01};
            case PERMEABILITY:
                return new double[] {0, 1e7};
            case PERMITTIVITY:
                return new double[] {1, 1e6};
            case DENSITY:
                return new double[] {0.01, 30_000};
            default:
                return new double[] {0.01, 3};
        }
    }

    /**
     * The SI unit in which ranges of a property are given.
     *
     * @param property the property, not null
     * @return "S/m", "1/K", "(relative)", "kg/m³" or "T"
     * @throws IllegalArgumentException for {@link MaterialProperty#SHEET_RESISTANCE}, which
     *                                  takes no range
     */
    public static String unit(MaterialProperty property) {
        switch (Require.nonNull("property", property)) {
            case CONDUCTIVITY:
                return "S/m";
            case TEMPERATURE_COEFFICIENT:
                return "1/K";
            case PERMEABILITY:
            case PERMITTIVITY:
                return "(relative)";
            case DENSITY:
                return "kg/m³";
            case SATURATION:
                return "T";
            default:
                throw new IllegalArgumentException("a " + property.key() + " takes no range; ranges are for "
                        + "conductivity, temperatureCoefficient, permeability, permittivity, density and saturation");
        }
    }

    /**
     * The property this range is of.
     *
     * @return the property
     */
    public MaterialProperty property() {
        return property;
    }

    /**
     * The lower bound.
     *
     * @return in the property's SI unit
     */
    public double low() {
        return low;
    }

    /**
     * The upper bound.
     *
     * @return in the property's SI unit
     */
    public double high() {
        return high;
    }

    /**
     * Where the range comes from.
     *
     * @return the source text
     */
    public String source() {
        return source;
    }

    /**
     * How far the range can be trusted, as its source states it.
     *
     * @return {@link Provenance#of(String)} of the source
     */
    public Provenance provenance() {
        return Provenance.of(source);
    }

    /**
     * Whether a value lies in the range, bounds included.
     *
     * @param value in the property's SI unit
     * @return true if {@code low ≤ value ≤ high}
     */
    public boolean contains(double value) {
        return value >= low && value <= high;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TypicalRange r && r.property == property && Double.compare(r.low, low) == 0
                && Double.compare(r.high, high) == 0 && r.source.equals(source);
    }

    @Override
    public int hashCode() {
        return ((property.hashCode() * 31 + Double.hashCode(low)) * 31 + Double.hashCode(high)) * 31
                + source.hashCode();
    }

    /**
     * A description such as {@code "permeability 20000 to 100000 (relative)"}, without the source.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return property.key() + " " + Text.number(low) + " to " + Text.number(high) + " " + unit(property);
    }
}
