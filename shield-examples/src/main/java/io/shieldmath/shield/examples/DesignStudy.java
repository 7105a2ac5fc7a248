/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.nT;
import static io.shieldmath.shield.quantity.Quantities.uT;

import io.shieldmath.shield.design.MarginReport;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.EnclosureEvaluation;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.SaturationCheck;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.materials.files.DesignFile;
import io.shieldmath.shield.materials.files.DesignLayer;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * The main example, a worked design study on an invented scenario (every number here is
 * illustrative, made up for this example):
 *
 * <p>A fluxgate magnetometer board inside a laboratory instrument sits 6 cm from the 20 kHz
 * coil of an inductive charger and 30 cm from a 50 Hz mains transformer. Which shield,
 * lightest first, keeps the interference at the sensor below its noise floor?
 *
 * <p>The program states the scenario, computes the required SE per band, evaluates flat
 * plates, a two-layer stack and vented cans, ranks them by mass against the requirement,
 * prints a report and writes into an output folder a CSV of the sweeps, the chosen
 * design as a JSON design file, and plots (PNG and SVG).
 */
public final class DesignStudy {

    /** Where the plate candidates sit: their area, for the mass (illustrative). */
    static final double PLATE_AREA_M2 = 0.12 * 0.12;
    /** The can's inner sides (illustrative). */
    static final double[] CAN_SIDES_M = {0.08, 0.06, 0.03};
    /** Below this frequency the transformer's field dominates, above it the charger's. */
    static final double SOURCE_SPLIT_HZ = 1000;
    /** The SE chart's size in pixels. */
    static final int CHART_WIDTH = 1000;
    static final int CHART_HEIGHT = 680;

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

    /** One evaluated candidate. */
    record Evaluated(String name, String kind, double massGrams, MarginReport margin, String limitingPath,
                     List<DesignLayer> wall, double[] sweepDb, Shell shell) {
    }

    /** What the study found, for callers and tests. */
    public record Outcome(String recommended, Path designFile, Requirement requirement, Path outputFolder) {
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
        Material stainless = catalogue.get("stainless-304");
        Material nickelIron = catalogue.get("nickel-iron-80");

        IncidentField transformer = IncidentField.magneticNearField(cm(30), ImpedanceForm.EXACT_DIPOLE);
        IncidentField charger = IncidentField.magneticNearField(cm(6), ImpedanceForm.EXACT_DIPOLE);
        Requirement need = Requirement.none()
                .plus(FrequencyBand.at(Hz(50)), uT(2), nT(5))
                .plus(FrequencyBand.at(Hz(150)), uT(0.5), nT(5))
                .plus(FrequencyBand.of(kHz(19), kHz(21)), uT(8), nT(5))
                .plus(FrequencyBand.of(kHz(38), kHz(42)), uT(1.5), nT(5))
                .plus(FrequencyBand.of(kHz(57), kHz(63)), uT(0.6), nT(5));

        printScenario(out, need);
        double[] sweepHz = FrequencyBand.of(Hz(10), kHz(200)).logSpacedHertz(121);

