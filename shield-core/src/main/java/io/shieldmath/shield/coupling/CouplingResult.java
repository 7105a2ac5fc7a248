/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.Complex;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Inductance;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ValidityNote;
import java.util.List;
import java.util.Locale;

/**
 * The coil-to-coil coupling through a barrier at one frequency: free-space and shielded
 * mutual inductance, the mutual impedance, the insertion loss, the induced voltage for a
 * drive current, and beside them the transmission-line estimate of the same case.
 *
 * <p>Conventions: time dependence e^{jωt}; the receiving coil's open-circuit voltage is
 * V = −jω·M·I (the sign of the induced voltage is not needed for amplitudes and is left
 * out: the mutual impedance is Z = jω·M). The shielded M is complex (eddy currents shift its
 * phase); it is kept as a log-magnitude so that it stays meaningful where it underflows.
 *
 * <p>Caution: induction coils driven at power levels carry hazardous voltages and currents,
 * and strong low-frequency fields have exposure limits (ICNIRP guidelines, IEEE C95.1); an
 * infinite-sheet model overstates what a finite plate achieves. Work on medical, safety or
 * compliance shielding follows local codes and licensed practice.
 *
 * <p>Immutable and thread-safe.
 */
public final class CouplingResult implements ShieldingResult {


    private final Frequency frequency;
    private final double freeSpace;
    private final double logM;
    private final double phase;
    private final double lossDb;
    private final PlanarResult planar;
    private final List<ValidityNote> notes;

    CouplingResult(Frequency frequency, double freeSpace, double logM, double phase, double lossDb,
                   PlanarResult planar, List<ValidityNote> notes) {
        this.notes = notes;
        this.frequency = frequency;
        this.freeSpace = freeSpace;
        this.logM = logM;
        this.phase = phase;
        this.lossDb = lossDb;
        this.planar = planar;
    }

    /**
     * The frequency.
     *
     * @return f
     */
    public Frequency frequency() {
        return frequency;
    }

    /**
     * The mutual inductance without the barrier (Maxwell's closed form, summed over rings).
     *
     * @return M_free
     */
    public Inductance freeSpaceMutualInductance() {
        return Inductance.ofHenries(freeSpace);
    }

    /**
     * The complex mutual inductance with the barrier in place, M = M_free·|M/M_free|·e^{jφ};
     * it underflows to zero behind barriers of more than about 6000 dB (use
     * {@link #shieldingEffectivenessDb()} there).
     *
     * @return M in henries
     */
    public Complex shieldedMutualInductance() {
        return Complex.ofPolar(Math.exp(logM), phase);
    }

    /**
     * The mutual impedance with the barrier in place, Z = jω·M (Ω): the open-circuit
     * receive voltage per ampere of drive current.
     *
     * @return Z in ohms
     */
    public Complex mutualImpedance() {
        double w = frequency.angular();
        Complex m = shieldedMutualInductance();
        return Complex.ofCartesian(-w * m.imaginary(), w * m.real());
    }

    /**
     * The shielding effectiveness of the barrier between the coils: its insertion loss
     * 20·log10|M_free/M| in dB.
     *
     * @return the loss, finite
     */
    @Override
    public double shieldingEffectivenessDb() {
        return lossDb;
    }

    /**
     * The hand estimate of the same case: the transmission-line model's shielding
     * effectiveness with the textbook magnetic wave impedance |Zw| = 2πfµ0·r at the
     * barrier's actual distance r from the transmitter (see
     * {@link CouplingEvaluation#planarEstimate()}), to show beside
     * {@link #shieldingEffectivenessDb()}. Its own {@link PlanarResult#validityNotes()} say
     * where that hand formula is unreliable (|K| &lt; 3).
     *
     * @return the planar result, with its absorption, reflection and B parts
     */
    public PlanarResult planarEstimate() {
        return planar;
    }

    /**
     * The planar estimate minus the exact insertion loss, in dB: positive where the
     * transmission-line model promises more than the coils see.
     *
     * @return SE_planar − IL
     */
    public double planarEstimateErrorDb() {
        return planar.shieldingEffectivenessDb() - lossDb;
    }

    /**
     * The open-circuit voltage induced in the receiving coil, |V| = ω·|M|·|I|.
     *
     * @param drive the drive current, not null, at this result's frequency
     * @return the voltage amplitude
     * @throws IllegalArgumentException if the current is at another frequency
     */
    public SineVoltage inducedVoltage(DriveCurrent drive) {
        return SineVoltage.ofVolts(voltage(drive, Math.exp(logM)), AmplitudeMeasure.PEAK);
    }

    /**
     * The open-circuit voltage the same drive would induce without the barrier.
     *
     * @param drive the drive current, not null, at this result's frequency
     * @return the voltage amplitude
     * @throws IllegalArgumentException if the current is at another frequency
     */
    public SineVoltage freeSpaceInducedVoltage(DriveCurrent drive) {
        return SineVoltage.ofVolts(voltage(drive, freeSpace), AmplitudeMeasure.PEAK);
    }

    private double voltage(DriveCurrent drive, double m) {
        Require.nonNull("drive current", drive);
        if (!drive.frequency().isCloseTo(frequency, 1e-12)) {
            throw new IllegalArgumentException("the drive current is at " + drive.frequency()
                    + " but this result is at " + frequency);
        }
        return frequency.angular() * m * drive.amperes(AmplitudeMeasure.PEAK);
    }

    /**
     * The notes on this result's validity: {@link ValidityNote.Limit#QUASI_STATIC} where
     * k0·max(largest coil radius, d) is above 0.1. The notes of the hand estimate are on
     * {@link #planarEstimate()}.
     *
     * @return an unmodifiable list, empty inside the limits
     */
    @Override
    public List<ValidityNote> validityNotes() {
        return notes;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "IL %.2f dB at %s (M free %.6g H; planar estimate %.2f dB)", lossDb,
                frequency, freeSpace, planar.shieldingEffectivenessDb());
    }
}
