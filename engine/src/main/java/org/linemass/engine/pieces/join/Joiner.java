package org.linemass.engine.pieces.join;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Joins segments end to end into maximal runs. Only ends on the same layer join. Ends are
 * clustered by {@link EndNodes} (tolerance {@link Tolerances#joinM()}), paired by
 * {@link EndPairing}, then walked: first from every end that has no partner (open runs), then
 * what is left forms closed loops. Segments are reversed where needed so a run is consistently
 * oriented; an open run is turned round so its start is lexicographically before its end, and a
 * closed loop starts at its lexicographically smallest vertex heading to the smaller neighbour,
 * so the result does not depend on input order or segment direction. Findings: {@code branch} (info) at every node where three or
 * more ends meet, and {@code joined_across_gap} (info) for every joined pair of ends farther apart
 * than the rounding noise there ({@link Tolerances#noiseAt}). Cost O(n) expected besides the per-node pairing.
 */
public final class Joiner {

    private Joiner() {
    }

    /**
     * @param segments segments to join (none of zero length)
     * @param layerOf layer number of each segment
     */
    public static JoinResult join(List<Segment> segments, int[] layerOf, Tolerances tol) {
        int n = segments.size();
        EndNodes nodes = EndNodes.of(segments, layerOf, tol.joinM());
        int[] partner = EndPairing.pair(segments, nodes);
        List<Finding> findings = new ArrayList<>();
        branchFindings(segments, nodes, findings);
        boolean[] visited = new boolean[n];
        List<Chain> chains = new ArrayList<>();
        for (int e = 0; e < 2 * n; e++) {
            if (partner[e] < 0 && !visited[e >> 1]) {
                chains.add(walk(segments, partner, visited, e, false));
            }
        }
        for (int i = 0; i < n; i++) {
            if (!visited[i]) {
                chains.add(walk(segments, partner, visited, 2 * i, true));
            }
        }
        for (int e = 0; e < 2 * n; e++) {
            int f = partner[e];
            if (f > e) {
                double d = nodes.point[e].distance(nodes.point[f]);
                if (d > tol.noiseAt(Math.max(nodes.point[e].maxAbs(), nodes.point[f].maxAbs()))) {
                    Provenance pa = segments.get(e >> 1).source();
                    Provenance pb = segments.get(f >> 1).source();
                    findings.add(Findings.of(FindingKind.JOINED_ACROSS_GAP, Severity.INFO,
                            nodes.point[e].plus(nodes.point[f]).times(0.5), d, pa.layer(), List.of(pa, pb), null,
                            "Ends of " + pa.describe() + " and " + pb.describe() + " are " + Findings.mm(d)
                                    + " apart and were joined (join tolerance " + Findings.mm(tol.joinM())
                                    + "); moving them together would tidy the drawing."));
                }
            }
        }
        boolean[] free = new boolean[2 * n];
        for (int e = 0; e < 2 * n; e++) {
            free[e] = nodes.size(nodes.nodeOf[e]) == 1;
        }
        int[] chainOf = new int[n];
        for (int c = 0; c < chains.size(); c++) {
            for (int i : chains.get(c).indices()) {
                chainOf[i] = c;
            }
        }
        return new JoinResult(chains, findings, free, nodes.point, chainOf);
    }

    private static void branchFindings(List<Segment> segments, EndNodes nodes, List<Finding> findings) {
        for (int k = 0; k < nodes.nodeCount(); k++) {
            int size = nodes.size(k);
            if (size < 3) {
                continue;
            }
            List<Provenance> who = new ArrayList<>();
            Vec3 sum = Vec3.ZERO;
            for (int j = nodes.first[k]; j < nodes.first[k + 1]; j++) {
                int e = nodes.ends[j];
                who.add(segments.get(e >> 1).source());
                sum = sum.plus(nodes.point[e]);
            }
            Vec3 at = sum.times(1.0 / size);
            String message = size + " ends meet at " + Findings.at(at) + "; runs continue through the"
                    + " straightest pairs turning by less than " + Findings.deg(EndPairing.MAX_BRANCH_TURN_DEG)
                    + ", and the other ends start or stop separate pieces there.";
            findings.add(Findings.of(FindingKind.BRANCH, Severity.INFO, at, null, who.get(0).layer(), who, null,
                    message));
        }
    }

    /** Walks from end {@code e} (entering its segment there) along partners. */
    private static Chain walk(List<Segment> segments, int[] partner, boolean[] visited, int startEnd,
            boolean loop) {
        List<Segment> segs = new ArrayList<>();
        List<Integer> idx = new ArrayList<>();
        int e = startEnd;
        int lastExit = -1;
        while (e >= 0 && !visited[e >> 1]) {
            int i = e >> 1;
            visited[i] = true;
            Segment s = segments.get(i);
            segs.add((e & 1) == 0 ? s : s.reversed());
            idx.add(i);
            lastExit = e ^ 1;
            e = partner[lastExit];
        }
        boolean closed = loop || (e >= 0 && e == startEnd);
        if (closed) {
            return canonicalLoop(segs, idx);
        }
        Vec3 a = segs.get(0).start();
        Vec3 b = segs.get(segs.size() - 1).end();
        if (Curves.compare(a, b) > 0) {
            List<Segment> rev = new ArrayList<>(segs.size());
            for (int k = segs.size() - 1; k >= 0; k--) {
                rev.add(segs.get(k).reversed());
            }
            List<Integer> ridx = new ArrayList<>(idx);
            Collections.reverse(ridx);
            return new Chain(rev, ridx, false, lastExit, startEnd);
        }
        return new Chain(segs, idx, false, startEnd, lastExit);
    }

    /**
     * A loop starting at its lexicographically smallest vertex and running towards the smaller of
     * that vertex's two neighbours, so its form does not depend on input order or direction.
     */
    private static Chain canonicalLoop(List<Segment> segs, List<Integer> idx) {
        Chain forward = rotated(segs, idx);
        int n = forward.segments().size();
        if (n < 2 || Curves.compare(forward.segments().get(0).end(), forward.segments().get(n - 1).start()) <= 0) {
            return forward;
        }
        List<Segment> rev = new ArrayList<>(n);
        List<Integer> ridx = new ArrayList<>(n);
        for (int k = n - 1; k >= 0; k--) {
            rev.add(forward.segments().get(k).reversed());
            ridx.add(forward.indices().get(k));
        }
        return rotated(rev, ridx);
    }

    private static Chain rotated(List<Segment> segs, List<Integer> idx) {
        int best = 0;
        for (int k = 1; k < segs.size(); k++) {
            if (Curves.compare(segs.get(k).start(), segs.get(best).start()) < 0) {
                best = k;
            }
        }
        List<Segment> s = new ArrayList<>(segs.size());
        List<Integer> i = new ArrayList<>(segs.size());
        for (int k = 0; k < segs.size(); k++) {
            s.add(segs.get((best + k) % segs.size()));
            i.add(idx.get((best + k) % segs.size()));
        }
        return new Chain(s, i, true, -1, -1);
    }
}
