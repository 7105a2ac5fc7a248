/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class QuantityTest {

    @Test
    void tradeUnitsConvertExactly() {
        // 1 mil = 25.4 µm and 1 inch = 25.4 mm by definition (international inch, 1959).
        assertEquals(21 * 25.4e-6, Length.parse("21 mil").toMetres(), 0);
        assertEquals(25.4e-3, Length.ofInches(1).toMetres(), 0);
        // 100 % IACS = 58.0 MS/m (IEC 60028).
        assertEquals(58.0e6, Conductivity.ofPercentIacs(100).toSiemensPerMetre(), 1e-6);
        assertEquals(0.61 * 58e6, Conductivity.parse("61 %IACS").toSiemensPerMetre(), 1e-6);
        assertEquals(5.8e7, Conductivity.parse("5.8e7 S/m").toSiemensPerMetre(), 0);
        // 1 µΩ·cm = 1e-8 Ω·m; annealed copper 1.7241 µΩ·cm (IEC 60028: 1/58 Ω·mm²/m).
        assertEquals(58.0e6, Conductivity.from(Resistivity.parse("1.72414 µΩ·cm")).toSiemensPerMetre(), 58e6 * 1e-5);
        // 1 Oe = 1000/(4π) A/m and 1 G = 1e-4 T (definitions of the CGS units).
        assertEquals(79.57747154594767, MagneticFieldStrength.parse("1 Oe").toAmperesPerMetre(), 1e-12);
        assertEquals(1e-4, MagneticFluxDensity.parse("1 G").toTesla(), 0);
        assertEquals(10e3, Frequency.parse("10 kHz").toHertz(), 0);
    }

    @Test
    void bothMicroSignsAndOddSpacesAreRead() {
        Length a = Length.parse("5 \u00b5m");   // micro sign
        Length b = Length.parse("5 \u03bcm");   // Greek small mu
        Length c = Length.parse("5\u00a0um");   // non-breaking space, ASCII u
        assertEquals(a, b);
        assertEquals(a, c);
        assertEquals(Frequency.ofKilohertz(10), Frequency.parse("10\u202fkHz"));
        assertEquals(Frequency.ofKilohertz(-0.0 + 10), Frequency.parse("  10kHz "));
        assertEquals(SheetResistance.ofOhmsPerSquare(0.05), SheetResistance.parse("0.05 \u2126/sq"));
    }

    @Test
    void caseMattersOnlyWhereItMustAndIsNeverGuessed() {
        assertEquals(1e-3, Frequency.parse("1 mHz").toHertz(), 0);
        assertEquals(1e6, Frequency.parse("1 MHz").toHertz(), 0);
        assertThrows(InvalidQuantityException.class, () -> Frequency.parse("1 mhz"));   // mHz or MHz?
        assertEquals(1e3, Frequency.parse("1 khz").toHertz(), 0);                       // only kHz fits
    }

    @Test
    void toStringIsEngineeringFormAndReadsBack() {
        assertEquals("10 kHz", Frequency.ofHertz(10_000).toString());
        assertEquals("2 mm", Length.ofMillimetres(2).toString());
        assertEquals("533.4 µm", Length.ofMils(21).toString());
        assertEquals("35.38 MS/m", Conductivity.ofPercentIacs(61).toString());
        assertEquals("40 µT", MagneticFluxDensity.ofMicrotesla(40).toString());
        assertEquals("0 S/m", Conductivity.ZERO.toString());
        for (Length l : new Length[] {Length.ofMils(21), Length.ofNanometres(3), Length.ofMetres(12.5)}) {
            assertTrue(Length.parse(l.toString()).isCloseTo(l, 1e-14), l::toString);
        }
        assertEquals(Length.ofNanometres(3), Length.parse(Length.ofNanometres(3).toString()));
        assertEquals(Frequency.ofMegahertz(1.5), Frequency.parse(Frequency.ofMegahertz(1.5).toString()));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "   ", "kHz", "10", "10 parsecs", "NaN Hz", "Infinity Hz", "1e999 Hz", "-5 Hz",
        "0 Hz", "ten Hz", "10 k Hz x"})
    void badFrequencyTextIsRefusedWithItsValue(String text) {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> Frequency.parse(text));
        assertTrue(e.getMessage().startsWith("frequency: "), e::getMessage);
        assertTrue(e.getMessage().contains("Hz"), e::getMessage);
    }

    @Test
    void outOfRangeValuesNameQuantityValueUnitAndRange() {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> Length.ofMillimetres(-2));
        assertEquals("length: -2 mm is out of range; allowed: finite and greater than 0 mm", e.getMessage());
        assertThrows(InvalidQuantityException.class, () -> Frequency.ofHertz(Double.NaN));
        assertThrows(InvalidQuantityException.class, () -> Frequency.ofHertz(Double.POSITIVE_INFINITY));
        assertThrows(InvalidQuantityException.class, () -> Conductivity.ofSiemensPerMetre(-1));
        assertThrows(InvalidQuantityException.class, () -> Length.ofMetres(Double.MAX_VALUE).multipliedBy(10));
        assertThrows(InvalidQuantityException.class, () -> RelativePermeability.of(0));
        assertThrows(InvalidQuantityException.class, () -> RelativePermeability.ofComplex(100, -1));
        assertThrows(InvalidQuantityException.class, () -> RelativePermittivity.of(0.5));
        assertThrows(InvalidQuantityException.class, () -> Decibels.of(Double.NaN));
        assertThrows(NullPointerException.class, () -> Frequency.of(1, null));
        assertEquals(0.0, Conductivity.ofSiemensPerMetre(-0.0).toSi());
        assertEquals(Double.MIN_VALUE, Length.ofMetres(Double.MIN_VALUE).toMetres());
    }

    @Test
    void permeabilityTextForms() {
        assertEquals(RelativePermeability.of(25000), RelativePermeability.parse("25000"));
        assertEquals(RelativePermeability.ofComplex(1200, 800), RelativePermeability.parse("1200 - j 800"));
        assertEquals("1200 - j 800", RelativePermeability.ofComplex(1200, 800).toString());
        assertThrows(InvalidQuantityException.class, () -> RelativePermeability.parse("lots"));
    }

    @Test
    void decibelsAndShieldingFactorAgree() {
        assertEquals(20, Decibels.ofFieldRatio(10).toDb(), 1e-12);
        assertEquals(100, ShieldingFactor.from(Decibels.of(40)).value(), 1e-9);
        assertEquals(Decibels.of(42.5), Decibels.parse("42.5 dB"));
        assertEquals(6, Decibels.of(6).toDb());
    }

    @Test
    void bandsAreLogSpacedWithExactEnds() {
        FrequencyBand band = FrequencyBand.parse("10 Hz to 100 kHz");
        double[] f = band.logSpacedHertz(5);
        assertEquals(10, f[0], 0);
        assertEquals(100, f[1], 1e-9);
        assertEquals(1e5, f[4], 0);
        assertThrows(InvalidQuantityException.class,
                () -> FrequencyBand.of(Frequency.ofKilohertz(2), Frequency.ofKilohertz(1)));
    }
}
