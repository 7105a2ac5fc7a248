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
import io.shieldmath.shield.internal.StackArrays;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
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
 * <p>How a sample is drawn: each varied property is multiplied by a factor s = 1 + tol·X
 * with X standard normal ({@link Spread#NORMAL}, tol is one standard deviation) or uniform
 * on [−1, 1] ({@link Spread#UNIFORM}, tol is the half-width), each layer and property
 * independently. Permeability is taken at the study's frequency, µ'₀ − jµ''₀, and varied
 * in its magnetisation, µ' = 1 + (µ'₀ − 1)·s and µ'' = µ''₀·s, so a non-magnetic layer
 * stays at µr = 1 and a magnetic one (µ'₀ ≥ 1) never drops below µ' = 1; a layer whose µ'₀
 * is below 1 at that frequency (a diamagnetic value, or a frequency model that has fallen
 * below 1) has no magnetisation to scale and has its whole µr scaled, µ' = µ'₀·s,
 * µ'' = µ''₀·s, which keeps µ' above 0 and its mean at µ'₀. The distance is varied only for
 * near fields.
 *
 * <p>Physical and documented ranges, kept by rejection: a factor is drawn again whenever
 * the varied value would leave its range (s ≤ 0 for any property; a thickness outside
 * {@link Layer#MIN_THICKNESS_METRES} to {@link Layer#MAX_THICKNESS_METRES} m; a conductivity
 * above 1e10 S/m; µ' or µ'' above {@link RelativePermeability#MAX}; a distance outside
 * {@link IncidentField#MIN_DISTANCE_METRES} to {@link IncidentField#MAX_DISTANCE_METRES} m).
 * Each property is thus drawn from its spread conditioned on its range (a truncated normal
 * or uniform distribution), never clamped to a bound, and no sample is ever built on an
 * unphysical or refused value. Since the nominal value lies inside its range, both spreads
 * are symmetric and a tolerance is at most 1, each draw lands inside with probability above
 * 1/3; after 64 draws outside (a chance below 1e-11) the nominal value is kept. The result
 * says how many samples needed a second draw and, for each property and layer, the nominal
 * value, the tolerance and the range that caused it ({@link ToleranceResult#redrawnSamples()},
 * {@link ToleranceResult#rangeNotes()}): a tolerance wide enough to matter there changes the
 * distribution, and that is the study's finding, not an error in a layer.
 *
 * <p>Memory: 8 bytes per sample (80 MB at {@value #MAX_SAMPLES} samples), held once.
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

    /**
     * Receives progress reports. It is called from the worker threads, but one call at a time
     * (the study holds a lock during the call, so keep it short), once per block of
     * {@value ToleranceStudy#BLOCK} samples.
     */
    @FunctionalInterface
    public interface ProgressListener {

        /** A listener that ignores reports. */
        ProgressListener NONE = (done, total) -> { };

        /**
         * Reports progress; {@code done} strictly increases from call to call and ends at
         * {@code total}.
         *
         * @param done  samples finished so far
         * @param total samples in the run
         */
        void progress(long done, long total);
    }

    /** The most draws of one factor before the nominal value is kept instead (see the class notes). */
    private static final int MAX_DRAWS = 64;

    private static final int THICKNESS = 0;
    private static final int CONDUCTIVITY = 1;
    private static final int PERMEABILITY = 2;
    private static final int DISTANCE = 3;
    private static final String[] NAMES = {"thickness", "conductivity", "permeability", "distance"};

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
    /** The most samples of one run (its values take 8 bytes each: 80 MB). */
    public static final int MAX_SAMPLES = 10_000_000;

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
         * @param count from 1 to {@value ToleranceStudy#MAX_SAMPLES} (8 bytes of memory each)
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
         * Runs the study. Every sample stays within the physical and documented ranges (see
         * the class notes); how many needed a second draw to do so is in the result.
         *
         * @return the distribution of SE, with the count and notes of samples drawn again
         * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside
         *         the planar model's range (1 µHz to 10 THz)
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
     * @param samples   the number of samples, from 1 to {@value #MAX_SAMPLES}
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
        Sampler sampler = sampler(hz);
        double[] values = new double[samples];
        int blocks = (samples + BLOCK - 1) / BLOCK;
        long[] redrawn = new long[sampler.slots()];
        long[] affected = new long[1];
        long[] done = new long[1];
        Object lock = new Object();
        IntStream.range(0, blocks).parallel().forEach(b -> {
            SplittableRandom rng = new SplittableRandom(mix(seed, b));
            int from = b * BLOCK;
            int to = Math.min(samples, from + BLOCK);
            int[] counts = new int[redrawn.length + 1];
            int hit = 0;
            for (int i = from; i < to; i++) {
                Sample s = sampler.draw(rng, counts);
                hit += s.redrawn() ? 1 : 0;
                values[i] = s.barrier().facing(s.field()).shieldingEffectivenessDb(hz);
            }
            // One lock for the counts and the report: the listener is called once at a time, and
            // `done` is read and reported inside it, so every call sees a larger value than the last.
            synchronized (lock) {
                for (int k = 0; k < redrawn.length; k++) {
                    redrawn[k] += counts[k];
                }
                affected[0] += hit;
                done[0] += to - from;
                listener.progress(done[0], samples);
            }
        });
        return new ToleranceResult(nominal, targetDb, values, affected[0], sampler.notes(redrawn, samples));
    }

    /** The sampler of this study at one frequency (package-private for the range tests). */
    Sampler sampler(double hz) {
        return new Sampler(hz);
    }

    /** One drawn case: the barrier, the field, and whether a draw was repeated to stay in range. */
    record Sample(Barrier barrier, IncidentField field, boolean redrawn) {
    }

    /**
     * Draws samples at one frequency, each property kept in its range by drawing its factor
     * again (see the class notes). Holds the nominal values at the frequency; immutable.
     * Count slots: 3 per layer (thickness, conductivity, permeability), then the distance.
     */
    final class Sampler {
        private final int n;
        private final double[] t;
        private final double[] sigma;
        private final double[] muRe;
        private final double[] muIm;
        private final double hz;

        private Sampler(double hz) {
            this.hz = hz;
            List<Layer> layers = barrier.layers();
            n = layers.size();
            t = new double[n];
            sigma = new double[n];
            muRe = new double[n];
            muIm = new double[n];
            for (int i = 0; i < n; i++) {
                Layer l = layers.get(i);
                t[i] = l.thickness().toMetres();
                sigma[i] = l.medium().conductivity().toSiemensPerMetre();
                muRe[i] = l.medium().permeability().real(hz);
                muIm[i] = l.medium().permeability().loss(hz);
            }
        }

        int slots() {
            return 3 * n + 1;
        }

        /**
         * Draws one sample.
         *
         * @param rng    the generator
         * @param counts {@link #slots()} + 1 counters: incremented at the slot of each property whose
         *               factor was drawn again; the last one is this sample's scratch count, left at 0
         * @return the sample
         */
        Sample draw(SplittableRandom rng, int[] counts) {
            List<Layer> layers = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                Layer l = barrier.layers().get(i);
                double ft = factor(rng, THICKNESS, i, counts);
                double fs = factor(rng, CONDUCTIVITY, i, counts);
                double fm = factor(rng, PERMEABILITY, i, counts);
                Medium m = l.medium();
                Medium varied = m;
                if (fs != 1 && sigma[i] > 0) {
                    varied = varied.withConductivity(Conductivity.ofSiemensPerMetre(sigma[i] * fs));
                }
                if (fm != 1 && isMagnetic(i)) {
                    double[] mu = permeability(muRe[i], muIm[i], fm);
                    varied = varied.withPermeability(new AtStudyFrequency(mu[0], mu[1]));
                }
                Length thickness = ft == 1 ? l.thickness() : Length.ofMetres(t[i] * ft);
                // An air gap varies only in thickness and stays marked as a gap.
                layers.add(varied == m ? (ft == 1 ? l : l.withThickness(thickness)) : Layer.of(varied, thickness));
            }
            IncidentField f = field;
            if (field.kind() != FieldKind.PLANE_WAVE) {
                double fd = factor(rng, DISTANCE, 0, counts);
                if (fd != 1) {
                    Length d = Length.ofMetres(field.distance().toMetres() * fd);
                    f = field.kind() == FieldKind.MAGNETIC_NEAR_FIELD ? IncidentField.magneticNearField(d, field.form())
                            : IncidentField.electricNearField(d, field.form());
                }
            }
            boolean again = counts[slots()] != 0;
            counts[slots()] = 0;
            return new Sample(Barrier.of(layers), f, again);
        }

        private boolean isMagnetic(int i) {
            return !(muRe[i] == 1 && muIm[i] == 0);
        }

        /**
         * The factor of one property of one layer: 1 without a tolerance, else drawn until the
         * varied value lies in its range, at most {@value #MAX_DRAWS} times, then 1.
         */
        private double factor(SplittableRandom rng, int k, int i, int[] counts) {
            if (tol[k] == 0) {
                return 1;
            }
            for (int draw = 0; draw < MAX_DRAWS; draw++) {
                double x = spread[k] == Spread.NORMAL ? gaussian(rng) : 2 * rng.nextDouble() - 1;
                double s = 1 + tol[k] * x;
                if (inRange(k, i, s)) {
                    return s;
                }
                if (draw == 0) {
                    counts[slot(k, i)]++;
                    counts[slots()]++;
                }
            }
            return 1;
        }

        private int slot(int k, int i) {
            return k == DISTANCE ? 3 * n : 3 * i + k;
        }

        /** Whether the property k of layer i, multiplied by s, stays in its documented, physical range. */
        boolean inRange(int k, int i, double s) {
            if (!(s > 0)) {
                return false;
            }
            switch (k) {
                case THICKNESS: {
                    double v = t[i] * s;
                    return v >= Layer.MIN_THICKNESS_METRES && v <= Layer.MAX_THICKNESS_METRES;
                }
                case CONDUCTIVITY: {
                    double v = sigma[i] * s;
                    return sigma[i] == 0 || v > 0 && v <= StackArrays.MAX_SIEMENS_PER_METRE;
                }
                case PERMEABILITY: {
                    if (!isMagnetic(i)) {
                        return true;
                    }
                    double[] mu = permeability(muRe[i], muIm[i], s);
                    return mu[0] > 0 && mu[0] <= RelativePermeability.MAX && mu[1] >= 0
                            && mu[1] <= RelativePermeability.MAX && (muRe[i] < 1 || mu[0] >= 1);
                }
                default: {
                    double v = field.distance().toMetres() * s;
                    return v >= IncidentField.MIN_DISTANCE_METRES && v <= IncidentField.MAX_DISTANCE_METRES;
                }
            }
        }

        /** What each property whose draws were repeated was, for the result's notes. */
        List<String> notes(long[] redrawn, int samples) {
            List<String> out = new ArrayList<>();
            for (int slot = 0; slot < redrawn.length; slot++) {
                if (redrawn[slot] == 0) {
                    continue;
                }
                int k = slot == 3 * n ? DISTANCE : slot % 3;
                int i = slot / 3;
                String what;
                String range;
                switch (k) {
                    case THICKNESS:
                        what = "thickness of layer " + (i + 1) + " (" + clip(barrier.layers().get(i)) + "), nominal "
                                + barrier.layers().get(i).thickness();
                        range = Text.number(Layer.MIN_THICKNESS_METRES) + " m to "
                                + Text.number(Layer.MAX_THICKNESS_METRES) + " m";
                        break;
                    case CONDUCTIVITY:
                        what = "conductivity of layer " + (i + 1) + " (" + clip(barrier.layers().get(i)) + "), nominal "
                                + barrier.layers().get(i).medium().conductivity();
                        range = "above 0 S/m and at most " + Text.number(StackArrays.MAX_SIEMENS_PER_METRE) + " S/m";
                        break;
                    case PERMEABILITY:
                        what = "permeability of layer " + (i + 1) + " (" + clip(barrier.layers().get(i)) + "), nominal "
                                + "µr = " + Text.number(muRe[i]) + " - j " + Text.number(muIm[i]) + " at "
                                + Frequency.ofHertz(hz);
                        range = muRe[i] >= 1 ? "µ' from 1 to " + Text.number(RelativePermeability.MAX)
                                : "µ' above 0 and µ'' at most " + Text.number(RelativePermeability.MAX);
                        break;
                    default:
                        what = "source distance, nominal " + field.distance();
                        range = Text.number(IncidentField.MIN_DISTANCE_METRES) + " m to "
                                + Text.number(IncidentField.MAX_DISTANCE_METRES) + " m";
                        break;
                }
                out.add(what + ", " + NAMES[k] + " tolerance " + Text.number(100 * tol[k]) + " % ("
                        + spread[k].name().toLowerCase(java.util.Locale.ROOT) + "): drawn again in " + redrawn[slot]
                        + " of " + samples + " samples to stay within " + range);
            }
            return List.copyOf(out);
        }
    }

    /**
     * A sample's permeability: the varied value at the study's frequency, the only frequency the
     * sample is evaluated at. Not a {@code PermeabilityModel.constant}, whose range (µ' from
     * 1e-6) a model's own value far above its corner may lie below; the sample keeps the
     * nominal model's range scaled by s.
     */
    private record AtStudyFrequency(double real, double loss) implements PermeabilityModel {
        @Override
        public double real(double hertz) {
            return real;
        }

        @Override
        public double loss(double hertz) {
            return loss;
        }
    }

    private static String clip(Layer l) {
        return Text.clip(l.medium().name());
    }

    /**
     * The varied permeability {µ', µ''} for a factor s: a medium with µ' ≥ 1 at the frequency
     * has its magnetisation scaled, µ' = 1 + (µ'₀ − 1)·s, µ'' = µ''₀·s; a medium with µ' below 1
     * there (a diamagnetic value, or a model whose µ' has fallen below 1) has no magnetisation
     * to scale and has its whole µr scaled, µ' = µ'₀·s, µ'' = µ''₀·s, which keeps µ' above 0.
     */
    static double[] permeability(double re, double im, double s) {
        return re >= 1 ? new double[] {1 + (re - 1) * s, im * s} : new double[] {re * s, im * s};
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
