/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.bench;

/**
 * What a bench measurement of insertion loss says when held against a model: the
 * infinite-sheet coupling ({@link BenchComparison}), or a finite-plate prediction of the
 * axisymmetric solver (module {@code shield-axisymmetric}, where the constants mean the same
 * against the finite plate). The notes below are for the infinite sheet.
 */
public enum BenchVerdict {
    /** The model value lies within the measurement's uncertainty (and the model tolerance). */
    CONSISTENT,
    /**
     * The measurement is below the model beyond its uncertainty: expected with a finite plate,
     * because field leaks round its edges, so the measured loss saturates (often at 10–20 dB
     * between small coils) while the infinite-sheet value keeps rising.
     */
    BELOW_MODEL,
    /**
     * The measurement is above the model beyond its uncertainty: an infinite sheet is the best
     * a plate can do, so suspect the setup (coils moved or detuned when the plate went in, the
     * receiver overloaded or picking up the drive directly, a ground loop, the wrong material
     * data, or a reading at the noise floor).
     */
    ABOVE_MODEL
}
