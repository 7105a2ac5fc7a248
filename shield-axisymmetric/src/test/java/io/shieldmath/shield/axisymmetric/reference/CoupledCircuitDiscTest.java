/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The coupled-circuit disc's limits and identities: no conductivity, reciprocity, the
 * low-frequency expansion, the energy balance, and refused input.
 */
class CoupledCircuitDiscTest {

    // An asymmetric case on purpose: unequal coils at unequal distances, the disc off-centre,
    // the receiver a wound coil of 3 × 2 rings.
    static final Winding TX = Winding.loop(0.012, -0.009, 5);
    static final Winding RX = new Winding(0.02, 0.014, 40, 0.004, 0.006, 3, 2);
    static DiscCoupling aluminium;

    @BeforeAll
    static void assemble() {
        // 60 mm aluminium disc (σ = 3.5e7 S/m), 1 mm thick, centre plane at z = 1 mm.
        aluminium = CoupledCircuitDisc.of(0.06, 1e-3, 1e-3, 3.5e7).gradedCells(20, 4, 2, 1.5).between(TX, RX);
    }

    @Test
    void noConductivityGivesTheFreeSpaceCouplingAndZeroDecibels() {
        // σ = 0: no eddy currents, M_shielded = Maxwell's M of the coils (summed over rings) exactly.
        DiscCouplingResult r = aluminium.withConductivity(0).at(1e4);
        assertEquals(TX.mutualInductance(RX), r.shieldedMutualInductanceRe(), 0);
        assertEquals(0, r.shieldedMutualInductanceIm(), 0);
        assertEquals(0, r.shieldingEffectivenessDb(), 0);
        assertEquals(0, r.eddyLossWatts(1), 0);
        // σ → 0: the insertion loss vanishes as σ² (the disc's response is a function of ωσ; see
        // the low-frequency test), so each factor 10 in σ divides it by 100.
        double il1 = aluminium.withConductivity(1e2).at(1e4).shieldingEffectivenessDb();
        double il2 = aluminium.withConductivity(1e1).at(1e4).shieldingEffectivenessDb();
        assertTrue(il1 > 0 && il1 < 1e-6, "IL at 100 S/m: " + il1);
        assertEquals(100, il1 / il2, 1e-3 * 100);
        DiscCouplingResult tiny = aluminium.withConductivity(1e-3).at(1e4);
        assertEquals(TX.mutualInductance(RX), tiny.shieldedMutualInductanceRe(), 1e-12 * TX.mutualInductance(RX));
    }

    @Test
    void swappingTransmitterAndReceiverLeavesTheShieldedCouplingUnchanged() {
        // Reciprocity (Z12 = Z21 of a passive linear network with symmetric L): M_shielded is the
        // same seen from either coil. Checked with a freshly assembled swapped case too.
        DiscCoupling fresh = CoupledCircuitDisc.of(0.06, 1e-3, 1e-3, 3.5e7).gradedCells(20, 4, 2, 1.5).between(RX, TX);
        for (double hz : new double[] {10, 1e3, 1e4, 1e5}) {
            DiscCouplingResult a = aluminium.at(hz);
            DiscCouplingResult b = aluminium.swapped().at(hz);
            DiscCouplingResult c = fresh.at(hz);
            double size = a.shieldedMutualInductance().abs();
            assertEquals(0, a.shieldedMutualInductance().subtract(b.shieldedMutualInductance()).abs(), 1e-9 * size);
            assertEquals(0, a.shieldedMutualInductance().subtract(c.shieldedMutualInductance()).abs(), 1e-9 * size);
        }
    }

    @Test
    void eddyLossEqualsTheIncreaseOfTheDriveResistance() {
        // Energy balance (Poynting): the power the drive delivers beyond its own loss,
        // ½·|I|²·Re ΔZ, is dissipated in the disc, Σ ½·|i_k|²·R_k (peak amplitudes).
        for (double hz : new double[] {50, 1e3, 1e4, 1e5, 1e6}) {
            DiscCouplingResult r = aluminium.at(hz);
            double amps = 2.5;
            double loss = r.eddyLossWatts(amps);
            assertTrue(loss > 0);
            assertEquals(loss, 0.5 * amps * amps * r.driveResistanceChangeOhms(), 1e-9 * loss, "at " + hz + " Hz");
            // Eddy currents oppose the drive's flux: its inductance falls.
            assertTrue(r.driveReactanceChangeOhms() < 0);
        }
    }

