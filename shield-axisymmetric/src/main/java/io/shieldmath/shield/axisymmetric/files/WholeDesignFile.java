/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import static io.shieldmath.shield.materials.internal.JsonValues.MAPPER;
import static io.shieldmath.shield.materials.internal.JsonValues.at;
import static io.shieldmath.shield.materials.internal.JsonValues.header;
import static io.shieldmath.shield.materials.internal.DesignParts.readCases;
import static io.shieldmath.shield.materials.internal.DesignParts.readMedium;
import static io.shieldmath.shield.materials.internal.DesignParts.writeCases;
import static io.shieldmath.shield.materials.internal.DesignParts.writeMedium;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.materials.files.DesignFile;
import io.shieldmath.shield.materials.files.MaterialFileException;
import io.shieldmath.shield.materials.internal.Node;
import io.shieldmath.shield.materials.internal.Spelling;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.BiFunction;
import tools.jackson.databind.node.ObjectNode;

/**
 * Design files of every kind: reads version 1, 2 and 3 documents of the design format (a
 * planar stack, a closed shell with its openings, or an axisymmetric arrangement) with the
 * strict located reading of {@link DesignFile} — every refusal a {@link MaterialFileException}
 * with its JSON path, line and column, unknown fields refused, every quantity with its unit —
 * and writes each kind so that it reads back to an equal design. Planar and shell designs are
 * read and written by {@link DesignFile}; this class adds the axisymmetric arrangement.
 *
 * <pre>{@code
 * WholeDesign d = WholeDesignFile.read(Path.of("can.json"), Catalogue.builtIn());
 * WholeDesignFile.write(d, Path.of("copy.json"));             // the same document again
 * }</pre>
 *
 * <p>The axisymmetric form (version 3):
 * <pre>
 * {
 *   "format": "shield-design",
 *   "version": 3,
 *   "title": "sensor can",                                        (optional)
 *   "arrangement": {
 *     "bodies": [
 *       { "name": "can", "shape": "can", "material": "nickel-iron-80",
 *         "innerRadius": "20 mm", "wall": "1 mm", "length": "60 mm",
 *         "lowerEnd": "capped", "upperEnd": "capped", "upperCapHole": "3 mm" },
 *       { "name": "plate", "shape": "disc", "medium": { "name": "my alloy", "conductivity": "20 MS/m" },
 *         "radius": "50 mm", "thickness": "0.5 mm", "centre": "-45 mm" }
 *     ],
 *     "appliedField": { "direction": "axial", "fluxDensity": "40 µT",
 *                       "sensor": { "radius": "5 mm", "length": "10 mm", "centre": "0 mm" } },
 *     "tolerance": "0.1 dB",                                      (optional)
 *     "fineness": 0.5                                             (optional, default 1)
 *   },
 *   "band": "10 Hz to 1 kHz",
 *   "points": 5,
 *   "cases": [ { "band": "49 Hz to 51 Hz", "incident": "40 µT", "tolerated": "100 nT" },
 *              { "band": "200 Hz to 400 Hz", "requiredSe": "20 dB" } ]    (requiredSe: SE given directly)
 * }
 * </pre>
 * A source case holds either {@code incident} and {@code tolerated} or {@code requiredSe}
 * (0 dB to 400 dB), never both.
 * Shapes and their lengths: {@code disc} (radius, thickness), {@code annular-plate}
 * (outerRadius, holeRadius, thickness), {@code cap} (radius, thickness, optional hole),
 * {@code tube} (innerRadius, wall, length), {@code can} (innerRadius, wall, length, lowerEnd
 * and upperEnd {@code "capped"} or {@code "open"}, optional lowerCapHole and upperCapHole).
 * Every body has a name, one of {@code material} (a catalogue identifier) and {@code medium},
 * and an optional {@code centre} on the axis (a length, negative towards the transmitter).
 * Instead of {@code appliedField}, a design between coils has
 * <pre>
 *     "coils": { "transmitter": { "radius": "10 mm", "turns": 20,
 *                                 "winding": { "width": "2 mm", "length": "3 mm",
 *                                              "radialRings": 2, "axialRings": 3 } },  (winding optional)
 *                "receiver": { "radius": "10 mm", "turns": 20 },
 *                "separation": "40 mm",
 *                "drive": { "current": "100 mA", "measure": "rms" } }             (drive optional)
 * </pre>
 * with the transmitter at z = −separation/2; measures are {@code peak}, {@code peak-to-peak}
 * and {@code rms}. The applied field's {@code direction} is {@code "axial"} (along the axis),
 * {@code "transverse"} (across it) or {@code "worst"} (both solved, the smaller shielding
 * counting: the case to design for when the field's direction is not known); see
 * {@link DesignFieldDirection}. The format's version stays 3: the field was in version 3 from
 * the start, with {@code "axial"} its only value, and a reader that knows only that value
 * refuses the others at that field, with its location, rather than misreading them; every
 * earlier file reads as before. The sensor is optional (a point at the centre) and is a point when it has
 * no radius and length. {@code fineness} is the solver's starting mesh fineness (0.25 to 16,
 * see {@code CoilCoupling.withFineness}), written only when it is not 1. The band must lie
 * within the geometry's quasi-static limit. A design
 * read from a file is written back with each quantity in the text it was given in.
 *
 * <p>Documents are at most 4 000 000 characters. Stateless and thread-safe.
 */
