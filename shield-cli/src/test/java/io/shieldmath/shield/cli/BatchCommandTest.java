/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.materials.files.DesignFile;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BatchCommandTest {

    static final String DESIGN = """
            {
              "format": "shield-design",
              "version": 1,
              "title": "copper plate",
              "layers": [ { "material": "copper-annealed", "thickness": "0.5 mm" } ],
              "field": { "kind": "plane-wave" },
              "band": "1 kHz to 1 MHz",
              "points": 4
            }
            """;

    record Run(int code, String out, String err) {
    }

    static Run run(String stdin, String... args) {
        return run(new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)), args);
    }

    static Run run(InputStream stdin, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = BatchCommand.run(args, stdin, out, new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** The design file {@link #DESIGN} in a directory. */
    static Path design(Path dir) throws IOException {
        return write(dir, "d.json", DESIGN);
    }

    static Path write(Path dir, String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    @Test
    void csvFromTheDesignsOwnBandMatchesTheLibrary(@TempDir Path dir) throws IOException {
        Path design = write(dir, "d.json", DESIGN);
        Run r = run("", "--design", design.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("frequency_hz,se_db,absorption_db,reflection_db,multiple_reflection_db", lines.get(0));
        assertEquals(5, lines.size());
        Barrier b = Barrier.of(Catalogue.builtIn().get("copper-annealed"), Length.ofMillimetres(0.5));
        double expected = b.facing(IncidentField.planeWave()).at(Frequency.ofKilohertz(1)).shieldingEffectivenessDb();
        assertEquals(expected, Double.parseDouble(lines.get(1).split(",")[1]), 1e-6);
    }

    @Test
    void frequenciesOnStandardInputAndJsonOutput(@TempDir Path dir) throws IOException {
        Path design = write(dir, "d.json", DESIGN);
        Run r = run("# frequencies\n10 kHz\n\n50000\n1.5 MHz\n", "--design", design.toString(), "--stdin",
                "--format", "json");
        assertEquals(0, r.code(), r.err());
        assertEquals(3, r.out().split("\"frequency_hz\"").length - 1, r.out());
        assertTrue(r.out().contains("\"frequency_hz\": 50000.0"), r.out());
        assertTrue(r.out().contains("\"design\": \"copper plate\""), r.out());
        Design d = DesignFile.read(design, Catalogue.builtIn());
        assertEquals("copper plate", d.title());
    }

    @Test
    void malformedJsonNamesItsLocation(@TempDir Path dir) throws IOException {
        Path design = write(dir, "bad.json", DESIGN.replace("\"0.5 mm\" }", "\"0.5 mm\" "));
        Run r = run("", "--design", design.toString());
        assertEquals(BatchCommand.BAD_INPUT, r.code());
        assertTrue(r.err().contains("line"), r.err());
        assertTrue(r.out().isEmpty());
    }

    @Test
    void unknownMaterialNamesItsJsonPath(@TempDir Path dir) throws IOException {
        Path design = write(dir, "d.json", DESIGN.replace("copper-annealed", "unobtainium"));
        Run r = run("", "--design", design.toString());
        assertEquals(BatchCommand.BAD_INPUT, r.code());
        assertTrue(r.err().contains("$.layers[0].material"), r.err());
        assertTrue(r.err().contains("unobtainium"), r.err());
    }

    @Test
    void emptyInputAndBadLinesAreErrors(@TempDir Path dir) throws IOException {
        Path design = write(dir, "d.json", DESIGN);
        Run empty = run("", "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, empty.code());
        assertTrue(empty.err().contains("no frequencies"), empty.err());
        Run bad = run("10 kHz\nten kHz\n", "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, bad.code());
        assertTrue(bad.err().contains("line 2"), bad.err());
        Path emptyFile = write(dir, "empty.json", "");
        Run emptyDesign = run("", "--design", emptyFile.toString());
        assertEquals(BatchCommand.BAD_INPUT, emptyDesign.code(), emptyDesign.err());
    }

    @Test
    void commandLineMistakesGiveUsage(@TempDir Path dir) throws IOException {
        assertEquals(BatchCommand.USAGE, run("").code());
        assertEquals(BatchCommand.USAGE, run("", "--design").code());
        assertEquals(BatchCommand.USAGE, run("", "--design", "x.json", "--format", "xml").code());
        assertEquals(BatchCommand.USAGE, run("", "--design", "x.json", "--wat").code());
        Run missing = run("", "--design", dir.resolve("missing.json").toString());
        assertEquals(BatchCommand.IO_ERROR, missing.code());
        assertTrue(missing.err().contains("cannot read design file " + dir.resolve("missing.json") + ": no such file"),
                missing.err());
        Path design = write(dir, "d.json", DESIGN);
        Run band = run("", "--design", design.toString(), "--band", "10 Hz to 1 kHz", "--points", "3");
        assertEquals(0, band.code(), band.err());
        assertEquals(4, band.out().lines().count());
    }
}
