/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code shield-batch} launcher script with the shaded jar, driven as an instrument
 * drives a co-process: write one line, read its answer, then the next, with standard input
 * still open. Runs after {@code package}, as an integration test.
 */
class ShieldBatchIT {

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

    static boolean windows() {
        return System.getProperty("os.name").toLowerCase(Locale.ROOT).startsWith("windows");
    }

    /** The launcher as a command line: the POSIX script through sh, or the .cmd on Windows. */
    static List<String> launcher(String... args) {
        Path bin = JShellToolIT.ROOT.resolve(Paths.get("shield-cli", "src", "main", "bin"));
        List<String> command = new ArrayList<>(windows()
                ? List.of("cmd.exe", "/c", bin.resolve("shield-batch.cmd").toString())
                : List.of("sh", bin.resolve("shield-batch").toString()));
        command.addAll(List.of(args));
        return command;
    }

    static Process start(Path dir, String... args) throws Exception {
        ProcessBuilder b = new ProcessBuilder(launcher(args)).directory(dir.toFile());
        // The script must find the jar from its own place in the repository, with no help.
        b.environment().remove("SHIELD_JAR");
        b.environment().put("JAVA_HOME", System.getProperty("java.home"));
        return b.start();
    }

    static double expectedSe(double kilohertz) {
        Barrier b = Barrier.of(Catalogue.builtIn().get("copper-annealed"), Length.ofMillimetres(0.5));
        return b.facing(IncidentField.planeWave()).at(Frequency.ofKilohertz(kilohertz)).shieldingEffectivenessDb();
    }

    @Test
    void answersEachLineBeforeTheNextIsWrittenAndGoesOnAfterABadOne(@TempDir Path dir) throws Exception {
        Path design = dir.resolve("d.json");
        Files.writeString(design, DESIGN, StandardCharsets.UTF_8);
        Process p = start(dir, "--design", design.toString(), "--stdin");
        OutputStream in = p.getOutputStream();
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        BufferedReader err = new BufferedReader(new InputStreamReader(p.getErrorStream(), StandardCharsets.UTF_8));

        in.write("10 kHz\n".getBytes(StandardCharsets.UTF_8));
        in.flush();
        assertEquals("frequency_hz,se_db,absorption_db,reflection_db,multiple_reflection_db", out.readLine());
        String first = out.readLine();
        assertTrue(first.startsWith("10000.0,"), first);
        // The same number as the library computes in this JVM (the command adds nothing of its own).
        assertEquals(expectedSe(10), Double.parseDouble(first.split(",")[1]), 1e-6);

        in.write("ten kHz\n".getBytes(StandardCharsets.UTF_8));
        in.flush();
        String record = out.readLine();
        assertTrue(record.startsWith("# error: standard input line 2: "), record);
        String message = err.readLine();
        assertTrue(message.startsWith("shield-batch: standard input line 2: "), message);

        in.write("# a comment\n20 kHz\n".getBytes(StandardCharsets.UTF_8));
        in.flush();
        String third = out.readLine();
        assertTrue(third.startsWith("20000.0,"), third);
        assertEquals(expectedSe(20), Double.parseDouble(third.split(",")[1]), 1e-6);
        assertTrue(p.isAlive(), "the command ended before its input did");

        in.close();
        assertEquals(null, out.readLine());
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(3, p.exitValue(), "a line failed, so the exit code says so");
    }

    @Test
    void jsonAnswersAreCompleteLinesToo(@TempDir Path dir) throws Exception {
        Path design = dir.resolve("d.json");
        Files.writeString(design, DESIGN, StandardCharsets.UTF_8);
        Process p = start(dir, "--design", design.toString(), "--stdin", "--format", "json");
        OutputStream in = p.getOutputStream();
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        in.write("50000\n".getBytes(StandardCharsets.UTF_8));
        in.flush();
        assertEquals("{\"design\": \"copper plate\", \"kind\": \"planar\", \"field\": \"plane wave\"}", out.readLine());
        String answer = out.readLine();
        assertTrue(answer.startsWith("{\"frequency_hz\": 50000.0, \"se_db\": ") && answer.endsWith("}"), answer);
        in.close();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue());
    }

    @Test
    void versionComesFromTheBuildAndHelpListsTheExitCodes(@TempDir Path dir) throws Exception {
        Process v = start(dir, "--version");
        v.getOutputStream().close();
        String version = new String(v.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertTrue(v.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, v.exitValue());
        assertEquals("shield-batch " + System.getProperty("shield.version"), version);

        Process h = start(dir, "--help");
        h.getOutputStream().close();
        String help = new String(h.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(h.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, h.exitValue());
        assertTrue(help.startsWith("usage: shield-batch --design FILE"), help);
        assertTrue(help.contains("Exit codes: 0 done; 2 bad command line; 3 "), help);
    }

    @Test
    void missingDesignFileExitsFourThroughTheScript(@TempDir Path dir) throws Exception {
        Process p = start(dir, "--design", dir.resolve("missing.json").toString());
        p.getOutputStream().close();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(4, p.exitValue(), err);
        assertTrue(err.startsWith("shield-batch: cannot read design file "), err);
    }
}
