/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * The one evaluation contract that every shielding model of this library implements: a
 * planar barrier facing a field, a coil pair with a sheet between, a closed shell, an
 * enclosure with openings, and any model of your own. The design tools (requirement
 * margins, band search, thickness solver, ranking, tolerance study) take a
 * {@link io.shieldmath.shield.model.ShieldingModel}, so they work on every model unchanged.
 *
 * <p>The names are decided once: {@code shieldingEffectivenessDb} is the shielding
 * effectiveness in dB (the field at the victim without the shield over the field with it,
 * as 20·log10 of the ratio; for a coil pair this is the insertion loss),
 * {@code shieldingEffectiveness()} the same as {@code Decibels}, {@code shieldingFactor()}
 * the plain ratio as a {@code ShieldingFactor}, {@code at(Frequency)} one result with its
 * parts, and {@code sweep(FrequencyBand, int)} a {@link io.shieldmath.shield.model.Sweep}.
 *
 * <p>This package depends only on {@code quantity}; the physics packages build on it.
 */
package io.shieldmath.shield.model;
