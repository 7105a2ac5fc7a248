/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.File;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;
import org.junit.jupiter.api.Test;

/**
 * Runs every JShell script in {@code shield-examples/jshell} through the JDK's
 * {@code jdk.jshell} API against the built classes, so the scripts cannot rot: each
 * snippet must be accepted without error and the output must carry the expected numbers.
 */
class JShellScriptsTest {

    /** Runs a script, returning what it printed; fails on any rejected snippet or exception. */
    static String run(Path script) throws IOException {
        return run(script.toString(), Files.readString(script, StandardCharsets.UTF_8));
    }

    /** Runs JShell source, returning what it printed; fails on any rejected snippet or exception. */
    static String run(String name, String text) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream out = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        List<String> problems = new ArrayList<>();
        // The local execution engine runs snippets in this JVM, so their System.out is ours: capture it.
        PrintStream saved = System.out;
        System.setOut(out);
        try (JShell shell = JShell.builder().out(out).err(out).executionEngine("local").build()) {
            for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
                shell.addToClasspath(entry);
            }
            String remaining = text;
            SourceCodeAnalysis analysis = shell.sourceCodeAnalysis();
            while (!remaining.isBlank()) {
                SourceCodeAnalysis.CompletionInfo info = analysis.analyzeCompletion(remaining);
                String source = info.source();
                if (source == null) {
                    problems.add("incomplete snippet: " + remaining.strip());
                    break;
                }
                for (SnippetEvent e : shell.eval(source)) {
                    if (e.status() == Snippet.Status.REJECTED) {
                        problems.add("rejected: " + source.strip() + " "
                                + shell.diagnostics(e.snippet()).map(d -> d.getMessage(null)).toList());
                    }
                    if (e.exception() != null) {
                        problems.add("threw " + e.exception() + " in: " + source.strip());
                    }
                }
                remaining = info.remaining();
            }
        } finally {
            System.setOut(saved);
        }
        assertTrue(problems.isEmpty(), () -> name + ":\n" + String.join("\n", problems));
        return bytes.toString(StandardCharsets.UTF_8);
    }

    static Path script(String name) {
        Path p = Paths.get("jshell", name);
        assertTrue(Files.exists(p), "missing script " + p.toAbsolutePath());
        return p;
    }

    @Test
    void quickLookPrintsBothMaterialsAtBothFrequencies() throws IOException {
        String out = run(script("quick-look.jsh"));
        Matcher m = Pattern.compile("(\\S+)\\s+50 Hz:\\s+(-?[0-9.]+) dB\\s+20 kHz:\\s+(-?[0-9.]+) dB").matcher(out);
        List<double[]> rows = new ArrayList<>();
        while (m.find()) {
            rows.add(new double[] {Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3))});
        }
        assertEquals(2, rows.size(), out);
        // Copper is nearly transparent at 50 Hz and strong at 20 kHz (common practice, no source).
        assertTrue(rows.get(0)[0] < 3 && rows.get(0)[1] > 20, out);
        // The high-µ alloy does far better than copper at 50 Hz.
        assertTrue(rows.get(1)[0] > rows.get(0)[0] + 20, out);
    }

    @Test
    void thinnestCopperScriptAnswersForBothFields() throws IOException {
        String out = run(script("thinnest-copper.jsh"));
        assertEquals(2, out.lines().filter(l -> l.contains("dB is first met at")).count(), out);
    }

    @Test
    void everyScriptInTheFolderIsCovered() throws IOException {
        try (var files = Files.list(Paths.get("jshell"))) {
            List<String> names = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".jsh"))
                    .sorted().toList();
            assertEquals(List.of("quick-look.jsh", "thinnest-copper.jsh"), names,
                    "add a test for each new script");
        }
    }
}
