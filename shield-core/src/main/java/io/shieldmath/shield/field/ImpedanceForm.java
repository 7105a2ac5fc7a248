/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.field;

/**
 * Which wave impedance a near field is given: the textbook magnitude used by hand
 * calculations and handbooks, or the exact complex impedance of a small dipole.
 */
public enum ImpedanceForm {
    /**
     * The textbook magnitude, taken as a real impedance: |Zw| = 2πfµ0·r for a magnetic
     * source and 1/(2πfε0·r) for an electric one (H. W. Ott, Electromagnetic
     * Compatibility Engineering, Wiley 2009, ch. 6). It reproduces the hand formulas, which
     * is why it is kept, but it is a magnitude used as a real number: the real near field of
     * a loop is inductive, Zw → jωµ0·r as kr → 0 (and that of a rod capacitive). Where
     * |K| = |Zw/η| of a layer is large the phase does not matter; where |K| is below about
     * 3 (thin sheets at low frequency, close to the source) it does: 0.1 mm of copper 1 cm
     * from a loop at 1 kHz gives 1.79 dB with this form and 0.22 dB with the inductive one.
     * There, and where kr ≥ 0.3 (no longer a near field; this form does not tend to η0 in
     * the far field), a planar result carries a validity note
     * ({@link io.shieldmath.shield.planar.PlanarResult#validityNotes()}); use
     * {@link #EXACT_DIPOLE} instead.
     */
    TEXTBOOK,
    /**
     * The exact complex wave impedance of a small dipole in its equatorial plane, with
     * x = kr, k = 2πf/c: Zw = η0·(x⁴ + jx)/(1 − x² + x⁴) for a magnetic dipole and
     * Zw = η0·(x⁴ − jx)/(x⁴ + x²) for an electric one (from the dipole fields,
     * e.g. C. A. Balanis, Antenna Theory, ch. 4). Both tend to η0 for kr ≫ 1; right near
     * kr ≈ 1, where the textbook form is not.
     */
    EXACT_DIPOLE
}
