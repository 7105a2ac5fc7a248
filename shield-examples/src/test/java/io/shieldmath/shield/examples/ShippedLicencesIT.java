/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import io.shieldmath.shield.examples.PomLicences.Component;
import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Enumeration;
import java.util.List;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * What we ship and under which licences. Everything {@code shield-all.jar} bundles is the
 * run-time path of this module, which holds every published module and what each brings
 * in; the licences come from each component's POM in the local repository. Fails if any
 * component may only be had under the GPL or AGPL, if one declares no licence, if the
 * committed third-party list {@code THIRD-PARTY.txt} is out of date, or if the shaded jar
 * lost a bundled LICENSE or NOTICE text, or if a component under the LGPL is bundled
 * without a copy of that licence's text. After a dependency change, rewrite the list with
 * {@code ./mvnw -B -pl shield-examples -am verify -Dtest=none -Dsurefire.failIfNoSpecifiedTests=false
 * -Dshield.thirdParty.write=true}.
 */
class ShippedLicencesIT {

    static final Path ROOT = JShellToolIT.ROOT;
    static final Path JAR = JShellToolIT.JAR;
    static final Path LIST = ROOT.resolve("THIRD-PARTY.txt");
    /** Licence texts the bundled components need beside them; each is also in shield-all.jar. */
    static final Path LICENCE_TEXTS = ROOT.resolve("licenses");
    /** Where shield-all.jar carries the files of {@link #LICENCE_TEXTS}. */
    static final String JAR_LICENCE_TEXTS = "META-INF/licenses/";

    /**
     * The licence text, a file in {@link #LICENCE_TEXTS}, that each bundled LGPL component
     * needs (LGPL-2.1 section 1: a copy of the licence goes with the library), by groupId:artifactId.
     * A POM does not always name the version: JFreeChart's names only the "GNU Lesser
     * General Public Licence"; its source files and its licence.txt name version 2.1, "or
     * (at your option) any later version" (from memory of the JFreeChart 1.5 sources).
     */
    static final Map<String, String> LGPL_TEXT = Map.of("org.jfree:jfreechart", "LGPL-2.1.txt");
    /**
     * SHA-256 of the verbatim GNU LGPL version 2.1 text as Debian ships it in
     * {@code /usr/share/common-licenses/LGPL-2.1} (package base-files), computed with
     * {@code sha256sum} on that file: {@code licenses/LGPL-2.1.txt} must stay that copy.
     */
    static final String LGPL_2_1_SHA256 = "dc626520dcd53a22f727af3ee42c770e56c97a64fe3adb063799d8ab032fe551";

    static List<Path> jars;
    static List<Component> thirdParty;

    @BeforeAll
    static void read() throws IOException {
        Path localRepository = Paths.get(System.getProperty("shield.localRepository")).toAbsolutePath().normalize();
        jars = Arrays.stream(Files.readString(Paths.get(System.getProperty("shield.runtimeClasspath"))).split(File.pathSeparator))
                .map(String::strip).filter(s -> !s.isEmpty()).map(p -> Paths.get(p).toAbsolutePath().normalize())
                .collect(Collectors.toList());
        assertTrue(jars.size() > 3, "the run-time path was read: " + jars);
        thirdParty = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (Path jar : jars) {
            Component c = PomLicences.ofJar(jar, localRepository);
            if (c.licences().isEmpty()) {
                problems.add(c.coordinates() + " declares no licence in its POM or its parents' (" + jar + ")");
            } else if (PomLicences.onlyGplFamily(c)) {
                problems.add(c.coordinates() + " is GPL/AGPL only: " + c.licences());
            }
            if (!"io.shieldmath".equals(c.groupId())) {
                thirdParty.add(c);
            }
        }
        if (!problems.isEmpty()) {
            fail("components we may not ship under Apache-2.0:\n  " + String.join("\n  ", problems));
        }
        thirdParty.sort(PomLicences.ORDER);
    }

    @Test
    void nothingShippedIsGplOrAgplOnly() {
        // The check itself is in read(); here, that it looked at the library's own modules too.
        assertTrue(jars.stream().anyMatch(j -> j.getFileName().toString().startsWith("shield-core")), jars.toString());
    }

