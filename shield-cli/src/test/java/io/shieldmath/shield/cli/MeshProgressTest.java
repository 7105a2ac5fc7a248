/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.AxialFieldSolution;
import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesignFile;
import io.shieldmath.shield.axisymmetric.internal.MeshProgress;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.quantity.Frequency;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Progress per mesh of the solver's refinement on standard error: each frequency of an
 * axisymmetric design is solved on a coarse and a fine mesh (fineness q/√2 and q without a
 * tolerance, as the solver documents), and the command names each with its fineness and its
 * unknowns before the frequency's "done" line. The last mesh of each frequency is checked
 * against the library's own solution (its fineness and unknowns).
 */
class MeshProgressTest {

    private static final Pattern MESH = Pattern.compile(
            "shield-batch: (.+) \\((.+) Hz\\): solving a mesh of fineness ([0-9.e+-]+) with ([0-9]+) unknowns, [0-9.]+ s");

    private static String errOf(String stdin, long afterNanos, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = BatchCommand.run(args, new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)), out,
                new PrintStream(err, true, StandardCharsets.UTF_8), afterNanos);
        String e = err.toString(StandardCharsets.UTF_8);
        assertEquals(0, code, e);
        return e;
    }

    @Test
    void eachMeshOfEachFrequencyIsNamedWithItsFinenessAndUnknowns(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "can.json", BatchKindsTest.FIELD);
        String err = errOf("", 0, "--design", f.toString());
        WholeDesign d = WholeDesignFile.parse(BatchKindsTest.FIELD, Catalogue.builtIn());
        double[] hz = d.band().logSpacedHertz(d.points());
        List<String> lines = err.lines().toList();
        for (int i = 0; i < hz.length; i++) {
            String what = "frequency " + (i + 1) + " of " + hz.length;
            List<Matcher> meshes = new ArrayList<>();
            for (String l : lines) {
                Matcher m = MESH.matcher(l);
                if (m.matches() && m.group(1).equals(what)) {
                    meshes.add(m);
                }
            }
            assertEquals(2, meshes.size(), what + "\n" + err);
            AxialFieldSolution s = (AxialFieldSolution) d.model().at(Frequency.ofHertz(hz[i]));
            Matcher fine = meshes.get(1);
            assertEquals(ResultOutput.shortest(hz[i]), fine.group(2));
            assertEquals(String.format(Locale.ROOT, "%.3g", s.fineness()), fine.group(3), err);
            assertEquals(s.unknowns(), Integer.parseInt(fine.group(4)), err);
            // The coarse mesh first: fineness q/√2, fewer unknowns.
            assertEquals(String.format(Locale.ROOT, "%.3g", s.fineness() / Math.sqrt(2)), meshes.get(0).group(3), err);
            assertTrue(Integer.parseInt(meshes.get(0).group(4)) < s.unknowns(), err);
            // Both before the frequency's done line.
            int done = lines.indexOf(lines.stream().filter(l -> l.startsWith("shield-batch: " + what + " (")
                    && l.contains(") done, ")).findFirst().orElseThrow());
            assertTrue(lines.indexOf(fine.group(0)) < done, err);
        }
    }

    @Test
    void standardInputLinesAreNamedByLineAndShortRunsSayNothing(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "can.json", BatchKindsTest.FIELD);
        String err = errOf("# a comment\n200 Hz\n", 0, "--design", f.toString(), "--stdin");
        assertEquals(2, err.lines().filter(l -> l.startsWith("shield-batch: standard input line 2 (200.0 Hz): solving a "
                + "mesh of fineness ")).count(), err);
        assertEquals("", errOf("", Long.MAX_VALUE, "--design", f.toString()));
        // A planar design has no meshes.
        Path planar = BatchCommandTest.design(dir);
        assertFalse(errOf("", 0, "--design", planar.toString()).contains("mesh"));
    }

    @Test
    void theHookBelongsToTheCallingThreadAndIsRestored() {
        List<String> heard = new ArrayList<>();
        String result = MeshProgress.during((q, n) -> heard.add("outer " + q + " " + n), () -> {
            MeshProgress.meshBuilt(1, 10);
            MeshProgress.during((q, n) -> heard.add("inner " + q + " " + n), () -> {
                MeshProgress.meshBuilt(2, 20);
                return null;
            });
            MeshProgress.meshBuilt(3, 30);
            return "ok";
        });
        MeshProgress.meshBuilt(4, 40);
        assertEquals("ok", result);
        assertEquals(List.of("outer 1.0 10", "inner 2.0 20", "outer 3.0 30"), heard);
    }
}
