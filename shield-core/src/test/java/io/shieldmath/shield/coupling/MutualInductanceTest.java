/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.Elliptic;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/** Free-space mutual inductance: Maxwell's closed form, its limits and the spectral integral. */
class MutualInductanceTest {

    private static final double MU0 = PhysicalConstants.MU_0;

    /** Neumann's formula for coaxial circles, M = µ0·a·b·∫0^π cos φ dφ / sqrt(a² + b² + z² − 2ab·cos φ). */
    static double neumann(double a, double b, double z) {
        IterativeLegendreGaussIntegrator g = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-30, 2, 64);
        return MU0 * a * b * g.integrate(10_000_000,
                p -> Math.cos(p) / Math.sqrt(a * a + b * b + z * z - 2 * a * b * Math.cos(p)), 0, Math.PI);
    }

    @Test
    void maxwellClosedFormMatchesNeumannIntegral() {
        // Independent check: Neumann's double line integral (F. E. Neumann 1845; Grover 1946, ch. 1)
        // reduced to one angle and integrated with Commons Math.
        double[][] cases = {{0.02, 0.02, 0.03}, {0.1, 0.05, 0.01}, {1, 1, 0.1}, {0.001, 0.003, 0.01}, {0.5, 0.5, 5}};
        for (double[] c : cases) {
            double ref = neumann(c[0], c[1], c[2]);
            assertEquals(ref, Elliptic.maxwell(c[0], c[1], c[2]), 1e-11 * ref);
        }
    }

    @Test
    void maxwellClosedFormLimits() {
        // Far apart: two coaxial magnetic dipoles, M = µ0·π·a²·b²/(2z³)·(1 + O((a/z)²)).
        double a = 0.01;
        double b = 0.02;
        double z = 10;
        double dipole = MU0 * Math.PI * a * a * b * b / (2 * z * z * z);
        assertEquals(dipole, Elliptic.maxwell(a, b, z), 1e-4 * dipole);
        // Close, equal circles: M ≈ µ0·a·(ln(8a/z) − 2) (Maxwell's formula for neighbouring circles,
        // Grover 1946; from memory), error of order (z/a)²·ln(a/z).
        double r = 1;
        double gap = 1e-3;
        double near = MU0 * r * (Math.log(8 * r / gap) - 2);
        assertEquals(near, Elliptic.maxwell(r, r, gap), 1e-5 * near);
    }

    @Test
    void spectralIntegralEqualsMaxwellToOnePartInABillion() {
        // The quadrature rule alone (F = 1) against the closed form, radii 1 mm to 1 m,
        // spacings 0.1 to 10 radii, equal and unequal loops.
        for (double a : new double[] {1e-3, 0.013, 0.2, 1}) {
            for (double ratio : new double[] {1, 0.35, 2.7}) {
                double b = Math.min(1, a * ratio);
                for (double spacing : new double[] {0.1, 0.23, 0.5, 1, 2.2, 5, 10}) {
                    double z = spacing * Math.max(a, b);
                    CoilPair p = CoilPair.coaxial(Coil.loop(Length.ofMetres(a), 3), Coil.loop(Length.ofMetres(b), 7),
                            Length.ofMetres(z));
                    double exact = 21 * Elliptic.maxwell(a, b, z);
                    assertEquals(exact, p.freeSpaceMutualInductance().toHenries(), 1e-14 * exact);
                    assertEquals(exact, p.rule().freeSpace, 1e-9 * exact,
                            "a " + a + ", b " + b + ", z " + z);
                    assertEquals(exact, p.rule().freeSpaceCoarse, 1e-9 * exact,
                            "single first panel: a " + a + ", b " + b + ", z " + z);
                }
            }
        }
    }

    @Test
    void windingsAreSumsOfRings() {
        // A 2×3-ring winding: the pair's closed form is the sum of Maxwell over all ring pairs, and the
        // spectral rule reproduces it (the rings' planes differ, so the separable kernel is exercised).
        Coil tx = Coil.loop(Length.ofMillimetres(20), 60).withWinding(Length.ofMillimetres(4),
                Length.ofMillimetres(6), 2, 3);
        Coil rx = Coil.loop(Length.ofMillimetres(12), 10);
        CoilPair p = CoilPair.coaxial(tx, rx, Length.ofMillimetres(25));
        double sum = 0;
        for (double ra : new double[] {0.019, 0.021}) {
            for (double za : new double[] {-0.002, 0, 0.002}) {
                sum += 10 * 10 * Elliptic.maxwell(ra, 0.012, 0.025 - za);
            }
        }
        assertEquals(sum, p.freeSpaceMutualInductance().toHenries(), 1e-13 * sum);
        assertEquals(sum, p.rule().freeSpace, 1e-9 * sum);
        // Nearest transmitter ring plane at +2 mm, receiver plane at 25 mm.
        assertEquals(0.023, p.gap().toMetres(), 1e-15);
    }
}
