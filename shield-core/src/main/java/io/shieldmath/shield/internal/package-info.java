/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * What the library's packages share and users do not see: the argument checks, the one
 * text grammar of quantities, the numeric constants and kernels, the primitive layer
 * arrays of a stack and the accessor through which other packages read a barrier's arrays
 * ({@link io.shieldmath.shield.internal.StackAccess}). Not exported, except to this library's own modules; nothing here is
 * API and any of it may change in any release.
 *
 * <p>Dependencies: this package uses only {@code quantity}'s {@code Unit} and
 * {@code InvalidQuantityException} (and, for the kernels, {@code medium}'s
 * permeability models); the physics packages above it stay acyclic.
 */
package io.shieldmath.shield.internal;
