/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.materials.Catalogue;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The README's material table is generated from the catalogue resource; this fails if it drifts. */
class CatalogueTableTest {

    @Test
    void readmeTableIsTheGeneratedOne() throws IOException {
        Catalogue cat = Catalogue.builtIn();
        Path readme = Path.of("..", "README.md");
        String text = Files.readString(readme, StandardCharsets.UTF_8);
        String expected = CatalogueTable.markdown(cat);
        assertEquals(expected, CatalogueTable.section(text),
                "README table differs from the catalogue; regenerate it with CatalogueTable (see its javadoc)");
        assertTrue(expected.contains("`nickel-iron-80`") && expected.contains("IEC 60028"));
        assertTrue(expected.contains(", checked]") && expected.contains(", from memory]")
                && expected.contains(", common practice]"), "the table shows the provenance of each number");
    }

    /** The count row adds up to the number of sources the catalogue's materials carry, state by state. */
    @Test
    void provenanceCountsAddUp() {
        Catalogue cat = Catalogue.builtIn();
        String counts = CatalogueTable.counts(cat);
        String all = counts.lines().filter(l -> l.startsWith("| all |")).findFirst().orElseThrow();
        String[] cells = all.split("\\|");
        long numbers = cat.all().stream().mapToLong(m -> m.sources().size()).sum();
        long sum = 0;
        for (int i = 2; i < 2 + io.shieldmath.shield.materials.Provenance.values().length; i++) {
            sum += Long.parseLong(cells[i].strip());
        }
        assertEquals(numbers, sum, counts);
        long checked = cat.all().stream().flatMap(m -> m.sources().values().stream())
                .filter(t -> t.startsWith("checked against") && !t.contains("from memory")).count();
        assertEquals(checked, Long.parseLong(cells[2].strip()), counts);
        long ranges = cat.all().stream().mapToLong(m -> m.ranges().size()).sum();
        assertEquals(ranges, Long.parseLong(cells[cells.length - 1].strip()), counts);
    }

    @Test
    void theSectionIsReplacedBetweenItsMarkers() {
        String doc = "a\n" + CatalogueTable.START + "\nold\n" + CatalogueTable.END + "\nb\n";
        String out = CatalogueTable.replaceSection(doc, "new\n");
        assertEquals("new\n", CatalogueTable.section(out));
        assertTrue(out.startsWith("a\n") && out.endsWith(CatalogueTable.END + "\nb\n"), out);
        assertThrows(IllegalArgumentException.class, () -> CatalogueTable.section("no markers"));
    }
}
