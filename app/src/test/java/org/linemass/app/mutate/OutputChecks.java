package org.linemass.app.mutate;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/**
 * Checks of one run's outputs: the JSON parses strictly and holds only finite numbers; no text
 * output (console, CSV, HTML, marked-up DXF) holds a non-finite number; the marked-up DXF has an
 * even number of lines, ends with EOF and imports again; no temporary is left; a failed run wrote
 * no report; no report is larger than {@link #outputLimit}. Each problem is one line starting with a
 * short class name and a colon.
 */
final class OutputChecks {

    /** How Java spells non-finite numbers, with word boundaries; and the infinity sign of DecimalFormat. */
    static final Pattern NON_FINITE = Pattern.compile("(?<![A-Za-z0-9_])(NaN|-?Infinity|-?inf)(?![A-Za-z0-9_])|\u221E");
    private static final ObjectMapper JSON = new ObjectMapper();
    static final List<String> REPORTS = List.of("r.json", "r.html", "bom.csv", "pieces.csv", "findings.csv",
            "marked.dxf");

    private OutputChecks() {
    }

    /** Problems of a successful run (exit 0 or 1). {@code input} is the drawing read, for context. */
    static List<String> success(MutantRun.Result r, byte[] input) throws IOException {
        List<String> problems = new ArrayList<>();
        String inputText = new String(input, StandardCharsets.ISO_8859_1);
        nonFinite("console", r.out(), inputText, problems);
        for (String name : REPORTS) {
            Path p = r.outDir().resolve(name);
            if (!Files.exists(p)) {
                if (!name.equals("marked.dxf")) {
                    problems.add("missing-report: " + name + " was not written");
                }
                continue;
            }
            long size = Files.size(p);
            if (size > outputLimit(input)) {
                // work and output are to stay proportional to what a person can read; not read into memory
                problems.add("output-too-large: " + name + " is " + size / (1 << 20) + " MiB from a drawing of "
                        + input.length / 1024 + " KiB");
                continue;
            }
            String text = Files.readString(p, name.endsWith(".dxf") ? StandardCharsets.ISO_8859_1 : StandardCharsets.UTF_8);
            if (name.endsWith(".json")) {
                json(text, problems);
            } else {
                nonFinite(name, text, inputText, problems);
            }
            if (name.endsWith(".dxf")) {
                markup(p, text, problems);
            }
        }
        temporaries(r.outDir(), problems);
        return problems;
    }

    /**
     * The largest report checked (bytes): 64 MiB, or 8 times the drawing for the marked-up copy of
     * a large drawing. Larger outputs count as a problem of their own and are not read.
     */
    static long outputLimit(byte[] input) {
        return Math.max(64L << 20, 8L * input.length);
    }

    /** Problems of a run that failed (exit 2): no report may exist, and no temporary. */
    static List<String> failure(MutantRun.Result r) throws IOException {
        List<String> problems = new ArrayList<>();
        for (String name : REPORTS) {
            if (Files.exists(r.outDir().resolve(name))) {
                problems.add("report-after-failure: " + name + " written although the run failed");
            }
        }
        temporaries(r.outDir(), problems);
        return problems;
    }

    static void temporaries(Path dir, List<String> problems) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            s.filter(p -> p.getFileName().toString().endsWith(".part"))
                    .forEach(p -> problems.add("part-left: " + p.getFileName()));
        }
    }

    private static void json(String text, List<String> problems) {
        JsonNode root;
        try {
            root = JSON.readTree(text);
        } catch (IOException e) {
            problems.add("json-invalid: " + Campaign.firstLines(String.valueOf(e.getMessage()), 1));
            return;
        }
        List<String> bad = new ArrayList<>();
        walk(root, "$", bad);
        if (!bad.isEmpty()) {
            problems.add("non-finite: r.json " + bad.get(0) + (bad.size() > 1 ? " and " + (bad.size() - 1) + " more" : ""));
        }
    }

    private static void walk(JsonNode n, String at, List<String> bad) {
        if (n.isNumber() && !Double.isFinite(n.asDouble())) {
            bad.add(at + " = " + n.asText());
        } else if (n.isObject()) {
            for (Iterator<java.util.Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext();) {
                var e = it.next();
                walk(e.getValue(), at + "." + e.getKey(), bad);
            }
        } else if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                walk(n.get(i), at + "[" + i + "]", bad);
            }
        }
    }

    /**
     * A non-finite token in a text output. A token that the drawing itself contains (a layer named
     * "NaN") may be copied text, and a message that quotes a bad value of the drawing ("is not
     * finite: Infinity" for a 1e309) says what was wrong, so neither counts.
     */
    static void nonFinite(String where, String text, String input, List<String> problems) {
        Matcher m = NON_FINITE.matcher(text);
        while (m.find()) {
            String token = m.group();
            if (input.contains(token.replace("-", ""))) {
                continue;
            }
            String before = text.substring(Math.max(0, m.start() - 16), m.start());
            if (before.endsWith("finite: ") || before.endsWith("number: ") || before.endsWith("integer: ")) {
                continue; // a message quoting the drawing's own value ("coordinate ... is not finite: Infinity")
            }
            int from = Math.max(0, m.start() - 40);
            int to = Math.min(text.length(), m.end() + 40);
            problems.add("non-finite: " + where + " ..." + text.substring(from, to).replace('\n', ' ').replace('\r', ' ')
                    + "...");
            return;
        }
    }

    private static void markup(Path p, String text, List<String> problems) {
        String[] lines = text.split("\r?\n", -1);
        int n = lines.length - (lines[lines.length - 1].isEmpty() ? 1 : 0);
        if (n % 2 != 0) {
            problems.add("markup-invalid: odd number of lines (" + n + ")");
        }
        if (n < 2 || !lines[n - 1].strip().equals("EOF") || !lines[n - 2].strip().equals("0")) {
            problems.add("markup-invalid: does not end with 0 / EOF");
        }
        try {
            DxfImporter.read(p, ImportOptions.DEFAULTS);
        } catch (DxfInputException e) {
            problems.add("markup-invalid: does not import again: " + e.getMessage());
        }
    }
}
