/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.Arrays;

/**
 * The anhysteretic (normal) magnetization curve of a soft magnetic material: a table of
 * points (H, B) through the origin, interpolated so that the permeability stays positive
 * and the magnetic energy stays convex, for nonlinear (saturation) field solutions.
 *
 * <p>Interpolation. The table is read as H(B), the form a vector-potential solver needs
 * (the reluctivity ν = H/B and its slope dH/dB at a flux density), and interpolated by a
 * piecewise cubic Hermite polynomial whose knot slopes are the weighted harmonic means of
 * the neighbouring secants, F. N. Fritsch and J. Butland, "A method for constructing
 * local monotone piecewise cubic interpolants", SIAM J. Sci. Stat. Comput. 5 (1984)
 * 300–304, the nonuniform form of the monotonicity conditions of F. N. Fritsch and
 * R. E. Carlson, SIAM J. Numer. Anal. 17 (1980) 238–246. Those slopes never exceed three
 * times the smaller neighbouring secant, which keeps each piece strictly increasing, so:
 * <ul>
 *   <li>dH/dB &gt; 0 everywhere: the differential permeability is positive and finite, and the
 *       inverse B(H) is a monotone function as well;</li>
 *   <li>the energy density w(B) = ∫₀^B H dB' is strictly convex, so the nonlinear
 *       magnetostatic problem has one solution and Newton's method with a line search on
 *       the energy converges to it;</li>
 *   <li>the secant permeability B/(µ0·H) is positive.</li>
 * </ul>
 * The end slopes depart from the textbook's three-point end formula, on purpose: at the
 * origin the slope is the first secant, which makes the initial permeability exactly
 * B₁/(µ0·H₁) of the first table point, the value a linear solve would use; at the last
 * point it is 1/µ0, the slope of the saturated line that follows (or three times the last
 * secant if that is smaller, the monotonicity bound). Beyond the last
 * point the material is taken as fully saturated, B = B_n + µ0·(H − H_n) (the
 * magnetisation stops rising), so every table segment must rise at least that steeply:
 * ΔB/ΔH ≥ µ0 (a segment below µ0 would mean a falling magnetisation).
 *
 * <p>Ranges: 1 to {@value #MAX_POINTS} points besides the origin, which is implied; H from
 * above 0 to 1e8 A/m, strictly increasing; B from above 0 to 5 T, strictly increasing; the
 * first secant permeability at most {@link RelativePermeability#MAX}; the saturation flux
 * density from 0.01 T to 3 T. The saturation flux density is the material's catalogue
 * value, used to judge how close a wall is to saturation; it is not an interpolation knot.
 *
 * <p>Caution: a magnetization curve depends on the anneal, on mechanical stress (bending,
 * drilling, welding after the final anneal) and on temperature. Typical curves are
 * estimates; a design that matters needs the measured curve of the actual material after
 * its last heat treatment. Hysteresis is not represented: this is the single-valued
 * curve through the tips of symmetric loops.
 *
 * <p>Immutable and thread-safe; the evaluation methods work on primitives and allocate
 * nothing, for the solvers' hot loops. Equality is by value.
 */
public final class MagnetizationCurve {

    /** The largest number of table points (the origin not counted). */
    public static final int MAX_POINTS = 1000;

    private static final double MU0 = PhysicalConstants.MU_0;

    /** Knots B_k in T, the origin first. */
    private final double[] b;
    /** Knots H_k in A/m, the origin first. */
    private final double[] h;
    /** Slopes dH/dB at the knots, A/(m·T). */
    private final double[] d;
    /** Energy density w(B_k) = ∫ H dB at the knots, J/m³. */
    private final double[] w;
    private final double saturation;

    private MagnetizationCurve(double[] b, double[] h, double[] d, double[] w, double saturation) {
        this.b = b;
        this.h = h;
        this.d = d;
        this.w = w;
        this.saturation = saturation;
    }

