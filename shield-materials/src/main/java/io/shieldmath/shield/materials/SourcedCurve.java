/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.medium.MagnetizationCurve;

/**
 * A magnetization curve of one catalogue material with the source of its points (a
 * handbook, a standard, a datasheet class, or "from memory" with the source to check it
 * against). Immutable and thread-safe.
 *
 * @param materialId the catalogue identifier of the material, not null
 * @param curve      the curve, not null
 * @param source     where the points come from, not blank
 */
public record SourcedCurve(String materialId, MagnetizationCurve curve, String source) {

    /**
     * Checks the parts.
     *
     * @param materialId the catalogue identifier of the material, not null
     * @param curve      the curve, not null
     * @param source     where the points come from, not blank
     * @throws NullPointerException     if a part is null
     * @throws IllegalArgumentException if the identifier is malformed or the source is blank
     */
    public SourcedCurve {
        Material.checkId(Require.nonNull("material id", materialId));
        Require.nonNull("magnetization curve", curve);
        Require.text("magnetization curve source", source, 2000);
    }
}
