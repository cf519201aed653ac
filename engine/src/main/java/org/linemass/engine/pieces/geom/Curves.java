package org.linemass.engine.pieces.geom;

import org.linemass.engine.integrate.CurveSpeed;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Lengths, end tangents and parameter grids of segments, accurate enough for drawing checks
 * (tiny segment, gap, bend angle). Straights and circular arcs use closed forms; elliptical arcs
 * and splines use a composite 5-point Gauss-Legendre rule on {@link #SUBDIVISIONS} pieces per
 * knot span ({@link CurveSpeed}, which evaluates a spline's speed from its span polynomials), which
 * is exact to well below a micrometre for drawn curves.
 */
public final class Curves {

    /** Sub-intervals per smooth span for numerical lengths (common practice, no source). */
    public static final int SUBDIVISIONS = 16;

    /** Chords per full turn of an arc or ellipse in {@link #polylineParams} (about 11 degrees each). */
    public static final int CHORDS_PER_TURN = 32;

    private Curves() {
    }

    /** Arc length of the whole segment in its own units. */
    public static double length(Segment s) {
        if (s instanceof Straight st) {
            return st.length();
        }
        if (s instanceof CircularArc arc) {
            return arc.length();
        }
        if (MomentIntegrator.stronglyWeighted(s)) {
            // the fixed rule misses the steps of extreme weights; the adaptive path resolves them
            return MomentIntegrator.lengthMoments(s, Tolerances.CHECK_LENGTH_RELATIVE).mass();
        }
        return lengthBetween(s, s.tStart(), s.tEnd());
    }

    /** Arc length between two parameters {@code a <= b} by composite Gauss-Legendre. */
    public static double lengthBetween(Segment s, double a, double b) {
        return CurveSpeed.of(s).lengthBetween(a, b, SUBDIVISIONS);
    }

    /** {@code a}, the breakpoints strictly inside (a, b), then {@code b}. */
    static double[] spans(Segment s, double a, double b) {
        double[] bp = s.breakpoints();
        double[] out = new double[bp.length + 2];
        int n = 0;
        out[n++] = a;
        for (double t : bp) {
            if (t > a && t < b) {
                out[n++] = t;
            }
        }
        out[n++] = b;
        return java.util.Arrays.copyOf(out, n);
    }

    /** Unit tangent in the direction of travel at the start; {@link Vec3#ZERO} for a point. */
    public static Vec3 startTangent(Segment s) {
        return tangent(s, s.tStart(), +1);
    }

    /** Unit tangent in the direction of travel at the end; {@link Vec3#ZERO} for a point. */
    public static Vec3 endTangent(Segment s) {
        return tangent(s, s.tEnd(), -1);
    }

    private static Vec3 tangent(Segment s, double t, int towardsInside) {
        Vec3 d = s.derivative(t);
        double n = d.norm();
        if (n > 0 && Double.isFinite(n)) {
            return d.times(1 / n);
        }
        // Vanishing derivative (repeated spline control points): use a short chord instead.
        double h = Tolerances.TANGENT_STEP_FRACTION * (s.tEnd() - s.tStart());
        Vec3 chord = towardsInside > 0 ? s.point(t + h).minus(s.point(t)) : s.point(t).minus(s.point(t - h));
        double c = chord.norm();
        return c > 0 ? chord.times(1 / c) : Vec3.ZERO;
    }

    /**
     * Parameters of a polyline that follows the curve: both ends, every breakpoint, and enough
     * points in between that each chord turns by at most about 11 degrees on arcs and ellipses
     * ({@link #CHORDS_PER_TURN} per full turn) and each spline span has half of
     * {@link #SUBDIVISIONS} chords.
     */
    public static double[] polylineParams(Segment s) {
        if (s instanceof Straight) {
            return new double[] {0, 1};
        }
        double a = s.tStart();
        double b = s.tEnd();
        double[] cuts = spans(s, a, b);
        int per;
        if (s instanceof org.linemass.geometry.Nurbs) {
            per = SUBDIVISIONS / 2;
        } else {
            per = Math.max(2, (int) Math.ceil((b - a) / (2 * Math.PI) * CHORDS_PER_TURN));
        }
        int total = (cuts.length - 1) * per + 1;
        double[] out = new double[total];
        int n = 0;
        for (int i = 0; i + 1 < cuts.length; i++) {
            for (int k = 0; k < per; k++) {
                out[n++] = cuts[i] + (cuts[i + 1] - cuts[i]) * k / per;
            }
        }
        out[n] = b;
        return out;
    }

    /** The angle in radians between two unit (or zero) vectors; 0 when either is zero. */
    public static double angleBetween(Vec3 a, Vec3 b) {
        double c = a.cross(b).norm();
        double d = a.dot(b);
        if (c == 0 && d == 0) {
            return 0;
        }
        return Math.atan2(c, d);
    }

    /** Lexicographic comparison of points (x, then y, then z). */
    public static int compare(Vec3 a, Vec3 b) {
        int c = Double.compare(a.x(), b.x());
        if (c == 0) {
            c = Double.compare(a.y(), b.y());
        }
        if (c == 0) {
            c = Double.compare(a.z(), b.z());
        }
        return c;
    }
}
