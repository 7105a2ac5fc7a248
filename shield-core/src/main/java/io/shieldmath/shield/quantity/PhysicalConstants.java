/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

/**
 * Physical constants in SI units, from the CODATA 2018 recommended values
 * (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)).
 */
public final class PhysicalConstants {

    /** Vacuum magnetic permeability µ0 in H/m (CODATA 2018: 1.25663706212e-6). */
    public static final double MU_0 = 1.25663706212e-6;

    /** Vacuum electric permittivity ε0 in F/m (CODATA 2018: 8.8541878128e-12). */
    public static final double EPSILON_0 = 8.8541878128e-12;

    /** Speed of light in vacuum c in m/s (exact by the definition of the metre). */
    public static final double SPEED_OF_LIGHT = 299_792_458.0;

    /** Impedance of free space η0 = sqrt(µ0/ε0) in Ω, about 376.730 Ω. */
    public static final double ETA_0 = Math.sqrt(MU_0 / EPSILON_0);

    /** The conductivity of the International Annealed Copper Standard, 58.0 MS/m (IEC 60028). */
    public static final double IACS_CONDUCTIVITY = 58.0e6;

    private PhysicalConstants() {
    }
}
