/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.Random;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/**
 * The magnetization curve: it passes through its points, keeps dH/dB positive (monotone,
 * Fritsch &amp; Carlson 1980; Fritsch &amp; Butland 1984) and its energy convex, its energy is
 * the integral of H (checked with Commons Math's Gauss–Legendre integrator as an
 * independent quadrature), it converges to a smooth analytic curve as points are added,
 * and bad tables are refused with the point named.
 */
class MagnetizationCurveTest {

    private static final double MU0 = PhysicalConstants.MU_0;
    private static final MagneticFluxDensity BS = MagneticFluxDensity.ofTesla(1.5);

    /** Random strictly monotone tables with every segment steeper than µ0 (the curve's contract). */
    private static MagnetizationCurve random(long seed, int points) {
        Random rnd = new Random(seed);
        double[] h = new double[points];
        double[] b = new double[points];
        double hh = 0;
        double bb = 0;
        for (int i = 0; i < points; i++) {
            double dh = Math.pow(10, -1 + 4 * rnd.nextDouble());
            double mur = Math.pow(10, 6 * rnd.nextDouble());
            hh += dh;
            bb += Math.max(1.001 * MU0 * dh, Math.min(mur * MU0 * dh, 0.15));
            h[i] = hh;
            b[i] = bb;
        }
        return MagnetizationCurve.of(h, b, BS);
    }

    @Test
    void passesThroughItsPointsAndTheOrigin() {
        double[] h = {10, 30, 100, 1000, 10_000};
        double[] b = {0.1, 0.5, 1.1, 1.4, 1.5};
        MagnetizationCurve c = MagnetizationCurve.of(h, b, BS);
        assertEquals(0, c.fieldStrength(0), 0);
        for (int i = 0; i < h.length; i++) {
            assertEquals(h[i], c.fieldStrength(b[i]), 1e-9 * h[i]);
            assertEquals(b[i], c.fluxDensityAt(MagneticFieldStrength.ofAmperesPerMetre(h[i])).toTesla(), 1e-9);
        }
        // Initial permeability: the first secant, B1/(µ0·H1).
        assertEquals(0.1 / (MU0 * 10), c.initialPermeability(), 1e-9);
        assertEquals(c.initialPermeability(), 1 / (MU0 * c.reluctivity(0)), 1e-6);
        // Beyond the last point: fully saturated, slope µ0.
        assertEquals(10_000 + 0.1 / MU0, c.fieldStrength(1.6), 1e-6);
    }

    @Test
    void slopeIsPositiveAndEnergyConvexOnRandomTables() {
        qt().withExamples(300).forAll(longs().all(), integers().between(1, 30)).checkAssert((seed, n) -> {
            MagnetizationCurve c = random(seed, n);
            double top = 1.2 * c.pointTesla(n - 1);
            double prevH = -1;
            for (int k = 0; k <= 2000; k++) {
                double x = top * k / 2000.0;
                double s = c.slope(x);
                assertTrue(s > 0 && Double.isFinite(s), "dH/dB at " + x + " T is " + s);
                double hx = c.fieldStrength(x);
                assertTrue(hx >= prevH, "H must not fall: " + hx + " after " + prevH);
                prevH = hx;
                assertTrue(c.reluctivity(x) > 0);
            }
        });
    }

    @Test
    void energyIsTheIntegralOfHByAnIndependentQuadrature() {
        qt().withExamples(50).forAll(longs().all(), integers().between(1, 12)).checkAssert((seed, n) -> {
            MagnetizationCurve c = random(seed, n);
            double top = 1.1 * c.pointTesla(n - 1);
            IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(5, 1e-11, 1e-13);
            // Integrate knot by knot (the integrand is smooth on each piece), in the offset u from
            // the piece's start: a piece can be a millionth of its start value wide, and nodes
            // placed at start + u keep full precision where nodes in [start, end] would not (the
            // integrator then never met its 1e-13 absolute tolerance and failed about once in 400
            // random curves).
            double sum = 0;
            double lo = 0;
            for (int k = 0; k <= n; k++) {
                double hi = k < n ? c.pointTesla(k) : top;
                double start = lo;
                sum += quad.integrate(100_000, u -> c.fieldStrength(start + u), 0, hi - lo);
                lo = hi;
            }
            assertEquals(sum, c.energyDensity(top), 1e-8 * sum);
            // dw/dB = H (central difference).
            double x = 0.7 * top;
            double e = 1e-6 * top;
            assertEquals(c.fieldStrength(x), (c.energyDensity(x + e) - c.energyDensity(x - e)) / (2 * e),
                    1e-4 * c.fieldStrength(x) + 1e-9);
        });
    }

    @Test
    void convergesToASmoothCurveAsPointsAreAdded() {
        // A smooth saturating curve B(H) = Bs·tanh(H/H0) + µ0·H (invented for the check);
        // the interpolant's largest error in H must fall as the table gets denser.
        double bs = 1.2;
        double h0 = 50;
        double prev = Double.POSITIVE_INFINITY;
        for (int n : new int[] {8, 16, 32, 64}) {
            double[] h = new double[n];
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                h[i] = h0 * 6.0 * (i + 1) / n;
                b[i] = bs * Math.tanh(h[i] / h0) + MU0 * h[i];
            }
            MagnetizationCurve c = MagnetizationCurve.of(h, b, MagneticFluxDensity.ofTesla(bs));
            double err = 0;
            for (int k = 1; k < 400; k++) {
                double hx = h[n - 1] * k / 400.0;
                double bx = bs * Math.tanh(hx / h0) + MU0 * hx;
                err = Math.max(err, Math.abs(c.fieldStrength(bx) - hx) / h[n - 1]);
            }
            assertTrue(err < prev / 2, n + " points: error " + err + " after " + prev);
            prev = err;
        }
        // The last piece ends on the saturated line's slope 1/µ0 by design, while this table stops
        // before full saturation; that end slope, not the interior, sets the remaining error.
        assertTrue(prev < 2e-3, "64 points: " + prev);
    }

    @Test
    void badTablesAreRefusedWithThePointNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MagnetizationCurve.of(new double[] {10, 5}, new double[] {0.1, 0.2}, BS));
        assertTrue(e.getMessage().contains("[1]"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> MagnetizationCurve.of(new double[] {10, 1e6}, new double[] {0.1, 0.2}, BS));
        assertTrue(e.getMessage().contains("less than µ0"), e.getMessage());
        assertThrows(InvalidQuantityException.class,
                () -> MagnetizationCurve.of(new double[] {Double.NaN}, new double[] {0.1}, BS));
        assertThrows(InvalidQuantityException.class,
                () -> MagnetizationCurve.of(new double[] {1}, new double[] {0.1}, MagneticFluxDensity.ofTesla(9)));
        assertThrows(IllegalArgumentException.class,
                () -> MagnetizationCurve.of(new double[] {1, 2}, new double[] {0.1}, BS));
        assertThrows(InvalidQuantityException.class, () -> MagnetizationCurve.of(new double[] {1}, new double[] {0.1}, BS)
                .fieldStrengthAt(MagneticFluxDensity.ofTesla(-1)));
    }
}
