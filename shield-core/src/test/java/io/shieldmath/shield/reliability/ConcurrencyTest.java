/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.um;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

/** Shared barrier objects evaluated from 8 threads at once give the single-threaded results, bit for bit. */
class ConcurrencyTest {

    @Test
    void eightThreadsAgreeWithOne() throws Exception {
        Medium copper = Medium.conductor("copper", iacs(100), 1);
        Medium nife = Medium.conductor("nickel-iron", iacs(2.9),
                PermeabilityModel.table(new double[] {10, 1e3, 1e5}, new double[] {60000, 30000, 800},
                        new double[] {0, 8000, 2000}));
        List<PlanarEvaluation> shared = List.of(
                Barrier.of(copper, um(35)).thenGap(mm(2)).then(nife, mm(0.5)).facing(IncidentField.planeWave()),
                Barrier.of(nife, mm(1)).facing(IncidentField.magneticNearField(cm(3), ImpedanceForm.EXACT_DIPOLE)),
                Barrier.of(copper, mm(1)).facing(IncidentField.electricNearField(cm(30), ImpedanceForm.TEXTBOOK)));
        double[] hz = FrequencyBand.of(Hz(1), MHz(100)).logSpacedHertz(2000);
        List<double[]> expected = new ArrayList<>();
        for (PlanarEvaluation e : shared) {
            expected.add(e.shieldingEffectivenessDb(hz));
        }
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            CountDownLatch start = new CountDownLatch(1);
            List<Future<List<double[]>>> futures = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                futures.add(pool.submit(() -> {
                    start.await();
                    List<double[]> got = new ArrayList<>();
                    for (int round = 0; round < 5; round++) {
                        got.clear();
                        for (PlanarEvaluation e : shared) {
                            got.add(e.shieldingEffectivenessDb(hz, new double[hz.length]));
                        }
                    }
                    return got;
                }));
            }
            start.countDown();
            for (Future<List<double[]>> f : futures) {
                List<double[]> got = f.get();
                for (int i = 0; i < expected.size(); i++) {
                    assertArrayEquals(expected.get(i), got.get(i));
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
