/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.internal.Node;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;
import io.shieldmath.shield.materials.Provenance;
import io.shieldmath.shield.materials.TypicalRange;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Strict reading of catalogue and design files: each refusal names the path, line and column. */
class MaterialFileTest {

    private static final String FOIL = String.join("\n",
            "{",
            "  \"format\": \"shield-catalogue\",",
            "  \"version\": 1,",
            "  \"materials\": [",
            "    {",
            "      \"id\": \"our-foil\",",
            "      \"name\": \"Our foil\",",
            "      \"conductivity\": {\"value\": \"35 MS/m\", \"source\": \"invented for this test\"},",
            "      \"temperatureCoefficient\": {\"value\": \"0.004 /K\", \"source\": \"invented for this test\"},",
            "      \"permeability\": {\"model\": \"constant\", \"value\": \"1\", \"source\": \"invented\"},",
            "      \"permittivity\": {\"value\": 1, \"source\": \"invented for this test\"},",
            "      \"density\": {\"value\": \"2700 kg/m3\", \"source\": \"invented for this test\"}",
            "    }",
            "  ]",
            "}");

    private static MaterialFileException refused(String json) {
        return assertThrows(MaterialFileException.class, () -> CatalogueFile.parse(json));
    }

    @Test
    void readsAValidFile() {
        Material m = CatalogueFile.parse(FOIL).get("our-foil");
        assertEquals(35e6, m.conductivity().toSiemensPerMetre(), 0);
        assertEquals("invented for this test", m.source(MaterialProperty.DENSITY).orElseThrow());
    }

    @Test
    void unknownFieldIsRefusedWithItsLocation() {
        MaterialFileException e = refused(FOIL.replace("\"name\": \"Our foil\",", "\"name\": \"Our foil\", \"colour\": \"red\","));
        assertEquals("$.materials[0].colour", e.path());
        assertEquals(7, e.line());
        // "      \"name\": \"Our foil\", \"colour\": " is 36 characters, so the value starts in column 37.
        assertEquals(37, e.column());
        assertTrue(e.problem().contains("unknown field \"colour\""), e.getMessage());
    }

    @Test
    void missingUnitIsRefused() {
        MaterialFileException e = refused(FOIL.replace("\"2700 kg/m3\"", "\"2700\""));
        assertEquals("$.materials[0].density.value", e.path());
        assertEquals(12, e.line());
        assertTrue(e.problem().contains("no unit") || e.problem().contains("unit"), e.getMessage());
        MaterialFileException n = refused(FOIL.replace("\"35 MS/m\"", "35"));
        assertTrue(n.problem().contains("with a unit"), n.getMessage());
    }

    @Test
    void unphysicalValuesAreRefused() {
        assertEquals("$.materials[0].conductivity.value", refused(FOIL.replace("35 MS/m", "-35 MS/m")).path());
        assertEquals("$.materials[0].density", refused(FOIL.replace("2700 kg/m3", "2.7e6 kg/m3")).path());
        assertEquals("$.materials[0].permittivity.value", refused(FOIL.replace("\"value\": 1,", "\"value\": 0.5,")).path());
        assertEquals("$.materials[0].permittivity.value", refused(FOIL.replace("\"value\": 1,", "\"value\": 1e999,")).path());
        assertEquals("$.materials[0].temperatureCoefficient",
                refused(FOIL.replace("0.004 /K", "0.5 /K")).path());
    }

    @Test
    void missingSourceAndMissingPropertiesAreRefused() {
        MaterialFileException s = refused(FOIL.replace("{\"value\": \"2700 kg/m3\", \"source\": \"invented for this test\"}",
                "{\"value\": \"2700 kg/m3\"}"));
        assertEquals("$.materials[0].density", s.path());
        assertTrue(s.problem().contains("missing field \"source\""), s.getMessage());
        MaterialFileException f = refused(FOIL.replace("\"value\": \"1\", \"source\": \"invented\"",
                "\"value\": \"20000\", \"source\": \"invented\""));
        assertTrue(f.problem().contains("saturation"), f.getMessage());
    }

    @Test
    void duplicateIdsAndDuplicateKeysAreRefused() {
        String entry = FOIL.substring(FOIL.indexOf("    {"), FOIL.indexOf("    }") + 5);
        String two = FOIL.replace(entry, entry + ",\n" + entry);
        MaterialFileException e = refused(two);
        assertEquals("$.materials[1].id", e.path());
        assertEquals(15, e.line());
        assertTrue(e.problem().contains("duplicate material id"), e.getMessage());
        MaterialFileException k = refused(FOIL.replace("\"version\": 1,", "\"version\": 1, \"version\": 1,"));
        assertEquals("$.version", k.path());
        assertTrue(k.problem().contains("duplicate field"), k.getMessage());
    }

