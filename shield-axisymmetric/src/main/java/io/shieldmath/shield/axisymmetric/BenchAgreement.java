/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.bench.BenchComparison;
import io.shieldmath.shield.bench.BenchVerdict;
import io.shieldmath.shield.bench.VoltageReading;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;

/**
 * Bench readings held against the finite-plate prediction
 * ({@link PredictedReading#against(VoltageReading, VoltageReading)}): the measured insertion
 * loss 20·log10(V_without/V_with) with its worst-case interval from the two readings'
 * uncertainties (the measurement uncertainty, computed as in {@link BenchComparison}), the
 * predicted loss with the solver's discretisation estimate, and a verdict.
 *
 * <p>The verdict is {@link BenchVerdict#CONSISTENT} while the measured interval overlaps
 * [prediction − tolerance, prediction + tolerance], the tolerance being the discretisation
 * estimate plus any model tolerance given with {@link #withModelToleranceDb(double)} (for
 * material data and geometry not known exactly); {@link BenchVerdict#BELOW_MODEL} when the bench
 * shows less loss than that, {@link BenchVerdict#ABOVE_MODEL} when it shows more. Beside it,
 * {@link #infiniteSheetVerdict()} holds the same readings against the infinite-sheet figure,
 * which lies above the finite plate because flux rounds the plate's rim (common practice, no
 * source).
 *
 * <p>Immutable and thread-safe; {@link #withModelToleranceDb(double)} returns a copy.
 */
public final class BenchAgreement {

    private final PredictedReading prediction;
    private final VoltageReading without;
    private final VoltageReading with;
    private final double modelToleranceDb;
    private final BenchComparison finite;
    private final BenchComparison sheet;

    private BenchAgreement(PredictedReading prediction, VoltageReading without, VoltageReading with,
                           double modelToleranceDb) {
        this.prediction = prediction;
        this.without = without;
        this.with = with;
        this.modelToleranceDb = modelToleranceDb;
        this.finite = BenchComparison.of(without, with, prediction.shieldingEffectivenessDb())
                .withModelToleranceDb(prediction.finitePlateDb().estimate() + modelToleranceDb);
        this.sheet = BenchComparison.of(without, with, prediction.infiniteSheetDb())
                .withModelToleranceDb(modelToleranceDb);
    }

    static BenchAgreement of(PredictedReading prediction, VoltageReading without, VoltageReading with,
                             double modelToleranceDb) {
        return new BenchAgreement(prediction, Require.nonNull("reading without plate", without),
                Require.nonNull("reading with plate", with), modelToleranceDb);
    }

    /**
     * This agreement with a tolerance on the prediction beyond the discretisation estimate,
     * for material data and geometry not known exactly.
     *
     * @param db the tolerance in dB, 0 or more
     * @return the new agreement; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the tolerance is negative or not finite
     */
    public BenchAgreement withModelToleranceDb(double db) {
        Require.finite("model tolerance", db, "dB");
        return new BenchAgreement(prediction, without, with, Require.nonNegative("model tolerance", db, "dB"));
    }

    /**
     * The prediction the readings are held against.
     *
     * @return the prediction
     */
    public PredictedReading prediction() {
        return prediction;
    }

    /**
     * The measured insertion loss 20·log10(V_without/V_with).
     *
     * @return the loss in dB
     */
    public double measuredDb() {
        return finite.measuredDb();
    }

    /**
     * The lower end of the measured loss's worst-case interval.
     *
     * @return the loss in dB; negative infinity if the reading without the plate is within its
     *         uncertainty of zero
     */
    public double lowerDb() {
        return finite.lowerDb();
    }

    /**
     * The upper end of the measured loss's worst-case interval.
     *
     * @return the loss in dB; positive infinity if the reading with the plate is within its
     *         uncertainty of zero
     */
    public double upperDb() {
        return finite.upperDb();
    }

    /**
     * The finite-plate prediction.
     *
     * @return the solver's insertion loss in dB
     */
    public double predictedDb() {
        return prediction.shieldingEffectivenessDb();
    }

    /**
     * The tolerance on the prediction the verdict allows: the discretisation estimate plus the
     * model tolerance.
     *
     * @return the tolerance in dB, 0 or more
     */
    public double toleranceDb() {
        return prediction.finitePlateDb().estimate() + modelToleranceDb;
    }

    /**
     * The measured minus the predicted loss.
     *
     * @return the difference in dB (negative when the bench shows less loss than predicted)
     */
    public double differenceDb() {
        return measuredDb() - predictedDb();
    }

    /**
     * Whether the bench agrees with the finite-plate prediction.
     *
     * @return the verdict against the finite plate
     */
    public BenchVerdict verdict() {
        return finite.verdict();
    }

    /**
     * The same readings against the infinite-sheet figure, with the model tolerance only.
     *
     * @return the verdict against the infinite sheet
     */
    public BenchVerdict infiniteSheetVerdict() {
        return sheet.verdict();
    }

    /**
     * How far the infinite-sheet figure sits above the finite-plate prediction.
     *
     * @return the difference in dB
     */
    public double infiniteSheetAboveDb() {
        return prediction.infiniteSheetAboveDb();
    }

    /**
     * The verdict in plain sentences with the numbers.
     *
     * @return the explanation
     */
    public String explanation() {
        double up = upperDb();
        String numbers = String.format(Locale.ROOT, "measured %.2f dB (%.2f to %s dB); finite plate %.2f ± %.2g dB; "
                        + "infinite sheet %.2f dB, %.2f dB above the finite plate", measuredDb(), lowerDb(),
                Double.isInfinite(up) ? "unbounded" : String.format(Locale.ROOT, "%.2f", up), predictedDb(),
                toleranceDb(), prediction.infiniteSheetDb(), infiniteSheetAboveDb());
        switch (verdict()) {
            case ABOVE_MODEL:
                return numbers + ": the bench shows more loss than the finite plate gives"
                        + (infiniteSheetVerdict() == BenchVerdict.ABOVE_MODEL
                        ? ", and more than even the infinite sheet; " : "; ")
                        + "suspect the setup (coils moved or detuned when the plate went in, receiver overload, "
                        + "a plate larger or a material better than stated).";
            case BELOW_MODEL:
                return numbers + ": the bench shows less loss than the finite plate gives; check that the plate is "
                        + "centred and as large and thick as stated, that no lead or ground loop couples the coils "
                        + "around it, the material data, and that the reading with the plate is above the noise floor.";
            default:
                return numbers + ": the bench agrees with the finite-plate prediction within the reading "
                        + "uncertainty and the tolerance.";
        }
    }

    @Override
    public String toString() {
        return verdict() + ": " + explanation();
    }
}
