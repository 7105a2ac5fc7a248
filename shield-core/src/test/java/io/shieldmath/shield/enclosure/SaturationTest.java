/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.amperesPerMetre;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.gauss;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.oersted;
import static io.shieldmath.shield.quantity.Quantities.tesla;
import static io.shieldmath.shield.quantity.Quantities.uT;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.junit.jupiter.api.Test;

/** Wall flux density against the thin-shell hand estimates (from memory), thresholds and units. */
class SaturationTest {

    private static final Medium ALLOY = ShellStaticTest.magnetic(50_000);

    @Test
    void exactLinearWallFluxTendsToTheHandEstimates() {
        // B ≈ µ0·H0·D/t (cylinder across the field), (3/2)·µ0·H0·R/t (sphere), for µr·t/R ≫ 1 (thin-shell hand estimates, from memory).
        MagneticFieldStrength h0 = amperesPerMetre(40);
        SaturationCheck cyl = Shell.cylinderTransverse(cm(5)).wall(ALLOY, mm(1)).saturation(h0, tesla(0.75));
        double handCyl = PhysicalConstants.MU_0 * 40 * 2 * 0.0505 / 0.001;
        assertEquals(handCyl, cyl.handEstimate(0).toTesla(), 1e-12);
        assertEquals(handCyl, cyl.wallFluxDensity(0).toTesla(), 0.02 * handCyl);
        SaturationCheck sph = Shell.sphere(cm(5)).wall(ALLOY, mm(1)).saturation(h0, tesla(0.75));
        double handSph = 1.5 * PhysicalConstants.MU_0 * 40 * 0.0505 / 0.001;
        assertEquals(handSph, sph.handEstimate(0).toTesla(), 1e-12);
        assertEquals(handSph, sph.wallFluxDensity(0).toTesla(), 0.02 * handSph);
        // with low µr·t/R part of the field goes through the cavity: less flux in the wall than the hand value
        SaturationCheck weak = Shell.cylinderTransverse(cm(5)).wall(ShellStaticTest.magnetic(20), mm(1))
                .saturation(h0, tesla(0.75));
        assertTrue(weak.wallFluxDensity(0).toTesla() < 0.5 * weak.handEstimate(0).toTesla());
    }

    @Test
    void ambientFieldUnitsGiveTheSameFlux() {
        // 1 Oe = 1000/(4π) A/m; 1 G = 100 µT; H = B/µ0 in air (unit definitions, SI brochure).
        Shell s = Shell.sphere(cm(10)).wall(ALLOY, mm(0.5));
        double perAm = s.saturation(amperesPerMetre(1000 / (4 * Math.PI)), tesla(0.75)).wallFluxDensity(0).toTesla();
        double perOe = s.saturation(oersted(1), tesla(0.75)).wallFluxDensity(0).toTesla();
        assertEquals(perAm, perOe, 1e-12 * perAm);
        double perGauss = s.saturation(MagneticFieldStrength.from(gauss(0.5)), tesla(0.75)).wallFluxDensity(0).toTesla();
        double perUt = s.saturation(MagneticFieldStrength.from(uT(50)), tesla(0.75)).wallFluxDensity(0).toTesla();
        assertEquals(perGauss, perUt, 1e-12 * perUt);
    }

    @Test
    void warnsFromHalfOfSaturationAndSuggestsAThickness() {
        Shell s = Shell.cylinderTransverse(cm(5)).wall(ALLOY, mm(1));
        double bPerAm = s.saturation(amperesPerMetre(1), tesla(0.75)).wallFluxDensity(0).toTesla();
        SaturationCheck low = s.saturation(amperesPerMetre(0.4 * 0.75 / bPerAm), tesla(0.75));
        SaturationCheck mid = s.saturation(amperesPerMetre(0.6 * 0.75 / bPerAm), tesla(0.75));
        SaturationCheck high = s.saturation(amperesPerMetre(1.2 * 0.75 / bPerAm), tesla(0.75));
        assertFalse(low.isWarning());
        assertTrue(low.warnings().isEmpty());
        assertTrue(mid.isWarning() && !mid.isSaturated());
        assertTrue(high.isSaturated());
        assertEquals(1, high.warnings().size());
        // the suggested thickness brings the wall to about half of saturation
        double t = high.suggestedMinimumThickness(0).orElseThrow().toMetres();
        assertEquals(2.4e-3, t, 1e-9);
        SaturationCheck thicker = Shell.cylinderTransverse(cm(5)).wall(ALLOY, m(t))
                .saturation(high.ambient(), tesla(0.75));
        assertEquals(0.5, thicker.fractionOfSaturation(0), 0.03);
        // along the axis of an infinite tube no thickness helps: B = µr·µ0·H0
        SaturationCheck axial = Shell.cylinderAxial(cm(5)).wall(ALLOY, mm(1)).saturation(amperesPerMetre(1), tesla(1.5));
        assertEquals(50_000 * PhysicalConstants.MU_0, axial.wallFluxDensity(0).toTesla(), 1e-9);
        assertTrue(axial.suggestedMinimumThickness(0).isEmpty());
    }
}
