/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Wave impedances of the three incident fields against the formulas of Ott 2009 ch. 6 and Schelkunoff 1943, evaluated
 * independently here with Commons Math {@link Complex} arithmetic.
 */
class IncidentFieldTest {

    private static final double MU0 = 1.25663706212e-6;      // CODATA 2018
    private static final double EPS0 = 8.8541878128e-12;     // CODATA 2018
    private static final double C = 299_792_458.0;           // exact (SI)
    private static final double ETA0 = Math.sqrt(MU0 / EPS0);

    @Test
    void planeWaveIsEtaZeroAtEveryFrequency() {
        // η0 = sqrt(µ0/ε0) ≈ 376.73 Ω (CODATA 2018 constants).
        IncidentField p = IncidentField.planeWave();
        assertSame(p, IncidentField.planeWave());
        assertEquals(376.730313, p.impedanceReal(1), 1e-6);
        assertEquals(ETA0, p.impedanceReal(1e9), 0);
        assertEquals(0, p.impedanceImaginary(1e9), 0);
        assertEquals(FieldKind.PLANE_WAVE, p.kind());
        assertEquals(null, p.distance());
        assertEquals("plane wave", p.toString());
    }

    @ParameterizedTest
    @CsvSource({"50, 0.1", "1e4, 0.3", "1e7, 1", "4.77e7, 1", "1e9, 2", "1e3, 100"})
    void textbookAndExactDipoleImpedancesMatchTheirFormulas(double hz, double r) {
        Length d = Length.ofMetres(r);
        double kr = 2 * Math.PI * hz / C * r;
        Complex jx = new Complex(0, kr);
        // Magnetic dipole, equatorial plane: Zw = η0·jkr(1 + jkr)/((jkr)² + jkr + 1).
        Complex zm = jx.multiply(Complex.ONE.add(jx)).divide(jx.multiply(jx).add(jx).add(1)).multiply(ETA0);
        // Electric dipole: the dual, Zw = η0·((jkr)² + jkr + 1)/(jkr(1 + jkr)).
        Complex ze = jx.multiply(jx).add(jx).add(1).divide(jx.multiply(Complex.ONE.add(jx))).multiply(ETA0);
        IncidentField m = IncidentField.magneticNearField(d, ImpedanceForm.EXACT_DIPOLE);
        IncidentField e = IncidentField.electricNearField(d, ImpedanceForm.EXACT_DIPOLE);
        assertEquals(zm.getReal(), m.impedanceReal(hz), 1e-9 * zm.abs());
        assertEquals(zm.getImaginary(), m.impedanceImaginary(hz), 1e-9 * zm.abs());
        assertEquals(ze.getReal(), e.impedanceReal(hz), 1e-9 * ze.abs());
        assertEquals(ze.getImaginary(), e.impedanceImaginary(hz), 1e-9 * ze.abs());
        Complex viaFrequency = io.shieldmath.shield.TestComplex.cm(m.waveImpedance(Frequency.ofHertz(hz)));
        assertEquals(m.impedanceReal(hz), viaFrequency.getReal(), 0);
        assertEquals(m.impedanceImaginary(hz), viaFrequency.getImaginary(), 0);
        // Textbook magnitudes: |Zw| = 2πfµ0r (magnetic) and 1/(2πfε0r) (electric), real by convention.
        IncidentField mt = IncidentField.magneticNearField(d, ImpedanceForm.TEXTBOOK);
        IncidentField et = IncidentField.electricNearField(d, ImpedanceForm.TEXTBOOK);
        assertEquals(2 * Math.PI * hz * MU0 * r, mt.impedanceReal(hz), 1e-12 * mt.impedanceReal(hz));
        assertEquals(0, mt.impedanceImaginary(hz), 0);
        assertEquals(1 / (2 * Math.PI * hz * EPS0 * r), et.impedanceReal(hz), 1e-12 * et.impedanceReal(hz));
        assertEquals(0, et.impedanceImaginary(hz), 0);
    }

    @Test
    void valueSemanticsAndText() {
        Length r = Length.ofCentimetres(30);
        IncidentField a = IncidentField.magneticNearField(r, ImpedanceForm.TEXTBOOK);
        assertEquals(a, IncidentField.magneticNearField(Length.ofMillimetres(300), ImpedanceForm.TEXTBOOK));
        assertEquals(a.hashCode(),
                IncidentField.magneticNearField(Length.ofMillimetres(300), ImpedanceForm.TEXTBOOK).hashCode());
        assertNotEquals(a, IncidentField.magneticNearField(r, ImpedanceForm.EXACT_DIPOLE));
        assertNotEquals(a, IncidentField.electricNearField(r, ImpedanceForm.TEXTBOOK));
        assertNotEquals(a, IncidentField.magneticNearField(Length.ofCentimetres(31), ImpedanceForm.TEXTBOOK));
        assertNotEquals(a, IncidentField.planeWave());
        assertEquals(r, a.distance());
        assertEquals(ImpedanceForm.TEXTBOOK, a.form());
        assertEquals(FieldKind.MAGNETIC_NEAR_FIELD, a.kind());
        assertEquals(FieldKind.ELECTRIC_NEAR_FIELD, IncidentField.electricNearField(r, ImpedanceForm.TEXTBOOK).kind());
        assertEquals("magnetic near field at 300 mm (textbook impedance)", a.toString());
        assertEquals("electric near field at 300 mm (exact dipole impedance)",
                IncidentField.electricNearField(r, ImpedanceForm.EXACT_DIPOLE).toString());
        assertThrows(NullPointerException.class, () -> IncidentField.magneticNearField(null, ImpedanceForm.TEXTBOOK));
        assertThrows(NullPointerException.class, () -> IncidentField.magneticNearField(r, null));
        assertThrows(NullPointerException.class, () -> IncidentField.electricNearField(null, ImpedanceForm.TEXTBOOK));
        assertThrows(NullPointerException.class, () -> IncidentField.electricNearField(r, null));
        assertThrows(NullPointerException.class, () -> a.waveImpedance(null));
    }
}
