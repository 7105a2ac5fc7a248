/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * Design value types and the edges of their rules. Physics: SE and margins in dB as 20·log10 of a
 * field ratio (common practice, no source); the wall flux estimate B ≈ B0·D/t (the thin-shell hand estimate, from memory); the rest is the
 * classes' documented arithmetic (sample mean, n − 1 standard deviation, linear percentile).
 */
class DesignValuesTest {

    /** A model given by a function, for the tools' edge cases (not physics). */
    private static io.shieldmath.shield.model.ShieldingModel<io.shieldmath.shield.model.ShieldingResult> fn(
            java.util.function.DoubleUnaryOperator seDb) {
        return io.shieldmath.shield.model.ShieldingModel.ofFunction("test function",
                FrequencyBand.of(Frequency.ofHertz(1e-6), Frequency.ofHertz(1e13)), seDb);
    }


    private static final Medium COPPER = Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1);  // IEC 60028
    private static final Medium ALLOY = Medium.conductor("alloy", Conductivity.ofMegasiemensPerMetre(1.7),
            PermeabilityModel.relaxation(30_000, Frequency.ofKilohertz(1)));                              // demo
    private static final FrequencyBand BAND = FrequencyBand.parse("50 Hz to 10 kHz");

    @Test
    void variedPermeabilityScalesTheMagnetisationOrTheWholeValueBelowOne() {
        // The documented rule of ToleranceStudy (hand values): µ' ≥ 1 scales µ' − 1 and µ''; below 1 the
        // whole µr scales, so µ' stays above 0 (the old rule gave 1 + (0.004 − 1)·1.2 = −0.195).
        assertArrayEquals(new double[] {1 + 1000 * 0.5, 20 * 0.5}, ToleranceStudy.permeability(1001, 20, 0.5), 1e-12);
        assertArrayEquals(new double[] {1, 0}, ToleranceStudy.permeability(1, 0, 3), 0);
        assertArrayEquals(new double[] {0.004 * 1.2, 2 * 1.2}, ToleranceStudy.permeability(0.004, 2, 1.2), 1e-15);
    }

    @Test
    void twoLayerAdviceEstimatesTheWallFluxOfEachOrder() {
        MagneticFluxDensity b0 = MagneticFluxDensity.ofMicrotesla(100);
        Requirement req = Requirement.none().plus(BAND, b0, MagneticFluxDensity.ofMicrotesla(10));
        IncidentField field = IncidentField.magneticNearField(Length.ofCentimetres(20), ImpedanceForm.TEXTBOOK);
        Length tc = Length.ofMillimetres(1);
        Length tm = Length.ofMillimetres(0.5);
        Length d = Length.ofCentimetres(10);
        TwoLayerAdvice.Advice a = TwoLayerAdvice.compare(COPPER, tc, ALLOY, tm, field, req,
                MagneticFluxDensity.ofTesla(0.75), d);
        // Facing the source the high-µ layer carries B0·D/t; behind the conductor B0/S_c·D/t with S_c the
        // conductor's own shielding factor at the band's lowest frequency.
        double facing = 100e-6 * 0.1 / 0.0005;
        double sc = Math.pow(10, Barrier.of(COPPER, tc).facing(field).shieldingEffectivenessDb(50) / 20);
        assertTrue(sc > 1);
        assertEquals(facing, a.magneticFirst().wallFluxDensity(), 1e-12 * facing);
        assertEquals(facing / sc, a.conductorFirst().wallFluxDensity(), 1e-9 * facing / sc);
        assertEquals(facing / 0.75, a.magneticFirst().saturationFraction(), 1e-12);
        assertEquals("conductor facing the source", a.conductorFirst().description());
        assertEquals("high-µ layer facing the source", a.magneticFirst().description());
        assertEquals(List.of(COPPER, ALLOY), List.of(a.conductorFirst().barrier().layers().get(0).medium(),
                a.conductorFirst().barrier().layers().get(1).medium()));
        // Reciprocity: both orders give the same SE, so the smaller wall flux decides.
        assertSame(a.conductorFirst(), a.recommended());
        assertTrue(a.reasoning().startsWith("Both orders give the same SE"), a::reasoning);
        assertThrows(InvalidQuantityException.class, () -> TwoLayerAdvice.compare(COPPER, tc, ALLOY, tm, field, req,
                MagneticFluxDensity.ofTesla(0), d));
        assertThrows(NullPointerException.class, () -> TwoLayerAdvice.compare(COPPER, tc, ALLOY, tm, field, req,
                null, d));
        assertThrows(NullPointerException.class, () -> TwoLayerAdvice.compare(COPPER, tc, ALLOY, tm, field, req,
                MagneticFluxDensity.ofTesla(1), null));
    }

    private static MarginReport marginOf(double marginDb) {
        Requirement.Entry e = new Requirement.Entry(BAND, MagneticFluxDensity.ofMicrotesla(10),
                MagneticFluxDensity.ofMicrotesla(1), 20);
        return new MarginReport(List.of(new MarginReport.Line(e, Frequency.ofHertz(50), 20 + marginDb, marginDb)));
    }

    @Test
    void adviceRecommendsTheLargerMarginThenTheSmallerWallFlux() {
        Barrier b = Barrier.of(COPPER, Length.ofMillimetres(1));
        TwoLayerAdvice.Option good = new TwoLayerAdvice.Option("A", b, marginOf(5), 0.9, 1.2);
        TwoLayerAdvice.Option worse = new TwoLayerAdvice.Option("B", b, marginOf(4.995), 0.1, 0.2);
        TwoLayerAdvice.Option farWorse = new TwoLayerAdvice.Option("C", b, marginOf(3), 0.1, 0.2);
        // Margins within 0.01 dB count as equal.
        assertSame(worse, new TwoLayerAdvice.Advice(good, worse).recommended());
        assertSame(worse, new TwoLayerAdvice.Advice(worse, good).recommended());
        assertSame(good, new TwoLayerAdvice.Advice(good, farWorse).recommended());
        assertSame(good, new TwoLayerAdvice.Advice(farWorse, good).recommended());
        TwoLayerAdvice.Option sameFlux = new TwoLayerAdvice.Option("D", b, marginOf(5), 0.9, 0.3);
        assertSame(good, new TwoLayerAdvice.Advice(good, sameFlux).recommended());   // tie on flux: the first
        assertSame(sameFlux, new TwoLayerAdvice.Advice(sameFlux, good).recommended());
        // Warning strictly above half of saturation.
        assertTrue(good.saturationWarning());
        assertFalse(new TwoLayerAdvice.Option("E", b, marginOf(1), 1, TwoLayerAdvice.WARNING_FRACTION)
                .saturationWarning());
        assertTrue(new TwoLayerAdvice.Option("E", b, marginOf(1), 1, Math.nextUp(TwoLayerAdvice.WARNING_FRACTION))
                .saturationWarning());
        String r = new TwoLayerAdvice.Advice(good, farWorse).reasoning();
        assertTrue(r.startsWith("Worst margin 5.0 dB with the A, 3.0 dB with the C."), r);
        assertTrue(r.contains("(120 % of saturation)"), r);
        assertTrue(r.contains("(20 %)"), r);
        assertTrue(r.contains("Recommended: A; warning: even so the high-µ layer is above half its saturation"), r);
        assertFalse(r.contains("Neither order"), r);
        TwoLayerAdvice.Option missA = new TwoLayerAdvice.Option("F", b, marginOf(-2), 0.1, 0.1);
        TwoLayerAdvice.Option missB = new TwoLayerAdvice.Option("G", b, marginOf(-3), 0.1, 0.1);
        String miss = new TwoLayerAdvice.Advice(missA, missB).reasoning();
        assertTrue(miss.endsWith("Recommended: F. Neither order meets the requirement."), miss);
    }

    @Test
    void marginReportsAndRequirements() {
        assertTrue(marginOf(0).meets());
        assertFalse(marginOf(-1e-9).meets());
        assertEquals("meets the requirement; worst margin 0.0 dB at 50 Hz", marginOf(0).toString());
        assertEquals("misses the requirement; worst margin -1.0 dB at 50 Hz", marginOf(-1).toString());
        Requirement.Entry e = marginOf(0).worst().entry();
        MarginReport two = new MarginReport(List.of(new MarginReport.Line(e, Frequency.ofHertz(50), 23, 3),
                new MarginReport.Line(e, Frequency.ofHertz(70), 21, 1), new MarginReport.Line(e, Frequency.ofHertz(90),
                        22, 2)));
        assertEquals(1, two.worstMarginDb(), 0);
        assertEquals(Frequency.ofHertz(70), two.worst().frequency());
        assertEquals(3, two.lines().size());
        // Required SE = 20·log10(incident/tolerated); H in air converts by B = µ0·H.
        Requirement byB = Requirement.none().plus(BAND, MagneticFluxDensity.ofMicrotesla(100),
                MagneticFluxDensity.ofMicrotesla(1));
        assertEquals(40, byB.entries().get(0).requiredDb(), 1e-12);
        Requirement byH = Requirement.none().plus(BAND, MagneticFieldStrength.ofAmperesPerMetre(100),
                MagneticFieldStrength.ofAmperesPerMetre(1));
        assertEquals(40, byH.entries().get(0).requiredDb(), 1e-12);
        assertEquals(byB, Requirement.none().plus(BAND, MagneticFluxDensity.ofMicrotesla(100),
                MagneticFluxDensity.ofMicrotesla(1)));
        assertEquals(byB.hashCode(), Requirement.none().plus(BAND, MagneticFluxDensity.ofMicrotesla(100),
                MagneticFluxDensity.ofMicrotesla(1)).hashCode());
        assertNotEquals(byB, byH);
        assertNotEquals(byB, Requirement.none());
        assertEquals("requirement:\n  50 Hz to 10 kHz: 100 µT incident, 1 µT tolerated, 40.0 dB required",
                byB.toString());
        assertEquals(List.of(), Requirement.none().entries());
        assertEquals("the requirement has no entries; add bands with plus(...)", assertThrows(
                IllegalStateException.class, () -> Requirement.none().marginOf(fn(f -> 0))).getMessage());
        assertThrows(InvalidQuantityException.class, () -> Requirement.none().plus(BAND, MagneticFluxDensity.ofTesla(0),
                MagneticFluxDensity.ofTesla(1)));
        assertThrows(InvalidQuantityException.class, () -> Requirement.none().plus(BAND, MagneticFluxDensity.ofTesla(1),
                MagneticFluxDensity.ofTesla(0)));
        // Margin of a flat 45 dB model against 40 dB required: +5 dB everywhere.
        MarginReport flat = byB.marginOf(fn(f -> 45));
        assertEquals(5, flat.worstMarginDb(), 1e-12);
        assertTrue(flat.meets());
    }

    @Test
    void bandSearchEdges() {
        // A single-frequency band evaluates that frequency once.
        BandSearch.WorstCase one = BandSearch.worst(fn(f -> f / 10), FrequencyBand.at(Frequency.ofHertz(70)));
        assertEquals(7, one.seDb(), 0);
        assertEquals(Frequency.ofHertz(70), one.frequency());
        assertEquals("7.00 dB at 70 Hz", one.toString());
        // A monotone model: the worst point is an end of the band, exactly.
        BandSearch.WorstCase rising = BandSearch.worst(fn(f -> Math.log10(f)), FrequencyBand.parse("10 Hz to 1 kHz"));
        assertEquals(1, rising.seDb(), 1e-9);
        assertEquals(10, rising.frequency().toHertz(), 1e-6);
        BandSearch.WorstCase falling = BandSearch.worst(fn(f -> -Math.log10(f)), FrequencyBand.parse("10 Hz to 1 kHz"), 2);
        assertEquals(-3, falling.seDb(), 1e-9);
        assertEquals(1000, falling.frequency().toHertz(), 1e-6);
        // A smooth minimum between grid points is refined: (log10 f − 2.13)² has its minimum at 134.9 Hz.
        BandSearch.WorstCase dip = BandSearch.worst(fn(f -> Math.pow(Math.log10(f) - 2.13, 2)),
                FrequencyBand.parse("10 Hz to 1 kHz"), 5);
        assertEquals(0, dip.seDb(), 1e-9);
        assertEquals(Math.pow(10, 2.13), dip.frequency().toHertz(), 1e-3);
        assertEquals("a band search needs at least 2 points; got 1", assertThrows(IllegalArgumentException.class,
                () -> BandSearch.worst(fn(f -> 0), BAND, 1)).getMessage());
        assertThrows(NullPointerException.class, () -> BandSearch.worst(null, BAND, 3));
        assertThrows(NullPointerException.class, () -> BandSearch.worst(fn(f -> 0), null, 3));
        assertThrows(NullPointerException.class, () -> BandSearch.worst(fn(f -> 0), null));
    }

    @Test
    void candidatesRankingsAndSolutions() {
        Candidate cu = Candidate.of("  copper ", COPPER, Density.ofKilogramsPerCubicMetre(8890)).withCostPerKilogram(10).withCostPerSquareMetre(30);
        assertEquals("copper", cu.name());
        assertEquals(8890, cu.density().toKilogramsPerCubicMetre(), 0);
        assertSame(COPPER, cu.medium());
        assertEquals(OptionalDouble.of(10), cu.costPerKilogram());
        assertEquals(OptionalDouble.of(30), cu.costPerSquareMetre());
        assertEquals("copper (8890 kg/m³)", cu.toString());
        assertEquals("candidate name must not be blank", assertThrows(IllegalArgumentException.class,
                () -> Candidate.of(" ", COPPER, Density.ofKilogramsPerCubicMetre(1))).getMessage());
        assertThrows(InvalidQuantityException.class, () -> Candidate.of("x", COPPER, Density.ofKilogramsPerCubicMetre(0)));
        assertThrows(NullPointerException.class, () -> Candidate.of("x", COPPER, null));
        assertThrows(InvalidQuantityException.class, () -> cu.withCostPerKilogram(-1));
        assertThrows(InvalidQuantityException.class, () -> cu.withCostPerSquareMetre(-1));
        assertEquals("areal mass", MaterialRanking.Criterion.AREAL_MASS.words());
        assertEquals("kg/m²", MaterialRanking.Criterion.AREAL_MASS.unit());
        assertEquals("m", MaterialRanking.Criterion.THICKNESS.unit());

        IncidentField plane = IncidentField.planeWave();
        FrequencyBand band = FrequencyBand.parse("1 MHz to 10 MHz");
        Length limit = Length.ofMillimetres(5);
        for (MaterialRanking.Criterion by : MaterialRanking.Criterion.values()) {
            Ranking r = MaterialRanking.rank(List.of(cu), plane, band, io.shieldmath.shield.quantity.Decibels.of(150), limit, by);
            assertEquals(by, r.criterion());
            assertEquals(150, r.targetDb(), 0);
            Ranking.Entry e = r.ranked().get(0);
            double t = e.thickness().toMetres();
            double expected = switch (by) {
                case AREAL_MASS -> 8890 * t;
                case THICKNESS -> t;
                case COST_BY_MASS -> 8890 * t * 10;
                case COST_PER_SQUARE_METRE -> 30;
            };
            assertEquals(expected, e.value(), 1e-12 * expected, by::name);
            assertEquals(8890 * t, e.arealMass().toKilogramsPerSquareMetre(), 1e-12);
            assertEquals(1, e.rank());
            assertEquals(String.format(java.util.Locale.ROOT, "1. copper: %s, %.3f kg/m², worst %s", e.thickness(),
                    e.arealMass().toKilogramsPerSquareMetre(), e.worst()), e.toString());
            assertTrue(r.toString().startsWith(String.format(java.util.Locale.ROOT, "ranking by %s for 150.0 dB:\n  1. ",
                    by.words())), r::toString);
        }
        Candidate bare = Candidate.of("bare", COPPER, Density.ofKilogramsPerCubicMetre(8890));
        assertEquals("candidate bare has no cost per kilogram; give one with withCostPerKilogram",
                assertThrows(IllegalArgumentException.class, () -> MaterialRanking.rank(List.of(bare), plane, band, io.shieldmath.shield.quantity.Decibels.of(150),
                        limit, MaterialRanking.Criterion.COST_BY_MASS)).getMessage());
        assertEquals("candidate bare has no cost per square metre; give one with withCostPerSquareMetre",
                assertThrows(IllegalArgumentException.class, () -> MaterialRanking.rank(List.of(bare), plane, band, io.shieldmath.shield.quantity.Decibels.of(150),
                        limit, MaterialRanking.Criterion.COST_PER_SQUARE_METRE)).getMessage());
        // Equal costs per m² tie: ordered by thickness, and the note says so.
        Candidate thin = Candidate.of("thin", COPPER, Density.ofKilogramsPerCubicMetre(8890)).withCostPerSquareMetre(30);
        Candidate steelish = Candidate.of("weak", Medium.conductor("weak", Conductivity.ofMegasiemensPerMetre(1), 1),
                Density.ofKilogramsPerCubicMetre(8000)).withCostPerSquareMetre(30);
        Ranking tie = MaterialRanking.rank(List.of(steelish, thin), plane, band, io.shieldmath.shield.quantity.Decibels.of(150), limit,
                MaterialRanking.Criterion.COST_PER_SQUARE_METRE);
        assertEquals("thin", tie.ranked().get(0).candidate().name());
        assertEquals(2, tie.ranked().get(1).rank());
        assertEquals("tied with weak on cost per m² (30.0000 per m²); ordered by thickness, then name",
                tie.ranked().get(0).note());
        assertTrue(tie.ranked().get(0).toString().endsWith(" (tied with weak on cost per m² (30.0000 per m²); "
                + "ordered by thickness, then name)"));
        Ranking notTied = MaterialRanking.rank(List.of(steelish, thin), plane, band, io.shieldmath.shield.quantity.Decibels.of(150), limit,
                MaterialRanking.Criterion.THICKNESS);
        assertEquals("", notTied.ranked().get(0).note());
        // An unreachable target excludes the candidate with the solver's explanation.
        Ranking none = MaterialRanking.rank(List.of(steelish), plane, band, io.shieldmath.shield.quantity.Decibels.of(5000), limit,
                MaterialRanking.Criterion.THICKNESS);
        assertEquals(List.of(), none.ranked());
        assertEquals(1, none.excluded().size());
        assertSame(steelish, none.excluded().get(0).candidate());
        assertTrue(none.toString().contains("\n  excluded weak: no thickness up to 5 mm meets 5000.00 dB"),
                none::toString);

        ThicknessSolution s = ThicknessSolver.minimumThickness(Barrier.of(COPPER, limit), 0, plane, band, 5000, limit);
        assertFalse(s.isFound());
        assertEquals(5000, s.targetDb(), 0);
        assertEquals(s.explanation(), s.toString());
        assertEquals(s.explanation(), assertThrows(IllegalStateException.class, s::thickness).getMessage());
        assertEquals(BandSearch.worst(Barrier.of(COPPER, limit).facing(plane), band).seDb(),
                s.worst().seDb(), 1e-9);
        ThicknessSolution ok = ThicknessSolver.minimumThickness(Barrier.of(COPPER, limit), 0, plane, band, 150, limit);
        assertTrue(ok.isFound());
        assertTrue(ok.worst().seDb() >= 150);
        assertEquals(150, ok.targetDb(), 0);
        assertTrue(ok.toString().startsWith("150.00 dB is first met at "), ok::toString);
        assertThrows(IndexOutOfBoundsException.class,
                () -> ThicknessSolver.minimumThickness(Barrier.of(COPPER, limit), 1, plane, band, 150, limit));
        assertThrows(IndexOutOfBoundsException.class,
                () -> ThicknessSolver.minimumThickness(Barrier.of(COPPER, limit), -1, plane, band, 150, limit));
        // Already met at the smallest thickness considered.
        ThicknessSolution at = ThicknessSolver.minimumThickness(t -> fn(f -> 10), band, 10, Length.ofMicrometres(1),
                limit);
        assertTrue(at.isFound());
        assertEquals(Length.ofMicrometres(1), at.thickness());
        assertEquals("already met at the smallest thickness considered", at.explanation());
        assertThrows(InvalidQuantityException.class, () -> ThicknessSolver.minimumThickness(t -> fn(f -> 10), band, 10,
                Length.ofMillimetres(6), limit));
    }

    @Test
    void aTargetMetExactlyAtTheLimitIsFoundThere() {
        // Regression: exp(log(limit)) and the last scan point can round below the limit, and a target
        // equal to the SE at the limit then left the Brent solver without a sign change
        // (NoBracketingException from Commons Math). Failing input: 173 µm annealed copper, plane wave,
        // 1 MHz to 10 MHz, target = the worst SE of the 173 µm plate itself.
        Length limit = Length.ofMicrometres(173);
        FrequencyBand band = FrequencyBand.parse("1 MHz to 10 MHz");
        IncidentField plane = IncidentField.planeWave();
        double target = BandSearch.worst(Barrier.of(COPPER, limit).facing(plane), band).seDb();
        ThicknessSolution s = ThicknessSolver.minimumThickness(Barrier.of(COPPER, limit), 0, plane, band, target,
                limit);
        assertTrue(s.isFound());
        assertTrue(s.worst().seDb() >= target);
        assertEquals(173e-6, s.thickness().toMetres(), 173e-6 * 1e-6);
        // The same with a model that steps up to the target only at the limit itself.
        Length five = Length.ofMillimetres(5);
        ThicknessSolution step = ThicknessSolver.minimumThickness(t -> fn(f -> t >= 0.005 ? 10 : 0), band, 10,
                Length.ofMicrometres(1), five);
        assertTrue(step.isFound());
        assertEquals(0.005, step.thickness().toMetres(), 0);
    }

    @Test
    void toleranceResultStatistics() {
        // Sample mean, n − 1 standard deviation, linear interpolation between order statistics.
        ToleranceResult r = new ToleranceResult(10, 12, new double[] {14, 10, 12, 16});
        assertEquals(13, r.meanDb(), 1e-12);
        assertEquals(Math.sqrt((1 + 9 + 1 + 9) / 3.0), r.standardDeviationDb(), 1e-12);
        assertEquals(10, r.percentileDb(0), 0);
        assertEquals(16, r.percentileDb(100), 0);
        assertEquals(13, r.percentileDb(50), 1e-12);                // between 12 and 14
        assertEquals(10 + 0.15 * 2, r.percentileDb(5), 1e-12);      // position 0.15
        assertEquals(0.75, r.probabilityOfMeeting(), 0);            // 12 counts: SE ≥ target
        assertEquals(4, r.samples());
        assertEquals(12, r.targetDb(), 0);
        assertEquals(10, r.nominalDb(), 0);
        assertEquals(10, r.sortedValuesDb()[0], 0);
        assertEquals(String.format(java.util.Locale.ROOT, "4 samples: mean 13.00 dB, sd %.2f dB, 5 %% 10.30 dB, "
                + "95 %% %.2f dB, P(SE ≥ 12.0 dB) = 0.750", r.standardDeviationDb(), r.percentileDb(95)), r.toString());
        assertThrows(InvalidQuantityException.class, () -> r.percentileDb(100.5));
        assertThrows(InvalidQuantityException.class, () -> r.percentileDb(-0.5));
        ToleranceResult single = new ToleranceResult(5, 6, new double[] {5});
        assertEquals(0, single.standardDeviationDb(), 0);
        assertEquals(5, single.percentileDb(50), 0);
        assertEquals(0, single.probabilityOfMeeting(), 0);
    }

    @Test
    void toleranceStudyVariesEachPart() {
        // With only one tolerance set, only that part varies; a relative spread u of a uniform
        // distribution keeps every factor within 1 ± u.
        IncidentField near = IncidentField.magneticNearField(Length.ofCentimetres(10), ImpedanceForm.TEXTBOOK);
        Barrier b = Barrier.of(COPPER, Length.ofMillimetres(0.5));
        double hz = 1e4;
        double nominal = b.facing(near).shieldingEffectivenessDb(hz);
        for (int part = 0; part < 4; part++) {
            ToleranceStudy s = ToleranceStudy.of(b, near);
            s = switch (part) {
                case 0 -> s.thickness(0.1, ToleranceStudy.Spread.UNIFORM);
                case 1 -> s.conductivity(0.1, ToleranceStudy.Spread.UNIFORM);
                case 2 -> s.permeability(0.1, ToleranceStudy.Spread.NORMAL);
                default -> s.distance(0.1, ToleranceStudy.Spread.UNIFORM);
            };
            ToleranceResult r = s.run(Frequency.ofHertz(hz), nominal, 200, 7, ToleranceStudy.ProgressListener.NONE);
            assertEquals(nominal, r.nominalDb(), 0);
            if (part == 2) {
                // µr = 1 scales to 1 + 0·f: copper's SE does not move.
                assertEquals(0, r.standardDeviationDb(), 1e-9);
                continue;
            }
            assertTrue(r.standardDeviationDb() > 0, "part " + part);
            // Thicker, more conductive plates and a farther source (larger magnetic |Zw|, higher R) shield more,
            // so the extremes of ±10 % bound the spread.
            double lo = spread(b, near, hz, part, 0.9);
            double hi = spread(b, near, hz, part, 1.1);
            double min = Math.min(lo, hi);
            double max = Math.max(lo, hi);
            assertTrue(r.percentileDb(0) >= min - 1e-9 && r.percentileDb(100) <= max + 1e-9,
                    () -> "part " + " " + r + " not within [" + min + ", " + max + "]");
        }
    }

    private static double spread(Barrier b, IncidentField near, double hz, int part, double f) {
        Medium m = b.layers().get(0).medium();
        Length t = b.layers().get(0).thickness();
        return switch (part) {
            case 0 -> Barrier.of(m, Length.ofMetres(t.toMetres() * f)).facing(near).shieldingEffectivenessDb(hz);
            case 1 -> Barrier.of(m.withConductivity(Conductivity.ofSiemensPerMetre(m.conductivity().toSi() * f)), t)
                    .facing(near).shieldingEffectivenessDb(hz);
            default -> b.facing(IncidentField.magneticNearField(Length.ofMetres(near.distance().toMetres() * f),
                    near.form())).shieldingEffectivenessDb(hz);
        };
    }
}
