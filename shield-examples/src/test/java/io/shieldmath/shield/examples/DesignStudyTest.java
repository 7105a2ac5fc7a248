/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.axisymmetric.FieldDirection;
import io.shieldmath.shield.axisymmetric.SaturationOnset;
import io.shieldmath.shield.axisymmetric.SaturationStudy;
import io.shieldmath.shield.axisymmetric.SensorRegion;
import io.shieldmath.shield.axisymmetric.WorstDirectionShielding;
import io.shieldmath.shield.axisymmetric.WorstDirectionSolution;
import io.shieldmath.shield.axisymmetric.files.AxisymmetricDesign;
import io.shieldmath.shield.axisymmetric.files.DesignFieldDirection;
import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesignFile;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.MagnetizationCurves;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.cli.BatchCommand;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The design study run once, its report and files checked. The physics of each number is
 * checked by the solver's own tests; here the checks are that the study recommends a design
 * the solver computes, that its printed numbers are the solver's, and that the infinite-sheet
 * plates stay a labelled comparison.
 */
class DesignStudyTest {

    @TempDir
    static Path dir;
    static DesignStudy.Outcome outcome;
    static String report;

    @BeforeAll
    static void runTheStudy() throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        outcome = DesignStudy.run(new PrintStream(bytes, true, StandardCharsets.UTF_8), dir);
        report = bytes.toString(StandardCharsets.UTF_8);
        System.out.println(report);
    }

    @Test
    void everyFileIsWrittenAndTheReportCarriesTheCautions() throws IOException {
        for (String f : new String[] {"sweeps.csv", "chosen-design.json", "se-vs-frequency.png",
            "se-vs-frequency.svg", "field-map-bench.png", "field-map-bench.svg", "field-map-can.png",
            "field-map-can.svg"}) {
            Path p = dir.resolve(f);
            assertTrue(Files.exists(p) && Files.size(p) > 100, f + " missing or empty");
        }
        assertTrue(report.contains("local codes"), "the report must carry the cautions");
        assertTrue(report.contains("heat plates and cans"), "the report must warn that strong fields heat the metal");
        byte[] png = Files.readAllBytes(dir.resolve("se-vs-frequency.png"));
        assertEquals((byte) 0x89, png[0]);
        assertEquals('P', png[1]);
        assertTrue(Files.readString(dir.resolve("se-vs-frequency.svg")).contains("<svg"));
        List<String> csv = Files.readAllLines(dir.resolve("sweeps.csv"));
        assertEquals(DesignStudy.studyFrequencies(outcome.requirement()).length + 1, csv.size());
        assertTrue(csv.get(0).contains("(infinite sheet, comparison only, SE dB)"), csv.get(0));
    }

    @Test
    void theTitleIsUnderlinedToItsFullLength() {
        List<String> lines = report.lines().toList();
        assertEquals(lines.get(0).length(), lines.get(1).length(), lines.get(0) + "\n" + lines.get(1));
        assertTrue(lines.get(1).chars().allMatch(c -> c == '='), lines.get(1));
    }

    @Test
    void theRecommendationIsACanTheSolverComputesAndItsNumberIsTheSolvers() {
        assertNotNull(outcome.recommended(), report);
        assertTrue(outcome.recommended().startsWith("can: "), outcome::recommended);
        assertTrue(report.contains("Recommended: " + outcome.recommended()), report);
        // The can rebuilt here from the public API with the study's stated geometry and mesh, in
        // a field of either direction: the solver's contract is bit-identical results for equal inputs.
        Catalogue c = Catalogue.builtIn();
        Arrangement can = Arrangement.of(Body.can("can", c.get("nickel-iron-80"), Length.ofMillimetres(15),
                Length.ofMillimetres(1), Length.ofMillimetres(60)).withCapHole(CanEnd.UPPER, Length.ofMillimetres(1)));
        SensorRegion sensor = SensorRegion.cylinder(Length.ofMillimetres(3), Length.ofMillimetres(10));
        WorstDirectionShielding rebuilt = WorstDirectionShielding.of(
                can.inUniformAxialField().sensing(sensor).withFineness(DesignStudy.CAN_FINENESS),
                can.inUniformTransverseField().sensing(sensor).withFineness(DesignStudy.CAN_FINENESS));
        assertEquals(rebuilt, outcome.recommendedModel(), "the study's recommendation is not the can it states");
        double se = rebuilt.shieldingEffectivenessDb(outcome.worstFrequency().toHertz());
        assertEquals(outcome.worstSeDb(), se, 0);
        assertTrue(report.contains(String.format(Locale.ROOT, "SE %.2f ± ", se)), report);
        // The report names the worse direction there, as the solver finds it.
        WorstDirectionSolution there = rebuilt.at(outcome.worstFrequency());
        assertEquals(there.worstDirection(), outcome.worseDirection());
        assertEquals(Math.min(there.axial().shieldingEffectivenessDb(), there.transverse().shieldingEffectivenessDb()), se,
                0);
        assertTrue(report.contains(String.format(Locale.ROOT, "SE %.2f ± %.2f dB with the field %s its axis, the worse "
                + "direction there.", se, (outcome.worseDirection() == FieldDirection.AXIAL ? there.axial().worstShieldingDb()
                : there.transverse().worstShieldingDb()).estimate(),
                outcome.worseDirection() == FieldDirection.AXIAL ? "along" : "across")), report);
        // Where its margin is smallest it still meets the band's required SE.
        Requirement.Entry band = outcome.requirement().entries().stream()
                .filter(e -> e.band().contains(outcome.worstFrequency())).findFirst().orElseThrow();
        assertTrue(se >= band.requiredDb(), band + ": " + se);
    }

    @Test
    void theWrittenDesignIsTheWholeCanAndEvaluatesToThePrintedNumber() throws IOException {
        WholeDesign d = WholeDesignFile.read(outcome.designFile(), Catalogue.builtIn());
        assertEquals(WholeDesign.Kind.AXISYMMETRIC, d.kind());
        AxisymmetricDesign a = d.axisymmetric().orElseThrow();
        assertEquals(outcome.recommendedModel(), a.model(), "the file must hold the can, its hole, sensor and mesh");
        assertEquals(Optional.of(DesignFieldDirection.WORST), a.fieldDirection());
        assertTrue(Files.readString(outcome.designFile()).contains("\"direction\" : \"worst\""),
                "the file must say the field's direction is the worse of the two");
        assertEquals(outcome.requirement(), a.requirement(), "the file must hold every source case");
        // The library on the file gives the study's number, bit for bit (equal inputs, equal results).
        assertEquals(outcome.worstSeDb(), d.model().shieldingEffectivenessDb(outcome.worstFrequency().toHertz()), 0);
    }

    @Test
    void theBatchCommandOnTheWrittenFileGivesTheNumberTheStudyPrinted() throws IOException {
        double hz = outcome.worstFrequency().toHertz();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = BatchCommand.run(new String[] {"--design", outcome.designFile().toString(), "--stdin"},
                new ByteArrayInputStream((hz + "\n").getBytes(StandardCharsets.UTF_8)), out,
                new PrintStream(err, true, StandardCharsets.UTF_8));
        String csv = out.toString(StandardCharsets.UTF_8);
        assertEquals(BatchCommand.OK, code, () -> csv + err.toString(StandardCharsets.UTF_8));
        List<String> lines = csv.lines().filter(l -> !l.isBlank()).toList();
        List<String> header = List.of(lines.get(0).split(","));
        String[] row = lines.get(1).split(",");
        assertEquals(hz, Double.parseDouble(row[0]), 0);
        double batch = Double.parseDouble(row[header.indexOf("se_db")]);
        // The batch writes six decimals: the study's number to that rounding, and the report's two decimals.
        assertEquals(outcome.worstSeDb(), batch, 5e-7, csv);
        // and it names the same worse direction as the study
        assertEquals(outcome.worseDirection() == FieldDirection.AXIAL ? "axial" : "transverse",
                row[header.indexOf("worse_direction")], csv);
        assertTrue(report.contains(String.format(Locale.ROOT, "SE %.2f ± ", batch)), report);
        // The README's quick start shows this very exchange.
        assertTrue(readme().contains(lines.get(1)), "README does not show the batch line " + lines.get(1));
    }

    static String readme() throws IOException {
        return Files.readString(Path.of("..", "README.md"), StandardCharsets.UTF_8);
    }

    @Test
    void theReadmeShowsWhatTheStudyPrints() throws IOException {
        String readme = readme();
        int from = readme.indexOf("## Quick start");
        String quick = readme.substring(from, readme.indexOf("\n## ", from + 1));
        List<String> shown = quick.lines().filter(l -> l.startsWith("  can ") || l.startsWith("  plate ")
                || l.startsWith("Recommended: ") || l.startsWith("  body ")
                || l.startsWith("The recommended design's results")).toList();
        assertTrue(shown.size() >= 4, quick);
        for (String line : shown) {
            assertTrue(report.contains(line), "README shows a line the study no longer prints: " + line);
        }
    }

    @Test
    void theReportGivesTheRecommendedDesignsValidityNotes() {
        double[] hz = DesignStudy.studyFrequencies(outcome.requirement());
        String intro = "The recommended design's results at the study's " + hz.length + " frequencies carry ";
        List<String> said = report.lines().filter(l -> l.startsWith(intro)).toList();
        assertEquals(1, said.size(), report);
        int recommended = report.indexOf("Recommended: ");
        assertTrue(report.indexOf(intro) > recommended, "the notes follow the recommendation\n" + report);
        // The library's own result at the worst frequency: each of its notes is counted in the report,
        // and a report of no notes means it has none.
        ShieldingResult there = outcome.recommendedModel().at(outcome.worstFrequency());
        if (said.get(0).equals(intro + "no validity notes.")) {
            assertEquals(List.of(), there.validityNotes());
        }
        for (ValidityNote n : there.validityNotes()) {
            assertTrue(report.contains("\n  " + n.limit() + " at "), n + "\n" + report);
        }
    }

    @Test
    void noteLinesSayNoneOrGiveEachLimitWithItsFrequencies() {
        double[] hz = {10, 100, 1000};
        assertEquals(List.of("The recommended design's results at the study's 3 frequencies carry no validity notes."),
                DesignStudy.noteLines(hz, List.of(List.of(), List.of(), List.of())));
        ValidityNote at100 = ValidityNote.of(ValidityNote.Limit.QUASI_STATIC, "k0·L = 0.2 at 100 Hz");
        ValidityNote at1000 = ValidityNote.of(ValidityNote.Limit.QUASI_STATIC, "k0·L = 2 at 1 kHz");
        ValidityNote hole = ValidityNote.of(ValidityNote.Limit.SMALL_HOLE, "vent: a large hole");
        assertEquals(List.of(
                "The recommended design's results at the study's 3 frequencies carry validity notes (the numbers stand, "
                        + "but trust them less):",
                "  QUASI_STATIC at 2 of 3 frequencies, from 100 Hz to 1 kHz: k0·L = 0.2 at 100 Hz",
                "  SMALL_HOLE at 1 of 3 frequencies, at 10 Hz: vent: a large hole"),
                DesignStudy.noteLines(hz, List.of(List.of(hole), List.of(at100), List.of(at1000))));
    }

    @Test
    void theSaturationCheckNamesTheBodyAndTheFieldAtWhichItSaturates() {
        // The study's onset, rebuilt from the public API: the recommended can (a 2 mm cable hole) in a
        // static field along its axis, the catalogue's curve, swept from the strongest ambient field.
        Arrangement can = Arrangement.of(Body.can("can", Catalogue.builtIn().get("nickel-iron-80"),
                Length.ofMillimetres(15), Length.ofMillimetres(1), Length.ofMillimetres(60))
                .withCapHole(CanEnd.UPPER, Length.ofMillimetres(1)));
        SaturationOnset onset = SaturationStudy.of(can.inUniformAxialField()
                        .sensing(SensorRegion.cylinder(Length.ofMillimetres(3), Length.ofMillimetres(10))))
                .withCurve("can", MagnetizationCurves.builtIn().get("nickel-iron-80")).withFineness(DesignStudy.FINENESS)
                .sweep(MagneticFieldStrength.from(MagneticFluxDensity.ofMicrotesla(8)),
                        MagneticFieldStrength.ofAmperesPerMetre(DesignStudy.SATURATION_SWEEP_TOP),
                        DesignStudy.SATURATION_SWEEP_POINTS)
                .onset().orElseThrow();
        assertEquals("can", onset.body());
        String text = onset.toString();
        assertTrue(text.startsWith("body 'can' reaches 80 % of its saturation flux density"), text);
        assertTrue(report.contains(text), "the report must name the body and the field: " + text + "\n" + report);
        assertTrue(report.contains("in the strongest ambient field, 8 µT held static, body 'can' carries at most"),
                report);
    }

    @Test
    void infiniteSheetsAreALabelledComparisonOutsideTheRanking() {
        int ranking = report.indexOf("Candidates computed by the solver");
        int recommended = report.indexOf("Recommended: ");
        int comparison = report.indexOf("For comparison only, never recommended");
        assertTrue(ranking >= 0 && recommended > ranking && comparison > recommended, report);
        String list = report.substring(ranking, recommended);
        assertTrue(!list.contains("infinite"), list);
        // Every plate of the ranking is a finite plate of the stated size.
        assertEquals(4, list.lines().filter(l -> l.contains("120 mm across")).count(), list);
        // The comparison has a line for each plate, and (common practice, no source) the infinite sheet
        // sits above the finite plate: flux rounds the rim of a real plate.
        String sheets = report.substring(comparison, report.indexOf("Saturation", comparison));
        List<String> rows = sheets.lines().filter(l -> l.matches("\\s+(plate|stack) .*dB")).toList();
        assertEquals(4, rows.size(), sheets);
        for (String row : rows) {
            String[] parts = row.trim().split("\\s+");
            double above = Double.parseDouble(parts[parts.length - 2]);
            assertTrue(above > 0, row);
        }
    }
}
