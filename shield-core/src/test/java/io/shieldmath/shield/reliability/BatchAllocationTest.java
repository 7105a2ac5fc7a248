/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingEvaluation;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import java.lang.management.ManagementFactory;
import org.junit.jupiter.api.Test;

/**
 * The batch calls {@code shieldingEffectivenessDb(double[], double[])} allocate nothing per
 * point, as their javadoc says: the bytes this thread allocates for a long batch and for a
 * short one differ by far less than one object per point. This counts bytes, not time (the
 * JVM's per-thread allocation counter), so it does not depend on the machine's load. It
 * would have caught the coupling batch that built a label string per point (560 KB for
 * 10 000 points). Invented demo case: 0.5 mm copper (100 % IACS) between two 20 mm loops
 * 40 mm apart, and the same barrier in a loop's near field 5 cm away.
 */
class BatchAllocationTest {

    private static final int SHORT = 10;
    private static final int LONG = 2_000;
    /** Far below one 16-byte object per extra point (31 KB for 1 990 points). */
    private static final long ALLOWED_BYTES = 4_096;

    private static final Barrier COPPER = Barrier.of(
            Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1), Length.ofMillimetres(0.5));

    @Test
    void couplingBatchAllocatesNothingPerPoint() {
        Coil loop = Coil.loop(Length.ofMillimetres(20), 10);
        CouplingEvaluation e = CoilPair.coaxial(loop, loop, Length.ofMillimetres(40)).through(COPPER);
        assertNoAllocationPerPoint(e);
    }

    @Test
    void planarBatchAllocatesNothingPerPoint() {
        assertNoAllocationPerPoint(COPPER.facing(
                IncidentField.magneticNearField(Length.ofCentimetres(5), ImpedanceForm.EXACT_DIPOLE)));
    }

    private static void assertNoAllocationPerPoint(ShieldingModel<?> model) {
        double[] shortRun = hertz(SHORT);
        double[] longRun = hertz(LONG);
        double[] out = new double[LONG];
        // Warm-up, so that class loading and the first compilation are not counted.
        for (int i = 0; i < 3; i++) {
            model.shieldingEffectivenessDb(longRun, out);
        }
        long extra = Long.MAX_VALUE;
        // The smallest of a few tries, so that a one-off allocation by the JVM itself does not count.
        for (int i = 0; i < 3; i++) {
            long a = allocated();
            model.shieldingEffectivenessDb(shortRun, out);
            long b = allocated();
            model.shieldingEffectivenessDb(longRun, out);
            long c = allocated();
            extra = Math.min(extra, (c - b) - (b - a));
        }
        long bytes = extra;
        assertTrue(bytes < ALLOWED_BYTES, () -> model + ": " + LONG + " points allocate " + bytes
                + " bytes more than " + SHORT + " points");
    }

    private static double[] hertz(int n) {
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 100 * Math.pow(1e5, i / (double) (n - 1)); // 100 Hz to 10 MHz, log-spaced
        }
        return f;
    }

    private static long allocated() {
        com.sun.management.ThreadMXBean bean = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        return bean.getThreadAllocatedBytes(Thread.currentThread().getId());
    }
}
