/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.ArealMass;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.ConductivityUnit;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.DensityUnit;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.RelativePermittivity;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.SheetResistance;
import io.shieldmath.shield.quantity.Temperature;
import io.shieldmath.shield.quantity.TemperatureCoefficient;
import io.shieldmath.shield.quantity.TemperatureUnit;
import io.shieldmath.shield.quantity.Unit;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Pattern;

/**
 * A named material with the provenance of every number: conductivity at 20 °C and its
 * temperature coefficient, a permeability model µr(f), relative permittivity, density,
 * and where they apply the saturation flux density (ferromagnetic materials) and the
 * sheet resistance (finishes known only that way). Stands for its 20 °C medium in a
 * barrier:
 *
 * <pre>{@code
 * Material cu = Catalogue.builtIn().get("copper-annealed");
 * Barrier b = Barrier.of(cu, mm(0.5));               // σ at 20 °C
 * Barrier hot = Barrier.of(cu.atTemperature(celsius(80)), mm(0.5));
 * }</pre>
 *
 * <p>Ranges checked when built: id lowercase kebab case ({@code [a-z0-9]+(-[a-z0-9]+)*},
 * at most 64 characters); σ from 0 to 1e9 S/m; α from −0.01 to 0.01 /K (required for
 * conductors); εr from 1 to 1e6; density from 0.01 to 30 000 kg/m³; static µr at most
 * 1e7; saturation from 0.01 T to 3 T, required when the static µr is
 * {@value #FERROMAGNETIC_MU} or more; sheet resistance from 1 µΩ/sq to 1 MΩ/sq with a
 * nominal thickness from 10 nm to 10 mm.
 *
 * <p>Handbook values are typical, not guaranteed: they vary with alloy, temper,
 * temperature, field strength and mechanical stress (bending or drilling a
 * high-permeability alloy after its anneal lowers its permeability). Verify designs by
 * measurement.
 *
 * <p>Immutable and thread-safe; equality is by value, every field and source included.
 */
public final class Material implements MediumSource {

    /** The static relative permeability from which a material counts as ferromagnetic. */
    public static final double FERROMAGNETIC_MU = 10;
    /** The lowest temperature {@link #atTemperature(Temperature)} accepts, −200 °C. */
    public static final Temperature MIN_TEMPERATURE = Temperature.ofCelsius(-200);
    /** The highest temperature {@link #atTemperature(Temperature)} accepts, 500 °C. */
    public static final Temperature MAX_TEMPERATURE = Temperature.ofCelsius(500);
    /** The reference temperature of the conductivity, 20 °C. */
    public static final Temperature REFERENCE_TEMPERATURE = Temperature.ROOM;

    private static final double MIN_ALPHA = -0.01;
    private static final double MAX_ALPHA = 0.01;
    private static final Unit[] CONDUCTIVITY_UNITS = {ConductivityUnit.SIEMENS_PER_METRE,
        ConductivityUnit.MEGASIEMENS_PER_METRE};

    private static final Pattern ID = Pattern.compile("[a-z0-9]+(?:-[a-z0-9]+)*");
    private static final String SHEET_SOURCE = "derived: σ = 1/(Rs·t) from the sheet resistance and nominal thickness";

    private final String id;
    private final String name;
    private final Conductivity conductivity;
    private final TemperatureCoefficient alpha;
    private final PermeabilityModel permeability;
    private final RelativePermittivity permittivity;
    private final Density density;
    private final MagneticFluxDensity saturation;
    private final SheetResistance sheetResistance;
    private final Length nominalThickness;
    private final String note;
    private final Map<MaterialProperty, String> sources;
    private final Map<MaterialProperty, TypicalRange> ranges;
    private final Medium medium;

