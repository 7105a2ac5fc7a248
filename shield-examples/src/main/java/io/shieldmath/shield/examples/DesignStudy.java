/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.nT;
import static io.shieldmath.shield.quantity.Quantities.uT;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.axisymmetric.CoilCoupling;
import io.shieldmath.shield.axisymmetric.CouplingSolution;
import io.shieldmath.shield.axisymmetric.EstimatedValue;
import io.shieldmath.shield.axisymmetric.FieldDirection;
import io.shieldmath.shield.axisymmetric.SaturationOnset;
import io.shieldmath.shield.axisymmetric.SaturationSolution;
import io.shieldmath.shield.axisymmetric.SaturationStudy;
import io.shieldmath.shield.axisymmetric.SensorRegion;
import io.shieldmath.shield.axisymmetric.WorstDirectionShielding;
import io.shieldmath.shield.axisymmetric.WorstDirectionSolution;
import io.shieldmath.shield.axisymmetric.files.AxisymmetricDesign;
import io.shieldmath.shield.axisymmetric.files.DesignBody;
import io.shieldmath.shield.axisymmetric.files.DesignCoil;
import io.shieldmath.shield.axisymmetric.files.DesignFieldDirection;
import io.shieldmath.shield.axisymmetric.files.DesignSensor;
import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesignFile;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.CouplingEvaluation;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.MagnetizationCurves;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.DoubleFunction;

/**
 * The main example, a worked design study on an invented scenario (every number here is
 * illustrative, made up for this example):
 *
 * <p>A fluxgate magnetometer board inside a laboratory instrument sits 6 cm from the 20 kHz
 * coil of an inductive charger and 30 cm from a 50 Hz mains transformer. Which shield,
 * lightest first, keeps the interference at the sensor below its noise floor?
 *
 * <p>The program states the scenario, computes the required SE per band, and computes every
 * candidate it may recommend with the axisymmetric finite-element solver: round plates of a
 * stated size between each source and the sensor, and real cans (capped tubes with a cable hole
 * in one cap, and an open tube) around the sensor in the ambient field, whose direction is not
 * known: each can counts the worse of a field along its axis and one across it
 * ({@link WorstDirectionShielding}). It ranks them by mass against the requirement and
 * recommends the lightest that meets it, saying which direction is the worse one where its
 * margin is smallest, with the validity notes of its results at the study's frequencies (or
 * that they carry none). The same plates as
 * infinite sheets between the same coils are computed beside them, as a separate, labelled
 * comparison that is never recommended. It writes into an output folder a CSV of the results,
 * the whole recommended design as a design file (version 3, the can's applied field
 * {@code "worst"} of the two directions, with the study's mesh fineness, so that it evaluates
 * to the printed numbers), the SE plot, and field maps of the bench case and of the recommended
 * can (PNG and SVG).
 *
 * <p>Solves run on {@link Runtime#availableProcessors()} threads; results do not depend on the
 * number of threads (the solver gives bit-identical results for equal inputs).
 */
public final class DesignStudy {

    /** The round plates' radius: plates 120 mm across (illustrative). */
    static final Length PLATE_RADIUS = mm(60);
    /** How far in front of the sensor, towards the source, a plate's centre sits. */
    static final Length PLATE_TO_SENSOR = mm(10);
    /** The charger coil: a flat 20-turn loop of 20 mm radius, 6 cm from the sensor (illustrative). */
    static final Coil CHARGER = Coil.loop(mm(20), 20);
    /** The transformer's stray field, as a 100-turn loop of 40 mm radius 30 cm from the sensor. */
    static final Coil TRANSFORMER = Coil.loop(mm(40), 100);
    /** The sensor as the coils see it: a 3 mm loop, the fluxgate core's size (illustrative). */
    static final Coil SENSOR_LOOP = Coil.loop(mm(3), 1);
    static final Length CHARGER_DISTANCE = mm(60);
    static final Length TRANSFORMER_DISTANCE = mm(300);
    /** The cans' inner radius and overall length (illustrative). */
    static final Length CAN_RADIUS = mm(15);
    static final Length CAN_LENGTH = mm(60);
    /** The radii of the two cable holes the cans are offered with: 6 mm and 2 mm across (illustrative). */
    static final Length CABLE_HOLE = mm(3);
    static final Length SMALL_CABLE_HOLE = mm(1);
    /** The sensor inside a can: a cylinder 3 mm in radius and 10 mm long at the centre. */
    static final SensorRegion SENSOR = SensorRegion.cylinder(mm(3), mm(10));
    /** Below this frequency the transformer's field dominates, above it the charger's. */
    static final double SOURCE_SPLIT_HZ = 1000;
    /**
     * The solver's mesh fineness for every candidate: half the default, so that a 1 mm
     * nickel-iron can at 60 kHz fits the solver's mesh cap and the study stays within a minute
     * on two cores; each result's discretisation estimate is printed beside it.
     */
    static final double FINENESS = 0.5;
    /**
     * The mesh fineness for the cans, in both directions: the solver's lowest, so that the
     * cans' solves across the axis (with eddy currents, dearer than axial ones) keep the study's
     * time. At {@link #FINENESS} a
     * transverse solve of the 1 mm nickel-iron can at 20 kHz takes about four times as long and
     * moves its SE by less than 0.1 dB; each SE's discretisation estimate is printed beside it.
     */
    static final double CAN_FINENESS = 0.25;
    /** The frequencies of the sweep table and plot besides the requirement's. */
    static final double[] SWEEP_HZ = {10, 100, 500, 2e3, 5e3, 1e4, 1e5, 2e5};
    /** The points of the written design's own sweep, 10 Hz to 200 kHz. */
    static final int DESIGN_POINTS = 19;
    /** The saturation sweep: from the strongest ambient field up to this field strength, in A/m, in this many fields. */
    static final double SATURATION_SWEEP_TOP = 1e5;
    static final int SATURATION_SWEEP_POINTS = 9;
    /** The SE chart's size in pixels. */
    static final int CHART_WIDTH = 1000;
    static final int CHART_HEIGHT = 680;
    /** The field maps' size in pixels. */
    static final int MAP_WIDTH = 900;
    static final int MAP_HEIGHT = 760;

