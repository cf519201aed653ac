package org.linemass.engine.pieces.join;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.linemass.engine.pieces.index.CandidatePairs;
import org.linemass.engine.pieces.index.SegmentIndex;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Many copies drawn on exactly the same place (an array with no spacing, found by fuzzing the
 * importer and resolver): ends at one point form one node without visiting every pair, and the
 * candidate-pair stage stops at its limit instead of growing quadratically. The generous timeouts
 * only turn a return to quadratic work into a failure; they measure nothing.
 */
class CoincidentEndsTest {

    private static List<Segment> copies(int n) {
        List<Segment> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(new Straight(Vec3.ZERO, new Vec3(0.1, 0, 0), Provenance.of("t.dxf", "W", i + 1, "", "LINE")));
        }
        return out;
    }

    @Test
    @Timeout(value = 20, unit = TimeUnit.SECONDS)
    void endNodes_hundredThousandCoincidentEnds_formTwoNodes() {
        List<Segment> segs = copies(100_000);
        EndNodes nodes = EndNodes.of(segs, new int[segs.size()], 1e-4);
        // every copy starts at the origin and ends at (0.1, 0, 0): two places, so two nodes
        assertEquals(2, nodes.nodeCount());
        assertEquals(100_000, nodes.size(0));
        assertEquals(100_000, nodes.size(1));
    }

    @Test
    void candidatePairs_stopAtTheirLimitAndSaySo() {
        List<Segment> segs = copies(200);
        SegmentIndex index = new SegmentIndex(segs, 1e-4);
        CandidatePairs capped = CandidatePairs.of(index, segs.size(), (i, j) -> true, 1000);
        assertTrue(capped.truncated());
        assertEquals(1000, capped.size());
        // all 200 * 199 / 2 pairs when the limit allows them
        CandidatePairs all = CandidatePairs.of(index, segs.size(), (i, j) -> true, 100_000);
        assertEquals(200 * 199 / 2, all.size());
        assertTrue(!all.truncated());
    }
}
