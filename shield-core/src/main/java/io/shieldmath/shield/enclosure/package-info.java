/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Enclosures: closed shells in static and alternating magnetic fields, saturation of
 * their walls, and the openings and seams through which field leaks in.
 *
 * <h2>Closed shells</h2>
 * A {@link io.shieldmath.shield.enclosure.Shell} is a sphere, an infinitely long cylinder
 * (field across or along its axis) or a closed box (as its equivalent sphere of radius
 * half its longest side; common practice, no source; aspect ratio up to 3) of one to
 * eight concentric walls with air gaps. Its shielding factor S is the applied uniform
 * field over the field at the centre.
 * <ul>
 *   <li>Static fields, {@link io.shieldmath.shield.enclosure.Shell#staticShielding()}:
 *       exact for linear µ (each wall's µ'(0)), by matching the dipole terms at every
 *       boundary; for one sphere this is S = [(2µr+1)(µr+2) − 2(a/b)³(µr−1)²]/(9µr)
 *       (J. D. Jackson, Classical Electrodynamics, §5.12), for one cylinder across the
 *       field S = [(µr+1)² − (a/b)²(µr−1)²]/(4µr). Beside it: the thin-shell limits
 *       1 + (2/3)µr·t/R and 1 + µr·t/D, the plain product of single-shell factors and the
 *       product with the spacing penalty of nested shells (Sumner, Pendlebury and Smith,
 *       J. Phys. D 20 (1987) 1095; from memory).</li>
 *   <li>Alternating fields, {@link io.shieldmath.shield.enclosure.Shell#at}: the same
 *       boundary matching with the complex wavenumber k = sqrt(jωµ0µrσ) of each wall, µr
 *       from the wall's permeability model at that frequency. Inside each wall the radial
 *       Bessel equation is solved on sublayers 0.001 thick in ln r with k²r² frozen in
 *       each (error below 1e-5 of ln S against the closed-form Bessel solution of the sphere; exact for σ = 0); nested shells are therefore
 *       as exact as single ones. Validity: quasi-static, k0·R ≤ 0.1 (flagged in
 *       {@link io.shieldmath.shield.enclosure.ShellResult#warnings()}); linear, isotropic
 *       walls. Each wall's Kaden thin-shell factor (H. Kaden, Wirbelströme und Schirmung
 *       in der Nachrichtentechnik, 1959), valid for t ≪ R, is given beside it:
 *       cosh(kt) + ⅓(kR/µr + 2µr/(kR))·sinh(kt) (sphere),
 *       cosh(kt) + ½(kR/µr + µr/(kR))·sinh(kt) (cylinder, across),
 *       cosh(kt) + (kR/(2µr))·sinh(kt) (cylinder, along); R the mean radius.</li>
 *   <li>Saturation, {@link io.shieldmath.shield.enclosure.Shell#saturation}: the wall
 *       flux density in a static ambient field against the alloy's saturation flux
 *       density, a warning from 50 % of it, and a suggested minimum thickness; see
 *       {@link io.shieldmath.shield.enclosure.SaturationCheck}.</li>
 * </ul>
 *
 * <h2>Openings and leakage paths</h2>
 * An {@link io.shieldmath.shield.enclosure.Enclosure} is a shell with
 * {@link io.shieldmath.shield.enclosure.Opening}s: holes, slots, seams, arrays of equal
 * holes, optionally behind a tube below cut-off. Facing an incident wave the wall is the
 * planar barrier of the shell's layers and the openings follow the aperture rules
 * (Ott 2009, ch. 6); in a uniform low-frequency magnetic field the wall is the shell and
 * holes leak by Bethe's small-aperture polarizability. The wall and every opening are
 * combined as field amplitudes (worst case: the magnitudes add; root-sum-square on
 * request, {@link io.shieldmath.shield.enclosure.PathSum}); the result names each path's
 * share and the path that limits the enclosure.
 *
 * <h2>Cautions</h2>
 * Results are estimates for idealised geometry: real enclosures are limited by seams,
 * openings, fasteners, gaskets, cable penetrations and field leaking around edges, and
 * must be verified by measurement (for enclosures IEEE Std 299). High-permeability alloys
 * lose permeability with frequency, with flux density and with mechanical stress (bending
 * and drilling after annealing); a saturated or stressed wall shields far less than the
 * linear model says. Mains-frequency sources, power electronics and induction coils carry
 * hazardous voltages and currents; strong low-frequency magnetic fields and RF fields
 * have exposure limits (ICNIRP guidelines, IEEE C95.1). Shielding for medical,
 * life-safety or regulatory compliance work must follow the applicable local codes and
 * licensed, qualified practice; this package does not replace them.
 *
 * <p>All types are immutable and thread-safe.
 */
package io.shieldmath.shield.enclosure;
