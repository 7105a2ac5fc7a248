/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.internal.JsonValues;
import io.shieldmath.shield.materials.internal.Node;

import io.shieldmath.shield.field.FieldKind;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.ConstantPermeability;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.medium.RelaxationPermeability;
import io.shieldmath.shield.medium.TabulatedPermeability;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.RelativePermittivity;
import io.shieldmath.shield.quantity.SheetResistance;
import io.shieldmath.shield.quantity.Temperature;
import io.shieldmath.shield.quantity.TemperatureCoefficient;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.BiFunction;
import java.util.function.Function;
import java.util.function.Supplier;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;
import io.shieldmath.shield.materials.TypicalRange;
import java.util.function.ToDoubleFunction;
import io.shieldmath.shield.internal.Require;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import static io.shieldmath.shield.materials.internal.JsonValues.*;
import static io.shieldmath.shield.materials.internal.QuantityText.*;
import static io.shieldmath.shield.materials.internal.DesignParts.*;

/**
 * The catalogue file format: reading a catalogue document with strict validation and its
 * location (JSON path, line and column) in every error, and writing one that reads back
 * equal. The format is described at {@link #toJson(Catalogue)}.
 *
 * <pre>{@code
 * Catalogue ours = CatalogueFile.read(Path.of("our-alloys.json"));
 * Catalogue cat = Catalogue.builtIn().extendedWith(ours);
 * CatalogueFile.write(cat, Path.of("all.json"));
 * }</pre>
 *
 * <p>Documents are at most 4 000 000 characters, counted after decoding for strings,
 * streams and files alike; a stream or file is UTF-8, UTF-16 or UTF-32 (detected, with or
 * without a byte-order mark). Stateless and thread-safe.
 */
public final class CatalogueFile {

    static final String CATALOGUE_FORMAT = "shield-catalogue";
    /** The newest catalogue version: 2 adds {@code "range"} to property objects. */
    static final int CATALOGUE_VERSION = 2;
    /** The version from which property objects may hold a {@code "range"}. */
    static final int RANGE_VERSION = 2;
    static final int MAX_MATERIALS = 10_000;

    private static final Set<String> CATALOGUE_FIELDS = Set.of("format", "version", "materials");
    private static final Set<String> MATERIAL_FIELDS = Set.of("id", "name", "conductivity", "sheetResistance",
            "temperatureCoefficient", "permeability", "permittivity", "density", "saturation", "note");
    private static final Set<String> SHEET_FIELDS = Set.of("value", "thickness", "source");
    private static final Set<String> RANGED_FIELDS = Set.of("value", "source", "range");
    private static final Set<String> RANGE_FIELDS = Set.of("low", "high", "source");

    private CatalogueFile() {
    }

    /**
     * Reads a catalogue document. Nothing is returned unless the whole document is valid.
     *
     * @param json the document, not null
     * @return the catalogue
     * @throws MaterialFileException if the document is not an acceptable catalogue (with its location)
     */
    public static Catalogue parse(String json) {
        return readCatalogue(Node.parse(Require.nonNull("json", json)));
    }

    /**
     * Reads a catalogue from a stream (UTF-8, UTF-16 or UTF-32, detected); the stream is
     * not closed.
     *
     * @param in the stream, not null
     * @return the catalogue
     * @throws MaterialFileException if the document is not an acceptable catalogue
     * @throws UncheckedIOException  if reading fails
     */
    public static Catalogue read(InputStream in) {
        return readCatalogue(Node.parse(Require.nonNull("stream", in)));
    }

