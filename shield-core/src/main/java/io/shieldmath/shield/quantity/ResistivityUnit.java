/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of electrical resistivity. */
public enum ResistivityUnit implements Unit {
    /** nanohm metre. */
    NANOHM_METRE("nΩ·m", 1e-9, List.of("nOhm·m", "nohm·m")),
    /** microhm centimetre, the unit of most handbooks: 1 µΩ·cm = 1e-8 Ω·m. */
    MICROHM_CENTIMETRE("µΩ·cm", 1e-8, List.of("uΩ·cm", "µOhm·cm", "uOhm·cm", "uohm·cm", "microhm·cm")),
    /** microhm metre. */
    MICROHM_METRE("µΩ·m", 1e-6, List.of("uΩ·m", "µOhm·m", "uOhm·m", "uohm·m", "microhm·m")),
    /** ohm metre, the SI unit. */
    OHM_METRE("Ω·m", 1, List.of("Ohm·m", "ohm·m"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    ResistivityUnit(String symbol, double toSi, List<String> aliases) {
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
