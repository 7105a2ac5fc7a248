/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.internal;

import java.util.Map;
import java.util.Objects;

/**
 * The texts a design's quantities were given in, where they differ from the default written
 * form ({@link JsonValues#defaultText(Object)}): "0.2 mm" stays "0.2 mm" and "21 mil" stays
 * "21 mil" when a design read from a file is written again. Keyed by the default text, which
 * is one-to-one with the value, so a text is only ever used for a value it reads back to.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class Spelling {

    /** No texts: every quantity is written in its default form. */
    public static final Spelling DEFAULT = new Spelling(Map.of());

    private final Map<String, String> given;

    private Spelling(Map<String, String> given) {
        this.given = given;
    }

    /**
     * The texts noted while reading a document.
     *
     * @param given from default text to the text as given, as {@link Node#spelled()} returns it
     * @return the spelling
     */
    public static Spelling of(Map<String, String> given) {
        return given.isEmpty() ? DEFAULT : new Spelling(Map.copyOf(given));
    }

    /**
     * The text to write a quantity in: as it was given, else its default form.
     *
     * @param quantity a quantity of a type {@link JsonValues#defaultText(Object)} knows, not null
     * @return the text
     * @throws IllegalArgumentException if the type is not one files hold
     */
    public String text(Object quantity) {
        String plain = JsonValues.defaultText(Objects.requireNonNull(quantity, "quantity"));
        if (plain == null) {
            throw new IllegalArgumentException("files do not hold a " + quantity.getClass().getSimpleName());
        }
        return given.getOrDefault(plain, plain);
    }

    /**
     * Whether no text differs from the default form.
     *
     * @return true for {@link #DEFAULT}
     */
    public boolean isDefault() {
        return given.isEmpty();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Spelling s && s.given.equals(given);
    }

    @Override
    public int hashCode() {
        return given.hashCode();
    }

    @Override
    public String toString() {
        return "as given: " + given;
    }
}
