/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.bench;

import io.shieldmath.shield.quantity.VoltageAmplitude;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.internal.Require;
import java.util.Locale;

/**
 * A reading of the receive-coil voltage on an instrument (oscilloscope, voltmeter, lock-in
 * amplifier): the value, stated as peak, peak-to-peak or RMS, and the reading's uncertainty
 * as a bound (±) in the same measure, for example from the instrument's accuracy
 * specification or the trace noise.
 *
 * <pre>{@code
 * VoltageReading open = VoltageReading.of(412e-3, 4e-3, AmplitudeMeasure.PEAK_TO_PEAK);
 * VoltageReading covered = VoltageReading.ofRelative(21.5e-3, 0.02, AmplitudeMeasure.PEAK_TO_PEAK);
 * }</pre>
 *
 * <p>Value: finite and greater than 0 V; uncertainty: finite and 0 V or more (it may reach
 * the value for a reading at the noise floor). Immutable and thread-safe; equality is by value.
 */
public final class VoltageReading {

    private final double peak;
    private final double uncertaintyPeak;

    private VoltageReading(double peak, double uncertaintyPeak) {
        this.peak = peak;
        this.uncertaintyPeak = uncertaintyPeak;
    }

    /**
     * A reading with an absolute uncertainty.
     *
     * @param volts            the reading in V, greater than 0
     * @param uncertaintyVolts the ± bound in V in the same measure, 0 or more
     * @param measure          how the reading is stated, not null
     * @return the reading
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public static VoltageReading of(double volts, double uncertaintyVolts, AmplitudeMeasure measure) {
        Require.nonNull("amplitude measure", measure);
        String unit = "V " + measure.symbol();
        Require.positive("voltage reading", volts, unit);
        Require.nonNegative("reading uncertainty", uncertaintyVolts, unit);
        return new VoltageReading(measure.toPeak(volts), measure.toPeak(uncertaintyVolts));
    }

    /**
     * A reading with an absolute uncertainty, from typed amplitudes.
     *
     * @param reading     the reading, greater than 0, not null
     * @param uncertainty the ± bound in the same measure, not null
     * @param measure     how the reading is stated, not null
     * @return the reading
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the reading is 0
     */
    public static VoltageReading of(VoltageAmplitude reading, VoltageAmplitude uncertainty, AmplitudeMeasure measure) {
        return of(Require.nonNull("voltage reading", reading).toVolts(),
                Require.nonNull("reading uncertainty", uncertainty).toVolts(), measure);
    }

    /**
     * A reading whose uncertainty is a fraction of the reading.
     *
     * @param volts    the reading in V, greater than 0
     * @param fraction the ± bound as a fraction of the reading, 0 to 1 (0.02 for ±2 %)
     * @param measure  how the reading is stated, not null
     * @return the reading
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public static VoltageReading ofRelative(double volts, double fraction, AmplitudeMeasure measure) {
        Require.inRange("relative reading uncertainty", fraction, 0, 1, "(fraction of the reading)");
        return of(volts, volts * fraction, measure);
    }

    /**
     * The reading in a measure.
     *
     * @param measure the measure, not null
     * @return the value in V
     * @throws NullPointerException if the measure is null
     */
    public double volts(AmplitudeMeasure measure) {
        return Require.nonNull("measure", measure).fromPeak(peak);
    }

    /**
     * The uncertainty bound in a measure.
     *
     * @param measure the measure, not null
     * @return the ± bound in V
     * @throws NullPointerException if the measure is null
     */
    public double uncertaintyVolts(AmplitudeMeasure measure) {
        return Require.nonNull("measure", measure).fromPeak(uncertaintyPeak);
    }

    double peak() {
        return peak;
    }

    double uncertaintyPeak() {
        return uncertaintyPeak;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof VoltageReading r && Double.compare(r.peak, peak) == 0
                && Double.compare(r.uncertaintyPeak, uncertaintyPeak) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(peak) * 31 + Double.hashCode(uncertaintyPeak);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.6g V pk ± %.3g V", peak, uncertaintyPeak);
    }
}
