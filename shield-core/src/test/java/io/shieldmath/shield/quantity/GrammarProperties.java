/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.internal.Text;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * Generated hostile input against every parser of the package: unit-prefix confusion,
 * look-alike characters, long runs, huge and tiny exponents and embedded spaces. Each
 * property holds for {@code -Dshield.tries} (10 000 by default) generated cases: the parser
 * gives the right value or refuses with {@link InvalidQuantityException}; never a wrong
 * unit, a silent 0 or infinity, another exception, or a hang.
 */
class GrammarProperties {

    static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    /** A kind of scalar quantity: its parser and its units. */
    record Kind(String name, Function<String, ScalarQuantity<?, ?>> parse, Unit[] units) {
    }

    static final List<Kind> KINDS = List.of(
            new Kind("frequency", Frequency::parse, FrequencyUnit.values()),
            new Kind("length", Length::parse, LengthUnit.values()),
            new Kind("conductivity", Conductivity::parse, ConductivityUnit.values()),
            new Kind("resistivity", Resistivity::parse, ResistivityUnit.values()),
            new Kind("sheet resistance", SheetResistance::parse, SheetResistanceUnit.values()),
            new Kind("field strength", MagneticFieldStrength::parse, MagneticFieldUnit.values()),
            new Kind("flux density", MagneticFluxDensity::parse, FluxDensityUnit.values()),
            new Kind("density", Density::parse, DensityUnit.values()),
            new Kind("areal mass", ArealMass::parse, ArealMassUnit.values()),
            new Kind("temperature", Temperature::parse, TemperatureUnit.values()),
            new Kind("temperature coefficient", TemperatureCoefficient::parse, TemperatureCoefficientUnit.values()),
            new Kind("voltage", VoltageAmplitude::parse, VoltageUnit.values()),
            new Kind("current", CurrentAmplitude::parse, CurrentUnit.values()),
            new Kind("inductance", Inductance::parse, InductanceUnit.values()));

    /** Every spelling of every unit of a kind. */
    static List<String> spellings(Unit u) {
        List<String> s = new ArrayList<>();
        s.add(u.symbol());
        s.addAll(u.aliases());
        return s;
    }

    /** The units of a kind that the text spells exactly (after the documented folding of µ and Ω). */
    static Unit exactUnit(Kind k, String spelling) {
        String key = spelling.replace('\u03bc', '\u00b5').replace('\u2126', '\u03a9');
        for (Unit u : k.units()) {
            for (String s : spellings(u)) {
                if (s.replace('\u03bc', '\u00b5').replace('\u2126', '\u03a9').equals(key)) {
                    return u;
                }
            }
        }
        return null;
    }

    static double si(double v, Unit u) {
        return v * u.toSi() + u.offset();
    }

    // ---- prefix confusion ----

