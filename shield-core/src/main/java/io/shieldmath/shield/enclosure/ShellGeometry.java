/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

/**
 * The shape of a closed shell and the direction of the applied field. Each is a
 * separable boundary-value problem with a uniform field inside the innermost cavity.
 */
public enum ShellGeometry {
    /** A spherical shell in a uniform field (the dipole, l = 1, term). */
    SPHERE,
    /** An infinitely long circular cylinder with the field across its axis (the m = 1 term). */
    CYLINDER_TRANSVERSE,
    /**
     * An infinitely long circular cylinder with the field along its axis. A static axial
     * field is not shielded at all by an infinite tube (S = 1 for any µr); only eddy
     * currents shield it. Real tubes of finite length do shield an axial static field,
     * through their open ends' demagnetisation, which this model does not include.
     */
    CYLINDER_AXIAL
}
