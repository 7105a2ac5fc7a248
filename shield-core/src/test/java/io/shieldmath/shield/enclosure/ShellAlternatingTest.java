/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Bessel;
import io.shieldmath.shield.model.Sweep;
import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.m;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.quantity.RelativePermeability;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Shells in alternating fields: Kaden's thin-shell formulas, their limits, and an exact sphere. */
class ShellAlternatingTest {

    private static final Medium COPPER = Medium.conductor("annealed copper", iacs(100), 1);

    static Shell shell(ShellGeometry g, double a, Medium medium, double t) {
        switch (g) {
            case SPHERE:
                return Shell.sphere(m(a)).wall(medium, m(t));
            case CYLINDER_TRANSVERSE:
                return Shell.cylinderTransverse(m(a)).wall(medium, m(t));
            default:
                return Shell.cylinderAxial(m(a)).wall(medium, m(t));
        }
    }

    /**
     * The exact quasi-static spherical shell, written independently of the engine with Commons Math
     * Complex: in the wall f = C1·i1(kr) + C2·k1(kr) with the modified spherical Bessel functions
     * i1(x) = (x cosh x − sinh x)/x² and k1(x) = e^{−x}(1/x + 1/x²) (Abramowitz and Stegun 10.2.13 and
     * 10.2.15, up to constant factors), matched to f = r inside and f = αr + β/r² outside so that f and
     * (f + r f')/µr are continuous; S = α. For |kb| below about 700.
     */
    static Complex exactSphere(double a, double b, Complex mu, double sigma, double hz) {
        Complex k = new Complex(0, 2 * Math.PI * hz * PhysicalConstants.MU_0 * sigma).multiply(mu).sqrt();
        Complex xa = k.multiply(a);
        Complex xb = k.multiply(b);
        // at r = a: [i1, k1; (i1 + x i1'), (k1 + x k1')]/µ · (C1, C2) = (a, 2a)
        Complex i1a = i1(xa);
        Complex k1a = k1(xa);
        Complex di1a = xa.sinh().subtract(i1a).divide(mu);
        Complex dk1a = dk1(xa).divide(mu);
        Complex det = i1a.multiply(dk1a).subtract(k1a.multiply(di1a));
        Complex c1 = new Complex(a).multiply(dk1a).subtract(k1a.multiply(2 * a)).divide(det);
        Complex c2 = i1a.multiply(2 * a).subtract(di1a.multiply(a)).divide(det);
        Complex fb = c1.multiply(i1(xb)).add(c2.multiply(k1(xb)));
        Complex gb = c1.multiply(xb.sinh().subtract(i1(xb))).add(c2.multiply(dk1(xb))).divide(mu);
        return fb.add(gb).divide(3 * b);
    }

    static Complex i1(Complex x) {
        return x.multiply(x.cosh()).subtract(x.sinh()).divide(x.multiply(x));
    }

    static Complex k1(Complex x) {
        Complex inv = x.reciprocal();
        return x.negate().exp().multiply(inv.add(inv.multiply(inv)));
    }

    /** k1(x) + x·k1'(x) = −e^{−x}(1 + 1/x + 1/x²). */
    static Complex dk1(Complex x) {
        Complex inv = x.reciprocal();
        return x.negate().exp().multiply(Complex.ONE.add(inv).add(inv.multiply(inv))).negate();
    }

    @ParameterizedTest
    @CsvSource({
        // a (m), t (m), σ (S/m), µ', µ'', f (Hz): thin and thick walls, copper, steel, lossy nickel-iron
        "0.05,  0.002,  58e6, 1,     0,    1000",
        "0.05,  0.002,  58e6, 1,     0,    100000",
        "0.02,  0.01,   58e6, 1,     0,    10000",
        "0.1,   0.001,  7e6,  800,   0,    100",
        "0.03,  0.015,  7e6,  200,   0,    50",
        "0.01,  0.0005, 1.7e6, 12000, 9000, 200",
        "0.01,  0.01,   1e5,  3,     0.5,  1e6",
    })
    void sphereMatchesTheExactBesselSolution(double a, double t, double sigma, double mr, double mi, double hz) {
        Medium wall = Medium.conductor("wall", Conductivity.ofSiemensPerMetre(sigma),
                PermeabilityModel.constant(RelativePermeability.ofComplex(mr, mi)));
        ShellResult r = Shell.sphere(m(a)).wall(wall, m(t)).at(Hz(hz));
        Complex ref = exactSphere(a, a + t, new Complex(mr, -mi), sigma, hz);
        double refDb = 20 * Math.log10(ref.abs());
        // the engine's sublayer error is of order (0.001)² relative in ln S
        assertEquals(refDb, r.shieldingEffectivenessDb(), 1e-5 * Math.max(1, refDb));
        assertEquals(ref.getArgument(), r.phase(), 1e-5 * Math.max(1, Math.abs(Math.log(ref.abs()))));
    }

    @ParameterizedTest
    @CsvSource({"SPHERE", "CYLINDER_TRANSVERSE", "CYLINDER_AXIAL"})
    void kadenTendsToTheStaticThinShellFactorAsKGoesToZero(ShellGeometry g) {
        Medium alloy = Medium.conductor("nickel-iron", Conductivity.ofMegasiemensPerMetre(1.7), 25_000);
        Shell s = shell(g, 0.08, alloy, 0.001);
        ShellResult r = s.at(Frequency.ofHertz(1e-6));
        double expected = s.staticShielding().thinShellFactor(0);
        assertEquals(expected, r.thinShellFactor(0).abs(), 1e-9 * expected);
        assertEquals(0, r.thinShellFactor(0).arg(), 1e-6);
        // and the engine tends to the exact static factor
        assertEquals(s.staticShielding().factor(), r.complexShieldingFactor().abs(), 1e-9 * expected);
    }

