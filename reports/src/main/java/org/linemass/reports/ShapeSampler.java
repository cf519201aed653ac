package org.linemass.reports;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Turns the ordered segments of one piece into a polyline for pictures: straights give their two
 * ends; curves are split at their breakpoints, each span into {@value #START_SPANS} equal parameter
 * steps, and each step is halved while the curve's midpoint lies farther than {@code chordM} from
 * the chord (at most {@value #MAX_DEPTH} halvings, so a span gives at most
 * {@code START_SPANS * 2^MAX_DEPTH} points). Consecutive duplicate points are dropped. For
 * drawing only: the numbers in the reports come from the engine's integrals, never from this.
 */
public final class ShapeSampler {

    /** Initial steps per smooth span: enough to catch an S-bend before the chord test. */
    static final int START_SPANS = 8;
    /** Most halvings of one step (bounds the work on pathological curves). */
    static final int MAX_DEPTH = 8;

    private ShapeSampler() {
    }

    /**
     * The polyline through {@code segments} (joined end to start, as the engine orders a piece).
     *
     * @param chordM largest allowed distance between the curve and the polyline, metres (&gt; 0)
     */
    public static List<Vec3> sample(List<? extends Segment> segments, double chordM) {
        if (!(chordM > 0) || !Double.isFinite(chordM)) {
            throw new IllegalArgumentException("chord tolerance must be positive and finite, got " + chordM);
        }
        List<Vec3> out = new ArrayList<>();
        for (Segment s : segments) {
            if (s instanceof Straight) {
                add(out, s.start());
                add(out, s.end());
                continue;
            }
            List<Double> cuts = new ArrayList<>();
            cuts.add(s.tStart());
            for (double b : s.breakpoints()) {
                if (b > s.tStart() && b < s.tEnd()) {
                    cuts.add(b);
                }
            }
            cuts.add(s.tEnd());
            add(out, s.start());
            for (int k = 0; k + 1 < cuts.size(); k++) {
                double a = cuts.get(k);
                double step = (cuts.get(k + 1) - a) / START_SPANS;
                for (int i = 0; i < START_SPANS; i++) {
                    double t0 = a + i * step;
                    double t1 = i == START_SPANS - 1 ? cuts.get(k + 1) : t0 + step;
                    refine(s, t0, t1, s.point(t0), s.point(t1), chordM, 0, out);
                }
            }
        }
        return out;
    }

    private static void refine(Segment s, double t0, double t1, Vec3 p0, Vec3 p1, double chordM, int depth,
            List<Vec3> out) {
        double tm = 0.5 * (t0 + t1);
        Vec3 pm = s.point(tm);
        if (depth < MAX_DEPTH && distanceToChord(pm, p0, p1) > chordM) {
            refine(s, t0, tm, p0, pm, chordM, depth + 1, out);
            refine(s, tm, t1, pm, p1, chordM, depth + 1, out);
        } else {
            add(out, p1);
        }
    }

    static double distanceToChord(Vec3 p, Vec3 a, Vec3 b) {
        Vec3 ab = b.minus(a);
        double len2 = ab.normSq();
        if (len2 == 0) {
            return p.distance(a);
        }
        double t = Math.max(0, Math.min(1, p.minus(a).dot(ab) / len2));
        return p.distance(a.plusScaled(ab, t));
    }

    private static void add(List<Vec3> out, Vec3 p) {
        if (out.isEmpty() || !out.get(out.size() - 1).equals(p)) {
            out.add(p);
        }
    }
}
