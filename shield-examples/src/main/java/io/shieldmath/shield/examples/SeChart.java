/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Frequency;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.Stroke;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A chart of shielding effectiveness against frequency (log axis) for several candidate
 * designs, with the requirement, the recommended design and, where the source changes with
 * frequency, that change marked on the plot. Written headless as PNG or SVG (SVG text stays
 * text); JFreeChart lays out the axes, every colour, stroke, font and mark is ours.
 *
 * <pre>{@code
 * SeChart.titled("Candidate shields (illustrative)")
 *         .plus(SeChart.Kind.CAN, "Ni-Fe 1 mm", hertz, canDb)
 *         .plus(SeChart.Kind.PLATE, "copper 1 mm", hertz, plateDb)
 *         .recommending(SeChart.Kind.CAN, "Ni-Fe 1 mm")
 *         .requiring(requirement)
 *         .switchingSourceAt(Frequency.ofHertz(1000), "transformer at 30 cm", "charger at 6 cm")
 *         .writeSvg(Path.of("se.svg"), 1000, 640);
 * }</pre>
 *
 * <h2>How it reads</h2>
 * <ul>
 *   <li>Colours: the project's own series palette (a lightness ladder, colour-blind safe and
 *       distinct in grey; see the colour notes in the README), in the order curves were added,
 *       repeating after eight.</li>
 *   <li>Line style by kind: a can solid, a finite plate dashed, a stack dash-dotted, an
 *       infinite-sheet estimate dotted. The recommended design is drawn twice as thick, named
 *       "recommended" in the legend and labelled on the plot.</li>
 *   <li>Requirement: a black diamond at each single frequency, exactly at that frequency
 *       (50 Hz is drawn at 50 Hz), and a black bar over the true width of each band; each is
 *       labelled with its frequency and the SE it needs.</li>
 *   <li>Grid: decades and, lighter, the 2 to 9 multiples in each decade; 10 dB steps.</li>
 *   <li>Source change: a dashed vertical line at the frequency where the source changes, the
 *       two sources named on either side, and the reason the curves of designs that see
 *       different sources step there.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe: every method that adds to the chart returns a new chart.
 */
public final class SeChart {

    /** The kind of a design, shown by its line style. */
    public enum Kind {
        /** A closed or nearly closed can: solid line. */
        CAN("can", null),
        /** A finite plate: dashed line. */
        PLATE("plate", new float[] {9f, 5f}),
        /** A stack of layers: dash-dot line. */
        STACK("stack", new float[] {10f, 4f, 2.5f, 4f}),
        /** An infinite-sheet estimate, for comparison only: dotted line. */
        SHEET("infinite sheet", new float[] {2f, 3.5f});

        private final String label;
        private final float[] dashes;

        Kind(String label, float[] dashes) {
            this.label = label;
            this.dashes = dashes;
        }

        /**
         * The word shown in the legend before a design of this kind.
         *
         * @return the label, such as "plate"
         */
        public String label() {
            return label;
        }

