/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingEvaluation;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.Sweep;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;

/**
 * What a round plate should read on the usual two-coil bench: the plate's insertion loss
 * between two coaxial coils predicted by the finite-element solver for the plate as it is
 * (its radius, thickness, material and place between the coils), with the solver's
 * discretisation estimate, beside the exact infinite-sheet figure for the same material and
 * thickness ({@link CouplingEvaluation}, J. R. Moser, IEEE Trans. EMC 9 (1967)).
 *
 * <pre>{@code
 * CoilPair pair = CoilPair.coaxial(Coil.loop(mm(10), 20), Coil.loop(mm(10), 20), mm(50));
 * BenchPrediction bench = BenchPrediction.ofPlate(aluminium, mm(25), mm(2), pair);
 * PredictedReading p = bench.at(kHz(10));
 * p.finitePlateDb();          // the solver's insertion loss with its discretisation estimate
 * p.infiniteSheetAboveDb();   // how far the infinite-sheet figure sits above it
 * p.against(VoltageReading.of(0.412, 0.004, AmplitudeMeasure.PEAK_TO_PEAK),   // without the plate
 *           VoltageReading.of(0.125, 0.002, AmplitudeMeasure.PEAK_TO_PEAK))   // with it
 *  .verdict();                // CONSISTENT, BELOW_MODEL or ABOVE_MODEL against the finite plate
 * }</pre>
 *
 * <p>The plate is a disc centred on the axis, midway between the coils' centre planes unless
 * moved with {@link #withPlateShiftedBy(Length)} or {@link #withPlateShiftedBackBy(Length)}.
 * The finite-plate value is exactly what {@link #finitePlate()} (an {@link Arrangement} of
 * that disc {@linkplain Arrangement#between(CoilPair) between} the pair, with this
 * prediction's fineness and tolerance) gives at the same frequency; the infinite-sheet value
 * is what {@code pair.through(Barrier.of(material, thickness))} gives, which does not depend
 * on where the sheet sits. Between small coils the flux that rounds the rim of a finite plate
 * limits its loss, so the infinite-sheet value lies above the finite-plate one, often by tens
 * of dB for a good conductor several skin depths thick (common practice, no source).
 *
 * <p>Frequencies: the finite-plate solver's {@link CoilCoupling#validBand()} (up to the
 * quasi-static limit). This is one {@link ShieldingModel} of the library: its shielding
 * effectiveness is the finite-plate insertion loss. Options return a new prediction; this one
 * is unchanged. Immutable and thread-safe; equal predictions give bit-identical results.
 *
 * <p>Cautions: drive coils carry hazardous currents and voltages, strong alternating fields
 * heat the plate, and their fields have exposure limits (ICNIRP guidelines, IEEE C95.1);
 * follow the local electrical-safety codes on the bench. The prediction is for an ideal
 * round, flat, coaxial plate; a real bench must be checked by measurement.
 */
public final class BenchPrediction implements ShieldingModel<PredictedReading> {

    /** The name of the plate body in {@link #finitePlate()}. */
    public static final String PLATE = "plate";

    private final CoilPair pair;
    private final Body plate;
    private final double fineness;
    private final Decibels tolerance;     // null: none
    private final CoilCoupling finite;
    private final CouplingEvaluation infinite;

    private BenchPrediction(CoilPair pair, Body plate, double fineness, Decibels tolerance,
                            CouplingEvaluation infinite) {
        this.pair = pair;
        this.plate = plate;
        this.fineness = fineness;
        this.tolerance = tolerance;
        CoilCoupling c = Arrangement.of(plate).between(pair).withFineness(fineness);
        this.finite = tolerance == null ? c : c.withTolerance(tolerance);
        this.infinite = infinite;
    }

    /**
     * A round plate midway between two coaxial coils.
     *
     * @param material  the plate's medium or catalogue material, not null
     * @param radius    the plate's radius, 1 µm to 100 m, not null
     * @param thickness the plate's thickness, 1 µm to 100 m, not null
     * @param pair      the coils and their separation, not null
     * @return the prediction, with the solver's default mesh and no tolerance
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a length is out of range
     * @throws IllegalArgumentException if the plate cuts a coil's winding
     */
    public static BenchPrediction ofPlate(MediumSource material, Length radius, Length thickness, CoilPair pair) {
        Require.nonNull("material", material);
        Require.nonNull("coil pair", pair);
        Body disc = Body.disc(PLATE, material, radius, thickness);
        return new BenchPrediction(pair, disc, 1, null, pair.through(Barrier.of(material, thickness)));
    }

    private BenchPrediction withPlate(Body moved) {
        return new BenchPrediction(pair, moved, fineness, tolerance, infinite);
    }

    /**
     * This prediction with the plate moved along the axis towards the receiver.
     *
     * @param distance the distance from where the plate is now, 0 to 100 m, not null
     * @return the new prediction; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     * @throws IllegalArgumentException if the moved plate cuts a coil's winding
     */
    public BenchPrediction withPlateShiftedBy(Length distance) {
        return withPlate(plate.shiftedBy(distance));
    }

