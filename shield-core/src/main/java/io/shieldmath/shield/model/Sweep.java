/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.model;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Frequency;
import java.util.ArrayList;
import java.util.List;

/**
 * The results of one model at a series of frequencies in increasing order: the one sweep
 * type of every model.
 *
 * <p>A sweep samples; it does not search. {@link #lowestSampled()} is the lowest of the
 * points computed, and a narrow resonance dip between two points is not seen. For the
 * worst case over a band use {@code io.shieldmath.shield.design.BandSearch}.
 *
 * <p>Immutable and thread-safe; the array accessors return copies. Equality is identity:
 * compare {@link #shieldingEffectivenessDb()} and {@link #frequenciesHertz()} instead.
 *
 * @param <R> the model's result type
 */
public final class Sweep<R extends ShieldingResult> {

    /** The most points in one sweep. */
    public static final int MAX_POINTS = 1_000_000;

    private final double[] hertz;
    private final List<R> results;

    private Sweep(double[] hertz, List<R> results) {
        this.hertz = hertz;
        this.results = List.copyOf(results);
    }

    /**
     * Evaluates a model at the given frequencies.
     *
     * @param <R>   the model's result type
     * @param model the model, not null
     * @param hertz the frequencies in Hz, increasing, 1 to {@value #MAX_POINTS} of them, not null
     * @return the sweep
     * @throws IllegalArgumentException if there are no frequencies, too many, or they do not increase
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a frequency is outside the
     *         model's valid band
     */
    public static <R extends ShieldingResult> Sweep<R> of(ShieldingModel<R> model, double[] hertz) {
        Require.nonNull("model", model);
        double[] f = Require.nonNull("frequencies", hertz).clone();
        checkPoints(f.length);
        for (int i = 1; i < f.length; i++) {
            if (!(f[i] > f[i - 1])) {
                throw new IllegalArgumentException("sweep frequencies must increase; frequency [" + i + "] is "
                        + f[i] + " Hz after " + f[i - 1] + " Hz");
            }
        }
        List<R> out = new ArrayList<>(f.length);
        for (double x : f) {
            out.add(model.at(Frequency.ofHertz(x)));
        }
        return new Sweep<>(f, out);
    }

    /**
     * A sweep of results already computed, for a model that solves many frequencies at once
     * (for example on one mesh) instead of one {@link ShieldingModel#at} call per point.
     *
     * @param <R>     the model's result type
     * @param hertz   the frequencies in Hz, increasing, 1 to {@value #MAX_POINTS} of them, not null
     * @param results the result at each frequency, as many as frequencies, none null, not null
     * @return the sweep
     * @throws IllegalArgumentException if there are no frequencies, too many, they do not increase,
     *                                  or the counts differ
     */
    public static <R extends ShieldingResult> Sweep<R> ofResults(double[] hertz, List<R> results) {
        double[] f = Require.nonNull("frequencies", hertz).clone();
        Require.nonNull("results", results);
        checkPoints(f.length);
        for (int i = 0; i < f.length; i++) {
            if (!(f[i] > 0) || Double.isInfinite(f[i]) || (i > 0 && !(f[i] > f[i - 1]))) {
                throw new IllegalArgumentException("sweep frequencies must be finite, above 0 Hz and increase; "
                        + "frequency [" + i + "] is " + f[i] + " Hz" + (i > 0 ? " after " + f[i - 1] + " Hz" : ""));
            }
        }
        if (results.size() != f.length) {
            throw new IllegalArgumentException("a sweep of " + f.length + " frequencies needs as many results; got "
                    + results.size());
        }
        for (int i = 0; i < f.length; i++) {
            if (results.get(i) == null) {
                throw new IllegalArgumentException("sweep result [" + i + "] at " + f[i] + " Hz is null");
            }
        }
        return new Sweep<>(f, results);
    }

    static void checkPoints(int points) {
        if (points < 1 || points > MAX_POINTS) {
            throw new IllegalArgumentException("number of sweep points must be from 1 to " + MAX_POINTS
                    + "; got " + points);
        }
    }

    /**
     * The results, one per frequency.
     *
     * @return an unmodifiable list
     */
    public List<R> results() {
        return results;
    }

    /**
     * One result.
     *
     * @param index the point's index, 0 for the lowest frequency
     * @return the result
     * @throws IndexOutOfBoundsException if there is no such point
     */
    public R get(int index) {
        return results.get(index);
    }

    /**
     * The number of points.
     *
     * @return 1 or more
     */
    public int size() {
        return results.size();
    }

    /**
     * The frequencies in Hz.
     *
     * @return a new array
     */
    public double[] frequenciesHertz() {
        return hertz.clone();
    }

    /**
     * The frequency of one point.
     *
     * @param index the point's index
     * @return the frequency
     * @throws IndexOutOfBoundsException if there is no such point
     */
    public Frequency frequency(int index) {
        return Frequency.ofHertz(hertz[index]);
    }

    /**
     * The shielding effectiveness at each frequency, in dB.
     *
     * @return a new array
     */
    public double[] shieldingEffectivenessDb() {
        double[] v = new double[results.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = results.get(i).shieldingEffectivenessDb();
        }
        return v;
    }

    /**
     * The index of the sampled point of lowest SE (the first one if several tie). Only the
     * points computed are compared: see the class note.
     *
     * @return the index
     */
    public int lowestSampledIndex() {
        int w = 0;
        for (int i = 1; i < results.size(); i++) {
            if (results.get(i).shieldingEffectivenessDb() < results.get(w).shieldingEffectivenessDb()) {
                w = i;
            }
        }
        return w;
    }

    /**
     * The sampled point of lowest SE (the first one if several tie). Only the points
     * computed are compared: see the class note.
     *
     * @return the result
     */
    public R lowestSampled() {
        return results.get(lowestSampledIndex());
    }

    @Override
    public String toString() {
        return "sweep of " + results.size() + " points from " + frequency(0) + " to " + frequency(hertz.length - 1)
                + ", lowest sampled: " + lowestSampled();
    }
}
