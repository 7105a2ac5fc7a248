/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.Temperature;
import io.shieldmath.shield.quantity.TemperatureCoefficient;
import java.util.List;
import java.util.Random;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * Generated hostile values inside otherwise valid catalogue and design files: unit-prefix
 * confusion, look-alike characters, long runs, huge and tiny exponents and embedded spaces.
 * For {@code -Dshield.tries} cases (10 000 by default) each reader either reads exactly what
 * the core parser reads from the same text, or refuses with a {@link MaterialFileException}
 * at that value's JSON path; no other outcome.
 */
class ReaderHostileProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    private static final String CATALOGUE = String.join("\n",
            "{",
            "  \"format\": \"shield-catalogue\", \"version\": 1,",
            "  \"materials\": [",
            "    {",
            "      \"id\": \"our-alloy\", \"name\": \"Our alloy\",",
            "      \"conductivity\": {\"value\": \"@conductivity\", \"source\": \"invented for this test\"},",
            "      \"temperatureCoefficient\": {\"value\": \"@alpha\", \"source\": \"invented for this test\"},",
            "      \"permeability\": {\"model\": \"constant\", \"value\": \"@mu\", \"source\": \"invented\"},",
            "      \"permittivity\": {\"value\": \"@epsilon\", \"source\": \"invented for this test\"},",
            "      \"density\": {\"value\": \"@density\", \"source\": \"invented for this test\"}",
            "    }",
            "  ]",
            "}");

    private static final String DESIGN = String.join("\n",
            "{",
            "  \"format\": \"shield-design\", \"version\": 1,",
            "  \"layers\": [",
            "    { \"material\": \"copper-annealed\", \"thickness\": \"@thickness\", \"temperature\": \"@temperature\" },",
            "    { \"medium\": { \"name\": \"alloy\", \"conductivity\": \"@sigma\" }, \"thickness\": \"1 mm\" }",
            "  ],",
            "  \"field\": { \"kind\": \"plane-wave\" },",
            "  \"band\": \"@band\",",
            "  \"points\": 5",
            "}");

    /** One value of a fixture: its placeholder, a valid text, the core parser and the JSON path. */
    record Slot(boolean design, String key, String valid, Function<String, Object> parse, String path,
                Function<Object, Object> read) {
    }

    private static final List<Slot> SLOTS = List.of(
            new Slot(false, "@conductivity", "35 MS/m", Conductivity::parse, "$.materials[0].conductivity.value",
                    c -> ((Catalogue) c).get("our-alloy").conductivity()),
            new Slot(false, "@alpha", "0.004 /K", TemperatureCoefficient::parse,
                    "$.materials[0].temperatureCoefficient.value",
                    c -> ((Catalogue) c).get("our-alloy").temperatureCoefficient().orElseThrow()),
            new Slot(false, "@mu", "3", RelativePermeability::parse, "$.materials[0].permeability.value",
                    c -> ((Catalogue) c).get("our-alloy").permeability().at(
                            io.shieldmath.shield.quantity.Frequency.ofHertz(1))),
            new Slot(false, "@epsilon", "2.5", io.shieldmath.shield.quantity.RelativePermittivity::parse,
                    "$.materials[0].permittivity.value", c -> ((Catalogue) c).get("our-alloy").permittivity()),
            new Slot(false, "@density", "2700 kg/m3", Density::parse, "$.materials[0].density.value",
                    c -> ((Catalogue) c).get("our-alloy").density()),
            new Slot(true, "@thickness", "0.5 mm", Length::parse, "$.layers[0].thickness",
                    d -> ((Design) d).layers().get(0).thickness()),
            new Slot(true, "@temperature", "60 °C", Temperature::parse, "$.layers[0].temperature",
                    d -> ((Design) d).layers().get(0).temperature().orElseThrow()),
            new Slot(true, "@sigma", "1.6 MS/m", Conductivity::parse, "$.layers[1].medium.conductivity",
                    d -> ((Design) d).layers().get(1).medium().conductivity()),
            new Slot(true, "@band", "10 Hz to 100 kHz", FrequencyBand::parse, "$.band", d -> ((Design) d).band()));

    private static final String LOOK_ALIKES = "\u039c\u212a\u0131\u017f\uff4b\uff10\u0661\u2007\u200b\u0430\u0391"
            + "\u2127\u00b5\u03bc\u00a0\u202f";

    /** A hostile variant of a valid text. */
    static String variant(String valid, Random r) {
        switch (r.nextInt(5)) {
            case 0: { // prefix confusion: flip the case of some letters
                StringBuilder b = new StringBuilder(valid);
                for (int i = 0; i < b.length(); i++) {
                    char c = b.charAt(i);
                    if (c < 128 && Character.isLetter(c) && r.nextBoolean()) {
                        b.setCharAt(i, Character.isUpperCase(c) ? Character.toLowerCase(c) : Character.toUpperCase(c));
                    }
                }
                return b.toString();
            }
            case 1: { // a look-alike or documented non-ASCII character somewhere
                int at = r.nextInt(valid.length() + 1);
                return valid.substring(0, at) + LOOK_ALIKES.charAt(r.nextInt(LOOK_ALIKES.length()))
                        + valid.substring(at);
            }
            case 2: { // a long run of spaces, digits or letters
                int at = r.nextInt(valid.length() + 1);
                String run = new String[] {" ", "0", "9", "x", "\u00a0"}[r.nextInt(5)]
                        .repeat(1 + r.nextInt(r.nextBoolean() ? 300 : 30_000));
                return valid.substring(0, at) + run + valid.substring(at);
            }
            case 3: { // a huge or tiny exponent after the first number
                int end = 0;
                while (end < valid.length() && "0123456789.".indexOf(valid.charAt(end)) >= 0) {
                    end++;
                }
                return valid.substring(0, end) + "e" + (r.nextInt(1400) - 700) + valid.substring(end);
            }
            default: { // a space inside the first number
                int at = 1 + r.nextInt(Math.max(1, firstNumberLength(valid) - 1));
                return valid.substring(0, at) + " " + valid.substring(at);
            }
        }
    }

    private static int firstNumberLength(String s) {
        int n = 0;
        while (n < s.length() && "0123456789.".indexOf(s.charAt(n)) >= 0) {
            n++;
        }
        return n;
    }

    private static String fill(String doc, Slot chosen, String text) {
        String out = doc;
        for (Slot s : SLOTS) {
            if (s.design() == chosen.design()) {
                out = out.replace(s.key(), s == chosen ? escape(text) : s.valid());
            }
        }
        return out;
    }

    private static String escape(String s) {
        StringBuilder b = new StringBuilder();
        for (char c : s.toCharArray()) {
            if (c == '"' || c == '\\') {
                b.append('\\');
            }
            b.append(c);
        }
        return b.toString();
    }

    @Test
    void hostileValuesAreReadAsTheCoreReadsThemOrRefusedAtTheirPath() {
        Catalogue cat = Catalogue.builtIn();
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Slot slot = SLOTS.get(r.nextInt(SLOTS.size()));
            String text = variant(slot.valid(), r);
            Object core;
            try {
                core = slot.parse().apply(text);
            } catch (InvalidQuantityException e) {
                core = null;
            }
            String doc = fill(slot.design() ? DESIGN : CATALOGUE, slot, text);
            try {
                Object read = slot.design() ? DesignFile.parse(doc, cat) : CatalogueFile.parse(doc);
                assertTrue(core != null, () -> "the reader accepted \"" + text + "\", which the core refuses");
                assertEquals(core, slot.read().apply(read), text);
            } catch (MaterialFileException e) {
                // Refused by the core parser at that value, or in range by the builder at the property.
                assertTrue(e.path().equals(slot.path()) || slot.path().startsWith(e.path() + "."),
                        () -> "\"" + text + "\" refused at " + e.getMessage());
                assertTrue(e.getMessage().length() < 1000, () -> "message not clipped: " + e.getMessage().length());
            } catch (RuntimeException e) {
                fail("\"" + text + "\" gave " + e, e);
            }
        });
    }
}
