/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.internal.ChainMatrix;
import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.StackArrays;

/**
 * A barrier facing an incident field: evaluate it at one frequency, over a sweep, or in
 * bulk on primitive arrays.
 *
 * <p>The shielding effectiveness is the insertion loss against the same thickness of
 * free space: SE = 20·log10 |T_free / T|, with T from the chain-matrix product of the
 * layers between the field's wave impedance on both sides (S. A.
 * Schelkunoff's transmission-line view of shielding, as in Ott 2009 ch. 6). A barrier
 * of free space gives 0 dB exactly.
 *
 * <p>Valid frequencies: {@value #MIN_HERTZ} Hz to {@value #MAX_HERTZ} Hz. The
 * result is finite for every layer thickness, conductivity and permeability the layer
 * types accept (thick layers are handled in log form, see the class notes of the engine).
 *
 * <p>Immutable and thread-safe; the batch methods allocate nothing per point and may be
 * called from many threads on the same object.
 */
public final class PlanarEvaluation implements ShieldingModel<PlanarResult> {

    /** The lowest frequency evaluated, in Hz. */
    public static final double MIN_HERTZ = 1e-6;
    /** The highest frequency evaluated, in Hz. */
    public static final double MAX_HERTZ = 1e13;

    private static final FrequencyBand VALID = FrequencyBand.of(Frequency.ofHertz(MIN_HERTZ), Frequency.ofHertz(MAX_HERTZ));

    private final Barrier barrier;
    private final StackArrays stack;
    private final IncidentField field;

    PlanarEvaluation(Barrier barrier, IncidentField field) {
        this.barrier = barrier;
        this.stack = barrier.stack;
        this.field = field;
    }

    /**
     * The barrier.
     *
     * @return the barrier
     */
    public Barrier barrier() {
        return barrier;
    }

    /**
     * The incident field.
     *
     * @return the field
     */
    public IncidentField field() {
        return field;
    }

    /**
     * The frequencies this model evaluates: 1 µHz to 10 THz.
     *
     * @return the valid band
     */
    @Override
    public FrequencyBand validBand() {
        return VALID;
    }

    /**
     * The full result at one frequency: total SE, transmission coefficient and parts.
     *
     * @param frequency the frequency, from 1 µHz to 10 THz
     * @return the result
     * @throws InvalidQuantityException if the frequency is out of range
     */
    @Override
    public PlanarResult at(Frequency frequency) {
        double hz = checkHertz("frequency", Require.nonNull("frequency", frequency).toHertz());
        return evaluate(frequency, hz);
    }

    private PlanarResult evaluate(Frequency frequency, double hz) {
        int n = barrier.layerCount();
        double[] parts = new double[n + 2];
        double zr = field.impedanceReal(hz);
        double zi = field.impedanceImaginary(hz);
        double logT = ChainMatrix.logTransmission(stack.thickness(), stack.sigma(), stack.epsilon(), stack.mu(),
                hz, zr, zi, parts);
        double se = Numerics.DB_PER_NEPER * (logFreeSpace(hz, zr, zi, logT) - logT);
        double[] absorption = new double[n];
        System.arraycopy(parts, 2, absorption, 0, n);
        requireFinite(se, hz);
        return new PlanarResult(frequency, field, se, absorption, parts[1], logT, parts[0]);
    }

    /**
     * The total shielding effectiveness at one frequency, in dB, without creating objects.
     *
     * @param hertz the frequency in Hz, from 1 µHz to 10 THz
     * @return SE in dB
     * @throws InvalidQuantityException if the frequency is out of range
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        return seDb(checkHertz("frequency", hertz));
    }

    /**
     * The total shielding effectiveness at many frequencies, for instrument software: no
     * allocation per point, safe to call from many threads.
     *
     * @param hertz frequencies in Hz, each from 1 µHz to 10 THz, not null
     * @param outDb the array that receives SE in dB, at least as long as {@code hertz}, not null
     * @return {@code outDb}
     * @throws InvalidQuantityException if a frequency is out of range (named by its index); nothing
     *                                  is written from that index on
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
        for (int i = 0; i < hertz.length; i++) {
            double hz = hertz[i];
            if (!(hz >= MIN_HERTZ && hz <= MAX_HERTZ)) {
                // The message (a new string) is built only on failure: nothing is allocated per point.
                checkHertz("frequency [" + i + "]", hz);
            }
            outDb[i] = seDb(hz);
        }
        return outDb;
    }

    /**
     * The total shielding effectiveness at many frequencies, into a new array.
     *
     * @param hertz frequencies in Hz, each from 1 µHz to 10 THz, not null
     * @return SE in dB at each frequency
     */
    public double[] shieldingEffectivenessDb(double[] hertz) {
        return shieldingEffectivenessDb(hertz, new double[Require.nonNull("frequencies", hertz).length]);
    }

    private double seDb(double hz) {
        double zr = field.impedanceReal(hz);
        double zi = field.impedanceImaginary(hz);
        double logT = ChainMatrix.logTransmission(stack.thickness(), stack.sigma(), stack.epsilon(), stack.mu(),
                hz, zr, zi, null);
        double se = Numerics.DB_PER_NEPER * (logFreeSpace(hz, zr, zi, logT) - logT);
        requireFinite(se, hz);
        return se;
    }

    /**
     * ln |T| of the same thickness of free space. A barrier made only of free space is its
     * own reference, so its SE is exactly 0 dB (insertion loss against free space) whatever the rounding of the
     * closed form and of the layer product; any other barrier uses the closed form.
     */
    private double logFreeSpace(double hz, double zr, double zi, double logT) {
        return stack.freeSpaceOnly() ? logT : ChainMatrix.logFreeSpaceTransmission(stack.total(), hz, zr, zi);
    }

    private void requireFinite(double se, double hz) {
        if (!Double.isFinite(se)) {
            // Only a permeability model that breaks its contract (NaN, µ' ≤ 0) should get here; say which.
            // (The wave impedance is finite for every field the field types accept: IncidentField's ranges.)
            throw Numerics.notFinite("shielding effectiveness", barrier, hz,
                    Numerics.permeabilityFault(stack.mu(), i -> "layer " + (i + 1), hz));
        }
    }

    private static double checkHertz(String what, double hz) {
        return Require.inRange(what, hz, MIN_HERTZ, MAX_HERTZ, "Hz");
    }

    @Override
    public String toString() {
        return barrier + " facing " + field;
    }
}
