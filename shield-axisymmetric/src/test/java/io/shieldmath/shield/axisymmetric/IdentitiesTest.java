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
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

/**
 * Limits and identities of the quasi-static field that any correct solver obeys, each with
 * the reason it must hold.
 */
class IdentitiesTest {

    private static final Catalogue CATALOGUE = Catalogue.builtIn();
    private static final CoilPair PAIR = CoilPair.coaxial(Coil.loop(mm(12), 10), Coil.loop(mm(8), 30), mm(24));

    @Test
    void theLowFrequencyLimitIsTheMagnetostaticSolve() {
        // As f → 0 the eddy term jωσ vanishes and µ(f) → µ(0): the harmonic solution tends to the
        // static one (Jackson, Classical Electrodynamics, §5.18: the quasi-static eddy term is first order in ω).
        CoilCoupling steel = Arrangement.of(Body.disc("steel", CATALOGUE.get("steel-1010"), mm(30), mm(1)))
                .between(PAIR);
        CouplingSolution low = steel.at(Hz(1e-3));
        CouplingSolution stat = steel.magnetostatic();
        System.out.printf(Locale.ROOT, "f→0: steel disc IL at 1 mHz %.12f dB, static %.12f dB%n",
                low.shieldingEffectivenessDb(), stat.shieldingEffectivenessDb());
        assertEquals(stat.shieldingEffectivenessDb(), low.shieldingEffectivenessDb(), 1e-6);
        assertEquals(stat.mutualInductance().re(), low.mutualInductance().re(), 1e-9 * stat.mutualInductance().abs());
        // and the check is not trivial: a permeable plate diverts static flux along itself (as the
        // infinite permeable sheet does in Moser's model), so the static loss is well above 0 dB.
        assertTrue(stat.shieldingEffectivenessDb() > 3, "static loss " + stat.shieldingEffectivenessDb());

        AxialFieldShielding can = Arrangement.of(Body.can("can", CATALOGUE.get("nickel-iron-80"), mm(10), mm(0.5), mm(30)))
                .inUniformAxialField();
        // A high-µ conducting can keeps a small eddy term at 1 mHz (ωτ ≈ 1e-5); it vanishes with f.
        double s0 = can.magnetostatic().worstShieldingDb().value();
        double d3 = Math.abs(can.at(Hz(1e-3)).worstShieldingDb().value() - s0);
        double d5 = Math.abs(can.at(Hz(1e-5)).worstShieldingDb().value() - s0);
        System.out.printf(Locale.ROOT, "f→0: can %.9f dB static; change at 1 mHz %.2e dB, at 10 µHz %.2e dB%n", s0, d3, d5);
        assertTrue(d3 < 1e-4 && d5 < 1e-7, d3 + " " + d5);
    }

    @Test
    void aNonMagneticBodyAtZeroFrequencyShieldsNothing() {
        // Without eddy currents and with µr = 1 the body is indistinguishable from air: 0 dB.
        CoilCoupling copper = Arrangement.of(Body.disc("copper", CATALOGUE.get("copper-annealed"), mm(30), mm(1)))
                .between(PAIR);
        assertEquals(0, copper.magnetostatic().shieldingEffectivenessDb(), 1e-12);
        assertEquals(0, copper.at(Hz(1e-3)).shieldingEffectivenessDb(), 1e-9);
        assertEquals(0, copper.shieldingEffectivenessDb(0), 1e-12);
    }

    @Test
    void swappingDriveAndReceiverLeavesTheMutualImpedanceUnchanged() {
        // Reciprocity (Lorentz; for circuits, Neumann's symmetric M): with an off-centre plate
        // and unequal coils, receiver-driven and transmitter-driven M agree; on one mesh the
        // discrete system S is symmetric, so to rounding.
        CouplingSolution s = Arrangement.of(Body.disc("plate", CATALOGUE.get("aluminium-1100-o"), mm(25), mm(0.8))
                .shiftedBy(mm(3))).between(PAIR).at(kHz(10));
        ComplexValue m = s.mutualInductance();
        ComplexValue r = s.reverseMutualInductance();
        double rel = Math.hypot(m.re() - r.re(), m.im() - r.im()) / m.abs();
        System.out.printf(Locale.ROOT, "reciprocity: M %s H, reversed %s H, relative difference %.2e%n", m, r, rel);
        assertTrue(rel < 1e-9, "relative difference " + rel);
        assertTrue(Math.abs(m.im()) > 1e-3 * m.abs(), "the eddy currents shift the phase, so the check is complex");
    }

