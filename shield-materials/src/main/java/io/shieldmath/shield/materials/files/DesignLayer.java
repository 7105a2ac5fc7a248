/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.Material;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.Temperature;
import io.shieldmath.shield.internal.Require;
import java.util.Objects;
import java.util.Optional;

/**
 * One layer of a {@link Design} as the user wrote it: a catalogue material (optionally at
 * an operating temperature), an inline medium, or an air gap, with its thickness. Unlike
 * a core {@link Layer} it remembers the material reference, so a design file written back
 * still names the material by its identifier.
 *
 * <p>Thickness range: 1 pm to 100 m. Immutable and thread-safe; equality is by value.
 */
public final class DesignLayer {

    /** What a design layer refers to. */
    public enum Kind {
        /** A catalogue material, referred to by its identifier. */
        MATERIAL,
        /** A medium given inline in the design. */
        MEDIUM,
        /** An air gap (free space). */
        GAP
    }

    private final Kind kind;
    private final Material material;
    private final Temperature temperature;
    private final Layer layer;

    private DesignLayer(Kind kind, Material material, Temperature temperature, Medium medium, Length thickness) {
        this.kind = kind;
        this.material = material;
        this.temperature = temperature;
        this.layer = kind == Kind.GAP ? Layer.gap(thickness) : Layer.of(medium, thickness);
    }

    /**
     * A layer of a catalogue material at 20 °C.
     *
     * @param material  the material, not null
     * @param thickness the thickness, 1 pm to 100 m
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m
     */
    public static DesignLayer of(Material material, Length thickness) {
        Require.nonNull("material", material);
        return new DesignLayer(Kind.MATERIAL, material, null, material.medium(), thickness);
    }

    /**
     * A layer of a finish known by sheet resistance, at its nominal thickness.
     *
     * @param material the material, not null, with a nominal thickness
     * @return the layer
     * @throws IllegalArgumentException if the material has no nominal thickness
     */
    public static DesignLayer of(Material material) {
        Require.nonNull("material", material);
        Length t = material.nominalThickness().orElseThrow(() -> new IllegalArgumentException(material.id()
                + " is a bulk material: give the layer thickness"));
        return of(material, t);
    }

    /**
     * A layer of a catalogue material at an operating temperature.
     *
     * @param material  the material, not null
     * @param thickness the thickness, 1 pm to 100 m
     * @param temperature the temperature, not null (see {@link Material#conductivityAt(Temperature)})
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the temperature is out of range
     */
    public static DesignLayer of(Material material, Length thickness, Temperature temperature) {
        Require.nonNull("material", material);
        Require.nonNull("temperature", temperature);
        return new DesignLayer(Kind.MATERIAL, material, temperature, material.atTemperature(temperature), thickness);
    }

    /**
     * A layer of a medium given inline.
     *
     * @param medium    the medium, not null
     * @param thickness the thickness, 1 pm to 100 m
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m
     */
    public static DesignLayer medium(Medium medium, Length thickness) {
        return new DesignLayer(Kind.MEDIUM, null, null, Require.nonNull("medium", medium), thickness);
    }

    /**
     * An air gap.
     *
     * @param thickness the gap, 1 pm to 100 m
     * @return the layer
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m
     */
    public static DesignLayer gap(Length thickness) {
        return new DesignLayer(Kind.GAP, null, null, Medium.AIR, thickness);
    }

    /**
     * What this layer refers to.
     *
     * @return the kind
     */
    public Kind kind() {
        return kind;
    }

    /**
     * The catalogue material, for {@link Kind#MATERIAL} layers.
     *
     * @return the material, or empty
     */
    public Optional<Material> material() {
        return Optional.ofNullable(material);
    }

    /**
     * The operating temperature, when one was given for a material layer.
     *
     * @return the temperature, or empty (20 °C)
     */
    public Optional<Temperature> temperature() {
        return Optional.ofNullable(temperature);
    }

    /**
     * The medium computed with (the material at its temperature, the inline medium, or air).
     *
     * @return the medium
     */
    public Medium medium() {
        return layer.medium();
    }

    /**
     * The thickness.
     *
     * @return t
     */
    public Length thickness() {
        return layer.thickness();
    }

    /**
     * The core layer for the planar engine.
     *
     * @return the layer
     */
    public Layer toLayer() {
        return layer;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DesignLayer d && d.kind == kind && Objects.equals(d.material, material)
                && Objects.equals(d.temperature, temperature) && d.layer.equals(layer);
    }

    @Override
    public int hashCode() {
        return Objects.hash(kind, material, temperature, layer);
    }

    /**
     * A description such as {@code "0.5 mm nickel-iron-80 at 60 °C"} or {@code "2 mm gap"}.
     *
     * @return the description
     */
    @Override
    public String toString() {
        switch (kind) {
            case MATERIAL:
                return thickness() + " " + material.id() + (temperature == null ? "" : " at " + temperature);
            case MEDIUM:
                return thickness() + " " + medium().name();
            default:
                return thickness() + " gap";
        }
    }
}
