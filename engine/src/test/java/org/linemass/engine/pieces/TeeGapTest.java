package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Segment;

/**
 * Gaps to the middle of a wire (almost T-junctions) in a small invented garden-gate frame: a cross
 * wire drawn up to a frame bar. Tolerances from {@link Fixtures#tol()}: join 0.1 mm, gap limit
 * 5 mm. Expected sizes and places are closed forms of the drawn coordinates.
 */
class TeeGapTest {

    /** Coordinates are whole or tenth millimetres; 1e-12 m is far above their rounding. */
    private static final double LEN_TOL_M = 1e-12;

    private static final String W = "WIRE";

    private static PieceAnalysis run(List<Segment> segs) {
        return PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.none(), false);
    }

    private static List<Finding> of(PieceAnalysis r, String kind) {
        return r.findings().stream().filter(f -> f.kind().equals(kind)).toList();
    }

    @Test
    void crossWireStoppingShortOfTheFrame_isAGapAtTheClosestPoint() {
        // frame bar along y = 0; the cross wire comes down x = 100 and stops at y = 2 mm
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 100, 80, 100, 2)));
        List<Finding> g = of(r, FindingKind.GAP);
        assertEquals(1, g.size(), r.findings().toString());
        Finding f = g.get(0);
        // closed form: the perpendicular foot (100, 0), distance 2 mm
        assertEquals(0.002, f.sizeM(), LEN_TOL_M);
        assertTrue(f.atM().distance(Fixtures.mm(100, 0)) < LEN_TOL_M, f.atM().toString());
        assertEquals(Severity.WARNING, f.severity());
        assertEquals(2, f.entities().size(), "both wires are named");
        assertTrue(f.message().contains("2.000 mm short of"), f.message());
        assertEquals(List.of(), of(r, FindingKind.T_JUNCTION));
        assertEquals(1, r.findings().size(), r.findings().toString());
    }

    @Test
    void crossWireOnAnotherLayerStoppingShort_isAGapToo() {
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0),
                Fixtures.line("CROSS", "11", 100, 80, 100, 3.5)));
        List<Finding> g = of(r, FindingKind.GAP);
        assertEquals(1, g.size(), r.findings().toString());
        assertEquals(0.0035, g.get(0).sizeM(), LEN_TOL_M);
        assertEquals("CROSS", g.get(0).layer(), "reported on the free end's layer");
    }

    @Test
    void crossWireStoppingShortOfAnArc_isAGapToTheArc() {
        // half ring r = 50 mm about the origin; a stem comes down x = 0 and stops at y = 53 mm:
        // closed form distance 53 - 50 = 3 mm, closest point (0, 50)
        PieceAnalysis r = run(List.of(Fixtures.arc(W, "10", 0, 0, 50, 0, 180), Fixtures.line(W, "11", 0, 120, 0, 53)));
        List<Finding> g = of(r, FindingKind.GAP);
        assertEquals(1, g.size(), r.findings().toString());
        assertEquals(0.003, g.get(0).sizeM(), LEN_TOL_M);
        assertTrue(g.get(0).atM().distance(Fixtures.mm(0, 50)) < LEN_TOL_M);
    }

    @Test
    void wireStoppingShortOfItsOwnShank_isAGap() {
        // a loop bent from one wire: along the bottom, up, back along the top and down again,
        // stopping 2 mm above its own first leg at (100, 0)
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 200, 0, 200, 50),
                Fixtures.line(W, "12", 200, 50, 100, 50), Fixtures.line(W, "13", 100, 50, 100, 2)));
        assertEquals(1, r.pieces().size());
        List<Finding> g = of(r, FindingKind.GAP);
        assertEquals(1, g.size(), r.findings().toString());
        assertEquals(0.002, g.get(0).sizeM(), LEN_TOL_M);
        assertTrue(g.get(0).atM().distance(Fixtures.mm(100, 0)) < LEN_TOL_M);
    }

    @Test
    void endsWithinTheJoinToleranceOrBeyondTheGapLimit_areNoGap() {
        // 0.05 mm short: touching (a T-junction, a weld); 6 mm short: beyond the 5 mm gap limit
        PieceAnalysis touching = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0),
                Fixtures.line(W, "11", 100, 80, 100, 0.05)));
        assertEquals(List.of(), of(touching, FindingKind.GAP));
        assertEquals(1, of(touching, FindingKind.T_JUNCTION).size());
        PieceAnalysis far = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 100, 80, 100, 6)));
        assertEquals(List.of(), far.findings());
    }

    @Test
    void wiresSideBySide_andAHairpin_areNoGap() {
        // two parallel wires 2 mm apart with staggered ends: each free end has the other wire 2 mm
        // to its side, not ahead of it
        PieceAnalysis side = run(List.of(Fixtures.line(W, "10", 0, 0, 200, 0), Fixtures.line(W, "11", 50, 2, 300, 2)));
        assertEquals(List.of(), side.findings(), side.findings().toString());
        // a hairpin: legs 3 mm apart joined by a half turn of r = 1.5 mm, the inner leg 20 mm
        // shorter (so its end lies 3 mm beside the outer leg, and the ends are not an end-to-end gap)
        PieceAnalysis pin = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.arc(W, "11", 100, 1.5, 1.5, -90, 90),
                Fixtures.line(W, "12", 100, 3, 20, 3)));
        assertEquals(1, pin.pieces().size());
        assertEquals(List.of(), of(pin, FindingKind.GAP), pin.findings().toString());
    }

    @Test
    void endNearAnotherEndAndThatWiresMiddle_isReportedOnce() {
        // the frame bar ends at (100, 0); the cross wire stops at (99, 2): 2 mm above the bar's
        // middle and sqrt(1 + 4) mm from its end. The end-to-end gap is the one reported.
        PieceAnalysis r = run(List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line(W, "11", 99, 50, 99, 2)));
        List<Finding> g = of(r, FindingKind.GAP);
        assertEquals(1, g.size(), r.findings().toString());
        assertEquals(Math.sqrt(5) * 1e-3, g.get(0).sizeM(), LEN_TOL_M);
    }
}
