/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.design.ToleranceStudy;
import io.shieldmath.shield.design.ToleranceStudy.Spread;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import java.util.Collection;
import java.util.Optional;

/**
 * A material's stored {@link TypicalRange} turned into the relative tolerance that
 * {@link ToleranceStudy} takes, so a study can draw from published ranges when asked:
 *
 * <pre>{@code
 * Material mu = Catalogue.builtIn().get("nickel-iron-80");
 * ToleranceStudy study = RangeTolerance.widest(ToleranceStudy.of(barrier, field), List.of(mu));
 * }</pre>
 *
 * <p>How the range becomes a tolerance: the study multiplies each property by 1 + tol·X
 * about its nominal value, symmetrically, so the tolerance is the larger distance from the
 * typical value to either end of the range, relative to the typical value, with a
 * {@link Spread#UNIFORM} spread. The sampled interval thus covers the whole published range
 * (and, for a range lopsided about the typical value, some more on the short side): the
 * cautious choice. For permeability the study varies the magnetisation µ′ − 1, so the
 * tolerance is relative to µdc − 1, and only a magnetic material (static µr above 1) gives
 * one. The study accepts tolerances up to 1; a wider range is capped at 1 and says so
 * ({@link #isCapped()}). Only conductivity and permeability are varied by the study; other
 * properties give no tolerance.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class RangeTolerance {

    private final String materialId;
    private final MaterialProperty property;
    private final double relative;
    private final boolean capped;

    private RangeTolerance(String materialId, MaterialProperty property, double relative, boolean capped) {
        this.materialId = materialId;
        this.property = property;
        this.relative = relative;
        this.capped = capped;
    }

    /**
     * The tolerance a material's stored range gives for a property.
     *
     * @param material the material, not null
     * @param property {@link MaterialProperty#CONDUCTIVITY} or {@link MaterialProperty#PERMEABILITY}
     * @return the tolerance, or empty if the material stores no range for the property, its
     *         typical conductivity is 0, or its static µr is not above 1
     * @throws IllegalArgumentException for a property the study does not vary
     */
    public static Optional<RangeTolerance> of(Material material, MaterialProperty property) {
        Require.nonNull("material", material);
        if (Require.nonNull("property", property) != MaterialProperty.CONDUCTIVITY
                && property != MaterialProperty.PERMEABILITY) {
            throw new IllegalArgumentException("the tolerance study varies conductivity and permeability only, not "
                    + property.key());
        }
        Optional<TypicalRange> stored = material.range(property);
        if (stored.isEmpty()) {
            return Optional.empty();
        }
        TypicalRange r = stored.get();
        double typical = material.typicalValue(property).getAsDouble();
        double base = property == MaterialProperty.PERMEABILITY ? typical - 1 : typical;
        if (!(base > 0)) {
            return Optional.empty();
        }
        double wider = Math.max(r.high() - typical, typical - r.low());
        double tol = wider / base;
        return Optional.of(new RangeTolerance(material.id(), property, Math.min(tol, 1), tol > 1));
    }

    /**
     * A copy of a study with the conductivity and permeability tolerances set from the
     * widest range among the materials given, since the study applies one tolerance to every
     * layer; a property none of them has a range for keeps the study's tolerance.
     *
     * @param study     the study, not null; unchanged
     * @param materials the materials of the barrier's layers, not null, none null
     * @return the new study, or {@code study} if no material gives a tolerance
     */
    public static ToleranceStudy widest(ToleranceStudy study, Collection<Material> materials) {
        Require.nonNull("study", study);
        Require.nonNull("materials", materials);
        ToleranceStudy out = study;
        for (MaterialProperty p : new MaterialProperty[] {MaterialProperty.CONDUCTIVITY,
            MaterialProperty.PERMEABILITY}) {
            RangeTolerance widest = null;
            for (Material m : materials) {
                RangeTolerance t = of(Require.nonNull("material", m), p).orElse(null);
                if (t != null && (widest == null || t.relative > widest.relative)) {
                    widest = t;
                }
            }
            if (widest != null) {
                out = widest.applyTo(out);
            }
        }
        return out;
    }

    /**
     * A copy of a study with this tolerance set on its property, uniform spread.
     *
     * @param study the study, not null; unchanged
     * @return the new study
     */
    public ToleranceStudy applyTo(ToleranceStudy study) {
        Require.nonNull("study", study);
        return property == MaterialProperty.CONDUCTIVITY ? study.conductivity(relative, Spread.UNIFORM)
                : study.permeability(relative, Spread.UNIFORM);
    }

    /**
     * The material the range belongs to.
     *
     * @return its identifier
     */
    public String materialId() {
        return materialId;
    }

    /**
     * The property varied.
     *
     * @return {@link MaterialProperty#CONDUCTIVITY} or {@link MaterialProperty#PERMEABILITY}
     */
    public MaterialProperty property() {
        return property;
    }

    /**
     * The relative tolerance, the half-width of a uniform spread.
     *
     * @return from 0 to 1
     */
    public double relative() {
        return relative;
    }

    /**
     * The spread the tolerance is meant for.
     *
     * @return always {@link Spread#UNIFORM}: a published range gives bounds, not a distribution
     */
    public Spread spread() {
        return Spread.UNIFORM;
    }

    /**
     * Whether the range was wider than the study accepts and the tolerance was cut to 1.
     *
     * @return true if capped
     */
    public boolean isCapped() {
        return capped;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RangeTolerance t && t.materialId.equals(materialId) && t.property == property
                && Double.compare(t.relative, relative) == 0 && t.capped == capped;
    }

    @Override
    public int hashCode() {
        return (materialId.hashCode() * 31 + property.hashCode()) * 31 + Double.hashCode(relative);
    }

    /**
     * A description such as {@code "nickel-iron-80 permeability ±0.667 uniform"}.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return materialId + " " + property.key() + " ±" + Text.number(relative) + " uniform"
                + (capped ? " (capped at 1)" : "");
    }
}
