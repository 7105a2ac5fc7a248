/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The batch-command examples of issue 15 (items 8, 9, 14 and 15), each as it was reported. */
class BatchRegressionTest {

    static final Pattern LONG_DIGIT_RUN = Pattern.compile("[0-9]{" + (Messages.DIGIT_RUN_LIMIT + 1) + ",}");

    /** One message line and, for usage errors, the usage line; no stack trace, no raw control character. */
    static void assertCleanMessage(BatchCommandTest.Run r) {
        long expectedLines = r.code() == BatchCommand.USAGE ? 2 : 1;
        assertEquals(expectedLines, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("shield-batch: "), r.err());
        assertFalse(r.err().contains("Exception in") || r.err().contains("\tat "), r.err());
        assertFalse(LONG_DIGIT_RUN.matcher(r.err()).find(), r.err());
        r.err().strip().codePoints().filter(c -> c != '\n').forEach(c -> assertFalse(Messages.unsafe(c),
                () -> "raw U+" + Integer.toHexString(c) + " in " + r.err()));
    }

    @Test
    void badBandExitsTwoAndNamesBand(@TempDir Path dir) throws IOException {
        String design = BatchCommandTest.design(dir).toString();
        for (String band : new String[] {"1 Hz to x", "1 Hz to 1e20 Hz", "1e-9 Hz to 1 kHz", "1 MHz to 1 Hz", "",
            "1 Hz" + " ".repeat(99_000) + "to 1 kHz", "1 Hz to 1 kHz" + " ".repeat(20_000) + "x"}) {
            BatchCommandTest.Run r = BatchCommandTest.run("", "--design", design, "--band", band);
            assertEquals(BatchCommand.USAGE, r.code(), r.err());
            assertTrue(r.err().startsWith("shield-batch: --band: "), r.err());
            assertCleanMessage(r);
            assertTrue(r.err().length() < 400, r.err());
        }
        // Refused before the design file is read: a missing design does not hide the usage error.
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", dir.resolve("none.json").toString(),
                "--band", "1 Hz to 1e20 Hz");
        assertEquals(BatchCommand.USAGE, r.code(), r.err());
        assertTrue(r.err().contains("upper end of \"1 Hz to 1e20 Hz\" is out of range; allowed: from 1.0e-6 Hz "
                + "to 1.0e13 Hz"), r.err());
    }

    @Test
    void designFollowedByStdinIsAUsageError() {
        BatchCommandTest.Run r = BatchCommandTest.run("10 kHz\n", "--design", "--stdin");
        assertEquals(BatchCommand.USAGE, r.code(), r.err());
        assertTrue(r.err().startsWith("shield-batch: --design needs a value before --stdin\n"), r.err());
        assertCleanMessage(r);
    }

    @Test
    void otherCommandLineMistakesAreUsageErrors(@TempDir Path dir) throws IOException {
        String design = BatchCommandTest.design(dir).toString();
        String[][] cases = {
            {"--design", design, "--design", design},
            {"--design", design, "--stdin", "--stdin"},
            {"--design", design, "--points", "1" + "0".repeat(300)},
            {"--design", design, "--points", "+5"},
            {"--design", design, "--points", "0"},
            {"--design", design, "--points", "100001"},
            {"--design", design, "--stdin", "--points", "5"},
            {"--design", design, "--format", "\u001b[2J" + "x".repeat(10_000)},
            {"--design", design, "\u0007--beep"},
            {"--design", design, "--band"},
        };
        for (String[] args : cases) {
            BatchCommandTest.Run r = BatchCommandTest.run("", args);
            assertEquals(BatchCommand.USAGE, r.code(), String.join(" ", args) + ": " + r.err());
            assertCleanMessage(r);
            assertTrue(r.err().length() < 400, r.err());
        }
    }

    @Test
    void byteOrderMarkOnStandardInputIsSkipped(@TempDir Path dir) throws IOException {
        BatchCommandTest.Run r = BatchCommandTest.run("\uFEFF10 kHz\n", "--design",
                BatchCommandTest.design(dir).toString(), "--stdin");
        assertEquals(BatchCommand.OK, r.code(), r.err());
        assertTrue(r.out().contains("\n10000.0,"), r.out());
    }

    @Test
    void escapeAndBellFromInputAreEscaped(@TempDir Path dir) throws IOException {
        BatchCommandTest.Run r = BatchCommandTest.run("\u001b[31mred\u0007\n", "--design",
                BatchCommandTest.design(dir).toString(), "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("\"\\u001B[31mred\\u0007\""), r.err());
        assertCleanMessage(r);
    }

    @Test
    void longBadLinesAndHugeNumbersAreShortened(@TempDir Path dir) throws IOException {
        String design = BatchCommandTest.design(dir).toString();
        for (String line : new String[] {"1" + "0".repeat(300), "1" + "0".repeat(300) + " Hz",
            "x".repeat(999), "1e300 Hz", "1e-400 MHz", "5 " + "k".repeat(900) + "Hz"}) {
            BatchCommandTest.Run r = BatchCommandTest.run(line + "\n", "--design", design, "--stdin");
            assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
            assertTrue(r.err().startsWith("shield-batch: standard input line 1: frequency: "), r.err());
            assertCleanMessage(r);
            assertTrue(r.err().length() < 400, r.err());
        }
    }

    @Test
    void arithmeticFailureExitsThreeWithOneLine(@TempDir Path dir) throws IOException {
        // A near field at 1e-200 m was accepted by the reader and failed in the evaluation with
        // ArithmeticException (exit 1 and a stack trace). Whether the reader refuses it or the
        // evaluation fails, the answer is exit 3 and one short line.
        for (String distance : new String[] {"1e-200 m", "1e100 m"}) {
            Path design = BatchCommandTest.write(dir, "near.json", BatchCommandTest.DESIGN.replace(
                    "{ \"kind\": \"plane-wave\" }", "{ \"kind\": \"magnetic-near-field\", \"distance\": \"" + distance
                            + "\", \"impedance\": \"exact-dipole\" }"));
            BatchCommandTest.Run r = BatchCommandTest.run("", "--design", design.toString());
            assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
            assertCleanMessage(r);
            assertTrue(r.err().length() < Messages.MESSAGE_LIMIT + 100, r.err());
            assertTrue(r.out().isEmpty(), r.out());
        }
    }
}
