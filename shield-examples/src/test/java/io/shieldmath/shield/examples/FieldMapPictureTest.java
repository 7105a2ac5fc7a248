/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.AxialFieldSolution;
import io.shieldmath.shield.axisymmetric.Point;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The field-map pictures read back: size, content, text, and the colour inside a can. */
class FieldMapPictureTest {

    @TempDir
    static Path dir;
    static List<Path> files;

    @BeforeAll
    static void writeBoth() throws IOException {
        files = FieldMapExample.write(dir);
    }

    @Test
    void bothPngsHaveTheirSizeAndAreNotBlank() throws IOException {
        for (Path p : List.of(files.get(0), files.get(2))) {
            BufferedImage img = ImageIO.read(p.toFile());
            assertEquals(FieldMapExample.WIDTH, img.getWidth(), p::toString);
            assertEquals(FieldMapExample.HEIGHT, img.getHeight(), p::toString);
            Set<Integer> colours = new HashSet<>();
            for (int y = 0; y < img.getHeight(); y += 3) {
                for (int x = 0; x < img.getWidth(); x += 3) {
                    colours.add(img.getRGB(x, y) & 0xffffff);
                }
            }
            // A colour field over several decades shows hundreds of colours; a blank canvas one.
            assertTrue(colours.size() > 200, p + " has only " + colours.size() + " colours");
        }
    }

    @Test
    void bothSvgsParseWithTheirSizeTitleAsTextAndAnEmbeddedColourField() throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        // No network at run time: do not fetch the SVG 1.0 DTD named in the DOCTYPE.
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        for (Path p : List.of(files.get(1), files.get(3))) {
            Document d = f.newDocumentBuilder().parse(p.toFile());
            Element root = d.getDocumentElement();
            assertEquals("svg", root.getLocalName());
            assertEquals(String.valueOf(FieldMapExample.WIDTH), root.getAttribute("width"));
            assertEquals(String.valueOf(FieldMapExample.HEIGHT), root.getAttribute("height"));
            NodeList texts = d.getElementsByTagNameNS("*", "text");
            StringBuilder words = new StringBuilder();
            for (int i = 0; i < texts.getLength(); i++) {
                words.append(texts.item(i).getTextContent()).append('\n');
            }
            assertTrue(words.toString().contains("illustrative)"), "the title must be SVG text: " + words);
            assertTrue(words.toString().contains("|B| ("), "the colour bar's unit must be SVG text");
            assertTrue(d.getElementsByTagNameNS("*", "image").getLength() >= 2, "colour field and colour bar");
            assertTrue(d.getElementsByTagNameNS("*", "path").getLength() > 0, "flux lines and outlines");
            String svg = Files.readString(p);
            assertTrue(svg.contains("data:image/png;base64,"), "the colour field is embedded, not linked");
            assertTrue(!svg.contains("<font") && !svg.contains("<glyph"), "no embedded fonts");
        }
    }

    @Test
    void insideTheCanIsDarkerThanOutsideAsTheColourMapSays() throws IOException {
        // The colour map puts weak field dark (L* rising with |B|, ColoursTest). A closed
        // high-µ can lowers the static field inside by orders of magnitude, so the middle of
        // the can must be darker than the field beside it, and each sample must show the
        // colour of the solver's own |B| there.
        Arrangement can = FieldMapExample.canArrangement();
        AxialFieldSolution s = can.inUniformAxialField().magnetostatic();
        FieldMapPicture picture = FieldMapPicture.around(can, s, FieldMapExample.APPLIED).withFluxLines(0);
        Path png = dir.resolve("can-plain.png");
        picture.writePng(png, FieldMapExample.WIDTH, FieldMapExample.HEIGHT);
        BufferedImage img = ImageIO.read(png.toFile());
        FieldMapPicture.Frame frame = picture.frame(FieldMapExample.WIDTH, FieldMapExample.HEIGHT);
        double[] inside = {0.010, 0};        // r 10 mm, z 0: inside the 20 mm can, 30 mm long each way
        double[] outside = {0.040, 0};       // r 40 mm, z 0: beyond its 21 mm outer radius
        int in = pixel(img, frame, inside);
        int out = pixel(img, frame, outside);
        assertTrue(Colours.lightness(in) + 30 < Colours.lightness(out),
                "inside L* " + Colours.lightness(in) + ", outside L* " + Colours.lightness(out));
        double[] scale = picture.scaleTesla();
        for (double[] at : new double[][] {inside, outside}) {
            double bT = s.fluxDensityAt(Point.ofMetres(at[0], at[1]), FieldMapExample.APPLIED).magnitudeTesla();
            double t = Math.log10(bT / scale[0]) / Math.log10(scale[1] / scale[0]);
            int expected = Colours.field(t);
            double shown = Colours.lightness(pixel(img, frame, at));
            // within 2 L* (the map's grid interpolates between solver samples)
            assertEquals(Colours.lightness(expected), shown, 2.0, "at r " + at[0] + " m");
        }
    }

    @Test
    void badInputIsRefusedWithItsValue() {
        FieldMapPicture p = FieldMapExample.canCase();
        assertThrows(IllegalArgumentException.class, () -> p.titled("  "));
        InvalidQuantityException e = assertThrows(InvalidQuantityException.class,
                () -> p.writePng(dir.resolve("x.png"), 20, 500));
        assertTrue(e.getMessage().contains("20"), e::getMessage);
        assertThrows(InvalidQuantityException.class, () -> p.withFluxLines(-1));
        assertThrows(NullPointerException.class, () -> FieldMapPicture.of(null, null));
    }

    private static int pixel(BufferedImage img, FieldMapPicture.Frame f, double[] rz) {
        return img.getRGB((int) f.x(rz[0]), (int) f.y(rz[1])) & 0xffffff;
    }
}
