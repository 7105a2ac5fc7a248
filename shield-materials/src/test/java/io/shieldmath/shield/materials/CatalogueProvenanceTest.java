/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.ConstantPermeability;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.RelativePermittivity;
import io.shieldmath.shield.quantity.TemperatureCoefficient;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The provenance of the built-in catalogue: every number that claims a check names its source and
 * the address where it was read, every stored range holds its typical value, and the spot checks of
 * the catalogue review are resolved against the published figures.
 */
class CatalogueProvenanceTest {

    private final Catalogue cat = Catalogue.builtIn();

    /** Every source text of the built-in catalogue, number sources and range sources, with where it is. */
    private List<String[]> allSources() {
        List<String[]> out = new ArrayList<>();
        for (Material m : cat.all()) {
            for (Map.Entry<MaterialProperty, String> e : m.sources().entrySet()) {
                out.add(new String[] {m.id() + " " + e.getKey().key(), e.getValue()});
            }
            for (TypicalRange r : m.ranges().values()) {
                out.add(new String[] {m.id() + " " + r.property().key() + " range", r.source()});
            }
        }
        return out;
    }

    private static final Pattern READ_AT = Pattern.compile(", read at (\\S+)");

    /**
     * A check names its source (text between "checked against" and the first ", read at") and where it
     * was read (every "read at" is followed by an http or https address of a stored page). Written out
     * here rather than through {@link Provenance#namesSourceAndPlace(String)}, so the rule is checked twice.
     */
    @Test
    void everyCheckedNumberNamesItsSourceAndWhereItWasRead() {
        int checked = 0;
        for (String[] s : allSources()) {
            String where = s[0];
            String text = s[1];
            if (!text.startsWith("checked against")) {
                assertFalse(text.toLowerCase(java.util.Locale.ROOT).contains("checked against") && !text.contains(
                        "from memory"), where + " mentions a check but does not start with it: " + text);
                continue;
            }
            checked++;
            assertEquals(Provenance.CHECKED, Provenance.of(text), where);
            int read = text.indexOf(", read at ");
            assertTrue(read > "checked against ".length() + 3, where + " names no source before \"read at\": " + text);
            Matcher m = READ_AT.matcher(text);
            int places = 0;
            while (m.find()) {
                places++;
                assertTrue(m.group(1).matches("https?://[^\\s,;]{4,}(?::|$)?.*"), where + ": not an address: " + m.group(1));
            }
            assertTrue(places >= 1, where);
            // every further source in the same text ("and against ...") also has its place
            assertEquals(countOf(text, "and against "), countOf(text, ", read at ") - 1, where + ": " + text);
            assertTrue(Provenance.namesSourceAndPlace(text), where);
        }
        assertTrue(checked >= 60, "the catalogue review checked at least 60 numbers and ranges, found " + checked);
    }

