/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.planar.Barrier;
import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A disc much wider than the coils against the exact spectral model of an infinite sheet
 * between coaxial loops (J. R. Moser, IEEE Trans. EMC 9 (1967) 6; C. V. Dodd &amp; W. E. Deeds,
 * J. Appl. Phys. 39 (1968) 2829), as implemented by shield-core's {@code CouplingEvaluation}
 * (itself checked there against an adaptive Commons Math integration): within 0.1 dB.
 *
 * <p>Bench: two one-turn loops of 10 mm radius, centre planes 20 mm apart, the disc midway.
 * Disc radius 400 mm (40 coil radii) for non-magnetic plates; 1 m (100 radii) for the
 * permeable ones, which channel flux out to the rim (measured: at 40 radii a 0.1 mm
 * nickel-iron foil at 60 Hz still reads 0.15 dB below the sheet, at 100 radii 0.02 dB).
 * Materials from the built-in catalogue: copper (58 MS/m), aluminium 1100, austenitic
 * stainless 304, low-carbon steel 1010 (µr 1000 relaxing above 20 kHz) and 80 % nickel-iron
 * with its tabulated µ(f). The matrix is a representative selection of the 5 materials ×
 * 4 frequencies, chosen to stay within the test-time budget, with three plates about ten
 * skin depths thick.
 */
class InfiniteSheetLimitTest {

    private static final Catalogue CATALOGUE = Catalogue.builtIn();
    private static final CoilPair PAIR = CoilPair.coaxial(Coil.loop(mm(10), 1), Coil.loop(mm(10), 1), mm(20));

    @ParameterizedTest(name = "{0} {2} mm at {1} Hz")
    @CsvSource({
        // material,        Hz,     mm,   disc radius m
        "copper-annealed,   60,     0.5,  0.4",
        "copper-annealed,   1000,   0.5,  0.4",
        "copper-annealed,   10000,  0.5,  0.4",
        "copper-annealed,   100000, 0.5,  0.4",
        "copper-annealed,   100000, 2.0,  0.4",   // 9.6 skin depths
        "aluminium-1100-o,  1000,   1.0,  0.4",
        "stainless-304,     10000,  0.5,  0.4",
        "stainless-304,     100000, 13.5, 0.4",   // 10.1 skin depths
        "steel-1010,        60,     0.5,  1.0",
        "steel-1010,        1000,   0.2,  1.0",
        "steel-1010,        10000,  0.63, 1.0",   // 9.9 skin depths
        "nickel-iron-80,    60,     0.1,  1.0",
        "nickel-iron-80,    10000,  0.1,  1.0",
        "nickel-iron-80,    100000, 0.1,  1.0",
    })
    void wideDiscMatchesTheInfiniteSheet(String id, double hertz, double millimetres, double discRadius) {
        MediumSource material = CATALOGUE.get(id);
        double t = millimetres * 1e-3;
        CouplingSolution fe = Arrangement.of(Body.disc("plate", material, m(discRadius), m(t))).between(PAIR).at(Hz(hertz));
        double sheet = PAIR.through(Barrier.of(material, m(t))).shieldingEffectivenessDb(hertz);
        System.out.printf(Locale.ROOT, "infinite sheet: %-16s %7.0f Hz %5.2f mm  FE %9.4f dB (± %.4f)  sheet %9.4f dB  diff %+.4f dB%n",
                id, hertz, millimetres, fe.shieldingEffectivenessDb(), fe.insertionLossEstimateDb(), sheet,
                fe.shieldingEffectivenessDb() - sheet);
        assertEquals(sheet, fe.shieldingEffectivenessDb(), 0.1);
    }
}
