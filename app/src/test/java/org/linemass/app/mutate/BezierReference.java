package org.linemass.app.mutate;

import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Two-sided reference for the length of one rational Bézier span with positive weights, by
 * repeated de Casteljau halving in homogeneous coordinates. With positive weights each halving
 * puts the new projected control points on the segments between the old ones (corner cutting),
 * so the control polygon's length never grows and tends to the curve's length: every control
 * polygon is an upper bound and the sum of its chords (end point to end point of each part) a lower
 * bound (the shortest path between two points is the straight one). Both are standard properties
 * of Bézier curves (corner cutting under subdivision; convex hull property). Nothing of the program
 * under test is used.
 */
final class BezierReference {

    /** {lower, upper, parts} in the units of the control points. */
    record Interval(double lower, double upper, int parts) {
    }

    private BezierReference() {
    }

    /**
     * Bounds of the length of the span with control points {@code p[i] = {x, y, z}} and weights
     * {@code w[i] > 0}, halving each part until its polygon and chord differ by at most
     * {@code relTol} of its polygon (so upper - lower is at most relTol x upper), or until
     * {@code maxParts} parts (then the interval is wider, still sound).
     */
    static Interval length(double[][] p, double[] w, double relTol, int maxParts) {
        int n = p.length;
        double[][] h = new double[n][4];
        double wmax = 0;
        for (double x : w) {
            wmax = Math.max(wmax, x);
        }
        for (int i = 0; i < n; i++) {
            double wi = w[i] / wmax; // homogeneous form scaled so no product overflows
            h[i] = new double[] {p[i][0] * wi, p[i][1] * wi, p[i][2] * wi, wi};
        }
        double lower = 0;
        double upper = 0;
        int parts = 0;
        Deque<double[][]> todo = new ArrayDeque<>();
        todo.push(h);
        while (!todo.isEmpty()) {
            double[][] q = todo.pop();
            double poly = polygon(q);
            double chord = dist(q[0], q[n - 1]);
            if (poly - chord <= relTol * poly || parts + todo.size() >= maxParts) {
                lower += chord;
                upper += poly;
                parts++;
                continue;
            }
            double[][][] halves = halve(q);
            todo.push(halves[1]);
            todo.push(halves[0]);
        }
        return new Interval(lower, upper, parts);
    }

    /** De Casteljau at 1/2 on homogeneous points; both halves renormalised to a largest weight of 1. */
    static double[][][] halve(double[][] q) {
        int n = q.length;
        double[][] left = new double[n][];
        double[][] right = new double[n][];
        double[][] row = new double[n][];
        for (int i = 0; i < n; i++) {
            row[i] = q[i].clone();
        }
        for (int k = 0; k < n; k++) {
            left[k] = row[0].clone();
            right[n - 1 - k] = row[n - 1 - k].clone();
            for (int i = 0; i < n - 1 - k; i++) {
                for (int c = 0; c < 4; c++) {
                    row[i][c] = (row[i][c] + row[i + 1][c]) / 2;
                }
            }
        }
        return new double[][][] {normalised(left), normalised(right)};
    }

    private static double[][] normalised(double[][] q) {
        double m = 0;
        for (double[] x : q) {
            m = Math.max(m, x[3]);
        }
        for (double[] x : q) {
            for (int c = 0; c < 4; c++) {
                x[c] /= m;
            }
        }
        return q;
    }

    static double polygon(double[][] q) {
        double s = 0;
        for (int i = 0; i + 1 < q.length; i++) {
            s += dist(q[i], q[i + 1]);
        }
        return s;
    }

    /** Distance of the projected points of two homogeneous points. */
    static double dist(double[] a, double[] b) {
        double dx = a[0] / a[3] - b[0] / b[3];
        double dy = a[1] / a[3] - b[1] / b[3];
        double dz = a[2] / a[3] - b[2] / b[3];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
