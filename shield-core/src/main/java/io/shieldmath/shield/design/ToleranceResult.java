/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.internal.Require;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The distribution of SE from a {@link ToleranceStudy}. Immutable and thread-safe.
 */
public final class ToleranceResult {

    private final double nominalDb;
    private final double targetDb;
    private final double[] sorted;
    private final double mean;
    private final double standardDeviation;
    private final double probability;
    private final long redrawn;
    private final List<String> notes;

    /** A result with no sample drawn again; takes {@code values} over (sorts it in place). */
    ToleranceResult(double nominalDb, double targetDb, double[] values) {
        this(nominalDb, targetDb, values, 0, List.of());
    }

    /**
     * A result; takes {@code values} over and sorts it in place, so that a run at its cap holds
     * its values once.
     */
    ToleranceResult(double nominalDb, double targetDb, double[] values, long redrawn, List<String> notes) {
        this.nominalDb = nominalDb;
        this.targetDb = targetDb;
        this.sorted = values;
        this.redrawn = redrawn;
        this.notes = List.copyOf(notes);
        Arrays.sort(sorted);
        double sum = 0;
        for (double v : sorted) {
            sum += v;
        }
        double m = sum / sorted.length;
        double ss = 0;
        long meeting = 0;
        for (double v : sorted) {
            ss += (v - m) * (v - m);
            if (v >= targetDb) {
                meeting++;
            }
        }
        this.mean = m;
        this.standardDeviation = sorted.length > 1 ? Math.sqrt(ss / (sorted.length - 1)) : 0;
        this.probability = (double) meeting / sorted.length;
    }

    /**
     * The SE of the nominal design, dB.
     *
     * @return the nominal SE
     */
    public double nominalDb() {
        return nominalDb;
    }

    /**
     * The mean SE of the samples, dB.
     *
     * @return the mean
     */
    public double meanDb() {
        return mean;
    }

    /**
     * The sample standard deviation of SE, dB.
     *
     * @return the standard deviation (0 for one sample)
     */
    public double standardDeviationDb() {
        return standardDeviation;
    }

    /**
     * A percentile of SE, interpolated linearly between order statistics (the R-7 /
     * spreadsheet definition: position (n − 1)·p/100).
     *
     * @param percent the percentile, from 0 to 100
     * @return the SE below which {@code percent} % of the samples lie, dB
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code percent} is outside 0 to 100
     */
    public double percentileDb(double percent) {
        Require.inRange("percentile", percent, 0, 100, "%");
        double pos = (sorted.length - 1) * percent / 100;
        int i = (int) Math.floor(pos);
        int j = Math.min(sorted.length - 1, i + 1);
        return sorted[i] + (pos - i) * (sorted[j] - sorted[i]);
    }

    /**
     * The fraction of samples whose SE meets the target.
     *
     * @return from 0 to 1
     */
    public double probabilityOfMeeting() {
        return probability;
    }

    /**
     * The target SE, dB.
     *
     * @return the target
     */
    public double targetDb() {
        return targetDb;
    }

    /**
     * The number of samples.
     *
     * @return the count
     */
    public int samples() {
        return sorted.length;
    }

    /**
     * The number of samples in which at least one property was drawn again because its first
     * draw left its physical or documented range (see {@link ToleranceStudy}); 0 when every
     * first draw was in range. A large count means the tolerance reaches the edge of a range
     * and the distribution there is the spread conditioned on the range.
     *
     * @return from 0 to {@link #samples()}
     */
    public long redrawnSamples() {
        return redrawn;
    }

    /**
     * One sentence for each property and layer whose draws were repeated: the property, the
     * layer, the nominal value given, the tolerance and its spread, how many samples, and the
     * range that was kept. Empty when {@link #redrawnSamples()} is 0.
     *
     * @return an unmodifiable list
     */
    public List<String> rangeNotes() {
        return notes;
    }

    /**
     * The sample values in increasing order.
     *
     * @return a copy
     */
    public double[] sortedValuesDb() {
        return sorted.clone();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%d samples: mean %.2f dB, sd %.2f dB, 5 %% %.2f dB, 95 %% %.2f dB, "
                + "P(SE ≥ %.1f dB) = %.3f", sorted.length, mean, standardDeviation, percentileDb(5),
                percentileDb(95), targetDb, probability)
                + (redrawn == 0 ? "" : String.format(Locale.ROOT, "; %d samples drawn again to stay in range", redrawn));
    }
}