    @Test
    void eddyLossEqualsTheRiseInTheDriveCoilsInputResistance() {
        // Poynting's theorem for the quasi-static field: the time-averaged power into the bodies,
        // ½∫|J|²/σ dV, is the real power ½·|I|²·ΔR the source delivers (real µ, so no magnetic loss).
        Medium copper = Medium.conductor("copper", Conductivity.ofMegasiemensPerMetre(58), 1);
        Medium brass = Medium.conductor("brass", Conductivity.ofMegasiemensPerMetre(16), 1);
        CoilCoupling c = Arrangement.of(Body.disc("copper plate", copper, mm(20), mm(0.5)).shiftedBackBy(mm(4)),
                Body.tube("brass sleeve", brass, mm(14), mm(1), mm(10)).shiftedBy(mm(4))).between(PAIR);
        CouplingSolution s = c.at(kHz(20));
        DriveCurrent i = DriveCurrent.ofAmperes(0.5, AmplitudeMeasure.RMS, kHz(20));
        Map<String, EstimatedValue> loss = s.eddyLosses(i);
        double total = loss.get("copper plate").value() + loss.get("brass sleeve").value();
        double fromResistance = 0.5 * Math.pow(i.amperes(AmplitudeMeasure.PEAK), 2) * s.inputResistanceChange().value();
        System.out.printf(Locale.ROOT, "eddy loss: plate %.6e W, sleeve %.6e W, sum %.9e W; ½I²ΔR %.9e W%n",
                loss.get("copper plate").value(), loss.get("brass sleeve").value(), total, fromResistance);
        assertTrue(loss.get("copper plate").value() > 0 && loss.get("brass sleeve").value() > 0);
        assertEquals(fromResistance, total, 1e-9 * total);
        // RMS convention: 0.5 A RMS is 0.707 A peak; P = I_rms²·ΔR.
        assertEquals(0.25 * s.inputResistanceChange().value(), total, 1e-9 * total);
    }

    @Test
    void equalInputsGiveEqualResults() {
        CouplingSolution a = Arrangement.of(Body.disc("p", CATALOGUE.get("brass-c26000"), mm(20), mm(1))).between(PAIR)
                .at(kHz(5));
        CouplingSolution b = Arrangement.of(Body.disc("p", CATALOGUE.get("brass-c26000"), mm(20), mm(1))).between(PAIR)
                .at(kHz(5));
        assertEquals(a.shieldingEffectivenessDb(), b.shieldingEffectivenessDb(), 0.0);
        assertEquals(a.mutualInductance(), b.mutualInductance());
    }

    @Test
    void twoThreadsSolvingDifferentCasesGiveTheSerialResults() throws Exception {
        CoilCoupling one = Arrangement.of(Body.disc("a", CATALOGUE.get("copper-annealed"), mm(20), mm(0.5))).between(PAIR);
        AxialFieldShielding two = Arrangement.of(Body.can("b", CATALOGUE.get("steel-1010"), mm(10), mm(1), mm(30)))
                .inUniformAxialField();
        double serialOne = one.shieldingEffectivenessDb(10e3);
        double serialTwo = two.shieldingEffectivenessDb(1e3);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            for (int round = 0; round < 2; round++) {
                Future<Double> f1 = pool.submit(() -> one.shieldingEffectivenessDb(10e3));
                Future<Double> f2 = pool.submit(() -> two.shieldingEffectivenessDb(1e3));
                assertEquals(serialOne, f1.get(), 0.0);
                assertEquals(serialTwo, f2.get(), 0.0);
            }
        } finally {
            pool.shutdown();
        }
    }
}
