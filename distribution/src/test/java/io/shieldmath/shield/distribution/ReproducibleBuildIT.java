/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.distribution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.Enumeration;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.Manifest;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Reproducible builds, checked cheaply inside {@code ./mvnw verify}. One published module,
 * {@code shield-core}, is built a second time with the wrapper, offline, from a copy of its
 * main sources, the parent POM and {@code .mvn} in {@code target/rebuild} (tests, javadoc
 * and sources jars skipped), and its jar must be byte for byte the jar this reactor built.
 * Every published module's jar is also checked for what makes two builds differ: each
 * entry carries the time {@code project.build.outputTimestamp} gives, and the manifest
 * holds no build-machine data. The full comparison of every archive of two release builds
 * is {@code scripts/check-reproducible.sh}, which is too slow for the suite.
 */
class ReproducibleBuildIT {

    static final String VERSION = System.getProperty("shield.version");
    static final Path ROOT = Paths.get(System.getProperty("shield.root", "..")).toAbsolutePath().normalize();
    static final Path WORK = Paths.get(System.getProperty("rebuild.work", "target/rebuild")).toAbsolutePath().normalize();
    /** The module built twice: the smallest published one every other depends on. */
    static final String MODULE = "shield-core";
    /** The nested build's limit; it takes well under a minute on 2 busy cores. */
    static final long TIMEOUT_SECONDS = 300;
    /**
     * Manifest attributes that carry the build machine, the user or the time (what the
     * Maven archiver, the bnd tool and common build scripts add when asked).
     */
    static final List<String> MACHINE_ATTRIBUTES = List.of("Built-By", "Build-Jdk", "Build-Time", "Build-Date",
            "Build-Timestamp", "Build-Host", "Build-OS", "Bnd-LastModified", "Implementation-Build");

    /** The jars of the published modules this reactor packaged, from the consumer's path. */
    static List<Path> published;

    @BeforeAll
    static void read() throws IOException {
        published = Arrays.stream(Files.readString(Paths.get(System.getProperty("consumer.classpath")))
                        .split(File.pathSeparator))
                .map(String::strip).filter(s -> !s.isEmpty()).map(p -> Paths.get(p).toAbsolutePath().normalize())
                .filter(p -> p.startsWith(ROOT) && p.getFileName().toString().endsWith(".jar"))
                .collect(Collectors.toList());
        assertEquals(4, published.size(), "the four published modules' jars, built by this reactor, are on the"
                + " consumer's path (build them in the same run, e.g. -pl distribution -am): " + published);
    }

