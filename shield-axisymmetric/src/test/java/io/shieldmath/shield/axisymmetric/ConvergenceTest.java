/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * Error against element size for two reference cases, with the observed order of
 * convergence. Element sizes scale as 1/q (q the fineness); bilinear elements should give
 * errors in the coupling (an energy-like quantity) of order h².
 */
class ConvergenceTest {

    @Test
    void freeSpaceCouplingConvergesAtAboutSecondOrder() {
        // Reference: Neumann's integral for coaxial circles (see FreeSpaceCouplingTest).
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 1), Coil.loop(mm(10), 1), mm(25));
        double exact = FreeSpaceCouplingTest.neumann(0.015, 0.010, 0.025);
        double[] q = {0.5, 0.5 * Math.sqrt(2), 1, Math.sqrt(2), 2};
        double[] err = new double[q.length];
        StringBuilder table = new StringBuilder("free space: q   h/h(q=1)   unknowns   relative error   order\n");
        for (int i = 0; i < q.length; i++) {
            CouplingSolution s = Arrangement.of().between(pair).withFineness(q[i]).magnetostatic();
            err[i] = Math.abs(s.freeSpaceMutualInductanceHenries() / exact - 1);
            String order = i == 0 ? "" : String.format(Locale.ROOT, "%.2f", Math.log(err[i - 1] / err[i]) / Math.log(q[i] / q[i - 1]));
            table.append(String.format(Locale.ROOT, "  %5.3f   %5.3f   %8d   %.3e   %s%n", q[i], 1 / q[i], s.unknowns(),
                    err[i], order));
        }
        System.out.print(table);
        double overall = Math.log(err[0] / err[q.length - 1]) / Math.log(q[q.length - 1] / q[0]);
        System.out.printf(Locale.ROOT, "free space: fitted order %.2f%n", overall);
        // Observed: about 1.8 (the thin loops' logarithmic singularities keep it just under 2).
        assertTrue(overall > 1.5 && overall < 2.5, table.toString());
    }

    @Test
    void thickPlateConvergesAndStatesTheElementsPerSkinDepthRule() {
        // 1 mm copper (4.8 δ) at 100 kHz, radius 40 coil radii, against the infinite-sheet model
        // (Moser 1967; Dodd & Deeds 1968). Through the thickness there are 12·q elements per skin
        // depth and the first element is δ/(10q); the table shows what that buys.
        Medium copper = Medium.conductor("copper", Conductivity.ofMegasiemensPerMetre(58), 1);
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(10), 1), Coil.loop(mm(10), 1), mm(20));
        double sheet = pair.through(Barrier.of(copper, mm(1))).shieldingEffectivenessDb(1e5);
        double[] q = {0.5, 0.5 * Math.sqrt(2), 1};
        double[] err = new double[q.length];
        StringBuilder table = new StringBuilder(String.format(Locale.ROOT,
                "thick plate (sheet %.4f dB): q   elements per δ inside   unknowns   IL error dB   estimate dB%n", sheet));
        for (int i = 0; i < q.length; i++) {
            CouplingSolution s = Arrangement.of(Body.disc("plate", copper, m(0.4), mm(1))).between(pair).withFineness(q[i])
                    .at(kHz(100));
            err[i] = s.shieldingEffectivenessDb() - sheet;
            table.append(String.format(Locale.ROOT, "  %5.3f   %5.1f   %8d   %+.4f   %.4f%n", q[i], 12 * q[i], s.unknowns(), err[i],
                    s.insertionLossEstimateDb()));
        }
        System.out.print(table);
        assertTrue(Math.abs(err[2]) < Math.abs(err[0]), table.toString());
        assertTrue(Math.abs(err[2]) < 0.05, table.toString());
    }
}
