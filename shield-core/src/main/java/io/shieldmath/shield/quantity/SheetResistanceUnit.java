/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of sheet resistance (ohms per square). */
public enum SheetResistanceUnit implements Unit {
    /** milliohm per square. */
    MILLIOHM_PER_SQUARE("mΩ/sq", 1e-3, List.of("mOhm/sq", "mohm/sq", "mΩ/□")),
    /** ohm per square, the SI unit. */
    OHM_PER_SQUARE("Ω/sq", 1, List.of("Ohm/sq", "ohm/sq", "Ω/□", "ohms/sq"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    SheetResistanceUnit(String symbol, double toSi, List<String> aliases) {
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