    /**
     * A curve through the given points and the origin.
     *
     * @param amperesPerMetre H of each point in A/m, strictly increasing, greater than 0, at most 1e8, not null
     * @param tesla           B of each point in T, strictly increasing, greater than 0, at most 5, not null
     * @param saturation      the material's saturation flux density, 0.01 T to 3 T, not null
     * @return the curve
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     * @throws IllegalArgumentException if the arrays differ in length, are empty or longer than
     *                                  {@value #MAX_POINTS}, are not strictly increasing, or a segment
     *                                  rises less steeply than µ0 (the message names the point)
     */
    public static MagnetizationCurve of(double[] amperesPerMetre, double[] tesla, MagneticFluxDensity saturation) {
        Require.nonNull("field strengths", amperesPerMetre);
        Require.nonNull("flux densities", tesla);
        double bs = Require.inRange("saturation flux density", Require.nonNull("saturation flux density", saturation)
                .toTesla(), 0.01, 3, "T");
        int n = amperesPerMetre.length;
        if (n == 0 || n != tesla.length || n > MAX_POINTS) {
            throw new IllegalArgumentException("magnetization curve: field strengths and flux densities must have the "
                    + "same length, 1 to " + MAX_POINTS + " points; got " + n + " and " + tesla.length);
        }
        double[] hh = new double[n + 1];
        double[] bb = new double[n + 1];
        for (int i = 0; i < n; i++) {
            hh[i + 1] = Require.inRange("magnetization curve field strength [" + i + "]", amperesPerMetre[i], 0, 1e8,
                    "A/m");
            bb[i + 1] = Require.inRange("magnetization curve flux density [" + i + "]", tesla[i], 0, 5, "T");
            if (!(hh[i + 1] > hh[i]) || !(bb[i + 1] > bb[i])) {
                throw new IllegalArgumentException("magnetization curve: point [" + i + "] (" + Text.number(hh[i + 1])
                        + " A/m, " + Text.number(bb[i + 1]) + " T) does not rise above the one before it ("
                        + Text.number(hh[i]) + " A/m, " + Text.number(bb[i]) + " T); H and B must both increase");
            }
            double slope = (bb[i + 1] - bb[i]) / (hh[i + 1] - hh[i]);
            if (slope < MU0) {
                throw new IllegalArgumentException("magnetization curve: the segment to point [" + i + "] ("
                        + Text.number(hh[i + 1]) + " A/m, " + Text.number(bb[i + 1]) + " T) rises by "
                        + Text.number(slope / MU0) + "·µ0, less than µ0: the magnetisation would fall");
            }
        }
        double mui = bb[1] / (MU0 * hh[1]);
        Require.inRange("initial relative permeability of the magnetization curve", mui, 1, RelativePermeability.MAX,
                "(relative)");
        // Secants of H(B) and the Fritsch–Butland knot slopes.
        double[] sec = new double[n];
        for (int k = 0; k < n; k++) {
            sec[k] = (hh[k + 1] - hh[k]) / (bb[k + 1] - bb[k]);
        }
        double[] dd = new double[n + 1];
        dd[0] = sec[0];
        // The last slope joins the saturated line beyond the table (dH/dB = 1/µ0) where the
        // monotonicity bound allows it (at most three times the last secant), so that H(B) is
        // continuously differentiable there too and Newton's method sees no kink.
        dd[n] = Math.min(1 / MU0, 3 * sec[n - 1]);
        for (int k = 1; k < n; k++) {
            double h0 = bb[k] - bb[k - 1];
            double h1 = bb[k + 1] - bb[k];
            double w1 = 2 * h1 + h0;
            double w2 = h1 + 2 * h0;
            dd[k] = (w1 + w2) / (w1 / sec[k - 1] + w2 / sec[k]);
        }
        double[] ww = new double[n + 1];
        for (int k = 0; k < n; k++) {
            ww[k + 1] = ww[k] + pieceEnergy(bb[k + 1] - bb[k], hh[k], hh[k + 1], dd[k], dd[k + 1], 1);
        }
        return new MagnetizationCurve(bb, hh, dd, ww, bs);
    }

