/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.Bessel;
import io.shieldmath.shield.internal.Elliptic;
import io.shieldmath.shield.internal.SpectralRule;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Inductance;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;

/**
 * Two coaxial coils, a transmitter and a receiver, with their centre planes a distance d
 * apart: the geometry of the usual bench test of a shielding plate. The pair holds the
 * spectral quadrature rule of its geometry (nodes and Bessel products), built once here,
 * so every barrier and frequency evaluated with it only computes the stack's transmission.
 *
 * <pre>{@code
 * CoilPair pair = CoilPair.coaxial(Coil.loop(mm(15), 20), Coil.loop(mm(15), 20), mm(30));
 * Inductance m = pair.freeSpaceMutualInductance();        // Maxwell's closed form
 * CouplingResult r = pair.through(Barrier.of(copper, mm(0.5))).at(kHz(10));
 * }</pre>
 *
 * <p>Ranges: the gap between the nearest ring planes of the two coils must be at least
 * {@value #MIN_GAP_RATIO} times the largest ring radius (the quadrature grows as radius/gap;
 * its accuracy is verified from 0.1 to 10 radii) and at most 1000 m. Immutable and thread-safe.
 */
public final class CoilPair {

    /** The smallest allowed ratio of the coil-to-coil gap to the largest ring radius. */
    public static final double MIN_GAP_RATIO = 0.05;

    private final Coil transmitter;
    private final Coil receiver;
    private final double separation;
    private final double gap;
    private final SpectralRule rule;
    private final double freeSpace;

    private CoilPair(Coil transmitter, Coil receiver, double separation) {
        this.transmitter = transmitter;
        this.receiver = receiver;
        this.separation = separation;
        double[] ta = transmitter.ringRadii();
        double[] tz = transmitter.ringOffsets();
        double[] ra = receiver.ringRadii();
        double[] rz = receiver.ringOffsets();
        // Transmitter at z = offset, receiver at z = d + offset.
        double txFace = Double.NEGATIVE_INFINITY;
        for (double z : tz) {
            txFace = Math.max(txFace, z);
        }
        double rxFace = Double.POSITIVE_INFINITY;
        for (double z : rz) {
            rxFace = Math.min(rxFace, separation + z);
        }
        this.gap = rxFace - txFace;
        double rho = 0;
        for (double r : ta) {
            rho = Math.max(rho, r);
        }
        for (double r : ra) {
            rho = Math.max(rho, r);
        }
        if (!(gap >= MIN_GAP_RATIO * rho)) {
            throw new IllegalArgumentException("the gap between the coils' nearest windings is " + gap
                    + " m; it must be at least " + MIN_GAP_RATIO + " times the largest ring radius ("
                    + MIN_GAP_RATIO * rho + " m): increase the separation or shorten the windings");
        }
        double[] td = new double[tz.length];
        for (int i = 0; i < tz.length; i++) {
            td[i] = txFace - tz[i];
        }
        double[] rd = new double[rz.length];
        for (int i = 0; i < rz.length; i++) {
            rd[i] = separation + rz[i] - rxFace;
        }
        this.rule = new SpectralRule(ta, td, transmitter.turnsPerRing(), ra, rd, receiver.turnsPerRing(), gap);
        double m = 0;
        for (int i = 0; i < ta.length; i++) {
            for (int j = 0; j < ra.length; j++) {
                m += Elliptic.maxwell(ta[i], ra[j], separation + rz[j] - tz[i]);
            }
        }
        this.freeSpace = m * transmitter.turnsPerRing() * receiver.turnsPerRing();
    }

    /**
     * A coaxial pair.
     *
     * @param transmitter the driven coil, not null
     * @param receiver    the receiving coil, not null
     * @param separation  the distance between the coils' centre planes, not null, at most 1000 m
     * @return the pair
     * @throws IllegalArgumentException if the windings come closer than {@value #MIN_GAP_RATIO}
     *                                  times the largest ring radius
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the separation is negative or above 1000 m
     */
    public static CoilPair coaxial(Coil transmitter, Coil receiver, Length separation) {
        Require.nonNull("transmitter", transmitter);
        Require.nonNull("receiver", receiver);
        double d = Require.inRange("coil separation", Require.nonNull("coil separation", separation).toMetres(),
                0, 1000, "m");
        return new CoilPair(transmitter, receiver, d);
    }

    /**
     * The driven coil.
     *
     * @return the transmitter
     */
    public Coil transmitter() {
        return transmitter;
    }

    /**
     * The receiving coil.
     *
     * @return the receiver
     */
    public Coil receiver() {
        return receiver;
    }

    /**
     * The distance between the coils' centre planes.
     *
     * @return d
     */
    public Length separation() {
        return Length.ofMetres(separation);
    }

    /**
     * The free space between the nearest ring planes of the two coils: the room a barrier may take.
     *
     * @return the gap
     */
    public Length gap() {
        return Length.ofMetres(gap);
    }

    /**
     * The same coils with transmitter and receiver exchanged. By reciprocity the mutual
     * inductance and impedance are unchanged (with the barrier's layer order reversed, as
     * seen from the new transmitter).
     *
     * @return the swapped pair
     */
    public CoilPair swapped() {
        return new CoilPair(receiver, transmitter, separation);
    }

    /**
     * The free-space mutual inductance, summed over the rings of both coils from Maxwell's
     * closed form M = µ0·sqrt(ab)·[(2/k − k)·K(k) − (2/k)·E(k)], k² = 4ab/((a+b)² + z²)
     * (J. C. Maxwell, <i>Treatise</i>, art. 701; F. W. Grover, <i>Inductance Calculations</i>),
     * with K and E computed by the arithmetic-geometric mean to full double precision.
     *
     * @return M, greater than 0
     */
    public Inductance freeSpaceMutualInductance() {
        return Inductance.ofHenries(freeSpace);
    }

    /** The free-space mutual inductance in henries, for the evaluation's inner loop. */
    double freeSpaceHenries() {
        return freeSpace;
    }

    /**
     * This pair with an infinite planar barrier between the coils, the barrier's first layer
     * facing the transmitter. Where the barrier sits in the gap does not matter (only the
     * total air path changes, and it stays the same), so air gaps in the barrier are allowed
     * but not needed to place it.
     *
     * @param barrier the barrier, not null, no thicker than {@link #gap()} (to rounding, 1e-12 relative)
     * @return the evaluation, ready for frequencies
     * @throws IllegalArgumentException if the barrier does not fit between the coils
     */
    public CouplingEvaluation through(Barrier barrier) {
        Require.nonNull("barrier", barrier);
        double t = barrier.totalThickness().toMetres();
        if (t > gap * (1 + 1e-12)) {
            throw new IllegalArgumentException("the barrier is " + t + " m thick but the gap between the coils is only "
                    + gap + " m");
        }
        return new CouplingEvaluation(this, barrier);
    }

    SpectralRule rule() {
        return rule;
    }

    double separationMetres() {
        return separation;
    }

    /**
     * Two pairs are equal when their coils and separation are equal; equal pairs give
     * bit-identical results.
     *
     * @param o the other object
     * @return whether it is an equal pair
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof CoilPair p && transmitter.equals(p.transmitter) && receiver.equals(p.receiver)
                && Double.compare(separation, p.separation) == 0;
    }

    @Override
    public int hashCode() {
        return (31 * transmitter.hashCode() + receiver.hashCode()) * 31 + Double.hashCode(separation);
    }

    @Override
    public String toString() {
        return transmitter + " to " + receiver + ", " + separation() + " apart";
    }
}
