/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import java.util.List;

/**
 * The results of a shell at a series of frequencies, in increasing order.
 *
 * <p>Immutable and thread-safe; the array accessors return copies.
 */
public final class ShellSweep {

    private final List<ShellResult> results;

    ShellSweep(List<ShellResult> results) {
        this.results = List.copyOf(results);
    }

    /**
     * The results, one per frequency.
     *
     * @return an unmodifiable list
     */
    public List<ShellResult> results() {
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
     * |S| in dB at each frequency.
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
     * The point of lowest |S| (the first one if several tie).
     *
     * @return the worst result
     */
    public ShellResult worst() {
        ShellResult w = results.get(0);
        for (ShellResult r : results) {
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
