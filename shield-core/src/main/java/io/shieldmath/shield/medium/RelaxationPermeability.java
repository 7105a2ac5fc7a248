/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.FrequencyUnit;

/**
 * A first-order relaxation µ(f) = 1 + (µdc − 1)/(1 + j·f/fc), the simplest model of the
 * fall of a high-permeability alloy's permeability with frequency (a single Debye-type
 * relaxation of the magnetic susceptibility χ = µ − 1; the domain-wall losses of an alloy
 * behave roughly like this above the corner; R. M. Bozorth, Ferromagnetism, 1951, ch. 17,
 * from memory). Only the susceptibility relaxes: far above the corner µ tends to the
 * free-space value 1, never below it, so the jωµσ term of a conductor keeps growing with
 * frequency and the absorption of a thick steel plate keeps rising at RF.
 *
 * <p>Changed in this release: earlier releases used µdc/(1 + j·f/fc), which took µ' below
 * 1, towards 0, above about fc·√µdc. The form is a property of this model, not of the
 * files that name it: a catalogue or design file that says {@code "relaxation"} now gets
 * this form, and results above the corner change (little below fc·√µdc, much at RF).
 *
 * <p>Ranges: µdc from 1 to {@value #MAX_LOW_FREQUENCY}; the corner from
 * {@value #MIN_CORNER_HERTZ} Hz to {@value #MAX_CORNER_HERTZ} Hz, so that at every frequency
 * from 0 Hz to 10 THz µ' and µ'' are finite, 1 ≤ µ' ≤ µdc and µ'' ≥ 0.
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
     * library) the value at 1e100·fc holds, so that x² and x never overflow.
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
     * The corner frequency fc, where the susceptibility |µ − 1| has fallen to (µdc − 1)/√2.
     *
     * @return fc
     */
    public Frequency corner() {
        return corner;
    }

    /**
     * µ' = 1 + (µdc − 1)/(1 + x²), x = f/fc. Above x = 1 the fraction is computed as
     * ((µdc − 1)/(x + 1/x))/x, which cannot overflow in x².
     */
    @Override
    public double real(double hertz) {
        double x = ratio(hertz);
        double chi = muDc - 1;
        if (x <= 1) {
            return 1 + chi / (1 + x * x);
        }
        return 1 + chi / (x + 1 / x) / x;
    }

    /** µ'' = (µdc − 1)·x/(1 + x²) = (µdc − 1)/(x + 1/x), the second form free of overflow for large x. */
    @Override
    public double loss(double hertz) {
        double x = ratio(hertz);
        double chi = muDc - 1;
        if (x <= 1) {
            return chi * x / (1 + x * x);
        }
        return chi / (x + 1 / x);
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
     * A description such as {@code "µr 1 + (25000 − 1)/(1 + j f/1 kHz)"}, the numbers to six
     * significant digits.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return "µr 1 + (" + Text.number(muDc) + " − 1)/(1 + j f/" + Text.show(fc, FrequencyUnit.values()) + ")";
    }
}
