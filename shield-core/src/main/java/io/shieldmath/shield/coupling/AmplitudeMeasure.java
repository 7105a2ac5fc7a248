/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

/**
 * How the size of a sinusoidal current or voltage is stated: by its peak, its
 * peak-to-peak swing or its root-mean-square value. For a sine, peak-to-peak = 2·peak and
 * RMS = peak/√2 (exact for a pure sinusoid only; a distorted waveform read by an averaging
 * or true-RMS meter differs).
 */
public enum AmplitudeMeasure {
    /** The peak (crest) value, the amplitude of the sine. */
    PEAK(1, "pk"),
    /** The peak-to-peak swing, twice the peak. */
    PEAK_TO_PEAK(2, "pp"),
    /** The root-mean-square value, peak/√2. */
    RMS(Math.sqrt(0.5), "rms");

    private final double perPeak;
    private final String symbol;

    AmplitudeMeasure(double perPeak, String symbol) {
        this.perPeak = perPeak;
        this.symbol = symbol;
    }

    /**
     * Converts a value stated in this measure to its peak.
     *
     * @param value the value in this measure
     * @return the peak value
     */
    public double toPeak(double value) {
        return value / perPeak;
    }

    /**
     * Converts a peak value to this measure.
     *
     * @param peak the peak value
     * @return the value in this measure
     */
    public double fromPeak(double peak) {
        return peak * perPeak;
    }

    /**
     * The short suffix used in text, {@code pk}, {@code pp} or {@code rms}.
     *
     * @return the suffix
     */
    public String symbol() {
        return symbol;
    }
}
