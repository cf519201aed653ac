package org.linemass.engine.fuzz;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import org.junit.jupiter.api.Timeout;
import org.linemass.drawing.Drawing;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.resolve.ResolvedDrawing;
import org.linemass.engine.resolve.Resolver;
import org.linemass.engine.section.SectionTable;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/**
 * Fuzzes the drawing path past the importer: every drawing the importer accepts is resolved to
 * world metres (block instancing, arrays in closed form, bounded expansion) with default settings.
 * Contract: the resolver throws nothing and finishes in bounded time ({@link Timeout}); the
 * segment count it reports is never negative (it saturates). Whether non-finite totals are flagged
 * is not checked here: that gap is known and listed in testdata/hostile/README.md.
 */
class ResolveFuzzTest {

    @Timeout(10)
    @FuzzTest(maxDuration = "2m")
    void resolve(byte[] content) {
        Drawing d;
        try {
            d = DxfImporter.read("fuzz.dxf", content, ImportOptions.DEFAULTS);
        } catch (DxfInputException e) {
            return;
        }
        ResolvedDrawing r = Resolver.resolve(d, AnalysisSettings.defaults(SectionTable.empty()));
        assertTrue(r.expandedSegments() >= 0, () -> "expanded segment count " + r.expandedSegments());
    }
}
