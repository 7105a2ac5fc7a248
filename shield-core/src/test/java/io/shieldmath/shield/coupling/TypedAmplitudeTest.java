/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import static io.shieldmath.shield.quantity.Quantities.kHz;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import io.shieldmath.shield.bench.VoltageReading;
import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.VoltageAmplitude;
import org.junit.jupiter.api.Test;

/**
 * The typed amplitude forms of drive currents, sine voltages and bench readings are the same
 * values as the forms in bare volts and amperes. Sine amplitude forms: peak-to-peak = 2·peak,
 * RMS = peak/√2 (common practice, no source).
 */
class TypedAmplitudeTest {

    @Test
    void typedAndBareFormsAgree() {
        DriveCurrent typed = DriveCurrent.of(CurrentAmplitude.ofMilliamperes(100), AmplitudeMeasure.RMS, kHz(10));
        assertEquals(DriveCurrent.ofAmperes(0.1, AmplitudeMeasure.RMS, kHz(10)), typed);
        assertEquals(0.1 * Math.sqrt(2), typed.amplitude(AmplitudeMeasure.PEAK).toAmperes(), 1e-15);

        SineVoltage v = SineVoltage.of(VoltageAmplitude.ofVolts(2), AmplitudeMeasure.PEAK_TO_PEAK);
        assertEquals(SineVoltage.ofVolts(1, AmplitudeMeasure.PEAK), v);
        assertEquals(1 / Math.sqrt(2), v.amplitude(AmplitudeMeasure.RMS).toVolts(), 1e-15);

        VoltageReading r = VoltageReading.of(VoltageAmplitude.ofVolts(0.5), VoltageAmplitude.ofVolts(0.01),
                AmplitudeMeasure.RMS);
        assertEquals(VoltageReading.of(0.5, 0.01, AmplitudeMeasure.RMS), r);
    }

    @Test
    void typedFormsKeepTheRanges() {
        assertThrows(NullPointerException.class, () -> DriveCurrent.of(null, AmplitudeMeasure.RMS, kHz(1)));
        assertThrows(InvalidQuantityException.class,
                () -> DriveCurrent.of(CurrentAmplitude.ofAmperes(0), AmplitudeMeasure.RMS, kHz(1)));
        assertThrows(InvalidQuantityException.class,
                () -> VoltageReading.of(VoltageAmplitude.ofVolts(0), VoltageAmplitude.ofVolts(0), AmplitudeMeasure.PEAK));
    }
}
