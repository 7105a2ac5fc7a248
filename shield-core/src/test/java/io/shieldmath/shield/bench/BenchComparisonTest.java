/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.bench;

import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.SineVoltage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import org.junit.jupiter.api.Test;

/**
 * The bench comparison: arithmetic of decibels of voltage ratios (20·log10 of an amplitude
 * ratio, common practice, no source) and sine amplitude forms (pp = 2·peak, RMS = peak/√2). Readings invented.
 */
class BenchComparisonTest {

    @Test
    void measuredLossAndItsWorstCaseInterval() {
        VoltageReading open = VoltageReading.of(1.0, 0.01, AmplitudeMeasure.PEAK_TO_PEAK);
        VoltageReading covered = VoltageReading.of(0.1, 0.002, AmplitudeMeasure.PEAK_TO_PEAK);
        BenchComparison c = BenchComparison.of(open, covered, 20.0);
        assertEquals(20, c.measuredDb(), 1e-12);
        assertEquals(20 * Math.log10(0.99 / 0.102), c.lowerDb(), 1e-12);
        assertEquals(20 * Math.log10(1.01 / 0.098), c.upperDb(), 1e-12);
        assertEquals(BenchVerdict.CONSISTENT, c.verdict());
        assertEquals(0, c.differenceDb(), 1e-12);
    }

    @Test
    void readingsInDifferentMeasuresAreComparedByTheirPeaks() {
        // 2.0 V pp is 1.0 V peak; 0.0707107 V rms is 0.1 V peak: 20 dB.
        BenchComparison c = BenchComparison.of(VoltageReading.of(2.0, 0, AmplitudeMeasure.PEAK_TO_PEAK),
                VoltageReading.of(0.1 / Math.sqrt(2), 0, AmplitudeMeasure.RMS), 20.0);
        assertEquals(20, c.measuredDb(), 1e-12);
    }

    @Test
    void verdicts() {
        VoltageReading open = VoltageReading.ofRelative(0.5, 0.02, AmplitudeMeasure.RMS);
        VoltageReading covered = VoltageReading.ofRelative(0.05, 0.02, AmplitudeMeasure.RMS);
        // Measured 20 dB ± about 0.35 dB.
        assertEquals(BenchVerdict.BELOW_MODEL, BenchComparison.of(open, covered, 35).verdict());
        assertEquals(BenchVerdict.ABOVE_MODEL, BenchComparison.of(open, covered, 12).verdict());
        assertEquals(BenchVerdict.CONSISTENT, BenchComparison.of(open, covered, 20.2).verdict());
        assertEquals(BenchVerdict.CONSISTENT, BenchComparison.of(open, covered, 21).withModelToleranceDb(1).verdict());
        assertTrue(BenchComparison.of(open, covered, 35).explanation().contains("finite plate"));
        assertTrue(BenchComparison.of(open, covered, 12).explanation().contains("suspect the setup"));
    }

    @Test
    void aReadingAtTheNoiseFloorHasNoUpperBound() {
        BenchComparison c = BenchComparison.of(VoltageReading.of(1, 0.01, AmplitudeMeasure.PEAK),
                VoltageReading.of(1e-4, 1e-4, AmplitudeMeasure.PEAK), 80);
        // the reading bounds the loss only from below: 20·log10(0.99/2e-4) = 73.9 dB
        assertEquals(Double.POSITIVE_INFINITY, c.upperDb());
        assertEquals(20 * Math.log10(0.99 / 2e-4), c.lowerDb(), 1e-12);
        assertEquals(BenchVerdict.CONSISTENT, c.verdict());
    }

    @Test
    void amplitudeFormsOfASine() {
        assertEquals(2, AmplitudeMeasure.PEAK_TO_PEAK.fromPeak(1), 0);
        assertEquals(1 / Math.sqrt(2), AmplitudeMeasure.RMS.fromPeak(1), 1e-15);
        assertEquals(Math.sqrt(2), AmplitudeMeasure.RMS.toPeak(1), 1e-15);
        SineVoltage v = SineVoltage.ofVolts(1, AmplitudeMeasure.RMS);
        assertEquals(2 * Math.sqrt(2), v.volts(AmplitudeMeasure.PEAK_TO_PEAK), 1e-15);
    }

    @Test
    void badReadingsAreRejectedWithTheirValues() {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> VoltageReading.of(-1, 0, AmplitudeMeasure.RMS));
        assertTrue(e.getMessage().contains("-1"), e.getMessage());
        assertThrows(InvalidQuantityException.class, () -> VoltageReading.ofRelative(1, 2, AmplitudeMeasure.RMS));
    }
}
