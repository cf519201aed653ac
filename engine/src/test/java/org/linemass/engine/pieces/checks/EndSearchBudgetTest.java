package org.linemass.engine.pieces.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.pieces.index.CandidatePairs;
import org.linemass.engine.pieces.index.DerivedIndex;
import org.linemass.engine.pieces.index.SegmentIndex;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * The budget of candidates looked at around free ends, on a garden-trellis comb: one long frame
 * wire along y = 0 and {@code n} upright wires at 100 mm pitch whose lower ends stop {@code d} above
 * the frame's interior. With d = 0 each upright makes one T-junction (n in all); with d = 2 mm,
 * inside the 5 mm gap limit and above the 0.1 mm join tolerance, each makes one gap to the middle
 * of a wire (n in all). Closed form from the construction; no other pair of wires comes near.
 */
class EndSearchBudgetTest {

    /** Join tolerance 0.1 mm, gap limit 5 mm. */
    private static final Tolerances TOL = new Tolerances(1e-4, 5e-3, 1e-12, 1e-4, 1e-10, Math.toRadians(0.01));

    private static final int N = 9;

    private static List<Segment> comb(double liftM) {
        List<Segment> wires = new ArrayList<>();
        wires.add(new Straight(-0.05, 0, 0, (N - 1) * 0.1 + 0.05, 0, 0, src(0x100)));
        for (int k = 0; k < N; k++) {
            wires.add(new Straight(k * 0.1, liftM, 0, k * 0.1, 0.6, 0, src(0x101 + k)));
        }
        return wires;
    }

    private static Provenance src(int handle) {
        return Provenance.of("trellis.dxf", "TRELLIS_D5", handle, Integer.toHexString(handle), "LINE");
    }

    private static DerivedIndex index(List<Segment> wires) {
        int[] identity = new int[wires.size()];
        Arrays.setAll(identity, i -> i);
        return new DerivedIndex(new SegmentIndex(wires, TOL.joinM()), wires.size(), wires, identity, TOL.joinM());
    }

    private static List<Finding> tees(long budget) {
        List<Segment> wires = comb(0);
        int[] identity = new int[wires.size()];
        Arrays.setAll(identity, i -> i);
        boolean[] free = new boolean[2 * wires.size()];
        Arrays.fill(free, true);
        CandidatePairs pairs = CandidatePairs.of(new SegmentIndex(wires, TOL.joinM()), wires.size(), (i, j) -> true);
        return ContactCheck.check(wires, index(wires), pairs, new int[wires.size()], free, identity, TOL, 1000,
                1000, budget);
    }

    private static List<Finding> teeGaps(long budget) {
        List<Segment> wires = comb(0.002);
        boolean[] free = new boolean[2 * wires.size()];
        Arrays.fill(free, true);
        Vec3[] ends = new Vec3[free.length];
        for (int i = 0; i < wires.size(); i++) {
            ends[2 * i] = wires.get(i).start();
            ends[2 * i + 1] = wires.get(i).end();
        }
        return TeeGapCheck.check(wires, index(wires), free, ends, new boolean[free.length], TOL, budget);
    }

    private static List<Finding> of(List<Finding> all, String kind) {
        return all.stream().filter(f -> f.kind().equals(kind)).toList();
    }

    @Test
    void ampleBudget_findsEveryTeeAndEveryGap_withoutALimit() {
        List<Finding> t = tees(EndSearchBudget.MAX_CANDIDATES);
        assertEquals(N, of(t, FindingKind.T_JUNCTION).size(), "closed form: one T-junction per upright");
        assertTrue(of(t, FindingKind.T_JUNCTION).get(0).message()
                .endsWith("Drawing total: 9 T-junctions and 0 crossings."));
        assertEquals(0, of(t, FindingKind.LIMIT_REACHED).size());
        List<Finding> g = teeGaps(EndSearchBudget.MAX_CANDIDATES);
        assertEquals(N, of(g, FindingKind.GAP).size(), "closed form: one gap per upright");
        assertEquals(0, of(g, FindingKind.LIMIT_REACHED).size());
    }

    @Test
    void spentBudget_stopsAfterTheFirstEnd_withAWarning_andLowerBoundTotals() {
        // a budget of 0 is spent by the first end's own segment: 1 of the 2 * (N + 1) free ends searched
        String stopped = "at the first 1 of " + 2 * (N + 1) + " free ends only";
        List<Finding> t = tees(0);
        List<Finding> limit = of(t, FindingKind.LIMIT_REACHED);
        assertEquals(1, limit.size());
        assertEquals(Severity.WARNING, limit.get(0).severity());
        assertTrue(limit.get(0).message().contains("T-junctions were looked for " + stopped), limit.get(0).message());
        assertTrue(of(t, FindingKind.T_JUNCTION).size() <= 1);
        for (Finding f : of(t, FindingKind.T_JUNCTION)) {
            assertTrue(f.message().contains("Drawing total: at least "), f.message());
        }
        List<Finding> g = teeGaps(0);
        assertTrue(of(g, FindingKind.GAP).size() <= 1);
        List<Finding> gl = of(g, FindingKind.LIMIT_REACHED);
        assertEquals(1, gl.size());
        assertTrue(gl.get(0).message().contains("gaps to the middle of a wire were looked for " + stopped),
                gl.get(0).message());
    }

    @Test
    void endToEndGaps_allFoundWithAmpleBudget_andTheSearchStopsWhenSpent() {
        // a handrail drawn as N lengths of 100 mm in a row, each 2 mm short of the next: N - 1 gaps
        // (closed form from the construction; 2 mm is inside the 5 mm gap limit)
        List<Segment> wires = new ArrayList<>();
        for (int k = 0; k < N; k++) {
            wires.add(new Straight(k * 0.102, 0, 0, k * 0.102 + 0.1, 0, 0, src(0x200 + k)));
        }
        boolean[] free = new boolean[2 * N];
        Arrays.fill(free, true);
        Vec3[] ends = new Vec3[2 * N];
        int[] chain = new int[N];
        double[] length = new double[N];
        for (int i = 0; i < N; i++) {
            ends[2 * i] = wires.get(i).start();
            ends[2 * i + 1] = wires.get(i).end();
            chain[i] = i;
            length[i] = 0.1;
        }
        List<Finding> all = GapCheck.check(wires, new int[N], free, ends, chain, length, TOL, new boolean[2 * N],
                EndSearchBudget.MAX_CANDIDATES);
        assertEquals(N - 1, of(all, FindingKind.GAP).size());
        assertEquals(0, of(all, FindingKind.LIMIT_REACHED).size());
        List<Finding> cut = GapCheck.check(wires, new int[N], free, ends, chain, length, TOL, new boolean[2 * N], 0);
        assertTrue(of(cut, FindingKind.GAP).size() <= 1);
        List<Finding> limit = of(cut, FindingKind.LIMIT_REACHED);
        assertEquals(1, limit.size());
        assertEquals(Severity.WARNING, limit.get(0).severity());
        assertTrue(limit.get(0).message().contains("gaps between wire ends were looked for at the first 1 of "
                + 2 * N + " free ends only"), limit.get(0).message());
    }

    @Test
    void negativeBudget_isRejected() {
        assertThrows(IllegalArgumentException.class, () -> new EndSearchBudget(-1));
    }
}
