/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Length;

/**
 * One wall of a shell: its medium and its inner and outer radii.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class Wall {

    private final Medium medium;
    private final double inner;
    private final double outer;

    Wall(Medium medium, double inner, double outer) {
        this.medium = medium;
        this.inner = inner;
        this.outer = outer;
    }

    /**
     * The wall's medium.
     *
     * @return the medium
     */
    public Medium medium() {
        return medium;
    }

    /**
     * The inner radius.
     *
     * @return a
     */
    public Length innerRadius() {
        return Length.ofMetres(inner);
    }

    /**
     * The outer radius.
     *
     * @return b
     */
    public Length outerRadius() {
        return Length.ofMetres(outer);
    }

    /**
     * The mean radius R = (a + b)/2, the radius the thin-shell formulas use.
     *
     * @return R
     */
    public Length meanRadius() {
        return Length.ofMetres(meanMetres());
    }

    /**
     * The thickness t = b − a.
     *
     * @return t
     */
    public Length thickness() {
        return Length.ofMetres(thicknessMetres());
    }

    double meanMetres() {
        return 0.5 * (inner + outer);
    }

    double thicknessMetres() {
        return outer - inner;
    }

    double innerMetres() {
        return inner;
    }

    double outerMetres() {
        return outer;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Wall w && w.medium.equals(medium) && w.inner == inner && w.outer == outer;
    }

    @Override
    public int hashCode() {
        return (medium.hashCode() * 31 + Double.hashCode(inner)) * 31 + Double.hashCode(outer);
    }

    @Override
    public String toString() {
        return thickness() + " " + medium.name() + " at radius " + innerRadius();
    }
}
