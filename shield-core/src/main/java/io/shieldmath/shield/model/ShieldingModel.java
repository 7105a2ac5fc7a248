/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.model;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.util.function.DoubleUnaryOperator;

/**
 * Anything that gives a shielding effectiveness at a frequency: a planar barrier facing a
 * field, a coil pair with a sheet between, a shell in a uniform field, an enclosure. The
 * design tools work on this one interface, so they serve every model:
 *
 * <pre>{@code
 * ShieldingModel<PlanarResult> plate = Barrier.of(copper, mm(0.5)).facing(field);
 * MarginReport m = need.marginOf(plate);               // any model, no adapter
 * WorstCase w = BandSearch.worst(plate, band);           // the real minimum over the band
 * Sweep<PlanarResult> s = plate.sweep(band, 61);         // results with their parts
 * }</pre>
 *
 * <p>Implementations must be immutable and thread-safe, must refuse a frequency outside
 * {@link #validBand()} with an {@link InvalidQuantityException}, and must return a finite
 * value for every frequency they accept.
 *
 * @param <R> the model's result type, with its parts
 */
public interface ShieldingModel<R extends ShieldingResult> {

    /**
     * The frequencies this model evaluates.
     *
     * @return the valid band, both ends included
     */
    FrequencyBand validBand();

    /**
     * The full result at one frequency, with the model's parts.
     *
     * @param frequency the frequency, not null, within {@link #validBand()}
     * @return the result
     * @throws InvalidQuantityException if the frequency is outside the valid band
     */
    R at(Frequency frequency);

    /**
     * The shielding effectiveness at one frequency, on primitives: the hot path of the
     * design tools. Implementations create no objects per call where they can, and say so.
     *
     * @param hertz the frequency in Hz, within {@link #validBand()}
     * @return SE in dB, finite
     * @throws InvalidQuantityException if the frequency is outside the valid band
     */
    double shieldingEffectivenessDb(double hertz);

    /**
     * The shielding effectiveness at many frequencies, into an array of the caller's.
     * The default calls {@link #shieldingEffectivenessDb(double)} per point and allocates
     * nothing.
     *
     * @param hertz frequencies in Hz, each within {@link #validBand()}, not null
     * @param outDb receives SE in dB, at least as long as {@code hertz}, not null
     * @return {@code outDb}
     * @throws InvalidQuantityException if a frequency is outside the valid band
     * @throws IllegalArgumentException if {@code outDb} is shorter than {@code hertz}
     */
    default double[] shieldingEffectivenessDb(double[] hertz, double[] outDb) {
        Require.nonNull("frequencies", hertz);
        Require.nonNull("output array", outDb);
        if (outDb.length < hertz.length) {
            throw new IllegalArgumentException("output array holds " + outDb.length + " values but "
                    + hertz.length + " frequencies were given");
        }
        for (int i = 0; i < hertz.length; i++) {
            outDb[i] = shieldingEffectivenessDb(hertz[i]);
        }
        return outDb;
    }

    /**
     * The results at log-spaced frequencies across a band, both ends included. This is a
     * coarse sampling: its {@link Sweep#lowestSampled()} may miss a narrow dip between
     * points; {@code io.shieldmath.shield.design.BandSearch} finds the real minimum.
     *
     * @param band   the band, not null, within {@link #validBand()}
     * @param points the number of points, 1 to {@value Sweep#MAX_POINTS}
     * @return the sweep
     * @throws InvalidQuantityException if the band leaves the valid band
     * @throws IllegalArgumentException if {@code points} is out of range
     */
    default Sweep<R> sweep(FrequencyBand band, int points) {
        Require.nonNull("band", band);
        Sweep.checkPoints(points);
        FrequencyBand valid = validBand();
        Require.inRange("band lower frequency", band.low().toHertz(), valid.low().toHertz(),
                valid.high().toHertz(), "Hz");
        Require.inRange("band upper frequency", band.high().toHertz(), valid.low().toHertz(),
                valid.high().toHertz(), "Hz");
        return Sweep.of(this, band.logSpacedHertz(points));
    }

    /**
     * A model of your own from a function of frequency: a measured curve, a vendor's
     * figure, a combination of this library's models. Its results carry only the
     * shielding effectiveness.
     *
     * <pre>{@code
     * ShieldingModel<ShieldingResult> gasket = ShieldingModel.ofFunction("gasketed seam",
     *         FrequencyBand.of(MHz(1), GHz(1)), hz -> 80 - 20 * Math.log10(hz / 1e6));
     * }</pre>
     *
     * @param name      a name for messages and {@code toString}, not null
     * @param validBand the frequencies the function accepts, not null
     * @param seDb      SE in dB at a frequency in Hz, not null; must be thread-safe and finite
     *                  inside the band
     * @return the model; it checks the band and refuses a non-finite value with an
     *         {@link ArithmeticException} naming the model and the frequency
     */
    static ShieldingModel<ShieldingResult> ofFunction(String name, FrequencyBand validBand, DoubleUnaryOperator seDb) {
        return new FunctionModel(Require.nonNull("name", name), Require.nonNull("valid band", validBand),
                Require.nonNull("SE function", seDb));
    }
}
