package org.linemass.engine.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.locationtech.jts.algorithm.Centroid;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.junit.jupiter.api.Test;

/**
 * Cross-checks against independent libraries: Commons Math's iterative Legendre-Gauss integrator
 * (run per knot span with tight tolerances) and JTS length and centroid of a finely sampled line
 * string (JTS's centroid of lines is length-weighted).
 */
class ReferenceLibraryTest {

    private static Moments ours(Segment s) {
        return MomentIntegrator.integrate(s, LinearDensity.UNIT, 0, 1e-10, MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                .moments();
    }

    /** Commons Math Legendre-Gauss of f over every span between the segment's cuts. */
    private static double legendre(Segment s, UnivariateFunction f) {
        IterativeLegendreGaussIntegrator lg = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-15, 2, 64);
        double[] cuts = MomentIntegrator.cuts(s);
        double sum = 0;
        for (int i = 0; i + 1 < cuts.length; i++) {
            sum += lg.integrate(Integer.MAX_VALUE, f, cuts[i], cuts[i + 1]);
        }
        return sum;
    }

    private static Nurbs randomSpline(Random rnd, int degree, int points, boolean rational) {
        Vec3[] p = new Vec3[points];
        double[] w = new double[points];
        for (int i = 0; i < points; i++) {
            p[i] = new Vec3(rnd.nextDouble() * 100, rnd.nextDouble() * 100, rnd.nextDouble() * 20);
            w[i] = rational ? 0.5 + rnd.nextDouble() * 2 : 1;
        }
        double[] k = new double[points + degree + 1];
        double t = 0;
        for (int i = 0; i < k.length; i++) {
            if (i > degree && i <= points) {
                t += 0.2 + rnd.nextDouble();
            }
            k[i] = t;
        }
        return Nurbs.of(degree, k, p, w, TestCurves.SRC);
    }

    @Test
    void nurbsAndEllipses_matchCommonsMathLegendreGauss() {
        Random rnd = new Random(20261201);
        for (int trial = 0; trial < 20; trial++) {
            Segment s = trial % 2 == 0 ? randomSpline(rnd, 2 + trial % 3, 6 + trial % 5, trial % 4 == 0)
                    : EllipticalArc.of(new Vec3(rnd.nextDouble(), 0, 0), new Vec3(1 + 9 * rnd.nextDouble(), 0, 0),
                            new Vec3(0, 0.05 + rnd.nextDouble(), 0.3), 0.2, 0.2 + 6 * rnd.nextDouble(), TestCurves.SRC);
            Moments m = ours(s);
            double length = legendre(s, t -> s.derivative(t).norm());
            double xMoment = legendre(s, t -> s.derivative(t).norm() * s.point(t).x());
            // both sides claim about 1e-10 relative or better; the reported bound must cover the difference
            double diff = Math.abs(m.mass() - length);
            assertTrue(diff <= m.errorBound() + 1e-13 * length, "trial " + trial + ": diff " + diff + " bound "
                    + m.errorBound());
            assertEquals(length, m.mass(), 1e-10 * length);
            assertEquals(xMoment / length, m.centroid().x(), 1e-9 * (1 + Math.abs(m.centroid().x())));
        }
    }

    @Test
    void nurbs_matchesJtsSampledLineString() {
        Random rnd = new Random(7);
        Nurbs s = randomSpline(rnd, 3, 9, true);
        int n = 200_000;
        Coordinate[] c = new Coordinate[n + 1];
        for (int i = 0; i <= n; i++) {
            Vec3 p = s.point(s.tStart() + (s.tEnd() - s.tStart()) * i / n);
            c[i] = new Coordinate(p.x(), p.y());
        }
        LineString ls = new GeometryFactory().createLineString(c);
        Nurbs flat = Nurbs.of(s.degree(), s.knots(), java.util.Arrays.stream(s.controlPoints())
                .map(p -> new Vec3(p.x(), p.y(), 0)).toArray(Vec3[]::new), s.weights(), TestCurves.SRC);
        Moments m = ours(flat);
        // chords of a smooth curve are short by about L h^2 kappa^2 / 24 per unit length: with 2e5 chords
        // the relative error is far below 1e-7, the tolerance used here
        assertEquals(ls.getLength(), m.mass(), 1e-7 * m.mass());
        Coordinate g = Centroid.getCentroid(ls);
        assertEquals(g.x, m.centroid().x(), 1e-6 * 100);
        assertEquals(g.y, m.centroid().y(), 1e-6 * 100);
    }

