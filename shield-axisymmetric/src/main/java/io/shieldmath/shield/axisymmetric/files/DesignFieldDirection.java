/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.WorstDirectionShielding;

/**
 * The direction of the uniform applied field an {@link AxisymmetricDesign} is evaluated in,
 * relative to the axis of its bodies; in a design file the {@code "direction"} of the
 * {@code "appliedField"}: {@code "axial"}, {@code "transverse"} or {@code "worst"}.
 */
public enum DesignFieldDirection {
    /** Along the axis ({@link Arrangement#inUniformAxialField()}); {@code "axial"} in a file. */
    AXIAL("axial"),
    /** Across the axis ({@link Arrangement#inUniformTransverseField()}); {@code "transverse"} in a file. */
    TRANSVERSE("transverse"),
    /**
     * Both directions, the smaller shielding counting ({@link WorstDirectionShielding}): the
     * case to design for when the field's direction is not known; {@code "worst"} in a file.
     */
    WORST("worst");

    private final String fileName;

    DesignFieldDirection(String fileName) {
        this.fileName = fileName;
    }

    /**
     * The name a design file gives this direction.
     *
     * @return {@code axial}, {@code transverse} or {@code worst}
     */
    public String fileName() {
        return fileName;
    }
}
