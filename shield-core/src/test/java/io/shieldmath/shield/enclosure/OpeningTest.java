/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.GHz;
import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The opening rules of H. W. Ott, Electromagnetic Compatibility Engineering, Wiley 2009,
 * ch. 6 (from memory), and Bethe's small-hole polarizability, through an enclosure whose
 * wall is so good that the opening alone limits it.
 */
class OpeningTest {

    /** 3 mm copper: far above 1000 dB at these frequencies, so openings alone count. */
    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);

    static double seDb(Opening o, double hz) {
        Enclosure e = Enclosure.of(Shell.box(cm(30), cm(30), cm(20)).wall(COPPER, mm(3))).withOpening(o);
        EnclosureResult r = e.facing(IncidentField.planeWave()).at(Hz(hz));
        assertEquals(o.name(), r.limitingPath().name());
        return r.shieldingEffectivenessDb();
    }

    @ParameterizedTest
    @CsvSource({"0.05, 1e8", "0.01, 1e9", "0.2, 3e8", "0.003, 2e9"})
    void singleOpeningFollowsTheHalfWavelengthRule(double l, double hz) {
        // SE = 20·log10(λ/(2L)) for L < λ/2 (Ott 2009 ch. 6)
        double lambda = PhysicalConstants.SPEED_OF_LIGHT / hz;
        assertEquals(20 * Math.log10(lambda / (2 * l)), seDb(Opening.slot(m(l), mm(1)), hz), 1e-9);
        assertEquals(20 * Math.log10(lambda / (2 * l)), seDb(Opening.seam(m(l)), hz), 1e-9);
    }

    @Test
    void openingsOfHalfAWavelengthOrMoreDoNotShield() {
        assertEquals(0, seDb(Opening.seam(cm(20)), 1e9), 0);   // λ/2 = 15 cm
        assertEquals(0, seDb(Opening.hole(cm(15)), 1e9), 0);   // L = λ/2 (to within 0.07 %)
    }

    @ParameterizedTest
    @CsvSource({"4, 6.0206", "100, 20", "1000, 30"})
    void arraysLoseTwentyLogRootN(int n, double lossDb) {
        // n equal openings: −20·log10(sqrt(n)) (Ott 2009 ch. 6)
        double one = seDb(Opening.hole(mm(5)), 1e8);
        assertEquals(one - lossDb, seDb(Opening.holes(mm(5), n), 1e8), 1e-3);
    }

    @Test
    void tubesBelowCutoffAddTheirAttenuation() {
        // round tube: ≈ 32·l/D dB (Ott 2009 ch. 6; exactly 8.686·3.682·l/D = 31.98·l/D far below cut-off)
        double bare = seDb(Opening.hole(mm(5)), 1e8);
        double tube = seDb(Opening.hole(mm(5)).throughTube(mm(10)), 1e8);
        assertEquals(32 * 10 / 5.0, tube - bare, 0.002 * 64);
        // rectangular tube: ≈ 27.3·l/w dB, w the larger side (Ott 2009 ch. 6)
        double slot = seDb(Opening.slot(mm(20), mm(3)), 1e8);
        double slotTube = seDb(Opening.slot(mm(20), mm(3)).throughTube(mm(30)), 1e8);
        assertEquals(27.3 * 30 / 20, slotTube - slot, 0.002 * 41);
        // above cut-off (TE11 of a 5 mm tube at 35.1 GHz) the tube adds nothing
        Opening hole = Opening.hole(mm(5));
        assertEquals(hole.farFieldDb(GHz(40).toHertz()), hole.throughTube(mm(10)).farFieldDb(GHz(40).toHertz()), 0);
        assertThrows(IllegalStateException.class, () -> Opening.seam(cm(5)).throughTube(mm(2)));
    }

    @Test
    void smallHoleInAUniformMagneticFieldLeaksByBethePolarizability() {
        // α_m = (4/3)·r³ (H. A. Bethe, Phys. Rev. 66 (1944) 163; from memory); at distance d on the axis
        // behind the hole the dipole with its image gives H = α_m·H_t/(2π d³), H_t = 1.5·H0 on a sphere.
        double r = 0.002;
        double d = 0.1;
        Shell can = Shell.sphere(m(d)).wall(COPPER, mm(3));
        Enclosure e = Enclosure.of(can).withOpening(Opening.hole(m(2 * r)).named("hole"));
        double expected = -20 * Math.log10(1.5 * (4.0 / 3) * r * r * r / (2 * Math.PI * d * d * d));
        EnclosureResult ac = e.inUniformField().at(MHz(1));
        assertEquals("hole", ac.limitingPath().name());
        assertEquals(expected, ac.shieldingEffectivenessDb(), 1e-6);
        // the polarizability scales with r³: half the diameter, 18.06 dB more
        Enclosure smaller = Enclosure.of(can).withOpening(Opening.hole(m(r)));
        assertEquals(expected + 20 * Math.log10(8), smaller.inUniformField().at(MHz(1)).shieldingEffectivenessDb(), 1e-6);
        // a victim closer to the hole sees more: d³
        Enclosure near = Enclosure.of(can).withOpening(Opening.hole(m(2 * r)).atDistance(m(d / 2)));
        assertEquals(expected - 20 * Math.log10(8), near.inUniformField().at(MHz(1)).shieldingEffectivenessDb(), 1e-6);
        assertTrue(ac.limitingPath().model().contains("Bethe"));
    }
}
