/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * A requirement band given directly as a required shielding effectiveness. Physics: SE is the
 * ratio of the field without the shield to the field with it, in dB (IEEE Std 299-2006,
 * clause 3), so a band needing the field cut from incident to tolerated needs
 * 20·log10(incident/tolerated) dB and the margin is SE − required. The barrier SE itself is the
 * library's planar model; only the arithmetic on it is checked here.
 */
class RequiredSeTest {

    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);  // IEC 60028
    private static final PlanarEvaluation SHEET = Barrier.of(COPPER, Length.ofMillimetres(0.5))              // demo
            .facing(IncidentField.magneticNearField(Length.ofCentimetres(10), ImpedanceForm.EXACT_DIPOLE));
    private static final Frequency F = Frequency.ofKilohertz(20);                                           // demo

    private static ShieldingModel<?> flat(double seDb) {
        return ShieldingModel.ofFunction("flat " + seDb + " dB",
                FrequencyBand.of(Frequency.ofHertz(1e-6), Frequency.ofHertz(1e13)), f -> seDb);
    }

    @Test
    void marginOfADirectCaseIsTheSeMinusTheRequiredSe() {
        // IEEE Std 299-2006 cl. 3: SE in dB; margin = SE − required. Single frequency: the SE there.
        Requirement need = Requirement.none().plus(FrequencyBand.at(F), Decibels.of(30));
        MarginReport m = need.marginOf(SHEET);
        double se = SHEET.shieldingEffectivenessDb(F.toHertz());
        assertEquals(se - 30, m.worstMarginDb(), 1e-12);
        assertEquals(se, m.worst().seDb(), 1e-12);
        assertEquals(F, m.worst().frequency());
        // A flat 45 dB model against 40 dB required: +5 dB (hand value); against 50 dB: −5 dB.
        assertEquals(5, Requirement.none().plus(FrequencyBand.parse("50 Hz to 10 kHz"), Decibels.of(40))
                .marginOf(flat(45)).worstMarginDb(), 1e-12);
        MarginReport missed = Requirement.none().plus(FrequencyBand.parse("50 Hz to 10 kHz"), Decibels.of(50))
                .marginOf(flat(45));
        assertEquals(-5, missed.worstMarginDb(), 1e-12);
        assertFalse(missed.meets());
    }

    @Test
    void aDirectCaseAndItsIncidentToleratedEquivalentGiveTheSameMargin() {
        // 8 µT to 5 nT is a field ratio of 1600: 20·log10(1600) = 64.0824 dB (hand value,
        // log10(1600) = 3.204120); 100 µT to 1 µT is 40 dB exactly.
        FrequencyBand band = FrequencyBand.parse("19 kHz to 21 kHz");
        Requirement bySource = Requirement.none()
                .plus(band, MagneticFluxDensity.ofMicrotesla(8), MagneticFluxDensity.ofNanotesla(5))
                .plus(FrequencyBand.at(F), MagneticFluxDensity.ofMicrotesla(100), MagneticFluxDensity.ofMicrotesla(1));
        Requirement direct = Requirement.none()
                .plus(band, Decibels.of(64.0824))
                .plus(FrequencyBand.at(F), Decibels.of(40));
        assertEquals(64.0824, bySource.entries().get(0).requiredDb(), 1e-4);
        MarginReport a = bySource.marginOf(SHEET);
        MarginReport b = direct.marginOf(SHEET);
        for (int i = 0; i < 2; i++) {
            assertEquals(a.lines().get(i).marginDb(), b.lines().get(i).marginDb(), 1e-4);
            assertEquals(a.lines().get(i).frequency(), b.lines().get(i).frequency());
        }
        assertEquals(a.lines().get(1).marginDb(), b.lines().get(1).marginDb(), 1e-12);
        assertEquals(a.meets(), b.meets());
    }

    @Test
    void aDirectEntryHasNoFieldsAndItsOwnEqualityAndText() {
        FrequencyBand band = FrequencyBand.parse("1 MHz to 10 MHz");
        Requirement.Entry e = Requirement.none().plus(band, Decibels.of(60)).entries().get(0);
        assertTrue(e.isDirect());
        assertEquals(Optional.empty(), e.incident());
        assertEquals(Optional.empty(), e.tolerated());
        assertEquals(60, e.requiredDb(), 0);
        assertEquals("1 MHz to 10 MHz: 60.0 dB required", e.toString());
        assertEquals(Requirement.none().plus(band, Decibels.of(60)), Requirement.none().plus(band, Decibels.of(60)));
        assertEquals(Requirement.none().plus(band, Decibels.of(60)).hashCode(),
                Requirement.none().plus(band, Decibels.of(60)).hashCode());
        assertNotEquals(Requirement.none().plus(band, Decibels.of(60)), Requirement.none().plus(band, Decibels.of(61)));
        // The same 40 dB given directly and by fields are different entries (the fields are kept).
        assertNotEquals(Requirement.none().plus(band, Decibels.of(40)), Requirement.none().plus(band,
                MagneticFluxDensity.ofMicrotesla(100), MagneticFluxDensity.ofMicrotesla(1)));
        Requirement.Entry bySource = Requirement.none().plus(band, MagneticFluxDensity.ofMicrotesla(100),
                MagneticFluxDensity.ofMicrotesla(1)).entries().get(0);
        assertFalse(bySource.isDirect());
        assertEquals(Optional.of(MagneticFluxDensity.ofMicrotesla(100)), bySource.incident());
        assertEquals(Optional.of(MagneticFluxDensity.ofMicrotesla(1)), bySource.tolerated());
        assertEquals("requirement:\n  1 MHz to 10 MHz: 100 µT incident, 1 µT tolerated, 40.0 dB required\n"
                + "  1 MHz to 10 MHz: 40.0 dB required", Requirement.none().plus(band,
                MagneticFluxDensity.ofMicrotesla(100), MagneticFluxDensity.ofMicrotesla(1))
                .plus(band, Decibels.of(40)).toString());
    }

    @Test
    void aRequiredSeOutsideZeroToFourHundredDbIsRefusedByName() {
        FrequencyBand band = FrequencyBand.at(F);
        assertEquals(0, Requirement.none().plus(band, Decibels.of(0)).entries().get(0).requiredDb(), 0);
        assertEquals(400, Requirement.none().plus(band, Decibels.of(400)).entries().get(0).requiredDb(), 0);
        InvalidQuantityException low = assertThrows(InvalidQuantityException.class,
                () -> Requirement.none().plus(band, Decibels.of(-0.5)));
        assertTrue(low.getMessage().contains("required shielding effectiveness"), low.getMessage());
        assertTrue(low.getMessage().contains("from 0 dB to 400 dB"), low.getMessage());
        assertThrows(InvalidQuantityException.class, () -> Requirement.none().plus(band, Decibels.of(400.5)));
        assertThrows(NullPointerException.class, () -> Requirement.none().plus(band, (Decibels) null));
        assertThrows(NullPointerException.class, () -> Requirement.none().plus(null, Decibels.of(10)));
        assertThrows(IllegalArgumentException.class, () -> new Requirement.Entry(band,
                Optional.of(MagneticFluxDensity.ofMicrotesla(1)), Optional.empty(), 10));
        assertThrows(InvalidQuantityException.class, () -> new Requirement.Entry(band, Optional.empty(),
                Optional.empty(), Double.NaN));
    }

    @Test
    void theTwoLayerAdviceRefusesADirectCaseItCannotEstimateTheWallFluxFor() {
        Requirement direct = Requirement.none().plus(FrequencyBand.at(F), Decibels.of(40));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> TwoLayerAdvice.compare(
                COPPER, Length.ofMillimetres(1), COPPER, Length.ofMillimetres(1),
                IncidentField.magneticNearField(Length.ofCentimetres(20), ImpedanceForm.TEXTBOOK), direct,
                MagneticFluxDensity.ofTesla(0.75), Length.ofCentimetres(10)));
        assertTrue(e.getMessage().contains("gives only a required SE"), e.getMessage());
        TwoLayerAdvice.Question q = TwoLayerAdvice.of(Layer.of(COPPER, Length.ofMillimetres(1)),
                Layer.of(COPPER, Length.ofMillimetres(1)));
        assertThrows(IllegalArgumentException.class, () -> q.meeting(direct));
        assertEquals(List.of(), Requirement.none().entries());
    }
}
