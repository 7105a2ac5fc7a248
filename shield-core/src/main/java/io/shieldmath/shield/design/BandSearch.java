/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.internal.Require;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * The lowest shielding effectiveness in a band: a dense log sweep, then Brent's
 * minimiser (Commons Math) on log f around every local minimum of the sweep, so that a
 * narrow dip between sweep points (a resonance of a thin stack, a permeability roll-off)
 * is not missed.
 *
 * <p>A dip narrower than the sweep spacing and not adjacent to a sampled local minimum
 * can still be missed: raise {@code points} for stacks with many resonances. Stateless
 * and thread-safe.
 */
public final class BandSearch {

    /** The default number of sweep points per decade. */
    public static final int DEFAULT_POINTS_PER_DECADE = 40;

    private BandSearch() {
    }

    /**
     * The worst (lowest) SE in a band, with {@value #DEFAULT_POINTS_PER_DECADE} sweep points
     * per decade (at least 16).
     *
     * @param model the model, not null
     * @param band  the band, not null
     * @return the worst point
     * @throws NullPointerException if an argument is null
     */
    public static WorstCase worst(ShieldingModel<?> model, FrequencyBand band) {
        Require.nonNull("band", band);
        double decades = Math.log10(band.high().toHertz() / band.low().toHertz());
        int points = Math.max(16, (int) Math.ceil(decades * DEFAULT_POINTS_PER_DECADE) + 1);
        return worst(model, band, points);
    }

    /**
     * The worst (lowest) SE in a band.
     *
     * @param model  the model, not null
     * @param band   the band, not null
     * @param points the number of log-spaced sweep points before refinement, 2 or more
     * @return the worst point
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if {@code points} is less than 2
     */
    public static WorstCase worst(ShieldingModel<?> model, FrequencyBand band, int points) {
        Require.nonNull("model", model);
        Require.nonNull("band", band);
        if (points < 2) {
            throw new IllegalArgumentException("a band search needs at least 2 points; got " + points);
        }
        double lo = band.low().toHertz();
        double hi = band.high().toHertz();
        if (lo == hi) {
            return new WorstCase(band.low(), model.shieldingEffectivenessDb(lo));
        }
        double[] f = band.logSpacedHertz(points);
        double[] se = new double[points];
        for (int i = 0; i < points; i++) {
            se[i] = model.shieldingEffectivenessDb(f[i]);
        }
        double bestF = f[0];
        double bestSe = se[0];
        for (int i = 0; i < points; i++) {
            if (se[i] < bestSe) {
                bestSe = se[i];
                bestF = f[i];
            }
        }
        BrentOptimizer brent = new BrentOptimizer(1e-10, 1e-12);
        UnivariateObjectiveFunction objective =
                new UnivariateObjectiveFunction(x -> model.shieldingEffectivenessDb(Math.exp(x)));
        for (int i = 0; i < points; i++) {
            boolean localMin = (i == 0 || se[i] <= se[i - 1]) && (i == points - 1 || se[i] <= se[i + 1]);
            if (!localMin) {
                continue;
            }
            double a = Math.log(f[Math.max(0, i - 1)]);
            double b = Math.log(f[Math.min(points - 1, i + 1)]);
            if (!(b > a)) {
                continue;
            }
            UnivariatePointValuePair p = brent.optimize(new MaxEval(200), objective, GoalType.MINIMIZE,
                    new SearchInterval(a, b, Math.log(f[i])));
            if (p.getValue() < bestSe) {
                bestSe = p.getValue();
                bestF = Math.min(hi, Math.max(lo, Math.exp(p.getPoint())));
            }
        }
        return new WorstCase(Frequency.ofHertz(bestF), bestSe);
    }

    /**
     * The lowest SE of a model in a band, and where it occurs.
     *
     * @param frequency where the minimum lies
     * @param seDb      the SE there, dB
     */
    public record WorstCase(Frequency frequency, double seDb) {

        @Override
        public String toString() {
            return String.format(java.util.Locale.ROOT, "%.2f dB at %s", seDb, frequency);
        }
    }
}
