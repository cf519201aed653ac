package org.linemass.engine.pieces.join;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Decides which ends continue into which at every node. Two ends at a node are paired. Where three
 * or more meet, the pairs are taken greedily in order of increasing turning angle (the angle
 * between the direction of travel arriving through one end and leaving through the other), so
 * the run continues through the pair closest to straight; ties are broken by the far ends'
 * coordinates so the result does not depend on input order. Nodes with more than
 * {@link #MAX_PAIRED_ENDS} ends are not paired at all (every run ends there), which bounds the
 * work per node.
 */
final class EndPairing {

    /** Largest node whose ends are paired; keeps the pairwise angle work bounded (no source). */
    static final int MAX_PAIRED_ENDS = 64;

    private EndPairing() {
    }

    /** Partner end of every end, or -1 when the end is a free end or a run stops there. */
    static int[] pair(List<Segment> segments, EndNodes nodes) {
        int[] partner = new int[nodes.nodeOf.length];
        java.util.Arrays.fill(partner, -1);
        for (int k = 0; k < nodes.nodeCount(); k++) {
            int size = nodes.size(k);
            int f = nodes.first[k];
            if (size == 2) {
                int a = nodes.ends[f];
                int b = nodes.ends[f + 1];
                partner[a] = b;
                partner[b] = a;
            } else if (size > 2 && size <= MAX_PAIRED_ENDS) {
                pairBranch(segments, nodes, f, size, partner);
            }
        }
        return partner;
    }

    private record Candidate(int a, int b, double turn, Vec3 farA, Vec3 farB) {
    }

    private static void pairBranch(List<Segment> segments, EndNodes nodes, int f, int size, int[] partner) {
        Vec3[] into = new Vec3[size];
        Vec3[] far = new Vec3[size];
        for (int i = 0; i < size; i++) {
            int e = nodes.ends[f + i];
            Segment s = segments.get(e >> 1);
            boolean atEnd = (e & 1) == 1;
            into[i] = atEnd ? Curves.endTangent(s) : Curves.startTangent(s).negate();
            far[i] = nodes.point[e ^ 1];
        }
        List<Candidate> cands = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            for (int j = i + 1; j < size; j++) {
                double turn = Math.PI - Curves.angleBetween(into[i], into[j]);
                Vec3 fa = Curves.compare(far[i], far[j]) <= 0 ? far[i] : far[j];
                Vec3 fb = fa == far[i] ? far[j] : far[i];
                cands.add(new Candidate(nodes.ends[f + i], nodes.ends[f + j], turn, fa, fb));
            }
        }
        cands.sort(Comparator.comparingDouble(Candidate::turn)
                .thenComparing(Candidate::farA, Curves::compare)
                .thenComparing(Candidate::farB, Curves::compare));
        for (Candidate c : cands) {
            if (partner[c.a()] < 0 && partner[c.b()] < 0) {
                partner[c.a()] = c.b();
                partner[c.b()] = c.a();
            }
        }
    }
}
