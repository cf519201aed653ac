package org.linemass.engine.integrate;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * How a rational spline with strongly differing weights is integrated: span by span, each half of a
 * span on a copy of that span whose parameter starts at 0 at the nearer span end, with cuts graded
 * geometrically towards that end.
 *
 * <p>Why: where the weights of one span differ by a factor R, the curve covers most of its way
 * within a parameter width of about 1/R of the span beside a span end (the quadratic with weights 1,
 * 1e15, 1 runs from its first control point almost to its second in t &lt; 1e-14). Two things go
 * wrong on the spline as given: a 21-point rule over a piece holding such a step agrees with its
 * embedded 10-point rule by luck (both miss the step) and reports a tiny error; and near a span end
 * at parameter 1 the double spacing (1.1e-16) cannot resolve a width of 1e-15 at all. On the local
 * copy the end sits at parameter 0, where doubles are dense, and the cuts at {@code m 2^-j} (for
 * {@code j} up to about log2(R) + 3, {@code m} half the span) give every piece a speed that varies
 * by a bounded factor. The transitions of a rational span lie where two weighted basis terms are
 * equal, at {@code u / (1 - u)} between 1/R and R, so this grading covers all of them.
 *
 * <p>Splines whose weights differ by at most {@link #RATIO_TO_SPLIT} in every span are left to the
 * ordinary path ({@link #of} returns null). The weight ratio is bounded by
 * {@link Nurbs#MAX_WEIGHT_RATIO}, so the number of cuts is too. Stateless.
 */
final class SplineParts {

    /** Spans whose weights differ by more than this are split ({@link Tolerances#SPLIT_WEIGHT_RATIO}). */
    static final double RATIO_TO_SPLIT = Tolerances.SPLIT_WEIGHT_RATIO;

    /**
     * One half of a span on a local copy.
     *
     * @param curve the span's local copy: parameter 0 at the nearer end, increasing into the span
     * @param cuts where to cut [0, half span], graded towards 0
     * @param backwards whether the copy runs against the spline (the second half of a span)
     */
    record Part(Nurbs curve, double[] cuts, boolean backwards) {
    }

    private SplineParts() {
    }

    /** The largest ratio of two weights acting on one span of the spline. */
    static double worstSpanRatio(Nurbs n) {
        double[] k = n.knots();
        double[] w = n.weights();
        int p = n.degree();
        double worst = 1;
        for (int s = p; s < w.length; s++) {
            if (k[s + 1] > k[s]) {
                worst = Math.max(worst, ratio(w, s - p, s));
            }
        }
        return worst;
    }

    /**
     * The parts of a spline in the order of its parameter (two per span), or null when no span's
     * weights differ by more than {@link #RATIO_TO_SPLIT}.
     */
    static List<Part> of(Nurbs n) {
        if (worstSpanRatio(n) <= RATIO_TO_SPLIT) {
            return null;
        }
        double[] k = n.knots();
        double[] w = n.weights();
        Vec3[] pts = n.controlPoints();
        int p = n.degree();
        List<Part> parts = new ArrayList<>();
        for (int s = p; s < w.length; s++) {
            if (!(k[s + 1] > k[s])) {
                continue;
            }
            double r = ratio(w, s - p, s);
            double[] fk = new double[2 * p + 2];
            double[] bk = new double[2 * p + 2];
            Vec3[] fp = new Vec3[p + 1];
            Vec3[] bp = new Vec3[p + 1];
            double[] fw = new double[p + 1];
            double[] bw = new double[p + 1];
            for (int j = 0; j < 2 * p + 2; j++) {
                fk[j] = k[s - p + j] - k[s];
                bk[j] = k[s + 1] - k[s + p + 1 - j];
            }
            for (int j = 0; j <= p; j++) {
                fp[j] = pts[s - p + j];
                fw[j] = w[s - p + j];
                bp[j] = pts[s - j];
                bw[j] = w[s - j];
            }
            Nurbs forward = Nurbs.of(p, fk, fp, fw, n.source());
            Nurbs backward = Nurbs.of(p, bk, bp, bw, n.source());
            double half = 0.5 * (k[s + 1] - k[s]);
            parts.add(new Part(forward, graded(forward, half, r), false));
            parts.add(new Part(backward, graded(backward, half, r), true));
        }
        return parts;
    }

    /**
     * Cuts of [0, half]: the points of near-zero speed ({@link SpeedZeros}) and {@code half 2^-j}
     * down to an eighth of the width {@code 2 half / r} over which the span's weights act.
     */
    private static double[] graded(Nurbs local, double half, double r) {
        double floor = 2 * half / (8 * r);
        List<Double> cuts = new ArrayList<>();
        for (double c : SpeedZeros.cuts(local, 0, half, Double.POSITIVE_INFINITY)) {
            cuts.add(c);
        }
        for (double d = half / 2; d >= floor && d > 0; d /= 2) {
            cuts.add(d);
        }
        return cuts.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
    }

    /**
     * The cuts of a whole spline as given, with cuts {@code m 2^-j} from both ends of every span
     * whose weights differ by more than {@link #RATIO_TO_SPLIT} (as far as doubles resolve them):
     * for integrators that work on the spline itself (arc-length maps, field integrals).
     */
    static double[] withGrading(Nurbs n, double[] cuts) {
        if (worstSpanRatio(n) <= RATIO_TO_SPLIT) {
            return cuts;
        }
        double[] k = n.knots();
        double[] w = n.weights();
        int p = n.degree();
        List<Double> out = new ArrayList<>();
        for (double c : cuts) {
            out.add(c);
        }
        for (int s = p; s < w.length; s++) {
            double a = k[s];
            double b = k[s + 1];
            double r = ratio(w, s - p, s);
            if (!(b > a) || r <= RATIO_TO_SPLIT) {
                continue;
            }
            double half = 0.5 * (b - a);
            double floor = 2 * half / (8 * r);
            for (double d = half / 2; d >= floor && d > 0; d /= 2) {
                if (a + d > a) {
                    out.add(a + d);
                }
                if (b - d < b) {
                    out.add(b - d);
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
    }

    private static double ratio(double[] w, int from, int to) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (int i = from; i <= to; i++) {
            lo = Math.min(lo, w[i]);
            hi = Math.max(hi, w[i]);
        }
        return hi / lo;
    }

    /** The control polygon's length over the whole spline: no curve of positive weights is longer. */
    static double polygonLength(Nurbs n) {
        Vec3[] pts = n.controlPoints();
        double sum = 0;
        for (int i = 1; i < pts.length; i++) {
            sum += pts[i].minus(pts[i - 1]).norm();
        }
        return sum;
    }
}
