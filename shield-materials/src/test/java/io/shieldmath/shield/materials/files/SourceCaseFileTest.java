/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Source cases in design files: a band with an incident and a tolerated flux density, or a band
 * with the required shielding effectiveness given directly ({@code "requiredSe"}), never both,
 * never neither. Every refusal is located at the case. The design is invented.
 */
class SourceCaseFileTest {

    private static final Catalogue CAT = Catalogue.builtIn();

    /** Line 5 holds the cases; case 0 starts at column 12, case 1 (CASE) at column 73 (counted by hand). */
    private static final String DESIGN = """
            {"format": "shield-design", "version": 2, "title": "vent lid",
             "layers": [{"material": "copper-annealed", "thickness": "0.2 mm"}],
             "field": {"kind": "magnetic-near-field", "distance": "6 cm", "impedance": "exact-dipole"},
             "band": "10 Hz to 100 kHz", "points": 11,
             "cases": [{"band": "20 kHz", "incident": "8 µT", "tolerated": "5 nT"}, CASE]}
            """;

    private static Design withCase(String json) {
        return DesignFile.parse(DESIGN.replace("CASE", json), CAT);
    }

    private static MaterialFileException refused(String json) {
        return assertThrows(MaterialFileException.class, () -> withCase(json));
    }

    @Test
    void aRequiredSeIsReadAndWrittenBackAsGiven() {
        Design d = withCase("{\"band\": \"1 MHz to 10 MHz\", \"requiredSe\": \"40.50 dB\"}");
        Requirement expected = Requirement.none()
                .plus(FrequencyBand.parse("20 kHz"), MagneticFluxDensity.ofMicrotesla(8),
                        MagneticFluxDensity.ofNanotesla(5))
                .plus(FrequencyBand.parse("1 MHz to 10 MHz"), Decibels.of(40.5));
        assertEquals(expected, d.requirement());
        Requirement.Entry direct = d.requirement().entries().get(1);
        assertTrue(direct.isDirect());
        assertEquals(Optional.empty(), direct.incident());
        String back = DesignFile.toJson(d);
        assertTrue(back.contains("\"requiredSe\" : \"40.50 dB\""), back);
        assertFalse(back.contains("\"incident\" : null"), back);
        Design again = DesignFile.parse(back, CAT);
        assertEquals(d, again);
        assertEquals(back, DesignFile.toJson(again));
        // Built in code: written in the default form, read back equal.
        Design plain = Design.of(d.layers(), d.field(), d.band(), d.points()).meeting(expected);
        String json = DesignFile.toJson(plain);
        assertTrue(json.contains("\"requiredSe\" : \"40.5 dB\""), json);
        assertEquals(plain, DesignFile.parse(json, CAT));
    }

    @Test
    void bothFormsOrNeitherIsRefusedAtTheCase() {
        MaterialFileException both = refused(
                "{\"band\": \"1 MHz\", \"requiredSe\": \"40 dB\", \"incident\": \"8 µT\", \"tolerated\": \"5 nT\"}");
        assertEquals("$.cases[1]", both.path());
        assertEquals(5, both.line());
        assertEquals(73, both.column());
        assertTrue(both.problem().contains("either \"requiredSe\" or \"incident\" and \"tolerated\""),
                both.problem());
        assertEquals("$.cases[1]", refused("{\"band\": \"1 MHz\", \"requiredSe\": \"40 dB\", \"tolerated\": \"5 nT\"}")
                .path());
        MaterialFileException neither = refused("{\"band\": \"1 MHz\"}");
        assertEquals("$.cases[1]", neither.path());
        assertEquals(5, neither.line());
        assertTrue(neither.problem().contains("needs \"incident\" and \"tolerated\", or \"requiredSe\""),
                neither.problem());
        // Half a pair: the missing half is named.
        MaterialFileException half = refused("{\"band\": \"1 MHz\", \"incident\": \"8 µT\"}");
        assertEquals("$.cases[1]", half.path());
        assertTrue(half.problem().contains("missing field \"tolerated\""), half.problem());
    }

    @Test
    void aRequiredSeOutsideItsRangeOrWithoutItsUnitIsRefusedAtTheValue() {
        for (String bad : new String[] {"\"-3 dB\"", "\"400.5 dB\"", "\"40\"", "\"40 µT\"", "40", "\"\""}) {
            MaterialFileException e = refused("{\"band\": \"1 MHz\", \"requiredSe\": " + bad + "}");
            assertEquals("$.cases[1].requiredSe", e.path(), bad);
            assertEquals(5, e.line(), bad);
        }
        assertTrue(refused("{\"band\": \"1 MHz\", \"requiredSe\": \"-3 dB\"}").problem()
                .contains("from 0 dB to 400 dB"));
        assertEquals("$.cases[1].requiredSE", refused("{\"band\": \"1 MHz\", \"requiredSE\": \"40 dB\"}").path());
    }
}
