package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Clean layouts give no findings; bends carry the right angle and radii; bend findings appear on
 * sections with a minimum bend radius. Angles and radii are closed forms of the drawn shapes.
 */
class CleanLayoutAndBendTest {

    /** Bend angles come from atan2 of exact unit tangents: 1e-9 degree is far above rounding. */
    private static final double ANGLE_TOL_DEG = 1e-9;

    private static final String F = "FRAME";

    /** A 400 x 250 mm frame drawn as four lines, corners shared exactly. */
    static List<Segment> frame() {
        return List.of(Fixtures.line(F, "10", 0, 0, 400, 0), Fixtures.line(F, "11", 400, 0, 400, 250),
                Fixtures.line(F, "12", 400, 250, 0, 250), Fixtures.line(F, "13", 0, 250, 0, 0));
    }

    /** The same frame with corners rounded on a centre-line radius r (mm): lines plus quarter arcs. */
    static List<Segment> roundedFrame(double r) {
        return List.of(Fixtures.line(F, "10", r, 0, 400 - r, 0), Fixtures.arc(F, "20", 400 - r, r, r, -90, 0),
                Fixtures.line(F, "11", 400, r, 400, 250 - r), Fixtures.arc(F, "21", 400 - r, 250 - r, r, 0, 90),
                Fixtures.line(F, "12", 400 - r, 250, r, 250), Fixtures.arc(F, "22", r, 250 - r, r, 90, 180),
                Fixtures.line(F, "13", 0, 250 - r, 0, r), Fixtures.arc(F, "23", r, r, r, 180, 270));
    }

    @Test
    void closedFrame_isOneClosedPieceWithFourSharpCornersAndNoFindings() {
        PieceAnalysis r = PieceAnalyzer.analyze(frame(), Fixtures.tol(), Fixtures.sections(F, Fixtures.WIRE_D4),
                false);
        assertEquals(List.of(), r.findings());
        assertEquals(1, r.pieces().size());
        Piece p = r.pieces().get(0);
        assertTrue(p.closed());
        assertEquals(4, p.bends().size());
        for (Bend b : p.bends()) {
            assertEquals(90, b.angleDeg(), ANGLE_TOL_DEG, "rectangle corners are right angles");
            assertNull(b.insideRadiusM(), "sharp corner");
        }
        assertEquals(List.of(List.of(0)), r.groups());
    }

    @Test
    void bentHookWithArc_hasOneBendWithInsideRadiusOfRoundSectionAndNoFindings() {
        PieceAnalysis r = PieceAnalyzer.analyze(Shapes.hook(F, 10), Fixtures.tol(),
                Fixtures.sections(F, Fixtures.WIRE_D4), false);
        assertEquals(List.of(), r.findings());
        Piece p = r.pieces().get(0);
        assertEquals(1, p.bends().size());
        Bend b = p.bends().get(0);
        assertEquals(90, b.angleDeg(), ANGLE_TOL_DEG);
        // centre-line radius 15 mm; inside radius = 15 - 4/2 = 13 mm (Bend contract)
        assertEquals(0.015, b.centreRadiusM(), 1e-15);
        assertEquals(0.013, b.insideRadiusM(), 1e-15);
        // at the middle of the arc: centre (100, 15) + 15 (cos -45, sin -45) mm
        Vec3 mid = new Vec3(0.1 + 0.015 * Math.cos(-Math.PI / 4), 0.015 + 0.015 * Math.sin(-Math.PI / 4), 0);
        assertTrue(b.atM().distance(mid) < 1e-15, b.toString());
    }

    @Test
    void roundedFrame_onRebarWithRadiusAboveMinimum_hasFourArcBendsAndNoFindings() {
        // B12: minimum inside radius 24 mm (FACTS.md 6.1, 4 phi mandrel); centre radius 30 -> inside 24
        PieceAnalysis r = PieceAnalyzer.analyze(roundedFrame(30), Fixtures.tol(),
                Fixtures.sections(F, Fixtures.BAR_B12), false);
        assertEquals(List.of(), r.findings());
        Piece p = r.pieces().get(0);
        assertTrue(p.closed());
        assertEquals(4, p.bends().size());
        for (Bend b : p.bends()) {
            assertEquals(0.024, b.insideRadiusM(), 1e-15);
        }
    }

    @Test
    void roundedFrame_onRebarWithTightRadius_reportsFourTightBends() {
        // centre radius 25 mm -> inside 19 mm < 24 mm
        PieceAnalysis r = PieceAnalyzer.analyze(roundedFrame(25), Fixtures.tol(),
                Fixtures.sections(F, Fixtures.BAR_B12), false);
        assertEquals(4, r.findings().size(), r.findings().toString());
        for (Finding f : r.findings()) {
            assertEquals(FindingKind.TIGHT_BEND, f.kind());
            assertEquals(Severity.WARNING, f.severity());
            assertEquals(0.019, f.sizeM(), 1e-15);
        }
    }

    @Test
    void sharpFrame_onRebar_reportsFourSharpCorners() {
        PieceAnalysis r = PieceAnalyzer.analyze(frame(), Fixtures.tol(), Fixtures.sections(F, Fixtures.BAR_B12),
                false);
        assertEquals(4, r.findings().stream().filter(f -> f.kind().equals(FindingKind.SHARP_CORNER)).count());
        assertEquals(4, r.findings().size());
    }

    @Test
    void halfRingSplitAtTheLoopStart_isStillOneBend() {
        // a "D": straight (0,-50) to (0,50) mm, half ring of r = 50 about the origin drawn as two
        // quarter arcs meeting at (-50, 0), the loop's lexicographically smallest vertex
        List<Segment> segs = List.of(Fixtures.line(F, "10", 0, -50, 0, 50), Fixtures.arc(F, "20", 0, 0, 50, 90, 180),
                Fixtures.arc(F, "21", 0, 0, 50, 180, 270));
        PieceAnalysis r = PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.sections(F, Fixtures.WIRE_D4), false);
        Piece p = r.pieces().get(0);
        assertTrue(p.closed());
        assertTrue(p.segments().get(0).start().distance(Fixtures.mm(-50, 0)) < 1e-15, "loop starts mid-arc");
        // one 180 degree arc bend and two sharp 90 degree corners where the arc meets the straight
        List<Double> arcs = p.bends().stream().filter(b -> b.centreRadiusM() != null).map(Bend::angleDeg).toList();
        assertEquals(1, arcs.size(), p.bends().toString());
        assertEquals(180, arcs.get(0), ANGLE_TOL_DEG);
        assertEquals(3, p.bends().size());
    }

    @Test
    void arcSplitInTwoOnTheSameCircle_isStillOneBend() {
        List<Segment> segs = new ArrayList<>(Shapes.hook(F, 10));
        org.linemass.geometry.CircularArc a = (org.linemass.geometry.CircularArc) segs.get(1);
        double mid = 0.5 * (a.t0() + a.t1());
        segs.set(1, org.linemass.geometry.CircularArc.of(a.centre(), a.radius(), a.u(), a.v(), a.t0(), mid,
                a.source()));
        segs.add(2, org.linemass.geometry.CircularArc.of(a.centre(), a.radius(), a.u(), a.v(), mid, a.t1(),
                a.source()));
        PieceAnalysis r = PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.sections(F, Fixtures.WIRE_D4), false);
        assertEquals(1, r.pieces().get(0).bends().size());
        assertEquals(90, r.pieces().get(0).bends().get(0).angleDeg(), ANGLE_TOL_DEG);
    }
}