    @Test
    void aCaseVariantOfAUnitIsThatUnitAnExactOtherUnitOrRefused() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Kind k = KINDS.get(r.nextInt(KINDS.size()));
            Unit u = k.units()[r.nextInt(k.units().length)];
            List<String> sp = spellings(u);
            String spelling = sp.get(r.nextInt(sp.size()));
            StringBuilder b = new StringBuilder(spelling);
            for (int i = 0; i < b.length(); i++) {
                char c = b.charAt(i);
                if (c < 128 && Character.isLetter(c) && r.nextInt(3) == 0) {
                    b.setCharAt(i, Character.isUpperCase(c) ? Character.toLowerCase(c) : Character.toUpperCase(c));
                }
            }
            String variant = b.toString();
            String text = "7 " + variant;
            Unit exact = exactUnit(k, variant);
            ScalarQuantity<?, ?> q;
            try {
                q = k.parse().apply(text);
            } catch (InvalidQuantityException e) {
                assertTrue(exact == null, () -> "\"" + text + "\" spells " + exact + " exactly but was refused: "
                        + e.getMessage());
                return;
            }
            Unit read = exact != null ? exact : u;
            assertEquals(si(7, read), q.toSi(), Math.abs(si(7, read)) * 1e-15, () -> "\"" + text + "\" ("
                    + spelling + " of " + u + ") read as " + q);
            if (exact == null && !variant.equals(spelling)) {
                // A case change was accepted: it never touched a prefix or one-letter symbol, so the
                // first letter of the spelling kept its case unless the spelling starts with a word.
                assertTrue(variant.charAt(0) == spelling.charAt(0) || Character.isLetter(spelling.charAt(0))
                        && spelling.length() > 1 && Character.isLetter(spelling.charAt(1))
                        && !isPrefixedElsewhere(k, spelling), () -> "\"" + text + "\" changed a prefix of " + spelling);
            }
        });
    }

    private static boolean isPrefixedElsewhere(Kind k, String spelling) {
        String rest = spelling.substring(1);
        for (Unit v : k.units()) {
            if (spellings(v).contains(rest)) {
                return true;
            }
        }
        return false;
    }

    // ---- look-alikes ----

    private static final String DOCUMENTED = "\u00b5\u03bc\u03a9\u2126\u00b0\u00b2\u00b3\u00b7\u22c5\u25a1\u2212"
            + "\u00a0\u2009\u202f";
    private static final String LOOK_ALIKES = "\u039c\u212a\u0131\u017f\u0130\u2163\uff4b\uff2d\uff10\u0661\u2007"
            + "\u200b\u00ad\u2010\u2013\u2014\u0430\u0435\u043c\u0455\u0391\u0397\u212b\u2127\u00d7\u02bc\ufeff"
            + "\u00b9\u2070\u1d50\u24c2";

    @Test
    void anUndocumentedNonAsciiCharacterIsAlwaysRefused() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Kind k = KINDS.get(r.nextInt(KINDS.size()));
            Unit u = k.units()[r.nextInt(k.units().length)];
            String good = "12.5 " + u.symbol();
            char c = r.nextBoolean() ? LOOK_ALIKES.charAt(r.nextInt(LOOK_ALIKES.length()))
                    : (char) (0x80 + r.nextInt(0xd800 - 0x80));
            if (DOCUMENTED.indexOf(c) >= 0) {
                return;
            }
            int at = r.nextInt(good.length() + 1);
            String text = good.substring(0, at) + c + good.substring(at);
            try {
                ScalarQuantity<?, ?> q = k.parse().apply(text);
                fail("\"" + text + "\" (U+" + Integer.toHexString(c) + ") read as " + q);
            } catch (InvalidQuantityException e) {
                assertTrue(e.getMessage().contains(String.format(Locale.ROOT, "U+%04X", (int) c)), e::getMessage);
            }
        });
    }

    // ---- long runs, embedded spaces, exponents ----

    private static final String[] PIECES = {"1", "0", "9", "-", "+", "\u2212", ".", "e", "E", "308", "400", "-400",
        "5", " ", "  ", "\u00a0", "\u202f", "\t", "j", "dB", "to", "..", "kHz", "Hz", "mm", "µm", "S/m", "MS/m",
        "kg/m3", "°C", "K", "/K", "ppm/K", "mV", "A", "nH", "g/m²", "x", "·", "/", "%"};

    @Test
    void anyTextGivesAFiniteValueOrTheDocumentedException() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            StringBuilder b = new StringBuilder();
            int n = r.nextInt(8);
            for (int i = 0; i < n; i++) {
                String p = PIECES[r.nextInt(PIECES.length)];
                b.append(r.nextInt(10) == 0 ? p.repeat(1 + r.nextInt(500)) : p);
            }
            String text = b.toString();
            for (Kind k : KINDS) {
                try {
                    double v = k.parse().apply(text).toSi();
                    assertTrue(Double.isFinite(v), () -> "\"" + text + "\" gave " + v);
                    assertTrue(text.length() <= Text.MAX_LENGTH, () -> "a long text was read: " + text.length());
                } catch (InvalidQuantityException e) {
                    assertTrue(e.getMessage().startsWith(e.quantity() + ": ") && !e.allowed().isEmpty(),
                            e::getMessage);
                    assertTrue(e.getMessage().length() < 600, () -> "message not clipped: " + e.getMessage().length());
                }
            }
            for (Function<String, Object> p : List.<Function<String, Object>>of(Decibels::parse,
                    RelativePermeability::parse, RelativePermittivity::parse, FrequencyBand::parse)) {
                try {
                    String s = p.apply(text).toString();
                    assertTrue(!s.contains("NaN") && !s.contains("Infinity"), s);
                } catch (InvalidQuantityException e) {
                    assertTrue(e.getMessage().length() < 800, () -> "message not clipped: " + e.getMessage().length());
                }
            }
        });
    }

    @Test
    void aSpaceInsideANumberIsAlwaysRefused() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            String number = (1 + r.nextInt(9)) + Integer.toString(r.nextInt(100_000)) + "." + (1 + r.nextInt(999))
                    + (r.nextBoolean() ? "e" + (r.nextInt(20) - 10) : "");
            int at = 1 + r.nextInt(number.length() - 1);
            String space = new String[] {" ", "\u00a0", "\u202f", "\t", "\u2009"}[r.nextInt(5)];
            String broken = number.substring(0, at) + space + number.substring(at);
            for (String text : new String[] {broken + " Hz", broken + " mm", broken}) {
                assertRefused(() -> Frequency.parse(text), text);
                assertRefused(() -> Length.parse(text), text);
                assertRefused(() -> Decibels.parse(broken + " dB"), broken + " dB");
                assertRefused(() -> RelativePermeability.parse(broken), broken);
                assertRefused(() -> RelativePermittivity.parse(broken), broken);
                assertRefused(() -> RelativePermeability.parse("5 - j " + broken), "5 - j " + broken);
            }
        });
    }

    private static void assertRefused(Runnable parse, String text) {
        try {
            parse.run();
            fail("\"" + text + "\" was read");
        } catch (InvalidQuantityException e) {
            // expected
        }
    }

    @Test
    void hugeAndTinyExponentsGiveAFiniteNonZeroValueOrARefusal() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Kind k = KINDS.get(r.nextInt(KINDS.size()));
            Unit u = k.units()[r.nextInt(k.units().length)];
            String mantissa = (1 + r.nextInt(9)) + "." + r.nextInt(1000);
            int exponent = r.nextInt(1300) - 650;
            String text = mantissa + "e" + exponent + " " + u.symbol();
            double expected = si(Double.parseDouble(mantissa + "e" + exponent), u);
            try {
                double v = k.parse().apply(text).toSi();
                assertTrue(Double.isFinite(v) && (v != 0 || u.offset() != 0), () -> "\"" + text + "\" gave " + v);
                assertEquals(expected, v, 0, text);
            } catch (InvalidQuantityException e) {
                // Refused only when the value under- or overflows, or is out of the kind's range.
                boolean outOfDoubles = !Double.isFinite(expected) || expected == 0 && u.offset() == 0
                        || Double.parseDouble(mantissa + "e" + exponent) == 0;
                boolean outOfRange = e.getMessage().contains("is out of range");
                assertTrue(outOfDoubles || outOfRange, () -> "\"" + text + "\" refused: " + e.getMessage());
            }
        });
    }

    // ---- round trip ----

    @Test
    void everyTextFormReadsBackWithinTheDocumentedBound() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            Kind k = KINDS.get(r.nextInt(KINDS.size()));
            Unit u = k.units()[r.nextInt(k.units().length)];
            double v = Math.exp(r.nextDouble() * 60 - 30);
            ScalarQuantity<?, ?> q;
            try {
                q = k.parse().apply(Text.exact(v) + " " + u.symbol());
            } catch (InvalidQuantityException e) {
                return;    // out of the kind's range
            }
            ScalarQuantity<?, ?> back = k.parse().apply(q.toString());
            double a = q.toSi();
            double b = back.toSi();
            assertTrue(Math.abs(a - b) <= Text.READ_BACK * Math.abs(a), () -> q + " read back as " + back);
            // Short decimals in a unit that toString may print read back exactly.
            String shortText = (1 + r.nextInt(999)) + "." + r.nextInt(100) + " " + u.symbol();
            ScalarQuantity<?, ?> s = k.parse().apply(shortText);
            ScalarQuantity<?, ?> sBack = k.parse().apply(s.toString());
            if (s.toString().endsWith(" " + u.symbol())) {
                assertEquals(s, sBack, () -> shortText + " printed as " + s);
            }
            // Decibels, permeability and permittivity print the shortest exact decimal.
            assertEquals(Decibels.of(-v), Decibels.parse(Decibels.of(-v).toString()));
            if (v <= RelativePermeability.MAX) {
                RelativePermeability mu = RelativePermeability.ofComplex(v, v / 3);
                assertEquals(mu, RelativePermeability.parse(mu.toString()));
            }
            if (v >= 1 && v <= RelativePermittivity.MAX) {
                assertEquals(RelativePermittivity.of(v), RelativePermittivity.parse(RelativePermittivity.of(v)
                        .toString()));
            }
        });
    }

    // ---- linear time ----

    /**
     * Reading time grows linearly with the text: inputs 10 times apart in length take at most
     * 40 times as long (a quadratic reader takes 100 times). The bound is loose so that the
     * check cannot flake; it compares a ratio of two timings of the same run, never an
     * absolute time.
     */
    @Test
    void readingTimeIsLinearInTheLength() {
        List<Function<String, ?>> parsers = List.of(Frequency::parse, FrequencyBand::parse, Density::parse,
                RelativePermeability::parse, Decibels::parse);
        for (Function<String, ?> p : parsers) {
            double shortTime = time(p, 24);
            double longTime = time(p, 240);
            double ratio = longTime / shortTime;
            assertTrue(ratio < 40, () -> "240 characters took " + ratio + " times as long as 24");
            // Beyond the cap a text is refused after one look at its length.
            double huge = time(p, 100_000) / time(p, 10_000);
            assertTrue(huge < 40, () -> "100 000 characters took " + huge + " times as long as 10 000");
        }
    }

    /** The best time of several rounds of reading a text of {@code n} characters, mostly spaces. */
    private static double time(Function<String, ?> parse, int n) {
        String text = "1" + " ".repeat(Math.max(1, n - 3)) + "x";
        long best = Long.MAX_VALUE;
        for (int round = 0; round < 7; round++) {
            long start = System.nanoTime();
            for (int i = 0; i < 200; i++) {
                try {
                    parse.apply(text);
                } catch (InvalidQuantityException e) {
                    // expected: "x" is no unit
                }
            }
            best = Math.min(best, System.nanoTime() - start);
        }
        return Math.max(best, 1);
    }
}
