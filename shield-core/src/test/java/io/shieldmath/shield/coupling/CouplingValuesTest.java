/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.bench.BenchVerdict;
import io.shieldmath.shield.bench.VoltageReading;
import io.shieldmath.shield.bench.BenchComparison;
import io.shieldmath.shield.internal.Elliptic;
import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.model.Sweep;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Coils, pairs, readings and results: geometry, validation edges and value semantics. Physics
 * values: Maxwell's closed form for coaxial circles (Maxwell, Treatise art. 701; Grover 1946), Faraday's law V = jωM·I, the
 * sine amplitude forms (pp = 2·peak, RMS = peak/√2) and the 20·log10 field-ratio definition (§2).
 */
class CouplingValuesTest {

    private static final Medium COPPER = CouplingPhysicsTest.COPPER;

    @Test
    void coilsPlaceTheirRingsAcrossTheWinding() {
        // Ring centres at the middle of equal sub-widths: r + w·((i + ½)/n − ½), z likewise.
        Coil c = Coil.loop(Length.ofMillimetres(20), 60).withWinding(Length.ofMillimetres(4), Length.ofMillimetres(6),
                2, 3);
        assertArrayEquals(new double[] {0.019, 0.021, 0.019, 0.021, 0.019, 0.021}, c.ringRadii(), 1e-15);
        assertArrayEquals(new double[] {-0.002, -0.002, 0, 0, 0.002, 0.002}, c.ringOffsets(), 1e-15);
        assertEquals(6, c.ringCount());
        assertEquals(10, c.turnsPerRing(), 0);
        assertEquals(0.004, c.radialWidth().map(Length::toMetres).orElse(0.0), 0);
        assertEquals(0.006, c.axialLength().map(Length::toMetres).orElse(0.0), 0);
        assertEquals(Length.ofMillimetres(20), c.radius());
        assertEquals(60, c.turns());
        assertEquals(120, c.withTurns(120).turns());
        assertEquals(60, c.turns());                                         // unchanged
        assertEquals(0.004, c.withTurns(120).radialWidth().map(Length::toMetres).orElse(0.0), 0);        // winding kept
        assertEquals("coil r 20 mm, 60 turns, winding 0.004 m × 0.006 m as 2×3 rings", c.toString());
        Coil loop = Coil.loop(Length.ofMillimetres(20), 5);
        assertEquals("loop r 20 mm, 5 turns", loop.toString());
        assertEquals(1, loop.ringCount());
        assertArrayEquals(new double[] {0.02}, loop.ringRadii(), 0);
        assertArrayEquals(new double[] {0}, loop.ringOffsets(), 0);
        // A single ring with a radial width still prints as a coil.
        assertTrue(loop.withWinding(Length.ofMillimetres(2), Length.ofMillimetres(1e-3), 1, 1).toString()
                .startsWith("coil r 20 mm"));
        // Value semantics over every field.
        assertEquals(c, Coil.loop(Length.ofMillimetres(20), 60).withWinding(Length.ofMillimetres(4),
                Length.ofMillimetres(6), 2, 3));
        assertEquals(c.hashCode(), Coil.loop(Length.ofMillimetres(20), 60).withWinding(Length.ofMillimetres(4),
                Length.ofMillimetres(6), 2, 3).hashCode());
        assertNotEquals(c, c.withTurns(61));
        assertNotEquals(c, Coil.loop(Length.ofMillimetres(21), 60).withWinding(Length.ofMillimetres(4),
                Length.ofMillimetres(6), 2, 3));
        assertNotEquals(c, c.withWinding(Length.ofMillimetres(5), Length.ofMillimetres(6), 2, 3));
        assertNotEquals(c, c.withWinding(Length.ofMillimetres(4), Length.ofMillimetres(7), 2, 3));
        assertNotEquals(c, c.withWinding(Length.ofMillimetres(4), Length.ofMillimetres(6), 3, 3));
        assertNotEquals(c, c.withWinding(Length.ofMillimetres(4), Length.ofMillimetres(6), 2, 2));
        assertNotEquals(c.hashCode(), c.withWinding(Length.ofMillimetres(4), Length.ofMillimetres(6), 2, 2)
                .hashCode());
    }

