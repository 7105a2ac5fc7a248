/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/**
 * A unit of one kind of quantity, as data: its printed symbol, the other spellings that
 * {@code parse} accepts, and its size in the SI unit of that kind.
 *
 * <p>Every implementation in this library is an enum, immutable and thread-safe.
 */
public interface Unit {

    /**
     * The symbol that {@code toString} prints, for example {@code "kHz"} or {@code "µm"}.
     *
     * @return the symbol, never empty
     */
    String symbol();

    /**
     * The size of one of this unit in the SI unit of its kind, for example 1000 for kHz
     * or 25.4e-6 for mil.
     *
     * @return the factor to SI, finite and greater than zero
     */
    double toSi();

    /**
     * The spellings accepted by {@code parse} besides {@link #symbol()}; matching ignores
     * case only where the unit list of the kind says so.
     *
     * @return the aliases, possibly empty, never null
     */
    List<String> aliases();
}
