/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Bench measurements against a model: receive-coil voltage readings with their
 * uncertainty ({@link io.shieldmath.shield.bench.VoltageReading}), the measured insertion
 * loss and its interval, and a verdict against a model's prediction
 * ({@link io.shieldmath.shield.bench.BenchComparison}, {@link io.shieldmath.shield.bench.BenchVerdict}).
 * The model here is the infinite sheet; what a finite round plate should read between the
 * same coils, and the verdict against it, come from {@code BenchPrediction} in the module
 * {@code shield-axisymmetric}, which holds its readings against the finite plate with the
 * same interval.
 *
 * <p>Cautions: drive coils and their amplifiers carry hazardous currents and voltages, and
 * strong alternating fields heat plates; follow the local electrical-safety codes and
 * exposure limits (ICNIRP guidelines, IEEE C95.1) for the bench.
 */
package io.shieldmath.shield.bench;