    private DesignStudy() {
    }

    /**
     * Runs the study, printing the report to standard output.
     *
     * @param args optional: the output folder (default {@code shield-output})
     * @throws IOException if an output file cannot be written
     */
    public static void main(String[] args) throws IOException {
        Path out = Paths.get(args.length > 0 ? args[0] : "shield-output");
        run(System.out, out);
    }

    /**
     * One candidate: a shield and how the solver evaluates it at a frequency.
     *
     * @param kind       "plate", "stack" or "can"
     * @param name       what it is
     * @param massGrams  its mass
     * @param solved     true for the solver's finite shields, false for infinite-sheet comparisons
     * @param seAt       SE in dB with its discretisation estimate at a frequency in Hz, and for a can the
     *                   worse direction there
     * @param bodies     the bodies as a design file holds them (finite shields), or null
     * @param evaluation the solver evaluation at the charger's frequencies (or the can's, both directions), or null
     * @param material   a can's material, or null
     */
    record Candidate(String kind, String name, double massGrams, boolean solved, DoubleFunction<Sample> seAt,
                     List<DesignBody> bodies, ShieldingModel<?> evaluation, Material material) {

        Arrangement arrangement() {
            return arrangementOf(bodies);
        }

        String label() {
            return kind + ": " + name;
        }
    }

    /**
     * The SE of a candidate at one frequency.
     *
     * @param se    SE in dB with its discretisation estimate
     * @param worse for a can, the direction of the applied field that gave that SE (the worse one); null
     *              for a plate
     * @param notes the result's validity notes ({@link ShieldingResult#validityNotes()}), often empty
     */
    record Sample(EstimatedValue se, FieldDirection worse, List<ValidityNote> notes) {
    }

    /** A candidate with its SE (and a can's worse direction) at every frequency of the study and its margin per band. */
    record Evaluated(Candidate candidate, double[] seDb, double[] estimateDb, FieldDirection[] worse,
                     List<List<ValidityNote>> notes, List<Margin> margins) {

        boolean meets() {
            return margins.stream().allMatch(m -> m.marginDb() >= 0);
        }

        Margin worst() {
            return margins.stream().min(Comparator.comparingDouble(Margin::marginDb)).orElseThrow();
        }
    }

    /**
     * The margin in one band of the requirement: the lowest SE at the band's sampled frequencies
     * (a single frequency, or the ends and centre of a band), less the required SE.
     *
     * @param entry      the requirement's band
     * @param hertz      where the lowest SE was found
     * @param seDb       that SE
     * @param estimateDb its discretisation estimate
     * @param marginDb   SE − required
     * @param worse      for a can, the direction of the applied field that gave that SE; null for a plate
     */
    record Margin(Requirement.Entry entry, double hertz, double seDb, double estimateDb, double marginDb,
                  FieldDirection worse) {
    }

    /**
     * What the study found, for callers and tests.
     *
     * @param recommended      the recommended design's label, or null if none meets the requirement
     * @param designFile       the design file written, or null
     * @param requirement      the requirement
     * @param outputFolder     where the files went
     * @param recommendedModel the solver evaluation of the recommended design, or null
     * @param worstFrequency   where its margin is smallest, or null
     * @param worstSeDb        its SE there as printed (rounded to 0.01 dB in the report)
     * @param worseDirection   for a can, the direction of the applied field that gives that SE (the worse
     *                         one there); null for a plate or if nothing is recommended
     */
    public record Outcome(String recommended, Path designFile, Requirement requirement, Path outputFolder,
                          ShieldingModel<?> recommendedModel, Frequency worstFrequency, double worstSeDb,
                          FieldDirection worseDirection) {
    }

