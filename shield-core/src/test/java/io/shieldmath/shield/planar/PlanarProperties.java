/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.internal.Numerics;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermittivity;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Property tests of the planar engine. Each property draws a seed from QuickTheories and
 * builds its random case from it, so a failure is reproducible from the reported seed.
 */
class PlanarProperties {

    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    /** A random case: stack, field, frequency. */
    record Case(Barrier barrier, IncidentField field, double hz) {
    }

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    static Medium randomMedium(Random r) {
        double sigma = r.nextInt(5) == 0 ? 0 : logUniform(r, 1e-2, 1e8);
        double mu = r.nextInt(3) == 0 ? 1 : logUniform(r, 1, 1e6);
        PermeabilityModel model = r.nextBoolean() ? PermeabilityModel.constant(mu)
                : PermeabilityModel.relaxation(mu, Frequency.ofHertz(logUniform(r, 10, 1e7)));
        double eps = r.nextInt(3) == 0 ? 1 : logUniform(r, 1, 10);
        return Medium.of("random", Conductivity.ofSiemensPerMetre(sigma), model, RelativePermittivity.of(eps));
    }

    static IncidentField randomField(Random r) {
        Length d = Length.ofMetres(logUniform(r, 1e-3, 100));
        ImpedanceForm form = r.nextBoolean() ? ImpedanceForm.TEXTBOOK : ImpedanceForm.EXACT_DIPOLE;
        switch (r.nextInt(3)) {
            case 0:
                return IncidentField.planeWave();
            case 1:
                return IncidentField.magneticNearField(d, form);
            default:
                return IncidentField.electricNearField(d, form);
        }
    }

    static Case randomCase(long seed, double minT, double maxT, int maxLayers) {
        Random r = new Random(seed);
        int n = 1 + r.nextInt(maxLayers);
        List<Layer> layers = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            layers.add(Layer.of(randomMedium(r), Length.ofMetres(logUniform(r, minT, maxT))));
        }
        return new Case(Barrier.of(layers), randomField(r), logUniform(r, 1e-3, 1e11));
    }

    /** Total absorption in nepers, to keep the unscaled reference below overflow. */
    static double nepers(Case c) {
        double a = 0;
        for (Layer l : c.barrier().layers()) {
            a += ReferenceChainMatrix.gamma(l, 2 * Math.PI * c.hz(), c.hz()).getReal() * l.thickness().toMetres();
        }
        return a;
    }

    @Test
    void fastPathAgreesWithCommonsMathReference() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Case c = randomCase(seed, 1e-9, 1e-1, 5);
            if (nepers(c) > 300) {
                return;
            }
            Complex t = ReferenceChainMatrix.transmission(c.barrier(), c.field(), c.hz());
            PlanarResult fast = c.barrier().facing(c.field()).at(Frequency.ofHertz(c.hz()));
            double lnRef = Math.log(t.abs());
            double lnFast = fast.transmissionDb() / Numerics.DB_PER_NEPER;
            assertEquals(lnRef, lnFast, 1e-9 * Math.max(1, Math.abs(lnRef)), () -> "seed " + seed + " " + c);
            double seRef = ReferenceChainMatrix.shieldingEffectivenessDb(c.barrier(), c.field(), c.hz());
            assertEquals(seRef, fast.shieldingEffectivenessDb(), 1e-8 * Math.max(1, Math.abs(seRef)), () -> "seed " + seed + " " + c);
        });
    }

    @Test
    void everyValidInputGivesAFiniteResultWhosePartsAddUp() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Case c = randomCase(seed, 1e-9, 1e-1, 5);
            PlanarResult r = c.barrier().facing(c.field()).at(Frequency.ofHertz(c.hz()));
            assertTrue(Double.isFinite(r.shieldingEffectivenessDb()) && Double.isFinite(r.reflectionDb())
                    && Double.isFinite(r.absorptionDb()) && Double.isFinite(r.transmissionDb()), () -> "seed " + seed);
            assertEquals(r.shieldingEffectivenessDb(), r.absorptionDb() + r.reflectionDb() + r.multipleReflectionDb(),
                    1e-9 * Math.max(1, Math.abs(r.shieldingEffectivenessDb())));
            assertTrue(r.absorptionDb() >= 0);
        });
    }

    @Test
    void splittingALayerChangesNothing() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Case c = randomCase(seed, 1e-8, 1e-2, 3);
            Random r = new Random(~seed);
            int k = r.nextInt(c.barrier().layerCount());
            Layer l = c.barrier().layers().get(k);
            double share = 0.05 + 0.9 * r.nextDouble();
            double t = l.thickness().toMetres();
            List<Layer> split = new ArrayList<>(c.barrier().layers());
            split.set(k, l.withThickness(Length.ofMetres(t * share)));
            split.add(k + 1, l.withThickness(Length.ofMetres(t * (1 - share))));
            double whole = c.barrier().facing(c.field()).shieldingEffectivenessDb(c.hz());
            double parts = Barrier.of(split).facing(c.field()).shieldingEffectivenessDb(c.hz());
            assertEquals(whole, parts, 1e-9 * Math.max(1, Math.abs(whole)), () -> "seed " + seed);
        });
    }

    @Test
    void reversingTheStackLeavesSeUnchanged() {
        // Reciprocity of a passive stack between equal terminations.
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Case c = randomCase(seed, 1e-9, 1e-1, 5);
            double forward = c.barrier().facing(c.field()).shieldingEffectivenessDb(c.hz());
            double backward = c.barrier().reversed().facing(c.field()).shieldingEffectivenessDb(c.hz());
            assertEquals(forward, backward, 1e-9 * Math.max(1, Math.abs(forward)), () -> "seed " + seed);
        });
    }

    @Test
    void moreGoodConductorNeverLowersPlaneWaveSe() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double hz = logUniform(r, 1e-3, 1e11);
            double sigma = logUniform(r, 1e4, 1e8);
            double mu = r.nextBoolean() ? 1 : logUniform(r, 1, 1e5);
            Medium m = Medium.conductor("conductor", Conductivity.ofSiemensPerMetre(sigma), mu);
            double t1 = logUniform(r, 1e-9, 1e-1);
            double t2 = t1 * (1 + r.nextDouble());
            Barrier thin = Barrier.of(m, Length.ofMetres(t1));
            // only good conductors: |η| < η0/100
            Complex eta = ReferenceChainMatrix.eta(thin.layers().get(0), 2 * Math.PI * hz, hz);
            if (eta.abs() >= io.shieldmath.shield.quantity.PhysicalConstants.ETA_0 / 100) {
                return;
            }
            double a = thin.facing(IncidentField.planeWave()).shieldingEffectivenessDb(hz);
            double b = Barrier.of(m, Length.ofMetres(t2)).facing(IncidentField.planeWave()).shieldingEffectivenessDb(hz);
            assertTrue(b >= a - 1e-9 * Math.abs(a), () -> "seed " + seed + ": " + a + " then " + b);
        });
    }
}
