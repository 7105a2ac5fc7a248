/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SeChartTest {

    @Test
    void svgKeepsItsWordsAsText(@TempDir Path dir) throws IOException {
        double[] hz = {10, 100, 1000, 10000};
        SeChart.write(dir.resolve("c.png"), dir.resolve("c.svg"), "Invented title for a test",
                List.of(new SeChart.Curve("plate: invented", hz, new double[] {1, 5, 20, 60})),
                List.of(new SeChart.Curve("required", new double[] {40, 60}, new double[] {30, 30})));
        String svg = Files.readString(dir.resolve("c.svg"));
        assertTrue(svg.contains("<text"), "text must be written as <text> elements");
        assertTrue(svg.contains("Invented title for a test"), "the title must be searchable text");
        assertTrue(!svg.contains("<font") && !svg.contains("<glyph"), "no embedded fonts or glyph outlines");
    }
}
