package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The whole program, DXF in and JSON out, against values from outside the project: the corpus
 * manifest's planted defects (v10) and handbook closed forms for a thin ring.
 */
class EndToEndTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    /** Manifest defect type to the finding kind linemass reports for it with the default join tolerance (0.01 mm). */
    private static final Map<String, String> KIND = Map.of("small_gap", "gap", "large_gap", "gap", "duplicate",
            "duplicate", "partial_overlap", "overlap", "zero_length", "zero_length", "t_junction", "t_junction",
            "crossing", "crossing");

    /**
     * Locations: the manifest gives them in closed form from the generator's own model; the
     * findings are placed at a gap's or an overlap's middle, a contact point or the zero-length
     * line, so 1e-6 m (1 micrometre on a 0.6 m panel) leaves room only for rounding and the
     * choice of the exact point on a T-junction.
     */
    private static final double AT_TOL_M = 1e-6;

    @Test
    void check_meshPanelDefects_everyPlantedDefectFoundAtItsPlaceAndNothingElse() throws Exception {
        Path corpus = CorpusJsonTest.corpus();
        assumeTrue(corpus != null && Files.exists(corpus.resolve("manifest.json")),
                "../shared/corpus not present beside the checkout; corpus checks skipped");
        String name = "v10_mesh_panel_defects_r2000_mm.dxf";
        JsonNode defects = MAPPER.readTree(corpus.resolve("manifest.json").toFile()).get("files").get(name)
                .get("defects");
        JsonNode report = run(0, 1, "check", "--json", "-", corpus.resolve(name).toString());
        List<JsonNode> findings = new ArrayList<>();
        report.get("findings").forEach(findings::add);
        for (JsonNode d : defects) {
            String kind = KIND.get(d.get("type").asText());
            assertNotNull(kind, "unknown manifest defect type " + d.get("type"));
            JsonNode match = null;
            for (JsonNode f : findings) {
                if (f.get("kind").asText().equals(kind) && distance(f.get("at_m"), d.get("location_m")) < AT_TOL_M) {
                    match = f;
                }
            }
            assertNotNull(match, d.get("type") + " at " + d.get("location_m") + " not found in " + findings);
            List<String> handles = new ArrayList<>();
            match.get("entities").forEach(e -> handles.add(e.get("handle").asText()));
            for (JsonNode h : d.get("entities")) {
                assertTrue(handles.contains(h.asText()), d.get("type") + ": entity " + h + " not in " + handles);
            }
            findings.remove(match);
        }
        // what is left: the two layers without a section, nothing else
        assertEquals(List.of("no_section", "no_section"),
                findings.stream().map(f -> f.get("kind").asText()).toList());
    }

    @Test
    void check_meshPanelDefects_smallGapJoinsUnderCoarserTolerance() throws Exception {
        Path corpus = CorpusJsonTest.corpus();
        assumeTrue(corpus != null && Files.exists(corpus.resolve("manifest.json")),
                "../shared/corpus not present beside the checkout; corpus checks skipped");
        // manifest v10 small_gap: "joinable: gap below a 0.1 join tolerance"
        JsonNode report = run(0, 1, "check", "--json", "-", "--join", "0.1mm",
                corpus.resolve("v10_mesh_panel_defects_r2000_mm.dxf").toString());
        long gaps = 0;
        long joined = 0;
        for (JsonNode f : report.get("findings")) {
            gaps += f.get("kind").asText().equals("gap") ? 1 : 0;
            if (f.get("kind").asText().equals("joined_across_gap")) {
                joined++;
                // 0.05 drawing units of mm, from the manifest's details.gap
                assertEquals(0.05e-3, f.get("size_m").asDouble(), 1e-12);
            }
        }
        assertEquals(1, gaps, "only the 2 mm gap stays a gap");
        assertEquals(1, joined);
    }

    @Test
    void check_thinRing_principalMomentsAreHandbookValues(@TempDir Path dir) throws Exception {
        // A CIRCLE of radius 100 mm in the x-y plane on a 10 mm EN bar (0.616 kg/m, FACTS.md §1.1).
        Path dxf = dir.resolve("ring.dxf");
        Files.writeString(dxf, String.join("\n", "0", "SECTION", "2", "HEADER", "9", "$INSUNITS", "70", "4",
                "0", "ENDSEC", "0", "SECTION", "2", "ENTITIES", "0", "CIRCLE", "5", "2A", "8", "RING", "10", "0",
                "20", "0", "30", "0", "40", "100", "0", "ENDSEC", "0", "EOF", ""), StandardCharsets.US_ASCII);
        JsonNode report = run(0, 0, "check", "--json", "-", "-a", "RING=RB10", dxf.toString());
        JsonNode t = report.get("totals");
        // the one layer is the whole drawing: its principal moments are the same numbers
        assertEquals(t.get("principal_moments_kg_m2"), report.get("layers").get(0).get("principal_moments_kg_m2"));
        double r = 0.1;
        double m = 0.616 * 2 * Math.PI * r;
        // closed form L = 2 pi r; the engine's arcs are closed forms too, so 1e-12 relative is rounding only
        assertEquals(m, t.get("mass_kg").asDouble(), 1e-12 * m);
        // FACTS.md §5.2: thin ring m r^2 about its axis, m r^2 / 2 about a diameter (thin-wire, centre line)
        JsonNode p = t.get("principal_moments_kg_m2");
        assertEquals(m * r * r / 2, p.get(0).asDouble(), 1e-12 * m * r * r);
        assertEquals(m * r * r / 2, p.get(1).asDouble(), 1e-12 * m * r * r);
        assertEquals(m * r * r, p.get(2).asDouble(), 1e-12 * m * r * r);
        // the largest moment is about the ring's axis, z
        assertEquals(1.0, Math.abs(t.get("principal_axes").get(2).get(2).asDouble()), 1e-12);
        // radius of gyration about the axis is r itself
        assertEquals(r, t.get("radii_of_gyration_m").get(2).asDouble(), 1e-12);
    }

    @Test
    void markupDxf_reimportsToTheSameSegments(@TempDir Path dir) throws Exception {
        // The demo drawing has every kind of segment: lines, bulged polylines, arcs in blocks, a spline.
        Path demo = dir.resolve("garden-planter.dxf");
        try (var in = EndToEndTest.class.getResourceAsStream("/org/linemass/app/demo/garden-planter.dxf")) {
            assumeTrue(in != null, "demo drawing not packaged");
            Files.copy(in, demo);
        }
        Path marked = dir.resolve("marked.dxf");
        exec(0, 1, new StringWriter(), "check", "-q", "--markup-dxf", marked.toString(), demo.toString());
        var original = org.linemass.importer.DxfImporter.read(demo, org.linemass.importer.ImportOptions.DEFAULTS);
        var copy = org.linemass.importer.DxfImporter.read(marked, org.linemass.importer.ImportOptions.DEFAULTS);
        assertEquals(original.blocks().keySet(), copy.blocks().keySet());
        for (String block : original.blocks().keySet()) {
            List<String> want = fingerprints(original.blocks().get(block).segments(), false);
            List<String> got = fingerprints(copy.blocks().get(block).segments(), true);
            // exact equality: the writer copies the original bytes through, so every number reads back identically
            assertEquals(want, got, "segments of block " + block);
            assertEquals(original.blocks().get(block).inserts().size(), copy.blocks().get(block).inserts().size());
        }
    }

    @Test
    void markupDxf_checkedAgain_markupLayerNotCounted(@TempDir Path dir) throws Exception {
        Path demo = dir.resolve("garden-planter.dxf");
        try (var in = EndToEndTest.class.getResourceAsStream("/org/linemass/app/demo/garden-planter.dxf")) {
            assumeTrue(in != null, "demo drawing not packaged");
            Files.copy(in, demo);
        }
        Path marked = dir.resolve("marked.dxf");
        JsonNode first = run(0, 1, "check", "--json", "-", "--markup-dxf", marked.toString(), demo.toString());
        JsonNode again = run(0, 1, "check", "--json", "-", marked.toString());
        // the same wire: the circles and labels of the added layer are not material (equal to the last bit:
        // the same segments are integrated in the same order)
        assertEquals(first.get("totals").get("length_m").asDouble(), again.get("totals").get("length_m").asDouble(), 0.0);
        // asked for on purpose, the layer is read
        JsonNode only = run(0, 1, "check", "--json", "-", "--only-layer", "LINEMASS_FINDINGS*", marked.toString());
        assertTrue(only.get("totals").get("length_m").asDouble() > 0, only.get("totals").toString());
    }

    @Test
    void check_resourceLimitOptions_skipWhatIsOverTheLimitAndSaySo(@TempDir Path dir) throws Exception {
        Path demo = dir.resolve("garden-planter.dxf");
        try (var in = EndToEndTest.class.getResourceAsStream("/org/linemass/app/demo/garden-planter.dxf")) {
            assumeTrue(in != null, "demo drawing not packaged");
            Files.copy(in, demo);
        }
        // the demo's two rims are LWPOLYLINEs of 8 vertices (testdata/demo/README.md): a limit of 2 skips both
        JsonNode r = run(1, 1, "check", "--json", "-", "--limit-vertices", "2", demo.toString());
        assertEquals(false, r.get("complete").asBoolean());
        long skipped = 0;
        for (JsonNode f : r.get("findings")) {
            skipped += f.get("kind").asText().equals("skipped_entity") ? 1 : 0;
        }
        assertEquals(2, skipped);
        // no expansion allowed: totals still come from instancing, pieces are skipped, and it says so
        JsonNode e = run(0, 1, "check", "--json", "-", "--limit-expanded", "0", demo.toString());
        assertEquals(false, e.get("complete").asBoolean());
        assertEquals(0, e.get("pieces").size());
        // drawn length: 7.283 m by the demo's hand calculation (duplicate not removed without the checks)
        assertEquals(7.2828, e.get("totals").get("length_m").asDouble(), 1e-4);
        // a limit below its minimum is a usage error
        exec(2, 2, new StringWriter(), "check", "--limit-block-depth", "-1", demo.toString());
    }

    /** Kind, layer, handle and exact points at five parameters of every segment (markup layer left out if asked). */
    private static List<String> fingerprints(List<org.linemass.geometry.Segment> segments, boolean skipMarkup) {
        List<String> out = new ArrayList<>();
        for (var s : segments) {
            if (skipMarkup && s.source().layer().startsWith("LINEMASS_FINDINGS")) {
                continue;
            }
            StringBuilder b = new StringBuilder(s.kind()).append(' ').append(s.source().layer()).append(' ')
                    .append(s.source().handle());
            for (int k = 0; k <= 4; k++) {
                b.append(' ').append(s.point(s.tStart() + k * (s.tEnd() - s.tStart()) / 4));
            }
            out.add(b.toString());
        }
        return out;
    }

    private static double distance(JsonNode a, JsonNode b) {
        double s = 0;
        for (int i = 0; i < 3; i++) {
            double d = a.get(i).asDouble() - b.get(i).asDouble();
            s += d * d;
        }
        return Math.sqrt(s);
    }

    /** Runs the real command line and returns its JSON; the exit code must lie in [lo, hi]. */
    private static JsonNode run(int lo, int hi, String... args) throws Exception {
        StringWriter out = new StringWriter();
        exec(lo, hi, out, args);
        return MAPPER.readTree(out.toString());
    }

    /** Runs the real command line with standard output into {@code out}; the exit code must lie in [lo, hi]. */
    private static void exec(int lo, int hi, StringWriter out, String... args) {
        StringWriter err = new StringWriter();
        AppContext sys = AppContext.system();
        AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), sys.pipeline(), sys.sections(),
                sys.integrator(), false);
        int code = Cli.run(ctx, args);
        assertTrue(code >= lo && code <= hi, "exit " + code + ": " + err);
    }
}
