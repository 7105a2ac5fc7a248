/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.MaterialFileException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * Round trips of whole designs of every kind (planar, shell, axisymmetric between coils and
 * in an applied field), each built from a random seed ({@link RandomWholeDesigns}):
 * {@code -Dshield.tries} cases, 10 000 by default.
 */
class WholeDesignProperties {

    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);
    private static final Catalogue CAT = Catalogue.builtIn();

    /**
     * Two designs evaluate alike: equal solver models (axisymmetric), or bit-identical SE at the
     * band's lower end (planar and shell models, which define no equality of their own).
     */
    private static void sameModel(WholeDesign a, WholeDesign b, String json) {
        if (a.kind() == WholeDesign.Kind.AXISYMMETRIC) {
            assertEquals(a.model(), b.model(), json);
        } else {
            double hz = a.band().low().toHertz();
            assertEquals(Double.doubleToRawLongBits(a.model().shieldingEffectivenessDb(hz)),
                    Double.doubleToRawLongBits(b.model().shieldingEffectivenessDb(hz)), json);
        }
    }

    @Test
    void anyDesignBuiltInCodeIsReadBackEqual() {
        qt().withExamples(TRIES).withShrinkCycles(0).forAll(longs().all()).checkAssert(seed -> {
            WholeDesign d = RandomWholeDesigns.of(seed).design();
            String json = WholeDesignFile.toJson(d);
            WholeDesign back = WholeDesignFile.parse(json, CAT);
            assertEquals(d, back, json);
            sameModel(d, back, json);
            assertEquals(json, WholeDesignFile.toJson(back));
        });
    }

    @Test
    void anyDocumentIsWrittenBackInTheTextsItGave() {
        qt().withExamples(TRIES).withShrinkCycles(0).forAll(longs().all()).checkAssert(seed -> {
            RandomWholeDesigns.Generated g = RandomWholeDesigns.of(seed);
            WholeDesign read = WholeDesignFile.parse(g.json(), CAT);
            // The document describes the same design as the code: the same kind and model.
            assertEquals(g.design().kind(), read.kind(), g.json());
            sameModel(g.design(), read, g.json());
            assertEquals(g.design().requirement(), read.requirement(), g.json());
            String back = WholeDesignFile.toJson(read);
            for (String text : g.texts()) {
                assertTrue(back.contains("\"" + text + "\"") || back.contains("\"-" + text + "\""),
                        text + " is lost in\n" + back + "\nfrom\n" + g.json());
            }
            WholeDesign again = WholeDesignFile.parse(back, CAT);
            assertEquals(read, again, back);
            assertEquals(back, WholeDesignFile.toJson(again));
        });
    }

    private static final JsonMapper MAPPER = JsonMapper.builder().build();

    /** A place in a pretty-printed document: its JSON path and the line its value starts on. */
    private record Place(String path, int line, boolean quantity) {
    }

    /** Every value of a document with its path and line, read with Jackson's own streaming parser. */
    private static List<Place> places(String json, List<String> quantities) {
        List<Place> out = new ArrayList<>();
        try (JsonParser p = JsonFactory.builder().build().createParser(ObjectReadContext.empty(), json)) {
            List<String> path = new ArrayList<>();
            List<int[]> counter = new ArrayList<>();   // {1, next index} for an array, {0, 0} for an object
            for (JsonToken t = p.nextToken(); t != null; t = p.nextToken()) {
                if (t == JsonToken.PROPERTY_NAME) {
                    continue;
                }
                if (t == JsonToken.END_OBJECT || t == JsonToken.END_ARRAY) {
                    path.remove(path.size() - 1);
                    counter.remove(counter.size() - 1);
                    continue;
                }
                String here = "$";
                if (!path.isEmpty()) {
                    int[] c = counter.get(counter.size() - 1);
                    here = c[0] == 1 ? path.get(path.size() - 1) + "[" + c[1]++ + "]"
                            : path.get(path.size() - 1) + "." + p.currentName();
                }
                int line = p.currentTokenLocation().getLineNr();
                out.add(new Place(here, line, t == JsonToken.VALUE_STRING && quantities.contains(p.getString())));
                if (t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) {
                    path.add(here);
                    counter.add(new int[] {t == JsonToken.START_ARRAY ? 1 : 0, 0});
                }
            }
        }
        return out;
    }

    private static JsonNode at(JsonNode root, String path) {
        JsonNode n = root;
        for (String part : path.substring(1).split("(?=[.\\[])")) {
            if (part.isEmpty()) {
                continue;
            }
            n = part.startsWith("[") ? n.get(Integer.parseInt(part.substring(1, part.length() - 1)))
                    : n.get(part.substring(1));
        }
        return n;
    }

    @Test
    void malformedDocumentsAreRefusedAtTheirPathAndLine() {
        qt().withExamples(TRIES).withShrinkCycles(0).forAll(longs().all()).checkAssert(seed -> {
            RandomWholeDesigns.Generated g = RandomWholeDesigns.of(seed);
            Random r = new Random(seed ^ 0x5DEECE66DL);
            ObjectNode root = (ObjectNode) MAPPER.readTree(g.json());
            String pretty = MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
            List<Place> all = places(pretty, g.texts());
            String expectedPath;
            if (r.nextBoolean()) {
                // A quantity without its unit: "0.25 mm" becomes "0.25".
                List<Place> q = all.stream().filter(Place::quantity).toList();
                Place chosen = q.get(r.nextInt(q.size()));
                String parent = chosen.path().substring(0, Math.max(chosen.path().lastIndexOf('.'),
                        chosen.path().lastIndexOf('[')));
                JsonNode holder = at(root, parent);
                String text = at(root, chosen.path()).asString();
                String bare = text.substring(0, text.indexOf(' '));
                if (holder instanceof ObjectNode o) {
                    o.put(chosen.path().substring(chosen.path().lastIndexOf('.') + 1), bare);
                } else {
                    ((tools.jackson.databind.node.ArrayNode) holder).set(
                            Integer.parseInt(chosen.path().replaceAll(".*\\[(\\d+)]$", "$1")), bare);
                }
                expectedPath = chosen.path();
            } else {
                // An unknown field in a random object.
                List<Place> objects = all.stream().filter(p -> at(root, p.path()) instanceof ObjectNode).toList();
                Place chosen = objects.get(r.nextInt(objects.size()));
                ((ObjectNode) at(root, chosen.path())).put("unknownField", 1);
                expectedPath = (chosen.path() + ".unknownField");
            }
            String bad = MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
            int expectedLine = places(bad, List.of()).stream().filter(p -> p.path().equals(expectedPath))
                    .findFirst().orElseThrow().line();
            MaterialFileException e = org.junit.jupiter.api.Assertions.assertThrows(MaterialFileException.class,
                    () -> WholeDesignFile.parse(bad, CAT), bad);
            assertEquals(expectedPath, e.path(), bad);
            assertEquals(expectedLine, e.line(), bad);
        });
    }
}
