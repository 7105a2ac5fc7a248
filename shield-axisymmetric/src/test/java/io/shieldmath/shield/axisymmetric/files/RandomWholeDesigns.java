/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.materials.files.DesignLayer;
import io.shieldmath.shield.materials.files.DesignShell;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.RelativePermittivity;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Random whole designs of every kind, invented for the property tests, each made twice from
 * one seed: once with the API (the values read from texts) and once as a JSON document whose
 * quantities are written in random units and forms ("3.000 mm", "0.12 in", "40 mil",
 * "2.5 cm"). Both must describe the same design, and the document must be written back with
 * the same texts.
 */
final class RandomWholeDesigns {

    private static final JsonMapper MAPPER = JsonMapper.builder().build();
    private static final String[] LENGTH_UNITS = {"mm", "cm", "µm", "m", "in", "mil"};
    private static final double[] LENGTH_FACTORS = {1e-3, 1e-2, 1e-6, 1, 25.4e-3, 25.4e-6};
    private static final List<Material> MATERIALS = Catalogue.builtIn().all();

    /** A design built with the API, the same design as a document, and the texts in the document. */
    record Generated(WholeDesign design, String json, List<String> texts) {
    }

    private final Random r;
    private final List<String> texts = new ArrayList<>();

    private RandomWholeDesigns(long seed) {
        this.r = new Random(seed);
    }

    /** A random design of a random kind. */
    static Generated of(long seed) {
        return new RandomWholeDesigns(seed).any();
    }

    private Generated any() {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", "shield-design");
        root.put("version", 3);
        WholeDesign d = switch (r.nextInt(4)) {
            case 0 -> WholeDesign.of(planar(root));
            case 1 -> WholeDesign.of(shell(root));
            case 2 -> WholeDesign.of(axisymmetric(root, true));
            default -> WholeDesign.of(axisymmetric(root, false));
        };
        return new Generated(d, MAPPER.writeValueAsString(root), List.copyOf(texts));
    }

    private double logUniform(double lo, double hi) {
        return lo * Math.exp(r.nextDouble() * Math.log(hi / lo));
    }

    /** A number rounded to 1 to 4 significant digits (or exactly {@code digits}), as plain text. */
    private String number(double v, int digits) {
        String s = new BigDecimal(v).round(new MathContext(digits > 0 ? digits : 1 + r.nextInt(4))).toPlainString();
        return s;
    }

    private String noted(String text) {
        texts.add(text);
        return text;
    }

    /** A length about {@code metres} in a random unit; {@code digits} 0 for a random precision. */
    private String length(double metres, int digits) {
        int u = r.nextInt(LENGTH_UNITS.length);
        return noted(number(metres / LENGTH_FACTORS[u], digits) + " " + LENGTH_UNITS[u]);
    }

    private static Length len(String text) {
        return Length.parse(text);
    }

    private String frequency(double hz) {
        return hz >= 1e3 && r.nextBoolean() ? number(hz / 1e3, 0) + " kHz" : number(hz, 0) + " Hz";
    }

    private String band(double lo, double hi) {
        String low = frequency(lo);
        double lowHz = io.shieldmath.shield.quantity.Frequency.parse(low).toHertz();
        if (r.nextInt(5) == 0) {
            return noted(low);
        }
        return noted(low + " to " + frequency(Math.max(hi, 2 * lowHz)));
    }

    private String fluxDensity(double tesla) {
        String[] units = {"nT", "µT", "mT"};
        double[] f = {1e-9, 1e-6, 1e-3};
        int u = r.nextInt(3);
        return noted(number(tesla / f[u], 0) + " " + units[u]);
    }

