/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

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
import io.shieldmath.shield.internal.Require;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import static io.shieldmath.shield.materials.files.JsonValues.*;

/**
 * The design file format: reading a design document, resolving material identifiers
 * against a catalogue, with strict validation and its location (JSON path, line and
 * column) in every error, and writing one that reads back equal. The format is described
 * at {@link #toJson(Design)}.
 *
 * <pre>{@code
 * Design d = DesignFile.read(Path.of("study.json"), Catalogue.builtIn());
 * Sweep<PlanarResult> s = d.sweep();
 * }</pre>
 *
 * <p>Documents are at most 4 000 000 characters, counted after decoding for strings,
 * streams and files alike. Stateless and thread-safe.
 */
public final class DesignFile {

    static final String DESIGN_FORMAT = "shield-design";

    private static final Set<String> DESIGN_FIELDS = Set.of("format", "version", "title", "layers", "field", "band",
            "points");
    private static final Set<String> LAYER_FIELDS = Set.of("material", "thickness", "temperature", "gap", "medium");
    private static final Set<String> MEDIUM_FIELDS = Set.of("name", "conductivity", "permeability", "permittivity");
    private static final Set<String> FIELD_FIELDS = Set.of("kind", "distance", "impedance");

    private DesignFile() {
    }

    /**
     * Reads a design file, resolving material identifiers against a catalogue.
     *
     * @param json      the document, not null
     * @param catalogue the catalogue for material references, not null
     * @return the design
     * @throws MaterialFileException if the document is not an acceptable design (with its location)
     */
    public static Design parse(String json, Catalogue catalogue) {
        Require.nonNull("catalogue", catalogue);
        return readDesign(Node.parse(Require.nonNull("json", json)), catalogue);
    }

    /**
     * Reads a design file from a stream (UTF-8, UTF-16 or UTF-32, detected); the stream is
     * not closed.
     *
     * @param in        the stream, not null
     * @param catalogue the catalogue for material references, not null
     * @return the design
     * @throws MaterialFileException if the document is not an acceptable design
     * @throws java.io.UncheckedIOException if reading fails
     */
    public static Design read(InputStream in, Catalogue catalogue) {
        Require.nonNull("catalogue", catalogue);
        return readDesign(Node.parse(Require.nonNull("stream", in)), catalogue);
    }

