/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.util.Locale;

/**
 * Makes text safe and short before it reaches standard error, which is often a terminal.
 *
 * <p>Everything the command prints on standard error goes through {@link #clean(String)}:
 * input echoed in a message can hold terminal escape sequences (ESC, BEL), line breaks that
 * would forge a second message, invisible bidirectional controls that reorder what the
 * reader sees, or megabytes of text. Echoed input is first shortened with
 * {@link #quote(String)}.
 */
final class Messages {

    /** Echoed input longer than this many code points is shortened; a shortened text is never longer. */
    static final int ECHO_LIMIT = 80;
    /** The number of code points kept from the start of shortened input. */
    static final int ECHO_KEPT = 40;
    /** A file name longer than this many code points is shortened. */
    static final int NAME_LIMIT = 200;
    /** The number of code points kept from each end of a shortened file name. */
    static final int NAME_KEPT = 80;
    /** A cleaned message longer than this many characters is cut, saying how much was left out. */
    static final int MESSAGE_LIMIT = 600;
    /** A run of more digits than this is shortened, keeping its first digits and its length. */
    static final int DIGIT_RUN_LIMIT = 40;
    /** The number of digits kept from the start of a shortened run. */
    static final int DIGITS_KEPT = 20;

    private Messages() {
    }

    /**
     * Input text for a message: in double quotes, shortened to its first
     * {@value #ECHO_KEPT} code points and its length when longer than {@value #ECHO_LIMIT}.
     * Control characters are left for {@link #clean(String)} to escape.
     */
    static String quote(String text) {
        return '"' + abbreviate(text) + '"';
    }

    /** The text itself, or its start and its length when longer than {@value #ECHO_LIMIT} code points. */
    static String abbreviate(String text) {
        int n = text.codePointCount(0, text.length());
        if (n <= ECHO_LIMIT) {
            return text;
        }
        return text.substring(0, text.offsetByCodePoints(0, ECHO_KEPT)) + "... (" + n + " characters)";
    }

    /**
     * A file name for a message: itself up to {@value #NAME_LIMIT} code points, else its first
     * and last {@value #NAME_KEPT} code points (the end holds the file's own name) and its length.
     */
    static String fileName(String name) {
        int n = name.codePointCount(0, name.length());
        if (n <= NAME_LIMIT) {
            return name;
        }
        return name.substring(0, name.offsetByCodePoints(0, NAME_KEPT)) + "..."
                + name.substring(name.offsetByCodePoints(name.length(), -NAME_KEPT)) + " (" + n + " characters)";
    }

    /**
     * A message made safe for a terminal, on one line: every text in double quotes longer
     * than {@value #ECHO_LIMIT} code points shortened as {@link #abbreviate(String)} does (the
     * library's exceptions quote the input they refuse), runs of more than
     * {@value #DIGIT_RUN_LIMIT} digits shortened, every control character (C0, DEL, C1), format character
     * (bidirectional controls, zero-width characters, byte-order marks), line or paragraph
     * separator and unpaired surrogate written as a Java escape (&#92;u001B; tab, line
     * feed and carriage return as {@code \t}, {@code \n}, {@code \r}); the result is cut
     * after {@value #MESSAGE_LIMIT} characters, saying how many were left out.
     */
    static String clean(String message) {
        String s = shortenDigitRuns(shortenQuoted(message == null ? "(no message)" : message));
        StringBuilder b = new StringBuilder(Math.min(s.length(), MESSAGE_LIMIT) + 32);
        for (int i = 0; i < s.length(); ) {
            int cp = s.codePointAt(i);
            int width = Character.charCount(cp);
            String piece = switch (cp) {
                case '\t' -> "\\t";
                case '\n' -> "\\n";
                case '\r' -> "\\r";
                default -> unsafe(cp) ? escape(s, i, width) : s.substring(i, i + width);
            };
            if (b.length() + piece.length() > MESSAGE_LIMIT) {
                return b.append("... (").append(s.codePointCount(i, s.length())).append(" more characters)")
                        .toString();
            }
            b.append(piece);
            i += width;
        }
        return b.toString();
    }

    private static String escape(String s, int from, int width) {
        StringBuilder b = new StringBuilder(6 * width);
        for (int k = from; k < from + width; k++) {
            b.append(String.format(Locale.ROOT, "\\u%04X", (int) s.charAt(k)));
        }
        return b.toString();
    }

    /** Whether a code point must not reach a terminal as it is. */
    static boolean unsafe(int cp) {
        int type = Character.getType(cp);
        return type == Character.CONTROL || type == Character.FORMAT || type == Character.SURROGATE
                || type == Character.LINE_SEPARATOR || type == Character.PARAGRAPH_SEPARATOR;
    }

    private static String shortenQuoted(String s) {
        StringBuilder b = null;
        int copied = 0;
        int open = s.indexOf('"');
        while (open >= 0) {
            int close = s.indexOf('"', open + 1);
            if (close < 0) {
                break;
            }
            String inside = s.substring(open + 1, close);
            String shorter = abbreviate(inside);
            if (shorter.length() < inside.length()) {
                if (b == null) {
                    b = new StringBuilder(s.length());
                }
                b.append(s, copied, open + 1).append(shorter);
                copied = close;
            }
            open = s.indexOf('"', close + 1);
        }
        return b == null ? s : b.append(s, copied, s.length()).toString();
    }

    private static String shortenDigitRuns(String s) {
        StringBuilder b = null;
        int i = 0;
        int copied = 0;
        while (i < s.length()) {
            if (!isAsciiDigit(s.charAt(i))) {
                i++;
                continue;
            }
            int start = i;
            while (i < s.length() && isAsciiDigit(s.charAt(i))) {
                i++;
            }
            if (i - start > DIGIT_RUN_LIMIT) {
                if (b == null) {
                    b = new StringBuilder(s.length());
                }
                b.append(s, copied, start + DIGITS_KEPT).append("... (").append(i - start).append(" digits)");
                copied = i;
            }
        }
        return b == null ? s : b.append(s, copied, s.length()).toString();
    }

    private static boolean isAsciiDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
