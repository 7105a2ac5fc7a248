/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.model;

import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.ShieldingFactor;

/**
 * The part every model's result shares: the shielding effectiveness, in dB, as a level
 * and as a plain factor. Each model's result type adds its own parts (absorption and
 * reflection of a planar stack, the mutual impedance of a coil pair, the leakage paths of
 * an enclosure).
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
}
