/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
/**
 * Finite shields of revolution.
 */
package io.shieldmath.shield.axisymmetric;
