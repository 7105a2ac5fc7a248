/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;
import io.shieldmath.shield.materials.Provenance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Properties of catalogues and designs: identifiers unique, every number with provenance, and
 * save-then-load giving an equal object. Random cases are built from a seed drawn by QuickTheories.
 */
class CatalogueProperties {

    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    /** The states a built-in number may have: checked with its source named, or honestly marked otherwise. */
    private static final Set<Provenance> BUILT_IN_STATES = EnumSet.of(Provenance.CHECKED,
            Provenance.COMMON_PRACTICE, Provenance.DERIVED, Provenance.FROM_MEMORY);

    /**
     * Every material of the built-in catalogue, drawn by index: its id is kebab case and unique, and every
     * property it carries has a source that was checked against a named publication, or says "from
     * memory", "common practice" or "derived" (no number merely cites a source without a check).
     * Exhaustive over the catalogue.
     */
    @Test
    void builtInIdentifiersAreUniqueAndEveryNumberHasProvenance() {
        Catalogue cat = Catalogue.builtIn();
        Set<String> ids = new HashSet<>();
        for (Material m : cat.all()) {
            assertTrue(ids.add(m.id()), "duplicate " + m.id());
        }
        assertEquals(cat.size(), cat.ids().size());
        for (Material m : cat.all()) {
            assertTrue(m.id().matches("[a-z0-9]+(-[a-z0-9]+)*"), m.id());
            Set<MaterialProperty> present = EnumSet.of(MaterialProperty.CONDUCTIVITY, MaterialProperty.PERMEABILITY,
                    MaterialProperty.PERMITTIVITY, MaterialProperty.DENSITY);
            if (m.temperatureCoefficient().isPresent()) {
                present.add(MaterialProperty.TEMPERATURE_COEFFICIENT);
            }
            if (m.saturation().isPresent()) {
                present.add(MaterialProperty.SATURATION);
            }
            if (m.sheetResistance().isPresent()) {
                present.add(MaterialProperty.SHEET_RESISTANCE);
            }
            assertEquals(present, m.sources().keySet(), m.id());
            for (Map.Entry<MaterialProperty, String> e : m.sources().entrySet()) {
                String s = e.getValue();
                assertFalse(s.isBlank(), m.id() + " " + e.getKey());
                assertTrue(BUILT_IN_STATES.contains(Provenance.of(s)), m.id() + " " + e.getKey() + ": " + s);
            }
            if (m.conductivity().toSiemensPerMetre() > 0) {
                assertTrue(m.temperatureCoefficient().isPresent(), m.id());
            }
            if (m.isFerromagnetic()) {
                assertTrue(m.saturation().isPresent(), m.id());
            }
        }
    }

    @Test
    void anyCatalogueSavedAndReloadedIsEqual() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Catalogue c = RandomMaterials.catalogue(new Random(seed), 2);
            String json = CatalogueFile.toJson(c);
            Catalogue back = CatalogueFile.parse(json);
            assertEquals(c, back, json);
            assertEquals(json, CatalogueFile.toJson(back));
        });
    }

    @Test
    void anyDesignSavedAndReloadedIsEqual() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Catalogue c = Catalogue.of(List.of(RandomMaterials.material(r, RandomMaterials.id(r))));
            Design d = RandomMaterials.design(r, c);
            String json = DesignFile.toJson(d);
            Design back = DesignFile.parse(json, c);
            assertEquals(d, back, json);
            assertEquals(d.barrier(), back.barrier());
        });
    }

    @Test
    void builtInCatalogueRoundTrips() {
        Catalogue cat = Catalogue.builtIn();
        assertEquals(cat, CatalogueFile.parse(CatalogueFile.toJson(cat)));
    }
}
