/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The flux density a static ambient field drives through each wall of a shell, against
 * the saturation flux density of the alloy.
 *
 * <p>The hand estimates (common practice, no source; the flux the shell gathers over its cross-section
 * flows along the wall): B ≈ µ0·H0·D/t for a long cylinder across the field,
 * B ≈ (3/2)·µ0·H0·R/t for a sphere, with D = 2R the mean diameter and t the wall
 * thickness; they are the limit µr → ∞ of a thin wall. This class reports the flux
 * density of the exact linear-µ solution instead (mean over the wall's thickness, at
 * the place where the tangential flux is largest). It tends to the hand estimate for a
 * thin wall (t ≪ R) with µr·t/R ≫ 1, and is lower for walls of lower µr·t/R, because part
 * of the field then goes through the cavity rather than along the wall. It can also be
 * higher: a thick wall of high µr gathers the flux over its outer cross-section, so the
 * exact value exceeds the hand estimate (which uses the mean radius R) by up to about
 * (b/R)², b the outer radius (a sphere: (b/R)²; a cylinder across the field: about b/R). The
 * hand estimates are therefore not an upper bound; this class's exact value is the one to
 * compare with saturation. For an infinite cylinder along the
 * field the wall simply sits in the field: B = µr·µ0·H0, whatever its thickness.
 *
 * <p>The warning threshold is {@value #WARNING_FRACTION} of the saturation flux density.
 * Well before saturation the permeability of a soft magnetic alloy already changes with
 * flux density, so the linear model itself is then no longer reliable. The suggested
 * minimum thickness of a wall is the thickness that brings its flux density down to the
 * threshold by the 1/t law of the hand estimates, t_min = t·B/(0.5·B_sat); it is not
 * defined along the axis of a cylinder.
 *
 * <p>Saturation is a matter of the peak field: for an alternating ambient field give its
 * peak amplitude (this check uses µ'(0), so it is meant for static and low-frequency
 * fields). Immutable and thread-safe.
 */
public final class SaturationCheck {

    /** The fraction of the saturation flux density at which the check warns. */
    public static final double WARNING_FRACTION = io.shieldmath.shield.internal.Numerics.SATURATION_WARNING_FRACTION;

    private final StaticShielding statics;
    private final MagneticFieldStrength ambient;
    private final MagneticFluxDensity saturation;
    private final double[] wallTesla;

    SaturationCheck(StaticShielding statics, MagneticFieldStrength ambient, MagneticFluxDensity saturation) {
        this.statics = statics;
        this.ambient = ambient;
        this.saturation = saturation;
        Shell s = statics.shell();
        double b0 = PhysicalConstants.MU_0 * ambient.toAmperesPerMetre();
        wallTesla = new double[s.walls().size()];
        for (int w = 0; w < wallTesla.length; w++) {
            wallTesla[w] = b0 * Math.exp(statics.wallLogFlux(s.wallLayer[w]));
        }
    }

    /**
     * The ambient field strength.
     *
     * @return H0
     */
    public MagneticFieldStrength ambient() {
        return ambient;
    }

    /**
     * The saturation flux density compared with.
     *
     * @return B_sat
     */
    public MagneticFluxDensity saturationFluxDensity() {
        return saturation;
    }

    /**
     * The number of walls checked.
     *
     * @return the wall count
     */
    public int wallCount() {
        return wallTesla.length;
    }

    /**
     * The mean flux density in a wall, from the exact linear-µ solution.
     *
     * @param wall the wall's index, 0 for the innermost
     * @return B in the wall
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public MagneticFluxDensity wallFluxDensity(int wall) {
        return MagneticFluxDensity.ofTesla(wallTesla[wall]);
    }

    /**
     * The hand estimate for a wall alone in the ambient field: µ0·H0·D/t (cylinder
     * across the field), (3/2)·µ0·H0·R/t (sphere), µr·µ0·H0 (cylinder along the field).
     *
     * @param wall the wall's index, 0 for the innermost
     * @return the estimate
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public MagneticFluxDensity handEstimate(int wall) {
        Wall w = statics.shell().walls().get(wall);
        double b0 = PhysicalConstants.MU_0 * ambient.toAmperesPerMetre();
        double r = w.meanMetres();
        double t = w.thicknessMetres();
        switch (statics.shell().geometry()) {
            case SPHERE:
                return MagneticFluxDensity.ofTesla(1.5 * b0 * r / t);
            case CYLINDER_TRANSVERSE:
                return MagneticFluxDensity.ofTesla(b0 * 2 * r / t);
            default:
                return MagneticFluxDensity.ofTesla(b0 * w.medium().permeability().staticValue());
        }
    }

    /**
     * The wall's flux density as a fraction of the saturation flux density.
     *
     * @param wall the wall's index, 0 for the innermost
     * @return B/B_sat
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public double fractionOfSaturation(int wall) {
        return wallTesla[wall] / saturation.toTesla();
    }

    /**
     * Whether any wall is at or above {@value #WARNING_FRACTION} of saturation.
     *
     * @return true if the result needs a warning
     */
    public boolean isWarning() {
        return highestFraction() >= WARNING_FRACTION;
    }

    /**
     * Whether any wall is at or above saturation by the linear model.
     *
     * @return true if saturated
     */
    public boolean isSaturated() {
        return highestFraction() >= 1;
    }

    private double highestFraction() {
        double m = 0;
        for (int w = 0; w < wallTesla.length; w++) {
            m = Math.max(m, fractionOfSaturation(w));
        }
        return m;
    }

    /**
     * The thickness that brings a wall down to {@value #WARNING_FRACTION} of saturation,
     * t·B/(0.5·B_sat) (may be less than the present thickness).
     *
     * @param wall the wall's index, 0 for the innermost
     * @return the thickness, or empty for a cylinder along the field (no thickness helps there)
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public Optional<Length> suggestedMinimumThickness(int wall) {
        if (statics.shell().geometry() == ShellGeometry.CYLINDER_AXIAL || wallTesla[wall] == 0) {
            return Optional.empty();
        }
        double t = statics.shell().walls().get(wall).thicknessMetres();
        return Optional.of(Length.ofMetres(t * wallTesla[wall] / (WARNING_FRACTION * saturation.toTesla())));
    }

    /**
     * Plain-text warnings, one per wall at or above the threshold (empty if none).
     *
     * @return an unmodifiable list
     */
    public List<String> warnings() {
        List<String> out = new ArrayList<>();
        for (int w = 0; w < wallTesla.length; w++) {
            double f = fractionOfSaturation(w);
            if (f >= WARNING_FRACTION) {
                String thick = suggestedMinimumThickness(w).map(t -> "; make it at least " + t + " thick")
                        .orElse("");
                out.add(String.format(java.util.Locale.ROOT,
                        "wall %d carries %s, %.0f %% of the saturation flux density %s%s; the linear-µ "
                                + "shielding factor overstates the shielding there", w + 1, wallFluxDensity(w),
                        100 * f, saturation, thick));
            }
        }
        return List.copyOf(out);
    }

    @Override
    public String toString() {
        return isWarning() ? String.join("; ", warnings()) : "no wall above " + (int) (100 * WARNING_FRACTION)
                + " % of saturation";
    }
}
