package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.spi.ToolProvider;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The shape of the code, checked on the compiled classes with the JDK's own dependency analyser
 * ({@code jdeps}, run in-process through {@link ToolProvider}): data flows one way between the
 * modules, a module uses only the packages another module offers as its API (the "private"
 * packages of the contributor guide's table stay private), and no two packages depend on each
 * other, directly or round a loop. The tool ships on the class path, where a {@code module-info}
 * would not be enforced; this test is the enforcement, on every build.
 *
 * <p>The expected values are the rules in DEVELOPERS.md ("Architecture in a paragraph" and "Where
 * things live"); when a module gains an API package, add it to {@link #API} and to that table.
 */
class StructureTest {

    /** Modules in build order, each with the modules it may depend on. */
    private static final Map<String, Set<String>> MAY_USE = new LinkedHashMap<>();
    /** The packages of each module that other modules may use; a module absent here offers all. */
    private static final Map<String, Set<String>> API = new HashMap<>();

    static {
        MAY_USE.put("model", Set.of());
        MAY_USE.put("importer", Set.of("model"));
        MAY_USE.put("engine", Set.of("model"));
        MAY_USE.put("plan", Set.of("model", "engine"));
        MAY_USE.put("reports", Set.of("model", "importer", "engine", "plan"));
        MAY_USE.put("app", Set.of("model", "importer", "engine", "plan", "reports"));
        API.put("importer", Set.of("org.linemass.importer"));
        API.put("engine", Set.of("org.linemass.engine", "org.linemass.engine.error", "org.linemass.engine.result",
                "org.linemass.engine.moments", "org.linemass.engine.settings", "org.linemass.engine.section",
                "org.linemass.engine.field", "org.linemass.engine.shape", "org.linemass.engine.bender"));
    }

    /** package -> module, from the classes folders. */
    private static final Map<String, String> MODULE_OF = new HashMap<>();
    /** package -> the project packages it uses (itself excluded). */
    private static final Map<String, Set<String>> USES = new TreeMap<>();

    @BeforeAll
    static void analyse() throws Exception {
        Path root = Path.of("").toAbsolutePath().getParent();
        List<Path> folders = new ArrayList<>();
        for (String m : MAY_USE.keySet()) {
            Path classes = root.resolve(m).resolve("target").resolve("classes");
            assumeTrue(Files.isDirectory(classes.resolve("org").resolve("linemass")),
                    "compiled classes of module " + m + " not found under " + classes
                            + "; the structure check runs in a reactor build (mvn verify from the root)");
            folders.add(classes);
            try (Stream<Path> files = Files.walk(classes)) {
                files.filter(f -> f.toString().endsWith(".class")).forEach(f -> {
                    String pkg = classes.relativize(f.getParent()).toString().replace(f.getFileSystem()
                            .getSeparator(), ".");
                    MODULE_OF.put(pkg, m);
                });
            }
        }
        ToolProvider jdeps = ToolProvider.findFirst("jdeps").orElse(null);
        assumeTrue(jdeps != null, "this JDK has no jdeps tool; the structure check needs a full JDK");
        String classPath = folders.stream().map(Path::toString)
                .collect(Collectors.joining(System.getProperty("path.separator")));
        for (Path folder : folders) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            int code = jdeps.run(new PrintWriter(out), new PrintWriter(err), "-verbose:package", "-filter:none",
                    "--class-path", classPath, folder.toString());
            assertEquals(0, code, "jdeps on " + folder + ": " + err);
            for (String line : out.toString().split("\n")) {
                String[] w = line.trim().split("\\s+");
                if (w.length >= 3 && w[1].equals("->") && w[0].startsWith("org.linemass")
                        && w[2].startsWith("org.linemass") && !w[0].equals(w[2])) {
                    USES.computeIfAbsent(w[0], k -> new TreeSet<>()).add(w[2]);
                }
            }
        }
        assertTrue(USES.size() > 20, "jdeps reported dependencies of the project's packages: " + USES.size());
    }

    @Test
    void modules_dependOnlyDownstream() {
        List<String> wrong = new ArrayList<>();
        USES.forEach((from, tos) -> tos.forEach(to -> {
            String a = MODULE_OF.get(from);
            String b = MODULE_OF.get(to);
            if (a != null && b != null && !a.equals(b) && !MAY_USE.get(a).contains(b)) {
                wrong.add(from + " (" + a + ") -> " + to + " (" + b + ")");
            }
        }));
        assertEquals(List.of(), wrong, "dependencies against the one-way flow of the modules");
    }

    @Test
    void modules_useOnlyEachOthersApi() {
        List<String> wrong = new ArrayList<>();
        USES.forEach((from, tos) -> tos.forEach(to -> {
            String a = MODULE_OF.get(from);
            String b = MODULE_OF.get(to);
            if (a != null && b != null && !a.equals(b) && API.containsKey(b) && !API.get(b).contains(to)) {
                wrong.add(from + " (" + a + ") -> " + to + " (private to " + b + ")");
            }
        }));
        assertEquals(List.of(), wrong, "packages used outside their module that are not its API");
        // the API lists name packages that exist, so a renamed package cannot make the check vacuous
        API.values().forEach(pkgs -> pkgs.forEach(p -> assertTrue(MODULE_OF.containsKey(p), "API package " + p)));
    }

    @Test
    void packages_formNoCycle() {
        List<List<String>> cycles = stronglyConnected().stream().filter(c -> c.size() > 1).toList();
        assertEquals(List.of(), cycles, "packages that depend on one another round a loop");
    }

    /** Tarjan's strongly connected components of the package graph (iterative, so deep graphs do not overflow). */
    private static List<List<String>> stronglyConnected() {
        Map<String, Integer> index = new HashMap<>();
        Map<String, Integer> low = new HashMap<>();
        Deque<String> stack = new ArrayDeque<>();
        Set<String> onStack = new HashSet<>();
        List<List<String>> out = new ArrayList<>();
        int[] counter = {0};
        Set<String> nodes = new TreeSet<>(USES.keySet());
        USES.values().forEach(nodes::addAll);
        for (String start : nodes) {
            if (index.containsKey(start)) {
                continue;
            }
            Deque<Frame> work = new ArrayDeque<>();
            work.push(new Frame(start, USES.getOrDefault(start, Set.of()).iterator()));
            index.put(start, counter[0]);
            low.put(start, counter[0]++);
            stack.push(start);
            onStack.add(start);
            while (!work.isEmpty()) {
                Frame frame = work.peek();
                String v = frame.pkg();
                if (frame.next().hasNext()) {
                    String w = frame.next().next();
                    if (!index.containsKey(w)) {
                        index.put(w, counter[0]);
                        low.put(w, counter[0]++);
                        stack.push(w);
                        onStack.add(w);
                        work.push(new Frame(w, USES.getOrDefault(w, Set.of()).iterator()));
                    } else if (onStack.contains(w)) {
                        low.put(v, Math.min(low.get(v), index.get(w)));
                    }
                } else {
                    work.pop();
                    if (!work.isEmpty()) {
                        String parent = work.peek().pkg();
                        low.put(parent, Math.min(low.get(parent), low.get(v)));
                    }
                    if (low.get(v).equals(index.get(v))) {
                        List<String> component = new ArrayList<>();
                        String w;
                        do {
                            w = stack.pop();
                            onStack.remove(w);
                            component.add(w);
                        } while (!w.equals(v));
                        out.add(component);
                    }
                }
            }
        }
        return out;
    }

    /** A package being visited and the packages it uses still to visit. */
    private record Frame(String pkg, Iterator<String> next) {
    }
}
