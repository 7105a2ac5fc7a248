/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Frequency;
import java.util.Locale;

/**
 * The sinusoidal current driving the transmitting coil: an amplitude, stated as peak,
 * peak-to-peak or RMS, at a frequency.
 *
 * <pre>{@code
 * DriveCurrent i = DriveCurrent.ofAmperes(0.1, AmplitudeMeasure.RMS, kHz(10));
 * }</pre>
 *
 * <p>Amplitude: finite and greater than 0 A, at most 1e6 A. Immutable and thread-safe;
 * equality is by value (the peak and the frequency).
 */
public final class DriveCurrent {

    private final double peak;
    private final Frequency frequency;

    private DriveCurrent(double peak, Frequency frequency) {
        this.peak = peak;
        this.frequency = frequency;
    }

    /**
     * A drive current.
     *
     * @param amperes   the amplitude in A, as stated by {@code measure}; greater than 0, at most 1e6 A
     * @param measure   how the amplitude is stated, not null
     * @param frequency the frequency, not null
     * @return the current
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the amplitude is out of range
     */
    public static DriveCurrent ofAmperes(double amperes, AmplitudeMeasure measure, Frequency frequency) {
        Require.nonNull("amplitude measure", measure);
        Require.inRange("drive current", Require.positive("drive current", amperes, "A " + measure.symbol()),
                0, measure.fromPeak(1e6), "A " + measure.symbol());
        return new DriveCurrent(measure.toPeak(amperes), Require.nonNull("frequency", frequency));
    }

    /**
     * A drive current from a typed amplitude.
     *
     * @param amplitude the amplitude, as stated by {@code measure}; greater than 0, at most 1e6 A
     * @param measure   how the amplitude is stated, not null
     * @param frequency the frequency, not null
     * @return the current
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the amplitude is out of range
     */
    public static DriveCurrent of(CurrentAmplitude amplitude, AmplitudeMeasure measure, Frequency frequency) {
        return ofAmperes(Require.nonNull("drive current", amplitude).toAmperes(), measure, frequency);
    }

    /**
     * The amplitude in a measure, as a typed value.
     *
     * @param measure the measure, not null
     * @return the amplitude
     * @throws NullPointerException if the measure is null
     */
    public CurrentAmplitude amplitude(AmplitudeMeasure measure) {
        return CurrentAmplitude.ofAmperes(amperes(measure));
    }

    /**
     * A drive current given in milliamperes.
     *
     * @param milliamperes the amplitude in mA, as stated by {@code measure}
     * @param measure      how the amplitude is stated, not null
     * @param frequency    the frequency, not null
     * @return the current
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the amplitude is not greater than 0 or above
     *         the equivalent of 1e6 A peak
     */
    public static DriveCurrent ofMilliamperes(double milliamperes, AmplitudeMeasure measure, Frequency frequency) {
        return ofAmperes(milliamperes * 1e-3, measure, frequency);
    }

    /**
     * The amplitude in a measure.
     *
     * @param measure the measure, not null
     * @return the amplitude in A
     * @throws NullPointerException if the measure is null
     */
    public double amperes(AmplitudeMeasure measure) {
        return Require.nonNull("measure", measure).fromPeak(peak);
    }

    /**
     * The frequency.
     *
     * @return f
     */
    public Frequency frequency() {
        return frequency;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DriveCurrent c && Double.compare(c.peak, peak) == 0 && c.frequency.equals(frequency);
    }

    @Override
    public int hashCode() {
        return Double.hashCode(peak) * 31 + frequency.hashCode();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.6g A pk at %s", peak, frequency);
    }
}
