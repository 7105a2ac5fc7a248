/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.AxialFieldShielding;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.axisymmetric.CoilCoupling;
import io.shieldmath.shield.axisymmetric.SensorRegion;
import io.shieldmath.shield.axisymmetric.TransverseFieldShielding;
import io.shieldmath.shield.axisymmetric.WorstDirectionShielding;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.DesignFile;
import io.shieldmath.shield.materials.files.MaterialFileException;
import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Whole-design files: every kind reads, writes back equal and in the user's own units, and
 * every malformed version 3 document is refused with its JSON path, line and column. The
 * designs are invented for the tests.
 */
class WholeDesignFileTest {

    private static final Catalogue CAT = Catalogue.builtIn();

    /** An invented can in an applied field; quantities in several units and forms. */
    static final String CAN = """
            {
              "format": "shield-design",
              "version": 3,
              "title": "sensor can",
              "arrangement": {
                "bodies": [
                  { "name": "can", "shape": "can", "material": "nickel-iron-80",
                    "innerRadius": "0.8 in", "wall": "40 mil", "length": "6 cm",
                    "lowerEnd": "capped", "upperEnd": "capped", "upperCapHole": "3.0 mm" },
                  { "name": "plate", "shape": "disc",
                    "medium": { "name": "my alloy", "conductivity": "20 MS/m" },
                    "radius": "50 mm", "thickness": "0.2 mm", "centre": "-45 mm" }
                ],
                "appliedField": { "direction": "axial", "fluxDensity": "40 µT",
                                  "sensor": { "radius": "5 mm", "length": "10 mm", "centre": "2 mm" } },
                "tolerance": "0.5 dB"
              },
              "band": "10 Hz to 1 kHz",
              "points": 3,
              "cases": [ { "band": "49 Hz to 51 Hz", "incident": "40 µT", "tolerated": "100 nT" } ]
            }
            """;

    /** An invented plate between two coils, one with a winding section. */
    static final String PLATE = """
            {
              "format": "shield-design",
              "version": 3,
              "arrangement": {
                "bodies": [
                  { "name": "plate", "shape": "annular-plate", "material": "copper-annealed",
                    "outerRadius": "25 mm", "holeRadius": "2 mm", "thickness": "0.5 mm" }
                ],
                "coils": { "transmitter": { "radius": "10 mm", "turns": 20,
                                            "winding": { "width": "2 mm", "length": "3 mm",
                                                         "radialRings": 2, "axialRings": 3 } },
                           "receiver": { "radius": "8 mm", "turns": 30 },
                           "separation": "40 mm",
                           "drive": { "current": "100 mA", "measure": "rms" } }
              },
              "band": "1 kHz to 100 kHz",
              "points": 2
            }
            """;

    private static MaterialFileException refused(String json) {
        return assertThrows(MaterialFileException.class, () -> WholeDesignFile.parse(json, CAT));
    }

    @Test
    void canInAppliedFieldReadsAsBuiltWithTheApi() {
        WholeDesign w = WholeDesignFile.parse(CAN, CAT);
        assertEquals(WholeDesign.Kind.AXISYMMETRIC, w.kind());
        AxisymmetricDesign d = w.axisymmetric().orElseThrow();
        AxisymmetricDesign built = AxisymmetricDesign.inUniformAxialField(List.of(
                        DesignBody.can("can", CAT.get("nickel-iron-80"), Length.parse("0.8 in"), Length.ofMils(40),
                                Length.ofCentimetres(6)).withCapHole(CanEnd.UPPER, Length.ofMillimetres(3)),
                        DesignBody.disc("plate", io.shieldmath.shield.medium.Medium.of("my alloy",
                                        io.shieldmath.shield.quantity.Conductivity.parse("20 MS/m"),
                                        io.shieldmath.shield.medium.PermeabilityModel.constant(1),
                                        io.shieldmath.shield.quantity.RelativePermittivity.ONE),
                                Length.ofMillimetres(50), Length.ofMillimetres(0.2))
                                .shiftedBackBy(Length.ofMillimetres(45))),
                DesignSensor.cylinder(Length.ofMillimetres(5), Length.ofMillimetres(10))
                        .shiftedBy(Length.ofMillimetres(2)),
                FrequencyBand.parse("10 Hz to 1 kHz"), 3)
                .withAppliedField(MagneticFluxDensity.parse("40 µT"))
                .withTolerance(Decibels.of(0.5))
                .meeting(Requirement.none().plus(FrequencyBand.parse("49 Hz to 51 Hz"),
                        MagneticFluxDensity.parse("40 µT"), MagneticFluxDensity.parse("100 nT")))
                .withTitle("sensor can");
        // The values agree; the read design also remembers the texts its quantities were given in.
        assertEquals(built.bodies(), d.bodies());
        assertEquals(built.sensor(), d.sensor());
        assertEquals(built.model(), d.model());
        assertEquals(WholeDesignFile.parse(WholeDesignFile.toJson(WholeDesign.of(built)), CAT).axisymmetric()
                .orElseThrow().model(), d.model());
        // The model is the solver's own evaluation behind the common contract.
        AxialFieldShielding direct = Arrangement.of(d.bodies().get(0).body(), d.bodies().get(1).body())
                .inUniformAxialField()
                .sensing(SensorRegion.cylinder(Length.ofMillimetres(5), Length.ofMillimetres(10))
                        .shiftedBy(Length.ofMillimetres(2)))
                .withTolerance(Decibels.of(0.5));
        assertEquals(direct, d.model());
    }

