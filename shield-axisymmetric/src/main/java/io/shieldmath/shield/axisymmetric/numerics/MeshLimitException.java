/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * Thrown by {@link Mesh} when a grid would exceed its size limits; the public layer turns it
 * into a message that names the limit and the arrangement.
 */
public final class MeshLimitException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** The unknowns the grid would have. */
    public final int unknowns;
    /** The band entries the grid would need. */
    public final long bandEntries;
    /** The unknowns allowed. */
    public final int maxUnknowns;
    /** The band entries allowed. */
    public final long maxBandEntries;

    MeshLimitException(int unknowns, long bandEntries, int maxUnknowns, long maxBandEntries) {
        super("the mesh would have " + unknowns + " unknowns and " + bandEntries + " band entries; the limits are "
                + maxUnknowns + " unknowns and " + maxBandEntries + " band entries");
        this.unknowns = unknowns;
        this.bandEntries = bandEntries;
        this.maxUnknowns = maxUnknowns;
        this.maxBandEntries = maxBandEntries;
    }
}
