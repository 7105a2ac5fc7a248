/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.internal.ChainMatrix;
import io.shieldmath.shield.model.Sweep;
import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.um;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermittivity;
import io.shieldmath.shield.quantity.SheetResistance;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Branches of the planar engine and its value types. Reference values come from
 * {@link ReferenceChainMatrix} (the Schelkunoff chain-matrix product written independently with
 * Commons Math {@code Complex} and {@code FieldMatrix}) or from the closed forms of Schelkunoff 1943 and Ott 2009 ch. 6.
 */
class PlanarBranchesTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);   // 58 MS/m, IEC 60028
    private static final Medium STEEL = Medium.conductor("steel", Conductivity.ofMegasiemensPerMetre(7),
            PermeabilityModel.relaxation(500, kHz(50)));                              // from memory, demo
    private static final IncidentField PLANE = IncidentField.planeWave();

    @Test
    void transmissionAndItsPhaseAgreeWithTheReferenceProduct() {
        IncidentField near = IncidentField.magneticNearField(Length.ofCentimetres(5), ImpedanceForm.EXACT_DIPOLE);
        Barrier b = Barrier.of(COPPER, um(20)).thenGap(mm(1)).then(STEEL, um(100));
        for (IncidentField field : new IncidentField[] {PLANE, near}) {
            for (double hz : new double[] {60, 3e3, 1e5, 2e7}) {
                PlanarResult r = b.facing(field).at(Hz(hz));
                Complex t = ReferenceChainMatrix.transmission(b, field, hz);
                Complex mine = io.shieldmath.shield.TestComplex.cm(r.transmission());
                assertEquals(t.abs(), mine.abs(), 1e-8 * t.abs(), () -> field + " " + hz);
                assertEquals(0, mine.divide(t).subtract(Complex.ONE).abs(), 1e-7, () -> field + " " + hz);
                assertEquals(20 * Math.log10(t.abs()), r.transmissionDb(), 1e-7);
                assertEquals(t.getArgument(), normalise(r.transmissionPhase()), 1e-7);
                assertEquals(ReferenceChainMatrix.shieldingEffectivenessDb(b, field, hz), r.shieldingEffectivenessDb(), 1e-7);
                assertEquals(r.shieldingEffectivenessDb(), r.shieldingEffectiveness().toDb(), 0);
                assertEquals(Math.pow(10, r.shieldingEffectivenessDb() / 20), r.shieldingFactor().value(), 1e-9
                        * r.shieldingFactor().value());
                assertEquals(3, r.layerCount());
                assertEquals(r.absorptionDb(0) + r.absorptionDb(1) + r.absorptionDb(2), r.absorptionDb(), 1e-12);
                assertEquals(r.shieldingEffectivenessDb(), r.absorptionDb() + r.reflectionDb() + r.multipleReflectionDb(), 1e-9);
                assertSame(field, r.field());
                assertEquals(Hz(hz), r.frequency());
            }
        }
    }

    private static double normalise(double phase) {
        double p = Math.IEEEremainder(phase, 2 * Math.PI);
        return p <= -Math.PI ? p + 2 * Math.PI : p;
    }

    @Test
    void absorptionOfEachLayerIsItsOwnAttenuation() {
        // A_i = 20·log10|e^{γ_i t_i}| = 8.686·Re(γ_i)·t_i (Ott 2009 ch. 6), γ from the reference.
        Barrier b = Barrier.of(COPPER, um(30)).then(STEEL, um(200));
        double hz = 2e4;
        PlanarResult r = b.facing(PLANE).at(Hz(hz));
        double w = 2 * Math.PI * hz;
        for (int i = 0; i < 2; i++) {
            Layer l = b.layers().get(i);
            double a = 20 / Math.log(10) * ReferenceChainMatrix.gamma(l, w, hz).getReal() * l.thickness().toMetres();
            assertEquals(a, r.absorptionDb(i), 1e-9 * a);
        }
        // Reflection of a single layer: R = 20·log10|(1+K)²/(4K)|, K = Zw/η (Ott 2009 ch. 6).
        Barrier single = Barrier.of(COPPER, um(30));
        Complex eta = ReferenceChainMatrix.eta(single.layers().get(0), w, hz);
        Complex k = new Complex(PLANE.impedanceReal(hz), 0).divide(eta);
        Complex onePlusK = k.add(1);
        double rExpected = 20 * Math.log10(onePlusK.multiply(onePlusK).divide(k.multiply(4)).abs());
        assertEquals(rExpected, single.facing(PLANE).at(Hz(hz)).reflectionDb(), 1e-9 * rExpected);
    }

    @Test
    void batchPathsMatchSinglePointsAndRefuseBadArrays() {
        PlanarEvaluation e = Barrier.of(COPPER, um(50)).facing(PLANE);
        double[] f = {1, 1e3, 1e6};
        double[] out = new double[4];
        out[3] = 99;
        assertSame(out, e.shieldingEffectivenessDb(f, out));
        for (int i = 0; i < f.length; i++) {
            assertEquals(e.at(Hz(f[i])).shieldingEffectivenessDb(), out[i], 0);
            assertEquals(e.shieldingEffectivenessDb(f[i]), out[i], 0);
        }
        assertEquals(99, out[3], 0);
        assertEquals(3, e.shieldingEffectivenessDb(f).length);
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> e.shieldingEffectivenessDb(f, new double[2]));
        assertEquals("output array holds 2 values but 3 frequencies were given", ex.getMessage());
        // The range is closed: both ends are accepted, one step beyond is refused.
        e.shieldingEffectivenessDb(PlanarEvaluation.MIN_HERTZ);
        e.shieldingEffectivenessDb(PlanarEvaluation.MAX_HERTZ);
        e.shieldingEffectivenessDb(new double[] {PlanarEvaluation.MIN_HERTZ, PlanarEvaluation.MAX_HERTZ});
        assertThrows(InvalidQuantityException.class,
                () -> e.shieldingEffectivenessDb(Math.nextDown(PlanarEvaluation.MIN_HERTZ)));
        assertThrows(InvalidQuantityException.class,
                () -> e.shieldingEffectivenessDb(new double[] {1, Math.nextUp(PlanarEvaluation.MAX_HERTZ)}));
        assertThrows(InvalidQuantityException.class, () -> e.at(Hz(2e13)));
        assertThrows(InvalidQuantityException.class, () -> e.sweep(FrequencyBand.of(Hz(1e-7), Hz(1)), 3));
        assertThrows(InvalidQuantityException.class, () -> e.sweep(FrequencyBand.of(Hz(1), Hz(2e13)), 3));
        assertThrows(NullPointerException.class, () -> e.shieldingEffectivenessDb(null, out));
        assertThrows(NullPointerException.class, () -> e.shieldingEffectivenessDb(f, null));
        assertThrows(NullPointerException.class, () -> e.shieldingEffectivenessDb((double[]) null));
        assertThrows(NullPointerException.class, () -> e.sweep(null, 3));
        assertThrows(NullPointerException.class, () -> e.at(null));
    }

    @Test
    void sweepFindsItsWorstPointAndListsItsValues() {
        PlanarEvaluation e = Barrier.of(COPPER, um(10)).facing(PLANE);
        Sweep<PlanarResult> s = e.sweep(FrequencyBand.parse("1 kHz to 10 GHz"), 8);
        assertEquals(8, s.size());
        assertEquals(8, s.results().size());
        double[] f = s.frequenciesHertz();
        double[] se = s.shieldingEffectivenessDb();
        assertEquals(1e3, f[0], 0);
        assertEquals(1e10, f[7], 0);
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < se.length; i++) {
            assertEquals(e.shieldingEffectivenessDb(f[i]), se[i], 0);
            min = Math.min(min, se[i]);
        }
        assertEquals(min, s.lowestSampled().shieldingEffectivenessDb(), 0);
        assertTrue(s.toString().startsWith("sweep of 8 points from 1 kHz to 10 GHz, lowest sampled: SE "), s::toString);
        // Thick copper in a plane wave: absorption grows as sqrt(f), so the first point is the worst.
        Sweep<PlanarResult> rising = Barrier.of(COPPER, mm(1)).facing(PLANE).sweep(FrequencyBand.parse("1 MHz to 1 GHz"), 4);
        assertEquals(rising.shieldingEffectivenessDb()[0], rising.lowestSampled().shieldingEffectivenessDb(), 0);
        assertTrue(rising.shieldingEffectivenessDb()[1] > rising.shieldingEffectivenessDb()[0]);
        // A thin film in an electric near field: |Zw| = 1/(2πfε0r) falls as 1/f, so the thin-film SE
        // ≈ 20·log10(|Zw|/(2Rs)) falls 20 dB per decade (Ott 2009 ch. 6) and the last point is the worst.
        IncidentField electric = IncidentField.electricNearField(Length.ofCentimetres(10), ImpedanceForm.TEXTBOOK);
        Sweep<PlanarResult> falling = Barrier.of(COPPER, um(1)).facing(electric).sweep(FrequencyBand.parse("1 kHz to 1 MHz"),
                4);
        assertEquals(falling.shieldingEffectivenessDb()[3], falling.lowestSampled().shieldingEffectivenessDb(), 0);
        assertEquals(-20, falling.shieldingEffectivenessDb()[2] - falling.shieldingEffectivenessDb()[1], 0.01);
    }

    @Test
    void resultTextShowsItsParts() {
        PlanarResult r = Barrier.of(COPPER, mm(1)).facing(PLANE).at(MHz(1));
        String expected = String.format(java.util.Locale.ROOT, "SE %.2f dB at 1 MHz (A %.2f dB, R %.2f dB, B %.2f dB)",
                r.shieldingEffectivenessDb(), r.absorptionDb(), r.reflectionDb(), r.multipleReflectionDb());
        assertEquals(expected, r.toString());
        assertEquals("1 mm copper facing plane wave", Barrier.of(COPPER, mm(1)).facing(PLANE).toString());
    }

    @Test
    void barriersAreCheckedAndBuiltAsValues() {
        Barrier a = Barrier.of(COPPER, mm(1));
        Barrier b = a.thenGap(mm(2)).then(Layer.of(STEEL, um(500)));
        assertEquals(3, b.layerCount());
        assertEquals(1, a.layerCount());                        // the receiver is unchanged
        assertEquals(3.5e-3, b.totalThickness().toMetres(), 1e-15);
        assertEquals("1 mm copper | 2 mm air | 500 µm steel", b.toString());
        assertEquals(b.layers().get(2), b.reversed().layers().get(0));
        assertEquals(b, b.reversed().reversed());
        assertEquals(b.hashCode(), b.reversed().reversed().hashCode());
        assertNotEquals(b, b.reversed());
        assertEquals(Barrier.of(List.of(Layer.of(COPPER, mm(1)))), a);
        Barrier replaced = b.withLayer(1, Layer.gap(mm(3)));
        assertEquals(mm(3), replaced.layers().get(1).thickness());
        assertEquals(mm(2), b.layers().get(1).thickness());
        assertThrows(UnsupportedOperationException.class, () -> b.layers().add(Layer.gap(mm(1))));
        assertEquals("a barrier needs at least one layer",
                assertThrows(IllegalArgumentException.class, () -> Barrier.of(List.of())).getMessage());
        List<Layer> many = new ArrayList<>();
        for (int i = 0; i < Barrier.MAX_LAYERS; i++) {
            many.add(Layer.gap(um(1)));
        }
        assertEquals(Barrier.MAX_LAYERS, Barrier.of(many).layerCount());
        many.add(Layer.gap(um(1)));
        assertEquals("a barrier has at most 256 layers; got 257",
                assertThrows(IllegalArgumentException.class, () -> Barrier.of(many)).getMessage());
        Medium tooGood = Medium.conductor("x", Conductivity.ofSiemensPerMetre(2e10), 1);
        assertEquals("layer 1 conductivity: 20000000000 S/m is out of range; allowed: from 0 S/m to 10000000000 S/m",
                assertThrows(InvalidQuantityException.class, () -> Barrier.of(tooGood, mm(1))).getMessage());
        Barrier.of(Medium.conductor("x", Conductivity.ofSiemensPerMetre(1e10), 1), mm(1));   // the edge is allowed
        assertThrows(NullPointerException.class, () -> Barrier.of((Layer[]) null));
        assertThrows(NullPointerException.class, () -> Barrier.of((List<Layer>) null));
        assertThrows(NullPointerException.class, () -> a.then(null));
        assertThrows(NullPointerException.class, () -> a.withLayer(0, null));
        assertThrows(NullPointerException.class, () -> a.facing(null));
        assertEquals(a, a.facing(PLANE).barrier());
        assertSame(PLANE, a.facing(PLANE).field());
    }

    @Test
    void layersAreCheckedAndFilmsCarryTheirSheetResistance() {
        // Thickness range of a layer: 1e-12 m to 100 m, both ends included.
        Layer.of(COPPER, Length.ofMetres(1e-12));
        Layer.of(COPPER, Length.ofMetres(100));
        assertEquals("layer thickness: 1e-13 m is out of range; allowed: from 1e-12 m to 100 m",
                assertThrows(InvalidQuantityException.class, () -> Layer.of(COPPER, Length.ofMetres(1e-13)))
                        .getMessage());
        assertThrows(InvalidQuantityException.class, () -> Layer.of(COPPER, Length.ofMetres(Math.nextUp(100.0))));
        assertThrows(NullPointerException.class, () -> Layer.of(null, mm(1)));
        assertThrows(NullPointerException.class, () -> Layer.of(() -> null, mm(1)));
        assertThrows(NullPointerException.class, () -> Layer.of(COPPER, null));
        // σ·t = 1/Rs (Ott 2009 ch. 6).
        Layer film = Layer.film(SheetResistance.ofOhmsPerSquare(0.5));
        assertEquals(Layer.NOMINAL_FILM_THICKNESS, film.thickness());
        assertEquals(1 / (0.5 * 1e-6), film.medium().conductivity().toSiemensPerMetre(), 1e-3);
        Layer thick = Layer.film(SheetResistance.ofOhmsPerSquare(0.5), um(4));
        assertEquals(1 / (0.5 * 4e-6), thick.medium().conductivity().toSiemensPerMetre(), 1e-3);
        assertEquals("film of 500 mΩ/sq", film.medium().name());
        assertThrows(NullPointerException.class, () -> Layer.film(null));
        assertThrows(NullPointerException.class, () -> Layer.film(SheetResistance.ofOhmsPerSquare(1), null));
        // Thin-film limit 20·log10(1 + η0/(2Rs)) (Ott 2009 ch. 6), through Barrier.thenFilm.
        Barrier withFilm = Barrier.of(Medium.dielectric("PTFE", 2.1), um(1)).thenFilm(SheetResistance.ofOhmsPerSquare(1));
        double limit = 20 * Math.log10(1 + PLANE.impedanceReal(1) / 2);
        assertEquals(limit, withFilm.facing(PLANE).at(kHz(1)).shieldingEffectivenessDb(), 1e-3);
        Layer l = Layer.of(COPPER, mm(1));
        assertEquals(Layer.of(COPPER, mm(1)), l);
        assertEquals(l.hashCode(), Layer.of(COPPER, mm(1)).hashCode());
        assertNotEquals(l, Layer.of(COPPER, mm(2)));
        assertNotEquals(l, Layer.of(STEEL, mm(1)));
        assertEquals(mm(2), l.withThickness(mm(2)).thickness());
        assertEquals(COPPER, l.medium());
        assertEquals("1 mm copper", l.toString());
    }

    @Test
    void freeSpaceLayersGiveZeroButDielectricOrMagneticOnesDoNot() {
        // A slab with the properties of free space gives 0 dB exactly (common practice, no source).
        assertEquals(0, Barrier.of(Medium.VACUUM, mm(3)).thenGap(mm(1)).facing(PLANE).shieldingEffectivenessDb(1e9), 0);
        // Any departure from free space (εr, µr or σ) is a real barrier, compared with the reference.
        Medium glass = Medium.of("glass", Conductivity.ZERO, PermeabilityModel.constant(1), RelativePermittivity.of(4));
        Medium ferrite = Medium.of("ferrite", Conductivity.ZERO, PermeabilityModel.constant(4), RelativePermittivity.ONE);
        Medium resistive = Medium.conductor("resistive", Conductivity.ofSiemensPerMetre(1e-3), 1);
        for (Medium m : new Medium[] {glass, ferrite, resistive}) {
            Barrier b = Barrier.of(m, mm(30));
            double hz = 1e9;
            double ref = ReferenceChainMatrix.shieldingEffectivenessDb(b, PLANE, hz);
            assertNotEquals(0, ref, m.name());
            assertEquals(ref, b.facing(PLANE).shieldingEffectivenessDb(hz), 1e-9 + 1e-9 * Math.abs(ref), m.name());
        }
    }

    @Test
    void engineHelpersAtTheirEdges() {
        // log|x + jy| without overflow or underflow: |3 + 4j| = 5 at every scale.
        assertEquals(Math.log(5), Numerics.logAbs(3, 4), 1e-15);
        assertEquals(Math.log(5) + 300 * Math.log(10), Numerics.logAbs(3e300, 4e300), 1e-12);
        assertEquals(Math.log(5) - 300 * Math.log(10), Numerics.logAbs(3e-300, 4e-300), 1e-12);
        assertEquals(Math.log(5) - 160 * Math.log(10), Numerics.logAbs(-3e-160, 4e-160), 1e-12);
        assertEquals(Double.NEGATIVE_INFINITY, Numerics.logAbs(0, 0));
        assertEquals(Math.log(Double.MAX_VALUE), Numerics.logAbs(Double.MAX_VALUE, 0), 1e-12);
        // expm1 branch: Math.expm1 near zero, exp − 1 below the cutoff; both agree with Math.expm1.
        assertEquals(0, ChainMatrix.expm1Fast(0), 0);
        assertEquals(Double.POSITIVE_INFINITY, 1 / ChainMatrix.expm1Fast(0.0));
        assertEquals(Math.expm1(-1e-12), ChainMatrix.expm1Fast(-1e-12), 1e-28);
        assertEquals(Math.expm1(-0.49), ChainMatrix.expm1Fast(-0.49), 1e-16);
        assertEquals(Math.expm1(-0.5), ChainMatrix.expm1Fast(-0.5), 1e-16);
        assertEquals(Math.expm1(-3), ChainMatrix.expm1Fast(-3), 1e-15);
        assertEquals(Math.expm1(2), ChainMatrix.expm1Fast(2), 1e-15);
        // Interface loss between equal impedances is 0 dB; between Z and Z/4 it is
        // 20·log10(|Z + Z/4|/(2·sqrt(Z·Z/4))) = 20·log10(1.25) (the R formula with K = 4).
        assertEquals(0, ChainMatrix.interfaceLossDb(377, 0, 377, 0), 1e-12);
        assertEquals(20 * Math.log10(1.25), ChainMatrix.interfaceLossDb(400, 0, 100, 0), 1e-12);
        assertEquals(20 * Math.log10(1.25), ChainMatrix.interfaceLossDb(0, 400, 0, 100), 1e-12);
        // Free-space transmission against the reference's own free-space slab.
        IncidentField near = IncidentField.electricNearField(Length.ofCentimetres(10), ImpedanceForm.TEXTBOOK);
        Barrier gap = Barrier.of(COPPER, mm(10));
        for (double hz : new double[] {1e6, 7.5e9}) {
            Complex ref = ReferenceChainMatrix.freeSpaceTransmission(gap, near, hz);
            assertEquals(Math.log(ref.abs()), ChainMatrix.logFreeSpaceTransmission(0.01, hz, near.impedanceReal(hz),
                    near.impedanceImaginary(hz)), 1e-9);
        }
        double eta0 = PLANE.impedanceReal(1);
        assertEquals(0, ChainMatrix.logFreeSpaceTransmission(0.3, 1e9, eta0, 0), 0);
        assertFalse(ChainMatrix.logFreeSpaceTransmission(0.3, 1e9, eta0, 1) == 0);
    }
}
