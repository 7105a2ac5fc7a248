/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * Bodies of revolution in a uniform field across the axis (the first azimuthal mode of the
 * scalar potential) against closed-form results. The geometry is invented for these tests.
 */
class TransverseShieldingTest {

    private static final Medium ALLOY = Medium.conductor("test alloy", Conductivity.ZERO, 1000);

    /**
     * The exact transverse factor of an infinitely long cylindrical shell of radii a &lt; b and
     * permeability µ, S = [(µ+1)² − (a/b)²(µ−1)²]/(4µ): the m = 1 boundary-value solution
     * (the cylindrical analogue of J. D. Jackson, Classical Electrodynamics, 3rd ed., §5.12; the
     * same formula in shield-core's StaticShielding). Written out here for complex µ = re + j·im.
     */
    private static double infiniteCylinder(double re, double im, double a, double b) {
        double q = (a / b) * (a / b);
        double p1r = (re + 1) * (re + 1) - im * im;
        double p1i = 2 * (re + 1) * im;
        double p2r = (re - 1) * (re - 1) - im * im;
        double p2i = 2 * (re - 1) * im;
        return Math.hypot(p1r - q * p2r, p1i - q * p2i) / (4 * Math.hypot(re, im));
    }

    @Test
    void theClosedFormAgreesWithTheShellModelOfTheCore() {
        // Two independent implementations of the infinite cylinder across the field: the one
        // written out above and shield-core's Shell (matched m = 1 terms at each boundary).
        double core = Shell.cylinderTransverse(mm(10)).wall(ALLOY, mm(1)).staticShielding().factor();
        assertEquals(infiniteCylinder(1000, 0, 10, 11), core, 1e-9 * core);
    }

    @Test
    void nonMagneticBodiesLeaveTheAppliedFieldUnchanged() {
        // A body with µr = 1 and no current is no body at all (Maxwell's equations), and the
        // applied potential −H0·r·cos φ lies in the element space, so S = 1 to rounding
        // (common practice, no source: the patch test of the finite-element method).
        Medium air = Medium.conductor("non-magnetic", Conductivity.ZERO, 1);
        TransverseFieldShielding e = Arrangement.of(Body.can("can", air, mm(20), mm(1), mm(42)))
                .inUniformTransverseField().sensing(SensorRegion.cylinder(mm(5), mm(10)));
        TransverseFieldSolution s = e.magnetostatic();
        assertEquals(1, s.worstShieldingFactor().value(), 1e-9);
        assertEquals(1, s.meanShieldingFactor().value(), 1e-9);
        assertEquals(1, s.shieldingFactorAt(Point.ofMillimetres(15, 30)).value(), 1e-9);
        assertEquals(0, e.at(Frequency.ofKilohertz(10)).shieldingEffectivenessDb(), 1e-9);
        assertTrue(s.relativeResidual() < 1e-10, "residual " + s.relativeResidual());
    }

    @Test
    void aLongOpenTubeGivesTheInfiniteCylindersFactorAtItsCentre() {
        // Shell.cylinderTransverse (exact, above) for a = 10 mm, b = 11 mm, µr = 1000: S = 44.30.
        // Away from the open ends the end field falls off algebraically, about as (D/L)²
        // (common practice, no source), so the deviation must shrink as the tube lengthens.
        double exact = Shell.cylinderTransverse(mm(10)).wall(ALLOY, mm(1)).staticShielding().factor();
        double[] lengthOverDiameter = {4, 8, 16};
        double[] dev = new double[3];
        StringBuilder table = new StringBuilder("open tube: L/D   S(centre) FE   S infinite   FE/exact\n");
        for (int i = 0; i < 3; i++) {
            double len = lengthOverDiameter[i] * 22;
            EstimatedValue s = Arrangement.of(Body.tube("tube", ALLOY, mm(10), mm(1), mm(len))).inUniformTransverseField()
                    .magnetostatic().shieldingFactorAt(Point.ORIGIN);
            dev[i] = Math.abs(s.value() / exact - 1);
            table.append(String.format(Locale.ROOT, "  %4.0f   %s   %.4f   %.5f%n", lengthOverDiameter[i], s, exact,
                    s.value() / exact));
        }
        System.out.print(table);
        assertTrue(dev[1] < dev[0] && dev[2] < dev[1], table.toString());
        assertTrue(dev[2] < 0.005, table.toString());
    }