    @Test
    void malformedAndOversizedDocumentsAreRefused() {
        assertEquals(1, refused("").line());
        assertTrue(refused(FOIL.substring(0, 200)).problem().startsWith("not valid JSON"));
        assertTrue(refused("[".repeat(100_000)).problem().contains("not valid JSON"));
        assertTrue(refused(FOIL + " {}").problem().contains("after the end"));
        assertTrue(refused(FOIL.replace("\"version\": 1", "\"version\": \"1\"")).problem().contains("a number"));
        assertTrue(refused(FOIL.replace("shield-catalogue", "shield-design")).problem().contains("expected"));
        String huge = FOIL.replace("\"Our foil\"", "\"" + "x".repeat(90_000) + "\"");
        assertTrue(refused(huge).problem().contains("200"));
        String longString = "{\"format\": \"shield-catalogue\", \"version\": 1, \"materials\": [], \"x\": \""
                + "y".repeat(Node.MAX_STRING + 1) + "\"}";
        assertTrue(refused(longString).problem().contains("not valid JSON"), refused(longString).getMessage());
        StringBuilder big = new StringBuilder("{\"format\": \"shield-catalogue\", \"version\": 1, \"materials\": [");
        while (big.length() < Node.MAX_DOCUMENT_CHARS + 10) {
            big.append("1,");
        }
        big.append("1]}");
        assertTrue(refused(big.toString()).problem().contains("longer than 4000000 characters"));
    }

    @Test
    void designFilesResolveMaterialsAndRefuseUnknownOnes() {
        Catalogue cat = Catalogue.builtIn();
        String json = String.join("\n",
                "{",
                "  \"format\": \"shield-design\", \"version\": 1, \"title\": \"lid\",",
                "  \"layers\": [",
                "    {\"material\": \"copper-annealed\", \"thickness\": \"0.3 mm\"},",
                "    {\"gap\": \"2 mm\"},",
                "    {\"material\": \"nickel-iron-80\", \"thickness\": \"0.5 mm\", \"temperature\": \"40 °C\"},",
                "    {\"material\": \"paint-nickel\"}",
                "  ],",
                "  \"field\": {\"kind\": \"magnetic-near-field\", \"distance\": \"6 cm\", \"impedance\": \"exact-dipole\"},",
                "  \"band\": \"10 Hz to 100 kHz\",",
                "  \"points\": 41",
                "}");
        Design d = DesignFile.parse(json, cat);
        assertEquals("lid", d.title());
        assertEquals(IncidentField.magneticNearField(Length.ofCentimetres(6), ImpedanceForm.EXACT_DIPOLE), d.field());
        assertEquals(FrequencyBand.parse("10 Hz to 100 kHz"), d.band());
        Barrier expected = Barrier.of(cat.get("copper-annealed"), Length.ofMillimetres(0.3))
                .thenGap(Length.ofMillimetres(2))
                .then(cat.get("nickel-iron-80").atTemperature(io.shieldmath.shield.quantity.Temperature.ofCelsius(40)), Length.ofMillimetres(0.5))
                .then(cat.get("paint-nickel"), Length.ofMicrometres(50));
        assertEquals(expected, d.barrier());
        assertEquals(41, d.sweep().size());
        assertEquals(d, DesignFile.parse(DesignFile.toJson(d), cat));

        MaterialFileException e = assertThrows(MaterialFileException.class,
                () -> DesignFile.parse(json.replace("nickel-iron-80", "nickel-iron-81"), cat));
        assertEquals("$.layers[2].material", e.path());
        assertEquals(6, e.line());
        assertTrue(e.problem().contains("nickel-iron-80"), e.getMessage());
        MaterialFileException t = assertThrows(MaterialFileException.class,
                () -> DesignFile.parse(json.replace("\"0.3 mm\"", "\"0.3\""), cat));
        assertEquals("$.layers[0].thickness", t.path());
        MaterialFileException k = assertThrows(MaterialFileException.class,
                () -> DesignFile.parse(json.replace("exact-dipole", "exact"), cat));
        assertEquals("$.field.impedance", k.path());
        MaterialFileException g = assertThrows(MaterialFileException.class,
                () -> DesignFile.parse(json.replace("{\"gap\": \"2 mm\"}", "{\"gap\": \"2 mm\", \"thickness\": \"1 mm\"}"), cat));
        assertEquals("$.layers[1].thickness", g.path());
        MaterialFileException c = assertThrows(MaterialFileException.class,
                () -> DesignFile.parse(json.replace("{\"material\": \"paint-nickel\"}", "{\"material\": \"lead\"}"), cat));
        assertTrue(c.problem().contains("thickness"), c.getMessage());
    }

