/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesignFile;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.CatalogueFile;
import io.shieldmath.shield.materials.files.MaterialFileException;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.util.Objects;

/**
 * The {@code shield-batch} command, for instrument software and scripts: evaluates a JSON
 * design file of any kind at frequencies and prints CSV or JSON to standard output.
 *
 * <pre>
 * shield-batch --design FILE [--catalogue FILE] [--band "10 Hz to 100 kHz" --points N | --stdin]
 *              [--format csv|json]
 * </pre>
 *
 * <p>Run it with {@code java -jar shield-all.jar ...} (the shaded jar of shield-examples) or
 * {@code java -cp ... io.shieldmath.shield.cli.BatchCommand ...}.
 *
 * <p>Every kind of design file is evaluated (versions 1 to 3, read by
 * {@link WholeDesignFile}): a planar stack (columns {@code frequency_hz, se_db, absorption_db,
 * reflection_db, multiple_reflection_db}), a closed shell with its openings ({@code frequency_hz,
 * se_db}), and an axisymmetric arrangement between coils or in an applied axial or transverse
 * field ({@code frequency_hz, se_db, discretisation_estimate_db}: the insertion loss or the
 * worst shielding over the sensor region, and the change between the last two meshes; each
 * frequency is solved on its own, exactly as {@code WholeDesign.model().at(frequency)} solves
 * it, so the numbers equal the library's). In a field of either direction (design file
 * direction {@code "worst"}) the columns are {@code frequency_hz, se_db,
 * discretisation_estimate_db, axial_se_db, transverse_se_db, worse_direction}: the smaller
 * shielding, its estimate, both directions' shielding and the word {@code axial} or
 * {@code transverse} for the direction that gave the smaller (axial on a tie). Every numeric
 * column name ends in its unit. The JSON header object names the design, its kind and the
 * field or source it faces.
 *
 * <p>Once a run has taken more than about a second (finite-element solves take from a tenth of
 * a second to several seconds per frequency), a short line per frequency done goes to standard
 * error, such as {@code shield-batch: frequency 3 of 21 (2500 Hz) done, 1.4 s}, and before it, for
 * an axisymmetric design, one line per mesh of the solver's refinement (a coarse and a fine mesh,
 * more with a tolerance) with its fineness and unknowns, such as
 * {@code shield-batch: frequency 3 of 21 (2500 Hz): solving a mesh of fineness 1.00 with 64030 unknowns, 1.9 s};
 * standard output holds only the results.
 *
 * <p>Validity notes ({@link io.shieldmath.shield.model.ShieldingResult#validityNotes()}: a result
 * computed beyond, or near the edge of, the range where its model holds, such as the textbook
 * near-field impedance beyond the near field or a quasi-static shell not small against the
 * wavelength) never enter a CSV row. At the end of the run (also when it stops on an error)
 * standard error gets one line per distinct note with the frequencies where it applied, such as
 * {@code shield-batch: validity note NOT_NEAR_FIELD at 2 of 4 frequencies, from 1.0e8 Hz to 1.0e9 Hz: kr = ...};
 * notes are told apart by their limit (and, for several notes of one limit in a result, such as
 * one per opening of an enclosure, by their order), since their messages carry the numbers of
 * their frequency, and each line shows the message at the lowest such frequency. With
 * {@code --format json}, a result object with notes also has the field {@code "validity_notes"},
 * an array of {@code {"limit": "NOT_NEAR_FIELD", "message": "..."}}, the notes at that frequency
 * exactly; a result without notes has no such field.
 *
 * <p>Without {@code --band} or {@code --stdin} the design's own band and points are used;
 * {@code --points} alone uses the design's band, {@code --band} alone the design's points.
 * With {@code --stdin}, each line holds one frequency ({@code "10 kHz"}, or a plain decimal
 * number in Hz such as {@code 50000} or {@code 2.5e4}); blank lines and lines starting with
 * {@code #} are skipped, and one byte-order mark at the start is skipped. Standard input is
 * read as a stream, so the command can run as a co-process of instrument software: each
 * frequency line is answered by exactly one output line before the next is read, in bounded
 * memory, and the output is flushed whenever the command would wait for more input. The CSV
 * header (or, with {@code --format json}, a header object) comes first; JSON results are
 * then one object per line (JSON Lines). A line that is not a frequency in range, or at which
 * the design cannot be evaluated, is answered by an error record ({@code # error: standard input line 3: ...}
 * in CSV, {@code {"line": 3, "error": "..."}} in JSON) and by its message on standard error
 * with the line number, and the next line is read; the exit code at the end is
 * {@value #BAD_INPUT} if any line failed. Faults of the stream itself (not UTF-8, a line over
 * the limit, too many lines, a read error) and output failures stop the run.
 *
 * <p>{@code --help} prints the usage, the options and the exit codes; {@code --version} the
 * version the jar was built as (from the build's properties, or the jar manifest); both exit
 * with {@value #OK}. The launcher scripts {@code shield-batch} (POSIX sh) and
 * {@code shield-batch.cmd} in {@code shield-cli/src/main/bin} run the shaded jar.
 *
 * <p>Limits, each checked before anything is allocated for it: {@code --points} from 1 to
 * {@value #MAX_POINTS}; a line of standard input, and the {@code --band} text, at most
 * {@value #MAX_LINE_CHARS} characters; at most {@value #MAX_INPUT_LINES} lines of standard
 * input (blank and comment lines included). Design and catalogue files must be regular files
 * (not a directory, named pipe or device) and are limited by their reader.
 *
 * <p>Messages go to standard error, one line each, starting {@code "shield-batch: "}, with
 * the file, line or JSON path at fault. Input echoed in them is shortened to its first
 * characters and its length, and control characters are written as Java escapes such as
 * &#92;u001B, so no input can drive the terminal.
 *
 * <p>Exit codes:
 * <ul>
 *   <li>{@value #OK} ({@link #OK}): done, every result written (also after {@code --help}
 *       and {@code --version});</li>
 *   <li>{@value #USAGE} ({@link #USAGE}): the command line is wrong (unknown, repeated or
 *       incomplete option, a bad {@code --band}, {@code --points} or {@code --format}, a
 *       forbidden combination); the usage text follows the message;</li>
 *   <li>{@value #BAD_INPUT} ({@link #BAD_INPUT}): the design or catalogue file is not
 *       acceptable, a line of standard input is not a frequency in range or cannot be
 *       evaluated (with {@code --stdin} the other lines are still answered), standard input holds
 *       no frequency or is over a limit, or the design cannot be evaluated at a frequency (an
 *       arithmetic failure);</li>
 *   <li>{@value #IO_ERROR} ({@link #IO_ERROR}): a file or standard input cannot be read (no
 *       such file, not a regular file, permission denied, read error);</li>
 *   <li>{@value #OUTPUT_ERROR} ({@link #OUTPUT_ERROR}): standard output cannot be written
 *       (disk full, closed, or the reading program has gone, as with {@code | head -1}); the
 *       command stops computing at once;</li>
 *   <li>{@value #INTERNAL_ERROR} ({@link #INTERNAL_ERROR}): a fault in this program; the
 *       message names the exception.</li>
 * </ul>
 * On exit codes 3 to 5 in the middle of a run, the results already computed have been
 * written (for JSON, an unterminated document): trust the output only on exit code 0.
 *
 * <p>Not instantiable; {@link #run(String[], InputStream, OutputStream, PrintStream)} keeps no
 * state between calls and may be called from several threads with different streams.
 */
