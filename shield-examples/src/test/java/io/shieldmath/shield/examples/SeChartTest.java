/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.nT;
import static io.shieldmath.shield.quantity.Quantities.uT;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.ui.Layer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

/** The SE chart: its words as SVG text, palette, line styles, requirement marks and grid. */
class SeChartTest {

    private static final double[] HZ = FrequencyBand.of(Hz(10), kHz(100)).logSpacedHertz(41);

    /** Invented demo data: SE rising with frequency, one curve per kind. */
    private static double[] rising(double start, double slope) {
        double[] db = new double[HZ.length];
        for (int i = 0; i < HZ.length; i++) {
            db[i] = start + slope * Math.log10(HZ[i] / 10);
        }
        return db;
    }

    private static final Requirement NEED = Requirement.none()
            .plus(FrequencyBand.at(Hz(50)), uT(2), nT(5))                       // 52.0 dB
            .plus(FrequencyBand.of(kHz(19), kHz(21)), uT(8), nT(5));            // 64.1 dB

    private static SeChart chart() {
        return SeChart.titled("Invented title for a test")
                .plus(SeChart.Kind.CAN, "invented can", HZ, rising(60, 5))
                .plus(SeChart.Kind.PLATE, "invented plate", HZ, rising(2, 20))
                .plus(SeChart.Kind.STACK, "invented stack", HZ, rising(5, 22))
                .plus(SeChart.Kind.SHEET, "invented sheet", HZ, rising(8, 25))
                .recommending(SeChart.Kind.CAN, "invented can")
                .requiring(NEED)
                .switchingSourceAt(kHz(1), "far coil", "near coil");
    }

    @Test
    void svgKeepsItsWordsAsText(@TempDir Path dir) throws Exception {
        Path svg = dir.resolve("c.svg");
        chart().writeSvg(svg, 1000, 680);
        String text = Files.readString(svg);
        assertTrue(text.contains("<text"), "text must be written as <text> elements");
        assertTrue(!text.contains("<font") && !text.contains("<glyph"), "no embedded fonts or glyph outlines");
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        Document d = f.newDocumentBuilder().parse(svg.toFile());
        assertEquals("1000", d.getDocumentElement().getAttribute("width"));
        NodeList texts = d.getElementsByTagNameNS("*", "text");
        StringBuilder words = new StringBuilder();
        for (int i = 0; i < texts.getLength(); i++) {
            words.append(texts.item(i).getTextContent()).append('\n');
        }
        String all = words.toString();
        for (String expected : new String[] {"Invented title for a test", "can: invented can  (recommended)",
            "plate: invented plate", "recommended: invented can", "50 Hz: 52 dB", "19 kHz to 21 kHz: 64 dB",
            "source: far coil", "so their curves step here", "shielding effectiveness (dB)", "10 Hz", "1 kHz",
            "100 kHz"}) {
            assertTrue(all.contains(expected), "missing SVG text '" + expected + "' in:\n" + all);
        }
    }

