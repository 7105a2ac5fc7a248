/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.source.doctree.DocCommentTree;
import com.sun.source.doctree.DocTree;
import com.sun.source.doctree.ReferenceTree;
import com.sun.source.doctree.ValueTree;
import com.sun.source.tree.ClassTree;
import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.tree.IdentifierTree;
import com.sun.source.tree.ImportTree;
import com.sun.source.tree.MemberSelectTree;
import com.sun.source.tree.MethodInvocationTree;
import com.sun.source.tree.MethodTree;
import com.sun.source.tree.NewClassTree;
import com.sun.source.tree.ThrowTree;
import com.sun.source.tree.Tree;
import com.sun.source.tree.VariableTree;
import com.sun.source.util.DocTreePath;
import com.sun.source.util.DocTreePathScanner;
import com.sun.source.util.DocTrees;
import com.sun.source.util.JavacTask;
import com.sun.source.util.TreePath;
import com.sun.source.util.TreePathScanner;
import com.sun.source.util.TreeScanner;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.lang.model.element.Modifier;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileObject;
import javax.tools.StandardJavaFileManager;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The javadoc contract of the published API, read from the sources of every module of this
 * repository that has a {@code module-info.java} (parsed with the JDK's compiler tree API,
 * nothing compiled):
 *
 * <ol>
 *   <li>Every public method and constructor of an exported type that refuses input says so:
 *       if its body throws, calls a check of {@code Require} other than the null check (a
 *       null argument is refused as its {@code @param} says "not null", as in java.time),
 *       creates an {@code InvalidQuantityException},
 *       or calls a method of its own class that does (followed through private helpers and
 *       overloads, by name), its javadoc has a {@code @throws} tag. Methods without a doc
 *       comment that override an interface method inherit its contract and are not
 *       counted; {@code throw new AssertionError} marks code that cannot be reached and is
 *       not a refusal.</li>
 *   <li>No javadoc of an exported type points a reader to what the published javadoc does
 *       not show: a {@code {@link}}, {@code {@linkplain}} or {@code @see} to a type that is
 *       not public, or that lives in a package the module does not export to everyone
 *       ({@code {@value}} is allowed: it prints the constant, not a link).</li>
 * </ol>
 *
 * <p>The first check follows calls within one class only (a call into another class that
 * refuses, such as a quantity factory, is not seen), so it finds the missing tags it can
 * prove, not all of them.
 */
class JavadocContractTest {

    /**
     * {@code Require} methods that are not counted as refusals: a null argument is documented
     * by "not null" on its {@code @param} (the java.time convention), and {@code show} formats.
     */
    private static final Set<String> NOT_REFUSALS = Set.of("nonNull", "show");

    /**
     * Methods the scan counts as refusing that cannot refuse, each with the reason (the scan
     * follows calls by name, so it cannot see that the arguments it passes are always valid).
     */
    private static final Map<String, String> CANNOT_REFUSE = Map.ofEntries(
            Map.entry("io.shieldmath.shield.planar.Barrier.reversed()",
                    "the same layers in the other order, which the constructor has accepted already"),
            Map.entry("io.shieldmath.shield.quantity.FrequencyBand.at(Frequency)",
                    "of(f, f): the only refusal of of(low, high) is high below low"),
            Map.entry("io.shieldmath.shield.coupling.CoilPair.swapped()",
                    "windings are centred on their coils' planes, so the gap between them is the same both ways"),
            Map.entry("io.shieldmath.shield.bench.BenchComparison.of(VoltageReading, VoltageReading, CouplingResult)",
                    "a coupling result's insertion loss is finite (the model checks it), the only refusal of of(..., double)"),
            Map.entry("io.shieldmath.shield.medium.Medium.withConductivity(Conductivity)",
                    "of(...) with this medium's own name, never blank; its other refusals are nulls"),
            Map.entry("io.shieldmath.shield.medium.Medium.withPermeability(PermeabilityModel)",
                    "of(...) with this medium's own name, never blank; its other refusals are nulls"),
            Map.entry("io.shieldmath.shield.medium.Medium.withPermittivity(RelativePermittivity)",
                    "of(...) with this medium's own name, never blank; its other refusals are nulls"),
            Map.entry("io.shieldmath.shield.materials.RangeTolerance.widest(ToleranceStudy, Collection<Material>)",
                    "asks of(material, property) only for conductivity and permeability, the two it accepts"),
            Map.entry("io.shieldmath.shield.materials.TypicalRange.toString()",
                    "a range is made only for a property that takes one, so unit(property) always has an answer"),
            Map.entry("io.shieldmath.shield.materials.files.DesignShell.inUniformField(boolean)",
                    "the constructor's checks do not depend on the field flag, and this shell passed them"),
            Map.entry("io.shieldmath.shield.cli.BatchCommand.main(String[])",
                    "reports every failure as a message and an exit code"));

