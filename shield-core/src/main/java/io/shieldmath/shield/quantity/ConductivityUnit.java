/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of electrical conductivity. 100 % IACS is 58.0 MS/m exactly (the annealed-copper standard of IEC 60028). */
public enum ConductivityUnit implements Unit {
    /** siemens per metre, the SI unit. */
    SIEMENS_PER_METRE("S/m", 1, List.of("S m^-1")),
    /** megasiemens per metre. */
    MEGASIEMENS_PER_METRE("MS/m", 1e6, List.of()),
    /** percent of the International Annealed Copper Standard: 1 % IACS = 0.58 MS/m. */
    PERCENT_IACS("% IACS", 0.58e6, List.of("%IACS", "IACS%", "% of IACS"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    ConductivityUnit(String symbol, double toSi, List<String> aliases) {
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
