/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;

/**
 * A closed band of frequencies [low, high], for sweeps and worst-case searches.
 *
 * <p>Immutable and thread-safe; equality is by value. The text form is
 * {@code "10 Hz to 100 kHz"}, read back by {@link #parse(CharSequence)}.
 */
public final class FrequencyBand {

    private final Frequency low;
    private final Frequency high;

    private FrequencyBand(Frequency low, Frequency high) {
        this.low = low;
        this.high = high;
    }

    /**
     * Obtains a band.
     *
     * @param low  the lowest frequency, not null
     * @param high the highest frequency, not null, not below {@code low}
     * @return the band
     * @throws InvalidQuantityException if {@code high} is below {@code low}
     */
    public static FrequencyBand of(Frequency low, Frequency high) {
        Require.nonNull("low frequency", low);
        Require.nonNull("high frequency", high);
        if (high.compareTo(low) < 0) {
            throw new InvalidQuantityException("band upper frequency", high.toString(), "at least the lower "
                    + "frequency, " + low);
        }
        return new FrequencyBand(low, high);
    }

    /**
     * A band of a single frequency.
     *
     * @param f the frequency, not null
     * @return the band [f, f]
     */
    public static FrequencyBand at(Frequency f) {
        return of(f, f);
    }

    /**
     * Reads {@code "10 Hz to 100 kHz"} (also {@code "10 Hz - 100 kHz"} or {@code "10 Hz..100 kHz"}),
     * or a single frequency such as {@code "50 Hz"} for a band of one frequency.
     *
     * @param text the text, not null
     * @return the band
     * @throws InvalidQuantityException if either end does not read or the ends are out of order
     */
    public static FrequencyBand parse(CharSequence text) {
        String s = Require.nonNull("band text", text).toString();
        String[] parts = s.split("\\s+to\\s+|\\.\\.|\\s+-\\s+", 2);
        if (parts.length != 2) {
            return at(Frequency.parse(s));
        }
        return of(Frequency.parse(parts[0]), Frequency.parse(parts[1]));
    }

    /**
     * The lowest frequency.
     *
     * @return the low end
     */
    public Frequency low() {
        return low;
    }

    /**
     * The highest frequency.
     *
     * @return the high end
     */
    public Frequency high() {
        return high;
    }

    /**
     * Whether a frequency lies in the band (ends included).
     *
     * @param f the frequency, not null
     * @return true if low ≤ f ≤ high
     */
    public boolean contains(Frequency f) {
        return f.compareTo(low) >= 0 && f.compareTo(high) <= 0;
    }

    /**
     * Log-spaced frequencies from low to high, both ends included exactly, the points between
     * rounded to 12 significant digits.
     *
     * @param points the number of points, 1 or more (1 gives the low end only; a
     *               single-frequency band gives that frequency repeated)
     * @return a new array of frequencies in Hz
     * @throws IllegalArgumentException if {@code points} is below 1
     */
    public double[] logSpacedHertz(int points) {
        if (points < 1) {
            throw new IllegalArgumentException("number of points must be 1 or more; got " + points);
        }
        double a = low.toHertz();
        double b = high.toHertz();
        double[] f = new double[points];
        if (points == 1) {
            f[0] = a;
            return f;
        }
        double la = Math.log(a);
        double step = (Math.log(b) - la) / (points - 1);
        for (int i = 0; i < points; i++) {
            // Rounded to 12 significant digits so that decade points come out as 1000, not 1000.0000000000002.
            f[i] = new java.math.BigDecimal(Math.exp(la + step * i)).round(new java.math.MathContext(12)).doubleValue();
        }
        f[0] = a;
        f[points - 1] = b;
        return f;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FrequencyBand b && b.low.equals(low) && b.high.equals(high);
    }

    @Override
    public int hashCode() {
        return low.hashCode() * 31 + high.hashCode();
    }

    /**
     * The text form, {@code "10 Hz to 100 kHz"}, or {@code "50 Hz"} for a single frequency.
     *
     * @return the text form, read back by {@link #parse(CharSequence)}
     */
    @Override
    public String toString() {
        return low.equals(high) ? low.toString() : low + " to " + high;
    }
}
