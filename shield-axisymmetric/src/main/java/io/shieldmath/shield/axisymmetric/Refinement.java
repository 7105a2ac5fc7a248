/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import java.util.function.DoubleFunction;
import java.util.function.ToDoubleBiFunction;
import java.util.function.ToDoubleFunction;

/**
 * The mesh sequence behind every result: meshes of fineness q/√2 and q (element sizes ∝ 1/q,
 * so unknowns roughly double per step), and with a tolerance, q·√2, 2q, ... until two
 * successive results agree within it.
 */
final class Refinement {

    /** The fineness ratio between successive meshes. */
    static final double STEP = Math.sqrt(2);
    /** The most refinement steps a tolerance may take beyond the starting mesh. */
    static final int MAX_STEPS = 8;

    private Refinement() {
    }

    record Outcome<T>(T fine, T coarse, double change, double fineness) {
    }

    /**
     * Runs the sequence.
     *
     * @param stage     solves on the mesh of a fineness
     * @param metric    the result in dB that must converge
     * @param change    the change between two results in dB (for sweeps the largest over frequencies)
     * @param fineness  the starting fineness
     * @param tolerance the tolerance in dB, or NaN for the plain pair of meshes
     * @param what      the evaluation, for messages
     */
    static <T> Outcome<T> run(DoubleFunction<T> stage, ToDoubleFunction<T> metric, ToDoubleBiFunction<T, T> change,
                              double fineness, double tolerance, String what) {
        T coarse = stage.apply(fineness / STEP);
        T fine = stage.apply(fineness);
        double d = change.applyAsDouble(fine, coarse);
        if (Double.isNaN(tolerance)) {
            return new Outcome<>(fine, coarse, d, fineness);
        }
        double q = fineness;
        for (int step = 0; d > tolerance; step++) {
            if (step == MAX_STEPS) {
                throw new ToleranceNotReachedException(what, tolerance, metric.applyAsDouble(fine), d,
                        MAX_STEPS + " refinement steps taken");
            }
            T next;
            try {
                next = stage.apply(q * STEP);
            } catch (MeshTooLargeException e) {
                throw new ToleranceNotReachedException(what, tolerance, metric.applyAsDouble(fine), d,
                        "the next mesh exceeds the size cap: " + e.getMessage());
            }
            q *= STEP;
            coarse = fine;
            fine = next;
            d = change.applyAsDouble(fine, coarse);
        }
        return new Outcome<>(fine, coarse, d, q);
    }
}
