/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

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

/**
 * The catalogue and design file formats: reading from a located {@link Node} tree with
 * strict validation, and writing with Jackson's tree model. Every value read goes through
 * the core parse methods or the checks here; nothing is bound by reflection and no type
 * is taken from the document.
 */
final class Json {

    static final String CATALOGUE_FORMAT = "shield-catalogue";
    static final String DESIGN_FORMAT = "shield-design";
    static final int VERSION = 1;
    static final int MAX_MATERIALS = 10_000;
    static final int MAX_TABLE_POINTS = 1000;

    private static final JsonMapper MAPPER = JsonMapper.builder().build();

    private static final Set<String> CATALOGUE_FIELDS = Set.of("format", "version", "materials");
    private static final Set<String> MATERIAL_FIELDS = Set.of("id", "name", "conductivity", "sheetResistance",
            "temperatureCoefficient", "permeability", "permittivity", "density", "saturation", "note");
    private static final Set<String> VALUE_FIELDS = Set.of("value", "source");
    private static final Set<String> SHEET_FIELDS = Set.of("value", "thickness", "source");
    private static final Set<String> DESIGN_FIELDS = Set.of("format", "version", "title", "layers", "field", "band",
            "points");
    private static final Set<String> LAYER_FIELDS = Set.of("material", "thickness", "temperature", "gap", "medium");
    private static final Set<String> MEDIUM_FIELDS = Set.of("name", "conductivity", "permeability", "permittivity");
    private static final Set<String> FIELD_FIELDS = Set.of("kind", "distance", "impedance");
    private static final Set<String> POINT_FIELDS = Set.of("frequency", "real", "loss");

    private Json() {
    }

    // ================================================================ catalogue

    static Catalogue readCatalogue(Node root) {
        Node.Fields f = root.object(CATALOGUE_FIELDS);
        header(f, CATALOGUE_FORMAT);
        List<Node> entries = f.required("materials").array(0, MAX_MATERIALS);
        List<Material> materials = new ArrayList<>(entries.size());
        Map<String, Node> seen = new HashMap<>();
        for (Node e : entries) {
            Material m = readMaterial(e);
            Node previous = seen.putIfAbsent(m.id(), e);
            if (previous != null) {
                throw e.fields.get("id").error("duplicate material id \"" + m.id() + "\" (first at line "
                        + previous.line + ", column " + previous.column + ")");
            }
            materials.add(m);
        }
        return Catalogue.of(materials);
    }

    private static void header(Node.Fields f, String format) {
        Node fmt = f.required("format");
        if (!fmt.string().equals(format)) {
            throw fmt.error("expected \"" + format + "\", found \"" + fmt.text + "\"");
        }
        f.required("version").integer(VERSION, VERSION);
    }

    static Material readMaterial(Node n) {
        Node.Fields f = n.object(MATERIAL_FIELDS);
        Node idNode = f.required("id");
        String id = idNode.convert(Material::checkId, idNode.string());
        Node nameNode = f.required("name");
        Material.Builder b = nameNode.convert(s -> Material.builder(id, s), nameNode.string());

        valued(f, "conductivity", false, Conductivity::parse, "58 MS/m", b::conductivity);
        Node sheet = f.optional("sheetResistance");
        if (sheet != null) {
            Node.Fields v = sheet.object(SHEET_FIELDS);
            SheetResistance rs = v.required("value").quantity(SheetResistance::parse, "0.5 Ω/sq");
            Length t = v.required("thickness").quantity(Length::parse, "50 µm");
            String src = source(v);
            at(sheet, () -> b.sheetResistance(rs, t, src));
        }
        valued(f, "temperatureCoefficient", false, TemperatureCoefficient::parse, "0.00393 /K",
                b::temperatureCoefficient);
        Node mu = f.required("permeability");
        PermeabilityModel model = readPermeability(mu, true);
        String muSource = source(new Node.Fields(mu));
        at(mu, () -> b.permeability(model, muSource));
        Node eps = f.required("permittivity");
        Node.Fields ev = eps.object(VALUE_FIELDS);
        RelativePermittivity epsilon = permittivity(ev.required("value"));
        String epsSource = source(ev);
        at(eps, () -> b.permittivity(epsilon, epsSource));
        valued(f, "density", true, Density::parse, "8890 kg/m³", b::density);
        valued(f, "saturation", false, MagneticFluxDensity::parse, "0.75 T", b::saturation);
        Node note = f.optional("note");
        if (note != null) {
            String text = note.string();
            at(note, () -> b.note(text));
        }
        return at(n, b::build);
    }

    /** Reads a {@code {"value": ..., "source": ...}} property and hands both to a builder step. */
    private static <Q> void valued(Node.Fields f, String key, boolean required, Function<String, Q> parse,
                                   String example, BiFunction<Q, String, Material.Builder> step) {
        Node n = required ? f.required(key) : f.optional(key);
        if (n == null) {
            return;
        }
        Node.Fields v = n.object(VALUE_FIELDS);
        Q q = v.required("value").quantity(parse, example);
        String src = source(v);
        at(n, () -> step.apply(q, src));
    }

    private static String source(Node.Fields v) {
        Node s = v.required("source");
        String text = s.string();
        if (text.isBlank()) {
            throw s.error("a source must not be blank: give the handbook, standard or datasheet class, or write "
                    + "\"from memory\" with the source to check against");
        }
        return text;
    }

    /** Runs a builder step, turning its exceptions into located ones. */
    private static <T> T at(Node node, Supplier<T> step) {
        try {
            return step.get();
        } catch (IllegalArgumentException e) {
            throw node.error(e.getMessage(), e);
        }
    }

