package org.linemass.engine.pieces.marks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.parallel.IndexedWork;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Segment;
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
     * Most group leaders a piece is compared with (nearest in length first, among pieces whose
     * ends are as far apart as its own, see {@link #mayMatch}). Bounds the work when
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
        double[] approx = new double[pieces.size()];
        for (int i = 0; i < approx.length; i++) {
            for (Segment s : pieces.get(i).segments()) {
                approx[i] += Curves.length(s);
            }
        }
        return group(pieces, sectionKeys, tol, mirror, approx, 1);
    }

    /**
     * As {@link #group(List, List, Tolerances, boolean)} given each piece's length as the piece
     * stage measured it ({@link Curves#length} per segment). Only pieces whose bucket holds another
     * piece of about the same length (within the length window plus
     * {@link Tolerances#GROUP_LENGTH_SCREEN_RELATIVE} of either length) and, for open pieces, with
     * ends as far apart (within twice the group tolerance, {@link #mayMatch}) get the arc-length
     * tables of a full comparison; any other piece cannot match and is a group of its own, as the
     * full comparison would make it. The arc-length tables are built on up to {@code threads} threads; the groups are the
     * same for any number.
     */
    public static List<List<Integer>> group(List<Piece> pieces, List<String> sectionKeys, Tolerances tol,
            boolean mirror, double[] approxLengthM, int threads) {
        if (approxLengthM.length != pieces.size()) {
            throw new IllegalArgumentException("need one length per piece: " + approxLengthM.length + " for "
                    + pieces.size() + " pieces");
        }
        Map<String, List<Integer>> buckets = new LinkedHashMap<>();
        int[] runs = new int[pieces.size()];
        for (int i = 0; i < pieces.size(); i++) {
            String kinds = PieceShape.kindsOf(pieces.get(i), tol.angleRad(), tol.joinM());
            runs[i] = kinds.length() - kinds.indexOf(':') - 1;
            String key = sectionKeys.get(i) + "\u0000" + kinds;
            buckets.computeIfAbsent(key, k -> new ArrayList<>()).add(i);
        }
        double[] chord = new double[pieces.size()];
        for (int i = 0; i < chord.length; i++) {
            chord[i] = chord(pieces.get(i));
        }
        PieceShape[] shapes = new PieceShape[pieces.size()];
        boolean[] compared = new boolean[pieces.size()];
        int[] groupOf = new int[pieces.size()];
        List<List<Integer>> groups = new ArrayList<>();
        for (List<Integer> all : buckets.values()) {
            List<Integer> bucket = candidates(all, pieces, approxLengthM, chord,
                    LENGTH_WINDOW * tol.groupM() * (runs[all.get(0)] + 1), tol.groupM());
            for (int i : bucket) {
                compared[i] = true;
            }
            for (int i : all) {
                if (!compared[i]) {
                    groupOf[i] = groups.size();
                    groups.add(new ArrayList<>(List.of(i)));
                }
            }
            List<PieceShape> made = IndexedWork.map(threads, bucket.size(),
                    k -> new PieceShape(pieces.get(bucket.get(k)), tol.angleRad(), tol.joinM()));
            for (int k = 0; k < bucket.size(); k++) {
                shapes[bucket.get(k)] = made.get(k);
            }
            bucket.sort(Comparator.<Integer>comparingDouble(i -> shapes[i].length()).thenComparingInt(i -> i));
            List<Integer> leaders = new ArrayList<>();
            List<double[][]> leaderSamples = new ArrayList<>();
            for (int i : bucket) {
                PieceShape s = shapes[i];
                double window = LENGTH_WINDOW * tol.groupM() * (s.runs() + 1);
                int found = -1;
                for (int k = leaders.size() - 1; k >= 0 && k >= leaders.size() - MAX_COMPARISONS; k--) {
                    PieceShape lead = shapes[leaders.get(k)];
                    if (lead.length() < s.length() - window) {
                        break;
                    }
                    if (mayMatch(chord[leaders.get(k)], chord[i], tol.groupM())
                            && Congruence.matches(lead, leaderSamples.get(k), s, tol.groupM(), mirror)) {
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

    /**
     * The members of a bucket that have another member within {@code window} plus the screening
     * slack in length (by the stage's lengths), in any order; members with a strongly
     * weighted spline are always kept (their two length rules may differ by more than the slack).
     */
    private static List<Integer> candidates(List<Integer> bucket, List<Piece> pieces, double[] approx,
            double[] chord, double window, double groupM) {
        // one slack per bucket, the largest any pair in it could need: a looser screen only keeps more
        double maxLength = 0;
        double maxChord = 0;
        for (int i : bucket) {
            maxLength = Math.max(maxLength, Math.abs(approx[i]));
            maxChord = Double.isNaN(chord[i]) ? maxChord : Math.max(maxChord, Math.abs(chord[i]));
        }
        double slackL = window + 2 * Tolerances.GROUP_LENGTH_SCREEN_RELATIVE * maxLength;
        double slackC = 2 * groupM + 2 * Tolerances.GROUP_LENGTH_SCREEN_RELATIVE * maxChord;
        // cells of one slack by one slack in (length, end distance): a piece can only match pieces in
        // its own cell or the eight around it; a closed piece (no ends) sits at end distance 0
        Map<Long, List<Integer>> cells = new java.util.HashMap<>();
        List<Integer> out = new ArrayList<>();
        List<Integer> placed = new ArrayList<>();
        for (int i : bucket) {
            double c = Double.isNaN(chord[i]) ? 0 : chord[i];
            if (!Double.isFinite(approx[i]) || !Double.isFinite(c) || weighted(pieces.get(i))) {
                out.add(i);
                continue;
            }
            cells.computeIfAbsent(cell(approx[i], slackL, c, slackC), k -> new ArrayList<>(1)).add(i);
            placed.add(i);
        }
        for (int i : placed) {
            double c = Double.isNaN(chord[i]) ? 0 : chord[i];
            long cl = (long) Math.floor(approx[i] / slackL);
            long cc = (long) Math.floor(c / slackC);
            boolean near = false;
            for (long dl = -1; dl <= 1 && !near; dl++) {
                for (long dc = -1; dc <= 1 && !near; dc++) {
                    List<Integer> others = cells.get(key(cl + dl, cc + dc));
                    if (others == null) {
                        continue;
                    }
                    for (int j : others) {
                        double cj = Double.isNaN(chord[j]) ? 0 : chord[j];
                        if (j != i && Math.abs(approx[j] - approx[i]) <= slackL && Math.abs(cj - c) <= slackC) {
                            near = true;
                            break;
                        }
                    }
                }
            }
            if (near) {
                out.add(i);
            }
        }
        return out;
    }

    private static long cell(double length, double slackL, double chord, double slackC) {
        return key((long) Math.floor(length / slackL), (long) Math.floor(chord / slackC));
    }

    private static long key(long a, long b) {
        return a * 0x9E3779B97F4A7C15L + b;
    }

    /**
     * Whether two pieces with these distances between their ends (NaN: closed, no ends) can be
     * congruent within {@code groupM}: a rigid motion keeps the distance, and a match moves each end
     * by at most the tolerance, so the distances differ by at most twice it.
     */
    static boolean mayMatch(double chordA, double chordB, double groupM) {
        double slack = 2 * groupM + Tolerances.GROUP_LENGTH_SCREEN_RELATIVE * (Math.abs(chordA) + Math.abs(chordB));
        return !(Math.abs(chordA - chordB) > slack);
    }

    /** The distance between an open piece's ends; NaN for a closed piece. */
    static double chord(Piece p) {
        if (p.closed() || p.segments().isEmpty()) {
            return Double.NaN;
        }
        return p.segments().get(0).start().distance(p.segments().get(p.segments().size() - 1).end());
    }

    private static boolean weighted(Piece p) {
        for (Segment s : p.segments()) {
            if (MomentIntegrator.stronglyWeighted(s)) {
                return true;
            }
        }
        return false;
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