    /**
     * Reads a catalogue file.
     *
     * @param file the file, not null
     * @return the catalogue
     * @throws IOException           if the file cannot be read
     * @throws MaterialFileException if the document is not an acceptable catalogue
     */
    public static Catalogue read(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(Require.nonNull("file", file))) {
            return read(in);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /**
     * A catalogue as a JSON document, read back by {@link #parse(String)} to an equal
     * catalogue. The format (all quantities are text with a unit):
     *
     * <pre>
     * {
     *   "format": "shield-catalogue",
     *   "version": 2,
     *   "materials": [
     *     {
     *       "id": "copper-annealed",
     *       "name": "Copper, annealed (IACS standard)",
     *       "conductivity": { "value": "58 MS/m", "source": "IEC 60028 (100 % IACS by definition)" },
     *       "temperatureCoefficient": { "value": "0.00393 /K", "source": "IEC 60028" },
     *       "permeability": { "model": "constant", "value": "1", "source": "..." },
     *       "permittivity": { "value": 1, "source": "..." },
     *       "density": { "value": "8890 kg/m3", "source": "IEC 60028" },
     *       "saturation": { "value": "0.75 T", "source": "..." },            (ferromagnetic only)
     *       "note": "..."                                                    (optional)
     *     }
     *   ]
     * }
     * </pre>
     *
     * A finish known by sheet resistance has, instead of {@code conductivity},
     * {@code "sheetResistance": { "value": "0.5 Ω/sq", "thickness": "50 µm", "source": "..." }}.
     * Permeability models: {@code {"model": "constant", "value": "1200 - j 800"}},
     * {@code {"model": "relaxation", "lowFrequency": 60000, "corner": "2 kHz"}} for
     * µ(f) = µdc/(1 + j·f/fc), and {@code {"model": "table", "points": [{"frequency": "10 Hz",
     * "real": 60000, "loss": 500}, ...]}} interpolated in log frequency; each with its
     * {@code "source"}. Units: conductivity S/m, MS/m, % IACS; temperature coefficient
     * {@code /K}, {@code 1/K}, {@code /°C} or {@code ppm/K}; density kg/m3 or g/cm3; flux
     * density T, mT, G; sheet resistance Ω/sq or mΩ/sq. Unknown fields, missing units,
     * duplicate identifiers and out-of-range values are rejected.
     *
     * <p>Version 2 adds an optional {@code "range"} beside the value of a conductivity,
     * temperature coefficient, permeability, permittivity, density or saturation: the range
     * a published reference gives around the typical value, in the value's own form, for
     * example {@code "conductivity": {"value": "2.1 MS/m", "range": {"low": "1.9 MS/m",
     * "high": "2.3 MS/m", "source": "..."}, "source": "..."}}, or plain numbers for
     * permittivity and for permeability (the static µr: {@code "range": {"low": 20000,
     * "high": 100000, "source": "..."}}). A range has its own source and must hold the
     * typical value. Version 1 documents are read as before and may
     * hold no range; a catalogue is written as version 1 when none of its materials has a
     * range, so that it reads back in older releases, and as version 2 otherwise.
     * The provenance of each number is read from its source text ({@link
     * io.shieldmath.shield.materials.Provenance}); a source that starts with "checked
     * against" must say where it was read.
     *
     * @param catalogue the catalogue, not null
     * @return the document, pretty-printed
     */
    public static String toJson(Catalogue catalogue) {
        return writeCatalogue(Require.nonNull("catalogue", catalogue));
    }

    /**
     * Writes {@link #toJson(Catalogue)} to a file in UTF-8, replacing it.
     *
     * @param catalogue the catalogue, not null
     * @param file      the file, not null
     * @throws IOException if the file cannot be written
     */
    public static void write(Catalogue catalogue, Path file) throws IOException {
        Files.writeString(Require.nonNull("file", file), toJson(catalogue), StandardCharsets.UTF_8);
    }


    private static Catalogue readCatalogue(Node root) {
        Node.Fields f = root.object(CATALOGUE_FIELDS);
        int version = header(f, CATALOGUE_FORMAT, CATALOGUE_VERSION);
        List<Node> entries = f.required("materials").array(0, MAX_MATERIALS);
        List<Material> materials = new ArrayList<>(entries.size());
        Map<String, Node> seen = new HashMap<>();
        for (Node e : entries) {
            Material m = readMaterial(e, version);
            Node previous = seen.putIfAbsent(m.id(), e);
            if (previous != null) {
                throw e.fields.get("id").error("duplicate material id \"" + m.id() + "\" (first at line "
                        + previous.line + ", column " + previous.column + ")");
            }
            materials.add(m);
        }
        return Catalogue.of(materials);
    }

    private static Material readMaterial(Node n, int version) {
        Node.Fields f = n.object(MATERIAL_FIELDS);
        Node idNode = f.required("id");
        String id = idNode.convert(Material::checkId, idNode.string());
        Node nameNode = f.required("name");
        Material.Builder b = nameNode.convert(s -> Material.builder(id, s), nameNode.string());

        valued(f, "conductivity", false, Conductivity::parse, "58 MS/m", b::conductivity, b, version,
                MaterialProperty.CONDUCTIVITY, Conductivity::toSiemensPerMetre);
        Node sheet = f.optional("sheetResistance");
        if (sheet != null) {
            Node.Fields v = sheet.object(SHEET_FIELDS);
            SheetResistance rs = v.required("value").quantity(SheetResistance::parse, "0.5 Ω/sq");
            Length t = v.required("thickness").quantity(Length::parse, "50 µm");
            String src = source(v);
            at(sheet, () -> b.sheetResistance(rs, t, src));
        }
        valued(f, "temperatureCoefficient", false, TemperatureCoefficient::parse, "0.00393 /K",
                b::temperatureCoefficient, b, version, MaterialProperty.TEMPERATURE_COEFFICIENT,
                TemperatureCoefficient::toPerKelvin);
        Node mu = f.required("permeability");
        PermeabilityModel model = readPermeability(mu, true);
        Node.Fields muFields = new Node.Fields(mu);
        String muSource = source(muFields);
        at(mu, () -> b.permeability(model, muSource));
        range(muFields, b, version, MaterialProperty.PERMEABILITY, model.staticValue(), Node::number);
        Node eps = f.required("permittivity");
        Node.Fields ev = eps.object(RANGED_FIELDS);
        RelativePermittivity epsilon = permittivity(ev.required("value"));
        String epsSource = source(ev);
        at(eps, () -> b.permittivity(epsilon, epsSource));
        range(ev, b, version, MaterialProperty.PERMITTIVITY, epsilon.value(), Node::number);
        valued(f, "density", true, Density::parse, "8890 kg/m³", b::density, b, version, MaterialProperty.DENSITY,
                Density::toKilogramsPerCubicMetre);
        valued(f, "saturation", false, MagneticFluxDensity::parse, "0.75 T", b::saturation, b, version,
                MaterialProperty.SATURATION, MagneticFluxDensity::toTesla);
        Node note = f.optional("note");
        if (note != null) {
            String text = note.string();
            at(note, () -> b.note(text));
        }
        return at(n, b::build);
    }

    /**
     * Reads a {@code {"value": ..., "source": ..., "range": ...}} property and hands value and
     * source to a builder step, then the range, if any, read with the same parser.
     */
    private static <Q> void valued(Node.Fields f, String key, boolean required, Function<String, Q> parse,
                                   String example, BiFunction<Q, String, Material.Builder> step,
                                   Material.Builder b, int version, MaterialProperty p, ToDoubleFunction<Q> si) {
        Node n = required ? f.required(key) : f.optional(key);
        if (n == null) {
            return;
        }
        Node.Fields v = n.object(RANGED_FIELDS);
        Q q = v.required("value").quantity(parse, example);
        String src = source(v);
        at(n, () -> step.apply(q, src));
        range(v, b, version, p, si.applyAsDouble(q), e -> si.applyAsDouble(e.quantity(parse, example)));
    }

    /**
     * Reads the optional {@code "range": {"low": ..., "high": ...}} of a property object
     * (catalogue version {@value #RANGE_VERSION} and later) and checks, at the range, that it
     * holds the typical value.
     */
    private static void range(Node.Fields v, Material.Builder b, int version, MaterialProperty p, double typical,
                              ToDoubleFunction<Node> read) {
        Node n = v.optional("range");
        if (n == null) {
            return;
        }
        if (version < RANGE_VERSION) {
            throw n.error("a range needs version " + RANGE_VERSION + " of the catalogue format; this document "
                    + "says version " + version);
        }
        Node.Fields r = n.object(RANGE_FIELDS);
        double low = read.applyAsDouble(r.required("low"));
        double high = read.applyAsDouble(r.required("high"));
        String src = source(r);
        TypicalRange range = at(n, () -> TypicalRange.of(p, low, high, src));
        if (!range.contains(typical)) {
            throw n.error("the " + range + " does not hold the typical value " + Text.number(typical) + " "
                    + TypicalRange.unit(p) + "; allowed: a range from at most to at least the typical value");
        }
        b.range(range);
    }

    private static String writeCatalogue(Catalogue c) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", CATALOGUE_FORMAT);
        boolean ranged = c.all().stream().anyMatch(m -> !m.ranges().isEmpty());
        root.put("version", ranged ? RANGE_VERSION : VERSION);
        ArrayNode list = root.putArray("materials");
        for (Material m : c.all()) {
            writeMaterial(list.addObject(), m);
        }
        return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    }

