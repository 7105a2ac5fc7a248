/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.junit.jupiter.api.Test;

/** How an enclosure combines its paths (leakage paths add as field amplitudes: Ott 2009 ch. 6, common practice). */
class EnclosureTest {

    /** Invented demo material and box; the wall is aluminium 6061-T6 at about 43 % IACS (Ott 2009 Table 6-1 and handbook tables, from memory). */
    private static final Medium ALUMINIUM = Medium.conductor("aluminium 6061-T6", iacs(43), 1);

    static Enclosure demoBox() {
        return Enclosure.of(Shell.box(cm(30), cm(20), cm(15)).wall(ALUMINIUM, mm(1.5)))
                .withOpening(Opening.holes(mm(4), 120).named("vent"))
                .withOpening(Opening.seam(cm(8)).named("lid seam"));
    }

    @Test
    void pathsAddAsFieldAmplitudesAndTheWorstOneIsNamed() {
        EnclosureResult r = demoBox().facing(IncidentField.planeWave()).at(MHz(300));
        double lambda = PhysicalConstants.SPEED_OF_LIGHT / 3e8;
        double vent = 20 * Math.log10(lambda / (2 * 0.004)) - 10 * Math.log10(120);
        double seam = 20 * Math.log10(lambda / (2 * 0.08));
        double wall = Barrier.of(ALUMINIUM, mm(1.5)).facing(IncidentField.planeWave()).at(MHz(300)).shieldingEffectivenessDb();
        assertEquals(wall, r.wall().shieldingEffectivenessDb(), 1e-9);
        assertEquals(vent, r.paths().get(1).shieldingEffectivenessDb(), 1e-9);
        assertEquals(seam, r.paths().get(2).shieldingEffectivenessDb(), 1e-9);
        double tau = Math.pow(10, -wall / 20) + Math.pow(10, -vent / 20) + Math.pow(10, -seam / 20);
        assertEquals(-20 * Math.log10(tau), r.shieldingEffectivenessDb(), 1e-9);
        assertEquals("lid seam", r.limitingPath().name());
        EnclosureResult rss = demoBox().withPathSum(PathSum.ROOT_SUM_SQUARE).facing(IncidentField.planeWave())
                .at(MHz(300));
        double tau2 = Math.sqrt(Math.pow(10, -wall / 10) + Math.pow(10, -vent / 10) + Math.pow(10, -seam / 10));
        assertEquals(-20 * Math.log10(tau2), rss.shieldingEffectivenessDb(), 1e-9);
        assertTrue(rss.shieldingEffectivenessDb() >= r.shieldingEffectivenessDb());
    }

    @Test
    void closedEnclosureIsItsWall() {
        Shell s = Shell.sphere(cm(10)).wall(ALUMINIUM, mm(1));
        Enclosure closed = Enclosure.of(s);
        assertEquals(s.at(Hz(1000)).shieldingEffectivenessDb(), closed.inUniformField().at(Hz(1000)).shieldingEffectivenessDb(), 1e-12);
        assertEquals(Math.max(0, s.staticShielding().shieldingEffectivenessDb()), closed.staticShielding().shieldingEffectivenessDb(), 1e-12);
        assertEquals(5, closed.inUniformField().sweep(FrequencyBand.of(Hz(10), Hz(1e5)), 5).size());
    }

    @Test
    void atLowFrequencyTheWallLimitsAndTheHoleTakesOverAsFrequencyRises() {
        Enclosure e = Enclosure.of(Shell.sphere(cm(10)).wall(ALUMINIUM, mm(1)))
                .withOpening(Opening.hole(mm(10)).named("cable hole"));
        assertEquals("wall", e.inUniformField().at(Hz(50)).limitingPath().name());
        assertEquals("cable hole", e.inUniformField().at(MHz(1)).limitingPath().name());
    }
}
