/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * What a victim needs: for each frequency or band, either the field the source makes at the
 * victim without a shield and the field the victim tolerates, from which the required
 * shielding effectiveness is 20·log10(incident / tolerated), or the required shielding
 * effectiveness itself. Shielding effectiveness is the ratio of the field without the
 * shield to the field with it, in decibels (IEEE Std 299-2006, clause 3).
 *
 * <pre>{@code
 * Requirement need = Requirement.none()
 *     .plus(FrequencyBand.at(Hz(50)), uT(40), nT(10))
 *     .plus(FrequencyBand.at(kHz(20)), uT(3), nT(200))
 *     .plus(FrequencyBand.parse("1 MHz to 10 MHz"), Decibels.of(60));
 * MarginReport m = need.marginOf(barrier.facing(field));
 * }</pre>
 *
 * <p>Fields in air convert between H and B with B = µ0·H. Immutable and thread-safe;
 * {@code plus} returns a new requirement.
 */
public final class Requirement {

    /** The smallest required SE {@link #plus(FrequencyBand, Decibels)} accepts, dB. */
    public static final double MIN_REQUIRED_DB = 0;

    /** The largest required SE {@link #plus(FrequencyBand, Decibels)} accepts, dB. */
    public static final double MAX_REQUIRED_DB = 400;

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
        return with(new Entry(band, Optional.of(incident), Optional.of(tolerated), 20 * Math.log10(inc / tol)));
    }

    /**
     * This requirement with one more band, given directly as the shielding effectiveness
     * the design must reach there. Such an entry has no incident or tolerated field
     * ({@link Entry#incident()} and {@link Entry#tolerated()} are empty).
     *
     * @param band       the band (or single frequency), not null
     * @param requiredSe the required SE, finite, from {@value #MIN_REQUIRED_DB} dB to
     *                   {@value #MAX_REQUIRED_DB} dB (0 dB: the design must not make the
     *                   field stronger)
     * @return the new requirement
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the required SE is outside
     *         0 dB to 400 dB
     */
    public Requirement plus(FrequencyBand band, Decibels requiredSe) {
        Require.nonNull("band", band);
        double db = Require.inRange("required shielding effectiveness",
                Require.nonNull("required SE", requiredSe).toDb(), MIN_REQUIRED_DB, MAX_REQUIRED_DB, "dB");
        return with(new Entry(band, Optional.empty(), Optional.empty(), db + 0.0));
    }

    private Requirement with(Entry e) {
        List<Entry> l = new ArrayList<>(entries);
        l.add(e);
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
     * <p>Any model of the common contract will do. For a shield whose field may come from
     * more than one direction, pass a model whose SE is already the worse of the directions:
     * shield-axisymmetric's {@code WorstDirectionShielding} (a body of revolution in a uniform
     * field along or across its axis) gives at each frequency the smaller of its axial and
     * transverse SE, so each line here is the smaller of the two directions' margins at a
     * single frequency, and over a band the lowest of that smaller SE (the band search runs on
     * it, so a band's line can lie lower than either direction's own search found).
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
     * One band of a requirement: either a source case (incident and tolerated flux densities
     * both present, the required SE following from them) or a required SE given directly
     * (both empty).
     *
     * @param band       the band
     * @param incident   the flux density without a shield; empty when the required SE was given directly
     * @param tolerated  the flux density the victim tolerates; empty when the required SE was given directly
     * @param requiredDb the required SE, dB: 20·log10(incident/tolerated) (negative: no shield
     *                   needed), or the level given directly
     */
    public record Entry(FrequencyBand band, Optional<MagneticFluxDensity> incident,
                        Optional<MagneticFluxDensity> tolerated, double requiredDb) {

        /**
         * Checks the entry.
         *
         * @param band       the band, not null
         * @param incident   the flux density without a shield, not null (empty for a direct entry)
         * @param tolerated  the tolerated flux density, not null (empty for a direct entry)
         * @param requiredDb the required SE, dB, finite
         * @throws NullPointerException     if an argument is null
         * @throws IllegalArgumentException if exactly one of incident and tolerated is present
         * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the required SE is not finite
         */
        public Entry {
            Require.nonNull("band", band);
            Require.nonNull("incident", incident);
            Require.nonNull("tolerated", tolerated);
            Require.finite("required shielding effectiveness", requiredDb, "dB");
            if (incident.isPresent() != tolerated.isPresent()) {
                throw new IllegalArgumentException("an entry holds both the incident and the tolerated flux density"
                        + " or neither (a required SE given directly)");
            }
        }

        /**
         * A source case: the required SE is 20·log10(incident/tolerated).
         *
         * @param band       the band
         * @param incident   the flux density without a shield, not null
         * @param tolerated  the flux density the victim tolerates, not null
         * @param requiredDb the required SE, dB, finite
         * @throws NullPointerException if an argument is null
         * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the required SE is not finite
         */
        public Entry(FrequencyBand band, MagneticFluxDensity incident, MagneticFluxDensity tolerated,
                     double requiredDb) {
            this(band, Optional.of(Require.nonNull("incident", incident)),
                    Optional.of(Require.nonNull("tolerated", tolerated)), requiredDb);
        }

        /**
         * Whether the required SE was given directly rather than from an incident and a
         * tolerated field.
         *
         * @return true if {@link #incident()} and {@link #tolerated()} are empty
         */
        public boolean isDirect() {
            return incident.isEmpty();
        }

        @Override
        public String toString() {
            if (isDirect()) {
                return String.format(Locale.ROOT, "%s: %.1f dB required", band, requiredDb);
            }
            return String.format(Locale.ROOT, "%s: %s incident, %s tolerated, %.1f dB required", band,
                    incident.get(), tolerated.get(), requiredDb);
        }
    }
}
