/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

/**
 * Thrown when a catalogue or design file cannot be accepted: malformed JSON, a document
 * over the size or nesting limits, an unknown or missing field, a value of the wrong
 * type, a quantity without a unit, an unphysical value, a duplicate or unknown material
 * identifier. It is the only exception the readers throw for bad content, and nothing is
 * loaded when it is thrown.
 *
 * <p>The message reads {@code "$.materials[2].density.value (line 31, column 18): ..."};
 * the parts are available separately. Lines and columns count from 1.
 */
public final class MaterialFileException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** The JSON path of the offending value. */
    private final String path;
    /** The line of the offending value, from 1. */
    private final int line;
    /** The column of the offending value, from 1. */
    private final int column;
    /** What is wrong, in words. */
    private final String problem;

    /**
     * Creates an exception.
     *
     * @param path    the JSON path of the offending value, such as {@code "$.layers[0].thickness"}
     * @param line    the line of the value, 1 or more
     * @param column  the column of the value, 1 or more
     * @param problem what is wrong, in words
     * @param cause   the underlying exception, or null
     */
    public MaterialFileException(String path, int line, int column, String problem, Throwable cause) {
        super(path + " (line " + line + ", column " + column + "): " + problem, cause);
        this.path = path;
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    /**
     * The JSON path of the offending value, {@code "$"} for the whole document.
     *
     * @return for example {@code "$.materials[2].density.value"}
     */
    public String path() {
        return path;
    }

    /**
     * The line of the offending value.
     *
     * @return 1 or more
     */
    public int line() {
        return line;
    }

    /**
     * The column of the offending value.
     *
     * @return 1 or more
     */
    public int column() {
        return column;
    }

    /**
     * What is wrong, without the location.
     *
     * @return the problem in words
     */
    public String problem() {
        return problem;
    }
}
