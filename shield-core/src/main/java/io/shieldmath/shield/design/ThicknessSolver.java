/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Decibels;
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
 *
 * <p>What is optimised: the model's own result. For a planar barrier that is an infinite
 * sheet, and for a shell a closed shell without seams; real plates lose field round their
 * edges and real enclosures through seams and holes, so a design found here is an upper
 * estimate until it is checked with a finite-geometry model (the axisymmetric module, an
 * enclosure with its openings) or by measurement.
 */
public final class ThicknessSolver {

    /** Points of the log-thickness scan that brackets the first crossing. */
    public static final int SCAN_POINTS = 24;

    private static final double SMALLEST_METRES = 1e-9;

    private ThicknessSolver() {
    }

    /**
     * Starts a search for the thinnest {@code layer} of a planar barrier, the other layers
     * kept:
     *
     * <pre>{@code
     * Layer steel = barrier.layers().get(2);
     * ThicknessSolution s = ThicknessSolver.resizing(barrier, steel)
     *         .facing(loop).over(FrequencyBand.of(Hz(10), kHz(100))).toMeet(Decibels.of(75)).upTo(mm(4));
     * }</pre>
     *
     * @param barrier the barrier, not null
     * @param layer   the layer to resize, not null; it must occur exactly once in the barrier
     *                (gaps are layers too: pick the layer itself, not a count)
     * @return the search, to be given a field, a band, a target and a limit
     * @throws IllegalArgumentException if the layer is not in the barrier, or is there more than once
     */
    public static Search resizing(Barrier barrier, Layer layer) {
        Require.nonNull("barrier", barrier);
        Require.nonNull("layer", layer);
        int index = -1;
        int count = 0;
        for (int i = 0; i < barrier.layerCount(); i++) {
            if (barrier.layers().get(i).equals(layer)) {
                index = i;
                count++;
            }
        }
        if (count != 1) {
            throw new IllegalArgumentException("the layer " + layer + " occurs " + count + " times in " + barrier
                    + "; resize a layer that occurs exactly once");
        }
        return new Search(barrier, index, null, null, null);
    }

    /**
     * A search for the thinnest layer, built a step at a time: {@link #facing(IncidentField)},
     * {@link #over(FrequencyBand)}, {@link #toMeet(Decibels)}, then {@link #upTo(Length)}
     * runs it. Immutable; each step returns a new search.
     */
    public static final class Search {
        private final Barrier barrier;
        private final int index;
        private final IncidentField field;
        private final FrequencyBand band;
        private final Decibels target;

        private Search(Barrier barrier, int index, IncidentField field, FrequencyBand band, Decibels target) {
            this.barrier = barrier;
            this.index = index;
            this.field = field;
            this.band = band;
            this.target = target;
        }

        /**
         * The incident field.
         *
         * @param incident the field, not null
         * @return the search with this field
         * @throws NullPointerException if the field is null
         */
        public Search facing(IncidentField incident) {
            return new Search(barrier, index, Require.nonNull("field", incident), band, target);
        }

        /**
         * The band over which the target must hold, worst case.
         *
         * @param frequencies the band, not null
         * @return the search with this band
         * @throws NullPointerException if the band is null
         */
        public Search over(FrequencyBand frequencies) {
            return new Search(barrier, index, field, Require.nonNull("band", frequencies), target);
        }

        /**
         * The target shielding effectiveness.
         *
         * @param se the target, not null
         * @return the search with this target
         * @throws NullPointerException if the target is null
         */
        public Search toMeet(Decibels se) {
            return new Search(barrier, index, field, band, Require.nonNull("target", se));
        }

        /**
         * Runs the search up to a thickness limit.
         *
         * @param limit the largest thickness allowed for the layer, from 1 nm to 100 m
         * @return the solution
         * @throws IllegalStateException if the field, the band or the target has not been given
         */
        public ThicknessSolution upTo(Length limit) {
            if (field == null || band == null || target == null) {
                throw new IllegalStateException("the thickness search needs "
                        + (field == null ? "facing(field)" : band == null ? "over(band)" : "toMeet(target)")
                        + " before upTo(limit)");
            }
            return minimumThickness(barrier, index, field, band, target.toDb(), limit);
        }

        @Override
        public String toString() {
            return "thinnest layer " + (index + 1) + " of " + barrier;
        }
    }

    /**
     * Starts a search for the thinnest wall of any model: {@code modelOfThickness} gives the
     * model for a wall thickness in metres.
     *
     * @param modelOfThickness the model for a wall thickness in metres, not null
     * @return the search, to be given a band, a target and the thickness range
     * @throws NullPointerException if the function is null
     */
    public static AnyModel resizing(DoubleFunction<? extends ShieldingModel<?>> modelOfThickness) {
        return new AnyModel(Require.nonNull("model of thickness", modelOfThickness), null, null);
    }

    /**
     * A search for the thinnest wall of any model: {@link #over(FrequencyBand)},
     * {@link #toMeet(Decibels)}, then {@link #between(Length, Length)} runs it. Immutable.
     */
    public static final class AnyModel {
        private final DoubleFunction<? extends ShieldingModel<?>> model;
        private final FrequencyBand band;
        private final Decibels target;

        private AnyModel(DoubleFunction<? extends ShieldingModel<?>> model, FrequencyBand band, Decibels target) {
            this.model = model;
            this.band = band;
            this.target = target;
        }

        /**
         * The band over which the target must hold, worst case.
         *
         * @param frequencies the band, not null
         * @return the search with this band
         * @throws NullPointerException if the band is null
         */
        public AnyModel over(FrequencyBand frequencies) {
            return new AnyModel(model, Require.nonNull("band", frequencies), target);
        }

        /**
         * The target shielding effectiveness.
         *
         * @param se the target, not null
         * @return the search with this target
         * @throws NullPointerException if the target is null
         */
        public AnyModel toMeet(Decibels se) {
            return new AnyModel(model, band, Require.nonNull("target", se));
        }

        /**
         * Runs the search between two thicknesses.
         *
         * @param smallest the thinnest wall considered, not null
         * @param limit    the thickest wall allowed, not below {@code smallest}, at most 100 m
         * @return the solution
         * @throws IllegalStateException if the band or the target has not been given
         */
        public ThicknessSolution between(Length smallest, Length limit) {
            if (band == null || target == null) {
                throw new IllegalStateException("the thickness search needs "
                        + (band == null ? "over(band)" : "toMeet(target)") + " before between(smallest, limit)");
            }
            return minimumThickness(model, band, target.toDb(), smallest, limit);
        }
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
    static ThicknessSolution minimumThickness(Barrier barrier, int layer, IncidentField field,
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
    static ThicknessSolution minimumThickness(DoubleFunction<? extends ShieldingModel<?>> modelOfThickness,
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
