/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import org.junit.jupiter.api.Test;

/** Refusals at the API boundary: each message names the quantity or the bodies involved. */
class BadInputTest {

    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofMegasiemensPerMetre(58), 1);
    private static final CoilPair PAIR = CoilPair.coaxial(Coil.loop(mm(10), 1), Coil.loop(mm(10), 1), mm(20));

    @Test
    void overlappingBodiesAreRefusedNamingBoth() {
        Body plate = Body.disc("plate", COPPER, mm(30), mm(2));
        Body ring = Body.tube("ring", COPPER, mm(20), mm(2), mm(10));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Arrangement.of(plate, ring));
        assertTrue(e.getMessage().contains("'plate'") && e.getMessage().contains("'ring'"), e.getMessage());
        // touching is allowed: a plate resting on the tube's end
        assertDoesNotThrow(() -> Arrangement.of(ring, Body.disc("lid", COPPER, mm(30), mm(1)).shiftedBy(mm(5.5))));
    }

    @Test
    void twoBodiesWithOneNameAreRefused() {
        Body a = Body.disc("plate", COPPER, mm(30), mm(1));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Arrangement.of(a, a.shiftedBy(mm(5))));
        assertTrue(e.getMessage().contains("'plate'"), e.getMessage());
    }

    @Test
    void aBodyCuttingACoilIsRefusedNamingBoth() {
        Body thick = Body.disc("slab", COPPER, mm(30), mm(25));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Arrangement.of(thick).between(PAIR));
        assertTrue(e.getMessage().contains("'slab'") && e.getMessage().contains("transmitter"), e.getMessage());
        Coil bobbin = Coil.loop(mm(10), 50).withWinding(mm(2), mm(4), 2, 4);
        CoilPair wound = CoilPair.coaxial(bobbin, Coil.loop(mm(10), 1), mm(30));
        Body sleeve = Body.tube("sleeve", COPPER, mm(10.5), mm(1), mm(10)).shiftedBackBy(mm(15));
        IllegalArgumentException f = assertThrows(IllegalArgumentException.class, () -> Arrangement.of(sleeve).between(wound));
        assertTrue(f.getMessage().contains("'sleeve'") && f.getMessage().contains("transmitter"), f.getMessage());
    }

    @Test
    void zeroSizeBodiesAreRefusedNamingTheBody() {
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> Body.annularPlate("washer", COPPER, mm(10), mm(10), mm(1)));
        assertTrue(e.getMessage().contains("'washer'") && e.getMessage().contains("m"), e.getMessage());
        InvalidQuantityException f = assertThrows(InvalidQuantityException.class,
                () -> Body.can("flat can", COPPER, mm(10), mm(1), mm(2)));
        assertTrue(f.getMessage().contains("'flat can'"), f.getMessage());
        assertThrows(NullPointerException.class, () -> Body.disc("x", COPPER, null, mm(1)));
        assertThrows(IllegalStateException.class, () -> Body.disc("x", COPPER, mm(5), mm(1)).withoutCap(CanEnd.UPPER));
        assertThrows(IllegalStateException.class,
                () -> Body.can("c", COPPER, mm(5), mm(1), mm(9)).withoutCap(CanEnd.UPPER).withCapHole(CanEnd.UPPER, mm(1)));
    }

    @Test
    void frequenciesBeyondTheQuasiStaticLimitAreRefused() {
        CoilCoupling c = Arrangement.of(Body.disc("plate", COPPER, mm(30), mm(1))).between(PAIR);
        // D = 60 mm: the limit k0·D = 0.1 is 0.1·c/(2π·0.06) ≈ 79.6 MHz.
        assertTrue(Math.abs(c.quasiStaticLimit().toHertz() / 79.577e6 - 1) < 1e-3, c.quasiStaticLimit().toString());
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class, () -> c.at(MHz(100)));
        assertTrue(e.getMessage().contains("quasi-static") && e.getMessage().contains("Hz"), e.getMessage());
        assertThrows(InvalidQuantityException.class, () -> c.shieldingEffectivenessDb(Double.NaN));
        assertThrows(InvalidQuantityException.class, () -> c.shieldingEffectivenessDb(-1));
    }

    @Test
    void aMeshOverTheCapIsRefusedWithTheCapInTheMessage() {
        CoilCoupling c = Arrangement.of(Body.disc("plate", COPPER, mm(30), mm(1))).between(PAIR).withMaxUnknowns(1000);
        MeshTooLargeException e = assertThrows(MeshTooLargeException.class, () -> c.at(kHz(10)));
        assertTrue(e.getMessage().contains("1000") && e.unknowns() > 1000, e.getMessage());
    }

    @Test
    void anUnreachableToleranceGivesTheBestEstimate() {
        // A 3 mm copper plate at 100 kHz (14 skin depths): its two default meshes differ by more
        // than 0.001 dB, and the cap admits the default mesh but not the next refinement.
        CoilCoupling plain = Arrangement.of(Body.disc("plate", COPPER, mm(30), mm(3))).between(PAIR);
        CouplingSolution s = plain.at(kHz(100));
        assertTrue(s.insertionLossEstimateDb() > 0.001, s.toString());
        CoilCoupling c = plain.withMaxUnknowns(s.unknowns() + 1000).withTolerance(Decibels.of(0.001));
        ToleranceNotReachedException e = assertThrows(ToleranceNotReachedException.class, () -> c.at(kHz(100)));
        assertEquals(s.shieldingEffectivenessDb(), e.bestValue(), 1e-12);
        assertEquals(s.insertionLossEstimateDb(), e.bestEstimate(), 1e-12);
        assertTrue(e.getMessage().contains("size cap") && e.getMessage().contains("0.001"), e.getMessage());
    }

    @Test
    void aDriveCurrentAtAnotherFrequencyOrAPointOutsideIsRefused() {
        CouplingSolution s = Arrangement.of(Body.disc("plate", COPPER, mm(30), mm(1))).between(PAIR).at(kHz(10));
        DriveCurrent wrong = DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, kHz(11));
        assertThrows(IllegalArgumentException.class, () -> s.eddyLoss("plate", wrong));
        assertThrows(IllegalArgumentException.class,
                () -> s.eddyLoss("no such", DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, kHz(10))));
        assertThrows(IllegalArgumentException.class, () -> s.fluxDensityPerAmpere(Point.ofMetres(500, 0)));
        assertThrows(InvalidQuantityException.class, () -> Point.ofMetres(-1, 0));
        assertThrows(InvalidQuantityException.class, () -> Point.ofMetres(Double.NaN, 0));
        assertThrows(InvalidQuantityException.class, () -> Body.disc("x", COPPER, mm(5), mm(1)).withHole(mm(6)));
        assertThrows(InvalidQuantityException.class,
                () -> Arrangement.of().between(PAIR).withTolerance(Decibels.of(0)));
        assertThrows(InvalidQuantityException.class, () -> Arrangement.of().between(PAIR).at(Hz(1)).fieldMap(
                Point.ORIGIN, Point.ofMillimetres(10, 10), 1, 5, DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, Hz(1))));
    }
}
