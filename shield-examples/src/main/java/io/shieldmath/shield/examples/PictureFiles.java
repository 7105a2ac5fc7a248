/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import io.shieldmath.shield.internal.Require;
import java.awt.Dimension;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.awt.image.RenderedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.batik.svggen.ImageHandlerBase64Encoder;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2DIOException;
import org.apache.batik.svggen.SVGGraphics2D;
import org.w3c.dom.Document;

/**
 * Writes whatever a painter draws on a {@link Graphics2D} as a PNG file, or as an SVG file
 * through Apache Batik's SVG generator (Apache-2.0) on the JDK's own DOM.
 *
 * <p>In the SVG, text is written as {@code <text>} elements with the font named, never as
 * glyph outlines and never with embedded fonts, so that the words of a picture can be
 * searched, selected and read by a screen reader. Both run headless. Not for use outside
 * this package.
 */
final class PictureFiles {

    /** The largest side of a picture in pixels. */
    static final int MAX_SIDE = 10_000;
    /** The smallest side of a picture in pixels. */
    static final int MIN_SIDE = 100;

    private static final String SVG_NAMESPACE = "http://www.w3.org/2000/svg";

    private PictureFiles() {
    }

    /**
     * Paints a picture into an SVG file.
     *
     * @param file    the file to write, replaced if it exists, not null
     * @param width   the canvas width in pixels (CSS px), 100 to 10 000
     * @param height  the canvas height in pixels, 100 to 10 000
     * @param painter draws the picture on a canvas of {@code width} by {@code height}
     * @throws IOException if the file cannot be written
     */
    static void writeSvg(Path file, int width, int height, Consumer<Graphics2D> painter) throws IOException {
        checkSize(file, width, height);
        Document document;
        try {
            document = DocumentBuilderFactory.newInstance().newDocumentBuilder().getDOMImplementation()
                    .createDocument(SVG_NAMESPACE, "svg", null);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the JDK offers no XML document builder", e);
        }
        SVGGeneratorContext context = SVGGeneratorContext.createDefault(document);
        context.setEmbeddedFontsOn(false);
        context.setComment("written by shield-examples");
        context.setPrecision(4);
        context.setImageHandler(new PngDataImages());
        SVGGraphics2D g = new SVGGraphics2D(context, false);   // false: text as <text>, not as shapes
        g.setSVGCanvasSize(new Dimension(width, height));
        smooth(g);
        painter.accept(g);
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            g.stream(out, true);
        }
    }

    /**
     * Paints a picture into a PNG file (opaque RGB).
     *
     * @param file    the file to write, replaced if it exists, not null
     * @param width   the image width in pixels, 100 to 10 000
     * @param height  the image height in pixels, 100 to 10 000
     * @param painter draws the picture on a canvas of {@code width} by {@code height}
     * @throws IOException if the file cannot be written
     */
    static void writePng(Path file, int width, int height, Consumer<Graphics2D> painter) throws IOException {
        checkSize(file, width, height);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            smooth(g);
            painter.accept(g);
        } finally {
            g.dispose();
        }
        if (!ImageIO.write(image, "png", file.toFile())) {
            throw new IOException("no PNG writer in this Java runtime");
        }
    }

    /**
     * Embeds raster images as base64 PNG data, encoded by the JDK's own PNG writer (Batik's
     * default handler needs an image codec module that we do not ship).
     */
    private static final class PngDataImages extends ImageHandlerBase64Encoder {
        @Override
        public void encodeImage(RenderedImage image, OutputStream out) throws SVGGraphics2DIOException {
            try {
                if (!ImageIO.write(image, "png", out)) {
                    throw new SVGGraphics2DIOException("no PNG writer in this Java runtime");
                }
            } catch (IOException e) {
                throw new SVGGraphics2DIOException(e);
            }
        }
    }

    private static void checkSize(Path file, int width, int height) {
        System.setProperty("java.awt.headless", "true");
        Require.nonNull("picture file", file);
        Require.inRange("picture width", width, MIN_SIDE, MAX_SIDE, "px");
        Require.inRange("picture height", height, MIN_SIDE, MAX_SIDE, "px");
    }

    private static void smooth(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
    }
}
