/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import io.shieldmath.shield.model.ValidityNote;
import java.io.BufferedWriter;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;

/**
 * Results written to standard output as they are computed, in CSV or JSON, through a writer
 * whose failures are reported, never swallowed.
 *
 * <p>A full disk, a closed descriptor or a reader that went away ({@code | head -1}) makes the
 * next write or flush fail; that failure becomes a {@link CommandFailure} with exit code
 * {@link BatchCommand#OUTPUT_ERROR}, so the command stops computing at once. Output is
 * buffered ({@value #BUFFER_CHARS} characters), so at most one buffer of results is computed
 * after the reader has gone. A {@link PrintStream} target, which records errors instead of
 * throwing them, is asked {@link PrintStream#checkError()} after every block written to it.
 *
 * <p>The header (the CSV column names, or the JSON opening) is written with the first result,
 * so a command that fails before any result writes nothing. Every number is checked finite
 * before it is written.
 */
final class ResultOutput {

    /** The size of the output buffer, in characters. */
    static final int BUFFER_CHARS = 8192;

    /** The CSV header line of a planar design. */
    static final String CSV_HEADER = "frequency_hz,se_db,absorption_db,reflection_db,multiple_reflection_db";
    /** The JSON field of a result's validity notes, present only when it has some. */
    static final String NOTES_FIELD = "validity_notes";

    private final Writer writer;
    private final boolean json;
    private final boolean jsonLines;
    private final String title;
    private final String kind;
    private final String field;
    private final String[] columns;
    private long count;
    private long errors;

    /**
     * An output.
     *
     * @param out     the stream; not closed by this class
     * @param json    true for JSON, false for CSV
     * @param title   the design's title for the JSON form, or null
     * @param kind    the design's kind for the JSON form: planar, shell or axisymmetric
     * @param field   the incident field's or source's description for the JSON form
     * @param lines   for JSON: one complete object per line (JSON Lines), as a co-process needs,
     *                instead of one document that stays open until the input ends
     * @param columns the names of the values after {@code frequency_hz}: the numbers', each ending in its
     *                unit, then those of the texts (words such as {@code axial}), if any
     */
    ResultOutput(OutputStream out, boolean json, String title, String kind, String field, boolean lines,
                 String[] columns) {
        this.writer = new BufferedWriter(new OutputStreamWriter(new Checked(out), StandardCharsets.UTF_8),
                BUFFER_CHARS);
        this.json = json;
        this.jsonLines = json && lines;
        this.title = title;
        this.kind = kind;
        this.field = field;
        this.columns = columns.clone();
    }

    /**
     * Writes one result, after the header if it is the first: the numbers in the order of the
     * columns, then the texts (plain words, written as they are in CSV and as JSON strings). In
     * JSON, a result with validity notes gets the field {@code "validity_notes"}, an array of
     * objects {@code {"limit": "NOT_NEAR_FIELD", "message": "..."}} after its values; a result
     * without notes has no such field. CSV rows never carry notes (the command reports them
     * on standard error).
     */
    void write(double hz, double[] values, String[] texts, List<ValidityNote> notes) throws CommandFailure {
        for (int i = 0; i < values.length; i++) {
            finite(words(columns[i]), values[i], hz);
        }
        StringBuilder b = new StringBuilder();
        try {
            if (jsonLines) {
                header();
                writer.write(object(b, hz, values, texts, notes).append('\n').toString());
            } else if (json) {
                writer.write(count > 0 ? ",\n" : "{\n  \"design\": " + jsonString(title) + ",\n  \"kind\": "
                        + jsonString(kind) + ",\n  \"field\": " + jsonString(field) + ",\n  \"results\": [\n");
                writer.write(object(b.append("    "), hz, values, texts, notes).toString());
            } else {
                header();
                b.append(shortest(hz));
                for (double v : values) {
                    b.append(',').append(String.format(Locale.ROOT, "%.6f", v));
                }
                for (String t : texts) {
                    b.append(',').append(t);
                }
                writer.write(b.append('\n').toString());
            }
        } catch (IOException e) {
            throw failed(e);
        }
        count++;
    }

