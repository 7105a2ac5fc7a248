/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * What a victim needs: for each frequency or band, the field the source makes at the
 * victim without a shield and the field the victim tolerates. The required shielding
 * effectiveness there is 20·log10(incident / tolerated).
 *
 * <pre>{@code
 * Requirement need = Requirement.none()
 *     .plus(FrequencyBand.at(Hz(50)), uT(40), nT(10))
 *     .plus(FrequencyBand.at(kHz(20)), uT(3), nT(200));
 * MarginReport m = need.marginOf(barrier.facing(field));
 * }</pre>
 *
 * <p>Fields in air convert between H and B with B = µ0·H. Immutable and thread-safe;
 * {@code plus} returns a new requirement.
 */
public final class Requirement {

    private static final Requirement NONE = new Requirement(List.of());

    private final List<Entry> entries;

    private Requirement(List<Entry> entries) {
        this.entries = Collections.unmodifiableList(entries);
    }

    /**
     * A requirement with no entries yet.
     *
     * @return the empty requirement
     */
    public static Requirement none() {
        return NONE;
    }

    /**
     * This requirement with one more band.
     *
     * @param band      the band (or single frequency), not null
     * @param incident  the flux density at the victim without a shield, greater than 0
     * @param tolerated the flux density the victim tolerates, greater than 0
     * @return the new requirement
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a flux density is not greater than 0
     */
    public Requirement plus(FrequencyBand band, MagneticFluxDensity incident, MagneticFluxDensity tolerated) {
        Require.nonNull("band", band);
        double inc = Require.positive("incident flux density", Require.nonNull("incident", incident).toTesla(), "T");
        double tol = Require.positive("tolerated flux density", Require.nonNull("tolerated", tolerated).toTesla(),
                "T");
        List<Entry> l = new ArrayList<>(entries);
        l.add(new Entry(band, incident, tolerated, 20 * Math.log10(inc / tol)));
        return new Requirement(l);
    }

    /**
     * This requirement with one more band, fields given as field strength.
     *
     * @param band      the band, not null
     * @param incident  the field strength at the victim without a shield, greater than 0
     * @param tolerated the field strength the victim tolerates, greater than 0
     * @return the new requirement
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a field strength is not greater than 0
     */
    public Requirement plus(FrequencyBand band, MagneticFieldStrength incident, MagneticFieldStrength tolerated) {
        return plus(band, MagneticFluxDensity.from(Require.nonNull("incident", incident)),
                MagneticFluxDensity.from(Require.nonNull("tolerated", tolerated)));
    }

    /**
     * The entries, in the order given.
     *
     * @return an unmodifiable list
     */
    public List<Entry> entries() {
        return entries;
    }

    /**
     * The margin of a design against every entry: its worst SE in each band minus the
     * required SE, found by {@link BandSearch}.
     *
     * @param model the design's model, not null
     * @return the margins, with the worst named
     * @throws IllegalStateException if the requirement has no entries
     */
    public MarginReport marginOf(ShieldingModel<?> model) {
        Require.nonNull("model", model);
        if (entries.isEmpty()) {
            throw new IllegalStateException("the requirement has no entries; add bands with plus(...)");
        }
        List<MarginReport.Line> lines = new ArrayList<>();
        for (Entry e : entries) {
            BandSearch.WorstCase w = BandSearch.worst(model, e.band());
            lines.add(new MarginReport.Line(e, w.frequency(), w.seDb(), w.seDb() - e.requiredDb()));
        }
        return new MarginReport(lines);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Requirement r && r.entries.equals(entries);
    }

    @Override
    public int hashCode() {
        return entries.hashCode();
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder("requirement:");
        for (Entry e : entries) {
            s.append("\n  ").append(e);
        }
        return s.toString();
    }

    /**
     * One band of a requirement.
     *
     * @param band       the band
     * @param incident   the flux density without a shield
     * @param tolerated  the flux density the victim tolerates
     * @param requiredDb the required SE, 20·log10(incident/tolerated), dB (negative: no shield needed)
     */
    public record Entry(FrequencyBand band, MagneticFluxDensity incident, MagneticFluxDensity tolerated,
                        double requiredDb) {

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%s: %s incident, %s tolerated, %.1f dB required", band, incident,
                    tolerated, requiredDb);
        }
    }
}
