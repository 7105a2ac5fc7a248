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

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Random malformed documents (truncated, wrong types, huge numbers, deep nesting, duplicate keys, stray
 * characters) give either a complete, valid object or the documented {@link MaterialFileException} with a
 * location: never another exception, never a stack overflow, never a half-read result.
 */
class MalformedJsonProperties {

    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);
    private static final String[] WRONG = {"1", "-1", "0", "1e999999", "-1e999999", "123456789012345678901234567890",
        "1." + "0".repeat(80), "true", "false", "null", "[]", "{}", "\"\"", "\"x\"", "\"-5 MS/m\"", "\"1e400 mm\"",
        "\"0.5\"", "\"NaN Hz\"", "[1, 2]", "{\"value\": 1}", "\"5 furlongs\"", "\"\\u0000\""};

    static String mutate(String json, Random r) {
        int n = json.length();
        switch (r.nextInt(8)) {
            case 0: // truncate
                return json.substring(0, r.nextInt(n));
            case 1: { // replace a string value (or key) with a value of another type
                List<int[]> strings = strings(json);
                int[] s = strings.get(r.nextInt(strings.size()));
                return json.substring(0, s[0]) + WRONG[r.nextInt(WRONG.length)] + json.substring(s[1]);
            }
            case 2: { // replace a number with a huge or odd one
                int i = firstDigitAfter(json, r.nextInt(n));
                if (i < 0) {
                    return json + "1";
                }
                int j = i;
                while (j < n && "0123456789.eE+-".indexOf(json.charAt(j)) >= 0) {
                    j++;
                }
                return json.substring(0, i) + WRONG[r.nextInt(6)] + json.substring(j);
            }
            case 3: { // deep nesting at a random place
                int depth = 20 + r.nextInt(r.nextBoolean() ? 100 : 5_000);
                int at = r.nextInt(n + 1);
                String open = r.nextBoolean() ? "[".repeat(depth) : "{\"a\":".repeat(depth);
                return json.substring(0, at) + open + json.substring(at);
            }
            case 4: { // duplicate the first key of a random object
                int brace = json.indexOf('{', r.nextInt(n));
                if (brace < 0) {
                    brace = 0;
                }
                int q1 = json.indexOf('"', brace);
                int q2 = q1 < 0 ? -1 : json.indexOf('"', q1 + 1);
                if (q2 < 0) {
                    return json + "}";
                }
                return json.substring(0, brace + 1) + json.substring(q1, q2 + 1) + ": null, "
                        + json.substring(brace + 1);
            }
            case 5: { // insert a stray structural character
                int at = r.nextInt(n + 1);
                String stray = "{}[]:,\"\\x/";
                return json.substring(0, at) + stray.charAt(r.nextInt(stray.length())) + json.substring(at);
            }
            case 6: { // delete a span
                int a = r.nextInt(n);
                int b = Math.min(n, a + 1 + r.nextInt(20));
                return json.substring(0, a) + json.substring(b);
            }
            default: { // add an unknown field to a random object
                int brace = json.indexOf('{', r.nextInt(n));
                if (brace < 0) {
                    return "[" + json;
                }
                return json.substring(0, brace + 1) + "\"extra\": 1, " + json.substring(brace + 1);
            }
        }
    }

    /** The [start, end) spans of the JSON strings in a document written by this library. */
    static List<int[]> strings(String json) {
        List<int[]> spans = new java.util.ArrayList<>();
        for (int i = 0; i < json.length(); i++) {
            if (json.charAt(i) == '"') {
                int j = i + 1;
                while (json.charAt(j) != '"') {
                    j += json.charAt(j) == '\\' ? 2 : 1;
                }
                spans.add(new int[] {i, j + 1});
                i = j;
            }
        }
        return spans;
    }

    private static int firstDigitAfter(String s, int from) {
        for (int i = from; i < s.length(); i++) {
            if (Character.isDigit(s.charAt(i)) && (i == 0 || s.charAt(i - 1) == ' ' || s.charAt(i - 1) == ':')) {
                return i;
            }
        }
        return -1;
    }

    private static void requireLocated(MaterialFileException e, String doc) {
        assertTrue(e.line() >= 1 && e.column() >= 1, e.getMessage());
        assertTrue(e.path().startsWith("$"), e.getMessage());
        assertTrue(e.getMessage().contains("(line " + e.line() + ", column " + e.column() + ")"), e.getMessage());
        assertTrue(e.line() <= doc.split("\n", -1).length + 1, e.getMessage());
    }

    @Test
    void malformedCataloguesGiveOnlyTheDocumentedException() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Catalogue original = RandomMaterials.catalogue(r, 1);
            String bad = mutate(CatalogueFile.toJson(original), r);
            try {
                Catalogue c = CatalogueFile.parse(bad);
                // Still a whole, valid catalogue (a mutation can leave a document valid): it reads back equal.
                assertEquals(c, CatalogueFile.parse(CatalogueFile.toJson(c)));
            } catch (MaterialFileException e) {
                requireLocated(e, bad);
            } catch (Throwable t) {
                fail("seed " + seed + ": " + t + " for\n" + bad, t);
            }
        });
    }

    @Test
    void malformedDesignsGiveOnlyTheDocumentedException() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Catalogue cat = Catalogue.of(List.of(RandomMaterials.material(r, "plate-a")));
            String bad = mutate(DesignFile.toJson(RandomMaterials.design(r, cat)), r);
            try {
                Design d = DesignFile.parse(bad, cat);
                assertEquals(d, DesignFile.parse(DesignFile.toJson(d), cat));
            } catch (MaterialFileException e) {
                requireLocated(e, bad);
            } catch (Throwable t) {
                fail("seed " + seed + ": " + t + " for\n" + bad, t);
            }
        });
    }
}
