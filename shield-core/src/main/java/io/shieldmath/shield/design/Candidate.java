/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Density;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * A material offered to {@link MaterialRanking}: a name, its medium, its density and,
 * optionally, its price per kilogram or per square metre of sheet. Immutable and
 * thread-safe; the {@code with…} methods return copies.
 */
public final class Candidate {

    private final String name;
    private final MediumSource medium;
    private final double density;
    private final OptionalDouble costPerKilogram;
    private final OptionalDouble costPerSquareMetre;

    private Candidate(String name, MediumSource medium, double density, OptionalDouble perKg, OptionalDouble perM2) {
        this.name = name;
        this.medium = medium;
        this.density = density;
        this.costPerKilogram = perKg;
        this.costPerSquareMetre = perM2;
    }

    /**
     * A candidate without prices.
     *
     * @param name    a name for reports, not blank
     * @param medium  the medium or catalogue material, not null
     * @param density the density, greater than 0
     * @return the candidate
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if the name is blank or the density is not greater than 0
     */
    public static Candidate of(String name, MediumSource medium, Density density) {
        Require.nonNull("candidate name", name);
        if (name.isBlank()) {
            throw new IllegalArgumentException("candidate name must not be blank");
        }
        return new Candidate(name.strip(), Require.nonNull("medium", medium),
                Require.positive("density", Require.nonNull("density", density).toKilogramsPerCubicMetre(), "kg/m³"), OptionalDouble.empty(), OptionalDouble.empty());
    }

    /**
     * A copy with a price per kilogram (any currency, the same for all candidates).
     *
     * @param price the price per kg, finite and 0 or more
     * @return the new candidate
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the price is negative or not finite
     */
    public Candidate withCostPerKilogram(double price) {
        return new Candidate(name, medium, density,
                OptionalDouble.of(Require.nonNegative("cost per kilogram", price, "per kg")), costPerSquareMetre);
    }

    /**
     * A copy with a price per square metre of sheet (any currency).
     *
     * @param price the price per m², finite and 0 or more
     * @return the new candidate
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the price is negative or not finite
     */
    public Candidate withCostPerSquareMetre(double price) {
        return new Candidate(name, medium, density, costPerKilogram,
                OptionalDouble.of(Require.nonNegative("cost per square metre", price, "per m²")));
    }

    /**
     * The name.
     *
     * @return the name
     */
    public String name() {
        return name;
    }

    /**
     * The medium.
     *
     * @return the medium source
     */
    public MediumSource medium() {
        return medium;
    }

    /**
     * The density.
     *
     * @return ρ
     */
    public Density density() {
        return Density.ofKilogramsPerCubicMetre(density);
    }

    /** The density in kg/m³, for the ranking's inner loop. */
    double densityKilogramsPerCubicMetre() {
        return density;
    }

    /**
     * The price per kilogram, if given.
     *
     * @return the price or empty
     */
    public OptionalDouble costPerKilogram() {
        return costPerKilogram;
    }

    /**
     * The price per square metre, if given.
     *
     * @return the price or empty
     */
    public OptionalDouble costPerSquareMetre() {
        return costPerSquareMetre;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s (%.0f kg/m³)", name, density);
    }
}