    /**
     * A curve through the given points and the origin, in typed quantities.
     *
     * @param fieldStrengths H of each point, strictly increasing, not null, none null
     * @param fluxDensities  B of each point, strictly increasing, not null, none null
     * @param saturation     the material's saturation flux density, 0.01 T to 3 T, not null
     * @return the curve
     * @throws IllegalArgumentException as {@link #of(double[], double[], MagneticFluxDensity)}
     */
    public static MagnetizationCurve of(MagneticFieldStrength[] fieldStrengths, MagneticFluxDensity[] fluxDensities,
                                        MagneticFluxDensity saturation) {
        Require.nonNull("field strengths", fieldStrengths);
        Require.nonNull("flux densities", fluxDensities);
        double[] hh = new double[fieldStrengths.length];
        double[] bb = new double[fluxDensities.length];
        for (int i = 0; i < hh.length; i++) {
            hh[i] = Require.nonNull("field strength [" + i + "]", fieldStrengths[i]).toAmperesPerMetre();
        }
        for (int i = 0; i < bb.length; i++) {
            bb[i] = Require.nonNull("flux density [" + i + "]", fluxDensities[i]).toTesla();
        }
        return of(hh, bb, saturation);
    }

    /** ∫₀^{t·len} H dB over one Hermite piece of length len in B, t in [0, 1]. */
    private static double pieceEnergy(double len, double h0, double h1, double d0, double d1, double t) {
        double t2 = t * t;
        double t3 = t2 * t;
        double t4 = t3 * t;
        double i00 = t4 / 2 - t3 + t;
        double i10 = t4 / 4 - 2 * t3 / 3 + t2 / 2;
        double i01 = -t4 / 2 + t3;
        double i11 = t4 / 4 - t3 / 3;
        return len * (i00 * h0 + i10 * len * d0 + i01 * h1 + i11 * len * d1);
    }

