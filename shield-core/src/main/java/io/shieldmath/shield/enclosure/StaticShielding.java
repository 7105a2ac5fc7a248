/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.internal.RadialChain;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.ShieldingFactor;
import java.util.List;
import java.util.Locale;

/**
 * The static shielding of a shell, linear µ (each wall's µ'(0)), with the usual
 * approximations beside the exact value so they can be compared.
 *
 * <ul>
 *   <li>{@link #shieldingFactor()}: exact, by matching the dipole (l = 1) or m = 1 terms
 *       at every boundary. For one sphere of radii a &lt; b it equals
 *       S = [(2µr+1)(µr+2) − 2(a/b)³(µr−1)²]/(9µr) (J. D. Jackson, Classical
 *       Electrodynamics, 3rd ed., §5.12); for one long cylinder across the field
 *       S = [(µr+1)² − (a/b)²(µr−1)²]/(4µr); along the field S = 1.</li>
 *   <li>{@link #thinShellFactor(int)}: one wall alone, thin-shell limit
 *       1 + (2/3)µr·t/R (sphere), 1 + µr·t/D (cylinder, D = 2R), R the mean radius;
 *       valid for t ≪ R.</li>
 *   <li>{@link #productFactor()}: the product of each wall's exact single-shell factor,
 *       which overstates nested shells.</li>
 *   <li>{@link #spacedProductFactor()}: the product with a spacing penalty
 *       Π S_i · Π [1 − (R_i/R_{i+1})^n], n = 3 for spheres and 2 for cylinders
 *       (T. J. Sumner, J. M. Pendlebury, K. F. Smith, J. Phys. D 20 (1987) 1095;
 *       from memory); valid when every S_i ≫ 1.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe.
 */
public final class StaticShielding implements ShieldingResult {


    private final Shell shell;
    private final double logS;
    private final double[] wallLogFlux;

    StaticShielding(Shell shell, double logS, double[] wallLogFlux) {
        this.shell = shell;
        this.logS = logS;
        this.wallLogFlux = wallLogFlux;
    }

    /**
     * The shell.
     *
     * @return the shell
     */
    public Shell shell() {
        return shell;
    }

    /**
     * The exact shielding factor S (applied field over the field at the centre).
     *
     * @return S, 1 or more for walls with µr ≥ 1
     */
    @Override
    public ShieldingFactor shieldingFactor() {
        return ShieldingFactor.of(factor());
    }

    /**
     * The exact shielding factor as a plain number.
     *
     * @return S
     */
    public double factor() {
        return Math.exp(logS);
    }

    /**
     * The exact shielding effectiveness 20·log10 S in dB.
     *
     * @return SE
     */
    @Override
    public double shieldingEffectivenessDb() {
        return Numerics.DB_PER_NEPER * logS;
    }

    /**
     * The exact shielding effectiveness.
     *
     * @return SE
     */
    @Override
    public Decibels shieldingEffectiveness() {
        return Decibels.of(shieldingEffectivenessDb());
    }

    /**
     * The exact factor of one wall alone (the others removed).
     *
     * @param wall the wall's index, 0 for the innermost
     * @return S of that wall alone
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public double singleWallFactor(int wall) {
        int i = shell.wallLayer[wall];
        return Math.exp(RadialChain.logShielding(shell.geometryCode, new double[] {shell.inner[i]},
                new double[] {shell.outer[i]}, new double[] {0}, new PermeabilityModel[] {shell.mu[i]}, 0, true,
                null, null));
    }

    /**
     * The thin-shell factor of one wall alone: 1 + (2/3)µr·t/R (sphere), 1 + µr·t/(2R)
     * (cylinder across the field), 1 (cylinder along the field); R is the mean radius.
     *
     * @param wall the wall's index, 0 for the innermost
     * @return the thin-shell factor
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public double thinShellFactor(int wall) {
        Wall w = shell.walls().get(wall);
        return Kaden.staticFactor(shell.geometry(), w.medium().permeability().staticValue(), w.meanMetres(),
                w.thicknessMetres());
    }

    /**
     * The product of the walls' exact single-shell factors.
     *
     * @return Π S_i
     */
    public double productFactor() {
        double p = 1;
        for (int i = 0; i < shell.walls().size(); i++) {
            p *= singleWallFactor(i);
        }
        return p;
    }

    /**
     * The product of the single-shell factors with the spacing penalty of nested shells,
     * Π S_i · Π [1 − (R_i/R_{i+1})^n], R the mean radii, n = 3 (sphere), 2 (cylinder
     * across the field), no penalty along the field (see the class notes; from memory).
     *
     * @return the approximate factor
     */
    public double spacedProductFactor() {
        List<Wall> w = shell.walls();
        int n = shell.geometry() == ShellGeometry.SPHERE ? 3 : 2;
        double p = productFactor();
        if (shell.geometry() == ShellGeometry.CYLINDER_AXIAL) {
            return p;
        }
        for (int i = 0; i + 1 < w.size(); i++) {
            p *= 1 - Math.pow(w.get(i).meanMetres() / w.get(i + 1).meanMetres(), n);
        }
        return p;
    }

    /** ln of the mean tangential flux density in layer i over the applied flux density. */
    double wallLogFlux(int layer) {
        return wallLogFlux[layer];
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "static S %.4g (%.2f dB); product %.4g, spaced product %.4g", factor(),
                shieldingEffectivenessDb(), productFactor(), spacedProductFactor());
    }
}
