/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.AxialFieldSolution;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CouplingSolution;
import io.shieldmath.shield.axisymmetric.FieldMap;
import io.shieldmath.shield.axisymmetric.Point;
import io.shieldmath.shield.coupling.Coil;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.coupling.DriveCurrent;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * A picture of a field map of an axisymmetric arrangement: the peak flux density |B| on a
 * logarithmic colour scale with its colour bar and unit, the flux lines, and the outline of
 * every body (and of the coils, when given), in the (r, z) half-plane
 * at true aspect ratio. A map that starts on the axis is drawn as a section through the axis:
 * its mirror image on the left, the axis as a dash-dot centre line. Written as PNG or SVG
 * (SVG text stays text).
 *
 * <pre>{@code
 * AxialFieldSolution s = can.inUniformAxialField().magnetostatic();
 * FieldMapPicture.around(can, s, uT(50)).titled("Ni-Fe can in 50 µT")
 *         .writePng(Path.of("can.png"), 900, 700);
 * FieldMapPicture.of(can, s.fieldMap(from, to, 121, 161, uT(50))).writeSvg(Path.of("can.svg"), 900, 700);
 * }</pre>
 *
 * <h2>What is drawn</h2>
 * <ul>
 *   <li>Colour: log10 |B| between the scale's ends, through the project's own field colour
 *       map: weak field dark (a deep moss green), strong field light (a warm cream), with
 *       L* rising linearly in between, so the picture reads the same in grey. The top of the
 *       scale is the 99.5th percentile of |B| on the map (so that the near-singular field
 *       beside a thin coil does not flatten the rest); the bottom is the smallest |B| on the
 *       map, but at most five decades below the top. Values beyond the ends take the end
 *       colours. The unit (T, mT, µT or nT) is the one in which the scale's geometric middle
 *       reads 1 to 1000.</li>
 *   <li>Flux lines: contours of Re ψ, ψ = r·A_φ (the in-phase part of the flux function;
 *       the flux through the circle of radius r at height z is 2π·ψ), traced by marching
 *       squares with linear interpolation on the map's grid. The levels are evenly spaced
 *       between the 0.5th and 99.5th percentiles of Re ψ, so the same flux passes between any
 *       two neighbouring lines: dense lines mean strong field.</li>
 *   <li>Bodies: the outline of each body's cross-section (seams between a can's wall and its
 *       caps are left out), drawn dark on a light halo so that it reads on every colour.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe: the map's arrays are copied once; every {@code with…} and
 * {@code titled} returns a new picture.
 */
public final class FieldMapPicture {

    /** The default number of flux lines. */
    public static final int DEFAULT_FLUX_LINES = 16;
    /** The most decades the colour scale spans. */
    static final double MAX_DECADES = 5;

    private static final Color PAPER = Colours.PAPER;
    private static final Color INK = Colours.INK;
    private static final Color QUIET_INK = Colours.QUIET_INK;
    private static final Color HALO = new Color(255, 255, 255, 170);
    private static final String FONT = Font.SANS_SERIF;

    private final Arrangement arrangement;
    private final double[] r;
    private final double[] z;
    private final double[][] b;
    private final double[][] psi;
    private final String title;
    private final CoilPair coils;
    private final int fluxLines;
    private final double scaleLow;
    private final double scaleHigh;

    private FieldMapPicture(Arrangement arrangement, double[] r, double[] z, double[][] b, double[][] psi,
                            String title, CoilPair coils, int fluxLines, double scaleLow, double scaleHigh) {
        this.arrangement = arrangement;
        this.r = r;
        this.z = z;
        this.b = b;
        this.psi = psi;
        this.title = title;
        this.coils = coils;
        this.fluxLines = fluxLines;
        this.scaleLow = scaleLow;
        this.scaleHigh = scaleHigh;
    }

