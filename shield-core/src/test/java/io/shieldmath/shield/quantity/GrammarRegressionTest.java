/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.internal.Text;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * The failing examples of the hostile-input review (issue 15), each as a regression test of
 * its class of bug, plus the new quantity types. Unit factors are SI definitions (BIPM SI
 * Brochure, 9th ed., prefixes and 2.3.1 for T/K = t/°C + 273.15).
 */
class GrammarRegressionTest {

    private static InvalidQuantityException refused(Function<String, ?> parse, String text) {
        return assertThrows(InvalidQuantityException.class, () -> parse.apply(text), () -> "accepted \"" + text + "\"");
    }

    // ---- 1. a case fallback never changes a prefix ----

    @Test
    void caseNeverChangesAPrefixOrAOneLetterSymbol() {
        refused(Conductivity::parse, "5 mS/m");       // was read as 5 MS/m, a factor of 1e9
        refused(SheetResistance::parse, "1 MΩ/sq");   // was read as 1 mΩ/sq
        refused(MagneticFluxDensity::parse, "1 MT");  // was read as 1 mT
        refused(Length::parse, "1 Mm");               // was read as 1 mm
        refused(Length::parse, "1 mM");
        refused(Length::parse, "1 NM");
        refused(Length::parse, "1 CM");
        refused(Frequency::parse, "1 mhz");           // mHz or MHz: never guessed
        refused(Frequency::parse, "1 MHZ");
        refused(Frequency::parse, "1 KHz");           // K is the kelvin, not a prefix
        refused(Frequency::parse, "1 GHZ".toLowerCase());   // "ghz": G is a prefix, g is not
        refused(Conductivity::parse, "1 s/m");        // s is the second
        refused(MagneticFluxDensity::parse, "1 t");
        refused(Resistivity::parse, "1 NΩ·m");
        refused(MagneticFieldStrength::parse, "1 KA/m");
        refused(Inductance::parse, "1 MH");
        refused(VoltageAmplitude::parse, "1 MV");
        refused(CurrentAmplitude::parse, "1 Ma");
        refused(Density::parse, "1 Kg/m3");
        refused(SheetResistance::parse, "1 MOhm/sq");
        // Unit words may change case where that is unambiguous, as documented in ScalarQuantity.
        assertEquals(Frequency.ofKilohertz(10), Frequency.parse("10 khz"));
        assertEquals(Frequency.ofHertz(10), Frequency.parse("10 hz"));
        assertEquals(Frequency.ofHertz(10), Frequency.parse("10 HZ"));
        assertEquals(Frequency.ofMegahertz(3), Frequency.parse("3 MHz"));
        assertEquals(Length.ofMils(2), Length.parse("2 MIL"));
        assertEquals(SheetResistance.ofOhmsPerSquare(2), SheetResistance.parse("2 OHM/SQ"));
        assertEquals(Conductivity.ofPercentIacs(61), Conductivity.parse("61 % iacs"));
        assertEquals(MagneticFieldStrength.ofOersteds(1), MagneticFieldStrength.parse("1 OE"));
    }

    // ---- 2. no inner spaces, only real numbers or the documented complex form ----

    @Test
    void numbersWithInnerSpacesOrOtherFormsAreRefused() {
        refused(RelativePermeability::parse, "1200 800");   // was read as 1200800
        refused(RelativePermeability::parse, "1 200");
        refused(RelativePermeability::parse, "1200 + j 800");
        refused(RelativePermeability::parse, "1200 - 800");
        refused(RelativePermeability::parse, "1200 - j");
        refused(RelativePermeability::parse, "1200 - j 8 00");
        refused(RelativePermeability::parse, "NaN");
        refused(RelativePermeability::parse, "0x10");
        refused(RelativePermittivity::parse, "2 1");
        refused(RelativePermittivity::parse, "Infinity");
        refused(RelativePermittivity::parse, "2.1d");
        refused(Length::parse, "1 2 mm");
        refused(Frequency::parse, "1 000 Hz");
        refused(Frequency::parse, "1,000 Hz");
        refused(Frequency::parse, "10 k Hz");
        refused(Length::parse, "1 m m");
        refused(Decibels::parse, "4 2 dB");
        assertEquals(RelativePermeability.ofComplex(1200, 800), RelativePermeability.parse("1200-j800"));
        assertEquals(RelativePermeability.ofComplex(1200, 800), RelativePermeability.parse(" 1200 \u2212 j 800 "));
        assertEquals(RelativePermeability.ofComplex(1.2e3, 8e2), RelativePermeability.parse("1.2e3 - j 8E2"));
    }

