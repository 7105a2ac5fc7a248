/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Length;
import java.util.Objects;

/**
 * A coil of an axisymmetric design as a file holds it: mean radius and turns, and optionally
 * a rectangular winding section and the rings it is modelled by, with the lengths as given.
 * Built at once with {@link Coil#loop(Length, int)} and
 * {@link Coil#withWinding(Length, Length, int, int)}.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class DesignCoil {

    final Length radius;
    final int turns;
    final Length width;
    final Length length;
    final int radialRings;
    final int axialRings;
    private final Coil coil;

    private DesignCoil(Length radius, int turns, Length width, Length length, int radialRings, int axialRings) {
        this.radius = radius;
        this.turns = turns;
        this.width = width;
        this.length = length;
        this.radialRings = radialRings;
        this.axialRings = axialRings;
        Coil c = Coil.loop(radius, turns);
        this.coil = width == null ? c : c.withWinding(width, length, radialRings, axialRings);
    }

    /**
     * A thin loop, as {@link Coil#loop(Length, int)}.
     *
     * @param radius the loop radius, 100 µm to 10 m, not null
     * @param turns  the number of turns, 1 to 1 000 000
     * @return the coil
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public static DesignCoil loop(Length radius, int turns) {
        return new DesignCoil(Require.nonNull("coil radius", radius), turns, null, null, 1, 1);
    }

    /**
     * This coil with a rectangular winding section, as
     * {@link Coil#withWinding(Length, Length, int, int)}.
     *
     * @param radialWidth the winding's radial width, less than twice the mean radius, not null
     * @param axialLength the winding's axial length, up to 10 m, not null
     * @param radialRings the rings across the width, 1 to {@value Coil#MAX_RINGS_PER_DIRECTION}
     * @param axialRings  the rings along the length, 1 to {@value Coil#MAX_RINGS_PER_DIRECTION}
     * @return the new coil; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a value is out of range
     */
    public DesignCoil withWinding(Length radialWidth, Length axialLength, int radialRings, int axialRings) {
        return new DesignCoil(radius, turns, Require.nonNull("winding width", radialWidth),
                Require.nonNull("winding length", axialLength), radialRings, axialRings);
    }

    /**
     * The coil for the solver.
     *
     * @return the coil
     */
    public Coil coil() {
        return coil;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DesignCoil c && c.radius.equals(radius) && c.turns == turns
                && Objects.equals(c.width, width) && Objects.equals(c.length, length)
                && c.radialRings == radialRings && c.axialRings == axialRings;
    }

    @Override
    public int hashCode() {
        return Objects.hash(radius, turns, width, length, radialRings, axialRings);
    }

    @Override
    public String toString() {
        return coil.toString();
    }
}
