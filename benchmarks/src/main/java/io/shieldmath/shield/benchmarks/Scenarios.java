/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;

/**
 * The invented stacks, fields and frequencies that every planar benchmark (and
 * {@code numpy_sweep.py}) measures, kept in one place so that the library and its
 * baselines compute exactly the same thing. Demo data, not a catalogue: the material
 * values are rounded typical values (ASM Handbook vol. 2 and Ott 2009 table 6-1, from memory).
 *
 * <ul>
 *   <li>1 layer: 0.5 mm copper (100 % IACS);</li>
 *   <li>3 layers: 0.3 mm copper | 2 mm air | 0.5 mm 80 % nickel-iron (1.7 MS/m,
 *       µr = 50 000 relaxing with a 2 kHz corner);</li>
 *   <li>5 layers: the 3-layer stack | 1 mm air | 1 mm aluminium (34 MS/m).</li>
 * </ul>
 *
 * <p>Fields: a plane wave, and the magnetic near field of a loop 5 cm away with the exact
 * small-dipole impedance. Point frequency 10 kHz; sweep 1 000 log-spaced points from
 * 10 Hz to 10 MHz. Stateless and thread-safe.
 */
final class Scenarios {

    /** The frequency of the single-point benchmarks, in Hz. */
    static final double POINT_HZ = 10_000;
    /** The number of points in the sweep benchmarks. */
    static final int SWEEP_POINTS = 1000;
    /** The sweep's band. */
    static final FrequencyBand SWEEP_BAND = FrequencyBand.of(Frequency.ofHertz(10), Frequency.ofMegahertz(10));

    static final Medium COPPER = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);
    static final Medium NICKEL_IRON = Medium.conductor("80 % nickel-iron", Conductivity.ofMegasiemensPerMetre(1.7),
            PermeabilityModel.relaxation(50_000, Frequency.ofKilohertz(2)));
    static final Medium ALUMINIUM = Medium.conductor("aluminium", Conductivity.ofMegasiemensPerMetre(34), 1);

    private Scenarios() {
    }

    /**
     * The stack with the given number of layers.
     *
     * @param layers 1, 3 or 5
     * @return the barrier
     * @throws IllegalArgumentException for any other count
     */
    static Barrier stack(int layers) {
        Barrier one = Barrier.of(COPPER, Length.ofMillimetres(0.5));
        Barrier three = Barrier.of(COPPER, Length.ofMillimetres(0.3)).thenGap(Length.ofMillimetres(2))
                .then(NICKEL_IRON, Length.ofMillimetres(0.5));
        switch (layers) {
            case 1:
                return one;
            case 3:
                return three;
            case 5:
                return three.thenGap(Length.ofMillimetres(1)).then(ALUMINIUM, Length.ofMillimetres(1));
            default:
                throw new IllegalArgumentException("stacks of 1, 3 or 5 layers are defined, not " + layers);
        }
    }

    /**
     * The field by name.
     *
     * @param name {@code plane-wave} or {@code magnetic-near-field}
     * @return the field
     * @throws IllegalArgumentException for any other name
     */
    static IncidentField field(String name) {
        switch (name) {
            case "plane-wave":
                return IncidentField.planeWave();
            case "magnetic-near-field":
                return IncidentField.magneticNearField(Length.ofCentimetres(5), ImpedanceForm.EXACT_DIPOLE);
            default:
                throw new IllegalArgumentException("unknown field " + name);
        }
    }

    /**
     * Checks in a benchmark's setup that two ways of computing the same SE agree, so that a
     * benchmark never times a wrong answer.
     *
     * @param what    what is compared, for the message
     * @param library the library's SE in dB
     * @param other   the baseline's SE in dB
     * @throws IllegalStateException if they differ by more than 1e-6 dB (relative to max(1, |SE|))
     */
    static void requireAgreement(String what, double library, double other) {
        if (!(Math.abs(library - other) <= 1e-6 * Math.max(1, Math.abs(other)))) {
            throw new IllegalStateException(what + ": library gives " + library + " dB, baseline " + other + " dB");
        }
    }
}
