/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Not API: hooks of the solver for this library's own command line (exported only to
 * {@code io.shieldmath.shield.cli}); they may change or go without notice.
 */
package io.shieldmath.shield.axisymmetric.internal;
