/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.Locale;

/**
 * Where a sweep of applied fields first drives a body near saturation: the body, and the
 * applied field at which its peak flux density reaches {@value SaturationStudy#THRESHOLD} of
 * its saturation flux density (log-log interpolation between the two sweep points that
 * bracket it, so its precision is that of the sweep's spacing). Immutable.
 *
 * @param body        the body's name
 * @param applied     the applied field strength at the onset
 * @param saturation  the body's saturation flux density
 * @param belowSweep  true if the body was already past the threshold at the sweep's first field
 *                    (the onset is then at or below {@code applied})
 */
public record SaturationOnset(String body, MagneticFieldStrength applied, MagneticFluxDensity saturation,
                              boolean belowSweep) {

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "body '%s' reaches %.0f %% of its saturation flux density (%s) at an applied "
                + "field of %s%s", body, 100 * SaturationStudy.THRESHOLD, saturation, belowSweep ? "or below " : "about ",
                applied);
    }
}
