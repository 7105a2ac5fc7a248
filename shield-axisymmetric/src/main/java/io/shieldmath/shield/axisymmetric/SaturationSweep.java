/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import java.util.List;
import java.util.Optional;

/**
 * Static saturation solutions over a series of applied fields: the shielding factor against
 * the applied field (flat at low fields, falling where a wall saturates) and the onset of
 * saturation. Immutable and thread-safe.
 */
public final class SaturationSweep {

    private final SaturationStudy study;
    private final List<SaturationSolution> points;

    SaturationSweep(SaturationStudy study, List<SaturationSolution> points) {
        this.study = study;
        this.points = List.copyOf(points);
    }

    /**
     * The solutions in order of rising applied field.
     *
     * @return an unmodifiable list
     */
    public List<SaturationSolution> points() {
        return points;
    }

    /**
     * The worst shielding factor at each applied field, as levels.
     *
     * @return 20·log10(S_worst) in dB, one per point
     */
    public double[] worstShieldingDb() {
        double[] out = new double[points.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = points.get(i).worstShieldingDb().value();
        }
        return out;
    }

    /**
     * The first body to reach {@value SaturationStudy#THRESHOLD} of its saturation flux
     * density and the applied field at which it does, if any body does within the sweep.
     *
     * @return the onset, or empty if no body gets there
     */
    public Optional<SaturationOnset> onset() {
        List<Body> bodies = study.bodies();
        SaturationOnset best = null;
        for (int k = 0; k < bodies.size(); k++) {
            MagnetizationCurve c = study.curve(k);
            if (c == null) {
                continue;
            }
            double limit = SaturationStudy.THRESHOLD * c.saturationTesla();
            for (int i = 0; i < points.size(); i++) {
                double b1 = points.get(i).peakTesla(k);
                if (b1 < limit) {
                    continue;
                }
                double h1 = points.get(i).appliedField().toAmperesPerMetre();
                double h;
                if (i == 0) {
                    h = h1;
                } else {
                    double b0 = points.get(i - 1).peakTesla(k);
                    double h0 = points.get(i - 1).appliedField().toAmperesPerMetre();
                    double t = Math.log(limit / b0) / Math.log(b1 / b0);
                    h = h0 * Math.pow(h1 / h0, t);
                }
                if (best == null || h < best.applied().toAmperesPerMetre()) {
                    best = new SaturationOnset(bodies.get(k).name(), MagneticFieldStrength.ofAmperesPerMetre(h),
                            c.saturation(), i == 0);
                }
                break;
            }
        }
        return Optional.ofNullable(best);
    }

    @Override
    public String toString() {
        return points.size() + " applied fields from " + points.get(0).appliedField() + " to "
                + points.get(points.size() - 1).appliedField() + onset().map(o -> "; " + o).orElse("; no body near saturation");
    }
}