    private static void writeMaterial(ObjectNode o, Material m) {
        o.put("id", m.id());
        o.put("name", m.name());
        if (m.sheetResistance().isPresent()) {
            ObjectNode s = o.putObject("sheetResistance");
            s.put("value", text(m.sheetResistance().get()));
            s.put("thickness", text(m.nominalThickness().get()));
            s.put("source", m.source(MaterialProperty.SHEET_RESISTANCE).get());
        } else {
            valued(o, "conductivity", text(m.conductivity()), m, MaterialProperty.CONDUCTIVITY);
        }
        if (m.temperatureCoefficient().isPresent()) {
            valued(o, "temperatureCoefficient", text(m.temperatureCoefficient().get()), m,
                    MaterialProperty.TEMPERATURE_COEFFICIENT);
        }
        ObjectNode mu = o.putObject("permeability");
        writePermeability(mu, m.permeability());
        mu.put("source", m.source(MaterialProperty.PERMEABILITY).get());
        writeRange(mu, m, MaterialProperty.PERMEABILITY);
        ObjectNode eps = o.putObject("permittivity");
        number(eps, "value", m.permittivity().value());
        eps.put("source", m.source(MaterialProperty.PERMITTIVITY).get());
        writeRange(eps, m, MaterialProperty.PERMITTIVITY);
        valued(o, "density", text(m.density()), m, MaterialProperty.DENSITY);
        if (m.saturation().isPresent()) {
            valued(o, "saturation", text(m.saturation().get()), m, MaterialProperty.SATURATION);
        }
        m.note().ifPresent(n -> o.put("note", n));
    }