        List<Evaluated> results = new ArrayList<>();
        // Flat plates and a stack between the sources and the board (infinite-sheet estimates).
        results.add(plate("plate", "aluminium 6061, 2 mm", List.of(DesignLayer.of(aluminium, mm(2))),
                transformer, charger, need, sweepHz));
        results.add(plate("plate", "copper, 1 mm", List.of(DesignLayer.of(copper, mm(1))),
                transformer, charger, need, sweepHz));
        results.add(plate("plate", "stainless 304, 1 mm", List.of(DesignLayer.of(stainless, mm(1))),
                transformer, charger, need, sweepHz));
        results.add(plate("plate", "80 % nickel-iron, 1 mm", List.of(DesignLayer.of(nickelIron, mm(1))),
                transformer, charger, need, sweepHz));
        results.add(plate("stack", "Cu 0.5 mm | gap 1 mm | Ni-Fe 0.5 mm", List.of(DesignLayer.of(copper, mm(0.5)),
                DesignLayer.gap(mm(1)), DesignLayer.of(nickelIron, mm(0.5))), transformer, charger, need, sweepHz));
        // Closed cans around the board, vented, in the (locally uniform) ambient field.
        Opening vent = Opening.holes(mm(3), 24).named("vent, 24 holes of 3 mm");
        results.add(can("can", "Ni-Fe 1 mm, vented", Shell.box(len(0), len(1), len(2)).wall(nickelIron, mm(1)),
                List.of(DesignLayer.of(nickelIron, mm(1))), vent, need, sweepHz));
        results.add(can("can", "Ni-Fe 0.5 mm in Cu 0.5 mm, vented", Shell.box(len(0), len(1), len(2))
                        .wall(nickelIron, mm(0.5)).thenGap(mm(2)).then(copper, mm(0.5)),
                List.of(DesignLayer.of(copper, mm(0.5)), DesignLayer.gap(mm(2)), DesignLayer.of(nickelIron, mm(0.5))),
                vent, need, sweepHz));
        results.add(can("can", "aluminium 2 mm, vented", Shell.box(len(0), len(1), len(2)).wall(aluminium, mm(2)),
                List.of(DesignLayer.of(aluminium, mm(2))), vent, need, sweepHz));

        Evaluated best = printRanking(out, results);
        printSaturation(out, best, need);
        printCautions(out);

        writeCsv(folder.resolve("sweeps.csv"), sweepHz, results);
        Path design = folder.resolve("chosen-design.json");
        if (best != null) {
            Design d = Design.of(best.wall(), charger, FrequencyBand.of(Hz(10), kHz(200)), 61)
                    .withTitle(best.kind() + ": " + best.name() + " (wall stack, source side first)");
            DesignFile.write(d, design);
        }
        SeChart chart = SeChart.titled("Candidate shields for the magnetometer board (illustrative)")
                .requiring(need)
                .switchingSourceAt(Hz(SOURCE_SPLIT_HZ), "transformer at 30 cm", "charger at 6 cm");
        for (Evaluated e : results) {
            chart = chart.plus(SeChart.Kind.valueOf(e.kind().toUpperCase(Locale.ROOT)), e.name(), sweepHz, e.sweepDb());
        }
        if (best != null) {
            chart = chart.recommending(SeChart.Kind.valueOf(best.kind().toUpperCase(Locale.ROOT)), best.name());
        }
        chart.writePng(folder.resolve("se-vs-frequency.png"), CHART_WIDTH, CHART_HEIGHT);
        chart.writeSvg(folder.resolve("se-vs-frequency.svg"), CHART_WIDTH, CHART_HEIGHT);
        out.println();
        out.println("Written to " + folder.toAbsolutePath() + ": sweeps.csv, chosen-design.json, "
                + "se-vs-frequency.png, se-vs-frequency.svg");
        return new Outcome(best == null ? null : best.kind() + ": " + best.name(), best == null ? null : design,
                need, folder);
    }

    private static Length len(int i) {
        return Length.ofMetres(CAN_SIDES_M[i]);
    }

    /** The planar model with the field of whichever source dominates at each frequency. */
    static ShieldingModel<?> twoSources(PlanarEvaluation nearTransformer, PlanarEvaluation nearCharger) {
        return ShieldingModel.ofFunction(nearTransformer.barrier() + ", nearer source per band",
                nearTransformer.validBand(),
                hz -> (hz < SOURCE_SPLIT_HZ ? nearTransformer : nearCharger).shieldingEffectivenessDb(hz));
    }

    private static Evaluated plate(String kind, String name, List<DesignLayer> layers, IncidentField transformer,
                                   IncidentField charger, Requirement need, double[] sweepHz) {
        var barrier = io.shieldmath.shield.planar.Barrier.of(layers.stream().map(DesignLayer::toLayer).toList());
        ShieldingModel<?> model = twoSources(barrier.facing(transformer), barrier.facing(charger));
        double mass = 0;
        for (DesignLayer l : layers) {
            if (l.material().isPresent()) {
                mass += l.material().get().arealMass(l.thickness()).toKilogramsPerSquareMetre() * PLATE_AREA_M2 * 1000;
            }
        }
        return new Evaluated(name, kind, mass, need.marginOf(model), "the plate (edges ignored)", layers,
                sweep(model, sweepHz), null);
    }