    private Material(Builder b) {
        this.id = b.id;
        this.name = b.name;
        this.alpha = b.alpha;
        this.permeability = b.permeability;
        this.permittivity = b.permittivity;
        this.density = b.density;
        this.saturation = b.saturation;
        this.sheetResistance = b.sheetResistance;
        this.nominalThickness = b.nominalThickness;
        this.note = b.note;
        EnumMap<MaterialProperty, String> s = new EnumMap<>(b.sources);
        if (sheetResistance != null) {
            double sigma = 1 / (sheetResistance.toOhmsPerSquare() * nominalThickness.toMetres());
            this.conductivity = Conductivity.ofSiemensPerMetre(
                    Require.inRange(id + " conductivity derived from the sheet resistance", sigma, 0, 1e9, "S/m"));
            s.put(MaterialProperty.CONDUCTIVITY, SHEET_SOURCE);
        } else {
            this.conductivity = b.conductivity;
        }
        this.sources = Collections.unmodifiableMap(s);
        this.ranges = Collections.unmodifiableMap(new EnumMap<>(b.ranges));
        this.medium = Medium.of(name, conductivity, permeability, permittivity);
    }

    /**
     * Starts building a material.
     *
     * @param id   the stable identifier, lowercase kebab case such as {@code "copper-annealed"}
     * @param name a display name for reports, not blank, at most 200 characters
     * @return a builder
     * @throws IllegalArgumentException if the id or name is not acceptable
     */
    public static Builder builder(String id, String name) {
        return new Builder(checkId(id), Require.text("material name", name, 200));
    }

    /**
     * Checks an identifier of a material.
     *
     * @param id the identifier, not null
     * @return the identifier
     * @throws IllegalArgumentException if it is not lowercase kebab case of at most 64 characters
     */
    public static String checkId(String id) {
        Require.nonNull("material id", id);
        if (id.length() > 64 || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException("material id \"" + Text.clip(id) + "\" is not acceptable; allowed: lowercase "
                    + "letters and digits in words joined by single hyphens, at most 64 characters, such as "
                    + "\"copper-annealed\"");
        }
        return id;
    }

    /**
     * The stable identifier, used in catalogue and design files.
     *
     * @return lowercase kebab case, for example {@code "nickel-iron-80"}
     */
    public String id() {
        return id;
    }

    /**
     * The display name.
     *
     * @return the name
     */
    public String name() {
        return name;
    }

    /**
     * The conductivity at 20 °C; for a finish known by sheet resistance, σ = 1/(Rs·t) at
     * its nominal thickness.
     *
     * @return σ at 20 °C
     */
    public Conductivity conductivity() {
        return conductivity;
    }

    /**
     * The temperature coefficient α of resistivity at 20 °C; empty for non-conductors.
     *
     * @return α, or empty
     */
    public Optional<TemperatureCoefficient> temperatureCoefficient() {
        return Optional.ofNullable(alpha);
    }

    /**
     * The relative permeability model, to be called at every frequency evaluated.
     *
     * @return µr(f)
     */
    public PermeabilityModel permeability() {
        return permeability;
    }

    /**
     * The relative permittivity.
     *
     * @return εr
     */
    public RelativePermittivity permittivity() {
        return permittivity;
    }

    /**
     * The mass density.
     *
     * @return ρ
     */
    public Density density() {
        return density;
    }

    /**
     * The saturation flux density, present for ferromagnetic materials.
     *
     * @return Bs, or empty
     */
    public Optional<MagneticFluxDensity> saturation() {
        return Optional.ofNullable(saturation);
    }

    /**
     * The sheet resistance of a finish known only that way (paint, plated fabric).
     *
     * @return Rs, or empty for bulk materials
     */
    public Optional<SheetResistance> sheetResistance() {
        return Optional.ofNullable(sheetResistance);
    }

    /**
     * The nominal thickness at which the sheet resistance holds; use it as the layer
     * thickness, since σ = 1/(Rs·t) is derived from it.
     *
     * @return t, or empty for bulk materials
     */
    public Optional<Length> nominalThickness() {
        return Optional.ofNullable(nominalThickness);
    }

    /**
     * A free-text remark (what the values depend on, cautions).
     *
     * @return the note, or empty
     */
    public Optional<String> note() {
        return Optional.ofNullable(note);
    }

    /**
     * Where a number comes from: "checked against" a named published source with where it
     * was read, "from memory" with the source it should be checked against, "common practice",
     * "measured", "derived", or a cited source; {@link #provenance(MaterialProperty)} reads
     * which.
     *
     * @param property the property, not null
     * @return the source, or empty if this material does not carry that property
     */
    public Optional<String> source(MaterialProperty property) {
        return Optional.ofNullable(sources.get(Require.nonNull("property", property)));
    }

