package org.linemass.engine.pieces.marks;

import org.linemass.engine.integrate.CurveSpeed;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * The point at a given arc length along one segment: exact for straights and circular arcs; for
 * other curves, linear interpolation in a table of cumulative lengths at {@link #TABLE} parameter
 * steps (Gauss-Legendre per step, {@link CurveSpeed}), built once per segment. Rigid copies of a curve share their parametrisation, so the
 * interpolation error is the same on both and does not hurt the congruence test.
 */
final class ArcLength {

    /** Parameter steps of the length table for curves without a closed form (no source). */
    static final int TABLE = 64;

    /**
     * 5-point Gauss-Legendre rules per step (and knot span inside it): a step is 1/64 of the curve,
     * over which a drawn curve's speed is smooth enough for one (no source).
     */
    static final int STEP_RULES = 1;

    private final Segment segment;
    private final double length;
    private final double[] params;
    private final double[] cumulative;

    ArcLength(Segment s) {
        this.segment = s;
        if (s instanceof Straight || s instanceof CircularArc) {
            this.length = Curves.length(s);
            this.params = null;
            this.cumulative = null;
        } else {
            params = new double[TABLE + 1];
            cumulative = new double[TABLE + 1];
            double a = s.tStart();
            double b = s.tEnd();
            CurveSpeed speed = CurveSpeed.of(s);
            for (int i = 0; i <= TABLE; i++) {
                params[i] = a + (b - a) * i / TABLE;
                if (i > 0) {
                    cumulative[i] = cumulative[i - 1] + speed.lengthBetween(params[i - 1], params[i], STEP_RULES);
                }
            }
            this.length = cumulative[TABLE];
        }
    }

    double length() {
        return length;
    }

    /** The point at arc length {@code s} from the start, clamped to [0, length]. */
    Vec3 at(double s) {
        double x = Math.max(0, Math.min(length, s));
        if (segment instanceof Straight st) {
            return length > 0 ? st.point(x / length) : st.a();
        }
        if (segment instanceof CircularArc arc) {
            return arc.point(arc.t0() + x / arc.radius());
        }
        int lo = 0;
        int hi = TABLE;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (cumulative[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double span = cumulative[hi] - cumulative[lo];
        double f = span > 0 ? (x - cumulative[lo]) / span : 0;
        return segment.point(params[lo] + f * (params[hi] - params[lo]));
    }
}