    private StringBuilder object(StringBuilder b, double hz, double[] values, String[] texts,
                                 List<ValidityNote> notes) {
        b.append("{\"frequency_hz\": ").append(shortest(hz));
        for (int i = 0; i < values.length; i++) {
            b.append(", \"").append(columns[i]).append("\": ").append(String.format(Locale.ROOT, "%.6f", values[i]));
        }
        for (int i = 0; i < texts.length; i++) {
            b.append(", \"").append(columns[values.length + i]).append("\": ").append(jsonString(texts[i]));
        }
        if (!notes.isEmpty()) {
            b.append(", \"").append(NOTES_FIELD).append("\": [");
            for (int i = 0; i < notes.size(); i++) {
                ValidityNote n = notes.get(i);
                b.append(i > 0 ? ", " : "").append("{\"limit\": ").append(jsonString(n.limit().name()))
                        .append(", \"message\": ").append(jsonString(n.message())).append('}');
            }
            b.append(']');
        }
        return b.append('}');
    }

    /** A column name in words for messages: "se_db" is the shielding effectiveness. */
    private static String words(String column) {
        return switch (column) {
            case "se_db" -> "shielding effectiveness";
            case "absorption_db" -> "absorption";
            case "reflection_db" -> "reflection";
            case "multiple_reflection_db" -> "multiple-reflection correction";
            default -> column.replace("_db", "").replace('_', ' ');
        };
    }

    /**
     * Writes the record of an input line that gave no result, so that a program waiting for
     * one answer line per input line is never left waiting: in CSV a line starting {@code #}
     * ({@code # error: standard input line 3: ...}), in JSON Lines an object
     * {@code {"line": 3, "error": "..."}}.
     *
     * @param line    the input line number, from 1
     * @param message the message, already cleaned of control characters
     */
    void error(long line, String message) throws CommandFailure {
        try {
            header();
            if (jsonLines) {
                writer.write("{\"line\": " + line + ", \"error\": " + jsonString(message) + "}\n");
            } else {
                writer.write("# error: " + message + "\n");
            }
        } catch (IOException e) {
            throw failed(e);
        }
        errors++;
    }

    /** Writes text (help, version) to {@code out} and flushes it. */
    static void text(OutputStream out, String s) throws CommandFailure {
        try {
            Writer w = new OutputStreamWriter(new Checked(out), StandardCharsets.UTF_8);
            w.write(s);
            w.flush();
        } catch (IOException e) {
            throw CommandFailure.unwritable("cannot write standard output: " + InputFiles.reason(e), e);
        }
    }

    /** The CSV header, or the JSON Lines header object, before the first record. */
    private void header() throws IOException {
        if (count > 0 || errors > 0) {
            return;
        }
        if (jsonLines) {
            writer.write("{\"design\": " + jsonString(title) + ", \"kind\": " + jsonString(kind) + ", \"field\": "
                    + jsonString(field) + "}\n");
        } else if (!json) {
            writer.write("frequency_hz," + String.join(",", columns));
            writer.write('\n');
        }
    }

    /** The number of results written so far (some may still be in the buffer). */
    long count() {
        return count;
    }

    /** Writes the end of the document (JSON) and flushes. */
    void finish() throws CommandFailure {
        try {
            if (json && !jsonLines && count > 0) {
                writer.write("\n  ]\n}\n");
            }
        } catch (IOException e) {
            throw failed(e);
        }
        flush();
    }

    /** Writes out everything buffered. */
    void flush() throws CommandFailure {
        try {
            writer.flush();
        } catch (IOException e) {
            throw failed(e);
        }
    }

    private CommandFailure failed(IOException e) {
        return CommandFailure.unwritable("cannot write standard output: " + InputFiles.reason(e)
                + "; stopped after " + count + (count == 1 ? " result" : " results"), e);
    }

    private static double finite(String what, double value, double hz) throws CommandFailure {
        if (!Double.isFinite(value)) {
            throw CommandFailure.badInput("the design's " + what + " at " + shortest(hz) + " Hz is " + value
                    + ", not a finite number of dB; nothing more is computed", null);
        }
        return value;
    }

    /** The shortest text that reads back to the same double, with a lower-case exponent. */
    static String shortest(double v) {
        return Double.toString(v).replace("E", "e");
    }

    /** A JSON string literal. */
    static String jsonString(String s) {
        StringBuilder b = new StringBuilder("\"");
        for (char c : (s == null ? "" : s).toCharArray()) {
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20 || c == 0x7F || c == '\u2028' || c == '\u2029') {
                        b.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }

    /** Passes writes on and turns a {@link PrintStream}'s recorded error into an exception. */
    private static final class Checked extends FilterOutputStream {

        Checked(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
            check();
        }

        @Override
        public void write(int b) throws IOException {
            out.write(b);
            check();
        }

        @Override
        public void flush() throws IOException {
            out.flush();
            check();
        }

        @Override
        public void close() throws IOException {
            flush();
        }

        private void check() throws IOException {
            if (out instanceof PrintStream p && p.checkError()) {
                throw new IOException("write error");
            }
        }
    }
}