public final class WholeDesignFile {

    private static final String FORMAT = "shield-design";
    private static final int VERSION = 3;

    private static final Set<String> ROOT_FIELDS = Set.of("format", "version", "title", "arrangement", "band",
            "points", "cases");
    private static final Set<String> ARRANGEMENT_FIELDS = Set.of("bodies", "coils", "appliedField", "tolerance",
            "fineness");
    private static final Set<String> COMMON_BODY_FIELDS = Set.of("name", "shape", "material", "medium", "centre");
    private static final Set<String> COILS_FIELDS = Set.of("transmitter", "receiver", "separation", "drive");
    private static final Set<String> COIL_FIELDS = Set.of("radius", "turns", "winding");
    private static final Set<String> WINDING_FIELDS = Set.of("width", "length", "radialRings", "axialRings");
    private static final Set<String> DRIVE_FIELDS = Set.of("current", "measure");
    private static final Set<String> APPLIED_FIELDS = Set.of("direction", "fluxDensity", "sensor");
    private static final Set<String> SENSOR_FIELDS = Set.of("radius", "length", "centre");

    private WholeDesignFile() {
    }

    /**
     * Reads a design document of any kind.
     *
     * @param json      the document, not null
     * @param catalogue the catalogue for material references, not null
     * @return the design
     * @throws MaterialFileException if the document is not an acceptable design (with its location)
     */
    public static WholeDesign parse(String json, Catalogue catalogue) {
        Require.nonNull("json", json);
        Require.nonNull("catalogue", catalogue);
        Node root = Node.parse(json);
        if (root.type == Node.Type.OBJECT && root.fields.containsKey("arrangement")) {
            return WholeDesign.of(readAxisymmetric(root, catalogue));
        }
        return WholeDesign.of(DesignFile.parse(json, catalogue));
    }

    /**
     * Reads a design document of any kind from a stream (UTF-8, UTF-16 or UTF-32, detected);
     * the stream is not closed.
     *
     * @param in        the stream, not null
     * @param catalogue the catalogue for material references, not null
     * @return the design
     * @throws MaterialFileException if the document is not an acceptable design
     * @throws UncheckedIOException  if reading fails
     */
    public static WholeDesign read(InputStream in, Catalogue catalogue) {
        Require.nonNull("catalogue", catalogue);
        return parse(Node.text(Require.nonNull("stream", in)), catalogue);
    }

