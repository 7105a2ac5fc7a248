/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;

/**
 * A level in decibels of a field-amplitude ratio: 20·log10 of the ratio, so 20 dB is a
 * factor of 10 in field. Negative values are allowed (a multiple-reflection correction,
 * a margin that is missed).
 *
 * <p>Immutable and thread-safe; equality is by value. The text form is {@code "42.5 dB"}.
 */
public final class Decibels implements Comparable<Decibels> {

    /** Zero decibels: a ratio of one. */
    public static final Decibels ZERO = new Decibels(0);

    private final double db;

    private Decibels(double db) {
        this.db = db;
    }

    /**
     * Obtains a level in decibels.
     *
     * @param db the level, finite
     * @return the level
     * @throws InvalidQuantityException if {@code db} is NaN or infinite
     */
    public static Decibels of(double db) {
        return new Decibels(Require.finite("level", db, "dB") + 0.0);
    }

    /**
     * The level of a field-amplitude ratio, 20·log10(ratio).
     *
     * @param ratio the ratio, finite and greater than 0
     * @return the level
     * @throws InvalidQuantityException if the ratio is not finite and positive
     */
    public static Decibels ofFieldRatio(double ratio) {
        return of(20 * Math.log10(Require.positive("field ratio", ratio, "(plain number)")));
    }

    /**
     * Reads {@code "42.5 dB"}: a decimal number, optional spaces (the documented spaces of
     * {@link ScalarQuantity}, the no-break space included) and the unit {@code dB}, which is
     * required and case-sensitive.
     *
     * @param text the text, not null, at most {@value Text#MAX_LENGTH} characters
     * @return the level
     * @throws InvalidQuantityException if the text does not read
     */
    public static Decibels parse(CharSequence text) {
        return of(Text.parse("level", text, UNITS));
    }

    /** The one unit of a level. */
    private enum LevelUnit implements Unit {
        DECIBEL;

        @Override
        public String symbol() {
            return "dB";
        }

        @Override
        public double toSi() {
            return 1;
        }

        @Override
        public java.util.List<String> aliases() {
            return java.util.List.of();
        }
    }

    private static final Unit[] UNITS = {LevelUnit.DECIBEL};

    /**
     * The level in dB.
     *
     * @return the level
     */
    public double toDb() {
        return db;
    }

    /**
     * The field-amplitude ratio, 10^(dB/20); may overflow to infinity above about 6160 dB.
     *
     * @return the ratio
     */
    public double toFieldRatio() {
        return Math.pow(10, db / 20);
    }

    /**
     * The sum of two levels.
     *
     * @param other the level to add, not null
     * @return the sum; this object is unchanged
     * @throws NullPointerException if {@code other} is null
     * @throws InvalidQuantityException if the sum is not finite
     */
    public Decibels plus(Decibels other) {
        return of(db + Require.nonNull("other", other).db);
    }

    /**
     * The difference of two levels.
     *
     * @param other the level to subtract, not null
     * @return the difference; this object is unchanged
     * @throws NullPointerException if {@code other} is null
     * @throws InvalidQuantityException if the difference is not finite
     */
    public Decibels minus(Decibels other) {
        return of(db - Require.nonNull("other", other).db);
    }

    /**
     * Whether the level is below zero.
     *
     * @return true if negative
     */
    public boolean isNegative() {
        return db < 0;
    }

    @Override
    public int compareTo(Decibels o) {
        return Double.compare(db, o.db);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Decibels d && Double.compare(d.db, db) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(db);
    }

    /**
     * The text form, {@code "42.5 dB"}, with the shortest decimal that reads back exactly.
     *
     * @return the text form, read back by {@link #parse(CharSequence)} to an equal level
     */
    @Override
    public String toString() {
        return Text.exact(db) + " dB";
    }
}
