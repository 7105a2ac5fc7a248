/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.bench.BenchVerdict;
import io.shieldmath.shield.bench.VoltageReading;
import io.shieldmath.shield.bench.BenchComparison;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import org.junit.jupiter.api.Test;

/** The README's "Coil to coil through a sheet" snippet, run as written (readings invented). */
class ReadmeExampleTest {

    @Test
    void readmeSnippetRuns() {
        Medium copper = Medium.conductor("copper", iacs(100), 1);
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(10), 25), Coil.loop(mm(10), 25), mm(40));
        CouplingResult r = pair.through(Barrier.of(copper, mm(0.5))).at(kHz(10));
        // Common practice, no source: well over 10 dB at 10 kHz; the textbook planar estimate is higher.
        assertTrue(r.shieldingEffectivenessDb() > 15);
        assertTrue(r.planarEstimate().shieldingEffectivenessDb() > r.shieldingEffectivenessDb());
        double mv = r.inducedVoltage(DriveCurrent.ofMilliamperes(100, AmplitudeMeasure.RMS, kHz(10)))
                .millivolts(AmplitudeMeasure.PEAK_TO_PEAK);
        assertEquals(2 * Math.PI * 1e4 * r.shieldedMutualInductance().abs() * 0.1 * Math.sqrt(2) * 2 * 1e3, mv,
                1e-9 * mv);
        BenchComparison bench = BenchComparison.of(
                VoltageReading.of(0.412, 0.004, AmplitudeMeasure.PEAK_TO_PEAK),
                VoltageReading.of(0.031, 0.001, AmplitudeMeasure.PEAK_TO_PEAK),
                r);
        // 20·log10(0.412/0.031) = 22.47 dB, at most 22.95 dB: below the infinite sheet.
        assertEquals(BenchVerdict.BELOW_MODEL, bench.verdict());
        assertTrue(bench.explanation().contains("finite plate"));
    }
}
