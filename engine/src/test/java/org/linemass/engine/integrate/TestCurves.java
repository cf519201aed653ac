package org.linemass.engine.integrate;

import java.util.function.DoubleFunction;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;

/** Curves for tests, built from their textbook definitions. */
final class TestCurves {

    static final Provenance SRC = Provenance.of("test", "0", 0, "", "TEST");

    private TestCurves() {
    }

    /**
     * The piecewise cubic Hermite interpolant of {@code c} with derivative {@code d} on [t0, t1] in
     * {@code n} equal pieces, written exactly as a cubic B-spline with triple inner knots (each piece
     * a Bezier curve with control points P0, P0 + h/3 P0', P1 - h/3 P1', P1). Its shape error is
     * O(h^4) (cubic Hermite interpolation).
     */
    static Nurbs hermite(DoubleFunction<Vec3> c, DoubleFunction<Vec3> d, double t0, double t1, int n) {
        Vec3[] pts = new Vec3[3 * n + 1];
        double[] knots = new double[3 * n + 5];
        double h = (t1 - t0) / n;
        for (int i = 0; i < n; i++) {
            double a = t0 + i * h;
            double b = i == n - 1 ? t1 : a + h;
            Vec3 pa = c.apply(a);
            Vec3 pb = c.apply(b);
            pts[3 * i] = pa;
            pts[3 * i + 1] = pa.plusScaled(d.apply(a), (b - a) / 3);
            pts[3 * i + 2] = pb.plusScaled(d.apply(b), -(b - a) / 3);
            pts[3 * i + 3] = pb;
        }
        int k = 0;
        for (int j = 0; j < 4; j++) {
            knots[k++] = t0;
        }
        for (int i = 1; i < n; i++) {
            double x = t0 + i * h;
            knots[k++] = x;
            knots[k++] = x;
            knots[k++] = x;
        }
        for (int j = 0; j < 4; j++) {
            knots[k++] = t1;
        }
        return Nurbs.of(3, knots, pts, null, SRC);
    }

    /** A full circle of radius r about the origin in the xy-plane as the 9-point rational quadratic NURBS. */
    static Nurbs nurbsCircle(double r) {
        double w = Math.sqrt(0.5);
        Vec3[] p = {new Vec3(r, 0, 0), new Vec3(r, r, 0), new Vec3(0, r, 0), new Vec3(-r, r, 0),
            new Vec3(-r, 0, 0), new Vec3(-r, -r, 0), new Vec3(0, -r, 0), new Vec3(r, -r, 0), new Vec3(r, 0, 0)};
        double[] wt = {1, w, 1, w, 1, w, 1, w, 1};
        double[] k = {0, 0, 0, 0.25, 0.25, 0.5, 0.5, 0.75, 0.75, 1, 1, 1};
        return Nurbs.of(2, k, p, wt, SRC);
    }

    /**
     * A circular arc of radius r from angle 0 to {@code sweep} (at most 2pi/3 for one segment) as one
     * rational quadratic Bezier: middle weight cos(sweep/2) (The NURBS Book, section 7.3).
     */
    static Nurbs rationalArc(double r, double sweep) {
        double half = sweep / 2;
        Vec3 p0 = new Vec3(r, 0, 0);
        Vec3 p2 = new Vec3(r * Math.cos(sweep), r * Math.sin(sweep), 0);
        double dist = r / Math.cos(half);
        Vec3 p1 = new Vec3(dist * Math.cos(half), dist * Math.sin(half), 0);
        return Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1}, new Vec3[] {p0, p1, p2},
                new double[] {1, Math.cos(half), 1}, SRC);
    }
}
