/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.internal;

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
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.materials.files.MaterialFileException;
import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.ConductivityUnit;
import io.shieldmath.shield.quantity.CurrentUnit;
import io.shieldmath.shield.quantity.FluxDensityUnit;
import io.shieldmath.shield.quantity.FrequencyUnit;
import io.shieldmath.shield.quantity.LengthUnit;

/**
 * What the catalogue and design formats share: the header check, located builder steps,
 * sources, permeability models and the exact text of quantities. Every value read goes
 * through the core parse methods or the checks here; nothing is bound by reflection and no
 * type is taken from the document. Stateless.
 */
public final class JsonValues {

    /** The first version of every format. */
    public static final int VERSION = 1;
    /** The most points of a permeability table. */
    public static final int MAX_TABLE_POINTS = 1000;

    /** The mapper that writes documents. */
    public static final JsonMapper MAPPER = JsonMapper.builder().build();

    /** The fields of a sourced value. */
    public static final Set<String> VALUE_FIELDS = Set.of("value", "source");
    private static final Set<String> POINT_FIELDS = Set.of("frequency", "real", "loss");

    private JsonValues() {
    }

    /**
     * Checks the format name and that the version is {@value #VERSION}.
     *
     * @param f      the root's fields
     * @param format the format name
     * @throws MaterialFileException if either is wrong
     */
    public static void header(Node.Fields f, String format) {
        header(f, format, VERSION);
    }

    /**
     * Checks the format name and reads the version, from {@value #VERSION} to {@code newest}.
     *
     * @param f      the root's fields
     * @param format the format name
     * @param newest the newest version read
     * @return the version
     * @throws MaterialFileException if either is wrong
     */
    public static int header(Node.Fields f, String format, int newest) {
        Node fmt = f.required("format");
        if (!fmt.string().equals(format)) {
            throw fmt.error("expected \"" + format + "\", found \"" + fmt.text + "\"");
        }
        return f.required("version").integer(VERSION, newest);
    }

    /**
     * The source of a sourced value, not blank.
     *
     * @param v the value's fields
     * @return the source
     * @throws MaterialFileException if it is missing or blank
     */
    public static String source(Node.Fields v) {
        Node s = v.required("source");
        String text = s.string();
        if (text.isBlank()) {
            throw s.error("a source must not be blank: give the handbook, standard or datasheet class, or write "
                    + "\"from memory\" with the source to check against");
        }
        return text;
    }

    /**
     * Runs a builder step, turning its exceptions into located ones.
     *
     * @param <T>  the result type
     * @param node where a refusal is reported
     * @param step the step
     * @return its result
     * @throws MaterialFileException if the step throws an IllegalArgumentException
     */
    public static <T> T at(Node node, Supplier<T> step) {
        try {
            return step.get();
        } catch (IllegalArgumentException e) {
            throw node.error(e.getMessage(), e);
        }
    }

    /**
     * A relative permittivity given as a number.
     *
     * @param n the value
     * @return the permittivity
     * @throws MaterialFileException if it is not an acceptable one
     */
    public static RelativePermittivity permittivity(Node n) {
        double v = n.number();
        return n.convert(x -> RelativePermittivity.of(v), n.text);
    }