    /**
     * Every property this material carries, with its source.
     *
     * @return an unmodifiable map in {@link MaterialProperty} order
     */
    public Map<MaterialProperty, String> sources() {
        return sources;
    }

    /**
     * How far a number can be trusted, as its source text states it ({@link Provenance#of(String)}).
     *
     * @param property the property, not null
     * @return the provenance, or empty if this material does not carry that property
     */
    public Optional<Provenance> provenance(MaterialProperty property) {
        return source(property).map(Provenance::of);
    }

    /**
     * The range a published reference gives for a property beside the typical value.
     *
     * @param property the property, not null
     * @return the range, or empty if none is stored
     */
    public Optional<TypicalRange> range(MaterialProperty property) {
        return Optional.ofNullable(ranges.get(Require.nonNull("property", property)));
    }

    /**
     * Every stored range.
     *
     * @return an unmodifiable map in {@link MaterialProperty} order, often empty
     */
    public Map<MaterialProperty, TypicalRange> ranges() {
        return ranges;
    }

    /**
     * The typical value of a property in the SI unit of its ranges
     * ({@link TypicalRange#unit(MaterialProperty)}): σ in S/m, α in 1/K, the static µr, εr,
     * the density in kg/m³ or the saturation in T.
     *
     * @param property the property, not null, not {@link MaterialProperty#SHEET_RESISTANCE}
     * @return the value, or empty if this material does not carry that property
     * @throws IllegalArgumentException for {@link MaterialProperty#SHEET_RESISTANCE}
     */
    public OptionalDouble typicalValue(MaterialProperty property) {
        TypicalRange.unit(property);
        return typical(property, conductivity, alpha, permeability, permittivity, density, saturation);
    }

    private static OptionalDouble typical(MaterialProperty p, Conductivity sigma, TemperatureCoefficient alpha,
                                          PermeabilityModel mu, RelativePermittivity eps, Density rho,
                                          MagneticFluxDensity bs) {
        switch (p) {
            case CONDUCTIVITY:
                return sigma == null ? OptionalDouble.empty() : OptionalDouble.of(sigma.toSiemensPerMetre());
            case TEMPERATURE_COEFFICIENT:
                return alpha == null ? OptionalDouble.empty() : OptionalDouble.of(alpha.toPerKelvin());
            case PERMEABILITY:
                return mu == null ? OptionalDouble.empty() : OptionalDouble.of(mu.staticValue());
            case PERMITTIVITY:
                return eps == null ? OptionalDouble.empty() : OptionalDouble.of(eps.value());
            case DENSITY:
                return rho == null ? OptionalDouble.empty() : OptionalDouble.of(rho.toKilogramsPerCubicMetre());
            case SATURATION:
                return bs == null ? OptionalDouble.empty() : OptionalDouble.of(bs.toTesla());
            default:
                return OptionalDouble.empty();
        }
    }

    /**
     * Whether the static relative permeability is {@value #FERROMAGNETIC_MU} or more.
     *
     * @return true for ferromagnetic materials
     */
    public boolean isFerromagnetic() {
        return permeability.staticValue() >= FERROMAGNETIC_MU;
    }

    /**
     * The medium at 20 °C.
     *
     * @return the medium, named by the display name
     */
    @Override
    public Medium medium() {
        return medium;
    }

