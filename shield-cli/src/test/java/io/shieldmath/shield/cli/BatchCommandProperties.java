/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Generated hostile input (issue 15, item 15): whatever a line of standard input, an option
 * value or a message holds, standard error gets short lines with no raw control character,
 * and the exit code is a documented one for that kind of input.
 */
class BatchCommandProperties {

    static final int TRIES = Integer.getInteger("shield.cli.tries", 300);

    private static final String[] PIECES = {"1", "0", "5", "e", "E", "-", "+", ".", "308", "400", " ", "\t",
        "\u00a0", "Hz", "kHz", "MHz", "mHz", "GHz", "to", "..", " - ", "#", "\"", "\\", "\u001b[31m", "\u0007",
        "\u0000", "\u007f", "\u009b", "\u202e", "\u200b", "\ufeff", "\u2028", "\ud800", "\udc00", "\ud83d\ude00",
        "µ", "Ω", "NaN", "Infinity", "0x1p3", "x", "%n", "%s"};

    /** Text made of hostile pieces, sometimes with a long run of one of them. */
    static String hostile(Random r) {
        StringBuilder b = new StringBuilder();
        int n = r.nextInt(8);
        for (int i = 0; i < n; i++) {
            String piece = PIECES[r.nextInt(PIECES.length)];
            b.append(r.nextInt(10) == 0 ? piece.repeat(1 + r.nextInt(400)) : piece);
        }
        return b.toString();
    }

    static void assertSafe(String err, String input) {
        for (String line : err.split("\n", -1)) {
            assertTrue(line.length() <= Messages.MESSAGE_LIMIT + 40, () -> "long line for " + input + ": " + line);
            line.codePoints().forEach(c -> assertFalse(Messages.unsafe(c), () -> "raw U+"
                    + Integer.toHexString(c) + " for input " + input.codePoints().limit(80).boxed().toList()));
        }
        assertTrue(err.isEmpty() || err.endsWith("\n"), err);
        assertFalse(err.contains("\tat ") || err.contains("Exception in"), err);
    }

    @Test
    void anyLineOfStandardInputGivesAResultOrOneCleanMessage(@TempDir Path dir) throws IOException {
        String design = BatchCommandTest.design(dir).toString();
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            String line = hostile(new Random(seed)).replace("\n", "").replace("\r", "");
            BatchCommandTest.Run r = BatchCommandTest.run(line + "\n", "--design", design, "--stdin");
            assertTrue(Set.of(BatchCommand.OK, BatchCommand.BAD_INPUT).contains(r.code()), r.code() + r.err());
            assertSafe(r.err(), line);
            if (r.code() == BatchCommand.OK) {
                // Only the validity notes' summary (a metal above 100 GHz, say) may follow a result.
                assertTrue(r.err().lines().allMatch(l -> l.startsWith("shield-batch: validity note ")), r.err());
                assertEquals(2, r.out().lines().count(), r.out());
            } else {
                assertEquals(1, r.err().lines().count(), r.err());
            }
        });
    }

    @Test
    void anyBandGivesASweepOrAUsageErrorNamingBand(@TempDir Path dir) throws IOException {
        String design = BatchCommandTest.design(dir).toString();
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            String band = hostile(new Random(seed));
            BatchCommandTest.Run r = BatchCommandTest.run("", "--design", design, "--band", band, "--points", "2");
            assertSafe(r.err(), band);
            if (r.code() == BatchCommand.OK) {
                assertEquals(3, r.out().lines().count(), r.out());
            } else {
                assertEquals(BatchCommand.USAGE, r.code(), r.err());
                assertTrue(r.err().startsWith("shield-batch: --band: "), r.err());
            }
        });
    }

    @Test
    void anyMessageIsCleanedToSafeBoundedText() {
        qt().withExamples(TRIES * 10).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            String text = hostile(r) + "\"" + hostile(r) + "\"" + hostile(r);
            String cleaned = Messages.clean(text);
            assertSafe(cleaned + "\n", text);
            assertFalse(cleaned.contains("\n"), cleaned);
            // Digit runs count in the text itself, not in the hexadecimal of an escape beside digits.
            assertFalse(BatchRegressionTest.LONG_DIGIT_RUN.matcher(cleaned.replaceAll("\\\\u[0-9A-F]{4}", "\\\\u"))
                    .find(), cleaned);
            assertTrue(cleaned.length() <= Messages.MESSAGE_LIMIT + 40, cleaned);
        });
    }
}
