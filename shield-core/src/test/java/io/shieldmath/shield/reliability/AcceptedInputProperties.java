/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingEvaluation;
import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.enclosure.ShellShape;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.medium.RelaxationPermeability;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.RelativePermittivity;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Issue 15 item 11: any input the types accept at construction, anywhere in their documented
 * ranges and at their ends (thickness 1 pm to 100 m, σ 0 to 1e10 S/m, µ' and µ'' up to 1e7,
 * any accepted permeability model, εr 1 to 1e6, near-field distance 1 µm to 1000 km, shell
 * radius 1 µm to 100 m, coil radius 100 µm to 10 m), evaluates to a finite result at every
 * frequency of the model's valid band, its ends included. {@link ModelRangeProperties} and
 * {@link PlanarRangeCornersTest} cover the narrower range of everyday designs; this covers
 * everything a caller can construct. Values just outside the ranges are refused where made.
 */
class AcceptedInputProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    /** From [lo, hi] on a log scale, or one of its ends one time in four. */
    static double edgy(Random r, double lo, double hi) {
        int k = r.nextInt(8);
        return k == 0 ? lo : k == 1 ? hi : logUniform(r, lo, hi);
    }

    static PermeabilityModel permeability(Random r) {
        double max = RelativePermeability.MAX;
        switch (r.nextInt(4)) {
            case 0:
                return PermeabilityModel.constant(1);
            case 1:
                return PermeabilityModel.constant(RelativePermeability.ofComplex(edgy(r, RelativePermeability.MIN, max),
                        r.nextBoolean() ? 0 : edgy(r, 1e-300, max)));
            case 2:
                return PermeabilityModel.relaxation(edgy(r, 1, RelaxationPermeability.MAX_LOW_FREQUENCY),
                        io.shieldmath.shield.quantity.Frequency.ofHertz(edgy(r, RelaxationPermeability.MIN_CORNER_HERTZ,
                                RelaxationPermeability.MAX_CORNER_HERTZ)));
            default: {
                int n = 1 + r.nextInt(4);
                double[] hz = new double[n];
                double[] re = new double[n];
                double[] im = new double[n];
                double f = logUniform(r, 1e-6, 1e6);
                for (int i = 0; i < n; i++) {
                    hz[i] = f;
                    f *= 1 + logUniform(r, 1e-9, 1e4);
                    re[i] = edgy(r, RelativePermeability.MIN, max);
                    im[i] = r.nextBoolean() ? 0 : edgy(r, 1e-300, max);
                }
                return PermeabilityModel.table(hz, re, im);
            }
        }
    }

    static Medium medium(Random r) {
        double sigma = r.nextInt(5) == 0 ? 0 : edgy(r, 1e-300, 1e10);
        double eps = r.nextInt(3) == 0 ? 1 : edgy(r, 1, RelativePermittivity.MAX);
        return Medium.of("any", Conductivity.ofSiemensPerMetre(sigma), permeability(r), RelativePermittivity.of(eps));
    }

    static IncidentField field(Random r) {
        Length d = Length.ofMetres(edgy(r, IncidentField.MIN_DISTANCE_METRES, IncidentField.MAX_DISTANCE_METRES));
        ImpedanceForm form = r.nextBoolean() ? ImpedanceForm.TEXTBOOK : ImpedanceForm.EXACT_DIPOLE;
        return switch (r.nextInt(3)) {
            case 0 -> IncidentField.planeWave();
            case 1 -> IncidentField.magneticNearField(d, form);
            default -> IncidentField.electricNearField(d, form);
        };
    }

    /** The model's band ends and three frequencies inside, each finite. */
    static void finiteAcrossTheBand(ShieldingModel<?> model, Random r, long seed) {
        double lo = model.validBand().low().toHertz();
        double hi = model.validBand().high().toHertz();
        double[] hz = {lo, hi, logUniform(r, lo, hi), logUniform(r, lo, hi), logUniform(r, lo, hi)};
        for (double f : hz) {
            double se = model.shieldingEffectivenessDb(f);
            assertTrue(Double.isFinite(se), () -> "seed " + seed + ": " + model + " at " + f + " Hz gave " + se);
        }
    }

    @Test
    void everyAcceptedBarrierAndFieldIsFiniteAcrossTheBand() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            int n = 1 + r.nextInt(4);
            List<Layer> layers = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                Length t = Length.ofMetres(edgy(r, Layer.MIN_THICKNESS_METRES, Layer.MAX_THICKNESS_METRES));
                layers.add(r.nextInt(5) == 0 ? Layer.gap(t) : Layer.of(medium(r), t));
            }
            var eval = Barrier.of(layers).facing(field(r));
            finiteAcrossTheBand(eval, r, seed);
            PlanarResult p = eval.at(io.shieldmath.shield.quantity.Frequency.ofHertz(
                    logUniform(r, eval.validBand().low().toHertz(), eval.validBand().high().toHertz())));
            assertTrue(Double.isFinite(p.reflectionDb()) && Double.isFinite(p.absorptionDb())
                    && Double.isFinite(p.multipleReflectionDb()), () -> "seed " + seed + ": " + p);
        });
    }

    @Test
    void everyAcceptedShellAndEnclosureIsFiniteAcrossTheBand() {
        // A tenth of the tries, like the coil pairs: a wall many radii thick takes up to a few
        // hundred radial steps per frequency (about 28 ms a case, 15 evaluations each).
        qt().withExamples(Math.max(100, TRIES / 10)).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = edgy(r, 1e-6, 100);
            ShellShape shape = switch (r.nextInt(4)) {
                case 0 -> Shell.sphere(Length.ofMetres(a));
                case 1 -> Shell.cylinderTransverse(Length.ofMetres(a));
                case 2 -> Shell.cylinderAxial(Length.ofMetres(a));
                default -> Shell.box(Length.ofMetres(2 * a), Length.ofMetres(2 * a / (1 + 2 * r.nextDouble())),
                        Length.ofMetres(2 * a / (1 + 2 * r.nextDouble())));
            };
            Shell shell = shape.wall(medium(r), Length.ofMetres(edgy(r, 1e-12, 100)));
            if (r.nextBoolean()) {
                shell = shell.thenGap(Length.ofMetres(edgy(r, 1e-12, 100))).then(medium(r),
                        Length.ofMetres(edgy(r, 1e-12, 100)));
            }
            finiteAcrossTheBand(shell, r, seed);
            assertTrue(Double.isFinite(shell.staticShielding().shieldingEffectivenessDb()), () -> "seed " + seed);
            // A hole up to 0.6 times the radius across fits every face (a box's shorter sides are at least 2a/3)
            // and its area, below 0.09·πa², is far below every wall area; holes are at least 1 µm.
            Enclosure e = Enclosure.of(shell);
            if (0.6 * a >= 1e-6) {
                e = e.withOpening(Opening.hole(Length.ofMetres(edgy(r, 1e-6, 0.6 * a))));
            }
            finiteAcrossTheBand(e.inUniformField(), r, seed);
            finiteAcrossTheBand(e.facing(field(r)), r, seed);
        });
    }

    @Test
    void everyAcceptedCoilPairAndBarrierIsFiniteAcrossTheBand() {
        qt().withExamples(Math.max(100, TRIES / 10)).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = edgy(r, 1e-4, 10);
            double b = edgy(r, 1e-4, 10);
            double gap = Math.min(1000, Math.max(a, b) * edgy(r, CoilPair.MIN_GAP_RATIO, 1000));
            CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(a), 1 + r.nextInt(1_000_000)),
                    Coil.loop(Length.ofMetres(b), 1 + r.nextInt(1_000_000)), Length.ofMetres(gap));
            double t = Math.max(Layer.MIN_THICKNESS_METRES, Math.min(Layer.MAX_THICKNESS_METRES,
                    gap * edgy(r, 1e-9, 0.99)));
            CouplingEvaluation eval = pair.through(Barrier.of(medium(r), Length.ofMetres(t)));
            finiteAcrossTheBand(eval, r, seed);
        });
    }

    @Test
    void casesThisPropertyFoundAreFinite() {
        // A long cylinder in an axial field with σ = 1e-300 S/m at 1 µHz: sinh(z)/z as a quotient underflowed
        // to 0/0 (εr = 1e6, µr = 1), and with µr = 1e-6 the square root of a subnormal p² divided by 0.
        for (double mu : new double[] {1, 1e-6}) {
            Medium m = Medium.of("tiny σ", Conductivity.ofSiemensPerMetre(1e-300), PermeabilityModel.constant(mu),
                    RelativePermittivity.of(1e6));
            Shell s = Shell.cylinderAxial(Length.ofMetres(5.69e-4)).wall(m, Length.ofMetres(6.27e-5));
            assertTrue(Double.isFinite(s.shieldingEffectivenessDb(1e-6)), () -> "µr " + mu);
        }
    }

    @Test
    void valuesJustOutsideTheRangesAreRefusedWhereTheyAreMade() {
        // Issue 15 item 11 regression: near-field distances of 1e-200 m and 1e100 m were accepted and
        // failed later with ArithmeticException.
        for (double d : new double[] {1e-200, 1e100, 0.999e-6, 1.001e6}) {
            String msg = assertThrows(InvalidQuantityException.class,
                    () -> IncidentField.magneticNearField(Length.ofMetres(d), ImpedanceForm.EXACT_DIPOLE)).getMessage();
            assertTrue(msg.contains("near-field source distance") && msg.contains("from 1e-6 m to 1000000 m"), msg);
            assertThrows(InvalidQuantityException.class,
                    () -> IncidentField.electricNearField(Length.ofMetres(d), ImpedanceForm.TEXTBOOK));
        }
        assertThrows(InvalidQuantityException.class, () -> Layer.gap(Length.ofMetres(0.99e-12)));
        assertThrows(InvalidQuantityException.class, () -> Barrier.of(
                Medium.conductor("too good", Conductivity.ofSiemensPerMetre(1.01e10), 1), Length.ofMillimetres(1)));
        assertThrows(InvalidQuantityException.class, () -> RelativePermeability.ofComplex(1.01e7, 0));
        // A constant or tabulated µ' of 1e-300 was accepted and gave 0/0 in the planar and coil engines.
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.constant(RelativePermeability.ofComplex(1e-300, 1)));
        assertThrows(InvalidQuantityException.class, () -> PermeabilityModel.table(new double[] {1, 10},
                new double[] {1, 0.99e-6}, new double[] {0, 0}));
        PermeabilityModel.constant(RelativePermeability.ofComplex(RelativePermeability.MIN, 0));
    }
}
