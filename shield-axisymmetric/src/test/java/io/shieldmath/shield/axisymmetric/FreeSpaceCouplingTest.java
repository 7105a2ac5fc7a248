/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/**
 * The mesh against Maxwell's mutual inductance of coaxial circles, with no bodies. The check
 * value is computed here, independently of the library, from Neumann's line integral
 * reduced to one angle for coaxial circles, M = µ0·a·b·∫0^π cos φ / sqrt(a² + b² + z² − 2ab·cos φ) dφ
 * (F. E. Neumann 1845; its closed form in elliptic integrals is Maxwell's, Treatise art. 701;
 * F. W. Grover, Inductance Calculations, 1946, ch. 13), integrated by Commons Math's
 * Gauss–Legendre integrator to 1e-13 relative.
 */
class FreeSpaceCouplingTest {

    static double neumann(double a, double b, double z) {
        IterativeLegendreGaussIntegrator g = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-30);
        double v = g.integrate(100_000, phi -> Math.cos(phi) / Math.sqrt(a * a + b * b + z * z - 2 * a * b * Math.cos(phi)),
                0, Math.PI);
        return PhysicalConstants.MU_0 * a * b * v;
    }

    @Test
    void loopsMatchMaxwellWithinOnePartInAThousand() {
        // Loops of 15 mm and 10 mm radius, centre planes 25 mm apart, one turn each.
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 1), Coil.loop(mm(10), 1), mm(25));
        double exact = neumann(0.015, 0.010, 0.025);
        // The library's own Maxwell form (AGM) agrees with the independent integral.
        assertEquals(exact, pair.freeSpaceMutualInductance().toHenries(), 1e-12 * exact);
        CouplingSolution s = Arrangement.of().between(pair).withFineness(2).magnetostatic();
        double rel = s.freeSpaceMutualInductanceHenries() / exact - 1;
        // Measured: −6.4e-4 at fineness 2 (−2.0e-3 at the default fineness 1).
        assertTrue(Math.abs(rel) < 1e-3, "relative error " + rel);
        // With no bodies, the coupling with "bodies" equals the reference to rounding: 0 dB.
        assertEquals(0, s.shieldingEffectivenessDb(), 1e-9);
    }

    @Test
    void defaultMeshErrorIsOfTheOrderOfItsOwnEstimate() {
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 1), Coil.loop(mm(10), 1), mm(25));
        double exact = neumann(0.015, 0.010, 0.025);
        CouplingSolution s = Arrangement.of().between(pair).magnetostatic();
        double err = Math.abs(s.freeSpaceMutualInductanceHenries() / exact - 1);
        double est = s.mutualImpedanceRelativeEstimate();
        // At 0 Hz the impedance is 0 but its relative estimate is that of M itself.
        assertTrue(err < 4e-3, "error " + err);
        assertTrue(est > 0.3 * err && est < 3 * err, "estimate " + est + " against error " + err);
    }

    @Test
    void farBoundaryTruncationIsBelowOnePartInTenThousand() {
        // Truncation measured: the same mesh rules with the far box at 40 and at 80 half-extents.
        // A dipole's field falls as 1/R³, so the 40 → 80 change bounds the error at 40 within a factor 8/7.
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 1), Coil.loop(mm(15), 1), mm(30));
        double m40 = Arrangement.of().between(pair).magnetostatic().freeSpaceMutualInductanceHenries();
        double m80 = Arrangement.of().between(pair).withFarBoundaryAt(80).magnetostatic()
                .freeSpaceMutualInductanceHenries();
        double m20 = Arrangement.of().between(pair).withFarBoundaryAt(20).magnetostatic()
                .freeSpaceMutualInductanceHenries();
        double t40 = Math.abs(m80 / m40 - 1);
        double t20 = Math.abs(m80 / m20 - 1);
        assertTrue(t40 < 2e-4, "40 → 80 half-extents changes M by " + t40);
        // and the change shrinks with the box as expected (about 1/R³: a factor near 8 per doubling)
        assertTrue(t20 > 3 * t40, "20: " + t20 + ", 40: " + t40);
    }

    @Test
    void windingSectionMatchesMaxwellIntegratedOverTheSection() {
        // Transmitter: 100 turns on a 4 mm × 6 mm section about 15 mm; receiver a 10 mm loop; 30 mm apart.
        Coil tx = Coil.loop(mm(15), 100).withWinding(mm(4), mm(6), 4, 6);
        Coil rx = Coil.loop(mm(10), 1);
        CoilPair pair = CoilPair.coaxial(tx, rx, mm(30));
        // Reference: Neumann's integral averaged over the section by an 8 × 8 Gauss–Legendre rule
        // (uniform current density; nodes and weights from Abramowitz & Stegun table 25.4).
        double[] x = {-0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498,
            0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363};
        double[] w = {0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620,
            0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763};
        double m = 0;
        for (int i = 0; i < 8; i++) {
            for (int j = 0; j < 8; j++) {
                double r = 0.015 + 0.002 * x[i];
                double z = 0.030 - 0.003 * x[j];
                m += 0.25 * w[i] * w[j] * neumann(r, 0.010, z);
            }
        }
        m *= 100;
        double fe = Arrangement.of().between(pair).withFineness(2).magnetostatic().freeSpaceMutualInductanceHenries();
        assertEquals(m, fe, 1e-3 * m, "relative error " + (fe / m - 1));
    }
}
