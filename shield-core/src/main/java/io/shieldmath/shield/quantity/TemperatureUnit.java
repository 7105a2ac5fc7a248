/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import java.util.List;

/**
 * Units of temperature. {@link Temperature} is held in degrees Celsius (an SI derived
 * unit, the one the material laws of this library are written in); a value in kelvin is
 * the Celsius value plus 273.15 exactly (BIPM SI Brochure, 9th ed., 2.3.1).
 */
public enum TemperatureUnit implements Unit {
    /** degree Celsius; also read as "degC". */
    CELSIUS("°C", 0, List.of("degC")),
    /** kelvin, the SI base unit: T/K = t/°C + 273.15. */
    KELVIN("K", -273.15, List.of());

    private final String symbol;
    private final double offset;
    private final List<String> aliases;

    TemperatureUnit(String symbol, double offset, List<String> aliases) {
        this.symbol = symbol;
        this.offset = offset;
        this.aliases = aliases;
    }

    @Override
    public String symbol() {
        return symbol;
    }

    /**
     * The size of one of this unit in degrees Celsius: 1 for both (a step of 1 K is a step
     * of 1 °C).
     *
     * @return 1
     */
    @Override
    public double toSi() {
        return 1;
    }

    @Override
    public List<String> aliases() {
        return aliases;
    }

    /**
     * The offset to degrees Celsius: 0 for °C, −273.15 for K.
     *
     * @return the offset
     */
    @Override
    public double offset() {
        return offset;
    }
}
