package org.linemass.engine.pieces.dedup;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.pieces.checks.SectionCache;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Resolves one cluster of circular arcs on the same circle and layer. Angles are measured in the
 * frame of the longest member with its normal sign fixed (so member orientation does not matter).
 * The circle is cut open where no member covers it (at the end of the widest uncovered stretch),
 * or at the longest member's start when the circle is covered all round; a member running over
 * the cut becomes two intervals. Then {@link IntervalSweep} decides what was drawn twice.
 */
final class ArcOverlaps {

    private static final double TWO_PI = 2 * Math.PI;

    private ArcOverlaps() {
    }

    /** Same contract as {@link StraightOverlaps#resolve}. */
    static void resolve(List<CircularArc> members, double tol, SectionCache sections, List<List<Segment>> kept,
            List<Segment> removed, List<Finding> findings) {
        CircularArc ref = members.get(0);
        for (CircularArc a : members) {
            if (a.length() > ref.length() || (a.length() == ref.length()
                    && Ranks.of(a.source()).compareTo(Ranks.of(ref.source())) < 0)) {
                ref = a;
            }
        }
        Vec3 n = StraightOverlaps.canonical(ref.normal().unit());
        Vec3 u = ref.u();
        Vec3 v = n.cross(u).unit();
        Vec3 c = ref.centre();
        double angTol = tol / ref.radius();
        int m = members.size();
        double[] alpha = new double[m];
        boolean[] same = new boolean[m];
        for (int k = 0; k < m; k++) {
            CircularArc a = members.get(k);
            same[k] = a.normal().dot(n) > 0;
            Vec3 p = (same[k] ? a.start() : a.end()).minus(c);
            alpha[k] = mod(Math.atan2(p.dot(v), p.dot(u)));
        }
        double cut = cutAngle(members, alpha, angTol, alpha[members.indexOf(ref)]);
        List<IntervalSweep.Item> items = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            double lo = mod(alpha[k] - cut);
            if (lo > TWO_PI - angTol) {
                lo = 0;
            }
            double sw = members.get(k).sweep();
            String rank = Ranks.of(members.get(k).source());
            if (lo + sw > TWO_PI + angTol) {
                items.add(new IntervalSweep.Item(k, lo, TWO_PI, rank));
                items.add(new IntervalSweep.Item(k, 0, lo + sw - TWO_PI, rank));
            } else {
                items.add(new IntervalSweep.Item(k, lo, Math.min(lo + sw, TWO_PI), rank));
            }
        }
        List<IntervalSweep.Cut> cuts = IntervalSweep.sweep(items, angTol);
        // removed angle ranges per item (NaN when untouched)
        double[] removedHi = new double[items.size()];
        java.util.Arrays.fill(removedHi, Double.NaN);
        boolean[] touched = new boolean[m];
        double[] overlapM = new double[m];
        Vec3[] where = new Vec3[m];
        Provenance[] ownerOf = new Provenance[m];
        boolean[] allWhole = new boolean[m];
        java.util.Arrays.fill(allWhole, true);
        boolean[] sameExtent = new boolean[m];
        for (IntervalSweep.Cut ct : cuts) {
            IntervalSweep.Item it = items.get(ct.item());
            IntervalSweep.Item ow = items.get(ct.owner());
            int k = it.member();
            CircularArc a = members.get(k);
            removedHi[ct.item()] = ct.whole() ? it.hi() : ct.hi();
            CircularArc gone = arc(a, u, v, cut + ct.lo(), cut + removedHi[ct.item()], same[k]);
            removed.add(gone);
            if (!touched[k]) {
                where[k] = gone.point(0.5 * (gone.t0() + gone.t1()));
                ownerOf[k] = members.get(ow.member()).source();
                sameExtent[k] = Math.abs(members.get(ow.member()).sweep() - a.sweep()) <= angTol;
            }
            touched[k] = true;
            allWhole[k] &= ct.whole();
            overlapM[k] += gone.length();
        }
        for (int i = 0; i < items.size(); i++) {
            int k = items.get(i).member();
            if (!touched[k]) {
                continue;
            }
            if (kept.get(k) == null) {
                kept.set(k, new ArrayList<>());
            }
            IntervalSweep.Item it = items.get(i);
            double from = Double.isNaN(removedHi[i]) ? it.lo() : removedHi[i];
            if (it.hi() - from > angTol) {
                kept.get(k).add(arc(members.get(k), u, v, cut + from, cut + it.hi(), same[k]));
            }
        }
        for (int k = 0; k < m; k++) {
            if (!touched[k]) {
                continue;
            }
            CircularArc a = members.get(k);
            boolean duplicate = allWhole[k] && sameExtent[k];
            String layer = a.source().layer();
            Double mass = sections.massOf(layer, overlapM[k]);
            String message = a.source().describe() + (duplicate ? " is drawn again over " : " overlaps ")
                    + ownerOf[k].describe() + " on the same circle: " + Findings.mm(overlapM[k])
                    + " would be counted twice" + (mass == null ? "" : " (" + Findings.kg(mass) + ")")
                    + "; it is counted once.";
            findings.add(Findings.of(duplicate ? FindingKind.DUPLICATE : FindingKind.OVERLAP, Severity.ERROR,
                    where[k], overlapM[k], layer, List.of(a.source(), ownerOf[k]), mass, message));
        }
    }

    private static CircularArc arc(CircularArc like, Vec3 u, Vec3 v, double t0, double t1, boolean same) {
        CircularArc a = CircularArc.of(like.centre(), like.radius(), u, v, t0, t1, like.source());
        return same ? a : a.reversed();
    }

    /** Start of the widest stretch of the circle no member covers; {@code fallback} if none. */
    private static double cutAngle(List<CircularArc> members, double[] alpha, double angTol, double fallback) {
        List<double[]> pieces = new ArrayList<>();
        for (int k = 0; k < alpha.length; k++) {
            double hi = alpha[k] + members.get(k).sweep();
            if (hi <= TWO_PI) {
                pieces.add(new double[] {alpha[k], hi});
            } else {
                pieces.add(new double[] {alpha[k], TWO_PI});
                pieces.add(new double[] {0, hi - TWO_PI});
            }
        }
        pieces.sort((p, q) -> Double.compare(p[0], q[0]));
        double bestGap = 0;
        double bestAt = fallback;
        double reach = pieces.get(0)[1];
        for (int i = 1; i < pieces.size(); i++) {
            double[] p = pieces.get(i);
            if (p[0] - reach > bestGap) {
                bestGap = p[0] - reach;
                bestAt = reach;
            }
            reach = Math.max(reach, p[1]);
        }
        double wrap = pieces.get(0)[0] + TWO_PI - reach;
        if (wrap > bestGap) {
            bestGap = wrap;
            bestAt = reach;
        }
        return bestGap > angTol ? mod(bestAt) : fallback;
    }

    private static double mod(double x) {
        double r = x - TWO_PI * Math.floor(x / TWO_PI);
        return r >= TWO_PI ? 0 : r;
    }
}
