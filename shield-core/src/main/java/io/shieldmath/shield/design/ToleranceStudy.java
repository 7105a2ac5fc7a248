/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.field.FieldKind;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;

/**
 * Monte Carlo tolerance analysis of a planar barrier at one frequency: layer
 * thicknesses, conductivities and permeabilities, and the source distance, each varied
 * by a relative tolerance with a normal or uniform spread; reports the mean and
 * percentiles of SE and the probability of meeting a target.
 *
 * <pre>{@code
 * ToleranceResult r = ToleranceStudy.of(barrier, field)
 *     .thickness(0.05, Spread.NORMAL)
 *     .conductivity(0.10, Spread.UNIFORM)
 *     .run(kHz(20), 60.0, 100_000, 42L, ToleranceStudy.ProgressListener.NONE);
 * }</pre>
 *
 * <p>How a sample is drawn: each varied property is multiplied by 1 + tol·X with X
 * standard normal ({@link Spread#NORMAL}, tol is one standard deviation) or uniform on
 * [−1, 1] ({@link Spread#UNIFORM}, tol is the half-width), each layer and property
 * independently; the factor is kept at 0.001 or more so no property turns unphysical
 * (this truncates the far tail of wide normal tolerances). Permeability is varied in
 * its magnetisation, µ' − 1, so non-magnetic layers stay at µr = 1. The distance is
 * varied only for near fields.
 *
 * <p>Reproducible: the samples are drawn in blocks of {@value #BLOCK}, block b from
 * its own generator seeded from (seed, b), so the result depends on the seed and the
 * sample count only, not on the number of threads. Runs in parallel on the common
 * fork-join pool. Immutable and thread-safe; the {@code with}-style setters return copies.
 */
public final class ToleranceStudy {

    /** Samples per block (one generator and one progress report per block). */
    public static final int BLOCK = 1024;

    /** The shape of a tolerance. */
    public enum Spread {
        /** Normal, the tolerance is one standard deviation. */
        NORMAL,
        /** Uniform, the tolerance is the half-width. */
        UNIFORM
    }

    /** Receives progress reports; may be called from several threads at once. */
    @FunctionalInterface
    public interface ProgressListener {

        /** A listener that ignores reports. */
        ProgressListener NONE = (done, total) -> { };

        /**
         * Reports progress; {@code done} only increases across calls.
         *
         * @param done  samples finished so far
         * @param total samples in the run
         */
        void progress(long done, long total);
    }

    private final Barrier barrier;
    private final IncidentField field;
    private final double[] tol;        // thickness, conductivity, permeability, distance
    private final Spread[] spread;

    private ToleranceStudy(Barrier barrier, IncidentField field, double[] tol, Spread[] spread) {
        this.barrier = barrier;
        this.field = field;
        this.tol = tol;
        this.spread = spread;
    }

    /**
     * A study of a barrier in a field with no tolerances yet.
     *
     * @param barrier the nominal barrier, not null
     * @param field   the nominal field, not null
     * @return the study
     */
    public static ToleranceStudy of(Barrier barrier, IncidentField field) {
        return new ToleranceStudy(Require.nonNull("barrier", barrier), Require.nonNull("field", field),
                new double[4], new Spread[] {Spread.NORMAL, Spread.NORMAL, Spread.NORMAL, Spread.NORMAL});
    }

    /**
     * A copy with a thickness tolerance on every layer.
     *
     * @param relative the relative tolerance, from 0 to 1
     * @param shape    its spread, not null
     * @return the new study
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code relative} is outside 0 to 1
     */
    public ToleranceStudy thickness(double relative, Spread shape) {
        return with(0, "thickness tolerance", relative, shape);
    }

    /**
     * A copy with a conductivity tolerance on every layer.
     *
     * @param relative the relative tolerance, from 0 to 1
     * @param shape    its spread, not null
     * @return the new study
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code relative} is outside 0 to 1
     */
    public ToleranceStudy conductivity(double relative, Spread shape) {
        return with(1, "conductivity tolerance", relative, shape);
    }