    // ---- 3. values that underflow to zero or overflow are refused, with the text quoted ----

    @Test
    void underflowAndOverflowAreRefusedWithTheText() {
        InvalidQuantityException e = refused(Conductivity::parse, "1e-400 MS/m");   // was 0 S/m
        assertTrue(e.getMessage().contains("\"1e-400 MS/m\"") && e.getMessage().contains("underflows to 0"),
                e::getMessage);
        e = refused(Length::parse, "1e-320 nm");     // a subnormal number, 0 once in metres
        assertTrue(e.getMessage().contains("underflows to 0 in SI units"), e::getMessage);
        e = refused(Frequency::parse, "1e308 GHz");
        assertTrue(e.getMessage().contains("\"1e308 GHz\"") && e.getMessage().contains("too large"), e::getMessage);
        refused(RelativePermeability::parse, "1e-400");
        refused(RelativePermittivity::parse, "1e999");
        refused(Decibels::parse, "1e-999 dB");
        // A zero written as zero is a zero, in any form.
        assertEquals(Conductivity.ZERO, Conductivity.parse("0.000e-999 MS/m"));
        assertEquals(Conductivity.ZERO, Conductivity.parse("-0 S/m"));
    }

    // ---- 5. look-alike letters ----

    @Test
    void onlyTheDocumentedNonAsciiCharactersAreRead() {
        InvalidQuantityException e = refused(Length::parse, "10 \u039cm");   // Greek capital Mu, was read as µm
        assertTrue(e.getMessage().contains("U+039C"), e::getMessage);
        refused(Temperature::parse, "300 \u212a");           // Kelvin sign
        refused(Length::parse, "2 m\u0131l");                  // dotless i
        refused(Conductivity::parse, "5 M\u017f/m");           // long s
        refused(Frequency::parse, "10 \uff4bHz");              // full-width k
        refused(Frequency::parse, "\uff110 kHz");              // full-width 1
        refused(Frequency::parse, "\u0661 Hz");                // Arabic-Indic digit one
        refused(Length::parse, "1\u2007mm");                   // figure space: not a documented space
        refused(Length::parse, "1\nmm");
        refused(Length::parse, "1 mm\u0000");
        refused(Frequency::parse, "1 Hz\ud83d\ude00");
        refused(SheetResistance::parse, "1 \u2127/sq");        // inverted ohm sign
        // The documented ones.
        assertEquals(Length.ofMicrometres(10), Length.parse("10 \u00b5m"));
        assertEquals(Length.ofMicrometres(10), Length.parse("10\u00a0\u03bcm"));
        assertEquals(SheetResistance.ofOhmsPerSquare(1), SheetResistance.parse("1\u202f\u2126/sq"));
        assertEquals(SheetResistance.ofOhmsPerSquare(1), SheetResistance.parse("1\u2009\u03a9/\u25a1"));
        assertEquals(Temperature.ofCelsius(-40), Temperature.parse("\u221240 \u00b0C"));
        assertEquals(Density.ofKilogramsPerCubicMetre(8890), Density.parse("8890 kg/m\u00b3"));
        assertEquals(ArealMass.ofKilogramsPerSquareMetre(2), ArealMass.parse("2 kg/m\u00b2"));
        assertEquals(Resistivity.ofMicrohmCentimetres(2), Resistivity.parse("2 \u00b5\u03a9\u22c5cm"));
    }

    // ---- 7. length cap; linear time is in GrammarProperties ----

    @Test
    void oneQuantityTextIsAtMost256Characters() {
        String padded = "1" + " ".repeat(Text.MAX_LENGTH - 4) + "Hz";
        assertEquals(Text.MAX_LENGTH - 1, padded.length());
        assertEquals(Frequency.ofHertz(1), Frequency.parse(padded));
        InvalidQuantityException e = refused(Frequency::parse, "1 Hz" + " ".repeat(20_000) + "x");
        assertTrue(e.getMessage().contains("longer than 256 characters"), e::getMessage);
        assertTrue(e.getMessage().length() < 400, "the message quotes a clipped text: " + e.getMessage().length());
        e = assertThrows(InvalidQuantityException.class,
                () -> FrequencyBand.parse("1 Hz" + " ".repeat(20_000) + "x"));
        assertTrue(e.getMessage().contains("longer than"), e::getMessage);
        assertEquals(FrequencyBand.of(Frequency.ofHertz(1), Frequency.ofKilohertz(1)),
                FrequencyBand.parse("1 Hz" + " ".repeat(200) + "to" + " ".repeat(200) + "1 kHz"));
        refused(RelativePermeability::parse, "1" + "0".repeat(300));
        refused(Decibels::parse, "1" + " ".repeat(300) + "dB");
    }

