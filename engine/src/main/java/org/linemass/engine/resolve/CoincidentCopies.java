package org.linemass.engine.resolve;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Collects expanded world segments and keeps one of every set of exact coincident copies: copies of
 * the same entity (same provenance: file, line, handle, layer and block path) that block copies
 * place on exactly the same curve, as a MINSERT with a spacing of zero does, or the same block
 * inserted twice at the same point. Only the first copy goes on to joining and checks; the others
 * are counted ({@link Group#copies()}) so that the caller can take them out of the totals and report
 * them as one finding with the count, instead of a million pairwise duplicates.
 *
 * <p>Curves other than straights compare exactly (the segments' own {@code equals}). Straights
 * compare by their end points rounded to the rounding noise where they lie (the grid of
 * {@link Tolerances#noiseAt} of their larger end magnitude, with the default noise floor), so that
 * a spacing of -0.0, or of 1e-300, which moves a copy by nothing or by far less than rounding,
 * still gives one copy: two straights in one grid cell are the same straight to within rounding.
 * Copies a little apart that fall either side of a grid line, copies farther apart, and copies of
 * different entities are left to the piece stage's duplicate search. Cost: one hash lookup per segment added; memory proportional to the distinct
 * segments. An accumulator, not thread-safe; order of {@link #segments()} is the order of first
 * appearance.
 */
final class CoincidentCopies {

    /**
     * One segment drawn more than once in the same place (to within rounding, for straights).
     *
     * @param kept the copy kept (the first placed)
     * @param copies how many times it is placed there in all (at least 2)
     */
    record Group(Segment kept, long copies) {

        Group {
            if (copies < 2) {
                throw new IllegalArgumentException("a coincident group has at least 2 copies, got " + copies);
            }
        }
    }

    private final List<Segment> segments = new ArrayList<>();
    private final Map<Segment, Integer> indexOf = new HashMap<>();
    private long[] count = new long[16];

    /** Adds a placed segment; returns true when it was new (false: a coincident copy, counted). */
    boolean add(Segment s) {
        Segment key = canonical(s);
        Integer at = indexOf.putIfAbsent(key, segments.size());
        if (at != null) {
            count[at]++;
            return false;
        }
        if (segments.size() == count.length) {
            count = java.util.Arrays.copyOf(count, 2 * count.length);
        }
        count[segments.size()] = 1;
        segments.add(s);
        return true;
    }

    /** Number of distinct segments so far. */
    int size() {
        return segments.size();
    }

    /** The distinct segments, in the order they were first placed. */
    List<Segment> segments() {
        return segments;
    }

    /** The segments placed more than once, in the order of {@link #segments()}. */
    List<Group> groups() {
        List<Group> out = new ArrayList<>();
        for (int i = 0; i < segments.size(); i++) {
            if (count[i] > 1) {
                out.add(new Group(segments.get(i), count[i]));
            }
        }
        return out;
    }

    /** Noise at a place with the default floor: the grid straights are compared on. */
    private static final Tolerances NOISE = Tolerances.defaults();

    /**
     * The straight with its coordinates rounded to the noise grid where it lies (as multiples of
     * the grid step, so -0.0 and +0.0 and anything within one cell agree); other kinds as they are.
     */
    private static Segment canonical(Segment s) {
        if (s instanceof Straight t) {
            Vec3 a = t.a();
            Vec3 b = t.b();
            double step = NOISE.noiseAt(Math.max(a.maxAbs(), b.maxAbs()));
            if (!Double.isFinite(step)) {
                return s;
            }
            return new Straight(cell(a.x(), step), cell(a.y(), step), cell(a.z(), step), cell(b.x(), step),
                    cell(b.y(), step), cell(b.z(), step), t.source());
        }
        return s;
    }

    /** The grid cell of {@code v} for a step; + 0.0 makes a -0.0 cell +0.0. */
    private static double cell(double v, double step) {
        return Math.floor(v / step) + 0.0;
    }
}