    private static RelativePermittivity permittivity(Node n) {
        double v = n.number();
        return n.convert(x -> RelativePermittivity.of(v), n.text);
    }

    static PermeabilityModel readPermeability(Node n, boolean withSource) {
        Node.Fields probe = n.object(Set.of("model", "value", "lowFrequency", "corner", "points", "source"));
        Node kind = probe.required("model");
        String model = kind.string();
        switch (model) {
            case "constant": {
                n.object(withSource ? Set.of("model", "value", "source") : Set.of("model", "value"));
                Node v = probe.required("value");
                if (v.type == Node.Type.NUMBER) {
                    double x = v.number();
                    return v.convert(s -> PermeabilityModel.constant(x), v.text);
                }
                return v.convert(s -> PermeabilityModel.constant(RelativePermeability.parse(s)), v.string());
            }
            case "relaxation": {
                n.object(withSource ? Set.of("model", "lowFrequency", "corner", "source")
                        : Set.of("model", "lowFrequency", "corner"));
                Node low = probe.required("lowFrequency");
                double mu = low.number();
                Frequency fc = probe.required("corner").quantity(Frequency::parse, "2 kHz");
                return low.convert(s -> PermeabilityModel.relaxation(mu, fc), low.text);
            }
            case "table": {
                n.object(withSource ? Set.of("model", "points", "source") : Set.of("model", "points"));
                Node pts = probe.required("points");
                List<Node> list = pts.array(1, MAX_TABLE_POINTS);
                double[] hz = new double[list.size()];
                double[] re = new double[list.size()];
                double[] im = new double[list.size()];
                for (int i = 0; i < hz.length; i++) {
                    Node.Fields p = list.get(i).object(POINT_FIELDS);
                    hz[i] = p.required("frequency").quantity(Frequency::parse, "10 kHz").toHertz();
                    re[i] = p.required("real").number();
                    Node loss = p.optional("loss");
                    im[i] = loss == null ? 0 : loss.number();
                }
                return pts.convert(s -> PermeabilityModel.table(hz, re, im), "");
            }
            default:
                throw kind.error("unknown permeability model \"" + model + "\"; known: constant, relaxation, table");
        }
    }

    static String writeCatalogue(Catalogue c) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", CATALOGUE_FORMAT);
        root.put("version", VERSION);
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
        ObjectNode eps = o.putObject("permittivity");
        number(eps, "value", m.permittivity().value());
        eps.put("source", m.source(MaterialProperty.PERMITTIVITY).get());
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
    }

    private static void number(ObjectNode o, String key, double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            o.put(key, (long) v);
        } else {
            o.put(key, v);
        }
    }

    static void writePermeability(ObjectNode o, PermeabilityModel model) {
        if (model instanceof ConstantPermeability c) {
            o.put("model", "constant");
            o.put("value", c.value().toString());
        } else if (model instanceof RelaxationPermeability r) {
            o.put("model", "relaxation");
            number(o, "lowFrequency", r.lowFrequencyValue());
            o.put("corner", text(r.corner()));
        } else if (model instanceof TabulatedPermeability t) {
            o.put("model", "table");
            ArrayNode pts = o.putArray("points");
            double[] hz = t.frequencies();
            double[] re = t.realParts();
            double[] im = t.lossParts();
            for (int i = 0; i < hz.length; i++) {
                ObjectNode p = pts.addObject();
                p.put("frequency", text(Frequency.ofHertz(hz[i])));
                number(p, "real", re[i]);
                number(p, "loss", im[i]);
            }
        } else {
            throw new IllegalArgumentException("cannot write a permeability model of type "
                    + model.getClass().getName() + "; files hold constant, relaxation and table models only");
        }
    }

    // ================================================================ exact text of quantities

    private static <Q> String exact(Q q, Function<String, Q> parse, double si, String siUnit) {
        String pretty = q.toString();
        try {
            if (parse.apply(pretty).equals(q)) {
                return pretty;
            }
        } catch (IllegalArgumentException e) {
            // fall through to the SI form
        }
        return Text.exact(si) + " " + siUnit;
    }

    static String text(Conductivity c) {
        return exact(c, Conductivity::parse, c.toSiemensPerMetre(), "S/m");
    }

    static String text(Length l) {
        return exact(l, Length::parse, l.toMetres(), "m");
    }

    static String text(Frequency f) {
        return exact(f, Frequency::parse, f.toHertz(), "Hz");
    }

    static String text(SheetResistance r) {
        return exact(r, SheetResistance::parse, r.toOhmsPerSquare(), "Ω/sq");
    }

    static String text(MagneticFluxDensity b) {
        return exact(b, MagneticFluxDensity::parse, b.toTesla(), "T");
    }

    static String text(Density d) {
        return exact(d, Density::parse, d.toKilogramsPerCubicMetre(), "kg/m³");
    }

    static String text(TemperatureCoefficient a) {
        return exact(a, TemperatureCoefficient::parse, a.toPerKelvin(), "/K");
    }

    static String text(Temperature t) {
        return exact(t, Temperature::parse, t.toCelsius(), "°C");
    }

    // ================================================================ design

    static Design readDesign(Node root, Catalogue catalogue) {
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
        Medium m = at(nameNode, () -> Medium.of(Material.checkText("medium name", name, 200), sigma, model, epsilon));
        Node sigmaNode = f.required("conductivity");
        at(sigmaNode, () -> io.shieldmath.shield.internal.Require.inRange("medium conductivity",
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

    static String writeDesign(Design d) {
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
