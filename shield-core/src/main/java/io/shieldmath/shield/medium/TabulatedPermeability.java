/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.FrequencyUnit;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.Arrays;

/**
 * A table of measured complex permeability against frequency. Between points, µ' and µ''
 * are interpolated linearly against log10(f); below the first point and at 0 Hz the
 * first point's values hold, above the last point the last point's values hold (so
 * give points up to the highest frequency you evaluate).
 *
 * <p>Ranges: 1 to {@value #MAX_POINTS} points; frequencies finite, greater than 0 and strictly
 * increasing; at every point µ' from {@code RelativePermeability.MIN} (1e-6) to
 * {@code RelativePermeability.MAX} (1e7), µ'' from 0 to 1e7, so every interpolated value is in range too.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class TabulatedPermeability implements PermeabilityModel {

    /** The largest number of points in a table. */
    public static final int MAX_POINTS = 100_000;

    private final double[] hertz;
    private final double[] logHertz;
    private final double[] real;
    private final double[] loss;

    TabulatedPermeability(double[] hertz, double[] real, double[] loss) {
        Require.nonNull("frequencies", hertz);
        Require.nonNull("real parts", real);
        Require.nonNull("loss parts", loss);
        if (hertz.length == 0 || hertz.length != real.length || hertz.length != loss.length) {
            throw new IllegalArgumentException("permeability table: frequencies, real parts and loss parts must "
                    + "have the same length of at least 1; got " + hertz.length + ", " + real.length + ", "
                    + loss.length);
        }
        this.hertz = hertz.clone();
        this.real = real.clone();
        this.loss = loss.clone();
        this.logHertz = new double[hertz.length];
        if (hertz.length > MAX_POINTS) {
            throw new IllegalArgumentException("permeability table: at most " + MAX_POINTS + " points; got "
                    + hertz.length);
        }
        for (int i = 0; i < hertz.length; i++) {
            Require.positive("permeability table frequency [" + i + "]", this.hertz[i], "Hz");
            Require.positive("permeability table real part [" + i + "]", this.real[i], "(relative)");
            Require.inRange("permeability table real part [" + i + "]", this.real[i], RelativePermeability.MIN,
                    RelativePermeability.MAX,
                    "(relative)");
            Require.nonNegative("permeability table loss part [" + i + "]", this.loss[i], "(relative)");
            Require.inRange("permeability table loss part [" + i + "]", this.loss[i], 0, RelativePermeability.MAX,
                    "(relative)");
            if (i > 0 && !(this.hertz[i] > this.hertz[i - 1])) {
                throw new InvalidQuantityException(
                        "permeability table frequency [" + i + "]", Text.exact(this.hertz[i]) + " Hz",
                        "greater than the previous point, " + Text.exact(this.hertz[i - 1]) + " Hz");
            }
            logHertz[i] = Math.log10(this.hertz[i]);
        }
    }

    /**
     * The table's frequencies in Hz.
     *
     * @return a copy of the frequencies in Hz
     */
    public double[] hertz() {
        return hertz.clone();
    }

    /**
     * The table's real parts µ'.
     *
     * @return a copy
     */
    public double[] realParts() {
        return real.clone();
    }

    /**
     * The table's loss parts µ''.
     *
     * @return a copy
     */
    public double[] lossParts() {
        return loss.clone();
    }

    @Override
    public double real(double hertz) {
        return interpolate(real, hertz);
    }

    @Override
    public double loss(double hertz) {
        return interpolate(loss, hertz);
    }

    private double interpolate(double[] values, double f) {
        int n = hertz.length;
        if (!(f > hertz[0])) {
            return values[0];
        }
        if (f >= hertz[n - 1]) {
            return values[n - 1];
        }
        int i = Arrays.binarySearch(hertz, f);
        if (i >= 0) {
            return values[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (Math.log10(f) - logHertz[lo]) / (logHertz[hi] - logHertz[lo]);
        return values[lo] + w * (values[hi] - values[lo]);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TabulatedPermeability t && Arrays.equals(t.hertz, hertz)
                && Arrays.equals(t.real, real) && Arrays.equals(t.loss, loss);
    }

    @Override
    public int hashCode() {
        return (Arrays.hashCode(hertz) * 31 + Arrays.hashCode(real)) * 31 + Arrays.hashCode(loss);
    }

    @Override
    public String toString() {
        return "µr table of " + hertz.length + (hertz.length == 1 ? " point, " : " points, ")
                + Text.show(hertz[0], FrequencyUnit.values()) + " to "
                + Text.show(hertz[hertz.length - 1], FrequencyUnit.values());
    }
}
