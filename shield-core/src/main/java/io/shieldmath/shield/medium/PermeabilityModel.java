/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.internal.Require;

/**
 * The relative permeability of a medium as a function of frequency,
 * µr(f) = µ'(f) − j·µ''(f) (time convention e^{jωt}, so loss gives µ'' ≥ 0). Every model
 * in the library (planar, coil coupling, shells) asks the medium's model for µr at the
 * frequency it evaluates, so a permeability roll-off is seen everywhere at once.
 *
 * <p>Three built-in forms: {@link #constant(RelativePermeability)},
 * {@link #relaxation(double, Frequency)} and {@link #table(double[], double[], double[])}.
 * Implementations must be immutable and thread-safe, must return finite values with
 * µ' &gt; 0 and µ'' ≥ 0 for every frequency of 0 Hz or more (0 Hz meaning a static field),
 * and must not allocate: the planar engine calls them once per layer and frequency on
 * its hot path.
 */
public interface PermeabilityModel {

    /**
     * The real part µ' at a frequency.
     *
     * @param hertz the frequency in Hz, 0 or more (0 for a static field)
     * @return µ', finite and greater than 0
     */
    double real(double hertz);

    /**
     * The loss part µ'' at a frequency (µr = µ' − j·µ'').
     *
     * @param hertz the frequency in Hz, 0 or more (0 for a static field)
     * @return µ'', finite and 0 or more
     */
    double loss(double hertz);

    /**
     * The relative permeability at a frequency, as a value object.
     *
     * @param frequency the frequency, not null
     * @return µr at that frequency
     */
    default RelativePermeability at(Frequency frequency) {
        double f = Require.nonNull("frequency", frequency).toHertz();
        return RelativePermeability.ofComplex(real(f), loss(f));
    }

    /**
     * The static (0 Hz) relative permeability µ'(0), used by static shell models.
     *
     * @return µ' at 0 Hz
     */
    default double staticValue() {
        return real(0);
    }

    /**
     * A permeability that does not change with frequency.
     *
     * @param mu the permeability, not null, with µ' from 1e-6 to 1e7
     * @return the model
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if µ' is below 1e-6
     */
    static PermeabilityModel constant(RelativePermeability mu) {
        return ConstantPermeability.of(Require.nonNull("permeability", mu));
    }

    /**
     * A real permeability that does not change with frequency.
     *
     * @param mu µr, from 1e-6 to 1e7
     * @return the model
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if µr is out of range
     */
    static PermeabilityModel constant(double mu) {
        return constant(RelativePermeability.of(mu));
    }

    /**
     * A first-order relaxation µ(f) = µdc / (1 + j·f/fc): µ' = µdc/(1 + x²),
     * µ'' = µdc·x/(1 + x²) with x = f/fc. At fc the magnitude has fallen by √2; far
     * above fc it falls as fc/f.
     *
     * @param muDc   the low-frequency permeability µdc, from 1 to 1e7
     * @param corner the corner frequency fc, not null, from 1 µHz to 10 THz
     * @return the model
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if µdc or the corner is out of range
     */
    static PermeabilityModel relaxation(double muDc, Frequency corner) {
        return new RelaxationPermeability(muDc, Require.nonNull("corner frequency", corner));
    }

    /**
     * A table of measured µ' and µ'' against frequency, interpolated linearly in both
     * parts against log10(f), held at the first and last points outside the table.
     *
     * @param hertz the frequencies in Hz, finite, greater than 0 and strictly increasing; 1 to
     *              100 000 of them
     * @param real  µ' at each frequency, from 1e-6 to 1e7
     * @param loss  µ'' at each frequency, from 0 to 1e7
     * @return the model (the arrays are copied)
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range or the
     *                                  frequencies do not increase
     * @throws IllegalArgumentException if the arrays differ in length, are empty or too long
     */
    static PermeabilityModel table(double[] hertz, double[] real, double[] loss) {
        return new TabulatedPermeability(hertz, real, loss);
    }

    /**
     * The skin depth δ = 1/sqrt(π·f·µ0·|µr|·σ) for this permeability, a convenience for
     * good conductors (where the propagation constant is (1+j)/δ).
     *
     * @param frequency    the frequency, not null
     * @param conductivity σ, not null, greater than 0
     * @return δ
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if σ is zero
     */
    default Length skinDepth(Frequency frequency, Conductivity conductivity) {
        double f = Require.nonNull("frequency", frequency).toHertz();
        double sigma = Require.positive("conductivity", Require.nonNull("conductivity", conductivity)
                .toSiemensPerMetre(), "S/m");
        double mu = Math.hypot(real(f), loss(f)) * io.shieldmath.shield.quantity.PhysicalConstants.MU_0;
        return Length.ofMetres(1 / Math.sqrt(Math.PI * f * mu * sigma));
    }
}
