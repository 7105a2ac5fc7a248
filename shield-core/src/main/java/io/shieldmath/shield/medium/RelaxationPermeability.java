/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.FrequencyUnit;

/**
 * A first-order relaxation µ(f) = µdc/(1 + j·f/fc), the simplest model of the fall of a
 * high-permeability alloy's permeability with frequency (a single Debye-type relaxation;
 * the eddy-current and domain-wall losses of thin laminations behave roughly like this
 * above the corner; Bozorth, Ferromagnetism, 1951, ch. 17).
 *
 * <p>Ranges: µdc from 1 to {@value #MAX_LOW_FREQUENCY}; the corner from
 * {@value #MIN_CORNER_HERTZ} Hz to {@value #MAX_CORNER_HERTZ} Hz, so that at every frequency
 * from 0 Hz to 10 THz µ' and µ'' are finite, µ' &gt; 0 and µ'' ≥ 0.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class RelaxationPermeability implements PermeabilityModel {

    /** The largest low-frequency permeability accepted (that of {@code RelativePermeability.MAX}). */
    public static final double MAX_LOW_FREQUENCY = 1e7;
    /** The lowest corner frequency accepted, in Hz. */
    public static final double MIN_CORNER_HERTZ = 1e-6;
    /** The highest corner frequency accepted, in Hz. */
    public static final double MAX_CORNER_HERTZ = 1e13;
    /**
     * The largest f/fc used: beyond it (above 1e100·fc, far outside any range of this
     * library) the value at 1e100·fc holds, so that µ' never underflows to 0.
     */
    private static final double MAX_RATIO = 1e100;

    private final double muDc;
    private final Frequency corner;
    private final double fc;

    RelaxationPermeability(double muDc, Frequency corner) {
        this.muDc = Require.inRange("low-frequency relative permeability", muDc, 1, MAX_LOW_FREQUENCY,
                "(relative)");
        Require.inRange("relaxation corner frequency", corner.toHertz(), MIN_CORNER_HERTZ, MAX_CORNER_HERTZ, "Hz");
        this.corner = corner;
        this.fc = corner.toHertz();
    }

    /**
     * The low-frequency permeability µdc.
     *
     * @return µdc
     */
    public double lowFrequencyValue() {
        return muDc;
    }

    /**
     * The corner frequency fc, where |µ| = µdc/√2.
     *
     * @return fc
     */
    public Frequency corner() {
        return corner;
    }

    /**
     * µ' = µdc/(1 + x²), x = f/fc. Above x = 1 it is computed as (µdc/(x + 1/x))/x, which
     * cannot overflow in x² (the textbook form gives 0 once x² overflows).
     */
    @Override
    public double real(double hertz) {
        double x = ratio(hertz);
        if (x <= 1) {
            return muDc / (1 + x * x);
        }
        return muDc / (x + 1 / x) / x;
    }

    /** µ'' = µdc·x/(1 + x²) = µdc/(x + 1/x), the second form free of overflow for large x. */
    @Override
    public double loss(double hertz) {
        double x = ratio(hertz);
        if (x <= 1) {
            return muDc * x / (1 + x * x);
        }
        return muDc / (x + 1 / x);
    }

    private double ratio(double hertz) {
        double x = hertz / fc;
        return x > MAX_RATIO ? MAX_RATIO : x;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RelaxationPermeability r && Double.compare(r.muDc, muDc) == 0 && r.corner.equals(corner);
    }

    @Override
    public int hashCode() {
        return Double.hashCode(muDc) * 31 + corner.hashCode();
    }

    /**
     * A description such as {@code "µr 25000/(1 + j f/1 kHz)"}, the numbers to six
     * significant digits.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return "µr " + Text.number(muDc) + "/(1 + j f/" + Text.show(fc, FrequencyUnit.values()) + ")";
    }
}
