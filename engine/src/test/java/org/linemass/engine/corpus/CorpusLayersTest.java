package org.linemass.engine.corpus;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.linemass.drawing.Drawing;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.moments.Sym3;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.testing.MiniJson;
import org.linemass.engine.testing.SharedDir;
import org.linemass.engine.testing.SimpleStages;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.ImportOptions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Every layer of every corpus drawing: raw length, length centroid and second moment J against the
 * manifest (independently generated, see ../shared/corpus/README.md). Expected values are taken in
 * drawing units and converted with the unit the importer chose, so a guessed unit does not matter.
 * Tolerances are the manifest's suggestion: 1e-7 relative on length and J, 1e-7 times the layer's
 * radius of gyration on the centroid, the layer's own comparison_tolerance_rel when it has one.
 * Runs with the "each segment is a piece" stage, so nothing is deduplicated (the manifest's values
 * are raw). Skipped when the corpus is absent or the importer is not available.
 */
class CorpusLayersTest {

    @TestFactory
    @SuppressWarnings("unchecked")
    Stream<DynamicTest> layers_matchManifest() throws Exception {
        Path corpus = SharedDir.corpus().orElse(null);
        Assumptions.assumeTrue(corpus != null, "../shared/corpus not present beside the checkout; corpus checks skipped");
        Map<String, Object> manifest = (Map<String, Object>) MiniJson.parse(Files.readString(corpus.resolve(
                "manifest.json")));
        Map<String, Object> files = (Map<String, Object>) manifest.get("files");
        List<DynamicTest> tests = new ArrayList<>();
        for (Map.Entry<String, Object> f : files.entrySet()) {
            tests.add(DynamicTest.dynamicTest(f.getKey(), () -> check(corpus.resolve(f.getKey()),
                    (Map<String, Object>) f.getValue())));
        }
        return tests.stream();
    }

    @SuppressWarnings("unchecked")
    private static void check(Path file, Map<String, Object> expected) throws Exception {
        Drawing drawing;
        try {
            drawing = DxfImporter.read(file, ImportOptions.DEFAULTS);
        } catch (UnsupportedOperationException e) {
            Assumptions.abort("importer not available in this build: " + e.getMessage());
            return;
        }
        Map<String, Object> layers = (Map<String, Object>) expected.get("layers");
        // each layer gets the manifest's illustrative section, typed as a parametric id
        List<LayerAssignment> sections = new ArrayList<>();
        for (Map.Entry<String, Object> e : layers.entrySet()) {
            Map<String, Object> mat = (Map<String, Object>) ((Map<String, Object>) e.getValue()).get("example_material");
            List<Object> sec = (List<Object>) mat.get("section");
            StringBuilder id = new StringBuilder(sec.get(0) + ":");
            for (int k = 1; k < sec.size(); k++) {
                id.append(k > 1 ? "x" : "").append(sec.get(k));
            }
            id.append(':').append(mat.get("density_kg_m3"));
            sections.add(new LayerAssignment(e.getKey(), id.toString(), "corpus manifest"));
        }
        DrawingResult r = Analyzer.analyze(drawing, AnalysisSettings.defaults(BuiltInSections.table())
                .withAssignments(sections), SimpleStages.EACH_SEGMENT);
        double unit = drawing.unit().metres();
        for (Map.Entry<String, Object> e : layers.entrySet()) {
            Map<String, Object> exp = (Map<String, Object>) e.getValue();
            LayerResult got = r.layers().stream().filter(l -> l.name().equals(e.getKey())).findFirst()
                    .orElseThrow(() -> new AssertionError("layer " + e.getKey() + " missing"));
            double rel = exp.containsKey("comparison_tolerance_rel") ? (Double) exp.get("comparison_tolerance_rel")
                    : 1e-7;
            double length = (Double) ((Map<String, Object>) exp.get("length")).get("du") * unit;
            assertEquals(length, got.drawnLengthM(), rel * length, e.getKey() + " length");
            List<Object> g = (List<Object>) ((Map<String, Object>) exp.get("centroid")).get("du");
            List<Object> j = (List<Object>) ((Map<String, Object>) exp.get("second_moment_centroidal")).get("du3");
            double[][] jm = new double[3][3];
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    jm[a][b] = (Double) ((List<Object>) j.get(a)).get(b) * unit * unit * unit;
                }
            }
            Sym3 jExp = new Sym3(jm[0][0], jm[0][1], jm[0][2], jm[1][1], jm[1][2], jm[2][2]);
            double gyration = Math.sqrt(jExp.trace() / 2 / length);
            for (int a = 0; a < 3; a++) {
                assertEquals((Double) g.get(a) * unit, got.lengthCentroidM().get(a), rel * gyration + 1e-12,
                        e.getKey() + " centroid " + a);
            }
            double diff = jExp.minus(got.lengthInertiaM3()).maxAbs();
            assertTrue(diff <= rel * jExp.maxAbs() + 1e-15, e.getKey() + " J differs by " + diff);
            // mass: the manifest's linear density (computed independently from the same dimensions) times the
            // raw length; the parametric section must reproduce that density to rounding
            Map<String, Object> mat = (Map<String, Object>) exp.get("example_material");
            double kgPerM = (Double) mat.get("linear_density_kg_per_m");
            assertEquals(kgPerM * length, got.massKg(), rel * kgPerM * length, e.getKey() + " mass");
        }
        Map<String, Object> counts = (Map<String, Object>) expected.get("entity_counts_expanded");
        for (Map.Entry<String, Object> c : counts.entrySet()) {
            assertEquals(((Double) c.getValue()).longValue(), r.entities().curves().getOrDefault(c.getKey(), 0L),
                    "count of " + c.getKey());
        }
    }
}
