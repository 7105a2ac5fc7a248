/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.AxialFieldSolution;
import io.shieldmath.shield.axisymmetric.Body;
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
        int[] heights = {FieldMapExample.BENCH_HEIGHT, FieldMapExample.CAN_HEIGHT};
        for (int n = 0; n < 2; n++) {
            Path p = files.get(2 * n);
            BufferedImage img = ImageIO.read(p.toFile());
            assertEquals(FieldMapExample.WIDTH, img.getWidth(), p::toString);
            assertEquals(heights[n], img.getHeight(), p::toString);
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
        int[] heights = {FieldMapExample.BENCH_HEIGHT, FieldMapExample.CAN_HEIGHT};
        for (int n = 0; n < 2; n++) {
            Path p = files.get(2 * n + 1);
            Document d = f.newDocumentBuilder().parse(p.toFile());
            Element root = d.getDocumentElement();
            assertEquals("svg", root.getLocalName());
            assertEquals(String.valueOf(FieldMapExample.WIDTH), root.getAttribute("width"));
            assertEquals(String.valueOf(heights[n]), root.getAttribute("height"));
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
        picture.writePng(png, FieldMapExample.WIDTH, FieldMapExample.CAN_HEIGHT);
        BufferedImage img = ImageIO.read(png.toFile());
        FieldMapPicture.Frame frame = picture.frame(FieldMapExample.WIDTH, FieldMapExample.CAN_HEIGHT);
        double[] inside = {0.010, 0};        // r 10 mm, z 0: inside the 20 mm can, 30 mm long each way
        double[] outside = {0.040, 0};       // r 40 mm, z 0: beyond its 21 mm outer radius
        int in = pixel(img, frame, inside);
        int out = pixel(img, frame, outside);
        assertTrue(Colours.lightness(in) + 30 < Colours.lightness(out),
                "inside L* " + Colours.lightness(in) + ", outside L* " + Colours.lightness(out));
        // The section through the axis is mirrored: the same colour at −r.
        assertEquals(Colours.lightness(in), Colours.lightness(pixel(img, frame, new double[] {-inside[0], 0})), 2.0);
        // The can's outer wall face (r = 21 mm) is outlined in black.
        boolean outlined = false;
        for (int dx = -1; dx <= 1; dx++) {
            int rgb = img.getRGB((int) frame.x(0.021) + dx, (int) frame.y(0.01)) & 0xffffff;
            outlined |= Colours.lightness(rgb) < 10;
        }
        assertTrue(outlined, "the can's outline at r = 21 mm");
        double[] scale = picture.scaleTesla();
        for (double[] at : new double[][] {inside, outside}) {
            double bT = s.fluxDensityAt(Point.ofMetres(at[0], at[1]), FieldMapExample.APPLIED).magnitudeTesla();
            double t = Math.log10(bT / scale[0]) / Math.log10(scale[1] / scale[0]);
            int expected = Colours.field(t);
            double shown = Colours.lightness(pixel(img, frame, at));
            // within 2 L* (the map's grid interpolates between solver samples)
            assertEquals(Colours.lightness(expected), shown, 2.0, "at r " + at[0] + " m");
        }
        // A map that does not start on the axis is drawn as it is, not mirrored.
        FieldMapPicture offAxis = FieldMapPicture.of(can, s.fieldMap(Point.ofMillimetres(5, -40),
                Point.ofMillimetres(40, 40), 36, 81, FieldMapExample.APPLIED));
        FieldMapPicture.Frame f = offAxis.frame(600, 600);
        assertTrue(!f.mirrored() && Math.abs(f.x(0.005) - f.x0()) < 1e-9);
        offAxis.writePng(dir.resolve("off-axis.png"), 600, 600);
        assertEquals(600, ImageIO.read(dir.resolve("off-axis.png").toFile()).getWidth());
    }

    @Test
    void aCanIsOutlinedWithoutTheSeamsBetweenWallAndCaps() {
        // The can of the example: inner radius 20 mm, wall and caps 1 mm, 60 mm long, a 4 mm
        // hole in the upper cap. The outline of its section, added up by hand from those
        // dimensions: outer face 60, upper cap top 17, hole 1, upper cap underside 16, inner
        // face 58, lower cap top 20, lower cap on the axis 1, bottom 21: 194 mm. The seams
        // where the caps meet the wall (2 × 1 mm) are not drawn.
        Body can = FieldMapExample.canArrangement().bodies().get(0);
        double length = 0;
        for (double[] e : FieldMapPicture.Outline.edges(can.crossSectionMetres())) {
            length += Math.hypot(e[2] - e[0], e[3] - e[1]);
        }
        assertEquals(0.194, length, 1e-12);
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
