/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of magnetic flux density B. One gauss is 1e-4 T exactly. */
public enum FluxDensityUnit implements Unit {
    /** nanotesla. */
    NANOTESLA("nT", 1e-9, List.of()),
    /** microtesla; also read as "uT" or "μT" (Greek mu). */
    MICROTESLA("µT", 1e-6, List.of("uT")),
    /** millitesla. */
    MILLITESLA("mT", 1e-3, List.of()),
    /** tesla, the SI unit. */
    TESLA("T", 1, List.of()),
    /** milligauss (CGS), 1e-7 T. */
    MILLIGAUSS("mG", 1e-7, List.of("mgauss")),
    /** gauss (CGS), 1e-4 T. */
    GAUSS("G", 1e-4, List.of("gauss"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    FluxDensityUnit(String symbol, double toSi, List<String> aliases) {
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
