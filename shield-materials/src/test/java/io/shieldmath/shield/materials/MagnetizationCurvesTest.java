/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.materials.files.MagnetizationCurveFile;
import io.shieldmath.shield.materials.files.MaterialFileException;
import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.NoSuchElementException;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The built-in magnetization curves and their file format. The curves are estimates (from
 * memory, each naming the standard to check against: ASTM A753 for nickel-iron, IEC
 * 60404-8-4 for silicon steel, ASM Handbook Vol. 1 for steel); the checks here are that each
 * says so, that each agrees with its own catalogue entry (initial permeability and
 * saturation, same sources), and that the shape is that of a soft magnetic material.
 */
class MagnetizationCurvesTest {

    private static final Set<String> EXPECTED = Set.of("steel-1010", "silicon-steel", "nickel-iron-50",
            "nickel-iron-80", "cobalt-amorphous");

    @Test
    void builtInCurvesCoverTheSoftMagneticAlloysWithTheirProvenance() {
        MagnetizationCurves all = MagnetizationCurves.builtIn();
        assertEquals(EXPECTED, all.ids());
        for (String id : all.ids()) {
            String src = all.source(id).orElseThrow();
            assertTrue(src.startsWith("from memory"), id + ": " + src);
            assertTrue(src.contains("ASTM A753") || src.contains("IEC 60404") || src.contains("ASM Handbook")
                    || src.contains("supplier"), id + ": " + src);
        }
    }

    @Test
    void eachCurveAgreesWithItsCatalogueEntry() {
        for (String id : EXPECTED) {
            Material m = Catalogue.builtIn().get(id);
            MagnetizationCurve c = MagnetizationCurves.builtIn().get(id);
            double bs = m.saturation().orElseThrow().toTesla();
            assertEquals(bs, c.saturationTesla(), 0, id);
            // Initial permeability within 20 % of the catalogue's low-field value (both estimates
            // from the same handbook classes).
            double mu = m.permeability().staticValue();
            assertEquals(1, c.initialPermeability() / mu, 0.2, id + ": curve " + c.initialPermeability()
                    + ", catalogue " + mu);
            // The last point is saturated: within 10 % of B_sat, and the secant µr there below 100.
            int last = c.points() - 1;
            assertEquals(1, c.pointTesla(last) / bs, 0.1, id);
            assertTrue(c.secantPermeability(MagneticFluxDensity.ofTesla(c.pointTesla(last))) < 100, id);
            // A soft magnetic curve: the permeability rises from its initial value to a maximum
            // before the knee (common practice, no source).
            double best = 0;
            for (int k = 0; k < c.points(); k++) {
                best = Math.max(best, c.secantPermeability(MagneticFluxDensity.ofTesla(c.pointTesla(k))));
            }
            assertTrue(best > 1.5 * c.initialPermeability(), id);
        }
    }

    @Test
    void unknownIdsAreRefusedWithTheKnownOnesListed() {
        NoSuchElementException e = assertThrows(NoSuchElementException.class,
                () -> MagnetizationCurves.builtIn().get("copper-annealed"));
        assertTrue(e.getMessage().contains("nickel-iron-80"), e.getMessage());
        assertTrue(MagnetizationCurves.builtIn().find("copper-annealed").isEmpty());
    }

    private static MaterialFileException refused(String json) {
        return assertThrows(MaterialFileException.class, () -> MagnetizationCurveFile.parse(json, Catalogue.builtIn()));
    }

    private static String doc(String material, String points) {
        return "{\n  \"format\": \"shield-magnetization-curves\",\n  \"version\": 1,\n  \"curves\": [\n"
                + "    {\"material\": \"" + material + "\", \"source\": \"invented for a test\",\n"
                + "     \"points\": [" + points + "]}\n  ]\n}";
    }

    @Test
    void malformedFilesAreRefusedWithTheirLocation() {
        String ok = "{\"fieldStrength\": \"10 A/m\", \"fluxDensity\": \"0.1 T\"}";
        MagnetizationCurves read = MagnetizationCurveFile.parse(doc("steel-1010", ok), Catalogue.builtIn());
        assertEquals(0.1 / (io.shieldmath.shield.quantity.PhysicalConstants.MU_0 * 10),
                read.get("steel-1010").initialPermeability(), 1e-6);

        MaterialFileException e = refused(doc("steel-101", ok));
        assertEquals(5, e.line());
        assertTrue(e.getMessage().contains("steel-1010"), e.getMessage());

        e = refused(doc("copper-annealed", ok));
        assertTrue(e.getMessage().contains("saturation"), e.getMessage());

        e = refused(doc("steel-1010", ok + ", {\"fieldStrength\": \"5 A/m\", \"fluxDensity\": \"0.2 T\"}"));
        assertTrue(e.path().contains("points"), e.path());
        assertTrue(e.getMessage().contains("[1]"), e.getMessage());

        e = refused(doc("steel-1010", "{\"fieldStrength\": \"10 T\", \"fluxDensity\": \"0.1 T\"}"));
        assertTrue(e.path().endsWith("fieldStrength"), e.path());

        e = refused(doc("steel-1010", "{\"field\": \"10 A/m\", \"fluxDensity\": \"0.1 T\"}"));
        assertTrue(e.getMessage().contains("unknown field"), e.getMessage());

        e = refused(doc("steel-1010", ok).replace("invented for a test", " "));
        assertTrue(e.getMessage().contains("source"), e.getMessage());
    }
}