    @Test
    void aCappedCanApproachesTheInfiniteCylinderAsItLengthens() {
        // The caps shield more than the open ends, so a short can beats the infinite cylinder,
        // and a long one tends to it (same exact reference as above).
        double exact = Shell.cylinderTransverse(mm(10)).wall(ALLOY, mm(1)).staticShielding().factor();
        double[] lengthOverDiameter = {1, 4, 8, 16};
        double[] dev = new double[4];
        StringBuilder table = new StringBuilder("capped can: L/D   S(centre) FE   FE/exact\n");
        for (int i = 0; i < 4; i++) {
            double len = lengthOverDiameter[i] * 22;
            EstimatedValue s = Arrangement.of(Body.can("can", ALLOY, mm(10), mm(1), mm(len))).inUniformTransverseField()
                    .magnetostatic().shieldingFactorAt(Point.ORIGIN);
            dev[i] = Math.abs(s.value() / exact - 1);
            table.append(String.format(Locale.ROOT, "  %4.0f   %s   %.5f%n", lengthOverDiameter[i], s, s.value() / exact));
        }
        System.out.print(table);
        assertTrue(dev[0] > 0.05, table.toString());
        assertTrue(dev[2] < dev[1] && dev[3] < dev[2], table.toString());
        assertTrue(dev[3] < 0.005, table.toString());
    }

    @Test
    void aNonConductingFerriteTubeAtFrequencyUsesItsComplexPermeability() {
        // µ(f) = 1000/(1 + j·f/fc) at f = fc is 500 − 500j; with no conductivity there is no
        // current, so the static formula holds with the complex µ (the same boundary-value
        // problem). Long tube, L/D = 16: within the 0.5 % end effect measured above.
        Medium ferrite = Medium.conductor("test ferrite", Conductivity.ZERO,
                PermeabilityModel.relaxation(1000, Frequency.ofKilohertz(100)));
        double s = Arrangement.of(Body.tube("tube", ferrite, mm(10), mm(1), mm(352))).inUniformTransverseField()
                .at(Frequency.ofKilohertz(100)).shieldingFactorAt(Point.ORIGIN).value();
        double exact = infiniteCylinder(500, -500, 10, 11);
        System.out.printf(Locale.ROOT, "ferrite tube at fc: FE %.4f, infinite cylinder %.4f%n", s, exact);
        assertEquals(exact, s, 0.005 * exact);
    }

    @Test
    void fieldInsideALongHighPermeabilityTubeDecaysWithTheFirstZeroOfJ1() {
        // A wall with µr → ∞ is an equipotential of Φ = Φ1·cos φ, so Φ1 = 0 there and the field
        // entering an open end decays as exp(−x·z/a), x = 3.8317, the first zero of J1
        // (Abramowitz & Stegun, table 9.5). Tube a = 10 mm, wall 1 mm, 100 mm long, µr 1e6.
        Medium ideal = Medium.conductor("ideal high-µ", Conductivity.ZERO, 1e6);
        TransverseFieldSolution s = Arrangement.of(Body.tube("tube", ideal, mm(10), mm(1), mm(100)))
                .inUniformTransverseField().sensing(SensorRegion.cylinder(mm(2), mm(30)).shiftedBy(mm(35)))
                .withFineness(2).magnetostatic();
        double s1 = s.shieldingFactorAt(Point.ofMetres(0, 0.050 - 0.010)).value();
        double s2 = s.shieldingFactorAt(Point.ofMetres(0, 0.050 - 0.015)).value();
        double rate = Math.log(s2 / s1) / 0.5;
        System.out.printf(Locale.ROOT, "transverse tube decay, high µ: x = %.4f (J1 zero 3.8317)%n", rate);
        assertEquals(3.8317, rate, 0.03 * 3.8317);
    }