    // ---- 17. a number without a unit says so ----

    @Test
    void aNumberWithoutAUnitSaysNoUnit() {
        assertEquals("density: cannot read \"8700\" (no unit); expected a number and a unit such as \"10 kg/m³\"; "
                + "units: kg/m³, g/cm³", refused(Density::parse, "8700").getMessage());
        assertTrue(refused(Temperature::parse, "60").getMessage().contains("(no unit)"));
        assertTrue(refused(TemperatureCoefficient::parse, "0.00393").getMessage().contains("(no unit)"));
        // A bare number is read in a stated unit only where the caller asks for it.
        assertEquals(Frequency.ofHertz(50), Frequency.parse("50", FrequencyUnit.HERTZ));
        assertEquals(Frequency.ofKilohertz(2), Frequency.parse("2 kHz", FrequencyUnit.HERTZ));
    }

    // ---- 18. the no-break space is a space everywhere ----

    @Test
    void noBreakSpacesAreReadInEveryParser() {
        assertEquals(Decibels.of(42.5), Decibels.parse("42.5\u00a0dB"));
        assertEquals(TemperatureCoefficient.ofPerKelvin(0.00393), TemperatureCoefficient.parse("0.00393\u00a0/K"));
        assertEquals(Density.ofKilogramsPerCubicMetre(8890), Density.parse("8890\u00a0kg/m3"));
        assertEquals(RelativePermeability.ofComplex(3, 4), RelativePermeability.parse("3\u00a0-\u00a0j\u00a04"));
        assertEquals(RelativePermittivity.of(2.1), RelativePermittivity.parse("\u00a02.1\u00a0"));
        assertEquals(FrequencyBand.of(Frequency.ofHertz(10), Frequency.ofKilohertz(1)),
                FrequencyBand.parse("10\u00a0Hz\u00a0to\u00a01\u00a0kHz"));
    }

    // ---- 20. the text form reads back, and its bound is the documented one ----

    @Test
    void textFormsReadBackExactlyOrWithinTheDocumentedBound() {
        Length mils = Length.ofMils(21);
        assertEquals("533.4 µm", mils.toString());
        assertTrue(Length.parse(mils.toString()).isCloseTo(mils, Text.READ_BACK));
        assertEquals(Length.ofMillimetres(2.07427352223), Length.parse(Length.ofMillimetres(2.07427352223).toString()));
        assertEquals(Temperature.ofCelsius(60), Temperature.parse(Temperature.ofCelsius(60).toString()));
        assertEquals("60 °C", Temperature.ofCelsius(60).toString());
        assertEquals("0.00393 /K", TemperatureCoefficient.ofPerKelvin(0.00393).toString());
        // 3930 × 1e-6 is not the double nearest 0.00393: close, not equal.
        assertTrue(TemperatureCoefficient.ofPerKelvin(0.00393).isCloseTo(TemperatureCoefficient.parse("3930 ppm/K"),
                1e-15));
        assertEquals(RelativePermeability.ofComplex(0.1 + 0.2, 1.0 / 3),
                RelativePermeability.parse(RelativePermeability.ofComplex(0.1 + 0.2, 1.0 / 3).toString()));
        assertEquals(Decibels.of(1.0 / 3), Decibels.parse(Decibels.of(1.0 / 3).toString()));
    }

    // ---- 21. a band narrower than the printing precision keeps its points strictly increasing ----

    @Test
    void narrowBandsGiveStrictlyIncreasingPoints() {
        double a = 1.0;
        double b = 1.0 + 1e-13;       // narrower than 12 significant digits
        double[] f = FrequencyBand.of(Frequency.ofHertz(a), Frequency.ofHertz(b)).logSpacedHertz(5);
        assertEquals(a, f[0], 0);
        assertEquals(b, f[4], 0);
        for (int i = 1; i < f.length; i++) {
            assertTrue(f[i] > f[i - 1], () -> java.util.Arrays.toString(f));
        }
        // Fewer distinct doubles than points: refused, not repeated.
        FrequencyBand tiny = FrequencyBand.of(Frequency.ofHertz(1), Frequency.ofHertz(Math.nextUp(Math.nextUp(1.0))));
        assertEquals(3, tiny.logSpacedHertz(3).length);
        assertThrows(IllegalArgumentException.class, () -> tiny.logSpacedHertz(4));
        assertThrows(IllegalArgumentException.class, () -> tiny.logSpacedHertz(Integer.MAX_VALUE));
    }

    // ---- the new quantity types ----

