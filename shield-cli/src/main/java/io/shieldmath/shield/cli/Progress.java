/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.io.PrintStream;
import java.util.Locale;

/**
 * Progress of a long run on standard error, never on standard output: once the run has taken
 * longer than a threshold (about a second), one short line per frequency evaluated, such as
 * {@code shield-batch: frequency 3 of 21 (2500 Hz) done, 1.4 s}, and before it, for the
 * finite-element solver, one per mesh of its refinement, such as
 * {@code shield-batch: frequency 3 of 21 (2500 Hz): solving a mesh of fineness 0.707 with 5123 unknowns, 1.1 s}.
 * Runs shorter than the threshold say nothing.
 */
final class Progress {

    /** The default threshold: a second. */
    static final long AFTER_NANOS = 1_000_000_000L;

    private final PrintStream err;
    private final long afterNanos;
    private final long start;

    /**
     * Progress from now.
     *
     * @param err        standard error
     * @param afterNanos how long the run must have taken before lines are written, ns
     */
    Progress(PrintStream err, long afterNanos) {
        this.err = err;
        this.afterNanos = afterNanos;
        this.start = System.nanoTime();
    }

    /**
     * Reports one frequency done, if the run has taken long enough.
     *
     * @param what which frequency, in words, such as {@code "frequency 3 of 21"}
     * @param hz   the frequency, Hz
     */
    void done(String what, double hz) {
        line(what + " (" + ResultOutput.shortest(hz) + " Hz) done, ");
    }

    /**
     * Reports a mesh about to be solved for a frequency (a stage of the solver's refinement), if
     * the run has taken long enough.
     *
     * @param what     which frequency, in words, such as {@code "frequency 3 of 21"}
     * @param hz       the frequency, Hz
     * @param fineness the mesh's fineness
     * @param unknowns its number of unknowns
     */
    void mesh(String what, double hz, double fineness, int unknowns) {
        line(what + " (" + ResultOutput.shortest(hz) + " Hz): solving a mesh of fineness "
                + String.format(Locale.ROOT, "%.3g with %d unknowns, ", fineness, unknowns));
    }

    /** Writes a line ending in the time taken so far, if that is long enough. */
    private void line(String text) {
        long t = System.nanoTime() - start;
        if (t >= afterNanos) {
            err.println(BatchCommand.NAME + ": " + text + String.format(Locale.ROOT, "%.1f s", t / 1e9));
            err.flush();
        }
    }
}
