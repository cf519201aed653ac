package org.linemass.engine.pieces.dedup;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.pieces.checks.SectionCache;
import org.linemass.engine.pieces.geom.ClosestPoints;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.pieces.index.CandidatePairs;
import org.linemass.engine.pieces.index.UnionFind;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.tolerance.Tolerances;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Removes material drawn twice. Candidate pairs on the same layer come from an STR-tree over the
 * segment boxes grown by the tolerance (never all pairs). Straights whose ends lie within the
 * tolerance of each other's carrier line and whose projections overlap by more than the
 * tolerance, and circular arcs on the same circle (centres, radii and planes within the
 * tolerance), are clustered and resolved by {@link StraightOverlaps} and {@link ArcOverlaps}.
 * Elliptical arcs and splines are checked for being identical (ends and three interior points
 * within the tolerance, either direction; the copy with the later source position goes) and then,
 * when drawn differently (started elsewhere, split, another kind of curve), for lying wholly
 * within the tolerance of another curve ({@link CurveCovers}).
 * Zero-length and shorter-than-tolerance segments are left alone (the size check reports them).
 */
public final class Deduplicator {

    /** Interior parameter fractions checked for identical curved segments. */
    private static final double[] PROBES = {0.25, 0.5, 0.75};

    private Deduplicator() {
    }

    /**
     * @param segments world segments in metres
     * @param pairs candidate pairs of {@code segments} (any layers; only same-layer pairs are used), boxes grown by at least the join tolerance
     * @param tol the analysis's tolerances; its join tolerance (metres) is the "same place" distance
     */
    public static DedupResult run(List<Segment> segments, CandidatePairs pairs, Tolerances tol,
            SectionCache sections) {
        double[] length = new double[segments.size()];
        for (int i = 0; i < length.length; i++) {
            length[i] = Curves.length(segments.get(i));
        }
        return run(segments, length, pairs, tol, sections);
    }

