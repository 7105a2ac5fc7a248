/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of mass per area (areal mass, surface density). */
public enum ArealMassUnit implements Unit {
    /** gram per square metre; also read as "g/m2" or "g/m^2". */
    GRAM_PER_SQUARE_METRE("g/m²", 0.001, List.of("g/m2", "g/m^2")),
    /** kilogram per square metre, the SI unit; also read as "kg/m2" or "kg/m^2". */
    KILOGRAM_PER_SQUARE_METRE("kg/m²", 1, List.of("kg/m2", "kg/m^2"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    ArealMassUnit(String symbol, double toSi, List<String> aliases) {
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