    @Test
    void lowFrequencyInsertionLossGrowsAsOmegaSquared() {
        // Derivation: with Z = R + jωL, i/I = −jω·Z⁻¹·m = −jω·R⁻¹m − ω²·R⁻¹LR⁻¹m + O(ω³), so
        // M_sh/M0 = 1 − jωα − ω²γ + O(ω³), α = nᵀR⁻¹m/M0, γ = nᵀR⁻¹LR⁻¹m/M0, and
        // |M_sh/M0|² = 1 + ω²(α² − 2γ) + O(ω³): IL = 10·log10(e)·ω²·(2γ − α²) + O(ω³).
        // The coefficient is computed here from the assembled matrices with Commons Math,
        // independently of the solve; the eddy loss tends to ½·ω²·Σ m_k²/R_k likewise.
        double[] res = aluminium.cellResistances();
        double[] m = aluminium.transmitterCouplings();
        double[] n = aluminium.receiverCouplings();
        RealMatrix l = new Array2DRowRealMatrix(aluminium.cellInductances());
        RealVector rm = new ArrayRealVector(m.length);
        RealVector rn = new ArrayRealVector(n.length);
        double lossCoefficient = 0;
        for (int k = 0; k < m.length; k++) {
            rm.setEntry(k, m[k] / res[k]);
            rn.setEntry(k, n[k] / res[k]);
            lossCoefficient += 0.5 * m[k] * m[k] / res[k];
        }
        double m0 = aluminium.freeSpaceMutualInductance();
        double alpha = rn.dotProduct(new ArrayRealVector(m)) / m0;
        double gamma = rn.dotProduct(l.operate(rm)) / m0;
        double c2 = 10 * Math.log10(Math.E) * (2 * gamma - alpha * alpha);
        assertTrue(c2 > 0, "shielding grows from zero: " + c2);
        StringBuilder table = new StringBuilder("f (Hz), IL/(c2·ω²), loss/(½·ω²·Σ m_k²/R_k):");
        double[] hz = {1, 3, 10};
        double[] err = new double[hz.length];
        for (int i = 0; i < hz.length; i++) {
            double w = 2 * Math.PI * hz[i];
            DiscCouplingResult r = aluminium.at(hz[i]);
            double ratio = r.shieldingEffectivenessDb() / (c2 * w * w);
            double lossRatio = r.eddyLossWatts(1) / (lossCoefficient * w * w);
            table.append(String.format(Locale.ROOT, "  %.0f: %.8f, %.8f", hz[i], ratio, lossRatio));
            err[i] = ratio - 1;
            assertEquals(1, lossRatio, 1e-2, table.toString());
        }
        System.out.println(table);
        // The ratios tend to 1, and their departures from 1 are the next term of the expansion,
        // of relative order (ωτ)² (τ = L/R of the disc): they scale as f².
        assertEquals(0, err[0], 1e-4, table.toString());
        for (int i = 1; i < hz.length; i++) {
            double expected = Math.pow(hz[i] / hz[i - 1], 2);
            assertEquals(expected, err[i] / err[i - 1], 0.05 * expected, table.toString());
        }
        DiscCouplingResult r1 = aluminium.at(1);
        assertEquals(1, r1.shieldingEffectivenessDb() / (c2 * Math.pow(2 * Math.PI, 2)), 1e-4);
        // First order: Im M_sh → −ω·α·M0.
        assertEquals(-2 * Math.PI * alpha * m0, r1.shieldedMutualInductanceIm(), 1e-4 * 2 * Math.PI * alpha * m0);
    }

    @Test
    void badInputIsRefusedWithTheQuantityNamed() {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> CoupledCircuitDisc.of(-1, 1e-3, 0, 1e7));
        assertTrue(e.getMessage().contains("disc radius") && e.getMessage().contains("m"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> CoupledCircuitDisc.of(0.1, 1e-3, 0, Double.NaN));
        assertTrue(e.getMessage().contains("conductivity"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> CoupledCircuitDisc.of(0.1, 1e-3, 0, 1e7).cells(0, 2));
        assertTrue(e.getMessage().contains("radial cells"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> CoupledCircuitDisc.of(0.1, 1e-3, 0, 1e7).cells(100, 64));
        assertTrue(e.getMessage().contains("cells in all"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> CoupledCircuitDisc.of(0.1, 1e-3, 0, 1e7).cells(4, 2)
                .between(Winding.loop(0.01, 0, 1), Winding.loop(0.01, 0.01, 1)));
        assertTrue(e.getMessage().contains("transmitter ring 0"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> aluminium.at(0));
        assertTrue(e.getMessage().contains("frequency"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> aluminium.at(Double.POSITIVE_INFINITY));
        assertTrue(e.getMessage().contains("frequency"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> CoupledCircuitDisc.of(0.1, 1e-3, 0, 1e7)
                .withEdges(new double[] {0, 0.05, 0.04, 0.1}, new double[] {-5e-4, 5e-4}));
        assertTrue(e.getMessage().contains("radial edge 2"), e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> Winding.loop(0.01, 0, 0));
        assertTrue(e.getMessage().contains("turns"), e.getMessage());
        assertThrows(IllegalStateException.class, () -> aluminium.withConductivity(0).cellResistances());
    }
}
