/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.bench;

import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.CouplingResult;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;

/**
 * A bench measurement of insertion loss held against the model: the receive-coil voltage
 * without and with the plate, each with its reading uncertainty, gives the measured loss
 * 20·log10(V_without/V_with) and its worst-case interval
 * [20·log10((V0 − u0)/(V1 + u1)), 20·log10((V0 + u0)/(V1 − u1))]; the verdict says whether the
 * model's infinite-sheet value lies inside it. A finite plate lets flux round its rim, so a reading below the infinite-sheet value is expected (common practice, no source); one above it is a warning sign.
 *
 * <pre>{@code
 * BenchComparison c = BenchComparison.of(
 *         VoltageReading.of(412e-3, 4e-3, AmplitudeMeasure.PEAK_TO_PEAK),
 *         VoltageReading.of(21.5e-3, 0.5e-3, AmplitudeMeasure.PEAK_TO_PEAK),
 *         model);
 * c.verdict();       // CONSISTENT, BELOW_MODEL or ABOVE_MODEL
 * c.explanation();   // the same in a plain sentence
 * }</pre>
 *
 * <p>The two readings may be in different measures (each is converted to its peak, valid for
 * sinusoids). The interval treats the uncertainties as bounds, not standard deviations, and
 * its upper end is infinite when the reading with the plate is within its own uncertainty of
 * zero (the plate's loss then has no upper bound from this measurement).
 *
 * <p>Immutable and thread-safe; {@link #withModelToleranceDb(double)} returns a copy.
 */
public final class BenchComparison {

    private final VoltageReading without;
    private final VoltageReading with;
    private final double modelDb;
    private final double toleranceDb;

    private BenchComparison(VoltageReading without, VoltageReading with, double modelDb, double toleranceDb) {
        this.without = without;
        this.with = with;
        this.modelDb = modelDb;
        this.toleranceDb = toleranceDb;
    }

    /**
     * Compares readings with a model result.
     *
     * @param withoutPlate the receive voltage with no plate between the coils, not null
     * @param withPlate    the receive voltage with the plate in place, not null
     * @param model        the model at the measurement frequency, not null
     * @return the comparison, with a model tolerance of 0 dB
     */
    public static BenchComparison of(VoltageReading withoutPlate, VoltageReading withPlate, CouplingResult model) {
        return of(withoutPlate, withPlate, Require.nonNull("model result", model).shieldingEffectivenessDb());
    }

    /**
     * Compares readings with a model value given in dB.
     *
     * @param withoutPlate the receive voltage with no plate between the coils, not null
     * @param withPlate    the receive voltage with the plate in place, not null
     * @param modelDb      the model's insertion loss in dB, finite
     * @return the comparison, with a model tolerance of 0 dB
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code modelDb} is NaN or infinite
     */
    public static BenchComparison of(VoltageReading withoutPlate, VoltageReading withPlate, double modelDb) {
        return new BenchComparison(Require.nonNull("reading without plate", withoutPlate),
                Require.nonNull("reading with plate", withPlate), Require.finite("model insertion loss", modelDb, "dB"),
                0);
    }

    /**
     * This comparison with a tolerance on the model value (for material data and geometry
     * not known exactly): the verdict is {@link BenchVerdict#CONSISTENT} while the
     * measurement interval overlaps [model − tolerance, model + tolerance].
     *
     * @param db the tolerance in dB, 0 or more
     * @return the new comparison; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code db} is negative, NaN or infinite
     */
    public BenchComparison withModelToleranceDb(double db) {
        return new BenchComparison(without, with, modelDb, Require.nonNegative("model tolerance", db, "dB"));
    }

    /**
     * The measured insertion loss 20·log10(V_without/V_with) in dB.
     *
     * @return the loss, finite
     */
    public double measuredDb() {
        return 20 * Math.log10(without.peak() / with.peak());
    }

    /**
     * The lower end of the measured loss's worst-case interval, in dB.
     *
     * @return 20·log10((V0 − u0)/(V1 + u1)); negative infinity if the reading without the plate
     *         is within its uncertainty of zero
     */
    public double lowerDb() {
        double num = without.peak() - without.uncertaintyPeak();
        return num <= 0 ? Double.NEGATIVE_INFINITY
                : 20 * Math.log10(num / (with.peak() + with.uncertaintyPeak()));
    }

    /**
     * The upper end of the measured loss's worst-case interval, in dB.
     *
     * @return 20·log10((V0 + u0)/(V1 − u1)); positive infinity if the reading with the plate is
     *         within its uncertainty of zero
     */
    public double upperDb() {
        double den = with.peak() - with.uncertaintyPeak();
        return den <= 0 ? Double.POSITIVE_INFINITY
                : 20 * Math.log10((without.peak() + without.uncertaintyPeak()) / den);
    }

    /**
     * The model's insertion loss in dB.
     *
     * @return the model value
     */
    public double modelDb() {
        return modelDb;
    }

    /**
     * The measured minus the model loss, in dB.
     *
     * @return negative when the bench shows less loss than the infinite sheet
     */
    public double differenceDb() {
        return measuredDb() - modelDb;
    }

    /**
     * The verdict: above the model beyond the uncertainty, below it, or consistent.
     *
     * @return the verdict
     */
    public BenchVerdict verdict() {
        if (lowerDb() > modelDb + toleranceDb) {
            return BenchVerdict.ABOVE_MODEL;
        }
        if (upperDb() < modelDb - toleranceDb) {
            return BenchVerdict.BELOW_MODEL;
        }
        return BenchVerdict.CONSISTENT;
    }

    /**
     * The verdict in a plain sentence with the numbers.
     *
     * @return the explanation
     */
    public String explanation() {
        String measured = String.format(Locale.ROOT, "measured %.2f dB (%.2f to %s dB), model %.2f dB", measuredDb(),
                lowerDb(), Double.isInfinite(upperDb()) ? "unbounded" : String.format(Locale.ROOT, "%.2f", upperDb()),
                modelDb);
        switch (verdict()) {
            case ABOVE_MODEL:
                return measured + ": the bench shows more loss than an infinite sheet can give; suspect the setup "
                        + "(coil position or tuning changed with the plate, receiver overload or direct pickup, "
                        + "ground loop, wrong material data, reading at the noise floor).";
            case BELOW_MODEL:
                return measured + ": the bench shows less loss than the infinite sheet; expected for a finite plate, "
                        + "since field leaks round its edges and the measured loss saturates.";
            default:
                return measured + ": consistent within the reading uncertainty.";
        }
    }

    @Override
    public String toString() {
        return explanation();
    }
}