    @Test
    void designValuesAreChecked() {
        Catalogue cat = Catalogue.builtIn();
        List<DesignLayer> layers = List.of(DesignLayer.of(cat.get("aluminium-6061-t6"), Length.ofMillimetres(1)));
        assertThrows(IllegalArgumentException.class, () -> Design.of(layers, IncidentField.planeWave(),
                FrequencyBand.parse("1 kHz to 1 MHz"), 0));
        assertThrows(IllegalArgumentException.class, () -> Design.of(List.of(), IncidentField.planeWave(),
                FrequencyBand.parse("1 kHz to 1 MHz"), 10));
        assertThrows(IllegalArgumentException.class, () -> DesignLayer.of(cat.get("lead")));
    }

    private static final String RANGED = FOIL.replace("\"version\": 1", "\"version\": 2").replace(
            "{\"value\": \"35 MS/m\", \"source\": \"invented for this test\"}",
            "{\"value\": \"35 MS/m\", \"range\": {\"low\": \"30 MS/m\", \"high\": \"37 MS/m\", \"source\": "
                    + "\"invented range\"}, \"source\": \"invented for this test\"}");

    @Test
    void rangesAreReadAndWrittenInVersionTwo() {
        Catalogue c = CatalogueFile.parse(RANGED);
        TypicalRange r = c.get("our-foil").range(MaterialProperty.CONDUCTIVITY).orElseThrow();
        assertEquals(30e6, r.low(), 0);
        assertEquals(37e6, r.high(), 0);
        assertEquals("invented range", r.source());
        String json = CatalogueFile.toJson(c);
        assertTrue(json.contains("\"version\" : 2"), json);
        assertEquals(c, CatalogueFile.parse(json));
        // Without ranges a catalogue is still written as version 1, readable by older releases.
        assertTrue(CatalogueFile.toJson(CatalogueFile.parse(FOIL)).contains("\"version\" : 1"));
        // The built-in catalogue has ranges and reads back equal through version 2.
        assertTrue(CatalogueFile.toJson(Catalogue.builtIn()).contains("\"version\" : 2"));
    }

    @Test
    void badRangesAreRefusedWithTheirLocation() {
        MaterialFileException v1 = refused(RANGED.replace("\"version\": 2", "\"version\": 1"));
        assertEquals("$.materials[0].conductivity.range", v1.path());
        assertEquals(8, v1.line());
        assertTrue(v1.problem().contains("version 2"), v1.getMessage());
        MaterialFileException v3 = refused(RANGED.replace("\"version\": 2", "\"version\": 3"));
        assertEquals("$.version", v3.path());
        MaterialFileException outside = refused(RANGED.replace("\"30 MS/m\"", "\"36 MS/m\""));
        assertEquals("$.materials[0].conductivity.range", outside.path());
        assertTrue(outside.problem().contains("does not hold the typical value"), outside.getMessage());
        MaterialFileException noSource = refused(RANGED.replace(", \"source\": \"invented range\"", ""));
        assertTrue(noSource.problem().contains("missing field \"source\""), noSource.getMessage());
        MaterialFileException unknown = refused(RANGED.replace("\"high\": \"37 MS/m\"", "\"top\": \"37 MS/m\""));
        assertEquals("$.materials[0].conductivity.range.top", unknown.path());
        MaterialFileException unit = refused(RANGED.replace("\"37 MS/m\"", "\"37\""));
        assertEquals("$.materials[0].conductivity.range.high", unit.path());
        MaterialFileException order = refused(RANGED.replace("\"37 MS/m\"", "\"29 MS/m\""));
        assertEquals("$.materials[0].conductivity.range", order.path());
    }

    @Test
    void aCheckedSourceWithoutItsPlaceIsRefusedWithItsLocation() {
        MaterialFileException e = refused(FOIL.replace("{\"value\": \"2700 kg/m3\", \"source\": \"invented for this test\"}",
                "{\"value\": \"2700 kg/m3\", \"source\": \"checked against a handbook\"}"));
        assertEquals("$.materials[0].density", e.path());
        assertEquals(12, e.line());
        assertTrue(e.problem().contains("read at"), e.getMessage());
        Material ok = CatalogueFile.parse(FOIL.replace("\"source\": \"invented for this test\"}\n    }",
                "\"source\": \"checked against a handbook, read at https://example.org/table\"}\n    }")).get("our-foil");
        assertEquals(Provenance.CHECKED, ok.provenance(MaterialProperty.DENSITY).orElseThrow());
    }
}
