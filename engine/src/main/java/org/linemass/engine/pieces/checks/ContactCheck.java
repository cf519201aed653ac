package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.pieces.geom.ClosestPoints;
import org.linemass.engine.pieces.geom.Contact;
import org.linemass.engine.pieces.geom.PlanarCrossing;
import org.linemass.engine.pieces.index.BoxIndex;
import org.linemass.engine.pieces.index.CandidatePairs;
import org.linemass.engine.pieces.index.DerivedIndex;
import org.linemass.engine.parallel.IndexedWork;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Contacts between pieces on any layers (a cross wire welded to a frame drawn on another layer
 * counts), found from STR-tree candidates and decided on the
 * true curves ({@link ClosestPoints}; for two straights in one horizontal plane the JTS robust
 * intersector decides a proper crossing exactly):
 * <ul>
 * <li>{@code t_junction} (info): a free end within the join tolerance of another segment's
 * interior (farther than the tolerance from that segment's ends); once per free end.</li>
 * <li>{@code crossing} (info): two pieces touch where neither has a free end and at least one is
 * in its interior (no shared vertex); once per pair of pieces and place.</li>
 * <li>{@code self_crossing} (warning): the same for two parts of one piece.</li>
 * </ul>
 * In welded wire products each T-junction and crossing is a weld; every message carries the
 * drawing's totals. A curve meeting another at several places gives one crossing per place
 * ({@link ClosestPoints#within}).
 *
 * <p>Limits: T-junctions are looked for until a budget of candidate segments around free ends is
 * spent (then a {@code limit_reached} warning); at most {@link #MAX_LISTED} T-junction and crossing
 * notes are listed, the rest only counted (one {@code limit_reached} note says how many); at most
 * {@link #MAX_COUNTED} places of contact are remembered, beyond which the search stops with a
 * {@code limit_reached} warning. When any search or the candidate pairs were cut short, the totals
 * read "at least".
 */
public final class ContactCheck {

    /**
     * Most T-junction and crossing notes listed one by one; beyond it they are counted (the weld
     * count in every message stays exact) and one {@code limit_reached} note says how many were
     * not listed. A drawing of thousands of long wires all crossing each other has millions.
     */
    public static final int MAX_LISTED = 100_000;

    /**
     * Most places of contact remembered for counting each pair of pieces and place once (about
     * 50 bytes each, so at most about 1 GB); beyond it the search stops, the counts are lower
     * bounds and a {@code limit_reached} warning says so.
     */
    public static final int MAX_COUNTED = 20_000_000;

    private ContactCheck() {
    }

    private record Hit(String kind, Vec3 at, int a, int b) {
    }

    /**
     * @param index candidate search over {@code segments} through the input segments they came from
     * @param pairs candidate pairs of input segments (boxes grown by at least the join tolerance)
     */
    public static List<Finding> check(List<Segment> segments, DerivedIndex index, CandidatePairs pairs,
            int[] layerOf, boolean[] free, int[] chainOf, Tolerances tol) {
        return check(segments, index, pairs, layerOf, free, chainOf, tol, MAX_LISTED, 1);
    }

    /**
     * As {@link #check(List, DerivedIndex, CandidatePairs, int[], boolean[], int[], Tolerances)}
     * listing at most {@code maxListed} T-junction and crossing notes, on {@code threads} threads
     * (the findings are the same for any number).
     */
    public static List<Finding> check(List<Segment> segments, DerivedIndex index, CandidatePairs pairs,
            int[] layerOf, boolean[] free, int[] chainOf, Tolerances tol, int maxListed, int threads) {
        return check(segments, index, pairs, layerOf, free, chainOf, tol, maxListed, MAX_COUNTED,
                EndSearchBudget.MAX_CANDIDATES, threads);
    }

    /**
     * As {@link #check(List, DerivedIndex, CandidatePairs, int[], boolean[], int[], Tolerances)}
     * listing at most {@code maxListed} T-junction and crossing notes and remembering at most
     * {@code maxCounted} places of contact, looking at most at about {@code maxEndCandidates}
     * candidate segments around free ends for T-junctions.
     */
    static List<Finding> check(List<Segment> segments, DerivedIndex index, CandidatePairs pairs,
            int[] layerOf, boolean[] free, int[] chainOf, Tolerances tol, int maxListed, int maxCounted,
            long maxEndCandidates) {
        return check(segments, index, pairs, layerOf, free, chainOf, tol, maxListed, maxCounted, maxEndCandidates,
                1);
    }

    /** Free ends, or candidate pairs, worked out side by side before their results are taken in order. */
    static final int BLOCK = 1 << 14;

    private record Tee(Hit hit, long spent) {
    }

    private record Touch(int a, int b, Vec3 at) {
    }

    static List<Finding> check(List<Segment> segments, DerivedIndex index, CandidatePairs pairs,
            int[] layerOf, boolean[] free, int[] chainOf, Tolerances tol, int maxListed, int maxCounted,
            long maxEndCandidates, int threads) {
        if (maxListed < 0 || maxCounted < 0) {
            throw new IllegalArgumentException("limits must not be negative: listed " + maxListed + ", counted "
                    + maxCounted);
        }
        double j = tol.joinM();
        List<Hit> hits = new ArrayList<>();
        // per kind: found, and of those not listed (notes beyond maxListed)
        long[] tees = new long[2];
        long[] crossings = new long[2];
        EndSearchBudget budget = new EndSearchBudget(maxEndCandidates);
        long ends = 0;
        long endsLeft = 0;
        int[] freeEnds = freeEnds(free);
        // each end's search is worked out on its own (side by side), then taken in end order against the
        // budget, exactly as one search after another would spend it
        for (int lo = 0; lo < freeEnds.length; lo += BLOCK) {
            int hi = Math.min(freeEnds.length, lo + BLOCK);
            if (budget.exhausted()) {
                ends += hi - lo;
                endsLeft += hi - lo;
                continue;
            }
            final int base = lo;
            List<Tee> found = IndexedWork.map(threads, hi - lo,
                    k -> tJunction(segments, index, freeEnds[base + k], j));
            for (Tee t : found) {
                ends++;
                if (budget.exhausted()) {
                    endsLeft++;
                    continue;
                }
                budget.spend(t.spent());
                if (t.hit() != null) {
                    tees[0]++;
                    if (tees[0] + crossings[0] <= maxListed) {
                        hits.add(t.hit());
                    } else {
                        tees[1]++;
                    }
                }
            }
        }
        ContactPlaces seen = new ContactPlaces();
        boolean stopped = false;
        for (int lo = 0; lo < pairs.size() && !stopped; lo += BLOCK) {
            final int base = lo;
            List<List<Touch>> touches = IndexedWork.map(threads, Math.min(pairs.size(), lo + BLOCK) - lo,
                    k -> touches(segments, index, pairs.first(base + k), pairs.second(base + k), free, j));
            for (List<Touch> list : touches) {
                for (Touch t : list) {
                    if (seen.size() == maxCounted) {
                        stopped = true;
                        break;
                    }
                    int ca = Math.min(chainOf[t.a()], chainOf[t.b()]);
                    int cb = Math.max(chainOf[t.a()], chainOf[t.b()]);
                    if (!seen.addIfNew(ca, cb, t.at(), j)) {
                        continue;
                    }
                    Hit h = new Hit(ca == cb ? FindingKind.SELF_CROSSING : FindingKind.CROSSING, t.at(),
                            Math.min(t.a(), t.b()), Math.max(t.a(), t.b()));
                    if (ca == cb) {
                        hits.add(h);
                    } else {
                        crossings[0]++;
                        if (tees[0] + crossings[0] <= maxListed) {
                            hits.add(h);
                        } else {
                            crossings[1]++;
                        }
                    }
                }
                if (stopped) {
                    break;
                }
            }
        }
        boolean[] stoppedFlag = {stopped};
        // pairs beyond the candidate-pair limit were never looked at: then the totals are lower bounds too
        String totals = String.format(Locale.ROOT, " Drawing total: %s%d T-junction%s and %d crossing%s.",
                stoppedFlag[0] || pairs.truncated() || endsLeft > 0 ? "at least " : "", tees[0],
                tees[0] == 1 ? "" : "s", crossings[0], crossings[0] == 1 ? "" : "s");
        List<Finding> out = new ArrayList<>(hits.size() + 2);
        for (Hit h : hits) {
            Provenance pa = segments.get(h.a()).source();
            Provenance pb = segments.get(h.b()).source();
            String message;
            Severity sev = Severity.INFO;
            switch (h.kind()) {
                case FindingKind.T_JUNCTION -> message = "The end of " + pa.describe() + " touches "
                        + pb.describe() + " away from its ends: a T-junction, counted as one weld or fixing where the "
                        + "two are joined." + totals;
                case FindingKind.CROSSING -> message = pa.describe() + " and " + pb.describe()
                        + " cross without a shared vertex: a crossing, counted as one weld or fixing where the two "
                        + "are joined." + totals;
                default -> {
                    sev = Severity.WARNING;
                    message = pa.describe().equals(pb.describe())
                            ? "The piece through " + pa.describe() + " crosses its own path within that entity."
                            : "The piece through " + pa.describe() + " crosses itself where it passes " + pb.describe()
                                    + ".";
                }
            }
            out.add(Findings.of(h.kind(), sev, h.at(), null, pa.layer(), List.of(pa, pb), null, message));
        }
        if (tees[1] + crossings[1] > 0) {
            // a note: only the list is shorter, every T-junction and crossing found is in the totals
            out.add(new Finding(FindingKind.LIMIT_REACHED, Severity.INFO, null, null, null, List.of(), null,
                    String.format(Locale.ROOT, "%d T-junction and crossing notes are not listed one by one (%d"
                            + " T-junction%s, %d crossing%s; more than %d in the drawing); each is counted in the"
                            + " drawing totals the listed ones give", tees[1] + crossings[1], tees[1],
                            tees[1] == 1 ? "" : "s", crossings[1], crossings[1] == 1 ? "" : "s", maxListed)));
        }
        out.addAll(budget.finding("T-junctions", endsLeft, ends));
        if (stoppedFlag[0]) {
            out.add(new Finding(FindingKind.LIMIT_REACHED, Severity.WARNING, null, null, null, List.of(), null,
                    String.format(Locale.ROOT, "more than %d places where pieces touch or cross: the search for"
                            + " crossings stopped there, so the T-junction and crossing totals are lower bounds and"
                            + " some crossings and self-crossings are missing", maxCounted)));
        }
        return out;
    }

    private static int[] freeEnds(boolean[] free) {
        int m = 0;
        for (boolean f : free) {
            m += f ? 1 : 0;
        }
        int[] out = new int[m];
        int k = 0;
        for (int e = 0; e < free.length; e++) {
            if (free[e]) {
                out[k++] = e;
            }
        }
        return out;
    }

    /** The T-junction at free end {@code end}, if any, and the candidates looked at. */
    private static Tee tJunction(List<Segment> segments, BoxIndex index, int end, double tol) {
        int own = end >> 1;
        Segment s = segments.get(own);
        Vec3 p = (end & 1) == 0 ? s.start() : s.end();
        org.linemass.geometry.Box3 box = new org.linemass.geometry.Box3(p, p).expandedBy(tol);
        double[] best = {Double.POSITIVE_INFINITY};
        int[] who = {-1};
        long[] spent = {0};
        index.query(box, k -> {
            spent[0]++;
            if (k == own) {
                return;
            }
            Segment c = segments.get(k);
            Contact ct = ClosestPoints.toPoint(c, p);
            if (ct.distance() > tol || ct.pa().distance(c.start()) <= tol || ct.pa().distance(c.end()) <= tol) {
                return;
            }
            if (ct.distance() < best[0] || (ct.distance() == best[0] && k < who[0])) {
                best[0] = ct.distance();
                who[0] = k;
            }
        });
        return new Tee(who[0] < 0 ? null : new Hit(FindingKind.T_JUNCTION, p, own, who[0]), spent[0]);
    }

    /** The places where the derived segments of input pair (oi, oj) cross, in the order a loop finds them. */
    private static List<Touch> touches(List<Segment> segments, DerivedIndex index, int oi, int oj, boolean[] free,
            double tol) {
        List<Touch> out = new ArrayList<>(0);
        index.derivedOf(oi, ii -> index.derivedOf(oj, k -> {
            if (ii == k || !index.box(ii).intersects(index.box(k))) {
                return;
            }
            for (Vec3 at : crossings(segments.get(ii), segments.get(k), 2 * ii, 2 * k, free, tol)) {
                out.add(new Touch(ii, k, at));
            }
        }));
        return out.isEmpty() ? List.of() : out;
    }

    /** Where a and b cross without a shared vertex (possibly several places for curves). */
    private static List<Vec3> crossings(Segment a, Segment b, int endsA, int endsB, boolean[] free, double tol) {
        if (a instanceof Straight sa && b instanceof Straight sb) {
            if (shareAnEnd(sa, sb, tol)) {
                // two straights meet at most once unless collinear (collinear overlaps are removed
                // before), and here that meeting is the shared end: no crossing
                return List.of();
            }
            if (PlanarCrossing.applies(sa, sb)) {
                Vec3 x = PlanarCrossing.properCrossing(sa, sb);
                if (x != null && nearEnd(sa, x, tol) < 0 && nearEnd(sb, x, tol) < 0) {
                    return List.of(x);
                }
            }
        }
        List<Vec3> out = new ArrayList<>(1);
        for (Contact c : ClosestPoints.within(a, b, tol)) {
            int nearA = nearEnd(a, c.pa(), tol);
            int nearB = nearEnd(b, c.pb(), tol);
            boolean shared = nearA >= 0 && nearB >= 0;
            boolean freeEndA = nearA >= 0 && free[endsA + nearA];
            boolean freeEndB = nearB >= 0 && free[endsB + nearB];
            if (!shared && !freeEndA && !freeEndB) {
                out.add(c.middle());
            }
        }
        return out;
    }

    private static boolean shareAnEnd(Straight a, Straight b, double tol) {
        return a.a().distance(b.a()) <= tol || a.a().distance(b.b()) <= tol || a.b().distance(b.a()) <= tol
                || a.b().distance(b.b()) <= tol;
    }

    /** 0 when p is within tol of the start, 1 of the end, -1 otherwise. */
    private static int nearEnd(Segment s, Vec3 p, double tol) {
        if (p.distance(s.start()) <= tol) {
            return 0;
        }
        return p.distance(s.end()) <= tol ? 1 : -1;
    }
}