    private static final Pattern EXPORTS = Pattern.compile("(?m)^\\s*exports\\s+([\\w.]+)\\s*(to\\b)?");

    /** A type of this repository: its package, whether it is public and whether its package is exported to all. */
    private record TypeInfo(String pkg, boolean isPublic, boolean exported) {
    }

    private final Map<String, TypeInfo> types = new HashMap<>();
    private final Set<String> exportedPackages = new HashSet<>();
    private final List<CompilationUnitTree> units = new ArrayList<>();
    private final Set<String> allowedSeen = new HashSet<>();
    private DocTrees docTrees;
    private int methods;

    @Test
    void everyRefusalIsDocumentedAndNoLinkLeavesThePublishedApi() throws IOException {
        JavadocContractTest scan = new JavadocContractTest();
        List<String> problems = scan.scan(Paths.get("").toAbsolutePath().getParent());
        assertTrue(scan.exportedPackages.contains("io.shieldmath.shield.planar") && scan.methods > 500,
                () -> "expected the public methods of the repository's modules, read " + scan.methods + " in "
                        + scan.exportedPackages);
        CANNOT_REFUSE.keySet().stream().filter(k -> !scan.allowedSeen.contains(k)).sorted()
                .forEach(k -> problems.add("listed as unable to refuse but not found (renamed?): " + k));
        assertTrue(problems.isEmpty(), () -> problems.size() + " problems:\n" + String.join("\n", problems));
    }

    /** The scan itself finds what it is meant to find, in a small module written here. */
    @Test
    void theScanFindsAMissingThrowsAndAHiddenLink(@TempDir Path root) throws IOException {
        Path src = root.resolve("demo/src/main/java");
        Files.createDirectories(src.resolve("demo/api"));
        Files.createDirectories(src.resolve("demo/hidden"));
        Files.writeString(src.resolve("module-info.java"),
                "module demo {\n    exports demo.api;\n    exports demo.hidden to other;\n}\n");
        Files.writeString(src.resolve("demo/hidden/Engine.java"),
                "package demo.hidden;\n/** Hidden. */\npublic final class Engine {\n"
                        + "    /** N. */\n    public static final int N = 3;\n}\n");
        Files.writeString(src.resolve("demo/api/Helper.java"),
                "package demo.api;\nfinal class Helper {\n}\n");
        Files.writeString(src.resolve("demo/api/Widget.java"), String.join("\n",
                "package demo.api;",
                "import demo.hidden.Engine;",
                "/** A widget, see {@link Engine}; at most {@value Engine#N}. */",
                "public final class Widget {",
                "    private Widget() {",
                "    }",
                "    /** Refuses, undocumented. @param x x @return w */",
                "    public static Widget of(double x) {",
                "        if (x < 0) {",
                "            throw new IllegalArgumentException(\"x\");",
                "        }",
                "        return new Widget();",
                "    }",
                "    /** Refuses through of. @param k k @return w */",
                "    public Widget scaled(double k) {",
                "        return of(k);",
                "    }",
                "    /** Checks with Require, documented. @param k k @return w",
                "     * @throws IllegalArgumentException if k is out of range */",
                "    public Widget checked(double k) {",
                "        Require.inRange(\"k\", k, 0, 1, \"\");",
                "        return this;",
                "    }",
                "    /** Only a null check, said by its param. @param s s, not null @return w */",
                "    public Widget named(String s) {",
                "        Require.nonNull(\"s\", s);",
                "        return this;",
                "    }",
                "    /** Points at {@link Helper}. @return w */",
                "    public Widget helped() {",
                "        return this;",
                "    }",
                "}",
                ""));
        JavadocContractTest scan = new JavadocContractTest();
        List<String> problems = scan.scan(root);
        assertEquals(List.of(
                "no @throws: demo.api.Widget.of(double)",
                "no @throws: demo.api.Widget.scaled(double)",
                "link out of the published API: demo.api.Widget -> Engine (package not exported)",
                "link out of the published API: demo.api.Widget.helped() -> Helper (not public)"), problems);
        assertEquals(5, scan.methods);
    }

