/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Issue 18 item 1: the shielding effectiveness of a conductor plate many skin depths thick
 * never falls with frequency in a plane wave, whatever its relaxation permeability.
 */
class ThickPlateProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    private static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    @Test
    void thickPlateSeNeverFallsWithFrequency() {
        // For t ≫ δ, SE = A + R with A = 8.686·Re(γ)·t and R ≈ 20·log10(|K|/4), K = η0/η (Ott 2009 ch. 6).
        // Re(γ) grows with f for µ = 1 + χ/(1 + j f/fc): ωµ = ω + χ·ω/(1 + j f/fc), and Re sqrt(j·ωµ) rises with
        // ω; R falls by at most 10·log10 per decade of f·|µ|, which A (at least 20 dB here, its logarithmic
        // slope at least A/4) outruns once the plate is thick. The earlier form µdc/(1 + j f/fc) froze A above
        // fc·sqrt(µdc) and failed this for steel (issue 18).
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double sigma = logUniform(r, 1e5, 6e7);
            PermeabilityModel mu = r.nextInt(4) == 0 ? PermeabilityModel.constant(logUniform(r, 1, 1e5))
                    : PermeabilityModel.relaxation(logUniform(r, 1, 1e5), Frequency.ofHertz(logUniform(r, 1, 1e7)));
            Medium m = Medium.conductor("random", Conductivity.ofSiemensPerMetre(sigma), mu);
            double f1 = logUniform(r, 1e3, 1e10);
            double f2 = f1 * logUniform(r, 1 + 1e-6, 100);
            // at least 20 dB of absorption at f1: t ≥ 20/8.686 exact skin depths
            double delta = m.exactSkinDepth(Frequency.ofHertz(f1)).toMetres();
            double t = delta * logUniform(r, 20 / 8.686, 200);
            PlanarEvaluation e = Barrier.of(m, Length.ofMetres(t)).facing(IncidentField.planeWave());
            double se1 = e.shieldingEffectivenessDb(f1);
            double se2 = e.shieldingEffectivenessDb(f2);
            assertTrue(se2 >= se1 - 1e-9 * se1, () -> "seed " + seed + ": " + m + ", t " + t + " m: " + se1
                    + " dB at " + f1 + " Hz, " + se2 + " dB at " + f2 + " Hz");
            // The absorption never falls below that of the same plate with µr = 1, 8.686·t·sqrt(πfµ0σ)
            // (Ott 2009 ch. 6): with µ' ≥ 1 and µ'' ≥ 0, Re sqrt(j(µ' − jµ'')) ≥ Re sqrt(j). The earlier form
            // fell far below it above fc·sqrt(µdc). Tolerance 1e-3: the displacement current, left out of the
            // floor, lowers Re(γ) by up to about ωε0/σ, below 6e-4 here (f ≤ 1e12 Hz, σ ≥ 1e5 S/m).
            double floor = 8.686 * t * Math.sqrt(Math.PI * f2 * io.shieldmath.shield.quantity.PhysicalConstants.MU_0
                    * sigma);
            double a2 = e.at(Frequency.ofHertz(f2)).absorptionDb();
            assertTrue(a2 >= floor * (1 - 1e-3), () -> "seed " + seed + ": " + m + ", A " + a2 + " dB < " + floor);
        });
    }
}