    /** The piece holding B (b[k] ≤ B &lt; b[k+1]), or n for B at or beyond the last knot. */
    private int piece(double tesla) {
        int n = b.length - 1;
        if (tesla >= b[n]) {
            return n;
        }
        int lo = 0;
        int hi = n - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (b[mid] <= tesla) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /**
     * H at a flux density, the primitive hot-path form.
     *
     * @param tesla |B| in T, 0 or more (negative values are read as their magnitude)
     * @return H in A/m, 0 or more, finite
     */
    public double fieldStrength(double tesla) {
        double x = Math.abs(tesla);
        int k = piece(x);
        int n = b.length - 1;
        if (k == n) {
            return h[n] + (x - b[n]) / MU0;
        }
        double len = b[k + 1] - b[k];
        double t = (x - b[k]) / len;
        double t2 = t * t;
        double t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * h[k] + (t3 - 2 * t2 + t) * len * d[k] + (-2 * t3 + 3 * t2) * h[k + 1]
                + (t3 - t2) * len * d[k + 1];
    }

    /**
     * The slope dH/dB at a flux density (the reciprocal of the differential permeability),
     * the primitive hot-path form.
     *
     * @param tesla |B| in T, 0 or more (negative values are read as their magnitude)
     * @return dH/dB in A/(m·T), greater than 0, finite
     */
    public double slope(double tesla) {
        double x = Math.abs(tesla);
        int k = piece(x);
        int n = b.length - 1;
        if (k == n) {
            return 1 / MU0;
        }
        double len = b[k + 1] - b[k];
        double t = (x - b[k]) / len;
        double t2 = t * t;
        return ((6 * t2 - 6 * t) * h[k] + (-6 * t2 + 6 * t) * h[k + 1]) / len + (3 * t2 - 4 * t + 1) * d[k]
                + (3 * t2 - 2 * t) * d[k + 1];
    }

    /**
     * The reluctivity ν = H/B at a flux density; at B = 0 its limit, the initial value.
     *
     * @param tesla |B| in T, 0 or more (negative values are read as their magnitude)
     * @return ν in m/H, greater than 0, finite
     */
    public double reluctivity(double tesla) {
        double x = Math.abs(tesla);
        if (x < 1e-300) {
            return d[0];
        }
        // On the first piece H = B·(d0 + ...) exactly; H/B loses nothing there since H(0) = 0.
        return fieldStrength(x) / x;
    }

    /**
     * The magnetic energy density w(B) = ∫₀^B H dB', convex in B.
     *
     * @param tesla |B| in T, 0 or more (negative values are read as their magnitude)
     * @return w in J/m³, 0 or more, finite
     */
    public double energyDensity(double tesla) {
        double x = Math.abs(tesla);
        int k = piece(x);
        int n = b.length - 1;
        if (k == n) {
            double e = x - b[n];
            return w[n] + h[n] * e + e * e / (2 * MU0);
        }
        double len = b[k + 1] - b[k];
        return w[k] + pieceEnergy(len, h[k], h[k + 1], d[k], d[k + 1], (x - b[k]) / len);
    }

    /**
     * B at a field strength, the inverse of the curve (found by bisection refined with
     * Newton's method on the monotone H(B); not for hot loops).
     *
     * @param fieldStrength H, 0 or more, not null
     * @return B
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if H is negative
     */
    public MagneticFluxDensity fluxDensityAt(MagneticFieldStrength fieldStrength) {
        double target = Require.nonNegative("field strength", Require.nonNull("field strength", fieldStrength)
                .toAmperesPerMetre(), "A/m");
        int n = b.length - 1;
        if (target >= h[n]) {
            return MagneticFluxDensity.ofTesla(b[n] + MU0 * (target - h[n]));
        }
        double lo = 0;
        double hi = b[n];
        for (int it = 0; it < 200 && hi - lo > 1e-15 * b[n]; it++) {
            double mid = 0.5 * (lo + hi);
            if (fieldStrength(mid) < target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return MagneticFluxDensity.ofTesla(0.5 * (lo + hi));
    }

    /**
     * H at a flux density.
     *
     * @param fluxDensity B, 0 or more, not null
     * @return H
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if B is negative
     */
    public MagneticFieldStrength fieldStrengthAt(MagneticFluxDensity fluxDensity) {
        double x = Require.nonNegative("flux density", Require.nonNull("flux density", fluxDensity).toTesla(), "T");
        return MagneticFieldStrength.ofAmperesPerMetre(fieldStrength(x));
    }

    /**
     * The initial relative permeability, B₁/(µ0·H₁) of the first table point: the value a
     * linear solve at low field uses.
     *
     * @return µr at B → 0
     */
    public double initialPermeability() {
        return 1 / (MU0 * d[0]);
    }

    /**
     * The secant relative permeability B/(µ0·H) at a flux density.
     *
     * @param fluxDensity B, 0 or more, not null
     * @return µr, greater than 0
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if B is negative
     */
    public double secantPermeability(MagneticFluxDensity fluxDensity) {
        double x = Require.nonNegative("flux density", Require.nonNull("flux density", fluxDensity).toTesla(), "T");
        return 1 / (MU0 * reluctivity(x));
    }

    /**
     * The material's saturation flux density this curve was given.
     *
     * @return B_sat
     */
    public MagneticFluxDensity saturation() {
        return MagneticFluxDensity.ofTesla(saturation);
    }

    /**
     * The saturation flux density in T, the primitive form.
     *
     * @return B_sat in T
     */
    public double saturationTesla() {
        return saturation;
    }

    /**
     * The number of table points, the origin not counted.
     *
     * @return the count
     */
    public int points() {
        return b.length - 1;
    }

    /**
     * The field strength of a table point.
     *
     * @param index 0 to {@link #points()} − 1
     * @return H in A/m
     * @throws IndexOutOfBoundsException if the index is out of range
     */
    public double pointAmperesPerMetre(int index) {
        java.util.Objects.checkIndex(index, b.length - 1);
        return h[index + 1];
    }

    /**
     * The flux density of a table point.
     *
     * @param index 0 to {@link #points()} − 1
     * @return B in T
     * @throws IndexOutOfBoundsException if the index is out of range
     */
    public double pointTesla(int index) {
        java.util.Objects.checkIndex(index, b.length - 1);
        return b[index + 1];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MagnetizationCurve c && Arrays.equals(c.b, b) && Arrays.equals(c.h, h)
                && c.saturation == saturation;
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(b) + Arrays.hashCode(h)) + Double.hashCode(saturation);
    }

    @Override
    public String toString() {
        return "magnetization curve of " + points() + " points to " + Text.number(h[h.length - 1]) + " A/m, "
                + Text.number(b[b.length - 1]) + " T, initial µr " + Text.number(initialPermeability())
                + ", saturation " + Text.number(saturation) + " T";
    }
}
