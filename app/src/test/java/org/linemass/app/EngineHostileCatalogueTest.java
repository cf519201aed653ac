package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The drawings of {@code testdata/hostile/engine} (see its README) through the whole command line:
 * each ends in bounded time with the numbers or the message the README states.
 */
class EngineHostileCatalogueTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    /**
     * Each case finishes in well under a second on a quiet machine (the nest used to take over
     * 120 s); 20 s leaves room for a loaded two-core build machine.
     */
    private static final Duration CAP = Duration.ofSeconds(20);

    @TempDir
    Path dir;

    private static Path catalogue(String name) {
        return CorpusJsonTest.repo().resolve("testdata/hostile/engine").resolve(name);
    }

    private record Run(int code, String out, String err) {
    }

    private static Run cli(String... args) {
        return assertTimeoutPreemptively(CAP, () -> {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            AppContext sys = AppContext.system();
            AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), sys.pipeline(),
                    sys.sections(), sys.integrator(), false);
            int code = Cli.run(ctx, args);
            return new Run(code, out.toString(), err.toString());
        });
    }

    private static List<String> messages(JsonNode report, String kind) {
        List<String> out = new ArrayList<>();
        report.get("findings").forEach(f -> {
            if (f.get("kind").asText().equals(kind)) {
                out.add(f.get("message").asText());
            }
        });
        return out;
    }

    @Test
    void splineExtremeWeight_lengthWithinItsBoundOfTheReference() throws IOException {
        Run r = cli("check", "--json", "-", "-a", "WIRE=RB10", catalogue("spline-extreme-weight.dxf").toString());
        assertEquals(0, r.code(), r.err());
        JsonNode t = MAPPER.readTree(r.out()).get("totals");
        // mpmath reference, engine/src/test/resources/.../rational-splines.csv row quad_w1e15 (mm)
        double reference = 28.28427124746188899e-3;
        assertTrue(Math.abs(t.get("length_m").asDouble() - reference) <= t.get("error_bound_m").asDouble()
                + 1e-15 * reference, r.out());
        assertEquals(List.of(), messages(MAPPER.readTree(r.out()), "zero_length"));
    }

    @Test
    void nonUniformNest_finishesWithTheClosedFormLength() throws IOException {
        Run r = cli("check", "--json", "-", "-a", "WIRE=RB10", catalogue("nonuniform-nest.dxf").toString());
        // the limit_reached warning (10^12 segments are not expanded for the checks) is not an error
        assertEquals(0, r.code(), r.err());
        // 10^12 copies of a 10 mm line stretched by 1.5^6 along x: 1.1390625e11 m; closed forms, rounding only
        assertEquals(1.1390625e11, MAPPER.readTree(r.out()).get("totals").get("length_m").asDouble(), 1e-9 * 1.14e11);
    }

    @Test
    void longLayerName_backtrackingGlob_finishes() {
        Run r = cli("check", "-q", "-a", "*A*A*A*A*A*A*B=RB10", catalogue("long-layer-name.dxf").toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("1.000 m"), r.out());
    }

    @Test
    void overflowParsecLine_errorFindingNamingTheLayer_inEveryReport() throws IOException {
        Path json = dir.resolve("r.json");
        Path csv = dir.resolve("f.csv");
        Path html = dir.resolve("r.html");
        Run r = cli("check", "-a", "WIRE=RB10", "--json", json.toString(), "--findings-csv", csv.toString(),
                "--html", html.toString(), catalogue("overflow-parsec-line.dxf").toString());
        assertEquals(1, r.code(), r.err());
        String message = "layer WIRE: its length moments exceed the range of numbers";
        assertEquals(1, messages(MAPPER.readTree(json.toFile()), "overflow").size());
        assertTrue(messages(MAPPER.readTree(json.toFile()), "overflow").get(0).startsWith(message));
        assertFalse(MAPPER.readTree(json.toFile()).get("complete").asBoolean());
        assertTrue(Files.readString(csv, StandardCharsets.UTF_8).contains(message));
        assertTrue(Files.readString(html, StandardCharsets.UTF_8).contains(message));
        assertTrue(r.out().contains("overflow"), r.out());
    }

    @Test
    void overflowHeavySection_errorFindingNamingTheSection() throws IOException {
        Run r = cli("check", "--json", "-", "--section-table", catalogue("overflow-heavy-section.csv").toString(),
                "-a", "WIRE=HEAVY", catalogue("overflow-heavy-section.dxf").toString());
        assertEquals(1, r.code(), r.err());
        List<String> m = messages(MAPPER.readTree(r.out()), "overflow");
        assertEquals(1, m.size(), r.out());
        assertTrue(m.get(0).startsWith("layer WIRE: its mass moments exceed the range of numbers with section HEAVY"),
                m.get(0));
    }

    @Test
    void farStrays_leaveTheRestAlone_andAreReportedWithTheirDistance() throws IOException {
        for (List<String> extra : List.of(List.<String>of(), List.of("--join", "0.01mm"))) {
            List<String> args = new ArrayList<>(List.of("check", "--json", "-", "-a", "WIRE=RB10"));
            args.addAll(extra);
            args.add(catalogue("far-strays.dxf").toString());
            Run r = cli(args.toArray(new String[0]));
            // a duplicate is an error finding: exit 1 with the default threshold
            assertEquals(1, r.code(), r.err());
            JsonNode j = MAPPER.readTree(r.out());
            // 8 L-shaped wires, the two halves of the wire with the 0.05 mm gap, the two strays
            assertEquals(12, j.get("pieces").size(), extra.toString());
            List<String> gaps = messages(j, "gap");
            assertEquals(1, gaps.size(), r.out());
            assertTrue(gaps.get(0).contains("0.050 mm apart"), gaps.get(0));
            assertEquals(List.of(), messages(j, "zero_length"));
            assertEquals(1, messages(j, "duplicate").size());
            List<String> far = messages(j, "remote_entity");
            assertEquals(2, far.size(), far.toString());
            assertTrue(far.stream().anyMatch(m -> m.startsWith("LINE at line 245, handle 3C lies 1.00e+06 m away")), far.toString());
            assertTrue(far.stream().anyMatch(m -> m.startsWith("LINE at line 263, handle 3D lies 1.00e+09 m away")), far.toString());
            // weighed: 8 x 440 + 400 - 0.05 + 2 x 10 mm (the duplicate counted once); sums of a few
            // decimal lengths, 1e-12 m covers their rounding
            assertEquals(3.52 + 0.39995 + 0.02, j.get("totals").get("length_m").asDouble(), 1e-12);
        }
    }

    @Test
    void coincidentArrayWithTinySpacing_collapsesToOneCopy() throws IOException {
        Run r = cli("check", "--json", "-", "-a", "WIRE=RB10", catalogue("coincident-array-tiny-spacing.dxf").toString());
        assertEquals(1, r.code(), r.err());
        JsonNode j = MAPPER.readTree(r.out());
        assertEquals(1, j.get("pieces").size());
        List<String> d = messages(j, "duplicate");
        assertEquals(1, d.size(), r.out());
        assertTrue(d.get(0).contains("is placed 1000000 times in the same place"), d.get(0));
        // one 100 mm line counted once, within the reported bound (the 999999 copies are taken out of a
        // drawn sum of 10^5 m, so rounding of that sum shows); drawn 10^6 times (closed form)
        JsonNode t = j.get("totals");
        assertTrue(Math.abs(t.get("length_m").asDouble() - 0.1) <= t.get("error_bound_m").asDouble(), t.toString());
        assertEquals(1e5, t.get("drawn_length_m").asDouble(), 1e-6);
    }

    @Test
    void splineWithEndWeight1e99_bendingTablesHoldOnlyFiniteNumbers() throws IOException {
        Path html = dir.resolve("r.html");
        Run r = cli("check", "--fail-at", "never", "-a", "WIRE=round:8:steel", "--html", html.toString(),
                catalogue("spline-end-weight-1e99.dxf").toString());
        assertEquals(0, r.code(), r.err());
        String text = Files.readString(html, StandardCharsets.UTF_8);
        assertFalse(text.contains("Infinity") || text.contains("NaN"), "no non-finite number in the report");
    }
}
