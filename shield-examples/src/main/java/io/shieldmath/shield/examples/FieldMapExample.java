/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.uT;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;

/**
 * Writes two field maps (PNG and SVG) of invented cases, to show {@link FieldMapPicture}:
 * a bench case, a copper plate between two coaxial coils at 10 kHz, and a nickel–iron can
 * with a cable hole in a uniform static axial field of 50 µT. Every number here is
 * illustrative, made up for this example.
 */
public final class FieldMapExample {

    /** The pictures' width in pixels. */
    static final int WIDTH = 900;
    /** The bench picture's height in pixels (a wide, flat scene). */
    static final int BENCH_HEIGHT = 520;
    /** The can picture's height in pixels. */
    static final int CAN_HEIGHT = 760;

    /** The applied field of the can case (illustrative). */
    static final MagneticFluxDensity APPLIED = uT(50);

    private FieldMapExample() {
    }

    /**
     * Writes the pictures into a folder.
     *
     * @param args optional: the output folder (default {@code shield-output})
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        for (Path p : write(Paths.get(args.length > 0 ? args[0] : "shield-output"))) {
            System.out.println("written " + p.toAbsolutePath());
        }
    }

    /**
     * Solves both cases and writes {@code field-map-bench.png/.svg} and
     * {@code field-map-can.png/.svg} into a folder.
     *
     * @param folder the folder, created if missing, not null
     * @return the four files written
     * @throws IOException if a file cannot be written
     */
    public static List<Path> write(Path folder) throws IOException {
        Files.createDirectories(folder);
        FieldMapPicture bench = benchCase();
        FieldMapPicture can = canCase();
        Path[] files = {folder.resolve("field-map-bench.png"), folder.resolve("field-map-bench.svg"),
            folder.resolve("field-map-can.png"), folder.resolve("field-map-can.svg")};
        bench.writePng(files[0], WIDTH, BENCH_HEIGHT);
        bench.writeSvg(files[1], WIDTH, BENCH_HEIGHT);
        can.writePng(files[2], WIDTH, CAN_HEIGHT);
        can.writeSvg(files[3], WIDTH, CAN_HEIGHT);
        return List.of(files);
    }

    /**
     * The bench arrangement: a copper disc of 40 mm radius, 1 mm thick, midway between the coils.
     *
     * @return the arrangement
     */
    static Arrangement benchArrangement() {
        return Arrangement.of(Body.disc("copper plate", Catalogue.builtIn().get("copper-annealed"), mm(40), mm(1)));
    }

    /**
     * Two 15 mm coils of 20 turns, 30 mm apart (illustrative).
     *
     * @return the coils
     */
    static CoilPair benchCoils() {
        return CoilPair.coaxial(Coil.loop(mm(15), 20), Coil.loop(mm(15), 20), mm(30));
    }

    /**
     * The can: 80 % nickel–iron, 20 mm inner radius, 1 mm wall, 60 mm long, a 4 mm cable hole on top.
     *
     * @return the arrangement
     */
    static Arrangement canArrangement() {
        return Arrangement.of(Body.can("Ni-Fe can", Catalogue.builtIn().get("nickel-iron-80"), mm(20), mm(1), mm(60))
                .withCapHole(CanEnd.UPPER, mm(4)));
    }

    /**
     * The bench case's picture: 1 A peak at 10 kHz in the transmitter.
     *
     * @return the picture
     */
    static FieldMapPicture benchCase() {
        Arrangement a = benchArrangement();
        CoilPair pair = benchCoils();
        DriveCurrent amp = DriveCurrent.ofAmperes(1, AmplitudeMeasure.PEAK, kHz(10));
        return FieldMapPicture.around(a, pair, a.between(pair).at(kHz(10)), amp)
                .titled("Copper plate, 1 mm, between two coils at 10 kHz (1 A peak; illustrative)");
    }

    /**
     * The can case's picture: static 50 µT along the axis.
     *
     * @return the picture
     */
    static FieldMapPicture canCase() {
        Arrangement a = canArrangement();
        return FieldMapPicture.around(a, a.inUniformAxialField().magnetostatic(), APPLIED)
                .titled("Nickel-iron can, 1 mm wall, in a static axial field of 50 µT (illustrative)");
    }
}