    @Test
    void everyQuantityIsWrittenInTheTextItWasGivenIn() {
        String back = WholeDesignFile.toJson(WholeDesignFile.parse(CAN, CAT));
        for (String given : List.of("\"0.8 in\"", "\"40 mil\"", "\"6 cm\"", "\"3.0 mm\"", "\"0.2 mm\"",
                "\"-45 mm\"", "\"20 MS/m\"", "\"40 µT\"", "\"100 nT\"", "\"0.5 dB\"", "\"10 Hz to 1 kHz\"",
                "\"49 Hz to 51 Hz\"")) {
            assertTrue(back.contains(given), given + " in\n" + back);
        }
        // Written again, the document is the same text, and reads back to an equal design.
        assertEquals(back, WholeDesignFile.toJson(WholeDesignFile.parse(back, CAT)));
        assertEquals(WholeDesignFile.parse(CAN, CAT), WholeDesignFile.parse(back, CAT));
    }

    @Test
    void plateBetweenCoilsRoundTrips() {
        WholeDesign w = WholeDesignFile.parse(PLATE, CAT);
        AxisymmetricDesign d = w.axisymmetric().orElseThrow();
        assertEquals(CoilPair.coaxial(Coil.loop(Length.ofMillimetres(10), 20).withWinding(Length.ofMillimetres(2),
                Length.ofMillimetres(3), 2, 3), Coil.loop(Length.ofMillimetres(8), 30), Length.ofMillimetres(40)),
                d.coils().orElseThrow());
        assertEquals(CurrentAmplitude.parse("100 mA"), d.drive().orElseThrow());
        assertEquals(AmplitudeMeasure.RMS, d.driveMeasure().orElseThrow());
        assertInstanceOf(CoilCoupling.class, d.model());
        assertEquals(w, WholeDesignFile.parse(WholeDesignFile.toJson(w), CAT));
    }

    @Test
    void freeSpaceBetweenCoilsGivesZeroDecibels() {
        // Insertion loss with nothing between the coils is 0 dB by its definition (the field
        // without the shield over the field with it; IEEE Std 299-2006, clause 3, shielding
        // effectiveness); the solver takes both on one mesh, so the ratio is exactly 1.
        String free = PLATE.replaceAll("(?s)\"bodies\": \\[.*?\\],", "\"bodies\": [],");
        WholeDesign w = WholeDesignFile.parse(free, CAT);
        assertEquals(0.0, w.model().shieldingEffectivenessDb(10e3), 1e-12);
    }

    @Test
    void modelGivesTheSolversNumberBitForBit() {
        WholeDesign w = WholeDesignFile.parse(PLATE, CAT);
        CoilCoupling direct = Arrangement.of(Body.annularPlate("plate", CAT.get("copper-annealed"),
                        Length.ofMillimetres(25), Length.ofMillimetres(2), Length.ofMillimetres(0.5)))
                .between(w.axisymmetric().orElseThrow().coils().orElseThrow());
        assertEquals(direct.shieldingEffectivenessDb(20e3), w.model().shieldingEffectivenessDb(20e3));
    }

