/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Scans every class of the module: no static field may be non-final, and no visible
 * static final field may be an array (an array's contents can be changed by anyone who
 * can see it). Private static final arrays are lookup tables the class never writes.
 */
class NoMutableStaticStateTest {

    @Test
    void noClassHasMutableStaticState() throws IOException, ClassNotFoundException {
        Path root = Paths.get("target/classes");
        List<String> offenders = new ArrayList<>();
        int scanned = 0;
        try (Stream<Path> files = Files.walk(root)) {
            for (Path p : (Iterable<Path>) files.filter(f -> f.toString().endsWith(".class"))::iterator) {
                String name = root.relativize(p).toString().replace('/', '.').replace(".class", "");
                if (name.equals("module-info")) {
                    continue;
                }
                Class<?> c = Class.forName(name, false, getClass().getClassLoader());
                scanned++;
                for (Field f : c.getDeclaredFields()) {
                    int m = f.getModifiers();
                    if (!Modifier.isStatic(m) || f.isSynthetic()) {
                        continue;
                    }
                    if (!Modifier.isFinal(m)) {
                        offenders.add(name + "." + f.getName() + " is static and not final");
                    } else if (f.getType().isArray() && !Modifier.isPrivate(m)) {
                        offenders.add(name + "." + f.getName() + " is a visible static array");
                    }
                }
            }
        }
        assertTrue(scanned > 30, "expected to scan the module's classes, found " + scanned);
        assertTrue(offenders.isEmpty(), () -> String.join("\n", offenders));
    }
}
