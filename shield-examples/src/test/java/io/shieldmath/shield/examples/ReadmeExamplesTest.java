/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import org.junit.jupiter.api.Test;

/** The README's design example runs as printed, through JShell, and says what it should. */
class ReadmeExamplesTest {

    static String javaBlockAfter(String heading) throws IOException {
        String readme = Files.readString(Paths.get("..", "README.md"), StandardCharsets.UTF_8);
        int at = readme.indexOf(heading);
        assertTrue(at >= 0, "README has no section " + heading);
        int start = readme.indexOf("```java\n", at) + "```java\n".length();
        int end = readme.indexOf("```", start);
        return readme.substring(start, end);
    }

    @Test
    void requirementToDesignExampleRuns() throws IOException {
        String out = JShellScriptsTest.run("README: From requirement to design",
                javaBlockAfter("## From requirement to design"));
        assertTrue(out.contains("the requirement; worst margin"), out);
        assertTrue(out.contains("is first met at") || out.contains("no thickness up to"), out);
        assertTrue(out.contains("ranking by areal mass for 150.0 dB"), out);
        assertTrue(out.contains("1. aluminium 6061"), out);   // the lightest, as in DesignTest's hand computation
        assertTrue(out.contains("reciprocity"), out);
        assertTrue(out.contains("100000 samples"), out);
    }
}
