/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.internal.Node;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.TemperatureCoefficient;
import java.io.ByteArrayInputStream;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/**
 * The hostile-input examples of issue 15 that reach the two file readers, each as a
 * regression test of its class: every value goes through the one core grammar, every
 * accepted value is in its physical range, and one size rule and one column rule hold for
 * strings, streams and files alike.
 */
class FileHardeningTest {

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

    private static final String DESIGN = String.join("\n",
            "{",
            "  \"format\": \"shield-design\", \"version\": 1,",
            "  \"layers\": [",
            "    { \"medium\": { \"name\": \"alloy\", \"conductivity\": \"1.6 MS/m\",",
            "                  \"permeability\": { \"model\": \"constant\", \"value\": \"300\" },",
            "                  \"permittivity\": 1 },",
            "      \"thickness\": \"1 mm\" }",
            "  ],",
            "  \"field\": { \"kind\": \"plane-wave\" },",
            "  \"band\": \"10 Hz to 100 kHz\",",
            "  \"points\": 5",
            "}");

    private static MaterialFileException refused(String json) {
        return assertThrows(MaterialFileException.class, () -> CatalogueFile.parse(json), json);
    }

    private static MaterialFileException refusedDesign(String json) {
        return assertThrows(MaterialFileException.class, () -> DesignFile.parse(json, Catalogue.empty()), json);
    }

    private static String foil(String from, String to) {
        assertTrue(FOIL.contains(from), from);
        return FOIL.replace(from, to);
    }

    private static String design(String from, String to) {
        assertTrue(DESIGN.contains(from), from);
        return DESIGN.replace(from, to);
    }

    @Test
    void theFixturesAreValid() {
        assertEquals(Density.ofKilogramsPerCubicMetre(2700), CatalogueFile.parse(FOIL).get("our-foil").density());
        assertEquals(1, DesignFile.parse(DESIGN, Catalogue.empty()).layers().size());
    }

    // ---- 1 and 2: the core grammar in files ----

    @Test
    void prefixesAndInnerSpacesAreRefusedInFiles() {
        MaterialFileException e = refused(foil("\"35 MS/m\"", "\"35 mS/m\""));   // never read as MS/m
        assertEquals("$.materials[0].conductivity.value", e.path());
        e = refusedDesign(design("\"1.6 MS/m\"", "\"5 mS/m\""));
        assertEquals("$.layers[0].medium.conductivity", e.path());
        e = refusedDesign(design("\"value\": \"300\"", "\"value\": \"1200 800\""));   // was 1200800
        assertEquals("$.layers[0].medium.permeability.value", e.path());
        refused(foil("\"value\": 1, \"source\": \"invented for this test\"}",
                "\"value\": \"2 1\", \"source\": \"invented for this test\"}"));
        refused(foil("\"2700 kg/m3\"", "\"2700 Kg/m3\""));
        refused(foil("\"0.004 /K\"", "\"0.004 /\u212a\""));                      // Kelvin sign
        refusedDesign(design("\"1 mm\"", "\"1 \u039cm\""));                         // Greek capital Mu
    }

    // ---- 3 and 11: nothing unphysical or underflowing is accepted ----

    @Test
    void unphysicalValuesAreRefusedWhereTheyAreRead() {
        // Issue 15 item 11: each of these was accepted and failed later in evaluation.
        MaterialFileException e = refused(foil("\"model\": \"constant\", \"value\": \"1\"",
                "\"model\": \"constant\", \"value\": \"1e150\""));
        assertEquals("$.materials[0].permeability.value", e.path());
        assertTrue(e.problem().contains("10000000"), e.getMessage());
        e = refused(foil("\"value\": 1, \"source\": \"invented for this test\"}",
                "\"value\": 1e200, \"source\": \"invented for this test\"}"));
        assertEquals("$.materials[0].permittivity.value", e.path());
        e = refused(foil("\"model\": \"constant\", \"value\": \"1\"",
                "\"model\": \"relaxation\", \"lowFrequency\": 1000, \"corner\": \"1e-300 Hz\""));
        assertTrue(e.problem().contains("relaxation corner frequency"), e.getMessage());
        e = refused(foil("\"model\": \"constant\", \"value\": \"1\"",
                "\"model\": \"table\", \"points\": [{\"frequency\": \"1 Hz\", \"real\": 5}, "
                        + "{\"frequency\": \"1 kHz\", \"real\": 1e300}]"));
        assertTrue(e.problem().contains("real part [1]"), e.getMessage());
        e = refused(foil("\"model\": \"constant\", \"value\": \"1\"",
                "\"model\": \"table\", \"points\": [{\"frequency\": \"1 Hz\", \"real\": 5, \"loss\": 1e300}]"));
        assertTrue(e.problem().contains("loss part [0]"), e.getMessage());
        refused(foil("\"35 MS/m\"", "\"1e-400 MS/m\""));                         // was 0 S/m
        refused(foil("\"value\": 1, \"source\": \"invented for this test\"}",
                "\"value\": 1e-400, \"source\": \"invented for this test\"}"));
        // The same ranges in the design reader's inline media.
        refusedDesign(design("\"value\": \"300\"", "\"value\": \"1e150\""));
        refusedDesign(design("\"permittivity\": 1 }", "\"permittivity\": 1e200 }"));
        refusedDesign(design("{ \"model\": \"constant\", \"value\": \"300\" }",
                "{ \"model\": \"relaxation\", \"lowFrequency\": 1000, \"corner\": \"1e-300 Hz\" }"));
        refusedDesign(design("{ \"model\": \"constant\", \"value\": \"300\" }",
                "{ \"model\": \"table\", \"points\": [{\"frequency\": \"1 Hz\", \"real\": 1e300}] }"));
    }