    private static Evaluated can(String kind, String name, Shell shell, List<DesignLayer> wallSourceSideFirst,
                                 Opening vent, Requirement need, double[] sweepHz) {
        EnclosureEvaluation e = Enclosure.of(shell).withOpening(vent).inUniformField();
        MarginReport margin = need.marginOf(e);
        String limiting = e.at(margin.worst().frequency()).limitingPath().name();
        double area = 2 * (CAN_SIDES_M[0] * CAN_SIDES_M[1] + CAN_SIDES_M[1] * CAN_SIDES_M[2]
                + CAN_SIDES_M[0] * CAN_SIDES_M[2]);
        double mass = 0;
        for (DesignLayer l : wallSourceSideFirst) {
            if (l.material().isPresent()) {
                mass += l.material().get().arealMass(l.thickness()).toKilogramsPerSquareMetre() * area * 1000;
            }
        }
        return new Evaluated(name, kind, mass, margin, limiting, wallSourceSideFirst, sweep(e, sweepHz), shell);
    }

    private static double[] sweep(ShieldingModel<?> m, double[] hz) {
        return m.shieldingEffectivenessDb(hz, new double[hz.length]);
    }

    private static void printScenario(PrintStream out, Requirement need) {
        out.println("shield design study: a magnetometer board between a charger coil and a transformer");
        out.println("=================================================================================");
        out.println("Scenario (illustrative, invented for this example): a fluxgate magnetometer board in a");
        out.println("lab instrument sits 6 cm from the 20 kHz coil of an inductive charger and 30 cm from a");
        out.println("50 Hz mains transformer. The sensor's noise floor is 5 nT; interference must stay below.");
        out.println("Assumptions: magnetic near fields with the exact dipole wave impedance; plates are");
        out.println(String.format(Locale.ROOT, "infinite sheets of %.0f cm x %.0f cm for their mass; cans are "
                + "closed boxes of %.0f x %.0f x %.0f cm", Math.sqrt(PLATE_AREA_M2) * 100,
                Math.sqrt(PLATE_AREA_M2) * 100, CAN_SIDES_M[0] * 100, CAN_SIDES_M[1] * 100, CAN_SIDES_M[2] * 100));
        out.println("in the locally uniform ambient field, each with a vent; plates see the transformer's");
        out.println("field (30 cm) below 1 kHz and the charger's (6 cm) above; materials from the built-in");
        out.println("catalogue at 20 °C.");
        out.println();
        out.println("Required shielding per band");
        out.println(String.format(Locale.ROOT, "  %-22s %12s %12s %10s", "band", "incident", "tolerated",
                "required"));
        for (Requirement.Entry e : need.entries()) {
            out.println(String.format(Locale.ROOT, "  %-22s %12s %12s %7.1f dB", e.band(), e.incident(),
                    e.tolerated(), e.requiredDb()));
        }
        out.println();
    }

