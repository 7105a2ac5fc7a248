/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;
import java.util.function.DoubleFunction;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;

/**
 * The thinnest wall that meets a target SE over a whole band, worst case over the band.
 *
 * <p>Method: the worst SE in the band ({@link BandSearch}) as a function of log
 * thickness is scanned at {@value #SCAN_POINTS} points from the smallest to the largest
 * thickness allowed to find the first thickness that meets the target, then Commons
 * Math's bracketing Brent solver (fifth order, solution kept on the meeting side)
 * closes in on it to 1e-9 in log thickness. Worst-case SE over a band rises with
 * thickness for conductors and magnetic layers; where it does not (for example a thin
 * stack at a resonance) the scan still returns the first crossing. When even the
 * largest thickness cannot meet the target (for example because an opening limits an
 * enclosure) the solution says so with the shortfall. Stateless and thread-safe.
 */
public final class ThicknessSolver {

    /** Points of the log-thickness scan that brackets the first crossing. */
    public static final int SCAN_POINTS = 24;

    private static final double SMALLEST_METRES = 1e-9;

    private ThicknessSolver() {
    }

    /**
     * The thinnest layer {@code layer} of a planar barrier that meets the target in a field
     * over a band, the other layers kept.
     *
     * @param barrier  the barrier, not null; its layer {@code layer} is the one resized
     * @param layer    the index of the layer to resize, 0 for the source-facing layer
     * @param field    the incident field, not null
     * @param band     the band, not null
     * @param targetDb the target SE in dB, finite
     * @param limit    the largest thickness allowed for that layer, from 1 nm to 100 m
     * @return the solution
     */
    public static ThicknessSolution minimumThickness(Barrier barrier, int layer, IncidentField field,
                                                     FrequencyBand band, double targetDb, Length limit) {
        Require.nonNull("barrier", barrier);
        Require.nonNull("field", field);
        if (layer < 0 || layer >= barrier.layerCount()) {
            throw new IndexOutOfBoundsException("layer index " + layer + " is outside the barrier's "
                    + barrier.layerCount() + " layers");
        }
        var base = barrier.layers().get(layer);
        return minimumThickness(t -> barrier.withLayer(layer, base.withThickness(Length.ofMetres(t))).facing(field),
                band, targetDb, Length.ofMetres(SMALLEST_METRES), limit);
    }

    /**
     * The thinnest wall of any model that meets the target over a band.
     *
     * @param modelOfThickness the model for a wall thickness in metres, not null
     * @param band             the band, not null
     * @param targetDb         the target SE in dB, finite
     * @param smallest         the thinnest wall considered, not null
     * @param limit            the thickest wall allowed, not below {@code smallest}
     * @return the solution
     */
    public static ThicknessSolution minimumThickness(DoubleFunction<? extends ShieldingModel<?>> modelOfThickness,
                                                     FrequencyBand band, double targetDb, Length smallest,
                                                     Length limit) {
        Require.nonNull("model of thickness", modelOfThickness);
        Require.nonNull("band", band);
        Require.finite("target shielding effectiveness", targetDb, "dB");
        double lo = Require.nonNull("smallest thickness", smallest).toMetres();
        double hi = Require.nonNull("thickness limit", limit).toMetres();
        Require.inRange("thickness limit", hi, lo, 100, "m");
        double xLo = Math.log(lo);
        double xHi = Math.log(hi);
        // The ends of the bracket are evaluated at exactly lo and hi: exp(log(hi)) can round below hi,
        // and a target met exactly at the limit would then leave the solver without a sign change.
        java.util.function.DoubleUnaryOperator margin = x -> BandSearch.worst(modelOfThickness.apply(
                x >= xHi ? hi : x <= xLo ? lo : Math.exp(x)), band).seDb() - targetDb;
        BandSearch.WorstCase atLimit = BandSearch.worst(modelOfThickness.apply(hi), band);
        if (atLimit.seDb() < targetDb) {
            return ThicknessSolution.notFound(targetDb, limit, atLimit, String.format(Locale.ROOT,
                    "no thickness up to %s meets %.2f dB: at that limit the worst SE is %.2f dB at %s, "
                            + "short by %.2f dB", limit, targetDb, atLimit.seDb(), atLimit.frequency(),
                    targetDb - atLimit.seDb()));
        }
        double prevX = xLo;
        double prevG = margin.applyAsDouble(xLo);
        if (prevG >= 0) {
            BandSearch.WorstCase w = BandSearch.worst(modelOfThickness.apply(lo), band);
            return ThicknessSolution.found(targetDb, smallest, w, "already met at the smallest thickness considered");
        }
        double bracketLo = xLo;
        double bracketHi = xHi;
        for (int i = 1; i <= SCAN_POINTS; i++) {
            double x = i == SCAN_POINTS ? xHi : xLo + (xHi - xLo) * i / SCAN_POINTS;
            double g = i == SCAN_POINTS ? atLimit.seDb() - targetDb : margin.applyAsDouble(x);
            if (g >= 0) {
                bracketLo = prevX;
                bracketHi = x;
                break;
            }
            prevX = x;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, 1e-9, 1e-12, 5);
        double x = solver.solve(500, margin::applyAsDouble, bracketLo, bracketHi, AllowedSolution.ABOVE_SIDE);
        double t = Math.min(hi, Math.exp(x));
        BandSearch.WorstCase w = BandSearch.worst(modelOfThickness.apply(t), band);
        if (w.seDb() < targetDb) {
            // Rounding in exp(x) can land a hair below the crossing: step up by the solver tolerance.
            t = Math.min(hi, t * (1 + 1e-8));
            w = BandSearch.worst(modelOfThickness.apply(t), band);
        }
        return ThicknessSolution.found(targetDb, Length.ofMetres(t), w, String.format(Locale.ROOT,
                "%.2f dB is first met at %s; worst SE there %.2f dB at %s", targetDb, Length.ofMetres(t),
                w.seDb(), w.frequency()));
    }
}