    @Test
    void pngHasItsSizeAndIsNotBlank(@TempDir Path dir) throws IOException {
        Path png = dir.resolve("c.png");
        chart().writePng(png, 900, 600);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(900, img.getWidth());
        assertEquals(600, img.getHeight());
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < 600; y += 2) {
            for (int x = 0; x < 900; x += 2) {
                colours.add(img.getRGB(x, y) & 0xffffff);
            }
        }
        assertTrue(colours.size() > 50, "only " + colours.size() + " colours");
    }

    @Test
    void curvesTakeOurPaletteAndTheirKindsLineStyle() {
        XYPlot plot = (XYPlot) chart().chart().getPlot();
        XYItemRenderer r = plot.getRenderer(0);
        for (int i = 0; i < 4; i++) {
            assertEquals(Colours.SERIES[i], r.getSeriesPaint(i), "series " + i);
        }
        BasicStroke can = (BasicStroke) r.getSeriesStroke(0);
        BasicStroke plate = (BasicStroke) r.getSeriesStroke(1);
        BasicStroke stack = (BasicStroke) r.getSeriesStroke(2);
        BasicStroke sheet = (BasicStroke) r.getSeriesStroke(3);
        assertNull(can.getDashArray(), "a can is solid");
        assertEquals(2, plate.getDashArray().length, "a plate is dashed");
        assertEquals(4, stack.getDashArray().length, "a stack is dash-dotted");
        assertTrue(sheet.getDashArray()[0] < 3, "a sheet is dotted");
        assertTrue(can.getLineWidth() > 1.8 * plate.getLineWidth(), "the recommended design is drawn thicker");
    }

    @Test
    void minorGridlinesMarkTwoToNineInEachDecade() {
        XYPlot plot = (XYPlot) chart().chart().getPlot();
        // 10 Hz to 100 kHz: four decades, 2..9 in each: 32 minor lines, plus the tint below the switch.
        assertEquals(33, plot.getDomainMarkers(Layer.BACKGROUND).size());
    }

    @Test
    void theFiftyHertzRequirementIsDrawnAtFiftyHertzNotOverABand() {
        // Draw only the requirement's marks and look along the row of the 50 Hz mark:
        // black at 50 Hz, nothing black at 35 Hz or 70 Hz (where the old chart's widened
        // segment reached).
        SeChart c = SeChart.titled("t").plus(SeChart.Kind.CAN, "c", HZ, rising(0, 0.1))
                .requiring(Requirement.none().plus(FrequencyBand.at(Hz(50)), uT(2), nT(5)));
        JFreeChart chart = c.chart();
        BufferedImage img = new BufferedImage(1000, 680, BufferedImage.TYPE_INT_RGB);
        ChartRenderingInfo info = new ChartRenderingInfo();
        Graphics2D g = img.createGraphics();
        chart.draw(g, new Rectangle(0, 0, 1000, 680), info);
        g.dispose();
        Rectangle2D area = info.getPlotInfo().getDataArea();
        XYPlot plot = (XYPlot) chart.getPlot();
        double need = 20 * Math.log10(2e-6 / 5e-9);   // 52.04 dB: 20·log10(incident/tolerated)
        int y = (int) Math.round(plot.getRangeAxis().valueToJava2D(need, area, plot.getRangeAxisEdge()));
        assertNotNull(plot.getDomainAxis());
        int x50 = (int) Math.round(plot.getDomainAxis().valueToJava2D(50, area, plot.getDomainAxisEdge()));
        int x35 = (int) Math.round(plot.getDomainAxis().valueToJava2D(35, area, plot.getDomainAxisEdge()));
        int x70 = (int) Math.round(plot.getDomainAxis().valueToJava2D(70, area, plot.getDomainAxisEdge()));
        assertTrue(dark(img.getRGB(x50, y)), "the mark at 50 Hz");
        assertTrue(!dark(img.getRGB(x35, y)) && !dark(img.getRGB(x70, y)), "no bar from 35 Hz to 70 Hz");
    }

    private static boolean dark(int rgb) {
        return Colours.lightness(rgb & 0xffffff) < 20;
    }

    @Test
    void badInputIsRefusedWithItsValue() {
        SeChart c = SeChart.titled("t");
        assertThrows(IllegalArgumentException.class, () -> SeChart.titled(" "));
        assertThrows(IllegalArgumentException.class, () -> c.plus(SeChart.Kind.CAN, "a", new double[] {1, 2},
                new double[] {1}));
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> c.plus(SeChart.Kind.CAN, "a", new double[] {-5, 2}, new double[] {1, 1}));
        assertTrue(e.getMessage().contains("-5"), e::getMessage);
        assertThrows(IllegalArgumentException.class, () -> c.plus(SeChart.Kind.CAN, "a", new double[] {2, 1},
                new double[] {1, 1}));
        assertThrows(InvalidQuantityException.class, () -> c.plus(SeChart.Kind.CAN, "a", new double[] {1, 2},
                new double[] {1, Double.NaN}));
        SeChart one = c.plus(SeChart.Kind.CAN, "a", new double[] {1, 2}, new double[] {1, 1});
        assertThrows(IllegalArgumentException.class, () -> one.plus(SeChart.Kind.CAN, "a", new double[] {1, 2},
                new double[] {1, 1}));
        assertThrows(IllegalArgumentException.class, () -> one.recommending(SeChart.Kind.PLATE, "a"));
        assertThrows(IllegalStateException.class, () -> c.writePng(Path.of("never.png"), 500, 500));
    }
}
