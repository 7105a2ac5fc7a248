/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.internal.JsonValues;
import io.shieldmath.shield.materials.internal.Node;
import io.shieldmath.shield.materials.internal.Spelling;

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
import io.shieldmath.shield.quantity.InvalidQuantityException;
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
import static io.shieldmath.shield.materials.internal.JsonValues.*;
import static io.shieldmath.shield.materials.internal.QuantityText.*;
import static io.shieldmath.shield.materials.internal.DesignParts.*;

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

    /**
     * The version this class writes; versions 1 (a planar stack only) and 2 are still read.
     * Version 3 may also hold an axisymmetric arrangement, which shield-axisymmetric's
     * whole-design file reads.
     */
    static final int DESIGN_VERSION = 3;

    private static final Set<String> DESIGN_FIELDS = Set.of("format", "version", "title", "layers", "field", "band",
            "points", "shell", "cases", "arrangement");
    private static final Set<String> SHELL_FIELDS = Set.of("form", "sides", "radius", "walls", "openings",
            "exposure");
    private static final Set<String> OPENING_FIELDS = Set.of("kind", "diameter", "count", "length", "width",
            "tubeDepth", "victimDistance", "name");
    private static final Set<String> LAYER_FIELDS = Set.of("material", "thickness", "temperature", "gap", "medium");
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
     *   "version": 3,
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
     *   "points": 41,
     *   "cases": [                                         (optional: every source case to meet)
     *     { "band": "19 kHz to 21 kHz", "incident": "8 µT", "tolerated": "5 nT" },
     *     { "band": "1 MHz to 10 MHz", "requiredSe": "40 dB" }  (a required SE given directly)
     *   ]
     * }
     * </pre>
     *
     * A closed shell replaces {@code "layers"} with
     * <pre>
     *   "shell": { "form": "box", "sides": ["8 cm", "6 cm", "3 cm"],     (or "radius" for
     *              "walls": [ ...layers, innermost first... ],          sphere, cylinder-transverse,
     *              "openings": [ { "kind": "holes", "diameter": "3 mm",  cylinder-axial)
     *                              "count": 24, "name": "vent" } ],
     *              "exposure": "uniform" }                              (or "incident-field")
     * </pre>
     * Opening kinds: {@code holes} (diameter, count), {@code slot} (length, width),
     * {@code seam} (length), each with optional {@code tubeDepth}, {@code victimDistance} and
     * {@code name}. Version 1 files (a planar stack, no shell or cases) are still read.
     * A source case holds either {@code incident} and {@code tolerated} or {@code requiredSe}
     * (0 dB to 400 dB), never both.
     *
     * Field kinds: {@code plane-wave} (no distance or impedance), {@code magnetic-near-field},
     * {@code electric-near-field}; impedance forms {@code textbook}, {@code exact-dipole}. A
     * finish known by sheet resistance may omit the thickness (its nominal one is used).
     * A design read from a file is written back with every quantity in the text it was given
     * in ("0.2 mm" stays "0.2 mm", "21 mil" stays "21 mil"); other values are written in a
     * short unit form where that reads back exactly, else in SI units with every digit.
     * Version 3 documents may instead hold an axisymmetric {@code "arrangement"} (finite bodies
     * between coils or in an applied field); those are read and written by
     * {@code io.shieldmath.shield.axisymmetric.files.WholeDesignFile} in shield-axisymmetric,
     * which reads every kind. This class refuses them at the {@code "arrangement"} field.
     *
     * @param design the design, not null
     * @return the document, pretty-printed
     * @throws IllegalArgumentException if a permeability model is of a type the files do not hold (only
     *         constant, relaxation and table models are written)
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
     * @throws IllegalArgumentException if a permeability model is of a type the files do not hold
     */
    public static void write(Design design, Path file) throws IOException {
        Files.writeString(Require.nonNull("file", file), toJson(design), StandardCharsets.UTF_8);
    }


    private static Design readDesign(Node root, Catalogue catalogue) {
        Node.Fields f = root.object(DESIGN_FIELDS);
        Node fmt = f.required("format");
        if (!fmt.string().equals(DESIGN_FORMAT)) {
            throw fmt.error("expected \"" + DESIGN_FORMAT + "\", found \"" + fmt.string() + "\"");
        }
        int version = f.required("version").integer(1, DESIGN_VERSION);
        if (version == 1) {
            root.object(Set.of("format", "version", "title", "layers", "field", "band", "points"));
        } else if (version == 2) {
            root.object(Set.of("format", "version", "title", "layers", "field", "band", "points", "shell", "cases"));
        }
        Node arrangement = f.optional("arrangement");
        if (arrangement != null) {
            throw arrangement.error("this design is an axisymmetric arrangement; read it with "
                    + "io.shieldmath.shield.axisymmetric.files.WholeDesignFile (module shield-axisymmetric), "
                    + "which reads every kind of design");
        }
        Node shellNode = f.optional("shell");
        if (shellNode != null && f.has("layers")) {
            throw root.error("a design has either \"layers\" (a planar stack) or \"shell\", not both");
        }
        DesignShell shell = shellNode == null ? null : readShell(shellNode, catalogue);
        List<DesignLayer> layers = shell == null ? readLayers(f.required("layers"), catalogue) : null;
        IncidentField field = readField(f.required("field"));
        Node bandNode = f.required("band");
        FrequencyBand band = bandNode.quantity(FrequencyBand::parse, "10 Hz to 100 kHz");
        int points = f.required("points").integer(1, Design.MAX_POINTS);
        Design planar = at(bandNode, () -> shell == null ? Design.of(layers, field, band, points)
                : Design.of(shell, field, band, points));
        Node casesNode = f.optional("cases");
        Design cased = casesNode == null ? planar : planar.meeting(readCases(casesNode));
        Node title = f.optional("title");
        Design d;
        if (title == null) {
            d = cased;
        } else {
            String t = title.string();
            d = at(title, () -> cased.withTitle(t));
        }
        return d.spelledAs(Spelling.of(root.spelled()));
    }

    private static List<DesignLayer> readLayers(Node layersNode, Catalogue catalogue) {
        List<Node> entries = layersNode.array(1, Barrier.MAX_LAYERS);
        List<DesignLayer> layers = new ArrayList<>(entries.size());
        for (Node e : entries) {
            layers.add(readLayer(e, catalogue));
        }
        return layers;
    }

    private static DesignShell readShell(Node n, Catalogue catalogue) {
        Node.Fields f = n.object(SHELL_FIELDS);
        Node formNode = f.required("form");
        String form = formNode.string();
        Node wallsNode = f.required("walls");
        List<DesignLayer> walls = readLayers(wallsNode, catalogue);
        DesignShell shell;
        if (form.equals("box")) {
            Node sidesNode = f.required("sides");
            List<Node> sides = sidesNode.array(3, 3);
            List<Length> l = new ArrayList<>(3);
            for (Node s : sides) {
                l.add(s.quantity(Length::parse, "8 cm"));
            }
            shell = at(wallsNode, () -> DesignShell.box(l.get(0), l.get(1), l.get(2), walls));
        } else {
            DesignShell.Form fm = switch (form) {
                case "sphere" -> DesignShell.Form.SPHERE;
                case "cylinder-transverse" -> DesignShell.Form.CYLINDER_TRANSVERSE;
                case "cylinder-axial" -> DesignShell.Form.CYLINDER_AXIAL;
                default -> throw formNode.error("unknown shell form \"" + form
                        + "\"; known: box, sphere, cylinder-transverse, cylinder-axial");
            };
            Node rn = f.required("radius");
            Length r = rn.quantity(Length::parse, "4 cm");
            shell = at(rn, () -> DesignShell.round(fm, r, walls));
        }
        Node openingsNode = f.optional("openings");
        if (openingsNode != null) {
            for (Node o : openingsNode.array(0, io.shieldmath.shield.enclosure.Enclosure.MAX_OPENINGS)) {
                io.shieldmath.shield.enclosure.Opening op = readOpening(o);
                DesignShell before = shell;
                shell = at(o, () -> before.withOpening(op));
            }
        }
        Node exposure = f.optional("exposure");
        if (exposure != null) {
            String e = exposure.string();
            if (e.equals("incident-field")) {
                shell = shell.inUniformField(false);
            } else if (!e.equals("uniform")) {
                throw exposure.error("unknown exposure \"" + e + "\"; known: uniform, incident-field");
            }
        }
        return shell;
    }

    private static io.shieldmath.shield.enclosure.Opening readOpening(Node n) {
        Node.Fields f = n.object(OPENING_FIELDS);
        Node kindNode = f.required("kind");
        String kind = kindNode.string();
        io.shieldmath.shield.enclosure.Opening o;
        switch (kind) {
            case "holes": {
                Length d = f.required("diameter").quantity(Length::parse, "3 mm");
                Node cn = f.optional("count");
                int c = cn == null ? 1 : cn.integer(1, io.shieldmath.shield.enclosure.Opening.MAX_COUNT);
                o = at(f.required("diameter"), () -> io.shieldmath.shield.enclosure.Opening.holes(d, c));
                break;
            }
            case "slot": {
                Length l = f.required("length").quantity(Length::parse, "20 mm");
                Length w = f.required("width").quantity(Length::parse, "1 mm");
                o = at(f.required("width"), () -> io.shieldmath.shield.enclosure.Opening.slot(l, w));
                break;
            }
            case "seam": {
                Length l = f.required("length").quantity(Length::parse, "50 mm");
                o = at(f.required("length"), () -> io.shieldmath.shield.enclosure.Opening.seam(l));
                break;
            }
            default:
                throw kindNode.error("unknown opening kind \"" + kind + "\"; known: holes, slot, seam");
        }
        Node depth = f.optional("tubeDepth");
        if (depth != null) {
            Length t = depth.quantity(Length::parse, "5 mm");
            io.shieldmath.shield.enclosure.Opening before = o;
            o = at(depth, () -> before.throughTube(t));
        }
        Node victim = f.optional("victimDistance");
        if (victim != null) {
            Length v = victim.quantity(Length::parse, "2 cm");
            io.shieldmath.shield.enclosure.Opening before = o;
            o = at(victim, () -> before.atDistance(v));
        }
        Node name = f.optional("name");
        if (name != null) {
            String s = name.string();
            io.shieldmath.shield.enclosure.Opening before = o;
            o = at(name, () -> before.named(s));
        }
        return o;
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
                Node distanceNode = f.required("distance");
                Length r = distanceNode.quantity(Length::parse, "6 cm");
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
                try {
                    return kind.startsWith("magnetic") ? IncidentField.magneticNearField(r, fm)
                            : IncidentField.electricNearField(r, fm);
                } catch (InvalidQuantityException e) {
                    // A length the grammar reads but the near field refuses (below 1 µm or above 1000 km).
                    throw distanceNode.error(e.getMessage());
                }
            }
            default:
                throw kindNode.error("unknown field kind \"" + kind
                        + "\"; known: plane-wave, magnetic-near-field, electric-near-field");
        }
    }

    private static String writeDesign(Design d) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", DESIGN_FORMAT);
        root.put("version", DESIGN_VERSION);
        if (!d.title().isEmpty()) {
            root.put("title", d.title());
        }
        Spelling sp = d.spelling();
        if (d.shell().isPresent()) {
            writeShell(root.putObject("shell"), d.shell().get(), sp);
        } else {
            writeLayers(root.putArray("layers"), d.layers(), sp);
        }
        writeFieldBandCases(root, d, sp);
        sp.applyTo(root);
        return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    }

    private static void writeShell(ObjectNode o, DesignShell s, Spelling sp) {
        o.put("form", switch (s.form()) {
            case BOX -> "box";
            case SPHERE -> "sphere";
            case CYLINDER_TRANSVERSE -> "cylinder-transverse";
            case CYLINDER_AXIAL -> "cylinder-axial";
        });
        if (s.form() == DesignShell.Form.BOX) {
            ArrayNode sides = o.putArray("sides");
            for (Length l : s.sizes()) {
                sides.add(sp.text(l));
            }
        } else {
            o.put("radius", sp.text(s.sizes().get(0)));
        }
        writeLayers(o.putArray("walls"), s.walls(), sp);
        ArrayNode openings = o.putArray("openings");
        for (io.shieldmath.shield.enclosure.Opening op : s.openings()) {
            ObjectNode on = openings.addObject();
            switch (op.kind()) {
                case HOLE:
                    on.put("kind", "holes");
                    on.put("diameter", sp.text(op.largestDimension()));
                    on.put("count", op.count());
                    break;
                case SLOT:
                    on.put("kind", "slot");
                    on.put("length", sp.text(op.largestDimension()));
                    on.put("width", sp.text(op.width().get()));
                    break;
                default:
                    on.put("kind", "seam");
                    on.put("length", sp.text(op.largestDimension()));
            }
            op.tubeDepth().ifPresent(t -> on.put("tubeDepth", sp.text(t)));
            op.victimDistance().ifPresent(t -> on.put("victimDistance", sp.text(t)));
            on.put("name", op.name());
        }
        o.put("exposure", s.uniformField() ? "uniform" : "incident-field");
    }

    private static void writeLayers(ArrayNode layers, List<DesignLayer> list, Spelling sp) {
        for (DesignLayer l : list) {
            ObjectNode o = layers.addObject();
            switch (l.kind()) {
                case GAP:
                    o.put("gap", sp.text(l.thickness()));
                    break;
                case MEDIUM: {
                    writeMedium(o.putObject("medium"), l.medium(), sp);
                    o.put("thickness", sp.text(l.thickness()));
                    break;
                }
                default:
                    o.put("material", l.material().get().id());
                    o.put("thickness", sp.text(l.thickness()));
                    if (l.temperature().isPresent()) {
                        o.put("temperature", sp.text(l.temperature().get()));
                    }
            }
        }
    }

    private static void writeFieldBandCases(ObjectNode root, Design d, Spelling sp) {
        ObjectNode field = root.putObject("field");
        IncidentField fld = d.field();
        switch (fld.kind()) {
            case PLANE_WAVE:
                field.put("kind", "plane-wave");
                break;
            default:
                field.put("kind", fld.kind() == FieldKind.MAGNETIC_NEAR_FIELD ? "magnetic-near-field"
                        : "electric-near-field");
                field.put("distance", sp.text(fld.distance()));
                field.put("impedance", fld.form() == ImpedanceForm.TEXTBOOK ? "textbook" : "exact-dipole");
        }
        root.put("band", sp.text(d.band()));
        root.put("points", d.points());
        writeCases(root, d.requirement(), sp);
    }
}
