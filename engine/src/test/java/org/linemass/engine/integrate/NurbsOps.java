package org.linemass.engine.integrate;

import java.util.Arrays;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Vec3;

/**
 * Re-parametrisations that keep a NURBS curve's point set and direction, written from their textbook
 * definitions in homogeneous coordinates (The NURBS Book: knot insertion A5.1 after Boehm, degree
 * elevation of a Bezier segment eq. 5.36).
 */
final class NurbsOps {

    private NurbsOps() {
    }

    /** Inserts knot {@code u} once (strictly inside the domain). */
    static Nurbs insertKnot(Nurbs n, double u) {
        int p = n.degree();
        double[] k = n.knots();
        Vec3[] pts = n.controlPoints();
        double[] w = n.weights();
        int span = -1;
        for (int i = p; i < pts.length; i++) {
            if (k[i] <= u && u < k[i + 1]) {
                span = i;
            }
        }
        if (span < 0) {
            throw new IllegalArgumentException("knot " + u + " outside the domain");
        }
        double[][] h = homogeneous(pts, w);
        double[][] q = new double[pts.length + 1][];
        for (int i = 0; i <= span - p; i++) {
            q[i] = h[i];
        }
        for (int i = span - p + 1; i <= span; i++) {
            double a = (u - k[i]) / (k[i + p] - k[i]);
            q[i] = mix(h[i], h[i - 1], a);
        }
        for (int i = span + 1; i <= pts.length; i++) {
            q[i] = h[i - 1];
        }
        double[] nk = new double[k.length + 1];
        System.arraycopy(k, 0, nk, 0, span + 1);
        nk[span + 1] = u;
        System.arraycopy(k, span + 1, nk, span + 2, k.length - span - 1);
        return build(p, nk, q);
    }

    /** Raises the degree of a single-span clamped spline (a rational Bezier curve) by one. */
    static Nurbs elevateBezier(Nurbs n) {
        int p = n.degree();
        Vec3[] pts = n.controlPoints();
        if (pts.length != p + 1) {
            throw new IllegalArgumentException("not a single Bezier span");
        }
        double[][] h = homogeneous(pts, n.weights());
        double[][] q = new double[p + 2][];
        q[0] = h[0];
        q[p + 1] = h[p];
        for (int i = 1; i <= p; i++) {
            double a = (double) i / (p + 1);
            q[i] = mix(h[i], h[i - 1], 1 - a);
        }
        double[] k = new double[2 * (p + 2)];
        Arrays.fill(k, 0, p + 2, n.tStart());
        Arrays.fill(k, p + 2, k.length, n.tEnd());
        return build(p + 1, k, q);
    }

    /** a * x + (1 - a) * y componentwise. */
    private static double[] mix(double[] x, double[] y, double a) {
        double[] r = new double[4];
        for (int c = 0; c < 4; c++) {
            r[c] = a * x[c] + (1 - a) * y[c];
        }
        return r;
    }

    private static double[][] homogeneous(Vec3[] pts, double[] w) {
        double[][] h = new double[pts.length][];
        for (int i = 0; i < pts.length; i++) {
            h[i] = new double[] {w[i] * pts[i].x(), w[i] * pts[i].y(), w[i] * pts[i].z(), w[i]};
        }
        return h;
    }

    private static Nurbs build(int p, double[] knots, double[][] q) {
        Vec3[] pts = new Vec3[q.length];
        double[] w = new double[q.length];
        for (int i = 0; i < q.length; i++) {
            w[i] = q[i][3];
            pts[i] = new Vec3(q[i][0] / w[i], q[i][1] / w[i], q[i][2] / w[i]);
        }
        return Nurbs.of(p, knots, pts, w, TestCurves.SRC);
    }
}
