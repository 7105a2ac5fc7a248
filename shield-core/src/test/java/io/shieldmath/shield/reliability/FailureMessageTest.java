/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Issue 15 item 13: the ArithmeticException of a non-finite result names its actual cause
 * (the layer whose permeability model broke its contract, with the values it returned) and
 * clips the description of the barrier or shell instead of printing all of it (2 to 5 KB
 * for a deep stack).
 */
class FailureMessageTest {

    /** A user model that returns µ' = −1 (outside its contract) above 1 kHz, 1 below. */
    private static final PermeabilityModel NEGATIVE = new PermeabilityModel() {
        @Override
        public double real(double hertz) {
            return hertz > 1000 ? -1 : 1;
        }

        @Override
        public double loss(double hertz) {
            return 0;
        }

        @Override
        public String toString() {
            return "user model";
        }
    };

    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);
    private static final Medium BAD = Medium.conductor("bad", Conductivity.ofMegasiemensPerMetre(10), NEGATIVE);

    @Test
    void aDeepBarrierNamesTheFaultyLayerAndIsClipped() {
        List<Layer> layers = new ArrayList<>();
        for (int i = 0; i < 158; i++) {
            layers.add(i == 119 ? Layer.of(BAD, Length.ofMicrometres(10)) : i % 2 == 0
                    ? Layer.of(COPPER, Length.ofMicrometres(10)) : Layer.gap(Length.ofMillimetres(1)));
        }
        Barrier b = Barrier.of(layers);
        assertTrue(b.toString().length() > 2000, "the description is long, as in the issue");
        String msg = assertThrows(ArithmeticException.class,
                () -> b.facing(IncidentField.planeWave()).shieldingEffectivenessDb(1e4)).getMessage();
        assertTrue(msg.length() < 400, () -> msg.length() + ": " + msg);
        assertTrue(msg.contains(" at 10000 Hz is not finite: the permeability model of layer 120 (user model) returns "
                + "µ' = -1, µ'' = 0 there"), msg);
        assertFalse(msg.contains("layers' permeability models"), msg);
        assertTrue(msg.contains("characters)"), "the clipped description says how long it was: " + msg);
    }

    @Test
    void shellsAndCouplingNameTheFaultToo() {
        Shell shell = Shell.sphere(Length.ofCentimetres(5)).wall(COPPER, Length.ofMillimetres(1))
                .thenGap(Length.ofMillimetres(2)).then(BAD, Length.ofMillimetres(1));
        String msg = assertThrows(ArithmeticException.class, () -> shell.shieldingEffectivenessDb(1e4)).getMessage();
        assertTrue(msg.contains("the permeability model of layer 3 from the inside (walls and gaps) (user model) "
                + "returns µ' = -1"), msg);
        Coil loop = Coil.loop(Length.ofCentimetres(1), 10);
        Barrier b = Barrier.of(COPPER, Length.ofMillimetres(0.1)).then(BAD, Length.ofMillimetres(0.1));
        String c = assertThrows(ArithmeticException.class, () -> CoilPair.coaxial(loop, loop, Length.ofCentimetres(4))
                .through(b).shieldingEffectivenessDb(1e4)).getMessage();
        assertTrue(c.startsWith("insertion loss of ") && c.contains("the permeability model of layer 2 (user model)"), c);
        assertEquals(-1, NEGATIVE.real(1e4));
    }
}
