/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.internal.Require;

/**
 * Anything that gives a shielding effectiveness at a frequency: a planar barrier facing
 * a field, a coil pair with a plate, an enclosure. The design tools (requirements,
 * worst-case search, thickness solver, ranking, tolerance study) work on this one
 * interface, so they serve every model.
 *
 * <p>Implementations must be thread-safe and return a finite value for every frequency
 * they accept.
 */
@FunctionalInterface
public interface ShieldingModel {

    /**
     * The shielding effectiveness at a frequency.
     *
     * @param hertz the frequency in Hz, greater than 0
     * @return SE in dB, finite
     */
    double shieldingEffectivenessDb(double hertz);

    /**
     * A planar barrier facing a field, as a model.
     *
     * @param evaluation the planar evaluation, not null
     * @return the model
     */
    static ShieldingModel of(PlanarEvaluation evaluation) {
        Require.nonNull("planar evaluation", evaluation);
        return evaluation::shieldingEffectivenessDb;
    }
}
