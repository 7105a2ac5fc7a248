/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import java.util.List;

/**
 * The results of a planar barrier at a series of frequencies, in increasing order.
 *
 * <p>Immutable and thread-safe; the array accessors return copies.
 */
public final class PlanarSweep {

    private final List<PlanarResult> results;

    PlanarSweep(List<PlanarResult> results) {
        this.results = List.copyOf(results);
    }

    /**
     * The results, one per frequency.
     *
     * @return an unmodifiable list
     */
    public List<PlanarResult> results() {
        return results;
    }

    /**
     * The number of points.
     *
     * @return the size
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
        double[] f = new double[results.size()];
        for (int i = 0; i < f.length; i++) {
            f[i] = results.get(i).frequency().toHertz();
        }
        return f;
    }

    /**
     * The total SE at each frequency, in dB.
     *
     * @return a new array
     */
    public double[] totalDb() {
        double[] v = new double[results.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = results.get(i).totalDb();
        }
        return v;
    }

    /**
     * The point of lowest SE (the first one if several tie).
     *
     * @return the worst result
     */
    public PlanarResult worst() {
        PlanarResult w = results.get(0);
        for (PlanarResult r : results) {
            if (r.totalDb() < w.totalDb()) {
                w = r;
            }
        }
        return w;
    }

    @Override
    public String toString() {
        return "sweep of " + results.size() + " points, worst " + worst();
    }
}
