package org.linemass.engine.pieces.join;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Decides which ends continue into which at every node. Two ends at a node are always paired (a
 * sharp corner is a bend of one piece). Where three or more meet, pairs are taken greedily in
 * order of increasing turning angle (the angle between the direction of travel arriving through
 * one end and leaving through the other), so the run continues through the pair closest to
 * straight; then the next straightest pair of the ends left, and so on, but only pairs turning by
 * less than {@link #MAX_BRANCH_TURN_DEG} are joined: a pair that turns more sharply is not a run
 * going through the node, and those ends start or stop separate pieces there (our own
 * convention, no source). Ties are broken by the far ends' coordinates so the result does not
 * depend on input order. Only where a layer join brings several layers to one node, the end that is
 * alone of its layer there is paired first, with the other layer's end it turns into most sharply
 * short of folding back (see {@code acrossLayers}; our own convention, no source).
 *
 * <p>Work per node is bounded: up to {@link #EXACT_LIMIT} ends every pair is a candidate; above
 * it the ends are sorted by the angle of their line in the node's best-fit plane of directions
 * (an orientation modulo 180 degrees, so a straight-through pair sits side by side in that order)
 * and each end is a candidate with its {@link #WINDOW} successors in the circular order, giving
 * O(k log k) for k ends; ends left over (their candidates were taken) get further rounds among
 * themselves, at most {@link #MAX_PASSES}. For ends in one plane this finds the straight-through partners exactly
 * unless more than {@link #WINDOW} ends share almost the same line; for ends in space it is an
 * approximation, still joining only pairs below the turning limit.
 */
final class EndPairing {

    /** Pairs at a branch node turning by this much or more are not joined (own convention). */
    static final double MAX_BRANCH_TURN_DEG = 90;

    /** Largest node at which every pair of ends is a candidate (bounds the k^2 work; no source). */
    static final int EXACT_LIMIT = 32;

    /** Neighbours in direction order that are candidates at larger nodes (no source). */
    static final int WINDOW = 8;

    /**
     * Greedy rounds per node: ends left unpaired by one round (their candidates were taken) are
     * paired among themselves in the next, each round O(m log m) for m ends left (no source).
     */
    static final int MAX_PASSES = 8;

    private static final double MAX_TURN_RAD = Math.toRadians(MAX_BRANCH_TURN_DEG);

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
            } else if (size > 2) {
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
        int[] open = acrossLayers(segments, nodes, f, size, into, far, partner);
        for (int pass = 0; pass < MAX_PASSES && open.length > 1; pass++) {
            int paired = pairAmong(open, nodes, f, into, far, partner);
            if (paired == 0) {
                break;
            }
            int[] left = new int[open.length - 2 * paired];
            int n = 0;
            for (int i : open) {
                if (partner[nodes.ends[f + i]] < 0) {
                    left[n++] = i;
                }
            }
            open = left;
        }
    }

    /**
     * Where a layer join brings ends of several layers to one node: each end that is the only one of
     * its layer there (a hook meeting a bar or a closed loop) is paired first, with the end of another
     * layer it turns most sharply into, short of folding back (a hook is a bend of the bar it leaves,
     * so a 135 degree hook at a loop's corner joins the side, not the corner arc, which is left as a
     * piece of its own). Lone ends are taken in order of their far ends. Returns the positions left
     * for the greedy rounds; all of them when the node holds one layer (always, without layer joins).
     */
    private static int[] acrossLayers(List<Segment> segments, EndNodes nodes, int f, int size, Vec3[] into, Vec3[] far,
            int[] partner) {
        String[] layer = new String[size];
        java.util.Map<String, Integer> count = new java.util.HashMap<>();
        for (int i = 0; i < size; i++) {
            layer[i] = segments.get(nodes.ends[f + i] >> 1).source().layer();
            count.merge(layer[i], 1, Integer::sum);
        }
        List<Integer> lone = new ArrayList<>();
        if (count.size() > 1) {
            for (int i = 0; i < size; i++) {
                if (count.get(layer[i]) == 1) {
                    lone.add(i);
                }
            }
            lone.sort(Comparator.comparing(i -> far[i], Curves::compare));
        }
        for (int i : lone) {
            int a = nodes.ends[f + i];
            if (partner[a] >= 0) {
                continue;
            }
            int best = -1;
            double bestTurn = -1;
            for (int j = 0; j < size; j++) {
                int b = nodes.ends[f + j];
                if (j == i || partner[b] >= 0 || layer[j].equals(layer[i])) {
                    continue;
                }
                double turn = Math.PI - Curves.angleBetween(into[i], into[j]);
                boolean better = turn > bestTurn || turn == bestTurn && best >= 0
                        && Curves.compare(far[j], far[best]) < 0;
                if (turn < Math.PI - Tolerances.BEND_HALF_TURN_SLACK && better) {
                    best = j;
                    bestTurn = turn;
                }
            }
            if (best >= 0) {
                int b = nodes.ends[f + best];
                partner[a] = b;
                partner[b] = a;
            }
        }
        int[] open = new int[size];
        int n = 0;
        for (int i = 0; i < size; i++) {
            if (partner[nodes.ends[f + i]] < 0) {
                open[n++] = i;
            }
        }
        return java.util.Arrays.copyOf(open, n);
    }

    /**
     * One greedy round over the ends {@code open} (positions in the node): every pair of them when
     * few, else each with its {@link #WINDOW} successors in line-angle order. Returns the number of
     * pairs made.
     */
    private static int pairAmong(int[] open, EndNodes nodes, int f, Vec3[] into, Vec3[] far, int[] partner) {
        int size = open.length;
        List<Candidate> cands = new ArrayList<>();
        if (size <= EXACT_LIMIT) {
            for (int i = 0; i < size; i++) {
                for (int j = i + 1; j < size; j++) {
                    addCandidate(cands, nodes, f, into, far, open[i], open[j]);
                }
            }
        } else {
            int[] order = byLineAngle(open, into, far);
            for (int r = 0; r < size; r++) {
                for (int w = 1; w <= WINDOW; w++) {
                    addCandidate(cands, nodes, f, into, far, order[r], order[(r + w) % size]);
                }
            }
        }
        cands.sort(Comparator.comparingDouble(Candidate::turn)
                .thenComparing(Candidate::farA, Curves::compare)
                .thenComparing(Candidate::farB, Curves::compare));
        int paired = 0;
        for (Candidate c : cands) {
            if (partner[c.a()] < 0 && partner[c.b()] < 0) {
                partner[c.a()] = c.b();
                partner[c.b()] = c.a();
                paired++;
            }
        }
        return paired;
    }

    private static void addCandidate(List<Candidate> cands, EndNodes nodes, int f, Vec3[] into, Vec3[] far, int i,
            int j) {
        double turn = Math.PI - Curves.angleBetween(into[i], into[j]);
        if (!(turn < MAX_TURN_RAD)) {
            return;
        }
        boolean iFirst = Curves.compare(far[i], far[j]) <= 0;
        int a = nodes.ends[f + (iFirst ? i : j)];
        int b = nodes.ends[f + (iFirst ? j : i)];
        cands.add(new Candidate(a, b, turn, iFirst ? far[i] : far[j], iFirst ? far[j] : far[i]));
    }

    /**
     * Ends sorted by the angle, modulo pi, of their direction in the plane spanned by the two
     * largest principal axes of the directions (ties by far end), so opposite directions of one
     * line sort together.
     */
    private static int[] byLineAngle(int[] open, Vec3[] into, Vec3[] far) {
        double[][] m = new double[3][3];
        for (int i : open) {
            double[] v = into[i].toArray();
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    m[r][c] += v[r] * v[c];
                }
            }
        }
        RealMatrix u = new SingularValueDecomposition(new Array2DRowRealMatrix(m, false)).getU();
        Vec3 u0 = new Vec3(u.getEntry(0, 0), u.getEntry(1, 0), u.getEntry(2, 0));
        Vec3 u1 = new Vec3(u.getEntry(0, 1), u.getEntry(1, 1), u.getEntry(2, 1));
        double[] angle = new double[into.length];
        Integer[] order = new Integer[open.length];
        for (int k = 0; k < open.length; k++) {
            int i = open[k];
            double a = Math.atan2(into[i].dot(u1), into[i].dot(u0));
            angle[i] = a - Math.PI * Math.floor(a / Math.PI);
            order[k] = i;
        }
        java.util.Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> angle[i])
                .thenComparing(i -> far[i], Curves::compare));
        int[] out = new int[order.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = order[i];
        }
        return out;
    }
}