    private static int countOf(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + 1)) {
            n++;
        }
        return n;
    }

    /** Each range holds the typical value, computed here from the material itself. */
    @Test
    void everyRangeHoldsItsTypicalValue() {
        int ranges = 0;
        for (Material m : cat.all()) {
            for (TypicalRange r : m.ranges().values()) {
                ranges++;
                double typical;
                switch (r.property()) {
                    case CONDUCTIVITY:
                        typical = m.conductivity().toSiemensPerMetre();
                        break;
                    case TEMPERATURE_COEFFICIENT:
                        typical = m.temperatureCoefficient().orElseThrow().toPerKelvin();
                        break;
                    case PERMEABILITY:
                        typical = m.permeability().staticValue();
                        break;
                    case PERMITTIVITY:
                        typical = m.permittivity().value();
                        break;
                    case DENSITY:
                        typical = m.density().toKilogramsPerCubicMetre();
                        break;
                    default:
                        typical = m.saturation().orElseThrow().toTesla();
                }
                assertTrue(r.low() <= typical && typical <= r.high(), m.id() + " " + r + " vs " + typical);
                assertTrue(r.low() < r.high(), m.id() + " " + r);
                assertEquals(Provenance.CHECKED, r.provenance(), m.id() + " " + r + ": " + r.source());
            }
        }
        assertTrue(ranges >= 15, "ranges stored: " + ranges);
    }

    /**
     * The discrepancies named by the catalogue review, resolved against the resistivity tables read
     * (the catalogue entries name them with their addresses): nickel 6.84 to 6.99 µΩ·cm (Preproom,
     * Engineering ToolBox, Robotz tables); tin 10.9 (Preproom) to 11.5 µΩ·cm (Robotz); lead 20.5
     * (Robotz) to 22 µΩ·cm (Preproom); gold 2.24 (Engineering ToolBox) to 2.44 µΩ·cm (Preproom). Where
     * the tables disagree by more than 3 % the catalogue keeps the lower conductivity and stores the range.
     */
    @Test
    void reviewDiscrepanciesAreResolvedAgainstThePublishedTables() {
        assertEquals(1 / 6.99e-8, cat.get("nickel").conductivity().toSiemensPerMetre(), 1 / 6.99e-8 * 0.005);
        assertRange(cat.get("tin"), 1 / 11.5e-8, 1 / 10.9e-8);
        assertRange(cat.get("lead"), 1 / 22e-8, 1 / 20.5e-8);
        assertRange(cat.get("gold"), 1 / 2.44e-8, 1 / 2.24e-8);
        assertTrue(cat.get("nickel").range(MaterialProperty.CONDUCTIVITY).isEmpty(),
                "the nickel tables agree within 3 %, so no range");
    }

    private static void assertRange(Material m, double lowSigma, double highSigma) {
        TypicalRange r = m.range(MaterialProperty.CONDUCTIVITY).orElseThrow();
        assertEquals(lowSigma, r.low(), lowSigma * 0.005, m.id());
        assertEquals(highSigma, r.high(), highSigma * 0.005, m.id());
        assertEquals(r.low(), m.conductivity().toSiemensPerMetre(), r.low() * 1e-12, m.id() + " keeps the lower value");
        assertTrue(r.source().contains("read at http"), m.id());
        assertTrue(m.source(MaterialProperty.CONDUCTIVITY).orElseThrow().contains("disagree"), m.id());
    }

    @Test
    void provenanceIsReadFromTheWordsOfTheSource() {
        assertEquals(Provenance.CHECKED, Provenance.of("checked against X Handbook, read at https://example.org/x"));
        assertEquals(Provenance.FROM_MEMORY, Provenance.of("checked against X, read at https://e.org/x; corner from memory"));
        assertEquals(Provenance.FROM_MEMORY, Provenance.of("From memory; to be checked against ASM Handbook Vol. 2"));
        assertEquals(Provenance.COMMON_PRACTICE, Provenance.of("common practice, no source: µr = 1"));
        assertEquals(Provenance.MEASURED, Provenance.of("measured with our four-point probe, 2026-11-30"));
        assertEquals(Provenance.DERIVED, Provenance.of("derived: σ = 1/(Rs·t)"));
        assertEquals(Provenance.CITED, Provenance.of("supplier datasheet, grade 3C90"));
        assertTrue(Provenance.namesSourceAndPlace("checked against ASM Handbook Vol. 2, read in the 1990 edition, p. 104"));
        assertFalse(Provenance.namesSourceAndPlace("checked against ASM Handbook Vol. 2"));
        assertFalse(Provenance.namesSourceAndPlace("checked against, read at https://example.org/x"));
        assertFalse(Provenance.namesSourceAndPlace("checked against ASM, read at somewhere"));
    }

    @Test
    void aCheckWithoutItsSourceAndPlaceIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> foil("checked against ASM Handbook"));
        assertTrue(e.getMessage().contains("our-foil density source") && e.getMessage().contains("read at"), e.getMessage());
        assertEquals(Provenance.CHECKED, foil("checked against our handbook, read in its 2nd edition, p. 12")
                .provenance(MaterialProperty.DENSITY).orElseThrow());
        assertThrows(IllegalArgumentException.class, () -> TypicalRange.of(MaterialProperty.DENSITY, 1, 2,
                "checked against a table"));
    }

    private static Material foil(String densitySource) {
        return Material.builder("our-foil", "Our foil")
                .conductivity(Conductivity.ofMegasiemensPerMetre(30), "invented for this test")
                .temperatureCoefficient(TemperatureCoefficient.ofPerKelvin(0.004), "invented for this test")
                .permeability(ConstantPermeability.ONE, "invented for this test")
                .permittivity(RelativePermittivity.ONE, "invented for this test")
                .density(Density.ofKilogramsPerCubicMetre(2700), densitySource).build();
    }

    @Test
    void aRangeMustHoldTheTypicalValue() {
        Material.Builder b = Material.builder("our-foil", "Our foil")
                .conductivity(Conductivity.ofMegasiemensPerMetre(30), "invented for this test")
                .temperatureCoefficient(TemperatureCoefficient.ofPerKelvin(0.004), "invented for this test")
                .permeability(ConstantPermeability.ONE, "invented for this test")
                .permittivity(RelativePermittivity.ONE, "invented for this test")
                .density(Density.ofKilogramsPerCubicMetre(2700), "invented for this test")
                .range(TypicalRange.of(MaterialProperty.CONDUCTIVITY, 31e6, 35e6, "invented for this test"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, b::build);
        assertTrue(e.getMessage().contains("does not hold the typical value"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> TypicalRange.of(MaterialProperty.SHEET_RESISTANCE, 1, 2, "x"));
        assertThrows(IllegalArgumentException.class, () -> TypicalRange.of(MaterialProperty.DENSITY, 2, 1, "x"));
        assertThrows(IllegalArgumentException.class, () -> TypicalRange.of(MaterialProperty.CONDUCTIVITY, -1, 2, "x"));
        assertThrows(IllegalArgumentException.class, () -> TypicalRange.of(MaterialProperty.DENSITY, 1, Double.NaN, "x"));
        assertThrows(IllegalArgumentException.class, () -> TypicalRange.of(MaterialProperty.DENSITY, 1, 2, " "));
        Material ok = b.range(TypicalRange.of(MaterialProperty.CONDUCTIVITY, 28e6, 35e6, "invented")).build();
        assertEquals(28e6, ok.range(MaterialProperty.CONDUCTIVITY).orElseThrow().low(), 0);
    }

    /** A designer can keep only the materials whose conductivity was checked. */
    @Test
    void aCatalogueFiltersOnProvenance() {
        Catalogue checked = cat.withProvenance(MaterialProperty.CONDUCTIVITY, Provenance.CHECKED);
        assertTrue(checked.contains("nickel") && checked.contains("aluminium-6061-t6"));
        assertFalse(checked.contains("copper-hard-drawn"), "hard-drawn copper stays from memory");
        assertFalse(checked.contains("ptfe"), "PTFE's zero conductivity is common practice");
        for (Material m : checked.all()) {
            assertTrue(m.source(MaterialProperty.CONDUCTIVITY).orElseThrow().startsWith("checked against"), m.id());
        }
        Catalogue memory = cat.withProvenance(MaterialProperty.SATURATION, Provenance.FROM_MEMORY);
        Catalogue satChecked = cat.withProvenance(MaterialProperty.SATURATION, Provenance.CHECKED);
        assertEquals(cat.all().stream().filter(m -> m.saturation().isPresent()).count(),
                memory.size() + satChecked.size(), "every saturation is either checked or from memory");
        assertTrue(satChecked.contains("silicon-steel") && memory.contains("steel-1010"));
    }
}
