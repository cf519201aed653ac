package org.linemass.engine.shape;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Turns segments into polylines whose chords stay within a given sagitta of the curve, for
 * pictures. Straights give their two ends; curves are split at their breakpoints and then
 * recursively halved until the midpoint deviation is within tolerance or the point budget per
 * segment is spent (so a hostile curve cannot blow up a report).
 */
public final class CurveSampler {

    /** Most points one segment may produce. */
    public static final int MAX_POINTS_PER_SEGMENT = 2048;

    private final double sagittaM;

    /**
     * @param sagittaM largest allowed distance between a chord midpoint and the curve (metres)
     */
    public CurveSampler(double sagittaM) {
        if (!(sagittaM > 0) || !Double.isFinite(sagittaM)) {
            throw new IllegalArgumentException("sagitta must be positive and finite, got " + sagittaM);
        }
        this.sagittaM = sagittaM;
    }

    /** Points along the segment from start to end, both included. */
    public List<Vec3> sample(Segment s) {
        List<Vec3> out = new ArrayList<>();
        if (s instanceof Straight line) {
            out.add(line.a());
            out.add(line.b());
            return out;
        }
        List<Double> cuts = new ArrayList<>();
        cuts.add(s.tStart());
        for (double b : s.breakpoints()) {
            cuts.add(b);
        }
        cuts.add(s.tEnd());
        // at least 8 spans per curve piece so that a closed circle never collapses to its chord
        int budgetPerPiece = Math.max(16, MAX_POINTS_PER_SEGMENT / cuts.size());
        out.add(s.point(s.tStart()));
        for (int i = 0; i + 1 < cuts.size(); i++) {
            double a = cuts.get(i);
            double b = cuts.get(i + 1);
            int n = 8;
            double h = (b - a) / n;
            int[] budget = {budgetPerPiece};
            for (int k = 0; k < n; k++) {
                refine(s, a + k * h, a + (k + 1) * h, out, budget, 0);
            }
        }
        return out;
    }

    /** Appends points in (t0, t1], t0's point already in {@code out}. */
    private void refine(Segment s, double t0, double t1, List<Vec3> out, int[] budget, int depth) {
        Vec3 p0 = out.get(out.size() - 1);
        Vec3 p1 = s.point(t1);
        Vec3 mid = s.point(0.5 * (t0 + t1));
        double dev = mid.distance(p0.plus(p1).times(0.5));
        if (dev > sagittaM && budget[0] > 1 && depth < 20) {
            budget[0]--;
            double tm = 0.5 * (t0 + t1);
            refine(s, t0, tm, out, budget, depth + 1);
            refine(s, tm, t1, out, budget, depth + 1);
            return;
        }
        out.add(p1);
    }
}
