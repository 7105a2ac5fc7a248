/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Exact boundary messages, range edges and text forms of the quantity package.
 *
 * <p>The message wording checked here is the library's own documented contract (the
 * javadoc of {@link Require} and {@link InvalidQuantityException}, DEVELOPERS.md "Boundary
 * checks"): quantity, value, unit and allowed range. Unit factors are SI definitions
 * (BIPM SI Brochure, 9th ed., prefixes; 1 inch = 25.4 mm exactly, international inch of
 * 1959; 1 Oe = 1000/(4π) A/m and 1 G = 1e-4 T, the CGS-EMU definitions; 100 % IACS =
 * 58.0 MS/m, IEC 60028).
 */
class BoundaryAndTextTest {

    // ---- Require: exact messages and the edges of each range ----

    @Test
    void positiveAcceptsTheSmallestDoubleAndRefusesZeroNaNAndInfinity() {
        assertEquals(Double.MIN_VALUE, Require.positive("q", Double.MIN_VALUE, "m"));
        assertEquals(Double.MAX_VALUE, Require.positive("q", Double.MAX_VALUE, "m"));
        for (double bad : new double[] {0, -0.0, -Double.MIN_VALUE, Double.NaN, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY}) {
            assertThrows(InvalidQuantityException.class, () -> Require.positive("q", bad, "m"), () -> "" + bad);
        }
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Require.positive("thickness", 0, "mm"));
        assertEquals("thickness: 0 mm is out of range; allowed: finite and greater than 0 mm", e.getMessage());
        assertEquals("thickness", e.quantity());
        assertEquals("0 mm", e.value());
        assertEquals("finite and greater than 0 mm", e.allowed());
        e = assertThrows(InvalidQuantityException.class,
                () -> Require.positive("thickness", Double.POSITIVE_INFINITY, "mm"));
        assertEquals("thickness: Infinity mm is out of range; allowed: finite and greater than 0 mm", e.getMessage());
    }

    @Test
    void nonNegativeAcceptsZeroTurnsNegativeZeroPositiveAndRefusesTheRest() {
        assertEquals(0.0, Require.nonNegative("q", 0, "S/m"));
        // IEEE 754: -0.0 + 0.0 is +0.0; the javadoc promises a positive zero back.
        assertEquals(Double.POSITIVE_INFINITY, 1 / Require.nonNegative("q", -0.0, "S/m"));
        assertEquals(Double.MAX_VALUE, Require.nonNegative("q", Double.MAX_VALUE, "S/m"));
        for (double bad : new double[] {-Double.MIN_VALUE, -1, Double.NaN, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY}) {
            assertThrows(InvalidQuantityException.class, () -> Require.nonNegative("q", bad, "S/m"), () -> "" + bad);
        }
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Require.nonNegative("conductivity", -1.5, "S/m"));
        assertEquals("conductivity: -1.5 S/m is out of range; allowed: finite and 0 S/m or more", e.getMessage());
    }

    @Test
    void finiteRefusesNaNAndBothInfinitiesOnly() {
        assertEquals(-Double.MAX_VALUE, Require.finite("level", -Double.MAX_VALUE, "dB"));
        assertEquals(0.0, Require.finite("level", 0, "dB"));
        assertThrows(InvalidQuantityException.class, () -> Require.finite("level", Double.NEGATIVE_INFINITY, "dB"));
        assertThrows(InvalidQuantityException.class, () -> Require.finite("level", Double.POSITIVE_INFINITY, "dB"));
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Require.finite("level", Double.NaN, "dB"));
        assertEquals("level: NaN dB is out of range; allowed: a finite number of dB", e.getMessage());
    }

    @Test
    void inRangeIncludesBothEndsAndNothingBeyond() {
        assertEquals(1.0, Require.inRange("mu", 1, 1, 10, "(relative)"));
        assertEquals(10.0, Require.inRange("mu", 10, 1, 10, "(relative)"));
        assertThrows(InvalidQuantityException.class, () -> Require.inRange("mu", Math.nextDown(1.0), 1, 10, "x"));
        assertThrows(InvalidQuantityException.class, () -> Require.inRange("mu", Math.nextUp(10.0), 1, 10, "x"));
        assertThrows(InvalidQuantityException.class, () -> Require.inRange("mu", Double.NaN, 1, 10, "x"));
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Require.inRange("angle", 90.5, 0, 90, "deg"));
        assertEquals("angle: 90.5 deg is out of range; allowed: from 0 deg to 90 deg", e.getMessage());
    }

    @Test
    void nonNullReturnsTheArgumentOrNamesIt() {
        String s = "x";
        assertSame(s, Require.nonNull("name", s));
        NullPointerException e = assertThrows(NullPointerException.class, () -> Require.nonNull("barrier", null));
        assertEquals("barrier must not be null", e.getMessage());
    }

    // ---- Text: numbers in messages ----

    @Test
    void numbersInMessagesArePlainAndLocaleFree() {
        assertEquals("3", Text.number(3.0));
        assertEquals("-2", Text.number(-2.0));
        assertEquals("0", Text.number(-0.0));
        assertEquals("0.5", Text.number(0.5));
        // Six significant digits, plain from 1e-4 to below 1e12, an exponent outside (Text javadoc).
        assertEquals("1e15", Text.number(999_999_999_999_999.0));
        assertEquals("1e15", Text.number(1e15));
        assertEquals("-1e15", Text.number(-1e15));
        assertEquals("0.0001", Text.number(9.999999999999999E-5));
        assertEquals("2.07427", Text.number(2.07427352223));
        assertEquals("25000", Text.number(25000.0));
        assertEquals("-1000000", Text.number(-1e6));
        assertEquals("1.5e-7", Text.number(1.5e-7));
        assertEquals("123457000", Text.number(123_456_789));
        assertEquals("1234570000", Text.number(1_234_567_890));
        assertEquals("1.23457e12", Text.number(1_234_567_890_123.0));
        assertEquals("NaN", Text.number(Double.NaN));
        assertEquals("-Infinity", Text.number(Double.NEGATIVE_INFINITY));
    }

    // ---- Text: parse ----

    @Test
    void parseFailuresSayWhatWasWrong() {
        assertEquals("frequency: cannot read \"10 parsecs\" (unknown unit \"parsecs\"); expected a number and a "
                + "unit such as \"10 mHz\"; units: mHz, Hz, kHz, MHz, GHz",
                assertThrows(InvalidQuantityException.class, () -> Frequency.parse("10 parsecs")).getMessage());
        assertProblem("  ", "(empty text)");
        assertProblem("Hz", "(no decimal number at the start)");
        assertProblem("10", "(no unit)");
        assertProblem("1e999 Hz", "(number too large)");
        assertProblem("1 mhz", "(unknown unit \"mhz\")");   // mHz or MHz: never guessed
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> Frequency.parse("10"));
        assertEquals("frequency", e.quantity());
        assertEquals("\"10\"", e.value());
        assertTrue(e.allowed().startsWith("a number and a unit such as \"10 mHz\""), e::allowed);
        NullPointerException npe = assertThrows(NullPointerException.class, () -> Length.parse(null));
        assertEquals("length text must not be null", npe.getMessage());
    }

    private static void assertProblem(String text, String problem) {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> Frequency.parse(text));
        assertTrue(e.getMessage().startsWith("frequency: cannot read \"" + text + "\" " + problem), e::getMessage);
    }

    @Test
    void parseReadsEveryDecimalFormAndTheUnicodeMinus() {
        // Decimal forms of Java's Double.parseDouble grammar restricted to plain decimals.
        assertEquals(5e-4, Length.parse(".5 mm").toMetres(), 0);
        assertEquals(5e-3, Length.parse("5. mm").toMetres(), 0);
        assertEquals(5e-3, Length.parse("+5 mm").toMetres(), 0);
        assertEquals(1500, Frequency.parse("1.5e3 Hz").toHertz(), 0);
        assertEquals(1500, Frequency.parse("1.5E+3Hz").toHertz(), 0);
        // U+2212 MINUS SIGN reads as '-', so the value is refused by the range, not by the reader.
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> Length.parse("\u22121 mm"));
        assertEquals("length: -0.001 m is out of range; allowed: finite and greater than 0 m", e.getMessage());
        assertEquals(0.0, Conductivity.parse("0 S/m").toSiemensPerMetre());
        assertThrows(InvalidQuantityException.class, () -> Length.parse("0 mm"));
    }

    @Test
    void compoundUnitSpellingsFoldTogether() {
        double expected = 1e-8;   // 1 µΩ·cm = 1e-8 Ω·m (SI prefixes)
        for (String s : new String[] {"1 µΩ·cm", "1 μΩ·cm", "1 µ\u2126·cm", "1 µΩ cm", "1 µΩ*cm", "1 µΩ.cm",
            "1 µΩ\u22c5cm", "1 µΩcm", "1 uohm·cm", "1 microhm·cm", "1 uOhm cm"}) {
            assertEquals(expected, Resistivity.parse(s).toOhmMetres(), expected * 1e-15, s);
        }
        assertEquals(1e3, Frequency.parse("1 kHZ").toHertz(), 0);          // only the word Hz may change case
        assertThrows(InvalidQuantityException.class, () -> Frequency.parse("1 KHZ"));   // never the prefix
        assertEquals(1e-4, MagneticFluxDensity.parse("1 GAUSS").toTesla(), 0);
        assertEquals(1e-7, MagneticFluxDensity.parse("1 mgauss").toTesla(), 1e-22);
        assertEquals(25.4e-3, Length.parse("1\"").toMetres(), 0);
        assertEquals(2 * 25.4e-6, Length.parse("2 thou").toMetres(), 0);
    }

    // ---- Text: format ----

    @Test
    void formatPicksTheUnitThatPutsTheValueBetweenOneAndAThousand() {
        assertEquals("1 mm", Length.ofMetres(1e-3).toString());
        assertEquals("999 µm", Length.ofMicrometres(999).toString());
        // 1e-12 relative tolerance at a unit boundary: 1 mm minus one part in 1e14 still prints in mm.
        assertTrue(Length.ofMetres(1e-3 * (1 - 1e-14)).toString().endsWith(" mm"));
        assertTrue(Length.ofMetres(1e-3 * (1 - 1e-10)).toString().endsWith(" µm"));
        assertEquals("0.1 nm", Length.ofMetres(1e-10).toString());        // below the smallest display unit
        // BigDecimal.toString keeps plain notation down to 1e-6 and switches to an exponent below it.
        assertEquals("0.000001 nm", Length.ofMetres(1e-15).toString());
        assertEquals("1e-8 nm", Length.ofMetres(1e-17).toString());
        assertEquals("1e20 m", Length.ofMetres(1e20).toString());
        assertEquals("1000000000000000 m", Length.ofMetres(1e15).toString());
        assertEquals("0.0001 m", Text.format(1e-4, new Unit[] {LengthUnit.METRE}, LengthUnit.METRE));
        assertEquals("1e-7 m", Text.format(1e-7, new Unit[] {LengthUnit.METRE}, LengthUnit.METRE));
        assertEquals("0 A/m", MagneticFieldStrength.ofAmperesPerMetre(0).toString());
        assertEquals("Infinity m", Text.format(Double.POSITIVE_INFINITY, new Unit[] {LengthUnit.METRE},
                LengthUnit.METRE));
        assertEquals("NaN Hz", Text.format(Double.NaN, new Unit[] {FrequencyUnit.HERTZ}, FrequencyUnit.HERTZ));
        // 1/3 m has no decimal of 15 digits that reads back: 15 significant digits (Text.format).
        assertEquals("333.333333333333 mm", Length.ofMetres(1.0 / 3).toString());
        assertEquals("1.5 kA/m", MagneticFieldStrength.ofAmperesPerMetre(1500).toString());
        assertEquals("2 mΩ/sq", SheetResistance.ofMilliohmsPerSquare(2).toString());
        assertEquals("17.241 nΩ·m", Resistivity.ofMicrohmCentimetres(1.7241).toString());
    }

    // ---- the quantity types ----

    @Test
    void factoriesUseTheirUnitAndRefuseAValueThatOverflowsInSi() {
        // Prefixes: BIPM SI Brochure; mil and inch: international inch (1959).
        assertEquals(1e-3, Quantities.Hz(1e-3).toHertz(), 0);
        assertEquals(2e3, Quantities.kHz(2).toHertz(), 0);
        assertEquals(3e6, Quantities.MHz(3).toHertz(), 0);
        assertEquals(4e9, Quantities.GHz(4).toHertz(), 0);
        assertEquals(5, Quantities.m(5).toMetres(), 0);
        assertEquals(0.06, Quantities.cm(6).toMetres(), 1e-18);
        assertEquals(7e-3, Quantities.mm(7).toMetres(), 0);
        assertEquals(8e-6, Quantities.um(8).toMetres(), 0);
        assertEquals(9e-9, Quantities.nm(9).toMetres(), 1e-23);
        assertEquals(2 * 25.4e-6, Quantities.mil(2).toMetres(), 0);
        assertEquals(3 * 25.4e-3, Quantities.inch(3).toMetres(), 1e-18);
        assertEquals(11, Quantities.siemensPerMetre(11).toSiemensPerMetre(), 0);
        assertEquals(12e6, Quantities.megasiemensPerMetre(12).toSiemensPerMetre(), 0);
        assertEquals(58e6, Quantities.iacs(100).toSiemensPerMetre(), 1e-6);
        assertEquals(100, Quantities.iacs(100).toPercentIacs(), 1e-12);
        assertEquals(0.25, Quantities.ohmsPerSquare(0.25).toOhmsPerSquare(), 0);
        assertEquals(13, Quantities.amperesPerMetre(13).toAmperesPerMetre(), 0);
        assertEquals(1000 / (4 * Math.PI), Quantities.oersted(1).toAmperesPerMetre(), 1e-12);
        assertEquals(14, Quantities.tesla(14).toTesla(), 0);
        assertEquals(15e-3, Quantities.mT(15).toTesla(), 1e-18);
        assertEquals(16e-6, Quantities.uT(16).toTesla(), 1e-21);
        assertEquals(17e-9, Quantities.nT(17).toTesla(), 1e-24);
        assertEquals(1e-4, Quantities.gauss(1).toTesla(), 0);
        assertEquals(2e-8, Resistivity.ofMicrohmCentimetres(2).toOhmMetres(), 1e-23);
        assertEquals(3e-6, Resistivity.ofMicrohmMetres(3).toOhmMetres(), 0);
        assertEquals(2 * Math.PI * 50, Frequency.ofHertz(50).angular(), 0);
        // A value that is finite in its unit but overflows in SI is refused in SI units.
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Frequency.ofGigahertz(Double.MAX_VALUE));
        assertEquals("frequency: Infinity Hz is out of range; allowed: finite and greater than 0 Hz", e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> Frequency.ofKilohertz(-3));
        assertEquals("frequency: -3 kHz is out of range; allowed: finite and greater than 0 kHz", e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> Conductivity.ofMegasiemensPerMetre(Double.MAX_VALUE));
        assertEquals("conductivity: Infinity S/m is out of range; allowed: finite and 0 S/m or more", e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> MagneticFluxDensity.ofMillitesla(-1));
        assertEquals("magnetic flux density: -1 mT is out of range; allowed: finite and 0 mT or more",
                e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> MagneticFieldStrength.ofOersteds(-1));
        assertEquals("magnetic field strength: -1 Oe is out of range; allowed: finite and 0 Oe or more",
                e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> SheetResistance.ofOhmsPerSquare(0));
        assertEquals("sheet resistance: 0 Ω/sq is out of range; allowed: finite and greater than 0 Ω/sq",
                e.getMessage());
        e = assertThrows(InvalidQuantityException.class, () -> Resistivity.ofOhmMetres(0));
        assertEquals("resistivity: 0 Ω·m is out of range; allowed: finite and greater than 0 Ω·m", e.getMessage());
        assertThrows(NullPointerException.class, () -> Length.of(1, null));
        assertThrows(NullPointerException.class, () -> Conductivity.of(1, null));
        assertThrows(NullPointerException.class, () -> Resistivity.of(1, null));
        assertThrows(NullPointerException.class, () -> SheetResistance.of(1, null));
        assertThrows(NullPointerException.class, () -> MagneticFieldStrength.of(1, null));
        assertThrows(NullPointerException.class, () -> MagneticFluxDensity.of(1, null));
    }

    @Test
    void parsedValuesAreRangeCheckedInSiUnits() {
        assertEquals("resistivity: 0 Ω·m is out of range; allowed: finite and greater than 0 Ω·m",
                assertThrows(InvalidQuantityException.class, () -> Resistivity.parse("0 µΩ·cm")).getMessage());
        assertEquals("sheet resistance: 0 Ω/sq is out of range; allowed: finite and greater than 0 Ω/sq",
                assertThrows(InvalidQuantityException.class, () -> SheetResistance.parse("0 mΩ/sq")).getMessage());
        assertEquals("magnetic field strength: -1 A/m is out of range; allowed: finite and 0 A/m or more",
                assertThrows(InvalidQuantityException.class, () -> MagneticFieldStrength.parse("-1 A/m"))
                        .getMessage());
        assertEquals("magnetic flux density: -0.001 T is out of range; allowed: finite and 0 T or more",
                assertThrows(InvalidQuantityException.class, () -> MagneticFluxDensity.parse("-1 mT")).getMessage());
        assertEquals("conductivity: -1000000 S/m is out of range; allowed: finite and 0 S/m or more",
                assertThrows(InvalidQuantityException.class, () -> Conductivity.parse("-1 MS/m")).getMessage());
        assertEquals(0.0, MagneticFieldStrength.parse("0 Oe").toAmperesPerMetre());
        assertEquals(0.0, MagneticFluxDensity.parse("0 nT").toTesla());
        assertEquals(2e-3, SheetResistance.parse("2 mΩ/sq").toOhmsPerSquare(), 0);
    }

    @Test
    void conversionsBetweenRelatedQuantities() {
        // σ = 1/ρ; B = µ0·H in air (CODATA 2018 µ0 = 1.25663706212e-6 H/m).
        assertEquals(1e8, Conductivity.from(Resistivity.ofOhmMetres(1e-8)).toSiemensPerMetre(), 1e-6);
        assertEquals(1 / 58e6, Resistivity.from(Conductivity.ofPercentIacs(100)).toOhmMetres(), 1e-22);
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Resistivity.from(Conductivity.ZERO));
        assertEquals("conductivity: 0 S/m is out of range; allowed: finite and greater than 0 S/m", e.getMessage());
        assertEquals(1.25663706212e-6, MagneticFieldStrength.ofAmperesPerMetre(1).toFluxDensityInAir().toTesla(),
                1e-20);
        assertEquals(1.25663706212e-6, MagneticFluxDensity.from(MagneticFieldStrength.ofAmperesPerMetre(1)).toTesla(),
                1e-20);
        assertEquals(1 / 1.25663706212e-6, MagneticFieldStrength.from(MagneticFluxDensity.ofTesla(1))
                .toAmperesPerMetre(), 1e-6);
        assertEquals(1000 / (4 * Math.PI), MagneticFieldStrength.from(MagneticFluxDensity.ofGauss(1))
                .in(MagneticFieldUnit.AMPERE_PER_METRE), 1e-3);   // 1 G in air ≈ 1 Oe (CGS definitions)
        assertEquals(1e-3, MagneticFieldStrength.ofAmperesPerMetre(1).in(MagneticFieldUnit.KILOAMPERE_PER_METRE), 0);
        assertEquals(1e4, MagneticFluxDensity.ofTesla(1).in(FluxDensityUnit.GAUSS), 1e-9);
        assertEquals(1e3, Frequency.ofMegahertz(1).in(FrequencyUnit.KILOHERTZ), 0);
    }

    @Test
    void scalarEqualityOrderAndTolerance() {
        Length a = Length.ofMillimetres(1);
        Length b = Length.ofMicrometres(1000);
        assertEquals(a, b);
        assertEquals(a.hashCode(), b.hashCode());
        assertEquals(0, a.compareTo(b));
        assertTrue(Length.ofMillimetres(2).compareTo(a) > 0);
        assertTrue(a.compareTo(Length.ofMillimetres(2)) < 0);
        // Same SI number, different kind: not equal.
        assertNotEquals(Frequency.ofHertz(1e-3), (Object) Length.ofMillimetres(1));
        assertNotEquals(a, null);
        assertNotEquals(a, Length.ofMillimetres(1.5));
        // isCloseTo: |a − b| ≤ rel·max(|a|, |b|), both ends of the tolerance.
        Length c = Length.ofMetres(1.5);
        Length d = Length.ofMetres(2.0);
        assertTrue(c.isCloseTo(d, 0.25));                 // |0.5| ≤ 0.25·2
        assertFalse(c.isCloseTo(d, 0.2499));
        assertTrue(d.isCloseTo(c, 0.25));
        assertFalse(d.isCloseTo(c, 0.2499));
        assertEquals(Length.ofMillimetres(3), a.plus(Length.ofMillimetres(2)));
        assertEquals(Length.ofMillimetres(2.5), a.multipliedBy(2.5));
        assertThrows(InvalidQuantityException.class, () -> a.multipliedBy(0));
    }

    @Test
    void decibelsAndShieldingFactorEdges() {
        assertEquals(-3.0, Decibels.parse("\u22123 dB").toDb());
        assertEquals(3.0, Decibels.parse(" 3dB ").toDb());
        assertEquals(0.5, Decibels.parse(".5 dB").toDb());
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> Decibels.parse("3 dBm"));
        assertEquals("level: cannot read \"3 dBm\" (unknown unit \"dBm\"); expected a number and a unit such as "
                + "\"10 dB\"; units: dB", e.getMessage());
        assertEquals("level: cannot read \"1e999 dB\" (number too large); expected a number and a unit such as "
                + "\"10 dB\"; units: dB",
                assertThrows(InvalidQuantityException.class, () -> Decibels.parse("1e999 dB")).getMessage());
        // 20·log10 of a field ratio (common practice, no source): 1000 → 60 dB, 0.1 → −20 dB.
        assertEquals(60, Decibels.ofFieldRatio(1000).toDb(), 1e-12);
        assertEquals(-20, Decibels.ofFieldRatio(0.1).toDb(), 1e-12);
        assertEquals(0.1, Decibels.of(-20).toFieldRatio(), 1e-15);
        assertEquals(Decibels.of(50), Decibels.of(20).plus(Decibels.of(30)));
        assertEquals(Decibels.of(-10), Decibels.of(20).minus(Decibels.of(30)));
        assertTrue(Decibels.of(-1e-9).isNegative());
        assertFalse(Decibels.of(-0.0).isNegative());
        assertFalse(Decibels.of(0).isNegative());
        assertEquals(Double.POSITIVE_INFINITY, 1 / Decibels.of(-0.0).toDb());   // -0 dB is stored as +0
        assertEquals(Decibels.ZERO, Decibels.of(-0.0));
        assertTrue(Decibels.of(1).compareTo(Decibels.of(2)) < 0);
        assertTrue(Decibels.of(2).compareTo(Decibels.of(1)) > 0);
        assertEquals(Decibels.of(7).hashCode(), Decibels.parse("7 dB").hashCode());
        assertNotEquals(Decibels.of(7), Decibels.of(8));
        assertEquals("-3.5 dB", Decibels.of(-3.5).toString());
        assertThrows(InvalidQuantityException.class, () -> Decibels.ofFieldRatio(0));

        assertEquals(40, ShieldingFactor.of(100).toDecibels().toDb(), 1e-12);
        assertEquals("100", ShieldingFactor.of(100).toString());
        assertEquals(ShieldingFactor.of(2), ShieldingFactor.of(2));
        assertEquals(ShieldingFactor.of(2).hashCode(), ShieldingFactor.of(2).hashCode());
        assertNotEquals(ShieldingFactor.of(2), ShieldingFactor.of(3));
        assertTrue(ShieldingFactor.of(2).compareTo(ShieldingFactor.of(3)) < 0);
        assertTrue(ShieldingFactor.of(3).compareTo(ShieldingFactor.of(2)) > 0);
        assertEquals("shielding factor: 0 (plain number) is out of range; allowed: finite and greater than 0 "
                + "(plain number)", assertThrows(InvalidQuantityException.class, () -> ShieldingFactor.of(0))
                .getMessage());
    }

    @Test
    void permeabilityAndPermittivityEdges() {
        assertSame(RelativePermeability.ONE, RelativePermeability.of(1));
        assertSame(RelativePermeability.ONE, RelativePermeability.ofComplex(1, -0.0));
        assertNotEquals(RelativePermeability.ONE, RelativePermeability.ofComplex(1, 1e-9));
        assertNotEquals(RelativePermeability.ONE, RelativePermeability.of(1.5));
        assertEquals(Double.POSITIVE_INFINITY, 1 / RelativePermeability.ofComplex(2, -0.0).loss());
        assertEquals(5, RelativePermeability.ofComplex(3, 4).magnitude(), 1e-15);   // 3-4-5 triangle
        assertEquals(3, RelativePermeability.ofComplex(3, 4).real());
        assertEquals(4, RelativePermeability.ofComplex(3, 4).loss());
        assertEquals("3 - j 4", RelativePermeability.ofComplex(3, 4).toString());
        assertEquals("2.5", RelativePermeability.of(2.5).toString());
        assertEquals(RelativePermeability.ofComplex(1200, 800), RelativePermeability.parse("1200-j800"));
        assertEquals(RelativePermeability.ofComplex(1200, 800), RelativePermeability.parse("1200 \u2212 j 800"));
        assertEquals(RelativePermeability.ofComplex(3, 4).hashCode(), RelativePermeability.parse("3 - j 4").hashCode());
        assertEquals("relative permeability: cannot read \"1,000\" (not a decimal number); expected a number such "
                + "as \"25000\" or \"1200 - j 800\"",
                assertThrows(InvalidQuantityException.class, () -> RelativePermeability.parse("1,000")).getMessage());
        assertThrows(InvalidQuantityException.class, () -> RelativePermeability.parse("100 - j x"));
        assertEquals("relative permeability (real part): 0 (relative) is out of range; allowed: finite and greater "
                + "than 0 (relative)",
                assertThrows(InvalidQuantityException.class, () -> RelativePermeability.of(0)).getMessage());

        assertSame(RelativePermittivity.ONE, RelativePermittivity.of(1));
        assertEquals(2.1, RelativePermittivity.parse(" 2.1 ").value());
        assertEquals("2.1", RelativePermittivity.of(2.1).toString());
        assertEquals(RelativePermittivity.of(2.1), RelativePermittivity.parse("2.1"));
        assertEquals(RelativePermittivity.of(2.1).hashCode(), RelativePermittivity.parse("2.1").hashCode());
        assertNotEquals(RelativePermittivity.of(2.1), RelativePermittivity.of(2.2));
        assertEquals("relative permittivity: 0.999 (relative) is out of range; allowed: from 1 to 1000000 (relative)",
                assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.of(0.999)).getMessage());
        assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.of(Double.POSITIVE_INFINITY));
        assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.of(Double.NaN));
        assertEquals(1e6, RelativePermittivity.of(1e6).value());
        assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.of(Math.nextUp(1e6)));
        assertEquals("relative permittivity: cannot read \"two\" (not a decimal number); expected a number such as "
                + "\"2.1\"",
                assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.parse("two")).getMessage());
    }

    @Test
    void bandParsingContainmentAndSpacing() {
        FrequencyBand dash = FrequencyBand.parse("10 Hz - 100 kHz");
        FrequencyBand dots = FrequencyBand.parse("10 Hz..100 kHz");
        FrequencyBand to = FrequencyBand.parse("10 Hz to 100 kHz");
        assertEquals(to, dash);
        assertEquals(to, dots);
        assertEquals(to.hashCode(), dash.hashCode());
        assertEquals("10 Hz to 100 kHz", to.toString());
        assertEquals(Frequency.ofHertz(10), to.low());
        assertEquals(Frequency.ofKilohertz(100), to.high());
        FrequencyBand one = FrequencyBand.parse("50 Hz");
        assertEquals(FrequencyBand.at(Frequency.ofHertz(50)), one);
        assertEquals("50 Hz", one.toString());
        assertNotEquals(to, one);
        assertNotEquals(to, FrequencyBand.parse("10 Hz to 200 kHz"));
        assertTrue(to.contains(Frequency.ofHertz(10)));
        assertTrue(to.contains(Frequency.ofKilohertz(100)));
        assertFalse(to.contains(Frequency.ofHertz(Math.nextDown(10.0))));
        assertFalse(to.contains(Frequency.ofHertz(Math.nextUp(1e5))));
        assertEquals("band upper frequency: 1 kHz is out of range; allowed: at least the lower frequency, 2 kHz",
                assertThrows(InvalidQuantityException.class, () -> FrequencyBand.parse("2 kHz to 1 kHz"))
                        .getMessage());
        assertEquals(1, to.logSpacedHertz(1).length);
        assertEquals(10, to.logSpacedHertz(1)[0], 0);
        double[] two = to.logSpacedHertz(2);
        assertEquals(10, two[0], 0);
        assertEquals(1e5, two[1], 0);
        // Decades of 10 Hz to 100 kHz: 10, 100, 1000, 10 000, 100 000, each exact after rounding to 12 digits.
        assertEquals(1000, to.logSpacedHertz(5)[2], 0);
        assertEquals(1e4, to.logSpacedHertz(5)[3], 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> to.logSpacedHertz(0));
        assertEquals("number of points must be 1 to 1000000; got 0", e.getMessage());
        double[] flat = one.logSpacedHertz(3);
        assertEquals(50, flat[1], 0);
    }
}
