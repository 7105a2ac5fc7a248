/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import java.util.Locale;

/**
 * A result and its discretisation estimate: the change of the result from the previous,
 * coarser mesh of the refinement sequence (element sizes √2 larger). For a method that
 * converges as h², the error of the finer result is about a third of that change, so the
 * estimate is a conservative bound in practice, not a guarantee. The unit is stated by the
 * method that returns the value. Immutable and thread-safe.
 *
 * @param value    the result on the finer mesh
 * @param estimate the absolute change from the coarser mesh, 0 or more
 */
public record EstimatedValue(double value, double estimate) {

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.6g ± %.2g", value, estimate);
    }
}
