/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * shield-cli: the {@code shield-batch} command, which evaluates a JSON design file of any kind at
 * frequencies and prints CSV or JSON for instrument software and scripts. Its entry point
 * is {@link io.shieldmath.shield.cli.BatchCommand}.
 */
module io.shieldmath.shield.cli {
    requires io.shieldmath.shield.materials;
    requires io.shieldmath.shield.axisymmetric;

    exports io.shieldmath.shield.cli;
}
