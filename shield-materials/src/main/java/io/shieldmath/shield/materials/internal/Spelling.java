/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.internal;

import java.util.ArrayList;
import java.util.Map;
import java.util.Objects;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The texts a design's quantities were given in, where they differ from the default written
 * form ({@link QuantityText#defaultText(Object)}): "0.2 mm" stays "0.2 mm" and "21 mil" stays
 * "21 mil" when a design read from a file is written again. Each text is kept with its JSON
 * path and the default text of its value; it is written back only at the same path and only
 * while the value there is still the same (its default text unchanged), so a text is never
 * used for a value it does not read back to, and one value given in two forms keeps both.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class Spelling {

    /** No texts: every quantity is written in its default form. */
    public static final Spelling DEFAULT = new Spelling(Map.of());

    private final Map<String, Map.Entry<String, String>> given;

    private Spelling(Map<String, Map.Entry<String, String>> given) {
        this.given = given;
    }

    /**
     * The texts noted while reading a document.
     *
     * @param given from JSON path to the default text and the text as given, as
     *              {@link Node#spelled()} returns it
     * @return the spelling
     */
    public static Spelling of(Map<String, Map.Entry<String, String>> given) {
        return given.isEmpty() ? DEFAULT : new Spelling(Map.copyOf(given));
    }

    /**
     * The default written form of a quantity; {@link #applyTo(ObjectNode)} puts the texts as
     * given back once the whole document is written.
     *
     * @param quantity a quantity of a type {@link QuantityText#defaultText(Object)} knows, not null
     * @return the text
     * @throws IllegalArgumentException if the type is not one files hold
     */
    public String text(Object quantity) {
        String plain = QuantityText.defaultText(Objects.requireNonNull(quantity, "quantity"));
        if (plain == null) {
            throw new IllegalArgumentException("files do not hold a " + quantity.getClass().getSimpleName());
        }
        return plain;
    }

    /**
     * Puts the texts as given back into a written document: each text value at a noted path
     * that still holds the noted default text (or that text after a minus sign) is replaced
     * by the text as given.
     *
     * @param root the document's root object, changed in place
     */
    public void applyTo(ObjectNode root) {
        if (!given.isEmpty()) {
            walk(root, "$");
        }
    }

    private void walk(JsonNode node, String path) {
        if (node instanceof ObjectNode o) {
            for (Map.Entry<String, JsonNode> e : new ArrayList<>(o.properties())) {
                String child = path + "." + e.getKey();
                if (e.getValue().isString()) {
                    String replaced = replacement(child, e.getValue().asString());
                    if (replaced != null) {
                        o.put(e.getKey(), replaced);
                    }
                } else {
                    walk(e.getValue(), child);
                }
            }
        } else if (node instanceof ArrayNode a) {
            for (int i = 0; i < a.size(); i++) {
                String child = path + "[" + i + "]";
                JsonNode item = a.get(i);
                if (item.isString()) {
                    String replaced = replacement(child, item.asString());
                    if (replaced != null) {
                        a.set(i, replaced);
                    }
                } else {
                    walk(item, child);
                }
            }
        }
    }

    private String replacement(String path, String written) {
        Map.Entry<String, String> e = given.get(path);
        if (e == null) {
            return null;
        }
        if (written.equals(e.getKey())) {
            return e.getValue();
        }
        if (written.equals("-" + e.getKey())) {
            return "-" + e.getValue();
        }
        return null;
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
