/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.quantity.Length;

/**
 * The answer of {@link ThicknessSolver}: the thinnest wall that meets the target, or
 * the statement that none up to the limit does, with the shortfall. Immutable and
 * thread-safe.
 *
 * <p>What is optimised: the model's own result. For a planar barrier that is an infinite
 * sheet, and for a shell a closed shell without seams; real plates lose field round their
 * edges and real enclosures through seams and holes, so a design found here is an upper
 * estimate until it is checked with a finite-geometry model (the axisymmetric module, an
 * enclosure with its openings) or by measurement.
 */
public final class ThicknessSolution {

    private final boolean found;
    private final double targetDb;
    private final Length thickness;
    private final BandSearch.WorstCase worst;
    private final String explanation;

    private ThicknessSolution(boolean found, double targetDb, Length thickness, BandSearch.WorstCase worst,
                              String explanation) {
        this.found = found;
        this.targetDb = targetDb;
        this.thickness = thickness;
        this.worst = worst;
        this.explanation = explanation;
    }

    static ThicknessSolution found(double targetDb, Length t, BandSearch.WorstCase worst, String why) {
        return new ThicknessSolution(true, targetDb, t, worst, why);
    }

    static ThicknessSolution notFound(double targetDb, Length limit, BandSearch.WorstCase worst, String why) {
        return new ThicknessSolution(false, targetDb, limit, worst, why);
    }

    /**
     * Whether a thickness within the limit meets the target.
     *
     * @return true if found
     */
    public boolean isFound() {
        return found;
    }

    /**
     * The thinnest wall that meets the target.
     *
     * @return the thickness
     * @throws IllegalStateException if none was found (the message says why)
     */
    public Length thickness() {
        if (!found) {
            throw new IllegalStateException(explanation);
        }
        return thickness;
    }

    /**
     * The worst case in the band at the returned thickness, or at the limit when none was found.
     *
     * @return the worst SE and its frequency
     */
    public BandSearch.WorstCase worst() {
        return worst;
    }

    /**
     * The target SE in dB.
     *
     * @return the target
     */
    public double targetDb() {
        return targetDb;
    }

    /**
     * A sentence that explains the answer, with numbers and units.
     *
     * @return the explanation
     */
    public String explanation() {
        return explanation;
    }

    @Override
    public String toString() {
        return explanation;
    }
}
