/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.model.ShieldingResult;
import java.util.Locale;

/**
 * The axial and transverse results of one arrangement, sensor region and frequency; as a
 * {@link ShieldingResult} its shielding effectiveness is the smaller of the two worst
 * factors, in dB. Immutable and thread-safe.
 */
public final class WorstDirectionSolution implements ShieldingResult {

    private final AxialFieldSolution axial;
    private final TransverseFieldSolution transverse;

    WorstDirectionSolution(AxialFieldSolution axial, TransverseFieldSolution transverse) {
        this.axial = axial;
        this.transverse = transverse;
    }

    /**
     * The axial result.
     *
     * @return it
     */
    public AxialFieldSolution axial() {
        return axial;
    }

    /**
     * The transverse result.
     *
     * @return it
     */
    public TransverseFieldSolution transverse() {
        return transverse;
    }

    /**
     * The direction with the smaller worst shielding factor (axial on a tie).
     *
     * @return the direction
     */
    public FieldDirection worstDirection() {
        return transverse.worstDirection(axial);
    }

    /**
     * The smaller of the two worst shielding factors over the sensor region, in dB.
     *
     * @return SE in dB, finite
     */
    @Override
    public double shieldingEffectivenessDb() {
        return Math.min(axial.shieldingEffectivenessDb(), transverse.shieldingEffectivenessDb());
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.6g Hz: worst %.4f dB (%s); axial %.4f dB, transverse %.4f dB", axial.hertz(),
                shieldingEffectivenessDb(), worstDirection(), axial.shieldingEffectivenessDb(),
                transverse.shieldingEffectivenessDb());
    }
}
