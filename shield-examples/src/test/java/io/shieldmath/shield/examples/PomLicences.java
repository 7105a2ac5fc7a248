/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.xml.sax.SAXException;

/**
 * The licences a component declares in its Maven POM (or, when it declares none, in its
 * nearest parent POM that does, as Maven inherits them), read from the local repository,
 * and the test of whether a licence is of the GPL or AGPL family.
 */
final class PomLicences {

    /** One declared licence: its name and address, either possibly empty. */
    record Licence(String name, String url) {
        @Override
        public String toString() {
            return url.isEmpty() ? name : name + " <" + url + ">";
        }
    }

    /** A component with the licences its POM chain declares (empty when none declares any). */
    record Component(String groupId, String artifactId, String version, List<Licence> licences) {
        String coordinates() {
            return groupId + ":" + artifactId + ":" + version;
        }
    }

    static final Comparator<Component> ORDER = Comparator.comparing(Component::groupId)
            .thenComparing(Component::artifactId).thenComparing(Component::version);

    /** The Lesser or Library GPL: a weak copyleft, not of the GPL family for this check. */
    private static final Pattern LESSER = Pattern.compile(
            "lgpl|lesser general public|library general public");
    /** GPL or AGPL, by name, SPDX-like identifier or address. */
    private static final Pattern GPL_FAMILY = Pattern.compile(
            "\\ba?gpl|general public licen[cs]e|gnu\\.org/licenses/(a?gpl|gpl)|gnu\\.org/copyleft/gpl");

    private PomLicences() {
    }

    /**
     * Whether a licence is the GNU GPL or AGPL (any version, with or without an exception),
     * and not the LGPL.
     */
    static boolean isGplFamily(Licence licence) {
        return !isLesserGpl(licence)
                && GPL_FAMILY.matcher((licence.name() + " " + licence.url()).toLowerCase(Locale.ROOT)).find();
    }

    /** Whether a licence is the GNU Lesser (or Library) GPL, any version. */
    static boolean isLesserGpl(Licence licence) {
        return LESSER.matcher((licence.name() + " " + licence.url()).toLowerCase(Locale.ROOT)).find();
    }

    /**
     * Whether a component may only be had under the GPL or AGPL: it declares licences and
     * every one of them is of that family. A component offered under a choice of licences,
     * one of them not GPL/AGPL, is taken under that one.
     */
    static boolean onlyGplFamily(Component component) {
        return !component.licences().isEmpty() && component.licences().stream().allMatch(PomLicences::isGplFamily);
    }

    /**
     * The component of a jar on the build's path: a jar in the local repository has its POM
     * beside it; a module of this repository has its {@code pom.xml} two levels up
     * ({@code module/target/x.jar} or {@code module/target/classes}).
     */
    static Component ofJar(Path jar, Path localRepository) throws IOException {
        Path pom;
        String file = jar.getFileName().toString();
        if (jar.startsWith(localRepository) && file.endsWith(".jar")) {
            pom = jar.resolveSibling(file.substring(0, file.length() - 4) + ".pom");
        } else {
            pom = jar.getParent().getParent().resolve("pom.xml");
        }
        return ofPom(pom, localRepository);
    }

    /** Reads a POM and, while no licence is declared, its parents. */
    static Component ofPom(Path pom, Path localRepository) throws IOException {
        Element project = parse(pom);
        Element parent = child(project, "parent");
        String groupId = text(project, "groupId");
        String version = text(project, "version");
        if (parent != null) {
            groupId = groupId.isEmpty() ? text(parent, "groupId") : groupId;
            version = version.isEmpty() ? text(parent, "version") : version;
        }
        List<Licence> licences = declared(project);
        Path at = pom;
        Element from = parent;
        while (licences.isEmpty() && from != null) {
            at = parentPom(at, from, localRepository);
            Element p = parse(at);
            licences = declared(p);
            from = child(p, "parent");
        }
        return new Component(groupId, text(project, "artifactId"), version, licences);
    }

    private static Path parentPom(Path child, Element parent, Path localRepository) throws IOException {
        String g = text(parent, "groupId");
        String a = text(parent, "artifactId");
        String v = text(parent, "version");
        Path inRepository = localRepository.resolve(g.replace('.', '/')).resolve(a).resolve(v)
                .resolve(a + "-" + v + ".pom");
        if (Files.isRegularFile(inRepository)) {
            return inRepository;
        }
        String relative = text(parent, "relativePath");
        Path beside = child.getParent().resolve(relative.isEmpty() ? "../pom.xml" : relative);
        if (Files.isDirectory(beside)) {
            beside = beside.resolve("pom.xml");
        }
        if (Files.isRegularFile(beside)) {
            Element p = parse(beside);
            if (a.equals(text(p, "artifactId"))) {
                return beside;
            }
        }
        throw new IOException("parent POM " + g + ":" + a + ":" + v + " of " + child + " not found");
    }

    private static List<Licence> declared(Element project) {
        List<Licence> out = new ArrayList<>();
        Element licences = child(project, "licenses");
        if (licences != null) {
            for (Node n = licences.getFirstChild(); n != null; n = n.getNextSibling()) {
                if (n instanceof Element e && "license".equals(e.getTagName())) {
                    out.add(new Licence(text(e, "name").replaceAll("\\s+", " "), text(e, "url")));
                }
            }
        }
        return out;
    }

    private static Element parse(Path pom) throws IOException {
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            f.setExpandEntityReferences(false);
            DocumentBuilder b = f.newDocumentBuilder();
            Document d = b.parse(pom.toFile());
            return d.getDocumentElement();
        } catch (ParserConfigurationException | SAXException e) {
            throw new IOException("cannot read the POM " + pom + ": " + e.getMessage(), e);
        }
    }

    private static Element child(Element parent, String name) {
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element e && name.equals(e.getTagName())) {
                return e;
            }
        }
        return null;
    }

    private static String text(Element parent, String name) {
        Element e = child(parent, name);
        return e == null ? "" : e.getTextContent().strip();
    }
}
