/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.model.Sweep;
import static io.shieldmath.shield.quantity.Quantities.GHz;
import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.um;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.quantity.SheetResistance;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Check values of the planar model, each with its source beside it. */
class PlanarCheckValuesTest {

    /** Annealed copper, 58.0 MS/m (IEC 60028), µr = 1. */
    private static final Medium COPPER = Medium.conductor("annealed copper", iacs(100), 1);
    private static final IncidentField PLANE = IncidentField.planeWave();

    @ParameterizedTest
    @CsvSource({
        // f (Hz), δ from 1/sqrt(πfµ0σ) worked by hand with CODATA 2018 µ0 and σ = 58.0 MS/m (mm),
        // handbook value (mm; Ott 2009 Table 6-2 gives inches, converted; from memory)
        "60,      8.531600, 8.51",
        "1000,    2.089807, 2.09",
        "10000,   0.660855, 0.66",
        "1000000, 0.0660855, 0.066",
    })
    void skinDepthOfAnnealedCopper(double hz, double formulaMm, double handbookMm) {
        double delta = COPPER.skinDepth(Frequency.ofHertz(hz)).in(io.shieldmath.shield.quantity.LengthUnit.MILLIMETRE);
        assertEquals(formulaMm, delta, formulaMm * 1e-6);
        assertEquals(handbookMm, delta, handbookMm * 0.01);
    }

    @Test
    void absorptionIsEightPointSixEightSixDecibelsPerSkinDepth() {
        // A = 20·log10(e)·t/δ = 8.686·t/δ for a good conductor (Ott 2009, ch. 6).
        for (double t : new double[] {0.1e-3, 1e-3, 5e-3}) {
            PlanarResult r = Barrier.of(COPPER, m(t)).facing(PLANE).at(MHz(1));
            double delta = COPPER.skinDepth(MHz(1)).toMetres();
            assertEquals(20 / Math.log(10) * t / delta, r.absorptionDb(), 1e-6 * r.absorptionDb());
        }
        // 5 mm copper at 1 MHz: A ≈ 657 dB (Ott 2009 ch. 6: A = 8.686·t/δ), finite and accurate.
        PlanarResult thick = Barrier.of(COPPER, mm(5)).facing(PLANE).at(MHz(1));
        assertEquals(657.2, thick.absorptionDb(), 0.1);
        assertTrue(Double.isFinite(thick.shieldingEffectivenessDb()));
    }

    @ParameterizedTest
    @CsvSource({"1000", "100000", "10000000"})
    void planeWaveReflectionMatchesOttHandFormula(double hz) {
        // R = 168 + 10·log10(σr/(µr·f)) (Ott 2009, ch. 6), valid where |K| ≫ 1. Ott's 168 is rounded.
        PlanarResult r = Barrier.of(COPPER, mm(1)).facing(PLANE).at(Frequency.ofHertz(hz));
        assertEquals(168 + 10 * Math.log10(1 / hz), r.reflectionDb(), 0.2);
    }

    @ParameterizedTest
    @CsvSource({"10000, 0.3", "100000, 0.1", "1000000, 1"})
    void magneticNearFieldReflectionMatchesOttHandFormula(double hz, double r) {
        // R = 14.6 + 10·log10(f·r²·σr/µr) (Ott 2009, ch. 6), with the textbook impedance, |K| ≫ 1.
        IncidentField field = IncidentField.magneticNearField(m(r), ImpedanceForm.TEXTBOOK);
        PlanarResult res = Barrier.of(COPPER, mm(1)).facing(field).at(Frequency.ofHertz(hz));
        assertEquals(14.6 + 10 * Math.log10(hz * r * r), res.reflectionDb(), 0.2);
    }

