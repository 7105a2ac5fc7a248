/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.materials.files.CatalogueFile;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.internal.Require;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Optional;
import java.util.Set;
import java.util.function.Predicate;

/**
 * An ordered set of materials with unique identifiers: the built-in catalogue, a user
 * catalogue read from a file, or a combination where the user's entries override.
 *
 * <pre>{@code
 * Catalogue cat = Catalogue.builtIn().extendedWith(CatalogueFile.read(Path.of("our-alloys.json")));
 * Material m = cat.get("nickel-iron-80");
 * Catalogue light = cat.conductivityAbove(Conductivity.ofMegasiemensPerMetre(20))
 *                      .densityBelow(Density.ofKilogramsPerCubicMetre(3000));
 * }</pre>
 *
 * <p>The built-in catalogue is the JSON resource {@code catalogue.json} in this package,
 * in the format of {@link CatalogueFile}; every number in it either was checked against a
 * named published source, with the address where it was read, or says "from memory" (with
 * the source to check it against and why it was not) or "common practice"; its
 * {@link Provenance} tells which, and {@link #withProvenance(MaterialProperty, Provenance)}
 * filters on it. Where a reference gives a range, or references disagree by more than about
 * 3 %, the entry stores the range ({@link Material#range(MaterialProperty)}) and keeps the
 * lower conductivity, the cautious choice for shielding. The values are typical, not
 * guaranteed; verify designs by measurement.
 *
 * <p>Immutable and thread-safe; equality is by value (materials and their order).
 */
public final class Catalogue {

    /** The resource holding the built-in catalogue, relative to this class. */
    static final String RESOURCE = "catalogue.json";

    private static final Catalogue EMPTY = new Catalogue(new LinkedHashMap<>());

    private final Map<String, Material> byId;
    private final List<Material> all;

    private Catalogue(LinkedHashMap<String, Material> byId) {
        this.byId = Collections.unmodifiableMap(byId);
        this.all = List.copyOf(byId.values());
    }

    private static final class BuiltIn {
        static final Catalogue INSTANCE = load();

