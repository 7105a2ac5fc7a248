/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

/**
 * The direction of a uniform applied field relative to the axis of an arrangement of bodies
 * of revolution.
 */
public enum FieldDirection {
    /** Along the axis ({@link Arrangement#inUniformAxialField()}). */
    AXIAL,
    /** Across the axis ({@link Arrangement#inUniformTransverseField()}). */
    TRANSVERSE
}
