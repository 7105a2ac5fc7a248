/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import java.util.Locale;

/**
 * The magnetic flux density at one point as peak phasors (e^{jωt}; real for a static field):
 * the radial and axial components, in tesla, and the discretisation estimate of its
 * magnitude. Immutable and thread-safe.
 *
 * @param point        where
 * @param radialRe     Re B_r in T
 * @param radialIm     Im B_r in T
 * @param axialRe      Re B_z in T
 * @param axialIm      Im B_z in T
 * @param estimateTesla the change of |B| from the coarser mesh, in T
 */
public record FluxDensitySample(Point point, double radialRe, double radialIm, double axialRe, double axialIm,
                                double estimateTesla) {

    /**
     * The peak magnitude sqrt(|B_r|² + |B_z|²) (for a rotating or elliptic field the largest
     * instantaneous magnitude is smaller than or equal to this).
     *
     * @return |B| in T, 0 or more
     */
    public double magnitudeTesla() {
        return Math.hypot(Math.hypot(radialRe, radialIm), Math.hypot(axialRe, axialIm));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "|B| %.6g T ± %.2g T at %s", magnitudeTesla(), estimateTesla, point);
    }
}
