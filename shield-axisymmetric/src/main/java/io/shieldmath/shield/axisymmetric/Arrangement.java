/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Shield bodies of revolution on one axis, nested or side by side, ready to be placed
 * between coaxial coils or in a uniform axial field. The first step of the sentence:
 *
 * <pre>{@code
 * Arrangement plate = Arrangement.of(Body.disc("plate", copper, mm(50), mm(0.5)));
 * CouplingSolution r = plate.between(pair).at(kHz(10));          // coil, plate, coil
 * AxialFieldSolution s = Arrangement.of(Body.can("can", mumetal, mm(20), mm(1), mm(60)))
 *         .inUniformAxialField().sensing(SensorRegion.cylinder(mm(5), mm(10))).magnetostatic();
 * }</pre>
 *
 * <p>Bodies may touch but must not overlap; two bodies with the same name, or overlapping
 * cross-sections, are refused with a message that names both. An arrangement with no body
 * is free space (useful to check the mesh against Maxwell's mutual inductance). At most
 * {@value #MAX_BODIES} bodies. Immutable and thread-safe.
 */
public final class Arrangement {

    /** The largest number of bodies in one arrangement. */
    public static final int MAX_BODIES = 64;

    private final List<Body> bodies;

    private Arrangement(List<Body> bodies) {
        this.bodies = bodies;
    }

    /**
     * The bodies, checked against each other.
     *
     * @param bodies the bodies, none null; none at all for free space
     * @return the arrangement
     * @throws IllegalArgumentException if two bodies share a name or overlap (both are named),
     *                                  or there are more than {@value #MAX_BODIES}
     */
    public static Arrangement of(Body... bodies) {
        Require.nonNull("bodies", bodies);
        return of(Arrays.asList(bodies));
    }

    /**
     * The bodies, checked against each other.
     *
     * @param bodies the bodies, not null, none null
     * @return the arrangement
     * @throws IllegalArgumentException if two bodies share a name or overlap (both are named),
     *                                  or there are more than {@value #MAX_BODIES}
     */
    public static Arrangement of(List<Body> bodies) {
        Require.nonNull("bodies", bodies);
        List<Body> list = new ArrayList<>(bodies.size());
        for (Body b : bodies) {
            list.add(Require.nonNull("body", b));
        }
        if (list.size() > MAX_BODIES) {
            throw new IllegalArgumentException("an arrangement holds at most " + MAX_BODIES + " bodies; "
                    + list.size() + " were given");
        }
        for (int i = 0; i < list.size(); i++) {
            for (int j = 0; j < i; j++) {
                Body a = list.get(i);
                Body b = list.get(j);
                if (a.name().equals(b.name())) {
                    throw new IllegalArgumentException("two bodies are named '" + a.name() + "': " + b + " and " + a);
                }
                for (double[] ra : a.rectangles()) {
                    for (double[] rb : b.rectangles()) {
                        if (overlap(ra, rb)) {
                            throw new IllegalArgumentException("body '" + a.name() + "' overlaps body '" + b.name()
                                    + "' (" + a + "; " + b + "): bodies may touch but not overlap");
                        }
                    }
                }
            }
        }
        return new Arrangement(List.copyOf(list));
    }

    /**
     * This arrangement with one more body.
     *
     * @param body the body, not null
     * @return the new arrangement; this one is unchanged
     * @throws IllegalArgumentException as {@link #of(List)}
     */
    public Arrangement and(Body body) {
        List<Body> list = new ArrayList<>(bodies);
        list.add(Require.nonNull("body", body));
        return of(list);
    }

    /** Whether two rectangles {r0, r1, z0, z1} share interior area (a part in 1e-12 of tolerance). */
    static boolean overlap(double[] a, double[] b) {
        double tol = 1e-12 * Math.max(1e-3, Math.max(Math.max(a[1], b[1]), Math.max(Math.abs(a[3]), Math.abs(b[3]))));
        return Math.min(a[1], b[1]) - Math.max(a[0], b[0]) > tol && Math.min(a[3], b[3]) - Math.max(a[2], b[2]) > tol;
    }

    /**
     * The bodies in the order given.
     *
     * @return an unmodifiable list
     */
    public List<Body> bodies() {
        return bodies;
    }

    /**
     * These bodies between two coaxial coils: the transmitter's centre plane at z = −d/2 and
     * the receiver's at z = +d/2 (d the pair's separation), so a body left at z = 0 sits
     * midway.
     *
     * @param pair the coils, not null
     * @return the evaluation, ready for frequencies
     * @throws IllegalArgumentException if a body cuts a coil's winding (the body and the coil are named)
     */
    public CoilCoupling between(CoilPair pair) {
        return new CoilCoupling(this, Require.nonNull("coil pair", pair));
    }

    /**
     * These bodies in a uniform applied axial field (far from the bodies), with the sensor at
     * the origin until {@link AxialFieldShielding#sensing(SensorRegion)} says otherwise.
     *
     * @return the evaluation, ready for frequencies
     */
    public AxialFieldShielding inUniformAxialField() {
        return new AxialFieldShielding(this, SensorRegion.centrePoint());
    }

    /**
     * These bodies in a uniform applied field across the axis (far from the bodies), with the
     * sensor at the origin until {@link TransverseFieldShielding#sensing(SensorRegion)} says
     * otherwise.
     *
     * @return the evaluation, ready for a static field or frequencies
     */
    public TransverseFieldShielding inUniformTransverseField() {
        return new TransverseFieldShielding(this, SensorRegion.centrePoint());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Arrangement a && a.bodies.equals(bodies);
    }

    @Override
    public int hashCode() {
        return bodies.hashCode();
    }

    @Override
    public String toString() {
        return bodies.isEmpty() ? "free space" : bodies.toString();
    }
}
