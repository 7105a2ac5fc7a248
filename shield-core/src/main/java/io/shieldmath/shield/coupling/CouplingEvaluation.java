/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.SpectralChain;
import io.shieldmath.shield.internal.StackArrays;
import java.util.List;

/**
 * A coil pair with an infinite planar barrier between the coils, evaluated exactly in the
 * quasi-static limit at any frequency.
 *
 * <p>The model (J. R. Moser, IEEE Trans. EMC 9 (1967) 6, for one sheet; any stack through
 * the chain-matrix product of Schelkunoff's transmission-line model; C. V. Dodd and W. E. Deeds, J. Appl. Phys. 39 (1968) 2829, for the layered-conductor integral):
 * M(ω) = µ0·π·Σ N_i·N_j·a_i·b_j ∫0^∞ J1(λa_i)·J1(λb_j)·e^{−λ(d_ij − t)}·T(λ, ω) dλ over the
 * rings of both coils, T the stack's transmission of a TE spectral wave between Z0 = jωµ0/λ
 * on both sides, with γ_i = sqrt(λ² + jωµ_iσ_i) and Z_i = jωµ_i/γ_i in layer i. Every
 * layer's permeability model is asked for µ'(f) and µ''(f) at each frequency evaluated.
 * The insertion loss is 20·log10|M_free/M|. A barrier of free space gives 0 dB, and the
 * result does not depend on where the barrier sits between the coils.
 *
 * <p>Validity: quasi-static, so the coils and their separation must be small against the
 * free-space wavelength (k0·max(radius, d) below about 0.1, for 10 cm coils up to some tens
 * of MHz); the permittivity of the layers is ignored. The barrier is infinite: a real plate
 * lets field round its edges, so a bench measurement saturates below this result (see
 * {@link io.shieldmath.shield.bench.BenchComparison}). Quadrature accuracy: 1e-6 relative or better from 1 Hz to
 * 10 MHz, radii 1 mm to 1 m, gaps 0.1 to 10 radii, stacks of microns to centimetres,
 * high-permeability layers included (verified against an adaptive Commons Math integration),
 * while the insertion loss stays below about 200 dB; beyond that the dropped tail of the
 * spectrum, below 1e-11 of the free-space coupling, limits the relative accuracy.
 *
 * <p>Valid frequencies: {@value #MIN_HERTZ} Hz to {@value #MAX_HERTZ} Hz. Immutable and
 * thread-safe; {@link #shieldingEffectivenessDb(double[], double[])} allocates nothing per point.
 * The shielding effectiveness of this model is the insertion loss of the barrier between
 * the coils.
 */
public final class CouplingEvaluation implements ShieldingModel<CouplingResult> {

    /** The lowest frequency evaluated, in Hz. */
    public static final double MIN_HERTZ = 1e-3;
    /** The highest frequency evaluated, in Hz. */
    public static final double MAX_HERTZ = 1e9;

    private static final FrequencyBand VALID = FrequencyBand.of(Frequency.ofHertz(MIN_HERTZ), Frequency.ofHertz(MAX_HERTZ));

    private final CoilPair pair;
    private final Barrier barrier;
    private final StackArrays stack;
    private final PlanarEvaluation planar;

    CouplingEvaluation(CoilPair pair, Barrier barrier) {
        this.pair = pair;
        this.barrier = barrier;
        List<Layer> layers = barrier.layers();
        stack = StackArrays.of("layer", layers.size(), i -> layers.get(i).medium(),
                i -> layers.get(i).thickness().toMetres(), i -> layers.get(i).isGap());
        planar = barrier.facing(IncidentField.magneticNearField(Length.ofMetres(pair.separationMetres()),
                ImpedanceForm.TEXTBOOK));
    }

    /**
     * The coil pair.
     *
     * @return the pair
     */
    public CoilPair pair() {
        return pair;
    }

    /**
     * The barrier, its first layer facing the transmitter.
     *
     * @return the barrier
     */
    public Barrier barrier() {
        return barrier;
    }

