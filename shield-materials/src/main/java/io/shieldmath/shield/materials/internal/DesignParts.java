/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.internal;

import static io.shieldmath.shield.materials.internal.JsonValues.at;
import static io.shieldmath.shield.materials.internal.JsonValues.number;
import static io.shieldmath.shield.materials.internal.JsonValues.permittivity;
import static io.shieldmath.shield.materials.internal.JsonValues.readPermeability;
import static io.shieldmath.shield.materials.internal.JsonValues.writePermeability;

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
 * Parts every design format shares: inline media and source cases, read with their location
 * and written so that they read back equal. Stateless.
 */
public final class DesignParts {

    private DesignParts() {
    }

    private static final Set<String> MEDIUM_FIELDS = Set.of("name", "conductivity", "permeability", "permittivity");
    private static final Set<String> CASE_FIELDS = Set.of("band", "incident", "tolerated", "requiredSe");

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
        PermeabilityModel model = mu == null ? ConstantPermeability.ONE : readPermeability(mu, false, true, sigma);
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
     * The source cases: each a band and either the flux density at the victim without a
     * shield and the flux density it tolerates ({@code "incident"} and {@code "tolerated"}),
     * or the required shielding effectiveness itself ({@code "requiredSe"}), never both.
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
            Node seNode = f.optional("requiredSe");
            Node inNode = f.optional("incident");
            Node tolNode = f.optional("tolerated");
            Requirement before = r;
            if (seNode != null) {
                if (inNode != null || tolNode != null) {
                    throw c.error("a source case gives either \"requiredSe\" or \"incident\" and \"tolerated\","
                            + " not both");
                }
                Decibels se = seNode.quantity(Decibels::parse, "40 dB");
                r = at(seNode, () -> before.plus(b, se));
            } else {
                if (inNode == null && tolNode == null) {
                    throw c.error("a source case needs \"incident\" and \"tolerated\", or \"requiredSe\"");
                }
                MagneticFluxDensity in = f.required("incident").quantity(MagneticFluxDensity::parse, "8 µT");
                MagneticFluxDensity tol = f.required("tolerated").quantity(MagneticFluxDensity::parse, "5 nT");
                r = at(c, () -> before.plus(b, in, tol));
            }
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
            if (e.isDirect()) {
                c.put("requiredSe", spelling.text(Decibels.of(e.requiredDb())));
            } else {
                c.put("incident", spelling.text(e.incident().orElseThrow()));
                c.put("tolerated", spelling.text(e.tolerated().orElseThrow()));
            }
        }
    }
}