    /**
     * Reads every module under {@code root} that has {@code src/main/java/module-info.java}
     * and returns the problems found, missing {@code @throws} first.
     */
    private List<String> scan(Path root) throws IOException {
        List<Path> sourceRoots = new ArrayList<>();
        try (Stream<Path> dirs = Files.list(root)) {
            for (Path module : (Iterable<Path>) dirs.sorted()::iterator) {
                Path info = module.resolve("src/main/java/module-info.java");
                if (Files.isRegularFile(info)) {
                    sourceRoots.add(module.resolve("src/main/java"));
                    Matcher m = EXPORTS.matcher(Files.readString(info, StandardCharsets.UTF_8));
                    while (m.find()) {
                        if (m.group(2) == null) {
                            exportedPackages.add(m.group(1));
                        }
                    }
                }
            }
        }
        parse(sourceRoots);
        for (CompilationUnitTree unit : units) {
            index(unit);
        }
        Set<String> missingThrows = new TreeSet<>();
        Set<String> hiddenLinks = new TreeSet<>();
        for (CompilationUnitTree unit : units) {
            String pkg = packageOf(unit);
            if (!exportedPackages.contains(pkg)) {
                continue;
            }
            for (Tree t : unit.getTypeDecls()) {
                if (t instanceof ClassTree c && isPublic(c, false)) {
                    methods += checkType(unit, c, pkg + "." + c.getSimpleName(), missingThrows, hiddenLinks);
                }
            }
        }
        List<String> problems = new ArrayList<>();
        missingThrows.forEach(s -> problems.add("no @throws: " + s));
        hiddenLinks.forEach(s -> problems.add("link out of the published API: " + s));
        return problems;
    }

    private void parse(List<Path> sourceRoots) throws IOException {
        JavaCompiler compiler = ToolProvider.getSystemJavaCompiler();
        try (StandardJavaFileManager files = compiler.getStandardFileManager(null, null, StandardCharsets.UTF_8)) {
            List<Path> sources = new ArrayList<>();
            for (Path r : sourceRoots) {
                try (Stream<Path> s = Files.walk(r)) {
                    s.filter(p -> p.toString().endsWith(".java") && !p.endsWith("module-info.java")
                            && !p.endsWith("package-info.java")).forEach(sources::add);
                }
            }
            Iterable<? extends JavaFileObject> objects = files.getJavaFileObjectsFromPaths(sources);
            JavacTask task = (JavacTask) compiler.getTask(null, files, null, List.of("-proc:none"), null, objects);
            for (CompilationUnitTree u : task.parse()) {
                units.add(u);
            }
            docTrees = DocTrees.instance(task);
        }
    }

    private static String packageOf(CompilationUnitTree unit) {
        return unit.getPackageName() == null ? "" : unit.getPackageName().toString();
    }

    private void index(CompilationUnitTree unit) {
        String pkg = packageOf(unit);
        boolean exported = exportedPackages.contains(pkg);
        for (Tree t : unit.getTypeDecls()) {
            if (t instanceof ClassTree c) {
                indexType(c, pkg, pkg + "." + c.getSimpleName(), isPublic(c, false), exported);
            }
        }
    }

    private void indexType(ClassTree c, String pkg, String name, boolean visible, boolean exported) {
        types.put(name, new TypeInfo(pkg, visible, exported));
        for (Tree m : c.getMembers()) {
            if (m instanceof ClassTree n) {
                indexType(n, pkg, name + "." + n.getSimpleName(), visible && isPublic(n, isInterface(c)), exported);
            }
        }
    }

