/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

/**
 * The numbers a {@link Material} may carry, each with its own provenance. The
 * {@link #key()} is the field name in catalogue files.
 */
public enum MaterialProperty {
    /** Conductivity σ at 20 °C (for finishes: derived from the sheet resistance). */
    CONDUCTIVITY("conductivity"),
    /** Temperature coefficient α of resistivity at 20 °C, in 1/K. */
    TEMPERATURE_COEFFICIENT("temperatureCoefficient"),
    /** The relative permeability model µr(f). */
    PERMEABILITY("permeability"),
    /** Relative permittivity εr. */
    PERMITTIVITY("permittivity"),
    /** Mass density. */
    DENSITY("density"),
    /** Saturation flux density, for ferromagnetic materials. */
    SATURATION("saturation"),
    /** Sheet resistance and nominal thickness, for finishes known only that way. */
    SHEET_RESISTANCE("sheetResistance");

    private final String key;

    MaterialProperty(String key) {
        this.key = key;
    }

    /**
     * The field name of this property in catalogue files.
     *
     * @return for example {@code "temperatureCoefficient"}
     */
    public String key() {
        return key;
    }
}
