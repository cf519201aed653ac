package org.linemass.engine.resolve;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Collects expanded world segments and keeps one of every set of exact coincident copies: copies of
 * the same entity (same provenance: file, line, handle, layer and block path) that block copies
 * place on exactly the same curve, as a MINSERT with a spacing of zero does, or the same block
 * inserted twice at the same point. Only the first copy goes on to joining and checks; the others
 * are counted ({@link Group#copies()}) so that the caller can take them out of the totals and report
 * them as one finding with the count, instead of a million pairwise duplicates.
 *
 * <p>Equality is exact (the segments' own {@code equals}), except that a zero coordinate of a
 * straight compares equal whatever its sign (a spacing of -0.0 moves a copy by -0.0). Copies that
 * are equal only within a tolerance, or of different entities, are left to the piece stage's
 * duplicate search. Cost: one hash lookup per segment added; memory proportional to the distinct
 * segments. An accumulator, not thread-safe; order of {@link #segments()} is the order of first
 * appearance.
 */
final class CoincidentCopies {

    /**
     * One segment drawn more than once in exactly the same place.
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

    /** The straight with -0.0 coordinates as +0.0 (adding 0.0 does exactly that); other kinds as they are. */
    private static Segment canonical(Segment s) {
        if (s instanceof Straight t) {
            Vec3 a = t.a();
            Vec3 b = t.b();
            return new Straight(a.x() + 0.0, a.y() + 0.0, a.z() + 0.0, b.x() + 0.0, b.y() + 0.0, b.z() + 0.0,
                    t.source());
        }
        return s;
    }
}