    static String list() {
        StringBuilder b = new StringBuilder();
        b.append("Third-party components bundled in shield-all.jar\n")
                .append("=================================================\n\n")
                .append("shield is licensed under the Apache License, Version 2.0 (LICENSE). shield-all.jar\n")
                .append("also bundles the components below, each under the licence its Maven POM declares.\n")
                .append("The published library modules depend on a part of them (see the README, \"Use it\n")
                .append("in your build\"). This list is generated from the POMs by ShippedLicencesIT in\n")
                .append("shield-examples, which fails the build when it is out of date.\n");
        for (Component c : thirdParty) {
            b.append('\n').append(c.coordinates()).append('\n');
            c.licences().forEach(l -> b.append("    ").append(l).append('\n'));
            String text = LGPL_TEXT.get(c.groupId() + ":" + c.artifactId());
            if (text != null) {
                b.append("    licence text: ").append(JAR_LICENCE_TEXTS).append(text)
                        .append(" (in the repository: licenses/").append(text).append(")\n");
            }
        }
        return b.toString();
    }

    @Test
    void theCommittedThirdPartyListIsUpToDate() throws IOException {
        String generated = list();
        if (Boolean.getBoolean("shield.thirdParty.write")) {
            Files.writeString(LIST, generated, StandardCharsets.UTF_8);
        }
        assertTrue(Files.isRegularFile(LIST), LIST + " exists");
        assertEquals(generated, Files.readString(LIST, StandardCharsets.UTF_8),
                "THIRD-PARTY.txt is out of date: rewrite it with -Dshield.thirdParty.write=true (see this test's javadoc)");
    }

    static byte[] entry(JarFile jar, String name) throws IOException {
        JarEntry e = jar.getJarEntry(name);
        if (e == null) {
            return null;
        }
        try (InputStream in = jar.getInputStream(e)) {
            return in.readAllBytes();
        }
    }

    /** The Apache LICENSE files the shade plugin's licence transformer folds into ours. */
    static boolean isApacheLicenceFile(String name) {
        String n = name.toUpperCase(Locale.ROOT);
        return n.equals("META-INF/LICENSE") || n.equals("META-INF/LICENSE.TXT") || n.equals("META-INF/LICENSE.MD");
    }

    static boolean isLegalText(String name) {
        String n = name.toUpperCase(Locale.ROOT);
        return n.startsWith("META-INF/") && n.indexOf('/', 9) < 0 && (n.contains("LICENSE") || n.contains("NOTICE"));
    }

