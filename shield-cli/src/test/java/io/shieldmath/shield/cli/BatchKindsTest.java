/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.EstimatedValue;
import io.shieldmath.shield.axisymmetric.FieldDirection;
import io.shieldmath.shield.axisymmetric.TransverseFieldSolution;
import io.shieldmath.shield.axisymmetric.WorstDirectionSolution;
import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesignFile;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command evaluates every kind of design file to the library's own numbers, with the
 * units in the header, data only on standard output and progress only on standard error. The
 * designs are invented for the tests; the numbers are checked against the library's
 * {@code WholeDesign.model().at(f)}, which the axisymmetric module's own tests check against
 * published references.
 */
class BatchKindsTest {

    static final String SHELL = """
            {"format": "shield-design", "version": 3, "title": "sphere",
             "shell": {"form": "sphere", "radius": "4 cm",
                       "walls": [{"material": "nickel-iron-80", "thickness": "1 mm"}],
                       "openings": [{"kind": "holes", "diameter": "3 mm", "count": 4, "name": "vent"}],
                       "exposure": "uniform"},
             "field": {"kind": "plane-wave"}, "band": "10 Hz to 1 kHz", "points": 3}
            """;

    static final String COILS = """
            {"format": "shield-design", "version": 3, "title": "plate between coils",
             "arrangement": {
               "bodies": [{"name": "plate", "shape": "disc", "material": "copper-annealed",
                           "radius": "15 mm", "thickness": "0.5 mm"}],
               "coils": {"transmitter": {"radius": "10 mm", "turns": 10},
                         "receiver": {"radius": "10 mm", "turns": 10},
                         "separation": "30 mm"}},
             "band": "1 kHz to 10 kHz", "points": 2}
            """;

    static final String FIELD = """
            {"format": "shield-design", "version": 3, "title": "copper can",
             "arrangement": {
               "bodies": [{"name": "can", "shape": "can", "material": "copper-annealed",
                           "innerRadius": "10 mm", "wall": "0.5 mm", "length": "30 mm",
                           "lowerEnd": "capped", "upperEnd": "open"}],
               "appliedField": {"direction": "axial", "fluxDensity": "10 µT"}},
             "band": "100 Hz to 1 kHz", "points": 2}
            """;

    private record Run(int code, String out, String err) {
    }

