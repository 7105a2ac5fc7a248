/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Not part of the API: the located JSON reader and the parts of the file formats shared by
 * this library's own modules (exported only to shield-axisymmetric, whose whole-design files
 * hold axisymmetric arrangements). May change without notice.
 */
package io.shieldmath.shield.materials.internal;
