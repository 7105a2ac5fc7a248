/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * A user's program as a JPMS module: it requires the published modules by the names the
 * README gives.
 */
module consumer.app {
    requires io.shieldmath.shield.materials;
    requires io.shieldmath.shield.axisymmetric;
    requires io.shieldmath.shield.cli;
}
