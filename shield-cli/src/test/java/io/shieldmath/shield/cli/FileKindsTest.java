/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Design and catalogue files (issue 15, items 9 and 15): anything but a regular file is refused
 * before it is opened, so a named pipe cannot block the command, and every file error names the
 * file, its role and the reason.
 */
class FileKindsTest {

    static void assertOneLine(String expected, BatchCommandTest.Run r) {
        assertEquals(expected, r.err().strip(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.out().isEmpty(), r.out());
    }

    @Test
    void directoryIsNamedWithTheReason(@TempDir Path dir) throws IOException {
        BatchCommandTest.Run design = BatchCommandTest.run("", "--design", dir.toString());
        assertEquals(BatchCommand.IO_ERROR, design.code());
        assertOneLine("shield-batch: cannot read design file " + dir + ": is a directory", design);
        Path d = BatchCommandTest.design(dir);
        BatchCommandTest.Run catalogue = BatchCommandTest.run("", "--design", d.toString(), "--catalogue",
                dir.toString());
        assertEquals(BatchCommand.IO_ERROR, catalogue.code());
        assertOneLine("shield-batch: cannot read catalogue file " + dir + ": is a directory", catalogue);
    }

    @Test
    void missingFilesAndPathsThroughAFileAreNamed(@TempDir Path dir) throws IOException {
        Path missing = dir.resolve("missing.json");
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", missing.toString());
        assertEquals(BatchCommand.IO_ERROR, r.code());
        assertOneLine("shield-batch: cannot read design file " + missing + ": no such file", r);
        Path through = BatchCommandTest.design(dir).resolve("x.json");
        BatchCommandTest.Run t = BatchCommandTest.run("", "--design", through.toString());
        assertEquals(BatchCommand.IO_ERROR, t.code());
        assertTrue(t.err().startsWith("shield-batch: cannot read design file " + through + ": "), t.err());
    }

    @Test
    void deviceIsNotARegularFile(@TempDir Path dir) throws IOException {
        Path d = BatchCommandTest.design(dir);
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", d.toString(), "--catalogue", "/dev/null");
        assertEquals(BatchCommand.IO_ERROR, r.code());
        assertOneLine("shield-batch: cannot read catalogue file /dev/null: not a regular file (a named pipe, "
                + "device or socket)", r);
    }

    @Test
    void namedPipeIsRefusedWithoutBlocking(@TempDir Path dir) throws Exception {
        Path fifo = dir.resolve("design.fifo");
        Process mkfifo = new ProcessBuilder("mkfifo", fifo.toString()).inheritIO().start();
        assertEquals(0, mkfifo.waitFor());
        // Should the command open the pipe after all, this writer lets the open return (with an
        // empty document, a different exit code and message), so the test fails instead of hanging.
        Thread writer = new Thread(() -> {
            try (OutputStream out = Files.newOutputStream(fifo)) {
                out.flush();
            } catch (IOException e) {
                throw new IllegalStateException(e);
            }
        });
        writer.setDaemon(true);
        writer.start();
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", fifo.toString());
        // Release the writer, which waits for a reader.
        try (InputStream release = Files.newInputStream(fifo)) {
            release.readAllBytes();
        }
        writer.join();
        assertEquals(BatchCommand.IO_ERROR, r.code(), r.err());
        assertOneLine("shield-batch: cannot read design file " + fifo + ": not a regular file (a named pipe, "
                + "device or socket)", r);
    }

    @Test
    void malformedFilesAreNamedWithTheirLocation(@TempDir Path dir) throws IOException {
        Path bad = BatchCommandTest.write(dir, "bad.json", "{\n  \"format\": \"shield-design\",\n  \"version\": 1,\n");
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", bad.toString());
        assertEquals(BatchCommand.BAD_INPUT, r.code());
        assertTrue(r.err().startsWith("shield-batch: bad design file " + bad + ": $"), r.err());
        assertTrue(r.err().contains("line "), r.err());
        Path cat = BatchCommandTest.write(dir, "cat.json", "[1, 2]");
        BatchCommandTest.Run c = BatchCommandTest.run("", "--design", BatchCommandTest.design(dir).toString(),
                "--catalogue", cat.toString());
        assertEquals(BatchCommand.BAD_INPUT, c.code());
        assertTrue(c.err().startsWith("shield-batch: bad catalogue file " + cat + ": $"), c.err());
    }

    @Test
    void reasonsAreWordsWithoutTheFileRepeated() {
        assertEquals("no such file", InputFiles.reason(new NoSuchFileException("/x/y.json")));
        assertEquals("permission denied", InputFiles.reason(new AccessDeniedException("/x/y.json")));
        assertEquals("Input/output error", InputFiles.reason(new IOException("Input/output error")));
    }

    @Test
    void longAndHostileFileNamesAreShortenedAndEscaped(@TempDir Path dir) {
        String name = dir.resolve("\u001b]0;owned\u0007.json").toString();
        BatchCommandTest.Run r = BatchCommandTest.run("", "--design", name);
        assertEquals(BatchCommand.IO_ERROR, r.code());
        assertTrue(r.err().contains("/\\u001B]0;owned\\u0007.json: no such file"), r.err());
        String longName = dir.resolve("a".repeat(240) + ".json").toString();
        BatchCommandTest.Run l = BatchCommandTest.run("", "--design", longName);
        assertEquals(BatchCommand.IO_ERROR, l.code());
        assertTrue(l.err().contains("aaa.json (" + longName.length() + " characters): no such file"), l.err());
        assertTrue(l.err().length() < 300, l.err());
    }
}