    private static boolean isInterface(ClassTree c) {
        return c.getKind() == Tree.Kind.INTERFACE || c.getKind() == Tree.Kind.ANNOTATION_TYPE;
    }

    private static boolean isPublic(ClassTree c, boolean inInterface) {
        Set<Modifier> m = c.getModifiers().getFlags();
        return m.contains(Modifier.PUBLIC) || inInterface && !m.contains(Modifier.PRIVATE);
    }

    /** Checks one public type (and its public nested types); returns the number of public methods read. */
    private int checkType(CompilationUnitTree unit, ClassTree type, String name, Set<String> missingThrows,
                          Set<String> hiddenLinks) {
        boolean iface = isInterface(type);
        checkLinks(unit, type, type, name, hiddenLinks);
        Map<String, List<MethodTree>> byName = new HashMap<>();
        for (Tree m : type.getMembers()) {
            if (m instanceof MethodTree mt) {
                byName.computeIfAbsent(mt.getName().toString(), k -> new ArrayList<>()).add(mt);
            }
        }
        Set<String> refusing = refusingMethodNames(type, byName);
        int count = 0;
        for (Tree m : type.getMembers()) {
            if (m instanceof ClassTree nested && isPublic(nested, iface)) {
                count += checkType(unit, nested, name + "." + nested.getSimpleName(), missingThrows, hiddenLinks);
            } else if (m instanceof VariableTree v && isVisible(v.getModifiers().getFlags(), iface)) {
                checkLinks(unit, type, v, name + "." + v.getName(), hiddenLinks);
            } else if (m instanceof MethodTree mt && isVisible(mt.getModifiers().getFlags(), iface)) {
                count++;
                String label = name + "." + signature(mt);
                checkLinks(unit, type, mt, label, hiddenLinks);
                DocCommentTree doc = docTrees.getDocCommentTree(TreePath.getPath(unit, mt));
                boolean overrides = mt.getModifiers().getAnnotations().stream()
                        .anyMatch(a -> a.getAnnotationType().toString().equals("Override"));
                if (doc == null && overrides) {
                    continue; // inherits the contract of the method it implements
                }
                if (CANNOT_REFUSE.containsKey(label)) {
                    allowedSeen.add(label);
                } else if (mt.getBody() != null && refuses(mt, type, refusing) && !hasThrowsTag(doc)) {
                    missingThrows.add(label);
                }
            }
        }
        return count;
    }

    private static boolean isVisible(Set<Modifier> flags, boolean inInterface) {
        return flags.contains(Modifier.PUBLIC) || flags.contains(Modifier.PROTECTED)
                || inInterface && !flags.contains(Modifier.PRIVATE);
    }

    private static String signature(MethodTree mt) {
        String params = mt.getParameters().stream().map(p -> p.getType().toString()).collect(Collectors.joining(", "));
        return mt.getName() + "(" + params + ")";
    }

    private static boolean hasThrowsTag(DocCommentTree doc) {
        return doc != null && doc.getBlockTags().stream()
                .anyMatch(t -> t.getKind() == DocTree.Kind.THROWS || t.getKind() == DocTree.Kind.EXCEPTION);
    }

    /** The names of this type's methods that refuse directly or through others of its methods (a fixed point). */
    private static Set<String> refusingMethodNames(ClassTree type, Map<String, List<MethodTree>> byName) {
        Set<String> refusing = new HashSet<>();
        boolean grew = true;
        while (grew) {
            grew = false;
            for (Map.Entry<String, List<MethodTree>> e : byName.entrySet()) {
                if (refusing.contains(e.getKey())) {
                    continue;
                }
                for (MethodTree mt : e.getValue()) {
                    if (mt.getBody() != null && refuses(mt, type, refusing)) {
                        refusing.add(e.getKey());
                        grew = true;
                        break;
                    }
                }
            }
        }
        return refusing;
    }

