/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static io.shieldmath.shield.reliability.ModelRangeProperties.logUniform;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingResult;
import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.EnclosureResult;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.enclosure.ShellResult;
import io.shieldmath.shield.enclosure.ShellShape;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermittivity;
import java.util.Random;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * Equal inputs give equal results, for every model: each case is built twice from the same
 * seed, as two separate object graphs (new media, new permeability models, new layers), so
 * nothing can be decided by object identity. The inputs must be {@code equals} with equal hash
 * codes, and every reported number must be bit-identical. This is the property that would have
 * caught the shell that told gaps by identity (two equal shells gave 0.268 and 0.0208).
 */
class EqualInputsProperties {

    static final int TRIES = Math.max(200, ModelRangeProperties.TRIES / 10);

    /** A medium made by value; air and free space are sometimes spelled out rather than shared. */
    static Medium medium(Random r) {
        switch (r.nextInt(8)) {
            case 0:
                return Medium.of("air", Conductivity.ofSiemensPerMetre(0), PermeabilityModel.constant(1),
                        RelativePermittivity.of(1));
            case 1:
                return Medium.dielectric("film", 1 + 9 * r.nextDouble());
            default:
                break;
        }
        double sigma = logUniform(r, 1e3, 6e7);
        PermeabilityModel mu = switch (r.nextInt(3)) {
            case 0 -> PermeabilityModel.constant(logUniform(r, 1, 1e5));
            case 1 -> PermeabilityModel.relaxation(logUniform(r, 2, 1e5), Frequency.ofHertz(logUniform(r, 100, 1e6)));
            default -> PermeabilityModel.table(new double[] {10, 1e3, 1e5},
                    new double[] {5000, 3000, 200}, new double[] {0, 500, 400});
        };
        return Medium.conductor("metal", Conductivity.ofSiemensPerMetre(sigma), mu);
    }

    static Length length(Random r, double lo, double hi) {
        return Length.ofMetres(logUniform(r, lo, hi));
    }

    static IncidentField field(Random r) {
        return switch (r.nextInt(3)) {
            case 0 -> IncidentField.planeWave();
            case 1 -> IncidentField.magneticNearField(length(r, 1e-3, 10),
                    r.nextBoolean() ? ImpedanceForm.EXACT_DIPOLE : ImpedanceForm.TEXTBOOK);
            default -> IncidentField.electricNearField(length(r, 1e-3, 10), ImpedanceForm.EXACT_DIPOLE);
        };
    }

    static Barrier barrier(Random r) {
        Barrier b = Barrier.of(medium(r), length(r, 1e-6, 1e-2));
        int more = r.nextInt(3);
        for (int i = 0; i < more; i++) {
            b = r.nextBoolean() ? b.thenGap(length(r, 1e-6, 1e-2)) : b.then(medium(r), length(r, 1e-6, 1e-2));
        }
        return b;
    }

    static Shell shell(Random r) {
        Length radius = length(r, 1e-2, 1);
        ShellShape s = switch (r.nextInt(4)) {
            case 0 -> Shell.sphere(radius);
            case 1 -> Shell.cylinderTransverse(radius);
            case 2 -> Shell.cylinderAxial(radius);
            default -> Shell.box(radius, Length.ofMetres(radius.toMetres() * 0.7), Length.ofMetres(radius.toMetres() * 0.5));
        };
        Shell w = s.wall(medium(r), length(r, 1e-5, 1e-3));
        if (r.nextBoolean()) {
            w = w.thenGap(length(r, 1e-4, 1e-2)).then(medium(r), length(r, 1e-5, 1e-3));
        }
        return w;
    }