    @Test
    void coilLimits() {
        Coil.loop(Length.ofMetres(1e-4), 1);
        Coil.loop(Length.ofMetres(10), 1_000_000);
        assertEquals("coil radius: 11 m is out of range; allowed: from 0.0001 m to 10 m",
                assertThrows(InvalidQuantityException.class, () -> Coil.loop(Length.ofMetres(11), 1)).getMessage());
        assertEquals("turns: 0 turns is out of range; allowed: from 1 turns to 1000000 turns",
                assertThrows(InvalidQuantityException.class, () -> Coil.loop(Length.ofMetres(1), 0)).getMessage());
        Coil c = Coil.loop(Length.ofMillimetres(10), 1);
        assertThrows(InvalidQuantityException.class, () -> c.withTurns(1_000_001));
        // The winding is narrower than the coil's diameter.
        c.withWinding(Length.ofMillimetres(19.99), Length.ofMillimetres(1), 1, 1);
        assertThrows(InvalidQuantityException.class,
                () -> c.withWinding(Length.ofMillimetres(20), Length.ofMillimetres(1), 1, 1));
        assertThrows(InvalidQuantityException.class,
                () -> c.withWinding(Length.ofMillimetres(1), Length.ofMetres(11), 1, 1));
        c.withWinding(Length.ofMillimetres(1), Length.ofMillimetres(1), Coil.MAX_RINGS_PER_DIRECTION,
                Coil.MAX_RINGS_PER_DIRECTION);
        assertThrows(InvalidQuantityException.class,
                () -> c.withWinding(Length.ofMillimetres(1), Length.ofMillimetres(1), 65, 1));
        assertThrows(InvalidQuantityException.class,
                () -> c.withWinding(Length.ofMillimetres(1), Length.ofMillimetres(1), 1, 0));
        assertThrows(NullPointerException.class, () -> c.withWinding(null, Length.ofMillimetres(1), 1, 1));
        assertThrows(NullPointerException.class, () -> c.withWinding(Length.ofMillimetres(1), null, 1, 1));
        assertThrows(NullPointerException.class, () -> Coil.loop(null, 1));
    }

    @Test
    void pairsMeasureTheirGapAndSumMaxwellOverRings() {
        Coil tx = Coil.loop(Length.ofMillimetres(15), 8).withWinding(Length.ofMillimetres(2), Length.ofMillimetres(4),
                1, 2);
        Coil rx = Coil.loop(Length.ofMillimetres(10), 6).withWinding(Length.ofMillimetres(2), Length.ofMillimetres(2),
                2, 2);
        CoilPair p = CoilPair.coaxial(tx, rx, Length.ofMillimetres(30));
        // Transmitter rings at z = ±1 mm; receiver rings at 30 mm ± 0.5 mm: gap 28.5 mm.
        assertEquals(0.0285, p.gap().toMetres(), 1e-15);
        assertEquals(Length.ofMillimetres(30), p.separation());
        assertSame(tx, p.transmitter());
        assertSame(rx, p.receiver());
        double sum = 0;
        for (double za : new double[] {-0.001, 0.001}) {
            for (double rb : new double[] {0.0095, 0.0105}) {
                for (double zb : new double[] {-0.0005, 0.0005}) {
                    sum += 4 * 1.5 * Elliptic.maxwell(0.015, rb, 0.03 + zb - za);
                }
            }
        }
        assertEquals(sum, p.freeSpaceMutualInductance().toHenries(), 1e-13 * sum);
        // Reciprocity: M12 = M21 (Neumann's formula is symmetric).
        CoilPair back = p.swapped();
        assertSame(rx, back.transmitter());
        assertEquals(p.freeSpaceMutualInductance().toHenries(), back.freeSpaceMutualInductance().toHenries(), 1e-13 * sum);
        assertEquals(p.gap(), back.gap());
        // Spectral rule and closed form agree for the free-space pair.
        assertEquals(sum, p.rule().freeSpace, 1e-9 * sum);
        assertEquals(tx + " to " + rx + ", 30 mm apart", p.toString());
    }

