/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesignFile;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The validity notes of the results reach the user: summarised on standard error after the run,
 * in each JSON result object that has some, and never in the CSV rows. These are checks of the
 * plumbing: the notes expected at each frequency are taken from the library's own
 * {@link PlanarResult#validityNotes()} for the same barrier and field.
 */
class ValidityNotesTest {

    /**
     * A 0.5 mm copper sheet 1 m from a small loop, with the textbook near-field impedance, from
     * 1 MHz to 1 GHz. kr = 2πf·r/c reaches 0.3 near 14 MHz (r = 1 m), so the upper frequencies are
     * beyond the near field and carry NOT_NEAR_FIELD notes, the lower ones none (kr = 0.3 is
     * the library's documented limit for the textbook form; the boundary between near and far
     * field near kr = 1 is common practice, no source).
     */
    static final String NEAR = """
            {
              "format": "shield-design",
              "version": 3,
              "title": "copper sheet near a loop (invented)",
              "layers": [ { "material": "copper-annealed", "thickness": "0.5 mm" } ],
              "field": { "kind": "magnetic-near-field", "distance": "1 m", "impedance": "textbook" },
              "band": "1 MHz to 1 GHz",
              "points": 4
            }
            """;

    private static List<String> resultLines(String out) {
        return out.lines().skip(1).toList();
    }

    /** The notes the library gives at each frequency of the run, by frequency. */
    private static Map<Double, List<ValidityNote>> libraryNotes(List<Double> hertz) {
        Barrier b = Barrier.of(Catalogue.builtIn().get("copper-annealed"), Length.ofMillimetres(0.5));
        IncidentField f = IncidentField.magneticNearField(Length.ofMetres(1), ImpedanceForm.TEXTBOOK);
        Map<Double, List<ValidityNote>> notes = new TreeMap<>();
        for (double hz : hertz) {
            notes.put(hz, b.facing(f).at(Frequency.ofHertz(hz)).validityNotes());
        }
        return notes;
    }

    @Test
    void csvRowsStayPlainAndStandardErrorSummarisesEachNoteWithItsFrequencies(@TempDir Path dir)
            throws IOException {
        Path design = BatchCommandTest.write(dir, "near.json", NEAR);
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", design.toString());
        assertEquals(0, r.code(), r.err());
        List<String> rows = resultLines(r.out());
        assertEquals(4, rows.size(), r.out());
        List<Double> hertz = new ArrayList<>();
        for (String row : rows) {
            String[] cells = row.split(",");
            assertEquals(5, cells.length, row);
            for (String c : cells) {
                Double.parseDouble(c);
            }
            hertz.add(Double.parseDouble(cells[0]));
        }
        Map<Double, List<ValidityNote>> expected = libraryNotes(hertz);
        // The limits the library reports, each with the lowest and highest frequency where it applies.
        Map<ValidityNote.Limit, double[]> ranges = new TreeMap<>();
        for (Map.Entry<Double, List<ValidityNote>> e : expected.entrySet()) {
            for (ValidityNote n : e.getValue()) {
                double[] range = ranges.computeIfAbsent(n.limit(), l -> new double[] {e.getKey(), e.getKey(), 0});
                range[1] = e.getKey();
                range[2]++;
            }
        }
        assertTrue(ranges.containsKey(ValidityNote.Limit.NOT_NEAR_FIELD), ranges.toString());
        assertTrue(expected.get(hertz.get(0)).isEmpty(), "1 MHz is in the near field at 1 m");
        List<String> noteLines = r.err().lines().filter(l -> l.startsWith("shield-batch: validity note ")).toList();
        assertEquals(ranges.size(), noteLines.size(), r.err());
        for (Map.Entry<ValidityNote.Limit, double[]> e : ranges.entrySet()) {
            double[] range = e.getValue();
            String where = range[0] == range[1] ? "at " + ResultOutput.shortest(range[0]) + " Hz"
                    : "from " + ResultOutput.shortest(range[0]) + " Hz to " + ResultOutput.shortest(range[1]) + " Hz";
            String start = "shield-batch: validity note " + e.getKey() + " at " + (long) range[2] + " of 4 frequencies, "
                    + where + ": ";
            assertTrue(noteLines.stream().anyMatch(l -> l.startsWith(start)), start + " in\n" + r.err());
        }
        // The line shows the message at the lowest frequency where the note applies.
        double lowest = ranges.get(ValidityNote.Limit.NOT_NEAR_FIELD)[0];
        String message = expected.get(lowest).stream().filter(n -> n.limit() == ValidityNote.Limit.NOT_NEAR_FIELD)
                .findFirst().orElseThrow().message();
        assertTrue(noteLines.stream().anyMatch(l -> l.contains(": " + message)), message + " in\n" + r.err());
        assertFalse(r.out().contains("NOT_NEAR_FIELD"), r.out());
        // The README's batch section shows this very line.
        String readme = Files.readString(Path.of("..", "README.md"), StandardCharsets.UTF_8);
        String shown = noteLines.stream().filter(l -> l.contains("NOT_NEAR_FIELD")).findFirst().orElseThrow();
        assertTrue(readme.contains("\n" + shown + "\n"), "README does not show the line " + shown);
    }

    @Test
    void jsonResultsCarryTheNotesOfTheirFrequencyAndOnlyThen(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.write(dir, "near.json", NEAR);
        BatchCommandTest.Run r = BatchCommandTest.run("1 MHz\n1 GHz\n", "--design", design.toString(), "--stdin",
                "--format", "json");
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(3, lines.size(), r.out());
        Map<Double, List<ValidityNote>> expected = libraryNotes(List.of(1e6, 1e9));
        assertTrue(expected.get(1e6).isEmpty());
        assertFalse(expected.get(1e9).isEmpty());
        assertFalse(lines.get(1).contains(ResultOutput.NOTES_FIELD), lines.get(1));
        StringBuilder notes = new StringBuilder(", \"" + ResultOutput.NOTES_FIELD + "\": [");
        for (ValidityNote n : expected.get(1e9)) {
            notes.append(notes.charAt(notes.length() - 1) == '[' ? "" : ", ").append("{\"limit\": \"")
                    .append(n.limit()).append("\", \"message\": ").append(ResultOutput.jsonString(n.message()))
                    .append('}');
        }
        String row = lines.get(2);
        assertTrue(row.startsWith("{\"frequency_hz\": 1.0e9, \"se_db\": "), row);
        assertTrue(row.endsWith(notes.append("]}").toString()), row + "\nexpected the end " + notes);
        // The summary on standard error: the one frequency of two where each note applied.
        for (ValidityNote n : expected.get(1e9)) {
            assertTrue(r.err().contains("shield-batch: validity note " + n.limit() + " at 1 of 2 frequencies, at 1.0e9 Hz: "),
                    r.err());
        }

        BatchCommandTest.Run document = BatchCommandTest.run("", "--design", design.toString(), "--format", "json");
        assertEquals(0, document.code(), document.err());
        assertTrue(document.out().contains("\"" + ResultOutput.NOTES_FIELD + "\": [{\"limit\": \"NOT_NEAR_FIELD\""),
                document.out());
        assertTrue(document.out().endsWith("}\n  ]\n}\n"), document.out());
    }

    @Test
    void aRunThatEndsOnABadLineStillSummarisesTheNotes(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.write(dir, "near.json", NEAR);
        BatchCommandTest.Run r = BatchCommandTest.run("1 GHz\nfast\n", "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("shield-batch: standard input line 2: "), r.err());
        assertTrue(r.err().contains("shield-batch: validity note NOT_NEAR_FIELD at 1 of 1 frequency, at 1.0e9 Hz: "),
                r.err());
        assertTrue(r.out().lines().noneMatch(l -> l.contains("NOT_NEAR_FIELD")), r.out());
    }

    /**
     * A nickel-iron sphere with two openings in a uniform field: each opening in a high-permeability
     * wall has its own note, and the large port (radius 15 mm at 40 mm from the centre) also its
     * small-hole note; the notes of one limit stay apart by opening.
     */
    static final String SHELL = """
            {"format": "shield-design", "version": 3, "title": "sphere with a vent and a port (invented)",
             "shell": {"form": "sphere", "radius": "4 cm",
                       "walls": [{"material": "nickel-iron-80", "thickness": "1 mm"}],
                       "openings": [{"kind": "holes", "diameter": "3 mm", "count": 4, "name": "vent"},
                                    {"kind": "holes", "diameter": "30 mm", "count": 1, "name": "port"}],
                       "exposure": "uniform"},
             "field": {"kind": "plane-wave"}, "band": "10 Hz to 1 kHz", "points": 3}
            """;

    @Test
    void severalNotesOfOneLimitInAResultStayApart(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.write(dir, "shell.json", SHELL);
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", design.toString());
        assertEquals(0, r.code(), r.err());
        WholeDesign d = WholeDesignFile.parse(SHELL, Catalogue.builtIn());
        double[] hz = d.band().logSpacedHertz(d.points());
        List<ValidityNote> notes = d.model().at(Frequency.ofHertz(hz[0])).validityNotes();
        for (double f : hz) {
            assertEquals(notes, d.model().at(Frequency.ofHertz(f)).validityNotes(), "the same notes at every frequency");
        }
        assertEquals(3, notes.size(), notes.toString());
        List<String> expected = new ArrayList<>();
        for (ValidityNote n : notes) {
            expected.add("shield-batch: validity note " + n.limit() + " at 3 of 3 frequencies, from "
                    + ResultOutput.shortest(hz[0]) + " Hz to " + ResultOutput.shortest(hz[2]) + " Hz: " + n.message());
        }
        List<String> lines = r.err().lines().toList();
        assertEquals(expected.size(), lines.size(), r.err());
        assertTrue(lines.containsAll(expected), r.err());
    }

    @Test
    void aDesignWithoutNotesSaysNothingMore(@TempDir Path dir) throws IOException {
        // A plane wave on copper from 1 kHz to 1 MHz: no limit of the planar model is near
        // (the notes are only for the textbook near-field form and for metals above 100 GHz).
        Path design = BatchCommandTest.design(dir);
        BatchCommandTest.Run csv = BatchCommandTest.run("", "--design", design.toString());
        assertEquals(0, csv.code(), csv.err());
        assertEquals("", csv.err());
        BatchCommandTest.Run json = BatchCommandTest.run("", "--design", design.toString(), "--format", "json");
        assertEquals(0, json.code(), json.err());
        assertEquals("", json.err());
        assertFalse(json.out().contains(ResultOutput.NOTES_FIELD), json.out());
    }

    @Test
    void groupsKeepTheirLowestMessageAndRangeWhateverTheOrder() {
        NoteSummary s = new NoteSummary();
        ValidityNote.Limit q = ValidityNote.Limit.QUASI_STATIC;
        ValidityNote.Limit hole = ValidityNote.Limit.SMALL_HOLE;
        s.add(2e9, List.of(ValidityNote.of(q, "k0L 2"), ValidityNote.of(hole, "a: hole"), ValidityNote.of(hole, "b: hole")));
        s.add(1e9, List.of(ValidityNote.of(q, "k0L 1"), ValidityNote.of(hole, "a: hole"), ValidityNote.of(hole, "b: hole")));
        s.add(1e3, List.of(ValidityNote.of(hole, "a: hole"), ValidityNote.of(hole, "b: hole")));
        assertEquals(List.of(
                "validity note QUASI_STATIC at 2 of 3 frequencies, from 1.0e9 Hz to 2.0e9 Hz: k0L 1 (as at 1.0e9 Hz; "
                        + "its numbers change with the frequency)",
                "validity note SMALL_HOLE at 3 of 3 frequencies, from 1000.0 Hz to 2.0e9 Hz: a: hole",
                "validity note SMALL_HOLE at 3 of 3 frequencies, from 1000.0 Hz to 2.0e9 Hz: b: hole"), s.lines());
        NoteSummary none = new NoteSummary();
        none.add(1e3, List.of());
        assertTrue(none.isEmpty());
        assertEquals(List.of(), none.lines());
    }
}
