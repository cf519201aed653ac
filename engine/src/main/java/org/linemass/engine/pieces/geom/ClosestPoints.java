package org.linemass.engine.pieces.geom;

import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Closest points between a point and a curve, and between two curves. Straights use closed forms
 * (clamped projection; clamped closest points of two segments, Ericson, Real-Time Collision
 * Detection, 5.1.9). Circular arcs against a point use the exact projection onto the circle.
 * Everything else starts from the nearest chord of each curve's sampled polyline
 * ({@link Curves#polylineParams}) and refines on the true curves by Newton's method on the squared
 * distance, clamped to the parameter ranges, at most {@link #MAX_NEWTON} steps; a step that does
 * not reduce the distance is rejected, so the result is never worse than the chord start.
 */
public final class ClosestPoints {

    /** Newton iterations cap (quadratic convergence needs far fewer from a chord start). */
    public static final int MAX_NEWTON = 30;

    private ClosestPoints() {
    }

    /** Closest point of {@code s} to {@code p}. */
    public static Contact toPoint(Segment s, Vec3 p) {
        if (s instanceof Straight st) {
            double t = projectClamped(st.a(), st.b(), p);
            Vec3 q = st.point(t);
            return new Contact(t, q, Double.NaN, p, q.distance(p));
        }
        if (s instanceof CircularArc arc) {
            return toPointOnArc(arc, p);
        }
        double[] ts = Curves.polylineParams(s);
        double bestT = ts[0];
        double bestD = Double.POSITIVE_INFINITY;
        Vec3 prev = s.point(ts[0]);
        for (int i = 1; i < ts.length; i++) {
            Vec3 cur = s.point(ts[i]);
            double f = projectClamped(prev, cur, p);
            double d = prev.plusScaled(cur.minus(prev), f).distance(p);
            if (d < bestD) {
                bestD = d;
                bestT = ts[i - 1] + f * (ts[i] - ts[i - 1]);
            }
            prev = cur;
        }
        double t = refinePoint(s, p, bestT);
        Vec3 q = s.point(t);
        return new Contact(t, q, Double.NaN, p, q.distance(p));
    }

    private static Contact toPointOnArc(CircularArc arc, Vec3 p) {
        Vec3 rel = p.minus(arc.centre());
        double angle = Math.atan2(rel.dot(arc.v()), rel.dot(arc.u()));
        double t0 = arc.t0();
        double t1 = arc.t1();
        // bring the angle into [t0, t0 + 2 pi)
        double t = t0 + floorMod(angle - t0, 2 * Math.PI);
        if (t > t1) {
            Vec3 a = arc.point(t0);
            Vec3 b = arc.point(t1);
            t = a.distance(p) <= b.distance(p) ? t0 : t1;
        }
        Vec3 q = arc.point(t);
        return new Contact(t, q, Double.NaN, p, q.distance(p));
    }

    private static double floorMod(double x, double m) {
        double r = x - m * Math.floor(x / m);
        return r >= m ? 0 : r;
    }

    private static double refinePoint(Segment s, Vec3 p, double t0) {
        double t = t0;
        double best = s.point(t).distance(p);
        double lo = s.tStart();
        double hi = s.tEnd();
        for (int i = 0; i < MAX_NEWTON; i++) {
            Vec3 c = s.point(t);
            Vec3 d1 = s.derivative(t);
            Vec3 d2 = s.secondDerivative(t);
            Vec3 r = c.minus(p);
            double g = r.dot(d1);
            double h = d1.dot(d1) + r.dot(d2);
            if (!(h > 0)) {
                break;
            }
            double tn = Math.min(hi, Math.max(lo, t - g / h));
            double dn = s.point(tn).distance(p);
            if (!(dn < best) || tn == t) {
                break;
            }
            best = dn;
            t = tn;
        }
        return t;
    }

    /** Parameter in [0, 1] of the point of segment ab closest to p. */
    public static double projectClamped(Vec3 a, Vec3 b, Vec3 p) {
        Vec3 ab = b.minus(a);
        double l2 = ab.normSq();
        if (!(l2 > 0)) {
            return 0;
        }
        return Math.min(1, Math.max(0, p.minus(a).dot(ab) / l2));
    }

    /** Closest points of two curves. */
    public static Contact between(Segment a, Segment b) {
        if (a instanceof Straight sa && b instanceof Straight sb) {
            double[] st = segmentSegment(sa.a(), sa.b(), sb.a(), sb.b());
            Vec3 pa = sa.point(st[0]);
            Vec3 pb = sb.point(st[1]);
            return new Contact(st[0], pa, st[1], pb, pa.distance(pb));
        }
        double[] ta = Curves.polylineParams(a);
        double[] tb = Curves.polylineParams(b);
        Vec3[] pa = points(a, ta);
        Vec3[] pb = points(b, tb);
        double best = Double.POSITIVE_INFINITY;
        double bs = ta[0];
        double bt = tb[0];
        for (int i = 1; i < pa.length; i++) {
            for (int j = 1; j < pb.length; j++) {
                double[] st = segmentSegment(pa[i - 1], pa[i], pb[j - 1], pb[j]);
                Vec3 qa = pa[i - 1].plusScaled(pa[i].minus(pa[i - 1]), st[0]);
                Vec3 qb = pb[j - 1].plusScaled(pb[j].minus(pb[j - 1]), st[1]);
                double d = qa.distance(qb);
                if (d < best) {
                    best = d;
                    bs = ta[i - 1] + st[0] * (ta[i] - ta[i - 1]);
                    bt = tb[j - 1] + st[1] * (tb[j] - tb[j - 1]);
                }
            }
        }
        double[] st = refinePair(a, b, bs, bt);
        Vec3 qa = a.point(st[0]);
        Vec3 qb = b.point(st[1]);
        return new Contact(st[0], qa, st[1], qb, qa.distance(qb));
    }

    /**
     * Every place where two curves come within {@code tol} of each other (a line through a ring
     * meets it twice): each pair of polyline chords closer than {@code tol} plus the chords' sag
     * starts a Newton refinement; results within {@code tol} are kept, one per place (places closer
     * than {@code tol} on the first curve are merged). Two straights give at most one contact.
     */
    public static java.util.List<Contact> within(Segment a, Segment b, double tol) {
        java.util.List<Contact> out = new java.util.ArrayList<>();
        if (a instanceof Straight && b instanceof Straight) {
            Contact c = between(a, b);
            if (c.distance() <= tol) {
                out.add(c);
            }
            return out;
        }
        double[] ta = Curves.polylineParams(a);
        double[] tb = Curves.polylineParams(b);
        Vec3[] pa = points(a, ta);
        Vec3[] pb = points(b, tb);
        double[] sagA = sags(a, ta, pa);
        double[] sagB = sags(b, tb, pb);
        for (int i = 1; i < pa.length; i++) {
            for (int j = 1; j < pb.length; j++) {
                double[] st = segmentSegment(pa[i - 1], pa[i], pb[j - 1], pb[j]);
                Vec3 qa = pa[i - 1].plusScaled(pa[i].minus(pa[i - 1]), st[0]);
                Vec3 qb = pb[j - 1].plusScaled(pb[j].minus(pb[j - 1]), st[1]);
                if (qa.distance(qb) > tol + sagA[i] + sagB[j]) {
                    continue;
                }
                double[] r = refinePair(a, b, ta[i - 1] + st[0] * (ta[i] - ta[i - 1]),
                        tb[j - 1] + st[1] * (tb[j] - tb[j - 1]));
                Vec3 ra = a.point(r[0]);
                Vec3 rb = b.point(r[1]);
                double d = ra.distance(rb);
                if (d > tol) {
                    continue;
                }
                boolean known = false;
                for (Contact c : out) {
                    if (c.pa().distance(ra) <= tol) {
                        known = true;
                        break;
                    }
                }
                if (!known) {
                    out.add(new Contact(r[0], ra, r[1], rb, d));
                }
            }
        }
        return out;
    }

    /** For each chord i (ending at point i), twice the distance from its midpoint to the curve's. */
    private static double[] sags(Segment s, double[] ts, Vec3[] ps) {
        double[] out = new double[ts.length];
        if (s instanceof Straight) {
            return out;
        }
        for (int i = 1; i < ts.length; i++) {
            Vec3 mid = ps[i - 1].plus(ps[i]).times(0.5);
            out[i] = 2 * mid.distance(s.point(0.5 * (ts[i - 1] + ts[i])));
        }
        return out;
    }

    private static Vec3[] points(Segment s, double[] ts) {
        Vec3[] out = new Vec3[ts.length];
        for (int i = 0; i < ts.length; i++) {
            out[i] = s.point(ts[i]);
        }
        return out;
    }

    /** Newton on f(s, t) = |A(s) - B(t)|^2 / 2 with clamping and descent safeguard. */
    private static double[] refinePair(Segment a, Segment b, double s0, double t0) {
        double s = s0;
        double t = t0;
        double best = a.point(s).distance(b.point(t));
        for (int i = 0; i < MAX_NEWTON && best > 0; i++) {
            Vec3 r = a.point(s).minus(b.point(t));
            Vec3 a1 = a.derivative(s);
            Vec3 b1 = b.derivative(t);
            Vec3 a2 = a.secondDerivative(s);
            Vec3 b2 = b.secondDerivative(t);
            double gs = r.dot(a1);
            double gt = -r.dot(b1);
            double hss = a1.dot(a1) + r.dot(a2);
            double htt = b1.dot(b1) - r.dot(b2);
            double hst = -a1.dot(b1);
            double det = hss * htt - hst * hst;
            double sn;
            double tn;
            if (det > 0 && hss > 0) {
                sn = s - (htt * gs - hst * gt) / det;
                tn = t - (hss * gt - hst * gs) / det;
            } else if (hss > 0 && htt > 0) {
                sn = s - gs / hss;
                tn = t - gt / htt;
            } else {
                break;
            }
            sn = Math.min(a.tEnd(), Math.max(a.tStart(), sn));
            tn = Math.min(b.tEnd(), Math.max(b.tStart(), tn));
            double dn = a.point(sn).distance(b.point(tn));
            if (!(dn < best)) {
                break;
            }
            best = dn;
            s = sn;
            t = tn;
        }
        return new double[] {s, t};
    }

    /**
     * Parameters (s, t) in [0, 1] of the closest points of segments p1p2 and q1q2 (clamped,
     * handles degenerate segments).
     */
    public static double[] segmentSegment(Vec3 p1, Vec3 p2, Vec3 q1, Vec3 q2) {
        Vec3 d1 = p2.minus(p1);
        Vec3 d2 = q2.minus(q1);
        Vec3 r = p1.minus(q1);
        double a = d1.dot(d1);
        double e = d2.dot(d2);
        double f = d2.dot(r);
        double s;
        double t;
        if (a <= 0 && e <= 0) {
            return new double[] {0, 0};
        }
        if (a <= 0) {
            return new double[] {0, clamp01(f / e)};
        }
        double c = d1.dot(r);
        if (e <= 0) {
            return new double[] {clamp01(-c / a), 0};
        }
        double b = d1.dot(d2);
        double denom = a * e - b * b;
        s = denom > 0 ? clamp01((b * f - c * e) / denom) : 0;
        t = (b * s + f) / e;
        if (t < 0) {
            t = 0;
            s = clamp01(-c / a);
        } else if (t > 1) {
            t = 1;
            s = clamp01((b - c) / a);
        }
        return new double[] {s, t};
    }

    private static double clamp01(double x) {
        return Math.min(1, Math.max(0, x));
    }
}
