/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of electric current. */
public enum CurrentUnit implements Unit {
    /** milliampere. */
    MILLIAMPERE("mA", 0.001, List.of()),
    /** ampere, the SI unit. */
    AMPERE("A", 1, List.of());

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    CurrentUnit(String symbol, double toSi, List<String> aliases) {
        this.symbol = symbol;
        this.toSi = toSi;
        this.aliases = aliases;
    }

    @Override
    public String symbol() {
        return symbol;
    }

    @Override
    public double toSi() {
        return toSi;
    }

    @Override
    public List<String> aliases() {
        return aliases;
    }

}