    @Test
    void earlierVersionsAndOtherKindsStillRead(@TempDir Path dir) throws Exception {
        String v1 = """
                {"format": "shield-design", "version": 1,
                 "layers": [{"material": "copper-annealed", "thickness": "0.3 mm"}],
                 "field": {"kind": "plane-wave"}, "band": "1 kHz to 1 MHz", "points": 4}
                """;
        WholeDesign planar = WholeDesignFile.parse(v1, CAT);
        assertEquals(WholeDesign.Kind.PLANAR, planar.kind());
        assertEquals(DesignFile.parse(v1, CAT), planar.design().orElseThrow());
        String v2 = """
                {"format": "shield-design", "version": 2,
                 "shell": {"form": "sphere", "radius": "4 cm",
                           "walls": [{"material": "nickel-iron-80", "thickness": "1 mm"}],
                           "openings": [{"kind": "holes", "diameter": "3 mm", "count": 4, "name": "vent"}],
                           "exposure": "uniform"},
                 "field": {"kind": "plane-wave"}, "band": "10 Hz to 1 kHz", "points": 3,
                 "cases": [{"band": "50 Hz", "incident": "40 µT", "tolerated": "1 µT"}]}
                """;
        WholeDesign shell = WholeDesignFile.parse(v2, CAT);
        assertEquals(WholeDesign.Kind.SHELL, shell.kind());
        assertEquals(shell.design().orElseThrow().model().shieldingEffectivenessDb(50),
                shell.model().shieldingEffectivenessDb(50));
        Path file = dir.resolve("shell.json");
        WholeDesignFile.write(shell, file);
        assertTrue(Files.readString(file).contains("\"version\" : 3"));
        assertEquals(shell, WholeDesignFile.read(file, CAT));
    }

    @Test
    void unknownFieldIsRefusedWithPathAndLine() {
        MaterialFileException e = refused(CAN.replace("\"wall\": \"40 mil\",", "\"wall\": \"40 mil\", \"colour\": 1,"));
        assertEquals("$.arrangement.bodies[0].colour", e.path());
        assertEquals(8, e.line()); // line 8 of the document, where "colour" stands
        MaterialFileException top = refused(CAN.replace("\"points\": 3,", "\"points\": 3, \"mesh\": 2,"));
        assertEquals("$.mesh", top.path());
        assertEquals(19, top.line());
    }

    @Test
    void quantityWithoutItsUnitIsRefusedAtItsPlace() {
        MaterialFileException e = refused(CAN.replace("\"radius\": \"50 mm\"", "\"radius\": \"50\""));
        assertEquals("$.arrangement.bodies[1].radius", e.path());
        assertEquals(12, e.line());
        MaterialFileException s = refused(PLATE.replace("\"separation\": \"40 mm\"", "\"separation\": 40"));
        assertEquals("$.arrangement.coils.separation", s.path());
        assertTrue(s.getMessage().contains("unit"), s.getMessage());
    }

    @Test
    void badBodiesAreRefusedAtTheBody() {
        // A hole as large as the plate leaves nothing.
        MaterialFileException hole = refused(PLATE.replace("\"holeRadius\": \"2 mm\"", "\"holeRadius\": \"25 mm\""));
        assertEquals("$.arrangement.bodies[0].holeRadius", hole.path());
        assertEquals(7, hole.line());
        // A plate inside the can's wall: the second body overlaps the first.
        MaterialFileException overlap = refused(CAN.replace("\"centre\": \"-45 mm\"", "\"centre\": \"29 mm\""));
        assertEquals("$.arrangement.bodies[1]", overlap.path());
        assertEquals(10, overlap.line());
        MaterialFileException shape = refused(CAN.replace("\"shape\": \"disc\"", "\"shape\": \"cone\""));
        assertEquals("$.arrangement.bodies[1].shape", shape.path());
        MaterialFileException open = refused(CAN.replace("\"upperEnd\": \"capped\"", "\"upperEnd\": \"open\""));
        assertEquals("$.arrangement.bodies[0].upperCapHole", open.path());
        MaterialFileException neither = refused(CAN.replace("\"material\": \"nickel-iron-80\",", ""));
        assertEquals("$.arrangement.bodies[0]", neither.path());
        MaterialFileException unknown = refused(CAN.replace("nickel-iron-80", "unobtainium"));
        assertEquals("$.arrangement.bodies[0].material", unknown.path());
    }

