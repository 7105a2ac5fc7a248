/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.RelativePermittivity;
import org.junit.jupiter.api.Test;

/** Media and the three permeability forms: values, table edges, validation and value semantics. */
class MediumTest {

    private static final double MU0 = 1.25663706212e-6;   // CODATA 2018

    @Test
    void relaxationIsAFirstOrderLowPass() {
        // µ(f) = 1 + χ/(1 + j f/fc), χ = µdc − 1 (the susceptibility relaxes, µ tends to 1): so
        // µ' = 1 + χ/(1 + x²), µ'' = χ·x/(1 + x²) (Debye-type first-order relaxation of χ, as in
        // Bozorth, Ferromagnetism, 1951, ch. 17, from memory; the values are its algebra).
        RelaxationPermeability m = (RelaxationPermeability) PermeabilityModel.relaxation(20_000,
                Frequency.ofKilohertz(2));
        assertEquals(20_000, m.real(0), 0);
        assertEquals(0, m.loss(0), 0);
        assertEquals(1 + 19_999 / 2.0, m.real(2000), 1e-9);     // x = 1: half of χ in each part
        assertEquals(19_999 / 2.0, m.loss(2000), 1e-9);
        assertEquals(1 + 19_999 / 5.0, m.real(4000), 1e-9);      // x = 2
        assertEquals(19_999 * 2 / 5.0, m.loss(4000), 1e-9);
        // Far above the corner µ' tends to free space, 1, and never goes below it: at x = 1e6,
        // µ' = 1 + 19999/(1 + 1e12) and µ'' = 19999·1e6/(1 + 1e12).
        assertEquals(1 + 19_999 / (1 + 1e12), m.real(2e9), 1e-15);
        assertEquals(19_999e6 / (1 + 1e12), m.loss(2e9), 1e-18);
        assertEquals(20_000, m.staticValue(), 0);
        assertEquals(20_000, m.lowFrequencyValue(), 0);
        assertEquals(Frequency.ofKilohertz(2), m.corner());
        RelativePermeability at = m.at(Frequency.ofKilohertz(2));
        assertEquals(10_000.5, at.real(), 1e-9);
        assertEquals(9_999.5, at.loss(), 1e-9);
        assertEquals(m, PermeabilityModel.relaxation(20_000, Frequency.ofHertz(2000)));
        assertEquals(m.hashCode(), PermeabilityModel.relaxation(20_000, Frequency.ofHertz(2000)).hashCode());
        assertNotEquals(m, PermeabilityModel.relaxation(20_001, Frequency.ofKilohertz(2)));
        assertNotEquals(m, PermeabilityModel.relaxation(20_000, Frequency.ofKilohertz(3)));
        assertEquals("µr 1 + (20000 − 1)/(1 + j f/2 kHz)", m.toString());
        // The low-frequency value is limited to [1, 1e7] (RelativePermeability.MAX).
        assertEquals(1, PermeabilityModel.relaxation(1, Frequency.ofHertz(1)).staticValue(), 0);
        assertEquals(1e7, PermeabilityModel.relaxation(1e7, Frequency.ofHertz(1)).staticValue(), 0);
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.relaxation(0.5, Frequency.ofHertz(1)));
        assertEquals("low-frequency relative permeability: 0.5 (relative) is out of range; allowed: from 1 "
                + "(relative) to 10000000 (relative)", e.getMessage());
        assertThrows(InvalidQuantityException.class, () -> PermeabilityModel.relaxation(1.5e7, Frequency.ofHertz(1)));
        assertThrows(NullPointerException.class, () -> PermeabilityModel.relaxation(10, null));
    }

    @Test
    void tableInterpolatesInLogFrequencyAndHoldsItsEnds() {
        // Linear in log10(f) between points (the class's documented rule): halfway in log between
        // 100 Hz and 10 kHz is 1 kHz.
        TabulatedPermeability t = (TabulatedPermeability) PermeabilityModel.table(
                new double[] {100, 10_000, 1e6}, new double[] {5000, 3000, 100}, new double[] {0, 1000, 50});
        assertEquals(4000, t.real(1000), 1e-9);
        assertEquals(500, t.loss(1000), 1e-9);
        assertEquals(5000 - 2000 * 0.25, t.real(Math.pow(10, 2.5)), 1e-9);   // a quarter of the way
        assertEquals(5000, t.real(100), 0);          // exactly on a point
        assertEquals(3000, t.real(10_000), 0);
        assertEquals(1000, t.loss(10_000), 0);
        assertEquals(5000, t.real(1), 0);            // below the first point
        assertEquals(5000, t.real(0), 0);            // 0 Hz
        assertEquals(5000, t.staticValue(), 0);
        assertEquals(100, t.real(1e6), 0);           // the last point and above
        assertEquals(100, t.real(1e9), 0);
        assertEquals(50, t.loss(1e9), 0);
        assertEquals(3000 - 2900 * 0.5, t.real(1e5), 1e-9);   // second interval
        assertArrayEquals(new double[] {100, 10_000, 1e6}, t.hertz());
        assertArrayEquals(new double[] {5000, 3000, 100}, t.realParts());
        assertArrayEquals(new double[] {0, 1000, 50}, t.lossParts());
        t.hertz()[0] = 7;                      // copies, not views
        assertEquals(100, t.hertz()[0], 0);
        assertEquals("µr table of 3 points, 100 Hz to 1 MHz", t.toString());

        double[] f = {100, 200};
        PermeabilityModel single = PermeabilityModel.table(new double[] {50}, new double[] {7}, new double[] {1});
        assertEquals(7, single.real(1e6), 0);
        assertEquals(1, single.loss(1), 0);
        PermeabilityModel a = PermeabilityModel.table(f, new double[] {3, 2}, new double[] {0, 0});
        f[0] = 150;                                   // the table copied its input
        assertEquals(3, a.real(100), 0);
        assertEquals(a, PermeabilityModel.table(new double[] {100, 200}, new double[] {3, 2}, new double[] {0, 0}));
        assertEquals(a.hashCode(),
                PermeabilityModel.table(new double[] {100, 200}, new double[] {3, 2}, new double[] {0, 0}).hashCode());
        assertNotEquals(a, PermeabilityModel.table(new double[] {100, 300}, new double[] {3, 2}, new double[] {0, 0}));
        assertNotEquals(a, PermeabilityModel.table(new double[] {100, 200}, new double[] {3, 1}, new double[] {0, 0}));
        assertNotEquals(a, PermeabilityModel.table(new double[] {100, 200}, new double[] {3, 2}, new double[] {0, 1}));
    }

    @Test
    void badTablesAreRefusedWithTheOffendingPoint() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PermeabilityModel.table(new double[] {1, 2}, new double[] {1}, new double[] {0, 0}));
        assertEquals("permeability table: frequencies, real parts and loss parts must have the same length of at "
                + "least 1; got 2, 1, 2", e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> PermeabilityModel.table(new double[] {1, 2}, new double[] {1, 1}, new double[] {0}));
        assertThrows(IllegalArgumentException.class,
                () -> PermeabilityModel.table(new double[0], new double[0], new double[0]));
        assertEquals("permeability table frequency [1]: 100 Hz is out of range; allowed: greater than the "
                + "previous point, 100 Hz", assertThrows(InvalidQuantityException.class,
                        () -> PermeabilityModel.table(new double[] {100, 100}, new double[] {1, 1},
                                new double[] {0, 0})).getMessage());
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.table(new double[] {100, 50}, new double[] {1, 1}, new double[] {0, 0}));
        assertEquals("permeability table real part [1]: 0 (relative) is out of range; allowed: finite and greater "
                + "than 0 (relative)", assertThrows(InvalidQuantityException.class,
                        () -> PermeabilityModel.table(new double[] {1, 2}, new double[] {1, 0},
                                new double[] {0, 0})).getMessage());
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.table(new double[] {0, 2}, new double[] {1, 1}, new double[] {0, 0}));
        assertThrows(InvalidQuantityException.class,
                () -> PermeabilityModel.table(new double[] {1, 2}, new double[] {1, 1}, new double[] {0, -1}));
        assertThrows(NullPointerException.class, () -> PermeabilityModel.table(null, new double[1], new double[1]));
        assertThrows(NullPointerException.class, () -> PermeabilityModel.table(new double[1], null, new double[1]));
        assertThrows(NullPointerException.class, () -> PermeabilityModel.table(new double[1], new double[1], null));
    }

    @Test
    void constantPermeabilityAndItsSharedUnitValue() {
        assertSame(ConstantPermeability.ONE, PermeabilityModel.constant(1));
        assertSame(ConstantPermeability.ONE, PermeabilityModel.constant(RelativePermeability.ONE));
        PermeabilityModel c = PermeabilityModel.constant(RelativePermeability.ofComplex(300, 20));
        assertEquals(300, c.real(1e9), 0);
        assertEquals(20, c.loss(1e-3), 0);
        assertEquals(RelativePermeability.ofComplex(300, 20), ((ConstantPermeability) c).value());
        assertEquals(c, PermeabilityModel.constant(RelativePermeability.ofComplex(300, 20)));
        assertEquals(c.hashCode(), PermeabilityModel.constant(RelativePermeability.ofComplex(300, 20)).hashCode());
        assertNotEquals(c, PermeabilityModel.constant(300));
        assertEquals("µr 300 - j 20", c.toString());
        assertThrows(NullPointerException.class, () -> PermeabilityModel.constant((RelativePermeability) null));
    }

    @Test
    void skinDepthUsesTheMagnitudeOfTheComplexPermeability() {
        // δ = 1/sqrt(π f µ σ) (Ott 2009 ch. 6); annealed copper at 1 MHz: about 66 µm
        // (Ott 2009, table 6-2, 0.0026 in).
        Medium copper = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);
        double expected = 1 / Math.sqrt(Math.PI * 1e6 * MU0 * 58e6);
        assertEquals(expected, copper.skinDepth(Frequency.ofMegahertz(1)).toMetres(), expected * 1e-12);
        assertEquals(66e-6, copper.skinDepth(Frequency.ofMegahertz(1)).toMetres(), 0.2e-6);
        // |µr| = 5 for µr = 3 − j4.
        PermeabilityModel lossy = PermeabilityModel.constant(RelativePermeability.ofComplex(3, 4));
        double d5 = 1 / Math.sqrt(Math.PI * 1e3 * 5 * MU0 * 1e6);
        assertEquals(d5, lossy.skinDepth(Frequency.ofKilohertz(1), io.shieldmath.shield.quantity.Conductivity.ofSiemensPerMetre(1e6)).toMetres(), d5 * 1e-12);
        assertEquals("conductivity: 0 S/m is out of range; allowed: finite and greater than 0 S/m",
                assertThrows(InvalidQuantityException.class,
                        () -> lossy.skinDepth(Frequency.ofKilohertz(1), io.shieldmath.shield.quantity.Conductivity.ZERO)).getMessage());
        assertThrows(InvalidQuantityException.class, () -> Medium.AIR.skinDepth(Frequency.ofKilohertz(1)));
        assertThrows(NullPointerException.class, () -> lossy.skinDepth(null, io.shieldmath.shield.quantity.Conductivity.ofSiemensPerMetre(1)));
        assertThrows(NullPointerException.class, () -> lossy.at(null));
    }

    @Test
    void mediaAreValuesWithCheckedParts() {
        Medium steel = Medium.conductor("  steel  ", Conductivity.ofMegasiemensPerMetre(7),
                PermeabilityModel.constant(500));
        assertEquals("steel", steel.name());
        assertEquals(Conductivity.ofMegasiemensPerMetre(7), steel.conductivity());
        assertEquals(RelativePermittivity.ONE, steel.permittivity());
        assertEquals(500, steel.permeabilityAt(Frequency.ofHertz(50)).real(), 0);
        assertSame(steel, steel.medium());
        assertEquals("steel (σ 7 MS/m, µr 500, εr 1)", steel.toString());
        Medium ptfe = Medium.dielectric("PTFE", 2.1);
        assertEquals(Conductivity.ZERO, ptfe.conductivity());
        assertEquals(2.1, ptfe.permittivity().value(), 0);
        assertSame(ConstantPermeability.ONE, ptfe.permeability());

        Medium same = Medium.of("steel", Conductivity.ofSiemensPerMetre(7e6), PermeabilityModel.constant(500),
                RelativePermittivity.ONE);
        assertEquals(steel, same);
        assertEquals(steel.hashCode(), same.hashCode());
        assertNotEquals(steel, steel.withName("iron"));
        assertNotEquals(steel, steel.withConductivity(Conductivity.ofMegasiemensPerMetre(6)));
        assertNotEquals(steel, steel.withPermeability(PermeabilityModel.constant(400)));
        assertNotEquals(steel, steel.withPermittivity(RelativePermittivity.of(2)));
        assertEquals("iron", steel.withName("iron").name());
        assertEquals(Conductivity.ofMegasiemensPerMetre(6),
                steel.withConductivity(Conductivity.ofMegasiemensPerMetre(6)).conductivity());
        assertEquals(400, steel.withPermeability(PermeabilityModel.constant(400)).permeability().staticValue(), 0);
        assertEquals(RelativePermittivity.of(2), steel.withPermittivity(RelativePermittivity.of(2)).permittivity());
        assertEquals("steel", steel.name());          // the receiver is unchanged

        assertEquals("medium name must not be blank", assertThrows(IllegalArgumentException.class,
                () -> steel.withName(" \t")).getMessage());
        assertThrows(NullPointerException.class, () -> steel.withName(null));
        assertThrows(NullPointerException.class, () -> steel.withConductivity(null));
        assertThrows(NullPointerException.class, () -> steel.withPermeability(null));
        assertThrows(NullPointerException.class, () -> steel.withPermittivity(null));
        assertTrue(Medium.VACUUM.conductivity().toSi() == 0 && Medium.AIR.permittivity().value() == 1);
        assertEquals("free space", Medium.VACUUM.name());
        assertEquals("air", Medium.AIR.name());
    }
}