    @Test
    void cusp_isSplitAtZeroSpeed() {
        // cubic Bezier P0=(0,0), P1=(1,1), P2=(0,1), P3=(1,0): C'(1/2) = 3[(P1-P0)/4 + (P2-P1)/2 + (P3-P2)/4] = 0,
        // a cusp; |C'| has a kink there, which the integrator must cut at
        Nurbs cusp = Nurbs.of(3, new double[] {0, 0, 0, 0, 1, 1, 1, 1}, new Vec3[] {new Vec3(0, 0, 0),
            new Vec3(1, 1, 0), new Vec3(0, 1, 0), new Vec3(1, 0, 0)}, null, TestCurves.SRC);
        double[] cuts = MomentIntegrator.cuts(cusp);
        assertTrue(java.util.Arrays.stream(cuts).anyMatch(c -> Math.abs(c - 0.5) < 1e-7), java.util.Arrays.toString(cuts));
        MomentIntegrator.Result r = MomentIntegrator.integrate(cusp, LinearDensity.UNIT, 0, 1e-10,
                MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
        IterativeLegendreGaussIntegrator lg = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-15, 2, 64);
        UnivariateFunction speed = t -> cusp.derivative(t).norm();
        double reference = lg.integrate(Integer.MAX_VALUE, speed, 0, 0.5) + lg.integrate(Integer.MAX_VALUE, speed, 0.5, 1);
        assertTrue(r.converged());
        assertEquals(reference, r.moments().mass(), 1e-10 * reference);
        assertTrue(Math.abs(reference - r.moments().mass()) <= r.moments().errorBound() + 1e-14);
        // a smooth integrand on each side: a few hundred evaluations, not the cap
        assertTrue(r.evaluations() < 5_000, "evaluations " + r.evaluations());
    }

    @Test
    void errorBound_boundsTrueErrorOnEllipses() {
        // exact perimeters from the complete elliptic integral, FACTS.md §5.3 (mpmath 40 digits)
        double[][] cases = {{2, 1, 9.6884482205476761984}, {3, 1, 13.364893220555258230}};
        for (double rel : new double[] {1e-4, 1e-6, 1e-8, 1e-10, 1e-12}) {
            for (double[] c : cases) {
                EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(c[0], 0, 0), new Vec3(0, c[1], 0), 0,
                        2 * Math.PI, TestCurves.SRC);
                Moments m = MomentIntegrator.integrate(e, LinearDensity.UNIT, 0, rel,
                        MomentIntegrator.DEFAULT_MAX_EVALUATIONS).moments();
                double err = Math.abs(m.mass() - c[2]);
                assertTrue(err <= m.errorBound() + 4 * Math.ulp(c[2]), "rel " + rel + ": error " + err + " > bound "
                        + m.errorBound());
                assertTrue(m.errorBound() <= 2 * rel * c[2], "bound " + m.errorBound() + " misses target " + rel);
            }
        }
    }

    @Test
    void unreachableTarget_isRaisedToRoundingLevel() {
        // a target of 1e-20 cannot be met in double precision; the run must still converge quickly
        EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(3, 0, 0), new Vec3(0, 1, 0), 0, 2 * Math.PI,
                TestCurves.SRC);
        MomentIntegrator.Result r = MomentIntegrator.integrate(e, LinearDensity.UNIT, 0, 1e-20,
                MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
        assertTrue(r.converged());
        assertTrue(r.evaluations() < 20_000, "evaluations " + r.evaluations());
        // FACTS.md §5.3 (mpmath): 13.364893220555258230
        assertEquals(13.364893220555258230, r.moments().mass(), 1e-13 * 13.4);
    }

    @Test
    void kronrodRule_exactOnPolynomials() {
        // K21 is exact to degree 31 and G10 to degree 19 (QUADPACK): integral of t^k over [0, 1] is 1/(k+1)
        for (int k = 0; k <= 31; k++) {
            int kk = k;
            Integrand f = new Integrand() {
                @Override
                public int dimension() {
                    return 1;
                }

                @Override
                public void evaluate(double a, double b, double t, double[] out) {
                    out[0] = Math.pow(t, kk);
                }
            };
            AdaptiveGaussKronrod.Result r = AdaptiveGaussKronrod.integrate(f, new double[] {0, 1}, 1, 0, 21);
            assertEquals(1.0 / (k + 1), r.value(0), 1e-15, "degree " + k);
            assertEquals(21, r.evaluations());
            if (k <= 19) {
                assertTrue(r.errorBound(0) < 1e-13, "G10 exact to degree 19: " + k);
            }
        }
    }
}
