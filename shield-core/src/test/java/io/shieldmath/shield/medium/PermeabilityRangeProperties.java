/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.RelativePermittivity;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Issue 15 items 11 and 12: every permeability model accepted at construction, anywhere in
 * its documented range, gives finite µ' &gt; 0 and µ'' ≥ 0 at every frequency from 0 Hz to
 * 10 THz and beyond, so the evaluation that asks for it never meets a NaN or a zero; values
 * outside the ranges are refused where the model is made.
 */
class PermeabilityRangeProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    /** A model drawn from the whole accepted range, ends included. */
    static PermeabilityModel anyModel(Random r) {
        switch (r.nextInt(3)) {
            case 0: {
                double re = r.nextInt(5) == 0 ? RelativePermeability.MAX : logUniform(r, RelativePermeability.MIN, RelativePermeability.MAX);
                double im = r.nextInt(3) == 0 ? 0 : logUniform(r, 1e-300, RelativePermeability.MAX);
                return PermeabilityModel.constant(RelativePermeability.ofComplex(re, im));
            }
            case 1: {
                double mu = r.nextInt(5) == 0 ? RelaxationPermeability.MAX_LOW_FREQUENCY
                        : logUniform(r, 1, RelaxationPermeability.MAX_LOW_FREQUENCY);
                double fc = r.nextInt(5) == 0 ? RelaxationPermeability.MIN_CORNER_HERTZ
                        : logUniform(r, RelaxationPermeability.MIN_CORNER_HERTZ, RelaxationPermeability.MAX_CORNER_HERTZ);
                return PermeabilityModel.relaxation(mu, Frequency.ofHertz(fc));
            }
            default: {
                int n = 1 + r.nextInt(6);
                double[] hz = new double[n];
                double[] re = new double[n];
                double[] im = new double[n];
                double f = logUniform(r, 1e-6, 1e3);
                for (int i = 0; i < n; i++) {
                    hz[i] = f;
                    f *= 1 + logUniform(r, 1e-12, 1e3);
                    re[i] = logUniform(r, RelativePermeability.MIN, RelativePermeability.MAX);
                    im[i] = r.nextBoolean() ? 0 : logUniform(r, 1e-300, RelativePermeability.MAX);
                }
                return PermeabilityModel.table(hz, re, im);
            }
        }
    }

    @Test
    void relaxationNeverGoesBelowFreeSpace() {
        // Issue 18 item 1: a relaxation of the susceptibility, µ = 1 + (µdc − 1)/(1 + j f/fc), has
        // 1 ≤ µ' ≤ µdc and µ'' ≥ 0 at every frequency, µ' falls monotonically with frequency, and
        // |µ − 1| = (µdc − 1)/sqrt(1 + x²) (algebra of the first-order relaxation, Bozorth 1951 ch. 17,
        // from memory). The earlier form µdc/(1 + j f/fc) failed the first check above fc·sqrt(µdc).
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double mu = logUniform(r, 1, RelaxationPermeability.MAX_LOW_FREQUENCY);
            double fc = logUniform(r, RelaxationPermeability.MIN_CORNER_HERTZ, RelaxationPermeability.MAX_CORNER_HERTZ);
            PermeabilityModel m = PermeabilityModel.relaxation(mu, Frequency.ofHertz(fc));
            double f1 = logUniform(r, 1e-6, 1e13);
            double f2 = f1 * (1 + logUniform(r, 1e-9, 1e6));
            for (double f : new double[] {0, f1, f2, 1e13}) {
                assertTrue(m.real(f) >= 1 && m.real(f) <= mu, () -> "seed " + seed + ": " + m + " at " + f + " Hz");
                assertTrue(m.loss(f) >= 0, () -> "seed " + seed);
            }
            assertTrue(m.real(f2) <= m.real(f1), () -> "seed " + seed + ": " + m + " rises from " + f1 + " to " + f2);
            double x = f1 / fc;
            double chi = Math.hypot(m.real(f1) - 1, m.loss(f1));
            assertEquals((mu - 1) / Math.sqrt(1 + x * x), chi, 1e-12 * Math.max(1, mu), () -> "seed " + seed);
        });
    }

    @Test
    void everyAcceptedModelIsFiniteAndInRangeAtEveryFrequency() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            PermeabilityModel m = anyModel(r);
            double[] hz = {0, Double.MIN_VALUE, 1e-6, logUniform(r, 1e-6, 1e13), 1e13, 1e30, Double.MAX_VALUE};
            for (double f : hz) {
                double re = m.real(f);
                double im = m.loss(f);
                assertTrue(Double.isFinite(re) && re > 0, () -> m + " at " + f + " Hz: µ' = " + re);
                assertTrue(Double.isFinite(im) && im >= 0, () -> m + " at " + f + " Hz: µ'' = " + im);
                assertTrue(re <= RelativePermeability.MAX && im <= RelativePermeability.MAX, m::toString);
            }
            Frequency f = Frequency.ofHertz(logUniform(r, 1e-6, 1e13));
            RelativePermeability at = m.at(f);
            assertTrue(at.magnitude() > 0 && Double.isFinite(at.magnitude()), m::toString);
            // A medium of it has a finite skin depth at any conductivity in range.
            Medium med = Medium.of("m", Conductivity.ofSiemensPerMetre(logUniform(r, 1e-2, 1e9)), m,
                    RelativePermittivity.of(logUniform(r, 1, RelativePermittivity.MAX)));
            assertTrue(Double.isFinite(med.skinDepth(f).toMetres()), med::toString);
            assertTrue(med.toString().length() < 200, med::toString);
        });
    }

    @Test
    void theReviewsExamplesAreRefusedWhereTheModelIsMade() {
        // Issue 15 item 12: relaxation(1000, 1e-300 Hz) gave µ' = 0 and µ'' = NaN.
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.relaxation(1000, Frequency.ofHertz(1e-300)));
        assertEquals("relaxation corner frequency: 1e-300 Hz is out of range; allowed: from 1e-6 Hz to 1e13 Hz",
                e.getMessage());
        assertThrows(InvalidQuantityException.class, () -> PermeabilityModel.relaxation(1000, Frequency.ofHertz(2e13)));
        // Item 11: a constant µr of 1e150, a table point with µ' = 1e300 (any point, not only the first).
        assertThrows(InvalidQuantityException.class, () -> PermeabilityModel.constant(1e150));
        assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.of(1e200));
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.table(new double[] {1, 10}, new double[] {5, 1e300}, new double[] {0, 0}));
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.table(new double[] {1, 10}, new double[] {5, 5}, new double[] {0, 1e300}));
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.table(new double[] {1, 10}, new double[] {5, 5}, new double[] {0, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> PermeabilityModel.table(new double[100_001],
                new double[100_001], new double[100_001]));
        // The ends of the ranges are accepted and evaluate far above the corner: µ' = 1 + χ/(1 + x²) with
        // χ = 1e7 − 1 and x = 1e13/1e-6 = 1e19 is 1 + 1e-31, so 1 (first-order relaxation of the
        // susceptibility, Bozorth 1951 ch. 17, from memory), and µ'' = χ/x ≈ 1e-12, not 0.
        PermeabilityModel low = PermeabilityModel.relaxation(1e7, Frequency.ofHertz(1e-6));
        assertEquals(1, low.real(1e13), 0);
        assertEquals((1e7 - 1) * 1e-19, low.loss(1e13), 1e-26);
        assertEquals(1e7, low.real(0), 0);
        assertEquals(0, low.loss(0), 0);
    }
}
