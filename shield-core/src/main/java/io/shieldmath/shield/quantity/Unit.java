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
     * The spellings accepted by {@code parse} besides {@link #symbol()}. Case matters in
     * prefixes and one-letter symbols; the letters of unit words of two or more letters may
     * be written in another case where that is unambiguous among the units of the kind
     * ({@code "10 khz"} reads, {@code "1 mhz"} and {@code "5 mS/m"} as MS/m do not).
     *
     * @return the aliases, possibly empty, never null
     */
    List<String> aliases();

    /**
     * The zero offset of this unit in the SI unit of its kind: a value {@code v} in this
     * unit is {@code v·toSi() + offset()} in SI units. Zero for every unit but the kelvin,
     * whose offset is −273.15 against the degree Celsius in which {@link Temperature} is held.
     *
     * @return the offset, finite; 0 by default
     */
    default double offset() {
        return 0;
    }
}
