/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.ArealMass;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Every candidate material that meets a target SE over a band within a thickness limit,
 * as a single plate facing a field, ranked by areal mass, thickness or cost.
 *
 * <p>For each candidate the thinnest plate is found by {@link ThicknessSolver}; the
 * candidates that cannot meet the target within the limit are listed apart with the
 * reason. Ties (criterion values equal to 9 significant digits) are broken by thickness,
 * then by name, and the tie is written in the entry's note. Stateless and thread-safe.
 *
 * <p>What is optimised: the model's own result. For a planar barrier that is an infinite
 * sheet, and for a shell a closed shell without seams; real plates lose field round their
 * edges and real enclosures through seams and holes, so a design found here is an upper
 * estimate until it is checked with a finite-geometry model (the axisymmetric module, an
 * enclosure with its openings) or by measurement.
 */
public final class MaterialRanking {

    /** What the ranking orders by, smallest first. */
    public enum Criterion {
        /** Mass per square metre of plate, ρ·t (kg/m²). */
        AREAL_MASS("areal mass", "kg/m²"),
        /** Plate thickness (m). */
        THICKNESS("thickness", "m"),
        /** Price of a square metre of plate from the price per kilogram, ρ·t·price. */
        COST_BY_MASS("cost per m² (by mass)", "per m²"),
        /** The price per square metre given for the candidate. */
        COST_PER_SQUARE_METRE("cost per m²", "per m²");

        private final String words;
        private final String unit;

        Criterion(String words, String unit) {
            this.words = words;
            this.unit = unit;
        }

        /**
         * The criterion in words.
         *
         * @return for example "areal mass"
         */
        public String words() {
            return words;
        }

        /**
         * The unit of the criterion's value.
         *
         * @return for example "kg/m²"
         */
        public String unit() {
            return unit;
        }
    }

    private MaterialRanking() {
    }

    /**
     * Ranks candidates as single plates.
     *
     * @param candidates the materials, not null, none null
     * @param field      the incident field, not null
     * @param band       the band the target must hold over, not null
     * @param target     the target SE, not null
     * @param limit      the largest thickness allowed
     * @param by         the criterion, not null
     * @return the ranking
     * @throws IllegalArgumentException if a cost criterion is chosen and a meeting candidate has no such price
     */
    public static Ranking rank(List<Candidate> candidates, IncidentField field, FrequencyBand band, Decibels target,
                               Length limit, Criterion by) {
        double targetDb = Require.nonNull("target", target).toDb();
        Require.nonNull("candidates", candidates);
        Require.nonNull("field", field);
        Require.nonNull("criterion", by);
        List<Ranking.Entry> meeting = new ArrayList<>();
        List<Ranking.Excluded> excluded = new ArrayList<>();
        for (Candidate c : candidates) {
            Require.nonNull("candidate", c);
            Barrier plate = Barrier.of(c.medium(), limit);
            ThicknessSolution s = ThicknessSolver.minimumThickness(plate, 0, field, band, targetDb, limit);
            if (!s.isFound()) {
                excluded.add(new Ranking.Excluded(c, s.explanation()));
                continue;
            }
            double t = s.thickness().toMetres();
            double mass = c.densityKilogramsPerCubicMetre() * t;
            meeting.add(new Ranking.Entry(0, c, s.thickness(), ArealMass.ofKilogramsPerSquareMetre(mass),
                    value(c, by, t, mass), s.worst(), ""));
        }
        // Sort on the value rounded to 9 significant digits, so near-equal values tie and the
        // tie is broken by thickness, then name (a transitive order, unlike a tolerance compare).
        Comparator<Ranking.Entry> order = Comparator.comparingDouble((Ranking.Entry e) -> roundedKey(e.value()))
                .thenComparingDouble(e -> e.thickness().toMetres())
                .thenComparing(e -> e.candidate().name());
        meeting.sort(order);
        List<Ranking.Entry> ranked = new ArrayList<>();
        for (int i = 0; i < meeting.size(); i++) {
            Ranking.Entry e = meeting.get(i);
            String note = "";
            List<String> ties = new ArrayList<>();
            for (Ranking.Entry o : meeting) {
                if (o != e && tied(o.value(), e.value())) {
                    ties.add(o.candidate().name());
                }
            }
            if (!ties.isEmpty()) {
                note = String.format(Locale.ROOT, "tied with %s on %s (%.6g %s); ordered by thickness, then name",
                        String.join(", ", ties), by.words(), e.value(), by.unit());
            }
            ranked.add(new Ranking.Entry(i + 1, e.candidate(), e.thickness(), e.arealMass(), e.value(), e.worst(),
                    note));
        }
        return new Ranking(by, targetDb, ranked, excluded);
    }

    private static double roundedKey(double v) {
        return v == 0 ? 0 : new java.math.BigDecimal(v).round(new java.math.MathContext(9)).doubleValue();
    }

    private static boolean tied(double a, double b) {
        return roundedKey(a) == roundedKey(b);
    }

    private static double value(Candidate c, Criterion by, double t, double mass) {
        switch (by) {
            case AREAL_MASS:
                return mass;
            case THICKNESS:
                return t;
            case COST_BY_MASS:
                return mass * c.costPerKilogram().orElseThrow(() -> new IllegalArgumentException(
                        "candidate " + c.name() + " has no cost per kilogram; give one with withCostPerKilogram"));
            default:
                return c.costPerSquareMetre().orElseThrow(() -> new IllegalArgumentException(
                        "candidate " + c.name() + " has no cost per square metre; give one with withCostPerSquareMetre"));
        }
    }
}
