/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Reads a JMH result file ({@code -rf json}) and prints, as a Markdown table, every
 * benchmark as a multiple of the floor ({@link FloorBenchmark}) measured in the same run,
 * then the project's speed targets, each met or not met with the measured ratio:
 *
 * <ol>
 *   <li>one single-layer point within {@value #FLOOR_TARGET}× the floor;</li>
 *   <li>the 3-layer point at least {@value #COMMONS_TARGET}× faster than the Commons Math
 *       baseline;</li>
 *   <li>no allocation per point in the batch sweep: at most {@value #ALLOC_TARGET} B per
 *       point (one 16-byte object per 1 000-point call would already show as 0.016);</li>
 *   <li>the sweep scaling with threads: two threads at least {@value #SCALING_TARGET}× the
 *       points per second of one.</li>
 * </ol>
 *
 * <p>Usage: {@code java -cp benchmarks.jar io.shieldmath.shield.benchmarks.RatioTable
 * result.json [numpy-points-per-second]}. Benchmarks added later (other classes in this
 * package) appear in the table without changes here.
 */
public final class RatioTable {

    static final double FLOOR_TARGET = 2;
    static final double COMMONS_TARGET = 10;
    static final double ALLOC_TARGET = 0.01;
    static final double SCALING_TARGET = 1.7;

    private static final String PACKAGE = RatioTable.class.getPackageName() + ".";
    private static final String FLOOR = "FloorBenchmark.floor";
    private static final String FLOOR_TWO = "FloorBenchmark.floorTwoThreads";
    private static final String POINT = "PlanarPointBenchmark.shield";
    private static final String COMMONS = "PlanarPointBenchmark.commonsMath";
    private static final String SWEEP_ONE = "PlanarSweepBenchmark.sweepOneThread";
    private static final String SWEEP_TWO = "PlanarSweepBenchmark.sweepTwoThreads";

    /** One measured benchmark: its name with parameters, time per operation and allocation. */
    record Row(String name, String mode, int threads, double nanosPerOp, double errorNanos, double bytesPerOp) {
    }

    private final Map<String, Row> rows = new TreeMap<>();
    private final String jvm;

    private RatioTable(JsonNode results) {
        String vm = "";
        for (JsonNode r : results) {
            Row row = row(r);
            rows.put(row.name(), row);
            vm = r.path("vmName").asString("") + " " + r.path("jdkVersion").asString("");
        }
        jvm = vm.strip();
    }

    /**
     * Prints the table.
     *
     * @param args the JMH JSON result file, then optionally NumPy's points per second
     */
    public static void main(String[] args) {
        if (args.length < 1 || args.length > 2) {
            System.err.println("usage: RatioTable jmh-result.json [numpy-points-per-second]");
            System.exit(2);
        }
        JsonNode results = new ObjectMapper().readTree(Path.of(args[0]));
        Optional<Double> numpy = args.length == 2 && !args[1].isBlank()
                ? Optional.of(Double.parseDouble(args[1])) : Optional.empty();
        new RatioTable(results).print(System.out, numpy);
    }

    private static Row row(JsonNode r) {
        String name = r.path("benchmark").asString().replace(PACKAGE, "");
        JsonNode params = r.path("params");
        if (!params.isMissingNode() && !params.isEmpty()) {
            // Parameters in name order, so that a row's name does not depend on the JSON's order.
            Map<String, String> sorted = new TreeMap<>();
            for (Map.Entry<String, JsonNode> e : params.properties()) {
                sorted.put(e.getKey(), e.getValue().asString());
            }
            List<String> p = new ArrayList<>();
            sorted.forEach((k, v) -> p.add(k + "=" + v));
            name += " [" + String.join(", ", p) + "]";
        }
        JsonNode primary = r.path("primaryMetric");
        double score = primary.path("score").asDouble();
        double error = primary.path("scoreError").asDouble(Double.NaN);
        String unit = primary.path("scoreUnit").asString();
        int threads = r.path("threads").asInt(1);
        // Average time is per thread; throughput is summed over the threads. Both become wall
        // time per operation with all threads running.
        double perThread = unit.endsWith("/op") ? threads : 1;
        double ns = toNanosPerOp(score, unit) / perThread;
        double nsError = Double.isFinite(error)
                ? Math.abs(ns - toNanosPerOp(score + error, unit) / perThread) : Double.NaN;
        double bytes = Double.NaN;
        for (Map.Entry<String, JsonNode> e : r.path("secondaryMetrics").properties()) {
            if (e.getKey().endsWith("gc.alloc.rate.norm")) {
                bytes = e.getValue().path("score").asDouble();
            }
        }
        return new Row(name, r.path("mode").asString(), threads, ns, nsError, bytes);
    }

    /** Nanoseconds per operation from a JMH score; for throughput over several threads, wall time per operation. */
    static double toNanosPerOp(double score, String unit) {
        String[] parts = unit.split("/");
        boolean timePerOp = parts[1].equals("op");
        String timeUnit = timePerOp ? parts[0] : parts[1];
        double nanos;
        switch (timeUnit) {
            case "ns":
                nanos = 1;
                break;
            case "us":
                nanos = 1e3;
                break;
            case "ms":
                nanos = 1e6;
                break;
            case "s":
                nanos = 1e9;
                break;
            case "min":
                nanos = 60e9;
                break;
            default:
                throw new IllegalArgumentException("unknown JMH score unit " + unit);
        }
        return timePerOp ? score * nanos : nanos / score;
    }

    private Optional<Row> find(String name) {
        return Optional.ofNullable(rows.get(name));
    }

    private void print(PrintStream out, Optional<Double> numpyPointsPerSecond) {
        long memory = 0;
        if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            memory = os.getTotalMemorySize();
        }
        out.printf(Locale.ROOT, "Measured %s: %d cores, %.0f GiB, %s; one JMH run, ratios against the floor of the same run.%n%n",
                LocalDate.now(), Runtime.getRuntime().availableProcessors(), memory / (1024.0 * 1024 * 1024), jvm);
        Optional<Row> floor = find(FLOOR);
        out.println("| benchmark | threads | ns per op | × floor | B per op |");
        out.println("|---|---:|---:|---:|---:|");
        for (Row r : rows.values()) {
            out.printf(Locale.ROOT, "| %s | %d | %s | %s | %s |%n", r.name(), r.threads(), nanos(r),
                    floor.map(f -> fixed(r.nanosPerOp() / f.nanosPerOp(), 2)).orElse("n/a"), bytes(r.bytesPerOp()));
        }
        out.println();
        out.println("One op is one frequency point (the floor: one complex square root and one complex exponential), except where a "
                + "benchmark's javadoc says otherwise; rows on 2 threads give wall time per op with both threads running. "
                + "± is JMH's 99.9 % confidence interval.");
        out.println();
        out.println("| target | measured | verdict |");
        out.println("|---|---|---|");
        for (String field : new String[] {"plane-wave", "magnetic-near-field"}) {
            Optional<Row> point = find(POINT + " [field=" + field + ", layers=1]");
            target(out, "1-layer point (" + field + ") within " + fixed(FLOOR_TARGET, 0) + "× the floor",
                    ratio(point, floor), "× floor", r -> r <= FLOOR_TARGET);
        }
        for (String field : new String[] {"plane-wave", "magnetic-near-field"}) {
            Optional<Row> point = find(POINT + " [field=" + field + ", layers=3]");
            Optional<Row> commons = find(COMMONS + " [field=" + field + ", layers=3]");
            target(out, "3-layer point (" + field + ") ≥ " + fixed(COMMONS_TARGET, 0) + "× faster than Commons Math",
                    ratio(commons, point), "× faster", r -> r >= COMMONS_TARGET);
        }
        for (String sweep : new String[] {SWEEP_ONE, SWEEP_TWO}) {
            Optional<Double> b = find(sweep).map(Row::bytesPerOp).filter(Double::isFinite);
            target(out, "no allocation per point, " + sweep.replace("PlanarSweepBenchmark.", "")
                    + " (run with -prof gc)", b, "B per point", v -> v <= ALLOC_TARGET);
        }
        target(out, "sweep on 2 threads ≥ " + fixed(SCALING_TARGET, 1) + "× the points per second of 1",
                ratio(find(SWEEP_ONE), find(SWEEP_TWO)), "× on 2 threads", r -> r >= SCALING_TARGET);
        ratio(floor, find(FLOOR_TWO)).ifPresent(r -> out.printf(Locale.ROOT,
                "%nIn the same run the floor (perfectly parallel work) on 2 threads gave %s× the throughput of 1 "
                        + "thread: the scaling this machine allowed while it was measured.%n", fixed(r, 2)));
        find(SWEEP_ONE).ifPresent(s -> {
            double pps = 1e9 / s.nanosPerOp();
            out.println();
            out.printf(Locale.ROOT, "Batch API, 1 000-point 3-layer sweep on one thread: %s points per second.%n",
                    grouped(pps));
            numpyPointsPerSecond.ifPresentOrElse(
                np -> out.printf(Locale.ROOT, "NumPy, the same sweep vectorised: %s points per second (batch API %s× NumPy).%n",
                        grouped(np), fixed(pps / np, 1)),
                () -> out.println("NumPy: not measured in this run (see numpy_sweep.py)."));
        });
        printAxisymmetric(out);
    }

    /** The axisymmetric solver's targets: converged point, sweep, scaling exponent and the baseline ratio. */
    private void printAxisymmetric(PrintStream out) {
        String base = "AxisymmetricBenchmark.";
        Optional<Row> point = find(base + "convergedPoint");
        Optional<Row> sweep = find(base + "sweep20");
        if (point.isEmpty() && sweep.isEmpty()) {
            return;
        }
        out.println();
        out.println("| axisymmetric solver | measured | verdict |");
        out.println("|---|---|---|");
        point.ifPresent(r -> out.printf(Locale.ROOT, "| one frequency converged to 0.1 dB, ≤ 1 s | %.3f s | %s |%n",
                r.nanosPerOp() * 1e-9, r.nanosPerOp() <= 1e9 ? "met" : "not met"));
        sweep.ifPresent(r -> out.printf(Locale.ROOT, "| 20-frequency sweep on one mesh, ≤ 10 s | %.3f s | %s |%n",
                r.nanosPerOp() * 1e-9, r.nanosPerOp() <= 1e10 ? "met" : "not met"));
        String[] q = {"0.4", "0.5", "0.707", "1", "1.414", "2"};
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        int m = 0;
        StringBuilder scaling = new StringBuilder();
        for (String f : q) {
            Optional<Row> r = find(base + "banded [fineness=" + f + "]");
            if (r.isPresent()) {
                int n = AxisymmetricBenchmark.unknowns(Double.parseDouble(f));
                double x = Math.log(n);
                double y = Math.log(r.get().nanosPerOp());
                sx += x;
                sy += y;
                sxx += x * x;
                sxy += x * y;
                m++;
                scaling.append(String.format(Locale.ROOT, "| fineness %s: %d unknowns | %.1f ms | |%n", f, n,
                        r.get().nanosPerOp() * 1e-6));
            }
        }
        out.print(scaling);
        if (m >= 2) {
            double slope = (m * sxy - sx * sy) / (m * sxx - sx * sx);
            out.printf(Locale.ROOT, "| solve time ∝ n^p, fitted p (banded: about 2 expected, n·b² with b ∝ √n) | %.2f | |%n",
                    slope);
        }
        ratio(find(base + "baseline"), find(base + "banded [fineness=1]")).ifPresent(r -> out.printf(Locale.ROOT,
                "| shorter-side numbering against longer-side numbering (the baseline), fineness 1 | %.2f× faster | %s |%n",
                r, r > 1 ? "met" : "not met"));
        String dense = String.valueOf(AxisymmetricBenchmark.DENSE_FINENESS);
        ratio(find(base + "dense"), find(base + "banded [fineness=" + dense + "]")).ifPresent(r -> out.printf(
                Locale.ROOT, "| banded LDLᵀ against dense LDLᵀ of the same system (the baseline), fineness %s, %d unknowns"
                        + " | %.1f× faster | %s |%n", dense, AxisymmetricBenchmark.unknowns(AxisymmetricBenchmark.DENSE_FINENESS),
                r, r > 1 ? "met" : "not met"));
    }

    /** a.nanos / b.nanos: how many times slower a is than b. */
    private static Optional<Double> ratio(Optional<Row> a, Optional<Row> b) {
        return a.flatMap(x -> b.map(y -> x.nanosPerOp() / y.nanosPerOp()));
    }

    private static void target(PrintStream out, String what, Optional<Double> measured, String unit,
                               java.util.function.DoublePredicate met) {
        out.printf(Locale.ROOT, "| %s | %s | %s |%n", what,
                measured.map(v -> (unit.startsWith("B") ? bytes(v) : fixed(v, 2)) + " " + unit).orElse("not measured"),
                measured.map(v -> met.test(v) ? "met" : "**not met**").orElse("not measured in this run"));
    }

    private static String nanos(Row r) {
        String s = r.nanosPerOp() >= 100 ? fixed(r.nanosPerOp(), 0) : fixed(r.nanosPerOp(), 1);
        return Double.isFinite(r.errorNanos()) ? s + " ± " + fixed(r.errorNanos(), r.errorNanos() >= 100 ? 0 : 1) : s;
    }

    private static String bytes(double b) {
        if (!Double.isFinite(b)) {
            return "n/a";
        }
        return b < 0.001 ? "< 0.001" : fixed(b, b < 10 ? 3 : 0);
    }

    private static String fixed(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    private static String grouped(double v) {
        return String.format(Locale.ROOT, "%,.0f", v).replace(',', ' ');
    }
}
