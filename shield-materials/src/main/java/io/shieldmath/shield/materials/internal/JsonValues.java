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
 * sources and permeability models ({@link QuantityText} writes quantities, {@link DesignParts}
 * holds the parts of the design formats). Every value read goes
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
            o.put("corner", QuantityText.text(r.corner()));
        } else if (model instanceof TabulatedPermeability t) {
            o.put("model", "table");
            ArrayNode pts = o.putArray("points");
            double[] hz = t.hertz();
            double[] re = t.realParts();
            double[] im = t.lossParts();
            for (int i = 0; i < hz.length; i++) {
                ObjectNode p = pts.addObject();
                p.put("frequency", QuantityText.text(Frequency.ofHertz(hz[i])));
                number(p, "real", re[i]);
                number(p, "loss", im[i]);
            }
        } else {
            throw new IllegalArgumentException("cannot write a permeability model of type "
                    + model.getClass().getName() + "; files hold constant, relaxation and table models only");
        }
    }
}