        /** The one use of the file formats from this package: the resource is a catalogue file. */
        private static Catalogue load() {
            try (InputStream in = Catalogue.class.getResourceAsStream(RESOURCE)) {
                if (in == null) {
                    throw new IllegalStateException("the built-in catalogue resource " + RESOURCE + " is missing");
                }
                return CatalogueFile.read(in);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    /**
     * The built-in catalogue, read once from the JSON resource in this module.
     *
     * @return the built-in catalogue
     */
    public static Catalogue builtIn() {
        return BuiltIn.INSTANCE;
    }

    /**
     * The empty catalogue.
     *
     * @return a catalogue without materials
     */
    public static Catalogue empty() {
        return EMPTY;
    }

    /**
     * A catalogue of the given materials, in that order.
     *
     * @param materials the materials, none null, identifiers unique
     * @return the catalogue
     * @throws IllegalArgumentException if two materials share an identifier
     */
    public static Catalogue of(Collection<Material> materials) {
        Require.nonNull("materials", materials);
        LinkedHashMap<String, Material> map = new LinkedHashMap<>();
        for (Material m : materials) {
            Require.nonNull("material", m);
            if (map.putIfAbsent(m.id(), m) != null) {
                throw new IllegalArgumentException("duplicate material id \"" + m.id() + "\"");
            }
        }
        return map.isEmpty() ? EMPTY : new Catalogue(map);
    }

    /**
     * The material with an identifier.
     *
     * @param id the identifier, not null
     * @return the material
     * @throws NoSuchElementException if there is none; the message lists similar identifiers
     */
    public Material get(String id) {
        Material m = byId.get(Require.nonNull("id", id));
        if (m == null) {
            throw new NoSuchElementException(unknown(id));
        }
        return m;
    }

    /**
     * The message for an identifier this catalogue does not hold, naming up to five similar
     * identifiers it does hold.
     *
     * @param id the identifier, not null
     * @return for example {@code "no material \"coper\" in the catalogue; did you mean copper-annealed?"}
     */
    public String unknown(String id) {
        Require.nonNull("id", id);
        List<String> near = near(id);
        return "no material \"" + id + "\" in the catalogue" + (near.isEmpty() ? "" : "; did you mean "
                + String.join(", ", near) + "?");
    }

    private List<String> near(String id) {
        String key = id.toLowerCase(java.util.Locale.ROOT);
        List<String> hits = new ArrayList<>();
        for (String known : byId.keySet()) {
            int d = distance(key, known);
            if (d <= Math.max(2, known.length() / 4) || known.contains(key) || key.contains(known)) {
                hits.add(known);
            }
        }
        hits.sort(Comparator.comparingInt((String k) -> distance(key, k)).thenComparing(k -> k));
        return hits.size() > 5 ? hits.subList(0, 5) : hits;
    }

    /** Levenshtein distance, bounded to short strings (identifiers are at most 64 characters). */
    private static int distance(String a, String b) {
        if (a.length() > 200) {
            return Integer.MAX_VALUE;
        }
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    /**
     * The material with an identifier, if there is one.
     *
     * @param id the identifier, not null
     * @return the material, or empty
     */
    public Optional<Material> find(String id) {
        return Optional.ofNullable(byId.get(Require.nonNull("id", id)));
    }

    /**
     * Whether a material with this identifier is present.
     *
     * @param id the identifier, not null
     * @return true if present
     */
    public boolean contains(String id) {
        return byId.containsKey(Require.nonNull("id", id));
    }

    /**
     * All materials, in catalogue order.
     *
     * @return an unmodifiable list
     */
    public List<Material> all() {
        return all;
    }

    /**
     * The identifiers, in catalogue order.
     *
     * @return an unmodifiable set
     */
    public Set<String> ids() {
        return byId.keySet();
    }

    /**
     * The number of materials.
     *
     * @return 0 or more
     */
    public int size() {
        return all.size();
    }

    /**
     * The materials that pass a test, in catalogue order.
     *
     * @param test the test, not null
     * @return a new catalogue; this one is unchanged
     */
    public Catalogue filter(Predicate<Material> test) {
        Require.nonNull("test", test);
        LinkedHashMap<String, Material> map = new LinkedHashMap<>();
        for (Material m : all) {
            if (test.test(m)) {
                map.put(m.id(), m);
            }
        }
        return map.size() == all.size() ? this : new Catalogue(map);
    }

    /**
     * The materials whose conductivity at 20 °C is above a value.
     *
     * @param sigma the bound (exclusive), not null
     * @return a new catalogue
     */
    public Catalogue conductivityAbove(Conductivity sigma) {
        Require.nonNull("conductivity", sigma);
        return filter(m -> m.conductivity().compareTo(sigma) > 0);
    }

    /**
     * The materials whose density is below a value.
     *
     * @param rho the bound (exclusive), not null
     * @return a new catalogue
     */
    public Catalogue densityBelow(Density rho) {
        Require.nonNull("density", rho);
        return filter(m -> m.density().compareTo(rho) < 0);
    }

    /**
     * The materials whose number for a property has a provenance, for example those whose
     * conductivity was checked against a published source:
     * {@code cat.withProvenance(MaterialProperty.CONDUCTIVITY, Provenance.CHECKED)}.
     *
     * @param property   the property, not null
     * @param provenance the provenance, not null
     * @return a new catalogue; materials without the property are left out
     */
    public Catalogue withProvenance(MaterialProperty property, Provenance provenance) {
        Require.nonNull("property", property);
        Require.nonNull("provenance", provenance);
        return filter(m -> m.provenance(property).filter(p -> p == provenance).isPresent());
    }

    /**
     * The ferromagnetic materials (static µr of {@value Material#FERROMAGNETIC_MU} or more).
     *
     * @return a new catalogue
     */
    public Catalogue ferromagnetic() {
        return filter(Material::isFerromagnetic);
    }

    /**
     * This catalogue with another's materials: an entry of {@code other} replaces the
     * entry of this catalogue with the same identifier in its place; new entries follow
     * in {@code other}'s order.
     *
     * @param other the overriding catalogue, not null
     * @return a new catalogue; this one is unchanged
     */
    public Catalogue extendedWith(Catalogue other) {
        Require.nonNull("other", other);
        if (other.all.isEmpty()) {
            return this;
        }
        LinkedHashMap<String, Material> map = new LinkedHashMap<>(byId);
        for (Material m : other.all) {
            map.put(m.id(), m);
        }
        return new Catalogue(map);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Catalogue c && c.all.equals(all);
    }

    @Override
    public int hashCode() {
        return all.hashCode();
    }

    @Override
    public String toString() {
        return "catalogue of " + all.size() + " materials";
    }
}
