package org.linemass.plan.revision;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.linemass.engine.moments.PrincipalAxes;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.Vec3;

/**
 * Pairs the pieces of two revisions of a drawing. The rule, with {@code t} the
 * {@link MatchTolerance}:
 * <ol>
 * <li>two pieces have the <em>same shape</em> when their sections, closedness and bend counts are
 * equal and their cut lengths and their three principal radii of gyration (of the centre-line,
 * sorted) differ by at most {@code t.shapeM()}: this holds under any rigid motion, so the
 * order of entities, the direction a wire is drawn in and marks renumbered do not matter (a mirror
 * image has the same radii and counts as the same shape);</li>
 * <li>they are in the <em>same place</em> when their centroids are at most {@code t.placeM()}
 * apart, so a move smaller than that is no move;</li>
 * <li>first, same shape in the same place: <b>unchanged</b>; then, of the pieces left, same shape
 * anywhere: <b>moved</b>; then, of those left, pieces in the same place or sharing an end (within
 * {@code t.placeM()}) but of another shape: <b>changed</b> (lengthened, shortened, section or
 * bends changed, reshaped); what is left of A is <b>removed</b>, of B <b>added</b>.</li>
 * </ol>
 * Each step pairs greedily, closest centroids first; ties are broken by the pieces' places (x, y,
 * z of the centroid, then length), never by their ids, so the result does not depend on the order
 * pieces or entities come in. Pieces of identical shape and place are interchangeable, so the
 * pairing among them does not change any count or difference. The cost is proportional to the
 * product of the numbers of pieces of equal section, closedness and bends, plus the product of the
 * numbers left for the third step. Stateless.
 */
public final class RevisionMatcher {

    private final MatchTolerance tol;

    private RevisionMatcher(MatchTolerance tol) {
        this.tol = tol;
    }

    /** Compares revision {@code a} with revision {@code b}. */
    public static RevisionDiff compare(DrawingResult a, DrawingResult b, MatchTolerance tol) {
        return new RevisionMatcher(tol).run(a, b);
    }

