/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The solver takes a winding as uniformly wound and ignores {@code Coil}'s ring count. This
 * quantifies that approximation against Maxwell's filament sum (Maxwell, Treatise art. 701;
 * Grover 1946), the coupling package's {@code freeSpaceMutualInductance()} over the coil's
 * rings: the filament sum tends to the uniform winding as the rings become many (midpoint
 * rule, error about 1/n²), and the solver sits at that limit, not at the few-ring value.
 */
class RingCountTest {

    private static double filaments(int rings) {
        Coil tx = Coil.loop(mm(15), 100).withWinding(mm(6), mm(6), rings, rings);
        return CoilPair.coaxial(tx, Coil.loop(mm(10), 1), mm(12)).freeSpaceMutualInductance().toHenries();
    }

    @Test
    void theSolverIsTheManyRingLimitAndTheFewRingErrorIsMeasured() {
        double m1 = filaments(1);
        double m2 = filaments(2);
        double m4 = filaments(4);
        double m32 = filaments(32);
        Coil tx = Coil.loop(mm(15), 100).withWinding(mm(6), mm(6), 1, 1);
        CoilPair pair = CoilPair.coaxial(tx, Coil.loop(mm(10), 1), mm(12));
        double fe = Arrangement.of().between(pair).withFineness(2).magnetostatic().freeSpaceMutualInductanceHenries();
        Coil tx8 = Coil.loop(mm(15), 100).withWinding(mm(6), mm(6), 8, 8);
        double fe8 = Arrangement.of().between(CoilPair.coaxial(tx8, Coil.loop(mm(10), 1), mm(12))).withFineness(2)
                .magnetostatic().freeSpaceMutualInductanceHenries();
        double e1 = m1 / m32 - 1;
        double e2 = m2 / m32 - 1;
        double e4 = m4 / m32 - 1;
        System.out.printf(Locale.ROOT, "ring count: filament sum vs 32x32: 1 ring %.3e, 2x2 %.3e, 4x4 %.3e; "
                + "FE (rings ignored) vs 32x32 %.3e%n", e1, e2, e4, fe / m32 - 1);
        // The ring count does not reach the solver.
        assertEquals(fe, fe8, 0.0);
        // The solver agrees with the many-ring limit within its free-space accuracy (1e-3).
        assertEquals(m32, fe, 1e-3 * m32);
        // The midpoint rule converges as 1/n²: each halving of the ring spacing cuts the error about 4×.
        double r12 = e1 / e2;
        double r24 = e2 / e4;
        assertTrue(r12 > 2.5 && r12 < 6 && r24 > 2.5 && r24 < 6, "ratios " + r12 + ", " + r24);
    }
}