    /**
     * The conductivity at a temperature, σ(T) = σ20/(1 + α·(T − 20 °C)), the linear
     * resistivity law with the coefficient at 20 °C (IEC 60028 for copper: α = 0.00393 /K).
     * Materials without a coefficient (non-conductors) keep σ20.
     *
     * @param temperature the temperature, not null, from −200 °C to 500 °C, where
     *                    1 + α·(T − 20 °C) is at least 0.1 (the linear law fails at cryogenic
     *                    temperatures)
     * @return σ(T)
     * @throws InvalidQuantityException if the temperature is out of range
     */
    public Conductivity conductivityAt(Temperature temperature) {
        double celsius = Require.nonNull("temperature", temperature).toCelsius();
        Require.inRange("temperature", celsius, MIN_TEMPERATURE.toCelsius(), MAX_TEMPERATURE.toCelsius(), "°C");
        if (alpha == null || temperature.equals(REFERENCE_TEMPERATURE)) {
            return conductivity;
        }
        double factor = 1 + alpha.toPerKelvin() * temperature.kelvinAbove(REFERENCE_TEMPERATURE);
        if (!(factor >= 0.1)) {
            throw new InvalidQuantityException("temperature", Text.show(celsius, TemperatureUnit.CELSIUS),
                    "a temperature where the linear law holds for " + id + " (1 + α·(T − 20 °C) ≥ 0.1)");
        }
        return Conductivity.ofSiemensPerMetre(conductivity.toSiemensPerMetre() / factor);
    }

    /**
     * The medium at a temperature: conductivity by {@link #conductivityAt(Temperature)}, the
     * other properties as at 20 °C.
     *
     * @param temperature the temperature, not null, from −200 °C to 500 °C (see
     *                    {@link #conductivityAt(Temperature)})
     * @return the medium, named with the temperature unless it is 20 °C
     * @throws InvalidQuantityException if the temperature is out of range
     */
    public Medium atTemperature(Temperature temperature) {
        Conductivity sigma = conductivityAt(temperature);
        if (temperature.equals(REFERENCE_TEMPERATURE)) {
            return medium;
        }
        return Medium.of(name + " at " + temperature, sigma, permeability, permittivity);
    }

    /**
     * The mass per area of a plate of this material, ρ·t.
     *
     * @param thickness the thickness, not null
     * @return the areal mass
     */
    public ArealMass arealMass(Length thickness) {
        return density.arealMass(thickness);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Material m && m.id.equals(id) && m.name.equals(name)
                && m.conductivity.equals(conductivity) && Objects.equals(m.alpha, alpha)
                && m.permeability.equals(permeability) && m.permittivity.equals(permittivity)
                && m.density.equals(density) && Objects.equals(m.saturation, saturation)
                && Objects.equals(m.sheetResistance, sheetResistance)
                && Objects.equals(m.nominalThickness, nominalThickness) && Objects.equals(m.note, note)
                && m.sources.equals(sources) && m.ranges.equals(ranges);
    }

    @Override
    public int hashCode() {
        return Objects.hash(id, name, conductivity, alpha, permeability, permittivity, density, saturation,
                sheetResistance, nominalThickness, note, sources, ranges);
    }

    /**
     * A description such as {@code "copper-annealed (Copper, annealed; σ 58 MS/m, µr 1, εr 1,
     * 8890 kg/m³)"}, the numbers to six significant digits.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return id + " (" + name + "; σ " + Text.show(conductivity.toSiemensPerMetre(), CONDUCTIVITY_UNITS) + ", "
                + permeability + ", εr " + Text.number(permittivity.value()) + ", "
                + Text.show(density.toKilogramsPerCubicMetre(), DensityUnit.KILOGRAM_PER_CUBIC_METRE) + ")";
    }

    /**
     * Builds a {@link Material}; every number is given with its source. Not thread-safe;
     * {@link #build()} checks the whole entry and may be called more than once.
     */
    public static final class Builder {

        private final String id;
        private final String name;
        private Conductivity conductivity;
        private TemperatureCoefficient alpha;
        private PermeabilityModel permeability;
        private RelativePermittivity permittivity;
        private Density density;
        private MagneticFluxDensity saturation;
        private SheetResistance sheetResistance;
        private Length nominalThickness;
        private String note;
        private final EnumMap<MaterialProperty, String> sources = new EnumMap<>(MaterialProperty.class);
        private final EnumMap<MaterialProperty, TypicalRange> ranges = new EnumMap<>(MaterialProperty.class);

        private Builder(String id, String name) {
            this.id = id;
            this.name = name;
        }

        private void source(MaterialProperty p, String source) {
            String what = id + " " + p.key() + " source";
            sources.put(p, Provenance.requireWellFormed(what, Require.text(what, source, 1000)));
        }

