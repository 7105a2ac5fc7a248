/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The quadrature rule for the spectral coupling integral of one coil pair, fixed by the
 * geometry alone: nodes λ_k and weights W_k that already hold the geometric kernel, so that
 * M = Σ_k W_k·F(λ_k) for any stack transmission F (F = 1 in free space). Built once per
 * coil pair; each frequency then costs only F at the nodes.
 *
 * <p>The kernel is µ0·π·P_tx(λ)·P_rx(λ)·e^{−λs}, P(λ) = Σ_rings N_i·a_i·J1(λ·a_i)·e^{−λ·u_i}, where
 * s is the gap between the nearest ring planes of the two coils and u_i the depth of ring i
 * behind its coil's nearest plane (so the ring pairs' plane separations are s + u_i + u_j).
 *
 * <p>Panels on the λ axis (scales: ρ the largest ring radius, s the gap, H = 6/max(ρ, s)):
 * <ul>
 *   <li>[0, H/4]: geometrically graded panels [H/4^{j+2}, H/4^{j+1}] down to H·4^{−10}, and one
 *       panel from 0 to there, {@value #GRADED_NODES}-point Gauss–Legendre each. The grading
 *       resolves the stack's small-λ scales (the eddy-current pole near λ = ωµ0σt/2 of a thin
 *       sheet, the 2/(µr·t) roll-off of a high-permeability sheet, the skin-depth scale), which
 *       may lie decades below 1/ρ; features of F have a width comparable with their position,
 *       so a constant ratio between panel ends resolves them wherever they fall.</li>
 *   <li>or, when every feature scale of the stack at the frequency evaluated is above 2H
 *       (see {@link SpectralChain}), [0, H/4] as one {@value #UNIFORM_NODES}-point panel;</li>
 *   <li>[H/4, 26/s]: equal panels of width H, {@value #UNIFORM_NODES}-point Gauss–Legendre,
 *       each spanning at most 6 radians of the kernel's fastest oscillation J1(λρ)² ~ sin(2λρ)
 *       and a factor e^{−6} of its decay. Beyond 26/s the kernel is below e^{−26} ≈ 5e-12
 *       of its size near λ = 0 (the stack transmission is bounded by about 1), so the tail is
 *       dropped; where the tail decays only as e^{−λs} times a power of λ this leaves a
 *       relative error below 1e-9.</li>
 * </ul>
 * Immutable and thread-safe.
 */
public final class SpectralRule {

    /** The number of geometrically graded panels near λ = 0. */
    public static final int GRADED_PANELS = 9;
    /** Gauss–Legendre nodes per graded panel. */
    public static final int GRADED_NODES = 8;
    /** Gauss–Legendre nodes per equal panel. */
    public static final int UNIFORM_NODES = 12;
    /** H·max(ρ, s): the equal panels' width H is this over the larger of the largest ring radius ρ and the gap s. */
    public static final double PANEL_SCALE = 6;
    /** λ·s where the spectrum is cut: beyond it the kernel is below e^{−26} ≈ 5e-12 of its size near λ = 0. */
    public static final double CUT_OFF = 26;

    private static final GaussLegendre GRADED = new GaussLegendre(GRADED_NODES);
    private static final GaussLegendre UNIFORM = new GaussLegendre(UNIFORM_NODES);

    /** The nodes λ_k in 1/m, increasing. */
    public final double[] lambda;
    /** The weights including the kernel, in H·m (so Σ W_k·F(λ_k) is in henries). */
    public final double[] weight;
    /** The first node of the graded panels; nodes before it form the single panel over [0, H/4]. */
    public final int gradedFrom;
    /** The first node of the equal panels. */
    public final int uniformFrom;
    /**
     * The smallest feature scale of the stack (in 1/m) for which the single panel over
     * [0, H/4] replaces the graded ones: 2H, eight times the panel's length, so that the
     * transmission is analytic in a disc of radius 2H about λ = 0 and the 12-point rule
     * on the panel converges like 5.8^{−24}.
     */
    public final double smoothScale;
    /** Σ W_k over the graded and equal panels: the free-space mutual inductance by this rule, in H. */
    public final double freeSpace;
    /** The same with the single panel over [0, H/4] in place of the graded ones, in H. */
    public final double freeSpaceCoarse;

    /**
     * The rule for two coils given as rings.
     *
     * @param txRadius radius of each transmitter ring, m
     * @param txDepth  depth of each transmitter ring behind its coil's plane nearest the receiver, m
     * @param txTurns  turns per transmitter ring
     * @param rxRadius radius of each receiver ring, m
     * @param rxDepth  depth of each receiver ring behind its coil's plane nearest the transmitter, m
     * @param rxTurns  turns per receiver ring
     * @param gap      the gap s between the nearest ring planes of the two coils, m
     */
    public SpectralRule(double[] txRadius, double[] txDepth, double txTurns, double[] rxRadius, double[] rxDepth,
                 double rxTurns, double gap) {
        double rho = 0;
        for (double r : txRadius) {
            rho = Math.max(rho, r);
        }
        for (double r : rxRadius) {
            rho = Math.max(rho, r);
        }
        double h = PANEL_SCALE / Math.max(rho, gap);
        double top = CUT_OFF / gap;
        double start = 0.25 * h;
        int uniform = Math.max(1, (int) Math.ceil((top - start) / h));
        int n = UNIFORM_NODES + (GRADED_PANELS + 1) * GRADED_NODES + uniform * UNIFORM_NODES;
        lambda = new double[n];
        weight = new double[n];
        smoothScale = 8 * start;
        // [0, H/4] in one panel, used when the stack has no feature near that range.
        int k = panel(UNIFORM, 0, start, 0);
        gradedFrom = k;
        // Graded panels, from 0 upwards.
        double lo = 0;
        double hi = start * Math.pow(4, -GRADED_PANELS);
        for (int p = 0; p <= GRADED_PANELS; p++) {
            k = panel(GRADED, lo, hi, k);
            lo = hi;
            hi *= 4;
        }
        uniformFrom = k;
        for (int p = 0; p < uniform; p++) {
            k = panel(UNIFORM, start + h * p, start + h * (1 + p), k);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double l = lambda[i];
            double kernel = PhysicalConstants.MU_0 * Math.PI * txTurns * rxTurns
                    * spectrum(txRadius, txDepth, l) * spectrum(rxRadius, rxDepth, l) * Math.exp(-l * gap);
            weight[i] *= kernel;
        }
        for (int i = gradedFrom; i < n; i++) {
            sum += weight[i];
        }
        freeSpace = sum;
        double coarse = 0;
        for (int i = 0; i < n; i++) {
            coarse += i < gradedFrom || i >= uniformFrom ? weight[i] : 0;
        }
        freeSpaceCoarse = coarse;
    }

    private int panel(GaussLegendre rule, double lo, double hi, int k) {
        double mid = 0.5 * (lo + hi);
        double half = 0.5 * (hi - lo);
        for (int i = 0; i < rule.x.length; i++) {
            lambda[k] = mid + half * rule.x[i];
            weight[k] = half * rule.w[i];
            k++;
        }
        return k;
    }

    /** Σ a_i·J1(λ·a_i)·e^{−λ·u_i} over one coil's rings (turns per ring factored out). */
    private static double spectrum(double[] radius, double[] depth, double l) {
        double s = 0;
        for (int i = 0; i < radius.length; i++) {
            s += radius[i] * Bessel.j1(l * radius[i]) * Math.exp(-l * depth[i]);
        }
        return s;
    }

    /**
     * The number of nodes.
     *
     * @return the size
     */
    public int size() {
        return lambda.length;
    }
}
