/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Sweeps on one mesh, and field samples for plotting. */
class SweepAndMapTest {

    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofMegasiemensPerMetre(58), 1);
    private static final CoilPair PAIR = CoilPair.coaxial(Coil.loop(mm(10), 1), Coil.loop(mm(10), 1), mm(20));

    @Test
    void aSweepOnOneMeshAgreesWithSingleSolvesWithinTheirEstimates() {
        CoilCoupling c = Arrangement.of(Body.disc("plate", COPPER, mm(30), mm(0.5))).between(PAIR);
        List<CouplingSolution> sweep = c.sweep(FrequencyBand.of(kHz(1), kHz(100)), 3).results();
        assertEquals(3, sweep.size());
        double previous = 0;
        for (CouplingSolution s : sweep) {
            CouplingSolution single = c.at(Hz(s.hertz()));
            // The sweep's mesh is graded for 100 kHz everywhere, so it is at least as fine.
            assertEquals(single.shieldingEffectivenessDb(), s.shieldingEffectivenessDb(), 0.05 + 3 * single.insertionLossEstimateDb());
            assertTrue(s.shieldingEffectivenessDb() > previous, "loss rises with frequency");
            previous = s.shieldingEffectivenessDb();
        }
    }

    @Test
    void theFluxFunctionAtTheReceiverIsTheMutualInductance() {
        // With no bodies and 1 A peak in the transmitter, the flux through the receiver's circle
        // is 2π·ψ(b, z_rx) = 2π·b·A_φ, i.e. Neumann's mutual inductance (FreeSpaceCouplingTest).
        CouplingSolution s = Arrangement.of().between(PAIR).withFineness(2).at(Hz(1));
        DriveCurrent amp = DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, Hz(1));
        FieldMap map = s.fieldMap(Point.ofMillimetres(0, 10), Point.ofMillimetres(10, 12), 11, 3, amp);
        double[][] psi = map.fluxFunctionReal();
        double exact = FreeSpaceCouplingTest.neumann(0.01, 0.01, 0.02);
        assertEquals(exact, 2 * Math.PI * psi[0][10], 2e-3 * exact);
        assertEquals(0, psi[0][0], 0.0);          // ψ = 0 on the axis
        double[][] b = map.fluxDensityTesla();
        assertTrue(b[0][0] > 0 && b.length == 3 && b[0].length == 11);
        // |B| on the axis against the loop's closed form µ0·I·a²/(2(a² + z²)^{3/2}) (Jackson §5.5), z = 20 mm.
        double onAxis = 4e-7 * Math.PI * 0.01 * 0.01 / (2 * Math.pow(0.01 * 0.01 + 0.02 * 0.02, 1.5));
        assertEquals(onAxis, b[0][0], 1e-2 * onAxis);
        assertEquals(onAxis, s.fluxDensityAt(Point.ofMillimetres(0, 10), amp).magnitudeTesla(), 1e-2 * onAxis);
    }
}
