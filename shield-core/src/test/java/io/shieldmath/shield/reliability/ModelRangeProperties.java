/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingResult;
import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.EnclosureResult;
import io.shieldmath.shield.enclosure.LeakagePath;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.enclosure.ShellResult;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Every model beyond the planar engine, across the documented input range (issue 9:
 * 1 mHz–100 GHz where the model accepts it, thickness 1 nm–10 cm, σ 0–1e8 S/m, µr 1–1e6,
 * distances 1 mm–100 m), gives a finite result whose parts add up to its total.
 */
class ModelRangeProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    static Medium medium(Random r) {
        double sigma = r.nextInt(6) == 0 ? 0 : logUniform(r, 1e-2, 1e8);
        double mu = r.nextInt(3) == 0 ? 1 : logUniform(r, 1, 1e6);
        PermeabilityModel m = r.nextBoolean() ? PermeabilityModel.constant(mu)
                : PermeabilityModel.relaxation(mu, Frequency.ofHertz(logUniform(r, 10, 1e7)));
        return Medium.conductor("random", Conductivity.ofSiemensPerMetre(sigma), m);
    }

    @Test
    void shellsAreFiniteAcrossTheRange() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Length radius = Length.ofMetres(logUniform(r, 1e-3, 10));
            Length t = Length.ofMetres(logUniform(r, 1e-9, 0.1));
            Shell shell = switch (r.nextInt(3)) {
                case 0 -> Shell.sphere(radius).wall(medium(r), t);
                case 1 -> Shell.cylinderTransverse(radius).wall(medium(r), t);
                default -> Shell.cylinderAxial(radius).wall(medium(r), t);
            };
            if (r.nextBoolean()) {
                shell = shell.thenGap(Length.ofMetres(logUniform(r, 1e-6, 0.1))).then(medium(r), t);
            }
            double hz = logUniform(r, 1e-3, 1e11);
            ShellResult res = shell.at(Frequency.ofHertz(hz));
            assertTrue(Double.isFinite(res.shieldingEffectivenessDb()), () -> "seed " + seed + ": " + res);
            assertTrue(Double.isFinite(shell.staticShielding().shieldingEffectivenessDb()), () -> "seed " + seed);
        });
    }

    @Test
    void enclosurePathsAreFiniteAndShareTheLeakage() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double side = logUniform(r, 0.01, 3);
            double y = side * (0.5 + r.nextDouble());
            double z = side * (0.5 + r.nextDouble());
            double shortest = Math.min(side, Math.min(y, z));
            Shell shell = Shell.box(Length.ofMetres(side), Length.ofMetres(y), Length.ofMetres(z)).wall(medium(r),
                    Length.ofMetres(logUniform(r, 1e-6, 0.01)));
            // Holes up to a tenth of the shortest side, at most 500: their area, at most 500·π/400 = 3.9 times
            // the shortest side squared, stays within the box's wall area, at least 6 times it.
            Enclosure e = Enclosure.of(shell)
                    .withOpening(Opening.holes(Length.ofMetres(shortest * logUniform(r, 1e-3, 0.1)), 1 + r.nextInt(500)))
                    .withOpening(Opening.seam(Length.ofMetres(side * logUniform(r, 1e-2, 1))));
            double hz = logUniform(r, 1e-3, 1e10);
            EnclosureResult res = r.nextBoolean() ? e.inUniformField().at(Frequency.ofHertz(hz))
                    : e.facing(IncidentField.planeWave()).at(Frequency.ofHertz(hz));
            assertTrue(Double.isFinite(res.shieldingEffectivenessDb()) && res.shieldingEffectivenessDb() >= 0, () -> "seed " + seed + ": " + res);
            double share = 0;
            for (LeakagePath p : res.paths()) {
                assertTrue(Double.isFinite(p.shieldingEffectivenessDb()), () -> "seed " + seed + ": " + p);
                // No path lets more through than the whole; the total is capped at 0 dB (PathSum), so a
                // wall that raises the field very slightly (SE just below 0 dB) still gives a 0 dB total.
                assertTrue(res.shieldingEffectivenessDb() <= Math.max(0, p.shieldingEffectivenessDb()) + 1e-9,
                        () -> "seed " + seed + ": " + p);
                share += p.share();
            }
            assertEquals(1, share, 1e-9, () -> "seed " + seed);
        });
    }

    @Test
    void coilCouplingIsFiniteAcrossTheRange() {
        qt().withExamples(Math.max(100, TRIES / 10)).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = logUniform(r, 1e-3, 1);
            double d = a * logUniform(r, 0.1, 10);
            double t = Math.min(d * 0.9, logUniform(r, 1e-6, 0.01));
            CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(a), 1 + r.nextInt(100)),
                    Coil.loop(Length.ofMetres(a * logUniform(r, 0.5, 2)), 1 + r.nextInt(100)), Length.ofMetres(d));
            Barrier b = Barrier.of(medium(r), Length.ofMetres(t));
            double hz = logUniform(r, 1e-3, 1e7);
            CouplingResult res = pair.through(b).at(Frequency.ofHertz(hz));
            assertTrue(Double.isFinite(res.shieldingEffectivenessDb()), () -> "seed " + seed + ": " + res);
            assertTrue(Double.isFinite(res.freeSpaceMutualInductance().toHenries()) && res.freeSpaceMutualInductance().toHenries() > 0);
        });
    }
}