    @Test
    void arrangementProblemsAreLocated() {
        MaterialFileException both = refused(CAN.replace("\"tolerance\": \"0.5 dB\"",
                "\"tolerance\": \"0.5 dB\", \"coils\": {}"));
        assertEquals("$.arrangement", both.path());
        MaterialFileException version = refused(CAN.replace("\"version\": 3", "\"version\": 2"));
        assertEquals("$.version", version.path());
        // 1 GHz is above the quasi-static limit of a 12 cm geometry.
        MaterialFileException band = refused(CAN.replace("10 Hz to 1 kHz", "10 Hz to 1 GHz"));
        assertEquals("$.band", band.path());
        MaterialFileException tol = refused(CAN.replace("0.5 dB", "50 dB"));
        assertEquals("$.arrangement.tolerance", tol.path());
        MaterialFileException close = refused(PLATE.replace("\"separation\": \"40 mm\"",
                "\"separation\": \"2 mm\""));
        assertEquals("$.arrangement.coils.separation", close.path());
        MaterialFileException direction = refused(CAN.replace("\"axial\"", "\"sideways\""));
        assertEquals("$.arrangement.appliedField.direction", direction.path());
        assertTrue(direction.getMessage().contains("\"sideways\"; known: axial, transverse, worst"),
                direction.getMessage());
        MaterialFileException number = refused(CAN.replace("\"axial\"", "2"));
        assertEquals("$.arrangement.appliedField.direction", number.path());
        MaterialFileException missing = refused(CAN.replace("\"direction\": \"axial\", ", ""));
        assertEquals("$.arrangement.appliedField", missing.path());
    }

    @Test
    void theAppliedFieldsDirectionChoosesTheModelAndIsWrittenBack() {
        AxisymmetricDesign axial = WholeDesignFile.parse(CAN, CAT).axisymmetric().orElseThrow();
        AxisymmetricDesign across = WholeDesignFile.parse(CAN.replace("\"axial\"", "\"transverse\""), CAT)
                .axisymmetric().orElseThrow();
        AxisymmetricDesign worst = WholeDesignFile.parse(CAN.replace("\"axial\"", "\"worst\""), CAT)
                .axisymmetric().orElseThrow();
        assertEquals(java.util.Optional.of(DesignFieldDirection.AXIAL), axial.fieldDirection());
        assertEquals(java.util.Optional.of(DesignFieldDirection.TRANSVERSE), across.fieldDirection());
        assertEquals(java.util.Optional.of(DesignFieldDirection.WORST), worst.fieldDirection());
        assertTrue(WholeDesignFile.parse(PLATE, CAT).axisymmetric().orElseThrow().fieldDirection().isEmpty());
        // Each is the solver's own evaluation of that direction, with the file's sensor and tolerance.
        Arrangement bodies = axial.arrangement();
        SensorRegion sensor = axial.sensor().orElseThrow().region();
        TransverseFieldShielding t = bodies.inUniformTransverseField().sensing(sensor).withTolerance(Decibels.of(0.5));
        assertEquals(t, across.model());
        assertEquals(WorstDirectionShielding.of((AxialFieldShielding) axial.model(), t), worst.model());
        // Only the direction differs, so the designs differ, and each is written back as read.
        assertFalse(axial.equals(worst));
        assertFalse(across.equals(worst));
        for (AxisymmetricDesign d : List.of(axial, across, worst)) {
            String json = WholeDesignFile.toJson(d);
            assertTrue(json.contains("\"direction\" : \"" + d.fieldDirection().orElseThrow().fileName() + "\""), json);
            assertTrue(json.contains("\"version\" : 3"), json);
            assertEquals(d, WholeDesignFile.parse(json, CAT).axisymmetric().orElseThrow());
        }
        assertTrue(worst.toString().contains("the worse of axial and transverse"), worst.toString());
    }

