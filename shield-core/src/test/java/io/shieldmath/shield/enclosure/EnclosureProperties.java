/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Property tests of shells and enclosures. Each property draws a seed from QuickTheories and
 * builds its random case from it, so a failure is reproducible from the reported seed.
 */
class EnclosureProperties {

    // 10 000 tries in the normal suite; the mutation profile lowers it with -Dshield.tries.
    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    static Medium randomMedium(Random r) {
        double sigma = r.nextInt(5) == 0 ? 0 : logUniform(r, 1e3, 6e7);
        double mu = r.nextInt(3) == 0 ? 1 : logUniform(r, 1, 1e5);
        PermeabilityModel model = r.nextBoolean() ? PermeabilityModel.constant(mu)
                : PermeabilityModel.relaxation(mu, Frequency.ofHertz(logUniform(r, 10, 1e6)));
        return Medium.conductor("random", Conductivity.ofSiemensPerMetre(sigma), model);
    }

    static ShellShape randomShape(Random r, double radius) {
        Length a = Length.ofMetres(radius);
        switch (r.nextInt(3)) {
            case 0:
                return Shell.sphere(a);
            case 1:
                return Shell.cylinderTransverse(a);
            default:
                return Shell.cylinderAxial(a);
        }
    }

    static Shell randomShell(Random r) {
        double a = logUniform(r, 0.005, 1);
        Shell s = randomShape(r, a).wall(randomMedium(r), Length.ofMetres(a * logUniform(r, 1e-4, 0.05)));
        int walls = r.nextInt(4);
        for (int i = 0; i < walls; i++) {
            s = s.thenGap(Length.ofMetres(a * logUniform(r, 0.01, 0.5)))
                    .then(randomMedium(r), Length.ofMetres(a * logUniform(r, 1e-4, 0.05)));
        }
        return s;
    }

    static Opening randomOpening(Random r) {
        Length size = Length.ofMetres(logUniform(r, 1e-4, 0.3));
        Opening o;
        switch (r.nextInt(4)) {
            case 0:
                o = Opening.hole(size);
                break;
            case 1:
                o = Opening.holes(size, 1 + r.nextInt(500));
                break;
            case 2:
                o = Opening.slot(size, size.multipliedBy(0.05 + 0.9 * r.nextDouble()));
                break;
            default:
                o = Opening.seam(size);
        }
        if (o.kind() != Opening.Kind.SEAM && r.nextBoolean()) {
            o = o.throughTube(Length.ofMetres(logUniform(r, 1e-4, 0.05)));
        }
        return o;
    }

    /**
     * A random opening that fits the enclosure (no larger than the face it sits on, open area
     * within the wall's; openings that do not fit are refused by {@link Enclosure#withOpening}
     * and drawn again here), or a 0.1 mm hole if none of 100 draws fits.
     */
    static Opening randomOpening(Random r, Enclosure e) {
        ShellShape shape = e.shell().shape();
        double open = 0;
        for (Opening o : e.openings()) {
            open += o.totalArea();
        }
        for (int k = 0; k < 100; k++) {
            Opening o = randomOpening(r);
            if (shape.misfit(o) == null && open + o.totalArea() <= shape.wallArea()) {
                return o;
            }
        }
        return Opening.hole(Length.ofMetres(1e-4));
    }

    static EnclosureResult evaluate(Enclosure e, Random r, double hz) {
        switch (r.nextInt(4)) {
            case 0:
                return e.staticShielding();
            case 1:
                return e.inUniformField().at(Frequency.ofHertz(hz));
            case 2:
                return e.facing(IncidentField.planeWave()).at(Frequency.ofHertz(hz));
            default:
                return e.facing(IncidentField.magneticNearField(Length.ofMetres(logUniform(r, 0.01, 10)),
                        ImpedanceForm.EXACT_DIPOLE)).at(Frequency.ofHertz(hz));
        }
    }

