/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.bench.VoltageReading;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.CouplingResult;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.coupling.SineVoltage;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.Frequency;
import java.util.Locale;

/**
 * What a round plate should read between two coils at one frequency
 * ({@link BenchPrediction#at(Frequency)}): the finite-plate insertion loss from the
 * finite-element solver with its discretisation estimate, the infinite-sheet insertion loss
 * for the same material and thickness, and the receive-coil voltages to expect for a drive
 * current. As a {@link ShieldingResult} its shielding effectiveness is the finite-plate
 * insertion loss. Immutable and thread-safe.
 */
public final class PredictedReading implements ShieldingResult {

    private final CouplingSolution finite;
    private final CouplingResult infinite;

    PredictedReading(CouplingSolution finite, CouplingResult infinite) {
        this.finite = finite;
        this.infinite = infinite;
    }

    /**
     * The frequency.
     *
     * @return the frequency
     */
    public Frequency frequency() {
        return Frequency.ofHertz(finite.hertz());
    }

    /**
     * The finite plate's insertion loss with its discretisation estimate (the change from the
     * previous, coarser mesh).
     *
     * @return the loss and its estimate, in dB
     */
    public EstimatedValue finitePlateDb() {
        return finite.insertionLossEstimated();
    }

    /**
     * The insertion loss of an infinite sheet of the same material and thickness between the
     * same coils (exact in the quasi-static limit).
     *
     * @return the loss in dB
     */
    public double infiniteSheetDb() {
        return infinite.shieldingEffectivenessDb();
    }

    /**
     * How far the infinite-sheet figure sits above the finite-plate prediction: the loss that
     * the flux rounding the plate's rim takes away.
     *
     * @return infinite-sheet minus finite-plate insertion loss, in dB (positive when the sheet
     *         gives more loss)
     */
    public double infiniteSheetAboveDb() {
        return infiniteSheetDb() - finite.insertionLossDb();
    }

    /**
     * The finite-plate insertion loss, for the common evaluation contract.
     *
     * @return the loss in dB, finite
     */
    @Override
    public double shieldingEffectivenessDb() {
        return finite.insertionLossDb();
    }

    /**
     * The solver's whole result for the plate (mutual impedance, eddy loss, field maps).
     *
     * @return the finite-element solution
     */
    public CouplingSolution finitePlate() {
        return finite;
    }

    /**
     * The infinite-sheet result for the same material and thickness.
     *
     * @return the exact infinite-sheet result
     */
    public CouplingResult infiniteSheet() {
        return infinite;
    }

    /**
     * The open-circuit receive-coil voltage to expect without the plate, ω·M0·I with M0 the
     * coils' free-space mutual inductance from Maxwell's closed form for coaxial circles
     * ({@link io.shieldmath.shield.coupling.CoilPair#freeSpaceMutualInductance()}; F. W. Grover,
     * Inductance Calculations, 1946), not the mesh's, so the discretisation error of the free
     * coupling does not enter.
     *
     * @param drive the transmitter current, at this frequency, not null
     * @return the voltage
     * @throws IllegalArgumentException if the current is at another frequency
     */
    public SineVoltage voltageWithoutPlate(DriveCurrent drive) {
        return SineVoltage.ofVolts(freeVolts(drive), AmplitudeMeasure.PEAK);
    }

    /**
     * The open-circuit receive-coil voltage to expect with the plate: the voltage without it
     * divided by the finite-plate insertion loss as a field ratio, so that the ratio of the two
     * voltages is exactly the predicted loss (in which most of the mesh's error cancels).
     *
     * @param drive the transmitter current, at this frequency, not null
     * @return the voltage
     * @throws IllegalArgumentException if the current is at another frequency
     */
    public SineVoltage voltageWithPlate(DriveCurrent drive) {
        return SineVoltage.ofVolts(freeVolts(drive) * Math.pow(10, -finite.insertionLossDb() / 20),
                AmplitudeMeasure.PEAK);
    }

    private double freeVolts(DriveCurrent drive) {
        return peakAmperes(drive) * 2 * Math.PI * finite.hertz()
                * infinite.freeSpaceMutualInductance().toHenries();
    }

    private double peakAmperes(DriveCurrent drive) {
        Require.nonNull("drive current", drive);
        double hz = drive.frequency().toHertz();
        if (Math.abs(hz - finite.hertz()) > 1e-9 * Math.max(hz, finite.hertz())) {
            throw new IllegalArgumentException("the drive current is at " + drive.frequency()
                    + " but this prediction is at " + frequency());
        }
        return drive.amperes(AmplitudeMeasure.PEAK);
    }

    /**
     * Holds bench readings against this prediction.
     *
     * @param withoutPlate the receive voltage with no plate between the coils, not null
     * @param withPlate    the receive voltage with the plate in place, not null
     * @return the agreement, with no model tolerance beyond the discretisation estimate
     * @throws NullPointerException if a reading is null
     */
    public BenchAgreement against(VoltageReading withoutPlate, VoltageReading withPlate) {
        return BenchAgreement.of(this, withoutPlate, withPlate, 0);
    }

    @Override
    public String toString() {
        EstimatedValue f = finitePlateDb();
        return String.format(Locale.ROOT, "%s: finite plate %.2f ± %.2g dB; infinite sheet %.2f dB (%.2f dB above)",
                frequency(), f.value(), f.estimate(), infiniteSheetDb(), infiniteSheetAboveDb());
    }
}
