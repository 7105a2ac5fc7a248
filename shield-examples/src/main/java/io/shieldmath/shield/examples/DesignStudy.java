/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.mm;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Frequency;
import java.io.PrintStream;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * The main example: a few candidate plates in front of a magnetic source, evaluated over
 * frequency and printed as a table. The materials come from the built-in catalogue (typical
 * handbook values with their sources, see {@link Catalogue}); the scenario is invented for
 * the demo.
 */
public final class DesignStudy {

    private DesignStudy() {
    }

    /**
     * Runs the study and prints the report to standard output.
     *
     * @param args ignored
     */
    public static void main(String[] args) {
        run(System.out);
    }

    /**
     * Runs the study.
     *
     * @param out where the report goes
     */
    public static void run(PrintStream out) {
        Catalogue catalogue = Catalogue.builtIn();
        Material copper = catalogue.get("copper-annealed");
        Material aluminium = catalogue.get("aluminium-1100-o");
        Material stainless = catalogue.get("stainless-304");
        Material nickelIron = catalogue.get("nickel-iron-80");

        Map<String, Barrier> candidates = new LinkedHashMap<>();
        candidates.put("copper 0.5 mm", Barrier.of(copper, mm(0.5)));
        candidates.put("aluminium 1 mm", Barrier.of(aluminium, mm(1)));
        candidates.put("stainless 1 mm", Barrier.of(stainless, mm(1)));
        candidates.put("Ni-Fe 0.5 mm", Barrier.of(nickelIron, mm(0.5)));
        candidates.put("Cu 0.3 + gap 2 + NiFe 0.5", Barrier.of(copper, mm(0.3)).thenGap(mm(2)).then(nickelIron, mm(0.5)));

        IncidentField field = IncidentField.magneticNearField(cm(6), ImpedanceForm.EXACT_DIPOLE);
        double[] hz = {50, 1e3, 1e4, 2e4, 1e5, 1e6};

        out.println("shield: candidate plates 6 cm from a magnetic (loop) source, exact dipole wave impedance");
        out.println("Invented scenario; materials from the built-in catalogue (typical values, see its sources).");
        out.println();
        StringBuilder head = new StringBuilder(String.format(Locale.ROOT, "%-28s", "barrier  \\  SE (dB) at"));
        for (double f : hz) {
            head.append(String.format(Locale.ROOT, "%10s", Frequency.ofHertz(f)));
        }
        out.println(head);
        double[] se = new double[hz.length];
        for (Map.Entry<String, Barrier> e : candidates.entrySet()) {
            PlanarEvaluation eval = e.getValue().facing(field);
            eval.shieldingEffectivenessDb(hz, se);
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%-28s", e.getKey()));
            for (double v : se) {
                row.append(String.format(Locale.ROOT, "%10.1f", v));
            }
            out.println(row);
        }
        out.println();
        out.println("Estimates for infinite flat sheets; real shields are limited by seams, openings and edges.");
        out.println("Verify by measurement, and follow local codes for mains, medical and safety work.");
    }
}
