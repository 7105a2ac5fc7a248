/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import java.awt.Dimension;
import java.awt.Graphics2D;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.w3c.dom.Document;

/**
 * Writes whatever a painter draws on a {@link Graphics2D} as an SVG file, through Apache
 * Batik's SVG generator (Apache-2.0) on the JDK's own DOM.
 *
 * <p>Text is written as SVG {@code <text>} elements with the font named, never as glyph
 * outlines and never with embedded fonts, so that the words of a picture can be searched,
 * selected and read by a screen reader. Not for use outside this package.
 */
final class SvgOutput {

    private static final String SVG_NAMESPACE = "http://www.w3.org/2000/svg";

    private SvgOutput() {
    }

    /**
     * Paints a picture into an SVG file.
     *
     * @param file    the file to write, replaced if it exists
     * @param width   the canvas width in pixels (CSS px), positive
     * @param height  the canvas height in pixels, positive
     * @param painter draws the picture on a canvas of {@code width} by {@code height}
     * @throws IOException if the file cannot be written
     */
    static void write(Path file, int width, int height, Consumer<Graphics2D> painter) throws IOException {
        System.setProperty("java.awt.headless", "true");
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
        SVGGraphics2D g = new SVGGraphics2D(context, false);   // false: text as <text>, not as shapes
        g.setSVGCanvasSize(new Dimension(width, height));
        painter.accept(g);
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            g.stream(out, true);
        }
    }
}
