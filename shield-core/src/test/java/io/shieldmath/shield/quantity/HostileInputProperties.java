/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.List;
import java.util.Random;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * Every parser and factory, driven with hostile text and values, gives either a correct
 * result or {@link InvalidQuantityException} whose message names the quantity and the
 * allowed range or accepted form; never another exception, never a NaN or infinite value.
 */
class HostileInputProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    private static final List<Function<String, ScalarQuantity<?, ?>>> PARSERS = List.of(
            Frequency::parse, Length::parse, Conductivity::parse, Resistivity::parse, SheetResistance::parse,
            MagneticFieldStrength::parse, MagneticFluxDensity::parse);

    private static final String[] PIECES = {"1", "0", "-", "+", ".", "e", "E", "308", "999", "5", "10", " ", "\u00a0",
        "\u202f", "\t", "\n", "kHz", "Hz", "MHz", "mHz", "mm", "µm", "μm", "um", "mil", "in", "\"", "S/m", "MS/m",
        "%IACS", "% IACS", "µΩ·cm", "Ω/sq", "\u2126/sq", "A/m", "Oe", "T", "µT", "nT", "G", "NaN", "Infinity",
        "\u2212", "１", "٣", "\u0000", "\ud83d\ude00", "ｋHz", "1e-400", "4.9e-324", "1.7976931348623157e308", "x",
        ",", "·", "/", "%", "µ"};

    static String hostile(Random r) {
        StringBuilder b = new StringBuilder();
        int n = r.nextInt(6);
        for (int i = 0; i < n; i++) {
            b.append(PIECES[r.nextInt(PIECES.length)]);
        }
        return b.toString();
    }

    @Test
    void hostileTextGivesAValueOrTheDocumentedException() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            String text = hostile(r);
            for (Function<String, ScalarQuantity<?, ?>> p : PARSERS) {
                try {
                    ScalarQuantity<?, ?> q = p.apply(text);
                    assertTrue(Double.isFinite(q.toSi()) && q.toSi() >= 0, () -> "\"" + text + "\" gave " + q);
                } catch (InvalidQuantityException e) {
                    assertTrue(e.getMessage().contains(": ") && !e.quantity().isEmpty() && !e.allowed().isEmpty(),
                            e::getMessage);
                }
            }
        });
    }

    @Test
    void hostileNumbersGiveAValueOrTheDocumentedException() {
        double[] values = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -1, -0.0, 0,
            Double.MIN_VALUE, Double.MIN_NORMAL, 1e-300, 1e300, Double.MAX_VALUE};
        for (double v : values) {
            for (LengthUnit u : LengthUnit.values()) {
                try {
                    Length l = Length.of(v, u);
                    assertTrue(Double.isFinite(l.toMetres()) && l.toMetres() > 0, l::toString);
                } catch (InvalidQuantityException e) {
                    assertTrue(e.getMessage().startsWith("length: "), e::getMessage);
                }
            }
            for (FrequencyUnit u : FrequencyUnit.values()) {
                try {
                    assertTrue(Frequency.of(v, u).toHertz() > 0);
                } catch (InvalidQuantityException e) {
                    assertTrue(e.getMessage().startsWith("frequency: "), e::getMessage);
                }
            }
        }
    }

    @Test
    void validTextReadsBackTheValue() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double v = Math.exp(r.nextDouble() * 40 - 20);
            LengthUnit u = LengthUnit.values()[r.nextInt(LengthUnit.values().length)];
            String space = new String[] {" ", "", "\u00a0", "\u202f", "  "}[r.nextInt(5)];
            String sym = u == LengthUnit.MICROMETRE ? new String[] {"µm", "μm", "um"}[r.nextInt(3)] : u.symbol();
            Length parsed = Length.parse(Double.toString(v) + space + sym);
            assertEquals(v * u.toSi(), parsed.toMetres(), 0.0);
            assertTrue(Length.parse(parsed.toString()).isCloseTo(parsed, 1e-11), parsed::toString);
        });
    }

    @Test
    void lookAlikeUnitsThatAreNotUnitsAreRefused() {
        assertThrows(InvalidQuantityException.class, () -> Frequency.parse("10 ｋHz"));   // full-width k
        assertThrows(InvalidQuantityException.class, () -> Frequency.parse("１0 kHz"));   // full-width 1
        assertThrows(InvalidQuantityException.class, () -> Length.parse("5 mµ"));
    }
}