    static String sha256(Path file) throws IOException {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        } catch (NoSuchAlgorithmException e) {
            throw new AssertionError("every JDK has SHA-256", e);
        }
    }

    /** Copies a file or a folder tree, keeping the files' attributes (the wrapper stays executable). */
    static void copy(Path from, Path to) throws IOException {
        try (Stream<Path> all = Files.walk(from)) {
            for (Path p : (Iterable<Path>) all::iterator) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    Files.createDirectories(target);
                } else {
                    Files.createDirectories(target.getParent());
                    Files.copy(p, target, StandardCopyOption.COPY_ATTRIBUTES, StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
    }

    static void delete(Path tree) throws IOException {
        if (!Files.exists(tree, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> all = Files.walk(tree)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).collect(Collectors.toList())) {
                Files.delete(p);
            }
        }
    }

    static byte[] bytes(JarFile jar, JarEntry e) throws IOException {
        try (InputStream in = jar.getInputStream(e)) {
            return in.readAllBytes();
        }
    }

    /** The entries of a jar in the order they are stored. */
    static List<JarEntry> entries(JarFile jar) {
        List<JarEntry> list = new ArrayList<>();
        for (Enumeration<JarEntry> en = jar.entries(); en.hasMoreElements(); ) {
            list.add(en.nextElement());
        }
        return list;
    }

    /** What differs between two jars, entry by entry (order, time, content), at most 20 lines. */
    static List<String> differences(Path a, Path b) throws IOException {
        List<String> out = new ArrayList<>();
        try (JarFile ja = new JarFile(a.toFile(), false); JarFile jb = new JarFile(b.toFile(), false)) {
            List<JarEntry> ea = entries(ja);
            List<JarEntry> eb = entries(jb);
            List<String> na = ea.stream().map(JarEntry::getName).collect(Collectors.toList());
            List<String> nb = eb.stream().map(JarEntry::getName).collect(Collectors.toList());
            if (!na.equals(nb)) {
                out.add("entry names or order differ: " + na.size() + " against " + nb.size() + " entries");
            }
            for (JarEntry x : ea) {
                JarEntry y = jb.getJarEntry(x.getName());
                if (y == null) {
                    out.add(x.getName() + ": only in the first");
                } else if (!x.getTimeLocal().equals(y.getTimeLocal())) {
                    out.add(x.getName() + ": time " + x.getTimeLocal() + " against " + y.getTimeLocal());
                } else if (!Arrays.equals(bytes(ja, x), bytes(jb, y))) {
                    out.add(x.getName() + ": content differs");
                }
            }
        }
        return out.size() > 20 ? out.subList(0, 20) : out;
    }

    @Test
    void aSecondBuildOfShieldCoreGivesTheSameJar() throws IOException, InterruptedException {
        String name = MODULE + "-" + VERSION + ".jar";
        Path reactorJar = ROOT.resolve(MODULE).resolve("target").resolve(name);
        assertTrue(published.contains(reactorJar), reactorJar + " is the jar this reactor built: " + published);

        delete(WORK);
        Files.createDirectories(WORK);
        for (String f : List.of("pom.xml", "mvnw", "mvnw.cmd", ".mvn")) {
            if (Files.exists(ROOT.resolve(f))) {
                copy(ROOT.resolve(f), WORK.resolve(f));
            }
        }
        copy(ROOT.resolve(MODULE).resolve("pom.xml"), WORK.resolve(MODULE).resolve("pom.xml"));
        copy(ROOT.resolve(MODULE).resolve("src").resolve("main"), WORK.resolve(MODULE).resolve("src").resolve("main"));

        boolean windows = System.getProperty("os.name").toLowerCase(Locale.ROOT).startsWith("windows");
        List<String> command = new ArrayList<>(List.of(
                WORK.resolve(windows ? "mvnw.cmd" : "mvnw").toString(),
                "-B", "-q", "-o", "-f", WORK.resolve(MODULE).resolve("pom.xml").toString(),
                "-Dmaven.test.skip=true", "-Dmaven.javadoc.skip=true", "-Dmaven.source.skip=true"));
        String localRepository = System.getProperty("shield.localRepository", "");
        if (!localRepository.isEmpty()) {
            command.add("-Dmaven.repo.local=" + localRepository);
        }
        command.add("package");
        Path log = WORK.resolve("build.log");
        ProcessBuilder pb = new ProcessBuilder(command).directory(WORK.toFile())
                .redirectErrorStream(true).redirectOutput(log.toFile());
        // The same JDK as this build's: the manifest names its specification version.
        Map<String, String> env = pb.environment();
        env.put("JAVA_HOME", System.getProperty("java.home"));
        Process p = pb.start();
        p.getOutputStream().close();
        if (!p.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            p.waitFor(30, TimeUnit.SECONDS);
            fail("the second build of " + MODULE + " took over " + TIMEOUT_SECONDS + " s: " + command);
        }
        assertEquals(0, p.exitValue(), "the second build of " + MODULE + " failed: " + command + "\n"
                + Files.readString(log, StandardCharsets.UTF_8));

        Path rebuilt = WORK.resolve(MODULE).resolve("target").resolve(name);
        assertTrue(Files.isRegularFile(rebuilt), rebuilt + " was built");
        List<String> why = sha256(reactorJar).equals(sha256(rebuilt)) ? List.of() : differences(reactorJar, rebuilt);
        assertEquals(sha256(reactorJar), sha256(rebuilt), name + " differs between this build and a second one (if"
                + " this tree was not built from clean, a stale class in target/classes may be the cause):\n  "
                + String.join("\n  ", why));
    }

    @Test
    void everyEntryOfEveryPublishedJarCarriesTheOutputTimestamp() throws IOException {
        String stamp = System.getProperty("shield.outputTimestamp");
        assertFalse(stamp == null || stamp.isBlank(), "project.build.outputTimestamp is set in the parent POM");
        // Zip stores local date and time to 2 s; the Maven archiver writes the UTC time of the stamp.
        LocalDateTime utc = OffsetDateTime.parse(stamp).withOffsetSameInstant(ZoneOffset.UTC).toLocalDateTime();
        LocalDateTime expected = utc.withNano(0).withSecond(utc.getSecond() / 2 * 2);
        List<String> problems = new ArrayList<>();
        for (Path jar : published) {
            try (JarFile j = new JarFile(jar.toFile(), false)) {
                for (JarEntry e : entries(j)) {
                    if (!expected.equals(e.getTimeLocal())) {
                        problems.add(jar.getFileName() + "!" + e.getName() + " has the time " + e.getTimeLocal());
                    }
                }
            }
        }
        assertTrue(problems.isEmpty(), "entries without the time " + expected + " of project.build.outputTimestamp:\n  "
                + String.join("\n  ", problems.subList(0, Math.min(20, problems.size()))));
    }

    @Test
    void noPublishedManifestHoldsBuildMachineData() throws IOException {
        String javaVersion = System.getProperty("java.version");
        for (Path jar : published) {
            try (JarFile j = new JarFile(jar.toFile(), false)) {
                Manifest m = j.getManifest();
                assertTrue(m != null, jar + " has a manifest");
                for (Map.Entry<Object, Object> a : m.getMainAttributes().entrySet()) {
                    String key = ((Attributes.Name) a.getKey()).toString();
                    String value = String.valueOf(a.getValue());
                    assertFalse(MACHINE_ATTRIBUTES.stream().anyMatch(key::equalsIgnoreCase),
                            jar.getFileName() + "'s manifest has " + key + ": " + value);
                    // "Build-Jdk-Spec: 17" names the Java version, the same on every machine; the
                    // JDK's full version (17.0.x, its vendor) would differ between machines.
                    assertFalse(value.contains(javaVersion) && !javaVersion.equals(value.strip()),
                            jar.getFileName() + "'s manifest has the JDK's version in " + key + ": " + value);
                }
            }
        }
    }
}