    /**
     * As {@link #run(List, CandidatePairs, Tolerances, SectionCache)} given each segment's length
     * ({@link Curves#length}).
     */
    public static DedupResult run(List<Segment> segments, double[] length, CandidatePairs pairs, Tolerances tol,
            SectionCache sections) {
        double tolM = tol.joinM();
        int n = segments.size();
        UnionFind uf = new UnionFind(n);
        boolean[] any = new boolean[n];
        pairs.forEach((i, j) -> {
            if (!(length[i] > tolM) || !(length[j] > tolM)) {
                return;
            }
            Segment a = segments.get(i);
            Segment b = segments.get(j);
            // material is counted twice only on one layer: another layer may be another bar
            if (a.getClass() == b.getClass() && a.source().layer().equals(b.source().layer())
                    && sameCarrier(a, b, tolM)) {
                uf.union(i, j);
                any[i] = true;
                any[j] = true;
            }
        });
        Map<Integer, List<Integer>> clusters = new LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            if (any[i]) {
                clusters.computeIfAbsent(uf.find(i), k -> new ArrayList<>()).add(i);
            }
        }
        List<List<Segment>> replacement = new ArrayList<>(java.util.Collections.nCopies(n, null));
        List<Segment> removed = new ArrayList<>();
        CappedFindings findings = new CappedFindings(CappedFindings.CAP);
        for (List<Integer> cluster : clusters.values()) {
            List<List<Segment>> kept = new ArrayList<>(java.util.Collections.nCopies(cluster.size(), null));
            Segment first = segments.get(cluster.get(0));
            if (first instanceof Straight) {
                StraightOverlaps.resolve(cluster.stream().map(i -> (Straight) segments.get(i)).toList(), tolM,
                        sections, kept, removed, findings);
            } else if (first instanceof CircularArc) {
                ArcOverlaps.resolve(cluster.stream().map(i -> (CircularArc) segments.get(i)).toList(), tolM,
                        sections, kept, removed, findings);
            } else {
                identical(cluster.stream().map(segments::get).toList(), length[cluster.get(0)], sections, kept,
                        removed, findings);
            }
            for (int k = 0; k < cluster.size(); k++) {
                replacement.set(cluster.get(k), kept.get(k));
            }
        }
        CurveCovers.find(segments, length, any, pairs, tolM, sections, replacement, removed, findings);
        List<Segment> out = new ArrayList<>(n);
        int[] origin = new int[n + removed.size() + 2 * clusters.size() + 16];
        for (int i = 0; i < n; i++) {
            List<Segment> r = replacement.get(i);
            List<Segment> parts = r == null ? List.of(segments.get(i)) : r;
            for (Segment s : parts) {
                if (out.size() == origin.length) {
                    origin = java.util.Arrays.copyOf(origin, 2 * origin.length);
                }
                origin[out.size()] = i;
                out.add(s);
            }
        }
        List<Finding> all = new ArrayList<>(findings);
        all.addAll(findings.overflow());
        return new DedupResult(out, java.util.Arrays.copyOf(origin, out.size()), removed, all);
    }

    static boolean sameCarrier(Segment a, Segment b, double tol) {
        if (a instanceof Straight p && b instanceof Straight q) {
            return collinearOverlap(p, q, tol);
        }
        if (a instanceof CircularArc p && b instanceof CircularArc q) {
            return p.centre().distance(q.centre()) <= tol && Math.abs(p.radius() - q.radius()) <= tol
                    && p.normal().cross(q.normal()).norm() * Math.max(p.radius(), q.radius()) <= tol;
        }
        return identicalCurves(a, b, tol);
    }

    static boolean collinearOverlap(Straight p, Straight q, double tol) {
        Straight longer = p.length() >= q.length() ? p : q;
        Straight shorter = longer == p ? q : p;
        Vec3 d = longer.b().minus(longer.a()).unit();
        Vec3 ra = shorter.a().minus(longer.a());
        Vec3 rb = shorter.b().minus(longer.a());
        if (ra.cross(d).norm() > tol || rb.cross(d).norm() > tol) {
            return false;
        }
        double lo = Math.min(ra.dot(d), rb.dot(d));
        double hi = Math.max(ra.dot(d), rb.dot(d));
        return Math.min(hi, longer.length()) - Math.max(lo, 0) > tol;
    }

    static boolean identicalCurves(Segment a, Segment b, double tol) {
        boolean forward = a.start().distance(b.start()) <= tol && a.end().distance(b.end()) <= tol;
        boolean backward = a.start().distance(b.end()) <= tol && a.end().distance(b.start()) <= tol;
        if (!forward && !backward) {
            return false;
        }
        for (double f : PROBES) {
            Vec3 pa = a.point(a.tStart() + f * (a.tEnd() - a.tStart()));
            Vec3 pb = b.point(b.tStart() + f * (b.tEnd() - b.tStart()));
            if (ClosestPoints.toPoint(b, pa).distance() > tol || ClosestPoints.toPoint(a, pb).distance() > tol) {
                return false;
            }
        }
        return true;
    }

    private static void identical(List<Segment> members, double lengthM, SectionCache sections,
            List<List<Segment>> kept, List<Segment> removed, List<Finding> findings) {
        int keep = 0;
        for (int k = 1; k < members.size(); k++) {
            if (Ranks.of(members.get(k).source()).compareTo(Ranks.of(members.get(keep).source())) < 0) {
                keep = k;
            }
        }
        Segment keeper = members.get(keep);
        List<Integer> order = new ArrayList<>();
        for (int k = 0; k < members.size(); k++) {
            order.add(k);
        }
        order.sort(Comparator.comparing(k -> Ranks.of(members.get(k).source())));
        for (int k : order) {
            if (k == keep) {
                continue;
            }
            Segment s = members.get(k);
            kept.set(k, List.of());
            removed.add(s);
            String layer = s.source().layer();
            Double mass = sections.massOf(layer, lengthM);
            String message = s.source().describe() + " is drawn again over " + keeper.source().describe() + ": "
                    + Findings.mm(lengthM) + " would be counted twice"
                    + (mass == null ? "" : " (" + Findings.kg(mass) + ")") + "; it is counted once.";
            Vec3 mid = s.point(0.5 * (s.tStart() + s.tEnd()));
            findings.add(Findings.of(FindingKind.DUPLICATE, Severity.ERROR, mid, lengthM, layer,
                    List.of(s.source(), keeper.source()), mass, message));
        }
    }
}
