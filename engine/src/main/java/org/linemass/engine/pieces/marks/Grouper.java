package org.linemass.engine.pieces.marks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.piece.Piece;

/**
 * Groups identical pieces. Candidates share a bucket: the same section key, open or closed, and
 * the same run kinds (in the smaller reading direction; as a multiset for closed pieces); within
 * a bucket pieces are taken in order of length and compared only with group leaders whose length
 * is within {@link #LENGTH_WINDOW} times the tolerance per run, so a rack of identical pieces
 * costs one comparison each. The comparison samples both pieces at equal arc-length steps
 * ({@link #samplesFor}) and fits a rigid motion (Kabsch); they match when the largest residual
 * is within {@link Tolerances#groupM()}, trying the other direction of travel and, for closed
 * pieces, each run start of the candidate as its starting point.
 *
 * <p>Handedness, one rule for every plane: without mirror grouping a left-hand and a right-hand
 * piece are different marks. A planar piece (every sample within the group tolerance of one
 * plane, not all on one line) is compared keeping its orientation relative to the canonical
 * normal of its plane: the unit normal whose largest-magnitude component is positive (ties, within
 * {@link Tolerances#NORMAL_TIE}, go to z, then y, then x; a drawing in plan gets +z). Each piece
 * carries a point off its centroid along its own canonical normal into the fit, and the fit only
 * uses proper rotations, so a planar piece and its mirror image, seen from the canonical side of
 * their planes, are told apart in the x-y plane, the x-z plane or any tilted plane alike; turning a
 * flat piece over counts as a mirror. A non-planar piece (a crank in space) is compared under
 * proper rotations only (determinant +1), so its mirror image is a different mark. Straight
 * pieces have no handedness. With mirror grouping on, improper fits are accepted too and mirror
 * images share a mark. Our own convention; no source.
 *
 * <p>Never groups on length alone: the length window only limits which pairs are compared.
 */
public final class Grouper {

    /** Length difference allowed per run for a candidate pair, in group tolerances (no source). */
    public static final double LENGTH_WINDOW = 4;

    /**
     * Most group leaders a piece is compared with (nearest in length first). Bounds the work when
     * many different shapes share a bucket and a length; past it a piece starts its own group, so
     * the cap can only split a mark, never merge different shapes (no source).
     */
    public static final int MAX_COMPARISONS = 256;

    /** Most starting points tried for a closed piece (bounds the work; no source). */
    public static final int MAX_LOOP_STARTS = 64;

    private Grouper() {
    }

    /**
     * @param pieces the pieces, in a stable order
     * @param sectionKeys per piece, the key of its section (section id, or the layer when none)
     * @return groups as lists of indices into {@code pieces}; every piece in exactly one group,
     *     groups ordered by their first piece
     */
    public static List<List<Integer>> group(List<Piece> pieces, List<String> sectionKeys, Tolerances tol,
            boolean mirror) {
        List<PieceShape> shapes = new ArrayList<>(pieces.size());
        for (Piece p : pieces) {
            shapes.add(new PieceShape(p, tol.angleRad(), tol.joinM()));
        }
        Map<String, List<Integer>> buckets = new LinkedHashMap<>();
        for (int i = 0; i < pieces.size(); i++) {
            PieceShape s = shapes.get(i);
            String key = sectionKeys.get(i) + "\u0000" + s.kinds();
            buckets.computeIfAbsent(key, k -> new ArrayList<>()).add(i);
        }
        int[] groupOf = new int[pieces.size()];
        List<List<Integer>> groups = new ArrayList<>();
        for (List<Integer> bucket : buckets.values()) {
            bucket.sort(Comparator.<Integer>comparingDouble(i -> shapes.get(i).length()).thenComparingInt(i -> i));
            List<Integer> leaders = new ArrayList<>();
            List<double[][]> leaderSamples = new ArrayList<>();
            for (int i : bucket) {
                PieceShape s = shapes.get(i);
                double window = LENGTH_WINDOW * tol.groupM() * (s.runs() + 1);
                int found = -1;
                for (int k = leaders.size() - 1; k >= 0 && k >= leaders.size() - MAX_COMPARISONS; k--) {
                    PieceShape lead = shapes.get(leaders.get(k));
                    if (lead.length() < s.length() - window) {
                        break;
                    }
                    if (Congruence.matches(lead, leaderSamples.get(k), s, tol.groupM(), mirror)) {
                        found = leaders.get(k);
                        break;
                    }
                }
                if (found < 0) {
                    leaders.add(i);
                    leaderSamples.add(Congruence.reference(s));
                    groupOf[i] = groups.size();
                    groups.add(new ArrayList<>(List.of(i)));
                } else {
                    groupOf[i] = groupOf[found];
                    groups.get(groupOf[i]).add(i);
                }
            }
        }
        for (List<Integer> g : groups) {
            g.sort(null);
        }
        groups.sort(Comparator.comparingInt(g -> g.get(0)));
        return groups;
    }

    /** Fewest and most samples per piece, and samples added per run (no source: enough to see every run). */
    static final int MIN_SAMPLES = 32;
    static final int MAX_SAMPLES = 512;
    static final int SAMPLES_PER_RUN = 16;

    /** Samples per piece for the fit: grows with the number of runs. */
    static int samplesFor(PieceShape s) {
        return Math.min(MAX_SAMPLES, Math.max(MIN_SAMPLES, SAMPLES_PER_RUN * s.runs() + MIN_SAMPLES));
    }
}
