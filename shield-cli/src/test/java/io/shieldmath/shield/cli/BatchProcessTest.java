/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.File;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command as a process (issue 15, item 14): {@link BatchCommand#main(String[])} writes
 * through standard output's file descriptor, so a reader that goes away, as {@code head -1}
 * does, ends the run with exit code {@value BatchCommand#OUTPUT_ERROR} long before the sweep
 * is done. One process, started once: the only process-level test of the suite.
 */
class BatchProcessTest {

    @Test
    void readerThatGoesAwayEndsTheRunEarlyWithExitFive(@TempDir Path dir) throws Exception {
        Path design = BatchCommandTest.design(dir);
        Path err = dir.resolve("stderr.txt");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        // The tests run on the module path: the command's module and its dependencies are on
        // jdk.module.path, the test libraries on java.class.path. The child runs from both as a
        // class path.
        String modulePath = System.getProperty("jdk.module.path");
        String classPath = (modulePath == null ? "" : modulePath + File.pathSeparator)
                + System.getProperty("java.class.path");
        Process p = new ProcessBuilder(java, "-Xmx64m", "-cp", classPath,
                BatchCommand.class.getName(), "--design", design.toString(), "--band", "1 Hz to 1 MHz", "--points",
                "100000").redirectError(err.toFile()).start();
        p.getOutputStream().close();
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        assertEquals(ResultOutput.CSV_HEADER, out.readLine());
        out.close();
        int code = p.waitFor();
        String message = Files.readString(err, StandardCharsets.UTF_8);
        assertEquals(BatchCommand.OUTPUT_ERROR, code, message);
        assertTrue(message.startsWith("shield-batch: cannot write standard output: "), message);
        // The pipe holds some tens of kilobytes: far fewer results than the 100 000 asked for.
        assertTrue(OutputFailureTest.stoppedAfter(message) < 50_000, message);
    }
}
