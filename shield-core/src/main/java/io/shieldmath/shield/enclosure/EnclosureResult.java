/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The shielding effectiveness of an enclosure with every leakage path and its share.
 *
 * <p>Immutable and thread-safe.
 */
public final class EnclosureResult implements ShieldingResult {

    private final Frequency frequency;
    private final PathSum sum;
    private final double totalDb;
    private final List<LeakagePath> paths;
    private final List<ValidityNote> notes;

    EnclosureResult(Frequency frequency, PathSum sum, double totalDb, List<LeakagePath> paths,
                    List<ValidityNote> notes) {
        this.notes = notes;
        this.frequency = frequency;
        this.sum = sum;
        this.totalDb = totalDb;
        this.paths = List.copyOf(paths);
    }

    /**
     * The frequency.
     *
     * @return f, or empty for a static field
     */
    public Optional<Frequency> frequency() {
        return Optional.ofNullable(frequency);
    }

    /**
     * How the paths were combined.
     *
     * @return the path sum
     */
    public PathSum pathSum() {
        return sum;
    }

    /**
     * The enclosure's shielding effectiveness, −20·log10 τ with τ the combined
     * transmission of all paths (capped at 1, so never below 0 dB).
     *
     * @return SE in dB, 0 or more
     */
    @Override
    public double shieldingEffectivenessDb() {
        return totalDb;
    }

    /**
     * The enclosure's shielding effectiveness.
     *
     * @return SE
     */
    @Override
    public Decibels shieldingEffectiveness() {
        return Decibels.of(totalDb);
    }

    /**
     * Every path, the wall first, then the openings in the order they were added.
     *
     * @return an unmodifiable list
     */
    public List<LeakagePath> paths() {
        return paths;
    }

    /**
     * The path through the wall.
     *
     * @return the wall path
     */
    public LeakagePath wall() {
        return paths.get(0);
    }

    /**
     * The path that limits the enclosure: the one of lowest SE (the first if several tie).
     *
     * @return the limiting path
     */
    public LeakagePath limitingPath() {
        LeakagePath w = paths.get(0);
        for (LeakagePath p : paths) {
            if (p.shieldingEffectivenessDb() < w.shieldingEffectivenessDb()) {
                w = p;
            }
        }
        return w;
    }

    /**
     * The notes on this result's validity: those of the wall model (a shell beyond the
     * quasi-static range, a planar wall's notes), and for holes in a uniform magnetic field a
     * hole not small against its distance to the victim ({@link ValidityNote.Limit#SMALL_HOLE})
     * and a hole in a high-permeability wall ({@link ValidityNote.Limit#HIGH_PERMEABILITY_OPENING}).
     *
     * @return an unmodifiable list, empty inside the limits
     */
    @Override
    public List<ValidityNote> validityNotes() {
        return notes;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "SE %.1f dB%s, limited by %s", totalDb,
                frequency == null ? " (static)" : " at " + frequency, limitingPath());
    }
}
