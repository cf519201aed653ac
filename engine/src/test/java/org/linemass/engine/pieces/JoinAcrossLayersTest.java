package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.section.LayerJoin;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Joining across layers: a 1 m bar on layer BAR with a 0.2 m hook leg on layer HOOK, touching end to
 * end (a detailer's drawing with the hook on its own layer). By default ends join on one layer only
 * (two pieces, as before); with a layer join they make one piece of 1.2 m, reported on the layer the
 * rule names or else on the layer with the longest run, with a joined_across_layers finding naming
 * both layers. Lengths are sums of two exact straights: compared to 1e-12 m.
 */
class JoinAcrossLayersTest {

    private static final double TOL = 1e-12;

    private static Segment line(String layer, int handle, Vec3 a, Vec3 b) {
        return new Straight(a, b, Provenance.of("bar.dxf", layer, handle, Integer.toString(handle), "LINE"));
    }

    private static final List<Segment> BAR_AND_HOOK = List.of(line("BAR", 1, Vec3.ZERO, new Vec3(1, 0, 0)),
            line("HOOK", 2, new Vec3(1, 0, 0), new Vec3(1, 0.2, 0)));

    private static PieceAnalysis analyse(List<LayerJoin> joins) {
        return PieceAnalyzer.analyze(BAR_AND_HOOK, Tolerances.defaults(), layer -> Optional.empty(), false, joins);
    }

    private static double length(Piece p) {
        return p.segments().stream().mapToDouble(s -> s.start().distance(s.end())).sum();
    }

    @Test
    void analyze_noJoin_twoPiecesAsBefore() {
        PieceAnalysis pa = analyse(List.of());
        assertEquals(2, pa.pieces().size());
        assertTrue(pa.findings().stream().noneMatch(f -> f.kind().equals(FindingKind.JOINED_ACROSS_LAYERS)));
    }

    @Test
    void analyze_joinWithoutLead_onePieceOnTheLongestRun() {
        PieceAnalysis pa = analyse(List.of(LayerJoin.parse("BAR+HOO*", "test")));
        assertEquals(1, pa.pieces().size());
        Piece p = pa.pieces().get(0);
        assertEquals("BAR", p.layer());
        assertEquals(1.2, length(p), TOL);
        List<Finding> across = pa.findings().stream().filter(f -> f.kind().equals(FindingKind.JOINED_ACROSS_LAYERS))
                .toList();
        assertEquals(1, across.size());
        assertTrue(across.get(0).message().contains("BAR, HOOK"), across.get(0).message());
        assertTrue(across.get(0).message().contains("longest run"), across.get(0).message());
    }

    @Test
    void analyze_joinWithLead_onePieceOnTheNamedLayer() {
        PieceAnalysis pa = analyse(List.of(LayerJoin.parse("HOOK+BAR=hook", "test")));
        assertEquals(1, pa.pieces().size());
        assertEquals("HOOK", pa.pieces().get(0).layer());
    }

    /**
     * A closed stirrup 300 x 400 on layer S with corner arcs of radius 25 mm, and two 60 mm hooks on
     * layer H leaving the two ends of the top-left corner arc at 135 degrees to the sides they continue
     * (45 degrees to the arc). Joined, each hook pairs with the side it turns 135 degrees from, so the
     * stirrup opens into one bar (hooks, four sides, three corners) and the top-left arc is left on its
     * own; without the join the loop stays closed and the hooks are two pieces.
     */
    @Test
    void analyze_hooksAtAClosedLoop_openTheLoopWhenJoined() {
        double r = 0.025;
        double s = Math.sqrt(0.5);
        Provenance ps = Provenance.of("bar.dxf", "S", 1, "1", "LWPOLYLINE");
        List<Segment> segs = new java.util.ArrayList<>(List.of(
                new Straight(new Vec3(0.025, 0, 0), new Vec3(0.275, 0, 0), ps),
                org.linemass.geometry.CircularArc.of(new Vec3(0.275, 0.025, 0), r, Vec3.X, Vec3.Y, 1.5 * Math.PI,
                        2 * Math.PI, ps),
                new Straight(new Vec3(0.3, 0.025, 0), new Vec3(0.3, 0.375, 0), ps),
                org.linemass.geometry.CircularArc.of(new Vec3(0.275, 0.375, 0), r, Vec3.X, Vec3.Y, 0, Math.PI / 2, ps),
                new Straight(new Vec3(0.275, 0.4, 0), new Vec3(0.025, 0.4, 0), ps),
                org.linemass.geometry.CircularArc.of(new Vec3(0.025, 0.375, 0), r, Vec3.X, Vec3.Y, Math.PI / 2, Math.PI,
                        ps),
                new Straight(new Vec3(0, 0.375, 0), new Vec3(0, 0.025, 0), ps),
                org.linemass.geometry.CircularArc.of(new Vec3(0.025, 0.025, 0), r, Vec3.X, Vec3.Y, Math.PI,
                        1.5 * Math.PI, ps)));
        Vec3 p1 = new Vec3(0, 0.375, 0);
        Vec3 p2 = new Vec3(0.025, 0.4, 0);
        Vec3 in = new Vec3(s, -s, 0).times(0.06);
        segs.add(line("H", 2, p1, p1.plus(in)));
        segs.add(line("H", 3, p2, p2.plus(in)));
        Tolerances tol = Tolerances.defaults();
        PieceAnalysis apart = PieceAnalyzer.analyze(segs, tol, layer -> Optional.empty(), false, List.of());
        assertEquals(3, apart.pieces().size());
        assertEquals(1, apart.pieces().stream().filter(Piece::closed).count());
        PieceAnalysis joined = PieceAnalyzer.analyze(segs, tol, layer -> Optional.empty(), false,
                List.of(LayerJoin.parse("S+H", "test")));
        assertEquals(2, joined.pieces().size());
        double arc = Math.PI / 2 * r;
        Piece bar = joined.pieces().stream().filter(p -> p.segments().size() > 1).findFirst().orElseThrow();
        assertEquals("S", bar.layer());
        // hooks 2 x 60, sides 250 + 350 + 250 + 350, three corner arcs
        assertEquals(0.12 + 1.2 + 3 * arc, arcLength(bar), 1e-12);
        Piece corner = joined.pieces().stream().filter(p -> p.segments().size() == 1).findFirst().orElseThrow();
        assertEquals(arc, arcLength(corner), 1e-12);
    }

    private static double arcLength(Piece p) {
        return p.segments().stream().mapToDouble(org.linemass.engine.pieces.geom.Curves::length).sum();
    }

    @Test
    void parse_emptyPattern_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> LayerJoin.parse("BAR++HOOK", "test"));
        assertThrows(IllegalArgumentException.class, () -> LayerJoin.parse("BAR+HOOK=", "test"));
    }
}