    @ParameterizedTest
    @CsvSource({"1000, 1", "100000, 0.1", "1000000, 0.05"})
    void electricNearFieldReflectionMatchesOttHandFormula(double hz, double r) {
        // R = 322 + 10·log10(σr/(µr·f³·r²)) (Ott 2009, ch. 6), textbook impedance. Ott's constant is
        // rounded: 10·log10(σ_Cu/(16·(2π)³·ε0²·µ0)) = 321.71 with CODATA 2018 constants, so allow 0.35 dB.
        IncidentField field = IncidentField.electricNearField(m(r), ImpedanceForm.TEXTBOOK);
        PlanarResult res = Barrier.of(COPPER, mm(1)).facing(field).at(Frequency.ofHertz(hz));
        assertEquals(322 + 10 * Math.log10(1 / (hz * hz * hz * r * r)), res.reflectionDb(), 0.35);
    }

    @Test
    void singleLayerPartsEqualTheClosedForms() {
        // Schelkunoff 1943; Ott 2009 ch. 6: A = 20·log10|e^{γt}|, R = 20·log10|(1+K)²/(4K)|, B = 20·log10|1 − ((K−1)/(K+1))² e^{−2γt}|.
        Medium steel = Medium.conductor("steel", iacs(12), 300);
        for (double hz : new double[] {50, 1e3, 1e5, 1e7}) {
            for (double t : new double[] {1e-6, 1e-4, 1e-3}) {
                Layer layer = Layer.of(steel, m(t));
                double w = 2 * Math.PI * hz;
                Complex gt = ReferenceChainMatrix.gamma(layer, w, hz).multiply(t);
                Complex k = new Complex(PhysicalConstants.ETA_0).divide(ReferenceChainMatrix.eta(layer, w, hz));
                double a = 20 * Math.log10(gt.exp().abs());
                double rr = 20 * Math.log10(k.add(1).pow(2).divide(k.multiply(4)).abs());
                Complex rho = k.subtract(1).divide(k.add(1));
                double b = 20 * Math.log10(Complex.ONE.subtract(rho.multiply(rho).multiply(gt.multiply(-2).exp())).abs());
                PlanarResult r = Barrier.of(layer).facing(PLANE).at(Frequency.ofHertz(hz));
                assertEquals(a, r.absorptionDb(), 1e-9 * Math.max(1, a));
                assertEquals(rr, r.reflectionDb(), 1e-9 * rr);
                assertEquals(b, r.multipleReflectionDb(), 1e-8);
                assertEquals(a + rr + b, r.shieldingEffectivenessDb(), 1e-8);
            }
        }
    }

    @Test
    void freeSpaceSlabGivesExactlyZeroForEveryFieldKind() {
        // Common practice, no source: SE is insertion loss against the same space filled with free space.
        for (IncidentField f : fields()) {
            for (double hz : new double[] {1e-3, 50, 1e6, 1e11}) {
                Medium vacuumLike = Medium.conductor("vacuum-like slab", io.shieldmath.shield.quantity.Conductivity.ZERO, 1);
                assertEquals(0.0, Barrier.of(vacuumLike, mm(3)).facing(f).at(Frequency.ofHertz(hz)).shieldingEffectivenessDb(), 0.0);
            }
        }
    }

    @Test
    void ptfeSheetIsTransparentBelowOneMegahertz() {
        // PTFE εr ≈ 2.1 (Ott 2009 Table 6-1 and handbook tables, from memory); 1.5 mm thick: under 0.01 dB below 1 MHz.
        Barrier ptfe = Barrier.of(Medium.dielectric("PTFE", 2.1), mm(1.5));
        for (IncidentField f : new IncidentField[] {PLANE,
            IncidentField.magneticNearField(cm(5), ImpedanceForm.TEXTBOOK),
            IncidentField.magneticNearField(cm(5), ImpedanceForm.EXACT_DIPOLE)}) {
            for (double hz : new double[] {1e-3, 1, 1e3, 1e5, 1e6}) {
                double se = ptfe.facing(f).at(Frequency.ofHertz(hz)).shieldingEffectivenessDb();
                assertTrue(Math.abs(se) < 0.01, () -> f + " " + hz + " Hz: " + se);
            }
        }
    }

