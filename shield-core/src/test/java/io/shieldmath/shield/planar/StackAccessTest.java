/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import io.shieldmath.shield.internal.StackAccess;
import io.shieldmath.shield.internal.StackArrays;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Length;
import org.junit.jupiter.api.Test;

/**
 * The coil coupling reads the arrays a barrier already holds through {@link StackAccess}
 * instead of building its own copy: the object handed out is the barrier's own, and the
 * reader cannot be replaced once the barrier class has registered it.
 */
class StackAccessTest {

    private static final Barrier BARRIER = Barrier.of(Medium.AIR, Length.ofMillimetres(1))
            .thenGap(Length.ofMillimetres(2));

    @Test
    void handsOutTheBarriersOwnArrays() {
        assertSame(BARRIER.stack, StackAccess.ofBarrier(BARRIER));
    }

    @Test
    void theReaderIsSetOnce() {
        assertThrows(IllegalStateException.class, () -> StackAccess.registerBarrier(b -> (StackArrays) null));
    }

    @Test
    void refusesWhatIsNotABarrier() {
        assertThrows(NullPointerException.class, () -> StackAccess.ofBarrier(null));
        assertThrows(ClassCastException.class, () -> StackAccess.ofBarrier("a barrier"));
    }
}
