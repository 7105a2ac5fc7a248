/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/** Cans and tubes in a uniform axial field against published closed-form results. */
class StaticShieldingTest {

    private static final MagneticFluxDensity ONE_TESLA = MagneticFluxDensity.ofTesla(1);

    @Test
    void closedHighPermeabilityCanMatchesMagersCappedCylinderFormula() {
        // A. Mager, IEEE Trans. Magn. 6 (1970) 67, capped cylinders in an axial static field:
        // S_A ≈ 4·N·S_T + 1, with S_T = 1 + µr·t/D the transverse factor of the infinite thin-walled
        // cylinder (standard boundary-value result, thin-shell limit) and N the cylinder's axial
        // demagnetising factor for L/D = 1, N ≈ 0.27 (D.-X. Chen, J. A. Brug, R. B. Goldfarb,
        // IEEE Trans. Magn. 27 (1991) 3601, magnetometric value; from memory). Mager's stated
        // accuracy, about ±3 dB (from memory), is the tolerance.
        // Can: inner radius 20 mm, wall 1 mm, outside length 42 mm = outside diameter, µr 20 000, σ = 0.
        Medium alloy = Medium.conductor("high-µ alloy", Conductivity.ZERO, 20_000);
        AxialFieldSolution s = Arrangement.of(Body.can("can", alloy, mm(20), mm(1), mm(42))).inUniformAxialField()
                .magnetostatic();
        double sT = 1 + 20_000 * 1.0 / 41;          // mean diameter 41 mm
        double mager = 4 * 0.27 * sT + 1;
        double fe = s.shieldingFactorAt(Point.ORIGIN).value();
        System.out.printf(Locale.ROOT, "Mager: closed can S(centre) FE %.1f (± %.1f), Mager %.1f, ratio %.3f (%.2f dB)%n",
                fe, s.shieldingFactorAt(Point.ORIGIN).estimate(), mager, fe / mager, 20 * Math.log10(fe / mager));
        assertTrue(Math.abs(20 * Math.log10(fe / mager)) < 3, "FE " + fe + ", Mager " + mager);
        // The shield is passive and the field inside is uniform to a few per cent near the centre.
        double off = s.fluxDensityAt(Point.ofMillimetres(5, 5), ONE_TESLA).magnitudeTesla();
        double centre = s.fluxDensityAt(Point.ORIGIN, ONE_TESLA).magnitudeTesla();
        assertEquals(centre, off, 0.05 * centre);
    }

    /** The decay constant of ln|B_z| on the axis between two depths inside a tube's open end. */
    private static double decayRate(AxialFieldSolution s, double end, double a, double d1, double d2) {
        double b1 = s.fluxDensityAt(Point.ofMetres(0, end - d1 * a), ONE_TESLA).magnitudeTesla();
        double b2 = s.fluxDensityAt(Point.ofMetres(0, end - d2 * a), ONE_TESLA).magnitudeTesla();
        return Math.log(b1 / b2) / ((d2 - d1) * a);
    }

    @Test
    void fieldInsideALongHighPermeabilityTubeDecaysWithTheFirstZeroOfJ0() {
        // Inside a long open tube whose wall is an equipotential of the magnetic scalar potential
        // (µr → ∞), the axial field entering an end decays as exp(−x·z/a), x = 2.405, the first
        // zero of J0 (Abramowitz & Stegun, table 9.5). Tube: a = 10 mm, wall 1 mm, 100 mm long,
        // µr 1e6 (so that the wall's own flux leaves a floor far below the decaying mode), σ = 0.
        Medium alloy = Medium.conductor("ideal high-µ", Conductivity.ZERO, 1e6);
        double a = 0.010;
        AxialFieldSolution s = Arrangement.of(Body.tube("tube", alloy, mm(10), mm(1), mm(100))).inUniformAxialField()
                .sensing(SensorRegion.cylinder(mm(2), mm(30)).shiftedBy(mm(35))).magnetostatic();
        double rate = decayRate(s, 0.050, a, 1.0, 2.5) * a;
        System.out.printf(Locale.ROOT, "tube decay, high µ: x = %.4f (J0 zero 2.4048)%n", rate);
        assertEquals(2.4048, rate, 0.03 * 2.4048);
    }

    @Test
    void fieldInsideALongConductingTubeDecaysWithTheFirstZeroOfJ1() {
        // A perfectly conducting wall keeps B normal to it at zero, so the entering axial field
        // decays as exp(−x·z/a) with x = 3.832, the first zero of J1 = −J0′ (Abramowitz & Stegun,
        // table 9.5). Copper at 1 MHz: δ = 66 µm against a = 10 mm, a good conductor to 0.7 %;
        // the wall is 8.3 δ thick so that the field diffusing through it (about (2√2·δ/a)·e^{-t/δ}
        // of the applied field, from H. Kaden's axial thin-shell factor, 1959) stays near 1 % of
        // the decaying mode at the depths read (measured: a 4.5 δ wall reads x = 3.56).
        Medium copper = Medium.conductor("copper", Conductivity.ofMegasiemensPerMetre(58), 1);
        double a = 0.010;
        AxialFieldSolution s = Arrangement.of(Body.tube("tube", copper, mm(10), mm(0.55), mm(100))).inUniformAxialField()
                .sensing(SensorRegion.cylinder(mm(2), mm(20)).shiftedBy(mm(35))).at(MHz(1));
        double rate = decayRate(s, 0.050, a, 1.0, 2.0) * a;
        System.out.printf(Locale.ROOT, "tube decay, conductor: x = %.4f (J1 zero 3.8317)%n", rate);
        assertEquals(3.8317, rate, 0.01 * 3.8317);
    }
}
