package org.linemass.engine.pieces.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
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

/**
 * The contact check's limits on a welded-mesh panel of {@code n} straight line wires across
 * {@code m} straight cross wires (each wire running 5 mm past the outermost wire it crosses), so
 * every line wire crosses every cross wire once, at a point interior to both: n*m crossings and no
 * T-junctions (closed form: two families of parallel lines, each line of one meeting each line of
 * the other exactly once). Small limits are passed in, so the tests stay fast.
 */
class ContactCapTest {

    /** Join tolerance 0.1 mm: wire ends 5 mm past the outermost wire touch nothing (no T-junctions). */
    private static final Tolerances TOL = new Tolerances(1e-4, 5e-3, 1e-12, 1e-4, 1e-10, Math.toRadians(0.01));

    private static final double PITCH_M = 0.050;
    private static final double OVERHANG_M = 0.005;

    private static final Pattern TOTAL =
            Pattern.compile("Drawing total: (at least )?(\\d+) T-junctions? and (\\d+) crossings?\\.");

    private static List<Finding> mesh(int n, int m, int maxListed, int maxCounted) {
        return mesh(n, m, maxListed, maxCounted, CandidatePairs.MAX_PAIRS);
    }

    private static List<Finding> mesh(int n, int m, int maxListed, int maxCounted, int maxPairs) {
        List<Segment> wires = new ArrayList<>();
        int handle = 0x100;
        for (int i = 0; i < n; i++) {
            double y = i * PITCH_M;
            wires.add(new Straight(-OVERHANG_M, y, 0, (m - 1) * PITCH_M + OVERHANG_M, y, 0, src(handle++)));
        }
        for (int k = 0; k < m; k++) {
            double x = k * PITCH_M;
            wires.add(new Straight(x, -OVERHANG_M, 0, x, (n - 1) * PITCH_M + OVERHANG_M, 0, src(handle++)));
        }
        int count = wires.size();
        SegmentIndex index = new SegmentIndex(wires, TOL.joinM());
        CandidatePairs pairs = CandidatePairs.of(index, count, (i, j) -> true, maxPairs);
        int[] identity = new int[count];
        Arrays.setAll(identity, i -> i);
        DerivedIndex derived = new DerivedIndex(index, count, wires, identity, TOL.joinM());
        boolean[] free = new boolean[2 * count];
        Arrays.fill(free, true);
        // every wire on one layer and a piece of its own
        return ContactCheck.check(wires, derived, pairs, new int[count], free, identity, TOL, maxListed, maxCounted,
                EndSearchBudget.MAX_CANDIDATES);
    }

    private static Provenance src(int handle) {
        String h = Integer.toHexString(handle).toUpperCase(java.util.Locale.ROOT);
        return Provenance.of("mesh-panel.dxf", "MESH_D4", handle, h, "LINE");
    }

    private static List<Finding> of(List<Finding> all, String kind) {
        return all.stream().filter(f -> f.kind().equals(kind)).toList();
    }

    /** The T-junction and crossing totals every listed note carries (all notes must agree). */
    private static long[] totals(List<Finding> notes) {
        long[] t = null;
        for (Finding f : notes) {
            Matcher mt = TOTAL.matcher(f.message());
            assertTrue(mt.find(), f.message());
            long[] here = {Long.parseLong(mt.group(2)), Long.parseLong(mt.group(3)), mt.group(1) == null ? 0 : 1};
            if (t != null) {
                assertEquals(Arrays.toString(t), Arrays.toString(here), "every note gives the same totals");
            }
            t = here;
        }
        return t;
    }

    @Test
    void underTheListLimit_everyCrossingIsListed_andNoLimitIsReported() {
        int n = 6;
        int m = 7;
        List<Finding> out = mesh(n, m, 1000, 1000);
        assertEquals(n * m, of(out, FindingKind.CROSSING).size(), "closed form: n*m crossings");
        assertEquals(0, of(out, FindingKind.LIMIT_REACHED).size());
        assertEquals(0, of(out, FindingKind.T_JUNCTION).size(), "every wire overhangs: no T-junctions");
        assertEquals("[0, 42, 0]", Arrays.toString(totals(of(out, FindingKind.CROSSING))));
    }

    @Test
    void overTheListLimit_listsTheLimit_countsEveryCrossing_andSaysHowManyAreNotListed() {
        int n = 12;
        int m = 15;
        int cap = 25;
        List<Finding> out = mesh(n, m, cap, 1000);
        List<Finding> crossings = of(out, FindingKind.CROSSING);
        assertEquals(cap, crossings.size(), "listed one by one: the limit");
        long[] t = totals(crossings);
        assertEquals(0, t[0], "T-junctions");
        assertEquals(n * m, t[1], "closed form: every crossing counted, n*m = 180");
        assertEquals(0, t[2], "the count is exact, not a lower bound");
        List<Finding> limits = of(out, FindingKind.LIMIT_REACHED);
        assertEquals(1, limits.size());
        Finding limit = limits.get(0);
        // a note: the totals are whole, only the list is shorter
        assertEquals(Severity.INFO, limit.severity());
        String notListed = (n * m - cap) + " T-junction and crossing notes are not listed one by one"
                + " (0 T-junctions, " + (n * m - cap) + " crossings; more than " + cap + " in the drawing)";
        assertTrue(limit.message().startsWith(notListed), limit.message());
    }

    @Test
    void overTheCountLimit_stopsTheSearch_withAWarning_andLowerBoundTotals() {
        int n = 5;
        int m = 4;
        int counted = 7;
        List<Finding> out = mesh(n, m, 1000, counted);
        List<Finding> crossings = of(out, FindingKind.CROSSING);
        assertEquals(counted, crossings.size(), "the search stops after the limit of places");
        long[] t = totals(crossings);
        assertEquals(counted, t[1]);
        assertEquals(1, t[2], "totals say 'at least'");
        List<Finding> limits = of(out, FindingKind.LIMIT_REACHED);
        assertEquals(1, limits.size());
        assertEquals(Severity.WARNING, limits.get(0).severity(), "something may be missing: not a mere note");
        assertTrue(limits.get(0).message().startsWith("more than " + counted + " places"), limits.get(0).message());
    }

    @Test
    void candidatePairsCutShort_giveLowerBoundTotals() {
        // 4 x 4 mesh: 16 crossing pairs plus parallel neighbours whose grown boxes do not meet (50 mm
        // pitch); keeping 5 pairs leaves crossings out
        List<Finding> out = mesh(4, 4, 1000, 1000, 5);
        List<Finding> crossings = of(out, FindingKind.CROSSING);
        assertTrue(crossings.size() <= 5 && !crossings.isEmpty(),
                "found among the kept pairs only: " + crossings.size());
        long[] t = totals(crossings);
        assertEquals(crossings.size(), t[1]);
        assertEquals(1, t[2], "totals say 'at least'");
    }

    @Test
    void negativeLimits_areRejected() {
        assertThrows(IllegalArgumentException.class, () -> mesh(2, 2, -1, 10));
    }
}