    private Requirement cases(ObjectNode root) {
        Requirement q = Requirement.none();
        int n = r.nextInt(3);
        if (n == 0) {
            return q;
        }
        ArrayNode cases = root.putArray("cases");
        for (int i = 0; i < n; i++) {
            ObjectNode c = cases.addObject();
            String b = band(logUniform(1, 1e4), 0);
            c.put("band", b);
            if (r.nextBoolean()) {
                // A required SE given directly, 0 dB to 400 dB (rounding 399.x up gives 400 at most).
                String se = noted(switch (r.nextInt(6)) {
                    case 0 -> "0 dB";
                    case 1 -> "400 dB";
                    default -> number(400 * r.nextDouble(), 0) + " dB";
                });
                c.put("requiredSe", se);
                q = q.plus(FrequencyBand.parse(b), Decibels.parse(se));
                continue;
            }
            String in = fluxDensity(logUniform(1e-7, 1e-3));
            String tol = fluxDensity(logUniform(1e-10, 1e-6));
            c.put("incident", in);
            c.put("tolerated", tol);
            q = q.plus(FrequencyBand.parse(b), MagneticFluxDensity.parse(in), MagneticFluxDensity.parse(tol));
        }
        return q;
    }

    private String title(ObjectNode root) {
        if (r.nextBoolean()) {
            return "";
        }
        String t = "design " + r.nextInt(1000);
        root.put("title", t);
        return t;
    }

    private MediumSource material(ObjectNode body) {
        if (r.nextInt(3) == 0) {
            String sigma = noted(number(logUniform(0.1, 60), 0) + " MS/m");
            ObjectNode m = body.putObject("medium");
            m.put("name", "medium " + r.nextInt(100));
            m.put("conductivity", sigma);
            return Medium.of(m.get("name").asString(), Conductivity.parse(sigma), PermeabilityModel.constant(1),
                    RelativePermittivity.ONE);
        }
        Material m = MATERIALS.get(r.nextInt(MATERIALS.size()));
        body.put("material", m.id());
        return m;
    }

    // ---------------------------------------------------------------- planar and shell

    private List<DesignLayer> layers(ArrayNode array) {
        List<DesignLayer> layers = new ArrayList<>();
        for (int i = 1 + r.nextInt(3); i > 0; i--) {
            ObjectNode o = array.addObject();
            String t = length(logUniform(1e-5, 3e-3), 0);
            Material m = MATERIALS.get(r.nextInt(MATERIALS.size()));
            if (r.nextInt(4) == 0 && !layers.isEmpty()) {
                o.put("gap", t);
                layers.add(DesignLayer.gap(len(t)));
            } else {
                o.put("material", m.id());
                o.put("thickness", t);
                layers.add(DesignLayer.of(m, len(t)));
            }
        }
        return layers;
    }

    private IncidentField field(ObjectNode root) {
        ObjectNode f = root.putObject("field");
        if (r.nextBoolean()) {
            f.put("kind", "plane-wave");
            return IncidentField.planeWave();
        }
        String d = length(logUniform(0.01, 1), 0);
        f.put("kind", "magnetic-near-field");
        f.put("distance", d);
        f.put("impedance", "textbook");
        return IncidentField.magneticNearField(len(d), ImpedanceForm.TEXTBOOK);
    }

    private Design finish(ObjectNode root, Design d) {
        Requirement q = cases(root);
        String t = title(root);
        return d.meeting(q).withTitle(t);
    }

    private Design planar(ObjectNode root) {
        List<DesignLayer> layers = layers(root.putArray("layers"));
        IncidentField field = field(root);
        String b = band(logUniform(1, 1e5), logUniform(1e5, 1e8));
        root.put("band", b);
        int points = 1 + r.nextInt(50);
        root.put("points", points);
        return finish(root, Design.of(layers, field, FrequencyBand.parse(b), points));
    }

    private Design shell(ObjectNode root) {
        ObjectNode s = root.putObject("shell");
        s.put("form", "sphere");
        String radius = length(logUniform(0.02, 0.5), 0);
        s.put("radius", radius);
        List<DesignLayer> walls = layers(s.putArray("walls"));
        s.putArray("openings");
        s.put("exposure", "uniform");
        IncidentField field = field(root);
        String b = band(logUniform(1, 1e4), logUniform(1e4, 1e6));
        root.put("band", b);
        int points = 1 + r.nextInt(50);
        root.put("points", points);
        DesignShell shell = DesignShell.round(DesignShell.Form.SPHERE, len(radius), walls);
        return finish(root, Design.of(shell, field, FrequencyBand.parse(b), points));
    }