public final class BatchCommand {

    /** Exit code: done. */
    public static final int OK = 0;
    /** Exit code: the command line is wrong. */
    public static final int USAGE = 2;
    /** Exit code: the design or catalogue file, or an input line, is wrong or cannot be evaluated. */
    public static final int BAD_INPUT = 3;
    /** Exit code: a file or standard input could not be read. */
    public static final int IO_ERROR = 4;
    /** Exit code: standard output could not be written. */
    public static final int OUTPUT_ERROR = 5;
    /** Exit code: a fault in this program (an unexpected exception), reported in one line. */
    public static final int INTERNAL_ERROR = 70;

    /** The largest {@code --points}. */
    public static final int MAX_POINTS = 100_000;
    /** The most characters in one line of standard input, and in the {@code --band} text. */
    public static final int MAX_LINE_CHARS = 1000;
    /** The most lines read from standard input in one run. */
    public static final long MAX_INPUT_LINES = 10_000_000L;

    /** The command's name, at the start of every message. */
    static final String NAME = "shield-batch";

    private static final String USAGE_TEXT = "usage: shield-batch --design FILE [--catalogue FILE] "
            + "[--band \"10 Hz to 100 kHz\" --points N | --stdin] [--format csv|json]";

    private static final String HELP_TEXT = USAGE_TEXT + "\n       shield-batch --help | --version\n\n"
            + "Evaluates a shield design file (JSON) of any kind (planar stack, closed shell, axisymmetric\n"
            + "arrangement) at frequencies and writes CSV or JSON on standard output, units in the column\n"
            + "names; a design in a field of either direction (\"worst\") also names the worse direction.\n"
            + "A run longer than about a second reports on standard error each frequency done, and each mesh\n"
            + "the solver refines it on. Validity notes (results beyond or near their model's limits) are\n"
            + "summarised on standard error after the run, one line per note with its frequencies; in JSON\n"
            + "each result with notes also has \"validity_notes\". CSV rows never carry notes.\n\n"
            + "  --design FILE     the design file (\"format\": \"shield-design\")\n"
            + "  --catalogue FILE  a catalogue file whose materials extend the built-in ones\n"
            + "  --band TEXT       a band such as \"10 Hz to 100 kHz\" (default: the design's)\n"
            + "  --points N        log-spaced points over the band, 1 to " + MAX_POINTS + " (default: the design's)\n"
            + "  --stdin           one frequency per input line (\"10 kHz\" or Hz as 50000); each line is\n"
            + "                    answered by one output line, flushed, before the next is read; a bad line\n"
            + "                    gets an error record (\"# error: standard input line N: ...\" or {\"line\": N, \"error\": ...})\n"
            + "                    and its message on standard error, and the run goes on\n"
            + "  --format FORMAT   csv (default) or json (with --stdin: one JSON object per line)\n"
            + "  --help            this text\n"
            + "  --version         the version\n\n"
            + "Exit codes: 0 done; 2 bad command line; 3 bad design, catalogue or input line (with --stdin:\n"
            + "some line failed); 4 a file or standard input cannot be read; 5 standard output cannot be\n"
            + "written; 70 a fault in this program.\n";

