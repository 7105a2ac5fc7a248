/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * Conducting bodies of revolution in an alternating field across the axis (the first
 * azimuthal mode of the vector potential with eddy currents) against closed-form results
 * and against the independent scalar-potential solve. The geometry is invented for these tests.
 */
class TransverseEddyCurrentTest {

    private static final Medium COPPER = Medium.conductor("test copper", Conductivity.ofMegasiemensPerMetre(58), 1);

    @Test
    void aConductorWithoutPermeabilityAtLowFrequencyIsNoShield() {
        // σ = 1 mS/m, µr = 1 at 50 Hz: δ ≈ 2.3 km against a 22 mm can, so the body is all but
        // absent (Maxwell's equations; common practice, no source) and the applied field lies in
        // the element space, so S = 1 to the eddy reaction, below 1e-9 here.
        Medium weak = Medium.conductor("weak conductor", Conductivity.ofSiemensPerMetre(1e-3), 1);
        TransverseFieldSolution s = Arrangement.of(Body.can("can", weak, mm(10), mm(1), mm(42)))
                .inUniformTransverseField().sensing(SensorRegion.cylinder(mm(3), mm(10))).at(Frequency.ofHertz(50));
        assertEquals(1, s.worstShieldingFactor().value(), 1e-9);
        assertEquals(1, s.meanShieldingFactor().value(), 1e-9);
        assertTrue(s.relativeResidual() < 1e-10, "residual " + s.relativeResidual());
    }

    @Test
    void atLowFrequencyTheEddySolveEqualsTheScalarPotentialSolve() {
        // Two independent formulations of the same field: the vector potential with eddy currents
        // (edge and nodal elements) at 50 Hz with negligible conductivity, and the static scalar
        // potential (nodal elements). They must agree within their discretisation estimates.
        Medium weak = Medium.conductor("weakly conducting alloy", Conductivity.ofSiemensPerMetre(1e-3), 1000);
        TransverseFieldShielding e = Arrangement.of(Body.can("can", weak, mm(10), mm(1), mm(42)))
                .inUniformTransverseField();
        EstimatedValue ac = e.at(Frequency.ofHertz(50)).shieldingFactorAt(Point.ORIGIN);
        EstimatedValue dc = e.magnetostatic().shieldingFactorAt(Point.ORIGIN);
        System.out.printf(Locale.ROOT, "vector potential at 50 Hz %s, scalar potential static %s%n", ac, dc);
        assertEquals(dc.value(), ac.value(), 2 * (ac.estimate() + dc.estimate()));
    }

    @Test
    void aLongCopperTubeGivesTheInfiniteCylindersFactorAtItsCentre() {
        // shield-core's Shell.cylinderTransverse(..).at(f): the exact boundary-value solution of
        // an infinitely long conducting cylinder across the field (Bessel functions of the wall's
        // complex wavenumber, matched m = 1 terms). Tube a = 10 mm, wall 1 mm, L/D = 16; the open
        // ends cost 0.25 % in the static case (TransverseShieldingTest), less here.
        StringBuilder table = new StringBuilder("copper tube across the field: f   FE   exact   FE/exact\n");
        for (double hz : new double[] {1e3, 1e4}) {
            EstimatedValue s = Arrangement.of(Body.tube("tube", COPPER, mm(10), mm(1), mm(352))).inUniformTransverseField()
                    .at(Frequency.ofHertz(hz)).shieldingFactorAt(Point.ORIGIN);
            double exact = Shell.cylinderTransverse(mm(10)).wall(COPPER, mm(1)).at(Frequency.ofHertz(hz))
                    .shieldingFactor().value();
            table.append(String.format(Locale.ROOT, "  %6.0f Hz   %s   %.5f   %.5f%n", hz, s, exact, s.value() / exact));
            assertEquals(exact, s.value(), 0.005 * exact, table.toString());
        }
        System.out.print(table);
    }

    @Test
    void fieldInsideALongConductingTubeDecaysWithTheFirstZeroOfJ1Prime() {
        // A perfectly conducting wall keeps B normal to it at zero, so inside an open tube the
        // scalar potential of the entering transverse field is J1(x·r/a)·cos φ·exp(−x·z/a) with
        // J1′(x) = 0, x = 1.8412 (Abramowitz & Stegun, table 9.5, first zero of J1′). Copper at
        // 1 MHz: δ = 66 µm against a = 10 mm, a good conductor to 0.7 %. The point values of the
        // edge-element field are accurate to O(h) only, so the rate is a least-squares fit of
        // ln S over 21 axis points one to two radii inside the end (fineness 0.7 keeps the
        // eddy system within the size cap).
        TransverseFieldSolution s = Arrangement.of(Body.tube("tube", COPPER, mm(10), mm(0.3), mm(80)))
                .inUniformTransverseField().sensing(SensorRegion.cylinder(mm(2), mm(30)).shiftedBy(mm(25)))
                .withFineness(0.7).at(Frequency.ofMegahertz(1));
        int n = 0;
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (int k = 0; k <= 20; k++) {
            double d = 1 + 0.05 * k;
            double y = Math.log(s.shieldingFactorAt(Point.ofMetres(0, 0.040 - d * 0.010)).value());
            n++;
            sx += d;
            sy += y;
            sxx += d * d;
            sxy += d * y;
        }
        double rate = (n * sxy - sx * sy) / (n * sxx - sx * sx);
        System.out.printf(Locale.ROOT, "transverse tube decay, conductor: x = %.4f (J1' zero 1.8412)%n", rate);
        assertEquals(1.8412, rate, 0.02 * 1.8412);
    }