    @Test
    void pairLimits() {
        Coil loop = Coil.loop(Length.ofMillimetres(10), 1);
        // The gap must be at least 0.05 times the largest ring radius; the edge is allowed.
        CoilPair edge = CoilPair.coaxial(loop, loop, Length.ofMetres(CoilPair.MIN_GAP_RATIO * 0.01));
        assertEquals(CoilPair.MIN_GAP_RATIO * 0.01, edge.gap().toMetres(), 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CoilPair.coaxial(loop, loop, Length.ofMetres(Math.nextDown(CoilPair.MIN_GAP_RATIO * 0.01))));
        assertTrue(e.getMessage().startsWith("the gap between the coils' nearest windings is "), e::getMessage);
        // The largest radius of either coil sets the limit.
        Coil big = Coil.loop(Length.ofMillimetres(100), 1);
        assertThrows(IllegalArgumentException.class, () -> CoilPair.coaxial(loop, big, Length.ofMillimetres(4)));
        assertThrows(IllegalArgumentException.class, () -> CoilPair.coaxial(big, loop, Length.ofMillimetres(4)));
        CoilPair.coaxial(big, loop, Length.ofMillimetres(6));
        assertThrows(InvalidQuantityException.class, () -> CoilPair.coaxial(loop, loop, Length.ofMetres(1001)));
        assertThrows(NullPointerException.class, () -> CoilPair.coaxial(null, loop, Length.ofMillimetres(5)));
        assertThrows(NullPointerException.class, () -> CoilPair.coaxial(loop, null, Length.ofMillimetres(5)));
        assertThrows(NullPointerException.class, () -> CoilPair.coaxial(loop, loop, null));
        // A barrier fits in the gap, up to exactly the gap.
        CoilPair p = CoilPair.coaxial(loop, loop, Length.ofMillimetres(5));
        p.through(Barrier.of(COPPER, Length.ofMillimetres(5)));
        String tooThick = assertThrows(IllegalArgumentException.class,
                () -> p.through(Barrier.of(COPPER, Length.ofMillimetres(5.1)))).getMessage();
        assertTrue(tooThick.startsWith("the barrier is 0.00509") && tooThick.endsWith(
                " m thick but the gap between the coils is only 0.005 m"), tooThick);
        assertThrows(NullPointerException.class, () -> p.through(null));
    }

    @Test
    void evaluationsAgreeAcrossTheirEntryPoints() {
        CoilPair p = CouplingPhysicsTest.SMALL;
        Barrier b = Barrier.of(COPPER, Length.ofMillimetres(0.2));
        CouplingEvaluation e = p.through(b);
        assertSame(p, e.pair());
        assertSame(b, e.barrier());
        assertEquals(p + " through " + b, e.toString());
        double[] f = {100, 1e4, 1e6};
        double[] out = new double[4];
        out[3] = -1;
        assertSame(out, e.shieldingEffectivenessDb(f, out));
        Sweep<CouplingResult> sweep = e.sweep(FrequencyBand.parse("100 Hz to 1 MHz"), 3);
        assertEquals(3, sweep.size());
        for (int i = 0; i < 3; i++) {
            double single = e.shieldingEffectivenessDb(f[i]);
            assertEquals(single, out[i], 0);
            assertEquals(single, e.at(Frequency.ofHertz(f[i])).shieldingEffectivenessDb(), 0);
            assertEquals(single, sweep.get(i).shieldingEffectivenessDb(), 1e-9);
            assertEquals(f[i], sweep.get(i).frequency().toHertz(), 1e-9);
        }
        assertEquals(-1, out[3], 0);
        assertTrue(out[2] > out[0], "copper shields more at higher frequency");
        assertEquals("output array holds 2 values but 3 frequencies were given",
                assertThrows(IllegalArgumentException.class, () -> e.shieldingEffectivenessDb(f, new double[2])).getMessage());
        // The frequency range 1 mHz to 1 GHz is closed at both ends.
        e.shieldingEffectivenessDb(CouplingEvaluation.MIN_HERTZ);
        e.shieldingEffectivenessDb(CouplingEvaluation.MAX_HERTZ);
        assertThrows(InvalidQuantityException.class, () -> e.shieldingEffectivenessDb(Math.nextUp(CouplingEvaluation.MAX_HERTZ)));
        assertThrows(InvalidQuantityException.class,
                () -> e.shieldingEffectivenessDb(new double[] {1, 0.5e-3}, new double[2]));
        assertThrows(InvalidQuantityException.class, () -> e.at(Frequency.ofGigahertz(2)));
        assertThrows(InvalidQuantityException.class, () -> e.sweep(FrequencyBand.parse("0.1 mHz to 1 Hz"), 2));
        assertThrows(InvalidQuantityException.class, () -> e.sweep(FrequencyBand.parse("1 Hz to 2 GHz"), 2));
        assertThrows(NullPointerException.class, () -> e.sweep(null, 2));
        assertThrows(NullPointerException.class, () -> e.shieldingEffectivenessDb(null, out));
        assertThrows(NullPointerException.class, () -> e.shieldingEffectivenessDb(f, null));
        assertThrows(NullPointerException.class, () -> e.at(null));
        // log|x + jy| helper: |3 + 4j| = 5; 0 gives −∞.
        assertEquals(Math.log(5), Numerics.logAbs(3, 4), 1e-15);
        assertEquals(Math.log(5e-200), Numerics.logAbs(-3e-200, 4e-200), 1e-12);
        assertEquals(Double.NEGATIVE_INFINITY, Numerics.logAbs(0, 0));
    }