    /**
     * The version of this command, from the build's properties packed beside the class, or
     * {@code "unknown"} when they are missing.
     */
    static String version() {
        try (InputStream in = BatchCommand.class.getResourceAsStream("shield-cli.properties")) {
            if (in != null) {
                java.util.Properties p = new java.util.Properties();
                p.load(in);
                String v = p.getProperty("version");
                if (v != null && !v.isBlank() && !v.startsWith("$")) {
                    return v.strip();
                }
            }
        } catch (IOException e) {
            // Fall back to the manifest.
        }
        String v = BatchCommand.class.getPackage().getImplementationVersion();
        return v != null ? v : "unknown";
    }

    private BatchCommand() {
    }

    /**
     * Runs the command on the process's standard streams and exits with its exit code.
     * Standard output is written through its file descriptor, so that a write failure is seen
     * (through {@link System#out} it would be recorded and ignored).
     *
     * @param args the command line
     */
    public static void main(String[] args) {
        int code = run(args, System.in, new FileOutputStream(FileDescriptor.out), System.err);
        System.err.flush();
        System.exit(code);
    }

    /**
     * Runs the command. Nothing is closed; {@code out} is flushed. A {@link PrintStream} given
     * as {@code out} is asked {@link PrintStream#checkError()} after each block written, so its
     * failures count too.
     *
     * @param args the command line, not null
     * @param in   standard input, read only with {@code --stdin}, not null
     * @param out  standard output, for results, not null
     * @param err  standard error, for messages, not null
     * @return the exit code, one of {@link #OK}, {@link #USAGE}, {@link #BAD_INPUT},
     *         {@link #IO_ERROR}, {@link #OUTPUT_ERROR} and {@link #INTERNAL_ERROR}
     * @throws NullPointerException if an argument is null
     */
    public static int run(String[] args, InputStream in, OutputStream out, PrintStream err) {
        return run(args, in, out, err, Progress.AFTER_NANOS);
    }

    /** {@link #run(String[], InputStream, OutputStream, PrintStream)} with progress lines after {@code progressAfterNanos}. */
    static int run(String[] args, InputStream in, OutputStream out, PrintStream err, long progressAfterNanos) {
        Objects.requireNonNull(args, "args");
        Objects.requireNonNull(in, "in");
        Objects.requireNonNull(out, "out");
        Objects.requireNonNull(err, "err");
        try {
            if (args.length == 1 && (args[0].equals("--help") || args[0].equals("--version"))) {
                ResultOutput.text(out, args[0].equals("--help") ? HELP_TEXT : NAME + " " + version() + "\n");
                return OK;
            }
            execute(Options.parse(args), in, out, err, progressAfterNanos);
            return OK;
        } catch (CommandFailure f) {
            if (f.getMessage() == null) {
                // Every failed line has been reported already.
                return f.exitCode();
            }
            err.println(NAME + ": " + Messages.clean(f.getMessage()));
            if (f.exitCode() == USAGE) {
                err.println(USAGE_TEXT);
            }
            return f.exitCode();
        } catch (RuntimeException e) {
            err.println(NAME + ": internal error, please report it: " + Messages.clean(e.toString()));
            return INTERNAL_ERROR;
        }
    }

