/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * Where a sweep of applied fields first drives a body near saturation: the body, and the
 * applied field at which its peak flux density reaches {@value SaturationStudy#THRESHOLD} of
 * its saturation flux density (log-log interpolation between the two sweep points that
 * bracket it, so its precision is that of the sweep's spacing). Immutable.
 *
 * <p>{@link #toString()} names the body, its saturation flux density and the applied field,
 * as field strength and as the flux density B0 = µ0·H0 it makes in air, both to three
 * significant digits (the sweep's interpolation is not finer than that), for example
 * {@code body 'can' reaches 80 % of its saturation flux density (750 mT) at an applied field
 * of about 7.4 kA/m (9.3 mT in air)}.
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
        MagneticFieldStrength h = MagneticFieldStrength.ofAmperesPerMetre(threeDigits(applied.toAmperesPerMetre()));
        MagneticFluxDensity b = MagneticFluxDensity.ofTesla(threeDigits(applied.toFluxDensityInAir().toTesla()));
        return String.format(Locale.ROOT, "body '%s' reaches %.0f %% of its saturation flux density (%s) %s %s (%s in air)",
                body, 100 * SaturationStudy.THRESHOLD, saturation,
                belowSweep ? "at or below an applied field of" : "at an applied field of about", h, b);
    }

    /** A positive value rounded to three significant digits (half up), for display. */
    private static double threeDigits(double v) {
        return new BigDecimal(v).round(new MathContext(3, RoundingMode.HALF_UP)).doubleValue();
    }
}
