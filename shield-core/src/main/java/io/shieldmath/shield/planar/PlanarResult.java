/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.Complex;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.model.ValidityNote;
import java.util.List;
import java.util.Locale;

/**
 * The shielding effectiveness of a planar barrier at one frequency, with its parts.
 *
 * <p>The parts and how they add up, SE = A + R + B:
 * <ul>
 *   <li>A, absorption: Σ 20·log10|e^{γ_i t_i}| over the layers (8.686·t/δ for a good
 *       conductor); also given per layer.</li>
 *   <li>R, reflection: for each layer that is not free space, the loss of its two faces
 *       as if it stood alone between the wave impedance Zw on both sides,
 *       Σ 20·log10|(1 + K_i)²/(4K_i)| with K_i = Zw/η_i. For one layer this is the classic
 *       single-shield reflection loss (S. A. Schelkunoff's transmission-line view, as in
 *       H. W. Ott, <i>Electromagnetic Compatibility Engineering</i>, Wiley 2009, ch. 6). Air
 *       gaps add nothing, so R is continuous as a gap shrinks to zero and a slab of air alone
 *       has R = 0.</li>
 *   <li>B, multiple reflections and coupling: the rest, SE − A − R. For one layer in a plane
 *       wave it equals 20·log10|1 − ((K−1)/(K+1))²·e^{−2γt}|. For several layers it also
 *       holds the interaction of the layers through the gaps between them (negative or
 *       positive). In a near field it further holds the free-space reference term of the
 *       insertion loss: with the near-field wave impedance the free-space slab of the same
 *       thickness does not transmit exactly 1, and the difference grows with the slab's
 *       thickness t against the source distance r (about t/r for the textbook magnetic
 *       impedance), not with k0·t. It is negative when re-reflections leak field through a
 *       thin shield.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe.
 */
public final class PlanarResult implements ShieldingResult {

    private final Frequency frequency;
    private final IncidentField field;
    private final double totalDb;
    private final double[] absorptionDb;
    private final double absorptionTotal;
    private final double reflectionDb;
    private final double logT;
    private final double phase;
    private final List<ValidityNote> notes;

    PlanarResult(Frequency frequency, IncidentField field, double totalDb, double[] absorptionDb,
                 double reflectionDb, double logT, double phase, List<ValidityNote> notes) {
        this.notes = notes;
        this.frequency = frequency;
        this.field = field;
        this.totalDb = totalDb;
        this.absorptionDb = absorptionDb;
        double a = 0;
        for (double x : absorptionDb) {
            a += x;
        }
        this.absorptionTotal = a;
        this.reflectionDb = reflectionDb;
        this.logT = logT;
        this.phase = phase;
    }

    /**
     * The frequency of this result.
     *
     * @return f
     */
    public Frequency frequency() {
        return frequency;
    }

    /**
     * The incident field of this result.
     *
     * @return the field
     */
    public IncidentField field() {
        return field;
    }

    /**
     * The total shielding effectiveness in dB, A + R + B.
     *
     * @return SE, finite
     */
    @Override
    public double shieldingEffectivenessDb() {
        return totalDb;
    }

    /**
     * The total absorption A in dB.
     *
     * @return A, 0 or more
     */
    public double absorptionDb() {
        return absorptionTotal;
    }

    /**
     * The absorption of one layer in dB.
     *
     * @param layer the layer's index, 0 for the source-facing layer
     * @return A of that layer
     * @throws IndexOutOfBoundsException if there is no such layer
     */
    public double absorptionDb(int layer) {
        return absorptionDb[layer];
    }

    /**
     * The number of layers.
     *
     * @return the layer count
     */
    public int layerCount() {
        return absorptionDb.length;
    }

    /**
     * The reflection loss R in dB (see the class description).
     *
     * <p>R can be negative. With a complex K (a magnetic layer, whose η has a phase other
     * than 45° or whose µ is lossy, or a reactive wave impedance), |1 + K|² can be smaller
     * than 4|K| where |K| is near 1: the two faces then let through more than a plain
     * impedance step would. For example 1 mm of low-carbon steel (σ = 7 MS/m, µr ≈ 1000)
     * 10 cm from a loop at 1 kHz, with the textbook impedance, has R ≈ −1.2 dB. That is
     * physical, not an error of the model; it is where the hand formulas for R fail (they
     * assume |K| ≫ 1).
     *
     * @return R, usually positive
     */
    public double reflectionDb() {
        return reflectionDb;
    }

    /**
     * The multiple-reflection correction B = SE − A − R in dB (see the class description).
     *
     * @return B, often negative for thin shields
     */
    public double multipleReflectionDb() {
        return totalDb - absorptionTotal - reflectionDb;
    }

    /**
     * 20·log10|T| of the barrier's transmission coefficient, finite even where T itself
     * underflows.
     *
     * @return |T| in dB, usually negative
     */
    public double transmissionDb() {
        return Numerics.DB_PER_NEPER * logT;
    }

    /**
     * The phase of the transmission coefficient T, in radians (not reduced to (−π, π]).
     *
     * @return arg T
     */
    public double transmissionPhase() {
        return phase;
    }

    /**
     * The complex transmission coefficient T (field behind over field incident, between
     * the wave impedance on both sides). Below about 1e-308 its magnitude underflows to
     * zero; use {@link #transmissionDb()} for thick barriers.
     *
     * @return T
     */
    public Complex transmission() {
        double m = Math.exp(logT);
        return Complex.ofPolar(m, phase);
    }

    /**
     * The notes on this result's validity (see {@link PlanarEvaluation} for the checks): the
     * textbook near-field impedance where |K| &lt; 3 or kr ≥ 0.3, and metals above 100 GHz.
     *
     * @return an unmodifiable list, empty inside the limits
     */
    @Override
    public List<ValidityNote> validityNotes() {
        return notes;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "SE %.2f dB at %s (A %.2f dB, R %.2f dB, B %.2f dB)", totalDb,
                frequency, absorptionTotal, reflectionDb, multipleReflectionDb());
    }
}