        /**
         * Stores the range a published reference gives for a property beside its typical
         * value; {@link #build()} checks that the range holds the typical value.
         *
         * @param range the range, not null, in the property's SI unit
         * @return this builder
         */
        public Builder range(TypicalRange range) {
            Require.nonNull("range", range);
            ranges.put(range.property(), range);
            return this;
        }

        /**
         * Sets the conductivity at 20 °C.
         *
         * @param sigma  σ, from 0 to 1e9 S/m
         * @param source where the value comes from, not blank
         * @return this builder
         * @throws InvalidQuantityException if σ is outside 0 to 1e9 S/m
         * @throws IllegalArgumentException if the source is blank or longer than 1000 characters, or claims
         *         "checked against" without naming the source and where it was read
         */
        public Builder conductivity(Conductivity sigma, String source) {
            Require.inRange(id + " conductivity", Require.nonNull("conductivity", sigma).toSiemensPerMetre(),
                    0, 1e9, "S/m");
            this.conductivity = sigma;
            source(MaterialProperty.CONDUCTIVITY, source);
            return this;
        }

        /**
         * Sets the sheet resistance of a finish known only that way, instead of a
         * conductivity; σ = 1/(Rs·t) at the nominal thickness.
         *
         * @param rs        the sheet resistance, from 1 µΩ/sq to 1 MΩ/sq
         * @param thickness the nominal thickness, from 10 nm to 10 mm
         * @param source    where the values come from, not blank
         * @return this builder
         * @throws InvalidQuantityException if Rs or the thickness is out of range
         * @throws IllegalArgumentException if the source is blank or longer than 1000 characters, or claims
         *         "checked against" without naming the source and where it was read
         */
        public Builder sheetResistance(SheetResistance rs, Length thickness, String source) {
            Require.inRange(id + " sheet resistance", Require.nonNull("sheet resistance", rs).toOhmsPerSquare(),
                    1e-6, 1e6, "Ω/sq");
            Require.inRange(id + " nominal thickness", Require.nonNull("thickness", thickness).toMetres(),
                    1e-8, 1e-2, "m");
            this.sheetResistance = rs;
            this.nominalThickness = thickness;
            source(MaterialProperty.SHEET_RESISTANCE, source);
            return this;
        }

        /**
         * Sets the temperature coefficient of resistivity at 20 °C.
         *
         * @param alpha  α, not null, from −0.01 /K to 0.01 /K
         * @param source where the value comes from, not blank
         * @return this builder
         * @throws InvalidQuantityException if α is out of range
         */
        public Builder temperatureCoefficient(TemperatureCoefficient alpha, String source) {
            Require.inRange(id + " temperature coefficient", Require.nonNull("temperature coefficient", alpha)
                    .toPerKelvin(), MIN_ALPHA, MAX_ALPHA, "/K");
            this.alpha = alpha;
            source(MaterialProperty.TEMPERATURE_COEFFICIENT, source);
            return this;
        }

        /**
         * Sets the permeability model.
         *
         * @param model  µr(f), static value at most 1e7, not null
         * @param source where the values come from, not blank
         * @return this builder
         * @throws InvalidQuantityException if the static µr is outside 0 to 1e7
         * @throws IllegalArgumentException if the source is blank or longer than 1000 characters, or claims
         *         "checked against" without naming the source and where it was read
         */
        public Builder permeability(PermeabilityModel model, String source) {
            Require.nonNull("permeability model", model);
            Require.inRange(id + " static relative permeability", model.staticValue(), 0, 1e7, "(relative)");
            this.permeability = model;
            source(MaterialProperty.PERMEABILITY, source);
            return this;
        }

        /**
         * Sets the relative permittivity.
         *
         * @param epsilon εr, from 1 to 1e6
         * @param source  where the value comes from, not blank
         * @return this builder
         * @throws InvalidQuantityException if εr is outside 1 to 1e6
         * @throws IllegalArgumentException if the source is blank or longer than 1000 characters, or claims
         *         "checked against" without naming the source and where it was read
         */
        public Builder permittivity(RelativePermittivity epsilon, String source) {
            Require.inRange(id + " relative permittivity", Require.nonNull("permittivity", epsilon).value(),
                    1, 1e6, "(relative)");
            this.permittivity = epsilon;
            source(MaterialProperty.PERMITTIVITY, source);
            return this;
        }

