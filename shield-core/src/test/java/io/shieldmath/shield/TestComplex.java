/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield;

import org.apache.commons.math3.complex.Complex;

/** Converts the library's own complex value to Commons Math's, for the reference computations in tests. */
public final class TestComplex {

    private TestComplex() {
    }

    /**
     * The same number as a Commons Math complex.
     *
     * @param z the library's value
     * @return the Commons Math value
     */
    public static Complex cm(io.shieldmath.shield.quantity.Complex z) {
        return new Complex(z.real(), z.imaginary());
    }
}
