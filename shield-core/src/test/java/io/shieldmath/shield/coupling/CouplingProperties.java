/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Property tests of the coil-coupling model. Each property draws a seed and builds its random
 * case from it, so a failure is reproducible from the reported seed.
 */
class CouplingProperties {

    // 10 000 tries in the normal suite; the mutation profile lowers it with -Dshield.tries.
    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    static Barrier randomStack(Random r, double room, boolean magnetic) {
        int n = 1 + r.nextInt(3);
        List<Layer> layers = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double t = Math.min(logUniform(r, 1e-6, 2e-2), room / n);
            double sigma = r.nextInt(5) == 0 ? 0 : logUniform(r, 1e3, 6e7);
            PermeabilityModel mu = !magnetic || r.nextBoolean() ? PermeabilityModel.constant(1)
                    : r.nextBoolean() ? PermeabilityModel.constant(logUniform(r, 1, 1e5))
                    : PermeabilityModel.relaxation(logUniform(r, 1, 1e5), Frequency.ofHertz(logUniform(r, 10, 1e6)));
            layers.add(r.nextInt(6) == 0 ? Layer.gap(Length.ofMetres(t))
                    : Layer.of(Medium.conductor("random", Conductivity.ofSiemensPerMetre(sigma), mu), Length.ofMetres(t)));
        }
        return Barrier.of(layers);
    }

    static Coil randomCoil(Random r, double radius) {
        Coil c = Coil.loop(Length.ofMetres(radius), 1 + r.nextInt(500));
        if (r.nextInt(3) == 0) {
            c = c.withWinding(Length.ofMetres(radius * r.nextDouble() * 0.5), Length.ofMetres(radius * r.nextDouble()),
                    1 + r.nextInt(3), 1 + r.nextInt(3));
        }
        return c;
    }

    @Test
    void insertionLossIsFiniteAndNonNegativeForNonMagneticStacksBetweenEqualLoops() {
        // For equal loops the kernel J1(λa)²e^{−λd} is ≥ 0 and a passive non-magnetic stack
        // transmits each spectral wave with |F(λ)| ≤ 1, so |M| ≤ M_free (IL ≥ 0 up to rounding).
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = logUniform(r, 1e-3, 1);
            double d = a * logUniform(r, 0.1, 10);
            CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(a), 1 + r.nextInt(100)),
                    Coil.loop(Length.ofMetres(a), 1 + r.nextInt(100)), Length.ofMetres(d));
            Barrier b = randomStack(r, 0.99 * d, false);
            double hz = logUniform(r, 1, 1e7);
            double il = pair.through(b).shieldingEffectivenessDb(hz);
            assertTrue(Double.isFinite(il) && il >= -1e-9, "seed " + seed + ": " + il + " dB for " + b);
        });
    }

    @Test
    void swappingTransmitterAndReceiverLeavesTheMutualImpedanceUnchanged() {
        // Reciprocity: Z12 = Z21. Seen from the other coil the stack's layer order is reversed.
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = logUniform(r, 1e-3, 1);
            double b = a * logUniform(r, 0.3, 3);
            Coil tx = randomCoil(r, a);
            Coil rx = randomCoil(r, b);
            double span = 0.5 * (tx.axialLength().map(Length::toMetres).orElse(0.0) + rx.axialLength().map(Length::toMetres).orElse(0.0));
            double d = span + Math.max(a + 0.5 * tx.radialWidth().map(Length::toMetres).orElse(0.0), b + 0.5 * rx.radialWidth().map(Length::toMetres).orElse(0.0))
                    * logUniform(r, 0.1, 10);
            CoilPair pair = CoilPair.coaxial(tx, rx, Length.ofMetres(d));
            Barrier stack = randomStack(r, 0.9 * pair.gap().toMetres(), true);
            Frequency f = Frequency.ofHertz(logUniform(r, 1, 1e7));
            CouplingResult forward = pair.through(stack).at(f);
            CouplingResult back = pair.swapped().through(stack.reversed()).at(f);
            Complex z1 = io.shieldmath.shield.TestComplex.cm(forward.mutualImpedance());
            Complex z2 = io.shieldmath.shield.TestComplex.cm(back.mutualImpedance());
            double rel = z1.subtract(z2).abs() / z1.abs();
            assertTrue(rel < 1e-9 || Math.abs(forward.shieldingEffectivenessDb() - back.shieldingEffectivenessDb()) < 1e-9,
                    "seed " + seed + ": " + rel);
        });
    }
}