    /**
     * The transmission-line stand-in for this case: the same barrier in the near field of a
     * magnetic source with the textbook wave impedance |Zw| = 2πf·µ0·r at r = d, the coils'
     * centre-plane separation (the hand formula of H. W. Ott, Electromagnetic Compatibility Engineering, Wiley 2009, ch. 6). It is what a hand calculation would give; the
     * difference from {@link #at(Frequency)} is the size of that approximation.
     *
     * @return the planar evaluation
     */
    public PlanarEvaluation planarEstimate() {
        return planar;
    }

    /**
     * The frequencies this model evaluates: 1 mHz to 1 GHz.
     *
     * @return the valid band
     */
    @Override
    public FrequencyBand validBand() {
        return VALID;
    }

    /**
     * The full result at one frequency.
     *
     * @param frequency the frequency, from 1 mHz to 1 GHz, not null
     * @return the result
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     */
    @Override
    public CouplingResult at(Frequency frequency) {
        double hz = checkHertz("frequency", Require.nonNull("frequency", frequency).toHertz());
        return evaluate(frequency, hz);
    }

    /**
     * The insertion loss at one frequency in dB, without creating result objects (two
     * small scratch arrays per call; the batch method reuses one pair for all points).
     *
     * @param hertz the frequency in Hz, from 1 mHz to 1 GHz
     * @return 20·log10|M_free/M| in dB
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        double hz = checkHertz("frequency", hertz);
        double[] out = new double[4];
        SpectralChain.sum(pair.rule(), stack.thickness(), stack.sigma(), stack.mu(), hz, new double[SpectralChain.SLOTS * stack.size()], out);
        return lossDb(out, hz);
    }

    /**
     * The insertion loss at many frequencies, for sweeps in instrument software: no
     * allocation per point or per quadrature node, safe to call from many threads.
     *
     * @param hertz frequencies in Hz, each from 1 mHz to 1 GHz, not null
     * @param outDb receives the insertion loss in dB, at least as long as {@code hertz}, not null
     * @return {@code outDb}
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a frequency is out of range
     *                                  (named by its index); nothing is written from that index on
     * @throws IllegalArgumentException if {@code outDb} is too short
     */
    @Override
    public double[] shieldingEffectivenessDb(double[] hertz, double[] outDb) {
        Require.nonNull("frequencies", hertz);
        Require.nonNull("output array", outDb);
        if (outDb.length < hertz.length) {
            throw new IllegalArgumentException("output array holds " + outDb.length + " values but "
                    + hertz.length + " frequencies were given");
        }
        double[] scratch = new double[SpectralChain.SLOTS * stack.size()];
        double[] out = new double[4];
        for (int i = 0; i < hertz.length; i++) {
            double hz = hertz[i];
            if (!(hz >= MIN_HERTZ && hz <= MAX_HERTZ)) {
                // The message (a new string) is built only on failure: nothing is allocated per point.
                checkHertz("frequency [" + i + "]", hz);
            }
            SpectralChain.sum(pair.rule(), stack.thickness(), stack.sigma(), stack.mu(), hz, scratch, out);
            outDb[i] = lossDb(out, hz);
        }
        return outDb;
    }

    private CouplingResult evaluate(Frequency frequency, double hz) {
        double[] out = new double[4];
        SpectralChain.sum(pair.rule(), stack.thickness(), stack.sigma(), stack.mu(), hz, new double[SpectralChain.SLOTS * stack.size()], out);
        double il = lossDb(out, hz);
        double logM = Numerics.logAbs(out[0], out[1]) - out[2];
        double phase = Math.atan2(out[1], out[0]);
        return new CouplingResult(frequency, pair.freeSpaceHenries(), logM, phase, il,
                planar.at(frequency));
    }

    private double lossDb(double[] out, double hz) {
        double db = Numerics.DB_PER_NEPER * (Math.log(out[3]) - Numerics.logAbs(out[0], out[1]) + out[2]);
        if (!Double.isFinite(db)) {
            // Only a permeability model that breaks its contract (NaN, µ' ≤ 0) should get here; say which.
            throw Numerics.notFinite("insertion loss", barrier, hz,
                    Numerics.permeabilityFault(stack.mu(), i -> "layer " + (i + 1), hz));
        }
        return db;
    }

    private static double checkHertz(String what, double hz) {
        return Require.inRange(what, hz, MIN_HERTZ, MAX_HERTZ, "Hz");
    }

    @Override
    public String toString() {
        return pair + " through " + barrier;
    }
}
