/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.medium.ApparentPermeability;
import io.shieldmath.shield.medium.TabulatedPermeability;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import org.junit.jupiter.api.Test;

/** Issue 18 item 2: each permeability in a catalogue says whether it is intrinsic or apparent. */
class PermeabilityBasisTest {

    /**
     * Demo apparent data of an invented alloy sheet 0.2 mm thick: the apparent values, rounded, of an invented
     * intrinsic µ of 20000 − j50 at 10 Hz and 15000 − j3000 at 1 kHz with σ = 2 MS/m.
     */
    private static final String APPARENT = String.join("\n",
            "{",
            "  \"format\": \"shield-catalogue\",",
            "  \"version\": 3,",
            "  \"materials\": [",
            "    {",
            "      \"id\": \"our-sheet\",",
            "      \"name\": \"Our sheet\",",
            "      \"conductivity\": {\"value\": \"2 MS/m\", \"source\": \"invented for this test\"},",
            "      \"temperatureCoefficient\": {\"value\": \"0.002 /K\", \"source\": \"invented for this test\"},",
            "      \"permeability\": {\"model\": \"table\", \"basis\": \"apparent\", \"sheetThickness\": \"0.2 mm\", "
                    + "\"points\": [{\"frequency\": \"10 Hz\", \"real\": 19996, \"loss\": 260}, "
                    + "{\"frequency\": \"1 kHz\", \"real\": 7951, \"loss\": 6942}], \"source\": \"invented\"},",
            "      \"permittivity\": {\"value\": 1, \"source\": \"invented for this test\"},",
            "      \"density\": {\"value\": \"8000 kg/m3\", \"source\": \"invented for this test\"},",
            "      \"saturation\": {\"value\": \"1 T\", \"source\": \"invented for this test\"}",
            "    }",
            "  ]",
            "}");

    private static MaterialFileException refused(String json) {
        return assertThrows(MaterialFileException.class, () -> CatalogueFile.parse(json));
    }

    @Test
    void anApparentTableIsConvertedAndWrittenBackAsGiven() {
        Material m = CatalogueFile.parse(APPARENT).get("our-sheet");
        ApparentPermeability a = assertInstanceOf(ApparentPermeability.class, m.permeability());
        assertEquals(Length.ofMillimetres(0.2), a.sheetThickness());
        // The model returns the intrinsic value, whose apparent value for the sheet is the one given
        // (forward relation µ_app = µ·tanh(kt/2)/(kt/2); see ApparentPermeability).
        RelativePermeability back = ApparentPermeability.apparent(
                RelativePermeability.ofComplex(a.real(1e3), a.loss(1e3)), Frequency.ofKilohertz(1),
                Length.ofMillimetres(0.2), Conductivity.ofMegasiemensPerMetre(2));
        assertEquals(7951, back.real(), 1e-6);
        assertEquals(6942, back.loss(), 1e-6);
        assertEquals(15000, a.real(1e3), 5);         // the invented intrinsic value, to the rounding of the data
        assertEquals(3000, a.loss(1e3), 5);
        String json = CatalogueFile.toJson(CatalogueFile.parse(APPARENT));
        assertTrue(json.contains("\"version\" : 3") && json.contains("\"basis\" : \"apparent\""), json);
        assertEquals(CatalogueFile.parse(APPARENT), CatalogueFile.parse(json));
    }