    private static void execute(Options o, InputStream in, OutputStream out, PrintStream err, long progressAfter)
            throws CommandFailure {
        FrequencyBand band = o.band() == null ? null : band(o.band());
        WholeDesign design = readDesign(o);
        DesignEvaluation evaluation;
        try {
            evaluation = DesignEvaluation.of(design);
        } catch (IllegalArgumentException e) {
            throw CommandFailure.badInput("design file " + Messages.fileName(o.design()) + ": " + e.getMessage(), e);
        }
        if (band != null) {
            checkBand(o.band(), band, evaluation);
        }
        ResultOutput output = new ResultOutput(out, o.json(), design.title(), evaluation.kind(), evaluation.field(),
                o.stdin(), evaluation.columns());
        Progress progress = new Progress(err, progressAfter);
        NoteSummary notes = new NoteSummary();
        try {
            if (o.stdin()) {
                fromStandardInput(evaluation, new LineInput(in, output::flush), output, err, progress, notes);
            } else {
                FrequencyBand b = band != null ? band : design.band();
                int points = o.points() > 0 ? o.points() : design.points();
                double[] all = b.logSpacedHertz(points);
                for (int i = 0; i < all.length; i++) {
                    String what = "frequency " + (i + 1) + " of " + all.length;
                    double hz = all[i];
                    DesignEvaluation.Row row = evaluation.row(hz, (q, n) -> progress.mesh(what, hz, q, n));
                    output.write(all[i], row.values(), row.texts(), row.notes());
                    notes.add(all[i], row.notes());
                    progress.done(what, hz);
                }
            }
            output.finish();
        } catch (CommandFailure f) {
            if (f.exitCode() != OUTPUT_ERROR) {
                flushQuietly(output);
            }
            notes.report(err);
            throw f;
        }
        notes.report(err);
    }

    /**
     * Answers standard input line by line. A line that is not a frequency in range, or at which
     * the design cannot be evaluated, gets its message on standard error and an error record on
     * standard output, and the next line is read; at the end, any such line makes the exit code
     * {@value #BAD_INPUT}. Faults of the stream itself (not UTF-8, an over-long line, too many
     * lines, a read error) and output failures stop the run.
     */
    private static void fromStandardInput(DesignEvaluation evaluation, LineInput lines, ResultOutput output,
            PrintStream err, Progress progress, NoteSummary notes) throws CommandFailure {
        long failed = 0;
        String line;
        while ((line = lines.next()) != null) {
            String s = line.strip();
            if (s.isEmpty() || s.startsWith("#")) {
                continue;
            }
            double hz;
            DesignEvaluation.Row result;
            try {
                hz = frequencyHertz(s, evaluation.lowHz(), evaluation.highHz());
                String what = "standard input line " + lines.lineNumber();
                double at = hz;
                result = evaluation.row(hz, (q, n) -> progress.mesh(what, at, q, n));
            } catch (CommandFailure f) {
                if (f.exitCode() != BAD_INPUT) {
                    throw f;
                }
                String message = Messages.clean("standard input line " + lines.lineNumber() + ": "
                        + f.getMessage());
                err.println(NAME + ": " + message);
                err.flush();
                output.error(lines.lineNumber(), message);
                failed++;
                continue;
            }
            output.write(hz, result.values(), result.texts(), result.notes());
            notes.add(hz, result.notes());
            progress.done("standard input line " + lines.lineNumber(), hz);
        }
        if (failed > 0) {
            output.finish();
            throw new CommandFailure(BAD_INPUT, null, null);
        }
        if (output.count() == 0) {
            throw CommandFailure.badInput("no frequencies on standard input", null);
        }
    }

    /**
     * A frequency in Hz from one line of input: a plain decimal number in Hz, or a number and a
     * unit as {@link Frequency#parse(CharSequence)} reads them; within the design's range.
     */
    static double frequencyHertz(String s) throws CommandFailure {
        return frequencyHertz(s, LOWEST_HZ, HIGHEST_HZ);
    }

    /** {@link #frequencyHertz(String)} within a design's own range. */
    static double frequencyHertz(String s, double lowHz, double highHz) throws CommandFailure {
        double hz;
        if (plainNumber(s)) {
            try {
                hz = Double.parseDouble(s);
            } catch (NumberFormatException e) {
                throw CommandFailure.badInput("frequency: cannot read " + Messages.quote(s)
                        + " as a number in Hz; expected for example 50000, 2.5e4 or \"25 kHz\"", e);
            }
        } else {
            try {
                hz = Frequency.parse(s).toHertz();
            } catch (InvalidQuantityException e) {
                // Say what was read when the library's message names only the value it made of it.
                String m = e.getMessage();
                throw CommandFailure.badInput(m.contains(s) ? m : m + " (read from " + Messages.quote(s) + ")", e);
            }
        }
        if (!(hz >= lowHz && hz <= highHz)) {
            throw CommandFailure.badInput("frequency: " + Messages.quote(s) + " is out of range; allowed: "
                    + range(lowHz, highHz), null);
        }
        return hz;
    }

