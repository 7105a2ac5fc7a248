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
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Issue 18 item 2: apparent permeability of a sheet and its conversion to the intrinsic
 * value, and the exact skin depth for a lossy µ.
 */
class ApparentPermeabilityProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);
    private static final double MU0 = PhysicalConstants.MU_0;

    private static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    /**
     * The thin-sheet relation typed in independently of the library with Commons Math:
     * µ_app = µ·tanh(kt/2)/(kt/2), k = sqrt(jωµ0µσ) (the eddy-current apparent permeability of a lamination
     * in a uniform tangential field; R. M. Bozorth, Ferromagnetism, 1951, ch. 17, from memory).
     */
    private static Complex forward(Complex mu, double hz, double t, double sigma) {
        Complex u = Complex.I.multiply(2 * Math.PI * hz * MU0 * sigma).multiply(mu).sqrt().multiply(t / 2);
        return mu.multiply(u.tanh()).divide(u);
    }

    @Test
    void conversionInvertsTheThinSheetRelation() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double re = logUniform(r, 1, 1e5);
            double im = r.nextInt(4) == 0 ? 0 : re * logUniform(r, 1e-4, 3);
            Complex mu = new Complex(re, -im);
            double hz = logUniform(r, 1, 1e6);
            double sigma = logUniform(r, 1e5, 6e7);
            // The sheet is drawn by its |kt/2| from 1e-4 (thin) to 200 (two hundred skin depths).
            double x = logUniform(r, 1e-4, 200);
            double t = 2 * x / Math.sqrt(2 * Math.PI * hz * MU0 * sigma * mu.abs());
            Complex app = forward(mu, hz, t, sigma);
            ApparentPermeability m = ApparentPermeability.fromTable(new double[] {hz},
                    new double[] {app.getReal()}, new double[] {-app.getImaginary()}, Length.ofMetres(t),
                    Conductivity.ofSiemensPerMetre(sigma));
            String what = "seed " + seed + ": µ " + mu + ", f " + hz + ", t " + t + ", σ " + sigma + ", app " + app;
            assertEquals(re, m.real(hz), 1e-7 * mu.abs(), what);
            assertEquals(im, m.loss(hz), 1e-7 * mu.abs(), what);
            // and the library's forward relation agrees with the one typed in here
            RelativePermeability back = ApparentPermeability.apparent(RelativePermeability.ofComplex(re, im),
                    Frequency.ofHertz(hz), Length.ofMetres(t), Conductivity.ofSiemensPerMetre(sigma));
            assertEquals(app.getReal(), back.real(), 1e-9 * app.abs(), what);
            assertEquals(-app.getImaginary(), back.loss(), 1e-9 * app.abs(), what);
        });
    }

    @Test
    void limitsOfTheThinSheetRelation() {
        // Thin sheet, |kt/2| ≪ 1: µ_app ≈ µ(1 − (kt/2)²/3), so µ''_app = µ·ωµ0µσt²/12, the classical eddy-current
        // loss of a lamination (Bozorth 1951 ch. 17, from memory). 0.1 mm, µ 5000, σ 2 MS/m, 50 Hz:
        double w = 2 * Math.PI * 50;
        double t = 0.1e-3;
        RelativePermeability thin = ApparentPermeability.apparent(RelativePermeability.of(5000), Frequency.ofHertz(50),
                Length.ofMetres(t), Conductivity.ofSiemensPerMetre(2e6));
        double q = w * MU0 * 5000 * 2e6 * t * t / 12;
        assertEquals(5000 * q, thin.loss(), 5000 * q * 1e-3);
        assertEquals(5000, thin.real(), 5000 * 1e-4);
        // Thick sheet, |kt/2| ≫ 1: µ_app ≈ µ(1 − j)δ/t, δ = 1/sqrt(πfµ0µσ) (the same source; the field penetrates
        // one skin depth from each face); the next term is of order e^{−t/δ}. 1 mm, µ 5000, σ 2 MS/m, 10 kHz:
        // δ = 50.3 µm, e^{−t/δ} = 2e-9.
        double delta = 1 / Math.sqrt(Math.PI * 1e4 * MU0 * 5000 * 2e6);
        RelativePermeability thick = ApparentPermeability.apparent(RelativePermeability.of(5000),
                Frequency.ofKilohertz(10), Length.ofMillimetres(1), Conductivity.ofSiemensPerMetre(2e6));
        assertEquals(50.3e-6, delta, 0.05e-6);
        assertEquals(5000 * delta / 1e-3, thick.real(), 5000 * delta / 1e-3 * 1e-8);
        assertEquals(5000 * delta / 1e-3, thick.loss(), 5000 * delta / 1e-3 * 1e-8);
        // No conductivity or no frequency: apparent = intrinsic.
        ApparentPermeability none = ApparentPermeability.fromTable(new double[] {10, 100}, new double[] {300, 200},
                new double[] {5, 50}, Length.ofMillimetres(1), Conductivity.ofSiemensPerMetre(0));
        assertEquals(200, none.real(100), 0);
        assertEquals(50, none.loss(100), 0);
    }

    @Test
    void aRealApparentValueOfAThickSheetIsRefused() {
        // Thick sheet at 10 kHz (|kt/2| ≈ 6 for µ 1000): a passive sheet's apparent µ has µ'' ≈ µ' there, so
        // µ_app = 1000 − j0 has no passive intrinsic value. At 10 Hz (|kt/2|² ≈ 0.04) µ'' = 20 is possible: the
        // thin-sheet loss alone is µ'·|kt/2|²/3 ≈ 13.
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ApparentPermeability.fromTable(new double[] {10, 1e4}, new double[] {1000, 1000},
                        new double[] {20, 0}, Length.ofMillimetres(1), Conductivity.ofMegasiemensPerMetre(2)));
        assertTrue(e.getMessage().startsWith("apparent permeability table point [1] at 10 kHz"), e::getMessage);
        assertTrue(e.getMessage().contains("no passive intrinsic permeability"), e::getMessage);
    }

    @Test
    void valueSemantics() {
        // Demo data: the apparent values of an invented intrinsic µ (30000 − j100 at 10 Hz, 20000 − j2000 at 1 kHz)
        // for a 0.35 mm sheet of 1.7 MS/m, by the relation typed in above.
        Complex a10 = forward(new Complex(30000, -100), 10, 0.35e-3, 1.7e6);
        Complex a1k = forward(new Complex(20000, -2000), 1e3, 0.35e-3, 1.7e6);
        double[] hz = {10, 1e3};
        double[] re = {a10.getReal(), a1k.getReal()};
        double[] im = {-a10.getImaginary(), -a1k.getImaginary()};
        ApparentPermeability a = ApparentPermeability.fromTable(hz, re, im, Length.ofMillimetres(0.35),
                Conductivity.ofMegasiemensPerMetre(1.7));
        ApparentPermeability b = ApparentPermeability.fromTable(hz, re, im, Length.ofMillimetres(0.35),
                Conductivity.ofMegasiemensPerMetre(1.7));
        assertEquals(a, b);
        assertEquals(a.hashCode(), b.hashCode());
        assertEquals(Length.ofMillimetres(0.35), a.sheetThickness());
        assertEquals(re[1], a.apparentTable().real(1e3), 0);
        assertEquals(20000, a.real(1e3), 1e-6);        // the intrinsic µ, above the screened apparent one
        assertTrue(re[1] < 20000, a::toString);
        assertTrue(a.toString().endsWith("converted from the apparent µ of a 350 µm sheet"), a::toString);
    }

    @Test
    void exactSkinDepthOfALossyPermeability() {
        // δ = 1/Re sqrt(jωµ0µσ) (the good-conductor propagation constant, Ott 2009 ch. 6), typed in with Commons
        // Math; for a real µ it is the textbook δ = 1/sqrt(πfµ0µσ).
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double re = logUniform(r, 1, 1e5);
            double im = r.nextInt(4) == 0 ? 0 : Math.min(1e7, re * logUniform(r, 1e-4, 1e3));
            double hz = logUniform(r, 1e-3, 1e10);
            double sigma = logUniform(r, 1, 6e7);
            PermeabilityModel m = PermeabilityModel.constant(RelativePermeability.ofComplex(re, im));
            Complex gamma = Complex.I.multiply(2 * Math.PI * hz * MU0 * sigma).multiply(new Complex(re, -im)).sqrt();
            double exact = m.exactSkinDepth(Frequency.ofHertz(hz), Conductivity.ofSiemensPerMetre(sigma)).toMetres();
            assertEquals(1 / gamma.getReal(), exact, 1e-12 / gamma.getReal(), () -> "seed " + seed);
            double hand = m.skinDepth(Frequency.ofHertz(hz), Conductivity.ofSiemensPerMetre(sigma)).toMetres();
            assertTrue(exact <= hand * (1 + 1e-12) && exact >= hand / Math.sqrt(2) * (1 - 1e-12), () -> "seed " + seed);
            if (im == 0) {
                assertEquals(hand, exact, 1e-12 * hand);
            }
        });
    }
}
