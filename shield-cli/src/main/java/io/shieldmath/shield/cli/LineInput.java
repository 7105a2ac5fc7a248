/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * Standard input as a stream of lines in bounded memory: one buffer of
 * {@value #BUFFER_CHARS} characters and one line of at most {@link BatchCommand#MAX_LINE_CHARS}
 * characters are held, whatever the length of the input.
 *
 * <p>The input is strict UTF-8 (a malformed byte sequence is an error, never a replacement
 * character); one byte-order mark at the very start is skipped. Lines end at line feed,
 * carriage return, or both, as {@link java.io.BufferedReader} reads them; a last line
 * without a terminator counts. A line longer than the cap, and more than
 * {@link BatchCommand#MAX_INPUT_LINES} lines, are refused as soon as they are seen, without
 * reading further.
 *
 * <p>Before every read that may wait for the input, {@link BeforeWait#run()} is called: the
 * command flushes its output there, so a program that writes one frequency and waits for its
 * answer gets it, while piped bulk input is still written in large blocks.
 */
final class LineInput {

    /** The size of the character buffer. */
    static final int BUFFER_CHARS = 8192;

    /** Called before a read that may wait for input. */
    @FunctionalInterface
    interface BeforeWait {
        /**
         * Runs before the input is read.
         *
         * @throws CommandFailure if the command must stop
         */
        void run() throws CommandFailure;
    }

    private final Reader reader;
    private final BeforeWait beforeWait;
    private final char[] buffer = new char[BUFFER_CHARS];
    private final StringBuilder line = new StringBuilder();
    private int position;
    private int end;
    private boolean atEnd;
    private boolean atStart = true;
    private boolean skipLineFeed;
    private long lineNumber;

    LineInput(InputStream in, BeforeWait beforeWait) {
        this.reader = new InputStreamReader(in, StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT));
        this.beforeWait = beforeWait;
    }

    /** The number of the line last returned, from 1; 0 before the first. */
    long lineNumber() {
        return lineNumber;
    }

    /**
     * The next line without its terminator, or null at the end of the input.
     *
     * @throws CommandFailure if the input is not UTF-8, cannot be read, holds a line longer
     *                        than the cap or more lines than the cap
     */
    String next() throws CommandFailure {
        line.setLength(0);
        boolean started = false;
        while (true) {
            if (position == end && !fill()) {
                return started ? finish() : null;
            }
            char c = buffer[position++];
            if (skipLineFeed) {
                skipLineFeed = false;
                if (c == '\n') {
                    continue;
                }
            }
            if (atStart) {
                atStart = false;
                if (c == '\uFEFF') {
                    continue;
                }
            }
            if (c == '\n') {
                return finish();
            }
            if (c == '\r') {
                skipLineFeed = true;
                return finish();
            }
            started = true;
            if (line.length() == BatchCommand.MAX_LINE_CHARS) {
                throw CommandFailure.badInput("standard input line " + (lineNumber + 1) + ": longer than "
                        + BatchCommand.MAX_LINE_CHARS + " characters; it starts " + Messages.quote(start(line)), null);
            }
            line.append(c);
        }
    }

    /** The first {@value Messages#ECHO_KEPT} characters of an over-long line, for its message. */
    private static String start(CharSequence s) {
        int n = Messages.ECHO_KEPT;
        if (Character.isHighSurrogate(s.charAt(n - 1))) {
            n--;
        }
        return s.subSequence(0, n) + "...";
    }

    private String finish() throws CommandFailure {
        lineNumber++;
        if (lineNumber > BatchCommand.MAX_INPUT_LINES) {
            throw CommandFailure.badInput("standard input: more than " + BatchCommand.MAX_INPUT_LINES
                    + " lines; split the input and run the command once per part", null);
        }
        return line.toString();
    }

    private boolean fill() throws CommandFailure {
        if (atEnd) {
            return false;
        }
        beforeWait.run();
        int n;
        try {
            do {
                n = reader.read(buffer, 0, buffer.length);
            } while (n == 0);
        } catch (CharacterCodingException e) {
            throw CommandFailure.badInput("standard input line " + (lineNumber + 1) + ": not UTF-8 text", e);
        } catch (IOException e) {
            throw CommandFailure.unreadable("cannot read standard input: " + e.getMessage(), e);
        }
        if (n < 0) {
            atEnd = true;
            return false;
        }
        position = 0;
        end = n;
        return true;
    }
}
