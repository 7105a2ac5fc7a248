/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.distribution;

import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.planar.Barrier;
import java.io.ByteArrayOutputStream;
import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.lang.module.ModuleFinder;
import java.lang.module.ModuleReference;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A user's build, done by hand with the JDK's own {@code javac} and {@code java} on the
 * packaged jars of the published modules and what their POMs bring in at run time: the
 * consumer program in {@code src/consumer/java} is compiled and run once on the class path
 * and once as a JPMS module. The README's "Use it in your build" section is checked against
 * the same jars: its coordinates, its version and its module names.
 */
class ConsumerBuildIT {

    static final String VERSION = System.getProperty("shield.version");
    static final Path ROOT = Paths.get(System.getProperty("shield.root", "..")).toAbsolutePath().normalize();
    static final Path SOURCES = Paths.get(System.getProperty("consumer.sources", "src/consumer/java"));
    static final Path WORK = Paths.get(System.getProperty("consumer.work", "target/consumer"));
    static final Path JAVA = Paths.get(System.getProperty("java.home"), "bin", "java");

    /** The jars a user's build puts on its path, from the dependency plugin. */
    static List<Path> jars;
    /** The published modules by artifactId, as the README's table lists them, with their module names. */
    static Map<String, String> readmeModules;
    static String readmeSection;

    @BeforeAll
    static void read() throws IOException {
        jars = Arrays.stream(Files.readString(Paths.get(System.getProperty("consumer.classpath"))).split(File.pathSeparator))
                .map(String::strip).filter(s -> !s.isEmpty()).map(Paths::get).collect(Collectors.toList());
        String readme = Files.readString(ROOT.resolve("README.md"));
        int start = readme.indexOf("\n## Use it in your build");
        assertTrue(start >= 0, "README has a section '## Use it in your build'");
        int end = readme.indexOf("\n## ", start + 1);
        readmeSection = readme.substring(start, end < 0 ? readme.length() : end);
        readmeModules = new LinkedHashMap<>();
        Matcher row = Pattern.compile("(?m)^\\| `(shield-[a-z]+)` \\| `(io\\.shieldmath\\.[a-z.]+)` \\|")
                .matcher(readmeSection);
        while (row.find()) {
            readmeModules.put(row.group(1), row.group(2));
        }
        assertFalse(readmeModules.isEmpty(), "README's module table has rows | `artifactId` | `module name` |");
    }

    /** The packaged jar of a published module on the consumer's path. */
    static Path jarOf(String artifactId) {
        String name = artifactId + "-" + VERSION + ".jar";
        return jars.stream().filter(p -> p.getFileName().toString().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError(name + " is not on the consumer's path " + jars));
    }

    static String path(List<Path> entries) {
        return entries.stream().map(Path::toString).collect(Collectors.joining(File.pathSeparator));
    }

    static void compile(Path out, String pathOption, List<Path> sources) throws IOException {
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        List<String> args = new ArrayList<>(List.of("-d", out.toString(), pathOption, path(jars),
                "--release", "17", "-Xlint:all,-requires-automatic"));
        sources.forEach(s -> args.add(s.toString()));
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = javac.run(null, err, err, args.toArray(new String[0]));
        assertEquals(0, code, "javac " + args + "\n" + err.toString(StandardCharsets.UTF_8));
    }

