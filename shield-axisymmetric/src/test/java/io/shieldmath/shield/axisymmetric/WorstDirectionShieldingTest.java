/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.design.MarginReport;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
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
    void everyLineOfTheMarginIsTheSmallerOfTheTwoDirectionsLines() {
        // By definition (common practice, no source), checked line by line against the two
        // models evaluated on their own: a conducting high-µ can (the catalogue's 80 % nickel-iron)
        // with a cable hole, whose worse
        // direction changes with frequency (axial at 50 Hz, where the wall's permeability
        // shields and the caps collect the axial flux; transverse at 20 kHz, where eddy currents
        // shield the wall and the field across the axis leaks through the hole).
        Material alloy = Catalogue.builtIn().get("nickel-iron-80");
        Arrangement can = Arrangement.of(Body.can("can", alloy, mm(15), mm(1), mm(60)).withCapHole(CanEnd.UPPER, mm(3)));
        SensorRegion sensor = SensorRegion.cylinder(mm(3), mm(10));
        WorstDirectionShielding either = WorstDirectionShielding.of(
                can.inUniformAxialField().sensing(sensor).withFineness(0.25),
                can.inUniformTransverseField().sensing(sensor).withFineness(0.25));
        Requirement need = Requirement.none()
                .plus(FrequencyBand.at(Frequency.ofHertz(50)), MagneticFluxDensity.ofMicrotesla(2),
                        MagneticFluxDensity.ofNanotesla(5))
                .plus(FrequencyBand.at(Frequency.ofKilohertz(20)), MagneticFluxDensity.ofMicrotesla(8),
                        MagneticFluxDensity.ofNanotesla(5));
        MarginReport both = need.marginOf(either);
        MarginReport axial = need.marginOf(either.axial());
        MarginReport transverse = need.marginOf(either.transverse());
        for (int i = 0; i < need.entries().size(); i++) {
            MarginReport.Line b = both.lines().get(i);
            MarginReport.Line a = axial.lines().get(i);
            MarginReport.Line t = transverse.lines().get(i);
            assertEquals(a.frequency(), b.frequency());
            assertEquals(Math.min(a.marginDb(), t.marginDb()), b.marginDb(), 0);
            assertEquals(Math.min(a.seDb(), t.seDb()), b.seDb(), 0);
        }
        assertEquals(Math.min(axial.worstMarginDb(), transverse.worstMarginDb()), both.worstMarginDb(), 0);
        // The case is one where each direction is the worse one somewhere, so neither alone would do.
        assertTrue(axial.lines().get(0).marginDb() < transverse.lines().get(0).marginDb(), both.toString());
        assertTrue(transverse.lines().get(1).marginDb() < axial.lines().get(1).marginDb(), both.toString());
        assertEquals(FieldDirection.AXIAL, either.at(Frequency.ofHertz(50)).worstDirection());
        assertEquals(FieldDirection.TRANSVERSE, either.at(Frequency.ofKilohertz(20)).worstDirection());
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