    private RevisionDiff run(DrawingResult ra, DrawingResult rb) {
        List<Key> a = keys(ra);
        List<Key> b = keys(rb);
        boolean[] usedA = new boolean[a.size()];
        boolean[] usedB = new boolean[b.size()];
        List<PieceChange> out = new ArrayList<>();
        Map<String, List<Integer>> bucketsB = new HashMap<>();
        for (int j = 0; j < b.size(); j++) {
            bucketsB.computeIfAbsent(b.get(j).bucket(), k -> new ArrayList<>()).add(j);
        }
        // step 1 and 2: same shape, first in the same place, then anywhere
        for (ChangeKind kind : List.of(ChangeKind.UNCHANGED, ChangeKind.MOVED)) {
            List<Pair> pairs = new ArrayList<>();
            for (int i = 0; i < a.size(); i++) {
                if (usedA[i]) {
                    continue;
                }
                for (int j : bucketsB.getOrDefault(a.get(i).bucket(), List.of())) {
                    double d = a.get(i).centroid.distance(b.get(j).centroid);
                    if (!usedB[j] && sameShape(a.get(i), b.get(j)) && (kind == ChangeKind.MOVED || d <= tol.placeM())) {
                        pairs.add(new Pair(i, j, d));
                    }
                }
            }
            take(pairs, usedA, usedB, (i, j, d) -> out.add(new PieceChange(kind, a.get(i).piece, b.get(j).piece, d,
                    List.of())));
        }
        // step 3: in the same place or sharing an end, another shape
        List<Pair> pairs = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            for (int j = 0; j < b.size(); j++) {
                if (!usedA[i] && !usedB[j]) {
                    double d = placeDistance(a.get(i), b.get(j));
                    if (d <= tol.placeM()) {
                        pairs.add(new Pair(i, j, d));
                    }
                }
            }
        }
        take(pairs, usedA, usedB, (i, j, d) -> out.add(new PieceChange(ChangeKind.CHANGED, a.get(i).piece,
                b.get(j).piece, a.get(i).centroid.distance(b.get(j).centroid), what(a.get(i), b.get(j)))));
        for (int i = 0; i < a.size(); i++) {
            if (!usedA[i]) {
                out.add(new PieceChange(ChangeKind.REMOVED, a.get(i).piece, null, 0, List.of()));
            }
        }
        for (int j = 0; j < b.size(); j++) {
            if (!usedB[j]) {
                out.add(new PieceChange(ChangeKind.ADDED, null, b.get(j).piece, 0, List.of()));
            }
        }
        out.sort(Comparator.comparing(PieceChange::kind).thenComparing(c -> place(c.b() != null ? c.b() : c.a()),
                RevisionMatcher::comparePlaces));
        return new RevisionDiff(ra.drawing().file(), rb.drawing().file(), tol, out);
    }

    private boolean sameShape(Key p, Key q) {
        if (Math.abs(p.piece.lengthM() - q.piece.lengthM()) > tol.shapeM()) {
            return false;
        }
        for (int k = 0; k < 3; k++) {
            if (Math.abs(p.radii[k] - q.radii[k]) > tol.shapeM()) {
                return false;
            }
        }
        return true;
    }

    /** The smaller of the centroid distance and the closest distance between an end of each. */
    private static double placeDistance(Key p, Key q) {
        double d = p.centroid.distance(q.centroid);
        for (Vec3 e : ends(p.piece)) {
            for (Vec3 f : ends(q.piece)) {
                d = Math.min(d, e.distance(f));
            }
        }
        return d;
    }

    private static List<Vec3> ends(PieceResult p) {
        List<Vec3> e = new ArrayList<>();
        if (!p.closed()) {
            if (p.startM() != null) {
                e.add(p.startM());
            }
            if (p.endM() != null) {
                e.add(p.endM());
            }
        }
        return e;
    }

    private List<String> what(Key p, Key q) {
        List<String> w = new ArrayList<>();
        if (Math.abs(p.piece.lengthM() - q.piece.lengthM()) > tol.shapeM()) {
            w.add("length");
        }
        if (!Objects.equals(p.piece.section(), q.piece.section())) {
            w.add("section");
        }
        if (p.piece.bends().size() != q.piece.bends().size()) {
            w.add("bends");
        }
        if (p.piece.closed() != q.piece.closed() || (w.isEmpty() && !sameShape(p, q))) {
            w.add("shape");
        }
        return w;
    }

    /** Takes pairs closest first (ties by the places of A's then B's piece) while both are free. */
    private void take(List<Pair> pairs, boolean[] usedA, boolean[] usedB, PairSink sink) {
        pairs.sort(Comparator.comparingDouble(Pair::d).thenComparingInt(Pair::i).thenComparingInt(Pair::j));
        for (Pair p : pairs) {
            if (!usedA[p.i()] && !usedB[p.j()]) {
                usedA[p.i()] = true;
                usedB[p.j()] = true;
                sink.accept(p.i(), p.j(), p.d());
            }
        }
    }

    /** The pieces of a drawing in order of place, so indexes (and ties) do not depend on entity order. */
    private static List<Key> keys(DrawingResult r) {
        List<Key> k = new ArrayList<>();
        for (PieceResult p : r.pieces()) {
            k.add(new Key(p, radii(p), p.centroidM() == null ? Vec3.ZERO : p.centroidM()));
        }
        k.sort((x, y) -> comparePlaces(place(x.piece), place(y.piece)));
        return k;
    }

    private static double[] place(PieceResult p) {
        Vec3 c = p.centroidM() == null ? Vec3.ZERO : p.centroidM();
        return new double[] {c.x(), c.y(), c.z(), p.lengthM()};
    }

    private static int comparePlaces(double[] x, double[] y) {
        return Arrays.compare(x, y);
    }

    private static double[] radii(PieceResult p) {
        double[] r = {0, 0, 0};
        if (p.lengthInertiaM3() != null && p.lengthM() > 0) {
            PrincipalAxes.tryOf(p.lengthInertiaM3()).ifPresent(ax -> {
                double[] g = ax.radiiOfGyration(p.lengthM());
                System.arraycopy(g, 0, r, 0, 3);
            });
        }
        Arrays.sort(r);
        return r;
    }

    private record Key(PieceResult piece, double[] radii, Vec3 centroid) {

        /** Pieces that can have the same shape share a bucket. */
        String bucket() {
            return piece.section() + "|" + piece.closed() + "|" + piece.bends().size();
        }
    }

    private record Pair(int i, int j, double d) {
    }

    @FunctionalInterface
    private interface PairSink {
        void accept(int i, int j, double d);
    }
}
