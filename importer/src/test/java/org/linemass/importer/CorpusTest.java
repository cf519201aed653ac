package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.linemass.drawing.Drawing;
import org.linemass.geometry.Segment;

/**
 * Every drawing of the shared corpus against its manifest.json (independently generated): per
 * layer the expanded curve entity counts and curve pieces, the length, the length centroid and
 * the centroidal second-moment tensor J, integrated here with {@link LineIntegrals} after the
 * test-only {@link TestExpander}. Tolerances from the corpus README: relative 1e-7 on length and
 * J (J entries relative to the largest entry), 1e-7 x radius of gyration on the centroid; layers
 * marked interpretation_dependent use their own comparison_tolerance_rel (2e-3).
 */
class CorpusTest {

    /** corpus README, "Comparing": suggested relative tolerance. */
    private static final double REL_TOL = 1e-7;

    @TestFactory
    Stream<DynamicTest> corpusDrawingsMatchManifest() throws IOException {
        Path corpus = SharedFiles.corpus();
        Assumptions.assumeTrue(Files.isRegularFile(corpus.resolve("manifest.json")),
                "../shared/corpus not present beside the checkout; corpus checks skipped");
        JsonNode files = new ObjectMapper().readTree(corpus.resolve("manifest.json").toFile()).get("files");
        List<DynamicTest> tests = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = files.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            tests.add(DynamicTest.dynamicTest(e.getKey(), () -> check(corpus.resolve(e.getKey()), e.getValue())));
        }
        return tests.stream();
    }

    private static void check(Path file, JsonNode expected) throws DxfInputException {
        Drawing d = DxfImporter.read(file, ImportOptions.DEFAULTS);
        assertEquals(expected.get("acadver").asText(), d.dxfVersion(), "acadver");
        assertTrue(d.notes().stream().noneMatch(n -> n.severity().equals("error")), () -> "errors: " + d.notes());
        List<TestExpander.Placed> placed = TestExpander.expand(d);
        Map<String, List<Segment>> byLayer = new TreeMap<>();
        Map<String, Map<String, Integer>> pieces = new TreeMap<>();
        Map<String, Map<String, java.util.Set<String>>> entities = new TreeMap<>();
        for (TestExpander.Placed p : placed) {
            byLayer.computeIfAbsent(p.layer(), k -> new ArrayList<>()).add(p.segment());
            pieces.computeIfAbsent(p.layer(), k -> new TreeMap<>()).merge(p.segment().kind(), 1, Integer::sum);
            entities.computeIfAbsent(p.layer(), k -> new TreeMap<>())
                    .computeIfAbsent(p.segment().source().entityType(), k -> new java.util.HashSet<>())
                    .add(p.entityKey());
        }
        JsonNode layers = expected.get("layers");
        assertEquals(names(layers), byLayer.keySet(), "layers with curves");
        Map<String, Long> fileCounts = new TreeMap<>();
        expected.get("entity_counts_expanded").fields().forEachRemaining(f -> fileCounts.put(f.getKey(),
                f.getValue().asLong()));
        assertEquals(fileCounts, TestExpander.expandedCounts(d), "expanded curve entity counts of the file");
        for (Iterator<Map.Entry<String, JsonNode>> it = layers.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            String layer = e.getKey();
            JsonNode ex = e.getValue();
            Map<String, Integer> expPieces = new TreeMap<>();
            ex.get("curve_pieces").fields().forEachRemaining(f -> expPieces.put(f.getKey(), f.getValue().asInt()));
            assertEquals(expPieces, pieces.get(layer), layer + " curve pieces");
            Map<String, Integer> expCounts = new TreeMap<>();
            ex.get("entity_counts_expanded").fields().forEachRemaining(f -> expCounts.merge(
                    f.getKey().startsWith("POLYLINE") ? "POLYLINE" : f.getKey(), f.getValue().asInt(), Integer::sum));
            Map<String, Integer> gotCounts = new TreeMap<>();
            entities.get(layer).forEach((k, v) -> gotCounts.put(k, v.size()));
            assertEquals(expCounts, gotCounts, layer + " expanded entity counts (POLYLINE 2D and 3D together)");
            double tol = ex.has("comparison_tolerance_rel") ? ex.get("comparison_tolerance_rel").asDouble() : REL_TOL;
            LineIntegrals li = LineIntegrals.of(byLayer.get(layer));
            double len = ex.get("length").get("du").asDouble();
            assertEquals(len, li.length, tol * len, layer + " length");
            JsonNode jn = ex.get("second_moment_centroidal").get("du3");
            double jmax = 0;
            double trace = 0;
            for (int a = 0; a < 3; a++) {
                trace += jn.get(a).get(a).asDouble();
                for (int b = 0; b < 3; b++) {
                    jmax = Math.max(jmax, Math.abs(jn.get(a).get(b).asDouble()));
                }
            }
            // radius of gyration about the centroid: trace(J) = 2 trace(C) = 2 L k^2
            double gyration = Math.sqrt(trace / (2 * len));
            JsonNode g = ex.get("centroid").get("du");
            double[] got = li.centroid.toArray();
            for (int a = 0; a < 3; a++) {
                assertEquals(g.get(a).asDouble(), got[a], tol * gyration, layer + " centroid " + a);
            }
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    assertEquals(jn.get(a).get(b).asDouble(), li.j[a][b], tol * jmax, layer + " J" + a + b);
                }
            }
        }
    }

    /**
     * Every corpus drawing re-written as binary DXF (both code widths, by the test's own writer) reads
     * to the same segments, layers, handles, blocks and counts as the ASCII file.
     */
    @TestFactory
    Stream<DynamicTest> corpusAsBinary_readsLikeAscii() throws IOException {
        Path corpus = SharedFiles.corpus();
        Assumptions.assumeTrue(Files.isRegularFile(corpus.resolve("manifest.json")),
                "../shared/corpus not present beside the checkout; corpus checks skipped");
        List<DynamicTest> tests = new ArrayList<>();
        try (Stream<Path> files = Files.list(corpus)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".dxf")).sorted().toList()) {
                tests.add(DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
                    Drawing ascii = DxfImporter.read(f, ImportOptions.DEFAULTS);
                    Dxf pairs = Dxf.parse(Files.readString(f, java.nio.charset.StandardCharsets.ISO_8859_1));
                    for (boolean wide : new boolean[] {true, false}) {
                        Drawing bin = DxfImporter.read("b.dxf", pairs.binary(wide), ImportOptions.DEFAULTS);
                        assertEquals(ascii.blocks().keySet(), bin.blocks().keySet());
                        assertEquals(ascii.layers().keySet(), bin.layers().keySet());
                        assertEquals(ascii.unit(), bin.unit());
                        for (String b : ascii.blocks().keySet()) {
                            var x = ascii.blocks().get(b);
                            var y = bin.blocks().get(b);
                            assertEquals(x.curveEntityCounts(), y.curveEntityCounts(), b);
                            assertEquals(x.otherEntityCounts(), y.otherEntityCounts(), b);
                            assertEquals(x.inserts().size(), y.inserts().size(), b);
                            for (int i = 0; i < x.inserts().size(); i++) {
                                assertEquals(x.inserts().get(i).placement(), y.inserts().get(i).placement());
                            }
                            assertEquals(x.segments().size(), y.segments().size(), b);
                            for (int i = 0; i < x.segments().size(); i++) {
                                Segment s = x.segments().get(i);
                                Segment t = y.segments().get(i);
                                assertEquals(s.withSource(t.source()), t, b + " segment " + i);
                                assertEquals(s.source().layer(), t.source().layer());
                                assertEquals(s.source().handle(), t.source().handle());
                            }
                        }
                    }
                }));
            }
        }
        return tests.stream();
    }

    /**
     * The fit-point-only spline layer is interpretation dependent (2e-3 in the manifest), but the
     * importer implements exactly the convention the corpus README documents (clamped C2 cubic,
     * chord-length knots, unit end tangents as derivatives), so it must agree to the ordinary 1e-7.
     */
    @org.junit.jupiter.api.Test
    void fitPointSpline_followsTheDocumentedConventionToFullTolerance() throws Exception {
        Path corpus = SharedFiles.corpus();
        Assumptions.assumeTrue(Files.isRegularFile(corpus.resolve("manifest.json")),
                "../shared/corpus not present beside the checkout; corpus checks skipped");
        String name = "v05_coil_spring_splines_r2018_mm.dxf";
        JsonNode layer = new ObjectMapper().readTree(corpus.resolve("manifest.json").toFile()).get("files").get(name)
                .get("layers").get("SPRING_FIT_D2");
        Assumptions.assumeTrue(layer != null, "corpus has no SPRING_FIT_D2 layer");
        Drawing d = DxfImporter.read(corpus.resolve(name), ImportOptions.DEFAULTS);
        List<Segment> segs = new ArrayList<>();
        for (TestExpander.Placed p : TestExpander.expand(d)) {
            if (p.layer().equals("SPRING_FIT_D2")) {
                segs.add(p.segment());
            }
        }
        double len = layer.get("length").get("du").asDouble();
        assertEquals(len, LineIntegrals.of(segs).length, REL_TOL * len);
    }

    private static java.util.Set<String> names(JsonNode layers) {
        java.util.Set<String> s = new java.util.TreeSet<>();
        layers.fieldNames().forEachRemaining(s::add);
        return s;
    }
}
