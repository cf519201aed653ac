package org.linemass.engine.bender;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.pieces.PieceAnalyzer;
import org.linemass.engine.assemble.PieceForms;
import org.linemass.engine.result.PieceForm;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.testing.SharedDir;
import org.linemass.geometry.Vec3;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.ImportOptions;

/**
 * Bend and coil counts on the corpus drawings (../shared/corpus/README.md describes each): the v07
 * stirrup (a closed LWPOLYLINE with four bulges of tan 22.5 degrees, i.e. four 90 degree corner arcs,
 * read from the file) in every placement of its block, including the non-uniform scale (1, 1.2, 0.8)
 * that turns its corner arcs into elliptical arcs; the v05 coil spring ("6 turns" in the corpus
 * README) and closed rings; the v02 CIRCLE rings.
 */
class CorpusBendsTest {

    /**
     * Plane angles add exactly, so a bend's sampled turning is its angle up to rounding: about 1e-13
     * rad per sample over a few hundred samples. 1e-9 degrees is far above that and far below any
     * drafting angle.
     */
    private static final double ANGLE_DEG = 1e-9;

    private static List<Piece> pieces(String name) throws Exception {
        Path corpus = SharedDir.corpus().orElse(null);
        Assumptions.assumeTrue(corpus != null, "../shared/corpus not present beside the checkout; corpus checks skipped");
        Drawing drawing = DxfImporter.read(corpus.resolve(name), ImportOptions.DEFAULTS);
        List<Piece> kept = new ArrayList<>();
        Analyzer.analyze(drawing, AnalysisSettings.defaults(BuiltInSections.table()), (world, tol, lookup, mirror) -> {
            PieceAnalysis pa = PieceAnalyzer.analyze(world, tol, lookup, mirror);
            kept.addAll(pa.pieces());
            return pa;
        });
        return kept;
    }

    private static List<FormRun> runs(Piece p) {
        return RunSplitter.split(p.segments(), p.closed(), Math.toRadians(0.01), 1e-5);
    }

    @Test
    void v07Stirrups_haveFourRightAngleBendsInEveryPlacement() throws Exception {
        int stirrups = 0;
        int elliptical = 0;
        for (Piece p : pieces("v07_rebar_cage_blocks_r2000_mm.dxf")) {
            if (!p.closed() || !(p.layer().equals("REBAR_STIRRUP_D8") || p.layer().equals("CAGE_ASSEMBLY"))) {
                continue;
            }
            stirrups++;
            if (p.segments().stream().anyMatch(s -> s.kind().equals("ellipse_arc"))) {
                elliptical++;
            }
            assertEquals(4, p.bends().size(), "bends of the stirrup at " + p.segments().get(0).start());
            for (var b : p.bends()) {
                assertEquals(90.0, b.angleDeg(), ANGLE_DEG);
            }
            long turns = runs(p).stream().filter(r -> r instanceof FormRun.Turn).count();
            assertEquals(4, turns);
        }
        assertTrue(stirrups >= 20, "stirrups found: " + stirrups);
        assertTrue(elliptical > 0, "some stirrups are under the non-uniform scale");
    }

    @Test
    void v05CoilSpring_isACoilOfSixTurns_andRingsAreRingsWithoutBends() throws Exception {
        boolean sawCoil = false;
        int rings = 0;
        for (Piece p : pieces("v05_coil_spring_splines_r2018_mm.dxf")) {
            List<FormRun> runs = runs(p);
            if (p.layer().equals("SPRING_COIL_D2")) {
                sawCoil = true;
                assertEquals(0, p.bends().size());
                List<FormRun.Wind> winds = runs.stream().filter(r -> r instanceof FormRun.Wind)
                        .map(r -> (FormRun.Wind) r).toList();
                assertEquals(1, winds.size());
                // "6 turns" (corpus README); the B-spline only approximates a helix and its ends may
                // run in or out, so a tenth of a turn
                assertEquals(6.0, winds.get(0).turns(), 0.1);
                assertFalse(winds.get(0).closed());
                assertTrue(winds.get(0).pitchM() > 0);
            }
            if (p.layer().equals("SPRING_RING_D2")) {
                rings++;
                assertTrue(p.closed());
                assertEquals(0, p.bends().size());
                assertEquals(1, runs.size());
                FormRun.Wind w = (FormRun.Wind) runs.get(0);
                assertTrue(w.closed());
                assertEquals(1.0, w.turns());
                assertEquals(0.0, w.pitchM());
            }
        }
        assertTrue(sawCoil);
        assertEquals(2, rings);
    }

    /**
     * Every corpus piece whose bender data is exact (straights, circular arcs, sharp corners in one
     * plane each) rebuilds from it: length equal to 1e-9 relative, end point within 1e-9 of the piece's
     * size (the bound the issue sets; rounding is about 1e-15).
     */
    @Test
    void corpusPieces_rebuildFromTheirBenderData() throws Exception {
        int rebuilt = 0;
        for (String name : List.of("v03_tubular_handrail_lwpoly_r2018_mm.dxf", "v07_rebar_cage_blocks_r2000_mm.dxf",
                "v09_tube_chair_frame_r2018_in.dxf", "v02_garden_trellis_arcs_r2000_mm.dxf",
                "v04_garden_gate_r12.dxf")) {
            for (Piece p : pieces(name)) {
                PieceForm form = PieceForms.of(p.segments(), p.closed(), null, 0, Math.toRadians(0.01), 1e-5);
                if (!form.program().exact() || !form.coils().isEmpty()) {
                    continue;
                }
                BenderReplay.Rebuilt r = BenderReplay.replay(form.program()).orElseThrow();
                double drawn = p.segments().stream().mapToDouble(org.linemass.engine.pieces.geom.Curves::length).sum();
                double size = Math.max(drawn, 1e-3);
                assertEquals(drawn, r.lengthM(), 1e-9 * drawn, name + " piece at " + p.segments().get(0).start());
                Vec3 end = p.segments().get(p.segments().size() - 1).end();
                assertTrue(r.endM().distance(end) <= 1e-9 * size, name + " end " + r.endM() + " vs " + end);
                rebuilt++;
            }
        }
        assertTrue(rebuilt > 50, "pieces rebuilt: " + rebuilt);
    }

    @Test
    void v02CircleRings_areRingsOfTheirDiameter() throws Exception {
        int rings = 0;
        for (Piece p : pieces("v02_garden_trellis_arcs_r2000_mm.dxf")) {
            if (!p.layer().equals("TRELLIS_RING_D6")) {
                continue;
            }
            rings++;
            assertEquals(0, p.bends().size());
            FormRun.Wind w = (FormRun.Wind) runs(p).get(0);
            double length = w.lengthM();
            // a circle: length = pi D (closed form); the fitted diameter comes from 256 samples of an
            // exact circle, so it agrees to rounding
            assertEquals(length / Math.PI, w.meanDiameterM(), 1e-12);
        }
        assertEquals(4, rings);
    }
}
