/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import java.util.Objects;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;

/**
 * Hands a barrier's {@link StackArrays} to other packages of this library without a public
 * accessor on the barrier: the barrier class registers, once, when it is initialised, how
 * its arrays are read; a model in another package (the coil coupling) then reads the arrays
 * the barrier already holds instead of building a second copy. This package is not
 * exported, so users cannot reach it.
 *
 * <p>The parameter is typed {@code Object} because this package must not depend on
 * {@code planar} (the package graph stays acyclic); the registered reader casts. Whoever
 * holds a barrier has caused its class to be initialised, so the reader is registered
 * before the first call. The reader is set once and never changes; thread-safe.
 */
public final class StackAccess {

    private static final AtomicReference<Function<Object, StackArrays>> BARRIER = new AtomicReference<>();

    private StackAccess() {
    }

    /**
     * Registers how a barrier's arrays are read; called once, by the barrier class's static
     * initialiser.
     *
     * @param reader the barrier's arrays from a barrier, not null
     * @throws IllegalStateException if a reader is already registered
     * @throws NullPointerException if {@code reader} is null
     */
    public static void registerBarrier(Function<Object, StackArrays> reader) {
        if (!BARRIER.compareAndSet(null, Objects.requireNonNull(reader, "reader"))) {
            throw new IllegalStateException("the barrier's stack reader is already registered");
        }
    }

    /**
     * The arrays a barrier holds (the same object, not a copy).
     *
     * @param barrier a {@code planar.Barrier}, not null
     * @return its stack arrays
     * @throws NullPointerException if {@code barrier} is null
     * @throws ClassCastException if it is not a barrier
     */
    public static StackArrays ofBarrier(Object barrier) {
        return BARRIER.get().apply(Objects.requireNonNull(barrier, "barrier"));
    }
}
