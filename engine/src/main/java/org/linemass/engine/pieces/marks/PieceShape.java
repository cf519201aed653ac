package org.linemass.engine.pieces.marks;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * What grouping needs to know about one piece: its length, its runs (maximal stretches of one
 * kind of curve that continue smoothly: collinear straights, arcs of one circle; any other
 * segment is a run of its own) with the arc-length position where each starts, a kind word that
 * survives rigid motion, reversal and splitting, and points at equal arc-length steps from any
 * start in either direction.
 */
final class PieceShape {

    private final boolean closed;
    private final ArcLength[] parts;
    private final double[] offset;
    private final double length;
    private final List<Double> runStarts = new ArrayList<>();
    private final String kinds;

    PieceShape(Piece piece, double angleRad, double joinM) {
        List<Segment> segs = piece.segments();
        this.closed = piece.closed();
        this.parts = new ArcLength[segs.size()];
        this.offset = new double[segs.size() + 1];
        boolean[] starts = runStartFlags(segs, closed, angleRad, joinM);
        for (int i = 0; i < segs.size(); i++) {
            parts[i] = new ArcLength(segs.get(i));
            offset[i + 1] = offset[i] + parts[i].length();
            if (starts[i]) {
                runStarts.add(offset[i]);
            }
        }
        this.length = offset[segs.size()];
        this.kinds = kinds(segs, starts, closed);
    }

    /**
     * The kind word of a piece ({@link #kinds()}) without building its arc-length tables: what
     * grouping buckets by before it knows which pieces need comparing at all.
     */
    static String kindsOf(Piece piece, double angleRad, double joinM) {
        List<Segment> segs = piece.segments();
        return kinds(segs, runStartFlags(segs, piece.closed(), angleRad, joinM), piece.closed());
    }

    /**
     * Per segment, whether a run starts there; for a closed piece whose last run continues into the
     * first, the first segment starts none (the run goes round).
     */
    private static boolean[] runStartFlags(List<Segment> segs, boolean closed, double angleRad, double joinM) {
        boolean[] starts = new boolean[segs.size()];
        int count = 0;
        for (int i = 0; i < segs.size(); i++) {
            if (i == 0 || !continues(segs.get(i - 1), segs.get(i), angleRad, joinM)) {
                starts[i] = true;
                count++;
            }
        }
        if (closed && count > 1 && continues(segs.get(segs.size() - 1), segs.get(0), angleRad, joinM)) {
            starts[0] = false;
        }
        return starts;
    }

    private static String kinds(List<Segment> segs, boolean[] starts, boolean closed) {
        StringBuilder k = new StringBuilder();
        for (int i = 0; i < segs.size(); i++) {
            if (starts[i]) {
                k.append(letter(segs.get(i)));
            }
        }
        String forward = k.toString();
        if (closed) {
            char[] c = forward.toCharArray();
            java.util.Arrays.sort(c);
            return "closed:" + new String(c);
        }
        String backward = new StringBuilder(forward).reverse().toString();
        return "open:" + (forward.compareTo(backward) <= 0 ? forward : backward);
    }

    private static boolean continues(Segment a, Segment b, double angleRad, double joinM) {
        if (Curves.angleBetween(Curves.endTangent(a), Curves.startTangent(b)) > angleRad) {
            return false;
        }
        if (a instanceof Straight && b instanceof Straight) {
            return true;
        }
        return a instanceof CircularArc p && b instanceof CircularArc q && p.centre().distance(q.centre()) <= joinM
                && Math.abs(p.radius() - q.radius()) <= joinM;
    }

    private static char letter(Segment s) {
        if (s instanceof Straight) {
            return 'L';
        }
        if (s instanceof CircularArc) {
            return 'A';
        }
        return s instanceof EllipticalArc ? 'E' : 'S';
    }

    double length() {
        return length;
    }

    int runs() {
        return runStarts.size();
    }

    String kinds() {
        return kinds;
    }

    boolean closed() {
        return closed;
    }

    List<Double> runStarts() {
        return runStarts;
    }

    /** The point at arc length {@code s} (taken modulo the length for a closed piece). */
    Vec3 at(double s) {
        double x = s;
        if (closed && length > 0) {
            x = x - length * Math.floor(x / length);
        }
        x = Math.max(0, Math.min(length, x));
        int lo = 0;
        int hi = parts.length;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (offset[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return parts[lo].at(x - offset[lo]);
    }

    /**
     * {@code count} points: for an open piece from one end to the other (from the end when
     * {@code reverse}), for a closed piece once round from {@code start}.
     */
    double[][] samples(double start, int count, boolean reverse) {
        double[][] out = new double[count][];
        for (int i = 0; i < count; i++) {
            double s;
            if (closed) {
                double step = length * i / count;
                s = reverse ? start - step : start + step;
            } else {
                double step = count > 1 ? length * i / (count - 1) : 0;
                s = reverse ? length - step : step;
            }
            out[i] = at(s).toArray();
        }
        return out;
    }
}
