/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.WideRangeChainProduct;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The coil-coupling engine's layer product ({@link SpectralChain}) on deep stacks, node by
 * node, against the same arbitrary-exponent reference product ({@link WideRangeChainProduct})
 * that checks the planar engine: the two engines share the per-layer step's rules (scaling
 * and rescaling) but not the code, so both are held to one reference.
 */
class DeepSpectralStackTest {

    private static final double SIGMA_CU = 5.8e7; // 100 % IACS, IEC 60028
    private static final PermeabilityModel[] NONE = new PermeabilityModel[0];

    /**
     * F(λ)·e^{Λ0} of the engine at one node λ_k of a real rule: every weight but node k's is
     * set to zero in a fresh rule, so the sum is that node's term alone.
     */
    private static double[] engineAtNode(SpectralRule rule, int k, double[] t, double[] sigma,
                                         PermeabilityModel[] mu, double hz) {
        java.util.Arrays.fill(rule.weight, 0);
        rule.weight[k] = 1;
        double[] out = new double[4];
        SpectralChain.sum(rule, t, sigma, mu, hz, new double[SpectralChain.SLOTS * t.length], out);
        return out;
    }

    /** ln |F(λ)| and arg F(λ) by the reference: F = e^{λ·Σt}·T with the normalised impedances z = µr·λ/γ. */
    private static double[] referenceF(double lambda, double[] t, double[] sigma, double hz) {
        int n = t.length;
        Complex[] gt = new Complex[n];
        Complex[] z = new Complex[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            Complex g = new Complex(lambda * lambda, 2 * Math.PI * hz * PhysicalConstants.MU_0 * sigma[i]).sqrt();
            gt[i] = g.multiply(t[i]);
            z[i] = new Complex(lambda).divide(g);
            total += t[i];
        }
        double[] lt = WideRangeChainProduct.logTransmission(gt, z, Complex.ONE);
        return new double[] {lt[0] + lambda * total, lt[1]};
    }

    private static void checkStack(int pairs, double gap, double hz) {
        int n = 2 * pairs;
        double[] t = new double[n];
        double[] sigma = new double[n];
        PermeabilityModel[] mu = new PermeabilityModel[n];
        for (int i = 0; i < n; i++) {
            t[i] = i % 2 == 0 ? 10e-6 : gap;
            sigma[i] = i % 2 == 0 ? SIGMA_CU : 0;
            mu[i] = PermeabilityModel.constant(1);
        }
        SpectralRule rule = new SpectralRule(new double[] {0.02}, new double[] {0}, 10,
                new double[] {0.02}, new double[] {0}, 10, 0.05);
        double[] lambda = rule.lambda.clone();
        // Nodes of the equal panels (always summed), low, middle and high in the spectrum.
        int[] nodes = {rule.uniformFrom, (rule.uniformFrom + lambda.length) / 2, lambda.length - 1};
        for (int k : nodes) {
            double[] out = engineAtNode(rule, k, t, sigma, mu, hz);
            String where = n + " layers, gap " + gap + " m, " + hz + " Hz, λ = " + lambda[k];
            assertTrue(Double.isFinite(out[0]) && Double.isFinite(out[1]), where);
            double[] ref = referenceF(lambda[k], t, sigma, hz);
            double logEngine = Numerics.logAbs(out[0], out[1]) - out[2];
            assertEquals(ref[0], logEngine, 1e-10 * Math.abs(ref[0]), where);
            double dPhase = Math.IEEEremainder(Math.atan2(out[1], out[0]) - ref[1], 2 * Math.PI);
            assertEquals(0, dPhase, 1e-8, where);
        }
    }

    @Test
    void deepCopperStacksAgreeWithTheReferenceAtEachNode() {
        for (double hz : new double[] {1e6, 1e9}) {
            checkStack(79, 1e-3, hz);
            checkStack(106, 10e-6, hz);
            checkStack(128, 1e-3, hz);
            checkStack(128, 10e-6, hz);
        }
    }

    @Test
    void aFullCoilStackIsFiniteAtTheTopOfTheBand() {
        Medium cu = Medium.conductor("copper", Conductivity.ofSiemensPerMetre(SIGMA_CU), 1);
        for (Length gap : List.of(Length.ofMicrometres(10), Length.ofMillimetres(1))) {
            List<Layer> layers = new ArrayList<>();
            for (int i = 0; i < Barrier.MAX_LAYERS / 2; i++) {
                layers.add(Layer.of(cu, Length.ofMicrometres(10)));
                layers.add(Layer.gap(gap));
            }
            // 128 interfaces pairs with 1 mm gaps: every spectral term is below e^{-1000}, which
            // used to underflow to an infinite insertion loss.
            CoilPair pair = CoilPair.coaxial(Coil.loop(Length.ofMillimetres(20), 10),
                    Coil.loop(Length.ofMillimetres(20), 10), Length.ofMillimetres(200));
            for (double hz : new double[] {1e6, 1e9}) {
                double se = pair.through(Barrier.of(layers)).at(Frequency.ofHertz(hz)).shieldingEffectivenessDb();
                assertTrue(Double.isFinite(se) && se > 0, () -> gap + " " + hz + " Hz: SE " + se);
            }
        }
    }
}
