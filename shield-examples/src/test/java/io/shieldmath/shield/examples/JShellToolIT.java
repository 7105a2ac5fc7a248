/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import jdk.jshell.JShell;
import jdk.jshell.SourceCodeAnalysis;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Every Java snippet of the README and every script in {@code jshell/} pasted into the JDK's
 * real {@code jshell} tool, started as a process with the shaded {@code shield-all.jar} on its
 * class path and fed line by line on standard input, as a user pastes them. The tool runs a
 * line as soon as it completes a statement, so a chain continued on a line starting with
 * {@code .} fails here as it fails for the user. Any error, exception or unresolved
 * reference the tool reports fails the test. Each README snippet runs twice: with
 * {@code --no-startup} (so its imports must be complete) and with the tool's default
 * start-up imports (what a user has, so no import may clash with them).
 *
 * <p>The numbers the README states in its comments are checked against what the tool prints
 * for that line, to the digits stated. The numbers themselves are checked against published
 * sources by the unit tests of the modules that compute them; here the check is that the
 * README says what the code prints.
 *
 * <p>Runs after {@code package} (the jar must exist), as an integration test.
 */
class JShellToolIT {

    /** The repository root, where the README's relative paths start. */
    static final Path ROOT = Paths.get("..").toAbsolutePath().normalize();

    static final Path JAR = Paths.get("target", "shield-all.jar").toAbsolutePath();

    /** A stand-in for the tool's own reading of lines, only to pair its output with the source. */
    static JShell analyser;

    @BeforeAll
    static void start() {
        assertTrue(Files.isRegularFile(JAR), "build the shaded jar first (package): " + JAR);
        analyser = JShell.builder().executionEngine("local").build();
    }

    @AfterAll
    static void stop() {
        analyser.close();
    }

    /** One complete input as the tool reads it (the lines up to a complete snippet), and what it printed. */
    record Unit(String source, String output) {
    }

    static String jshell() {
        String exe = System.getProperty("os.name").toLowerCase(Locale.ROOT).startsWith("windows") ? "jshell.exe"
                : "jshell";
        Path p = Paths.get(System.getProperty("java.home"), "bin", exe);
        assertTrue(Files.isExecutable(p), "no jshell next to the running java: " + p);
        return p.toString();
    }

    /**
     * The source cut where the tool cuts it: it adds lines until
     * {@link SourceCodeAnalysis#analyzeCompletion(String)} calls the text complete, then runs it.
     */
    static List<String> units(String source) {
        List<String> units = new ArrayList<>();
        StringBuilder pending = new StringBuilder();
        for (String line : lines(source)) {
            if (pending.length() == 0 && analyser.sourceCodeAnalysis().analyzeCompletion(line + "\n").completeness()
                    == SourceCodeAnalysis.Completeness.EMPTY) {
                // The tool answers a blank or comment-only line with a new prompt.
                units.add(line + "\n");
                continue;
            }
            pending.append(line).append('\n');
            if (analyser.sourceCodeAnalysis().analyzeCompletion(pending.toString()).completeness().isComplete()) {
                units.add(pending.toString());
                pending.setLength(0);
            }
        }
        return units;
    }