    @Test
    void theFactorConvergesUnderMeshRefinement() {
        // Bilinear elements: the error of an energy-like quantity falls as h², of a point field
        // value about as h (common practice, no source). Successive changes must shrink and the
        // observed order must lie between 1 and 3. Can: a = 20 mm, wall 1 mm, 42 mm, µr 1000.
        Body can = Body.can("can", ALLOY, mm(20), mm(1), mm(42));
        double[] q = {0.5, 0.5 * Math.sqrt(2), 1, Math.sqrt(2), 2, 2 * Math.sqrt(2)};
        double[] s = new double[q.length];
        StringBuilder table = new StringBuilder("transverse can: q   unknowns   S(centre)   change   order\n");
        for (int i = 0; i < q.length; i++) {
            TransverseFieldSolution r = Arrangement.of(can).inUniformTransverseField().withFineness(q[i]).magnetostatic();
            s[i] = r.shieldingFactorAt(Point.ORIGIN).value();
            String change = i == 0 ? "" : String.format(Locale.ROOT, "%.3e", Math.abs(s[i] - s[i - 1]));
            String order = i < 2 ? "" : String.format(Locale.ROOT, "%.2f",
                    Math.log(Math.abs(s[i - 1] - s[i - 2]) / Math.abs(s[i] - s[i - 1])) / Math.log(Math.sqrt(2)));
            table.append(String.format(Locale.ROOT, "  %5.3f   %8d   %.6f   %s   %s%n", q[i], r.unknowns(), s[i], change, order));
        }
        System.out.print(table);
        for (int i = 2; i < q.length; i++) {
            double d0 = Math.abs(s[i - 1] - s[i - 2]);
            double d1 = Math.abs(s[i] - s[i - 1]);
            assertTrue(d1 < d0, table.toString());
        }
        double order = Math.log(Math.abs(s[1] - s[0]) / Math.abs(s[q.length - 1] - s[q.length - 2]))
                / Math.log(q[q.length - 1] / q[1]);
        assertTrue(order > 1 && order < 3, table.toString());
    }

    @Test
    void theFarBoundaryTruncationIsSmall() {
        // The body's far field is a dipole; a fixed potential on a box at distance D changes the
        // field seen inside by a part in (extent/D)³ (common practice, no source). Measured by
        // moving the box from 40 to 80 half-extents.
        TransverseFieldShielding e = Arrangement.of(Body.can("can", ALLOY, mm(20), mm(1), mm(42)))
                .inUniformTransverseField();
        double at40 = e.magnetostatic().shieldingFactorAt(Point.ORIGIN).value();
        double at80 = e.withFarBoundaryAt(80).magnetostatic().shieldingFactorAt(Point.ORIGIN).value();
        System.out.printf(Locale.ROOT, "far boundary 40 → 80: %.6f → %.6f (%.1e)%n", at40, at80, at80 / at40 - 1);
        assertEquals(at80, at40, 1e-4 * at80);
    }

    @Test
    void mirrorImagesAndOrderingHold() {
        // Symmetry: a can open at the top read above its centre equals its mirror image, open
        // at the bottom read below (common practice, no source). The worst factor never exceeds
        // the mean (the largest |B| is at least its mean), and more permeability shields more.
        Body up = Body.can("can", ALLOY, mm(20), mm(1), mm(60)).withoutCap(CanEnd.UPPER);
        Body down = Body.can("can", ALLOY, mm(20), mm(1), mm(60)).withoutCap(CanEnd.LOWER);
        TransverseFieldSolution a = Arrangement.of(up).inUniformTransverseField()
                .sensing(SensorRegion.cylinder(mm(5), mm(10)).shiftedBy(mm(10))).magnetostatic();
        TransverseFieldSolution b = Arrangement.of(down).inUniformTransverseField()
                .sensing(SensorRegion.cylinder(mm(5), mm(10)).shiftedBackBy(mm(10))).magnetostatic();
        assertEquals(a.worstShieldingDb().value(), b.worstShieldingDb().value(), a.worstShieldingDb().estimate());
        assertEquals(a.meanShieldingDb().value(), b.meanShieldingDb().value(), a.meanShieldingDb().estimate());
        assertTrue(a.worstShieldingFactor().value() <= a.meanShieldingFactor().value());
        Medium better = Medium.conductor("more permeable", Conductivity.ZERO, 4000);
        double more = Arrangement.of(Body.can("can", better, mm(20), mm(1), mm(60)).withoutCap(CanEnd.UPPER))
                .inUniformTransverseField().sensing(SensorRegion.cylinder(mm(5), mm(10)).shiftedBy(mm(10)))
                .magnetostatic().shieldingEffectivenessDb();
        assertTrue(more > a.shieldingEffectivenessDb());
    }