    /**
     * Reads a design file of any kind.
     *
     * @param file      the file, not null
     * @param catalogue the catalogue for material references, not null
     * @return the design
     * @throws IOException           if the file cannot be read
     * @throws MaterialFileException if the document is not an acceptable design
     */
    public static WholeDesign read(Path file, Catalogue catalogue) throws IOException {
        try (InputStream in = Files.newInputStream(Require.nonNull("file", file))) {
            return read(in, catalogue);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /**
     * A design as a JSON document that {@link #parse(String, Catalogue)} reads back to an
     * equal design (given a catalogue holding the same materials): planar and shell designs as
     * {@link DesignFile#toJson(Design)} writes them, axisymmetric ones in the form above.
     *
     * @param design the design, not null
     * @return the document, pretty-printed
     * @throws IllegalArgumentException if a permeability model is of a type the files do not hold (only
     *         constant, relaxation and table models are written)
     */
    public static String toJson(WholeDesign design) {
        Require.nonNull("design", design);
        if (design.axisymmetric().isPresent()) {
            return toJson(design.axisymmetric().get());
        }
        return DesignFile.toJson(design.design().get());
    }

    /**
     * An axisymmetric design as a JSON document (see {@link #toJson(WholeDesign)}).
     *
     * @param design the design, not null
     * @return the document, pretty-printed
     * @throws IllegalArgumentException if a permeability model is of a type the files do not hold (only
     *         constant, relaxation and table models are written)
     */
    public static String toJson(AxisymmetricDesign design) {
        return writeAxisymmetric(Require.nonNull("design", design));
    }

    /**
     * Writes {@link #toJson(WholeDesign)} to a file in UTF-8, replacing it.
     *
     * @param design the design, not null
     * @param file   the file, not null
     * @throws IOException if the file cannot be written
     * @throws IllegalArgumentException if a permeability model is of a type the files do not hold
     */
    public static void write(WholeDesign design, Path file) throws IOException {
        Files.writeString(Require.nonNull("file", file), toJson(design), StandardCharsets.UTF_8);
    }

    // ================================================================ reading

    private static AxisymmetricDesign readAxisymmetric(Node root, Catalogue catalogue) {
        Node.Fields f = root.object(ROOT_FIELDS);
        int version = header(f, FORMAT, VERSION);
        if (version < VERSION) {
            throw f.required("version").error("an \"arrangement\" needs version " + VERSION + " of the design format; this "
                    + "document says version " + version);
        }
        Node arrangementNode = f.required("arrangement");
        Node.Fields af = arrangementNode.object(ARRANGEMENT_FIELDS);
        List<DesignBody> bodies = new ArrayList<>();
        Arrangement checked = Arrangement.of();
        for (Node b : af.required("bodies").array(0, Arrangement.MAX_BODIES)) {
            DesignBody body = readBody(b, catalogue);
            Arrangement before = checked;
            checked = at(b, () -> before.and(body.body()));
            bodies.add(body);
        }
        Node coilsNode = af.optional("coils");
        Node appliedNode = af.optional("appliedField");
        if ((coilsNode == null) == (appliedNode == null)) {
            throw arrangementNode.error("an arrangement has exactly one of \"coils\" (a transmitter and a receiver) "
                    + "and \"appliedField\" (a uniform applied field)");
        }
        Node bandNode = f.required("band");
        FrequencyBand band = bandNode.quantity(FrequencyBand::parse, "10 Hz to 1 kHz");
        Node pointsNode = f.required("points");
        int points = pointsNode.integer(1, AxisymmetricDesign.MAX_POINTS);
        AxisymmetricDesign d;
        if (coilsNode != null) {
            Node.Fields cf = coilsNode.object(COILS_FIELDS);
            DesignCoil tx = readCoil(cf.required("transmitter"));
            DesignCoil rx = readCoil(cf.required("receiver"));
            Node sepNode = cf.required("separation");
            Length sep = sepNode.quantity(Length::parse, "40 mm");
            Arrangement arrangement = checked;
            // Coils too close, or cutting a body, are refused at the separation.
            at(sepNode, () -> arrangement.between(
                    io.shieldmath.shield.coupling.CoilPair.coaxial(tx.coil(), rx.coil(), sep)));
            d = at(bandNode, () -> AxisymmetricDesign.betweenCoils(bodies, tx, rx, sep, band, points));
            Node driveNode = cf.optional("drive");
            if (driveNode != null) {
                Node.Fields df = driveNode.object(DRIVE_FIELDS);
                CurrentAmplitude current = df.required("current").quantity(CurrentAmplitude::parse, "100 mA");
                AmplitudeMeasure measure = measure(df.required("measure"));
                d = d.drivenAt(current, measure);
            }
        } else {
            Node.Fields pf = appliedNode.object(APPLIED_FIELDS);
            DesignFieldDirection direction = direction(pf.required("direction"));
            Node sensorNode = pf.optional("sensor");
            DesignSensor sensor = sensorNode == null ? DesignSensor.point() : readSensor(sensorNode);
            d = at(bandNode, () -> AxisymmetricDesign.inUniformField(bodies, sensor, direction, band, points));
            Node level = pf.optional("fluxDensity");
            if (level != null) {
                d = d.withAppliedField(level.quantity(MagneticFluxDensity::parse, "40 µT"));
            }
        }
        Node tolNode = af.optional("tolerance");
        if (tolNode != null) {
            Decibels tol = tolNode.quantity(Decibels::parse, "0.1 dB");
            AxisymmetricDesign before = d;
            d = at(tolNode, () -> before.withTolerance(tol));
        }
        Node finNode = af.optional("fineness");
        if (finNode != null) {
            double q = finNode.number();
            AxisymmetricDesign before = d;
            d = at(finNode, () -> before.withFineness(q));
        }
        Node casesNode = f.optional("cases");
        if (casesNode != null) {
            d = d.meeting(readCases(casesNode));
        }
        Node title = f.optional("title");
        if (title != null) {
            String t = title.string();
            AxisymmetricDesign before = d;
            d = at(title, () -> before.withTitle(t));
        }
        return d.spelledAs(Spelling.of(root.spelled()));
    }

    private static DesignBody readBody(Node n, Catalogue catalogue) {
        Node.Fields probe = n.object(Set.of("name", "shape", "material", "medium", "centre", "radius", "thickness",
                "outerRadius", "holeRadius", "hole", "innerRadius", "wall", "length", "lowerEnd", "upperEnd",
                "lowerCapHole", "upperCapHole"));
        Node shapeNode = probe.required("shape");
        String shape = shapeNode.string();
        Set<String> own = switch (shape) {
            case "disc" -> Set.of("radius", "thickness");
            case "annular-plate" -> Set.of("outerRadius", "holeRadius", "thickness");
            case "cap" -> Set.of("radius", "thickness", "hole");
            case "tube" -> Set.of("innerRadius", "wall", "length");
            case "can" -> Set.of("innerRadius", "wall", "length", "lowerEnd", "upperEnd", "lowerCapHole",
                    "upperCapHole");
            default -> throw shapeNode.error("unknown shape \"" + shape
                    + "\"; known: disc, annular-plate, cap, tube, can");
        };
        Set<String> allowed = new java.util.HashSet<>(COMMON_BODY_FIELDS);
        allowed.addAll(own);
        Node.Fields f = n.object(allowed);
        String name = f.required("name").string();
        MediumSource material = material(n, f, catalogue);
        DesignBody body = switch (shape) {
            case "disc" -> {
                Length r = length(f, "radius");
                Length t = length(f, "thickness");
                yield at(f.required("thickness"), () -> DesignBody.disc(name, material, r, t));
            }
            case "annular-plate" -> {
                Length r = length(f, "outerRadius");
                Length h = length(f, "holeRadius");
                Length t = length(f, "thickness");
                yield at(f.required("holeRadius"), () -> DesignBody.annularPlate(name, material, r, h, t));
            }
            case "cap" -> {
                Length r = length(f, "radius");
                Length t = length(f, "thickness");
                DesignBody c = at(f.required("thickness"), () -> DesignBody.cap(name, material, r, t));
                Node holeNode = f.optional("hole");
                if (holeNode != null) {
                    Length h = holeNode.quantity(Length::parse, "3 mm");
                    c = at(holeNode, () -> DesignBody.cap(name, material, r, t).withHole(h));
                }
                yield c;
            }
            case "tube" -> {
                Length r = length(f, "innerRadius");
                Length w = length(f, "wall");
                Length l = length(f, "length");
                yield at(f.required("length"), () -> DesignBody.tube(name, material, r, w, l));
            }
            default -> readCan(f, name, material);
        };
        return placed(f.optional("centre"), body, DesignBody::shiftedBy, DesignBody::shiftedBackBy);
    }

    private static DesignBody readCan(Node.Fields f, String name, MediumSource material) {
        Length r = length(f, "innerRadius");
        Length w = length(f, "wall");
        Length l = length(f, "length");
        DesignBody can = at(f.required("length"), () -> DesignBody.can(name, material, r, w, l));
        for (CanEnd end : CanEnd.values()) {
            String key = end == CanEnd.LOWER ? "lower" : "upper";
            Node endNode = f.required(key + "End");
            String state = endNode.string();
            Node holeNode = f.optional(key + "CapHole");
            if (state.equals("open")) {
                if (holeNode != null) {
                    throw holeNode.error("the " + key + " end is open; a cap hole needs \"" + key
                            + "End\": \"capped\"");
                }
                can = can.withoutCap(end);
            } else if (!state.equals("capped")) {
                throw endNode.error("unknown end \"" + state + "\"; known: capped, open");
            }
            if (holeNode != null) {
                Length h = holeNode.quantity(Length::parse, "3 mm");
                DesignBody before = can;
                can = at(holeNode, () -> before.withCapHole(end, h));
            }
        }
        return can;
    }

    private static Length length(Node.Fields f, String key) {
        return f.required(key).quantity(Length::parse, "20 mm");
    }

    private static MediumSource material(Node body, Node.Fields f, Catalogue catalogue) {
        if (f.has("material") == f.has("medium")) {
            throw body.error("a body has exactly one of \"material\" (a catalogue identifier) and \"medium\"");
        }
        if (f.has("medium")) {
            return readMedium(f.required("medium"));
        }
        Node ref = f.required("material");
        String id = ref.string();
        return catalogue.find(id).orElseThrow(() -> ref.error(catalogue.unknown(id)));
    }

    private static DesignCoil readCoil(Node n) {
        Node.Fields f = n.object(COIL_FIELDS);
        Node radiusNode = f.required("radius");
        Length r = radiusNode.quantity(Length::parse, "10 mm");
        int turns = f.required("turns").integer(1, 1_000_000);
        DesignCoil c = at(radiusNode, () -> DesignCoil.loop(r, turns));
        Node windingNode = f.optional("winding");
        if (windingNode == null) {
            return c;
        }
        Node.Fields w = windingNode.object(WINDING_FIELDS);
        Length width = w.required("width").quantity(Length::parse, "2 mm");
        Length length = w.required("length").quantity(Length::parse, "3 mm");
        int radial = w.required("radialRings").integer(1, io.shieldmath.shield.coupling.Coil.MAX_RINGS_PER_DIRECTION);
        int axial = w.required("axialRings").integer(1, io.shieldmath.shield.coupling.Coil.MAX_RINGS_PER_DIRECTION);
        return at(windingNode, () -> c.withWinding(width, length, radial, axial));
    }

    private static DesignSensor readSensor(Node n) {
        Node.Fields f = n.object(SENSOR_FIELDS);
        if (f.has("radius") != f.has("length")) {
            throw n.error("a sensor cylinder has both \"radius\" and \"length\"; a point has neither");
        }
        DesignSensor s;
        if (f.has("radius")) {
            Length r = f.required("radius").quantity(Length::parse, "5 mm");
            Length l = f.required("length").quantity(Length::parse, "10 mm");
            s = at(n, () -> DesignSensor.cylinder(r, l));
        } else {
            s = DesignSensor.point();
        }
        return placed(f.optional("centre"), s, DesignSensor::shiftedBy, DesignSensor::shiftedBackBy);
    }

    /** A body or sensor moved to its centre on the axis, if one is given; refusals located there. */
    private static <T> T placed(Node centre, T item, BiFunction<T, Length, T> forward,
                                BiFunction<T, Length, T> backward) {
        Length z = centre == null ? null : shift(centre);
        if (z == null) {
            return item;
        }
        BiFunction<T, Length, T> move = negative(centre) ? backward : forward;
        return at(centre, () -> move.apply(item, z));
    }

    /** Whether a centre is written with a minus sign. */
    private static boolean negative(Node centre) {
        String text = centre.string().strip();
        return text.startsWith("-") || text.startsWith("\u2212");
    }

    /**
     * The distance of a centre from z = 0, a length with an optional sign; null for a centre
     * written as zero ("0 mm"), which is no shift.
     */
    private static Length shift(Node centre) {
        String text = centre.string().strip();
        String unsigned = negative(centre) || text.startsWith("+") ? text.substring(1).strip() : text;
        // Zero and a unit ("0 mm", "0.0 in"); a unit starts with a letter or sign, never a digit.
        if (unsigned.matches("(0+(\\.0*)?|\\.0+)\\s*[^0-9\\s.]\\S*")) {
            return null;
        }
        return centre.convert(Length::parse, unsigned);
    }

    private static DesignFieldDirection direction(Node n) {
        String text = n.string();
        for (DesignFieldDirection d : DesignFieldDirection.values()) {
            if (d.fileName().equals(text)) {
                return d;
            }
        }
        throw n.error("unknown direction \"" + text + "\"; known: axial, transverse, worst");
    }

    private static AmplitudeMeasure measure(Node n) {
        String m = n.string();
        return switch (m) {
            case "peak" -> AmplitudeMeasure.PEAK;
            case "peak-to-peak" -> AmplitudeMeasure.PEAK_TO_PEAK;
            case "rms" -> AmplitudeMeasure.RMS;
            default -> throw n.error("unknown measure \"" + m + "\"; known: peak, peak-to-peak, rms");
        };
    }

    // ================================================================ writing

    private static String writeAxisymmetric(AxisymmetricDesign d) {
        Spelling sp = d.spelling();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("version", VERSION);
        if (!d.title().isEmpty()) {
            root.put("title", d.title());
        }
        ObjectNode a = root.putObject("arrangement");
        var bodies = a.putArray("bodies");
        for (DesignBody b : d.bodies()) {
            writeBody(bodies.addObject(), b, sp);
        }
        if (d.coils().isPresent()) {
            ObjectNode c = a.putObject("coils");
            writeCoil(c.putObject("transmitter"), d.transmitter().get(), sp);
            writeCoil(c.putObject("receiver"), d.receiver().get(), sp);
            c.put("separation", sp.text(d.separation().get()));
            if (d.drive().isPresent()) {
                ObjectNode dr = c.putObject("drive");
                dr.put("current", sp.text(d.drive().get()));
                dr.put("measure", switch (d.driveMeasure().get()) {
                    case PEAK -> "peak";
                    case PEAK_TO_PEAK -> "peak-to-peak";
                    case RMS -> "rms";
                });
            }
        } else {
            ObjectNode p = a.putObject("appliedField");
            p.put("direction", d.fieldDirection().get().fileName());
            d.appliedField().ifPresent(b -> p.put("fluxDensity", sp.text(b)));
            DesignSensor s = d.sensor().get();
            if (!s.equals(DesignSensor.point())) {
                ObjectNode sn = p.putObject("sensor");
                if (s.radius != null) {
                    sn.put("radius", sp.text(s.radius));
                    sn.put("length", sp.text(s.length));
                }
                if (s.shift != null) {
                    sn.put("centre", (s.back ? "-" : "") + sp.text(s.shift));
                }
            }
        }
        d.tolerance().ifPresent(t -> a.put("tolerance", sp.text(t)));
        if (d.fineness() != AxisymmetricDesign.DEFAULT_FINENESS) {
            a.put("fineness", d.fineness());
        }
        root.put("band", sp.text(d.band()));
        root.put("points", d.points());
        writeCases(root, d.requirement(), sp);
        sp.applyTo(root);
        return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    }

    private static void writeBody(ObjectNode o, DesignBody b, Spelling sp) {
        o.put("name", b.name);
        o.put("shape", switch (b.shape) {
            case DISC -> "disc";
            case ANNULAR_PLATE -> "annular-plate";
            case CAP -> "cap";
            case TUBE -> "tube";
            case CAN -> "can";
        });
        if (b.material instanceof Material m) {
            o.put("material", m.id());
        } else {
            writeMedium(o.putObject("medium"), (Medium) b.material, sp);
        }
        switch (b.shape) {
            case DISC -> {
                o.put("radius", sp.text(b.radius));
                o.put("thickness", sp.text(b.thickness));
            }
            case ANNULAR_PLATE -> {
                o.put("outerRadius", sp.text(b.radius));
                o.put("holeRadius", sp.text(b.hole));
                o.put("thickness", sp.text(b.thickness));
            }
            case CAP -> {
                o.put("radius", sp.text(b.radius));
                o.put("thickness", sp.text(b.thickness));
                if (b.hole != null) {
                    o.put("hole", sp.text(b.hole));
                }
            }
            case TUBE -> {
                o.put("innerRadius", sp.text(b.radius));
                o.put("wall", sp.text(b.thickness));
                o.put("length", sp.text(b.length));
            }
            case CAN -> {
                o.put("innerRadius", sp.text(b.radius));
                o.put("wall", sp.text(b.thickness));
                o.put("length", sp.text(b.length));
                o.put("lowerEnd", b.lowerCap ? "capped" : "open");
                o.put("upperEnd", b.upperCap ? "capped" : "open");
                if (b.lowerHole != null) {
                    o.put("lowerCapHole", sp.text(b.lowerHole));
                }
                if (b.upperHole != null) {
                    o.put("upperCapHole", sp.text(b.upperHole));
                }
            }
        }
        if (b.shift != null) {
            o.put("centre", (b.back ? "-" : "") + sp.text(b.shift));
        }
    }

    private static void writeCoil(ObjectNode o, DesignCoil c, Spelling sp) {
        o.put("radius", sp.text(c.radius));
        o.put("turns", c.turns);
        if (c.width != null) {
            ObjectNode w = o.putObject("winding");
            w.put("width", sp.text(c.width));
            w.put("length", sp.text(c.length));
            w.put("radialRings", c.radialRings);
            w.put("axialRings", c.axialRings);
        }
    }
}
