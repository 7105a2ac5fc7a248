/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.medium.PermeabilityModel;

/**
 * A permeability model with its magnetisation scaled: µ' = 1 + (µ'₀ − 1)·s, µ'' = µ''₀·s,
 * so a non-magnetic medium (µr = 1) stays non-magnetic under a permeability tolerance.
 */
record ScaledPermeability(PermeabilityModel base, double factor) implements PermeabilityModel {

    @Override
    public double real(double hertz) {
        return 1 + (base.real(hertz) - 1) * factor;
    }

    @Override
    public double loss(double hertz) {
        return base.loss(hertz) * factor;
    }
}
