/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Rectangle;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Plots of shielding effectiveness against frequency (log axis) for several designs,
 * with the requirement drawn as dashed black segments, written headless as PNG and SVG with
 * JFreeChart, the SVG through Apache Batik (text stays text).
 */
public final class SeChart {

    /** One curve: a name, frequencies in Hz and SE in dB. */
    public record Curve(String name, double[] hertz, double[] db) {
    }

    private SeChart() {
    }

    /**
     * Writes the chart as PNG and SVG.
     *
     * @param png         the PNG file to write
     * @param svg         the SVG file to write
     * @param title       the chart title
     * @param curves      the designs' curves
     * @param requirement the requirement as segments (each a curve of two points), drawn as dashed black
     *                    lines; the SE axis runs to twice the highest requirement, so curves far above it are clipped
     * @throws IOException if a file cannot be written
     */
    public static void write(Path png, Path svg, String title, List<Curve> curves, List<Curve> requirement)
            throws IOException {
        System.setProperty("java.awt.headless", "true");
        XYSeriesCollection designs = new XYSeriesCollection();
        for (Curve c : curves) {
            designs.addSeries(series(c));
        }
        LogAxis frequency = new LogAxis("frequency");
        frequency.setBase(10);
        frequency.setSmallestValue(1e-3);
        frequency.setTickUnit(new NumberTickUnit(1));
        frequency.setNumberFormatOverride(new FrequencyFormat());
        NumberAxis se = new NumberAxis("shielding effectiveness (dB)");
        se.setRange(0, topOfRange(curves, requirement));
        XYLineAndShapeRenderer lines = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < curves.size(); i++) {
            lines.setSeriesStroke(i, new BasicStroke(2f));
            lines.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
        }
        XYPlot plot = new XYPlot(designs, frequency, se, lines);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        XYSeriesCollection need = new XYSeriesCollection();
        XYLineAndShapeRenderer dashed = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < requirement.size(); i++) {
            need.addSeries(series(requirement.get(i)));
            dashed.setSeriesPaint(i, Color.BLACK);
            dashed.setSeriesStroke(i, new BasicStroke(3.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {7f, 4f}, 0f));
            dashed.setSeriesVisibleInLegend(i, i == 0);
        }
        plot.setDataset(1, need);
        plot.setRenderer(1, dashed);
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        int w = 1000;
        int h = 620;
        ChartUtils.saveChartAsPNG(png.toFile(), chart, w, h);
        SvgOutput.write(svg, w, h, g -> chart.draw(g, new Rectangle(0, 0, w, h)));
    }

    /** Distinct colours that read on white. */
    private static final Color[] PALETTE = {new Color(0x1f77b4), new Color(0xd62728), new Color(0x2ca02c),
        new Color(0x9467bd), new Color(0xff7f0e), new Color(0x17becf), new Color(0x8c564b), new Color(0xe377c2),
        new Color(0x7f7f7f), new Color(0xbcbd22)};

    /** The top of the SE axis: twice the highest requirement, at least 60 dB, rounded up to 20 dB. */
    private static double topOfRange(List<Curve> curves, List<Curve> requirement) {
        double need = 30;
        for (Curve c : requirement) {
            for (double v : c.db()) {
                need = Math.max(need, v);
            }
        }
        return Math.ceil(2 * need / 20) * 20;
    }

    /** Tick labels in engineering form: 10 Hz, 1 kHz, 100 kHz. */
    private static final class FrequencyFormat extends java.text.NumberFormat {
        private static final long serialVersionUID = 1L;

        @Override
        public StringBuffer format(double number, StringBuffer to, java.text.FieldPosition pos) {
            return number > 0 ? to.append(io.shieldmath.shield.quantity.Frequency.ofHertz(number)) : to;
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

    private static XYSeries series(Curve c) {
        XYSeries s = new XYSeries(c.name(), false, true);
        for (int i = 0; i < c.hertz().length; i++) {
            s.add(c.hertz()[i], c.db()[i]);
        }
        return s;
    }
}
