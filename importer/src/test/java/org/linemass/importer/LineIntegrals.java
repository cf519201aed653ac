package org.linemass.importer;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Test-only line integrals of a set of world segments: length L, centroid g = (1/L) integral r ds,
 * and J = integral (|r-g|^2 I - (r-g)(r-g)^T) ds. Straights in closed form; every curve by a
 * composite Gauss-Legendre rule from Commons Math (12 points on each of 32 sub-intervals of every
 * smooth piece, split at spline knots), which is far below the 1e-7 comparison tolerance for the
 * smooth integrands of arcs, ellipses and spline spans.
 */
final class LineIntegrals {

    private static final int POINTS = 12;
    private static final int SUBINTERVALS = 32;
    private static final GaussIntegratorFactory FACTORY = new GaussIntegratorFactory();

    final double length;
    final Vec3 centroid;
    final double[][] j;

    private LineIntegrals(double length, Vec3 centroid, double[][] j) {
        this.length = length;
        this.centroid = centroid;
        this.j = j;
    }

    interface Sink {
        void add(double w, Vec3 r);
    }

    static LineIntegrals of(List<Segment> segments) {
        double[] l = new double[1];
        double[] s = new double[3];
        for (Segment seg : segments) {
            visit(seg, (w, r) -> {
                l[0] += w;
                s[0] += w * r.x();
                s[1] += w * r.y();
                s[2] += w * r.z();
            }, null);
        }
        Vec3 g = new Vec3(s[0] / l[0], s[1] / l[0], s[2] / l[0]);
        double[][] c = new double[3][3];
        for (Segment seg : segments) {
            visit(seg, (w, r) -> {
                double[] d = r.minus(g).toArray();
                for (int a = 0; a < 3; a++) {
                    for (int b = 0; b < 3; b++) {
                        c[a][b] += w * d[a] * d[b];
                    }
                }
            }, g);
        }
        double tr = c[0][0] + c[1][1] + c[2][2];
        double[][] jj = new double[3][3];
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                jj[a][b] = (a == b ? tr : 0) - c[a][b];
            }
        }
        return new LineIntegrals(l[0], g, jj);
    }

    /**
     * Feeds weighted sample points whose sums are the integrals of a function over the curve. For a
     * straight and a second-moment pass the exact two-point rule (points at mid +- d/sqrt(12)) is
     * used: it integrates quadratics in s exactly.
     */
    private static void visit(Segment seg, Sink sink, Vec3 g) {
        if (seg instanceof Straight st) {
            double len = st.length();
            Vec3 mid = st.a().plus(st.b()).times(0.5);
            if (g == null) {
                sink.add(len, mid);
            } else {
                Vec3 h = st.b().minus(st.a()).times(0.5 / Math.sqrt(3));
                sink.add(len / 2, mid.plus(h));
                sink.add(len / 2, mid.minus(h));
            }
            return;
        }
        List<Double> cuts = new ArrayList<>();
        cuts.add(seg.tStart());
        for (double k : seg.breakpoints()) {
            cuts.add(k);
        }
        cuts.add(seg.tEnd());
        for (int p = 0; p + 1 < cuts.size(); p++) {
            double a = cuts.get(p);
            double b = cuts.get(p + 1);
            double h = (b - a) / SUBINTERVALS;
            for (int k = 0; k < SUBINTERVALS; k++) {
                GaussIntegrator gi = FACTORY.legendre(POINTS, a + k * h, a + (k + 1) * h);
                for (int i = 0; i < gi.getNumberOfPoints(); i++) {
                    double t = gi.getPoint(i);
                    sink.add(gi.getWeight(i) * seg.derivative(t).norm(), seg.point(t));
                }
            }
        }
    }
}
