/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

/**
 * Equal inputs give equal results: two evaluations built separately from equal values (new
 * media, new coils, new bodies) are {@code equals}, hash alike and give bit-identical
 * results, serially and from several threads at once. Random cases from a seed.
 */
class EqualInputsProperties {

    private static final int TRIES = 6;

    /** One random coil–plate–coil case; every call builds its values anew. */
    private static CoilCoupling coupling(long seed) {
        Random r = new Random(seed);
        double sigma = 1 + 59 * r.nextDouble();
        double mu = r.nextBoolean() ? 1 : 1 + 300 * r.nextDouble();
        double radius = 0.012 + 0.03 * r.nextDouble();
        double thickness = 1e-4 + 1e-3 * r.nextDouble();
        Medium m = Medium.conductor("metal " + seed, Conductivity.ofMegasiemensPerMetre(sigma), mu);
        CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(0.008 + 0.004 * r.nextDouble()), 1 + r.nextInt(20)),
                Coil.loop(Length.ofMetres(0.01), 5), Length.ofMetres(0.02));
        return Arrangement.of(Body.disc("plate", m, Length.ofMetres(radius), Length.ofMetres(thickness)))
                .between(pair).withFineness(0.5);
    }

    /** One random can in a uniform field; every call builds its values anew. */
    private static AxialFieldShielding can(long seed) {
        Random r = new Random(seed);
        Medium m = Medium.conductor("alloy " + seed, Conductivity.ofMegasiemensPerMetre(1 + 9 * r.nextDouble()),
                100 + 5000 * r.nextDouble());
        return Arrangement.of(Body.can("can", m, Length.ofMetres(0.01 + 0.01 * r.nextDouble()),
                Length.ofMetres(5e-4 + 1e-3 * r.nextDouble()), Length.ofMetres(0.03 + 0.03 * r.nextDouble())))
                .inUniformAxialField().withFineness(0.5);
    }

    private static double hertz(long seed) {
        return Math.pow(10, 2 + 3 * new Random(~seed).nextDouble());
    }

    @Test
    void equalCouplingsGiveBitIdenticalResults() {
        qt().withExamples(TRIES).withShrinkCycles(0).forAll(longs().all()).checkAssert(seed -> {
            CoilCoupling a = coupling(seed);
            CoilCoupling b = coupling(seed);
            assertTrue(a != b && a.equals(b) && a.hashCode() == b.hashCode());
            double f = hertz(seed);
            CouplingSolution x = a.at(io.shieldmath.shield.quantity.Frequency.ofHertz(f));
            CouplingSolution y = b.at(io.shieldmath.shield.quantity.Frequency.ofHertz(f));
            assertEquals(Double.doubleToRawLongBits(x.shieldingEffectivenessDb()),
                    Double.doubleToRawLongBits(y.shieldingEffectivenessDb()));
            assertEquals(x.mutualInductance(), y.mutualInductance());
            assertEquals(Double.doubleToRawLongBits(x.insertionLossEstimateDb()),
                    Double.doubleToRawLongBits(y.insertionLossEstimateDb()));
            // A different option is a different evaluation.
            assertTrue(!a.equals(a.withFineness(1)));
        });
    }

    @Test
    void equalCansGiveBitIdenticalResults() {
        // Static field: an alternating field on a high-µ conducting can at the top of the
        // frequency range needs a mesh beyond the default cap (see the thread test for f > 0).
        qt().withExamples(TRIES).withShrinkCycles(0).forAll(longs().all()).checkAssert(seed -> {
            AxialFieldShielding a = can(seed);
            AxialFieldShielding b = can(seed);
            assertTrue(a != b && a.equals(b) && a.hashCode() == b.hashCode());
            assertEquals(Double.doubleToRawLongBits(a.shieldingEffectivenessDb(0)),
                    Double.doubleToRawLongBits(b.shieldingEffectivenessDb(0)));
            assertEquals(Double.doubleToRawLongBits(a.magnetostatic().meanShieldingDb().value()),
                    Double.doubleToRawLongBits(b.magnetostatic().meanShieldingDb().value()));
        });
    }

    @Test
    void resultsDoNotDependOnTheThreadOrOnWhatOtherThreadsSolve() throws Exception {
        long[] seeds = {11, 22, 33, 44};
        double[] serial = new double[seeds.length];
        for (int i = 0; i < seeds.length; i++) {
            serial[i] = i % 2 == 0 ? coupling(seeds[i]).shieldingEffectivenessDb(hertz(seeds[i]))
                    : can(seeds[i]).shieldingEffectivenessDb(0);
        }
        ExecutorService pool = Executors.newFixedThreadPool(3);
        try {
            List<Future<Double>> futures = new ArrayList<>();
            for (int round = 0; round < 2; round++) {
                for (int i = 0; i < seeds.length; i++) {
                    long s = seeds[i];
                    boolean coil = i % 2 == 0;
                    // Equal evaluations built inside the worker, not shared with the serial run.
                    futures.add(pool.submit(() -> coil ? coupling(s).shieldingEffectivenessDb(hertz(s))
                            : can(s).shieldingEffectivenessDb(0)));
                }
            }
            for (int k = 0; k < futures.size(); k++) {
                assertEquals(Double.doubleToRawLongBits(serial[k % seeds.length]),
                        Double.doubleToRawLongBits(futures.get(k).get()), "case " + k);
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