    /**
     * The requirement of the scenario: the field each source makes at the board without a
     * shield, and the sensor's 5 nT noise floor.
     *
     * @return the requirement
     */
    public static Requirement requirement() {
        return Requirement.none()
                .plus(FrequencyBand.at(Hz(50)), uT(2), nT(5))
                .plus(FrequencyBand.at(Hz(150)), uT(0.5), nT(5))
                .plus(FrequencyBand.of(kHz(19), kHz(21)), uT(8), nT(5))
                .plus(FrequencyBand.of(kHz(38), kHz(42)), uT(1.5), nT(5))
                .plus(FrequencyBand.of(kHz(57), kHz(63)), uT(0.6), nT(5));
    }

    /**
     * Runs the study.
     *
     * @param out    where the report goes
     * @param folder the output folder, created if missing
     * @return what the study recommends and where it wrote it
     * @throws IOException if an output file cannot be written
     */
    public static Outcome run(PrintStream out, Path folder) throws IOException {
        Files.createDirectories(folder);
        Catalogue catalogue = Catalogue.builtIn();
        Material copper = catalogue.get("copper-annealed");
        Material aluminium = catalogue.get("aluminium-6061-t6");
        Material nickelIron = catalogue.get("nickel-iron-80");
        Requirement need = requirement();
        printScenario(out, need);

        List<Candidate> candidates = new ArrayList<>();
        // Round plates between each source and the sensor, and the same plates as infinite sheets.
        candidates.addAll(plate("aluminium 6061, 2 mm", List.of(new Sheet(aluminium, mm(2)))));
        candidates.addAll(plate("copper, 1 mm", List.of(new Sheet(copper, mm(1)))));
        candidates.addAll(plate("80 % nickel-iron, 1 mm", List.of(new Sheet(nickelIron, mm(1)))));
        candidates.addAll(plate("Cu 0.5 mm | gap 1 mm | Ni-Fe 0.5 mm", List.of(new Sheet(copper, mm(0.5)),
                new Sheet(null, mm(1)), new Sheet(nickelIron, mm(0.5)))));
        // Cans around the sensor in the ambient field, along the can's axis or across it.
        candidates.add(can("Ni-Fe 1 mm, capped, 6 mm cable hole", nickelIron, mm(1), CABLE_HOLE));
        candidates.add(can("Ni-Fe 1 mm, capped, 2 mm cable hole", nickelIron, mm(1), SMALL_CABLE_HOLE));
        candidates.add(can("Ni-Fe 0.5 mm, capped, 6 mm cable hole", nickelIron, mm(0.5), CABLE_HOLE));
        candidates.add(can("Ni-Fe 1 mm, open tube", nickelIron, mm(1), null));
        candidates.add(can("aluminium 2 mm, capped, 6 mm cable hole", aluminium, mm(2), CABLE_HOLE));

        double[] hz = studyFrequencies(need);
        List<Evaluated> results = evaluate(candidates, hz, need);
        List<Evaluated> solved = results.stream().filter(e -> e.candidate().solved()).toList();
        List<Evaluated> sheets = results.stream().filter(e -> !e.candidate().solved()).toList();

        Evaluated best = printRanking(out, solved);
        if (best != null) {
            noteLines(hz, best.notes()).forEach(out::println);
        }
        printSheetComparison(out, sheets, solved, hz);
        printSaturation(out, best, need);
        printCautions(out);

        writeCsv(folder.resolve("sweeps.csv"), hz, results);
        Path design = folder.resolve("chosen-design.json");
        if (best != null) {
            writeDesign(best, need, design);
        }
        SeChart chart = SeChart.titled("Candidate shields for the magnetometer board (illustrative)")
                .requiring(need)
                .switchingSourceAt(Hz(SOURCE_SPLIT_HZ), "transformer at 30 cm", "charger at 6 cm");
        for (Evaluated e : results) {
            chart = chart.plus(chartKind(e.candidate()), e.candidate().name(), hz, e.seDb());
        }
        if (best != null) {
            chart = chart.recommending(chartKind(best.candidate()), best.candidate().name());
        }
        chart.writePng(folder.resolve("se-vs-frequency.png"), CHART_WIDTH, CHART_HEIGHT);
        chart.writeSvg(folder.resolve("se-vs-frequency.svg"), CHART_WIDTH, CHART_HEIGHT);
        List<String> maps = writeFieldMaps(folder, copper, best, need);
        out.println();
        out.println("Written to " + folder.toAbsolutePath() + ": sweeps.csv, " + (best == null ? "" : "chosen-design.json, ")
                + "se-vs-frequency.png, se-vs-frequency.svg" + (maps.isEmpty() ? "" : ", " + String.join(", ", maps)));
        if (best == null) {
            return new Outcome(null, null, need, folder, null, null, Double.NaN, null);
        }
        Margin w = best.worst();
        return new Outcome(best.candidate().label(), design, need, folder, best.candidate().evaluation(),
                Frequency.ofHertz(w.hertz()), w.seDb(), w.worse());
    }

