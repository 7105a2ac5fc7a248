/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.quantity.Frequency;
import java.util.List;
import java.util.Locale;

/**
 * The margin of a design against a {@link Requirement}, band by band, with the worst
 * band named. Immutable and thread-safe.
 *
 * <p>What is optimised: the model's own result. For a planar barrier that is an infinite
 * sheet, and for a shell a closed shell without seams; real plates lose field round their
 * edges and real enclosures through seams and holes, so a design found here is an upper
 * estimate until it is checked with a finite-geometry model (the axisymmetric module, an
 * enclosure with its openings) or by measurement.
 */
public final class MarginReport {

    private final List<Line> lines;
    private final Line worst;

    MarginReport(List<Line> lines) {
        this.lines = List.copyOf(lines);
        Line w = lines.get(0);
        for (Line l : lines) {
            if (l.marginDb() < w.marginDb()) {
                w = l;
            }
        }
        this.worst = w;
    }

    /**
     * One line per requirement entry, in the requirement's order.
     *
     * @return an unmodifiable list
     */
    public List<Line> lines() {
        return lines;
    }

    /**
     * The line with the smallest margin: the band that limits the design.
     *
     * @return the worst line
     */
    public Line worst() {
        return worst;
    }

    /**
     * The smallest margin in dB (negative: the requirement is missed).
     *
     * @return the worst margin
     */
    public double worstMarginDb() {
        return worst.marginDb();
    }

    /**
     * Whether every band meets its requirement.
     *
     * @return true if the worst margin is 0 dB or more
     */
    public boolean meets() {
        return worst.marginDb() >= 0;
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder(meets() ? "meets the requirement" : "misses the requirement");
        s.append(String.format(Locale.ROOT, "; worst margin %.1f dB at %s", worstMarginDb(), worst.frequency()));
        return s.toString();
    }

    /**
     * The margin in one band.
     *
     * @param entry      the requirement entry
     * @param frequency  where the design's SE is lowest in the band
     * @param seDb       that lowest SE, dB
     * @param marginDb   seDb minus the required SE, dB
     */
    public record Line(Requirement.Entry entry, Frequency frequency, double seDb, double marginDb) {
    }
}
