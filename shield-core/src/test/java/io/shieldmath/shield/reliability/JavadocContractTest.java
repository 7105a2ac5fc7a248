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
import com.sun.source.tree.ExpressionTree;
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
 *       ({@code {@value}} is allowed: it prints the constant, not a link), or to a member of
 *       its own type that is not public.</li>
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
                    "reports every failure as a message and an exit code"),
            Map.entry("io.shieldmath.shield.enclosure.SaturationCheck.warnings()",
                    "asks suggestedMinimumThickness(w) only for the walls w it has"),
            Map.entry("io.shieldmath.shield.materials.files.DesignLayer.toString()",
                    "calls the getter medium(), not the refusing factory medium(Medium, Length) of the same name"),
            Map.entry("io.shieldmath.shield.axisymmetric.SaturationStudy.of(AxialFieldShielding)",
                    "builds the scene the evaluation has built already (its bodies and sensor region, no coils)"),
            Map.entry("io.shieldmath.shield.axisymmetric.files.AxisymmetricDesign.meeting(Requirement)",
                    "copies a design whose model was built and checked already; only the null check refuses"));

    private static final Pattern EXPORTS = Pattern.compile("(?m)^\\s*exports\\s+([\\w.]+)\\s*(to\\b)?");

    /** A type of this repository: its package, whether it is public and whether its package is exported to all. */
    private record TypeInfo(String pkg, boolean isPublic, boolean exported) {
    }

    /** A type of this repository with the file it is declared in. */
    private record Declared(CompilationUnitTree unit, ClassTree tree, String name, String pkg) {
    }

    private final Map<String, TypeInfo> types = new HashMap<>();
    private final Map<String, Declared> declared = new HashMap<>();
    /** For each type of the repository, the names of its methods that refuse ("<init>" for constructors). */
    private final Map<String, Set<String>> refusing = new HashMap<>();
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
        Files.writeString(src.resolve("demo/api/Helper.java"), String.join("\n",
                "package demo.api;",
                "final class Helper {",
                "    static int make(int n) {",
                "        if (n < 1) {",
                "            throw new IllegalArgumentException(\"n\");",
                "        }",
                "        return n;",
                "    }",
                "}",
                ""));
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
                "    /** Only a null check, said by its param; see {@link #secret()}. @param s s, not null @return w */",
                "    public Widget named(String s) {",
                "        Require.nonNull(\"s\", s);",
                "        return this;",
                "    }",
                "    private void secret() {",
                "    }",
                "    /** Points at {@link Helper}; refuses through it. @param n n @return w */",
                "    public Widget helped(int n) {",
                "        Helper.make(n);",
                "        return this;",
                "    }",
                "}",
                ""));
        JavadocContractTest scan = new JavadocContractTest();
        List<String> problems = scan.scan(root);
        assertEquals(List.of(
                "no @throws: demo.api.Widget.helped(int)",
                "no @throws: demo.api.Widget.of(double)",
                "no @throws: demo.api.Widget.scaled(double)",
                "link out of the published API: demo.api.Widget -> Engine (package not exported)",
                "link out of the published API: demo.api.Widget.helped(int) -> Helper (not public)",
                "link out of the published API: demo.api.Widget.named(String) -> #secret() (not public)"), problems);
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
        findRefusingMethods();
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
                indexType(unit, c, pkg, pkg + "." + c.getSimpleName(), isPublic(c, false), exported);
            }
        }
    }

    private void indexType(CompilationUnitTree unit, ClassTree c, String pkg, String name, boolean visible,
                           boolean exported) {
        types.put(name, new TypeInfo(pkg, visible, exported));
        declared.put(name, new Declared(unit, c, name, pkg));
        refusing.put(name, new HashSet<>());
        for (Tree m : c.getMembers()) {
            if (m instanceof ClassTree n) {
                indexType(unit, n, pkg, name + "." + n.getSimpleName(), visible && isPublic(n, isInterface(c)),
                        exported);
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
        Declared here = declared.get(name);
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
                } else if (mt.getBody() != null && refuses(mt, here) && !hasThrowsTag(doc)) {
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

    /**
     * Fills {@link #refusing}: a method refuses if its body does (see {@link #refuses}); calls
     * are followed through every type of the repository, to a fixed point.
     */
    private void findRefusingMethods() {
        boolean grew = true;
        while (grew) {
            grew = false;
            for (Declared d : declared.values()) {
                Set<String> names = refusing.get(d.name());
                for (Tree m : d.tree().getMembers()) {
                    if (m instanceof MethodTree mt && mt.getBody() != null
                            && !names.contains(mt.getName().toString()) && refuses(mt, d)) {
                        names.add(mt.getName().toString());
                        grew = true;
                    }
                }
            }
        }
    }

    /**
     * Whether the body refuses: it throws (other than {@code AssertionError}), calls a check of
     * {@code Require} other than those in {@link #NOT_REFUSALS}, or calls a refusing method or
     * constructor of a type of this repository that the call names (a method of its own or an
     * enclosing class, a static import, or {@code Type.method}, {@code new Type}); methods are
     * matched by name, so one refusing overload makes every overload count. A call into
     * another type counts only if an argument uses one of this method's parameters (a getter
     * that turns a checked field into a quantity cannot refuse). Calls on objects
     * ({@code barrier.facing(...)}) are not followed: their type is not known without compiling.
     */
    private boolean refuses(MethodTree mt, Declared owner) {
        boolean[] found = {false};
        Set<String> params = new HashSet<>();
        mt.getParameters().forEach(v -> params.add(v.getName().toString()));
        Map<String, String> imports = imports(owner.unit());
        Map<String, String> staticImports = staticImports(owner.unit());
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
                String type = typeNamed(node.getIdentifier().toString());
                if (node.getClassBody() == null && (owner.name().equals(type) || passesInput(node.getArguments()))
                        && refuses(type, "<init>")) {
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
                    String type = target.equals("this") ? owner.name() : typeNamed(target);
                    if (type != null && type.endsWith(".internal.Require")) {
                        found[0] |= !NOT_REFUSALS.contains(called);
                    } else if ((owner.name().equals(type) || passesInput(node.getArguments())) && refuses(type, called)) {
                        found[0] = true;
                    }
                } else if (select instanceof IdentifierTree id) {
                    String called = id.getName().toString();
                    if (called.equals("this")) {
                        found[0] |= refuses(owner.name(), "<init>");
                    } else {
                        for (String t = owner.name(); t.length() > owner.pkg().length(); t = t.substring(0, t.lastIndexOf('.'))) {
                            found[0] |= refuses(t, called);
                        }
                        if (passesInput(node.getArguments())) {
                            found[0] |= refuses(staticImports.get(called), called);
                            for (String t : staticImports.getOrDefault("*", "").split(",")) {
                                found[0] |= refuses(t, called);
                            }
                        }
                    }
                }
                return super.visitMethodInvocation(node, p);
            }

            @Override
            public Void visitClass(ClassTree node, Void p) {
                return null; // a nested or anonymous class's code runs later, not in this call
            }

            /**
             * Whether a call into another type is handed this method's input: a value the
             * object holds was checked when it was made, so a call on it alone does not refuse.
             */
            private boolean passesInput(List<? extends ExpressionTree> arguments) {
                boolean[] uses = {false};
                for (ExpressionTree a : arguments) {
                    new TreeScanner<Void, Void>() {
                        @Override
                        public Void visitIdentifier(IdentifierTree node, Void p) {
                            uses[0] |= params.contains(node.getName().toString());
                            return null;
                        }
                    }.scan(a, null);
                }
                return uses[0];
            }

            private String typeNamed(String name) {
                return resolveType(name, imports, owner);
            }
        }.scan(mt.getBody(), null);
        return found[0];
    }

    private boolean refuses(String type, String method) {
        return type != null && refusing.containsKey(type) && refusing.get(type).contains(method);
    }

    /** The repository type a name in code means in {@code owner}'s file, or null. */
    private String resolveType(String name, Map<String, String> imports, Declared owner) {
        if (types.containsKey(name)) {
            return name;
        }
        String first = name.contains(".") ? name.substring(0, name.indexOf('.')) : name;
        String rest = name.substring(first.length());
        for (String t = owner.name(); t.length() > owner.pkg().length(); t = t.substring(0, t.lastIndexOf('.'))) {
            if (types.containsKey(t + "." + name)) {
                return t + "." + name;
            }
        }
        if (imports.containsKey(first) && types.containsKey(imports.get(first) + rest)) {
            return imports.get(first) + rest;
        }
        String samePackage = owner.pkg() + "." + name;
        return types.containsKey(samePackage) ? samePackage : null;
    }

    /**
     * Simple member name to its type, for {@code import static a.b.Type.member;}; under
     * {@code "*"} the types of {@code import static a.b.Type.*;}, comma-separated.
     */
    private static Map<String, String> staticImports(CompilationUnitTree unit) {
        Map<String, String> m = new HashMap<>();
        for (ImportTree i : unit.getImports()) {
            if (i.isStatic()) {
                String q = i.getQualifiedIdentifier().toString();
                String member = q.substring(q.lastIndexOf('.') + 1);
                String type = q.substring(0, q.lastIndexOf('.'));
                m.merge(member, type, (a, b) -> a + "," + b);
            }
        }
        return m;
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
                String memberName = ref.substring(1).replaceAll("\\(.*", "");
                if (hiddenMember(owner, memberName)) {
                    hiddenLinks.add(label + " -> " + ref + " (not public)");
                }
                continue;
            }
            String resolved = resolve(typePart, imports, pkg, owner);
            TypeInfo info = resolved == null ? null : types.get(resolved);
            if (info != null && (!info.isPublic() || !info.exported())) {
                hiddenLinks.add(label + " -> " + ref + " (" + (info.isPublic() ? "package not exported" : "not public") + ")");
            }
        }
    }

    /** Whether {@code owner} declares members named {@code name} and none of them is visible to users. */
    private static boolean hiddenMember(ClassTree owner, String name) {
        boolean iface = isInterface(owner);
        boolean any = false;
        for (Tree m : owner.getMembers()) {
            Set<Modifier> flags;
            String n;
            if (m instanceof MethodTree mt) {
                flags = mt.getModifiers().getFlags();
                n = mt.getName().contentEquals("<init>") ? owner.getSimpleName().toString() : mt.getName().toString();
            } else if (m instanceof VariableTree v) {
                flags = v.getModifiers().getFlags();
                n = v.getName().toString();
                if (owner.getKind() == Tree.Kind.ENUM && flags.isEmpty()) {
                    continue; // an enum constant
                }
            } else {
                continue;
            }
            if (n.equals(name)) {
                if (isVisible(flags, iface) || owner.getKind() == Tree.Kind.RECORD) {
                    return false;
                }
                any = true;
            }
        }
        return any;
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
