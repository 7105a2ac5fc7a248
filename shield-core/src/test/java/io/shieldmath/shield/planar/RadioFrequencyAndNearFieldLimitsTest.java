/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import static io.shieldmath.shield.quantity.Quantities.GHz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.megasiemensPerMetre;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Issue 18 items 1, 4 and 6: the relaxation permeability at RF, the textbook near-field
 * impedance where it is unreliable, negative R, and the validity notes of planar results.
 */
class RadioFrequencyAndNearFieldLimitsTest {

    private static final double DB_PER_NEPER = 20 / Math.log(10);
    private static final double MU0 = PhysicalConstants.MU_0;
    /** Demo steel with the numbers of the catalogue's steel-1010 entry: 7.0 MS/m, µdc 1000, fc 20 kHz. */
    private static final Medium STEEL = Medium.conductor("steel as steel-1010", megasiemensPerMetre(7.0),
            PermeabilityModel.relaxation(1000, kHz(20)));
    private static final Medium COPPER = Medium.conductor("annealed copper", iacs(100), 1);   // IEC 60028

    /**
     * A + R of a thick good-conductor plate in a plane wave, B left out (e^{−2γt} is below
     * 1e-10 in every case used): A = 20·log10|e^{γt}|, R = 20·log10|(1+K)²/(4K)|, K = η0/η,
     * γ = sqrt(jωµσ), η = jωµ/γ (S. A. Schelkunoff, Electromagnetic Waves, 1943; H. W. Ott,
     * Electromagnetic Compatibility Engineering, Wiley 2009, ch. 6), typed in with Commons
     * Math and the relaxation µ = 1 + (µdc − 1)/(1 + j f/fc) written out independently.
     */
    private static double thickPlateSe(double muDc, double fc, double sigma, double t, double hz) {
        Complex mu = Complex.ONE.add(new Complex(muDc - 1).divide(new Complex(1, hz / fc)));
        double w = 2 * Math.PI * hz;
        Complex jwmu = Complex.I.multiply(w * MU0).multiply(mu);
        Complex gamma = jwmu.multiply(sigma).sqrt();
        Complex eta = jwmu.divide(gamma);
        Complex k = new Complex(PhysicalConstants.ETA_0).divide(eta);
        double a = DB_PER_NEPER * gamma.getReal() * t;
        double r = 20 * Math.log10(Complex.ONE.add(k).pow(2).divide(k.multiply(4)).abs());
        return a + r;
    }

    @Test
    void thickSteelKeepsRisingAtRadioFrequencies() {
        // Issue 18: 0.76 mm of steel-1010 in a plane wave gave 305.4 dB at 1 MHz, 100 MHz and 1 GHz alike with
        // µ = µdc/(1 + j f/fc); with the relaxation to free space the issue's figures are 305, 462 and 1177 dB.
        Barrier plate = Barrier.of(STEEL, mm(0.76));
        IncidentField plane = IncidentField.planeWave();
        double[] hz = {1e6, 1e8, 1e9};
        double[] issue = {305, 462, 1177};
        double previous = 0;
        for (int i = 0; i < hz.length; i++) {
            double se = plate.facing(plane).at(Frequency.ofHertz(hz[i])).shieldingEffectivenessDb();
            double reference = thickPlateSe(1000, 20e3, 7.0e6, 0.76e-3, hz[i]);
            assertEquals(reference, se, 1e-6 * reference, "reference A + R");
            assertEquals(issue[i], se, 1.0);
            assertTrue(se > previous);
            previous = se;
        }
        // At 1 GHz µ is within 2 % of 1, so the textbook formulas with µr = 1 hold to about 1 %:
        // A = 131.4·t·sqrt(f·µr·σr), R = 168 + 10·log10(σr/(µr·f)), t in m, σr = σ/58 MS/m (Ott 2009, ch. 6).
        double sr = 7.0 / 58.0;
        double handbook = 131.4 * 0.76e-3 * Math.sqrt(1e9 * sr) + 168 + 10 * Math.log10(sr / 1e9);
        assertEquals(handbook, plate.facing(plane).at(GHz(1)).shieldingEffectivenessDb(), 0.015 * handbook);
    }

