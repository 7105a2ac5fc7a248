/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.Bessel;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The fixed spectral rule against an independent adaptive integration of the same integral
 * (Commons Math IterativeLegendreGaussIntegrator, Commons Math Bessel functions and Complex
 * chain matrices, see {@link ReferenceCoupling}), on a spread of cases across the claimed
 * range: 1 Hz to 10 MHz, radii 1 mm to 1 m, spacings 0.1 to 10 radii, stacks of microns to
 * centimetres, high-permeability and relaxing layers, stacks of several layers.
 */
class QuadratureAccuracyTest {

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    static Medium randomMedium(Random r) {
        double sigma = r.nextInt(5) == 0 ? 0 : logUniform(r, 1e5, 6e7);
        switch (r.nextInt(3)) {
            case 0:
                return Medium.conductor("non-magnetic", Conductivity.ofSiemensPerMetre(sigma), 1);
            case 1:
                return Medium.conductor("magnetic", Conductivity.ofSiemensPerMetre(sigma), logUniform(r, 1, 1e5));
            default:
                return Medium.conductor("relaxing", Conductivity.ofSiemensPerMetre(sigma),
                        PermeabilityModel.relaxation(logUniform(r, 100, 1e5), Frequency.ofHertz(logUniform(r, 10, 1e5))));
        }
    }

    /** Nepers of absorption at λ = 0, to keep the unscaled reference in range. */
    static double nepers(Barrier b, double hz) {
        double n = 0;
        for (Layer l : b.layers()) {
            double mu = Math.hypot(l.medium().permeability().real(hz), l.medium().permeability().loss(hz));
            double s = l.medium().conductivity().toSiemensPerMetre();
            n += l.thickness().toMetres() * Math.sqrt(Math.PI * hz * 4e-7 * Math.PI * mu * s);
        }
        return n;
    }

    @Test
    void ruleAgreesWithAdaptiveIntegrationToOnePartInAMillion() {
        Random r = new Random(20260417L);
        List<String> failures = new ArrayList<>();
        int checked = 0;
        while (checked < 36) {
            double a = logUniform(r, 1e-3, 1);
            double b = r.nextBoolean() ? a : Math.min(1, a * logUniform(r, 0.3, 3));
            double z = Math.max(a, b) * logUniform(r, 0.1, 10);
            int n = 1 + r.nextInt(3);
            List<Layer> layers = new ArrayList<>();
            double room = 0.9 * z;
            for (int i = 0; i < n; i++) {
                double t = Math.min(logUniform(r, 1e-6, 1e-2), room / n);
                layers.add(i == 1 && r.nextBoolean() ? Layer.gap(Length.ofMetres(t)) : Layer.of(randomMedium(r),
                        Length.ofMetres(t)));
            }
            Barrier barrier = Barrier.of(layers);
            double hz = logUniform(r, 1, 1e7);
            if (nepers(barrier, hz) > 20) {
                continue; // beyond the reference's unscaled range (and above 170 dB)
            }
            CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(a), 1), Coil.loop(Length.ofMetres(b), 1),
                    Length.ofMetres(z));
            Complex mine = io.shieldmath.shield.TestComplex.cm(pair.through(barrier).at(Frequency.ofHertz(hz)).shieldedMutualInductance());
            Complex ref = ReferenceCoupling.mutual(a, 1, b, 1, z, barrier, hz, 1e-10);
            double err = mine.subtract(ref).abs() / ref.abs();
            if (!(err < 1e-6)) {
                failures.add(String.format("a %.3g b %.3g z %.3g f %.3g %s: %.2e", a, b, z, hz, barrier, err));
            }
            checked++;
        }
        assertTrue(failures.isEmpty(), String.join("\n", failures));
    }

    @Test
    void thinHighPermeabilitySheetsWithTheirSmallWavenumberScale() {
        // The roll-off of a thin high-µ sheet sits near λ = 2/(µr·t), decades below 1/a: the graded
        // panels must resolve it. Static-like (σ = 0) and conducting cases.
        double[][] cases = {{1e5, 1e-5, 0, 50}, {1e5, 1e-4, 1.7e6, 1}, {3e4, 1e-3, 1.7e6, 10}, {1e3, 2e-5, 7e6, 1e3}};
        for (double[] c : cases) {
            Barrier barrier = Barrier.of(Medium.conductor("high-µ", Conductivity.ofSiemensPerMetre(c[2]), c[0]),
                    Length.ofMetres(c[1]));
            for (double a : new double[] {1e-3, 0.3}) {
                double z = 0.7 * a + 2 * c[1];
                CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMetres(a), 1), Coil.loop(Length.ofMetres(a), 1),
                        Length.ofMetres(z));
                Complex mine = io.shieldmath.shield.TestComplex.cm(pair.through(barrier).at(Frequency.ofHertz(c[3])).shieldedMutualInductance());
                Complex ref = ReferenceCoupling.mutual(a, 1, a, 1, z, barrier, c[3], 1e-10);
                double err = mine.subtract(ref).abs() / ref.abs();
                assertTrue(err < 1e-6, barrier + " a " + a + ": " + err);
            }
        }
    }
}
