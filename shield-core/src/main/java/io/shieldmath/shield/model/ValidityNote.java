/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.model;

import io.shieldmath.shield.internal.Require;
import java.util.Objects;

/**
 * A note that a result was computed outside, or near the edge of, the range where its
 * model holds: the one way every {@link ShieldingResult} reports its validity limits
 * ({@link ShieldingResult#validityNotes()}). A note does not change the number; it says
 * how far to trust it and what to use instead.
 *
 * <pre>{@code
 * PlanarResult r = Barrier.of(copper, mm(0.1)).facing(loopAt1cm).at(kHz(1));
 * for (ValidityNote n : r.validityNotes()) {
 *     if (n.limit() == ValidityNote.Limit.HAND_FORMULA_IMPEDANCE) { ... use ImpedanceForm.EXACT_DIPOLE }
 * }
 * }</pre>
 *
 * <p>Immutable and thread-safe; equality is by value (limit and message).
 */
public final class ValidityNote {

    /** Which validity limit a note is about. */
    public enum Limit {
        /**
         * A quasi-static model (coil coupling, shells) at a frequency where the geometry is
         * no longer small against the wavelength: k0·L above 0.1, k0 = 2πf/c and L the
         * largest dimension.
         */
        QUASI_STATIC,
        /**
         * The textbook near-field wave impedance, a magnitude taken as a real number, where
         * |K| = |Zw/η| of a layer is below 3: the real and the reactive (inductive or
         * capacitive) impedance give visibly different results there, and only the exact
         * dipole impedance is reliable.
         */
        HAND_FORMULA_IMPEDANCE,
        /**
         * The textbook near-field wave impedance at kr of about 0.3 or more: the field at
         * the barrier is no longer a near field, and the textbook impedance does not tend to
         * η0 as the exact one does.
         */
        NOT_NEAR_FIELD,
        /**
         * Bethe's small-hole polarizability used where the hole is not small against its
         * distance to the victim (radius above a fifth of the distance).
         */
        SMALL_HOLE,
        /**
         * A hole in a high-permeability wall in a static or low-frequency field: the hole
         * is driven by the normal field and a tube beyond it attenuates faster than the
         * eddy-current law the model uses; an order-of-magnitude estimate.
         */
        HIGH_PERMEABILITY_OPENING,
        /**
         * A metal above about 100 GHz: its conductivity is taken as its DC value, which no
         * longer holds there (relaxation of the conduction electrons, surface roughness).
         */
        DC_CONDUCTIVITY
    }

    private final Limit limit;
    private final String message;

    private ValidityNote(Limit limit, String message) {
        this.limit = limit;
        this.message = message;
    }

    /**
     * A note.
     *
     * @param limit   which limit, not null
     * @param message the plain-text explanation for a user, not null or blank
     * @return the note
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if the message is blank
     */
    public static ValidityNote of(Limit limit, String message) {
        Require.nonNull("validity limit", limit);
        Require.nonNull("validity message", message);
        if (message.isBlank()) {
            throw new IllegalArgumentException("a validity note needs a message; got a blank one for " + limit);
        }
        return new ValidityNote(limit, message);
    }

    /**
     * Which limit this note is about.
     *
     * @return the limit
     */
    public Limit limit() {
        return limit;
    }

    /**
     * The explanation, in plain text, for a user.
     *
     * @return the message
     */
    public String message() {
        return message;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ValidityNote n && n.limit == limit && n.message.equals(message);
    }

    @Override
    public int hashCode() {
        return Objects.hash(limit, message);
    }

    /**
     * The message.
     *
     * @return the message
     */
    @Override
    public String toString() {
        return message;
    }
}
