/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

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
     * or a single frequency such as {@code "50 Hz"} for a band of one frequency. Each end is
     * read by {@link Frequency#parse(CharSequence)}; the separator {@code to} or {@code -}
     * needs a space on each side, {@code ..} none. Reading is one pass, linear in the length.
     *
     * @param text the text, not null, at most {@value #MAX_TEXT} characters
     * @return the band
     * @throws InvalidQuantityException if the text is too long, either end does not read or
     *                                  the ends are out of order
     */
    public static FrequencyBand parse(CharSequence text) {
        String s = Require.nonNull("band text", text).toString();
        if (s.length() > MAX_TEXT) {
            throw InvalidQuantityException.unreadable("frequency band", s, "longer than " + MAX_TEXT
                    + " characters", "a band such as \"10 Hz to 100 kHz\"");
        }
        int[] cut = separator(s);
        if (cut == null) {
            return at(Frequency.parse(s));
        }
        return of(Frequency.parse(s.substring(0, cut[0])), Frequency.parse(s.substring(cut[1])));
    }

    /** The longest text {@link #parse(CharSequence)} reads: two frequencies and a separator. */
    public static final int MAX_TEXT = 2 * Text.MAX_LENGTH + 8;

    /**
     * The first separator: {@code ..}, or {@code to} or {@code -} with white space on both
     * sides; as {start, end} of the separator with its spaces, or null.
     */
    private static int[] separator(String s) {
        int n = s.length();
        for (int i = 0; i < n; i++) {
            char c = s.charAt(i);
            if (c == '.' && i + 1 < n && s.charAt(i + 1) == '.') {
                return new int[] {i, i + 2};
            }
            if (!isBlank(c)) {
                continue;
            }
            // A run of white space: look at what follows it.
            int j = i;
            while (j < n && isBlank(s.charAt(j))) {
                j++;
            }
            int word = -1;
            if (j + 1 < n && s.charAt(j) == 't' && s.charAt(j + 1) == 'o') {
                word = j + 2;
            } else if (j < n && s.charAt(j) == '-') {
                word = j + 1;
            }
            if (word > 0 && word < n && isBlank(s.charAt(word))) {
                int k = word;
                while (k < n && isBlank(s.charAt(k))) {
                    k++;
                }
                return new int[] {i, k};
            }
            i = j - 1;
        }
        return null;
    }

    private static boolean isBlank(char c) {
        return c == ' ' || c == '\t' || c == '\u00a0' || c == '\u2009' || c == '\u202f';
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

    /** The largest number of points {@link #logSpacedHertz(int)} makes. */
    public static final int MAX_POINTS = 1_000_000;

    /**
     * Log-spaced frequencies from low to high, both ends included exactly, the points between
     * rounded to 12 significant digits where that keeps them strictly increasing (so decade
     * points come out as 1000, not 1000.0000000000002), else left unrounded.
     *
     * @param points the number of points, 1 to {@value #MAX_POINTS} (1 gives the low end only;
     *               a single-frequency band gives that frequency repeated)
     * @return a new array of frequencies in Hz, strictly increasing unless the band is a
     *         single frequency
     * @throws IllegalArgumentException if {@code points} is out of range, or the band is so
     *                                  narrow that it holds fewer than {@code points} distinct
     *                                  doubles
     */
    public double[] logSpacedHertz(int points) {
        if (points < 1 || points > MAX_POINTS) {
            throw new IllegalArgumentException("number of points must be 1 to " + MAX_POINTS + "; got " + points);
        }
        double a = low.toHertz();
        double b = high.toHertz();
        double[] f = new double[points];
        if (points == 1 || a == b) {
            java.util.Arrays.fill(f, a);
            return f;
        }
        double la = Math.log(a);
        double step = (Math.log(b) - la) / (points - 1);
        f[0] = a;
        for (int i = 1; i < points - 1; i++) {
            double raw = Math.exp(la + step * i);
            double rounded = new java.math.BigDecimal(raw).round(new java.math.MathContext(12)).doubleValue();
            f[i] = rounded > f[i - 1] && rounded < b ? rounded : raw;
            if (!(f[i] > f[i - 1])) {
                // The band is narrower than the spacing of doubles allows: step up one double.
                f[i] = Math.nextUp(f[i - 1]);
            }
            if (!(f[i] < b)) {
                throw new IllegalArgumentException("the band " + this + " holds fewer than " + points
                        + " distinct frequencies; use fewer points");
            }
        }
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
