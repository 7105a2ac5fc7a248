/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.design.ToleranceResult;
import io.shieldmath.shield.design.ToleranceStudy;
import io.shieldmath.shield.design.ToleranceStudy.Spread;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A stored range becomes the relative tolerance the tolerance study takes. */
class RangeToleranceTest {

    private final Catalogue cat = Catalogue.builtIn();

    /**
     * 80 % nickel-iron: the stored low-field range 20 000 to 100 000 (the permeability table of the
     * Permeability article and ezcalculator.net, named in the catalogue) around the typical µdc; the study
     * varies µ' − 1, so tol = max(high − µ, µ − low)/(µ − 1).
     */
    @Test
    void permeabilityRangeOfNickelIron() {
        Material mu = cat.get("nickel-iron-80");
        double typical = mu.permeability().staticValue();
        RangeTolerance t = RangeTolerance.of(mu, MaterialProperty.PERMEABILITY).orElseThrow();
        assertEquals(Math.max(100_000 - typical, typical - 20_000) / (typical - 1), t.relative(), 1e-12);
        assertFalse(t.isCapped());
        assertEquals(Spread.UNIFORM, t.spread());
        assertEquals("nickel-iron-80", t.materialId());
    }

    /** Lead: 4.55 to 4.87 MS/m, typical at the low end, so tol = (4.87 − 4.55)/4.55. */
    @Test
    void conductivityRangeOfLead() {
        RangeTolerance t = RangeTolerance.of(cat.get("lead"), MaterialProperty.CONDUCTIVITY).orElseThrow();
        assertEquals((4.87 - 4.55) / 4.55, t.relative(), 1e-9);
    }

    /** Nickel µr 100 to 600 with 100 kept: (600 − 100)/99 is above the study's limit of 1, so it is capped. */
    @Test
    void aWideRangeIsCappedAndSaysSo() {
        RangeTolerance t = RangeTolerance.of(cat.get("nickel"), MaterialProperty.PERMEABILITY).orElseThrow();
        assertEquals(1.0, t.relative(), 0);
        assertTrue(t.isCapped());
        assertTrue(t.toString().contains("capped"), t.toString());
    }

    @Test
    void noRangeNoTolerance() {
        Material cu = cat.get("copper-annealed");
        assertTrue(RangeTolerance.of(cu, MaterialProperty.CONDUCTIVITY).isEmpty());
        assertTrue(RangeTolerance.of(cat.get("stainless-304"), MaterialProperty.CONDUCTIVITY).isEmpty());
        ToleranceStudy s = ToleranceStudy.of(Barrier.of(cu, Length.ofMillimetres(1)), IncidentField.planeWave());
        assertSame(s, RangeTolerance.widest(s, List.of(cu)));
        assertThrows(IllegalArgumentException.class, () -> RangeTolerance.of(cu, MaterialProperty.DENSITY));
    }

    /**
     * The study drawn from the ranges gives exactly the result of the same study with the tolerances set
     * by hand (same seed, same samples), and a different one from the study without them.
     */
    @Test
    void theStudyDrawsFromTheRangeWhenAsked() {
        Material gold = cat.get("gold");
        Material mu = cat.get("nickel-iron-80");
        Barrier b = Barrier.of(gold, Length.ofMicrometres(50)).then(mu, Length.ofMillimetres(0.3));
        IncidentField loop = IncidentField.magneticNearField(Length.ofCentimetres(5), ImpedanceForm.TEXTBOOK);
        ToleranceStudy plain = ToleranceStudy.of(b, loop);
        ToleranceStudy fromRanges = RangeTolerance.widest(plain, List.of(gold, mu));
        double sigmaTol = RangeTolerance.of(gold, MaterialProperty.CONDUCTIVITY).orElseThrow().relative();
        double muTol = RangeTolerance.of(mu, MaterialProperty.PERMEABILITY).orElseThrow().relative();
        assertEquals((44.6 - 41.0) / 41.0, sigmaTol, 1e-9);
        ToleranceStudy byHand = plain.conductivity(sigmaTol, Spread.UNIFORM).permeability(muTol, Spread.UNIFORM);
        ToleranceResult a = run(fromRanges);
        ToleranceResult h = run(byHand);
        ToleranceResult n = run(plain);
        assertArrayEquals(h.sortedValuesDb(), a.sortedValuesDb(), 0);
        assertTrue(a.standardDeviationDb() > 0.1, a.toString());
        assertEquals(0, n.standardDeviationDb(), 1e-9);
    }

    private static ToleranceResult run(ToleranceStudy s) {
        return s.at(Frequency.ofKilohertz(1)).toMeet(Decibels.of(30)).samples(2048).seed(19L).run();
    }
}