    @Test
    void thinSteelFoilAbsorbsAtLeastTheFreeSpacePermeabilityValue() {
        // Issue 18: 0.1 mm of steel at 100 MHz absorbed 28.9 dB with µ' below 1. With µ' ≥ 1 and µ'' ≥ 0,
        // Re sqrt(jωµ0µσ) ≥ sqrt(ωµ0σ/2), so A ≥ 8.686·t/δ(µr = 1) (A = 8.686·t/δ, Ott 2009 ch. 6): 45.7 dB.
        double delta = 1 / Math.sqrt(Math.PI * 1e8 * MU0 * 7.0e6);
        double floor = DB_PER_NEPER * 0.1e-3 / delta;
        assertEquals(45.7, floor, 0.05);
        PlanarResult r = Barrier.of(STEEL, mm(0.1)).facing(IncidentField.planeWave()).at(MHz(100));
        assertTrue(r.absorptionDb() >= floor, r::toString);
        // and exactly 20·log10|e^{γt}| with the complex µ of the relaxation (reference typed in above)
        Complex mu = Complex.ONE.add(new Complex(999).divide(new Complex(1, 1e8 / 20e3)));
        double a = DB_PER_NEPER * Complex.I.multiply(2 * Math.PI * 1e8 * MU0 * 7.0e6).multiply(mu).sqrt().getReal() * 0.1e-3;
        assertEquals(a, r.absorptionDb(), 1e-9 * a);
    }

    @Test
    void textbookImpedanceIsFlaggedWhereKIsSmall() {
        // Issue 18 item 4: 0.1 mm copper, 1 kHz, 1 cm from a loop. The magnitude form Zw = 2πfµ0r taken as real
        // gives 1.79 dB; the inductive near field Zw = jωµ0r (the kr → 0 limit of the dipole impedance,
        // Ott 2009 ch. 6; C. A. Balanis, Antenna Theory, ch. 4) gives 0.22 dB.
        Barrier foil = Barrier.of(COPPER, mm(0.1));
        double hz = 1e3;
        double r = 0.01;
        double zw = 2 * Math.PI * hz * MU0 * r;
        IncidentField textbook = IncidentField.magneticNearField(cm(1), ImpedanceForm.TEXTBOOK);
        PlanarResult magnitude = foil.facing(textbook).at(kHz(1));
        assertEquals(ReferenceChainMatrix.shieldingEffectivenessDb(foil, new Complex(zw, 0), hz),
                magnitude.shieldingEffectivenessDb(), 1e-9);
        assertEquals(1.79, magnitude.shieldingEffectivenessDb(), 0.005);
        double inductive = ReferenceChainMatrix.shieldingEffectivenessDb(foil, new Complex(0, zw), hz);
        assertEquals(0.22, inductive, 0.005);
        // The exact dipole form is the inductive one at kr = 2e-7.
        PlanarResult exact = foil.facing(IncidentField.magneticNearField(cm(1), ImpedanceForm.EXACT_DIPOLE)).at(kHz(1));
        assertEquals(inductive, exact.shieldingEffectivenessDb(), 1e-6);
        // The faces' |K| = Zw/|η|, |η| = sqrt(ωµ0/σ) = 1.17e-5 Ω (Ott 2009 ch. 6), is 6.8, above 3; the foil
        // (t/δ = 0.05) acts as one sheet of admittance σt, and its thin-sheet |K| = Zw·σt/2 = 0.23 is far below 3,
        // so the result carries the note.
        double eta = Math.sqrt(2 * Math.PI * hz * MU0 / 58.0e6);
        assertEquals(6.77, zw / eta, 0.01);
        assertEquals(0.229, zw * 58.0e6 * 0.1e-3 / 2, 0.001);
        assertEquals(List.of(ValidityNote.Limit.HAND_FORMULA_IMPEDANCE),
                magnitude.validityNotes().stream().map(ValidityNote::limit).toList());
        assertTrue(magnitude.validityNotes().get(0).message().startsWith("|K| = 0.229 for layer 0"),
                magnitude.validityNotes().get(0)::message);
        assertTrue(exact.validityNotes().isEmpty());
    }