    /** Builds the case twice from one seed and checks equality of inputs and bit-identity of outputs. */
    static <T> void twice(long seed, Function<Random, T> build, Function<T, double[]> results) {
        T a = build.apply(new Random(seed));
        T b = build.apply(new Random(seed));
        assertEquals(a, b, () -> "seed " + seed);
        assertEquals(a.hashCode(), b.hashCode(), () -> "seed " + seed);
        double[] x = results.apply(a);
        double[] y = results.apply(b);
        assertEquals(x.length, y.length);
        for (int i = 0; i < x.length; i++) {
            int k = i;
            assertEquals(Double.doubleToRawLongBits(x[i]), Double.doubleToRawLongBits(y[i]),
                    () -> "seed " + seed + ", result " + k + ": " + x[k] + " vs " + y[k]);
        }
    }

    static Frequency hertz(long seed, double lo, double hi) {
        return Frequency.ofHertz(logUniform(new Random(~seed), lo, hi));
    }

    @Test
    void equalBarriersInEqualFieldsGiveIdenticalParts() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> twice(seed,
                r -> new Case<>(barrier(r), field(r)),
                c -> {
                    PlanarResult p = c.a().facing(c.b()).at(hertz(seed, 1, 1e10));
                    return new double[] {p.shieldingEffectivenessDb(), p.absorptionDb(), p.reflectionDb(),
                            p.multipleReflectionDb(), p.transmissionPhase(),
                            c.a().facing(c.b()).shieldingEffectivenessDb(hertz(seed, 1, 1e10).toHertz())};
                }));
    }

    @Test
    void equalShellsGiveIdenticalShielding() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> twice(seed, EqualInputsProperties::shell,
                s -> {
                    ShellResult ac = s.at(hertz(seed, 1e-2, 1e6));
                    return new double[] {ac.shieldingEffectivenessDb(), s.staticShielding().shieldingEffectivenessDb()};
                }));
    }

    @Test
    void equalEnclosuresGiveIdenticalPaths() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> twice(seed,
                r -> {
                    Shell s = shell(r);
                    Enclosure e = Enclosure.of(s);
                    if (r.nextBoolean()) {
                        e = e.withOpening(Opening.holes(length(r, 1e-4, 1e-3), 1 + r.nextInt(20)));
                    }
                    return e;
                },
                e -> {
                    EnclosureResult res = e.facing(IncidentField.planeWave()).at(hertz(seed, 1, 1e9));
                    EnclosureResult uni = e.inUniformField().at(hertz(seed, 1e-2, 1e5));
                    return new double[] {res.shieldingEffectivenessDb(), uni.shieldingEffectivenessDb(),
                            res.paths().size()};
                }));
    }

    @Test
    void equalCoilPairsThroughEqualBarriersGiveIdenticalCoupling() {
        qt().withExamples(Math.max(50, TRIES / 4)).forAll(longs().all()).checkAssert(seed -> twice(seed,
                r -> {
                    double a = logUniform(r, 5e-3, 0.1);
                    Coil tx = Coil.loop(Length.ofMetres(a), 1 + r.nextInt(50));
                    Coil rx = Coil.loop(Length.ofMetres(a * logUniform(r, 0.5, 2)), 1 + r.nextInt(50));
                    if (r.nextBoolean()) {
                        tx = tx.withWinding(Length.ofMetres(a * 0.2), Length.ofMetres(a * 0.3), 2, 3);
                    }
                    CoilPair pair = CoilPair.coaxial(tx, rx, Length.ofMetres(a * logUniform(r, 1, 4)));
                    double room = pair.gap().toMetres();
                    Barrier plate = Barrier.of(medium(r), Length.ofMetres(room * logUniform(r, 1e-3, 0.5)));
                    return new Case<>(pair, plate);
                },
                c -> {
                    CouplingResult res = c.a().through(c.b()).at(hertz(seed, 1, 1e6));
                    return new double[] {res.shieldingEffectivenessDb(), res.planarEstimateErrorDb(),
                            res.freeSpaceMutualInductance().toHenries()};
                }));
    }

    /** Two inputs of one case, compared as a pair. */
    record Case<A, B>(A a, B b) {
    }
}