    /**
     * A permeability model: constant, relaxation or table.
     *
     * @param n          the value
     * @param withSource whether a source (and range) field is allowed
     * @return the model
     * @throws MaterialFileException if it is not an acceptable model
     */
    public static PermeabilityModel readPermeability(Node n, boolean withSource) {
        Node.Fields probe = n.object(Set.of("model", "value", "lowFrequency", "corner", "points", "source", "range"));
        Node kind = probe.required("model");
        String model = kind.string();
        switch (model) {
            case "constant": {
                n.object(withSource ? Set.of("model", "value", "source", "range") : Set.of("model", "value"));
                Node v = probe.required("value");
                if (v.type == Node.Type.NUMBER) {
                    double x = v.number();
                    return v.convert(s -> PermeabilityModel.constant(x), v.text);
                }
                return v.convert(s -> PermeabilityModel.constant(RelativePermeability.parse(s)), v.string());
            }
            case "relaxation": {
                n.object(withSource ? Set.of("model", "lowFrequency", "corner", "source", "range")
                        : Set.of("model", "lowFrequency", "corner"));
                Node low = probe.required("lowFrequency");
                double mu = low.number();
                Frequency fc = probe.required("corner").quantity(Frequency::parse, "2 kHz");
                return low.convert(s -> PermeabilityModel.relaxation(mu, fc), low.text);
            }
            case "table": {
                n.object(withSource ? Set.of("model", "points", "source", "range") : Set.of("model", "points"));
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

    /**
     * Writes a number, whole numbers without a decimal point.
     *
     * @param o   the object
     * @param key the field name
     * @param v   the number
     */
    public static void number(ObjectNode o, String key, double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            o.put(key, (long) v);
        } else {
            o.put(key, v);
        }
    }

    /**
     * Writes a permeability model as {@link #readPermeability(Node, boolean)} reads it.
     *
     * @param o     the object to fill
     * @param model the model
     * @throws IllegalArgumentException if the model is of a kind files do not hold
     */
    public static void writePermeability(ObjectNode o, PermeabilityModel model) {
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
            double[] hz = t.hertz();
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

    private static <Q> String exact(Q q, Function<String, Q> parse, double si, String siUnit,
                                    io.shieldmath.shield.quantity.Unit... units) {
        // The shortest text in a common unit that reads back to exactly this value: a value made
        // from 0.2 mm is written "0.2 mm", not "0.0002 m" or "200 µm" (0.2·1e-3 is neither the
        // double nearest 2e-4 nor 200·1e-6). Candidates are found with plain double arithmetic,
        // as the quantity parser computes them (number × unit factor), and the one chosen is
        // then checked with the parser itself.
        String best = null;
        for (io.shieldmath.shield.quantity.Unit unit : units) {
            String number = shortestIn(si, unit.toSi(),
                    best == null ? 40 : best.length() - unit.symbol().length() - 2);
            if (number != null) {
                best = number + " " + unit.symbol();
            }
        }
        if (best != null && readsBack(best, q, parse)) {
            return best;
        }
        String pretty = q.toString();
        if (readsBack(pretty, q, parse)) {
            return pretty;
        }
        return Text.exact(si) + " " + siUnit;
    }

    /**
     * A short plain decimal, at most {@code maxChars} characters, whose product with the
     * factor is exactly si, or null: the quotient rounded to 15 digits (0.2 when 0.2·1e-3/1e-3
     * comes out as 0.20000000000000004), else the quotient's own shortest text.
     */
    private static String shortestIn(double si, double factor, int maxChars) {
        double quotient = si / factor;
        if (maxChars <= 0 || !(quotient > 0) || Double.isInfinite(quotient)) {
            return null;
        }
        String rounded = new java.math.BigDecimal(quotient).round(new java.math.MathContext(15))
                .stripTrailingZeros().toPlainString();
        if (rounded.length() <= maxChars && Double.parseDouble(rounded) * factor == si) {
            return rounded;
        }
        String own = java.math.BigDecimal.valueOf(quotient).stripTrailingZeros().toPlainString();
        return own.length() <= maxChars && Double.parseDouble(own) * factor == si ? own : null;
    }

    private static <Q> boolean readsBack(String text, Q q, Function<String, Q> parse) {
        try {
            return parse.apply(text).equals(q);
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /**
     * The default written form of a conductivity: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param c the value
     * @return the text
     */
    public static String text(Conductivity c) {
        return exact(c, Conductivity::parse, c.toSiemensPerMetre(), "S/m", ConductivityUnit.MEGASIEMENS_PER_METRE,
                ConductivityUnit.SIEMENS_PER_METRE);
    }

    /**
     * The default written form of a length: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param l the value
     * @return the text
     */
    public static String text(Length l) {
        return exact(l, Length::parse, l.toMetres(), "m", LengthUnit.MILLIMETRE, LengthUnit.MICROMETRE,
                LengthUnit.METRE, LengthUnit.CENTIMETRE, LengthUnit.NANOMETRE);
    }

    /**
     * The default written form of a frequency: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param f the value
     * @return the text
     */
    public static String text(Frequency f) {
        return exact(f, Frequency::parse, f.toHertz(), "Hz", FrequencyUnit.HERTZ, FrequencyUnit.KILOHERTZ,
                FrequencyUnit.MEGAHERTZ, FrequencyUnit.GIGAHERTZ);
    }

    /**
     * The default written form of a sheet resistance: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param r the value
     * @return the text
     */
    public static String text(SheetResistance r) {
        return exact(r, SheetResistance::parse, r.toOhmsPerSquare(), "Ω/sq");
    }

    /**
     * The default written form of a flux density: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param b the value
     * @return the text
     */
    public static String text(MagneticFluxDensity b) {
        return exact(b, MagneticFluxDensity::parse, b.toTesla(), "T", FluxDensityUnit.MICROTESLA,
                FluxDensityUnit.NANOTESLA, FluxDensityUnit.MILLITESLA, FluxDensityUnit.TESLA);
    }

    /**
     * The default written form of a density: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param d the value
     * @return the text
     */
    public static String text(Density d) {
        return exact(d, Density::parse, d.toKilogramsPerCubicMetre(), "kg/m³");
    }

    /**
     * The default written form of a temperature coefficient: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param a the value
     * @return the text
     */
    public static String text(TemperatureCoefficient a) {
        return exact(a, TemperatureCoefficient::parse, a.toPerKelvin(), "/K");
    }

    /**
     * The default written form of a temperature: its short form if that reads back exactly, else SI
     * with every digit.
     *
     * @param t the value
     * @return the text
     */
    public static String text(Temperature t) {
        return exact(t, Temperature::parse, t.toCelsius(), "°C");
    }


    /**
     * The default written form of a band: both ends as {@link #text(Frequency)} writes them.
     *
     * @param b the band
     * @return the text, such as {@code "10 Hz to 100 kHz"}
     */
    public static String text(FrequencyBand b) {
        return text(b.low()) + " to " + text(b.high());
    }

    /**
     * The default written form of a level in decibels.
     *
     * @param d the level
     * @return the text
     */
    public static String text(Decibels d) {
        return exact(d, Decibels::parse, d.toDb(), "dB");
    }

    /**
     * The default written form of a current amplitude.
     *
     * @param c the amplitude
     * @return the text
     */
    public static String text(CurrentAmplitude c) {
        return exact(c, CurrentAmplitude::parse, c.toAmperes(), "A", CurrentUnit.MILLIAMPERE, CurrentUnit.AMPERE);
    }

    /**
     * The default written form of any quantity the files hold, or null for other values.
     *
     * @param q the value, may be null
     * @return the text as the {@code text} method of its type writes it, or null
     */
    public static String defaultText(Object q) {
        if (q instanceof Length v) {
            return text(v);
        } else if (q instanceof Frequency v) {
            return text(v);
        } else if (q instanceof FrequencyBand v) {
            return text(v);
        } else if (q instanceof Conductivity v) {
            return text(v);
        } else if (q instanceof MagneticFluxDensity v) {
            return text(v);
        } else if (q instanceof SheetResistance v) {
            return text(v);
        } else if (q instanceof Density v) {
            return text(v);
        } else if (q instanceof TemperatureCoefficient v) {
            return text(v);
        } else if (q instanceof Temperature v) {
            return text(v);
        } else if (q instanceof Decibels v) {
            return text(v);
        } else if (q instanceof CurrentAmplitude v) {
            return text(v);
        }
        return null;
    }

    // ================================================================ parts shared by the design formats

    private static final Set<String> MEDIUM_FIELDS = Set.of("name", "conductivity", "permeability", "permittivity");
    private static final Set<String> CASE_FIELDS = Set.of("band", "incident", "tolerated");

    /**
     * An inline medium: name, conductivity, optional permeability model and permittivity.
     *
     * @param n the object
     * @return the medium
     * @throws MaterialFileException if it is not an acceptable medium
     */
    public static Medium readMedium(Node n) {
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

    /**
     * Writes a medium as {@link #readMedium(Node)} reads it.
     *
     * @param m        the object to fill
     * @param med      the medium
     * @param spelling the texts to write quantities in
     * @throws IllegalArgumentException if its permeability model is of a kind files do not hold
     */
    public static void writeMedium(ObjectNode m, Medium med, Spelling spelling) {
        m.put("name", med.name());
        m.put("conductivity", spelling.text(med.conductivity()));
        writePermeability(m.putObject("permeability"), med.permeability());
        number(m, "permittivity", med.permittivity().value());
    }

    /**
     * The source cases: each a band, the flux density at the victim without a shield and the
     * flux density it tolerates.
     *
     * @param n the array
     * @return the requirement
     * @throws MaterialFileException if a case is not acceptable
     */
    public static Requirement readCases(Node n) {
        Requirement r = Requirement.none();
        for (Node c : n.array(0, 1000)) {
            Node.Fields f = c.object(CASE_FIELDS);
            Node bn = f.required("band");
            FrequencyBand b = bn.quantity(FrequencyBand::parse, "19 kHz to 21 kHz");
            MagneticFluxDensity in = f.required("incident").quantity(MagneticFluxDensity::parse, "8 µT");
            MagneticFluxDensity tol = f.required("tolerated").quantity(MagneticFluxDensity::parse, "5 nT");
            Requirement before = r;
            r = at(c, () -> before.plus(b, in, tol));
        }
        return r;
    }

    /**
     * Writes the source cases as {@link #readCases(Node)} reads them, nothing if there are none.
     *
     * @param root        the object to add {@code "cases"} to
     * @param requirement the cases
     * @param spelling    the texts to write quantities in
     */
    public static void writeCases(ObjectNode root, Requirement requirement, Spelling spelling) {
        if (requirement.entries().isEmpty()) {
            return;
        }
        ArrayNode cases = root.putArray("cases");
        for (Requirement.Entry e : requirement.entries()) {
            ObjectNode c = cases.addObject();
            c.put("band", spelling.text(e.band()));
            c.put("incident", spelling.text(e.incident()));
            c.put("tolerated", spelling.text(e.tolerated()));
        }
    }
}
