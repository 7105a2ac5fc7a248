/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.field;

/** The kind of source that makes the incident field. */
public enum FieldKind {
    /** A far-field plane wave, wave impedance η0. */
    PLANE_WAVE,
    /** The near field of a small current loop (magnetic dipole): low wave impedance. */
    MAGNETIC_NEAR_FIELD,
    /** The near field of a short rod (electric dipole): high wave impedance. */
    ELECTRIC_NEAR_FIELD
}