    // ---------------------------------------------------------------- axisymmetric

    private AxisymmetricDesign axisymmetric(ObjectNode root, boolean coils) {
        ObjectNode a = root.putObject("arrangement");
        ArrayNode bodyArray = a.putArray("bodies");
        List<DesignBody> bodies = new ArrayList<>();
        double cursor = -logUniform(1e-3, 0.05);
        double rMax = 0;
        // Free space is a design between coils only; an applied field needs a body to read it against.
        for (int i = coils ? r.nextInt(4) : 1 + r.nextInt(3); i > 0; i--) {
            ObjectNode o = bodyArray.addObject();
            String name = "body " + i;
            o.put("name", name);
            String shape = new String[] {"disc", "annular-plate", "cap", "tube", "can"}[r.nextInt(5)];
            o.put("shape", shape);
            MediumSource m = material(o);
            String radius = length(logUniform(2e-3, 0.05), 0);
            double a0 = len(radius).toMetres();
            rMax = Math.max(rMax, a0);
            DesignBody b;
            double height;
            switch (shape) {
                case "disc", "annular-plate", "cap" -> {
                    String t = length(logUniform(5e-5, 3e-3), 0);
                    o.put("annular-plate".equals(shape) ? "outerRadius" : "radius", radius);
                    o.put("thickness", t);
                    height = len(t).toMetres();
                    b = shape.equals("cap") ? DesignBody.cap(name, m, len(radius), len(t))
                            : DesignBody.disc(name, m, len(radius), len(t));
                    if (shape.equals("annular-plate") || shape.equals("cap") && r.nextBoolean()) {
                        String h = length(a0 * (0.1 + 0.4 * r.nextDouble()), 0);
                        o.put(shape.equals("cap") ? "hole" : "holeRadius", h);
                        b = shape.equals("cap") ? b.withHole(len(h))
                                : DesignBody.annularPlate(name, m, len(radius), len(h), len(t));
                    }
                }
                default -> {
                    String w = length(logUniform(5e-5, 2e-3), 0);
                    double wall = len(w).toMetres();
                    String l = length(4 * wall + logUniform(3e-3, 0.08), 0);
                    o.put("innerRadius", radius);
                    o.put("wall", w);
                    o.put("length", l);
                    height = len(l).toMetres();
                    rMax = Math.max(rMax, a0 + wall);
                    if (shape.equals("tube")) {
                        b = DesignBody.tube(name, m, len(radius), len(w), len(l));
                    } else {
                        b = DesignBody.can(name, m, len(radius), len(w), len(l));
                        for (CanEnd end : CanEnd.values()) {
                            String key = end == CanEnd.LOWER ? "lower" : "upper";
                            if (r.nextInt(3) == 0) {
                                o.put(key + "End", "open");
                                b = b.withoutCap(end);
                            } else {
                                o.put(key + "End", "capped");
                                if (r.nextBoolean()) {
                                    String h = length(a0 * (0.1 + 0.4 * r.nextDouble()), 0);
                                    o.put(key + "CapHole", h);
                                    b = b.withCapHole(end, len(h));
                                }
                            }
                        }
                    }
                }
            }
            // Stack the bodies along the axis with a gap, so that none overlaps another.
            double centre = cursor + height / 2;
            cursor += height + 1e-3 + 0.01 * Math.abs(cursor);
            if (Math.abs(centre) > 1e-4) {
                String c = length(Math.abs(centre), 5);
                o.put("centre", (centre < 0 ? "-" : "") + c);
                b = centre < 0 ? b.shiftedBackBy(len(c)) : b.shiftedBy(len(c));
            }
            bodies.add(b);
        }
        double reach = Math.max(Math.abs(cursor), 0.06);
        AxisymmetricDesign d;
        double top;
        if (coils) {
            ObjectNode c = a.putObject("coils");
            DesignCoil tx = coil(c.putObject("transmitter"));
            DesignCoil rx = coil(c.putObject("receiver"));
            String sep = length(2 * reach + 0.03, 5);
            c.put("separation", sep);
            top = 1e5;
            String b = band(logUniform(1, 1e3), logUniform(1e3, top));
            root.put("band", b);
            int points = 1 + r.nextInt(5);
            root.put("points", points);
            d = AxisymmetricDesign.betweenCoils(bodies, tx, rx, len(sep), FrequencyBand.parse(b), points);
            if (r.nextBoolean()) {
                String cur = noted(number(logUniform(1, 1000), 0) + (r.nextBoolean() ? " mA" : " A"));
                AmplitudeMeasure measure = AmplitudeMeasure.values()[r.nextInt(3)];
                ObjectNode dr = c.putObject("drive");
                dr.put("current", cur);
                dr.put("measure", switch (measure) {
                    case PEAK -> "peak";
                    case PEAK_TO_PEAK -> "peak-to-peak";
                    case RMS -> "rms";
                });
                d = d.drivenAt(CurrentAmplitude.parse(cur), measure);
            }
        } else {
            ObjectNode p = a.putObject("appliedField");
            DesignFieldDirection direction = DesignFieldDirection.values()[r.nextInt(3)];
            p.put("direction", direction.fileName());
            DesignSensor s = DesignSensor.point();
            if (r.nextBoolean()) {
                ObjectNode sn = p.putObject("sensor");
                if (r.nextBoolean()) {
                    String sr = length(logUniform(1e-3, 1e-2), 0);
                    String sl = length(logUniform(1e-3, 2e-2), 0);
                    sn.put("radius", sr);
                    sn.put("length", sl);
                    s = DesignSensor.cylinder(len(sr), len(sl));
                }
                if (r.nextBoolean()) {
                    String sc = length(logUniform(1e-3, 1e-2), 0);
                    boolean back = r.nextBoolean();
                    sn.put("centre", (back ? "-" : "") + sc);
                    s = back ? s.shiftedBackBy(len(sc)) : s.shiftedBy(len(sc));
                }
            }
            String b = band(logUniform(1, 1e3), logUniform(1e3, 1e5));
            root.put("band", b);
            int points = 1 + r.nextInt(5);
            root.put("points", points);
            d = direction == DesignFieldDirection.AXIAL && r.nextBoolean()
                    ? AxisymmetricDesign.inUniformAxialField(bodies, s, FrequencyBand.parse(b), points)
                    : AxisymmetricDesign.inUniformField(bodies, s, direction, FrequencyBand.parse(b), points);
            if (r.nextBoolean()) {
                String level = fluxDensity(logUniform(1e-6, 1e-2));
                p.put("fluxDensity", level);
                d = d.withAppliedField(MagneticFluxDensity.parse(level));
            }
        }
        if (r.nextBoolean()) {
            String tol = noted(number(logUniform(0.001, 10), 0) + " dB");
            a.put("tolerance", tol);
            d = d.withTolerance(Decibels.parse(tol));
        }
        Requirement q = cases(root);
        String t = title(root);
        return d.meeting(q).withTitle(t);
    }

    private DesignCoil coil(ObjectNode o) {
        String radius = length(logUniform(2e-3, 0.05), 4);
        int turns = 1 + r.nextInt(1000);
        o.put("radius", radius);
        o.put("turns", turns);
        DesignCoil c = DesignCoil.loop(len(radius), turns);
        if (r.nextBoolean()) {
            double a = len(radius).toMetres();
            String w = length(a * (0.05 + 0.4 * r.nextDouble()), 0);
            String l = length(logUniform(5e-4, 5e-3), 0);
            int radial = 1 + r.nextInt(3);
            int axial = 1 + r.nextInt(3);
            ObjectNode wn = o.putObject("winding");
            wn.put("width", w);
            wn.put("length", l);
            wn.put("radialRings", radial);
            wn.put("axialRings", axial);
            c = c.withWinding(len(w), len(l), radial, axial);
        }
        return c;
    }
}
