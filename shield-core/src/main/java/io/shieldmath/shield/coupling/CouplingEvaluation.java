/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.SpectralChain;
import io.shieldmath.shield.internal.StackAccess;
import io.shieldmath.shield.internal.StackArrays;
import io.shieldmath.shield.internal.Validity;
import io.shieldmath.shield.model.ValidityNote;
import java.util.ArrayList;
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
 * of MHz; above it each result carries a {@link io.shieldmath.shield.model.ValidityNote.Limit#QUASI_STATIC}
 * note, {@link CouplingResult#validityNotes()}); the permittivity of the layers is ignored. The barrier is infinite: a real plate
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
    private final double position;

    CouplingEvaluation(CoilPair pair, Barrier barrier, double transmitterToBarrier) {
        this.pair = pair;
        this.barrier = barrier;
        this.position = transmitterToBarrier;
        // The arrays the barrier already holds (one copy per barrier, checked once).
        stack = StackAccess.ofBarrier(barrier);
        // A barrier that fills the whole gap of a flat loop touches it (r = 0); the estimate then
        // puts the source a thousandth of the gap away (at least 1 µm, the near field's range), as
        // the impedance 2πfµ0·r needs r > 0.
        double r = estimateDistance(transmitterToBarrier, pair);
        planar = barrier.facing(IncidentField.magneticNearField(Length.ofMetres(r), ImpedanceForm.TEXTBOOK));
    }

    /**
     * The distance from the transmitter's centre plane to the barrier's near face, as placed
     * by {@link CoilPair#through(Barrier)} (centred in the gap) or
     * {@link CoilPair#through(Barrier, Length)}, and the source distance of the planar
     * estimate; a barrier that touches the transmitter counts as a thousandth of the gap away,
     * and never less than 1 µm. It does not change the exact result.
     *
     * @return the distance
     */
    public Length transmitterToBarrier() {
        return Length.ofMetres(estimateDistance(position, pair));
    }

    /**
     * The source distance of the planar estimate: the plate's position, at least a thousandth
     * of the gap, and never below the near field's smallest distance, 1 µm.
     */
    private static double estimateDistance(double position, CoilPair pair) {
        return Math.max(Math.max(position, 1e-3 * pair.gap().toMetres()), IncidentField.MIN_DISTANCE_METRES);
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
     * The hand estimate of this case: the transmission-line (Schelkunoff) shielding
     * effectiveness SE = A + R + B of the same barrier in the near field of a magnetic
     * (loop) source, with the textbook wave impedance |Zw| = 2πf·µ0·r taken as a real
     * number, r the distance from the transmitter to the barrier's near face
     * ({@link #transmitterToBarrier()}; (d − t)/2 for a centred barrier between single
     * loops). This is the magnetic near-field estimate of H. W. Ott, Electromagnetic
     * Compatibility Engineering, Wiley 2009, ch. 6, with R and B from their exact
     * single-layer forms rather than the rounded formula R = 14.6 + 10·log10(f·r²·σr/µr).
     * It is what a careful hand calculation gives; the difference from {@link #at(Frequency)}
     * is the size of that approximation (a loop's field is not a plane wave of one
     * impedance). Earlier releases put the source at r = d, the coil-to-coil distance, which
     * overstated the estimate by about 6 dB for a centred plate.
     *
     * @return the planar evaluation; its results carry their own validity notes
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
        List<ValidityNote> notes = new ArrayList<>(1);
        Validity.quasiStatic(hz, Math.max(pair.largestRadiusMetres(), pair.separationMetres()),
                "the coil coupling model", notes);
        return new CouplingResult(frequency, pair.freeSpaceHenries(), logM, phase, il,
                planar.at(frequency), List.copyOf(notes));
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