    /**
     * A picture of a field map over the bodies of an arrangement.
     *
     * @param arrangement the bodies to outline, not null
     * @param map         the field map, not null; its |B| must be finite and not all zero
     * @return the picture, titled "|B| and flux lines" until {@link #titled(String)}
     * @throws IllegalArgumentException if the map holds a non-finite value or no positive |B|
     */
    public static FieldMapPicture of(Arrangement arrangement, FieldMap map) {
        Require.nonNull("arrangement", arrangement);
        Require.nonNull("field map", map);
        double[][] b = map.fluxDensityTesla();
        double[][] psi = map.fluxFunctionReal();
        int count = 0;
        for (int k = 0; k < b.length; k++) {
            for (int i = 0; i < b[k].length; i++) {
                if (!Double.isFinite(b[k][i]) || !Double.isFinite(psi[k][i])) {
                    throw new IllegalArgumentException("the field map holds a non-finite value at row " + k
                            + ", column " + i + ": |B| " + b[k][i] + " T, ψ " + psi[k][i] + " Wb/rad");
                }
                if (b[k][i] > 0) {
                    count++;
                }
            }
        }
        if (count == 0) {
            throw new IllegalArgumentException("the field map has no positive |B|: nothing to draw on a log scale");
        }
        double[] sorted = new double[count];
        int n = 0;
        for (double[] row : b) {
            for (double v : row) {
                if (v > 0) {
                    sorted[n++] = v;
                }
            }
        }
        Arrays.sort(sorted);
        double high = percentile(sorted, 0.995);
        double low = Math.max(sorted[0], high * Math.pow(10, -MAX_DECADES));
        if (!(high > low)) {
            low = high / 10;           // a uniform map: one decade below it
        }
        return new FieldMapPicture(arrangement, map.radiiMetres(), map.axialMetres(), b, psi, "|B| and flux lines",
                null, DEFAULT_FLUX_LINES, low, high);
    }

    /**
     * The field map of an arrangement in a uniform axial field, framing its bodies: the map
     * runs from the axis to 1.6 times the bodies' outer radius (or half their height beyond
     * it, if that is more) and 0.3 times their height (or outer radius, if that is more)
     * beyond their axial ends, on a grid of about 30 000 points.
     *
     * @param arrangement the solved arrangement, with at least one body, not null
     * @param solution    its solution, not null
     * @param applied     the applied peak flux density B0, not null
     * @return the picture
     * @throws IllegalArgumentException if the arrangement has no body, or as {@link #of}
     */
    public static FieldMapPicture around(Arrangement arrangement, AxialFieldSolution solution,
                                         MagneticFluxDensity applied) {
        double[] box = frame(arrangement, null);
        int[] grid = grid(box);
        FieldMap map = Require.nonNull("solution", solution).fieldMap(Point.ofMetres(box[0], box[2]),
                Point.ofMetres(box[1], box[3]), grid[0], grid[1], applied);
        return of(arrangement, map);
    }

    /**
     * The field map of an arrangement between coaxial coils, framing its bodies and both
     * coils (as {@link #around(Arrangement, AxialFieldSolution, MagneticFluxDensity)}), with
     * the coils drawn.
     *
     * @param arrangement the solved arrangement, not null
     * @param pair        the coils it was solved between, not null
     * @param solution    its solution, not null
     * @param current     the transmitter current, at the solution's frequency, not null
     * @return the picture, with the coils
     * @throws IllegalArgumentException if the current's frequency differs, or as {@link #of}
     */
    public static FieldMapPicture around(Arrangement arrangement, CoilPair pair, CouplingSolution solution,
                                         DriveCurrent current) {
        double[] box = frame(arrangement, Require.nonNull("coil pair", pair));
        int[] grid = grid(box);
        FieldMap map = Require.nonNull("solution", solution).fieldMap(Point.ofMetres(box[0], box[2]),
                Point.ofMetres(box[1], box[3]), grid[0], grid[1], current);
        return of(arrangement, map).withCoils(pair);
    }

    /**
     * This picture with a title.
     *
     * @param text the title, not blank, at most 200 characters
     * @return the new picture; this one is unchanged
     * @throws IllegalArgumentException if the title is blank or too long
     */
    public FieldMapPicture titled(String text) {
        String t = Require.text("picture title", text, 200);
        return new FieldMapPicture(arrangement, r, z, b, psi, t, coils, fluxLines, scaleLow, scaleHigh);
    }

    /**
     * This picture with the coils drawn, transmitter at z = −separation/2 and receiver at
     * +separation/2 (as the solver places them).
     *
     * @param pair the coils, not null
     * @return the new picture; this one is unchanged
     */
    public FieldMapPicture withCoils(CoilPair pair) {
        return new FieldMapPicture(arrangement, r, z, b, psi, title, Require.nonNull("coil pair", pair), fluxLines,
                scaleLow, scaleHigh);
    }

