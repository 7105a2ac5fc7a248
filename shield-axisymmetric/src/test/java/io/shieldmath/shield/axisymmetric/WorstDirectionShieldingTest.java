/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import io.shieldmath.shield.design.MarginReport;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import org.junit.jupiter.api.Test;

/** The worse of the two directions, as the design tools see it. Invented can and requirement. */
class WorstDirectionShieldingTest {

    private static final Medium ALLOY = Medium.conductor("test alloy", Conductivity.ZERO, 1000);
    private static final SensorRegion SENSOR = SensorRegion.cylinder(mm(4), mm(10));

    private static WorstDirectionShielding of(Arrangement a) {
        return WorstDirectionShielding.of(a.inUniformAxialField().sensing(SENSOR), a.inUniformTransverseField().sensing(SENSOR));
    }

    @Test
    void theRequirementsMarginIsTheWorseOfTheTwoDirections() {
        // By definition (common practice, no source): the design must meet the requirement in
        // whichever direction the field takes, so its margin is the smaller of the two margins.
        Arrangement tube = Arrangement.of(Body.tube("tube", ALLOY, mm(10), mm(1), mm(88)));
        WorstDirectionShielding either = of(tube);
        Requirement need = Requirement.none().plus(FrequencyBand.at(Frequency.ofHertz(50)),
                MagneticFluxDensity.ofMicrotesla(40), MagneticFluxDensity.ofMicrotesla(4));
        MarginReport both = need.marginOf(either);
        double axial = need.marginOf(either.axial()).worstMarginDb();
        double transverse = need.marginOf(either.transverse()).worstMarginDb();
        assertEquals(Math.min(axial, transverse), both.worstMarginDb(), 0);
        // A long open tube barely shields an axial static field (the infinite tube not at all,
        // shield-core's ShellGeometry.CYLINDER_AXIAL), so the axial direction is the worse one.
        assertEquals(FieldDirection.AXIAL, either.magnetostatic().worstDirection());
        assertEquals(axial, both.worstMarginDb(), 0);
    }

    @Test
    void mismatchedEvaluationsAreRefused() {
        Arrangement a = Arrangement.of(Body.can("can", ALLOY, mm(10), mm(1), mm(30)));
        Arrangement b = Arrangement.of(Body.can("can", ALLOY, mm(11), mm(1), mm(30)));
        assertThrows(IllegalArgumentException.class,
                () -> WorstDirectionShielding.of(a.inUniformAxialField(), b.inUniformTransverseField()));
        assertThrows(IllegalArgumentException.class,
                () -> WorstDirectionShielding.of(a.inUniformAxialField().sensing(SENSOR), a.inUniformTransverseField()));
        assertEquals(of(a), of(Arrangement.of(Body.can("can", ALLOY, mm(10), mm(1), mm(30)))));
    }
}
