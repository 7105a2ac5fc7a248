/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

import io.shieldmath.shield.medium.PermeabilityModel;

/**
 * The geometry handed to the mesher, reduced to what it needs: rectangles of the (r, z)
 * half-plane, each of a material, the coils' winding sections, and extra coordinates that
 * must be grid lines. Plain arrays, filled once by the public layer and never changed after.
 *
 * <p>Material 0 is air; rectangle material indices start at 1. A coil section of zero
 * width and length is a thin loop; of zero width only, a current sheet on a cylinder; of
 * zero length only, a flat spiral sheet.
 */
public final class Layout {

    final double[] r0;
    final double[] r1;
    final double[] z0;
    final double[] z1;
    final int[] material;
    final double[] sigma;
    final PermeabilityModel[] mu;
    final double[] coilR0;
    final double[] coilR1;
    final double[] coilZ0;
    final double[] coilZ1;
    final double[] coilTurns;
    final double[] keyR;
    final double[] keyZ;

    /**
     * Wraps the arrays (not copied; the caller hands them over).
     *
     * @param r0        inner radius of each rectangle, m
     * @param r1        outer radius of each rectangle, m
     * @param z0        lower axial end of each rectangle, m
     * @param z1        upper axial end of each rectangle, m
     * @param material  the material of each rectangle, 1 … sigma.length − 1
     * @param sigma     conductivity of each material in S/m, index 0 air (0)
     * @param mu        permeability model of each material, index 0 air
     * @param coilR0    inner radius of each coil section, m
     * @param coilR1    outer radius of each coil section, m
     * @param coilZ0    lower end of each coil section, m
     * @param coilZ1    upper end of each coil section, m
     * @param coilTurns turns of each coil
     * @param keyR      extra radii that must be grid lines
     * @param keyZ      extra axial coordinates that must be grid lines
     */
    public Layout(double[] r0, double[] r1, double[] z0, double[] z1, int[] material, double[] sigma,
                  PermeabilityModel[] mu, double[] coilR0, double[] coilR1, double[] coilZ0, double[] coilZ1,
                  double[] coilTurns, double[] keyR, double[] keyZ) {
        this.r0 = r0;
        this.r1 = r1;
        this.z0 = z0;
        this.z1 = z1;
        this.material = material;
        this.sigma = sigma;
        this.mu = mu;
        this.coilR0 = coilR0;
        this.coilR1 = coilR1;
        this.coilZ0 = coilZ0;
        this.coilZ1 = coilZ1;
        this.coilTurns = coilTurns;
        this.keyR = keyR;
        this.keyZ = keyZ;
    }

    /**
     * The number of materials including air.
     *
     * @return the count
     */
    public int materialCount() {
        return sigma.length;
    }
}
