/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of length: metric, and the mil and inch of sheet-metal practice (exact, 1 inch = 25.4 mm). */
public enum LengthUnit implements Unit {
    /** nanometre. */
    NANOMETRE("nm", 1e-9, List.of()),
    /** micrometre; also read as "um", "μm" (Greek mu) or "micron". */
    MICROMETRE("µm", 1e-6, List.of("um", "micron", "microns")),
    /** millimetre. */
    MILLIMETRE("mm", 1e-3, List.of()),
    /** centimetre. */
    CENTIMETRE("cm", 1e-2, List.of()),
    /** metre, the SI unit. */
    METRE("m", 1, List.of()),
    /** mil (thou), 25.4 µm exactly. */
    MIL("mil", 25.4e-6, List.of("mils", "thou")),
    /** inch, 25.4 mm exactly. */
    INCH("in", 25.4e-3, List.of("inch", "inches", "\""));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    LengthUnit(String symbol, double toSi, List<String> aliases) {
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