        /**
         * The line of this kind.
         *
         * @param width the line width in pixels
         * @return a solid or dashed stroke
         */
        Stroke stroke(float width) {
            return dashes == null ? new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
                    : new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dashes, 0f);
        }
    }

    /** The most curves a chart takes. */
    public static final int MAX_CURVES = 64;

    private static final Color PAPER = Colours.PAPER;
    private static final Color INK = Colours.INK;
    private static final Color QUIET_INK = Colours.QUIET_INK;
    private static final Color GRID = new Color(0xD5D3CE);
    private static final Color MINOR_GRID = new Color(0xECEAE5);
    private static final Color BELOW_SWITCH = new Color(0xF1EEE6);
    private static final String FONT = Font.SANS_SERIF;
    private static final float LINE = 2.0f;
    private static final float RECOMMENDED_LINE = 4.2f;

    private record Series(Kind kind, String name, double[] hertz, double[] db) {
    }

    private record Switch(double hertz, String below, String above) {
    }

    private final String title;
    private final List<Series> series;
    private final Series recommended;
    private final List<Requirement.Entry> requirement;
    private final Switch sourceSwitch;

    private SeChart(String title, List<Series> series, Series recommended, List<Requirement.Entry> requirement,
                    Switch sourceSwitch) {
        this.title = title;
        this.series = series;
        this.recommended = recommended;
        this.requirement = requirement;
        this.sourceSwitch = sourceSwitch;
    }

    /**
     * An empty chart with a title.
     *
     * @param title the title, 1 to 200 characters
     * @return the chart, without curves
     * @throws IllegalArgumentException if the title is blank or too long
     */
    public static SeChart titled(String title) {
        return new SeChart(Require.text("chart title", title, 200), List.of(), null, List.of(), null);
    }

    /**
     * This chart with one more design's curve.
     *
     * @param kind  the design's kind (line style), not null
     * @param name  the design's name for the legend, 1 to 120 characters, unique among the
     *              chart's curves of this kind
     * @param hertz the frequencies in Hz, positive, finite and ascending, at least 2
     * @param db    the SE in dB at each frequency, finite, as many as {@code hertz}
     * @return the new chart; this one is unchanged
     * @throws IllegalArgumentException if the arrays differ in length, hold fewer than 2 points,
     *                                  the frequencies do not ascend, or the name is blank, too
     *                                  long or taken
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a frequency or SE is not
     *                                  finite, or a frequency not positive
     * @throws IllegalStateException    if the chart already holds {@value #MAX_CURVES} curves
     */
    public SeChart plus(Kind kind, String name, double[] hertz, double[] db) {
        Require.nonNull("kind", kind);
        String n = Require.text("curve name", name, 120);
        Require.nonNull("frequencies", hertz);
        Require.nonNull("SE values", db);
        if (hertz.length != db.length || hertz.length < 2) {
            throw new IllegalArgumentException("curve '" + n + "' needs as many SE values as frequencies, at least 2; got "
                    + hertz.length + " frequencies and " + db.length + " SE values");
        }
        for (int i = 0; i < hertz.length; i++) {
            Require.positive("frequency of curve '" + n + "'", Require.finite("frequency of curve '" + n + "'",
                    hertz[i], "Hz"), "Hz");
            if (i > 0 && !(hertz[i] > hertz[i - 1])) {
                throw new IllegalArgumentException("the frequencies of curve '" + n + "' must ascend; "
                        + hertz[i] + " Hz follows " + hertz[i - 1] + " Hz");
            }
            Require.finite("SE of curve '" + n + "'", db[i], "dB");
        }
        if (series.size() >= MAX_CURVES) {
            throw new IllegalStateException("a chart takes at most " + MAX_CURVES + " curves");
        }
        if (find(kind, n) != null) {
            throw new IllegalArgumentException("the chart already holds a " + kind.label() + " named '" + n + "'");
        }
        List<Series> more = new ArrayList<>(series);
        more.add(new Series(kind, n, hertz.clone(), db.clone()));
        return new SeChart(title, List.copyOf(more), recommended, requirement, sourceSwitch);
    }

    /**
     * This chart with one design marked as recommended.
     *
     * @param kind the curve's kind, not null
     * @param name the name of a curve of that kind already in the chart
     * @return the new chart; this one is unchanged
     * @throws IllegalArgumentException if no curve of that kind has that name
     */
    public SeChart recommending(Kind kind, String name) {
        Require.nonNull("kind", kind);
        Require.nonNull("recommended design", name);
        Series s = find(kind, name.strip());
        if (s == null) {
            throw new IllegalArgumentException("no " + kind.label() + " named '" + name + "' to recommend; the chart holds "
                    + series.stream().map(c -> c.kind().label() + ": " + c.name()).toList());
        }
        return new SeChart(title, series, s, requirement, sourceSwitch);
    }

    /**
     * This chart with the requirement drawn: each entry at its own frequency or over its own
     * band, labelled with the SE it needs.
     *
     * @param need the requirement, not null
     * @return the new chart; this one is unchanged
     */
    public SeChart requiring(Requirement need) {
        return new SeChart(title, series, recommended, List.copyOf(Require.nonNull("requirement", need).entries()),
                sourceSwitch);
    }

    /**
     * This chart with a change of source marked: below {@code at} the designs see one source,
     * above it another, so the curves of designs whose SE depends on the source step there.
     *
     * @param at    the frequency of the change, not null
     * @param below the source below it, 1 to 60 characters
     * @param above the source above it, 1 to 60 characters
     * @return the new chart; this one is unchanged
     * @throws IllegalArgumentException if a name is blank or too long
     */
    public SeChart switchingSourceAt(Frequency at, String below, String above) {
        Require.nonNull("source change frequency", at);
        return new SeChart(title, series, recommended, requirement, new Switch(at.toHertz(),
                Require.text("source below", below, 60), Require.text("source above", above, 60)));
    }

    /**
     * Writes the chart as a PNG image.
     *
     * @param file   the file, replaced if it exists, not null
     * @param width  the width in pixels, 100 to 10 000
     * @param height the height in pixels, 100 to 10 000
     * @throws IOException if the file cannot be written
     * @throws IllegalStateException if the chart has no curve
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a size is out of range
     */
    public void writePng(Path file, int width, int height) throws IOException {
        JFreeChart chart = chart();
        PictureFiles.writePng(file, width, height, g -> chart.draw(g, new Rectangle(0, 0, width, height)));
    }

    /**
     * Writes the chart as SVG, its words as SVG text.
     *
     * @param file   the file, replaced if it exists, not null
     * @param width  the width in CSS pixels, 100 to 10 000
     * @param height the height in CSS pixels, 100 to 10 000
     * @throws IOException if the file cannot be written
     * @throws IllegalStateException if the chart has no curve
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a size is out of range
     */
    public void writeSvg(Path file, int width, int height) throws IOException {
        JFreeChart chart = chart();
        PictureFiles.writeSvg(file, width, height, g -> chart.draw(g, new Rectangle(0, 0, width, height)));
    }

    @Override
    public String toString() {
        return "SE chart '" + title + "': " + series.size() + " curves"
                + (recommended == null ? "" : ", recommending '" + recommended.name() + "'")
                + ", " + requirement.size() + " requirement entries";
    }

    private Series find(Kind kind, String name) {
        for (Series s : series) {
            if (s.kind() == kind && s.name().equals(name)) {
                return s;
            }
        }
        return null;
    }

    /**
     * The colour of a curve.
     *
     * @param index the curve's place in the chart, from 0
     * @return its colour from the series palette
     */
    static Color colourOf(int index) {
        return Colours.SERIES[index % Colours.SERIES.length];
    }

    // ---------------------------------------------------------------- building the chart

    /**
     * The chart, laid out by JFreeChart (package-private for the tests).
     *
     * @return a new chart
     */
    JFreeChart chart() {
        if (series.isEmpty()) {
            throw new IllegalStateException("the chart '" + title + "' has no curve to draw");
        }
        XYSeriesCollection designs = new XYSeriesCollection();
        XYLineAndShapeRenderer lines = new XYLineAndShapeRenderer(true, false);
        double lowHz = Double.POSITIVE_INFINITY;
        double highHz = 0;
        for (int i = 0; i < series.size(); i++) {
            Series s = series.get(i);
            boolean best = s == recommended;
            XYSeries xy = new XYSeries(s.kind().label() + ": " + s.name() + (best ? "  (recommended)" : ""),
                    false, true);
            for (int k = 0; k < s.hertz().length; k++) {
                xy.add(s.hertz()[k], s.db()[k]);
            }
            designs.addSeries(xy);
            lines.setSeriesPaint(i, colourOf(i));
            lines.setSeriesStroke(i, s.kind().stroke(best ? RECOMMENDED_LINE : LINE));
            lowHz = Math.min(lowHz, s.hertz()[0]);
            highHz = Math.max(highHz, s.hertz()[s.hertz().length - 1]);
        }
        lines.setLegendLine(new Line2D.Double(-18, 0, 18, 0));
        lines.setDrawSeriesLineAsPath(true);

        // Rotated text as drawString, not as a TextLayout (which the SVG writer could only draw
        // as glyph outlines); the workaround was for Java runtimes older than the one we need.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
        LogAxis frequency = new FrequencyAxis();
        frequency.setBase(10);
        frequency.setSmallestValue(1e-3);
        frequency.setTickUnit(new NumberTickUnit(1));
        frequency.setNumberFormatOverride(new FrequencyFormat());
        frequency.setRange(lowHz, highHz);
        NumberAxis se = new NumberAxis("shielding effectiveness (dB)");
        se.setRange(0, topOfRange());
        se.setTickUnit(new NumberTickUnit(se.getUpperBound() > 120 ? 20 : 10));
        for (ValueAxis axis : new ValueAxis[] {frequency, se}) {
            axis.setLabelFont(new Font(FONT, Font.PLAIN, 12));
            axis.setLabelPaint(INK);
            axis.setTickLabelFont(new Font(FONT, Font.PLAIN, 11));
            axis.setTickLabelPaint(INK);
            axis.setAxisLinePaint(QUIET_INK);
            axis.setAxisLineStroke(new BasicStroke(1f));
            axis.setTickMarkPaint(QUIET_INK);
            axis.setTickMarkInsideLength(0);
            axis.setTickMarkOutsideLength(5);
        }

        XYPlot plot = new XYPlot(designs, frequency, se, lines);
        plot.setOrientation(PlotOrientation.VERTICAL);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlineVisible(false);
        plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setDomainGridlineStroke(new BasicStroke(0.8f));
        plot.setRangeGridlineStroke(new BasicStroke(0.8f));
        addMinorGrid(plot, lowHz, highHz);
        if (sourceSwitch != null && sourceSwitch.hertz() > lowHz && sourceSwitch.hertz() < highHz) {
            IntervalMarker tint = new IntervalMarker(lowHz, sourceSwitch.hertz(), BELOW_SWITCH);
            tint.setOutlinePaint(null);
            plot.addDomainMarker(tint, Layer.BACKGROUND);
            plot.addAnnotation(new SwitchMark(sourceSwitch, anySwitching()));
        }
        if (!requirement.isEmpty()) {
            plot.addAnnotation(new RequirementMarks(requirement));
        }
        if (recommended != null) {
            plot.addAnnotation(new RecommendedMark(recommended, colourOf(series.indexOf(recommended))));
        }

        JFreeChart chart = new JFreeChart(null, new Font(FONT, Font.BOLD, 16), plot, false);
        chart.setBackgroundPaint(PAPER);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(10, 14, 10, 18));
        TextTitle head = new TextTitle(title, new Font(FONT, Font.BOLD, 16), INK, RectangleEdge.TOP,
                HorizontalAlignment.LEFT, org.jfree.chart.ui.VerticalAlignment.CENTER, new RectangleInsets(0, 0, 2, 0));
        chart.addSubtitle(head);
        TextTitle key = new TextTitle(kindsNote(), new Font(FONT, Font.PLAIN, 11), QUIET_INK, RectangleEdge.TOP,
                HorizontalAlignment.LEFT, org.jfree.chart.ui.VerticalAlignment.CENTER, new RectangleInsets(0, 0, 8, 0));
        chart.addSubtitle(key);
        LegendTitle legend = new LegendTitle(plot);
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setHorizontalAlignment(HorizontalAlignment.LEFT);
        legend.setItemFont(new Font(FONT, Font.PLAIN, 11));
        legend.setItemPaint(INK);
        legend.setBackgroundPaint(PAPER);
        legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
        legend.setItemLabelPadding(new RectangleInsets(2, 4, 2, 14));
        legend.setMargin(new RectangleInsets(8, 0, 0, 0));
        chart.addSubtitle(legend);
        return chart;
    }

    /** Whether any curve's kind depends on the source (plates, stacks, sheets do; cans here do not). */
    private boolean anySwitching() {
        return series.stream().anyMatch(s -> s.kind() != Kind.CAN);
    }

    private String kindsNote() {
        StringBuilder s = new StringBuilder("Line style by kind: ");
        List<String> parts = new ArrayList<>();
        for (Kind k : Kind.values()) {
            if (series.stream().anyMatch(c -> c.kind() == k)) {
                parts.add(k.label() + " " + switch (k) {
                    case CAN -> "solid";
                    case PLATE -> "dashed";
                    case STACK -> "dash-dot";
                    case SHEET -> "dotted";
                });
            }
        }
        s.append(String.join(", ", parts));
        if (recommended != null) {
            s.append("; thick: recommended");
        }
        if (!requirement.isEmpty()) {
            s.append(";  \u25C6 required SE at one frequency, \u25AC over a band");
        }
        return s.toString();
    }

    /** Light lines at 2 to 9 times each power of ten inside the axis range. */
    private static void addMinorGrid(XYPlot plot, double lowHz, double highHz) {
        for (int decade = (int) Math.floor(Math.log10(lowHz)); decade <= (int) Math.ceil(Math.log10(highHz)); decade++) {
            for (int m = 2; m <= 9; m++) {
                double hz = m * Math.pow(10, decade);
                if (hz > lowHz && hz < highHz) {
                    ValueMarker line = new ValueMarker(hz, MINOR_GRID, new BasicStroke(0.6f));
                    plot.addDomainMarker(line, Layer.BACKGROUND);
                }
            }
        }
    }

    /** The top of the SE axis: twice the highest requirement, at least 60 dB, rounded up to 20 dB. */
    private double topOfRange() {
        double need = 30;
        for (Requirement.Entry e : requirement) {
            need = Math.max(need, e.requiredDb());
        }
        return Math.ceil(2 * need / 20) * 20;
    }

    // ---------------------------------------------------------------- marks drawn on the plot

    private static double x(ValueAxis axis, double hz, Rectangle2D area, XYPlot plot) {
        return axis.valueToJava2D(hz, area, plot.getDomainAxisEdge());
    }

    private static double y(ValueAxis axis, double db, Rectangle2D area, XYPlot plot) {
        return axis.valueToJava2D(db, area, plot.getRangeAxisEdge());
    }

    /** Text on a pale box, so that it reads over curves and grid. */
    private static void boxedText(Graphics2D g, String s, double x, double y, Color ink) {
        FontMetrics m = g.getFontMetrics();
        g.setColor(new Color(255, 255, 255, 215));
        g.fill(new Rectangle2D.Double(x - 2, y - m.getAscent(), m.stringWidth(s) + 4, m.getAscent() + m.getDescent()));
        g.setColor(ink);
        g.drawString(s, (float) x, (float) y);
    }

    /** Each requirement entry: a diamond at a single frequency, a bar over a band, and its label. */
    private static final class RequirementMarks extends AbstractXYAnnotation {
        private static final long serialVersionUID = 1L;
        private final transient List<Requirement.Entry> entries;

        RequirementMarks(List<Requirement.Entry> entries) {
            this.entries = entries;
        }

        @Override
        public void draw(Graphics2D g, XYPlot plot, Rectangle2D area, ValueAxis domain, ValueAxis range,
                         int rendererIndex, PlotRenderingInfo info) {
            g.setFont(new Font(FONT, Font.PLAIN, 11));
            FontMetrics m = g.getFontMetrics();
            List<Requirement.Entry> sorted = new ArrayList<>(entries);
            sorted.sort(Comparator.comparingDouble(e -> e.band().low().toHertz()));
            List<Rectangle2D> taken = new ArrayList<>();
            for (Requirement.Entry e : sorted) {
                double lo = e.band().low().toHertz();
                double hi = e.band().high().toHertz();
                double x0 = x(domain, lo, area, plot);
                double x1 = x(domain, hi, area, plot);
                double yy = y(range, e.requiredDb(), area, plot);
                g.setColor(Color.BLACK);
                if (hi > lo) {
                    g.setStroke(new BasicStroke(4.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
                    g.draw(new Line2D.Double(x0, yy, Math.max(x1, x0 + 1), yy));
                }
                double xc = 0.5 * (x0 + x1);
                if (hi == lo || x1 - x0 < 6) {
                    Path2D.Double diamond = new Path2D.Double();
                    diamond.moveTo(xc, yy - 5.5);
                    diamond.lineTo(xc + 5.5, yy);
                    diamond.lineTo(xc, yy + 5.5);
                    diamond.lineTo(xc - 5.5, yy);
                    diamond.closePath();
                    g.fill(diamond);
                }
                String label = e.band() + ": " + String.format(Locale.ROOT, "%.0f dB", e.requiredDb());
                double w = m.stringWidth(label);
                double h = m.getAscent() + m.getDescent();
                // First choice above the mark; move further up while it would cover an earlier label.
                Rectangle2D box = new Rectangle2D.Double(xc - w / 2, yy - 10 - h, w, h);
                for (int tries = 0; tries < 6 && overlaps(box, taken); tries++) {
                    box = new Rectangle2D.Double(box.getX(), box.getY() - h - 2, w, h);
                }
                if (box.getMaxX() > area.getMaxX()) {
                    box = new Rectangle2D.Double(area.getMaxX() - w - 2, box.getY(), w, h);
                }
                taken.add(box);
                if (box.getMaxY() < yy - 12) {
                    g.setColor(QUIET_INK);
                    g.setStroke(new BasicStroke(0.8f));
                    g.draw(new Line2D.Double(xc, yy - 6, box.getCenterX(), box.getMaxY()));
                }
                boxedText(g, label, box.getX(), box.getY() + m.getAscent(), INK);
            }
        }

        private static boolean overlaps(Rectangle2D box, List<Rectangle2D> taken) {
            for (Rectangle2D t : taken) {
                if (t.intersects(box.getX() - 3, box.getY() - 1, box.getWidth() + 6, box.getHeight() + 2)) {
                    return true;
                }
            }
            return false;
        }
    }

    /** The change of source: a dashed line, the two sources, and why curves step there. */
    private static final class SwitchMark extends AbstractXYAnnotation {
        private static final long serialVersionUID = 1L;
        private final transient Switch change;
        private final boolean curvesStep;

        SwitchMark(Switch change, boolean curvesStep) {
            this.change = change;
            this.curvesStep = curvesStep;
        }

        @Override
        public void draw(Graphics2D g, XYPlot plot, Rectangle2D area, ValueAxis domain, ValueAxis range,
                         int rendererIndex, PlotRenderingInfo info) {
            double xs = x(domain, change.hertz(), area, plot);
            g.setColor(QUIET_INK);
            g.setStroke(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f},
                    0f));
            g.draw(new Line2D.Double(xs, area.getMinY(), xs, area.getMaxY()));
            g.setFont(new Font(FONT, Font.BOLD, 11));
            FontMetrics m = g.getFontMetrics();
            double top = area.getMinY() + m.getAscent() + 4;
            String left = "source: " + change.below() + " \u2190";
            String right = "\u2192 source: " + change.above();
            boxedText(g, left, xs - 8 - m.stringWidth(left), top, INK);
            boxedText(g, right, xs + 8, top, INK);
            if (curvesStep) {
                g.setFont(new Font(FONT, Font.ITALIC, 11));
                m = g.getFontMetrics();
                String[] why = {"plates and stacks see the nearer source on each",
                    "side of " + Frequency.ofHertz(change.hertz()) + ", so their curves step here"};
                for (int i = 0; i < why.length; i++) {
                    boxedText(g, why[i], xs + 8, top + (i + 1) * (m.getHeight() + 2) + 2, QUIET_INK);
                }
            }
        }
    }

    /** A label pointing at the recommended design's curve. */
    private static final class RecommendedMark extends AbstractXYAnnotation {
        private static final long serialVersionUID = 1L;
        private final transient Series design;
        private final Color colour;

        RecommendedMark(Series design, Color colour) {
            this.design = design;
            this.colour = colour;
        }

        @Override
        public void draw(Graphics2D g, XYPlot plot, Rectangle2D area, ValueAxis domain, ValueAxis range,
                         int rendererIndex, PlotRenderingInfo info) {
            // Point at the curve about two thirds of the way along the axis, where it is on the plot.
            double[] hz = design.hertz();
            double[] db = design.db();
            int pick = -1;
            double targetX = area.getMinX() + 0.62 * area.getWidth();
            double bestDistance = Double.POSITIVE_INFINITY;
            for (int k = 0; k < hz.length; k++) {
                double px = x(domain, hz[k], area, plot);
                double py = y(range, db[k], area, plot);
                if (py > area.getMinY() + 40 && py < area.getMaxY() - 10 && Math.abs(px - targetX) < bestDistance) {
                    bestDistance = Math.abs(px - targetX);
                    pick = k;
                }
            }
            if (pick < 0) {
                return;
            }
            double px = x(domain, hz[pick], area, plot);
            double py = y(range, db[pick], area, plot);
            g.setFont(new Font(FONT, Font.BOLD, 11));
            FontMetrics m = g.getFontMetrics();
            String label = "recommended: " + design.name();
            double lx = Math.min(px + 26, area.getMaxX() - m.stringWidth(label) - 4);
            double ly = py + 34 < area.getMaxY() - 4 ? py + 34 : py - 26;
            g.setColor(INK);
            g.setStroke(new BasicStroke(1f));
            g.draw(new Line2D.Double(px, py, lx + 4, ly - m.getAscent() / 2.0));
            g.setColor(colour);
            g.fill(new java.awt.geom.Ellipse2D.Double(px - 4.5, py - 4.5, 9, 9));
            g.setColor(Color.WHITE);
            g.setStroke(new BasicStroke(1.4f));
            g.draw(new java.awt.geom.Ellipse2D.Double(px - 4.5, py - 4.5, 9, 9));
            boxedText(g, label, lx + 6, ly, INK);
        }
    }

    /**
     * A log frequency axis whose decade ticks carry plain text labels in engineering form
     * (JFreeChart's own log ticks carry styled text, which an SVG writer can only draw as
     * glyph outlines).
     */
    private static final class FrequencyAxis extends LogAxis {
        private static final long serialVersionUID = 1L;

        FrequencyAxis() {
            super("frequency");
        }

        @Override
        @SuppressWarnings({"rawtypes", "unchecked"})
        protected List refreshTicksHorizontal(Graphics2D g2, Rectangle2D dataArea, RectangleEdge edge) {
            List ticks = new ArrayList();
            double low = getLowerBound();
            double high = getUpperBound();
            for (int decade = (int) Math.floor(Math.log10(low)); decade <= (int) Math.ceil(Math.log10(high)); decade++) {
                double hz = Math.pow(10, decade);
                if (hz >= low * (1 - 1e-9) && hz <= high * (1 + 1e-9)) {
                    ticks.add(new NumberTick(TickType.MAJOR, hz, Frequency.ofHertz(hz).toString(),
                            TextAnchor.TOP_CENTER, TextAnchor.CENTER, 0.0));
                }
            }
            return ticks;
        }
    }

    /** Tick labels in engineering form: 10 Hz, 1 kHz, 100 kHz. */
    private static final class FrequencyFormat extends java.text.NumberFormat {
        private static final long serialVersionUID = 1L;

        @Override
        public StringBuffer format(double number, StringBuffer to, java.text.FieldPosition pos) {
            return number > 0 ? to.append(Frequency.ofHertz(number)) : to;
        }

        @Override
        public StringBuffer format(long number, StringBuffer to, java.text.FieldPosition pos) {
            return format((double) number, to, pos);
        }

        @Override
        public Number parse(String source, java.text.ParsePosition pos) {
            return null;
        }
    }
}
