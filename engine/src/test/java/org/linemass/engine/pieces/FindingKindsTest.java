package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/** One small invented drawing per finding kind; sizes are closed forms of the drawn geometry. */
class FindingKindsTest {

    /** Lengths here are sums of a few closed forms; 1e-12 m is far above their rounding. */
    private static final double LEN_TOL_M = 1e-12;

    private static final String W = "WIRE";

    private static PieceAnalysis run(List<Segment> segs) {
        return PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.sections(W, Fixtures.WIRE_D4), false);
    }

    private static List<Finding> of(PieceAnalysis r, String kind) {
        return r.findings().stream().filter(f -> f.kind().equals(kind)).toList();
    }

    @Test
    void reversedDuplicateLine_isADuplicate() {
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 300, 0), Fixtures.line(W, "11", 300, 0, 0, 0)));
        List<Finding> d = of(r, FindingKind.DUPLICATE);
        assertEquals(1, d.size());
        assertEquals(0.3, d.get(0).sizeM(), LEN_TOL_M);
        assertEquals(1, r.pieces().size());
        assertEquals(1, r.removed().size());
        assertEquals("11", r.removed().get(0).source().handle(), "the later copy is removed");
    }

    @Test
    void shortLineInsideLongerLine_isAnOverlapOfItsWholeLength() {
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 300, 0), Fixtures.line(W, "11", 250, 0, 100, 0)));
        List<Finding> d = of(r, FindingKind.OVERLAP);
        assertEquals(1, d.size());
        assertEquals(0.15, d.get(0).sizeM(), LEN_TOL_M);
        assertTrue(d.get(0).atM().distance(Fixtures.mm(175, 0)) < 1e-15);
        assertEquals(List.of(), of(r, FindingKind.DUPLICATE));
    }

    @Test
    void threeOverlappingCollinearLines_countEveryMillimetreOnce() {
        // 0..200, 150..350, 300..500 (mm): union 500 mm, drawn 600 mm, so 100 mm removed
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 350, 0, 150, 0),
                Fixtures.line(W, "12", 300, 0, 500, 0)));
        double removed = r.removed().stream().mapToDouble(Curves::length).sum();
        assertEquals(0.1, removed, LEN_TOL_M);
        assertEquals(2, of(r, FindingKind.OVERLAP).size());
        assertEquals(1, r.pieces().size(), "trimmed parts join into one wire");
        assertEquals(0.5, r.pieces().get(0).segments().stream().mapToDouble(Curves::length).sum(), LEN_TOL_M);
        assertEquals(List.of(), of(r, FindingKind.JOINED_ACROSS_GAP), "trimmed ends meet exactly");
    }

    @Test
    void circleWithAnArcDrawnOverIt_isAnOverlapOfTheArcLength() {
        // ring r = 50 mm and a 60 degree arc on it drawn clockwise (reversed): overlap 50 * pi / 3 mm
        CircularArc ring = Fixtures.arc(W, "10", 0, 0, 50, 0, 360);
        CircularArc over = Fixtures.arc(W, "11", 0, 0, 50, 350, 410).reversed();
        PieceAnalysis r = run(List.of(ring, over));
        List<Finding> d = of(r, FindingKind.OVERLAP);
        assertEquals(1, d.size(), r.findings().toString());
        assertEquals(0.05 * Math.PI / 3, d.get(0).sizeM(), LEN_TOL_M);
        assertEquals(1, r.pieces().size());
        assertTrue(r.pieces().get(0).closed());
        double kept = r.pieces().get(0).segments().stream().mapToDouble(Curves::length).sum();
        assertEquals(2 * Math.PI * 0.05, kept, LEN_TOL_M);
        for (Segment s : r.removed()) {
            assertEquals("11", s.source().handle(), "removed parts carry the removed copy's provenance");
            assertTrue(s instanceof CircularArc);
        }
    }

    @Test
    void twoArcsOverlappingOnOneCircle_keepTheUnion() {
        // 0..120 and 90..200 degrees on r = 40 mm: overlap 30 degrees
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 40, 0, 120), Fixtures.arc(W, "11", 0, 0, 40, 90, 200)));
        List<Finding> d = of(r, FindingKind.OVERLAP);
        assertEquals(1, d.size());
        assertEquals(0.04 * Math.toRadians(30), d.get(0).sizeM(), LEN_TOL_M);
        assertEquals(1, r.pieces().size());
        double kept = r.pieces().get(0).segments().stream().mapToDouble(Curves::length).sum();
        assertEquals(0.04 * Math.toRadians(200), kept, LEN_TOL_M);
    }

    @Test
    void identicalEllipseDrawnTwiceReversed_isADuplicate() {
        Provenance p = Provenance.of("t.dxf", W, 10, "10", "ELLIPSE");
        EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(0.1, 0, 0), new Vec3(0, 0.05, 0), 0, Math.PI, p);
        Segment copy = e.reversed().withSource(Provenance.of("t.dxf", W, 11, "11", "ELLIPSE"));
        PieceAnalysis r = run(List.of(e, copy));
        assertEquals(1, of(r, FindingKind.DUPLICATE).size());
        assertEquals(1, r.pieces().size());
    }

    @Test
    void identicalSplineDrawnTwiceReversed_isADuplicate() {
        // cubic B-spline, clamped; the copy is the exact reversal (Nurbs.reversed, same point set)
        org.linemass.geometry.Nurbs s = org.linemass.geometry.Nurbs.of(3, new double[] {0, 0, 0, 0, 0.5, 1, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(0.05, 0.08, 0), new Vec3(0.12, -0.03, 0),
                    new Vec3(0.18, 0.06, 0), new Vec3(0.25, 0, 0)}, null, Provenance.of("t.dxf", W, 10, "10", "SPLINE"));
        Segment copy = s.reversed().withSource(Provenance.of("t.dxf", W, 11, "11", "SPLINE"));
        PieceAnalysis r = run(List.of(copy, s));
        List<Finding> d = of(r, FindingKind.DUPLICATE);
        assertEquals(1, d.size());
        assertEquals(Curves.length(s), d.get(0).sizeM(), LEN_TOL_M);
        assertEquals("11", r.removed().get(0).source().handle(), "the later copy goes");
        assertEquals(1, r.pieces().size());
    }

    @Test
    void tinySegment_isAWarningAndAPieceOfItsOwn() {
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line(W, "11", 200, 0, 200.05, 0)));
        List<Finding> t = of(r, FindingKind.TINY_SEGMENT);
        assertEquals(1, t.size());
        assertEquals(Severity.WARNING, t.get(0).severity());
        assertEquals(0.05e-3, t.get(0).sizeM(), LEN_TOL_M);
        assertEquals(2, r.pieces().size());
    }

    @Test
    void threeEndsAtOnePoint_continueStraightAndReportABranch() {
        // a straight wire drawn as two lines through (100, 0) and a side wire leaving at 60 degrees
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line(W, "11", 100, 0, 200, 0),
                Fixtures.line(W, "12", 100, 0, 150, 86.60254037844386)));
        List<Finding> b = of(r, FindingKind.BRANCH);
        assertEquals(1, b.size());
        assertEquals(Severity.INFO, b.get(0).severity());
        assertTrue(b.get(0).atM().distance(Fixtures.mm(100, 0)) < 1e-15);
        assertEquals(2, r.pieces().size());
        Piece straight = r.pieces().stream().filter(p -> p.segments().size() == 2).findFirst().orElseThrow();
        assertEquals(0, straight.bends().size(), "the run goes straight on through the branch");
    }

    @Test
    void figureEight_isASelfCrossing() {
        // a closed bow-tie: (0,0) (100,100) (100,0) (0,100) back to (0,0): diagonals cross at (50, 50)
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 100), Fixtures.line(W, "11", 100, 100, 100, 0),
                Fixtures.line(W, "12", 100, 0, 0, 100), Fixtures.line(W, "13", 0, 100, 0, 0)));
        List<Finding> s = of(r, FindingKind.SELF_CROSSING);
        assertEquals(1, s.size());
        assertEquals(Severity.WARNING, s.get(0).severity());
        assertTrue(s.get(0).atM().distance(Fixtures.mm(50, 50)) < 1e-15);
        // the two diagonals are different entities: the message names the other one, never "itself at itself"
        String m = s.get(0).message();
        assertTrue(m.contains("crosses itself where it passes"), m);
        assertEquals(List.of(), of(r, FindingKind.CROSSING));
    }

    @Test
    void almostClosedRing_reportsTheGapBetweenItsOwnEnds() {
        // ring of r = 100 mm drawn as an arc leaving 1.5 mm open: chord 2 r sin(dt/2)
        double dt = 0.0015 / 0.1;
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 100, Math.toDegrees(dt), 360)));
        List<Finding> g = of(r, FindingKind.GAP);
        assertEquals(1, g.size());
        assertEquals(2 * 0.1 * Math.sin(dt / 2), g.get(0).sizeM(), LEN_TOL_M);
    }

    @Test
    void endWithTwoNearEnds_isPairedWithTheNearest() {
        // wire A ends at (100, 0); wire B starts 1 mm further on, wire C 3 mm off to the side
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line(W, "11", 101, 0, 200, 0),
                Fixtures.line(W, "12", 100, 3, 100, 100)));
        List<Finding> g = of(r, FindingKind.GAP);
        // A-B (1 mm) is A's and B's nearest; C's nearest is A (3 mm), so A-C is reported too
        assertEquals(2, g.size(), g.toString());
        assertTrue(g.stream().anyMatch(f -> Math.abs(f.sizeM() - 0.001) < LEN_TOL_M));
        assertTrue(g.stream().anyMatch(f -> Math.abs(f.sizeM() - 0.003) < LEN_TOL_M));
    }

    @Test
    void shortStub_isNotAGapWithItself() {
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 3, 0)));
        assertEquals(List.of(), r.findings());
    }

    @Test
    void endsOnDifferentLayers_doNotJoin() {
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line("OTHER", "11", 100, 0, 200, 0)));
        assertEquals(2, r.pieces().size());
        assertEquals(List.of(), r.findings());
    }

    @Test
    void crossingInSpace_isFoundWhenTheWiresTouch_andNotWhenOnePassesAbove() {
        Provenance p = Fixtures.src(W, "10");
        Provenance q = Fixtures.src(W, "11");
        Straight a = new Straight(new Vec3(0, 0, 0), new Vec3(0.1, 0.1, 0.1), p);
        Straight b = new Straight(new Vec3(0.1, 0, 0), new Vec3(0, 0.1, 0.1), q);
        assertEquals(1, of(run(List.of(a, b)), FindingKind.CROSSING).size());
        Straight above = new Straight(new Vec3(0.1, 0, 0.001), new Vec3(0, 0.1, 0.101), q);
        assertEquals(0, of(run(List.of(a, above)), FindingKind.CROSSING).size());
    }

    @Test
    void lineThroughARing_crossesItTwice() {
        // ring r = 50 mm about the origin, a line y = 20 mm through it: crossings at x = +-sqrt(50^2 - 20^2)
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 50, 0, 360), Fixtures.line(W, "11", -80, 20, 80, 20)));
        List<Finding> c = of(r, FindingKind.CROSSING);
        assertEquals(2, c.size(), r.findings().toString());
        double x = Math.sqrt(0.05 * 0.05 - 0.02 * 0.02);
        // Newton converges quadratically: 1 nm is generous
        assertTrue(c.stream().anyMatch(f -> f.atM().distance(new Vec3(x, 0.02, 0)) < 1e-9), c.toString());
        assertTrue(c.stream().anyMatch(f -> f.atM().distance(new Vec3(-x, 0.02, 0)) < 1e-9), c.toString());
        assertTrue(c.get(0).message().contains("0 T-junctions and 2 crossings"), c.get(0).message());
    }

    @Test
    void lineThroughAnArc_isACrossing() {
        List<Segment> segs = new ArrayList<>();
        segs.add(Fixtures.arc(W, "10", 0, 0, 50, 0, 180));
        segs.add(Fixtures.line(W, "11", -10, 20, 10, 80));
        PieceAnalysis r = run(segs);
        List<Finding> c = of(r, FindingKind.CROSSING);
        assertEquals(1, c.size(), r.findings().toString());
        // the line x = -10 + (y - 20) / 3 meets x^2 + y^2 = 50^2 where the contact lies on both
        Vec3 at = c.get(0).atM();
        assertEquals(0.05, Math.hypot(at.x(), at.y()), 1e-9, "on the circle (Newton to 1 nm)");
        assertEquals(at.x(), -0.01 + (at.y() - 0.02) / 3, 1e-9, "on the line");
    }
}
