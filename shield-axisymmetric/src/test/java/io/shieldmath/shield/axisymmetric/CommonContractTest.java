/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.design.BandSearch;
import io.shieldmath.shield.design.ThicknessSolution;
import io.shieldmath.shield.design.ThicknessSolver;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.Sweep;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The axisymmetric evaluations behind the library's one evaluation contract: the design
 * tools take them with no adapter.
 */
class CommonContractTest {

    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofMegasiemensPerMetre(58), 1);
    private static final CoilPair PAIR = CoilPair.coaxial(Coil.loop(mm(10), 1), Coil.loop(mm(10), 1), mm(20));

    @Test
    void theThicknessSolverSizesALargeDiscAsItSizesTheInfiniteSheet() {
        // Target 20 dB at 10 kHz. A disc of 12 coil radii acts as the infinite sheet (Dodd &
        // Deeds 1968, the library's spectral coupling model, checked in InfiniteSheetLimitTest),
        // so the tool must find the same thickness on both models.
        FrequencyBand at10k = FrequencyBand.at(kHz(10));
        ThicknessSolution sheet = ThicknessSolver.resizing(t -> PAIR.through(Barrier.of(COPPER, Length.ofMetres(t))))
                .over(at10k).toMeet(Decibels.of(20)).between(mm(0.05), mm(2));
        ThicknessSolution disc = ThicknessSolver.resizing(t -> Arrangement.of(
                        Body.disc("plate", COPPER, mm(120), Length.ofMetres(t))).between(PAIR).withFineness(0.5))
                .over(at10k).toMeet(Decibels.of(20)).between(mm(0.05), mm(2));
        System.out.printf(Locale.ROOT, "thickness for 20 dB at 10 kHz: sheet %s, 120 mm disc %s%n",
                sheet.thickness(), disc.thickness());
        assertTrue(sheet.isFound() && disc.isFound());
        assertEquals(sheet.thickness().toMetres(), disc.thickness().toMetres(), 0.01 * sheet.thickness().toMetres());
    }

    @Test
    void theBandSearchFindsTheLowEndOfARisingLoss() {
        // Eddy-current shielding by a non-magnetic plate rises with frequency (Kaden 1959; the
        // infinite-sheet model does so too), so the worst case over a band is its lower end.
        CoilCoupling plate = Arrangement.of(Body.disc("plate", COPPER, mm(25), mm(0.5))).between(PAIR).withFineness(0.5);
        BandSearch.WorstCase w = BandSearch.worst(plate, FrequencyBand.of(kHz(1), kHz(10)), 3);
        assertEquals(1e3, w.frequency().toHertz(), 1e-6 * 1e3);
        assertEquals(plate.shieldingEffectivenessDb(1e3), w.seDb(), 0.0);
    }

    @Test
    void aSweepIsTheCommonSweepOnOneMesh() {
        CoilCoupling plate = Arrangement.of(Body.disc("plate", COPPER, mm(25), mm(0.5))).between(PAIR).withFineness(0.5);
        FrequencyBand band = FrequencyBand.of(kHz(1), kHz(100));
        Sweep<CouplingSolution> s = plate.sweep(band, 4);
        assertEquals(4, s.size());
        double[] f = band.logSpacedHertz(4);
        for (int i = 0; i < 4; i++) {
            assertEquals(f[i], s.frequenciesHertz()[i], 0.0);
            assertEquals(f[i], s.get(i).hertz(), 0.0);
        }
        assertEquals(0, s.lowestSampledIndex());
        // The model's own type check: the contract's static view sees the same results.
        ShieldingModel<CouplingSolution> m = plate;
        assertEquals(s.get(3).shieldingEffectivenessDb(), m.sweep(band, 4).get(3).shieldingEffectivenessDb(), 0.0);
    }

    @Test
    void theValidBandIsChecked() {
        CoilCoupling plate = Arrangement.of(Body.disc("plate", COPPER, mm(25), mm(0.5))).between(PAIR);
        assertEquals(CoilCoupling.LOWEST_HERTZ, plate.validBand().low().toHertz(), 0.0);
        assertEquals(plate.quasiStaticLimit(), plate.validBand().high());
        InvalidQuantityException low = assertThrows(InvalidQuantityException.class, () -> plate.at(Hz(1e-7)));
        assertTrue(low.getMessage().contains("magnetostatic()"), low.getMessage());
        assertThrows(InvalidQuantityException.class,
                () -> plate.sweep(FrequencyBand.of(Hz(1e-7), Hz(1)), 2));
        AxialFieldShielding can = Arrangement.of(Body.can("can", COPPER, mm(10), mm(1), mm(30))).inUniformAxialField();
        assertThrows(InvalidQuantityException.class, () -> can.at(Hz(1e-7)));
        // 0 Hz stays available on the primitive form, as the static solve.
        assertEquals(can.magnetostatic().shieldingEffectivenessDb(), can.shieldingEffectivenessDb(0), 0.0);
    }
}
