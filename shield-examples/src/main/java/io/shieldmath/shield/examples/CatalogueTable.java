/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;
import io.shieldmath.shield.materials.Provenance;
import io.shieldmath.shield.materials.TypicalRange;

import io.shieldmath.shield.medium.ApparentPermeability;
import io.shieldmath.shield.medium.ConstantPermeability;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.medium.RelaxationPermeability;
import io.shieldmath.shield.medium.TabulatedPermeability;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Prints a catalogue as a Markdown table with numbered sources, the table of the README,
 * generated from the catalogue resource so that it cannot drift from it. Each number is
 * followed by its source number and its {@link Provenance} (checked, from memory, common
 * practice, ...), a stored range by its own; a second table counts the provenance of the
 * numbers by property.
 *
 * <pre>
 * ./mvnw -q -pl shield-examples exec:java -Dexamples.main=io.shieldmath.shield.examples.CatalogueTable                              (print)
 * ./mvnw -q -pl shield-examples exec:java -Dexamples.main=io.shieldmath.shield.examples.CatalogueTable -Dexec.args=$PWD/README.md  (rewrite)
 * </pre>
 *
 * With a file argument, the text between the lines {@value #START} and {@value #END} is
 * replaced. Stateless and thread-safe.
 */
public final class CatalogueTable {

    /** The line that opens the generated table in a Markdown file. */
    public static final String START = "<!-- catalogue:start -->";
    /** The line that closes the generated table in a Markdown file. */
    public static final String END = "<!-- catalogue:end -->";

    private CatalogueTable() {
    }

    /**
     * Prints the built-in catalogue's table, or rewrites it in a Markdown file.
     *
     * @param args nothing to print to standard output, or the path of a Markdown file whose
     *             marked section is replaced
     * @throws IOException if the file cannot be read or written
     */
    public static void main(String[] args) throws IOException {
        String table = markdown(Catalogue.builtIn());
        if (args.length == 0) {
            System.out.print(table);
            return;
        }
        Path file = Path.of(args[0]);
        String text = Files.readString(file, StandardCharsets.UTF_8);
        Files.writeString(file, replaceSection(text, table), StandardCharsets.UTF_8);
    }

    /**
     * Replaces the text between the {@value #START} and {@value #END} lines.
     *
     * @param document the Markdown document, not null, holding both markers in order
     * @param table    the new section, not null
     * @return the new document
     * @throws IllegalArgumentException if the markers are missing
     */
    public static String replaceSection(String document, String table) {
        int a = java.util.Objects.requireNonNull(document, "document").indexOf(START);
        int b = document.indexOf(END);
        if (a < 0 || b < a) {
            throw new IllegalArgumentException("the document has no " + START + " ... " + END + " section");
        }
        return document.substring(0, a + START.length()) + "\n" + table + document.substring(b);
    }

    /**
     * The text between the {@value #START} and {@value #END} lines of a document.
     *
     * @param document the Markdown document, not null
     * @return the section, without the marker lines
     * @throws IllegalArgumentException if the markers are missing
     */
    public static String section(String document) {
        int a = java.util.Objects.requireNonNull(document, "document").indexOf(START);
        int b = document.indexOf(END);
        if (a < 0 || b < a) {
            throw new IllegalArgumentException("the document has no " + START + " ... " + END + " section");
        }
        return document.substring(a + START.length() + 1, b);
    }

    /**
     * The catalogue as a Markdown table followed by its numbered sources.
     *
     * @param catalogue the catalogue, not null
     * @return the Markdown text, ending with a line break
     */
    public static String markdown(Catalogue catalogue) {
        java.util.Objects.requireNonNull(catalogue, "catalogue");
        Map<String, Integer> sources = new LinkedHashMap<>();
        StringBuilder s = new StringBuilder();
        s.append("| id | material | σ at 20 °C | α (1/K) | µr model | \\|µr\\| at 10 Hz / 10 kHz / 100 kHz "
                + "| εr | density (kg/m³) | Bs |\n");
        s.append("|---|---|---|---|---|---|---|---|---|\n");
        for (Material m : catalogue.all()) {
            List<String> cells = new ArrayList<>();
            cells.add("`" + m.id() + "`");
            cells.add(m.name());
            if (m.sheetResistance().isPresent()) {
                cells.add(m.sheetResistance().get() + " at " + m.nominalThickness().get()
                        + ref(sources, m, MaterialProperty.SHEET_RESISTANCE));
            } else {
                double sigma = m.conductivity().toSiemensPerMetre();
                String text = sigma == 0 ? "0" : digits(sigma / 1e6, 4) + " MS/m (" + digits(
                        m.conductivity().toPercentIacs(), 4) + " % IACS)";
                cells.add(text + ref(sources, m, MaterialProperty.CONDUCTIVITY)
                        + range(sources, m, MaterialProperty.CONDUCTIVITY, 1e6, " MS/m"));
            }
            cells.add(m.temperatureCoefficient().isPresent()
                    ? digits(m.temperatureCoefficient().get().toPerKelvin(), 4)
                    + ref(sources, m, MaterialProperty.TEMPERATURE_COEFFICIENT)
                    + range(sources, m, MaterialProperty.TEMPERATURE_COEFFICIENT, 1, "") : "—");
            cells.add(model(m.permeability()) + ref(sources, m, MaterialProperty.PERMEABILITY)
                    + range(sources, m, MaterialProperty.PERMEABILITY, 1, " (static µr)"));
            PermeabilityModel p = m.permeability();
            cells.add(magnitude(p, 10) + " / " + magnitude(p, 1e4) + " / " + magnitude(p, 1e5));
            cells.add(digits(m.permittivity().value(), 4) + ref(sources, m, MaterialProperty.PERMITTIVITY)
                    + range(sources, m, MaterialProperty.PERMITTIVITY, 1, ""));
            cells.add(digits(m.density().toKilogramsPerCubicMetre(), 4) + ref(sources, m, MaterialProperty.DENSITY)
                    + range(sources, m, MaterialProperty.DENSITY, 1, ""));
            cells.add(m.saturation().isPresent() ? m.saturation().get() + ref(sources, m, MaterialProperty.SATURATION)
                    + range(sources, m, MaterialProperty.SATURATION, 1, " T") : "—");
            s.append("| ").append(String.join(" | ", cells)).append(" |\n");
        }
        s.append("\n").append(counts(catalogue));
        s.append("\nSources:\n\n");
        for (Map.Entry<String, Integer> e : sources.entrySet()) {
            s.append(e.getValue()).append(". ").append(e.getKey()).append('\n');
        }
        return s.toString();
    }

    private static String ref(Map<String, Integer> sources, Material m, MaterialProperty p) {
        return ref(sources, m.source(p).orElseThrow());
    }

    private static String ref(Map<String, Integer> sources, String text) {
        Integer n = sources.computeIfAbsent(text, k -> sources.size() + 1);
        return " [" + n + ", " + Provenance.of(text).words() + "]";
    }

    /** The stored range of a property, in the cell's unit, with its own source; empty if none. */
    private static String range(Map<String, Integer> sources, Material m, MaterialProperty p, double unit,
                                String suffix) {
        TypicalRange r = m.range(p).orElse(null);
        if (r == null) {
            return "";
        }
        return " (range " + digits(r.low() / unit, 4) + " to " + digits(r.high() / unit, 4) + suffix
                + ref(sources, r.source()) + ")";
    }

    /**
     * How many numbers of each property have each provenance, and how many ranges are stored.
     *
     * @param catalogue the catalogue, not null
     * @return a Markdown table ending with a line break
     */
    public static String counts(Catalogue catalogue) {
        java.util.Objects.requireNonNull(catalogue, "catalogue");
        StringBuilder s = new StringBuilder("| property |");
        StringBuilder rule = new StringBuilder("|---|");
        for (Provenance v : Provenance.values()) {
            s.append(' ').append(v.words()).append(" |");
            rule.append("---|");
        }
        s.append(" ranges stored |\n").append(rule).append("---|\n");
        int[] total = new int[Provenance.values().length];
        int ranges = 0;
        for (MaterialProperty p : MaterialProperty.values()) {
            int[] n = new int[total.length];
            int r = 0;
            for (Material m : catalogue.all()) {
                m.provenance(p).ifPresent(v -> n[v.ordinal()]++);
                r += m.range(p).isPresent() ? 1 : 0;
            }
            if (java.util.Arrays.stream(n).sum() == 0) {
                continue;
            }
            s.append("| ").append(p.key()).append(" |");
            for (int i = 0; i < n.length; i++) {
                s.append(' ').append(n[i]).append(" |");
                total[i] += n[i];
            }
            s.append(' ').append(r).append(" |\n");
            ranges += r;
        }
        s.append("| all |");
        for (int t : total) {
            s.append(' ').append(t).append(" |");
        }
        return s.append(' ').append(ranges).append(" |\n").toString();
    }

    private static String model(PermeabilityModel p) {
        if (p instanceof ConstantPermeability c) {
            return "constant " + c.value();
        }
        if (p instanceof RelaxationPermeability r) {
            return "relaxation, µdc " + digits(r.lowFrequencyValue(), 6) + ", fc " + r.corner();
        }
        if (p instanceof TabulatedPermeability t) {
            double[] hz = t.hertz();
            return "table of " + hz.length + " points";
        }
        if (p instanceof ApparentPermeability a) {
            return "table of " + a.apparentTable().hertz().length + " points, apparent µ of a "
                    + a.sheetThickness() + " sheet, converted to intrinsic";
        }
        return p.toString();
    }

    private static String magnitude(PermeabilityModel p, double hz) {
        return digits(Math.hypot(p.real(hz), p.loss(hz)), 3);
    }

    /** A value to a number of significant digits, without exponent or trailing zeros. */
    static String digits(double v, int significant) {
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(significant)).stripTrailingZeros();
        return d.scale() < 0 ? d.setScale(0).toPlainString() : d.toPlainString();
    }
}
