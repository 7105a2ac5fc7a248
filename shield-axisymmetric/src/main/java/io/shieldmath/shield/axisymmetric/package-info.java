/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
/**
 * Finite shields of revolution: discs, annular plates, tubes, caps and cans on one axis,
 * between two coaxial coils or in a uniform axial field, solved by axisymmetric finite
 * elements; and in a uniform field across the axis.
 *
 * <pre>{@code
 * CoilPair pair = CoilPair.coaxial(Coil.loop(mm(10), 20), Coil.loop(mm(10), 20), mm(50));
 * CouplingSolution r = Arrangement.of(Body.disc("plate", copper, mm(25), mm(2)))
 *         .between(pair).withTolerance(Decibels.of(0.1)).at(kHz(10));
 * r.insertionLossEstimated();          // about 10 dB ± its discretisation estimate
 *
 * AxialFieldSolution s = Arrangement.of(Body.can("can", alloy, mm(20), mm(1), mm(42)))
 *         .inUniformAxialField().sensing(SensorRegion.cylinder(mm(5), mm(10))).magnetostatic();
 * s.worstShieldingFactor();
 * }</pre>
 *
 * <p>{@link io.shieldmath.shield.axisymmetric.BenchPrediction} answers what a round plate
 * should read between two coils: the solver's finite-plate insertion loss with its
 * discretisation estimate beside the infinite-sheet figure, and a verdict on bench readings
 * against the finite plate ({@link io.shieldmath.shield.axisymmetric.BenchAgreement}).
 *
 * <h2>Method</h2>
 * The field is quasi-static and time-harmonic (phasors e^{jωt}). The only unknown is the
 * azimuthal vector potential A = A_φ(r, z); B_r = −∂A/∂z and B_z = (1/r)·∂(rA)/∂r. Galerkin's
 * method with bilinear elements on a rectangular grid solves, per radian,
 * ∫ ν[(∂A/∂z)(∂v/∂z) + (∂A/∂r + A/r)(∂v/∂r + v/r)] r dr dz + jω∫ σAv r dr dz = ∫ J v r dr dz,
 * ν = 1/(µ0·µr(f)) complex from each body's permeability model, σ its conductivity; at 0 Hz
 * the eddy term vanishes and the solve is magnetostatic. The standard derivation is in, for
 * example, P. P. Silvester and R. L. Ferrari, <i>Finite Elements for Electrical Engineers</i>
 * (axisymmetric vector potential), and the coil-over-conductor problem it generalises in C. V.
 * Dodd and W. E. Deeds, J. Appl. Phys. 39 (1968) 2829.
 * <ul>
 *   <li>Grid: a tensor grid whose lines include every body face, every coil winding and the
 *       sensor region's ends. Element sizes follow a size function that grows geometrically
 *       (factor 1.2 at the default fineness) away from each face: at a conductor face the first
 *       element is δ/10, through a conductor's thickness it stays at most δ/12 (δ the skin
 *       depth); coils ask for a twenty-fourth of their radius. The convergence study in the
 *       tests found that 6 elements per skin depth through a 4.8 δ copper plate leave 0.05 dB
 *       of error, 12 leave 0.015 dB.</li>
 *   <li>Open boundary: A = 0 (coils) or A = B0·r/2 (uniform field) on a box 40 half-extents
 *       of the geometry away; the truncation error of the free-space coupling, measured against
 *       Maxwell's closed form, is below 2e-4.</li>
 *   <li>Solve: the matrix is complex symmetric with a positive definite real part, so LDLᵀ
 *       without pivoting exists (N. J. Higham, Math. Comp. 67 (1998) 1591); a band
 *       factorisation on primitive arrays, unknowns numbered along the grid's shorter side,
 *       then one step of iterative refinement. A sweep builds the grid, numbering, band layout,
 *       element matrices and the free-space reference once.</li>
 *   <li>Estimates: every result is computed on two meshes, element sizes √2 apart; the change
 *       is its discretisation estimate. {@code withTolerance} refines until the change is within
 *       the tolerance, or throws {@link io.shieldmath.shield.axisymmetric.ToleranceNotReachedException}
 *       with the best value reached.</li>
 * </ul>
 *
 * <h2>Limits</h2>
 * Quasi-static: the bodies and coils together must be small against the wavelength,
 * k0·D ≤ 0.1 (D their largest extent; about 48 MHz for D = 0.1 m); higher frequencies are
 * refused. Linear media, except in {@link io.shieldmath.shield.axisymmetric.SaturationStudy}
 * (magnetization curves in a uniform axial field; static by Newton's method, at frequency by
 * the effective-permeability approximation); no hysteresis beyond the permeability model's
 * loss part. Bodies of revolution about the coils' axis only: a slot, a seam or an off-axis
 * hole needs a three-dimensional model. A uniform field across the axis is solved by
 * {@link io.shieldmath.shield.axisymmetric.TransverseFieldShielding} as the first azimuthal
 * mode: the magnetic scalar potential statically, and with eddy currents at frequency the
 * vector potential inside the conductors coupled to the scalar potential outside them. A coil with a winding section
 * carries a uniform current density; the coils' own resistance is not modelled. Results are
 * estimates for idealised geometry: real shields are limited by seams, fasteners and the
 * alloy's handling, and must be verified by measurement.
 *
 * <h2>Checks</h2>
 * The tests compare against Maxwell's (Neumann's) mutual inductance of coaxial circles, the
 * exact infinite-sheet model (J. R. Moser, IEEE Trans. EMC 9 (1967) 6), an independent
 * coupled-circuit model of a finite disc (after Miller and Bridges; self-inductance from the
 * geometric mean distance, F. W. Grover, <i>Inductance Calculations</i>, 1946), A. Mager's
 * capped-cylinder formula (IEEE Trans. Magn. 6 (1970) 67), and the decay of the field in a
 * long open tube with the first zeros of J0 and J1 (Abramowitz and Stegun, table 9.5). The
 * transverse solves are checked against the exact infinitely long cylinder across the field
 * (static, complex µ, conducting), against J. D. Jackson's spherical shell (<i>Classical
 * Electrodynamics</i>, 3rd ed., §5.12; a staircase of rings, both directions), and against
 * the decay with the first zeros of J1 (high-µ wall) and J1′ (conducting wall).
 *
 * <p>Every type is immutable and thread-safe.
 */
package io.shieldmath.shield.axisymmetric;