    @Test
    void newQuantitiesConvertByTheirDefinitions() {
        // 1 g/cm³ = 1000 kg/m³ (SI prefixes).
        assertEquals(8890, Density.parse("8.89 g/cm3").toKilogramsPerCubicMetre(), 1e-9);
        assertEquals(8890, Density.parse("8.89 g/cc").toKilogramsPerCubicMetre(), 1e-9);
        assertEquals("8890 kg/m³", Quantities.kgPerCubicMetre(8890).toString());
        // ρ·t: 8890 kg/m³ × 0.5 mm = 4.445 kg/m².
        assertEquals(4.445, Density.ofKilogramsPerCubicMetre(8890).arealMass(Length.ofMillimetres(0.5))
                .toKilogramsPerSquareMetre(), 1e-12);
        assertEquals("75 g/m²", ArealMass.ofKilogramsPerSquareMetre(0.075).toString());
        assertEquals(ArealMass.ofGramsPerSquareMetre(3), ArealMass.ofGramsPerSquareMetre(1)
                .plus(ArealMass.ofGramsPerSquareMetre(2)));
        // T/K = t/°C + 273.15 (BIPM SI Brochure, 9th ed., 2.3.1).
        assertEquals(20, Temperature.parse("293.15 K").toCelsius(), 1e-12);
        assertEquals(293.15, Temperature.ofCelsius(20).toKelvin(), 1e-12);
        assertEquals(60, Temperature.parse("60 degC").toCelsius(), 0);
        assertEquals(40, Temperature.ofCelsius(60).kelvinAbove(Temperature.ROOM), 0);
        assertEquals("temperature: -1 K is out of range; allowed: finite and 0 K (absolute zero) or more",
                refused(s -> Temperature.ofKelvin(-1), "").getMessage());
        assertEquals("temperature: -300 °C is out of range; allowed: finite and -273.15 °C (absolute zero) or more",
                refused(Temperature::parse, "-300 °C").getMessage());
        assertEquals(-40, Temperature.ofCelsius(-40).in(TemperatureUnit.CELSIUS), 0);
        assertEquals(233.15, Temperature.ofCelsius(-40).in(TemperatureUnit.KELVIN), 1e-12);
        // ppm = 1e-6.
        assertEquals(3.93e-3, TemperatureCoefficient.ofPpmPerKelvin(3930).toPerKelvin(), 1e-18);
        assertEquals(-4e-4, TemperatureCoefficient.parse("-400 ppm/°C").toPerKelvin(), 1e-18);
        assertEquals(0.00393, TemperatureCoefficient.parse("0.00393 1/K").toPerKelvin(), 0);
        assertEquals(2.5e-3, Quantities.mV(2.5).toVolts(), 1e-18);
        assertEquals("2.5 mV", VoltageAmplitude.ofVolts(2.5e-3).toString());
        assertEquals(3e-6, VoltageAmplitude.parse("3 uV").toVolts(), 1e-21);
        assertEquals(0.1, CurrentAmplitude.parse("100 mA").toAmperes(), 1e-15);
        refused(s -> CurrentAmplitude.ofAmperes(-1), "");
        assertEquals(1.5e-6, Inductance.parse("1.5 µH").toHenries(), 1e-21);
        assertEquals(-2e-9, Inductance.parse("-2 nH").toHenries(), 1e-24);   // a mutual inductance may be negative
        assertEquals("1.5 µH", Quantities.uH(1.5).toString());
        assertEquals("250 nH", Quantities.nH(250).toString());
        refused(s -> Inductance.ofHenries(Double.NaN), "");
    }

    @Test
    void messagesUseSixSignificantDigits() {
        assertEquals("length: -0.0001 m is out of range; allowed: finite and greater than 0 m",
                refused(s -> Length.ofMetres(-9.999999999999999E-5), "").getMessage());
        assertEquals("µr 1 + (25000 − 1)/(1 + j f/1 kHz)", io.shieldmath.shield.medium.PermeabilityModel.relaxation(25000.0,
                Frequency.ofKilohertz(1)).toString());
        assertEquals("2.07427 mm", Text.show(2.07427352223e-3, LengthUnit.values()[2]));
        assertEquals("2.07427 mm", Text.show(2.07427352223e-3,
                new Unit[] {LengthUnit.NANOMETRE, LengthUnit.MICROMETRE, LengthUnit.MILLIMETRE, LengthUnit.METRE}));
        assertEquals("\"" + "x".repeat(60) + "… (100 characters)\"", '"' + Text.clip("x".repeat(100)) + '"');
        assertEquals("a\\u001bb", Text.clip("a\u001bb"));
    }
}
