/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.bench.BenchVerdict;
import io.shieldmath.shield.bench.VoltageReading;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.model.Sweep;
import org.junit.jupiter.api.Test;

/**
 * The bench prediction on an invented bench (two 20-turn loops of 10 mm radius, 50 mm apart,
 * a 2 mm aluminium plate of 25 mm radius): it must be the solver's own number, the infinite
 * sheet must sit above it, and invented readings above, at and below it must get the verdicts
 * they call for.
 */
class BenchPredictionTest {

    private static final Material ALUMINIUM = Catalogue.builtIn().get("aluminium-1100-o");
    private static final CoilPair PAIR = CoilPair.coaxial(Coil.loop(mm(10), 20), Coil.loop(mm(10), 20), mm(50));
    private static final BenchPrediction BENCH = BenchPrediction.ofPlate(ALUMINIUM, mm(25), mm(2), PAIR);
    private static final PredictedReading AT_10_KHZ = BENCH.at(kHz(10));

    @Test
    void thePredictionIsTheSolversNumberAndTheSheetIsTheExactInfiniteSheet() {
        CouplingSolution direct = Arrangement.of(Body.disc("plate", ALUMINIUM, mm(25), mm(2))).between(PAIR)
                .at(kHz(10));
        // Equal evaluations give bit-identical results (the solver's contract), so exact equality.
        assertEquals(direct.insertionLossDb(), AT_10_KHZ.finitePlateDb().value(), 0);
        assertEquals(direct.insertionLossEstimateDb(), AT_10_KHZ.finitePlateDb().estimate(), 0);
        assertEquals(direct.insertionLossDb(), AT_10_KHZ.shieldingEffectivenessDb(), 0);
        assertEquals(direct.insertionLossDb(), BENCH.shieldingEffectivenessDb(1e4), 0);
        double sheet = PAIR.through(Barrier.of(ALUMINIUM, mm(2))).at(kHz(10)).shieldingEffectivenessDb();
        assertEquals(sheet, AT_10_KHZ.infiniteSheetDb(), 0);
        assertEquals(sheet - direct.insertionLossDb(), AT_10_KHZ.infiniteSheetAboveDb(), 1e-12);
    }

    @Test
    void aMovedPlateAndTheSolverOptionsAreTheSolversToo() {
        BenchPrediction moved = BENCH.withPlateShiftedBy(mm(10)).withFineness(0.7);
        CouplingSolution direct = Arrangement.of(Body.disc("plate", ALUMINIUM, mm(25), mm(2)).shiftedBy(mm(10)))
                .between(PAIR).withFineness(0.7).at(kHz(10));
        assertEquals(direct.insertionLossDb(), moved.at(kHz(10)).finitePlateDb().value(), 0);
        assertEquals(moved.finitePlate(), Arrangement.of(Body.disc("plate", ALUMINIUM, mm(25), mm(2))
                .shiftedBy(mm(10))).between(PAIR).withFineness(0.7));
        assertEquals(BENCH, BenchPrediction.ofPlate(ALUMINIUM, mm(25), mm(2), PAIR));
        assertEquals(BENCH, BENCH.withPlateShiftedBy(mm(4)).withPlateShiftedBackBy(mm(4)));
    }

    @Test
    void theSweepIsTheSolversSweep() {
        FrequencyBand band = FrequencyBand.of(kHz(1), kHz(10));
        Sweep<PredictedReading> s = BENCH.sweep(band, 2);
        Sweep<CouplingSolution> direct = BENCH.finitePlate().sweep(band, 2);
        for (int i = 0; i < 2; i++) {
            assertEquals(direct.results().get(i).insertionLossDb(), s.results().get(i).shieldingEffectivenessDb(), 0);
        }
    }

    @Test
    void theInfiniteSheetSitsWellAboveAPlateTwoAndAHalfCoilRadiiWide() {
        // Common practice, no source: between small coaxial coils a plate one or two coil radii
        // wide reaches a plateau of roughly 10-20 dB at 10 kHz for a good conductor several skin
        // depths thick (2 mm aluminium is about 2.4 skin depths here), because flux rounds the rim;
        // the infinite sheet keeps rising with thickness.
        double finite = AT_10_KHZ.finitePlateDb().value();
        assertTrue(finite > 5 && finite < 20, AT_10_KHZ::toString);
        assertTrue(AT_10_KHZ.infiniteSheetAboveDb() > 10, AT_10_KHZ::toString);
    }

