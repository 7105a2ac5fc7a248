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
    private final double transmitterFace;
    private final double largestRadius;
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
        this.transmitterFace = txFace;
        double rho = 0;
        for (double r : ta) {
            rho = Math.max(rho, r);
        }
        for (double r : ra) {
            rho = Math.max(rho, r);
        }
        this.largestRadius = rho;
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
     * This pair with an infinite planar barrier centred in the gap between the coils, the
     * barrier's first layer facing the transmitter. Where the barrier sits in the gap does
     * not change the exact result (only the total air path matters, and it stays the same);
     * it changes only the hand estimate beside it ({@link CouplingEvaluation#planarEstimate()}),
     * which puts the source at the transmitter and the barrier at its actual distance. For a
     * single-ring pair the centred barrier's near face is (d − t)/2 from the transmitter.
     *
     * @param barrier the barrier, not null, no thicker than {@link #gap()} (to rounding, 1e-12 relative)
     * @return the evaluation, ready for frequencies
     * @throws NullPointerException     if the barrier is null
     * @throws IllegalArgumentException if the barrier does not fit between the coils
     */
    public CouplingEvaluation through(Barrier barrier) {
        double t = fitting(barrier);
        return new CouplingEvaluation(this, barrier, transmitterFace + Math.max(0, gap - t) / 2);
    }

    /**
     * This pair with an infinite planar barrier at a given place between the coils, the
     * barrier's first layer facing the transmitter. The exact result is the same wherever
     * the barrier sits; the place is used by the hand estimate beside it
     * ({@link CouplingEvaluation#planarEstimate()}).
     *
     * @param barrier              the barrier, not null, no thicker than {@link #gap()}
     * @param transmitterToBarrier the distance from the transmitter's centre plane to the
     *                             barrier's near face, not null; the whole barrier must lie
     *                             between the nearest windings of the two coils (to rounding,
     *                             1e-12 of the gap)
     * @return the evaluation, ready for frequencies
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if the barrier does not fit between the coils at that place
     */
    public CouplingEvaluation through(Barrier barrier, Length transmitterToBarrier) {
        double t = fitting(barrier);
        double r = Require.nonNull("transmitter-to-barrier distance", transmitterToBarrier).toMetres();
        double slack = 1e-12 * gap;
        if (r < transmitterFace - slack || r + t > transmitterFace + gap + slack) {
            throw new IllegalArgumentException("a barrier " + Length.ofMetres(t) + " thick placed "
                    + transmitterToBarrier + " from the transmitter does not fit between the coils: its near face "
                    + "must be from " + metres(transmitterFace) + " to " + metres(transmitterFace + gap - t)
                    + " from the transmitter");
        }
        return new CouplingEvaluation(this, barrier, r);
    }

    private static String metres(double m) {
        return String.format(java.util.Locale.ROOT, "%.6g m", m);
    }

    private double fitting(Barrier barrier) {
        Require.nonNull("barrier", barrier);
        double t = barrier.totalThickness().toMetres();
        if (t > gap * (1 + 1e-12)) {
            throw new IllegalArgumentException("the barrier is " + t + " m thick but the gap between the coils is only "
                    + gap + " m");
        }
        return t;
    }

    /** The largest ring radius of either coil, m. */
    double largestRadiusMetres() {
        return largestRadius;
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