    /**
     * Whether a line is meant as a plain number in Hz: it starts like a number and holds only
     * digits, signs, points and exponent letters, so {@link Double#parseDouble(String)} cannot
     * take a hexadecimal form, {@code NaN}, {@code Infinity}, a type suffix or white space.
     */
    private static boolean plainNumber(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean digit = c >= '0' && c <= '9';
            if (!(digit || c == '+' || c == '-' || c == '.' || (i > 0 && (c == 'e' || c == 'E')))) {
                return false;
            }
        }
        return true;
    }

    /** The range any design accepts at most (the planar model's), checked before the design is read. */
    private static final double LOWEST_HZ = io.shieldmath.shield.planar.PlanarEvaluation.MIN_HERTZ;
    private static final double HIGHEST_HZ = io.shieldmath.shield.planar.PlanarEvaluation.MAX_HERTZ;

    /** A range of frequencies in words. */
    private static String range(double lowHz, double highHz) {
        return "from " + ResultOutput.shortest(lowHz) + " Hz to " + ResultOutput.shortest(highHz) + " Hz";
    }

    private static FrequencyBand band(String text) throws CommandFailure {
        FrequencyBand b;
        try {
            b = FrequencyBand.parse(text);
        } catch (IllegalArgumentException e) {
            throw CommandFailure.usage("--band: " + e.getMessage());
        }
        double low = b.low().toHertz();
        double high = b.high().toHertz();
        if (!(low >= LOWEST_HZ && high <= HIGHEST_HZ)) {
            throw CommandFailure.usage("--band: the " + (low < LOWEST_HZ ? "lower" : "upper")
                    + " end of " + Messages.quote(text) + " is out of range; allowed: " + range(LOWEST_HZ, HIGHEST_HZ));
        }
        return b;
    }

    /** The {@code --band} against the frequencies this design accepts (a finite body's quasi-static limit). */
    private static void checkBand(String text, FrequencyBand b, DesignEvaluation evaluation) throws CommandFailure {
        double low = b.low().toHertz();
        double high = b.high().toHertz();
        if (!(low >= evaluation.lowHz() && high <= evaluation.highHz())) {
            throw CommandFailure.usage("--band: the " + (low < evaluation.lowHz() ? "lower" : "upper") + " end of "
                    + Messages.quote(text) + " is out of range for this " + evaluation.kind() + " design; allowed: "
                    + range(evaluation.lowHz(), evaluation.highHz()));
        }
    }

    private static WholeDesign readDesign(Options o) throws CommandFailure {
        Catalogue catalogue = Catalogue.builtIn();
        if (o.catalogue() != null) {
            String name = "catalogue file " + Messages.fileName(o.catalogue());
            try (InputStream in = InputFiles.open("catalogue file", o.catalogue())) {
                catalogue = catalogue.extendedWith(CatalogueFile.read(in));
            } catch (MaterialFileException | IllegalArgumentException e) {
                throw CommandFailure.badInput("bad " + name + ": " + e.getMessage(), e);
            } catch (UncheckedIOException e) {
                throw CommandFailure.unreadable("cannot read " + name + ": " + InputFiles.reason(e.getCause()), e);
            } catch (IOException e) {
                throw CommandFailure.unreadable("cannot read " + name + ": " + InputFiles.reason(e), e);
            }
        }
        String name = "design file " + Messages.fileName(o.design());
        try (InputStream in = InputFiles.open("design file", o.design())) {
            return WholeDesignFile.read(in, catalogue);
        } catch (MaterialFileException | IllegalArgumentException e) {
            throw CommandFailure.badInput("bad " + name + ": " + e.getMessage(), e);
        } catch (UncheckedIOException e) {
            throw CommandFailure.unreadable("cannot read " + name + ": " + InputFiles.reason(e.getCause()), e);
        } catch (IOException e) {
            throw CommandFailure.unreadable("cannot read " + name + ": " + InputFiles.reason(e), e);
        }
    }

    private static void flushQuietly(ResultOutput output) {
        try {
            output.flush();
        } catch (CommandFailure ignored) {
            // The first failure is the one reported.
        }
    }
}
