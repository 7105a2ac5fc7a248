/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.field.FieldKind;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Issue 15 item 4, as a property over random tolerances: whatever the tolerances (0 to 1,
 * either spread), the barrier (anywhere in the accepted ranges, edges included, µ' above
 * and below 1) and the frequency, every sample of the tolerance study lies in the physical
 * and documented range of each property, evaluates finite, and the run's count of samples
 * drawn again agrees with its notes.
 */
class ToleranceRangeProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    /** A value from [lo, hi] on a log scale, or one of its ends one time in four. */
    static double edgy(Random r, double lo, double hi) {
        switch (r.nextInt(8)) {
            case 0:
                return lo;
            case 1:
                return hi;
            default:
                return logUniform(r, lo, hi);
        }
    }

    static Medium medium(Random r) {
        double sigma = r.nextInt(6) == 0 ? 0 : edgy(r, 1e-3, 1e10);
        PermeabilityModel mu = switch (r.nextInt(4)) {
            case 0 -> PermeabilityModel.constant(1);
            case 1 -> PermeabilityModel.constant(RelativePermeability.ofComplex(edgy(r, RelativePermeability.MIN, RelativePermeability.MAX),
                    r.nextBoolean() ? 0 : edgy(r, 1e-6, RelativePermeability.MAX)));
            case 2 -> PermeabilityModel.constant(RelativePermeability.ofComplex(edgy(r, RelativePermeability.MIN, 0.999), edgy(r, 1e-9, 10)));
            default -> PermeabilityModel.relaxation(edgy(r, 1, 1e7), Frequency.ofHertz(edgy(r, 1e-6, 1e13)));
        };
        return Medium.conductor("random", Conductivity.ofSiemensPerMetre(sigma), mu);
    }

    @Test
    void everySampleStaysInRangeAndEvaluatesFinite() {
        // Half the tries: each try draws 8 samples and runs a 16-sample study (about 4 ms a try).
        qt().withExamples(Math.max(100, TRIES / 2)).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            int n = 1 + r.nextInt(3);
            List<Layer> layers = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                Length t = Length.ofMetres(edgy(r, Layer.MIN_THICKNESS_METRES, Layer.MAX_THICKNESS_METRES));
                layers.add(r.nextInt(4) == 0 ? Layer.gap(t) : Layer.of(medium(r), t));
            }
            Barrier b = Barrier.of(layers);
            Length d = Length.ofMetres(edgy(r, IncidentField.MIN_DISTANCE_METRES, IncidentField.MAX_DISTANCE_METRES));
            ImpedanceForm form = r.nextBoolean() ? ImpedanceForm.TEXTBOOK : ImpedanceForm.EXACT_DIPOLE;
            IncidentField field = switch (r.nextInt(3)) {
                case 0 -> IncidentField.planeWave();
                case 1 -> IncidentField.magneticNearField(d, form);
                default -> IncidentField.electricNearField(d, form);
            };
            ToleranceStudy study = ToleranceStudy.of(b, field);
            study = study.thickness(tolerance(r), spread(r)).conductivity(tolerance(r), spread(r))
                    .permeability(tolerance(r), spread(r)).distance(tolerance(r), spread(r));
            double hz = edgy(r, PlanarEvaluation.MIN_HERTZ, PlanarEvaluation.MAX_HERTZ);
            ToleranceStudy.Sampler sampler = study.sampler(hz);
            SplittableRandom rng = new SplittableRandom(seed);
            int[] counts = new int[sampler.slots() + 1];
            for (int k = 0; k < 8; k++) {
                ToleranceStudy.Sample s = sampler.draw(rng, counts);
                for (int i = 0; i < n; i++) {
                    Layer nominal = b.layers().get(i);
                    Layer varied = s.barrier().layers().get(i);
                    double t = varied.thickness().toMetres();
                    assertTrue(t >= Layer.MIN_THICKNESS_METRES && t <= Layer.MAX_THICKNESS_METRES);
                    double sigma = varied.medium().conductivity().toSiemensPerMetre();
                    double sigma0 = nominal.medium().conductivity().toSiemensPerMetre();
                    assertTrue(sigma <= 1e10 && (sigma0 == 0) == (sigma == 0), () -> "seed " + seed + ": σ " + sigma);
                    double re0 = nominal.medium().permeability().real(hz);
                    double re = varied.medium().permeability().real(hz);
                    double im = varied.medium().permeability().loss(hz);
                    assertTrue(re > 0 && re <= RelativePermeability.MAX && (re0 < 1 || re >= 1),
                            () -> "seed " + seed + ": µ' " + re + " for nominal " + re0);
                    assertTrue(im >= 0 && im <= RelativePermeability.MAX, () -> "seed " + seed + ": µ'' " + im);
                }
                if (field.kind() != FieldKind.PLANE_WAVE) {
                    double dm = s.field().distance().toMetres();
                    assertTrue(dm >= IncidentField.MIN_DISTANCE_METRES && dm <= IncidentField.MAX_DISTANCE_METRES);
                }
                double se = s.barrier().facing(s.field()).shieldingEffectivenessDb(hz);
                assertTrue(Double.isFinite(se), () -> "seed " + seed + ": " + s);
            }
            assertEquals(0, counts[sampler.slots()], "the scratch count is left at 0");
            ToleranceResult res = study.run(Frequency.ofHertz(hz), 0, 16, seed, ToleranceStudy.ProgressListener.NONE);
            assertTrue(res.redrawnSamples() >= 0 && res.redrawnSamples() <= 16);
            assertEquals(res.redrawnSamples() == 0, res.rangeNotes().isEmpty(), () -> "seed " + seed + ": " + res);
            for (double v : res.sortedValuesDb()) {
                assertTrue(Double.isFinite(v), () -> "seed " + seed + ": " + res);
            }
        });
    }

    private static double tolerance(Random r) {
        return switch (r.nextInt(4)) {
            case 0 -> 0;
            case 1 -> 1;
            default -> r.nextDouble();
        };
    }

    private static ToleranceStudy.Spread spread(Random r) {
        return r.nextBoolean() ? ToleranceStudy.Spread.NORMAL : ToleranceStudy.Spread.UNIFORM;
    }
}
