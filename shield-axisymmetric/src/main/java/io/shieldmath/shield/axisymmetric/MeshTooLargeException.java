/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

/**
 * Thrown when the mesh an evaluation needs would exceed the size cap: at most
 * {@value #MAX_BAND_ENTRIES} band entries per factorisation (two {@code double} arrays of
 * that length, 256 MB together) and at most the evaluation's unknowns cap (by default
 * {@value CoilCoupling#DEFAULT_MAX_UNKNOWNS}). Typical causes: a very high frequency (the
 * skin depth, and with it the first element, becomes tiny against the bodies), a very thin
 * body far from the axis, or a fineness set too high.
 */
public final class MeshTooLargeException extends IllegalStateException {

    private static final long serialVersionUID = 1L;

    /** The largest band storage of one factorisation, entries per part (real or imaginary). */
    public static final long MAX_BAND_ENTRIES = 16_000_000L;

    /** The unknowns the refused mesh would have had. */
    private final int unknowns;
    /** The cap in force. */
    private final int maxUnknowns;

    MeshTooLargeException(String what, int unknowns, long bandEntries, int maxUnknowns, double fineness) {
        super("the mesh for " + what + " at fineness " + (float) fineness + " would have " + unknowns
                + " unknowns and " + bandEntries + " band entries; the cap is " + maxUnknowns + " unknowns and "
                + MAX_BAND_ENTRIES + " band entries: lower the fineness or the tolerance, or the highest frequency");
        this.unknowns = unknowns;
        this.maxUnknowns = maxUnknowns;
    }

    /**
     * The unknowns the refused mesh would have had.
     *
     * @return the count
     */
    public int unknowns() {
        return unknowns;
    }

    /**
     * The cap on unknowns that was in force.
     *
     * @return the cap
     */
    public int maxUnknowns() {
        return maxUnknowns;
    }
}
