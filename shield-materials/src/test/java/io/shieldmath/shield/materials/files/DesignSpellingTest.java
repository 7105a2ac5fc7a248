/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.materials.Catalogue;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Design files keep each quantity in the text the user gave it in: a design read from a file
 * and written again says "0.2 mm", not "2.0E-4 m" or "200 µm". The designs are invented.
 */
class DesignSpellingTest {

    private static final Catalogue CAT = Catalogue.builtIn();

    private static final String LID = """
            {"format": "shield-design", "version": 2, "title": "lid",
             "layers": [{"material": "copper-annealed", "thickness": "0.2 mm"},
                        {"gap": "0.08 in"},
                        {"material": "nickel-iron-80", "thickness": "21 mil", "temperature": "60.0 °C"},
                        {"medium": {"name": "foil", "conductivity": "58 % IACS"}, "thickness": "35 µm"}],
             "field": {"kind": "magnetic-near-field", "distance": "6 cm", "impedance": "exact-dipole"},
             "band": "0.01 kHz to 100 kHz", "points": 41,
             "cases": [{"band": "20 kHz", "incident": "8 µT", "tolerated": "0.005 µT"}]}
            """;

    @Test
    void readThenWrittenKeepsEveryTextAsGiven() {
        Design d = DesignFile.parse(LID, CAT);
        String back = DesignFile.toJson(d);
        for (String given : List.of("\"0.2 mm\"", "\"0.08 in\"", "\"21 mil\"", "\"60.0 °C\"", "\"58 % IACS\"",
                "\"35 µm\"", "\"6 cm\"", "\"0.01 kHz to 100 kHz\"", "\"20 kHz\"", "\"8 µT\"", "\"0.005 µT\"")) {
            assertTrue(back.contains(given), given + " in\n" + back);
        }
        assertFalse(back.contains("E-"), back);
        assertTrue(back.contains("\"version\" : 3"), back);
        Design again = DesignFile.parse(back, CAT);
        assertEquals(d, again);
        assertEquals(back, DesignFile.toJson(again));
    }

    @Test
    void aDesignBuiltInCodeIsWrittenInShortUnits() {
        Design d = DesignFile.parse(LID, CAT);
        // The same values without the texts: equal barrier, but written in the default forms.
        Design plain = Design.of(d.layers(), d.field(), d.band(), d.points()).meeting(d.requirement())
                .withTitle(d.title());
        assertEquals(d.barrier(), plain.barrier());
        String json = DesignFile.toJson(plain);
        // The shortest text in a common unit that reads back exactly (21 mil is 533 400 nm exactly).
        assertTrue(json.contains("\"0.2 mm\""), json);
        assertTrue(json.contains("\"6 cm\""), json);
        assertTrue(json.contains("\"533400 nm\""), json);
        assertFalse(json.contains("E-") || json.contains(" m\""), json);
        assertEquals(plain, DesignFile.parse(json, CAT));
    }
}
