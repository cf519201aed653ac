package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * The piece stage and the assembly run on {@code --threads N}; the reports must not depend on N.
 * {@code check --json} on the demo drawing, on every drawing of ../shared/corpus and on a generated
 * welded mesh (big enough that every parallel step really splits its work) with 1 and with 4 threads
 * must give the same bytes. Expected values: the one-thread run itself (common practice, no source);
 * the mesh's weld count is its closed form (n x n crossings of n wires each way).
 */
class ThreadCountTest {

    @TempDir
    Path tmp;

    @TestFactory
    Stream<DynamicTest> check_demoAndCorpus_sameBytesOnOneAndFourThreads() throws IOException {
        List<Path> files = new ArrayList<>();
        files.add(CorpusJsonTest.repo().resolve("testdata/demo/garden-planter.dxf"));
        Path corpus = CorpusJsonTest.corpus();
        if (corpus != null && Files.isDirectory(corpus)) {
            try (Stream<Path> s = Files.list(corpus)) {
                s.filter(p -> p.toString().endsWith(".dxf")).sorted().forEach(files::add);
            }
        }
        return files.stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            List<String> extra = f.getFileName().toString().startsWith("v04") ? List.of("--units", "mm") : List.of();
            assertArrayEquals(json(f, 1, extra), json(f, 4, extra), f + ": the JSON depends on the thread count");
        }));
    }

    @Test
    void check_corpusPresent_orSaysSo() {
        Path corpus = CorpusJsonTest.corpus();
        assumeTrue(corpus != null && Files.isDirectory(corpus),
                "../shared/corpus is not beside this checkout: only the demo and the mesh compared across threads");
        assertTrue(Files.isDirectory(corpus));
    }

    @Test
    void check_weldedMesh_sameBytesOnOneAndFourThreads_andCountsEveryWeld() throws IOException {
        int n = 60;
        Path dxf = mesh(n);
        byte[] one = json(dxf, 1, List.of("--list-notes"));
        byte[] four = json(dxf, 4, List.of("--list-notes"));
        assertArrayEquals(one, four, "the mesh's JSON depends on the thread count");
        // the outer four wires join into a frame at its corners; every other meeting is a weld:
        // n x n meetings in all, less the 4 corners
        JsonNode root = new ObjectMapper().readTree(one);
        long welds = 0;
        for (JsonNode f : root.get("findings")) {
            String kind = f.get("kind").asText();
            if (kind.equals("crossing") || kind.equals("t_junction")) {
                welds++;
            }
        }
        assertEquals((long) n * n - 4, welds);
        // by default only a sample is listed and a note says how many more there are
        JsonNode capped = new ObjectMapper().readTree(json(dxf, 4, List.of()));
        long listed = 0;
        boolean noted = false;
        for (JsonNode f : capped.get("findings")) {
            String kind = f.get("kind").asText();
            listed += kind.equals("crossing") || kind.equals("t_junction") ? 1 : 0;
            noted |= kind.equals("limit_reached") && f.get("message").asText().startsWith(
                    ((long) n * n - 4 - 1000) + " T-junction and crossing notes are not listed");
        }
        assertEquals(1000, listed);
        assertTrue(noted, "no note on the notes left out");
    }

    /** n horizontal and n vertical LINEs at 50 mm pitch on one layer (as bench/generate's meshes). */
    private Path mesh(int n) throws IOException {
        StringBuilder b = new StringBuilder("0\nSECTION\n2\nHEADER\n9\n$INSUNITS\n70\n4\n0\nENDSEC\n"
                + "0\nSECTION\n2\nENTITIES\n");
        double span = (n - 1) * 50.0;
        for (int i = 0; i < n; i++) {
            line(b, 0, i * 50.0, span, i * 50.0);
            line(b, i * 50.0, 0, i * 50.0, span);
        }
        b.append("0\nENDSEC\n0\nEOF\n");
        Path f = tmp.resolve("mesh.dxf");
        Files.writeString(f, b, StandardCharsets.US_ASCII);
        return f;
    }

    private static void line(StringBuilder b, double x0, double y0, double x1, double y1) {
        b.append(String.format(Locale.ROOT, "0\nLINE\n8\nMESH\n10\n%.3f\n20\n%.3f\n30\n0.0\n11\n%.3f\n21\n%.3f\n31\n0.0\n",
                x0, y0, x1, y1));
    }

    private byte[] json(Path drawing, int threads, List<String> extra) throws IOException {
        Path out = tmp.resolve("out-" + threads + "-" + System.nanoTime() + ".json");
        List<String> args = new ArrayList<>(List.of("check", drawing.toString(), "--fail-at", "never", "--threads",
                Integer.toString(threads), "--json", out.toString()));
        args.addAll(extra);
        StringWriter err = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(new StringWriter()), new PrintWriter(err), new EnginePipeline(),
                new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
        int code = Cli.run(ctx, args.toArray(String[]::new));
        assertEquals(0, code, () -> "exit code for " + drawing + ": " + err);
        return Files.readAllBytes(out);
    }
}
