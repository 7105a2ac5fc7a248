/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.SequenceInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --stdin} as a stream in bounded memory, with its documented caps (issue 15, items 8
 * and 15): each line is answered before the next is read, an over-long line and too many
 * lines are refused as soon as they are seen, and the text is strict UTF-8.
 */
class StandardInputTest {

    /** {@code count} bytes of {@code fill}, made on demand, counting what was read. */
    static final class Repeated extends InputStream {
        final byte fill;
        final long count;
        long read;

        Repeated(char fill, long count) {
            this.fill = (byte) fill;
            this.count = count;
        }

        @Override
        public int read() {
            if (read >= count) {
                return -1;
            }
            read++;
            return fill;
        }

        @Override
        public int read(byte[] b, int off, int len) {
            if (read >= count) {
                return -1;
            }
            int n = (int) Math.min(len, count - read);
            java.util.Arrays.fill(b, off, off + n, fill);
            read += n;
            return n;
        }
    }

    static InputStream text(String s) {
        return new ByteArrayInputStream(s.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void eachLineIsAnsweredBeforeTheNextIsRead(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        List<String> wrong = new ArrayList<>();
        String[] lines = {"10 kHz\n", "# a comment\n", "20 kHz\n", "\n", "30000\n", "1 MHz\n"};
        // The number of frequency lines among the first k lines, for k = 0 to 6.
        int[] answersBefore = {0, 1, 1, 2, 2, 3, 4};
        InputStream in = new InputStream() {
            int next;

            @Override
            public int read() {
                throw new AssertionError("read one byte at a time");
            }

            @Override
            public int read(byte[] b, int off, int len) {
                // Every line handed out so far must have its answer on the output already.
                long answers = Math.max(0, out.toString(StandardCharsets.UTF_8).lines().count() - 1);
                if (answers != answersBefore[next]) {
                    wrong.add("before line " + (next + 1) + ": " + answers + " answers");
                }
                if (next == lines.length) {
                    return -1;
                }
                byte[] line = lines[next++].getBytes(StandardCharsets.UTF_8);
                System.arraycopy(line, 0, b, off, line.length);
                return line.length;
            }
        };
        int code = BatchCommand.run(new String[] {"--design", design.toString(), "--stdin"}, in, out,
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
        assertEquals(BatchCommand.OK, code);
        assertEquals(List.of(), wrong);
        assertEquals(5, out.toString(StandardCharsets.UTF_8).lines().count());
    }

    @Test
    void tenMegabyteLineIsRefusedWithoutReadingItAllOrEchoingIt(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        Repeated in = new Repeated('7', 10_000_000L);
        BatchCommandTest.Run r = BatchCommandTest.run(in, "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().startsWith("shield-batch: standard input line 1: longer than 1000 characters; it starts "
                + "\"7777777777777777777777777777777777777777...\""), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().length() < 200, r.err());
        assertTrue(in.read < 100_000, "read " + in.read + " bytes");
        assertTrue(r.out().isEmpty(), r.out());
    }

    @Test
    void lineAtTheCapIsReadAndOneMoreCharacterIsNot(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        String atCap = " ".repeat(BatchCommand.MAX_LINE_CHARS - 6) + "10 kHz";
        BatchCommandTest.Run ok = BatchCommandTest.run(atCap + "\n", "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.OK, ok.code(), ok.err());
        assertTrue(ok.out().contains("\n10000.0,"), ok.out());
        BatchCommandTest.Run over = BatchCommandTest.run("20 kHz\n " + atCap + "\n", "--design", design.toString(),
                "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, over.code(), over.err());
        assertTrue(over.err().contains("line 2: longer than 1000 characters"), over.err());
        // The answer to line 1 was written before line 2 was refused.
        assertTrue(over.out().contains("\n20000.0,"), over.out());
    }

    @Test
    void linesUpToTheCapAreReadAndOneMoreIsRefused(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        long blank = BatchCommand.MAX_INPUT_LINES - 1;
        BatchCommandTest.Run ok = BatchCommandTest.run(new SequenceInputStream(new Repeated('\n', blank),
                text("10 kHz\n")), "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.OK, ok.code(), ok.err());
        assertEquals(2, ok.out().lines().count());
        BatchCommandTest.Run over = BatchCommandTest.run(new SequenceInputStream(new Repeated('\n', blank + 1),
                text("10 kHz")), "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, over.code(), over.err());
        assertTrue(over.err().contains("standard input: more than 10000000 lines"), over.err());
    }

    @Test
    void lineEndingsOfEveryKindAndALastLineWithoutOne(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        BatchCommandTest.Run r = BatchCommandTest.run("10 kHz\r\n20 kHz\r30 kHz\n\r\n40 kHz", "--design",
                design.toString(), "--stdin");
        assertEquals(BatchCommand.OK, r.code(), r.err());
        List<String> freq = r.out().lines().skip(1).map(l -> l.split(",")[0]).toList();
        assertEquals(List.of("10000.0", "20000.0", "30000.0", "40000.0"), freq);
    }

    @Test
    void byteOrderMarkIsSkippedAtTheStartOnly(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        BatchCommandTest.Run first = BatchCommandTest.run("\uFEFF10 kHz\n", "--design", design.toString(),
                "--stdin");
        assertEquals(BatchCommand.OK, first.code(), first.err());
        assertEquals(2, first.out().lines().count());
        BatchCommandTest.Run later = BatchCommandTest.run("10 kHz\n\uFEFF20 kHz\n", "--design", design.toString(),
                "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, later.code(), later.err());
        assertTrue(later.err().contains("line 2") && later.err().contains("\\uFEFF20 kHz"), later.err());
    }

    @Test
    void malformedUtf8IsRefusedWithItsLine(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        byte[] bytes = {'1', '0', ' ', 'k', 'H', 'z', '\n', '2', '0', (byte) 0xFF, '\n'};
        BatchCommandTest.Run r = BatchCommandTest.run(new ByteArrayInputStream(bytes), "--design", design.toString(),
                "--stdin");
        assertEquals(BatchCommand.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("standard input line 2: not UTF-8 text"), r.err());
        assertTrue(r.out().contains("\n10000.0,"), r.out());
    }

    @Test
    void plainNumbersAreReadStrictly() throws CommandFailure {
        assertEquals(50_000.0, BatchCommand.frequencyHertz("50000"));
        assertEquals(25_000.0, BatchCommand.frequencyHertz("2.5e4"));
        assertEquals(0.5, BatchCommand.frequencyHertz(".5"));
        assertEquals(7.0, BatchCommand.frequencyHertz("+7"));
        assertEquals(25_000.0, BatchCommand.frequencyHertz("25 kHz"));
        for (String bad : new String[] {"0x1p4", "NaN", "Infinity", "5d", "5f", "1e", "--5", "1.2.3", "5 5",
            "1e400", "1e-400", "0", "-5", "2e13", "1e-7"}) {
            try {
                BatchCommand.frequencyHertz(bad);
                throw new AssertionError("accepted " + bad);
            } catch (CommandFailure f) {
                assertEquals(BatchCommand.BAD_INPUT, f.exitCode());
                assertTrue(f.getMessage().startsWith("frequency: "), f.getMessage());
                assertTrue(f.getMessage().contains(bad), f.getMessage());
            }
        }
    }

    @Test
    void readFailureExitsFourAndAFaultIsOneLine(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        InputStream broken = new InputStream() {
            @Override
            public int read() throws IOException {
                throw new IOException("Input/output error");
            }
        };
        BatchCommandTest.Run r = BatchCommandTest.run(broken, "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.IO_ERROR, r.code(), r.err());
        assertEquals("shield-batch: cannot read standard input: Input/output error", r.err().strip());
        InputStream faulty = new InputStream() {
            @Override
            public int read() {
                throw new IllegalStateException("a fault\n\tat somewhere");
            }
        };
        BatchCommandTest.Run f = BatchCommandTest.run(faulty, "--design", design.toString(), "--stdin");
        assertEquals(BatchCommand.INTERNAL_ERROR, f.code(), f.err());
        assertEquals(1, f.err().lines().count(), f.err());
        assertTrue(f.err().contains("internal error") && f.err().contains("IllegalStateException"), f.err());
        assertFalse(f.err().contains("\tat"), f.err());
    }
}
