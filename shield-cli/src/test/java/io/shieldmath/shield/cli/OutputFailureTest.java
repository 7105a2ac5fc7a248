/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Output failures (issue 15, item 14): a full disk, a closed descriptor and a reader that has
 * gone must end the command with {@link BatchCommand#OUTPUT_ERROR}, a message, and no more
 * computing. The streams here fail as the operating system's do: by throwing on write.
 */
class OutputFailureTest {

    /** An output that accepts {@code capacity} bytes, then fails every write and flush, counting them. */
    static final class FailingOutput extends OutputStream {
        final long capacity;
        final String reason;
        long accepted;
        int failedWrites;

        FailingOutput(long capacity, String reason) {
            this.capacity = capacity;
            this.reason = reason;
        }

        @Override
        public void write(int b) throws IOException {
            write(new byte[] {(byte) b}, 0, 1);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            if (accepted + len > capacity) {
                failedWrites++;
                throw new IOException(reason);
            }
            accepted += len;
        }
    }

    /** Endless lines of {@code "1 kHz"}, counting the bytes handed out; ends after 50 MB as a safety net. */
    static final class EndlessInput extends InputStream {
        static final byte[] LINE = "1 kHz\n".getBytes(StandardCharsets.US_ASCII);
        static final long SAFETY_NET = 50_000_000L;
        long supplied;

        @Override
        public int read() {
            if (supplied >= SAFETY_NET) {
                return -1;
            }
            return LINE[(int) (supplied++ % LINE.length)];
        }

        @Override
        public int read(byte[] b, int off, int len) {
            if (supplied >= SAFETY_NET) {
                return -1;
            }
            for (int i = 0; i < len; i++) {
                b[off + i] = LINE[(int) (supplied++ % LINE.length)];
            }
            return len;
        }
    }

    static BatchCommandTest.Run run(InputStream in, OutputStream out, String... args) {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = BatchCommand.run(args, in, out, new PrintStream(err, true, StandardCharsets.UTF_8));
        return new BatchCommandTest.Run(code, "", err.toString(StandardCharsets.UTF_8));
    }

    static long stoppedAfter(String err) {
        Matcher m = Pattern.compile("stopped after (\\d+) results?").matcher(err);
        assertTrue(m.find(), err);
        return Long.parseLong(m.group(1));
    }

    @Test
    void fullDiskOnTheFirstWriteStopsTheSweepAtOnce(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        FailingOutput out = new FailingOutput(0, "No space left on device");
        BatchCommandTest.Run r = run(InputStream.nullInputStream(), out, "--design", design.toString(),
                "--band", "1 Hz to 1 MHz", "--points", "100000");
        assertEquals(BatchCommand.OUTPUT_ERROR, r.code(), r.err());
        assertTrue(r.err().startsWith("shield-batch: cannot write standard output: No space left on device"),
                r.err());
        // One failed write, then nothing more: a command that ignored the failure would go on filling buffers.
        assertEquals(1, out.failedWrites);
        long done = stoppedAfter(r.err());
        assertTrue(done > 0 && done < 1000, r.err());
    }

    @Test
    void failureOfTheLastFlushIsSeen(@TempDir Path dir) throws IOException {
        // The design's 4 points fit in the buffer: the only write is the final flush, as with > /dev/full.
        Path design = BatchCommandTest.design(dir);
        FailingOutput out = new FailingOutput(0, "No space left on device");
        BatchCommandTest.Run r = run(InputStream.nullInputStream(), out, "--design", design.toString());
        assertEquals(BatchCommand.OUTPUT_ERROR, r.code(), r.err());
        assertEquals(4, stoppedAfter(r.err()));
        BatchCommandTest.Run json = run(InputStream.nullInputStream(), new FailingOutput(100, "Bad file descriptor"),
                "--design", design.toString(), "--format", "json");
        assertEquals(BatchCommand.OUTPUT_ERROR, json.code(), json.err());
        assertTrue(json.err().contains("Bad file descriptor"), json.err());
    }

    @Test
    void printStreamThatRecordsItsErrorCountsAsAFailure(@TempDir Path dir) throws IOException {
        Path design = BatchCommandTest.design(dir);
        PrintStream swallowing = new PrintStream(new FailingOutput(0, "Broken pipe"), false, StandardCharsets.UTF_8);
        BatchCommandTest.Run r = run(InputStream.nullInputStream(), swallowing, "--design", design.toString(),
                "--band", "1 Hz to 1 MHz", "--points", "100000");
        assertEquals(BatchCommand.OUTPUT_ERROR, r.code(), r.err());
        assertTrue(r.err().contains("cannot write standard output"), r.err());
        assertTrue(stoppedAfter(r.err()) < 1000, r.err());
    }

    @Test
    void endlessStandardInputStopsSoonAfterTheReaderHasGone(@TempDir Path dir) throws IOException {
        // As with "| head -1": the reader takes a little, then goes. Memory and work stay bounded.
        Path design = BatchCommandTest.design(dir);
        EndlessInput in = new EndlessInput();
        BatchCommandTest.Run r = run(in, new FailingOutput(100, "Broken pipe"), "--design", design.toString(),
                "--stdin");
        assertEquals(BatchCommand.OUTPUT_ERROR, r.code(), r.err());
        assertTrue(in.supplied < 100_000, "read " + in.supplied + " bytes of input after the output failed");
        assertTrue(stoppedAfter(r.err()) < 10_000, r.err());
    }
}
