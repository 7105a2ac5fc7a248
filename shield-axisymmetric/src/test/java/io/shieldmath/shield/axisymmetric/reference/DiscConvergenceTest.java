/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * Convergence of the insertion loss as the cells are halved in both directions (nr and nz
 * doubled on the nested graded grid).
 */
class DiscConvergenceTest {

    @Test
    void insertionLossConvergesAsTheCellsAreHalved() {
        // 1 mm copper disc of radius 40 mm between 10 mm loops 20 mm apart, at 10 kHz (t = 1.5 δ):
        // the currents crowd to the faces and the rim matters, a harder case than a thin sheet.
        CoupledCircuitDisc disc = CoupledCircuitDisc.of(0.04, 1e-3, 0, 5.8e7);
        Winding tx = Winding.loop(0.01, -0.01, 1);
        Winding rx = Winding.loop(0.01, 0.01, 1);
        int[][] levels = {{6, 1}, {12, 2}, {24, 4}, {48, 8}};
        double[] il = new double[levels.length];
        StringBuilder table = new StringBuilder("nr × nz   IL (dB)      change (dB)\n");
        for (int i = 0; i < levels.length; i++) {
            il[i] = disc.gradedCells(levels[i][0], levels[i][1], 2, 2).between(tx, rx).at(1e4).shieldingEffectivenessDb();
            table.append(String.format(Locale.ROOT, "%3d × %-3d %.6f   %s%n", levels[i][0], levels[i][1], il[i],
                    i == 0 ? "" : String.format(Locale.ROOT, "%+.6f", il[i] - il[i - 1])));
        }
        System.out.print(table);
        for (int i = 2; i < levels.length; i++) {
            double before = Math.abs(il[i - 1] - il[i - 2]);
            double now = Math.abs(il[i] - il[i - 1]);
            // Each halving must at least halve the change (about 4× is expected: piecewise-
            // constant currents in a Galerkin scheme give an O(h²) error in M_shielded).
            assertTrue(now < 0.5 * before, table.toString());
        }
        // Richardson: with the observed ratio q of successive changes, the finest level's
        // remaining error is about |last change|/(q − 1); 0.06 dB here, the axial cells dominating
        // (t = 1.5 δ; 4 → 8 layers moves the result 0.13 dB, 24 → 48 radial cells 0.006 dB).
        double q = Math.abs((il[2] - il[1]) / (il[3] - il[2]));
        double remaining = Math.abs(il[3] - il[2]) / (q - 1);
        System.out.printf(Locale.ROOT, "observed ratio %.2f, estimated remaining error %.3f dB%n", q, remaining);
        assertTrue(q > 2.5 && remaining < 0.1, table.toString());
    }
}
