/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.quantity.ArealMass;
import io.shieldmath.shield.quantity.Length;
import java.util.List;
import java.util.Locale;

/**
 * The result of {@link MaterialRanking}: the candidates that meet the target, best
 * first, and those that do not, with the reason. Immutable and thread-safe.
 *
 * <p>What is optimised: the model's own result. For a planar barrier that is an infinite
 * sheet, and for a shell a closed shell without seams; real plates lose field round their
 * edges and real enclosures through seams and holes, so a design found here is an upper
 * estimate until it is checked with a finite-geometry model (the axisymmetric module, an
 * enclosure with its openings) or by measurement.
 */
public final class Ranking {

    private final MaterialRanking.Criterion criterion;
    private final double targetDb;
    private final List<Entry> ranked;
    private final List<Excluded> excluded;

    Ranking(MaterialRanking.Criterion criterion, double targetDb, List<Entry> ranked, List<Excluded> excluded) {
        this.criterion = criterion;
        this.targetDb = targetDb;
        this.ranked = List.copyOf(ranked);
        this.excluded = List.copyOf(excluded);
    }

    /**
     * The candidates that meet the target, best first.
     *
     * @return an unmodifiable list
     */
    public List<Entry> ranked() {
        return ranked;
    }

    /**
     * The candidates that cannot meet the target within the limit.
     *
     * @return an unmodifiable list
     */
    public List<Excluded> excluded() {
        return excluded;
    }

    /**
     * The criterion.
     *
     * @return what the ranking orders by
     */
    public MaterialRanking.Criterion criterion() {
        return criterion;
    }

    /**
     * The target SE in dB.
     *
     * @return the target
     */
    public double targetDb() {
        return targetDb;
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "ranking by %s for %.1f dB:",
                criterion.words(), targetDb));
        for (Entry e : ranked) {
            s.append("\n  ").append(e);
        }
        for (Excluded x : excluded) {
            s.append("\n  excluded ").append(x.candidate().name()).append(": ").append(x.reason());
        }
        return s.toString();
    }

    /**
     * A candidate that meets the target.
     *
     * @param rank      1 for the best
     * @param candidate the candidate
     * @param thickness the thinnest plate that meets the target
     * @param arealMass the plate's mass per square metre
     * @param value     the criterion's value, in the criterion's unit
     * @param worst     the worst SE in the band at that thickness
     * @param note      how a tie was broken, or empty
     */
    public record Entry(int rank, Candidate candidate, Length thickness, ArealMass arealMass, double value,
                        BandSearch.WorstCase worst, String note) {

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%d. %s: %s, %.3f kg/m², worst %s%s", rank, candidate.name(),
                    thickness, arealMass.toKilogramsPerSquareMetre(), worst, note.isEmpty() ? "" : " (" + note + ")");
        }
    }

    /**
     * A candidate that cannot meet the target within the limit.
     *
     * @param candidate the candidate
     * @param reason    why, with numbers
     */
    public record Excluded(Candidate candidate, String reason) {
    }
}
