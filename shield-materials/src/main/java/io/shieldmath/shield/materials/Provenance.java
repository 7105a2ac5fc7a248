/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * How far a number of a {@link Material} can be trusted, read from the words its source
 * text starts with. The state is not stored apart from the text, so the two cannot
 * disagree:
 *
 * <ul>
 * <li>{@link #FROM_MEMORY}: the text says "from memory" anywhere (the weakest claim wins,
 *     so a text that checks one part and gives another from memory is from memory);</li>
 * <li>{@link #CHECKED}: the text starts with "checked against", in the form
 *     {@code checked against <source named>, read at <address>} (or
 *     {@code read in <edition, page>} for a printed copy), checked when a material is built;</li>
 * <li>{@link #MEASURED}: the text starts with "measured";</li>
 * <li>{@link #COMMON_PRACTICE}: the text starts with "common practice" (a fact of the
 *     trade with no source to cite);</li>
 * <li>{@link #DERIVED}: the text starts with "derived" (computed from other numbers of
 *     the entry, such as σ = 1/(Rs·t));</li>
 * <li>{@link #CITED}: anything else: the text names a source without saying that the
 *     value was checked against it.</li>
 * </ul>
 *
 * Filter a catalogue on it with {@link Catalogue#withProvenance(MaterialProperty, Provenance)}.
 */
public enum Provenance {
    /** Checked against a named published source, with the place where it was read. */
    CHECKED("checked"),
    /** Measured by the user (the text starts with "measured"). */
    MEASURED("measured"),
    /** Computed from other numbers of the same entry. */
    DERIVED("derived"),
    /** A fact of the trade with no source to cite. */
    COMMON_PRACTICE("common practice"),
    /** Names a source, without a record that the value was checked against it. */
    CITED("cited"),
    /** Not checked against its source: recalled, to be checked. */
    FROM_MEMORY("from memory");

    /**
     * The form a {@link #CHECKED} source must have: "checked against", the source named
     * (at least three characters), then ", read at" and a web address, or ", read in" and
     * a description of the printed copy (at least three characters).
     */
    private static final Pattern CHECKED_FORM = Pattern.compile(
            "checked against \\S.{2,}?, read (?:at https?://[^\\s,;]{4,}|in \\S.{2,})", Pattern.DOTALL);

    private final String words;

    Provenance(String words) {
        this.words = words;
    }

    /**
     * The short words for reports and tables.
     *
     * @return for example {@code "checked"} or {@code "from memory"}
     */
    public String words() {
        return words;
    }

    /**
     * The provenance a source text states, by the rules of this class.
     *
     * @param source the source text, not null
     * @return its provenance
     */
    public static Provenance of(String source) {
        String s = Require.nonNull("source", source).strip().toLowerCase(Locale.ROOT);
        if (s.contains("from memory")) {
            return FROM_MEMORY;
        }
        if (s.startsWith("checked against")) {
            return CHECKED;
        }
        if (s.startsWith("measured")) {
            return MEASURED;
        }
        if (s.startsWith("common practice")) {
            return COMMON_PRACTICE;
        }
        if (s.startsWith("derived")) {
            return DERIVED;
        }
        return CITED;
    }

    /**
     * Whether a text claiming {@link #CHECKED} names its source and where it was read:
     * {@code checked against <source>, read at <http(s) address>} or
     * {@code checked against <source>, read in <printed copy>}, and more text may follow.
     *
     * @param source the source text, not null
     * @return true if the text is in that form; false for other texts, checked or not
     */
    public static boolean namesSourceAndPlace(String source) {
        return CHECKED_FORM.matcher(Require.nonNull("source", source).strip()).lookingAt();
    }

    /**
     * Checks that a source text which claims {@link #CHECKED} names the source and where it
     * was read; other texts pass unchanged.
     *
     * @param what   what the source belongs to, for the message (for example
     *               {@code "nickel conductivity source"})
     * @param source the source text, not null
     * @return the text
     * @throws IllegalArgumentException if the text starts with "checked against" but does
     *                                  not name the source and where it was read
     */
    public static String requireWellFormed(String what, String source) {
        if (of(source) == CHECKED && !namesSourceAndPlace(source)) {
            throw new IllegalArgumentException(what + " \"" + Text.clip(source) + "\" claims a check but does not "
                    + "say against what and where it was read; write \"checked against <source named>, read at "
                    + "<web address>\" or \"checked against <source named>, read in <edition and page>\"");
        }
        return source;
    }
}