    /**
     * A copy with a permeability tolerance on every magnetic layer (on µ' − 1).
     *
     * @param relative the relative tolerance, from 0 to 1
     * @param shape    its spread, not null
     * @return the new study
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code relative} is outside 0 to 1
     */
    public ToleranceStudy permeability(double relative, Spread shape) {
        return with(2, "permeability tolerance", relative, shape);
    }

    /**
     * A copy with a source-distance tolerance (near fields only).
     *
     * @param relative the relative tolerance, from 0 to 1
     * @param shape    its spread, not null
     * @return the new study
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if {@code relative} is outside 0 to 1
     */
    public ToleranceStudy distance(double relative, Spread shape) {
        return with(3, "distance tolerance", relative, shape);
    }

    private ToleranceStudy with(int k, String what, double relative, Spread shape) {
        Require.inRange(what, relative, 0, 1, "(relative)");
        double[] t = tol.clone();
        Spread[] s = spread.clone();
        t[k] = relative;
        s[k] = Require.nonNull("spread", shape);
        return new ToleranceStudy(barrier, field, t, s);
    }

    /**
     * Starts a run at one frequency:
     *
     * <pre>{@code
     * ToleranceResult t = study.at(kHz(20)).toMeet(Decibels.of(60)).samples(100_000).seed(42).run();
     * }</pre>
     *
     * @param frequency the frequency, not null
     * @return the first stage of the run; give it the target with {@link AtFrequency#toMeet(Decibels)}
     */
    public AtFrequency at(Frequency frequency) {
        return new AtFrequency(this, Require.nonNull("frequency", frequency));
    }

    /** A run at one frequency, waiting for its target. Immutable. */
    public static final class AtFrequency {
        private final ToleranceStudy study;
        private final Frequency frequency;

        private AtFrequency(ToleranceStudy study, Frequency frequency) {
            this.study = study;
            this.frequency = frequency;
        }

        /**
         * The target shielding effectiveness the samples are compared with.
         *
         * @param target the target, not null
         * @return the run, with {@value #DEFAULT_SAMPLES} samples, seed 0 and no progress
         *         reports until changed
         */
        public Run toMeet(Decibels target) {
            Require.nonNull("target", target);
            return new Run(study, frequency, target, DEFAULT_SAMPLES, 0L, ProgressListener.NONE);
        }
    }

    /** The number of samples of a run unless {@link Run#samples(int)} says otherwise. */
    public static final int DEFAULT_SAMPLES = 10_000;
    /** The most samples of one run. */
    public static final int MAX_SAMPLES = 100_000_000;

    /**
     * A run ready to go: change the sample count, the seed or the progress listener, then
     * {@link #run()}. Immutable; each setting returns a new run.
     */
    public static final class Run {
        private final ToleranceStudy study;
        private final Frequency frequency;
        private final Decibels target;
        private final int samples;
        private final long seed;
        private final ProgressListener listener;

        private Run(ToleranceStudy study, Frequency frequency, Decibels target, int samples, long seed,
                    ProgressListener listener) {
            this.study = study;
            this.frequency = frequency;
            this.target = target;
            this.samples = samples;
            this.seed = seed;
            this.listener = listener;
        }

        /**
         * The number of samples.
         *
         * @param count from 1 to {@value ToleranceStudy#MAX_SAMPLES}
         * @return the run with this count
         * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the count is out of range
         */
        public Run samples(int count) {
            Require.inRange("number of samples", count, 1, MAX_SAMPLES, "samples");
            return new Run(study, frequency, target, count, seed, listener);
        }

        /**
         * The seed: the same seed and sample count give the same result, on any number of threads.
         *
         * @param value the seed
         * @return the run with this seed
         */
        public Run seed(long value) {
            return new Run(study, frequency, target, samples, value, listener);
        }

