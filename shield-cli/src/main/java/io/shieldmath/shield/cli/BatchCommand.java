/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Design;
import io.shieldmath.shield.materials.MaterialFileException;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.NoSuchFileException;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A batch command for instrument software and scripts: evaluates a JSON design file at
 * frequencies and prints CSV or JSON to standard output.
 *
 * <pre>
 * shield-batch --design FILE [--catalogue FILE] [--band "10 Hz to 100 kHz" --points N | --stdin]
 *              [--format csv|json]
 * </pre>
 *
 * <p>Without {@code --band} or {@code --stdin} the design's own band and points are used.
 * With {@code --stdin}, one frequency per line ({@code "10 kHz"}, or a plain number in Hz);
 * blank lines and lines starting with {@code #} are skipped. Errors go to standard error
 * with the offending line or JSON path; exit codes: 0 done, 2 bad command line, 3 bad
 * design file or input line, 4 file not readable.
 */
public final class BatchCommand {

    /** Exit code: done. */
    public static final int OK = 0;
    /** Exit code: the command line is wrong. */
    public static final int USAGE = 2;
    /** Exit code: the design file or an input line is wrong. */
    public static final int BAD_INPUT = 3;
    /** Exit code: a file could not be read. */
    public static final int IO_ERROR = 4;

    private static final String USAGE_TEXT = "usage: shield-batch --design FILE [--catalogue FILE] "
            + "[--band \"10 Hz to 100 kHz\" --points N | --stdin] [--format csv|json]";

    private BatchCommand() {
    }

    /**
     * Runs the command and exits with its exit code.
     *
     * @param args the command line
     */
    public static void main(String[] args) {
        System.exit(run(args, System.in, System.out, System.err));
    }

    /**
     * Runs the command.
     *
     * @param args the command line
     * @param in   standard input, read with {@code --stdin}
     * @param out  standard output, for results
     * @param err  standard error, for messages
     * @return the exit code
     */
    public static int run(String[] args, InputStream in, PrintStream out, PrintStream err) {
        String designFile = null;
        String catalogueFile = null;
        String band = null;
        Integer points = null;
        boolean stdin = false;
        String format = "csv";
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            boolean hasValue = i + 1 < args.length;
            switch (a) {
                case "--design" -> designFile = hasValue ? args[++i] : null;
                case "--catalogue" -> catalogueFile = hasValue ? args[++i] : null;
                case "--band" -> band = hasValue ? args[++i] : null;
                case "--points" -> {
                    try {
                        points = hasValue ? Integer.parseInt(args[++i]) : null;
                    } catch (NumberFormatException e) {
                        return usage(err, "--points takes a whole number from 1 to 100000; got " + args[i]);
                    }
                }
                case "--stdin" -> stdin = true;
                case "--format" -> format = hasValue ? args[++i] : null;
                default -> {
                    return usage(err, "unknown option " + a);
                }
            }
            if (!hasValue && !a.equals("--stdin")) {
                return usage(err, a + " needs a value");
            }
        }
        if (designFile == null) {
            return usage(err, "--design FILE is required");
        }
        if (!"csv".equals(format) && !"json".equals(format)) {
            return usage(err, "--format is csv or json; got " + format);
        }
        if (stdin && (band != null || points != null)) {
            return usage(err, "give either --stdin or --band/--points, not both");
        }
        if (points != null && (points < 1 || points > 100_000)) {
            return usage(err, "--points takes a whole number from 1 to 100000; got " + points);
        }
        Design design;
        try {
            Catalogue catalogue = Catalogue.builtIn();
            if (catalogueFile != null) {
                catalogue = catalogue.extendedWith(Catalogue.read(Paths.get(catalogueFile)));
            }
            design = Design.read(Paths.get(designFile), catalogue);
        } catch (MaterialFileException e) {
            err.println("shield-batch: bad file: " + e.getMessage());
            return BAD_INPUT;
        } catch (NoSuchFileException e) {
            err.println("shield-batch: no such file: " + e.getFile());
            return IO_ERROR;
        } catch (IOException e) {
            err.println("shield-batch: cannot read: " + e.getMessage());
            return IO_ERROR;
        }
        double[] hz;
        try {
            if (stdin) {
                hz = readFrequencies(in);
            } else if (band != null || points != null) {
                FrequencyBand b = band != null ? FrequencyBand.parse(band) : design.band();
                hz = b.logSpacedHertz(points != null ? points : design.points());
            } else {
                hz = design.band().logSpacedHertz(design.points());
            }
        } catch (BadLine e) {
            err.println("shield-batch: standard input line " + e.line + ": " + e.getMessage());
            return BAD_INPUT;
        } catch (InvalidQuantityException e) {
            err.println("shield-batch: --band: " + e.getMessage());
            return USAGE;
        } catch (IOException e) {
            err.println("shield-batch: cannot read standard input: " + e.getMessage());
            return IO_ERROR;
        }
        if (hz.length == 0) {
            err.println("shield-batch: no frequencies on standard input");
            return BAD_INPUT;
        }
        PlanarEvaluation eval = design.barrier().facing(design.field());
        List<PlanarResult> results = new ArrayList<>(hz.length);
        try {
            for (double f : hz) {
                results.add(eval.at(Frequency.ofHertz(f)));
            }
        } catch (InvalidQuantityException e) {
            err.println("shield-batch: " + e.getMessage());
            return BAD_INPUT;
        }
        if (format.equals("csv")) {
            out.println("frequency_hz,se_db,absorption_db,reflection_db,multiple_reflection_db");
            for (PlanarResult r : results) {
                out.println(String.format(Locale.ROOT, "%s,%.6f,%.6f,%.6f,%.6f", shortest(r.frequency().toHertz()),
                        r.totalDb(), r.absorptionDb(), r.reflectionDb(), r.multipleReflectionDb()));
            }
        } else {
            StringBuilder s = new StringBuilder("{\n  \"design\": ").append(quote(design.title()))
                    .append(",\n  \"field\": ").append(quote(design.field().toString()))
                    .append(",\n  \"results\": [");
            for (int i = 0; i < results.size(); i++) {
                PlanarResult r = results.get(i);
                s.append(i == 0 ? "\n" : ",\n").append(String.format(Locale.ROOT,
                        "    {\"frequency_hz\": %s, \"se_db\": %.6f, \"absorption_db\": %.6f, \"reflection_db\": %.6f, "
                                + "\"multiple_reflection_db\": %.6f}", shortest(r.frequency().toHertz()), r.totalDb(),
                        r.absorptionDb(), r.reflectionDb(), r.multipleReflectionDb()));
            }
            s.append("\n  ]\n}");
            out.println(s);
        }
        return OK;
    }

    private static int usage(PrintStream err, String problem) {
        err.println("shield-batch: " + problem);
        err.println(USAGE_TEXT);
        return USAGE;
    }

    /** A bad line of standard input. */
    private static final class BadLine extends Exception {
        private static final long serialVersionUID = 1L;
        final int line;

        BadLine(int line, String message) {
            super(message);
            this.line = line;
        }
    }

    private static double[] readFrequencies(InputStream in) throws IOException, BadLine {
        List<Double> list = new ArrayList<>();
        BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
        String line;
        int n = 0;
        while ((line = r.readLine()) != null) {
            n++;
            String s = line.strip();
            if (s.isEmpty() || s.startsWith("#")) {
                continue;
            }
            try {
                if (s.matches("[+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?")) {
                    list.add(Frequency.ofHertz(Double.parseDouble(s)).toHertz());
                } else {
                    list.add(Frequency.parse(s).toHertz());
                }
            } catch (InvalidQuantityException e) {
                throw new BadLine(n, e.getMessage());
            }
        }
        double[] hz = new double[list.size()];
        for (int i = 0; i < hz.length; i++) {
            hz[i] = list.get(i);
        }
        return hz;
    }

    private static String shortest(double v) {
        return Double.toString(v).replace("E", "e");
    }

    private static String quote(String s) {
        StringBuilder b = new StringBuilder("\"");
        for (char c : (s == null ? "" : s).toCharArray()) {
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }
}
