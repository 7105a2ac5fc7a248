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
     * Compatibility Engineering, Wiley 2009, ch. 6). Right for kr ≪ 1; it does not tend to
     * η0 in the far field.
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
