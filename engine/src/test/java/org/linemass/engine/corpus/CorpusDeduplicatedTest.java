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
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.testing.MiniJson;
import org.linemass.engine.testing.SharedDir;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.ImportOptions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * The whole engine with the real piece stage on every corpus drawing: each layer's length
 * (duplicates and overlaps counted once) against the manifest's {@code deduplicated} values where a
 * layer has them and its raw values otherwise, and the raw drawn length always; tolerance 1e-7
 * relative (the manifest's suggestion). Skipped when the corpus, the importer or the piece stage is
 * not available in this build.
 */
class CorpusDeduplicatedTest {

    @TestFactory
    @SuppressWarnings("unchecked")
    Stream<DynamicTest> deduplicatedLengths_matchManifest() throws Exception {
        Path corpus = SharedDir.corpus().orElse(null);
        Assumptions.assumeTrue(corpus != null, "../shared/corpus not present beside the checkout; corpus checks skipped");
        Map<String, Object> files = (Map<String, Object>) ((Map<String, Object>) MiniJson.parse(Files.readString(
                corpus.resolve("manifest.json")))).get("files");
        List<DynamicTest> tests = new ArrayList<>();
        for (Map.Entry<String, Object> f : files.entrySet()) {
            tests.add(DynamicTest.dynamicTest(f.getKey(), () -> check(corpus.resolve(f.getKey()),
                    (Map<String, Object>) f.getValue())));
        }
        return tests.stream();
    }

    @SuppressWarnings("unchecked")
    private static void check(Path file, Map<String, Object> expected) throws Exception {
        DrawingResult r;
        Drawing drawing;
        try {
            drawing = DxfImporter.read(file, ImportOptions.DEFAULTS);
            r = Analyzer.analyze(drawing, AnalysisSettings.defaults(BuiltInSections.table()));
        } catch (UnsupportedOperationException e) {
            Assumptions.abort("importer or piece stage not available in this build: " + e.getMessage());
            return;
        }
        double unit = drawing.unit().metres();
        Map<String, Object> layers = (Map<String, Object>) expected.get("layers");
        for (Map.Entry<String, Object> e : layers.entrySet()) {
            Map<String, Object> exp = (Map<String, Object>) e.getValue();
            double rel = exp.containsKey("comparison_tolerance_rel") ? (Double) exp.get("comparison_tolerance_rel")
                    : 1e-7;
            LayerResult got = r.layers().stream().filter(l -> l.name().equals(e.getKey())).findFirst()
                    .orElseThrow(() -> new AssertionError("layer " + e.getKey() + " missing"));
            double raw = (Double) ((Map<String, Object>) exp.get("length")).get("du") * unit;
            Map<String, Object> dedup = (Map<String, Object>) exp.getOrDefault("deduplicated", exp);
            double length = (Double) ((Map<String, Object>) dedup.get("length")).get("du") * unit;
            assertEquals(raw, got.drawnLengthM(), rel * raw, e.getKey() + " drawn length");
            assertEquals(length, got.lengthM(), rel * raw, e.getKey() + " deduplicated length");
            List<Object> g = (List<Object>) ((Map<String, Object>) dedup.get("centroid")).get("du");
            List<Object> j = (List<Object>) ((Map<String, Object>) dedup.get("second_moment_centroidal")).get("du3");
            double traceJ = 0;
            for (int a = 0; a < 3; a++) {
                traceJ += (Double) ((List<Object>) j.get(a)).get(a) * unit * unit * unit;
            }
            // radius of gyration: trace(J) = 2 trace(C) = 2 L r_g^2
            double gyration = Math.sqrt(traceJ / 2 / length);
            for (int a = 0; a < 3; a++) {
                assertEquals((Double) g.get(a) * unit, got.lengthCentroidM().get(a), rel * gyration + 1e-12,
                        e.getKey() + " centroid " + a);
            }
            assertTrue(got.errorBoundM() < 1e-6 * raw, e.getKey() + " error bound " + got.errorBoundM());
        }
    }
}
