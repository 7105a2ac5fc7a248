/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import java.util.concurrent.atomic.AtomicLong;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

class ToleranceStudyTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);
    private static final Medium STEEL = Medium.conductor("steel", iacs(12), PermeabilityModel.relaxation(300, kHz(50)));

    @Test
    void zeroTolerancesGiveTheNominalValueEveryTime() {
        Barrier b = Barrier.of(COPPER, mm(0.3)).thenGap(mm(1)).then(STEEL, mm(0.5));
        IncidentField f = IncidentField.magneticNearField(cm(5), ImpedanceForm.EXACT_DIPOLE);
        ToleranceResult r = ToleranceStudy.of(b, f).run(kHz(20), 40, 3000, 7L, ToleranceStudy.ProgressListener.NONE);
        for (double v : r.sortedValuesDb()) {
            assertEquals(r.nominalDb(), v, 0.0);
        }
        assertEquals(0.0, r.standardDeviationDb(), 1e-9);
    }

    @Test
    void percentilesConvergeToTheNormalDistributionWhenSeIsLinearInThickness() {
        // Thick copper at 1 MHz in a plane wave: SE = R + 8.686·t/δ (B ≈ 0), linear in t. With t normal,
        // N(t0, (0.05·t0)²), SE is normal with mean SE(t0) and sd 8.686·0.05·t0/δ. Quantiles from
        // Commons Math's NormalDistribution (an independent implementation).
        Barrier b = Barrier.of(COPPER, mm(1));
        IncidentField plane = IncidentField.planeWave();
        double delta = COPPER.skinDepth(MHz(1)).toMetres();
        double sd = 20 / Math.log(10) * 0.05 * 1e-3 / delta;
        ToleranceResult r = ToleranceStudy.of(b, plane).thickness(0.05, ToleranceStudy.Spread.NORMAL)
                .run(MHz(1), 0, 40_000, 2026L, ToleranceStudy.ProgressListener.NONE);
        NormalDistribution exact = new NormalDistribution(r.nominalDb(), sd);
        assertEquals(sd, r.standardDeviationDb(), sd * 0.02);
        assertEquals(r.nominalDb(), r.meanDb(), sd * 0.02);
        for (double p : new double[] {5, 25, 50, 75, 95}) {
            assertEquals(exact.inverseCumulativeProbability(p / 100), r.percentileDb(p), sd * 0.04, "p" + p);
        }
        // P(SE ≥ nominal + sd) = 1 − Φ(1) = 0.1587
        ToleranceResult r2 = ToleranceStudy.of(b, plane).thickness(0.05, ToleranceStudy.Spread.NORMAL)
                .run(MHz(1), r.nominalDb() + sd, 40_000, 2026L, ToleranceStudy.ProgressListener.NONE);
        assertEquals(1 - exact.cumulativeProbability(r.nominalDb() + sd), r2.probabilityOfMeeting(), 0.01);
    }

    @Test
    void uniformSpreadStaysWithinItsHalfWidth() {
        Barrier b = Barrier.of(COPPER, mm(1));
        IncidentField plane = IncidentField.planeWave();
        ToleranceResult r = ToleranceStudy.of(b, plane).thickness(0.1, ToleranceStudy.Spread.UNIFORM)
                .run(MHz(1), 0, 5000, 1L, ToleranceStudy.ProgressListener.NONE);
        double delta = COPPER.skinDepth(MHz(1)).toMetres();
        double half = 20 / Math.log(10) * 0.1 * 1e-3 / delta;
        assertTrue(r.percentileDb(0) >= r.nominalDb() - half - 1e-6);
        assertTrue(r.percentileDb(100) <= r.nominalDb() + half + 1e-6);
        // uniform on [−h, h] has sd h/√3
        assertEquals(half / Math.sqrt(3), r.standardDeviationDb(), half * 0.03);
    }

    @Test
    void sameSeedGivesSameResultAndProgressReachesTheTotal() {
        Barrier b = Barrier.of(COPPER, mm(0.3)).thenGap(mm(1)).then(STEEL, mm(0.5));
        IncidentField f = IncidentField.magneticNearField(cm(5), ImpedanceForm.TEXTBOOK);
        ToleranceStudy s = ToleranceStudy.of(b, f).thickness(0.05, ToleranceStudy.Spread.NORMAL)
                .conductivity(0.1, ToleranceStudy.Spread.UNIFORM).permeability(0.3, ToleranceStudy.Spread.NORMAL)
                .distance(0.1, ToleranceStudy.Spread.NORMAL);
        AtomicLong last = new AtomicLong();
        ToleranceResult a = s.run(kHz(20), 40, 5000, 99L, (done, total) -> last.accumulateAndGet(done, Math::max));
        ToleranceResult c = s.run(kHz(20), 40, 5000, 99L, ToleranceStudy.ProgressListener.NONE);
        assertArrayEquals(a.sortedValuesDb(), c.sortedValuesDb());
        assertEquals(5000, last.get());
        assertTrue(a.standardDeviationDb() > 0);
    }
}
