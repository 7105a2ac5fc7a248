/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.SaturableSolve;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.ShieldingFactor;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The self-consistent field of bodies that may saturate, in one applied field: the
 * shielding factor over the sensor region, and per saturable body the peak flux density and
 * the fraction of its volume above {@value SaturationStudy#THRESHOLD} of its saturation
 * flux density. At frequency, flux densities are peak values over a period of the
 * first-harmonic solution. Immutable and thread-safe.
 */
public final class SaturationSolution {

    private final SaturationStudy study;
    private final MagneticFieldStrength applied;
    private final double hertz;
    private final SaturableSolve.Outcome fine;
    private final SaturableSolve.Outcome coarse;
    private final String what;

    SaturationSolution(SaturationStudy study, MagneticFieldStrength applied, double hertz, SaturableSolve.Outcome fine,
                       SaturableSolve.Outcome coarse, String what) {
        this.study = study;
        this.applied = applied;
        this.hertz = hertz;
        this.fine = fine;
        this.coarse = coarse;
        this.what = what;
    }

    /**
     * The applied field strength.
     *
     * @return H0 (peak at frequency)
     */
    public MagneticFieldStrength appliedField() {
        return applied;
    }

    /**
     * The frequency.
     *
     * @return f in Hz, 0 for a static field
     */
    public double hertz() {
        return hertz;
    }

    /**
     * The smallest shielding factor B0/|B| over the sensor region.
     *
     * @return S
     */
    public ShieldingFactor worstShieldingFactor() {
        return ShieldingFactor.of(Math.pow(10, worstShieldingDb().value() / 20));
    }

    /**
     * The worst shielding factor as a level, with its discretisation estimate.
     *
     * @return 20·log10(S_worst) in dB and its change from the coarser mesh
     */
    public EstimatedValue worstShieldingDb() {
        double f = AxialFieldSolution.worstDb(fine.field(), study.evaluation().sensor(), what);
        double c = AxialFieldSolution.worstDb(coarse.field(), study.evaluation().sensor(), what);
        return new EstimatedValue(f, Math.abs(f - c));
    }

    private int saturable(String bodyName) {
        int k = study.bodyIndex(Require.nonNull("body name", bodyName));
        if (study.curve(k) == null) {
            throw new IllegalArgumentException("body '" + bodyName + "' has no magnetization curve in " + study);
        }
        return k;
    }

    /**
     * The largest flux density in a saturable body (at its Gauss points; the peak over a
     * period at frequency).
     *
     * @param bodyName the body's name, not null
     * @return |B|max with its change from the coarser mesh, in T
     * @throws IllegalArgumentException if no body has that name or the body has no curve
     */
    public EstimatedValue peakFluxDensityTesla(String bodyName) {
        int k = saturable(bodyName);
        double f = fine.peakTesla(k + 1);
        return new EstimatedValue(f, Math.abs(f - coarse.peakTesla(k + 1)));
    }

    /**
     * The largest flux density in a saturable body.
     *
     * @param bodyName the body's name, not null
     * @return |B|max
     * @throws IllegalArgumentException if no body has that name or the body has no curve
     */
    public MagneticFluxDensity peakFluxDensity(String bodyName) {
        return MagneticFluxDensity.ofTesla(peakFluxDensityTesla(bodyName).value());
    }

    /**
     * The fraction of a saturable body's volume whose flux density is above
     * {@value SaturationStudy#THRESHOLD} of its saturation flux density.
     *
     * @param bodyName the body's name, not null
     * @return the fraction, 0 to 1
     * @throws IllegalArgumentException if no body has that name or the body has no curve
     */
    public double fractionNearSaturation(String bodyName) {
        return fine.fractionAbove(saturable(bodyName) + 1);
    }

    /**
     * Whether a body's peak flux density is above {@value SaturationStudy#THRESHOLD} of its saturation flux density.
     *
     * @param bodyName the body's name, not null
     * @return true if near saturation
     * @throws IllegalArgumentException if no body has that name or the body has no curve
     */
    public boolean isNearSaturation(String bodyName) {
        int k = saturable(bodyName);
        return fine.peakTesla(k + 1) > SaturationStudy.THRESHOLD * study.curve(k).saturationTesla();
    }

    /**
     * The bodies whose peak flux density is above {@value SaturationStudy#THRESHOLD} of their saturation flux density.
     *
     * @return their names, in arrangement order
     */
    public List<String> bodiesNearSaturation() {
        List<String> out = new ArrayList<>();
        List<Body> bodies = study.bodies();
        for (int k = 0; k < bodies.size(); k++) {
            MagnetizationCurve c = study.curve(k);
            if (c != null && fine.peakTesla(k + 1) > SaturationStudy.THRESHOLD * c.saturationTesla()) {
                out.add(bodies.get(k).name());
            }
        }
        return List.copyOf(out);
    }

    /**
     * The iterations the finer mesh's solve took (one factorisation each).
     *
     * @return the count
     */
    public int iterations() {
        return fine.iterations();
    }

    /**
     * The convergence history of the finer mesh's solve: per iteration the largest relative
     * nodal update (static, Newton) or the largest relative change of a reluctivity
     * (alternating, fixed point).
     *
     * @return a copy
     */
    public double[] convergenceHistory() {
        return fine.history();
    }

    /**
     * The unknowns of the finer mesh.
     *
     * @return the count
     */
    public int unknowns() {
        return fine.field().mesh().unknowns();
    }

    /**
     * The flux density at a point.
     *
     * @param point the point, inside the solved region, not null
     * @return B in T for this solution's applied field (peak phasors at frequency), with its estimate
     * @throws IllegalArgumentException if the point is outside the far boundary
     */
    public FluxDensitySample fluxDensityAt(Point point) {
        Require.nonNull("point", point);
        Sampling.checkInside(fine.field(), point);
        double b0 = io.shieldmath.shield.quantity.PhysicalConstants.MU_0 * applied.toAmperesPerMetre();
        return Sampling.sample(fine.field(), coarse.field(), point, b0);
    }

    double peakTesla(int body) {
        return fine.peakTesla(body + 1);
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "%s%s: worst shielding %.3f dB",
                applied, hertz > 0 ? String.format(Locale.ROOT, " at %.6g Hz", hertz) : " static",
                worstShieldingDb().value()));
        List<Body> bodies = study.bodies();
        for (int k = 0; k < bodies.size(); k++) {
            MagnetizationCurve c = study.curve(k);
            if (c != null) {
                s.append(String.format(Locale.ROOT, "; '%s' peak %.4g T (%.0f %% of saturation), %.1f %% of it above %.0f %%",
                        bodies.get(k).name(), fine.peakTesla(k + 1), 100 * fine.peakTesla(k + 1) / c.saturationTesla(),
                        100 * fine.fractionAbove(k + 1), 100 * SaturationStudy.THRESHOLD));
            }
        }
        return s.append(String.format(Locale.ROOT, "; %d iterations", iterations())).toString();
    }
}