    /**
     * This picture with another number of flux lines.
     *
     * @param count the number of contour levels, 0 (none) to 100
     * @return the new picture; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the count is out of range
     */
    public FieldMapPicture withFluxLines(int count) {
        Require.inRange("flux lines", count, 0, 100, "lines");
        return new FieldMapPicture(arrangement, r, z, b, psi, title, coils, count, scaleLow, scaleHigh);
    }

    /**
     * The ends of the colour scale.
     *
     * @return {lowest, highest} |B| in T (peak)
     */
    public double[] scaleTesla() {
        return new double[] {scaleLow, scaleHigh};
    }

    /**
     * Writes the picture as a PNG image.
     *
     * @param file   the file, replaced if it exists, not null
     * @param width  the width in pixels, 100 to 10 000
     * @param height the height in pixels, 100 to 10 000
     * @throws IOException if the file cannot be written
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a size is out of range
     */
    public void writePng(Path file, int width, int height) throws IOException {
        PictureFiles.writePng(file, width, height, g -> paint(g, width, height));
    }

    /**
     * Writes the picture as SVG; its words are SVG text, and the colour field is an embedded
     * raster image under vector flux lines and outlines.
     *
     * @param file   the file, replaced if it exists, not null
     * @param width  the width in CSS pixels, 100 to 10 000
     * @param height the height in CSS pixels, 100 to 10 000
     * @throws IOException if the file cannot be written
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a size is out of range
     */
    public void writeSvg(Path file, int width, int height) throws IOException {
        PictureFiles.writeSvg(file, width, height, g -> paint(g, width, height));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "field map picture '%s': %d × %d points, |B| scale %.3g T to %.3g T, "
                + "%d bodies", title, r.length, z.length, scaleLow, scaleHigh, arrangement.bodies().size());
    }

    // ---------------------------------------------------------------- layout

    /**
     * Where the map sits on a canvas: pixel x of r (r &lt; 0 is the mirrored half, left of the
     * axis), pixel y of z. Package-private for the tests.
     */
    record Frame(double x0, double y0, double pxPerMetre, double rLeft, double zMax, int width, int height,
                 boolean mirrored) {
        /**
         * The pixel column of a radius.
         *
         * @param rMetres r in m; negative on the mirrored half
         * @return x in pixels
         */
        double x(double rMetres) {
            return x0 + (rMetres - rLeft) * pxPerMetre;
        }

        /**
         * The pixel row of an axial coordinate.
         *
         * @param zMetres z in m
         * @return y in pixels
         */
        double y(double zMetres) {
            return y0 + (zMax - zMetres) * pxPerMetre;
        }
    }

    private static final int TOP = 62;
    private static final int LEFT = 64;
    private static final int BOTTOM = 62;
    private static final int RIGHT = 120;

    /**
     * The map's place on a canvas of the given size.
     *
     * @param width  the canvas width in pixels
     * @param height the canvas height in pixels
     * @return the frame
     */
    Frame frame(int width, int height) {
        boolean mirrored = r[0] == 0;
        double rLeft = mirrored ? -r[r.length - 1] : r[0];
        double spanR = r[r.length - 1] - rLeft;
        double spanZ = z[z.length - 1] - z[0];
        double s = Math.min(Math.max(20, width - LEFT - RIGHT) / spanR, Math.max(20, height - TOP - BOTTOM) / spanZ);
        return new Frame(LEFT, TOP, s, rLeft, z[z.length - 1], (int) Math.round(spanR * s),
                (int) Math.round(spanZ * s), mirrored);
    }

    // ---------------------------------------------------------------- painting

    private void paint(Graphics2D g, int width, int height) {
        Frame f = frame(width, height);
        g.setColor(PAPER);
        g.fill(new Rectangle2D.Double(0, 0, width, height));
        g.drawImage(colourField(f), (int) f.x0(), (int) f.y0(), null);
        paintFluxLines(g, f);
        paintBodies(g, f);
        if (coils != null) {
            paintCoils(g, f);
        }
        if (f.mirrored()) {
            g.setColor(INK);
            g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {12f, 3f, 2f, 3f}, 0f));
            g.draw(new Line2D.Double(f.x(0), f.y0(), f.x(0), f.y0() + f.height()));
            g.setFont(new Font(FONT, Font.PLAIN, 11));
            haloText(g, "axis", (float) f.x(0) + 4, (float) f.y0() + 14);
        }
        g.setColor(QUIET_INK);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double(f.x0(), f.y0(), f.width(), f.height()));
        paintAxes(g, f);
        paintColourBar(g, f);
        paintTitle(g);
    }

    /** The colour field at one image pixel per canvas pixel, bilinear in log10 |B|. */
    private BufferedImage colourField(Frame f) {
        int w = Math.max(1, f.width());
        int h = Math.max(1, f.height());
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        double lo = Math.log10(scaleLow);
        double span = Math.log10(scaleHigh) - lo;
        double floor = scaleLow * 1e-3;
        int[] column = new int[w];
        double[] columnU = new double[w];
        for (int px = 0; px < w; px++) {
            double rr = Math.abs(f.rLeft() + (px + 0.5) / f.pxPerMetre());   // mirrored: |r|
            column[px] = cell(r, rr);
            columnU[px] = fraction(r, column[px], rr);
        }
        for (int py = 0; py < h; py++) {
            double zz = f.zMax() - (py + 0.5) / f.pxPerMetre();
            int k = cell(z, zz);
            double v = fraction(z, k, zz);
            for (int px = 0; px < w; px++) {
                int i = column[px];
                double u = columnU[px];
                double b00 = Math.log10(Math.max(b[k][i], floor));
                double b01 = Math.log10(Math.max(b[k][i + 1], floor));
                double b10 = Math.log10(Math.max(b[k + 1][i], floor));
                double b11 = Math.log10(Math.max(b[k + 1][i + 1], floor));
                double logB = (1 - v) * ((1 - u) * b00 + u * b01) + v * ((1 - u) * b10 + u * b11);
                img.setRGB(px, py, Colours.field((logB - lo) / span));
            }
        }
        return img;
    }

    /** The index i of the grid interval [a[i], a[i+1]] holding x (clamped to the grid). */
    private static int cell(double[] a, double x) {
        int i = Arrays.binarySearch(a, x);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.max(0, Math.min(a.length - 2, i));
    }

    private static double fraction(double[] a, int i, double x) {
        double u = (x - a[i]) / (a[i + 1] - a[i]);
        return Math.max(0, Math.min(1, u));
    }

    private void paintFluxLines(Graphics2D g, Frame f) {
        if (fluxLines == 0) {
            return;
        }
        double[] sorted = new double[psi.length * psi[0].length];
        int n = 0;
        for (double[] row : psi) {
            for (double v : row) {
                sorted[n++] = v;
            }
        }
        Arrays.sort(sorted);
        double lo = percentile(sorted, 0.005);
        double hi = percentile(sorted, 0.995);
        if (!(hi > lo)) {
            return;
        }
        Path2D.Double path = new Path2D.Double();
        double[] seg = new double[4];
        for (int j = 1; j <= fluxLines; j++) {
            double level = lo + (hi - lo) * (j - 0.5) / fluxLines;
            ContourTracer.trace(r, z, psi, level, (r0, z0, r1, z1) -> {
                segment(path, f, r0, z0, r1, z1);
            }, seg);
        }
        g.setColor(HALO);
        g.setStroke(new BasicStroke(2.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(path);
        g.setColor(INK);
        g.setStroke(new BasicStroke(1.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(path);
    }

    private void paintBodies(Graphics2D g, Frame f) {
        Path2D.Double outline = new Path2D.Double();
        for (Body body : arrangement.bodies()) {
            for (double[] e : Outline.edges(body.crossSectionMetres())) {
                segment(outline, f, e[0], e[1], e[2], e[3]);
            }
        }
        g.setColor(Color.WHITE);
        g.setStroke(new BasicStroke(4.2f, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER));
        g.draw(outline);
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1.8f, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER));
        g.draw(outline);
    }

    /** A straight piece from (r0, z0) to (r1, z1), and its mirror image when the frame is mirrored. */
    private static void segment(Path2D.Double path, Frame f, double r0, double z0, double r1, double z1) {
        path.moveTo(f.x(r0), f.y(z0));
        path.lineTo(f.x(r1), f.y(z1));
        if (f.mirrored()) {
            path.moveTo(f.x(-r0), f.y(z0));
            path.lineTo(f.x(-r1), f.y(z1));
        }
    }

    private void paintCoils(Graphics2D g, Frame f) {
        double d = coils.separation().toMetres();
        for (double side : f.mirrored() ? new double[] {1, -1} : new double[] {1}) {
            paintCoil(g, f, coils.transmitter(), side, -d / 2, side > 0 ? "transmitter" : null);
            paintCoil(g, f, coils.receiver(), side, d / 2, side > 0 ? "receiver" : null);
        }
    }

    private static void paintCoil(Graphics2D g, Frame f, Coil coil, double side, double zc, String label) {
        double a = coil.radius().toMetres();
        double w = coil.radialWidth().map(l -> l.toMetres()).orElse(0.0);
        double l = coil.axialLength().map(x -> x.toMetres()).orElse(0.0);
        double halfW = Math.max(4, w * f.pxPerMetre() / 2);
        double halfL = Math.max(4, l * f.pxPerMetre() / 2);
        double x = f.x(side * a);
        double y = f.y(zc);
        Rectangle2D box = new Rectangle2D.Double(x - halfW, y - halfL, 2 * halfW, 2 * halfL);
        g.setColor(new Color(0xF2C14E));
        g.fill(box);
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1.2f));
        g.draw(box);
        g.draw(new Line2D.Double(box.getMinX(), box.getMinY(), box.getMaxX(), box.getMaxY()));
        g.draw(new Line2D.Double(box.getMinX(), box.getMaxY(), box.getMaxX(), box.getMinY()));
        if (label != null) {
            g.setFont(new Font(FONT, Font.PLAIN, 11));
            haloText(g, label + " coil", (float) (box.getMaxX() + 4), (float) (y + 4));
        }
    }

    private static void haloText(Graphics2D g, String s, float x, float y) {
        FontMetrics m = g.getFontMetrics();
        g.setColor(HALO);
        g.fill(new Rectangle2D.Double(x - 2, y - m.getAscent(), m.stringWidth(s) + 4, m.getAscent() + m.getDescent()));
        g.setColor(INK);
        g.drawString(s, x, y);
    }

    private void paintAxes(Graphics2D g, Frame f) {
        g.setFont(new Font(FONT, Font.PLAIN, 11));
        FontMetrics m = g.getFontMetrics();
        g.setStroke(new BasicStroke(1f));
        double bottom = f.y0() + f.height();
        double stepR = niceStep((r[r.length - 1] - f.rLeft()) * 1e3);
        for (double mm = Math.ceil(f.rLeft() * 1e3 / stepR) * stepR; mm <= r[r.length - 1] * 1e3 + 1e-9;
                mm += stepR) {
            double x = f.x(mm / 1e3);
            g.setColor(QUIET_INK);
            g.draw(new Line2D.Double(x, bottom, x, bottom + 5));
            String s = number(Math.abs(mm));
            g.setColor(INK);
            g.drawString(s, (float) (x - m.stringWidth(s) / 2.0), (float) (bottom + 7 + m.getAscent()));
        }
        double stepZ = niceStep((z[z.length - 1] - z[0]) * 1e3);
        for (double mm = Math.ceil(z[0] * 1e3 / stepZ) * stepZ; mm <= z[z.length - 1] * 1e3 + 1e-9; mm += stepZ) {
            double y = f.y(mm / 1e3);
            g.setColor(QUIET_INK);
            g.draw(new Line2D.Double(f.x0() - 5, y, f.x0(), y));
            String s = number(mm);
            g.setColor(INK);
            g.drawString(s, (float) (f.x0() - 8 - m.stringWidth(s)), (float) (y + m.getAscent() / 2.0 - 1));
        }
        g.setFont(new Font(FONT, Font.PLAIN, 12));
        m = g.getFontMetrics();
        String rLabel = f.mirrored() ? "r, distance from the axis (mm), on both sides of it"
                : "r, distance from the axis (mm)";
        g.drawString(rLabel, (float) (f.x0() + f.width() / 2.0 - m.stringWidth(rLabel) / 2.0),
                (float) (bottom + 26 + m.getAscent()));
        String zLabel = "z (mm)";
        g.drawString(zLabel, (float) (f.x0() - m.stringWidth(zLabel) - 8), (float) (f.y0() - 8));
    }

    private void paintColourBar(Graphics2D g, Frame f) {
        int barW = 16;
        int barH = Math.max(40, Math.min(f.height(), 360));
        double x = f.x0() + f.width() + 22;
        double y = f.y0() + (f.height() - barH) / 2.0;
        BufferedImage bar = new BufferedImage(barW, barH, BufferedImage.TYPE_INT_RGB);
        for (int py = 0; py < barH; py++) {
            int rgb = Colours.field(1 - (py + 0.5) / barH);
            for (int px = 0; px < barW; px++) {
                bar.setRGB(px, py, rgb);
            }
        }
        g.drawImage(bar, (int) x, (int) y, null);
        g.setColor(QUIET_INK);
        g.setStroke(new BasicStroke(1f));
        g.draw(new Rectangle2D.Double((int) x, (int) y, barW, barH));
        double unit = unitOf(Math.sqrt(scaleLow * scaleHigh));
        String unitName = unitName(unit);
        g.setFont(new Font(FONT, Font.PLAIN, 11));
        FontMetrics m = g.getFontMetrics();
        double lo = Math.log10(scaleLow);
        double span = Math.log10(scaleHigh) - lo;
        double[] multiples = span <= 2.2 ? new double[] {1, 2, 5} : new double[] {1};
        for (int decade = (int) Math.floor(lo); decade <= (int) Math.ceil(lo + span); decade++) {
            for (double mult : multiples) {
                double v = mult * Math.pow(10, decade);
                double t = (Math.log10(v) - lo) / span;
                if (t < -1e-9 || t > 1 + 1e-9) {
                    continue;
                }
                double ty = (int) y + barH * (1 - t);
                g.setColor(QUIET_INK);
                g.draw(new Line2D.Double((int) x + barW, ty, (int) x + barW + 4, ty));
                g.setColor(INK);
                g.drawString(number(v / unit), (float) ((int) x + barW + 7), (float) (ty + m.getAscent() / 2.0 - 1));
            }
        }
        g.setFont(new Font(FONT, Font.PLAIN, 12));
        g.drawString("|B| (" + unitName + ")", (float) x - 4, (float) y - 22);
        g.setFont(new Font(FONT, Font.PLAIN, 10));
        g.setColor(QUIET_INK);
        g.drawString("peak, log scale", (float) x - 4, (float) y - 8);
    }

    private void paintTitle(Graphics2D g) {
        g.setColor(INK);
        g.setFont(new Font(FONT, Font.BOLD, 15));
        g.drawString(title, LEFT, 22);
        g.setFont(new Font(FONT, Font.PLAIN, 11));
        g.setColor(QUIET_INK);
        g.drawString("colour: |B| on a log scale;  thin lines: flux lines (contours of Re ψ), equal flux between neighbours"
                + (fluxLines > 0 ? "" : " (none drawn)") + ";  thick lines: bodies", LEFT, 40);
    }

    // ---------------------------------------------------------------- helpers

    private static double percentile(double[] sorted, double p) {
        return sorted[(int) Math.min(sorted.length - 1, Math.round(p * (sorted.length - 1)))];
    }

    /** A tick step of 1, 2 or 5 times a power of ten, giving about five to ten ticks over span. */
    private static double niceStep(double span) {
        double raw = span / 6;
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / p;
        return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
    }

    /**
     * The unit in which a flux density reads from 1 to below 1000: T, mT, µT or nT.
     *
     * @param tesla the flux density in T
     * @return the unit's size in T
     */
    static double unitOf(double tesla) {
        if (tesla >= 1) {
            return 1;
        }
        if (tesla >= 1e-3) {
            return 1e-3;
        }
        return tesla >= 1e-6 ? 1e-6 : 1e-9;
    }

    /**
     * The symbol of a unit chosen by {@link #unitOf(double)}.
     *
     * @param unit the unit's size in T
     * @return its symbol
     */
    static String unitName(double unit) {
        return unit == 1 ? "T" : unit == 1e-3 ? "mT" : unit == 1e-6 ? "µT" : "nT";
    }

    private static String number(double v) {
        double a = Math.abs(v);
        if (a < 1e-9) {
            return "0";
        }
        String s = String.format(Locale.ROOT, a >= 1 && a < 1e6 ? "%.0f" : "%.3g", v);
        if (a >= 1 && a < 1e6 && Math.abs(v - Math.rint(v)) > 1e-6) {
            s = String.format(Locale.ROOT, "%.3g", v);
        }
        return s.contains("e") ? s : s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }

    /** {rMin, rMax, zMin, zMax} in m framing the bodies (and coils) with a margin. */
    private static double[] frame(Arrangement arrangement, CoilPair pair) {
        Require.nonNull("arrangement", arrangement);
        double rMax = 0;
        double zMin = Double.POSITIVE_INFINITY;
        double zMax = Double.NEGATIVE_INFINITY;
        for (Body body : arrangement.bodies()) {
            for (double[] rect : body.crossSectionMetres()) {
                rMax = Math.max(rMax, rect[1]);
                zMin = Math.min(zMin, rect[2]);
                zMax = Math.max(zMax, rect[3]);
            }
        }
        if (pair != null) {
            double d = pair.separation().toMetres();
            for (Coil c : List.of(pair.transmitter(), pair.receiver())) {
                double w = c.radialWidth().map(x -> x.toMetres()).orElse(0.0);
                double l = c.axialLength().map(x -> x.toMetres()).orElse(0.0);
                rMax = Math.max(rMax, c.radius().toMetres() + w / 2);
                zMin = Math.min(zMin, -d / 2 - l / 2);
                zMax = Math.max(zMax, d / 2 + l / 2);
            }
        }
        if (rMax == 0) {
            throw new IllegalArgumentException("the arrangement has no body to frame a field map around");
        }
        double height = zMax - zMin;
        double margin = Math.max(0.3 * height, 0.3 * rMax);
        return new double[] {0, Math.max(1.6 * rMax, rMax + 0.5 * height), zMin - margin, zMax + margin};
    }

    /** Columns and rows for about 30 000 points at equal spacing in r and z. */
    private static int[] grid(double[] box) {
        double w = box[1] - box[0];
        double h = box[3] - box[2];
        double step = Math.sqrt(w * h / 30_000);
        return new int[] {(int) Math.max(8, Math.min(2000, Math.round(w / step) + 1)),
            (int) Math.max(8, Math.min(2000, Math.round(h / step) + 1))};
    }

    /** Listing the body outlines: the edges of a union of touching rectangles, without the seams. */
    static final class Outline {
        private Outline() {
        }

        /**
         * The outer edges of non-overlapping rectangles: each rectangle edge less the parts
         * that another rectangle's edge covers on the opposite side.
         *
         * @param rects each {r0, r1, z0, z1}
         * @return segments {r0, z0, r1, z1}
         */
        static List<double[]> edges(List<double[]> rects) {
            List<double[]> out = new ArrayList<>();
            for (int i = 0; i < rects.size(); i++) {
                double[] a = rects.get(i);
                // bottom (z0), top (z1): horizontal; left (r0), right (r1): vertical
                addUncovered(out, rects, i, a[2], a[0], a[1], true, 3);
                addUncovered(out, rects, i, a[3], a[0], a[1], true, 2);
                addUncovered(out, rects, i, a[0], a[2], a[3], false, 1);
                addUncovered(out, rects, i, a[1], a[2], a[3], false, 0);
            }
            return out;
        }

        /**
         * Adds the parts of one edge (at {@code at}, from {@code from} to {@code to}) not
         * covered by the opposite edge (index {@code opposite} in the rectangle array) of
         * another rectangle.
         */
        private static void addUncovered(List<double[]> out, List<double[]> rects, int self, double at, double from,
                                         double to, boolean horizontal, int opposite) {
            List<double[]> pieces = new ArrayList<>();
            pieces.add(new double[] {from, to});
            for (int j = 0; j < rects.size(); j++) {
                double[] o = rects.get(j);
                if (j == self || Math.abs(o[opposite] - at) > 1e-12) {
                    continue;
                }
                double c0 = horizontal ? o[0] : o[2];
                double c1 = horizontal ? o[1] : o[3];
                List<double[]> next = new ArrayList<>();
                for (double[] p : pieces) {
                    if (c1 <= p[0] || c0 >= p[1]) {
                        next.add(p);
                        continue;
                    }
                    if (c0 > p[0]) {
                        next.add(new double[] {p[0], c0});
                    }
                    if (c1 < p[1]) {
                        next.add(new double[] {c1, p[1]});
                    }
                }
                pieces = next;
            }
            for (double[] p : pieces) {
                out.add(horizontal ? new double[] {p[0], at, p[1], at} : new double[] {at, p[0], at, p[1]});
            }
        }
    }
}
