/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.medium.ConstantPermeability;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import java.util.function.IntFunction;
import java.util.function.IntPredicate;
import java.util.function.IntToDoubleFunction;

/**
 * The primitive arrays of a stack of layers, indexed like the layers, for the engines'
 * hot paths: thickness in m, conductivity in S/m, relative permittivity, the permeability
 * model and the gap mark of each layer. Built once per barrier, shell or coupling case by
 * the one loop here, and checked there (conductivity at most {@value #MAX_SIEMENS_PER_METRE} S/m).
 *
 * <p>The accessors return the arrays themselves, not copies, so that the engines read
 * them without allocation; no caller may write to them. Immutable in that sense and
 * thread-safe.
 */
public final class StackArrays {

    /** The largest conductivity a layer may have, S/m. */
    public static final double MAX_SIEMENS_PER_METRE = 1e10;

    private final double[] thickness;
    private final double[] sigma;
    private final double[] epsilon;
    private final PermeabilityModel[] mu;
    private final boolean[] gap;
    private final double total;
    private final boolean freeSpaceOnly;

    private StackArrays(double[] t, double[] s, double[] e, PermeabilityModel[] m, boolean[] g, double total,
                        boolean freeSpaceOnly) {
        this.thickness = t;
        this.sigma = s;
        this.epsilon = e;
        this.mu = m;
        this.gap = g;
        this.total = total;
        this.freeSpaceOnly = freeSpaceOnly;
    }

    /**
     * The arrays of {@code n} layers.
     *
     * @param noun      what a layer is called in messages ("layer", "wall")
     * @param n         the number of layers, 0 or more
     * @param medium    the medium of layer i, not null
     * @param metres    the thickness of layer i in m
     * @param isGap     whether layer i is a gap
     * @return the arrays
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a conductivity is above
     *         {@value #MAX_SIEMENS_PER_METRE} S/m
     */
    public static StackArrays of(String noun, int n, IntFunction<Medium> medium, IntToDoubleFunction metres,
                                 IntPredicate isGap) {
        return of(i -> noun + " " + (i + 1), n, medium, metres, isGap);
    }

    /**
     * The arrays of {@code n} layers.
     *
     * @param label     what layer i is called in messages, for example "wall 2"
     * @param n         the number of layers, 0 or more
     * @param medium    the medium of layer i, not null
     * @param metres    the thickness of layer i in m
     * @param isGap     whether layer i is a gap
     * @return the arrays
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a conductivity is above
     *         {@value #MAX_SIEMENS_PER_METRE} S/m
     */
    public static StackArrays of(IntFunction<String> label, int n, IntFunction<Medium> medium,
                                 IntToDoubleFunction metres, IntPredicate isGap) {
        double[] t = new double[n];
        double[] s = new double[n];
        double[] e = new double[n];
        PermeabilityModel[] m = new PermeabilityModel[n];
        boolean[] g = new boolean[n];
        double sum = 0;
        boolean vacuum = true;
        for (int i = 0; i < n; i++) {
            Medium md = medium.apply(i);
            t[i] = metres.applyAsDouble(i);
            s[i] = Require.inRange(label.apply(i) + " conductivity", md.conductivity().toSiemensPerMetre(),
                    0, MAX_SIEMENS_PER_METRE, "S/m");
            e[i] = md.permittivity().value();
            m[i] = md.permeability();
            g[i] = isGap.test(i);
            sum += t[i];
            vacuum &= s[i] == 0 && e[i] == 1 && m[i].equals(ConstantPermeability.ONE);
        }
        return new StackArrays(t, s, e, m, g, sum, vacuum);
    }

    /**
     * The thickness of each layer, m (the array itself: do not modify).
     *
     * @return the thicknesses
     */
    public double[] thickness() {
        return thickness;
    }

    /**
     * The conductivity of each layer, S/m (the array itself: do not modify).
     *
     * @return the conductivities
     */
    public double[] sigma() {
        return sigma;
    }

    /**
     * The relative permittivity of each layer (the array itself: do not modify).
     *
     * @return the permittivities
     */
    public double[] epsilon() {
        return epsilon;
    }

    /**
     * The permeability model of each layer (the array itself: do not modify).
     *
     * @return the models
     */
    public PermeabilityModel[] mu() {
        return mu;
    }

    /**
     * Whether each layer is a gap (the array itself: do not modify).
     *
     * @return the gap marks
     */
    public boolean[] gap() {
        return gap;
    }

    /**
     * The total thickness, m.
     *
     * @return the sum of the thicknesses
     */
    public double total() {
        return total;
    }

    /**
     * Whether every layer is free space (σ = 0, εr = 1, µr = 1): such a stack is its own
     * insertion-loss reference.
     *
     * @return true if the stack is all free space
     */
    public boolean freeSpaceOnly() {
        return freeSpaceOnly;
    }

    /**
     * The inner radius of each layer of a shell whose first layer starts at {@code innerRadius}
     * (a new array: the running sum of the thicknesses).
     *
     * @param innerRadius the radius where the first layer starts, m
     * @return the inner radii, m
     */
    public double[] innerRadii(double innerRadius) {
        double[] r = new double[thickness.length];
        double at = innerRadius;
        for (int i = 0; i < r.length; i++) {
            r[i] = at;
            at += thickness[i];
        }
        return r;
    }

    /**
     * The outer radius of each layer of a shell whose first layer starts at {@code innerRadius}
     * (a new array, consistent with {@link #innerRadii(double)}).
     *
     * @param innerRadius the radius where the first layer starts, m
     * @return the outer radii, m
     */
    public double[] outerRadii(double innerRadius) {
        double[] r = new double[thickness.length];
        double at = innerRadius;
        for (int i = 0; i < r.length; i++) {
            at += thickness[i];
            r[i] = at;
        }
        return r;
    }

    /**
     * The permeability models with {@code null} for each gap, the form the radial kernel
     * reads (a new array).
     *
     * @return the models, null where a layer is a gap
     */
    public PermeabilityModel[] muWithGapsAsNull() {
        PermeabilityModel[] m = mu.clone();
        for (int i = 0; i < m.length; i++) {
            if (gap[i]) {
                m[i] = null;
            }
        }
        return m;
    }

    /**
     * The number of layers.
     *
     * @return n
     */
    public int size() {
        return thickness.length;
    }
}
