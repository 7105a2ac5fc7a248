/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.materials.Catalogue;
import org.junit.jupiter.api.Test;

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
}
