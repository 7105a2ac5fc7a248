/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.internal.Require;

/**
 * A first-order relaxation µ(f) = µdc/(1 + j·f/fc), the simplest model of the fall of a
 * high-permeability alloy's permeability with frequency (DOMAIN: the eddy-current and
 * domain-wall losses of thin laminations behave roughly like this above the corner).
 * Immutable and thread-safe; equality is by value.
 */
public final class RelaxationPermeability implements PermeabilityModel {

    private final double muDc;
    private final Frequency corner;
    private final double fc;

    RelaxationPermeability(double muDc, Frequency corner) {
        this.muDc = Require.inRange("low-frequency relative permeability", muDc, 1, 1e8, "(relative)");
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

    @Override
    public double real(double hertz) {
        double x = hertz / fc;
        return muDc / (1 + x * x);
    }

    @Override
    public double loss(double hertz) {
        double x = hertz / fc;
        return muDc * x / (1 + x * x);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RelaxationPermeability r && Double.compare(r.muDc, muDc) == 0 && r.corner.equals(corner);
    }

    @Override
    public int hashCode() {
        return Double.hashCode(muDc) * 31 + corner.hashCode();
    }

    @Override
    public String toString() {
        return "µr " + muDc + "/(1 + j f/" + corner + ")";
    }
}