    /**
     * Pastes {@code source} into a new {@code jshell} process line by line and returns each
     * unit with its output; fails on any message of the tool other than its welcome and goodbye.
     */
    static List<Unit> paste(String name, String source, boolean defaultStartup) throws Exception {
        List<String> command = new ArrayList<>(List.of(jshell(), "--class-path", JAR.toString(), "-R-Xmx512m"));
        if (!defaultStartup) {
            command.add("--no-startup");
        }
        Process p = new ProcessBuilder(command).directory(ROOT.toFile()).redirectErrorStream(true).start();
        CompletableFuture<byte[]> read = CompletableFuture.supplyAsync(() -> readAll(p.getInputStream()));
        try (OutputStream in = p.getOutputStream()) {
            for (String line : lines(source)) {
                in.write((line + "\n").getBytes(StandardCharsets.UTF_8));
                in.flush();
            }
            in.write("/exit\n".getBytes(StandardCharsets.UTF_8));
        }
        if (!p.waitFor(5, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            fail(name + ": jshell did not finish in 5 minutes");
        }
        String out = new String(read.get(), StandardCharsets.UTF_8).replace("\b", "").replace("\r", "");
        String[] chunks = out.split("jshell> ", -1);
        List<String> problems = new ArrayList<>();
        for (int i = 1; i < chunks.length; i++) {
            for (String line : chunks[i].split("\n")) {
                if (line.startsWith("|") && !line.strip().equals("|  Goodbye")) {
                    problems.add(line);
                }
            }
        }
        String mode = defaultStartup ? " (default start-up)" : " (--no-startup)";
        assertTrue(problems.isEmpty(), () -> name + mode + ": jshell reported\n" + String.join("\n", problems)
                + "\n--- whole session:\n" + out);
        assertTrue(out.contains("|  Goodbye"), () -> name + mode + ": jshell did not reach /exit\n" + out);
        List<String> units = units(source);
        // Chunk 0 is the welcome; the last one holds /exit's goodbye.
        assertEquals(units.size(), chunks.length - 2, () -> name + mode + ": " + units.size()
                + " snippets in the source but " + (chunks.length - 2) + " prompts answered\n" + out);
        List<Unit> result = new ArrayList<>();
        for (int i = 0; i < units.size(); i++) {
            result.add(new Unit(units.get(i), chunks[i + 1]));
        }
        return result;
    }

    /** The lines of a text, without the empty one after its last line feed. */
    static List<String> lines(String source) {
        List<String> lines = new ArrayList<>(List.of(source.split("\n", -1)));
        if (!lines.isEmpty() && lines.get(lines.size() - 1).isEmpty()) {
            lines.remove(lines.size() - 1);
        }
        return lines;
    }

    private static byte[] readAll(InputStream in) {
        try (in) {
            ByteArrayOutputStream b = new ByteArrayOutputStream();
            in.transferTo(b);
            return b.toByteArray();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static String readme() throws IOException {
        return Files.readString(ROOT.resolve("README.md"), StandardCharsets.UTF_8);
    }

    /** The Java block after a heading of the README. */
    static String javaBlockAfter(String heading) throws IOException {
        String readme = readme();
        int at = readme.indexOf("\n" + heading + "\n");
        assertTrue(at >= 0, "README has no section " + heading);
        int start = readme.indexOf("```java\n", at) + "```java\n".length();
        int end = readme.indexOf("```", start);
        return readme.substring(start, end);
    }

    /** Runs a README block both ways and returns the units of the --no-startup run. */
    static List<Unit> pasteBoth(String heading) throws Exception {
        String block = javaBlockAfter(heading);
        CompletableFuture<List<Unit>> plain = CompletableFuture.supplyAsync(() -> {
            try {
                return paste("README " + heading, block, false);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        paste("README " + heading, block, true);
        try {
            return plain.join();
        } catch (java.util.concurrent.CompletionException e) {
            if (e.getCause() instanceof AssertionError a) {
                throw a;
            }
            throw e;
        }
    }

    static final Pattern NUMBER = Pattern.compile("[-+]?\\d+(\\.\\d+)?([eE][-+]?\\d+)?");

    /**
     * The README line holding {@code fragment} states a number in its comment (the first one
     * after {@code //}); the value jshell printed for that line ({@code ... ==> value}) must
     * agree with it to the last digit stated.
     */
    static void stated(List<Unit> units, String fragment) {
        Unit unit = units.stream().filter(u -> u.source().contains(fragment)).findFirst()
                .orElseThrow(() -> new AssertionError("README block has no line with " + fragment));
        String line = unit.source().lines().filter(l -> l.contains(fragment)).findFirst().orElseThrow();
        int comment = line.indexOf("//");
        assertTrue(comment >= 0, "no comment on " + line);
        Matcher m = NUMBER.matcher(line.substring(comment));
        assertTrue(m.find(), "no number in the comment of " + line);
        String text = m.group();
        double claimed = Double.parseDouble(text);
        int value = unit.output().indexOf("==> ");
        assertTrue(value >= 0, () -> "jshell printed no value for " + line + ": " + unit.output());
        Matcher v = NUMBER.matcher(unit.output().substring(value + 4));
        assertTrue(v.find(), () -> "no number in jshell's value for " + line + ": " + unit.output());
        double printed = Double.parseDouble(v.group());
        assertEquals(claimed, printed, halfUnitOfLastDigit(text),
                () -> "README states " + text + " for " + line.strip() + " but jshell printed " + unit.output());
    }

    /** Half a unit in the last place written: 15.9 → 0.05, 6.6e4 → 500, 409 → 0.5. */
    static double halfUnitOfLastDigit(String number) {
        String s = number.toLowerCase(Locale.ROOT);
        int exponent = 0;
        int e = s.indexOf('e');
        if (e >= 0) {
            exponent = Integer.parseInt(s.substring(e + 1).replace("+", ""));
            s = s.substring(0, e);
        }
        int dot = s.indexOf('.');
        int decimals = dot < 0 ? 0 : s.length() - dot - 1;
        return 0.5 * Math.pow(10, exponent - decimals);
    }

    @Test
    void halfUnitIsReadFromTheWrittenDigits() {
        assertEquals(0.05, halfUnitOfLastDigit("15.9"), 1e-15);
        assertEquals(500, halfUnitOfLastDigit("6.6e4"), 1e-9);
        assertEquals(0.5, halfUnitOfLastDigit("409"), 1e-15);
        assertEquals(5e-11, halfUnitOfLastDigit("1.625e-7"), 1e-23);
    }

    @Test
    void aChainContinuedOnALineStartingWithADotFails() {
        // What the README's blocks once did: jshell runs the first line alone and rejects the second.
        AssertionError e = org.junit.jupiter.api.Assertions.assertThrows(AssertionError.class,
                () -> paste("leading dot", "String s = \"a\"\n        .trim();\n", false));
        assertTrue(e.getMessage().contains("illegal start of expression"), e.getMessage());
    }

    @Test
    void firstCalculation() throws Exception {
        List<Unit> u = pasteBoth("## A first calculation");
        stated(u, "r.shieldingEffectivenessDb()");
        stated(u, "r.absorptionDb(0)");
        stated(u, "r.multipleReflectionDb()");
        stated(u, "r.transmission()");
    }

    @Test
    void requirementToDesign() throws Exception {
        String out = String.join("", pasteBoth("## From requirement to design").stream().map(Unit::output).toList());
        assertTrue(out.contains("the requirement; worst margin"), out);
        assertTrue(out.contains("is first met at") || out.contains("no thickness up to"), out);
        assertTrue(out.contains("ranking by areal mass for 150.0 dB"), out);
        assertTrue(out.contains("1. aluminium 6061"), out);   // the lightest, as in DesignTest's hand computation
        assertTrue(out.contains("reciprocity"), out);
        assertTrue(out.contains("100000 samples"), out);
    }

    @Test
    void enclosures() throws Exception {
        List<Unit> u = pasteBoth("## Enclosures");
        stated(u, "r.shieldingEffectivenessDb()");
        stated(u, "r.limitingPath()");
        stated(u, "can.staticShielding().factor()");
    }

    @Test
    void materialsAndFilesTheRepositoryShips() throws Exception {
        List<Unit> u = pasteBoth("## Materials, catalogues and design files");
        stated(u, "mu.arealMass(mm(0.5))");
        Unit ours = u.stream().filter(x -> x.source().contains("Catalogue ours")).findFirst().orElseThrow();
        assertTrue(ours.output().contains("catalogue of 38 materials"), ours.output());
    }

    @Test
    void coilToCoil() throws Exception {
        List<Unit> u = pasteBoth("## Coil to coil through a sheet");
        stated(u, "r.freeSpaceMutualInductance()");
        stated(u, "r.shieldingEffectivenessDb()");
        stated(u, "r.planarEstimate().shieldingEffectivenessDb()");
        stated(u, "millivolts(AmplitudeMeasure.PEAK_TO_PEAK)");
        stated(u, "p.finitePlateDb()");
        stated(u, "p.infiniteSheetAboveDb()");
        stated(u, "a.measuredDb()");
        assertTrue(unitWith(u, "a.verdict()").output().contains("CONSISTENT"), () -> unitWith(u, "a.verdict()").output());
        assertTrue(unitWith(u, "a.infiniteSheetVerdict()").output().contains("BELOW_MODEL"),
                () -> unitWith(u, "a.infiniteSheetVerdict()").output());
    }

    static Unit unitWith(List<Unit> units, String fragment) {
        return units.stream().filter(u -> u.source().contains(fragment)).findFirst()
                .orElseThrow(() -> new AssertionError("no line with " + fragment));
    }

    @Test
    void finiteShieldsOfRevolution() throws Exception {
        List<Unit> u = pasteBoth("### Worked example: an invented bench and an invented sensor can");
        stated(u, "r.insertionLossEstimated()");
        stated(u, "r.eddyLoss(\"plate\", drive)");
        stated(u, "r.mutualImpedance()");
        stated(u, "can.magnetostatic().worstShieldingFactor()");
        stated(u, "can.at(Hz(50)).worstShieldingFactor()");
    }

    @Test
    void everyJavaBlockOfTheReadmeIsCovered() throws IOException {
        long blocks = readme().lines().filter(l -> l.equals("```java")).count();
        assertEquals(6, blocks, "add a test for each new Java block of the README");
    }

    static String script(String name) throws IOException {
        Path p = Paths.get("jshell", name);
        assertTrue(Files.exists(p), "missing script " + p.toAbsolutePath());
        return Files.readString(p, StandardCharsets.UTF_8);
    }

    @Test
    void quickLookScriptPrintsBothMaterialsAtBothFrequencies() throws Exception {
        String out = String.join("", paste("quick-look.jsh", script("quick-look.jsh"), false).stream()
                .map(Unit::output).toList());
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
        // The README shows the script's output: the same numbers.
        String readme = readme();
        for (String line : out.lines().filter(l -> l.contains(" 50 Hz: ")).toList()) {
            assertTrue(readme.contains(line.strip()), "README does not show " + line);
        }
    }

    @Test
    void thinnestCopperScriptAnswersForBothFields() throws Exception {
        String out = String.join("", paste("thinnest-copper.jsh", script("thinnest-copper.jsh"), false).stream()
                .map(Unit::output).toList());
        assertEquals(2, out.lines().filter(l -> l.contains("dB is first met at")).count(), out);
    }

    @Test
    void plateOnBenchScriptPrintsTheSolversPredictionAtEachFrequency() throws Exception {
        String out = String.join("", paste("plate-on-bench.jsh", script("plate-on-bench.jsh"), false).stream()
                .map(Unit::output).toList());
        Matcher m = Pattern.compile("(\\d+ kHz)\\s+plate\\s+([0-9.]+) ± ([0-9.]+) dB\\s+sheet\\s+([0-9.]+) dB\\s+"
                + "receiver ([0-9.]+) mV pp without, ([0-9.]+) mV pp with").matcher(out);
        // The same bench computed here, in this JVM, through the library: the script must print its numbers.
        io.shieldmath.shield.coupling.CoilPair pair = io.shieldmath.shield.coupling.CoilPair.coaxial(
                io.shieldmath.shield.coupling.Coil.loop(io.shieldmath.shield.quantity.Length.ofMillimetres(10), 20),
                io.shieldmath.shield.coupling.Coil.loop(io.shieldmath.shield.quantity.Length.ofMillimetres(10), 20),
                io.shieldmath.shield.quantity.Length.ofMillimetres(50));
        io.shieldmath.shield.axisymmetric.BenchPrediction bench = io.shieldmath.shield.axisymmetric.BenchPrediction
                .ofPlate(io.shieldmath.shield.materials.Catalogue.builtIn().get("aluminium-1100-o"),
                        io.shieldmath.shield.quantity.Length.ofMillimetres(25),
                        io.shieldmath.shield.quantity.Length.ofMillimetres(2), pair);
        int rows = 0;
        String readme = readme();
        while (m.find()) {
            rows++;
            var f = io.shieldmath.shield.quantity.Frequency.parse(m.group(1));
            var p = bench.at(f);
            var drive = io.shieldmath.shield.coupling.DriveCurrent.ofMilliamperes(100,
                    io.shieldmath.shield.coupling.AmplitudeMeasure.RMS, f);
            var pp = io.shieldmath.shield.coupling.AmplitudeMeasure.PEAK_TO_PEAK;
            double[] expected = {p.finitePlateDb().value(), p.finitePlateDb().estimate(), p.infiniteSheetDb(),
                p.voltageWithoutPlate(drive).millivolts(pp), p.voltageWithPlate(drive).millivolts(pp)};
            for (int i = 0; i < expected.length; i++) {
                String text = m.group(i + 2);
                assertEquals(expected[i], Double.parseDouble(text), halfUnitOfLastDigit(text), m.group());
            }
            // Common practice, no source: the finite plate reads below the infinite sheet (flux rounds its rim).
            assertTrue(expected[0] < expected[2], m.group());
            // The README shows the script's output.
            assertTrue(readme.contains(m.group().strip()), "README does not show " + m.group());
        }
        assertEquals(3, rows, out);
    }

    @Test
    void everyScriptInTheFolderIsCovered() throws IOException {
        try (var files = Files.list(Paths.get("jshell"))) {
            List<String> names = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".jsh"))
                    .sorted().toList();
            assertEquals(List.of("plate-on-bench.jsh", "quick-look.jsh", "thinnest-copper.jsh"), names,
                    "add a test for each new script");
        }
    }
}
