/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of voltage. */
public enum VoltageUnit implements Unit {
    /** microvolt; also read as "uV" or "μV" (Greek mu). */
    MICROVOLT("µV", 1e-06, List.of("uV")),
    /** millivolt. */
    MILLIVOLT("mV", 0.001, List.of()),
    /** volt, the SI unit. */
    VOLT("V", 1, List.of());

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    VoltageUnit(String symbol, double toSi, List<String> aliases) {
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
