package dev.morse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The packages of morse-core depend on each other one way only: every reference from a class to
 * another package of the project (an import, a static import, or a fully qualified name in code)
 * goes to a package listed earlier in {@link #LAYERS}, the data flow DEVELOPERS.md draws. Comments
 * and string literals are not references. The sources are read from {@code src/main/java} of the
 * module, the working directory of the test run.
 */
class PackageLayersTest {
    /** The packages under {@code dev.morse}, lowest first; a package may use only those before it. */
    static final List<String> LAYERS = List.of("progress", "parallel", "poset", "complex", "homology", "matching",
            "morsecomplex", "cw", "posetreduction", "implicit", "io", "image", "graph", "mesh", "input", "engine", "cycles", "interval",
            "batch", "inspect", "layout", "report", "generate");

    private static final Path SOURCES = Path.of("src", "main", "java");
    private static final Pattern PACKAGE = Pattern.compile("^\\s*package\\s+dev\\.morse\\.([a-z_][a-z0-9_]*)[.;]",
            Pattern.MULTILINE);
    private static final Pattern REFERENCE = Pattern.compile(
            "(?<![\\w.])(import\\s+(?:static\\s+)?)?dev\\s*\\.\\s*morse\\s*\\.\\s*([a-z_][a-z0-9_]*)((?:\\s*\\.\\s*\\w+)*)");

    /** One reference from a source file to a project package other than its own. */
    record Reference(String file, int line, String fromPackage, String toPackage, String text) {
        @Override
        public String toString() {
            return file + ":" + line + ": " + text;
        }
    }

    /** Every source file of the module with its package and its references to other packages. */
    record SourceFile(String file, String packageName, List<Reference> references) {
    }

    @Test
    void sourcesAreFound() {
        // the rest would pass vacuously on an empty tree; morse-core has well over a hundred classes
        List<SourceFile> files = mainSources();
        assertTrue(files.size() > 100, "found only " + files.size() + " files under " + SOURCES.toAbsolutePath());
        assertTrue(files.stream().anyMatch(f -> !f.references().isEmpty()), "no file references another package");
    }

    @Test
    void everyPackageHasItsPlaceInTheLayerOrder() {
        Set<String> unknown = new TreeSet<>();
        for (SourceFile f : mainSources()) {
            if (!LAYERS.contains(f.packageName())) {
                unknown.add(f.packageName() + " (" + f.file() + ")");
            }
            for (Reference r : f.references()) {
                if (!LAYERS.contains(r.toPackage())) {
                    unknown.add(r.toPackage() + " (" + r + ")");
                }
            }
        }
        assertEquals(Set.of(), unknown, "packages missing from the layer order " + LAYERS);
    }

    @Test
    void packagesFormNoCycle() {
        List<String> cycles = cycles(mainSources());
        if (!cycles.isEmpty()) {
            fail("package cycles:\n" + String.join("\n", cycles));
        }
    }

    @Test
    void everyReferenceGoesToAnEarlierLayer() {
        List<String> upward = upwardReferences(mainSources());
        if (!upward.isEmpty()) {
            fail("references to a package not earlier in " + LAYERS + ":\n" + String.join("\n", upward));
        }
    }

    @Test
    void scannerSeesImportsStaticImportsAndQualifiedNamesButNotCommentsOrStrings() {
        String source = """
                package dev.morse.complex;

                import dev.morse.poset.Poset;
                import static dev.morse.homology.Coefficients.INTEGERS;
                import dev.morse.complex.OrderComplex;
                // dev.morse.report.Svg in a line comment
                /** {@link dev.morse.engine.Engines} in Javadoc */
                final class Sample {
                    String a = "dev.morse.inspect.ThinCheck in a string";
                    String b = \"""
                        dev.morse.generate.Families in a text block
                        \""";
                    char c = '"';
                    dev.morse.matching.Matching m = dev.morse.matching.MatchingHeuristics.byName("x") /* dev.morse.io.X */;
                }
                """;
        SourceFile f = scan("Sample.java", source);
        assertEquals("complex", f.packageName());
        assertEquals(List.of("Sample.java:3: import dev.morse.poset.Poset",
                "Sample.java:4: import static dev.morse.homology.Coefficients.INTEGERS",
                "Sample.java:14: dev.morse.matching.Matching",
                "Sample.java:14: dev.morse.matching.MatchingHeuristics.byName"),
                f.references().stream().map(Reference::toString).toList());
    }

    @Test
    void cycleFinderNamesTheCycleAndTheFilesThatCloseIt() {
        SourceFile a = scan("A.java", "package dev.morse.poset;\nimport dev.morse.complex.X;\n");
        SourceFile b = scan("B.java", "package dev.morse.complex;\nimport dev.morse.homology.Y;\n");
        SourceFile c = scan("C.java", "package dev.morse.homology;\nclass C { dev.morse.poset.Z z; }\n");
        SourceFile d = scan("D.java", "package dev.morse.report;\nimport dev.morse.poset.Z;\n");
        assertEquals(List.of("complex -> homology -> poset -> complex: B.java:2: import dev.morse.homology.Y;"
                + " C.java:2: dev.morse.poset.Z; A.java:2: import dev.morse.complex.X"), cycles(List.of(a, b, c, d)));
        assertEquals(List.of("poset -> complex: A.java:2: import dev.morse.complex.X",
                "complex -> homology: B.java:2: import dev.morse.homology.Y"), upwardReferences(List.of(a, b, c, d)));
        assertEquals(List.of(), cycles(List.of(a, d)));
    }

    // ---- the scan ----

    private static List<SourceFile> mainSources() {
        assertTrue(Files.isDirectory(SOURCES), "no " + SOURCES.toAbsolutePath() + "; run from the module directory");
        try (Stream<Path> paths = Files.walk(SOURCES)) {
            List<SourceFile> files = new ArrayList<>();
            for (Path p : paths.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                files.add(scan(SOURCES.relativize(p).toString(), Files.readString(p, StandardCharsets.UTF_8)));
            }
            return files;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static SourceFile scan(String file, String source) {
        String code = withoutCommentsAndLiterals(source);
        Matcher pm = PACKAGE.matcher(code);
        String own = pm.find() ? pm.group(1) : "(not under dev.morse.*)";
        List<Reference> references = new ArrayList<>();
        Matcher m = REFERENCE.matcher(code);
        while (m.find()) {
            String target = m.group(2);
            if (target.equals(own)) {
                continue;
            }
            int line = 1 + (int) code.substring(0, m.start()).chars().filter(ch -> ch == '\n').count();
            String text = m.group().trim().replaceAll("\\s+", " ").replaceAll("\\s*\\.\\s*", ".");
            references.add(new Reference(file, line, own, target, text));
        }
        return new SourceFile(file, own, references);
    }

    /**
     * The source with comments, string, text block and character literals blanked out, line
     * breaks kept so that line numbers stay right.
     */
    static String withoutCommentsAndLiterals(String s) {
        StringBuilder out = new StringBuilder(s.length());
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            int end;
            if (s.startsWith("//", i)) {
                end = s.indexOf('\n', i);
                end = end < 0 ? s.length() : end;
            } else if (s.startsWith("/*", i)) {
                end = s.indexOf("*/", i + 2);
                end = end < 0 ? s.length() : end + 2;
            } else if (s.startsWith("\"\"\"", i)) {
                end = closing(s, i + 3, "\"\"\"");
            } else if (c == '"' || c == '\'') {
                end = closing(s, i + 1, String.valueOf(c));
            } else {
                out.append(c);
                i++;
                continue;
            }
            for (int k = i; k < end; k++) {
                out.append(s.charAt(k) == '\n' ? '\n' : ' ');
            }
            i = end;
        }
        return out.toString();
    }

    /** The index just past the unescaped {@code quote} that closes a literal whose content starts at {@code from}. */
    private static int closing(String s, int from, String quote) {
        int k = from;
        while (k < s.length()) {
            if (s.charAt(k) == '\\') {
                k += 2;
            } else if (s.startsWith(quote, k)) {
                return k + quote.length();
            } else {
                k++;
            }
        }
        return s.length();
    }

    // ---- the checks ----

    /** Each reference that does not go to an earlier layer, as "from -> to: FILE:LINE: reference". */
    static List<String> upwardReferences(List<SourceFile> files) {
        List<String> upward = new ArrayList<>();
        for (SourceFile f : files) {
            for (Reference r : f.references()) {
                int from = LAYERS.indexOf(r.fromPackage());
                int to = LAYERS.indexOf(r.toPackage());
                if (from < 0 || to < 0 || to >= from) {
                    upward.add(r.fromPackage() + " -> " + r.toPackage() + ": " + r);
                }
            }
        }
        return upward;
    }

    /**
     * One line per strongly connected component of more than one package (Tarjan 1972): a cycle
     * through it, each step followed by a reference that makes it.
     */
    static List<String> cycles(List<SourceFile> files) {
        Map<String, Map<String, Reference>> edges = new TreeMap<>();
        for (SourceFile f : files) {
            edges.computeIfAbsent(f.packageName(), k -> new TreeMap<>());
            for (Reference r : f.references()) {
                edges.get(f.packageName()).putIfAbsent(r.toPackage(), r);
                edges.computeIfAbsent(r.toPackage(), k -> new TreeMap<>());
            }
        }
        List<String> found = new ArrayList<>();
        for (Set<String> component : stronglyConnectedComponents(edges)) {
            if (component.size() > 1) {
                found.add(describeCycle(component, edges));
            }
        }
        return found;
    }

    private static List<Set<String>> stronglyConnectedComponents(Map<String, Map<String, Reference>> edges) {
        Map<String, Integer> index = new HashMap<>();
        Map<String, Integer> low = new HashMap<>();
        Deque<String> stack = new ArrayDeque<>();
        Set<String> onStack = new TreeSet<>();
        List<Set<String>> components = new ArrayList<>();
        for (String v : edges.keySet()) {
            if (!index.containsKey(v)) {
                strongConnect(v, edges, index, low, stack, onStack, components);
            }
        }
        return components;
    }

    private static void strongConnect(String v, Map<String, Map<String, Reference>> edges, Map<String, Integer> index,
            Map<String, Integer> low, Deque<String> stack, Set<String> onStack, List<Set<String>> components) {
        index.put(v, index.size());
        low.put(v, index.get(v));
        stack.push(v);
        onStack.add(v);
        for (String w : edges.get(v).keySet()) {
            if (!index.containsKey(w)) {
                strongConnect(w, edges, index, low, stack, onStack, components);
                low.put(v, Math.min(low.get(v), low.get(w)));
            } else if (onStack.contains(w)) {
                low.put(v, Math.min(low.get(v), index.get(w)));
            }
        }
        if (low.get(v).equals(index.get(v))) {
            Set<String> component = new TreeSet<>();
            String w;
            do {
                w = stack.pop();
                onStack.remove(w);
                component.add(w);
            } while (!w.equals(v));
            components.add(component);
        }
    }

    /** A shortest cycle through the first package of the component, by breadth-first search inside it. */
    private static String describeCycle(Set<String> component, Map<String, Map<String, Reference>> edges) {
        String start = component.iterator().next();
        Map<String, String> parent = new HashMap<>();
        Deque<String> queue = new ArrayDeque<>(List.of(start));
        String last = null;
        while (!queue.isEmpty() && last == null) {
            String v = queue.poll();
            for (String w : edges.get(v).keySet()) {
                if (!component.contains(w)) {
                    continue;
                }
                if (w.equals(start)) {
                    last = v;
                    break;
                }
                if (!parent.containsKey(w)) {
                    parent.put(w, v);
                    queue.add(w);
                }
            }
        }
        List<String> path = new ArrayList<>();
        for (String v = last; !v.equals(start); v = parent.get(v)) {
            path.add(0, v);
        }
        path.add(0, start);
        path.add(start);
        List<String> steps = new ArrayList<>();
        for (int k = 0; k + 1 < path.size(); k++) {
            steps.add(edges.get(path.get(k)).get(path.get(k + 1)).toString());
        }
        return String.join(" -> ", path) + ": " + String.join("; ", steps);
    }
}
