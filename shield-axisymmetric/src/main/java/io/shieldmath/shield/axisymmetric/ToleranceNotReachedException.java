/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import java.util.Locale;

/**
 * Thrown when mesh refinement cannot bring two successive meshes within the requested
 * tolerance: the next mesh would exceed the size cap, or the refinement levels ran out. It
 * carries the best result reached and its estimate, so the caller may still use them.
 */
public final class ToleranceNotReachedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** The tolerance asked for, dB. */
    private final double tolerance;
    /** The best result reached, dB. */
    private final double bestValue;
    /** Its change from the mesh before, dB. */
    private final double bestEstimate;

    ToleranceNotReachedException(String what, double tolerance, double bestValue, double bestEstimate, String reason) {
        super(String.format(Locale.ROOT, "%s: the tolerance %.3g dB was not reached (%s); the best result is %.6g dB "
                + "with a change of %.3g dB from the mesh before it", what, tolerance, reason, bestValue, bestEstimate));
        this.tolerance = tolerance;
        this.bestValue = bestValue;
        this.bestEstimate = bestEstimate;
    }

    /**
     * The tolerance asked for.
     *
     * @return the tolerance in dB
     */
    public double tolerance() {
        return tolerance;
    }

    /**
     * The result on the finest mesh reached.
     *
     * @return the value in dB (insertion loss, or the worst shielding factor as a level)
     */
    public double bestValue() {
        return bestValue;
    }

    /**
     * The change of the best result from the mesh before it, its discretisation estimate.
     *
     * @return the estimate in dB
     */
    public double bestEstimate() {
        return bestEstimate;
    }
}
