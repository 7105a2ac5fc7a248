/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.SheetResistance;

/**
 * One layer of a planar barrier: a medium and a thickness.
 *
 * <p>Thickness range: 1 pm to 100 m. Immutable and thread-safe; equality is by value.
 */
public final class Layer {

    /** The smallest layer thickness, in metres (1 pm). */
    public static final double MIN_THICKNESS_METRES = 1e-12;
    /** The largest layer thickness, in metres. */
    public static final double MAX_THICKNESS_METRES = 100;

    /** The thickness given to a film known only by its sheet resistance: 1 µm. */
    public static final Length NOMINAL_FILM_THICKNESS = Length.ofMicrometres(1);

    private final Medium medium;
    private final Length thickness;
    private final boolean gap;

    private Layer(Medium medium, Length thickness, boolean gap) {
        this.medium = medium;
        this.thickness = thickness;
        this.gap = gap;
    }

    /**
     * A layer of a medium.
     *
     * @param medium    the medium or a catalogue material, not null
     * @param thickness the thickness, from 1 pm to 100 m
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is out of range
     */
    public static Layer of(MediumSource medium, Length thickness) {
        return make(medium, thickness, false);
    }

    private static Layer make(MediumSource medium, Length thickness, boolean gap) {
        Medium m = Require.nonNull("medium", Require.nonNull("medium", medium).medium());
        Require.nonNull("thickness", thickness);
        Require.inRange("layer thickness", thickness.toMetres(), MIN_THICKNESS_METRES, MAX_THICKNESS_METRES, "m");
        return new Layer(m, thickness, gap);
    }

    /**
     * An air gap (treated as free space). A gap is marked as such ({@link #isGap()}), so a
     * model that treats gaps apart from walls (a shell's spacing between walls, for one)
     * knows it by the mark, never by which {@code Medium} object it holds.
     *
     * @param thickness the gap, from 1 pm to 100 m
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is out of range
     */
    public static Layer gap(Length thickness) {
        return make(Medium.AIR, thickness, true);
    }

    /**
     * A thin conductive film, plating or coating known by its sheet resistance Rs, given the
     * nominal thickness {@link #NOMINAL_FILM_THICKNESS} and the conductivity σ = 1/(Rs·t).
     * For films much thinner than a skin depth only σ·t matters, so the nominal thickness
     * does not change the result; for a plane wave the shielding effectiveness then tends
     * to 20·log10(1 + η0/(2Rs)).
     *
     * @param rs the sheet resistance, not null
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if σ = 1/(Rs·1 µm) is not finite
     */
    public static Layer film(SheetResistance rs) {
        return film(rs, NOMINAL_FILM_THICKNESS);
    }

    /**
     * A thin film of known thickness and sheet resistance (σ = 1/(Rs·t)).
     *
     * @param rs        the sheet resistance, not null
     * @param thickness the film thickness, from 1 pm to 100 m
     * @return the layer
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness or the conductivity 1/(Rs·t) is out of range
     */
    public static Layer film(SheetResistance rs, Length thickness) {
        Require.nonNull("sheet resistance", rs);
        Require.nonNull("thickness", thickness);
        double sigma = 1 / (rs.toOhmsPerSquare() * thickness.toMetres());
        Medium m = Medium.conductor("film of " + rs, Conductivity.ofSiemensPerMetre(sigma), 1);
        return of(m, thickness);
    }

    /**
     * The medium.
     *
     * @return the medium
     */
    public Medium medium() {
        return medium;
    }

    /**
     * Whether this layer is an air gap made by {@link #gap(Length)} (a layer of any medium
     * made by {@link #of(MediumSource, Length)} is not, even of air).
     *
     * @return true for a gap
     */
    public boolean isGap() {
        return gap;
    }

    /**
     * The thickness.
     *
     * @return t
     */
    public Length thickness() {
        return thickness;
    }

    /**
     * A copy with another thickness.
     *
     * @param newThickness the thickness, from 1 pm to 100 m
     * @return the new layer; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m
     */
    public Layer withThickness(Length newThickness) {
        return make(medium, newThickness, gap);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Layer l && l.gap == gap && l.medium.equals(medium) && l.thickness.equals(thickness);
    }

    @Override
    public int hashCode() {
        return (medium.hashCode() * 31 + thickness.hashCode()) * 2 + (gap ? 1 : 0);
    }

    @Override
    public String toString() {
        return thickness + " " + medium.name();
    }
}
