/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of inductance. */
public enum InductanceUnit implements Unit {
    /** nanohenry. */
    NANOHENRY("nH", 1e-09, List.of()),
    /** microhenry; also read as "uH" or "μH" (Greek mu). */
    MICROHENRY("µH", 1e-06, List.of("uH")),
    /** millihenry. */
    MILLIHENRY("mH", 0.001, List.of()),
    /** henry, the SI unit. */
    HENRY("H", 1, List.of());

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    InductanceUnit(String symbol, double toSi, List<String> aliases) {
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