    @Test
    void theEddySolveConvergesUnderMeshRefinement() {
        // Same tube at 10 kHz (δ = 0.66 mm): the distance to the finest value shrinks with the
        // element size (a Cauchy-sequence check; common practice, no source; successive
        // differences alone are not monotone here, they are a few thousandths of a percent),
        // and the finest value is within 0.5 % of the exact one.
        double exact = Shell.cylinderTransverse(mm(10)).wall(COPPER, mm(1)).at(Frequency.ofHertz(1e4))
                .shieldingFactor().value();
        double[] q = {0.5, 0.5 * Math.sqrt(2), 1, Math.sqrt(2)};
        double[] s = new double[q.length];
        StringBuilder table = new StringBuilder("copper tube, 10 kHz: q   unknowns (nodes)   S(centre)   S/exact\n");
        for (int i = 0; i < q.length; i++) {
            TransverseFieldSolution r = Arrangement.of(Body.tube("tube", COPPER, mm(10), mm(1), mm(352)))
                    .inUniformTransverseField().withFineness(q[i]).at(Frequency.ofHertz(1e4));
            s[i] = r.shieldingFactorAt(Point.ORIGIN).value();
            table.append(String.format(Locale.ROOT, "  %5.3f   %8d   %.5f   %.5f%n", q[i], r.unknowns(), s[i], s[i] / exact));
        }
        System.out.print(table);
        int last = q.length - 1;
        for (int i = 1; i < last; i++) {
            assertTrue(Math.abs(s[i] - s[last]) < Math.abs(s[i - 1] - s[last]), table.toString());
        }
        assertEquals(exact, s[last], 0.005 * exact, table.toString());
    }

    @Test
    void eddyCurrentsAddToTheStaticShieldingOfAHighPermeabilityCan() {
        // A conducting high-µ can at 50 Hz shields at least as well as statically: eddy currents
        // oppose the field change (Lenz's law; common practice, no source), and the axial case
        // of the same can is compared for the worse direction. Can: σ 1.6 MS/m, µr 20 000,
        // a = 20 mm, wall 1 mm, 42 mm long; δ ≈ 56 µm, so the wall is 18 δ thick and a coarser
        // mesh (fineness 0.7) keeps the eddy system within the size cap.
        Medium alloy = Medium.conductor("test nickel-iron", Conductivity.ofMegasiemensPerMetre(1.6), 20_000);
        Arrangement can = Arrangement.of(Body.can("can", alloy, mm(20), mm(1), mm(42)));
        SensorRegion region = SensorRegion.cylinder(mm(5), mm(10));
        TransverseFieldShielding e = can.inUniformTransverseField().sensing(region).withFineness(0.7);
        double dc = e.magnetostatic().shieldingEffectivenessDb();
        TransverseFieldSolution ac = e.at(Frequency.ofHertz(50));
        AxialFieldSolution axial = can.inUniformAxialField().sensing(region).withFineness(0.7).at(Frequency.ofHertz(50));
        System.out.printf(Locale.ROOT, "high-µ can: transverse static %.3f dB, 50 Hz %s dB; axial 50 Hz %s dB; worse: %s%n",
                dc, ac.worstShieldingDb(), axial.worstShieldingDb(), ac.worstDirection(axial));
        assertTrue(ac.shieldingEffectivenessDb() >= dc - ac.worstShieldingDb().estimate());
        // The README quotes these three numbers; not a physics check (that is the line above).
        assertEquals(54.43, dc, 0.006);
        assertEquals(59.29, ac.shieldingEffectivenessDb(), 0.006);
        assertEquals(57.12, axial.shieldingEffectivenessDb(), 0.006);
        assertEquals(FieldDirection.AXIAL, ac.worstDirection(axial));
    }

    @Test
    void equalEvaluationsGiveBitIdenticalEddyResults() {
        // Two evaluations built from separately made equal values (EqualInputsProperties' rule).
        TransverseFieldShielding a = Arrangement.of(Body.tube("tube", Medium.conductor("c", Conductivity.ofMegasiemensPerMetre(58), 1),
                mm(10), mm(1), mm(40))).inUniformTransverseField();
        TransverseFieldShielding b = Arrangement.of(Body.tube("tube", Medium.conductor("c", Conductivity.ofMegasiemensPerMetre(58), 1),
                mm(10), mm(1), mm(40))).inUniformTransverseField();
        assertEquals(a, b);
        assertEquals(Double.doubleToLongBits(a.shieldingEffectivenessDb(1e3)),
                Double.doubleToLongBits(b.at(Frequency.ofKilohertz(1)).shieldingEffectivenessDb()));
    }
}