    // ---- 7: long runs ----

    @Test
    void longRunsInsideValuesAreReadOrRefusedAtOnce() {
        Material m = CatalogueFile.parse(foil("\"2700 kg/m3\"", "\"2700" + " ".repeat(200) + "kg/m3\""))
                .get("our-foil");
        assertEquals(Density.ofKilogramsPerCubicMetre(2700), m.density());
        MaterialFileException e = refused(foil("\"2700 kg/m3\"", "\"2700" + " ".repeat(99_000) + "kg/m3\""));
        assertEquals("$.materials[0].density.value", e.path());
        assertTrue(e.problem().contains("longer than 256 characters"), e.getMessage());
        assertTrue(e.getMessage().length() < 500, "the message quotes a clipped text");
        e = refusedDesign(design("\"10 Hz to 100 kHz\"", "\"10 Hz" + " ".repeat(99_000) + "to 100 kHz\""));
        assertEquals("$.band", e.path());
    }

    // ---- 17 and 18 ----

    @Test
    void aBareDensitySaysNoUnitAndNoBreakSpacesAreRead() {
        MaterialFileException e = refused(foil("\"2700 kg/m3\"", "\"8700\""));
        assertTrue(e.problem().contains("(no unit)"), e.getMessage());
        Material m = CatalogueFile.parse(foil("\"0.004 /K\"", "\"0.004\u00a0/K\"")).get("our-foil");
        assertEquals(TemperatureCoefficient.ofPerKelvin(0.004), m.temperatureCoefficient().orElseThrow());
    }

    // ---- 16: one size rule and one column rule ----

    @Test
    void stringsAndStreamsCountTheSameCharactersAndColumns() {
        String doc = foil("\"name\": \"Our foil\",", "\"name\": \"µµµ Ω°\", \"colour\": 1,");
        MaterialFileException fromString = refused(doc);
        for (Charset cs : new Charset[] {StandardCharsets.UTF_8, StandardCharsets.UTF_16BE, StandardCharsets.UTF_16LE,
            Charset.forName("UTF-32BE")}) {
            MaterialFileException fromStream = assertThrows(MaterialFileException.class,
                    () -> CatalogueFile.read(new ByteArrayInputStream(doc.getBytes(cs))));
            assertEquals(fromString.getMessage(), fromStream.getMessage(), cs.name());
        }
        // "      \"name\": \"µµµ Ω°\", \"colour\": " is 34 characters (each µ, Ω and ° one character).
        assertEquals(35, fromString.column());
        // A byte-order mark is skipped in both.
        assertEquals(CatalogueFile.parse(FOIL), CatalogueFile.parse("\ufeff" + FOIL));
        byte[] bom = ("\ufeff" + FOIL).getBytes(StandardCharsets.UTF_8);
        assertEquals(CatalogueFile.parse(FOIL), CatalogueFile.read(new ByteArrayInputStream(bom)));
    }

    @Test
    void theDocumentLimitCountsCharactersForStringsAndStreams() {
        // 3 million characters, 6 million bytes in UTF-8: under the limit of 4 million characters for
        // both, so both reach the content and refuse it for the same reason.
        StringBuilder b = new StringBuilder("[");
        String chunk = "\"" + "µ".repeat(99_000) + "\"";
        for (int i = 0; i < 30; i++) {
            b.append(i == 0 ? "" : ",").append(chunk);
        }
        String wide = b.append("]").toString();
        assertTrue(wide.length() < Node.MAX_DOCUMENT_CHARS && wide.getBytes(StandardCharsets.UTF_8).length
                > Node.MAX_DOCUMENT_CHARS);
        MaterialFileException s = refused(wide);
        MaterialFileException f = assertThrows(MaterialFileException.class,
                () -> CatalogueFile.read(new ByteArrayInputStream(wide.getBytes(StandardCharsets.UTF_8))));
        assertEquals(s.getMessage(), f.getMessage());
        assertTrue(s.problem().contains("expected an object"), s.getMessage());
        // One character over the limit: refused by both, with the same words.
        String over = "[" + " ".repeat((int) Node.MAX_DOCUMENT_CHARS - 1) + "]";
        MaterialFileException so = refused(over);
        MaterialFileException fo = assertThrows(MaterialFileException.class,
                () -> CatalogueFile.read(new ByteArrayInputStream(over.getBytes(StandardCharsets.UTF_8))));
        assertEquals(so.getMessage(), fo.getMessage());
        assertTrue(so.problem().contains("longer than 4000000 characters"), so.getMessage());
    }

    @Test
    void malformedBytesAreRefusedWithTheirLocation() {
        byte[] good = FOIL.getBytes(StandardCharsets.UTF_8);
        byte[] bad = good.clone();
        int at = FOIL.indexOf("Our foil") + 1;
        bad[at] = (byte) 0xc3;       // a lead byte followed by an ASCII byte: malformed UTF-8
        MaterialFileException e = assertThrows(MaterialFileException.class,
                () -> CatalogueFile.read(new ByteArrayInputStream(bad)));
        assertEquals(7, e.line());
        assertTrue(e.problem().contains("malformed UTF-8"), e.getMessage());
    }
}