    /** Whether the body throws, checks with Require, or calls a refusing method of its own class by name. */
    private static boolean refuses(MethodTree mt, ClassTree owner, Set<String> refusingNames) {
        boolean[] found = {false};
        new TreeScanner<Void, Void>() {
            @Override
            public Void visitThrow(ThrowTree node, Void p) {
                String thrown = node.getExpression().toString();
                if (!thrown.startsWith("new AssertionError")) {
                    found[0] = true;
                }
                return super.visitThrow(node, p);
            }

            @Override
            public Void visitNewClass(NewClassTree node, Void p) {
                String created = node.getIdentifier().toString();
                if (created.equals(owner.getSimpleName().toString()) && refusingNames.contains("<init>")) {
                    found[0] = true;
                }
                return super.visitNewClass(node, p);
            }

            @Override
            public Void visitMethodInvocation(MethodInvocationTree node, Void p) {
                Tree select = node.getMethodSelect();
                if (select instanceof MemberSelectTree ms) {
                    String target = ms.getExpression().toString();
                    String called = ms.getIdentifier().toString();
                    boolean require = target.equals("Require") || target.endsWith(".Require");
                    if (require && !NOT_REFUSALS.contains(called)
                            || target.equals("this") && refusingNames.contains(called)) {
                        found[0] = true;
                    }
                } else if (select instanceof IdentifierTree id) {
                    String called = id.getName().toString();
                    if (refusingNames.contains(called) || called.equals("this") && refusingNames.contains("<init>")) {
                        found[0] = true;
                    }
                }
                return super.visitMethodInvocation(node, p);
            }

            @Override
            public Void visitClass(ClassTree node, Void p) {
                return null; // a nested or anonymous class's code runs later, not in this call
            }
        }.scan(mt.getBody(), null);
        return found[0];
    }

    /** Flags references in the doc comment of {@code member} to types the published javadoc does not show. */
    private void checkLinks(CompilationUnitTree unit, ClassTree owner, Tree member, String label,
                            Set<String> hiddenLinks) {
        TreePath path = TreePath.getPath(unit, member);
        DocCommentTree doc = path == null ? null : docTrees.getDocCommentTree(path);
        if (doc == null) {
            return;
        }
        Map<String, String> imports = imports(unit);
        String pkg = packageOf(unit);
        Set<String> refs = new LinkedHashSet<>();
        new DocTreePathScanner<Void, Void>() {
            @Override
            public Void visitValue(ValueTree node, Void p) {
                return null; // {@value X#C} prints the constant's value, it is not a link
            }

            @Override
            public Void visitReference(ReferenceTree node, Void p) {
                refs.add(node.getSignature());
                return null;
            }
        }.scan(new DocTreePath(path, doc), null);
        for (String ref : refs) {
            String typePart = ref.contains("#") ? ref.substring(0, ref.indexOf('#')) : ref;
            if (typePart.isEmpty()) {
                continue;
            }
            String resolved = resolve(typePart, imports, pkg, owner);
            TypeInfo info = resolved == null ? null : types.get(resolved);
            if (info != null && (!info.isPublic() || !info.exported())) {
                hiddenLinks.add(label + " -> " + ref + " (" + (info.isPublic() ? "package not exported" : "not public") + ")");
            }
        }
    }

    private static Map<String, String> imports(CompilationUnitTree unit) {
        Map<String, String> m = new HashMap<>();
        for (ImportTree i : unit.getImports()) {
            if (!i.isStatic()) {
                String q = i.getQualifiedIdentifier().toString();
                m.put(q.substring(q.lastIndexOf('.') + 1), q);
            }
        }
        return m;
    }

    /** The repository type a javadoc reference names, or null if it names none (a JDK type, say). */
    private String resolve(String ref, Map<String, String> imports, String pkg, ClassTree owner) {
        if (types.containsKey(ref)) {
            return ref;
        }
        String first = ref.contains(".") ? ref.substring(0, ref.indexOf('.')) : ref;
        String rest = ref.substring(first.length());
        if (imports.containsKey(first)) {
            return imports.get(first) + rest;
        }
        for (Tree m : owner.getMembers()) {
            if (m instanceof ClassTree n && n.getSimpleName().contentEquals(first)) {
                return null; // a nested type of the owner: checked where it is declared
            }
        }
        String samePackage = pkg + "." + ref;
        return types.containsKey(samePackage) ? samePackage : null;
    }
}
