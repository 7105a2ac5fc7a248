/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.internal.JsonValues;
import io.shieldmath.shield.materials.internal.Node;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.MagnetizationCurves;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.SourcedCurve;
import io.shieldmath.shield.medium.MagnetizationCurve;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The magnetization-curve file format: B–H tables keyed by catalogue material, read with
 * strict validation and the location (JSON path, line and column) of every error. The
 * format (quantities are text with a unit; the origin is implied and not listed):
 *
 * <pre>
 * {
 *   "format": "shield-magnetization-curves",
 *   "version": 1,
 *   "curves": [
 *     {
 *       "material": "nickel-iron-80",
 *       "source": "from memory; to be checked against ASTM A753 alloy 4",
 *       "points": [ { "fieldStrength": "0.1 A/m", "fluxDensity": "7.5 mT" }, ... ]
 *     }
 *   ]
 * }
 * </pre>
 *
 * <p>Each curve's material must be in the catalogue given and must have a saturation flux
 * density there, which becomes the curve's; the points follow the ranges of {@link
 * MagnetizationCurve} (strictly increasing, every segment at least as steep as µ0, at most
 * {@value MagnetizationCurve#MAX_POINTS} points). Limits of the document as for {@link
 * CatalogueFile}. Stateless and thread-safe.
 */
public final class MagnetizationCurveFile {

    static final String FORMAT = "shield-magnetization-curves";

    private static final Set<String> TOP = Set.of("format", "version", "curves");
    private static final Set<String> CURVE = Set.of("material", "source", "points");
    private static final Set<String> POINT = Set.of("fieldStrength", "fluxDensity");

    private MagnetizationCurveFile() {
    }

    /**
     * Reads a curve document given as text.
     *
     * @param json      the document, not null
     * @param catalogue the catalogue the material identifiers refer to, not null
     * @return the curves
     * @throws MaterialFileException if the document is not acceptable (with its location)
     */
    public static MagnetizationCurves parse(String json, Catalogue catalogue) {
        return readCurves(Node.parse(Require.nonNull("json", json)), Require.nonNull("catalogue", catalogue));
    }

    /**
     * Reads a curve document from a stream (UTF-8, UTF-16 or UTF-32, detected); the stream
     * is not closed.
     *
     * @param in        the stream, not null
     * @param catalogue the catalogue the material identifiers refer to, not null
     * @return the curves
     * @throws MaterialFileException if the document is not acceptable
     * @throws UncheckedIOException  if reading fails
     */
    public static MagnetizationCurves read(InputStream in, Catalogue catalogue) {
        return readCurves(Node.parse(Require.nonNull("stream", in)), Require.nonNull("catalogue", catalogue));
    }

    /**
     * Reads a curve file.
     *
     * @param file      the file, not null
     * @param catalogue the catalogue the material identifiers refer to, not null
     * @return the curves
     * @throws IOException           if the file cannot be read
     * @throws MaterialFileException if the document is not acceptable
     */
    public static MagnetizationCurves read(Path file, Catalogue catalogue) throws IOException {
        try (InputStream in = Files.newInputStream(Require.nonNull("file", file))) {
            return read(in, catalogue);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    private static MagnetizationCurves readCurves(Node root, Catalogue catalogue) {
        Node.Fields top = root.object(TOP);
        JsonValues.header(top, FORMAT);
        List<Node> entries = top.required("curves").array(0, CatalogueFile.MAX_MATERIALS);
        List<SourcedCurve> out = new ArrayList<>(entries.size());
        Set<String> seen = new HashSet<>();
        for (Node e : entries) {
            Node.Fields f = e.object(CURVE);
            Node idNode = f.required("material");
            String id = idNode.string();
            if (!seen.add(id)) {
                throw idNode.error("a second curve for material \"" + id + "\"");
            }
            Material m = catalogue.find(id).orElseThrow(() -> idNode.error(catalogue.unknown(id)));
            MagneticFluxDensity bs = m.saturation().orElseThrow(() -> idNode.error("material \"" + id
                    + "\" has no saturation flux density in the catalogue; a magnetization curve needs one"));
            String source = JsonValues.source(f);
            Node pts = f.required("points");
            List<Node> list = pts.array(1, MagnetizationCurve.MAX_POINTS);
            double[] h = new double[list.size()];
            double[] b = new double[list.size()];
            for (int i = 0; i < h.length; i++) {
                Node.Fields p = list.get(i).object(POINT);
                h[i] = p.required("fieldStrength").quantity(MagneticFieldStrength::parse, "80 A/m").toAmperesPerMetre();
                b[i] = p.required("fluxDensity").quantity(MagneticFluxDensity::parse, "0.5 T").toTesla();
            }
            MagnetizationCurve c = pts.convert(s -> MagnetizationCurve.of(h, b, bs), "");
            out.add(JsonValues.at(e, () -> new SourcedCurve(id, c, source)));
        }
        return MagnetizationCurves.of(out);
    }
}
