/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

/**
 * Anything that can stand for a medium in a barrier: a {@link Medium} itself, or a
 * catalogue material (in {@code shield-materials}) at its reference temperature.
 */
public interface MediumSource {

    /**
     * The electromagnetic properties to compute with.
     *
     * @return the medium, never null
     */
    Medium medium();
}
