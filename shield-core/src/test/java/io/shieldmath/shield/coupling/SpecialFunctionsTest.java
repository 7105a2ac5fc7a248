/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.GaussLegendre;
import io.shieldmath.shield.internal.Elliptic;
import io.shieldmath.shield.internal.Bessel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.special.BesselJ;
import org.apache.commons.math3.special.Gamma;
import org.junit.jupiter.api.Test;

/** The own special functions against independent implementations and closed forms. */
class SpecialFunctionsTest {

    @Test
    void besselJ1MatchesCommonsMathAcrossAllRanges() {
        // Reference: Commons Math BesselJ (a port of the Netlib RJBESL routine).
        double worst = 0;
        for (double x = 0; x < 2000; x += x < 30 ? 0.00731 : 0.731) {
            double ref = BesselJ.value(1, x);
            double err = Math.abs(Bessel.j1(x) - ref);
            // Absolute error against the envelope sqrt(2/(πx)) (relative near the zeros is meaningless).
            double scale = Math.min(0.6, Math.sqrt(2 / (Math.PI * Math.max(x, 1e-300))));
            worst = Math.max(worst, err / Math.max(scale, Math.abs(ref)));
        }
        assertTrue(worst < 1e-13, "worst scaled error " + worst);
    }

    @Test
    void besselJ1SmallArgumentsAreRelativelyExact() {
        // J1(x) = x/2 − x³/16 + … (DLMF 10.2.2), so J1(x)/(x/2) → 1.
        for (double x = 1e-12; x < 1e-3; x *= 3.7) {
            assertEquals(1 - x * x / 8, Bessel.j1(x) / (0.5 * x), 1e-15);
        }
        assertEquals(0, Bessel.j1(0));
    }

    @Test
    void ellipticIntegralsMatchTheirDefiningIntegrals() {
        // K(k) = ∫0^{π/2} dθ/sqrt(1 − k² sin²θ), E(k) = ∫0^{π/2} sqrt(1 − k² sin²θ) dθ (DLMF 19.2.8),
        // integrated independently with Commons Math.
        IterativeLegendreGaussIntegrator g = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-16, 2, 64);
        for (double k : new double[] {0, 1e-6, 0.01, 0.2, 0.5, 0.7, 0.9, 0.99, 0.999}) {
            double k2 = k * k;
            double kRef = g.integrate(1_000_000, th -> 1 / Math.sqrt(1 - k2 * Math.sin(th) * Math.sin(th)), 0,
                    Math.PI / 2);
            double eRef = g.integrate(1_000_000, th -> Math.sqrt(1 - k2 * Math.sin(th) * Math.sin(th)), 0,
                    Math.PI / 2);
            assertEquals(kRef, Elliptic.firstKind(k), 1e-13 * kRef, "K(" + k + ")");
            assertEquals(eRef, Elliptic.secondKind(k), 1e-13 * eRef, "E(" + k + ")");
        }
    }

    @Test
    void ellipticIntegralsAtTheLemniscaticModulus() {
        // K(1/√2) = Γ(1/4)²/(4·sqrt(π)) (DLMF 19.6.2 with the lemniscate constant), and
        // Legendre's relation E·K' + E'·K − K·K' = π/2 (DLMF 19.7.1) with k = k' gives
        // E(1/√2) = (π/2 + K²)/(2K). Γ from Commons Math.
        double k = Math.sqrt(0.5);
        double kExact = Math.pow(Math.exp(Gamma.logGamma(0.25)), 2) / (4 * Math.sqrt(Math.PI));
        assertEquals(kExact, Elliptic.firstKind(k), 1e-14 * kExact);
        double eExact = (Math.PI / 2 + kExact * kExact) / (2 * kExact);
        assertEquals(eExact, Elliptic.secondKind(k), 1e-14 * eExact);
        // From memory (tabulated in Abramowitz and Stegun, table 17.1): K(1/√2) = 1.854074677301372.
        assertEquals(1.854074677301372, Elliptic.firstKind(k), 1e-14);
    }

    @Test
    void gaussLegendreIntegratesPolynomialsExactly() {
        // An n-point Gauss–Legendre rule is exact for degree 2n − 1 (A&S 25.4.29).
        for (int n : new int[] {8, 12}) {
            GaussLegendre r = new GaussLegendre(n);
            for (int deg = 0; deg <= 2 * n - 1; deg++) {
                double s = 0;
                for (int i = 0; i < n; i++) {
                    s += r.w[i] * Math.pow(r.x[i], deg);
                }
                double exact = deg % 2 == 1 ? 0 : 2.0 / (deg + 1);
                assertEquals(exact, s, 1e-14, "n " + n + " degree " + deg);
            }
        }
    }
}