    /**
     * Reads a design file.
     *
     * @param file      the file, not null
     * @param catalogue the catalogue for material references, not null
     * @return the design
     * @throws IOException           if the file cannot be read
     * @throws MaterialFileException if the document is not an acceptable design
     */
    public static Design read(Path file, Catalogue catalogue) throws IOException {
        try (InputStream in = Files.newInputStream(Require.nonNull("file", file))) {
            return read(in, catalogue);
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /**
     * A design as a JSON document, read back by {@link #parse(String, Catalogue)} to an
     * equal design (given a catalogue holding the same materials). The format:
     *
     * <pre>
     * {
     *   "format": "shield-design",
     *   "version": 1,
     *   "title": "lid for a fluxgate housing",            (optional)
     *   "layers": [
     *     { "material": "copper-annealed", "thickness": "0.3 mm" },
     *     { "gap": "2 mm" },
     *     { "material": "nickel-iron-80", "thickness": "0.5 mm", "temperature": "60 °C" },
     *     { "medium": { "name": "my alloy", "conductivity": "1.6 MS/m",
     *                   "permeability": { "model": "relaxation", "lowFrequency": 30000, "corner": "1 kHz" },
     *                   "permittivity": 1 },
     *       "thickness": "1 mm" }
     *   ],
     *   "field": { "kind": "magnetic-near-field", "distance": "6 cm", "impedance": "exact-dipole" },
     *   "band": "10 Hz to 100 kHz",
     *   "points": 41
     * }
     * </pre>
     *
     * Field kinds: {@code plane-wave} (no distance or impedance), {@code magnetic-near-field},
     * {@code electric-near-field}; impedance forms {@code textbook}, {@code exact-dipole}. A
     * finish known by sheet resistance may omit the thickness (its nominal one is used).
     * Values are written in a short unit form where that reads back exactly, else in SI
     * units with every digit.
     *
     * @param design the design, not null
     * @return the document, pretty-printed
     */
    public static String toJson(Design design) {
        return writeDesign(Require.nonNull("design", design));
    }

    /**
     * Writes {@link #toJson(Design)} to a file in UTF-8, replacing it.
     *
     * @param design the design, not null
     * @param file   the file, not null
     * @throws IOException if the file cannot be written
     */
    public static void write(Design design, Path file) throws IOException {
        Files.writeString(Require.nonNull("file", file), toJson(design), StandardCharsets.UTF_8);
    }


    private static Design readDesign(Node root, Catalogue catalogue) {
        Node.Fields f = root.object(DESIGN_FIELDS);
        header(f, DESIGN_FORMAT);
        Node layersNode = f.required("layers");
        List<Node> entries = layersNode.array(1, Barrier.MAX_LAYERS);
        List<DesignLayer> layers = new ArrayList<>(entries.size());
        for (Node e : entries) {
            layers.add(readLayer(e, catalogue));
        }
        IncidentField field = readField(f.required("field"));
        Node bandNode = f.required("band");
        FrequencyBand band = bandNode.quantity(FrequencyBand::parse, "10 Hz to 100 kHz");
        int points = f.required("points").integer(1, Design.MAX_POINTS);
        Design d = at(bandNode, () -> Design.of(layers, field, band, points));
        Node title = f.optional("title");
        if (title == null) {
            return d;
        }
        String t = title.string();
        return at(title, () -> d.withTitle(t));
    }

    private static DesignLayer readLayer(Node n, Catalogue catalogue) {
        Node.Fields f = n.object(LAYER_FIELDS);
        int kinds = (f.has("material") ? 1 : 0) + (f.has("gap") ? 1 : 0) + (f.has("medium") ? 1 : 0);
        if (kinds != 1) {
            throw n.error("a layer has exactly one of \"material\", \"gap\" and \"medium\"");
        }
        if (f.has("gap")) {
            n.object(Set.of("gap"));
            Length t = f.required("gap").quantity(Length::parse, "2 mm");
            return at(f.required("gap"), () -> DesignLayer.gap(t));
        }
        if (f.has("medium")) {
            n.object(Set.of("medium", "thickness"));
            Medium m = readMedium(f.required("medium"));
            Node tn = f.required("thickness");
            Length t = tn.quantity(Length::parse, "1 mm");
            return at(tn, () -> DesignLayer.medium(m, t));
        }
        Node ref = f.required("material");
        String id = ref.string();
        Material m = catalogue.find(id).orElseThrow(() -> ref.error(catalogue.unknown(id)));
        Node tn = f.optional("thickness");
        Node temp = f.optional("temperature");
        Length t;
        if (tn != null) {
            t = tn.quantity(Length::parse, "0.5 mm");
        } else {
            t = m.nominalThickness().orElseThrow(() -> n.error("missing field \"thickness\" (" + id
                    + " is a bulk material)"));
        }
        Node where = tn != null ? tn : ref;
        if (temp == null) {
            return at(where, () -> DesignLayer.of(m, t));
        }
        Temperature c = temp.quantity(Temperature::parse, "60 °C");
        // The temperature's range is checked at the temperature, the thickness's at the thickness.
        at(temp, () -> m.atTemperature(c));
        return at(where, () -> DesignLayer.of(m, t, c));
    }

    private static Medium readMedium(Node n) {
        Node.Fields f = n.object(MEDIUM_FIELDS);
        Node nameNode = f.required("name");
        String name = nameNode.string();
        Conductivity sigma = f.required("conductivity").quantity(Conductivity::parse, "1 MS/m");
        Node mu = f.optional("permeability");
        PermeabilityModel model = mu == null ? ConstantPermeability.ONE : readPermeability(mu, false);
        Node eps = f.optional("permittivity");
        RelativePermittivity epsilon = eps == null ? RelativePermittivity.ONE : permittivity(eps);
        Medium m = at(nameNode, () -> Medium.of(Require.text("medium name", name, 200), sigma, model, epsilon));
        Node sigmaNode = f.required("conductivity");
        at(sigmaNode, () -> Require.inRange("medium conductivity",
                sigma.toSiemensPerMetre(), 0, 1e9, "S/m"));
        return m;
    }

    private static IncidentField readField(Node n) {
        Node.Fields f = n.object(FIELD_FIELDS);
        Node kindNode = f.required("kind");
        String kind = kindNode.string();
        switch (kind) {
            case "plane-wave":
                n.object(Set.of("kind"));
                return IncidentField.planeWave();
            case "magnetic-near-field":
            case "electric-near-field": {
                Length r = f.required("distance").quantity(Length::parse, "6 cm");
                Node formNode = f.required("impedance");
                String form = formNode.string();
                ImpedanceForm fm;
                if (form.equals("textbook")) {
                    fm = ImpedanceForm.TEXTBOOK;
                } else if (form.equals("exact-dipole")) {
                    fm = ImpedanceForm.EXACT_DIPOLE;
                } else {
                    throw formNode.error("unknown impedance form \"" + form + "\"; known: textbook, exact-dipole");
                }
                return kind.startsWith("magnetic") ? IncidentField.magneticNearField(r, fm)
                        : IncidentField.electricNearField(r, fm);
            }
            default:
                throw kindNode.error("unknown field kind \"" + kind
                        + "\"; known: plane-wave, magnetic-near-field, electric-near-field");
        }
    }

    private static String writeDesign(Design d) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", DESIGN_FORMAT);
        root.put("version", VERSION);
        if (!d.title().isEmpty()) {
            root.put("title", d.title());
        }
        ArrayNode layers = root.putArray("layers");
        for (DesignLayer l : d.layers()) {
            ObjectNode o = layers.addObject();
            switch (l.kind()) {
                case GAP:
                    o.put("gap", text(l.thickness()));
                    break;
                case MEDIUM: {
                    ObjectNode m = o.putObject("medium");
                    Medium med = l.medium();
                    m.put("name", med.name());
                    m.put("conductivity", text(med.conductivity()));
                    writePermeability(m.putObject("permeability"), med.permeability());
                    number(m, "permittivity", med.permittivity().value());
                    o.put("thickness", text(l.thickness()));
                    break;
                }
                default:
                    o.put("material", l.material().get().id());
                    o.put("thickness", text(l.thickness()));
                    if (l.temperature().isPresent()) {
                        o.put("temperature", text(l.temperature().get()));
                    }
            }
        }
        ObjectNode field = root.putObject("field");
        IncidentField fld = d.field();
        switch (fld.kind()) {
            case PLANE_WAVE:
                field.put("kind", "plane-wave");
                break;
            default:
                field.put("kind", fld.kind() == FieldKind.MAGNETIC_NEAR_FIELD ? "magnetic-near-field"
                        : "electric-near-field");
                field.put("distance", text(fld.distance()));
                field.put("impedance", fld.form() == ImpedanceForm.TEXTBOOK ? "textbook" : "exact-dipole");
        }
        root.put("band", text(d.band().low()) + " to " + text(d.band().high()));
        root.put("points", d.points());
        return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    }
}