        /**
         * Progress reports while the run goes on.
         *
         * @param progress the listener, not null
         * @return the run with this listener
         */
        public Run reporting(ProgressListener progress) {
            return new Run(study, frequency, target, samples, seed, Require.nonNull("progress listener", progress));
        }

        /**
         * Runs the study.
         *
         * @return the distribution of SE
         * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside the planar model's band,
         *         1 µHz to 10 THz
         */
        public ToleranceResult run() {
            return study.run(frequency, target.toDb(), samples, seed, listener);
        }
    }

    /**
     * Runs the study.
     *
     * @param frequency the frequency, not null
     * @param targetDb  the target SE in dB, finite
     * @param samples   the number of samples, from 1 to 100 000 000
     * @param seed      the seed; the same seed and sample count give the same result
     * @param listener  progress reports, not null ({@link ProgressListener#NONE} for none)
     * @return the distribution of SE
     */
    ToleranceResult run(Frequency frequency, double targetDb, int samples, long seed,
                               ProgressListener listener) {
        double hz = Require.nonNull("frequency", frequency).toHertz();
        Require.finite("target shielding effectiveness", targetDb, "dB");
        Require.inRange("number of samples", samples, 1, MAX_SAMPLES, "samples");
        Require.nonNull("progress listener", listener);
        double nominal = barrier.facing(field).shieldingEffectivenessDb(hz);
        double[] values = new double[samples];
        int blocks = (samples + BLOCK - 1) / BLOCK;
        AtomicLong done = new AtomicLong();
        IntStream.range(0, blocks).parallel().forEach(b -> {
            SplittableRandom rng = new SplittableRandom(mix(seed, b));
            int from = b * BLOCK;
            int to = Math.min(samples, from + BLOCK);
            for (int i = from; i < to; i++) {
                values[i] = sample(rng).facing(sampleField(rng)).shieldingEffectivenessDb(hz);
            }
            listener.progress(done.addAndGet(to - from), samples);
        });
        return new ToleranceResult(nominal, targetDb, values);
    }

    private Barrier sample(SplittableRandom rng) {
        List<Layer> layers = new ArrayList<>(barrier.layerCount());
        for (Layer l : barrier.layers()) {
            double ft = factor(rng, 0);
            double fs = factor(rng, 1);
            double fm = factor(rng, 2);
            Medium m = l.medium();
            Medium varied = m;
            if (fs != 1) {
                varied = varied.withConductivity(Conductivity.ofSiemensPerMetre(m.conductivity().toSi() * fs));
            }
            if (fm != 1) {
                varied = varied.withPermeability(new ScaledPermeability(m.permeability(), fm));
            }
            layers.add(Layer.of(varied, ft == 1 ? l.thickness() : Length.ofMetres(l.thickness().toMetres() * ft)));
        }
        return Barrier.of(layers);
    }

    private IncidentField sampleField(SplittableRandom rng) {
        double fd = factor(rng, 3);
        if (field.kind() == FieldKind.PLANE_WAVE || fd == 1) {
            return field;
        }
        Length d = Length.ofMetres(field.distance().toMetres() * fd);
        return field.kind() == FieldKind.MAGNETIC_NEAR_FIELD ? IncidentField.magneticNearField(d, field.form())
                : IncidentField.electricNearField(d, field.form());
    }

    private double factor(SplittableRandom rng, int k) {
        if (tol[k] == 0) {
            return 1;
        }
        double x = spread[k] == Spread.NORMAL ? gaussian(rng) : 2 * rng.nextDouble() - 1;
        return Math.max(1e-3, 1 + tol[k] * x);
    }

    /** A standard normal deviate by the Box–Muller transform (SplittableRandom has none in Java 17). */
    private static double gaussian(SplittableRandom rng) {
        double u = 1 - rng.nextDouble();
        double v = rng.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }

    /** The seed of block b: a SplitMix64 finaliser of (seed, b). */
    private static long mix(long seed, int block) {
        long z = seed + 0x9E3779B97F4A7C15L * (block + 1L);
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
