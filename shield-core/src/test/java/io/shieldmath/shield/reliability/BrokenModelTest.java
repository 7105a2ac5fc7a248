/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import org.junit.jupiter.api.Test;

/**
 * A user permeability model that breaks its contract (NaN) must not give a silent NaN: every
 * evaluation path says so with an {@link ArithmeticException} naming the frequency (the
 * library's documented rule, DEVELOPERS.md "Boundary checks").
 */
class BrokenModelTest {

    /** Returns NaN above 1 kHz, a valid µr = 1 below (so construction succeeds). */
    private static final PermeabilityModel BROKEN = new PermeabilityModel() {
        @Override
        public double real(double hertz) {
            return hertz > 1000 ? Double.NaN : 1;
        }

        @Override
        public double loss(double hertz) {
            return 0;
        }
    };

    private static final Medium BAD = Medium.conductor("broken", Conductivity.ofMegasiemensPerMetre(10), BROKEN);

    @Test
    void everyPathRefusesANaNResult() {
        Barrier b = Barrier.of(BAD, Length.ofMillimetres(1));
        var planar = b.facing(IncidentField.planeWave());
        assertTrue(Double.isFinite(planar.shieldingEffectivenessDb(100)));
        assertMessage(assertThrows(ArithmeticException.class, () -> planar.shieldingEffectivenessDb(1e4)));
        assertMessage(assertThrows(ArithmeticException.class, () -> planar.at(Frequency.ofKilohertz(10))));
        Shell shell = Shell.sphere(Length.ofCentimetres(5)).wall(BAD, Length.ofMillimetres(1));
        assertTrue(Double.isFinite(shell.shieldingEffectivenessDb(100)));
        assertMessage(assertThrows(ArithmeticException.class, () -> shell.shieldingEffectivenessDb(1e4)));
        assertMessage(assertThrows(ArithmeticException.class, () -> shell.at(Frequency.ofKilohertz(10))));
        Coil loop = Coil.loop(Length.ofCentimetres(1), 10);
        var coupling = CoilPair.coaxial(loop, loop, Length.ofCentimetres(4)).through(b);
        assertTrue(Double.isFinite(coupling.shieldingEffectivenessDb(100)));
        assertMessage(assertThrows(ArithmeticException.class, () -> coupling.shieldingEffectivenessDb(1e4)));
    }

    private static void assertMessage(ArithmeticException e) {
        assertTrue(e.getMessage().contains("10000") && e.getMessage().contains("is not finite"), e::getMessage);
    }
}