    @Test
    void smallKAndLargeKrAreNoted() {
        // |K| = 2πfµ0r / sqrt(ωµ0|µr|/σ) (Ott 2009 ch. 6 impedances): 1 mm of the steel 10 cm from a loop at 1 kHz
        // has |K| ≈ 0.77 (computed below), below 3.
        double hz = 1e3;
        double zw = 2 * Math.PI * hz * MU0 * 0.1;
        double muAbs = Math.hypot(STEEL.permeability().real(hz), STEEL.permeability().loss(hz));
        double k = zw / Math.sqrt(2 * Math.PI * hz * MU0 * muAbs / 7.0e6);
        assertTrue(k < 3, () -> "|K| = " + k);
        PlanarResult steel = Barrier.of(STEEL, mm(1)).facing(IncidentField.magneticNearField(cm(10),
                ImpedanceForm.TEXTBOOK)).at(kHz(1));
        List<ValidityNote> notes = steel.validityNotes();
        assertEquals(1, notes.size(), notes::toString);
        assertEquals(ValidityNote.Limit.HAND_FORMULA_IMPEDANCE, notes.get(0).limit());
        assertTrue(notes.get(0).message().contains("EXACT_DIPOLE"), notes.get(0)::message);
        assertFalse(steel.isWithinValidityLimits());
        // The exact dipole form carries no such note.
        assertTrue(Barrier.of(STEEL, mm(1)).facing(IncidentField.magneticNearField(cm(10),
                ImpedanceForm.EXACT_DIPOLE)).at(kHz(1)).validityNotes().isEmpty());
        // kr = 2π·f·r/c: 1 m at 20 MHz is 0.42 (≥ 0.3), 1 m at 10 MHz is 0.21.
        IncidentField oneMetre = IncidentField.magneticNearField(io.shieldmath.shield.quantity.Quantities.m(1),
                ImpedanceForm.TEXTBOOK);
        assertTrue(Barrier.of(COPPER, mm(1)).facing(oneMetre).at(MHz(20)).validityNotes().stream()
                .anyMatch(n -> n.limit() == ValidityNote.Limit.NOT_NEAR_FIELD));
        assertTrue(Barrier.of(COPPER, mm(1)).facing(oneMetre).at(MHz(10)).validityNotes().isEmpty());
        // A plane wave never gets impedance notes.
        assertTrue(Barrier.of(STEEL, mm(1)).facing(IncidentField.planeWave()).at(kHz(1)).validityNotes().isEmpty());
    }

    @Test
    void reflectionLossCanBeNegativeWhereKIsNearOne() {
        // Issue 18 item 6: steel (7 MS/m, µr = 1000, real; demo values) 1 mm thick at 1 kHz and 10 cm, textbook
        // impedance: R = −1.15 dB. Independent value: R = 20·log10|(1+K)²/(4K)|, K = Zw/η, η = jωµ/γ (Ott 2009
        // ch. 6), typed in here with Commons Math.
        Medium steel = Medium.conductor("steel, µr 1000", megasiemensPerMetre(7.0), 1000);
        double hz = 1e3;
        double w = 2 * Math.PI * hz;
        Complex mu = new Complex(1000 * MU0);
        Complex gamma = Complex.I.multiply(w).multiply(mu).multiply(7.0e6).sqrt();
        Complex eta = Complex.I.multiply(w).multiply(mu).divide(gamma);
        Complex k = new Complex(w * MU0 * 0.1).divide(eta);
        double reference = 20 * Math.log10(Complex.ONE.add(k).pow(2).divide(k.multiply(4)).abs());
        PlanarResult r = Barrier.of(steel, mm(1)).facing(IncidentField.magneticNearField(cm(10),
                ImpedanceForm.TEXTBOOK)).at(kHz(1));
        assertEquals(reference, r.reflectionDb(), 1e-9);
        assertEquals(-1.15, r.reflectionDb(), 0.005);
        // The relaxation steel above (µ at 1 kHz = 997.5 − j49.8) gives −1.07 dB: also negative.
        assertTrue(Barrier.of(STEEL, mm(1)).facing(IncidentField.magneticNearField(cm(10),
                ImpedanceForm.TEXTBOOK)).at(kHz(1)).reflectionDb() < -1);
    }

    @Test
    void metalsAbove100GigahertzAreNoted() {
        // Conductivity is its DC value in the model; a metal's departs from it above about 100 GHz
        // (Drude relaxation times of 10 to 30 fs; Ashcroft and Mermin, Solid State Physics, 1976, ch. 1, from memory).
        Barrier plate = Barrier.of(COPPER, mm(0.01));
        List<ValidityNote> high = plate.facing(IncidentField.planeWave()).at(GHz(200)).validityNotes();
        assertEquals(List.of(ValidityNote.Limit.DC_CONDUCTIVITY), high.stream().map(ValidityNote::limit).toList());
        assertTrue(plate.facing(IncidentField.planeWave()).at(GHz(100)).validityNotes().isEmpty());
        // A dielectric layer is not a metal.
        Medium film = Medium.of("lossy film", io.shieldmath.shield.quantity.Conductivity.ofSiemensPerMetre(10),
                PermeabilityModel.constant(1), io.shieldmath.shield.quantity.RelativePermittivity.of(3));
        assertTrue(Barrier.of(film, mm(1)).facing(IncidentField.planeWave()).at(GHz(500)).validityNotes().isEmpty());
    }
}
