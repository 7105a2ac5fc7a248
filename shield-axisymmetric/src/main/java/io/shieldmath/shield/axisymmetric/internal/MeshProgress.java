/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.internal;

import java.util.Objects;
import java.util.function.Supplier;

/**
 * Not API: a hook through which this library's own command line hears of each mesh the solver
 * builds while it works for it (the refinement stages of one evaluation, each with its
 * fineness and its number of unknowns), to report progress during a long solve. The package is
 * exported only to {@code io.shieldmath.shield.cli}; it may change or go without notice.
 *
 * <p>The listener belongs to the calling thread: {@link #during(Listener, Supplier)} sets it
 * for the work it runs and restores the previous one afterwards, so calls on other threads
 * never see it. Every solve of this module runs on its caller's thread; a solve moved to
 * another thread would go unreported, never misreported. Without a listener a mesh costs one
 * thread-local read more.
 */
public final class MeshProgress {

    /** Hears of each mesh built for a solve. */
    @FunctionalInterface
    public interface Listener {

        /**
         * A mesh has been built and is about to be solved.
         *
         * @param fineness the mesh fineness (element sizes ∝ 1/fineness), positive
         * @param unknowns the mesh's number of unknowns, positive
         */
        void meshBuilt(double fineness, int unknowns);
    }

    private static final ThreadLocal<Listener> CURRENT = new ThreadLocal<>();

    private MeshProgress() {
    }

    /**
     * Runs work with a listener for the meshes it builds on this thread.
     *
     * @param <T>      the work's result
     * @param listener the listener, not null; it should not throw (what it throws ends the work)
     * @param work     the work, not null
     * @return the work's result
     * @throws NullPointerException if an argument is null
     */
    public static <T> T during(Listener listener, Supplier<T> work) {
        Objects.requireNonNull(listener, "listener");
        Objects.requireNonNull(work, "work");
        Listener previous = CURRENT.get();
        CURRENT.set(listener);
        try {
            return work.get();
        } finally {
            if (previous == null) {
                CURRENT.remove();
            } else {
                CURRENT.set(previous);
            }
        }
    }

    /**
     * Tells this thread's listener, if any, of a mesh built: called by the solver, once per mesh.
     *
     * @param fineness the mesh fineness
     * @param unknowns the mesh's number of unknowns
     */
    public static void meshBuilt(double fineness, int unknowns) {
        Listener l = CURRENT.get();
        if (l != null) {
            l.meshBuilt(fineness, unknowns);
        }
    }
}
