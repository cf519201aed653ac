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
        return PieceAnalyzer.analyze(BAR_AND_HOOK, Tolerances.defaultsFor(1.0), layer -> Optional.empty(), false, joins);
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

    @Test
    void parse_emptyPattern_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> LayerJoin.parse("BAR++HOOK", "test"));
        assertThrows(IllegalArgumentException.class, () -> LayerJoin.parse("BAR+HOOK=", "test"));
    }
}
