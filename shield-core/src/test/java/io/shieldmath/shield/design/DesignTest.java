/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.PlanarResult;
import static io.shieldmath.shield.quantity.Quantities.GHz;
import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.nT;
import static io.shieldmath.shield.quantity.Quantities.uT;
import static io.shieldmath.shield.quantity.Quantities.um;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.SheetResistance;
import java.util.List;
import org.junit.jupiter.api.Test;

class DesignTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);       // IEC 60028
    private static final Medium ALUMINIUM = Medium.conductor("aluminium", iacs(61), 1);  // 1100-class, from memory
    private static final Medium BRASS = Medium.conductor("brass", iacs(27.6), 1);        // 16 MS/m, from memory
    private static final IncidentField PLANE = IncidentField.planeWave();

    @Test
    void requiredShieldingIsTheRatioOfIncidentToTolerated() {
        Requirement need = Requirement.none().plus(FrequencyBand.at(Hz(50)), uT(40), nT(10));
        assertEquals(20 * Math.log10(4000), need.entries().get(0).requiredDb(), 1e-12);
    }

    @Test
    void marginNamesTheWorstBand() {
        Requirement need = Requirement.none()
                .plus(FrequencyBand.at(Hz(50)), uT(40), nT(10))
                .plus(FrequencyBand.of(kHz(15), kHz(25)), uT(3), nT(200));
        Barrier plate = Barrier.of(COPPER, mm(1));
        MarginReport m = need.marginOf(plate.facing(
                IncidentField.magneticNearField(cm(6), ImpedanceForm.TEXTBOOK)));
        // Copper is nearly transparent at 50 Hz, so the 50 Hz band limits (common practice, no source).
        assertEquals(Hz(50), m.worst().frequency());
        assertFalse(m.meets());
        assertEquals(m.lines().get(0).seDb() - 72.04, m.worstMarginDb(), 0.01);
    }

    @Test
    void thickGoodConductorThicknessMatchesTheAbsorptionFormula() {
        // Where absorption dominates (B ≈ 0), t = δ·(target − R)/8.686 (Ott 2009 ch. 6).
        double target = 200;
        FrequencyBand at1MHz = FrequencyBand.at(MHz(1));
        ThicknessSolution s = ThicknessSolver.minimumThickness(Barrier.of(COPPER, mm(1)), 0, PLANE, at1MHz, target,
                mm(10));
        assertTrue(s.isFound(), s::explanation);
        PlanarResult thick = Barrier.of(COPPER, mm(3)).facing(PLANE).at(MHz(1));
        double delta = COPPER.skinDepth(MHz(1)).toMetres();
        double expected = delta * (target - thick.reflectionDb()) / (20 / Math.log(10));
        assertEquals(expected, s.thickness().toMetres(), expected * 1e-6);
    }

    @Test
    void solvedThicknessMeetsTheTargetAndJustBelowMisses() {
        Medium steel = Medium.conductor("steel", iacs(12), PermeabilityModel.relaxation(300, kHz(50)));
        IncidentField near = IncidentField.magneticNearField(cm(5), ImpedanceForm.EXACT_DIPOLE);
        FrequencyBand band = FrequencyBand.of(kHz(1), kHz(100));
        for (double target : new double[] {20, 45, 80}) {
            Barrier b = Barrier.of(COPPER, um(20)).thenGap(mm(1)).then(steel, mm(1));
            ThicknessSolution s = ThicknessSolver.minimumThickness(b, 2, near, band, target, mm(20));
            assertTrue(s.isFound(), s::explanation);
            Length t = s.thickness();
            double at = BandSearch.worst(b.withLayer(2, b.layers().get(2).withThickness(t))
                    .facing(near), band).seDb();
            double below = BandSearch.worst(b.withLayer(2, b.layers().get(2)
                    .withThickness(t.multipliedBy(1 - 1e-4))).facing(near), band).seDb();
            assertTrue(at >= target && at < target + 0.01, () -> target + ": " + at);
            assertTrue(below < target, () -> target + " below: " + below);
        }
    }

    @Test
    void anUnreachableTargetIsSaidPlainly() {
        ThicknessSolution s = ThicknessSolver.minimumThickness(Barrier.of(COPPER, mm(1)), 0,
                IncidentField.magneticNearField(cm(6), ImpedanceForm.TEXTBOOK), FrequencyBand.at(Hz(50)), 60, mm(2));
        assertFalse(s.isFound());
        assertTrue(s.explanation().startsWith("no thickness up to 2 mm meets 60.00 dB"), s::explanation);
    }

    @Test
    void rankingReproducesTheHandComputedOrder() {
        // Hand computation, plane wave at 1 MHz, target 150 dB, using R = 168 + 10·log10(σr/f) and
        // t = δ·(150 − R)/8.686 (Ott 2009 ch. 6 formulas; B ≈ 0 at several skin depths):
        //   copper    σr 1.000: R 108.0, δ 0.0661 mm, t ≈ 0.32 mm, 8890 kg/m³ → 2.8 kg/m²
        //   aluminium σr 0.610: R 105.9, δ 0.0846 mm, t ≈ 0.43 mm, 2700 kg/m³ → 1.2 kg/m²
        //   brass     σr 0.276: R 102.4, δ 0.1258 mm, t ≈ 0.69 mm, 8530 kg/m³ → 5.9 kg/m²
        // By areal mass: aluminium, copper, brass. By thickness: copper, aluminium, brass.
        List<Candidate> c = List.of(Candidate.of("brass", BRASS, Density.ofKilogramsPerCubicMetre(8530)),
                Candidate.of("copper", COPPER, Density.ofKilogramsPerCubicMetre(8890)),
                Candidate.of("aluminium", ALUMINIUM, Density.ofKilogramsPerCubicMetre(2700)));
        FrequencyBand band = FrequencyBand.at(MHz(1));
        Ranking byMass = MaterialRanking.rank(c, PLANE, band, io.shieldmath.shield.quantity.Decibels.of(150), mm(5), MaterialRanking.Criterion.AREAL_MASS);
        assertEquals(List.of("aluminium", "copper", "brass"),
                byMass.ranked().stream().map(e -> e.candidate().name()).toList());
        assertEquals(1.16, byMass.ranked().get(0).arealMass().toKilogramsPerSquareMetre(), 0.05);
        assertEquals(2.83, byMass.ranked().get(1).arealMass().toKilogramsPerSquareMetre(), 0.1);
        assertEquals(5.86, byMass.ranked().get(2).arealMass().toKilogramsPerSquareMetre(), 0.2);
        Ranking byThickness = MaterialRanking.rank(c, PLANE, band, io.shieldmath.shield.quantity.Decibels.of(150), mm(5), MaterialRanking.Criterion.THICKNESS);
        assertEquals(List.of("copper", "aluminium", "brass"),
                byThickness.ranked().stream().map(e -> e.candidate().name()).toList());
        Ranking tooThin = MaterialRanking.rank(c, PLANE, band, io.shieldmath.shield.quantity.Decibels.of(150), mm(0.4), MaterialRanking.Criterion.AREAL_MASS);
        assertEquals(List.of("copper"), tooThin.ranked().stream().map(e -> e.candidate().name()).toList());
        assertEquals(2, tooThin.excluded().size());
    }

    @Test
    void tiesAreBrokenByThicknessThenNameAndSaidSo() {
        List<Candidate> c = List.of(Candidate.of("copper B", COPPER, Density.ofKilogramsPerCubicMetre(8890)).withCostPerSquareMetre(10),
                Candidate.of("copper A", COPPER, Density.ofKilogramsPerCubicMetre(8890)).withCostPerSquareMetre(10));
        Ranking r = MaterialRanking.rank(c, PLANE, FrequencyBand.at(MHz(1)), io.shieldmath.shield.quantity.Decibels.of(150), mm(5),
                MaterialRanking.Criterion.COST_PER_SQUARE_METRE);
        assertEquals("copper A", r.ranked().get(0).candidate().name());
        assertTrue(r.ranked().get(0).note().startsWith("tied with copper B on cost per m²"), r.ranked().get(0)::note);
    }

    @Test
    void bandSearchFindsNarrowResonanceDipsLikeABruteForceSweep() {
        // Two low-resistance films 10 cm apart: the gap resonates at n·c/(2·0.1 m) ≈ n·1.5 GHz, where
        // SE dips sharply (the film-spacer-film resonance, common practice, no source).
        Barrier b = Barrier.of(Layer.film(SheetResistance.ofOhmsPerSquare(0.05))).thenGap(cm(10))
                .then(Layer.film(SheetResistance.ofOhmsPerSquare(0.05)));
        ShieldingModel<PlanarResult> model = b.facing(PLANE);
        FrequencyBand band = FrequencyBand.of(MHz(100), GHz(10));
        double bruteMin = Double.POSITIVE_INFINITY;
        for (double f : band.logSpacedHertz(200_000)) {
            bruteMin = Math.min(bruteMin, model.shieldingEffectivenessDb(f));
        }
        final double brute = bruteMin;
        BandSearch.WorstCase w = BandSearch.worst(model, band);
        assertTrue(w.seDb() <= brute + 0.01, () -> w + " vs brute force " + brute);
        // a plain 81-point sweep misses the dip by a wide margin
        double coarse = Double.POSITIVE_INFINITY;
        for (double f : band.logSpacedHertz(81)) {
            coarse = Math.min(coarse, model.shieldingEffectivenessDb(f));
        }
        assertTrue(coarse > brute + 1, "the case must have a dip narrower than the sweep spacing");
    }

    @Test
    void twoLayerAdviceKeepsSeAndPrefersTheOrderThatSparesTheHighMuLayer() {
        Medium nickelIron = Medium.conductor("80 % nickel-iron", iacs(2.9),
                PermeabilityModel.relaxation(60_000, Hz(300)));
        Requirement need = Requirement.none()
                .plus(FrequencyBand.at(Hz(50)), uT(40), nT(10))
                .plus(FrequencyBand.at(kHz(20)), uT(3), nT(200));
        IncidentField near = IncidentField.magneticNearField(cm(6), ImpedanceForm.EXACT_DIPOLE);
        TwoLayerAdvice.Advice a = TwoLayerAdvice.compare(COPPER, mm(0.5), nickelIron, mm(0.5), near, need,
                MagneticFluxDensity.ofTesla(0.75), cm(5));
        assertEquals(a.conductorFirst().margin().worstMarginDb(), a.magneticFirst().margin().worstMarginDb(), 1e-6);
        // 50 Hz limits the flux (copper transparent there), so both orders see B·D/t = 40 µT·100 = 4 mT.
        assertEquals(4e-3, a.magneticFirst().wallFluxDensity(), 1e-9);
        assertTrue(a.conductorFirst().wallFluxDensity() <= a.magneticFirst().wallFluxDensity());
        assertTrue(a.reasoning().contains("reciprocity"), a::reasoning);
    }
}
