/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.util.Set;

/**
 * The command line, read and checked before any file is touched. Every mistake is a
 * {@link CommandFailure#usage(String)} naming the option.
 *
 * @param design    the design file name, never null
 * @param catalogue the extra catalogue file name, or null
 * @param band      the {@code --band} text, or null
 * @param points    the {@code --points} value, 1 to {@link BatchCommand#MAX_POINTS}, or 0 if not given
 * @param stdin     whether frequencies come from standard input
 * @param json      true for JSON output, false for CSV
 */
record Options(String design, String catalogue, String band, int points, boolean stdin, boolean json) {

    /** The options; a value after an option may not be one of them. */
    static final Set<String> NAMES = Set.of("--design", "--catalogue", "--band", "--points", "--stdin", "--format");

    /**
     * Reads the command line.
     *
     * @param args the arguments
     * @return the options
     * @throws CommandFailure (usage) for an unknown, repeated or incomplete option, a bad
     *                        value or a forbidden combination
     */
    static Options parse(String[] args) throws CommandFailure {
        String design = null;
        String catalogue = null;
        String band = null;
        String pointsText = null;
        boolean stdin = false;
        String format = null;
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            if (a == null || !NAMES.contains(a)) {
                throw CommandFailure.usage("unknown option " + Messages.quote(String.valueOf(a)));
            }
            if (a.equals("--stdin")) {
                if (stdin) {
                    throw CommandFailure.usage("--stdin is given twice");
                }
                stdin = true;
                continue;
            }
            if (i + 1 == args.length) {
                throw CommandFailure.usage(a + " needs a value");
            }
            String v = args[++i];
            if (v == null || NAMES.contains(v)) {
                throw CommandFailure.usage(a + " needs a value before " + v);
            }
            boolean repeated = switch (a) {
                case "--design" -> design != null;
                case "--catalogue" -> catalogue != null;
                case "--band" -> band != null;
                case "--points" -> pointsText != null;
                default -> format != null;
            };
            if (repeated) {
                throw CommandFailure.usage(a + " is given twice");
            }
            switch (a) {
                case "--design" -> design = v;
                case "--catalogue" -> catalogue = v;
                case "--band" -> band = v;
                case "--points" -> pointsText = v;
                default -> format = v;
            }
        }
        if (design == null) {
            throw CommandFailure.usage("--design FILE is required");
        }
        if (format != null && !format.equals("csv") && !format.equals("json")) {
            throw CommandFailure.usage("--format is csv or json; got " + Messages.quote(format));
        }
        if (stdin && (band != null || pointsText != null)) {
            throw CommandFailure.usage("give either --stdin or --band/--points, not both");
        }
        if (band != null && band.length() > BatchCommand.MAX_LINE_CHARS) {
            throw CommandFailure.usage("--band: " + Messages.quote(band) + " is longer than "
                    + BatchCommand.MAX_LINE_CHARS + " characters; give a band such as \"10 Hz to 100 kHz\"");
        }
        int points = pointsText == null ? 0 : points(pointsText);
        return new Options(design, catalogue, band, points, stdin, "json".equals(format));
    }

    private static int points(String text) throws CommandFailure {
        String problem = "--points takes a whole number from 1 to " + BatchCommand.MAX_POINTS + "; got "
                + Messages.quote(text);
        // At most 6 ASCII digits: no sign, no exponent, nothing Integer.parseInt would take beyond them.
        if (text.isEmpty() || text.length() > 6) {
            throw CommandFailure.usage(problem);
        }
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c < '0' || c > '9') {
                throw CommandFailure.usage(problem);
            }
        }
        int n = Integer.parseInt(text);
        if (n < 1 || n > BatchCommand.MAX_POINTS) {
            throw CommandFailure.usage(problem);
        }
        return n;
    }
}