    @Test
    void planarReaderPointsToThisOneForAnArrangement() {
        MaterialFileException e = assertThrows(MaterialFileException.class, () -> DesignFile.parse(CAN, CAT));
        assertEquals("$.arrangement", e.path());
        assertTrue(e.getMessage().contains("WholeDesignFile"), e.getMessage());
    }

    @Test
    void aRequiredSeGivenDirectlyReadsWritesBackAsGivenAndMatchesItsFieldPair() {
        String direct = CAN.replace("\"incident\": \"40 µT\", \"tolerated\": \"100 nT\"",
                "\"requiredSe\": \"52.04 dB\"");
        WholeDesign d = WholeDesignFile.parse(direct, CAT);
        Requirement.Entry e = d.requirement().entries().get(0);
        assertTrue(e.isDirect());
        assertEquals(52.04, e.requiredDb(), 0);
        String back = WholeDesignFile.toJson(d);
        assertTrue(back.contains("\"requiredSe\" : \"52.04 dB\""), back);
        assertFalse(back.contains("incident"), back);
        assertEquals(d, WholeDesignFile.parse(back, CAT));
        assertEquals(back, WholeDesignFile.toJson(WholeDesignFile.parse(back, CAT)));
        // 40 µT to 100 nT needs 20·log10(400) = 52.0412 dB (IEEE Std 299-2006, clause 3: SE as a
        // field ratio in dB); the direct 52.04 dB case has a margin larger by 0.0012 dB (hand value).
        WholeDesign byFields = WholeDesignFile.parse(CAN, CAT);
        assertEquals(20 * Math.log10(400) - 52.04, byFields.requirement().entries().get(0).requiredDb()
                - e.requiredDb(), 1e-12);
        assertEquals(0.0012, byFields.requirement().entries().get(0).requiredDb() - e.requiredDb(), 1e-4);
    }

    @Test
    void sourceCaseProblemsAreLocatedAtTheCase() {
        String pair = "\"incident\": \"40 µT\", \"tolerated\": \"100 nT\"";
        MaterialFileException both = refused(CAN.replace(pair, pair + ", \"requiredSe\": \"40 dB\""));
        assertEquals("$.cases[0]", both.path());
        assertEquals(20, both.line()); // the line of "cases" in CAN (counted by hand)
        assertTrue(both.problem().contains("not both"), both.problem());
        MaterialFileException neither = refused(CAN.replace(", " + pair, ""));
        assertEquals("$.cases[0]", neither.path());
        assertEquals(20, neither.line());
        MaterialFileException range = refused(CAN.replace(pair, "\"requiredSe\": \"-1 dB\""));
        assertEquals("$.cases[0].requiredSe", range.path());
        assertTrue(range.problem().contains("from 0 dB to 400 dB"), range.problem());
        MaterialFileException unit = refused(CAN.replace(pair, "\"requiredSe\": \"40\""));
        assertEquals("$.cases[0].requiredSe", unit.path());
    }

    @Test
    void theReadmesExampleReads() throws Exception {
        // The invented example the README shows and the batch command's session uses.
        WholeDesign d = WholeDesignFile.read(Path.of("../shield-examples/examples/sensor-can.json"), CAT);
        assertEquals(WholeDesign.Kind.AXISYMMETRIC, d.kind());
        assertInstanceOf(AxialFieldShielding.class, d.model());
        // Required SE = 20·log10(incident/tolerated) = 20·log10(40 µT / 100 nT) = 20·log10(400)
        // = 52.0412 dB (the definition of shielding effectiveness, IEEE Std 299-2006, clause 3).
        assertEquals(52.0412, d.requirement().entries().get(0).requiredDb(), 1e-4);
    }

    @Test
    void aCentreAtZeroIsNoShiftAndABareNumberIsRefused() {
        WholeDesign zero = WholeDesignFile.parse(CAN.replace("\"centre\": \"2 mm\"", "\"centre\": \"0 mm\""), CAT);
        WholeDesign none = WholeDesignFile.parse(CAN.replace(", \"centre\": \"2 mm\"", ""), CAT);
        assertEquals(none.model(), zero.model());
        MaterialFileException bare = refused(CAN.replace("\"-45 mm\"", "\"0.45\""));
        assertEquals("$.arrangement.bodies[1].centre", bare.path());
    }
}
