/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.internal.Validity;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
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
 * <p>Validity notes ({@link PlanarResult#validityNotes()}): with the textbook near-field
 * impedance ({@link ImpedanceForm#TEXTBOOK}), a note where kr ≥ {@value #NEAR_FIELD_KR_LIMIT}
 * (no longer a near field) and where |K| of a layer is below {@value #HAND_FORMULA_K_LIMIT}
 * (the magnitude form, a real number, is unreliable beside the reactive near field; use
 * {@link ImpedanceForm#EXACT_DIPOLE}). Here |K| is the smaller of |Zw/η|, the K of the
 * layer's two faces, and |Zw·sinh(γt)/(2η)|, its thin-sheet form (≈ Zw·σt/2 for a layer much
 * thinner than its skin depth, which then acts as one sheet of admittance σt); the
 * second one catches thin foils, whose |Zw/η| can be large while the phase of Zw still
 * decides the result. With any impedance, a note
 * for a metal layer (σ ≥ 1e5 S/m) above 100 GHz, where its DC conductivity, which the model
 * uses, no longer holds.
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

    /**
     * From this kr = 2πf·r/c on, a result with the textbook near-field impedance carries a
     * {@link ValidityNote.Limit#NOT_NEAR_FIELD} note.
     */
    public static final double NEAR_FIELD_KR_LIMIT = 0.3;
    /**
     * Below this |K| of any layer (see the class notes), a result with the textbook near-field impedance
     * carries a {@link ValidityNote.Limit#HAND_FORMULA_IMPEDANCE} note.
     */
    public static final double HAND_FORMULA_K_LIMIT = 3;

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
        return new PlanarResult(frequency, field, se, absorption, parts[1], logT, parts[0], notes(hz));
    }

    /**
     * The validity notes of a result (see {@link PlanarResult#validityNotes()}); built only
     * for full results, never on the primitive paths.
     */
    private List<ValidityNote> notes(double hz) {
        List<ValidityNote> out = new ArrayList<>(2);
        if (field.form() == ImpedanceForm.TEXTBOOK) {
            double r = field.distance().toMetres();
            double kr = Validity.k0L(hz, r);
            if (kr >= NEAR_FIELD_KR_LIMIT) {
                out.add(ValidityNote.of(ValidityNote.Limit.NOT_NEAR_FIELD, String.format(Locale.ROOT,
                        "kr = %.3g at %s (%s from the source): the field at the barrier is no longer a near field "
                                + "and the textbook impedance, which does not tend to η0, is wrong there; use "
                                + "ImpedanceForm.EXACT_DIPOLE", kr, Frequency.ofHertz(hz), field.distance())));
            }
            double zw = Math.abs(field.impedanceReal(hz));
            double w = 2 * Math.PI * hz;
            double smallest = Double.POSITIVE_INFINITY;
            int which = -1;
            for (int i = 0; i < stack.size(); i++) {
                if (stack.gap()[i]) {
                    continue;
                }
                double k = handFormulaK(zw, w, stack.mu()[i], stack.sigma()[i], stack.epsilon()[i],
                        stack.thickness()[i], hz);
                if (k < smallest) {
                    smallest = k;
                    which = i;
                }
            }
            if (smallest < HAND_FORMULA_K_LIMIT) {
                out.add(ValidityNote.of(ValidityNote.Limit.HAND_FORMULA_IMPEDANCE, String.format(Locale.ROOT,
                        "|K| = %.3g for layer %d (below %s): with |K| this small, taking the textbook near-field "
                                + "impedance as a real number is unreliable (the real near field is reactive), and "
                                + "so are R and B; use ImpedanceForm.EXACT_DIPOLE", smallest, which,
                        HAND_FORMULA_K_LIMIT)));
            }
        }
        Validity.dcConductivity(hz, stack.sigma(), out);
        return List.copyOf(out);
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
     * @throws InvalidQuantityException if a frequency is out of range (named by its index)
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

    /**
     * |K| of one layer for the hand-formula check: the smaller of |Zw/η| (the two faces of a
     * thick layer) and |Zw·sinh(γt)/(2η)| (a layer thinner than its skin depth acts as one
     * sheet of admittance sinh(γt)/η ≈ σt, and Zw·σt/2 takes the place of K). Both from
     * γ = sqrt(jωµ(σ + jωε)), η = jωµ/γ.
     */
    private static double handFormulaK(double zw, double w, PermeabilityModel m, double sigma, double epsR, double t,
                                       double hz) {
        org.apache.commons.math3.complex.Complex jwmu = new org.apache.commons.math3.complex.Complex(
                w * PhysicalConstants.MU_0 * m.loss(hz), w * PhysicalConstants.MU_0 * m.real(hz));
        org.apache.commons.math3.complex.Complex gamma = jwmu.multiply(
                new org.apache.commons.math3.complex.Complex(sigma, w * PhysicalConstants.EPSILON_0 * epsR)).sqrt();
        double eta = jwmu.divide(gamma).abs();
        double faces = zw / eta;
        double gt = gamma.getReal() * t;
        if (gt > 20) {
            // |sinh(γt)| > e^20/2: the sheet form is far above the faces' one.
            return faces;
        }
        double sheet = zw * gamma.multiply(t).sinh().abs() / (2 * eta);
        return Math.min(faces, sheet);
    }

    @Override
    public String toString() {
        return barrier + " facing " + field;
    }
}