    /** Runs {@code java} with the arguments, returns its standard output; fails on a non-zero exit. */
    static String run(List<String> args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>();
        command.add(JAVA.toString());
        command.addAll(args);
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        p.getOutputStream().close();
        byte[] out;
        try (InputStream in = p.getInputStream()) {
            out = in.readAllBytes();
        }
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("timed out: " + command);
        }
        String text = new String(out, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), command + "\n" + text);
        return text;
    }

    static Map<String, String> keyValues(String text) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String line : text.split("\\R")) {
            int eq = line.indexOf('=');
            if (eq > 0) {
                m.put(line.substring(0, eq), line.substring(eq + 1));
            }
        }
        return m;
    }

    /** The number the consumer prints, computed here in the test's own JVM with the same library. */
    static String expectedSe() {
        return Double.toString(Barrier.of(Catalogue.builtIn().get("copper-annealed"), mm(1))
                .facing(IncidentField.planeWave()).at(kHz(100)).shieldingEffectivenessDb());
    }

    @Test
    void aClassPathProgramCompilesAndRuns() throws Exception {
        Path out = WORK.resolve("classpath");
        compile(out, "--class-path", List.of(SOURCES.resolve(Paths.get("consumer", "app", "Consumer.java"))));
        List<Path> cp = new ArrayList<>(List.of(out));
        cp.addAll(jars);
        Map<String, String> printed = keyValues(run(List.of("-cp", path(cp), "consumer.app.Consumer")));
        assertEquals(expectedSe(), printed.get("se"), "the consumer's number equals the library's here");
        assertEquals("Body", printed.get("body"));
        // On the class path every class is in the unnamed module.
        assertEquals("null", printed.get("consumer.module"));
        assertEquals("null", printed.get("core.module"));
        assertEquals("null", printed.get("materials.module"));
    }

    @Test
    void aModularProgramCompilesAndRunsOnTheModulePath() throws Exception {
        Path out = WORK.resolve("module");
        compile(out, "--module-path", List.of(SOURCES.resolve("module-info.java"),
                SOURCES.resolve(Paths.get("consumer", "app", "Consumer.java"))));
        List<Path> mp = new ArrayList<>(List.of(out));
        mp.addAll(jars);
        Map<String, String> printed = keyValues(run(List.of("--module-path", path(mp),
                "-m", "consumer.app/consumer.app.Consumer")));
        assertEquals(expectedSe(), printed.get("se"));
        assertEquals("consumer.app", printed.get("consumer.module"));
        assertEquals(readmeModules.get("shield-core"), printed.get("core.module"));
        assertEquals(readmeModules.get("shield-materials"), printed.get("materials.module"));
        assertEquals(readmeModules.get("shield-axisymmetric"), printed.get("axisymmetric.module"));
        assertEquals(readmeModules.get("shield-cli"), printed.get("cli.module"));
    }

    @Test
    void theBatchCommandRunsAsAModule() throws Exception {
        String printed = run(List.of("--module-path", path(jars),
                "-m", readmeModules.get("shield-cli") + "/io.shieldmath.shield.cli.BatchCommand", "--version"));
        assertTrue(printed.contains(VERSION), "--version prints " + VERSION + ": " + printed);
    }

    @Test
    void theReadmeNamesEveryPublishedModuleWithItsModuleName() {
        Set<String> published = new TreeSet<>(List.of("shield-core", "shield-materials", "shield-axisymmetric",
                "shield-cli"));
        assertEquals(published, new TreeSet<>(readmeModules.keySet()), "README's module table");
        for (Map.Entry<String, String> e : readmeModules.entrySet()) {
            Set<ModuleReference> found = ModuleFinder.of(jarOf(e.getKey())).findAll();
            assertEquals(1, found.size());
            String name = found.iterator().next().descriptor().name();
            assertEquals(e.getValue(), name, e.getKey() + "'s module name in the README");
        }
    }

    @Test
    void theReadmeSnippetsUseTheseCoordinates() {
        String release = VERSION.replace("-SNAPSHOT", "");
        Matcher maven = Pattern.compile("<groupId>([^<]+)</groupId>\\s*<artifactId>([^<]+)</artifactId>\\s*"
                + "<version>([^<]+)</version>").matcher(readmeSection);
        Set<String> mavenArtifacts = new TreeSet<>();
        while (maven.find()) {
            assertEquals("io.shieldmath", maven.group(1));
            assertEquals(release, maven.group(3), "the Maven snippet's version");
            mavenArtifacts.add(maven.group(2));
        }
        Matcher gradle = Pattern.compile("\"io\\.shieldmath:([a-z-]+):([^\"]+)\"").matcher(readmeSection);
        Set<String> gradleArtifacts = new TreeSet<>();
        while (gradle.find()) {
            assertEquals(release, gradle.group(2), "the Gradle snippet's version");
            gradleArtifacts.add(gradle.group(1));
        }
        assertFalse(mavenArtifacts.isEmpty(), "README has a Maven dependency snippet");
        assertFalse(gradleArtifacts.isEmpty(), "README has a Gradle dependency snippet");
        for (String a : mavenArtifacts) {
            assertTrue(readmeModules.containsKey(a), a + " in the Maven snippet is a published module");
        }
        assertEquals(mavenArtifacts, gradleArtifacts, "the Maven and Gradle snippets name the same modules");
        for (String a : readmeModules.keySet()) {
            jarOf(a);
        }
        assertTrue(readmeSection.contains("javadoc"), "the section says where the javadoc is");
    }
}
