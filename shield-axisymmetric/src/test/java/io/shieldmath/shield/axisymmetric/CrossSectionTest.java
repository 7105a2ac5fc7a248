/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The public cross-section of a body, as a drawing program reads it. */
class CrossSectionTest {

    private static final Medium METAL = Medium.conductor("metal", Conductivity.ofMegasiemensPerMetre(10), 1);

    @Test
    void aCanIsItsWallAndItsCapsWhereBodyCanPutsThem() {
        // Body.can: the length is overall, caps included, each cap as thick as the wall, the
        // caps inside the wall's inner radius (its javadoc); the numbers follow from that.
        Body can = Body.can("c", METAL, mm(20), mm(1), mm(60)).withCapHole(CanEnd.UPPER, mm(4)).shiftedBy(mm(5));
        List<double[]> rects = can.crossSectionMetres();
        assertEquals(3, rects.size());
        assertArrayEquals(new double[] {0.020, 0.021, -0.025, 0.035}, rects.get(0), 1e-15);
        assertArrayEquals(new double[] {0, 0.020, -0.025, -0.024}, rects.get(1), 1e-15);
        assertArrayEquals(new double[] {0.004, 0.020, 0.034, 0.035}, rects.get(2), 1e-15);
    }

    @Test
    void aWasherIsOneRingAndTheListIsACopy() {
        Body washer = Body.annularPlate("w", METAL, mm(30), mm(10), mm(2));
        List<double[]> rects = washer.crossSectionMetres();
        assertArrayEquals(new double[] {0.010, 0.030, -0.001, 0.001}, rects.get(0), 1e-15);
        rects.get(0)[0] = 99;
        assertEquals(0.010, washer.crossSectionMetres().get(0)[0], 0.0);
    }
}
