/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.quantity.VoltageAmplitude;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;

/**
 * The amplitude of a sinusoidal voltage, such as the voltage induced in the receiving coil,
 * readable as peak, peak-to-peak or RMS.
 *
 * <p>Amplitude: finite and 0 V or more (an induced voltage may underflow to 0 behind a very
 * thick barrier). Immutable and thread-safe; equality is by value.
 */
public final class SineVoltage {

    private final double peak;

    private SineVoltage(double peak) {
        this.peak = peak;
    }

    /**
     * A voltage amplitude.
     *
     * @param volts   the amplitude in V as stated by {@code measure}, finite and 0 or more
     * @param measure how the amplitude is stated, not null
     * @return the voltage
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the amplitude is negative or not finite
     */
    public static SineVoltage ofVolts(double volts, AmplitudeMeasure measure) {
        Require.nonNull("amplitude measure", measure);
        return new SineVoltage(measure.toPeak(Require.nonNegative("voltage", volts, "V " + measure.symbol())));
    }

    /**
     * A sinusoidal voltage from a typed amplitude.
     *
     * @param amplitude the amplitude, as stated by {@code measure}, not null
     * @param measure   how the amplitude is stated, not null
     * @return the voltage
     * @throws NullPointerException if an argument is null
     */
    public static SineVoltage of(VoltageAmplitude amplitude, AmplitudeMeasure measure) {
        return ofVolts(Require.nonNull("voltage amplitude", amplitude).toVolts(), measure);
    }

    /**
     * The amplitude in a measure, as a typed value.
     *
     * @param measure the measure, not null
     * @return the amplitude
     * @throws NullPointerException if the measure is null
     */
    public VoltageAmplitude amplitude(AmplitudeMeasure measure) {
        return VoltageAmplitude.ofVolts(volts(measure));
    }

    /**
     * The amplitude in a measure.
     *
     * @param measure the measure, not null
     * @return the amplitude in V
     * @throws NullPointerException if the measure is null
     */
    public double volts(AmplitudeMeasure measure) {
        return Require.nonNull("measure", measure).fromPeak(peak);
    }

    /**
     * The amplitude in millivolts in a measure.
     *
     * @param measure the measure, not null
     * @return the amplitude in mV
     */
    public double millivolts(AmplitudeMeasure measure) {
        return volts(measure) * 1e3;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SineVoltage v && Double.compare(v.peak, peak) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(peak);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.6g V pk", peak);
    }
}
