/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

/**
 * How the field amplitudes that reach the victim through the wall and through each
 * opening are combined. Each path i lets through a fraction τ_i = 10^(−SE_i/20) of the
 * field; the enclosure lets through τ, and SE = −20·log10 τ.
 */
public enum PathSum {
    /**
     * The worst case, and the default: the magnitudes add, τ = Σ τ_i (all paths in phase),
     * capped at 1 (0 dB: the enclosure is not taken to raise the field).
     */
    MAGNITUDES,
    /**
     * Root-sum-square, τ = sqrt(Σ τ_i²): paths of unrelated phase, a typical rather than a
     * worst case. Also capped at 1.
     */
    ROOT_SUM_SQUARE
}
