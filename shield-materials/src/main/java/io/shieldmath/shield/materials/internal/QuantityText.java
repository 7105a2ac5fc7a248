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
 * The text files write quantities in: for each quantity the files hold, the shortest text in a
 * common unit that reads back to exactly the same value, else the library's own text form if it
 * does, else SI with every digit. Stateless.
 */
public final class QuantityText {

    private QuantityText() {
    }

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

}
