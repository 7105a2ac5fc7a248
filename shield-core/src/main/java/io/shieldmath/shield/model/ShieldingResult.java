/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.model;

import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.ShieldingFactor;
import java.util.List;

/**
 * The part every model's result shares: the shielding effectiveness, in dB, as a level
 * and as a plain factor. Each model's result type adds its own parts (absorption and
 * reflection of a planar stack, the mutual impedance of a coil pair, the leakage paths of
 * an enclosure).
 *
 * <p>Every result also reports where it stands against its model's validity limits,
 * {@link #validityNotes()}: a quasi-static model at too high a frequency, a hand formula
 * where it is unreliable, a small-hole law for a hole that is not small. The number is the
 * model's either way; the notes say how far to trust it.
 *
 * <p>Implementations are immutable and thread-safe.
 */
public interface ShieldingResult {

    /**
     * The shielding effectiveness in dB: 20·log10 of the field at the victim without the
     * shield over the field with it.
     *
     * @return SE in dB, finite (negative when the shield raises the field)
     */
    double shieldingEffectivenessDb();

    /**
     * The shielding effectiveness as a level.
     *
     * @return SE
     */
    default Decibels shieldingEffectiveness() {
        return Decibels.of(shieldingEffectivenessDb());
    }

    /**
     * The shielding factor S = 10^(SE/20), the plain field ratio.
     *
     * @return S
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if SE is above about
     *         6160 dB, where S does not fit a double (use {@link #shieldingEffectivenessDb()})
     */
    default ShieldingFactor shieldingFactor() {
        return ShieldingFactor.from(shieldingEffectiveness());
    }

    /**
     * The notes on this result's validity: each limit of the model that the case is
     * outside of or near, with what to use instead. The default has none; models with
     * stated limits override it.
     *
     * @return an unmodifiable list, empty when the result is inside every limit checked
     */
    default List<ValidityNote> validityNotes() {
        return List.of();
    }

    /**
     * Whether this result is inside every validity limit its model checks.
     *
     * @return true if {@link #validityNotes()} is empty
     */
    default boolean isWithinValidityLimits() {
        return validityNotes().isEmpty();
    }
}
