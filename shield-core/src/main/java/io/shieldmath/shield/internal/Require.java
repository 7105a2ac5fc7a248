/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.quantity.InvalidQuantityException;

/**
 * Boundary checks that throw {@link InvalidQuantityException} with the quantity, the
 * value, the unit and the allowed range in the message. Used by every factory in this
 * library. Internal: not exported (only to this library's own modules).
 *
 * <p>Stateless and thread-safe.
 */
public final class Require {

    private Require() {
    }

    /**
     * Requires a finite value greater than zero.
     *
     * @param quantity the quantity's name for the message
     * @param value    the value to check
     * @param unit     the unit the value is expressed in, for the message
     * @return {@code value}
     * @throws InvalidQuantityException if {@code value} is NaN, infinite, zero or negative
     */
    public static double positive(String quantity, double value, String unit) {
        if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
            throw new InvalidQuantityException(quantity, show(value, unit),
                    "finite and greater than 0 " + unit);
        }
        return value;
    }

    /**
     * Requires a finite value of zero or more.
     *
     * @param quantity the quantity's name for the message
     * @param value    the value to check
     * @param unit     the unit the value is expressed in, for the message
     * @return {@code value} (a negative zero becomes positive zero)
     * @throws InvalidQuantityException if {@code value} is NaN, infinite or negative
     */
    public static double nonNegative(String quantity, double value, String unit) {
        if (!(value >= 0) || value == Double.POSITIVE_INFINITY) {
            throw new InvalidQuantityException(quantity, show(value, unit),
                    "finite and 0 " + unit + " or more");
        }
        return value + 0.0;
    }

    /**
     * Requires a finite value.
     *
     * @param quantity the quantity's name for the message
     * @param value    the value to check
     * @param unit     the unit the value is expressed in, for the message
     * @return {@code value}
     * @throws InvalidQuantityException if {@code value} is NaN or infinite
     */
    public static double finite(String quantity, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new InvalidQuantityException(quantity, show(value, unit), "a finite number of " + unit);
        }
        return value;
    }

    /**
     * Requires a finite value within a closed range.
     *
     * @param quantity the quantity's name for the message
     * @param value    the value to check
     * @param min      the smallest allowed value, in {@code unit}
     * @param max      the largest allowed value, in {@code unit}
     * @param unit     the unit of {@code value}, {@code min} and {@code max}
     * @return {@code value}
     * @throws InvalidQuantityException if {@code value} is NaN or outside [min, max]
     */
    public static double inRange(String quantity, double value, double min, double max, String unit) {
        if (!(value >= min && value <= max)) {
            throw new InvalidQuantityException(quantity, show(value, unit),
                    "from " + Text.number(min) + " " + unit + " to " + Text.number(max) + " " + unit);
        }
        return value;
    }

    /**
     * Requires a non-null argument.
     *
     * @param <T>      the argument's type
     * @param quantity the argument's name for the message
     * @param value    the argument
     * @return {@code value}
     * @throws NullPointerException if {@code value} is null, with the name in the message
     */
    public static <T> T nonNull(String quantity, T value) {
        if (value == null) {
            throw new NullPointerException(quantity + " must not be null");
        }
        return value;
    }

    /**
     * Requires a short text without control characters, such as a name or a title.
     *
     * @param what the text's name for the message
     * @param text the text
     * @param max  the largest number of characters, after stripping
     * @return the text, stripped
     * @throws NullPointerException     if {@code text} is null, with the name in the message
     * @throws IllegalArgumentException if the stripped text is empty, longer than {@code max}
     *                                  or holds a control character; the message quotes it, clipped
     */
    public static String text(String what, String text, int max) {
        nonNull(what, text);
        String s = text.strip();
        if (s.isEmpty() || s.length() > max || s.chars().anyMatch(Character::isISOControl)) {
            throw new IllegalArgumentException(what + " must be 1 to " + max
                    + " characters without control characters; got \"" + Text.clip(text) + "\"");
        }
        return s;
    }

    /**
     * A value and its unit for a message, such as {@code "0.001 m"}.
     *
     * @param value the value
     * @param unit  the unit
     * @return the text
     */
    public static String show(double value, String unit) {
        return Text.number(value) + " " + unit;
    }
}
