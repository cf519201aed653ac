package org.linemass.engine.pieces.dedup;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.pieces.checks.SectionCache;
import org.linemass.engine.pieces.index.CandidatePairs;
import org.linemass.engine.pieces.geom.ClosestPoints;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * An ellipse or spline drawn again over another curve with a different parametrisation (reversed
 * and started elsewhere, split into parts, or drawn as another kind of curve): an elliptical arc or
 * spline whose sample points all lie within the tolerance of another segment on the same layer is
 * a {@code duplicate} (error) of its whole length, and is removed. Samples are the curve's
 * polyline points ({@link Curves#polylineParams}) and the middle of each chord's parameter
 * interval, each tested by its exact distance to the other curve ({@link ClosestPoints#toPoint}).
 *
 * <p>Only candidate pairs from the segment index are tested, and only segments no other rule has
 * resolved. Segments are taken longest first (ties by source position), and one is removed only
 * when it is covered by a segment taken before it that stays, so of two copies of one curve the
 * later one goes and a curve is never removed in favour of a part of itself. Partial overlaps of
 * such curves are not resolved (only whole covers).
 */
final class CurveCovers {

    private CurveCovers() {
    }

    /**
     * @param resolved segments already in a cluster resolved by another rule (left alone)
     * @param replacement per segment, what replaces it (null for "unchanged"); set to the empty
     *     list for every segment removed here
     */
    static void find(List<Segment> segments, double[] length, boolean[] resolved, CandidatePairs pairs, double tolM,
            SectionCache sections, List<List<Segment>> replacement, List<Segment> removed, List<Finding> findings) {
        Map<Integer, List<Integer>> around = new HashMap<>();
        pairs.forEach((i, j) -> {
            if (resolved[i] || resolved[j] || !(length[i] > tolM) || !(length[j] > tolM)) {
                return;
            }
            Segment a = segments.get(i);
            Segment b = segments.get(j);
            if (!a.source().layer().equals(b.source().layer())) {
                return;
            }
            if (curved(a)) {
                around.computeIfAbsent(i, k -> new ArrayList<>()).add(j);
            }
            if (curved(b)) {
                around.computeIfAbsent(j, k -> new ArrayList<>()).add(i);
            }
        });
        if (around.isEmpty()) {
            return;
        }
        Comparator<Integer> order = Comparator.<Integer>comparingDouble(i -> -length[i])
                .thenComparing(i -> Ranks.of(segments.get(i).source()));
        List<Integer> curves = new ArrayList<>(around.keySet());
        curves.sort(order);
        java.util.Set<Integer> gone = new java.util.HashSet<>();
        for (int a : curves) {
            List<Integer> others = new ArrayList<>(around.get(a));
            others.sort(order);
            for (int b : others) {
                if (order.compare(b, a) >= 0 || gone.contains(b)
                        || !covers(segments.get(b), segments.get(a), length[a], length[b], tolM)) {
                    continue;
                }
                gone.add(a);
                Segment s = segments.get(a);
                Segment keeper = segments.get(b);
                replacement.set(a, List.of());
                removed.add(s);
                String layer = s.source().layer();
                Double mass = sections.massOf(layer, length[a]);
                String message = s.source().describe() + " is drawn again over " + keeper.source().describe()
                        + " (traced differently): " + Findings.mm(length[a]) + " would be counted twice"
                        + (mass == null ? "" : " (" + Findings.kg(mass) + ")") + "; it is counted once.";
                Vec3 mid = s.point(0.5 * (s.tStart() + s.tEnd()));
                findings.add(Findings.of(FindingKind.DUPLICATE, Severity.ERROR, mid, length[a], layer,
                        List.of(s.source(), keeper.source()), mass, message));
                break;
            }
        }
    }

    private static boolean curved(Segment s) {
        return s instanceof EllipticalArc || s instanceof Nurbs;
    }

    /** Whether every sample of {@code inner} lies within {@code tol} of {@code outer}. */
    static boolean covers(Segment outer, Segment inner, double innerLength, double outerLength, double tol) {
        if (innerLength > outerLength + tol) {
            return false;
        }
        double[] ts = Curves.polylineParams(inner);
        for (int i = 0; i < ts.length; i++) {
            if (ClosestPoints.toPoint(outer, inner.point(ts[i])).distance() > tol) {
                return false;
            }
            if (i > 0 && ClosestPoints.toPoint(outer, inner.point(0.5 * (ts[i - 1] + ts[i]))).distance() > tol) {
                return false;
            }
        }
        return true;
    }
}
