/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.internal;

import io.shieldmath.shield.materials.files.MaterialFileException;

import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.StreamReadConstraints;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.JacksonIOException;
import tools.jackson.core.json.JsonFactory;

/**
 * A JSON value with its path and its line and column in the document, read with
 * Jackson's streaming parser so that every later validation error can say where it is.
 * Plain data only: objects, arrays, strings, numbers (kept as their text), booleans and
 * null; no type information is ever taken from the document.
 *
 * <p>Limits (Jackson {@link StreamReadConstraints} plus the checks here): document
 * {@value #MAX_DOCUMENT_CHARS} characters, counted after decoding for strings, streams
 * and files alike (UTF-16 code units, as {@link String#length()} counts), nesting depth {@value #MAX_DEPTH}, strings
 * {@value #MAX_STRING} characters, numbers {@value #MAX_NUMBER} digits, field names
 * {@value #MAX_NAME} characters. Duplicate field names are rejected.
 *
 * <p>Immutable once read.
 */
public final class Node {

    /** Deepest nesting. */
    public static final int MAX_DEPTH = 32;
    /** Longest document, in UTF-16 code units. */
    public static final long MAX_DOCUMENT_CHARS = 4_000_000;
    /** Longest string. */
    public static final int MAX_STRING = 100_000;
    /** Most digits of a number. */
    public static final int MAX_NUMBER = 64;
    /** Longest field name. */
    public static final int MAX_NAME = 200;

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder()
                    .maxNestingDepth(MAX_DEPTH)
                    .maxDocumentLength(MAX_DOCUMENT_CHARS)
                    .maxStringLength(MAX_STRING)
                    .maxNumberLength(MAX_NUMBER)
                    .maxNameLength(MAX_NAME)
                    .maxTokenCount(1_000_000)
                    .build())
            .disable(StreamReadFeature.AUTO_CLOSE_SOURCE)
            .build();

    /** The JSON value types. */
    public enum Type {
        /** An object. */
        OBJECT("an object"),
        /** An array. */
        ARRAY("an array"),
        /** A string. */
        STRING("a text value"),
        /** A number, kept as its text. */
        NUMBER("a number"),
        /** true or false. */
        BOOLEAN("true or false"),
        /** null. */
        NULL("null");

        final String words;

        Type(String words) {
            this.words = words;
        }
    }

    /** The type. */
    public final Type type;
    /** The JSON path, such as {@code $.layers[0].thickness}. */
    public final String path;
    /** The line, from 1. */
    public final int line;
    /** The column, from 1. */
    public final int column;
    /** String value or number text; null for objects, arrays and null. */
    public final String text;
    /** The fields of an object, else null. */
    public final Map<String, Node> fields;
    /** The items of an array, else null. */
    public final List<Node> items;

    /**
     * The document's quantities whose text differs from their default written form: from the
     * JSON path to the default text and the text as given.
     */
    private final Map<String, Map.Entry<String, String>> spelled;

    private Node(Type type, String path, int line, int column, String text, Map<String, Node> fields,
                 List<Node> items, Map<String, Map.Entry<String, String>> spelled) {
        this.spelled = spelled;
        this.type = type;
        this.path = path;
        this.line = line;
        this.column = column;
        this.text = text;
        this.fields = fields;
        this.items = items;
    }

    // ---------------------------------------------------------------- reading

    /**
     * Reads a document given as text. The limit is {@value #MAX_DOCUMENT_CHARS} characters
     * (UTF-16 code units), the same rule as for streams; a leading byte-order mark is skipped.
     *
     * @param json the document
     * @return the root value
     * @throws MaterialFileException if it is not valid JSON or over a limit
     */
    public static Node parse(String json) {
        if (json.length() > MAX_DOCUMENT_CHARS) {
            throw tooLong(json.length());
        }
        String text = json.startsWith("\ufeff") ? json.substring(1) : json;
        return read(() -> FACTORY.createParser(ObjectReadContext.empty(), text));
    }

    /**
     * Reads a document from a stream: at most 4 × {@value #MAX_DOCUMENT_CHARS} bytes are read
     * (no character takes more than 4 bytes in any of the encodings), the encoding is detected
     * (UTF-8, UTF-16 or UTF-32, with or without a byte-order mark; RFC 8259 section 8.1 and
     * RFC 4627 section 3), the bytes are decoded strictly (a malformed sequence is refused
     * with its line and column), and the text is then read as by {@link #parse(String)}, so
     * the size limit and the columns are the same as for a string.
     *
     * @param in the stream, not closed
     * @return the root value
     * @throws MaterialFileException if it is not valid JSON or over a limit
     * @throws UncheckedIOException if reading fails
     */
    public static Node parse(InputStream in) {
        return parse(text(in));
    }

    /**
     * The text of a document in a stream, read and decoded as {@link #parse(InputStream)} does.
     *
     * @param in the stream, not closed
     * @return the text
     * @throws MaterialFileException if it is too long or not validly encoded
     * @throws UncheckedIOException if reading fails
     */
    public static String text(InputStream in) {
        byte[] bytes;
        try {
            bytes = in.readNBytes((int) (4 * MAX_DOCUMENT_CHARS + 4));
            if (bytes.length == 4 * MAX_DOCUMENT_CHARS + 4 && in.read() >= 0) {
                throw tooLong(-1);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return decode(bytes);
    }

    private static MaterialFileException tooLong(long chars) {
        return new MaterialFileException("$", 1, 1, "the document is longer than " + MAX_DOCUMENT_CHARS
                + " characters" + (chars > 0 ? " (" + chars + ")" : ""), null);
    }

    /**
     * Detects the encoding of a JSON document and decodes it strictly.
     *
     * @param b the bytes
     * @return the text
     * @throws MaterialFileException if a byte sequence is malformed or the text is too long
     */
    public static String decode(byte[] b) {
        int n = b.length;
        java.nio.charset.Charset cs = java.nio.charset.StandardCharsets.UTF_8;
        int skip = 0;
        if (n >= 4 && b[0] == 0 && b[1] == 0 && (b[2] & 0xff) == 0xfe && (b[3] & 0xff) == 0xff) {
            cs = java.nio.charset.Charset.forName("UTF-32BE");
            skip = 4;
        } else if (n >= 4 && (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe && b[2] == 0 && b[3] == 0) {
            cs = java.nio.charset.Charset.forName("UTF-32LE");
            skip = 4;
        } else if (n >= 3 && (b[0] & 0xff) == 0xef && (b[1] & 0xff) == 0xbb && (b[2] & 0xff) == 0xbf) {
            skip = 3;
        } else if (n >= 2 && (b[0] & 0xff) == 0xfe && (b[1] & 0xff) == 0xff) {
            cs = java.nio.charset.StandardCharsets.UTF_16BE;
            skip = 2;
        } else if (n >= 2 && (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe) {
            cs = java.nio.charset.StandardCharsets.UTF_16LE;
            skip = 2;
        } else if (n >= 4 && b[0] == 0 && b[1] == 0 && b[2] == 0 && b[3] != 0) {
            cs = java.nio.charset.Charset.forName("UTF-32BE");
        } else if (n >= 4 && b[0] != 0 && b[1] == 0 && b[2] == 0 && b[3] == 0) {
            cs = java.nio.charset.Charset.forName("UTF-32LE");
        } else if (n >= 2 && b[0] == 0 && b[1] != 0) {
            cs = java.nio.charset.StandardCharsets.UTF_16BE;
        } else if (n >= 2 && b[0] != 0 && b[1] == 0) {
            cs = java.nio.charset.StandardCharsets.UTF_16LE;
        }
        java.nio.charset.CharsetDecoder d = cs.newDecoder()
                .onMalformedInput(java.nio.charset.CodingErrorAction.REPORT)
                .onUnmappableCharacter(java.nio.charset.CodingErrorAction.REPORT);
        java.nio.ByteBuffer input = java.nio.ByteBuffer.wrap(b, skip, n - skip);
        java.nio.CharBuffer out = java.nio.CharBuffer.allocate(n - skip + 1);
        java.nio.charset.CoderResult r = d.decode(input, out, true);
        if (!r.isError()) {
            r = d.flush(out);
        }
        if (r.isError()) {
            out.flip();
            int line = 1;
            int column = 1;
            for (int i = 0; i < out.limit(); i++) {
                if (out.get(i) == '\n') {
                    line++;
                    column = 1;
                } else {
                    column++;
                }
            }
            throw new MaterialFileException("$", line, column, "not valid JSON: malformed " + cs.name()
                    + " byte sequence at byte " + input.position(), null);
        }
        out.flip();
        if (out.length() > MAX_DOCUMENT_CHARS) {
            throw tooLong(out.length());
        }
        return out.toString();
    }

    private interface ParserSource {
        JsonParser open();
    }

    private static Node read(ParserSource source) {
        State s = new State();
        try (JsonParser p = source.open()) {
            s.parser = p;
            JsonToken t = s.next();
            if (t == null) {
                throw new MaterialFileException("$", 1, 1, "the document is empty", null);
            }
            Node root = s.value(t, "$", 1);
            if (s.next() != null) {
                throw s.error("content after the end of the document");
            }
            return root;
        } catch (JacksonIOException e) {
            IOException io = e.getCause() != null ? e.getCause() : new IOException(e.getOriginalMessage(), e);
            throw new UncheckedIOException(io);
        } catch (JacksonException e) {
            TokenStreamLocation loc = e.getLocation();
            if ((loc == null || loc.getLineNr() < 1) && s.parser != null) {
                loc = s.parser.currentLocation();
            }
            int line = loc == null || loc.getLineNr() < 1 ? 1 : loc.getLineNr();
            int column = loc == null || loc.getColumnNr() < 1 ? 1 : loc.getColumnNr();
            throw new MaterialFileException(s.path, line, column, "not valid JSON: " + firstLine(e.getOriginalMessage()), e);
        }
    }

    private static String firstLine(String m) {
        if (m == null) {
            return "unreadable";
        }
        int i = m.indexOf('\n');
        return i < 0 ? m : m.substring(0, i);
    }

    /** Parse state: the parser and the path of the value being read, for error messages. */
    private static final class State {
        JsonParser parser;
        String path = "$";
        final Map<String, Map.Entry<String, String>> spelled = new LinkedHashMap<>();

        JsonToken next() {
            return parser.nextToken();
        }

        MaterialFileException error(String problem) {
            TokenStreamLocation l = parser.currentTokenLocation();
            return new MaterialFileException(path, Math.max(1, l.getLineNr()), Math.max(1, l.getColumnNr()), problem,
                    null);
        }

        Node value(JsonToken t, String at, int depth) {
            path = at;
            if (depth > MAX_DEPTH) {
                throw error("nested more than " + MAX_DEPTH + " levels deep");
            }
            TokenStreamLocation l = parser.currentTokenLocation();
            int line = Math.max(1, l.getLineNr());
            int col = Math.max(1, l.getColumnNr());
            switch (t) {
                case START_OBJECT: {
                    Map<String, Node> map = new LinkedHashMap<>();
                    for (JsonToken k = next(); k != JsonToken.END_OBJECT; k = next()) {
                        String name = parser.currentName();
                        String child = at + "." + name;
                        path = child;
                        if (map.containsKey(name)) {
                            throw error("duplicate field \"" + name + "\"");
                        }
                        map.put(name, value(next(), child, depth + 1));
                        path = at;
                    }
                    return new Node(Type.OBJECT, at, line, col, null, Collections.unmodifiableMap(map), null, spelled);
                }
                case START_ARRAY: {
                    List<Node> list = new ArrayList<>();
                    for (JsonToken v = next(); v != JsonToken.END_ARRAY; v = next()) {
                        list.add(value(v, at + "[" + list.size() + "]", depth + 1));
                        path = at;
                    }
                    return new Node(Type.ARRAY, at, line, col, null, null, Collections.unmodifiableList(list), spelled);
                }
                case VALUE_STRING:
                    return new Node(Type.STRING, at, line, col, parser.getString(), null, null, spelled);
                case VALUE_NUMBER_INT:
                case VALUE_NUMBER_FLOAT:
                    return new Node(Type.NUMBER, at, line, col, parser.getString(), null, null, spelled);
                case VALUE_TRUE:
                case VALUE_FALSE:
                    return new Node(Type.BOOLEAN, at, line, col, Boolean.toString(t == JsonToken.VALUE_TRUE), null,
                            null, spelled);
                case VALUE_NULL:
                    return new Node(Type.NULL, at, line, col, null, null, null, spelled);
                default:
                    throw error("unexpected " + t);
            }
        }
    }

    // ---------------------------------------------------------------- validation helpers

    /**
     * An error located at this value.
     *
     * @param problem the problem in words
     * @return the exception, to throw
     */
    public MaterialFileException error(String problem) {
        return new MaterialFileException(path, line, column, problem, null);
    }

    /**
     * An error located at this value, with its cause.
     *
     * @param problem the problem in words
     * @param cause   the cause, or null
     * @return the exception, to throw
     */
    public MaterialFileException error(String problem, Throwable cause) {
        return new MaterialFileException(path, line, column, problem, cause);
    }

    private Node expect(Type t) {
        if (type != t) {
            throw error("expected " + t.words + ", found " + type.words);
        }
        return this;
    }

    /**
     * This object's fields, checking that every field name is one of {@code allowed}.
     *
     * @param allowed the allowed field names
     * @return the fields
     * @throws MaterialFileException if this is not an object or a field is unknown
     */
    public Fields object(Set<String> allowed) {
        expect(Type.OBJECT);
        for (Map.Entry<String, Node> e : fields.entrySet()) {
            if (!allowed.contains(e.getKey())) {
                throw e.getValue().error("unknown field \"" + e.getKey() + "\"; allowed here: "
                        + String.join(", ", allowed));
            }
        }
        return new Fields(this);
    }

    /**
     * This array's items, checking their number.
     *
     * @param min the fewest items
     * @param max the most items
     * @return the items
     * @throws MaterialFileException if this is not an array or the number is out of range
     */
    public List<Node> array(int min, int max) {
        expect(Type.ARRAY);
        if (items.size() < min || items.size() > max) {
            throw error("expected " + min + " to " + max + " entries, found " + items.size());
        }
        return items;
    }

    /**
     * This text value.
     *
     * @return the text
     * @throws MaterialFileException if this is not a text value
     */
    public String string() {
        return expect(Type.STRING).text;
    }

    /**
     * A text value read by a quantity parser; its exceptions become located ones.
     *
     * @param <Q>     the quantity type
     * @param parser  the parser
     * @param example an example for the message
     * @return the quantity
     * @throws MaterialFileException if this is not a text value or the parser refuses it
     */
    public <Q> Q quantity(Function<String, Q> parser, String example) {
        if (type != Type.STRING) {
            throw error("expected a text value with a unit, such as \"" + example + "\", found " + type.words);
        }
        return convert(parser, text);
    }

    /**
     * A value read by a parser, its exceptions located at this value. A quantity read here
     * whose text differs from its default written form is noted in {@link #spelled()}.
     *
     * @param <Q>    the result type
     * @param parser the parser
     * @param value  the text to read
     * @return the result
     * @throws MaterialFileException if the parser refuses the text
     */
    public <Q> Q convert(Function<String, Q> parser, String value) {
        try {
            Q q = parser.apply(value);
            String plain = QuantityText.defaultText(q);
            if (plain != null && !plain.equals(value)) {
                // Reading is single-threaded; the map is only read once the whole document is read.
                spelled.putIfAbsent(path, Map.entry(plain, value));
            }
            return q;
        } catch (IllegalArgumentException | ArithmeticException e) {
            throw error(e.getMessage(), e);
        }
    }

    /**
     * A plain number, or a text value holding one, read by the one number grammar of the
     * core ({@code Text.parseNumber}): a number that overflows or underflows to 0 is refused.
     *
     * @return the number
     * @throws MaterialFileException if this is not a number
     */
    public double number() {
        if (type != Type.NUMBER && type != Type.STRING) {
            throw error("expected a number, found " + type.words);
        }
        try {
            return Text.parseNumber("number", text, "a decimal number such as 2.1");
        } catch (InvalidQuantityException e) {
            throw error(e.getMessage(), e);
        }
    }

    /**
     * The quantities of this value's document read so far whose text differs from the form
     * {@link QuantityText#defaultText(Object)} would write: from the JSON path to that default
     * text and the text as given, so that a design read from a file is written back in the
     * user's units.
     *
     * @return an unmodifiable copy
     */
    public Map<String, Map.Entry<String, String>> spelled() {
        return Map.copyOf(spelled);
    }

    /**
     * A whole number in a range.
     *
     * @param min the smallest
     * @param max the largest
     * @return the number
     * @throws MaterialFileException if this is not a whole number in range
     */
    public int integer(int min, int max) {
        expect(Type.NUMBER);
        if (!text.matches("-?[0-9]{1,10}")) {
            throw error("expected a whole number from " + min + " to " + max + ", found " + text);
        }
        long v = Long.parseLong(text);
        if (v < min || v > max) {
            throw error("expected a whole number from " + min + " to " + max + ", found " + text);
        }
        return (int) v;
    }

    /** The fields of one JSON object, already checked against the allowed names. */
    public static final class Fields {
        /** The object. */
        public final Node node;

        /**
         * The fields of an object whose field names have been checked.
         *
         * @param node the object
         */
        public Fields(Node node) {
            this.node = node;
        }

        /**
         * A field that must be there.
         *
         * @param name the name
         * @return its value
         * @throws MaterialFileException if it is missing
         */
        public Node required(String name) {
            Node n = node.fields.get(name);
            if (n == null) {
                throw node.error("missing field \"" + name + "\"");
            }
            return n;
        }

        /**
         * A field that may be missing.
         *
         * @param name the name
         * @return its value, or null
         */
        public Node optional(String name) {
            return node.fields.get(name);
        }

        /**
         * Whether a field is there.
         *
         * @param name the name
         * @return true if it is
         */
        public boolean has(String name) {
            return node.fields.containsKey(name);
        }
    }
}
