/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.RelativePermittivity;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.ConductivityUnit;

/**
 * A homogeneous, isotropic, linear medium: conductivity σ, relative permeability model
 * µr(f) and relative permittivity εr. It is the plain property set the models compute
 * with; named materials with provenance live in {@code shield-materials}.
 *
 * <p>Immutable and thread-safe; equality is by value (name included). The {@code with…}
 * methods return a new medium and leave this one untouched.
 *
 * <pre>{@code
 * Medium copper = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);
 * Medium ptfe = Medium.dielectric("PTFE", 2.1);
 * }</pre>
 */
public final class Medium implements MediumSource {

    /** Free space: σ = 0, µr = 1, εr = 1. A slab of it shields nothing (0 dB exactly). */
    public static final Medium VACUUM =
            new Medium("free space", Conductivity.ZERO, ConstantPermeability.ONE, RelativePermittivity.ONE);

    /** Air, treated as free space (σ = 0, µr = 1, εr = 1; the real εr ≈ 1.0006 is ignored). */
    public static final Medium AIR =
            new Medium("air", Conductivity.ZERO, ConstantPermeability.ONE, RelativePermittivity.ONE);

    private final String name;
    private final Conductivity conductivity;
    private final PermeabilityModel permeability;
    private final RelativePermittivity permittivity;

    private Medium(String name, Conductivity conductivity, PermeabilityModel permeability,
                   RelativePermittivity permittivity) {
        this.name = name;
        this.conductivity = conductivity;
        this.permeability = permeability;
        this.permittivity = permittivity;
    }

    /**
     * Obtains a medium from all its properties.
     *
     * @param name         a name for reports, not blank
     * @param conductivity σ, not null (zero allowed)
     * @param permeability the permeability model, not null
     * @param permittivity εr, not null
     * @return the medium
     * @throws IllegalArgumentException if the name is blank
     */
    public static Medium of(String name, Conductivity conductivity, PermeabilityModel permeability,
                            RelativePermittivity permittivity) {
        Require.nonNull("medium name", name);
        if (name.isBlank()) {
            throw new IllegalArgumentException("medium name must not be blank");
        }
        return new Medium(name.strip(), Require.nonNull("conductivity", conductivity),
                Require.nonNull("permeability model", permeability), Require.nonNull("permittivity", permittivity));
    }

    /**
     * A conductor with a constant real permeability and εr = 1.
     *
     * @param name         a name for reports, not blank
     * @param conductivity σ, not null
     * @param mu           µr, finite and greater than 0
     * @return the medium
     * @throws IllegalArgumentException if the name is blank
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if µr is not finite and greater than 0
     */
    public static Medium conductor(String name, Conductivity conductivity, double mu) {
        return of(name, conductivity, PermeabilityModel.constant(mu), RelativePermittivity.ONE);
    }

    /**
     * A conductor whose permeability follows a model.
     *
     * @param name         a name for reports, not blank
     * @param conductivity σ, not null
     * @param permeability the permeability model, not null
     * @return the medium
     * @throws IllegalArgumentException if the name is blank
     */
    public static Medium conductor(String name, Conductivity conductivity, PermeabilityModel permeability) {
        return of(name, conductivity, permeability, RelativePermittivity.ONE);
    }

    /**
     * A lossless, non-magnetic dielectric (σ = 0, µr = 1).
     *
     * @param name    a name for reports, not blank
     * @param epsilon εr, finite and 1 or more
     * @return the medium
     * @throws IllegalArgumentException if the name is blank
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if εr is NaN or out of range
     */
    public static Medium dielectric(String name, double epsilon) {
        return of(name, Conductivity.ZERO, ConstantPermeability.ONE, RelativePermittivity.of(epsilon));
    }

    @Override
    public Medium medium() {
        return this;
    }

    /**
     * The name given for reports.
     *
     * @return the name
     */
    public String name() {
        return name;
    }

    /**
     * The conductivity σ.
     *
     * @return σ
     */
    public Conductivity conductivity() {
        return conductivity;
    }

    /**
     * The permeability model.
     *
     * @return µr(f)
     */
    public PermeabilityModel permeability() {
        return permeability;
    }

    /**
     * The relative permeability at a frequency.
     *
     * @param frequency the frequency, not null
     * @return µr(f)
     */
    public RelativePermeability permeabilityAt(Frequency frequency) {
        return permeability.at(frequency);
    }

    /**
     * The relative permittivity εr.
     *
     * @return εr
     */
    public RelativePermittivity permittivity() {
        return permittivity;
    }

    /**
     * The skin depth δ = 1/sqrt(π·f·µ0·|µr(f)|·σ), the good-conductor value with the
     * magnitude of µr (see {@link PermeabilityModel#skinDepth(Frequency,
     * io.shieldmath.shield.quantity.Conductivity)}; for a lossy µr the exact decay length is
     * {@link #exactSkinDepth(Frequency)}).
     *
     * @param frequency the frequency, not null
     * @return δ
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the medium does not conduct
     */
    public Length skinDepth(Frequency frequency) {
        return permeability.skinDepth(frequency, conductivity);
    }

    /**
     * The exact good-conductor skin depth δ = 1/Re(γ), γ = sqrt(jωµ0µr(f)σ), with the
     * complex µr (see {@link PermeabilityModel#exactSkinDepth(Frequency,
     * io.shieldmath.shield.quantity.Conductivity)}).
     *
     * @param frequency the frequency, not null
     * @return δ
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the medium does not conduct
     */
    public Length exactSkinDepth(Frequency frequency) {
        return permeability.exactSkinDepth(frequency, conductivity);
    }

    /**
     * A copy with another name.
     *
     * @param newName the name, not blank
     * @return the renamed medium; this one is unchanged
     * @throws IllegalArgumentException if the name is blank
     */
    public Medium withName(String newName) {
        return of(newName, conductivity, permeability, permittivity);
    }

    /**
     * A copy with another conductivity.
     *
     * @param sigma the conductivity, not null
     * @return the new medium; this one is unchanged
     */
    public Medium withConductivity(Conductivity sigma) {
        return of(name, sigma, permeability, permittivity);
    }

    /**
     * A copy with another permeability model.
     *
     * @param model the model, not null
     * @return the new medium; this one is unchanged
     */
    public Medium withPermeability(PermeabilityModel model) {
        return of(name, conductivity, model, permittivity);
    }

    /**
     * A copy with another permittivity.
     *
     * @param epsilon εr, not null
     * @return the new medium; this one is unchanged
     */
    public Medium withPermittivity(RelativePermittivity epsilon) {
        return of(name, conductivity, permeability, epsilon);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Medium m && m.name.equals(name) && m.conductivity.equals(conductivity)
                && m.permeability.equals(permeability) && m.permittivity.equals(permittivity);
    }

    @Override
    public int hashCode() {
        return ((name.hashCode() * 31 + conductivity.hashCode()) * 31 + permeability.hashCode()) * 31
                + permittivity.hashCode();
    }

    /**
     * A description such as {@code "copper (σ 58 MS/m, µr 1, εr 1)"}, the numbers to six
     * significant digits.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return name + " (σ " + Text.show(conductivity.toSiemensPerMetre(), CONDUCTIVITY_UNITS) + ", " + permeability
                + ", εr " + Text.number(permittivity.value()) + ")";
    }

    private static final io.shieldmath.shield.quantity.Unit[] CONDUCTIVITY_UNITS = {
        ConductivityUnit.SIEMENS_PER_METRE, ConductivityUnit.MEGASIEMENS_PER_METRE};
}
