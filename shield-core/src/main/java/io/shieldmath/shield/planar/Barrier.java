/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.StackAccess;
import io.shieldmath.shield.internal.StackArrays;
import io.shieldmath.shield.quantity.SheetResistance;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * An infinite planar barrier: an ordered stack of layers, the first facing the source.
 * Built fluently:
 *
 * <pre>{@code
 * Barrier b = Barrier.of(copper, mil(21)).thenGap(mm(2)).then(nickelIron, mm(0.5));
 * PlanarResult r = b.facing(IncidentField.planeWave()).at(kHz(10));
 * }</pre>
 *
 * <p>At most {@value #MAX_LAYERS} layers; each layer's conductivity at most 1e10 S/m.
 * Immutable and thread-safe: one barrier may be evaluated from many threads at once.
 * Every {@code then…} method returns a new barrier and leaves this one untouched.
 */
public final class Barrier {

    /** The largest number of layers in one barrier. */
    public static final int MAX_LAYERS = 256;

    static {
        // Lets the coil-coupling model read the arrays below without a public accessor.
        StackAccess.registerBarrier(b -> ((Barrier) b).stack);
    }

    private final List<Layer> layers;
    /** Primitive copies for the hot path, indexed like the layers (also read through {@code StackAccess}). */
    final StackArrays stack;

    private Barrier(List<Layer> layers) {
        if (layers.isEmpty()) {
            throw new IllegalArgumentException("a barrier needs at least one layer");
        }
        if (layers.size() > MAX_LAYERS) {
            throw new IllegalArgumentException("a barrier has at most " + MAX_LAYERS + " layers; got "
                    + layers.size());
        }
        this.layers = layers;
        this.stack = StackArrays.of("layer", layers.size(), i -> layers.get(i).medium(),
                i -> layers.get(i).thickness().toMetres(), i -> layers.get(i).isGap());
    }

    /** An unmodifiable copy that names a null layer by its number before anything else can throw. */
    private static List<Layer> checked(List<Layer> given) {
        List<Layer> copy = new ArrayList<>(given.size());
        for (int i = 0; i < given.size(); i++) {
            copy.add(Require.nonNull("layer " + (i + 1), given.get(i)));
        }
        return Collections.unmodifiableList(copy);
    }

    /**
     * A barrier of one layer.
     *
     * @param medium    the medium or catalogue material, not null
     * @param thickness its thickness, from 1 pm to 100 m
     * @return the barrier
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m or the
     *         conductivity is above 1e10 S/m
     */
    public static Barrier of(MediumSource medium, Length thickness) {
        return of(Layer.of(medium, thickness));
    }

    /**
     * A barrier of the given layers, the first facing the source.
     *
     * @param layers one or more layers, none null
     * @return the barrier
     * @throws IllegalArgumentException if there are no layers or more than {@value #MAX_LAYERS}
     * @throws NullPointerException if the array or a layer is null (the message names the layer's number)
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a layer's conductivity is above 1e10 S/m
     */
    public static Barrier of(Layer... layers) {
        return new Barrier(checked(java.util.Arrays.asList(Require.nonNull("layers", layers))));
    }

    /**
     * A barrier of the given layers, the first facing the source.
     *
     * @param layers one or more layers, none null
     * @return the barrier
     * @throws IllegalArgumentException if there are no layers or more than {@value #MAX_LAYERS}
     * @throws NullPointerException if the list or a layer is null (the message names the layer's number)
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a layer's conductivity is above 1e10 S/m
     */
    public static Barrier of(List<Layer> layers) {
        return new Barrier(checked(Require.nonNull("layers", layers)));
    }

    /**
     * This barrier with one more layer on the side away from the source.
     *
     * @param medium    the medium or catalogue material, not null
     * @param thickness its thickness
     * @return the new barrier
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m or the
     *         conductivity is above 1e10 S/m
     * @throws IllegalArgumentException if the barrier would have more than {@value #MAX_LAYERS} layers
     */
    public Barrier then(MediumSource medium, Length thickness) {
        return then(Layer.of(medium, thickness));
    }

    /**
     * This barrier with one more layer on the side away from the source.
     *
     * @param layer the layer, not null
     * @return the new barrier
     * @throws NullPointerException if the layer is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the layer's conductivity is above 1e10 S/m
     * @throws IllegalArgumentException if the barrier would have more than {@value #MAX_LAYERS} layers
     */
    public Barrier then(Layer layer) {
        List<Layer> l = new ArrayList<>(layers);
        l.add(Require.nonNull("layer", layer));
        return new Barrier(Collections.unmodifiableList(l));
    }

    /**
     * This barrier followed by an air gap.
     *
     * @param thickness the gap
     * @return the new barrier
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the thickness is outside 1 pm to 100 m
     * @throws IllegalArgumentException if the barrier would have more than {@value #MAX_LAYERS} layers
     */
    public Barrier thenGap(Length thickness) {
        return then(Layer.gap(thickness));
    }

    /**
     * This barrier followed by a thin film known by its sheet resistance.
     *
     * @param rs the sheet resistance
     * @return the new barrier
     * @see Layer#film(SheetResistance)
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the film's conductivity 1/(Rs·1 µm) is above 1e10 S/m
     * @throws IllegalArgumentException if the barrier would have more than {@value #MAX_LAYERS} layers
     */
    public Barrier thenFilm(SheetResistance rs) {
        return then(Layer.film(rs));
    }

    /**
     * This barrier with layer {@code index} replaced.
     *
     * @param index the layer's index, 0 for the source-facing layer
     * @param layer the new layer, not null
     * @return the new barrier
     * @throws IndexOutOfBoundsException if there is no such layer
     */
    public Barrier withLayer(int index, Layer layer) {
        List<Layer> l = new ArrayList<>(layers);
        l.set(index, Require.nonNull("layer", layer));
        return new Barrier(Collections.unmodifiableList(l));
    }

    /**
     * The same layers in the opposite order (the source now faces the last layer).
     *
     * @return the reversed barrier
     */
    public Barrier reversed() {
        List<Layer> l = new ArrayList<>(layers);
        Collections.reverse(l);
        return new Barrier(Collections.unmodifiableList(l));
    }

    /**
     * The layers, the source-facing one first.
     *
     * @return an unmodifiable list
     */
    public List<Layer> layers() {
        return layers;
    }

    /**
     * The number of layers.
     *
     * @return 1 or more
     */
    public int layerCount() {
        return layers.size();
    }

    /**
     * The total thickness, gaps included.
     *
     * @return the sum of the layer thicknesses
     */
    public Length totalThickness() {
        return Length.ofMetres(stack.total());
    }

    /**
     * This barrier in a field, ready to evaluate at frequencies.
     *
     * @param field the incident field, not null
     * @return the evaluation
     * @throws NullPointerException if the field is null
     */
    public PlanarEvaluation facing(IncidentField field) {
        return new PlanarEvaluation(this, Require.nonNull("field", field));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Barrier b && b.layers.equals(layers);
    }

    @Override
    public int hashCode() {
        return layers.hashCode();
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder();
        for (Layer l : layers) {
            if (s.length() > 0) {
                s.append(" | ");
            }
            s.append(l);
        }
        return s.toString();
    }
}