    /**
     * Field maps of the bench case (the 1 mm copper plate between the charger coil and the
     * sensor at 20 kHz, 1 A peak in the charger coil) and of the recommended can at its worst
     * frequency in the ambient field of that band.
     */
    private static List<String> writeFieldMaps(Path folder, Material copper, Evaluated best, Requirement need)
            throws IOException {
        List<String> written = new ArrayList<>();
        Arrangement bench = arrangementOf(plateBodies(List.of(new Sheet(copper, mm(1))), CHARGER_DISTANCE));
        CoilPair pair = coils(true);
        Frequency f = kHz(20);
        FieldMapPicture benchMap = FieldMapPicture.around(bench, pair,
                        bench.between(pair).withFineness(FINENESS).at(f), DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, f))
                .titled(String.format(Locale.ROOT, "Copper plate 1 mm, %.0f mm across, charger coil to sensor, 20 kHz "
                        + "(1 A peak; illustrative)", 2 * PLATE_RADIUS.toMetres() * 1e3));
        benchMap.writePng(folder.resolve("field-map-bench.png"), MAP_WIDTH, MAP_HEIGHT);
        benchMap.writeSvg(folder.resolve("field-map-bench.svg"), MAP_WIDTH, MAP_HEIGHT);
        written.add("field-map-bench.png");
        written.add("field-map-bench.svg");
        if (best != null && best.candidate().evaluation() instanceof WorstDirectionShielding can) {
            Margin w = best.worst();
            Frequency at = Frequency.ofHertz(w.hertz());
            // The study's own requirement is made of source cases, so each entry has its incident field.
            MagneticFluxDensity incident = w.entry().incident().orElseThrow();
            // The map is of the field along the axis, the direction whose field the solver maps.
            FieldMapPicture canMap = FieldMapPicture.around(best.candidate().arrangement(), can.axial().at(at), incident)
                    .titled("Recommended " + best.candidate().label() + ", in " + incident + " along its axis at "
                            + at + " (illustrative)");
            canMap.writePng(folder.resolve("field-map-can.png"), MAP_WIDTH, MAP_HEIGHT);
            canMap.writeSvg(folder.resolve("field-map-can.svg"), MAP_WIDTH, MAP_HEIGHT);
            written.add("field-map-can.png");
            written.add("field-map-can.svg");
        }
        return written;
    }

    /** How the chart draws a candidate: by its kind, infinite sheets as comparisons. */
    private static SeChart.Kind chartKind(Candidate c) {
        return c.solved() ? SeChart.Kind.valueOf(c.kind().toUpperCase(Locale.ROOT)) : SeChart.Kind.SHEET;
    }

    /** The coils of the charger (above the source split) or of the transformer (below it). */
    static CoilPair coils(boolean charger) {
        return charger ? CoilPair.coaxial(CHARGER, SENSOR_LOOP, CHARGER_DISTANCE)
                : CoilPair.coaxial(TRANSFORMER, SENSOR_LOOP, TRANSFORMER_DISTANCE);
    }

    /**
     * One layer of a plate or stack, source side first.
     *
     * @param material  the layer's material, or null for an air gap
     * @param thickness its thickness
     */
    record Sheet(Material material, Length thickness) {

        Layer layer() {
            return material == null ? Layer.gap(thickness) : Layer.of(material, thickness);
        }
    }

    /**
     * The bodies of a plate or stack, source side first, its centre {@link #PLATE_TO_SENSOR}
     * in front of the sensor between coils of the given separation: round plates of
     * {@link #PLATE_RADIUS}, the gaps left as air.
     */
    static List<DesignBody> plateBodies(List<Sheet> sheets, Length separation) {
        double total = sheets.stream().mapToDouble(l -> l.thickness().toMetres()).sum();
        // The sensor sits at +separation/2; the stack's centre PLATE_TO_SENSOR before it.
        double z = separation.toMetres() / 2 - PLATE_TO_SENSOR.toMetres() - total / 2;
        List<DesignBody> bodies = new ArrayList<>();
        for (int i = 0; i < sheets.size(); i++) {
            Sheet l = sheets.get(i);
            if (l.material() != null) {
                DesignBody b = DesignBody.disc(i == 0 ? "plate" : "plate layer " + (i + 1), l.material(), PLATE_RADIUS,
                        l.thickness());
                double centre = z + l.thickness().toMetres() / 2;
                bodies.add(centre >= 0 ? b.shiftedBy(Length.ofMetres(centre)) : b.shiftedBackBy(Length.ofMetres(-centre)));
            }
            z += l.thickness().toMetres();
        }
        return List.copyOf(bodies);
    }

    static Arrangement arrangementOf(List<DesignBody> bodies) {
        return Arrangement.of(bodies.stream().map(DesignBody::body).toList());
    }

    /** A finite plate (or stack) computed by the solver, and the same layers as an infinite sheet. */
    private static List<Candidate> plate(String name, List<Sheet> sheets) {
        String kind = sheets.size() > 1 ? "stack" : "plate";
        double mass = 0;
        for (Sheet l : sheets) {
            if (l.material() != null) {
                mass += l.material().arealMass(l.thickness()).toKilogramsPerSquareMetre()
                        * Math.PI * Math.pow(PLATE_RADIUS.toMetres(), 2) * 1000;
            }
        }
        List<DesignBody> nearBodies = plateBodies(sheets, CHARGER_DISTANCE);
        CoilCoupling near = arrangementOf(nearBodies).between(coils(true)).withFineness(FINENESS);
        CoilCoupling far = arrangementOf(plateBodies(sheets, TRANSFORMER_DISTANCE)).between(coils(false))
                .withFineness(FINENESS);
        Candidate finite = new Candidate(kind, name + String.format(Locale.ROOT, ", %.0f mm across",
                2 * PLATE_RADIUS.toMetres() * 1e3), mass, true,
                hz -> plateSample((hz < SOURCE_SPLIT_HZ ? far : near).at(Frequency.ofHertz(hz))),
                nearBodies, near, null);
        Barrier barrier = Barrier.of(sheets.stream().map(Sheet::layer).toList());
        CouplingEvaluation sheetNear = coils(true).through(barrier);
        CouplingEvaluation sheetFar = coils(false).through(barrier);
        Candidate sheet = new Candidate(kind, name, mass, false,
                hz -> new Sample(new EstimatedValue((hz < SOURCE_SPLIT_HZ ? sheetFar : sheetNear)
                        .shieldingEffectivenessDb(hz), 0), null, List.of()),
                null, sheetNear, null);
        return List.of(finite, sheet);
    }

    /**
     * A can of the study's size around the sensor, in the ambient field taken as uniform and of
     * unknown direction, so the worse of a field along the can's axis and one across it counts
     * at each frequency: capped at both ends with the cable hole in the upper cap, or (hole
     * null) an open tube.
     */
    private static Candidate can(String name, Material material, Length wall, Length hole) {
        DesignBody body = DesignBody.can("can", material, CAN_RADIUS, wall, CAN_LENGTH);
        body = hole != null ? body.withCapHole(CanEnd.UPPER, hole) : body.withoutCap(CanEnd.LOWER).withoutCap(CanEnd.UPPER);
        Arrangement a = arrangementOf(List.of(body));
        WorstDirectionShielding e = WorstDirectionShielding.of(
                a.inUniformAxialField().sensing(SENSOR).withFineness(CAN_FINENESS),
                a.inUniformTransverseField().sensing(SENSOR).withFineness(CAN_FINENESS));
        return new Candidate("can", name, canMassGrams(material, wall, hole), true, hz -> worse(e.at(Frequency.ofHertz(hz))),
                List.of(body), e, material);
    }

    /** The worse direction's SE, its estimate and the direction (axial on a tie, as the solution says). */
    private static Sample worse(WorstDirectionSolution s) {
        FieldDirection d = s.worstDirection();
        return new Sample(d == FieldDirection.AXIAL ? s.axial().worstShieldingDb() : s.transverse().worstShieldingDb(), d,
                s.validityNotes());
    }

    /** A finite plate's insertion loss with its estimate and its notes. */
    private static Sample plateSample(CouplingSolution s) {
        return new Sample(s.insertionLossEstimated(), null, s.validityNotes());
    }

    /** A can's mass: the tube between the caps, two caps, less the cable hole (or, hole null, an open tube). */
    static double canMassGrams(Material material, Length wall, Length hole) {
        double a = CAN_RADIUS.toMetres();
        double w = wall.toMetres();
        double l = CAN_LENGTH.toMetres();
        double outer = Math.PI * (a + w) * (a + w);
        double volume = hole != null
                ? (outer - Math.PI * a * a) * (l - 2 * w) + 2 * outer * w
                        - Math.PI * hole.toMetres() * hole.toMetres() * w
                : (outer - Math.PI * a * a) * l;
        return volume * material.density().toKilogramsPerCubicMetre() * 1000;
    }

    /** The requirement's frequencies (each band's ends and centre) and the sweep's, sorted. */
    static double[] studyFrequencies(Requirement need) {
        TreeSet<Double> all = new TreeSet<>();
        for (double f : SWEEP_HZ) {
            all.add(f);
        }
        for (Requirement.Entry e : need.entries()) {
            for (double f : bandSamples(e.band())) {
                all.add(f);
            }
        }
        return all.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** A single frequency, or a band's ends and its (geometric) centre. */
    static double[] bandSamples(FrequencyBand band) {
        double lo = band.low().toHertz();
        double hi = band.high().toHertz();
        return lo == hi ? new double[] {lo} : band.logSpacedHertz(3);
    }

    /** Every candidate at every frequency, on all cores, the slowest solves first. */
    private static List<Evaluated> evaluate(List<Candidate> candidates, double[] hz, Requirement need) {
        int n = candidates.size();
        Sample[][] values = new Sample[n][hz.length];
        ExecutorService pool = Executors.newFixedThreadPool(Runtime.getRuntime().availableProcessors());
        try {
            List<Future<?>> jobs = new ArrayList<>();
            // Cans at high frequency cost most: submit from the highest frequency down, cans first.
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                order.add(i);
            }
            order.sort(Comparator.comparing((Integer i) -> !candidates.get(i).kind().equals("can")));
            for (int j = hz.length - 1; j >= 0; j--) {
                for (int i : order) {
                    int ci = i;
                    int fj = j;
                    jobs.add(pool.submit(() -> {
                        values[ci][fj] = candidates.get(ci).seAt().apply(hz[fj]);
                    }));
                }
            }
            for (Future<?> f : jobs) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the study was interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
        List<Evaluated> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double[] se = new double[hz.length];
            double[] est = new double[hz.length];
            FieldDirection[] worse = new FieldDirection[hz.length];
            List<List<ValidityNote>> notes = new ArrayList<>(hz.length);
            for (int j = 0; j < hz.length; j++) {
                se[j] = values[i][j].se().value();
                est[j] = values[i][j].se().estimate();
                worse[j] = values[i][j].worse();
                notes.add(values[i][j].notes());
            }
            List<Margin> margins = new ArrayList<>();
            for (Requirement.Entry e : need.entries()) {
                Margin worst = null;
                for (double f : bandSamples(e.band())) {
                    int j = Arrays.binarySearch(hz, f);
                    Margin m = new Margin(e, f, se[j], est[j], se[j] - e.requiredDb(), worse[j]);
                    if (worst == null || m.marginDb() < worst.marginDb()) {
                        worst = m;
                    }
                }
                margins.add(worst);
            }
            out.add(new Evaluated(candidates.get(i), se, est, worse, List.copyOf(notes), List.copyOf(margins)));
        }
        return out;
    }

    private static void printScenario(PrintStream out, Requirement need) {
        String title = "shield design study: a magnetometer board between a charger coil and a transformer";
        out.println(title);
        out.println("=".repeat(title.length()));
        out.println("Scenario (illustrative, invented for this example): a fluxgate magnetometer board in a");
        out.println("lab instrument sits 6 cm from the 20 kHz coil of an inductive charger and 30 cm from a");
        out.println("50 Hz mains transformer. The sensor's noise floor is 5 nT; interference must stay below.");
        out.println("Every candidate below is computed by the axisymmetric finite-element solver:");
        out.println(String.format(Locale.ROOT, "- round plates %.0f mm across, %.0f mm in front of the sensor, on the axis from each",
                2 * PLATE_RADIUS.toMetres() * 1e3, PLATE_TO_SENSOR.toMetres() * 1e3));
        out.println("  source (the charger a 20 mm loop, the transformer a 40 mm loop) to the sensor (a 3 mm loop);");
        out.println("  the transformer's field below 1 kHz, the charger's above;");
        out.println(String.format(Locale.ROOT, "- cans of %.0f mm inner radius, %.0f mm long, around the sensor (a cylinder 3 mm in",
                CAN_RADIUS.toMetres() * 1e3, CAN_LENGTH.toMetres() * 1e3));
        out.println(String.format(Locale.ROOT, "  radius, 10 mm long): capped with a %.0f mm or %.0f mm cable hole in one cap, or",
                2 * CABLE_HOLE.toMetres() * 1e3, 2 * SMALL_CABLE_HOLE.toMetres() * 1e3));
        out.println("  open; in the locally uniform ambient field, whose direction is not known: the worse of a");
        out.println("  field along the can's axis and one across it counts, at the worst point of the sensor.");
        out.println(String.format(Locale.ROOT, "Mesh fineness %.2g for plates, %.2g for cans; each SE carries its discretisation",
                FINENESS, CAN_FINENESS));
        out.println("estimate (±). Bands are sampled at their ends and centre. Materials from the built-in");
        out.println("catalogue at 20 °C.");
        out.println();
        out.println("Required shielding per band");
        out.println(String.format(Locale.ROOT, "  %-22s %12s %12s %10s", "band", "incident", "tolerated",
                "required"));
        for (Requirement.Entry e : need.entries()) {
            out.println(String.format(Locale.ROOT, "  %-22s %12s %12s %7.1f dB", e.band(),
                    e.incident().map(Object::toString).orElse("-"), e.tolerated().map(Object::toString).orElse("-"),
                    e.requiredDb()));
        }
        out.println();
    }

    private static Evaluated printRanking(PrintStream out, List<Evaluated> solved) {
        List<Evaluated> sorted = new ArrayList<>(solved);
        sorted.sort(Comparator.comparing((Evaluated e) -> !e.meets())
                .thenComparingDouble(e -> e.candidate().massGrams()));
        out.println("Candidates computed by the solver, meeting designs first, lightest first within each group");
        out.println(String.format(Locale.ROOT, "  %-5s %-50s %7s %18s %10s %10s %-10s  %s", "kind", "design", "mass",
                "SE at worst", "margin", "worst at", "direction", "meets"));
        Evaluated best = null;
        for (Evaluated e : sorted) {
            Margin w = e.worst();
            out.println(String.format(Locale.ROOT, "  %-5s %-50s %5.0f g %8.2f ± %4.2f dB %7.1f dB %10s %-10s  %s",
                    e.candidate().kind(), e.candidate().name(), e.candidate().massGrams(), w.seDb(), w.estimateDb(),
                    w.marginDb(), Frequency.ofHertz(w.hertz()), directionWord(w.worse()), e.meets() ? "yes" : "no"));
            if (best == null && e.meets()) {
                best = e;
            }
        }
        out.println("  (direction: for a can, the direction of the ambient field that gives the SE shown, the worse");
        out.println("  of along the axis and across it; a field at an angle can read up to 3 dB lower at a point.)");
        out.println();
        if (best == null) {
            out.println("No candidate meets the requirement: add thickness, a second layer or a closed can.");
        } else {
            Margin w = best.worst();
            out.println(String.format(Locale.ROOT, "Recommended: %s, %.0f g: worst margin %.1f dB at %s, where the "
                    + "solver gives SE %.2f ± %.2f dB%s.", best.candidate().label(), best.candidate().massGrams(),
                    w.marginDb(), Frequency.ofHertz(w.hertz()), w.seDb(), w.estimateDb(),
                    w.worse() == null ? "" : w.worse() == FieldDirection.AXIAL
                            ? " with the field along its axis, the worse direction there"
                            : " with the field across its axis, the worse direction there"));
        }
        return best;
    }

    /**
     * The report's lines on the validity notes of the recommended design's results at the
     * study's frequencies ({@link ShieldingResult#validityNotes()}): "no validity notes", or one
     * line per limit with how many frequencies it applied at, their range and the message at the
     * lowest of them (a message carries the numbers of its own frequency).
     *
     * @param hz    the study's frequencies, Hz, ascending
     * @param notes the notes at each of them
     * @return the lines
     */
    static List<String> noteLines(double[] hz, List<List<ValidityNote>> notes) {
        String where = "The recommended design's results at the study's " + hz.length + " frequencies carry ";
        Map<ValidityNote.Limit, List<Integer>> at = new EnumMap<>(ValidityNote.Limit.class);
        for (int j = 0; j < hz.length; j++) {
            for (ValidityNote n : notes.get(j)) {
                List<Integer> js = at.computeIfAbsent(n.limit(), l -> new ArrayList<>());
                if (js.isEmpty() || js.get(js.size() - 1) != j) {
                    js.add(j);
                }
            }
        }
        if (at.isEmpty()) {
            return List.of(where + "no validity notes.");
        }
        List<String> lines = new ArrayList<>();
        lines.add(where + "validity notes (the numbers stand, but trust them less):");
        for (Map.Entry<ValidityNote.Limit, List<Integer>> e : at.entrySet()) {
            List<Integer> js = e.getValue();
            int first = js.get(0);
            int last = js.get(js.size() - 1);
            String message = notes.get(first).stream().filter(n -> n.limit() == e.getKey()).findFirst().orElseThrow()
                    .message();
            lines.add("  " + e.getKey() + " at " + js.size() + " of " + hz.length + " frequencies, "
                    + (first == last ? "at " + Frequency.ofHertz(hz[first])
                            : "from " + Frequency.ofHertz(hz[first]) + " to " + Frequency.ofHertz(hz[last]))
                    + ": " + message);
        }
        return lines;
    }

    /** A can's worse direction in the ranking, "-" for a plate. */
    private static String directionWord(FieldDirection d) {
        return d == null ? "-" : d == FieldDirection.AXIAL ? "axial" : "transverse";
    }

    private static void printSheetComparison(PrintStream out, List<Evaluated> sheets, List<Evaluated> solved,
                                             double[] hz) {
        out.println();
        out.println("For comparison only, never recommended: the same plates as infinite sheets between the");
        out.println("same coils (exact infinite-sheet coupling). Flux rounds a real plate's rim, so the sheet");
        out.println("figure overstates it; the difference is shown at the finite plate's worst frequency.");
        out.println(String.format(Locale.ROOT, "  %-5s %-36s %15s %15s %13s", "kind", "layers", "sheet margin",
                "plate margin", "sheet above"));
        for (Evaluated sheet : sheets) {
            Evaluated plate = solved.stream().filter(e -> e.candidate().name().startsWith(sheet.candidate().name()))
                    .findFirst().orElseThrow();
            Margin pw = plate.worst();
            int j = Arrays.binarySearch(hz, pw.hertz());
            out.println(String.format(Locale.ROOT, "  %-5s %-36s %12.1f dB %12.1f dB %10.1f dB", sheet.candidate().kind(),
                    sheet.candidate().name(), sheet.worst().marginDb(), pw.marginDb(), sheet.seDb()[j] - plate.seDb()[j]));
        }
    }

    /**
     * The solver's static saturation check of the recommended can in the strongest ambient
     * field, and the onset of saturation from a static sweep of the applied field: the body and
     * the applied field at which its wall reaches 80 % of its saturation flux density. Both in
     * a field along the axis (the saturation study's direction).
     */
    private static void printSaturation(PrintStream out, Evaluated best, Requirement need) {
        if (best == null || !best.candidate().kind().equals("can")) {
            return;
        }
        MagneticFluxDensity strongest = MagneticFluxDensity.ofTesla(0);
        for (Requirement.Entry e : need.entries()) {
            if (e.incident().isPresent() && e.incident().get().compareTo(strongest) > 0) {
                strongest = e.incident().get();
            }
        }
        Body can = best.candidate().arrangement().bodies().get(0);
        Material material = best.candidate().material();
        out.println();
        if (!material.isFerromagnetic()) {
            out.println("Saturation: the recommended can is not ferromagnetic; no saturation check needed.");
            return;
        }
        SaturationStudy study = SaturationStudy.of(best.candidate().arrangement().inUniformAxialField().sensing(SENSOR))
                .withCurve(can.name(), MagnetizationCurves.builtIn().get(material.id())).withFineness(FINENESS);
        MagneticFieldStrength ambient = MagneticFieldStrength.from(strongest);
        SaturationSolution s = study.magnetostatic(ambient);
        double peak = s.peakFluxDensity(can.name()).toTesla();
        out.println(String.format(Locale.ROOT, "Saturation (solver, static, the catalogue's B-H curve, the field along "
                + "the axis):%n  in the strongest ambient field, %s held static, body '%s' carries at most %.3g mT, %s.",
                strongest, can.name(), peak * 1e3, s.isNearSaturation(can.name())
                        ? "WARNING: near saturation, thicken the wall" : "far from saturation"));
        MagneticFieldStrength top = MagneticFieldStrength.ofAmperesPerMetre(SATURATION_SWEEP_TOP);
        Optional<SaturationOnset> onset = study.sweep(ambient, top, SATURATION_SWEEP_POINTS).onset();
        out.println(String.format(Locale.ROOT, "  Onset of saturation (static sweep, %d fields from %s to %s):",
                SATURATION_SWEEP_POINTS, strongest, top));
        out.println(onset.map(o -> String.format(Locale.ROOT, "  %s,%n  %s.", o, o.belowSweep()
                        ? "WARNING: already in the strongest ambient field"
                        : String.format(Locale.ROOT, "about %s times the strongest ambient field",
                                new BigDecimal(o.applied().toAmperesPerMetre() / ambient.toAmperesPerMetre())
                                        .round(new MathContext(2)).toPlainString())))
                .orElse(String.format(Locale.ROOT, "  no body reaches %.0f %% of its saturation flux density.",
                        100 * SaturationStudy.THRESHOLD)));
    }

    /**
     * Writes the recommended design as a whole design (version 3 of the design file): the
     * can and the sensor region in the ambient field of either direction ({@code "worst"}), or
     * the plate between the charger coil and the sensor, with every band of the requirement as
     * a source case and the study's mesh fineness, so that the file evaluates to the numbers
     * the study printed.
     */
    private static void writeDesign(Evaluated best, Requirement need, Path file) throws IOException {
        Candidate c = best.candidate();
        FrequencyBand band = FrequencyBand.of(Hz(10), kHz(200));
        AxisymmetricDesign d = c.kind().equals("can")
                ? AxisymmetricDesign.inUniformField(c.bodies(), DesignSensor.cylinder(mm(3), mm(10)),
                        DesignFieldDirection.WORST, band, DESIGN_POINTS).withFineness(CAN_FINENESS)
                : AxisymmetricDesign.betweenCoils(c.bodies(), DesignCoil.loop(CHARGER.radius(), CHARGER.turns()),
                        DesignCoil.loop(SENSOR_LOOP.radius(), SENSOR_LOOP.turns()), CHARGER_DISTANCE, band,
                        DESIGN_POINTS).withFineness(FINENESS);
        WholeDesignFile.write(WholeDesign.of(d.meeting(need)
                .withTitle(c.label() + " (magnetometer board study)")), file);
    }

    private static void printCautions(PrintStream out) {
        out.println();
        out.println("Cautions");
        out.println("  These are estimates for idealised geometry: bodies of revolution on one axis, the field");
        out.println("  uniform along it or across it (at an angle it can read up to 3 dB lower at a point). Real");
        out.println("  shields are limited by seams, openings and fasteners; verify by measurement (IEEE Std 299");
        out.println("  for enclosures, ASTM D4935 for planar materials). High-permeability alloys lose");
        out.println("  permeability when bent or drilled after annealing, and saturate in strong fields; their");
        out.println("  B-H curves depend on anneal, stress and temperature. Mains transformers and chargers");
        out.println("  carry hazardous voltages; strong alternating fields heat plates and cans and have");
        out.println("  exposure limits (ICNIRP, IEEE C95.1). Medical, safety and compliance work must follow");
        out.println("  local codes and licensed, qualified practice.");
    }

    private static void writeCsv(Path file, double[] hz, List<Evaluated> results) throws IOException {
        StringBuilder s = new StringBuilder("frequency_hz");
        for (Evaluated e : results) {
            s.append(",\"").append(e.candidate().label()).append(!e.candidate().solved()
                    ? " (infinite sheet, comparison only, SE dB)\""
                    : e.candidate().kind().equals("can") ? " (worse direction, SE dB)\"" : " (SE dB)\"");
        }
        s.append('\n');
        for (int i = 0; i < hz.length; i++) {
            s.append(String.format(Locale.ROOT, "%.6g", hz[i]));
            for (Evaluated e : results) {
                s.append(String.format(Locale.ROOT, ",%.4f", e.seDb()[i]));
            }
            s.append('\n');
        }
        Files.writeString(file, s, StandardCharsets.UTF_8);
    }
}
