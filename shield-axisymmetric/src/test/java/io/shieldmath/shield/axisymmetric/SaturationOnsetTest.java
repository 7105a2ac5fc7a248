/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import org.junit.jupiter.api.Test;

/**
 * The onset of saturation reads as a sentence that names the body and the applied field. The
 * values are invented; the conversion to flux density in air is B0 = µ0·H0 (the SI definition
 * of H in vacuum, µ0 = 1.25663706e-6 N/A², CODATA 2018).
 */
class SaturationOnsetTest {

    @Test
    void namesTheBodyItsSaturationAndTheAppliedFieldInBothForms() {
        SaturationOnset o = new SaturationOnset("can", MagneticFieldStrength.ofAmperesPerMetre(7398.48195620246),
                MagneticFluxDensity.ofMillitesla(750), false);
        // 7398.48 A/m to three digits is 7.40 kA/m; in air µ0·7398.48 A/m = 9.297e-3 T, 9.30 mT to three digits.
        assertEquals("body 'can' reaches 80 % of its saturation flux density (750 mT) at an applied field of about "
                + "7.4 kA/m (9.3 mT in air)", o.toString());
        // The record keeps the interpolated field itself; only the text is rounded.
        assertEquals(7398.48195620246, o.applied().toAmperesPerMetre(), 0);
    }

    @Test
    void aBodyAlreadyPastTheThresholdAtTheFirstFieldSaysOrBelow() {
        SaturationOnset o = new SaturationOnset("lid", MagneticFieldStrength.ofAmperesPerMetre(12.3456),
                MagneticFluxDensity.ofTesla(1.6), true);
        // µ0·12.3456 A/m = 1.5514e-5 T, 15.5 µT to three digits.
        assertEquals("body 'lid' reaches 80 % of its saturation flux density (1.6 T) at or below an applied field of "
                + "12.3 A/m (15.5 µT in air)", o.toString());
    }
}
