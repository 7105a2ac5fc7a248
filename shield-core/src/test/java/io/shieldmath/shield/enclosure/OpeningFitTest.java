/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Length;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Issue 15 item 6: an opening larger than the face it sits on, or openings whose open area
 * exceeds the wall's, are refused with a message naming the opening, its size, the face and
 * its size. The limits are plane geometry (a hole of diameter D fits a rectangle whose
 * shorter side is at least D; a segment fits up to the rectangle's diagonal; a sphere's
 * widest chord is its diameter; the areas πD²/4, L·W, 2(xy + yz + zx), 4πR²): common
 * practice, no source. The boxes and openings are invented.
 */
class OpeningFitTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);
    private static final Shell SMALL_BOX = Shell.box(cm(3), cm(2), cm(2)).wall(COPPER, mm(1));

    private static IllegalArgumentException refused(Shell shell, Opening... openings) {
        return assertThrows(IllegalArgumentException.class, () -> {
            Enclosure e = Enclosure.of(shell);
            for (Opening o : openings) {
                e = e.withOpening(o);
            }
        });
    }

    @Test
    void aHundredMetreHoleInAThreeCentimetreBoxIsRefused() {
        // Regression: this enclosure gave 89.5 dB.
        String msg = refused(SMALL_BOX, Opening.hole(m(100))).getMessage();
        assertTrue(msg.startsWith("opening \"hole 100 m\" (diameter 100 m) is larger than the face it sits on: box 30 mm"
                + " × 20 mm × 20 mm"), msg);
        assertTrue(msg.endsWith("its largest face, 30 mm × 20 mm, holds a hole of at most 20 mm across"), msg);
    }

    @Test
    void eachKindFitsUpToItsFaceAndNoFurther() {
        // Largest face 3 cm × 2 cm: a hole up to 2 cm, a slot up to the diagonal √13 cm = 3.606 cm by 2 cm,
        // a seam up to the perimeter, 10 cm.
        Enclosure ok = Enclosure.of(SMALL_BOX).withOpening(Opening.hole(cm(2)));
        assertEquals(1, ok.openings().size());
        Enclosure.of(SMALL_BOX).withOpening(Opening.slot(cm(3.6), mm(1)));
        Enclosure.of(SMALL_BOX).withOpening(Opening.seam(cm(10)));
        refused(SMALL_BOX, Opening.hole(cm(2.001)));
        assertTrue(refused(SMALL_BOX, Opening.slot(cm(3.7), mm(1)).named("cable slot")).getMessage()
                .contains("\"cable slot\" (37 mm × 1 mm)"));
        refused(SMALL_BOX, Opening.slot(cm(2.5), cm(2.1)));
        assertTrue(refused(SMALL_BOX, Opening.seam(cm(10.1))).getMessage().endsWith("has a perimeter of 100 mm"));
        // A sphere of radius 1 cm: chord 2 cm, circumference 2π cm.
        Shell sphere = Shell.sphere(cm(1)).wall(COPPER, mm(1));
        Enclosure.of(sphere).withOpening(Opening.hole(cm(2))).withOpening(Opening.seam(cm(6.28)));
        refused(sphere, Opening.hole(cm(2.01)));
        refused(sphere, Opening.slot(cm(2.01), mm(1)));
        refused(sphere, Opening.seam(cm(6.29)));
        // A long cylinder of radius 1 cm: across 2 cm, along the axis no limit, and no stated area.
        Shell tube = Shell.cylinderTransverse(cm(1)).wall(COPPER, mm(1));
        Enclosure.of(tube).withOpening(Opening.slot(m(1), cm(2))).withOpening(Opening.seam(m(5)))
                .withOpening(Opening.holes(mm(1), 1_000_000_000));
        refused(tube, Opening.hole(cm(2.01)));
        refused(tube, Opening.slot(m(1), cm(2.01)));
    }

    @Test
    void theOpenAreaOfAllOpeningsMayNotExceedTheWall() {
        // Wall area of the 3 × 2 × 2 cm box: 2(6 + 6 + 4) cm² = 32 cm². 160 holes of 5 mm: 160·π·6.25 mm² =
        // 31.4 cm², inside; 200 of them: 39.3 cm², refused.
        String msg = refused(SMALL_BOX, Opening.holes(mm(5), 200).named("vent")).getMessage();
        assertTrue(msg.startsWith("opening \"vent\" (200 openings of diameter 5 mm, 0.00392699 m² open) brings the open "
                + "area of the enclosure to 0.00392699 m², more than the inner wall area of box 30 mm × 20 mm × 20 mm"), msg);
        assertTrue(msg.endsWith(", 0.0032 m²"), msg);
        Enclosure e = Enclosure.of(SMALL_BOX).withOpening(Opening.holes(mm(5), 160)).withOpening(Opening.slot(cm(2), mm(1)));
        // 31.416 + 0.2 cm² so far; a 2 cm × 2 mm slot (0.4 cm²) brings it to 32.02 cm²: the sum is what counts.
        Enclosure before = e;
        assertThrows(IllegalArgumentException.class, () -> before.withOpening(Opening.slot(cm(2), mm(2))));
        // A seam is a joint, not a cut-out: it adds no area.
        assertEquals(3, e.withOpening(Opening.seam(cm(8))).openings().size());
        // A sphere of radius 1 cm has 4π cm² = 12.57 cm² of wall: 4 holes of 2 cm (12.57 cm²) fit, 5 do not.
        Shell sphere = Shell.sphere(cm(1)).wall(COPPER, mm(1));
        Enclosure.of(sphere).withOpening(Opening.holes(cm(1.999), 4));
        refused(sphere, Opening.holes(cm(2), 5));
    }

    @Test
    void everyAcceptedOpeningFitsItsBoxAndEveryRefusalNamesIt() {
        qt().withExamples(Integer.getInteger("shield.tries", 10_000)).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            double a = Math.exp(Math.log(0.01) + r.nextDouble() * Math.log(100));
            double[] s = {a, a * (1 + 2 * r.nextDouble()), a * (1 + 2 * r.nextDouble())};
            double min = Math.min(s[0], Math.min(s[1], s[2]));
            double max = Math.max(s[0], Math.max(s[1], s[2]));
            if (max > 3 * min) {
                return;
            }
            double middle = s[0] + s[1] + s[2] - min - max;
            Shell box = Shell.box(Length.ofMetres(s[0]), Length.ofMetres(s[1]), Length.ofMetres(s[2])).wall(COPPER, mm(1));
            double d = a * Math.exp(r.nextGaussian());
            int n = 1 + r.nextInt(1000);
            Opening o = Opening.holes(Length.ofMetres(d), n).named("probe " + seed);
            try {
                Enclosure e = Enclosure.of(box).withOpening(o);
                // Accepted: one hole fits the largest face (shorter side = the middle side), and n holes' area
                // fits the wall.
                assertTrue(d <= middle * (1 + 1e-12), () -> "seed " + seed);
                assertTrue(n * Math.PI * d * d / 4 <= 2 * (s[0] * s[1] + s[1] * s[2] + s[2] * s[0]) * (1 + 1e-12));
                assertTrue(Double.isFinite(e.facing(IncidentField.planeWave()).shieldingEffectivenessDb(1e8)));
            } catch (IllegalArgumentException refusal) {
                assertTrue(refusal.getMessage().startsWith("opening \"probe " + seed + "\" ("), refusal::getMessage);
                assertTrue(d > middle * (1 - 1e-12)
                        || n * Math.PI * d * d / 4 > 2 * (s[0] * s[1] + s[1] * s[2] + s[2] * s[0]) * (1 - 1e-12),
                        () -> "seed " + seed + ": " + refusal.getMessage());
            }
        });
    }
}
