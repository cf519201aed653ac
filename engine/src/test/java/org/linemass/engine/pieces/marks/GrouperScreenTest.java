package org.linemass.engine.pieces.marks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * The screen that spares grouping its arc-length tables: it must never keep apart pieces the full
 * comparison groups. Expected values are closed forms: a rigid motion keeps the distance between a
 * piece's ends, and a match moves each end by at most the group tolerance.
 */
class GrouperScreenTest {

    private static final Tolerances TOL = Tolerances.defaults();

    @Test
    void mayMatch_endDistancesWithinTwiceTheTolerance_pass_fartherDoNot() {
        double g = 1e-3;
        assertTrue(Grouper.mayMatch(1.0, 1.0 + 2 * g, g));
        assertFalse(Grouper.mayMatch(1.0, 1.0 + 3 * g, g));
        // a closed piece has no ends: never screened out
        assertTrue(Grouper.mayMatch(Double.NaN, 1.0, g));
    }

    @Test
    void group_sameLengthHooksDifferentOpening_apart_andRotatedCopiesTogether() {
        // an L of legs 1 m and 1 m (ends sqrt(2) m apart) in three rotated places, and a straight
        // 2 m bar on the same layer (ends 2 m apart): same length, so only the end distance tells them
        List<Piece> pieces = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            double a = k * 0.7;
            Vec3 o = new Vec3(5 * k, 0, 0);
            Vec3 u = new Vec3(Math.cos(a), Math.sin(a), 0);
            Vec3 v = new Vec3(-Math.sin(a), Math.cos(a), 0);
            pieces.add(piece(o, o.plus(u), o.plus(u).plus(v)));
        }
        pieces.add(piece(new Vec3(0, 10, 0), new Vec3(1, 10, 0), new Vec3(2, 10, 0)));
        List<String> keys = List.of("layer:A", "layer:A", "layer:A", "layer:A");
        double[] lengths = {2, 2, 2, 2};
        List<List<Integer>> groups = Grouper.group(pieces, keys, TOL, false, lengths, 1);
        assertEquals(List.of(List.of(0, 1, 2), List.of(3)), groups);
        assertEquals(groups, Grouper.group(pieces, keys, TOL, false, lengths, 4));
        assertEquals(groups, Grouper.group(pieces, keys, TOL, false));
    }

    private static Piece piece(Vec3... corners) {
        List<Segment> segs = new ArrayList<>();
        for (int i = 0; i + 1 < corners.length; i++) {
            segs.add(new Straight(corners[i], corners[i + 1], Provenance.of("t.dxf", "A", 10 + i, "1" + i, "LINE")));
        }
        return new Piece("A", segs, false, List.of());
    }
}
