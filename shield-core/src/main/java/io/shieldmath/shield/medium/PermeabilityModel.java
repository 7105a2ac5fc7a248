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
 * Every model is the intrinsic permeability of the material, which the models combine
 * with σ and the thickness to find the eddy-current screening. A supplier's apparent
 * permeability of a sheet of given thickness already contains that screening: convert it
 * with {@link ApparentPermeability#fromTable} rather than giving it as a table.
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
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the model returns µ' or µ'' out of the range of
     *         {@link io.shieldmath.shield.quantity.RelativePermeability} (a model that breaks the contract of
     *         {@link #real(double)} and {@link #loss(double)})
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
     * A first-order relaxation of the susceptibility, µ(f) = 1 + (µdc − 1)/(1 + j·f/fc):
     * µ' = 1 + (µdc − 1)/(1 + x²), µ'' = (µdc − 1)·x/(1 + x²) with x = f/fc. At fc the
     * susceptibility |µ − 1| has fallen by √2; far above fc it falls as fc/f and µ tends to
     * the free-space value 1 (never below it). Earlier releases used µdc/(1 + j·f/fc), which
     * went below 1 at RF: results above the corner differ from theirs.
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
     * The good-conductor skin depth δ = 1/sqrt(π·f·µ0·|µr|·σ) for this permeability, with
     * the magnitude |µr|: the value of the hand formulas, exact for a real µr (where the
     * propagation constant is (1+j)/δ). For a lossy µr = µ' − jµ'' the field decays faster
     * or slower than this; the exact decay length of the good-conductor propagation
     * constant is {@link #exactSkinDepth(Frequency, Conductivity)}.
     *
     * @param frequency    the frequency, not null, above 0 Hz
     * @param conductivity σ, not null, greater than 0
     * @return δ
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if σ is zero
     */
    default Length skinDepth(Frequency frequency, Conductivity conductivity) {
        double f = Require.nonNull("frequency", frequency).toHertz();
        double sigma = Require.positive("conductivity", Require.nonNull("conductivity", conductivity)
                .toSiemensPerMetre(), "S/m");
        double mu = Math.hypot(real(f), loss(f)) * io.shieldmath.shield.quantity.PhysicalConstants.MU_0;
        return Length.ofMetres(1 / Math.sqrt(Math.PI * f * mu * sigma));
    }

    /**
     * The exact skin depth of a good conductor with this (possibly lossy) permeability:
     * δ = 1/Re(γ) with γ = sqrt(jωµ0µrσ), µr = µ' − jµ'' (displacement current left out, as
     * in every good-conductor formula). Writing µr = |µr|·e^{−jφ} (φ = atan(µ''/µ'), from 0
     * to π/2), γ = sqrt(ωµ0|µr|σ)·e^{j(π/2 − φ)/2}, so δ = 1/(sqrt(ωµ0|µr|σ)·cos(π/4 − φ/2)).
     * It equals {@link #skinDepth(Frequency, Conductivity)} for a real µr and is shorter, by
     * up to a factor √2, as the loss part grows: the absorption of a layer is 8.686·t/δ with
     * this δ.
     *
     * @param frequency    the frequency, not null, above 0 Hz
     * @param conductivity σ, not null, greater than 0
     * @return δ
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if σ is zero
     */
    default Length exactSkinDepth(Frequency frequency, Conductivity conductivity) {
        double f = Require.nonNull("frequency", frequency).toHertz();
        double sigma = Require.positive("conductivity", Require.nonNull("conductivity", conductivity)
                .toSiemensPerMetre(), "S/m");
        double re = real(f);
        double im = loss(f);
        double mu = Math.hypot(re, im) * io.shieldmath.shield.quantity.PhysicalConstants.MU_0;
        double phi = Math.atan2(im, re);
        double k = Math.sqrt(2 * Math.PI * f * mu * sigma) * Math.cos(Math.PI / 4 - phi / 2);
        return Length.ofMetres(1 / k);
    }
}
