/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.files.MagnetizationCurveFile;
import io.shieldmath.shield.medium.MagnetizationCurve;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Optional;
import java.util.Set;

/**
 * Magnetization curves (B–H curves) of catalogue materials, by material identifier, for
 * saturation studies. The built-in set is the resource {@code bh-curves.json} in this
 * package, in the format of {@link MagnetizationCurveFile}, with curves for low-carbon
 * steel, silicon steel, 50 % and 80 % nickel-iron and a cobalt-based amorphous alloy; each
 * curve's saturation flux density is the catalogue material's.
 *
 * <pre>{@code
 * MagnetizationCurve mu = MagnetizationCurves.builtIn().get("nickel-iron-80");
 * mu.initialPermeability();          // B1/(µ0·H1) of the first point
 * }</pre>
 *
 * <p>Caution: the built-in curves are typical estimates, marked "from memory" with the
 * standard to check them against. A magnetization curve depends on the anneal, the
 * mechanical stress and the temperature; a design that matters needs the measured curve of
 * the actual material, and degaussing and annealing follow the supplier's instructions.
 *
 * <p>Immutable and thread-safe.
 */
public final class MagnetizationCurves {

    /** The resource holding the built-in curves, relative to this class. */
    static final String RESOURCE = "bh-curves.json";

    private final Map<String, SourcedCurve> byId;

    private MagnetizationCurves(Map<String, SourcedCurve> byId) {
        this.byId = byId;
    }

    private static final class BuiltIn {
        static final MagnetizationCurves INSTANCE = load();

        private static MagnetizationCurves load() {
            try (InputStream in = MagnetizationCurves.class.getResourceAsStream(RESOURCE)) {
                if (in == null) {
                    throw new IllegalStateException("the built-in magnetization curve resource " + RESOURCE
                            + " is missing");
                }
                return MagnetizationCurveFile.read(in, Catalogue.builtIn());
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    /**
     * The built-in curves, read once from the JSON resource in this module against the
     * built-in catalogue.
     *
     * @return the curves
     */
    public static MagnetizationCurves builtIn() {
        return BuiltIn.INSTANCE;
    }

    /**
     * A set of curves.
     *
     * @param curves the curves, not null, none null, at most one per material
     * @return the set, in the order given
     * @throws IllegalArgumentException if two curves are for the same material (it is named)
     */
    public static MagnetizationCurves of(Collection<SourcedCurve> curves) {
        Require.nonNull("curves", curves);
        LinkedHashMap<String, SourcedCurve> map = new LinkedHashMap<>();
        for (SourcedCurve c : curves) {
            Require.nonNull("curve", c);
            if (map.putIfAbsent(c.materialId(), c) != null) {
                throw new IllegalArgumentException("two magnetization curves for material '" + c.materialId() + "'");
            }
        }
        return new MagnetizationCurves(java.util.Collections.unmodifiableMap(map));
    }

    /**
     * The curve of a material, if there is one.
     *
     * @param materialId the identifier, not null
     * @return the curve, or empty
     */
    public Optional<MagnetizationCurve> find(String materialId) {
        SourcedCurve c = byId.get(Require.nonNull("material id", materialId));
        return c == null ? Optional.empty() : Optional.of(c.curve());
    }

    /**
     * The curve of a material.
     *
     * @param materialId the identifier, not null
     * @return the curve
     * @throws NoSuchElementException if there is no curve for it; the message lists those there are
     */
    public MagnetizationCurve get(String materialId) {
        return find(materialId).orElseThrow(() -> new NoSuchElementException("no magnetization curve for material '"
                + materialId + "'; curves exist for " + String.join(", ", byId.keySet())));
    }

    /**
     * The source of a material's curve, if there is a curve.
     *
     * @param materialId the identifier, not null
     * @return the source text, or empty
     */
    public Optional<String> source(String materialId) {
        SourcedCurve c = byId.get(Require.nonNull("material id", materialId));
        return c == null ? Optional.empty() : Optional.of(c.source());
    }

    /**
     * The materials that have a curve, in file order.
     *
     * @return an unmodifiable set
     */
    public Set<String> ids() {
        return byId.keySet();
    }

    /**
     * All curves with their sources, in file order.
     *
     * @return an unmodifiable list
     */
    public List<SourcedCurve> all() {
        return List.copyOf(byId.values());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MagnetizationCurves m && m.byId.equals(byId);
    }

    @Override
    public int hashCode() {
        return byId.hashCode();
    }

    @Override
    public String toString() {
        return "magnetization curves for " + String.join(", ", byId.keySet());
    }
}