    /** Runs the command with progress lines from the start (threshold 0), so that they show. */
    private static Run run(String stdin, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = BatchCommand.run(args, new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)), out,
                new PrintStream(err, true, StandardCharsets.UTF_8), 0);
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Every data line: a frequency and then the given number of fixed-point values. */
    private static void onlyData(List<String> lines, int values) {
        String number = "-?[0-9]+\\.[0-9]{6}";
        for (String l : lines.subList(1, lines.size())) {
            assertTrue(l.matches("[0-9.e+-]+(," + number + "){" + values + "}"), l);
        }
    }

    /** The library's numbers for a design at its own band, as the command prints them. */
    private static void sameAsLibrary(String json, List<String> lines) {
        WholeDesign d = WholeDesignFile.parse(json, Catalogue.builtIn());
        double[] hz = d.band().logSpacedHertz(d.points());
        assertEquals(hz.length + 1, lines.size(), String.join("\n", lines));
        for (int i = 0; i < hz.length; i++) {
            ShieldingResult r = d.model().at(Frequency.ofHertz(hz[i]));
            String[] cells = lines.get(i + 1).split(",");
            assertEquals(hz[i], Double.parseDouble(cells[0]));
            assertEquals(String.format(Locale.ROOT, "%.6f", r.shieldingEffectivenessDb()), cells[1]);
        }
    }

    @Test
    void shellIsEvaluatedAsAShellNotAsASheet(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "shell.json", SHELL);
        Run r = run("", "--design", f.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("frequency_hz,se_db", lines.get(0));
        onlyData(lines, 1);
        sameAsLibrary(SHELL, lines);
        assertTrue(r.err().contains("frequency 3 of 3 (1000.0 Hz) done"), r.err());
    }

    @Test
    void plateBetweenCoilsGivesTheSolversInsertionLoss(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "coils.json", COILS);
        Run r = run("", "--design", f.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("frequency_hz,se_db,discretisation_estimate_db", lines.get(0));
        onlyData(lines, 2);
        sameAsLibrary(COILS, lines);
        // One progress line per frequency, on standard error only.
        assertEquals(2, r.err().lines().filter(l -> l.matches("shield-batch: frequency [12] of 2 \\(.* Hz\\) done, "
                + "[0-9.]+ s")).count(), r.err());
        assertTrue(!r.out().contains("done"), r.out());
    }

    @Test
    void canInAnAppliedFieldAsJson(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "can.json", FIELD);
        Run r = run("", "--design", f.toString(), "--format", "json");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("{\n  \"design\": \"copper can\",\n  \"kind\": \"axisymmetric\",\n"
                + "  \"field\": \"uniform axial field, sensor point on the axis at z 0.00000 mm\",\n  \"results\": [\n"),
                r.out());
        assertEquals(2, r.out().lines().filter(l -> l.contains("\"discretisation_estimate_db\": ")).count(), r.out());
        WholeDesign d = WholeDesignFile.parse(FIELD, Catalogue.builtIn());
        double se = d.model().at(Frequency.ofHertz(100)).shieldingEffectivenessDb();
        assertTrue(r.out().contains("{\"frequency_hz\": 100.0, \"se_db\": " + String.format(Locale.ROOT, "%.6f", se)),
                r.out());
        assertTrue(r.out().endsWith("\n  ]\n}\n"), r.out());
    }

    @Test
    void canAcrossTheAxisGivesTheTransverseSolversNumbers(@TempDir Path dir) throws IOException {
        String across = FIELD.replace("\"axial\"", "\"transverse\"");
        Path f = BatchCommandTest.write(dir, "across.json", across);
        Run r = run("", "--design", f.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("frequency_hz,se_db,discretisation_estimate_db", lines.get(0));
        onlyData(lines, 2);
        sameAsLibrary(across, lines);
        assertTrue(WholeDesignFile.parse(across, Catalogue.builtIn()).model().at(Frequency.ofHertz(100))
                instanceof TransverseFieldSolution);
    }

    @Test
    void canInAFieldOfEitherDirectionSaysWhichIsWorse(@TempDir Path dir) throws IOException {
        String either = FIELD.replace("\"axial\"", "\"worst\"");
        Path f = BatchCommandTest.write(dir, "either.json", either);
        Run r = run("", "--design", f.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("frequency_hz,se_db,discretisation_estimate_db,axial_se_db,transverse_se_db,worse_direction",
                lines.get(0));
        sameAsLibrary(either, lines);
        WholeDesign d = WholeDesignFile.parse(either, Catalogue.builtIn());
        double[] hz = d.band().logSpacedHertz(d.points());
        for (int i = 0; i < hz.length; i++) {
            WorstDirectionSolution w = (WorstDirectionSolution) d.model().at(Frequency.ofHertz(hz[i]));
            boolean axial = w.worstDirection() == FieldDirection.AXIAL;
            EstimatedValue worse = axial ? w.axial().worstShieldingDb() : w.transverse().worstShieldingDb();
            assertEquals(String.format(Locale.ROOT, "%s,%.6f,%.6f,%.6f,%.6f,%s", hz[i], worse.value(), worse.estimate(),
                    w.axial().shieldingEffectivenessDb(), w.transverse().shieldingEffectivenessDb(),
                    axial ? "axial" : "transverse"), lines.get(i + 1));
            // The smaller of the two, by definition of the worse direction.
            assertEquals(Math.min(w.axial().shieldingEffectivenessDb(), w.transverse().shieldingEffectivenessDb()),
                    worse.value());
        }
        Run json = run("100 Hz\n", "--design", f.toString(), "--stdin", "--format", "json");
        assertEquals(0, json.code(), json.err());
        List<String> records = json.out().lines().toList();
        assertEquals("{\"design\": \"copper can\", \"kind\": \"axisymmetric\", \"field\": \"uniform field, the worse "
                + "of axial and transverse, sensor point on the axis at z 0.00000 mm\"}", records.get(0));
        String[] csv = lines.get(1).split(",");
        assertEquals("{\"frequency_hz\": 100.0, \"se_db\": " + csv[1] + ", \"discretisation_estimate_db\": " + csv[2]
                + ", \"axial_se_db\": " + csv[3] + ", \"transverse_se_db\": " + csv[4] + ", \"worse_direction\": \""
                + csv[5] + "\"}", records.get(1));
    }

    @Test
    void standardInputFrequenciesForAnArrangement(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "coils.json", COILS);
        Run r = run("5 kHz\n1 GHz\n", "--design", f.toString(), "--stdin");
        // The second line is above the geometry's quasi-static limit: an error record, and exit code 3.
        assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("frequency_hz,se_db,discretisation_estimate_db", lines.get(0));
        assertTrue(lines.get(1).startsWith("5000.0,"), r.out());
        assertTrue(lines.get(2).startsWith("# error: standard input line 2: frequency: \"1 GHz\" is out of range"),
                r.out());
        assertTrue(r.err().contains("standard input line 1 (5000.0 Hz) done"), r.err());
    }

    @Test
    void bandBeyondTheQuasiStaticLimitIsAUsageError(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.write(dir, "coils.json", COILS);
        Run r = run("", "--design", f.toString(), "--band", "1 kHz to 1 GHz", "--points", "2");
        assertEquals(BatchCommand.USAGE, r.code());
        assertTrue(r.err().contains("out of range for this axisymmetric design"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void planarDesignStillGivesItsParts(@TempDir Path dir) throws IOException {
        Path f = BatchCommandTest.design(dir);
        Run r = run("", "--design", f.toString(), "--band", "1 kHz to 10 kHz", "--points", "2");
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(ResultOutput.CSV_HEADER, lines.get(0));
        onlyData(lines, 4);
        WholeDesign d = WholeDesignFile.parse(BatchCommandTest.DESIGN, Catalogue.builtIn());
        assertEquals(String.format(Locale.ROOT, "%.6f", d.model().at(Frequency.ofKilohertz(10))
                .shieldingEffectivenessDb()), lines.get(2).split(",")[1]);
        assertEquals(FrequencyBand.parse("1 kHz to 10 kHz").logSpacedHertz(2)[1], Double.parseDouble(
                lines.get(2).split(",")[0]));
    }
}
