package org.linemass.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code linemass demo}: copies the built-in demo drawing, its section table and its layer assignments to a new
 * temporary folder, runs {@code check} on it with the HTML and JSON reports written beside it,
 * and prints where they are. Exits 0 when the run came out as intended (its one error and one
 * warning are deliberate); a demo that does not is an internal error (exit 3), and a failed demo
 * removes the temporary folder it made.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Weigh and check the built-in demo drawing (a wire garden-planter frame) and write its HTML "
                + "and JSON reports to a temporary folder.")
final class DemoCommand implements Callable<Integer> {

    /** Classpath folder of the demo files. */
    static final String RESOURCE_DIR = "/org/linemass/app/demo/";
    static final String DRAWING = "garden-planter.dxf";
    static final String SECTION_TABLE = "garden-planter-section-table.csv";
    static final String ASSIGNMENTS = "garden-planter-layers.csv";

    @Mixin
    CommonOptions common;

    @Option(names = "--into", paramLabel = "FOLDER",
            description = "Write the demo files into this folder instead of a new temporary one.")
    Path into;

    private final AppContext ctx;

    DemoCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() throws Exception {
        Path dir = into != null ? Files.createDirectories(into) : Files.createTempDirectory("linemass-demo-");
        try {
            return demo(dir);
        } catch (Exception | Error e) {
            if (into == null) {
                // nothing useful was left there: do not leave a half-written temporary folder behind
                deleteTree(dir);
            }
            throw e;
        }
    }

    private int demo(Path dir) throws Exception {
        Path dxf = copy(DRAWING, dir);
        Path table = copy(SECTION_TABLE, dir);
        Path csv = copy(ASSIGNMENTS, dir);
        DrawingOptions d = new DrawingOptions();
        d.sectionTable = table;
        d.assignFiles = List.of(csv);
        OutputOptions o = new OutputOptions();
        o.html = dir.resolve("garden-planter-report.html").toString();
        o.json = dir.resolve("garden-planter-report.json").toString();
        o.failAt = FailThreshold.NEVER;
        int code = new CheckRun(ctx, common, d, o, null).run(List.of(dxf));
        String off = offCourse(Path.of(o.json));
        if (!off.isEmpty()) {
            throw new IllegalStateException("the demo did not come out as intended: " + off);
        }
        ctx.out().print("\nDemo drawing:  " + dxf + "\nHTML report:   " + o.html + "\nJSON report:   " + o.json
                + "\nOpen the HTML report in a browser to see the drawing with its findings marked.\n");
        ctx.out().flush();
        return code;
    }

    /**
     * What differs from the demo's deliberate content (testdata/demo/README.md): exactly one error, a
     * duplicate, and one warning, a gap; empty when the run came out as intended.
     */
    static String offCourse(Path json) throws IOException {
        com.fasterxml.jackson.databind.JsonNode findings = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(json.toFile()).path("findings");
        java.util.List<String> serious = new java.util.ArrayList<>();
        for (com.fasterxml.jackson.databind.JsonNode f : findings) {
            String sev = f.path("severity").asText();
            if (!"info".equals(sev)) {
                serious.add(sev + " " + f.path("kind").asText());
            }
        }
        java.util.Collections.sort(serious);
        java.util.List<String> intended = java.util.List.of("error duplicate", "warning gap");
        return serious.equals(intended) ? "" : "expected findings " + intended + ", got " + serious;
    }

    private static void deleteTree(Path dir) {
        try (java.util.stream.Stream<Path> s = Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException | RuntimeException ignored) {
            // best effort: the folder is in the system's temporary area
        }
    }

    private static Path copy(String name, Path dir) throws IOException {
        try (InputStream in = DemoCommand.class.getResourceAsStream(RESOURCE_DIR + name)) {
            if (in == null) {
                throw new IOException("demo file " + name + " is missing from this build");
            }
            Path target = dir.resolve(name);
            Files.copy(in, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            return target;
        }
    }
}
