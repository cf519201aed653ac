package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.List;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.parallel.IndexedWork;
import org.linemass.engine.pieces.index.BoxIndex;
import org.linemass.engine.pieces.geom.ClosestPoints;
import org.linemass.engine.pieces.geom.Contact;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * {@code gap} (warning) to the middle of a wire: an almost T-junction, where the drafter stopped a
 * cross wire just short of the frame. A free end is reported when another segment, on any layer,
 * has its closest point to the end
 * <ul>
 * <li>farther than {@link Tolerances#joinM()} and within {@link Tolerances#gapLimitM()};</li>
 * <li>not at one of that segment's free ends (two free ends facing each other are the end-to-end
 * gap of {@link GapCheck});</li>
 * <li>ahead of the end: the direction from the end to the closest point is within
 * {@link #MAX_AIM_DEG} of the wire's outward direction at the end (our own convention, no
 * source), so two wires lying side by side, a hairpin's legs or the next segment of the same run
 * are not gaps.</li>
 * </ul>
 * An end that touches something (anything within the join tolerance: a T-junction or a contact
 * with another layer) and an end already reported by {@link GapCheck} are skipped, so nothing is
 * reported twice. One finding per end, for the nearest such segment: the size is the distance,
 * the place the closest point on the other segment. Candidates come from the segment index with
 * the query box grown by the gap limit, O(log n + k) per end.
 */
public final class TeeGapCheck {

    /** Largest angle between the end's outward direction and the way to the other wire (own convention). */
    public static final double MAX_AIM_DEG = 45;

    private static final double COS_MAX_AIM = Math.cos(Math.toRadians(MAX_AIM_DEG));

    private TeeGapCheck() {
    }

    /**
     * @param segments the joined segments, end 2i / 2i+1 being segment i's start / end
     * @param index candidate search over {@code segments}
     * @param free whether each end is free (alone at its node)
     * @param endPoint the point of each end
     * @param reported ends already in an end-to-end gap finding (skipped)
     */
    public static List<Finding> check(List<Segment> segments, BoxIndex index, boolean[] free, Vec3[] endPoint,
            boolean[] reported, Tolerances tol) {
        return check(segments, index, free, endPoint, reported, tol, EndSearchBudget.MAX_CANDIDATES);
    }

    /**
     * As {@link #check(List, BoxIndex, boolean[], Vec3[], boolean[], Tolerances)}, stopping with a
     * {@code limit_reached} warning once about {@code maxCandidates} candidate segments were looked at.
     */
    static List<Finding> check(List<Segment> segments, BoxIndex index, boolean[] free, Vec3[] endPoint,
            boolean[] reported, Tolerances tol, long maxCandidates) {
        return check(segments, index, free, endPoint, reported, tol, maxCandidates, 1);
    }

    /**
     * As {@link #check(List, BoxIndex, boolean[], Vec3[], boolean[], Tolerances)} on {@code threads}
     * threads: each end is searched on its own, and the searches are taken in end order against the
     * budget, so the findings are those of one search after another.
     */
    public static List<Finding> check(List<Segment> segments, BoxIndex index, boolean[] free, Vec3[] endPoint,
            boolean[] reported, Tolerances tol, int threads) {
        return check(segments, index, free, endPoint, reported, tol, EndSearchBudget.MAX_CANDIDATES, threads);
    }

    private record Search(Finding finding, long spent) {
    }

    static List<Finding> check(List<Segment> segments, BoxIndex index, boolean[] free, Vec3[] endPoint,
            boolean[] reported, Tolerances tol, long maxCandidates, int threads) {
        List<Finding> out = new ArrayList<>();
        EndSearchBudget budget = new EndSearchBudget(maxCandidates);
        long ends = 0;
        long endsLeft = 0;
        int m = 0;
        int[] todo = new int[free.length];
        for (int e = 0; e < free.length; e++) {
            if (free[e] && !reported[e]) {
                todo[m++] = e;
            }
        }
        for (int lo = 0; lo < m; lo += ContactCheck.BLOCK) {
            int hi = Math.min(m, lo + ContactCheck.BLOCK);
            if (budget.exhausted()) {
                ends += hi - lo;
                endsLeft += hi - lo;
                continue;
            }
            final int base = lo;
            List<Search> found = IndexedWork.map(threads, hi - lo,
                    k -> search(segments, index, free, endPoint, todo[base + k], tol));
            for (Search r : found) {
                ends++;
                if (budget.exhausted()) {
                    endsLeft++;
                    continue;
                }
                budget.spend(r.spent());
                if (r.finding() != null) {
                    out.add(r.finding());
                }
            }
        }
        out.addAll(budget.finding("gaps to the middle of a wire", endsLeft, ends));
        return out;
    }

    /** The gap finding of free end {@code e}, if any, and the candidates looked at. */
    private static Search search(List<Segment> segments, BoxIndex index, boolean[] free, Vec3[] endPoint, int e,
            Tolerances tol) {
        double join = tol.joinM();
        double limit = tol.gapLimitM();
        int own = e >> 1;
        Segment s = segments.get(own);
        Vec3 p = endPoint[e];
        Vec3 outward = (e & 1) == 0 ? Curves.startTangent(s).negate() : Curves.endTangent(s);
        boolean[] touching = {false};
        int[] best = {-1};
        Contact[] bestContact = {null};
        long[] spent = {0};
        index.query(new Box3(p, p).expandedBy(limit), k -> {
            spent[0]++;
            if (k == own || touching[0]) {
                return;
            }
            Segment c = segments.get(k);
            Contact ct = ClosestPoints.toPoint(c, p);
            double d = ct.distance();
            if (d <= join) {
                touching[0] = true;
                return;
            }
            if (d > limit || (free[2 * k] && ct.pa().distance(c.start()) <= join)
                    || (free[2 * k + 1] && ct.pa().distance(c.end()) <= join)) {
                return;
            }
            if (ct.pa().minus(p).dot(outward) < COS_MAX_AIM * d) {
                return;
            }
            Contact b = bestContact[0];
            int place = b == null ? -1 : Curves.compare(ct.pa(), b.pa());
            // ties (e.g. aimed at the corner two frame segments share) go by place, then by
            // source, so the finding does not depend on input order
            if (b == null || d < b.distance() || (d == b.distance() && (place < 0 || (place == 0
                    && c.source().describe().compareTo(segments.get(best[0]).source().describe()) < 0)))) {
                bestContact[0] = ct;
                best[0] = k;
            }
        });
        if (touching[0] || best[0] < 0) {
            return new Search(null, spent[0]);
        }
        Contact ct = bestContact[0];
        Provenance pa = s.source();
        Provenance pb = segments.get(best[0]).source();
        return new Search(Findings.of(FindingKind.GAP, Severity.WARNING, ct.pa(), ct.distance(), pa.layer(),
                List.of(pa, pb), null, "The end of " + pa.describe() + " stops " + Findings.mm(ct.distance())
                        + " short of " + pb.describe() + ": more than the join tolerance "
                        + Findings.mm(join) + " but within the gap limit " + Findings.mm(limit)
                        + "; it was probably meant to meet it (a T-junction)."), spent[0]);
    }
}
