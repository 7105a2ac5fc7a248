/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

/**
 * Ends the command: a message for standard error and the exit code that goes with it
 * (one of {@link BatchCommand}'s constants). The message may hold raw input; it is cleaned
 * by {@link Messages#clean(String)} when printed.
 */
final class CommandFailure extends Exception {

    private static final long serialVersionUID = 1L;

    /** The exit code. */
    private final int exitCode;

    CommandFailure(int exitCode, String message, Throwable cause) {
        super(message, cause);
        this.exitCode = exitCode;
    }

    /** The command line is wrong: exit {@value BatchCommand#USAGE}, with the usage text. */
    static CommandFailure usage(String message) {
        return new CommandFailure(BatchCommand.USAGE, message, null);
    }

    /** A design or catalogue file or an input line is wrong, or cannot be evaluated. */
    static CommandFailure badInput(String message, Throwable cause) {
        return new CommandFailure(BatchCommand.BAD_INPUT, message, cause);
    }

    /** A file or standard input cannot be read. */
    static CommandFailure unreadable(String message, Throwable cause) {
        return new CommandFailure(BatchCommand.IO_ERROR, message, cause);
    }

    /** Standard output cannot be written. */
    static CommandFailure unwritable(String message, Throwable cause) {
        return new CommandFailure(BatchCommand.OUTPUT_ERROR, message, cause);
    }

    /** The exit code for this failure. */
    int exitCode() {
        return exitCode;
    }
}
