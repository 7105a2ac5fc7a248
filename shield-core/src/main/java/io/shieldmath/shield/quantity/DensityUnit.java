/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of mass density. */
public enum DensityUnit implements Unit {
    /** kilogram per cubic metre, the SI unit; also read as "kg/m3" or "kg/m^3". */
    KILOGRAM_PER_CUBIC_METRE("kg/m³", 1, List.of("kg/m3", "kg/m^3")),
    /** gram per cubic centimetre, 1000 kg/m³; also read as "g/cm3", "g/cm^3" or "g/cc". */
    GRAM_PER_CUBIC_CENTIMETRE("g/cm³", 1000, List.of("g/cm3", "g/cm^3", "g/cc"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    DensityUnit(String symbol, double toSi, List<String> aliases) {
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
