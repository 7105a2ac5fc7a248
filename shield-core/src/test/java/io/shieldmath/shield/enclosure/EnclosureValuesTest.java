/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.model.Sweep;
import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.amperesPerMetre;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.tesla;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Value semantics, validation and the edges of the enclosure rules. Physics values are the rules
 * of the published rules (Ott 2009 ch. 6 aperture and cut-off rules; Bethe 1944 polarizability; Kaden
 * thin-shell factors; Jackson §5.12 static shells).
 */
class EnclosureValuesTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);   // IEC 60028
    private static final Medium ALLOY = ShellStaticTest.magnetic(30_000);

    @Test
    void wallsKnowTheirRadii() {
        Shell s = Shell.sphere(cm(10)).wall(COPPER, mm(2)).thenGap(mm(8)).then(ALLOY, mm(1));
        assertEquals(2, s.walls().size());
        Wall outer = s.walls().get(1);
        assertEquals(0.11, outer.innerRadius().toMetres(), 1e-15);
        assertEquals(0.111, outer.outerRadius().toMetres(), 1e-15);
        assertEquals(0.1105, outer.meanRadius().toMetres(), 1e-15);
        assertEquals(0.001, outer.thickness().toMetres(), 1e-15);
        assertEquals(0.11, outer.innerMetres(), 1e-15);
        assertEquals(0.111, outer.outerMetres(), 1e-15);
        assertEquals(ALLOY, outer.medium());
        assertEquals("1 mm µr 30000.0 at radius 110 mm", outer.toString());
        assertEquals(0.111, s.outerRadius().toMetres(), 1e-15);
        Wall same = Shell.sphere(cm(10)).wall(COPPER, mm(2)).thenGap(mm(8)).then(ALLOY, mm(1)).walls().get(1);
        assertEquals(outer, same);
        assertEquals(outer.hashCode(), same.hashCode());
        assertNotEquals(outer, s.walls().get(0));
        assertNotEquals(outer, Shell.sphere(cm(10)).wall(COPPER, mm(2)).thenGap(mm(9)).then(ALLOY, mm(1))
                .walls().get(1));
        assertNotEquals(outer, Shell.sphere(cm(10)).wall(COPPER, mm(2)).thenGap(mm(8)).then(ALLOY, mm(2))
                .walls().get(1));
        assertNotEquals(outer, Shell.sphere(cm(10)).wall(COPPER, mm(2)).thenGap(mm(8)).then(COPPER, mm(1))
                .walls().get(1));
    }

    @Test
    void shellsAreValuesAndRefuseTooManyWalls() {
        Shell a = Shell.cylinderTransverse(cm(5)).wall(COPPER, mm(1)).thenGap(mm(2)).then(ALLOY, mm(1));
        Shell b = Shell.cylinderTransverse(cm(5)).wall(COPPER, mm(1)).thenGap(mm(2)).then(ALLOY, mm(1));
        assertEquals(a, b);
        assertEquals(a.hashCode(), b.hashCode());
        assertNotEquals(a, Shell.cylinderAxial(cm(5)).wall(COPPER, mm(1)).thenGap(mm(2)).then(ALLOY, mm(1)));
        assertNotEquals(a, Shell.cylinderTransverse(cm(5)).wall(COPPER, mm(1)));
        assertEquals(3, a.layers().size());
        assertEquals(ShellGeometry.CYLINDER_TRANSVERSE, a.geometry());
        assertEquals(Shell.cylinderTransverse(cm(5)), a.shape());
        assertEquals("long cylinder of inner radius 50 mm, field across the axis: 1 mm copper | 2 mm air | "
                + "1 mm µr 30000.0", a.toString());
        // The planar stand-in lists the layers from the outside in.
        assertEquals(List.of(Layer.of(ALLOY, mm(1)), Layer.gap(mm(2)), Layer.of(COPPER, mm(1))),
                a.toBarrier().layers());
        Shell s = Shell.sphere(cm(10)).wall(COPPER, mm(1));
        for (int i = 1; i < Shell.MAX_WALLS; i++) {
            s = s.then(COPPER, mm(1));
        }
        assertEquals(Shell.MAX_WALLS, s.walls().size());
        Shell full = s;
        assertEquals("a shell has at most 8 walls; got 9",
                assertThrows(IllegalArgumentException.class, () -> full.then(COPPER, mm(1))).getMessage());
        Medium tooGood = Medium.conductor("x", io.shieldmath.shield.quantity.Conductivity.ofSiemensPerMetre(2e10), 1);
        assertEquals("wall 2 conductivity: 20000000000 S/m is out of range; allowed: from 0 S/m to 10000000000 S/m",
                assertThrows(InvalidQuantityException.class, () -> Shell.sphere(cm(10)).wall(COPPER, mm(1))
                        .thenGap(mm(1)).then(tooGood, mm(1))).getMessage());
        // The frequency range is closed at both ends.
        Shell one = Shell.sphere(cm(10)).wall(COPPER, mm(1));
        one.shieldingEffectivenessDb(Shell.MIN_HERTZ);
        one.shieldingEffectivenessDb(Shell.MAX_HERTZ);
        assertThrows(InvalidQuantityException.class, () -> one.shieldingEffectivenessDb(Math.nextUp(Shell.MAX_HERTZ)));
        assertThrows(InvalidQuantityException.class, () -> one.at(Hz(2e11)));
        assertThrows(InvalidQuantityException.class, () -> one.sweep(FrequencyBand.of(Hz(1e-7), Hz(1)), 2));
        assertThrows(InvalidQuantityException.class, () -> one.sweep(FrequencyBand.of(Hz(1), Hz(2e11)), 2));
        assertEquals(one.at(kHz(3)).shieldingEffectivenessDb(), one.shieldingEffectivenessDb(3e3), 1e-12);
        assertThrows(InvalidQuantityException.class, () -> one.saturation(amperesPerMetre(1), tesla(0)));
        assertThrows(NullPointerException.class, () -> one.saturation(null, tesla(1)));
        assertThrows(NullPointerException.class, () -> one.saturation(amperesPerMetre(1), null));
    }

    @Test
    void shapesDescribeThemselvesAndCheckTheirRadius() {
        assertEquals("sphere of inner radius 100 mm", Shell.sphere(cm(10)).description());
        assertEquals("long cylinder of inner radius 100 mm, field across the axis",
                Shell.cylinderTransverse(cm(10)).toString());
        assertEquals("long cylinder of inner radius 100 mm, field along the axis",
                Shell.cylinderAxial(cm(10)).description());
        ShellShape box = Shell.box(cm(30), cm(20), cm(15));
        assertEquals(ShellGeometry.SPHERE, box.geometry());
        assertEquals(cm(15), box.innerRadius());
        assertEquals("box 300 mm × 200 mm × 150 mm as its equivalent sphere of inner radius 150 mm",
                box.description());
        assertEquals(box, Shell.box(cm(30), cm(20), cm(15)));
        assertEquals(box.hashCode(), Shell.box(cm(30), cm(20), cm(15)).hashCode());
        assertNotEquals(box, Shell.sphere(cm(15)));                       // same radius, other description
        assertNotEquals(Shell.sphere(cm(15)), Shell.sphere(cm(16)));
        assertNotEquals(Shell.sphere(cm(15)), Shell.cylinderAxial(cm(15)));
        // Radius range 1 µm to 100 m, both ends included.
        Shell.sphere(m(1e-6));
        Shell.sphere(m(100));
        assertEquals("shell inner radius: 200 m is out of range; allowed: from 1e-6 m to 100 m",
                assertThrows(InvalidQuantityException.class, () -> Shell.sphere(m(200))).getMessage());
        assertThrows(InvalidQuantityException.class, () -> Shell.cylinderAxial(m(1e-7)));
        assertThrows(InvalidQuantityException.class, () -> Shell.box(m(300), m(200), m(150)));   // 150 m radius
        // Aspect ratio 1 to 3, both ends included.
        Shell.box(cm(30), cm(10), cm(10));
        assertThrows(InvalidQuantityException.class, () -> Shell.box(cm(31), cm(10), cm(10)));
        assertThrows(NullPointerException.class, () -> Shell.box(null, cm(1), cm(1)));
        assertThrows(NullPointerException.class, () -> Shell.box(cm(1), null, cm(1)));
        assertThrows(NullPointerException.class, () -> Shell.box(cm(1), cm(1), null));
        assertThrows(NullPointerException.class, () -> Shell.sphere(null));
    }

    @Test
    void openingsAreValuesWithTheirParts() {
        Opening h = Opening.holes(mm(4), 12).throughTube(mm(10)).atDistance(cm(5)).named("  vent  ");
        assertEquals(Opening.Kind.HOLE, h.kind());
        assertEquals(mm(4), h.largestDimension());
        assertEquals(12, h.count());
        assertEquals(Optional.of(mm(10)), h.tubeDepth());
        assertEquals(Optional.of(cm(5)), h.victimDistance());
        assertEquals("vent", h.name());
        assertEquals("vent through a tube of 10 mm", h.toString());
        assertEquals("12 holes of 4 mm", Opening.holes(mm(4), 12).toString());
        assertEquals("hole 4 mm", Opening.hole(mm(4)).name());
        assertEquals("slot 20 mm × 3 mm", Opening.slot(mm(20), mm(3)).name());
        assertEquals("seam 80 mm", Opening.seam(cm(8)).name());
        assertEquals(Opening.Kind.SEAM, Opening.seam(cm(8)).kind());
        assertEquals(Opening.Kind.SLOT, Opening.slot(mm(20), mm(3)).kind());
        assertEquals(Optional.empty(), Opening.hole(mm(4)).tubeDepth());
        assertEquals(Optional.empty(), Opening.hole(mm(4)).victimDistance());
        Opening same = Opening.holes(mm(4), 12).throughTube(mm(10)).atDistance(cm(5)).named("vent");
        assertEquals(h, same);
        assertEquals(h.hashCode(), same.hashCode());
        assertNotEquals(h, same.named("grille"));
        assertNotEquals(h, Opening.holes(mm(4), 13).throughTube(mm(10)).atDistance(cm(5)).named("vent"));
        assertNotEquals(h, Opening.holes(mm(5), 12).throughTube(mm(10)).atDistance(cm(5)).named("vent"));
        assertNotEquals(h, Opening.holes(mm(4), 12).throughTube(mm(11)).atDistance(cm(5)).named("vent"));
        assertNotEquals(h, Opening.holes(mm(4), 12).throughTube(mm(10)).atDistance(cm(6)).named("vent"));
        assertNotEquals(Opening.slot(mm(20), mm(3)).named("a"), Opening.slot(mm(20), mm(4)).named("a"));
        assertNotEquals(Opening.slot(mm(20), mm(20)).named("a"), Opening.hole(mm(20)).named("a"));
        // Validation: sizes 1 µm to 100 m, count 1 to MAX_COUNT, width not above the length.
        Opening.slot(mm(20), mm(20));
        assertEquals("slot width: 0.021 m is out of range; allowed: from 0 m to 0.02 m",
                assertThrows(InvalidQuantityException.class, () -> Opening.slot(mm(20), mm(21))).getMessage());
        assertEquals("hole count: 0 (holes) is out of range; allowed: from 1 (holes) to 1000000000 (holes)",
                assertThrows(InvalidQuantityException.class, () -> Opening.holes(mm(4), 0)).getMessage());
        Opening.holes(mm(4), Opening.MAX_COUNT);
        assertThrows(InvalidQuantityException.class, () -> Opening.hole(m(101)));
        assertThrows(InvalidQuantityException.class, () -> Opening.hole(m(1e-7)));
        assertThrows(NullPointerException.class, () -> Opening.hole(null));
        assertThrows(InvalidQuantityException.class, () -> Opening.hole(mm(4)).atDistance(m(200)));
        assertEquals("opening name must not be blank",
                assertThrows(IllegalArgumentException.class, () -> Opening.hole(mm(4)).named(" ")).getMessage());
        assertThrows(NullPointerException.class, () -> Opening.hole(mm(4)).named(null));
    }

    @Test
    void apertureAndTubeRulesAtTheirEdges() {
        // SE ≈ 20·log10(λ/(2L)) for L < λ/2, 0 from L = λ/2 on (Ott 2009 ch. 6).
        double c = PhysicalConstants.SPEED_OF_LIGHT;
        Opening slot = Opening.slot(m(0.5), mm(1));
        assertEquals(0, slot.apertureDb(c), 1e-12);                           // λ = 1 m: L = λ/2 exactly
        assertEquals(20 * Math.log10(2), slot.apertureDb(c / 2), 1e-12);       // λ = 2 m
        assertEquals(0, slot.apertureDb(2 * c), 0);                            // L > λ/2
        assertEquals(20 * Math.log10(10), slot.apertureDb(c / 10), 1e-12);
        // n openings: −20·log10(sqrt(n)) = −10·log10(n) (Ott 2009 ch. 6); never below 0 dB in total.
        Opening four = Opening.holes(mm(1), 4);
        assertEquals(four.apertureDb(1e8) - 10 * Math.log10(4), four.farFieldDb(1e8), 1e-12);
        assertEquals(0, Opening.holes(mm(100), 1000).farFieldDb(1e9), 0);
        // Cut-off wavelength: TE11 of a round tube λc = πD/1.8412; TE10 of a rectangular one λc = 2w.
        assertEquals(Math.PI * 0.01 / 1.8412, Opening.hole(mm(10)).cutoffWavelength(), 1e-15);
        assertEquals(0.04, Opening.slot(mm(20), mm(2)).cutoffWavelength(), 1e-15);
        // Below cut-off α = (2π/λc)·sqrt(1 − (f/fc)²), 8.686 dB per neper; 0 at and above cut-off.
        Opening tube = Opening.slot(mm(20), mm(2)).throughTube(mm(30));
        double fc = c / 0.04;
        assertEquals(0, tube.tubeDb(fc), 0);
        assertEquals(0, tube.tubeDb(1.5 * fc), 0);
        double half = 20 / Math.log(10) * 0.03 * 2 * Math.PI / 0.04 * Math.sqrt(1 - 0.25);
        assertEquals(half, tube.tubeDb(0.5 * fc), 1e-9);
        assertEquals(0, Opening.hole(mm(10)).tubeDb(1e6), 0);
        assertEquals(tube.apertureDb(1e8) + tube.tubeDb(1e8), tube.farFieldDb(1e8), 1e-12);
    }

    @Test
    void magneticLeakageUsesTheSurfaceFieldOfEachShape() {
        // τ = k·(4/3)r³/(2π d³)·n with the wall field k·H0 of a perfect-conductor shell: 3/2 for a sphere,
        // 2 for a cylinder across the field, 1 along it (standard boundary-value results; Bethe 1944).
        double r = 0.001;
        double d = 0.05;
        double base = (4.0 / 3) * r * r * r / (2 * Math.PI * d * d * d);
        Opening hole = Opening.holes(m(2 * r), 3);
        assertEquals(-20 * Math.log10(1.5 * base * 3), hole.magneticDb(1e3, ShellGeometry.SPHERE, d), 1e-9);
        assertEquals(-20 * Math.log10(2 * base * 3), hole.magneticDb(1e3, ShellGeometry.CYLINDER_TRANSVERSE, d),
                1e-9);
        assertEquals(-20 * Math.log10(base * 3), hole.magneticDb(1e3, ShellGeometry.CYLINDER_AXIAL, d), 1e-9);
        // The victim distance, when given, replaces the default.
        assertEquals(-20 * Math.log10(1.5 * base * 3 * 8), hole.atDistance(m(d / 2)).magneticDb(1e3,
                ShellGeometry.SPHERE, d), 1e-9);
        // A tube adds its cut-off attenuation.
        Opening tubed = hole.throughTube(mm(5));
        assertEquals(hole.magneticDb(1e3, ShellGeometry.SPHERE, d) + tubed.tubeDb(1e3),
                tubed.magneticDb(1e3, ShellGeometry.SPHERE, d), 1e-9);
        assertTrue(tubed.tubeDb(1e3) > 0);
        // A hole as large as the distance leaks everything: never below 0 dB.
        assertEquals(0, Opening.hole(m(1)).magneticDb(1e3, ShellGeometry.SPHERE, 0.1), 0);
    }

    @Test
    void enclosuresAreValuesAndNameTheirPaths() {
        Shell s = Shell.sphere(cm(10)).wall(COPPER, mm(1));
        Enclosure e = Enclosure.of(s).withOpening(Opening.hole(mm(5)).named("hole"));
        assertSame(e, e.withPathSum(PathSum.MAGNITUDES));
        assertEquals(PathSum.MAGNITUDES, e.pathSum());
        Enclosure rss = e.withPathSum(PathSum.ROOT_SUM_SQUARE);
        assertEquals(PathSum.ROOT_SUM_SQUARE, rss.pathSum());
        assertNotEquals(e, rss);
        assertEquals(e, Enclosure.of(s).withOpening(Opening.hole(mm(5)).named("hole")));
        assertEquals(e.hashCode(), Enclosure.of(s).withOpening(Opening.hole(mm(5)).named("hole")).hashCode());
        assertNotEquals(e, Enclosure.of(s));
        assertNotEquals(e, Enclosure.of(Shell.sphere(cm(11)).wall(COPPER, mm(1)))
                .withOpening(Opening.hole(mm(5)).named("hole")));
        assertSame(s, e.shell());
        assertEquals(1, e.openings().size());
        assertEquals("sphere of inner radius 100 mm: 1 mm copper with 1 openings", e.toString());
        assertEquals(e + " in a uniform magnetic field", e.inUniformField().toString());
        assertEquals(e + " facing plane wave", e.facing(IncidentField.planeWave()).toString());
        assertSame(e, e.inUniformField().enclosure());
        Enclosure many = Enclosure.of(s);
        for (int i = 0; i < Enclosure.MAX_OPENINGS; i++) {
            many = many.withOpening(Opening.hole(mm(1)));
        }
        Enclosure full = many;
        assertEquals("an enclosure has at most 256 openings",
                assertThrows(IllegalArgumentException.class, () -> full.withOpening(Opening.hole(mm(1)))).getMessage());
        assertThrows(NullPointerException.class, () -> e.withOpening(null));
        assertThrows(NullPointerException.class, () -> e.withPathSum(null));
        assertThrows(NullPointerException.class, () -> e.facing(null));
        assertThrows(NullPointerException.class, () -> Enclosure.of(null));
        assertThrows(NullPointerException.class, () -> e.inUniformField().at(null));

        // Results: shares of the leakage add to 1; the static result has no frequency.
        EnclosureResult at = e.facing(IncidentField.planeWave()).at(MHz(300));
        assertEquals(Optional.of(MHz(300)), at.frequency());
        double shares = 0;
        for (LeakagePath p : at.paths()) {
            shares += p.share();
        }
        assertEquals(1, shares, 1e-12);
        assertTrue(at.wall().isWall());
        assertFalse(at.paths().get(1).isWall());
        assertEquals("wall", at.wall().name());
        assertEquals("aperture rule λ/(2L)", at.paths().get(1).model());
        assertEquals(at.shieldingEffectivenessDb(), at.shieldingEffectiveness().toDb(), 0);
        assertEquals(PathSum.MAGNITUDES, at.pathSum());
        assertEquals(String.format(java.util.Locale.ROOT, "SE %.1f dB at 300 MHz, limited by %s", at.shieldingEffectivenessDb(),
                at.limitingPath()), at.toString());
        LeakagePath hole = at.paths().get(1);
        assertEquals(String.format(java.util.Locale.ROOT, "hole: %.1f dB (%.1f %% of the leakage; aperture rule "
                + "λ/(2L))", hole.shieldingEffectivenessDb(), 100 * hole.share()), hole.toString());
        EnclosureResult again = e.facing(IncidentField.planeWave()).at(MHz(300));
        assertEquals(hole, again.paths().get(1));
        assertEquals(hole.hashCode(), again.paths().get(1).hashCode());
        assertNotEquals(hole, at.wall());
        EnclosureResult still = e.staticShielding();
        assertEquals(Optional.empty(), still.frequency());
        assertTrue(still.toString().contains(" (static), limited by "), still::toString);
        assertEquals("static shell, exact", still.wall().model());
        String models = Enclosure.of(s).withOpening(Opening.holes(mm(2), 4).throughTube(mm(5)))
                .facing(IncidentField.planeWave()).at(MHz(100)).paths().get(1).model();
        assertEquals("aperture rule λ/(2L), sqrt(n), tube below cut-off", models);
        assertEquals("Bethe magnetic polarizability, tube below cut-off", Enclosure.of(s)
                .withOpening(Opening.hole(mm(2)).throughTube(mm(5))).inUniformField().at(kHz(1)).paths().get(1)
                .model());
        assertEquals(5, e.facing(IncidentField.planeWave()).sweep(FrequencyBand.parse("1 MHz to 1 GHz"), 5).size());
        assertThrows(NullPointerException.class, () -> e.inUniformField().sweep(null, 3));
    }

    @Test
    void shellResultsCarryPhaseThinShellFactorAndTheQuasiStaticWarning() {
        Shell s = Shell.cylinderTransverse(cm(5)).wall(COPPER, mm(0.5));
        ShellResult r = s.at(kHz(10));
        Complex sf = io.shieldmath.shield.TestComplex.cm(r.complexShieldingFactor());
        assertEquals(r.shieldingEffectivenessDb(), 20 * Math.log10(sf.abs()), 1e-9);
        assertEquals(r.phase(), sf.getArgument(), 1e-12);
        assertEquals(Math.pow(10, r.shieldingEffectivenessDb() / 20), r.shieldingFactor().value(), 1e-9 * r.shieldingFactor().value());
        assertEquals(r.shieldingEffectivenessDb(), r.shieldingEffectiveness().toDb(), 0);
        assertSame(s, r.shell());
        assertEquals(kHz(10), r.frequency());
        // Kaden, cylinder across the field: S = cosh(kt) + ½(kR/µr + µr/(kR))·sinh(kt), k = (1+j)/δ,
        // evaluated here with Commons Math Complex at the wall's mean radius.
        double delta = COPPER.skinDepth(kHz(10)).toMetres();
        Complex k = new Complex(1, 1).divide(delta);
        double t = 0.0005;
        double rm = 0.05025;
        Complex kr = k.multiply(rm);
        Complex kaden = k.multiply(t).cosh().add(kr.add(kr.reciprocal()).multiply(0.5).multiply(k.multiply(t).sinh()));
        assertEquals(kaden.abs(), r.thinShellFactor(0).abs(), 1e-9 * kaden.abs());
        assertEquals(20 * Math.log10(kaden.abs()), r.thinShellDb(0), 1e-9);
        // k0·R ≤ 0.1 is quasi-static: R = 50.5 mm gives the limit near 94.5 MHz.
        assertTrue(r.isQuasiStatic());
        assertEquals(List.of(), r.warnings());
        double fLimit = 0.1 * PhysicalConstants.SPEED_OF_LIGHT / (2 * Math.PI * 0.0505);
        assertTrue(s.at(Hz(fLimit * 0.999)).isQuasiStatic());
        ShellResult fast = s.at(Hz(fLimit * 1.01));
        assertFalse(fast.isQuasiStatic());
        assertEquals(1, fast.warnings().size());
        assertTrue(fast.warnings().get(0).startsWith("the shell is not small against the wavelength at "));
        assertEquals(String.format(java.util.Locale.ROOT, "|S| %.2f dB, arg S %.3f rad at 10 kHz", r.shieldingEffectivenessDb(),
                r.phase()), r.toString());
        // Sweep: values, frequencies, worst point (|S| of a conducting shell rises with frequency).
        Sweep<ShellResult> sw = s.sweep(FrequencyBand.parse("10 Hz to 100 kHz"), 5);
        assertEquals(5, sw.size());
        assertEquals(5, sw.results().size());
        assertEquals(10, sw.frequenciesHertz()[0], 0);
        assertEquals(1e5, sw.frequenciesHertz()[4], 0);
        assertEquals(s.at(kHz(1)).shieldingEffectivenessDb(), sw.shieldingEffectivenessDb()[2], 1e-12);
        assertEquals(sw.shieldingEffectivenessDb()[0], sw.lowestSampled().shieldingEffectivenessDb(), 0);
        assertTrue(sw.shieldingEffectivenessDb()[4] > sw.shieldingEffectivenessDb()[0]);
        assertTrue(sw.toString().startsWith("sweep of 5 points from 10 Hz to 100 kHz, lowest sampled: |S| "), sw::toString);
        assertThrows(NullPointerException.class, () -> s.sweep(null, 3));
        assertThrows(NullPointerException.class, () -> s.at(null));
    }

    @Test
    void staticResultsAndTheirHandForms() {
        // Single thin sphere: S ≈ 1 + (2/3)µr·t/R (Kaden 1959, from memory), the Kaden static factor.
        Shell sphere = Shell.sphere(cm(10)).wall(ALLOY, mm(1));
        StaticShielding st = sphere.staticShielding();
        assertSame(sphere, st.shell());
        assertEquals(1 + 2.0 / 3 * 30_000 * 0.001 / 0.1005, st.thinShellFactor(0), 1e-9);
        assertEquals(20 * Math.log10(st.factor()), st.shieldingEffectivenessDb(), 1e-9);
        assertEquals(st.factor(), st.shieldingFactor().value(), 1e-9 * st.factor());
        assertEquals(st.shieldingEffectivenessDb(), st.shieldingEffectiveness().toDb(), 0);
        assertEquals(st.singleWallFactor(0), st.productFactor(), 0);
        // Jackson's exact sphere for the single wall.
        assertEquals(ShellStaticTest.jacksonSphere(30_000, 0.1, 0.101), st.singleWallFactor(0),
                1e-9 * st.singleWallFactor(0));
        // Spaced product: ∏S_i·∏(1 − (R_i/R_{i+1})^n), n = 3 sphere, 2 cylinder; no penalty along the axis
        // (Sumner, Pendlebury and Smith 1987).
        Shell two = Shell.sphere(cm(10)).wall(ALLOY, mm(1)).thenGap(cm(2)).then(ALLOY, mm(1));
        StaticShielding s2 = two.staticShielding();
        double ratio = 0.1005 / 0.1215;
        assertEquals(s2.productFactor() * (1 - Math.pow(ratio, 3)), s2.spacedProductFactor(),
                1e-9 * s2.spacedProductFactor());
        assertEquals(s2.singleWallFactor(0) * s2.singleWallFactor(1), s2.productFactor(), 1e-9 * s2.productFactor());
        Shell cyl = Shell.cylinderTransverse(cm(10)).wall(ALLOY, mm(1)).thenGap(cm(2)).then(ALLOY, mm(1));
        StaticShielding c2 = cyl.staticShielding();
        assertEquals(c2.productFactor() * (1 - Math.pow(ratio, 2)), c2.spacedProductFactor(),
                1e-9 * c2.spacedProductFactor());
        Shell axial = Shell.cylinderAxial(cm(10)).wall(ALLOY, mm(1)).thenGap(cm(2)).then(ALLOY, mm(1));
        StaticShielding a2 = axial.staticShielding();
        assertEquals(a2.productFactor(), a2.spacedProductFactor(), 0);
        assertEquals(1, axial.staticShielding().thinShellFactor(0), 0);     // no static shielding along the axis
        assertEquals(String.format(java.util.Locale.ROOT, "static S %.4g (%.2f dB); product %.4g, spaced product %.4g",
                s2.factor(), s2.shieldingEffectivenessDb(), s2.productFactor(), s2.spacedProductFactor()), s2.toString());
    }

    @Test
    void saturationThresholdsAndHandEstimatesOfEachShape() {
        Shell axial = Shell.cylinderAxial(cm(5)).wall(ALLOY, mm(1));
        SaturationCheck a = axial.saturation(amperesPerMetre(10), tesla(0.75));
        // Along the axis the wall carries µ0·µr·H0 (hand form of the class), and no thickness fixes it.
        assertEquals(PhysicalConstants.MU_0 * 10 * 30_000, a.handEstimate(0).toTesla(), 1e-12);
        assertEquals(Optional.empty(), a.suggestedMinimumThickness(0));
        assertEquals(1, a.wallCount());
        assertEquals(amperesPerMetre(10), a.ambient());
        assertEquals(tesla(0.75), a.saturationFluxDensity());
        assertEquals(a.wallFluxDensity(0).toTesla() / 0.75, a.fractionOfSaturation(0), 1e-15);
        // A zero ambient field carries no flux: no warning, no thickness suggestion.
        SaturationCheck none = Shell.sphere(cm(5)).wall(ALLOY, mm(1)).saturation(amperesPerMetre(0), tesla(0.75));
        assertFalse(none.isWarning());
        assertFalse(none.isSaturated());
        assertEquals(Optional.empty(), none.suggestedMinimumThickness(0));
        assertEquals(List.of(), none.warnings());
        assertEquals("no wall above 50 % of saturation", none.toString());
        // Thresholds: warning from 50 %, saturated from 100 % of the saturation flux density.
        Shell s = Shell.sphere(cm(5)).wall(ALLOY, mm(1));
        double perAm = s.saturation(amperesPerMetre(1), tesla(1)).wallFluxDensity(0).toTesla();
        SaturationCheck half = s.saturation(amperesPerMetre(1), tesla(perAm / 0.5));
        assertEquals(0.5, half.fractionOfSaturation(0), 1e-12);
        SaturationCheck below = s.saturation(amperesPerMetre(1), tesla(perAm / 0.49));
        assertFalse(below.isWarning());
        SaturationCheck over = s.saturation(amperesPerMetre(1), tesla(perAm / 1.01));
        assertTrue(over.isWarning());
        assertTrue(over.isSaturated());
        SaturationCheck warn = s.saturation(amperesPerMetre(1), tesla(perAm / 0.7));
        assertTrue(warn.isWarning());
        assertFalse(warn.isSaturated());
        // Suggested thickness brings the wall to half of saturation: t·B/(0.5·Bsat).
        assertEquals(0.001 * 0.7 / 0.5, warn.suggestedMinimumThickness(0).get().toMetres(), 1e-12);
        assertEquals(1, warn.warnings().size());
        assertTrue(warn.warnings().get(0).startsWith("wall 1 carries "), () -> warn.warnings().get(0));
        assertTrue(warn.warnings().get(0).contains("70 % of the saturation flux density"), () -> warn.warnings().get(0));
        assertTrue(warn.warnings().get(0).contains("; make it at least 1.4 mm thick"), () -> warn.warnings().get(0));
        assertEquals(warn.warnings().get(0), warn.toString());
        SaturationCheck axialWarn = axial.saturation(amperesPerMetre(10), tesla(a.wallFluxDensity(0).toTesla() / 0.7));
        assertFalse(axialWarn.warnings().get(0).contains("make it at least"), () -> axialWarn.warnings().get(0));
    }
}
