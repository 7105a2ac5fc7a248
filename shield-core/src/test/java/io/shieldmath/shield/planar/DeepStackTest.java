/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.TestComplex;
import io.shieldmath.shield.WideRangeChainProduct;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Deep stacks up to the documented {@value Barrier#MAX_LAYERS} layers, at the top of the
 * documented band: the running chain product grows by about |η0/η| per copper layer (1e4
 * at 45 GHz) and used to overflow from 158 layers. Each case is checked against
 * {@link WideRangeChainProduct}, the textbook product in arbitrary-exponent arithmetic.
 */
class DeepStackTest {

    /** Annealed copper, 5.80e7 S/m (100 % IACS, IEC 60028). */
    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofSiemensPerMetre(5.8e7), 1);

    /** {@code pairs} times 10 µm copper followed by an air gap. */
    private static Barrier copperAndGaps(int pairs, Length gap) {
        List<Layer> layers = new ArrayList<>();
        for (int i = 0; i < pairs; i++) {
            layers.add(Layer.of(COPPER, Length.ofMicrometres(10)));
            layers.add(Layer.gap(gap));
        }
        return Barrier.of(layers);
    }

    /** SE in dB by the reference: 20·log10 |T_free / T|. */
    static double referenceDb(Barrier b, IncidentField field, double hz) {
        double w = 2 * Math.PI * hz;
        Complex z = TestComplex.cm(field.waveImpedance(Frequency.ofHertz(hz)));
        return 20 / Math.log(10) * (logT(Barrier.of(Layer.gap(b.totalThickness())), w, hz, z) - logT(b, w, hz, z));
    }

    private static double logT(Barrier b, double w, double hz, Complex z) {
        int n = b.layerCount();
        Complex[] gt = new Complex[n];
        Complex[] eta = new Complex[n];
        for (int i = 0; i < n; i++) {
            Layer l = b.layers().get(i);
            gt[i] = ReferenceChainMatrix.gamma(l, w, hz).multiply(l.thickness().toMetres());
            eta[i] = ReferenceChainMatrix.eta(l, w, hz);
        }
        return WideRangeChainProduct.logTransmission(gt, eta, z)[0];
    }

    private static void check(Barrier b, double hz) {
        for (IncidentField field : List.of(IncidentField.planeWave(),
                IncidentField.magneticNearField(Length.ofMetres(1), ImpedanceForm.EXACT_DIPOLE))) {
            PlanarEvaluation e = b.facing(field);
            double fast = e.shieldingEffectivenessDb(hz);
            PlanarResult r = e.at(Frequency.ofHertz(hz));
            String where = b.layerCount() + " layers, " + field + ", " + hz + " Hz";
            assertTrue(Double.isFinite(fast), where);
            assertEquals(fast, r.shieldingEffectivenessDb(), 0, where);
            assertEquals(fast, r.absorptionDb() + r.reflectionDb() + r.multipleReflectionDb(), 1e-9 * fast, where);
            double ref = referenceDb(b, field, hz);
            assertEquals(ref, fast, 1e-10 * ref, where);
        }
    }

    @Test
    void copperWithMillimetreGapsFrom158Layers() {
        // The failing case of the report: 79 × (10 µm copper, 1 mm air), 44.7 GHz.
        check(copperAndGaps(79, Length.ofMillimetres(1)), 44.7e9);
        check(copperAndGaps(79, Length.ofMillimetres(1)), 1e13);
        check(copperAndGaps(128, Length.ofMillimetres(1)), 44.7e9);
        check(copperAndGaps(128, Length.ofMillimetres(1)), 1e13);
    }

    @Test
    void copperWithMicrometreGapsFrom212Layers() {
        check(copperAndGaps(106, Length.ofMicrometres(10)), 44.7e9);
        check(copperAndGaps(106, Length.ofMicrometres(10)), 1e13);
        check(copperAndGaps(128, Length.ofMicrometres(10)), 44.7e9);
        check(copperAndGaps(128, Length.ofMicrometres(10)), 1e13);
    }

    @Test
    void aFullStackOfOneMediumIsLinearInTheLayerCount() {
        // 256 equal copper layers touching are one 2.56 mm plate: no interfaces inside, so the
        // same SE as one layer of the total thickness (common practice, no source: a layer
        // divided into touching layers of the same medium is the same layer).
        List<Layer> layers = new ArrayList<>();
        for (int i = 0; i < Barrier.MAX_LAYERS; i++) {
            layers.add(Layer.of(COPPER, Length.ofMicrometres(10)));
        }
        Barrier split = Barrier.of(layers);
        Barrier whole = Barrier.of(COPPER, Length.ofMicrometres(2560));
        for (double hz : new double[] {44.7e9, 1e13}) {
            double a = split.facing(IncidentField.planeWave()).shieldingEffectivenessDb(hz);
            double b = whole.facing(IncidentField.planeWave()).shieldingEffectivenessDb(hz);
            assertEquals(b, a, 1e-9 * b, hz + " Hz");
        }
    }
}
