/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * Standard input as a stream of lines in bounded memory: a buffer of {@value #BUFFER_CHARS}
 * bytes, one of as many characters, and one line of at most {@link BatchCommand#MAX_LINE_CHARS}
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

    /** The size of the byte buffer and of the character buffer. */
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

    private final InputStream in;
    private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT);
    private final BeforeWait beforeWait;
    private final ByteBuffer bytes = ByteBuffer.allocate(BUFFER_CHARS).flip();
    private final char[] buffer = new char[BUFFER_CHARS];
    private final CharBuffer chars = CharBuffer.wrap(buffer);
    private final StringBuilder line = new StringBuilder();
    private int position;
    private int end;
    private boolean inputEnded;
    private boolean atEnd;
    private boolean malformed;
    private boolean atStart = true;
    private boolean skipLineFeed;
    private long lineNumber;

    LineInput(InputStream in, BeforeWait beforeWait) {
        this.in = in;
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

    /**
     * Decodes the next characters into the buffer, reading more bytes when the decoder needs
     * them. A malformed sequence is reported only after the characters before it have been
     * delivered, so that its line number is right.
     */
    private boolean fill() throws CommandFailure {
        while (true) {
            if (malformed) {
                throw CommandFailure.badInput("standard input line " + (lineNumber + 1) + ": not UTF-8 text", null);
            }
            if (atEnd) {
                return false;
            }
            chars.clear();
            CoderResult r = decoder.decode(bytes, chars, inputEnded);
            if (r.isError()) {
                malformed = true;
            } else if (inputEnded && r.isUnderflow()) {
                decoder.flush(chars);
                atEnd = true;
            }
            if (chars.position() > 0) {
                position = 0;
                end = chars.position();
                return true;
            }
            if (!malformed && !atEnd) {
                readBytes();
            }
        }
    }

    private void readBytes() throws CommandFailure {
        beforeWait.run();
        bytes.compact();
        try {
            int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
            if (n < 0) {
                inputEnded = true;
            } else {
                bytes.position(bytes.position() + n);
            }
        } catch (IOException e) {
            throw CommandFailure.unreadable("cannot read standard input: " + e.getMessage(), e);
        } finally {
            bytes.flip();
        }
    }
}