    @Test
    void addingALeakagePathNeverRaisesEnclosureSe() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Enclosure e = Enclosure.of(randomShell(r));
            if (r.nextBoolean()) {
                e = e.withPathSum(PathSum.ROOT_SUM_SQUARE);
            }
            int n = r.nextInt(4);
            for (int i = 0; i < n; i++) {
                e = e.withOpening(randomOpening(r, e));
            }
            Enclosure more = e.withOpening(randomOpening(r, e));
            double hz = logUniform(r, 1, 1e10);
            long mode = r.nextLong();
            EnclosureResult before = evaluate(e, new Random(mode), hz);
            EnclosureResult after = evaluate(more, new Random(mode), hz);
            assertTrue(after.shieldingEffectivenessDb() <= before.shieldingEffectivenessDb() + 1e-9 * Math.max(1, before.shieldingEffectivenessDb()),
                    () -> "seed " + seed + ": " + before + " then " + after);
            double shares = 0;
            for (LeakagePath p : after.paths()) {
                shares += p.share();
                assertTrue(p.shieldingEffectivenessDb() >= after.limitingPath().shieldingEffectivenessDb());
            }
            assertEquals(1, shares, 1e-9, () -> "seed " + seed);
            assertTrue(after.shieldingEffectivenessDb() <= Math.max(0, after.limitingPath().shieldingEffectivenessDb()) + 1e-9,
                    () -> "seed " + seed);
        });
    }

    @Test
    void aShellOfFreeSpacePropertiesGivesZeroDecibels() {
        Medium vacuumLike = Medium.conductor("µr 1, σ 0", Conductivity.ZERO,
                PermeabilityModel.constant(RelativePermeability.ONE));
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = logUniform(r, 1e-4, 10);
            Shell s = randomShape(r, a).wall(vacuumLike, Length.ofMetres(a * logUniform(r, 1e-4, 2)));
            if (r.nextBoolean()) {
                s = s.thenGap(Length.ofMetres(a * logUniform(r, 1e-3, 1))).then(vacuumLike,
                        Length.ofMetres(a * logUniform(r, 1e-4, 1)));
            }
            double hz = logUniform(r, 1e-6, 1e11);
            assertEquals(0, s.staticShielding().shieldingEffectivenessDb(), 1e-9, () -> "seed " + seed);
            ShellResult ac = s.at(Frequency.ofHertz(hz));
            assertEquals(0, ac.shieldingEffectivenessDb(), 1e-9, () -> "seed " + seed);
            assertEquals(0, ac.phase(), 1e-9, () -> "seed " + seed);
        });
    }

    @Test
    void thinShellSeRisesWithWallThickness() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = logUniform(r, 0.005, 1);
            ShellShape shape = randomShape(r, a);
            // µ' ≥ 1 at every frequency: a relaxation of µdc = 1 is slightly diamagnetic above 0 Hz, and a
            // thicker diamagnetic wall rightly shields less
            double sigma = r.nextInt(5) == 0 ? 0 : logUniform(r, 1e3, 6e7);
            Medium m = Medium.conductor("random", Conductivity.ofSiemensPerMetre(sigma),
                    r.nextInt(3) == 0 ? 1 : logUniform(r, 1, 1e5));
            double t1 = a * logUniform(r, 1e-5, 0.01);
            double t2 = t1 * (1 + r.nextDouble());
            double hz = logUniform(r, 1e-3, 1e7);
            ShellResult thin = shape.wall(m, Length.ofMetres(t1)).at(Frequency.ofHertz(hz));
            ShellResult thick = shape.wall(m, Length.ofMetres(t2)).at(Frequency.ofHertz(hz));
            assertTrue(thick.shieldingEffectivenessDb() >= thin.shieldingEffectivenessDb() - 1e-9 * Math.max(1, thin.shieldingEffectivenessDb()),
                    () -> "seed " + seed + ": " + thin + " then " + thick);
            assertTrue(thick.thinShellDb(0) >= thin.thinShellDb(0) - 1e-9 * Math.max(1, thin.thinShellDb(0)),
                    () -> "seed " + seed + ": Kaden " + thin.thinShellDb(0) + " then " + thick.thinShellDb(0));
            double st1 = shape.wall(m, Length.ofMetres(t1)).staticShielding().shieldingEffectivenessDb();
            double st2 = shape.wall(m, Length.ofMetres(t2)).staticShielding().shieldingEffectivenessDb();
            assertTrue(st2 >= st1 - 1e-12, () -> "seed " + seed);
        });
    }
}