    /**
     * This prediction with the plate moved along the axis towards the transmitter.
     *
     * @param distance the distance from where the plate is now, 0 to 100 m, not null
     * @return the new prediction; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     * @throws IllegalArgumentException if the moved plate cuts a coil's winding
     */
    public BenchPrediction withPlateShiftedBackBy(Length distance) {
        return withPlate(plate.shiftedBackBy(distance));
    }

    /**
     * This prediction refining the solver's mesh until two successive meshes agree within a
     * tolerance ({@link CoilCoupling#withTolerance(Decibels)}).
     *
     * @param tolerance the largest change allowed between the last two meshes, 0.001 dB to 10 dB, not null
     * @return the new prediction; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the tolerance is out of range
     */
    public BenchPrediction withTolerance(Decibels tolerance) {
        finite.withTolerance(tolerance);      // checks the range
        return new BenchPrediction(pair, plate, fineness, tolerance, infinite);
    }

    /**
     * This prediction on a finer or coarser starting mesh ({@link CoilCoupling#withFineness(double)}).
     *
     * @param q the fineness, 0.25 to 16
     * @return the new prediction; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if q is out of range
     */
    public BenchPrediction withFineness(double q) {
        finite.withFineness(q);               // checks the range
        return new BenchPrediction(pair, plate, q, tolerance, infinite);
    }

    /**
     * The finite-element evaluation of the plate between the coils, with this prediction's
     * options: the solver call that {@link #at(Frequency)} makes.
     *
     * @return the evaluation
     */
    public CoilCoupling finitePlate() {
        return finite;
    }

    /**
     * The exact quasi-static evaluation of an infinite sheet of the plate's material and
     * thickness between the same coils.
     *
     * @return the evaluation
     */
    public CouplingEvaluation infiniteSheet() {
        return infinite;
    }

    /**
     * The plate as a body of the solver, in its place between the coils.
     *
     * @return the disc named {@value #PLATE}
     */
    public Body plate() {
        return plate;
    }

    /**
     * The coils.
     *
     * @return the pair
     */
    public CoilPair pair() {
        return pair;
    }

    /**
     * The frequencies this prediction accepts: those both {@link #finitePlate()} and
     * {@link #infiniteSheet()} accept.
     *
     * @return the band
     */
    @Override
    public FrequencyBand validBand() {
        double low = Math.max(finite.validBand().low().toHertz(), infinite.validBand().low().toHertz());
        double high = Math.min(finite.validBand().high().toHertz(), infinite.validBand().high().toHertz());
        return FrequencyBand.of(Frequency.ofHertz(low), Frequency.ofHertz(high));
    }

    /**
     * The predicted reading at one frequency.
     *
     * @param frequency the frequency, within {@link #validBand()}, not null
     * @return the finite-plate and infinite-sheet values
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside the valid band
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public PredictedReading at(Frequency frequency) {
        Require.nonNull("frequency", frequency);
        checkBand("frequency", frequency.toHertz());
        CouplingSolution s = finite.at(frequency);
        return new PredictedReading(s, infinite.at(frequency));
    }

    /**
     * The finite-plate insertion loss at one frequency, in dB.
     *
     * @param hertz the frequency in Hz, within {@link #validBand()}
     * @return the loss in dB, finite
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside the valid band
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        checkBand("frequency", hertz);
        return finite.shieldingEffectivenessDb(hertz);
    }

    /**
     * The predicted readings at log-spaced frequencies, on one mesh pair for the whole band
     * ({@link CoilCoupling#sweep(FrequencyBand, int)}).
     *
     * @param band   the band, within {@link #validBand()}, not null
     * @param points the number of frequencies, 1 to {@value CoilCoupling#MAX_SWEEP_POINTS}
     * @return the readings, lowest frequency first
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the band leaves the valid band or points is out of range
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public Sweep<PredictedReading> sweep(FrequencyBand band, int points) {
        Require.nonNull("band", band);
        checkBand("band lower frequency", band.low().toHertz());
        checkBand("band upper frequency", band.high().toHertz());
        Sweep<CouplingSolution> s = finite.sweep(band, points);
        double[] hz = new double[s.results().size()];
        List<PredictedReading> readings = new ArrayList<>(hz.length);
        for (int i = 0; i < hz.length; i++) {
            CouplingSolution c = s.results().get(i);
            hz[i] = c.hertz();
            readings.add(new PredictedReading(c, infinite.at(Frequency.ofHertz(c.hertz()))));
        }
        return Sweep.ofResults(hz, readings);
    }

    private void checkBand(String what, double hertz) {
        FrequencyBand b = validBand();
        Require.inRange(what, hertz, b.low().toHertz(), b.high().toHertz(), "Hz");
    }

    /**
     * Two predictions are equal when their plates (material, size, place), coils and solver
     * options are equal.
     *
     * @param o the other object
     * @return whether it is an equal prediction
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof BenchPrediction b && b.finite.equals(finite);    // the sheet follows from the plate
    }

    @Override
    public int hashCode() {
        return finite.hashCode();
    }

    @Override
    public String toString() {
        return "bench prediction: " + plate + " between " + pair;
    }
}
