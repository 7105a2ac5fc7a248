/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.MHz;
import static io.shieldmath.shield.quantity.Quantities.amperesPerMetre;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.tesla;

import io.shieldmath.shield.enclosure.Enclosure;
import io.shieldmath.shield.enclosure.EnclosureResult;
import io.shieldmath.shield.enclosure.LeakagePath;
import io.shieldmath.shield.enclosure.Opening;
import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import java.io.PrintStream;

/**
 * An aluminium box with a vent and a lid seam in a plane wave, and a nickel-iron can in
 * the mains field. All numbers are illustrative, invented for the demo.
 */
public final class EnclosureExample {

    private EnclosureExample() {
    }

    /**
     * Runs the example and prints the report to standard output.
     *
     * @param args ignored
     */
    public static void main(String[] args) {
        run(System.out);
    }

    /**
     * Prints the report.
     *
     * @param out where to print, not null
     */
    public static void run(PrintStream out) {
        Medium aluminium = Medium.conductor("aluminium", iacs(43), 1);
        Enclosure box = Enclosure.of(Shell.box(cm(30), cm(20), cm(15)).wall(aluminium, mm(1.5)))
                .withOpening(Opening.holes(mm(4), 120).throughTube(mm(1.5)).named("vent"))
                .withOpening(Opening.seam(cm(8)).named("lid seam"));
        for (double mhz : new double[] {30, 300, 1000}) {
            EnclosureResult r = box.facing(IncidentField.planeWave()).at(MHz(mhz));
            out.println(r);
            for (LeakagePath p : r.paths()) {
                out.println("    " + p);
            }
        }
        Medium nickelIron = Medium.conductor("80 % nickel-iron", iacs(2.9),
                PermeabilityModel.relaxation(40_000, Hz(1000)));
        Shell can = Shell.cylinderTransverse(cm(4)).wall(nickelIron, mm(1)).thenGap(cm(1)).then(nickelIron, mm(1));
        out.println(can.staticShielding());
        out.println("at 50 Hz: " + can.at(Hz(50)));
        out.println(can.saturation(amperesPerMetre(400), tesla(0.75)));
    }
}