    @ParameterizedTest
    @CsvSource({
        // geometry, divisor of τ = µ0σRt/n (Kaden 1959, from memory), ωτ
        "SPHERE, 3, 0.5", "SPHERE, 3, 2", "SPHERE, 3, 6",
        "CYLINDER_TRANSVERSE, 2, 0.5", "CYLINDER_TRANSVERSE, 2, 2", "CYLINDER_TRANSVERSE, 2, 6",
        "CYLINDER_AXIAL, 2, 0.5", "CYLINDER_AXIAL, 2, 2", "CYLINDER_AXIAL, 2, 6",
    })
    void nonMagneticThinShellFollowsItsEddyCurrentTimeConstant(ShellGeometry g, double n, double wt) {
        double a = 0.1;
        double t = 1e-4;
        double r = a + t / 2;
        double tau = PhysicalConstants.MU_0 * 58e6 * r * t / n;
        double hz = wt / tau / (2 * Math.PI);
        ShellResult res = shell(g, a, COPPER, t).at(Hz(hz));
        double expected = Math.sqrt(1 + wt * wt);
        // valid while t ≪ δ and t ≪ R: the neglected terms are of order t/R and (t/δ)²·(t/R)
        assertEquals(expected, res.thinShellFactor(0).abs(), 0.01 * expected);
        assertEquals(expected, res.complexShieldingFactor().abs(), 0.01 * expected);
    }

    @ParameterizedTest
    @CsvSource({
        "SPHERE, 58e6, 1, 1000", "SPHERE, 7e6, 500, 60", "SPHERE, 1.7e6, 30000, 1000", "SPHERE, 58e6, 1, 1e6",
        "CYLINDER_TRANSVERSE, 58e6, 1, 1000", "CYLINDER_TRANSVERSE, 1.7e6, 30000, 300",
        "CYLINDER_AXIAL, 58e6, 1, 1000", "CYLINDER_AXIAL, 1.7e6, 30000, 300", "CYLINDER_AXIAL, 58e6, 1, 1e6",
    })
    void thinWallAgreesWithKaden(ShellGeometry g, double sigma, double mu, double hz) {
        // For t/R = 1e-3 the thin-shell formula and the exact matching differ by terms of order t/R.
        Medium wall = Medium.conductor("wall", Conductivity.ofSiemensPerMetre(sigma), mu);
        ShellResult r = shell(g, 0.1, wall, 1e-4).at(Hz(hz));
        assertEquals(r.thinShellDb(0), r.shieldingEffectivenessDb(), 0.02 + 1e-3 * Math.abs(r.shieldingEffectivenessDb()), r::toString);
    }

    @Test
    void permeabilityIsTakenFromTheModelAtEachFrequency() {
        PermeabilityModel relax = PermeabilityModel.relaxation(40_000, Hz(500));
        Medium alloy = Medium.conductor("nickel-iron", Conductivity.ofMegasiemensPerMetre(1.7), relax);
        for (double hz : new double[] {10, 500, 20_000}) {
            Medium frozen = alloy.withPermeability(PermeabilityModel.constant(relax.at(Hz(hz))));
            double modelDb = Shell.sphere(m(0.05)).wall(alloy, m(0.001)).at(Hz(hz)).shieldingEffectivenessDb();
            double frozenDb = Shell.sphere(m(0.05)).wall(frozen, m(0.001)).at(Hz(hz)).shieldingEffectivenessDb();
            assertEquals(frozenDb, modelDb, 1e-12 * Math.abs(frozenDb));
        }
        // a model that keeps the low-frequency µr overstates the shell at 20 kHz (common practice, no source)
        Medium fixed = alloy.withPermeability(PermeabilityModel.constant(40_000));
        assertTrue(Shell.sphere(m(0.05)).wall(fixed, m(0.001)).at(Hz(20_000)).shieldingEffectivenessDb()
                > Shell.sphere(m(0.05)).wall(alloy, m(0.001)).at(Hz(20_000)).shieldingEffectivenessDb() + 3);
        // static fields use µ'(0)
        Shell s = Shell.sphere(m(0.05)).wall(alloy, m(0.001));
        assertEquals(ShellStaticTest.jacksonSphere(40_000, 0.05, 0.051), s.staticShielding().factor(), 1e-6);
    }

    @Test
    void thickCopperStaysFiniteAndPrimitivePathAgrees() {
        Shell s = Shell.sphere(m(0.5)).wall(COPPER, m(0.01));
        ShellResult r = s.at(Frequency.ofMegahertz(10));
        // absorption alone is 8.686·t/δ ≈ 4200 dB (δ = 20.9 µm)
        assertTrue(r.shieldingEffectivenessDb() > 4000 && Double.isFinite(r.shieldingEffectivenessDb()), r::toString);
        assertEquals(r.shieldingEffectivenessDb(), s.shieldingEffectivenessDb(1e7), 0);
        assertEquals(r.thinShellDb(0), r.shieldingEffectivenessDb(), 1e-3 * r.shieldingEffectivenessDb());
        assertFalse(r.isQuasiStatic());
        assertFalse(r.warnings().isEmpty());
        Sweep<ShellResult> sw = s.sweep(FrequencyBand.of(Hz(10), Hz(1e4)), 7);
        assertEquals(7, sw.size());
        assertEquals(sw.results().get(0), sw.lowestSampled());
    }
}