        /**
         * Sets the density.
         *
         * @param rho    ρ, from 0.01 to 30 000 kg/m³
         * @param source where the value comes from, not blank
         * @return this builder
         * @throws InvalidQuantityException if ρ is outside 0.01 to 30 000 kg/m³
         * @throws IllegalArgumentException if the source is blank or longer than 1000 characters, or claims
         *         "checked against" without naming the source and where it was read
         */
        public Builder density(Density rho, String source) {
            Require.inRange(id + " density", Require.nonNull("density", rho).toKilogramsPerCubicMetre(),
                    0.01, 30_000, "kg/m³");
            this.density = rho;
            source(MaterialProperty.DENSITY, source);
            return this;
        }

        /**
         * Sets the saturation flux density (required for ferromagnetic materials).
         *
         * @param bs     Bs, from 0.01 T to 3 T
         * @param source where the value comes from, not blank
         * @return this builder
         * @throws InvalidQuantityException if Bs is outside 0.01 T to 3 T
         * @throws IllegalArgumentException if the source is blank or longer than 1000 characters, or claims
         *         "checked against" without naming the source and where it was read
         */
        public Builder saturation(MagneticFluxDensity bs, String source) {
            Require.inRange(id + " saturation flux density", Require.nonNull("saturation", bs).toTesla(),
                    0.01, 3, "T");
            this.saturation = bs;
            source(MaterialProperty.SATURATION, source);
            return this;
        }

        /**
         * Sets a free-text remark.
         *
         * @param text the note, 1 to 1000 characters
         * @return this builder
         * @throws IllegalArgumentException if the text is blank or longer than 1000 characters
         */
        public Builder note(String text) {
            this.note = Require.text(id + " note", text, 1000);
            return this;
        }

        /**
         * Checks the entry and builds the material.
         *
         * @return the material
         * @throws IllegalArgumentException if a required property is missing (conductivity or
         *                                  sheet resistance, permeability, permittivity, density; the
         *                                  temperature coefficient for conductors; the saturation for
         *                                  ferromagnetic materials) or both a conductivity and a sheet
         *                                  resistance are given
         */
        public Material build() {
            if ((conductivity == null) == (sheetResistance == null)) {
                throw new IllegalArgumentException(id + ": give exactly one of a conductivity and a sheet resistance");
            }
            require(permeability, MaterialProperty.PERMEABILITY);
            require(permittivity, MaterialProperty.PERMITTIVITY);
            require(density, MaterialProperty.DENSITY);
            boolean conducts = sheetResistance != null || conductivity.toSiemensPerMetre() > 0;
            if (conducts && alpha == null) {
                throw new IllegalArgumentException(id + ": a conductor needs a temperature coefficient ("
                        + MaterialProperty.TEMPERATURE_COEFFICIENT.key() + ")");
            }
            if (permeability.staticValue() >= FERROMAGNETIC_MU && saturation == null) {
                throw new IllegalArgumentException(id + ": a ferromagnetic material (static µr "
                        + Text.number(permeability.staticValue()) + ") needs a saturation flux density ("
                        + MaterialProperty.SATURATION.key() + ")");
            }
            for (TypicalRange r : ranges.values()) {
                MaterialProperty p = r.property();
                OptionalDouble v = typical(p, conductivity, alpha, permeability, permittivity, density, saturation);
                if (v.isEmpty()) {
                    throw new IllegalArgumentException(id + ": a range of " + p.key() + " needs a " + p.key()
                            + (p == MaterialProperty.CONDUCTIVITY ? " (a finish known by sheet resistance takes no "
                            + "conductivity range)" : ""));
                }
                if (!r.contains(v.getAsDouble())) {
                    throw new IllegalArgumentException(id + ": the " + r + " does not hold the typical value "
                            + Text.number(v.getAsDouble()) + " " + TypicalRange.unit(p)
                            + "; allowed: a range from at most to at least the typical value");
                }
            }
            return new Material(this);
        }

        private void require(Object value, MaterialProperty p) {
            if (value == null) {
                throw new IllegalArgumentException(id + ": missing " + p.key());
            }
        }
    }
}
