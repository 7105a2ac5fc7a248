/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

import io.shieldmath.shield.internal.Text;

/**
 * Thrown at the API boundary when a value is not acceptable: out of its physical range,
 * not a number, infinite, or text that does not parse. The message names the quantity,
 * the value, its unit and the allowed range, for example
 * {@code "frequency: -5 Hz is out of range; allowed: finite and greater than 0 Hz"}.
 *
 * <p>The structured parts are also available, so instrument software can show them in
 * its own words.
 */
public final class InvalidQuantityException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /** The name of the refused quantity. */
    private final String quantity;
    /** The refused value with its unit, or the refused text in quotes. */
    private final String value;
    /** The allowed range or accepted form, in words. */
    private final String allowed;

    /**
     * Creates an exception.
     *
     * @param quantity the quantity's name, for example {@code "frequency"}
     * @param value    the offending value with its unit, as text
     * @param allowed  the allowed range in words, with units
     */
    public InvalidQuantityException(String quantity, String value, String allowed) {
        super(quantity + ": " + value + " is out of range; allowed: " + allowed);
        this.quantity = quantity;
        this.value = value;
        this.allowed = allowed;
    }

    /**
     * Creates an exception for text that does not read as a quantity.
     *
     * @param quantity the quantity's name
     * @param text     the text as given; the message quotes at most its first 60 characters,
     *                 with control characters escaped
     * @param problem  what is wrong with it
     * @param expected the accepted form, with the known units
     * @return the exception, ready to throw
     */
    public static InvalidQuantityException unreadable(String quantity, String text, String problem,
                                                      String expected) {
        return new InvalidQuantityException(quantity, '"' + Text.clip(String.valueOf(text)) + '"', problem, expected);
    }

    private InvalidQuantityException(String quantity, String value, String problem, String expected) {
        super(quantity + ": cannot read " + value + " (" + problem + "); expected " + expected);
        this.quantity = quantity;
        this.value = value;
        this.allowed = expected;
    }

    /**
     * The name of the quantity that was refused.
     *
     * @return for example {@code "frequency"} or {@code "layer 2 thickness"}
     */
    public String quantity() {
        return quantity;
    }

    /**
     * The refused value with its unit, or the refused text in quotes.
     *
     * @return the value as text
     */
    public String value() {
        return value;
    }

    /**
     * The allowed range, or the accepted text form, in words.
     *
     * @return the allowed range
     */
    public String allowed() {
        return allowed;
    }
}
