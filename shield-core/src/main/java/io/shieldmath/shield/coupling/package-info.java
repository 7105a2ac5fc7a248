/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Coil to coil through an infinite planar barrier: the exact quasi-static mutual inductance
 * of coaxial coils with any planar stack between them (spectral integral over TE waves),
 * the insertion loss, the induced voltage for a drive current, the transmission-line
 * estimate beside it, and the comparison of bench readings with the model.
 *
 * <pre>{@code
 * CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 20), Coil.loop(mm(15), 20), mm(30));
 * CouplingResult r = pair.through(Barrier.of(copper, mm(0.5))).at(kHz(10));
 * r.shieldingEffectivenessDb();
 * }</pre>
 */
package io.shieldmath.shield.coupling;
