package org.linemass.engine.integrate;

import java.util.List;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.tolerance.Tolerances;

/**
 * The arc length {@code s(t)} of a segment from its start to parameter {@code t} (metres when the
 * segment is in metres). Straights and circular arcs have constant speed and are exact; other
 * curves are integrated once adaptively ({@link AdaptiveGaussKronrod}) to the requested relative
 * error, and {@code s(t)} is the cumulative length up to the piece containing {@code t} plus the
 * 21-point Kronrod rule over the rest of that piece (which the adaptive run found smooth enough).
 * Immutable and thread-safe once built.
 */
public final class ArcLengthMap {

    private final Segment segment;
    private final double t0;
    private final double speed;
    private final double[] starts;
    private final double[] cumulative;
    private final double total;
    private final double errorBound;

    private ArcLengthMap(Segment segment, double t0, double speed, double[] starts, double[] cumulative,
            double total, double errorBound) {
        this.segment = segment;
        this.t0 = t0;
        this.speed = speed;
        this.starts = starts;
        this.cumulative = cumulative;
        this.total = total;
        this.errorBound = errorBound;
    }

    /** Builds the map of {@code seg} to relative accuracy {@code relative}. */
    public static ArcLengthMap of(Segment seg, double relative, long maxEvaluations) {
        if (seg instanceof Straight s) {
            double l = s.length();
            return new ArcLengthMap(seg, 0, l, null, null, l, Tolerances.CLOSED_FORM_ROUNDING_ULPS * Math.ulp(1.0) * l);
        }
        if (seg instanceof CircularArc c) {
            double l = c.length();
            return new ArcLengthMap(seg, c.t0(), c.radius(), null, null, l,
                    Tolerances.CLOSED_FORM_ROUNDING_ULPS * Math.ulp(1.0) * l);
        }
        Integrand speedIntegrand = new Integrand() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void evaluate(double a, double b, double t, double[] out) {
                out[0] = seg.derivative(t).norm();
            }
        };
        double[] cuts = MomentIntegrator.cuts(seg);
        AdaptiveGaussKronrod.Result r = AdaptiveGaussKronrod.integrate(speedIntegrand, cuts, relative, 0,
                MomentIntegrator.budget(maxEvaluations, cuts.length - 1));
        List<AdaptiveGaussKronrod.Piece> pieces = r.pieces();
        double[] starts = new double[pieces.size()];
        double[] cum = new double[pieces.size()];
        double sum = 0;
        for (int i = 0; i < pieces.size(); i++) {
            starts[i] = pieces.get(i).a();
            cum[i] = sum;
            sum += pieces.get(i).kronrod()[0];
        }
        return new ArcLengthMap(seg, seg.tStart(), 0, starts, cum, sum, r.reportedBound(relative));
    }

    /** Total length. */
    public double length() {
        return total;
    }

    /** Bound on the absolute error of {@link #length()}. */
    public double errorBound() {
        return errorBound;
    }

    /** Arc length from the start of the segment to parameter {@code t}. */
    public double at(double t) {
        if (starts == null) {
            double s = segment instanceof Straight ? speed * t : speed * (t - t0);
            return Math.min(Math.max(s, 0), total);
        }
        int lo = 0;
        int hi = starts.length - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (starts[mid] <= t) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        double a = starts[lo];
        if (t <= a) {
            return cumulative[lo];
        }
        double centre = 0.5 * (a + t);
        double half = 0.5 * (t - a);
        double sum = KronrodRule.WK[10] * segment.derivative(centre).norm();
        for (int j = 0; j < 10; j++) {
            double x = half * KronrodRule.XK[j];
            sum += KronrodRule.WK[j] * (segment.derivative(centre - x).norm() + segment.derivative(centre + x).norm());
        }
        return cumulative[lo] + half * sum;
    }
}
