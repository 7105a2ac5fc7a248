/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/** Units of a temperature coefficient (per kelvin; a step of 1 K equals a step of 1 °C). */
public enum TemperatureCoefficientUnit implements Unit {
    /** per kelvin, the SI unit; also read as "1/K", "K^-1", "/°C" or "1/°C". */
    PER_KELVIN("/K", 1, List.of("1/K", "K^-1", "/°C", "1/°C")),
    /** parts per million per kelvin, 1e-6 /K; also read as "ppm/°C". */
    PPM_PER_KELVIN("ppm/K", 1e-06, List.of("ppm/°C"));

    private final String symbol;
    private final double toSi;
    private final List<String> aliases;

    TemperatureCoefficientUnit(String symbol, double toSi, List<String> aliases) {
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
