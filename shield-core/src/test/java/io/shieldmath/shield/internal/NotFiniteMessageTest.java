/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import io.shieldmath.shield.medium.PermeabilityModel;
import org.junit.jupiter.api.Test;

/** Issue 15 item 13: the message builder of a non-finite result, each branch. */
class NotFiniteMessageTest {

    @Test
    void withoutAFaultItSaysTheComputationOverflowedAndClipsTheSubject() {
        String subject = "x".repeat(5000);
        assertEquals("shielding effectiveness of " + "x".repeat(60) + "… (5000 characters) at 1000000 Hz is not finite: "
                + "every layer's permeability is valid there and every input is in range, so the computation "
                + "overflowed; please report this case",
                Numerics.notFinite("shielding effectiveness", subject, 1e6, null).getMessage());
    }

    @Test
    void aFaultIsTheFirstLayerOutsideTheContractAndGapsAreSkipped() {
        PermeabilityModel nan = new PermeabilityModel() {
            @Override
            public double real(double hertz) {
                return 2;
            }

            @Override
            public double loss(double hertz) {
                return Double.NaN;
            }

            @Override
            public String toString() {
                return "lossy";
            }
        };
        PermeabilityModel[] mu = {PermeabilityModel.constant(3), null, nan};
        assertEquals("the permeability model of wall 3 (lossy) returns µ' = 2, µ'' = NaN there, and a permeability "
                + "model must return finite µ' > 0 and µ'' >= 0", Numerics.permeabilityFault(mu, i -> "wall " + (i + 1), 1));
        assertNull(Numerics.permeabilityFault(new PermeabilityModel[] {PermeabilityModel.constant(3), null},
                i -> "wall", 1));
    }
}
