/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * The {@code shield-batch} command line tool: {@link io.shieldmath.shield.cli.BatchCommand}
 * evaluates a JSON design file at frequencies and prints CSV or JSON on standard output, with
 * located messages on standard error and documented exit codes.
 */
package io.shieldmath.shield.cli;