    private static Evaluated printRanking(PrintStream out, List<Evaluated> results) {
        List<Evaluated> sorted = new ArrayList<>(results);
        sorted.sort(Comparator.comparing((Evaluated e) -> !e.margin().meets()).thenComparingDouble(Evaluated::massGrams));
        out.println("Candidates, meeting designs first, lightest first within each group");
        out.println(String.format(Locale.ROOT, "  %-5s %-36s %9s %10s %12s  %-6s %s", "kind", "design", "mass",
                "margin", "worst at", "meets", "limited by"));
        Evaluated best = null;
        Evaluated bestPlate = null;
        for (Evaluated e : sorted) {
            MarginReport.Line w = e.margin().worst();
            out.println(String.format(Locale.ROOT, "  %-5s %-36s %7.0f g %7.1f dB %12s  %-6s %s", e.kind(), e.name(),
                    e.massGrams(), w.marginDb(), w.frequency(), e.margin().meets() ? "yes" : "no", e.limitingPath()));
            if (e.margin().meets() && e.kind().equals("can") && best == null) {
                best = e;
            }
            if (e.margin().meets() && !e.kind().equals("can") && bestPlate == null) {
                bestPlate = e;
            }
        }
        out.println();
        if (best == null && bestPlate != null) {
            out.println("No closed can meets the requirement; only an infinite-sheet estimate does, which real");
            out.println("plates will not reach. Taking it anyway, as the best available lead:");
            best = bestPlate;
        }
        if (best == null) {
            out.println("No candidate meets the requirement: add thickness, a second layer or a closed can.");
        } else {
            out.println(String.format(Locale.ROOT, "Recommended: %s: %s, %.0f g, worst margin %.1f dB at %s.",
                    best.kind(), best.name(), best.massGrams(), best.margin().worstMarginDb(),
                    best.margin().worst().frequency()));
        }
        out.println("The recommendation is the lightest closed can that meets every band. Plate and stack");
        out.println("numbers are infinite-sheet estimates shown for comparison: field leaking around the edges");
        out.println("of a real plate limits it (often to 10-20 dB), so they are not recommended on their own.");
        return best;
    }

    /** The saturation check of the recommended can's high-µ walls in the strongest incident field. */
    private static void printSaturation(PrintStream out, Evaluated best, Requirement need) {
        if (best == null || best.shell() == null) {
            return;
        }
        MagneticFluxDensity strongest = MagneticFluxDensity.ofTesla(0);
        for (Requirement.Entry e : need.entries()) {
            if (e.incident().compareTo(strongest) > 0) {
                strongest = e.incident();
            }
        }
        for (DesignLayer l : best.wall()) {
            if (l.material().isPresent() && l.material().get().saturation().isPresent()) {
                SaturationCheck c = best.shell().saturation(MagneticFieldStrength.from(strongest),
                        l.material().get().saturation().get());
                double worst = 0;
                for (int i = 0; i < c.wallCount(); i++) {
                    worst = Math.max(worst, c.fractionOfSaturation(i));
                }
                out.println(String.format(Locale.ROOT, "Saturation (static check, strongest ambient field %s):%n"
                        + "  the %s wall carries at most %.2g %% of its saturation flux density (%s)%s.", strongest,
                        l.material().get().name(), 100 * worst, l.material().get().saturation().get(),
                        c.isWarning() ? "; WARNING: near saturation, thicken the wall" : ", far from saturation"));
                return;
            }
        }
    }

    private static void printCautions(PrintStream out) {
        out.println();
        out.println("Cautions");
        out.println("  These are estimates for idealised geometry. Real shields are limited by seams, openings,");
        out.println("  fasteners and edges; verify by measurement (IEEE Std 299 for enclosures, ASTM D4935 for");
        out.println("  planar materials). High-permeability alloys lose permeability when bent or drilled after");
        out.println("  annealing and saturate in strong fields. Mains transformers and chargers carry hazardous");
        out.println("  voltages; strong fields have exposure limits (ICNIRP, IEEE C95.1). Medical, safety and");
        out.println("  compliance work must follow local codes and licensed, qualified practice.");
    }

    private static void writeCsv(Path file, double[] hz, List<Evaluated> results) throws IOException {
        StringBuilder s = new StringBuilder("frequency_hz");
        for (Evaluated e : results) {
            s.append(",\"").append(e.kind()).append(": ").append(e.name()).append(" (SE dB)\"");
        }
        s.append('\n');
        for (int i = 0; i < hz.length; i++) {
            s.append(String.format(Locale.ROOT, "%.6g", hz[i]));
            for (Evaluated e : results) {
                s.append(String.format(Locale.ROOT, ",%.4f", e.sweepDb()[i]));
            }
            s.append('\n');
        }
        Files.writeString(file, s, StandardCharsets.UTF_8);
    }
}
