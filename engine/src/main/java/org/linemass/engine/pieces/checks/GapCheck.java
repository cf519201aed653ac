package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.pieces.index.PointGrid;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * {@code gap} (warning): for every free end (alone at its node), the nearest other free end on the
 * same layer within {@link Tolerances#gapLimitM()} (it is necessarily farther than the join
 * tolerance, or the two would have joined). Each pair is reported once, at the middle of the gap,
 * with the gap as size. The two ends of one piece are not reported when the piece is shorter than
 * {@link #SAME_PIECE_FACTOR} times their distance (a short stub, not an almost-closed loop).
 * A hash grid with cells of the gap limit finds the candidates, O(n) expected.
 */
public final class GapCheck {

    /** Length-to-gap ratio below which a piece's own two ends are not a gap (common practice, no source). */
    public static final double SAME_PIECE_FACTOR = 10;

    private GapCheck() {
    }

    /**
     * @param segments the joined segments, end 2i / 2i+1 being segment i's start / end
     * @param chainOf chain number per segment
     * @param chainLength length of each chain (metres)
     */
    public static List<Finding> check(List<Segment> segments, int[] layerOf, boolean[] free, Vec3[] endPoint,
            int[] chainOf, double[] chainLength, Tolerances tol) {
        return check(segments, layerOf, free, endPoint, chainOf, chainLength, tol, new boolean[free.length]);
    }

    /**
     * As {@link #check(List, int[], boolean[], Vec3[], int[], double[], Tolerances)}, and marks in
     * {@code reported} (one flag per end) every end that is part of a reported gap, so that
     * {@link TeeGapCheck} does not report it again.
     */
    public static List<Finding> check(List<Segment> segments, int[] layerOf, boolean[] free, Vec3[] endPoint,
            int[] chainOf, double[] chainLength, Tolerances tol, boolean[] reported) {
        return check(segments, layerOf, free, endPoint, chainOf, chainLength, tol, reported,
                EndSearchBudget.MAX_CANDIDATES);
    }

    /**
     * As {@link #check(List, int[], boolean[], Vec3[], int[], double[], Tolerances, boolean[])},
     * stopping with a {@code limit_reached} warning once about {@code maxCandidates} other ends were
     * looked at (thousands of free ends crowded within the gap limit of each other).
     */
    static List<Finding> check(List<Segment> segments, int[] layerOf, boolean[] free, Vec3[] endPoint,
            int[] chainOf, double[] chainLength, Tolerances tol, boolean[] reported, long maxCandidates) {
        EndSearchBudget budget = new EndSearchBudget(maxCandidates);
        int searched = 0;
        List<Integer> ends = new ArrayList<>();
        for (int e = 0; e < free.length; e++) {
            if (free[e]) {
                ends.add(e);
            }
        }
        int m = ends.size();
        double[] xyz = new double[3 * m];
        int[] group = new int[m];
        for (int k = 0; k < m; k++) {
            Vec3 p = endPoint[ends.get(k)];
            xyz[3 * k] = p.x();
            xyz[3 * k + 1] = p.y();
            xyz[3 * k + 2] = p.z();
            group[k] = layerOf[ends.get(k) >> 1];
        }
        PointGrid grid = new PointGrid(xyz, group, tol.gapLimitM());
        double limit2 = tol.gapLimitM() * tol.gapLimitM();
        Set<Long> pairsReported = new HashSet<>();
        List<Finding> out = new ArrayList<>();
        for (int k = 0; k < m && !budget.exhausted(); k++, searched++) {
            final int kk = k;
            Vec3 p = endPoint[ends.get(k)];
            int[] best = {-1};
            double[] bestD2 = {Double.POSITIVE_INFINITY};
            grid.near(p.x(), p.y(), p.z(), group[k], j -> {
                budget.spend();
                if (j == kk) {
                    return;
                }
                double d2 = grid.distanceSq(j, p.x(), p.y(), p.z());
                if (d2 > limit2) {
                    return;
                }
                int ea = ends.get(kk);
                int eb = ends.get(j);
                int ca = chainOf[ea >> 1];
                if (ca == chainOf[eb >> 1] && chainLength[ca] < SAME_PIECE_FACTOR * Math.sqrt(d2)) {
                    return;
                }
                if (d2 < bestD2[0] || (d2 == bestD2[0] && j < best[0])) {
                    bestD2[0] = d2;
                    best[0] = j;
                }
            });
            if (best[0] < 0) {
                continue;
            }
            int a = Math.min(k, best[0]);
            int b = Math.max(k, best[0]);
            if (!pairsReported.add(((long) a << 32) | b)) {
                continue;
            }
            reported[ends.get(a)] = true;
            reported[ends.get(b)] = true;
            Vec3 pa = endPoint[ends.get(a)];
            Vec3 pb = endPoint[ends.get(b)];
            double d = pa.distance(pb);
            Provenance sa = segments.get(ends.get(a) >> 1).source();
            Provenance sb = segments.get(ends.get(b) >> 1).source();
            out.add(Findings.of(FindingKind.GAP, Severity.WARNING, pa.plus(pb).times(0.5), d, sa.layer(),
                    List.of(sa, sb), null, "Ends of " + sa.describe() + " and " + sb.describe() + " are "
                            + Findings.mm(d) + " apart: more than the join tolerance " + Findings.mm(tol.joinM())
                            + " but within the gap limit " + Findings.mm(tol.gapLimitM())
                            + "; they were probably meant to join."));
        }
        out.addAll(budget.finding("gaps between wire ends", m - searched, m));
        return out;
    }
}
