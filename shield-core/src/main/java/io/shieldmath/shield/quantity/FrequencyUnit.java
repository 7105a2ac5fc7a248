/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of frequency. */
public enum FrequencyUnit implements Unit {
    /** millihertz. */
    MILLIHERTZ("mHz", 1e-3),
    /** hertz, the SI unit. */
    HERTZ("Hz", 1),
    /** kilohertz. */
    KILOHERTZ("kHz", 1e3),
    /** megahertz. */
    MEGAHERTZ("MHz", 1e6),
    /** gigahertz. */
    GIGAHERTZ("GHz", 1e9);

    private final String symbol;
    private final double toSi;

    FrequencyUnit(String symbol, double toSi) {
        this.symbol = symbol;
        this.toSi = toSi;
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
        return List.of();
    }
}
