package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * One smooth stretch of a segment between its parameters {@code t0 < t1}: a whole straight, arc or
 * elliptical arc, or one knot span of a spline (a spline may have a corner at a knot). Straight when
 * it cannot turn (a straight, a degree-1 spline span). Package-private helper of {@link RunSplitter}.
 */
record Element(Segment segment, double t0, double t1, boolean straight) {

    /** Samples per full turn of an arc or ellipse parameter; spans of splines get {@link #PER_SPAN}. */
    static final int PER_TURN = 256;
    /** Samples per spline knot span. */
    static final int PER_SPAN = 48;
    /**
     * Parameter step, as a share of the element's range, for a one-sided tangent: at an inner knot of a
     * spline (which may be a corner) and where the derivative vanishes. Small enough that the tangent's
     * direction moves by about 1e-9 of the element's turning.
     */
    private static final double STEP = Tolerances.BEND_TANGENT_STEP;

    /** The elements of a segment in order of travel. */
    static List<Element> of(Segment s) {
        List<Element> out = new ArrayList<>();
        if (s instanceof Straight) {
            out.add(new Element(s, s.tStart(), s.tEnd(), true));
        } else if (s instanceof Nurbs n) {
            double prev = s.tStart();
            for (double k : s.breakpoints()) {
                if (k > prev && k < s.tEnd()) {
                    out.add(new Element(s, prev, k, n.degree() == 1));
                    prev = k;
                }
            }
            out.add(new Element(s, prev, s.tEnd(), n.degree() == 1));
        } else {
            out.add(new Element(s, s.tStart(), s.tEnd(), false));
        }
        return out;
    }

    Vec3 start() {
        return segment.point(t0);
    }

    Vec3 end() {
        return segment.point(t1);
    }

    /** Unit tangent leaving the start, taken just inside the element. */
    Vec3 startTangent() {
        return tangent(t0, +1);
    }

    /** Unit tangent arriving at the end, taken just inside the element. */
    Vec3 endTangent() {
        return tangent(t1, -1);
    }

    /** Unit tangent at {@code t}, or a short chord towards the inside where the derivative vanishes. */
    Vec3 tangent(double t, int inward) {
        double h = STEP * (t1 - t0);
        // at an inner spline knot the derivative is one-sided: step inside the element so the span's own
        // side is used; the segment's own ends need no step
        boolean inner = t != segment.tStart() && t != segment.tEnd();
        double at = segment instanceof Nurbs && inner && inward != 0 ? t + inward * h : t;
        Vec3 d = segment.derivative(at);
        double n = d.norm();
        if (n > 0 && Double.isFinite(n)) {
            return d.times(1 / n);
        }
        Vec3 chord = inward > 0 ? segment.point(t + h).minus(segment.point(t)) : segment.point(t).minus(
                segment.point(t - h));
        double c = chord.norm();
        return c > 0 ? chord.times(1 / c) : Vec3.ZERO;
    }

    double length() {
        if (segment instanceof Straight st) {
            return st.length();
        }
        if (segment instanceof CircularArc arc) {
            return arc.radius() * (t1 - t0);
        }
        return Curves.lengthBetween(segment, t0, t1);
    }

    /** Sample count for turning and curvature (at least 4). */
    int samples() {
        if (straight) {
            return 1;
        }
        if (segment instanceof Nurbs) {
            return PER_SPAN;
        }
        return Math.max(4, (int) Math.ceil((t1 - t0) / (2 * Math.PI) * PER_TURN));
    }

    /** Centre-line radius of curvature at {@code t}: |C'|^3 / |C' x C''| (infinite where straight). */
    double radiusOfCurvature(double t) {
        Vec3 d1 = segment.derivative(t);
        Vec3 d2 = segment.secondDerivative(t);
        double c = d1.cross(d2).norm();
        double n = d1.norm();
        return c > 0 ? n * n * n / c : Double.POSITIVE_INFINITY;
    }
}
