/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.internal.MeshProgress;
import io.shieldmath.shield.axisymmetric.numerics.Layout;
import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.axisymmetric.numerics.MeshLimitException;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.ArrayList;
import java.util.List;

/**
 * The geometry of one evaluation reduced to the mesher's arrays, with the checks that need
 * the bodies and the coils together, and the quasi-static frequency limit. Each body is its
 * own material slot (index = body + 1), so losses are reported per body.
 */
final class Scene {

    /** k0·D at the quasi-static limit (D the largest dimension of bodies and coils together). */
    static final double QUASI_STATIC_K0D = 0.1;

    final Layout layout;
    final List<Body> bodies;
    final double size;
    final double maxHertz;

    private Scene(Layout layout, List<Body> bodies, double size) {
        this.layout = layout;
        this.bodies = bodies;
        this.size = size;
        this.maxHertz = QUASI_STATIC_K0D * PhysicalConstants.SPEED_OF_LIGHT / (2 * Math.PI * size);
    }

    /** {r0, r1, z0, z1, turns} of a coil whose centre plane is at z. Uses only radius, turns, width and length. */
    static double[] section(Coil coil, double z) {
        double a = coil.radius().toMetres();
        double w = coil.radialWidth().map(Length::toMetres).orElse(0.0);
        double l = coil.axialLength().map(Length::toMetres).orElse(0.0);
        return new double[] {a - w / 2, a + w / 2, z - l / 2, z + l / 2, coil.turns()};
    }

    static Scene of(Arrangement arrangement, double[][] coils, String[] coilNames, SensorRegion sensor) {
        List<Body> bodies = arrangement.bodies();
        List<double[]> rects = new ArrayList<>();
        List<Integer> mats = new ArrayList<>();
        double[] sigma = new double[bodies.size() + 1];
        PermeabilityModel[] mu = new PermeabilityModel[bodies.size() + 1];
        mu[0] = PermeabilityModel.constant(1);
        double rMax = 0;
        double zMin = Double.POSITIVE_INFINITY;
        double zMax = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < bodies.size(); k++) {
            Body b = bodies.get(k);
            sigma[k + 1] = b.medium().conductivity().toSiemensPerMetre();
            mu[k + 1] = b.medium().permeability();
            for (double[] r : b.rectangles()) {
                for (int c = 0; c < coils.length; c++) {
                    if (cuts(coils[c], r)) {
                        throw new IllegalArgumentException("body '" + b.name() + "' cuts the " + coilNames[c]
                                + " coil's winding (" + b + "): move the body or the coil");
                    }
                }
                rects.add(r);
                mats.add(k + 1);
                rMax = Math.max(rMax, r[1]);
                zMin = Math.min(zMin, r[2]);
                zMax = Math.max(zMax, r[3]);
            }
        }
        for (double[] c : coils) {
            rMax = Math.max(rMax, c[1]);
            zMin = Math.min(zMin, c[2]);
            zMax = Math.max(zMax, c[3]);
        }
        double[] keyR;
        double[] keyZ;
        if (sensor.isPoint()) {
            keyR = new double[0];
            keyZ = new double[] {sensor.lowerMetres()};
        } else {
            keyR = new double[] {sensor.radiusMetres()};
            keyZ = new double[] {sensor.lowerMetres(), sensor.upperMetres()};
            rMax = Math.max(rMax, sensor.radiusMetres());
        }
        zMin = Math.min(zMin, keyZ[0]);
        zMax = Math.max(zMax, keyZ[keyZ.length - 1]);
        int n = rects.size();
        double[] r0 = new double[n];
        double[] r1 = new double[n];
        double[] z0 = new double[n];
        double[] z1 = new double[n];
        int[] m = new int[n];
        for (int i = 0; i < n; i++) {
            r0[i] = rects.get(i)[0];
            r1[i] = rects.get(i)[1];
            z0[i] = rects.get(i)[2];
            z1[i] = rects.get(i)[3];
            m[i] = mats.get(i);
        }
        int nc = coils.length;
        double[] cr0 = new double[nc];
        double[] cr1 = new double[nc];
        double[] cz0 = new double[nc];
        double[] cz1 = new double[nc];
        double[] turns = new double[nc];
        for (int c = 0; c < nc; c++) {
            cr0[c] = coils[c][0];
            cr1[c] = coils[c][1];
            cz0[c] = coils[c][2];
            cz1[c] = coils[c][3];
            turns[c] = coils[c][4];
        }
        Layout layout = new Layout(r0, r1, z0, z1, m, sigma, mu, cr0, cr1, cz0, cz1, turns, keyR, keyZ);
        double size = Math.max(2 * rMax, zMax - zMin);
        if (!(size > 0)) {
            // Only an empty arrangement with a point sensor: no size at all.
            throw new IllegalArgumentException("the arrangement has no body, coil or sensor region of any size");
        }
        return new Scene(layout, bodies, size);
    }

    /** Whether a coil section (possibly a loop or a sheet) reaches into a body rectangle's interior. */
    static boolean cuts(double[] coil, double[] body) {
        double tol = 1e-12 * Math.max(1e-3, Math.max(coil[1], Math.abs(coil[3])));
        return reaches(coil[0], coil[1], body[0], body[1], tol) && reaches(coil[2], coil[3], body[2], body[3], tol);
    }

    private static boolean reaches(double c0, double c1, double b0, double b1, double tol) {
        if (c1 - c0 <= tol) {
            return c0 > b0 + tol && c0 < b1 - tol;
        }
        return Math.min(c1, b1) - Math.max(c0, b0) > tol;
    }

    /**
     * A mesh, its limits converted to the public exception; the calling thread's
     * {@link MeshProgress} listener, if any, hears of it.
     */
    Mesh mesh(double[] hertz, double fineness, double box, boolean shortSide, int maxUnknowns, String what) {
        Mesh mesh;
        try {
            mesh = new Mesh(layout, hertz, fineness, box, shortSide, maxUnknowns, MeshTooLargeException.MAX_BAND_ENTRIES);
        } catch (MeshLimitException e) {
            throw new MeshTooLargeException(what, e.unknowns, e.bandEntries, maxUnknowns, fineness);
        }
        MeshProgress.meshBuilt(fineness, mesh.unknowns());
        return mesh;
    }

    /** The valid-band check of the common contract: from {@code lowest} Hz to the quasi-static limit. */
    double checkBand(String quantity, double hz, double lowest) {
        if (hz < lowest) {
            throw new io.shieldmath.shield.quantity.InvalidQuantityException(quantity, hz + " Hz",
                    "from " + lowest + " Hz to " + (float) maxHertz + " Hz (use magnetostatic() for 0 Hz)");
        }
        return checkHertz(quantity, hz);
    }

    /** The quasi-static check; names the limit and the size that sets it. */
    double checkHertz(String quantity, double hz) {
        if (!(hz >= 0 && hz <= maxHertz)) {
            throw new io.shieldmath.shield.quantity.InvalidQuantityException(quantity, hz + " Hz",
                    "from 0 Hz to " + (float) maxHertz + " Hz, the quasi-static limit k0·D ≤ " + QUASI_STATIC_K0D
                            + " for bodies and coils spanning D = " + (float) size + " m");
        }
        return hz;
    }
}
