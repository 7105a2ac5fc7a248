/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Length;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The split SE = A + R + B stays meaningful when a stack has air gaps: R counts each layer
 * that is not free space against the wave impedance, so it is continuous as a gap shrinks
 * to zero.
 */
class ReflectionSplitTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);
    private static final Medium STEEL = Medium.conductor("steel", iacs(12), 300);
    private static final IncidentField LOOP = IncidentField.magneticNearField(cm(6), ImpedanceForm.EXACT_DIPOLE);

    @Test
    void aVanishingGapLeavesTheReflectionAndMultipleReflectionPartsInPlace() {
        // Regression: with R taken interface by interface, inserting a 0.001 mm air gap in a near
        // field moved R from 30.8 dB to 118 dB and B to −88 dB while SE stayed put.
        Barrier solid = Barrier.of(COPPER, mm(0.5)).then(STEEL, mm(0.5));
        PlanarResult a = solid.facing(LOOP).at(kHz(20));
        for (double gapMm : new double[] {1e-3, 1e-6, 1e-9}) {
            PlanarResult b = Barrier.of(COPPER, mm(0.5)).thenGap(mm(gapMm)).then(STEEL, mm(0.5))
                    .facing(LOOP).at(kHz(20));
            assertEquals(a.shieldingEffectivenessDb(), b.shieldingEffectivenessDb(), 1e-3 + 10 * gapMm);
            assertEquals(a.reflectionDb(), b.reflectionDb(), 1e-9);
            assertEquals(a.multipleReflectionDb(), b.multipleReflectionDb(), 1e-3 + 10 * gapMm);
        }
    }

    @Test
    void aSlabOfAirHasNoReflectionAndNoMultipleReflectionPart() {
        // Regression: a slab of air alone printed R 106 dB and B −106 dB in a near field.
        PlanarResult air = Barrier.of(Layer.gap(mm(1))).facing(LOOP).at(kHz(20));
        assertEquals(0, air.shieldingEffectivenessDb(), 0);
        assertEquals(0, air.reflectionDb(), 0);
        assertEquals(0, air.multipleReflectionDb(), 0);
    }

    @Test
    void oneLayerKeepsTheTextbookReflectionLoss() {
        // Single shield: R = 20·log10|(1 + K)²/(4K)|, K = Zw/η (Schelkunoff; Ott 2009 ch. 6),
        // computed here with Commons Math Complex from η = sqrt(jωµ/σ) (good conductor, σ ≫ ωε).
        double hz = 20e3;
        double w = 2 * Math.PI * hz;
        double sigma = 58e6;
        Complex eta = new Complex(0, w * 1.25663706212e-6 / sigma).sqrt();
        io.shieldmath.shield.quantity.Complex z = LOOP.waveImpedance(io.shieldmath.shield.quantity.Frequency.ofHertz(hz));
        Complex k = new Complex(z.real(), z.imaginary()).divide(eta);
        double expected = 20 * Math.log10(k.add(1).pow(2).divide(k.multiply(4)).abs());
        PlanarResult r = Barrier.of(COPPER, Length.ofMillimetres(0.2)).facing(LOOP).at(kHz(20));
        assertEquals(expected, r.reflectionDb(), 1e-6);
        // Two layers with a gap: R is the sum of the layers' own single-shield losses.
        PlanarResult one = Barrier.of(STEEL, mm(0.3)).facing(LOOP).at(kHz(20));
        PlanarResult both = Barrier.of(COPPER, Length.ofMillimetres(0.2)).thenGap(mm(3)).then(STEEL, mm(0.3))
                .facing(LOOP).at(kHz(20));
        assertEquals(r.reflectionDb() + one.reflectionDb(), both.reflectionDb(), 1e-9);
    }
}