    @Test
    void theBasisIsCheckedWithItsLocation() {
        // Older documents have no basis and read as intrinsic; a basis needs version 3.
        MaterialFileException v2 = refused(APPARENT.replace("\"version\": 3", "\"version\": 2"));
        assertEquals("$.materials[0].permeability.basis", v2.path());
        assertTrue(v2.problem().contains("version 3"), v2.getMessage());
        MaterialFileException unknown = refused(APPARENT.replace("\"apparent\"", "\"measured\""));
        assertTrue(unknown.problem().startsWith("unknown permeability basis \"measured\""), unknown.getMessage());
        MaterialFileException noSheet = refused(APPARENT.replace("\"sheetThickness\": \"0.2 mm\", ", ""));
        assertEquals("$.materials[0].permeability", noSheet.path());
        assertTrue(noSheet.problem().contains("sheetThickness"), noSheet.getMessage());
        MaterialFileException stray = refused(APPARENT.replace("\"apparent\"", "\"intrinsic\""));
        assertEquals("$.materials[0].permeability.sheetThickness", stray.path());
        MaterialFileException relaxation = refused(APPARENT.replace("\"model\": \"table\", \"basis\": \"apparent\", "
                + "\"sheetThickness\": \"0.2 mm\", \"points\": [{\"frequency\": \"10 Hz\", \"real\": 19996, \"loss\": "
                + "260}, {\"frequency\": \"1 kHz\", \"real\": 7951, \"loss\": 6942}]",
                "\"model\": \"relaxation\", \"basis\": \"apparent\", \"lowFrequency\": 20000, \"corner\": \"1 kHz\""));
        assertEquals("$.materials[0].permeability.basis", relaxation.path());
        assertTrue(relaxation.problem().contains("give it as a table"), relaxation.getMessage());
        // A point no passive sheet can show: a real µ of 7951 at 1 kHz for 0.2 mm (several skin depths).
        MaterialFileException impossible = refused(APPARENT.replace("\"loss\": 6942", "\"loss\": 0"));
        assertEquals("$.materials[0].permeability.points", impossible.path());
        assertTrue(impossible.problem().contains("no passive intrinsic permeability"), impossible.getMessage());
    }

    @Test
    void aDesignMediumMayGiveAnApparentTable() {
        // The same invented sheet as a medium of a design file: converted with the medium's own conductivity.
        String json = String.join("\n",
                "{",
                "  \"format\": \"shield-design\", \"version\": 1, \"title\": \"trial\",",
                "  \"layers\": [",
                "    {\"medium\": {\"name\": \"trial sheet\", \"conductivity\": \"2 MS/m\", \"permeability\": ",
                "      {\"model\": \"table\", \"basis\": \"apparent\", \"sheetThickness\": \"0.2 mm\", \"points\": ",
                "        [{\"frequency\": \"1 kHz\", \"real\": 7951, \"loss\": 6942}]}}, \"thickness\": \"0.2 mm\"}",
                "  ],",
                "  \"field\": {\"kind\": \"plane-wave\"},",
                "  \"band\": \"100 Hz to 10 kHz\",",
                "  \"points\": 5",
                "}");
        Design d = DesignFile.parse(json, Catalogue.builtIn());
        ApparentPermeability a = assertInstanceOf(ApparentPermeability.class,
                d.barrier().layers().get(0).medium().permeability());
        assertEquals(15000, a.real(1e3), 5);
        assertEquals(d, DesignFile.parse(DesignFile.toJson(d), Catalogue.builtIn()));
    }

    @Test
    void everyBuiltInFrequencyModelSaysItIsIntrinsic() {
        // The built-in catalogue states "basis": "intrinsic" for each relaxation and table (version 3).
        String text = new String(readResource(), java.nio.charset.StandardCharsets.UTF_8);
        long models = text.split("\"model\": \"relaxation\"", -1).length - 1 + text.split("\"model\": \"table\"", -1).length - 1;
        long intrinsic = text.split("\"basis\": \"intrinsic\"", -1).length - 1;
        assertEquals(7, models);
        assertEquals(models, intrinsic);
        for (Material m : Catalogue.builtIn().all()) {
            assertTrue(!(m.permeability() instanceof ApparentPermeability), m.id());
        }
        assertInstanceOf(TabulatedPermeability.class, Catalogue.builtIn().get("nickel-iron-80").permeability());
    }

    private static byte[] readResource() {
        try (java.io.InputStream in = Catalogue.class.getResourceAsStream("catalogue.json")) {
            return in.readAllBytes();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