    private static void valued(ObjectNode o, String key, String value, Material m, MaterialProperty p) {
        ObjectNode v = o.putObject(key);
        v.put("value", value);
        v.put("source", m.source(p).get());
        writeRange(v, m, p);
    }

    private static void writeRange(ObjectNode o, Material m, MaterialProperty p) {
        TypicalRange r = m.range(p).orElse(null);
        if (r == null) {
            return;
        }
        ObjectNode n = o.putObject("range");
        switch (p) {
            case CONDUCTIVITY:
                n.put("low", text(Conductivity.ofSiemensPerMetre(r.low())));
                n.put("high", text(Conductivity.ofSiemensPerMetre(r.high())));
                break;
            case TEMPERATURE_COEFFICIENT:
                n.put("low", text(TemperatureCoefficient.ofPerKelvin(r.low())));
                n.put("high", text(TemperatureCoefficient.ofPerKelvin(r.high())));
                break;
            case DENSITY:
                n.put("low", text(Density.ofKilogramsPerCubicMetre(r.low())));
                n.put("high", text(Density.ofKilogramsPerCubicMetre(r.high())));
                break;
            case SATURATION:
                n.put("low", text(MagneticFluxDensity.ofTesla(r.low())));
                n.put("high", text(MagneticFluxDensity.ofTesla(r.high())));
                break;
            default:
                number(n, "low", r.low());
                number(n, "high", r.high());
        }
        n.put("source", r.source());
    }
}