    @Test
    void theShadedJarKeepsEveryLicenceAndNotice() throws IOException {
        try (JarFile all = new JarFile(JAR.toFile())) {
            assertArrayEquals(Files.readAllBytes(ROOT.resolve("LICENSE")), entry(all, "META-INF/LICENSE"),
                    "shield-all.jar carries our LICENSE (Apache-2.0)");
            assertArrayEquals(Files.readAllBytes(LIST), entry(all, "META-INF/THIRD-PARTY.txt"),
                    "shield-all.jar carries THIRD-PARTY.txt");
            byte[] noticeBytes = entry(all, "META-INF/NOTICE");
            assertNotNull(noticeBytes, "shield-all.jar has a merged META-INF/NOTICE");
            String notice = new String(noticeBytes, StandardCharsets.UTF_8);
            Path localRepository = Paths.get(System.getProperty("shield.localRepository")).toAbsolutePath().normalize();
            for (Path path : jars) {
                if (!Files.isRegularFile(path)) {
                    continue;
                }
                try (JarFile dep = new JarFile(path.toFile())) {
                    for (Enumeration<JarEntry> en = dep.entries(); en.hasMoreElements(); ) {
                        String name = en.nextElement().getName();
                        if (!isLegalText(name)) {
                            continue;
                        }
                        byte[] text = entry(dep, name);
                        if (isApacheLicenceFile(name)) {
                            // Dropped in favour of our identical Apache-2.0 text: only right if
                            // the component is Apache-2.0.
                            Component c = PomLicences.ofJar(path, localRepository);
                            assertTrue(c.licences().stream().anyMatch(l -> (l.name() + l.url()).contains("Apache")),
                                    c.coordinates() + " ships " + name + " but is not Apache-2.0: keep its text");
                        } else if (name.toUpperCase(Locale.ROOT).startsWith("META-INF/NOTICE")) {
                            for (String line : new String(text, StandardCharsets.UTF_8).split("\\R")) {
                                if (line.toLowerCase(Locale.ROOT).contains("copyright")) {
                                    assertTrue(notice.contains(line.strip()),
                                            "the merged NOTICE keeps \"" + line.strip() + "\" of " + path.getFileName());
                                }
                            }
                        } else {
                            assertArrayEquals(text, entry(all, name), name + " of " + path.getFileName() + " is kept");
                        }
                    }
                }
            }
        }
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new AssertionError("every JDK has SHA-256", e);
        }
    }

    @Test
    void everyLgplComponentShipsWithTheLicenceText() throws IOException {
        List<String> problems = new ArrayList<>();
        try (JarFile all = new JarFile(JAR.toFile())) {
            for (Component c : thirdParty) {
                if (c.licences().stream().noneMatch(PomLicences::isLesserGpl)) {
                    continue;
                }
                String text = LGPL_TEXT.get(c.groupId() + ":" + c.artifactId());
                if (text == null) {
                    problems.add(c.coordinates() + " is under the LGPL (" + c.licences() + ") but LGPL_TEXT names no"
                            + " licence text for it: add the text of its LGPL version to licenses/ and to LGPL_TEXT");
                    continue;
                }
                Path file = LICENCE_TEXTS.resolve(text);
                if (!Files.isRegularFile(file)) {
                    problems.add(c.coordinates() + " needs " + file + ", which is missing");
                    continue;
                }
                byte[] inJar = entry(all, JAR_LICENCE_TEXTS + text);
                if (inJar == null || !Arrays.equals(Files.readAllBytes(file), inJar)) {
                    problems.add(c.coordinates() + " is bundled, but shield-all.jar does not carry licenses/" + text
                            + " as " + JAR_LICENCE_TEXTS + text + " (add it to the shade plugin's IncludeResourceTransformers)");
                }
            }
        }
        if (!problems.isEmpty()) {
            fail("LGPL components shipped without their licence text:\n  " + String.join("\n  ", problems));
        }
        // The check above had something to check: JFreeChart is bundled, and under the LGPL.
        assertTrue(thirdParty.stream().anyMatch(c -> "org.jfree".equals(c.groupId())
                && c.licences().stream().anyMatch(PomLicences::isLesserGpl)), thirdParty.toString());
    }

    @Test
    void theLgplTextIsTheVerbatimVersion21() throws IOException {
        byte[] text = Files.readAllBytes(LICENCE_TEXTS.resolve("LGPL-2.1.txt"));
        String head = new String(text, 0, Math.min(200, text.length), StandardCharsets.US_ASCII);
        assertTrue(head.contains("GNU LESSER GENERAL PUBLIC LICENSE") && head.contains("Version 2.1, February 1999"), head);
        assertEquals(LGPL_2_1_SHA256, sha256(text), "licenses/LGPL-2.1.txt is the unchanged text (Debian's copy)");
    }

    @Test
    void everyLicenceTextOfTheRepositoryIsInTheJar() throws IOException {
        List<Path> texts;
        try (Stream<Path> files = Files.list(LICENCE_TEXTS)) {
            texts = files.filter(Files::isRegularFile).sorted().collect(Collectors.toList());
        }
        assertTrue(texts.containsAll(LGPL_TEXT.values().stream().map(LICENCE_TEXTS::resolve).collect(Collectors.toList())),
                "every text LGPL_TEXT names is in licenses/: " + texts);
        try (JarFile all = new JarFile(JAR.toFile())) {
            for (Path t : texts) {
                String name = JAR_LICENCE_TEXTS + t.getFileName();
                assertArrayEquals(Files.readAllBytes(t), entry(all, name), "shield-all.jar carries " + name);
            }
        }
    }
}
