package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/** Degenerate and boundary inputs; expected values are closed forms of the drawn shapes. */
class EdgeCasesTest {

    private static final double LEN_TOL_M = 1e-12;

    private static final String W = "WIRE";

    private static PieceAnalysis run(List<Segment> segs) {
        return PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.none(), false);
    }

    private static List<Finding> of(PieceAnalysis r, String kind) {
        return r.findings().stream().filter(f -> f.kind().equals(kind)).toList();
    }

    @Test
    void emptyDrawing_givesAnEmptyAnalysis() {
        PieceAnalysis r = run(List.of());
        assertEquals(List.of(), r.pieces());
        assertEquals(List.of(), r.findings());
        assertEquals(List.of(), r.removed());
        assertEquals(List.of(), r.groups());
    }

    @Test
    void nullArguments_areRejected() {
        assertThrows(NullPointerException.class, () -> PieceAnalyzer.analyze(null, Fixtures.tol(), Fixtures.none(),
                false));
    }

    @Test
    void singleCircle_isOneClosedPieceWithNoFindings() {
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 30, 0, 360)));
        assertEquals(1, r.pieces().size());
        assertTrue(r.pieces().get(0).closed());
        assertEquals(List.of(), r.findings());
    }

    @Test
    void sameCircleDrawnTwiceFromDifferentStarts_isOneDuplicateOfItsCircumference() {
        CircularArc a = Fixtures.arc(W, "10", 0, 0, 30, 0, 360);
        CircularArc b = Fixtures.arc(W, "11", 0, 0, 30, 100, 460).reversed();
        PieceAnalysis r = run(List.of(a, b));
        List<Finding> d = of(r, FindingKind.DUPLICATE);
        assertEquals(1, d.size(), r.findings().toString());
        // closed form: 2 pi r
        assertEquals(2 * Math.PI * 0.03, d.get(0).sizeM(), LEN_TOL_M);
        assertEquals(2 * Math.PI * 0.03, r.removed().stream().mapToDouble(Curves::length).sum(), LEN_TOL_M);
        assertEquals(1, r.pieces().size());
        assertEquals(1, r.findings().size());
    }

    @Test
    void tJunctionOnAnArc_isFound() {
        // a stem ending on the top of a half ring of r = 50 mm at (0, 50)
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 50, 0, 180), Fixtures.line(W, "11", 0, 50, 0, 120)));
        List<Finding> t = of(r, FindingKind.T_JUNCTION);
        assertEquals(1, t.size(), r.findings().toString());
        assertTrue(t.get(0).atM().distance(Fixtures.mm(0, 50)) < 1e-15);
        assertEquals(List.of(), of(r, FindingKind.CROSSING));
    }

    @Test
    void endNearAnotherWireButBeyondTheJoinTolerance_isNeitherJoinedNorATJunction_butAGap() {
        // the stem stops 0.5 mm short of the bar: not touching (join tolerance 0.1 mm), within the
        // 5 mm gap limit, so a gap to the middle of the bar (closed form: 0.5 mm at (100, 0))
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 100, 0.5, 100, 80)));
        assertEquals(1, r.findings().size(), r.findings().toString());
        assertEquals(FindingKind.GAP, r.findings().get(0).kind());
        assertEquals(0.0005, r.findings().get(0).sizeM(), LEN_TOL_M);
        assertEquals(2, r.pieces().size());
    }

    @Test
    void wiresCrossingOnDifferentLayers_areReportedAsAWeldButNotJoinedOrDeduplicated() {
        // a cross wire on its own layer welded across a frame bar: one crossing at (100, 0) mm
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line("OTHER", "11", 100, -50, 100, 50)));
        assertEquals(1, r.findings().size(), r.findings().toString());
        assertEquals("crossing", r.findings().get(0).kind());
        assertTrue(r.findings().get(0).atM().closeTo(new org.linemass.geometry.Vec3(0.1, 0, 0), 1e-12));
        assertEquals(2, r.pieces().size());
        assertEquals(List.of(), r.removed());
    }

    @Test
    void sameLineOnTwoLayers_isNotADuplicate() {
        // another layer may be another bar (e.g. a bar and its coating drawn apart): only contacts are noted
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line("OTHER", "11", 0, 0, 200, 0)));
        assertEquals(List.of(), r.removed());
        assertTrue(r.findings().stream().noneMatch(f -> f.kind().equals("duplicate") || f.kind().equals("overlap")),
                r.findings().toString());
    }

    @Test
    void crossAtASharedVertex_continuesBothWiresStraight() {
        // two wires drawn as four lines meeting at (0, 0): two straight pieces, one branch notice
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", -100, 0, 0, 0), Fixtures.line(W, "11", 0, 0, 100, 0),
                Fixtures.line(W, "12", 0, -100, 0, 0), Fixtures.line(W, "13", 0, 0, 0, 100)));
        assertEquals(2, r.pieces().size());
        for (Piece p : r.pieces()) {
            assertEquals(0, p.bends().size());
            assertEquals(0.2, p.segments().stream().mapToDouble(Curves::length).sum(), LEN_TOL_M);
        }
        assertEquals(1, of(r, FindingKind.BRANCH).size());
        assertEquals(List.of(), of(r, FindingKind.CROSSING), "a shared vertex is not a crossing");
    }

    @Test
    void closedFrame_hasTheSameFormWhateverTheInputOrderAndDirection() {
        List<Segment> a = CleanLayoutAndBendTest.frame();
        List<Segment> b = new ArrayList<>();
        for (Segment s : a) {
            b.add(0, s.reversed());
        }
        Piece pa = run(a).pieces().get(0);
        Piece pb = run(b).pieces().get(0);
        assertEquals(pa.segments(), pb.segments(), "same start, same direction, same segments");
        // starts at the smallest corner (0, 0) heading to the smaller neighbour (0, 250)
        assertEquals(Vec3.ZERO, pa.segments().get(0).start());
        assertEquals(Fixtures.mm(0, 250), pa.segments().get(0).end());
    }

    @Test
    void nearlyCollinearOverlapWithinTheJoinTolerance_isAnOverlap_butParallelWiresHalfAMillimetreApartAreNot() {
        // second line 0.05 mm off the first's carrier (join tolerance 0.1 mm): drawn over it
        PieceAnalysis near = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 150, 0.05, 300, 0.05)));
        assertEquals(1, of(near, FindingKind.OVERLAP).size());
        // the removed part runs from the copy's start (150, 0.05) to the covering line's end (200, 0):
        // closed form sqrt(50^2 + 0.05^2) mm
        assertEquals(Math.hypot(0.05, 0.00005), of(near, FindingKind.OVERLAP).get(0).sizeM(), LEN_TOL_M);
        // 0.5 mm apart: two real wires side by side
        PieceAnalysis apart = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 150, 0.5, 300, 0.5)));
        assertEquals(List.of(), apart.findings());
        assertEquals(List.of(), apart.removed());
    }

    @Test
    void concentricArcsHalfAMillimetreApart_areNotOverlaps() {
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 50, 0, 180), Fixtures.arc(W, "11", 0, 0, 50.5, 0, 180)));
        assertEquals(List.of(), r.removed());
        assertEquals(List.of(), of(r, FindingKind.OVERLAP));
        assertEquals(2, r.pieces().size());
        // their ends are 0.5 mm apart at both sides: two gaps, nothing else
        assertEquals(2, of(r, FindingKind.GAP).size());
        assertEquals(2, r.findings().size());
    }

    @Test
    void longChainOfShortLines_isOnePieceOrientedEndToEnd() {
        List<Segment> segs = new ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            Straight s = Fixtures.line(W, "10", i, Math.sin(i * 0.01), i + 1, Math.sin((i + 1) * 0.01));
            segs.add(i % 3 == 0 ? s.reversed() : s);
        }
        java.util.Collections.shuffle(segs, new java.util.Random(1));
        PieceAnalysis r = run(segs);
        assertEquals(1, r.pieces().size());
        Piece p = r.pieces().get(0);
        for (int i = 1; i < p.segments().size(); i++) {
            assertEquals(0, p.segments().get(i - 1).end().distance(p.segments().get(i).start()), 0.0,
                    "each segment starts where the last one ends");
        }
        // oriented so the start is lexicographically first: it begins at x = 0
        assertEquals(Vec3.ZERO, p.segments().get(0).start());
        assertEquals(List.of(), r.findings());
    }
}
