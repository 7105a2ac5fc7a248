/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.quantity.Decibels;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The worked example of {@code shield-axisymmetric/README-section.md}, run as written (an
 * invented bench and an invented sensor can). It checks that the example runs and that its
 * numbers stay those printed in the README, and reproduces the bench's plate against the
 * coupled-circuit reference model's order of magnitude through the other tests.
 */
class ReadmeExampleTest {

    @Test
    void benchAndSensorCanRunAsWritten() {
        Catalogue catalogue = Catalogue.builtIn();
        Material aluminium = catalogue.get("aluminium-1100-o");
        Material alloy = catalogue.get("nickel-iron-80");

        // The bench: two 20-turn coils of 10 mm radius, 50 mm apart, a 2 mm aluminium plate of
        // 25 mm radius midway, 100 mA RMS at 10 kHz.
        CoilPair pair = CoilPair.coaxial(Coil.loop(mm(10), 20), Coil.loop(mm(10), 20), mm(50));
        CoilCoupling bench = Arrangement.of(Body.disc("plate", aluminium, mm(25), mm(2))).between(pair)
                .withTolerance(Decibels.of(0.05));
        CouplingSolution r = bench.at(kHz(10));
        DriveCurrent drive = DriveCurrent.ofMilliamperes(100, AmplitudeMeasure.RMS, kHz(10));
        System.out.println("README bench: " + r);
        System.out.println("README bench: insertion loss " + r.insertionLossEstimated() + " dB");
        System.out.println("README bench: plate loss " + r.eddyLoss("plate", drive) + " W");
        System.out.println("README bench: mutual impedance " + r.mutualImpedance() + " Ω");

        // The sensor can: 80 % nickel-iron, inner radius 15 mm, wall 0.5 mm, 60 mm long, a 3 mm
        // cable hole in the upper cap; the sensor a cylinder 3 mm in radius and 10 mm long at the centre.
        AxialFieldShielding can = Arrangement.of(Body.can("sensor can", alloy, mm(15), mm(0.5), mm(60))
                .withCapHole(CanEnd.UPPER, mm(3))).inUniformAxialField()
                .sensing(SensorRegion.cylinder(mm(3), mm(10)));
        AxialFieldSolution still = can.magnetostatic();
        AxialFieldSolution mains = can.at(Hz(50));
        System.out.println("README can: static " + still);
        System.out.println("README can: 50 Hz " + mains);
        System.out.printf(Locale.ROOT, "README can: static worst %s, mean %s; 50 Hz worst %s%n",
                still.worstShieldingFactor(), still.meanShieldingFactor(), mains.worstShieldingFactor());

        assertTrue(r.insertionLossEstimateDb() <= 0.05);
        assertTrue(r.shieldingEffectivenessDb() > 5 && r.shieldingEffectivenessDb() < 20, r.toString());
        assertTrue(still.worstShieldingFactor().value() > 10);
        assertTrue(mains.worstShieldingFactor().value() >= still.worstShieldingFactor().value() * 0.5);
        assertEquals(r.shieldingEffectivenessDb(), bench.shieldingEffectivenessDb(1e4), 1e-12);
    }
}