    @Test
    void aLongOpenTubeIsWorstAgainstAnAxialField() {
        // An infinitely long tube does not shield a static axial field at all (S = 1, see
        // shield-core's ShellGeometry.CYLINDER_AXIAL) but shields a transverse one (S = 44 here),
        // so at the centre of a long tube the axial direction is the worse one.
        Arrangement tube = Arrangement.of(Body.tube("tube", ALLOY, mm(10), mm(1), mm(176)));
        SensorRegion region = SensorRegion.cylinder(mm(4), mm(10));
        AxialFieldSolution axial = tube.inUniformAxialField().sensing(region).magnetostatic();
        TransverseFieldSolution transverse = tube.inUniformTransverseField().sensing(region).magnetostatic();
        assertEquals(FieldDirection.AXIAL, transverse.worstDirection(axial));
        AxialFieldSolution elsewhere = tube.inUniformAxialField().magnetostatic();
        assertThrows(IllegalArgumentException.class, () -> transverse.worstDirection(elsewhere));
    }

    @Test
    void badOptionsAreRefused() {
        TransverseFieldShielding e = Arrangement.of(Body.can("outer can", ALLOY, mm(20), mm(1), mm(42)))
                .inUniformTransverseField();
        assertThrows(InvalidQuantityException.class, () -> e.shieldingEffectivenessDb(-1));
        assertThrows(InvalidQuantityException.class, () -> e.at(Frequency.ofGigahertz(10)));
        assertThrows(InvalidQuantityException.class, () -> e.withFineness(0.1));
        assertThrows(InvalidQuantityException.class, () -> e.withFarBoundaryAt(1));
        assertThrows(InvalidQuantityException.class, () -> e.withMaxUnknowns(10));
    }

    @Test
    void equalEvaluationsGiveBitIdenticalResults() {
        // Two evaluations built from separately made equal values (EqualInputsProperties' rule).
        TransverseFieldShielding a = Arrangement.of(Body.can("can", Medium.conductor("m", Conductivity.ZERO, 700),
                mm(15), mm(1), mm(30))).inUniformTransverseField().sensing(SensorRegion.cylinder(mm(3), mm(6)));
        TransverseFieldShielding b = Arrangement.of(Body.can("can", Medium.conductor("m", Conductivity.ZERO, 700),
                mm(15), mm(1), mm(30))).inUniformTransverseField().sensing(SensorRegion.cylinder(mm(3), mm(6)));
        assertEquals(a, b);
        assertEquals(a.hashCode(), b.hashCode());
        assertEquals(Double.doubleToLongBits(a.shieldingEffectivenessDb(0)),
                Double.doubleToLongBits(b.magnetostatic().shieldingEffectivenessDb()));
    }

    @Test
    void theReadmeTableReadsAsPrinted() {
        // The numbers of the README's transverse table (invented can, µr 1000, a = 20 mm, wall
        // 1 mm, 42 mm long, sensor cylinder 5 mm × 10 mm), so that the README cannot drift from
        // the code. Not a physics check: those are the tests above.
        SensorRegion region = SensorRegion.cylinder(mm(5), mm(10));
        Body can = Body.can("can", ALLOY, mm(20), mm(1), mm(42));
        Body open = Body.tube("tube", ALLOY, mm(20), mm(1), mm(42));
        double[][] expected = {{27.39, 27.25, 27.41, 21.44}, {12.78, 11.67, 12.68, 2.977}};
        Body[] bodies = {can, open};
        for (int i = 0; i < 2; i++) {
            TransverseFieldSolution t = Arrangement.of(bodies[i]).inUniformTransverseField().sensing(region).magnetostatic();
            AxialFieldSolution a = Arrangement.of(bodies[i]).inUniformAxialField().sensing(region).magnetostatic();
            double[] got = {t.shieldingFactorAt(Point.ORIGIN).value(), t.worstShieldingFactor().value(),
                t.meanShieldingFactor().value(), a.worstShieldingFactor().value()};
            System.out.printf(Locale.ROOT, "README %s: transverse centre %.4g, worst %.4g, mean %.4g; axial worst %.4g; %s%n",
                    bodies[i].name(), got[0], got[1], got[2], got[3], t.worstDirection(a));
            for (int k = 0; k < 4; k++) {
                assertEquals(expected[i][k], got[k], 0.0005 * expected[i][k] + 0.005, "README value " + k);
            }
            assertEquals(FieldDirection.AXIAL, t.worstDirection(a));
        }
    }
}
