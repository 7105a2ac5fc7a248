/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.design.MarginReport;
import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.EnclosureEvaluation;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.materials.files.DesignFile;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DesignStudyTest {

    @Test
    void studyWritesEveryFileAndItsRecommendationMeetsTheRequirement(@TempDir Path dir) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        DesignStudy.Outcome o = DesignStudy.run(new PrintStream(bytes, true, StandardCharsets.UTF_8), dir);
        String report = bytes.toString(StandardCharsets.UTF_8);
        for (String f : new String[] {"sweeps.csv", "chosen-design.json", "se-vs-frequency.png",
            "se-vs-frequency.svg"}) {
            Path p = dir.resolve(f);
            assertTrue(Files.exists(p) && Files.size(p) > 100, f + " missing or empty");
        }
        assertTrue(report.contains("Recommended: " + o.recommended()), report);
        assertTrue(report.contains("local codes"), "the report must carry the cautions");
        byte[] png = Files.readAllBytes(dir.resolve("se-vs-frequency.png"));
        assertEquals((byte) 0x89, png[0]);
        assertEquals('P', png[1]);
        assertTrue(Files.readString(dir.resolve("se-vs-frequency.svg")).contains("<svg"));
        assertEquals(122, Files.readAllLines(dir.resolve("sweeps.csv")).size());

        // Re-evaluate the recommended can from the written design file, through the public API only.
        assertNotNull(o.recommended());
        assertTrue(o.recommended().startsWith("can: "), o::recommended);
        Design d = DesignFile.read(o.designFile(), Catalogue.builtIn());
        List<Layer> inToOut = new ArrayList<>(d.barrier().layers());
        Collections.reverse(inToOut);           // the file lists the wall source (outer) side first
        Shell shell = Shell.box(Length.ofMetres(0.08), Length.ofMetres(0.06), Length.ofMetres(0.03))
                .wall(inToOut.get(0).medium(), inToOut.get(0).thickness());
        for (int i = 1; i < inToOut.size(); i++) {
            Layer l = inToOut.get(i);
            shell = l.isGap() ? shell.thenGap(l.thickness())
                    : shell.then(l.medium(), l.thickness());
        }
        EnclosureEvaluation e = Enclosure.of(shell).withOpening(Opening.holes(Length.ofMillimetres(3), 24))
                .inUniformField();
        MarginReport m = o.requirement().marginOf(e);
        assertTrue(m.meets(), m::toString);
    }
}
