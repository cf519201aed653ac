package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check} on a folder with several jobs prints and writes exactly what one job does: the real
 * importer and engine on the demo drawing, two hostile drawings that fail, and the corpus drawings
 * when ../shared/corpus is beside the checkout (the test still runs without them). The check value
 * is the one-job run itself: the outputs must be equal byte for byte, except the summary's time
 * column, which is wall-clock time and differs between any two runs.
 */
class ParallelCheckTest {

    /** The report files each run writes, by the option that asks for them. */
    private static final String[][] OUTPUTS = {
        {"--json", "report.json"}, {"--bom-csv", "bom.csv"}, {"--pieces-csv", "pieces.csv"},
        {"--findings-csv", "findings.csv"}, {"--summary-csv", "summary.csv"}, {"--html", "report.html"},
        {"--markup-dxf", "marked"},
    };

    @TempDir
    Path dir;

    @Test
    void check_severalJobs_sameBytesAsOneJob() throws IOException {
        Path in = dir.resolve("in");
        Files.createDirectories(in);
        Path repo = CorpusJsonTest.repo();
        Files.copy(repo.resolve("testdata/demo/garden-planter.dxf"), in.resolve("garden-planter.dxf"));
        // two drawings that cannot be read (testdata/hostile/README.md gives their messages)
        Files.copy(repo.resolve("testdata/hostile/group-code-not-number.dxf"), in.resolve("b-bad.dxf"));
        Files.copy(repo.resolve("testdata/hostile/empty.dxf"), in.resolve("t-bad.dxf"));
        Path corpus = CorpusJsonTest.corpus();
        if (corpus != null && Files.isDirectory(corpus)) {
            try (Stream<Path> s = Files.list(corpus)) {
                for (Path p : s.filter(p -> p.toString().endsWith(".dxf")).toList()) {
                    Files.copy(p, in.resolve(p.getFileName()));
                }
            }
        }
        Result one = run(in, "1");
        Result four = run(in, "4");
        assertEquals(2, one.code, "two drawings failed: " + one.err);
        assertEquals(one.code, four.code);
        assertEquals(one.out, four.out);
        assertEquals(one.err, four.err);
        // the failures come in input order, one line each, then the line that counts them
        List<String> errLines = one.err.lines().toList();
        assertEquals(3, errLines.size(), one.err);
        assertTrue(errLines.get(0).contains("b-bad.dxf") && errLines.get(1).contains("t-bad.dxf"), one.err);
        assertEquals(one.files.keySet(), four.files.keySet());
        for (String name : one.files.keySet()) {
            byte[] a = one.files.get(name);
            byte[] b = four.files.get(name);
            if (name.equals("summary.csv")) {
                a = withoutTimes(a);
                b = withoutTimes(b);
            }
            assertArrayEquals(a, b, name + " differs between 1 and 4 jobs");
        }
        String summary = new String(one.files.get("summary.csv"), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(summary.contains("b-bad.dxf,failed,"), summary);
        assertTrue(one.out.contains("Drawings"), "the console has the table of drawings");
    }

    private record Result(int code, String out, String err, java.util.SortedMap<String, byte[]> files) {
    }

    /** Runs check with {@code jobs} into out/ (the same path both times, as stdout names it), then moves it away. */
    private Result run(Path in, String jobs) throws IOException {
        Path out = dir.resolve("out");
        List<String> args = new ArrayList<>(List.of("check", "--jobs", jobs, "--fail-at", "never"));
        for (String[] o : OUTPUTS) {
            args.add(o[0]);
            args.add(out.resolve(o[1]).toString());
        }
        args.add(in.toString());
        Files.createDirectories(out.resolve("marked"));
        StringWriter so = new StringWriter();
        StringWriter se = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(so), new PrintWriter(se), new EnginePipeline(),
                new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
        int code = Cli.run(ctx, args.toArray(new String[0]));
        java.util.SortedMap<String, byte[]> files = new java.util.TreeMap<>();
        try (Stream<Path> s = Files.walk(out)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                files.put(out.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        Files.move(out, dir.resolve("out-" + jobs));
        return new Result(code, so.toString(), se.toString(), files);
    }

    /** The summary CSV with its time column (the tenth) emptied. */
    private static byte[] withoutTimes(byte[] csv) {
        String text = new String(csv, java.nio.charset.StandardCharsets.UTF_8);
        String blanked = text.lines().map(l -> {
            String[] cells = l.split(",", -1);
            if (cells.length > 9) {
                cells[9] = "";
            }
            return String.join(",", cells);
        }).collect(Collectors.joining("\n", "", "\n"));
        return blanked.getBytes(java.nio.charset.StandardCharsets.UTF_8);
    }
}
