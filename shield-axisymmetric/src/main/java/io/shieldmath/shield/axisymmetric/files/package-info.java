/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Whole designs in one file: a planar stack, a closed shell with its openings, or an
 * axisymmetric arrangement of finite bodies between coils or in a uniform applied field (along
 * the axis, across it, or the worse of the two), each
 * with the band to evaluate and every source case it must meet.
 * {@link io.shieldmath.shield.axisymmetric.files.WholeDesignFile} reads and writes every kind
 * (version 3 of the design format; versions 1 and 2 are still read), and
 * {@link io.shieldmath.shield.axisymmetric.files.WholeDesign#model()} evaluates every kind
 * through the common {@link io.shieldmath.shield.model.ShieldingModel} contract.
 *
 * <p>This package lives in shield-axisymmetric, not beside the planar design file in
 * shield-materials, because of the direction of the module dependencies: shield-axisymmetric
 * already uses shield-materials (its tests use the catalogue), so shield-materials cannot
 * depend on the solver without a cycle, and the catalogue module stays free of the finite
 * element code.
 */
package io.shieldmath.shield.axisymmetric.files;