    @Test
    void resultsGiveTheMutualImpedanceAndInducedVoltages() {
        Frequency f = Frequency.ofKilohertz(5);
        CouplingResult r = CouplingPhysicsTest.SMALL.through(Barrier.of(COPPER, Length.ofMillimetres(0.3))).at(f);
        Complex m = io.shieldmath.shield.TestComplex.cm(r.shieldedMutualInductance());
        assertTrue(Math.abs(m.getImaginary()) > 1e-3 * m.abs(), "eddy currents shift the phase of M");
        // Z = jωM (e^{jωt} convention, common practice).
        Complex z = m.multiply(Complex.I).multiply(f.angular());
        assertEquals(z.getReal(), r.mutualImpedance().real(), 1e-12 * z.abs());
        assertEquals(z.getImaginary(), r.mutualImpedance().imaginary(), 1e-12 * z.abs());
        assertEquals(20 * Math.log10(r.freeSpaceMutualInductance().toHenries() / m.abs()), r.shieldingEffectivenessDb(), 1e-9);
        assertEquals(r.shieldingEffectivenessDb(), r.shieldingEffectiveness().toDb(), 0);
        assertEquals(f, r.frequency());
        assertEquals(String.format(java.util.Locale.ROOT, "IL %.2f dB at 5 kHz (M free %.6g H; planar estimate %.2f dB)",
                r.shieldingEffectivenessDb(), r.freeSpaceMutualInductance().toHenries(), r.planarEstimate().shieldingEffectivenessDb()), r.toString());
        // The drive must be at the result's frequency.
        DriveCurrent other = DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, Frequency.ofKilohertz(6));
        assertEquals("the drive current is at 6 kHz but this result is at 5 kHz",
                assertThrows(IllegalArgumentException.class, () -> r.inducedVoltage(other)).getMessage());
        assertThrows(IllegalArgumentException.class, () -> r.freeSpaceInducedVoltage(other));
        assertThrows(NullPointerException.class, () -> r.inducedVoltage(null));
        DriveCurrent i = DriveCurrent.ofAmperes(2, AmplitudeMeasure.PEAK, f);
        assertEquals(f.angular() * m.abs() * 2, r.inducedVoltage(i).volts(AmplitudeMeasure.PEAK),
                1e-12 * f.angular() * m.abs() * 2);
        assertEquals(r.inducedVoltage(i).volts(AmplitudeMeasure.PEAK) * 1e3,
                r.inducedVoltage(i).millivolts(AmplitudeMeasure.PEAK), 1e-9);
    }

    @Test
    void drivesReadingsAndVoltagesAreValues() {
        Frequency f = Frequency.ofKilohertz(1);
        DriveCurrent a = DriveCurrent.ofMilliamperes(200, AmplitudeMeasure.PEAK_TO_PEAK, f);
        assertEquals(0.1, a.amperes(AmplitudeMeasure.PEAK), 1e-15);
        assertEquals(0.1 / Math.sqrt(2), a.amperes(AmplitudeMeasure.RMS), 1e-15);
        assertEquals(f, a.frequency());
        assertEquals(a, DriveCurrent.ofAmperes(0.1, AmplitudeMeasure.PEAK, f));
        assertEquals(a.hashCode(), DriveCurrent.ofAmperes(0.1, AmplitudeMeasure.PEAK, f).hashCode());
        assertNotEquals(a, DriveCurrent.ofAmperes(0.2, AmplitudeMeasure.PEAK, f));
        assertNotEquals(a, DriveCurrent.ofAmperes(0.1, AmplitudeMeasure.PEAK, Frequency.ofKilohertz(2)));
        assertEquals("0.100000 A pk at 1 kHz", a.toString());
        // Drive current limit: 1 MA peak, stated in the caller's measure.
        DriveCurrent.ofAmperes(2e6, AmplitudeMeasure.PEAK_TO_PEAK, f);
        assertThrows(InvalidQuantityException.class, () -> DriveCurrent.ofAmperes(2.1e6, AmplitudeMeasure.PEAK_TO_PEAK, f));
        assertEquals("drive current: 0 A rms is out of range; allowed: finite and greater than 0 A rms",
                assertThrows(InvalidQuantityException.class, () -> DriveCurrent.ofAmperes(0, AmplitudeMeasure.RMS, f))
                        .getMessage());
        assertThrows(NullPointerException.class, () -> DriveCurrent.ofAmperes(1, null, f));
        assertThrows(NullPointerException.class, () -> DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, null));

        VoltageReading v = VoltageReading.of(2, 0.2, AmplitudeMeasure.PEAK_TO_PEAK);
        assertEquals(1, v.volts(AmplitudeMeasure.PEAK), 0);
        assertEquals(0.1, v.uncertaintyVolts(AmplitudeMeasure.PEAK), 1e-16);
        assertEquals(0.1 / Math.sqrt(2), v.uncertaintyVolts(AmplitudeMeasure.RMS), 1e-16);
        assertEquals(v, VoltageReading.ofRelative(1, 0.1, AmplitudeMeasure.PEAK));
        assertEquals(v.hashCode(), VoltageReading.ofRelative(1, 0.1, AmplitudeMeasure.PEAK).hashCode());
        assertNotEquals(v, VoltageReading.of(1, 0.2, AmplitudeMeasure.PEAK));
        assertNotEquals(v, VoltageReading.of(1.1, 0.1, AmplitudeMeasure.PEAK));
        assertEquals("1.00000 V pk ± 0.100 V", v.toString());
        VoltageReading.ofRelative(1, 0, AmplitudeMeasure.PEAK);
        VoltageReading.ofRelative(1, 1, AmplitudeMeasure.PEAK);
        assertThrows(InvalidQuantityException.class, () -> VoltageReading.of(1, -0.1, AmplitudeMeasure.PEAK));
        assertThrows(NullPointerException.class, () -> VoltageReading.of(1, 0, null));

        SineVoltage s = SineVoltage.ofVolts(1, AmplitudeMeasure.RMS);
        assertEquals(Math.sqrt(2), s.volts(AmplitudeMeasure.PEAK), 1e-15);
        assertEquals(1e3, s.millivolts(AmplitudeMeasure.RMS), 1e-12);
        SineVoltage pp = SineVoltage.ofVolts(2, AmplitudeMeasure.PEAK_TO_PEAK);
        assertEquals(pp, SineVoltage.ofVolts(1, AmplitudeMeasure.PEAK));
        assertEquals(pp.hashCode(), SineVoltage.ofVolts(1, AmplitudeMeasure.PEAK).hashCode());
        assertNotEquals(pp, SineVoltage.ofVolts(1.5, AmplitudeMeasure.PEAK));
        assertEquals("1.41421 V pk", s.toString());
        assertEquals(0, SineVoltage.ofVolts(0, AmplitudeMeasure.PEAK).volts(AmplitudeMeasure.RMS), 0);
        assertThrows(InvalidQuantityException.class, () -> SineVoltage.ofVolts(-1, AmplitudeMeasure.PEAK));
        assertThrows(NullPointerException.class, () -> SineVoltage.ofVolts(1, null));
        assertThrows(NullPointerException.class, () -> s.volts(null));
        assertEquals("pk", AmplitudeMeasure.PEAK.symbol());
        assertEquals("pp", AmplitudeMeasure.PEAK_TO_PEAK.symbol());
        assertEquals("rms", AmplitudeMeasure.RMS.symbol());
    }

    @Test
    void benchComparisonEdges() {
        // 1 V without, 0.1 V with the plate: 20 dB measured (20·log10 of the field ratio, common practice, no source).
        VoltageReading open = VoltageReading.of(1, 0.1, AmplitudeMeasure.PEAK);
        VoltageReading covered = VoltageReading.of(0.1, 0.01, AmplitudeMeasure.PEAK);
        BenchComparison c = BenchComparison.of(open, covered, 19);
        assertEquals(20, c.measuredDb(), 1e-12);
        assertEquals(1, c.differenceDb(), 1e-12);
        assertEquals(19, c.modelDb(), 0);
        double lower = 20 * Math.log10(0.9 / 0.11);
        double upper = 20 * Math.log10(1.1 / 0.09);
        assertEquals(lower, c.lowerDb(), 1e-12);
        assertEquals(upper, c.upperDb(), 1e-12);
        // Verdict edges: strictly above the model plus tolerance, strictly below the model minus it.
        assertEquals(BenchVerdict.CONSISTENT, BenchComparison.of(open, covered, lower).verdict());
        assertEquals(BenchVerdict.ABOVE_MODEL, BenchComparison.of(open, covered, lower - 1e-9).verdict());
        assertEquals(BenchVerdict.CONSISTENT, BenchComparison.of(open, covered, upper).verdict());
        assertEquals(BenchVerdict.BELOW_MODEL, BenchComparison.of(open, covered, upper + 1e-9).verdict());
        assertEquals(BenchVerdict.CONSISTENT, BenchComparison.of(open, covered, lower - 1).withModelToleranceDb(1)
                .verdict());
        assertEquals(BenchVerdict.ABOVE_MODEL, BenchComparison.of(open, covered, lower - 1.01).withModelToleranceDb(1)
                .verdict());
        assertEquals(BenchVerdict.CONSISTENT, BenchComparison.of(open, covered, upper + 1).withModelToleranceDb(1)
                .verdict());
        assertEquals(BenchVerdict.BELOW_MODEL, BenchComparison.of(open, covered, upper + 1.01).withModelToleranceDb(1)
                .verdict());
        assertThrows(InvalidQuantityException.class, () -> c.withModelToleranceDb(-1));
        assertThrows(InvalidQuantityException.class, () -> BenchComparison.of(open, covered, Double.NaN));
        assertThrows(NullPointerException.class, () -> BenchComparison.of(null, covered, 1));
        assertThrows(NullPointerException.class, () -> BenchComparison.of(open, null, 1));
        assertThrows(NullPointerException.class, () -> BenchComparison.of(open, covered, (CouplingResult) null));
        // A reading whose uncertainty reaches its value bounds nothing on that side.
        BenchComparison noLower = BenchComparison.of(VoltageReading.of(1, 1, AmplitudeMeasure.PEAK), covered, 18);
        assertEquals(Double.NEGATIVE_INFINITY, noLower.lowerDb());
        BenchComparison noUpper = BenchComparison.of(open, VoltageReading.of(0.1, 0.1, AmplitudeMeasure.PEAK), 18);
        assertEquals(Double.POSITIVE_INFINITY, noUpper.upperDb());
        assertEquals(String.format(java.util.Locale.ROOT, "measured 20.00 dB (%.2f to %.2f dB), model 18.00 dB: "
                + "consistent within the reading uncertainty.", lower, upper).replace("model 18.00", "model 19.00"), c.explanation());
        assertEquals(c.explanation(), c.toString());
        assertTrue(noUpper.explanation().contains(" to unbounded dB)"), noUpper::explanation);
        // From a model result: the model value is its insertion loss.
        CouplingResult r = CouplingPhysicsTest.SMALL.through(Barrier.of(COPPER, Length.ofMillimetres(0.1)))
                .at(Frequency.ofKilohertz(1));
        assertEquals(r.shieldingEffectivenessDb(), BenchComparison.of(open, covered, r).modelDb(), 0);
    }
}