    @Test
    void thinFilmTendsToTheSheetResistanceLimit() {
        // For t ≪ δ, plane-wave SE → 20·log10(1 + η0/(2Rs)) (Ott 2009 ch. 6; the thin-film formula of
        // R. B. Schulz, V. C. Plantz, D. R. Brush, IEEE Trans. EMC 30 (1988) 187, from memory).
        for (double rs : new double[] {0.01, 1, 100}) {
            double se = Barrier.of(Layer.film(SheetResistance.ofOhmsPerSquare(rs))).facing(PLANE).at(MHz(1)).shieldingEffectivenessDb();
            assertEquals(20 * Math.log10(1 + PhysicalConstants.ETA_0 / (2 * rs)), se, 1e-3);
        }
    }

    @Test
    void exactDipoleImpedanceTendsToTextbookNearAndToEtaZeroFar() {
        IncidentField exact = IncidentField.magneticNearField(cm(10), ImpedanceForm.EXACT_DIPOLE);
        IncidentField book = IncidentField.magneticNearField(cm(10), ImpedanceForm.TEXTBOOK);
        // kr ≪ 1: |Zw| → 2πfµ0 r.
        assertEquals(book.waveImpedance(kHz(10)).abs(), exact.waveImpedance(kHz(10)).abs(), 1e-9);
        // kr ≫ 1: Zw → η0.
        assertEquals(PhysicalConstants.ETA_0, exact.waveImpedance(GHz(100)).abs(), 1e-4 * PhysicalConstants.ETA_0);
        IncidentField exactE = IncidentField.electricNearField(cm(10), ImpedanceForm.EXACT_DIPOLE);
        IncidentField bookE = IncidentField.electricNearField(cm(10), ImpedanceForm.TEXTBOOK);
        assertEquals(1, exactE.waveImpedance(kHz(10)).abs() / bookE.waveImpedance(kHz(10)).abs(), 1e-9);
        assertEquals(PhysicalConstants.ETA_0, exactE.waveImpedance(GHz(100)).abs(), 1e-4 * PhysicalConstants.ETA_0);
    }

    @Test
    void sweepAndBatchAgreeWithSinglePoints() {
        Barrier b = Barrier.of(COPPER, um(35)).thenGap(mm(2)).then(Medium.conductor("steel", iacs(12), 200), mm(0.5));
        PlanarEvaluation e = b.facing(IncidentField.magneticNearField(cm(3), ImpedanceForm.EXACT_DIPOLE));
        Sweep<PlanarResult> s = e.sweep(io.shieldmath.shield.quantity.FrequencyBand.of(Hz(10), MHz(10)), 31);
        double[] batch = e.shieldingEffectivenessDb(s.frequenciesHertz());
        for (int i = 0; i < batch.length; i++) {
            assertEquals(s.results().get(i).shieldingEffectivenessDb(), batch[i], 0);
        }
        assertTrue(s.lowestSampled().shieldingEffectivenessDb() <= batch[batch.length - 1]);
    }

    @Test
    void outOfRangeFrequenciesAreRefusedWithTheirIndex() {
        PlanarEvaluation e = Barrier.of(COPPER, mm(1)).facing(PLANE);
        InvalidQuantityException x = assertThrows(InvalidQuantityException.class,
                () -> e.shieldingEffectivenessDb(new double[] {50, Double.NaN}));
        assertTrue(x.getMessage().startsWith("frequency [1]: NaN Hz"), x::getMessage);
        assertThrows(InvalidQuantityException.class, () -> e.shieldingEffectivenessDb(1e14));
        assertThrows(IllegalArgumentException.class, () -> e.shieldingEffectivenessDb(new double[2], new double[1]));
        assertThrows(InvalidQuantityException.class, () -> Layer.of(COPPER, Length.ofMetres(1000)));
    }

    static IncidentField[] fields() {
        return new IncidentField[] {PLANE,
            IncidentField.magneticNearField(cm(5), ImpedanceForm.TEXTBOOK),
            IncidentField.magneticNearField(cm(5), ImpedanceForm.EXACT_DIPOLE),
            IncidentField.electricNearField(cm(5), ImpedanceForm.TEXTBOOK),
            IncidentField.electricNearField(cm(5), ImpedanceForm.EXACT_DIPOLE)};
    }
}
