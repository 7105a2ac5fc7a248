/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of magnetic field strength H. One oersted is 1000/(4π) A/m exactly. */
public enum MagneticFieldUnit implements Unit {
    /** ampere per metre, the SI unit. */
    AMPERE_PER_METRE("A/m", 1, List.of()),
    /** kiloampere per metre. */
    KILOAMPERE_PER_METRE("kA/m", 1e3, List.of()),
    /** oersted (CGS), 1000/(4π) A/m. */
    OERSTED("Oe", 1000 / (4 * Math.PI), List.of("oersted"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    MagneticFieldUnit(String symbol, double toSi, List<String> aliases) {
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
