/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.io.PrintStream;
import java.util.Locale;

/**
 * Progress of a long run on standard error, never on standard output: once the run has taken
 * longer than a threshold (about a second), one short line per frequency evaluated, such as
 * {@code shield-batch: frequency 3 of 21 (2500 Hz) done, 1.4 s}. Runs shorter than the
 * threshold say nothing.
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
        long t = System.nanoTime() - start;
        if (t >= afterNanos) {
            err.println(BatchCommand.NAME + ": " + what + " (" + ResultOutput.shortest(hz) + " Hz) done, "
                    + String.format(Locale.ROOT, "%.1f s", t / 1e9));
            err.flush();
        }
    }
}