    @Test
    void aPlateEightCoilRadiiWideReadsTheInfiniteSheet() {
        // Against the exact infinite-sheet coupling (Moser, IEEE Trans. EMC 9 (1967)): a plate far wider
        // than the coils leaves no path round its rim, so the sheet sits less than 0.1 dB above it (the
        // limit the solver's wide-disc agreement test keeps). Invented bench: 25-turn loops of 10 mm radius,
        // 40 mm apart, 0.5 mm copper (about 0.76 skin depths at 10 kHz), plate radius 80 mm.
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(10), 25), Coil.loop(mm(10), 25), mm(40));
        PredictedReading wide = BenchPrediction.ofPlate(Catalogue.builtIn().get("copper-annealed"), mm(80), mm(0.5),
                pair).at(kHz(10));
        assertEquals(0, wide.infiniteSheetAboveDb(), 0.1, wide::toString);
    }

    @Test
    void theVoltagesToExpectFollowTheLossAndMaxwellsMutualInductance() {
        DriveCurrent drive = DriveCurrent.ofMilliamperes(100, AmplitudeMeasure.RMS, kHz(10));
        double without = AT_10_KHZ.voltageWithoutPlate(drive).volts(AmplitudeMeasure.PEAK);
        double with = AT_10_KHZ.voltageWithPlate(drive).volts(AmplitudeMeasure.PEAK);
        // Identity: the voltage ratio is the insertion loss.
        assertEquals(AT_10_KHZ.shieldingEffectivenessDb(), 20 * Math.log10(without / with), 1e-9);
        // Without the plate: ω·M·I with M from Maxwell's closed form for coaxial circles (Grover 1946,
        // as CoilPair computes it), 100 mA RMS = 141.4 mA peak.
        double maxwell = 2 * Math.PI * 1e4 * PAIR.freeSpaceMutualInductance().toHenries() * 0.1 * Math.sqrt(2);
        assertEquals(maxwell, without, 1e-12 * maxwell);
        // With the plate: the solver's own |jωM|·I agrees to its free-space discretisation error
        // (2.5e-3 relative at the default fineness for this pair, measured; 1e-3 at fineness 2 in
        // FreeSpaceCouplingTest), which the insertion loss cancels.
        double solver = 2 * Math.PI * 1e4 * AT_10_KHZ.finitePlate().mutualInductance().abs() * 0.1 * Math.sqrt(2);
        assertEquals(solver, with, 5e-3 * solver);
        assertThrows(IllegalArgumentException.class,
                () -> AT_10_KHZ.voltageWithPlate(DriveCurrent.ofMilliamperes(100, AmplitudeMeasure.RMS, kHz(11))));
    }

    /** Readings of an invented bench whose measured loss is {@code lossDb}, each read to ±0.5 %. */
    private static BenchAgreement readingsAt(double lossDb) {
        double v0 = 0.412;
        double v1 = v0 * Math.pow(10, -lossDb / 20);
        return AT_10_KHZ.against(VoltageReading.ofRelative(v0, 0.005, AmplitudeMeasure.PEAK_TO_PEAK),
                VoltageReading.ofRelative(v1, 0.005, AmplitudeMeasure.PEAK_TO_PEAK));
    }

    @Test
    void verdictsOnInventedReadingsAboveWithinAndBelowThePrediction() {
        double p = AT_10_KHZ.shieldingEffectivenessDb();
        // ±0.5 % on each reading is about ±0.09 dB on the loss: 3 dB off is well outside.
        BenchAgreement above = readingsAt(p + 3);
        BenchAgreement within = readingsAt(p + 0.05);
        BenchAgreement below = readingsAt(p - 3);
        assertEquals(BenchVerdict.ABOVE_MODEL, above.verdict(), above::explanation);
        assertEquals(BenchVerdict.CONSISTENT, within.verdict(), within::explanation);
        assertEquals(BenchVerdict.BELOW_MODEL, below.verdict(), below::explanation);
        assertEquals(p + 3, above.measuredDb(), 1e-9);
        assertTrue(within.lowerDb() < within.measuredDb() && within.measuredDb() < within.upperDb());
        assertEquals(0.087, within.upperDb() - within.measuredDb(), 0.002);   // 20·log10(1.005/0.995)
        // Against the infinite sheet all three are below: a finite plate never reaches it here.
        for (BenchAgreement a : new BenchAgreement[] {above, within, below}) {
            assertEquals(BenchVerdict.BELOW_MODEL, a.infiniteSheetVerdict(), a::explanation);
            assertEquals(AT_10_KHZ.infiniteSheetAboveDb(), a.infiniteSheetAboveDb(), 0);
        }
        assertTrue(within.explanation().contains("agrees with the finite-plate prediction"), within::explanation);
        assertTrue(above.explanation().contains("more loss than the finite plate"), above::explanation);
        assertTrue(below.explanation().contains("less loss than the finite plate"), below::explanation);
    }

    @Test
    void theDiscretisationEstimateAndAModelToleranceWidenTheAgreement() {
        double p = AT_10_KHZ.shieldingEffectivenessDb();
        BenchAgreement a = readingsAt(p + 1.5);
        assertEquals(BenchVerdict.ABOVE_MODEL, a.verdict());
        assertEquals(AT_10_KHZ.finitePlateDb().estimate(), a.toleranceDb(), 0);
        BenchAgreement tolerant = a.withModelToleranceDb(2);
        assertEquals(BenchVerdict.CONSISTENT, tolerant.verdict(), tolerant::explanation);
        assertEquals(AT_10_KHZ.finitePlateDb().estimate() + 2, tolerant.toleranceDb(), 1e-12);
        assertEquals(BenchVerdict.ABOVE_MODEL, a.verdict(), "the original is unchanged");
    }

    @Test
    void badInputIsRefusedWithItsQuantityNamed() {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> BENCH.at(MHz(500)));
        assertTrue(e.getMessage().contains("frequency"), e.getMessage());
        assertThrows(InvalidQuantityException.class, () -> BENCH.shieldingEffectivenessDb(-1));
        assertThrows(NullPointerException.class, () -> BenchPrediction.ofPlate(null, mm(25), mm(2), PAIR));
        assertThrows(NullPointerException.class, () -> BenchPrediction.ofPlate(ALUMINIUM, mm(25), mm(2), null));
        assertThrows(InvalidQuantityException.class, () -> BenchPrediction.ofPlate(ALUMINIUM, mm(0), mm(2), PAIR));
        assertThrows(InvalidQuantityException.class, () -> readingsAt(10).withModelToleranceDb(-1));
        assertThrows(NullPointerException.class, () -> AT_10_KHZ.against(null,
                VoltageReading.ofRelative(0.1, 0.01, AmplitudeMeasure.PEAK)));
        // A plate that cuts a coil's winding: the coils sit at ±25 mm.
        assertThrows(IllegalArgumentException.class, () -> BENCH.withPlateShiftedBy(mm(25)));
    }
}
