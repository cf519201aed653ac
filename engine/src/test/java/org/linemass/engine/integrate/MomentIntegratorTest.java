package org.linemass.engine.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.linemass.engine.moments.Moments;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;
import org.linemass.tolerance.Tolerances;

class MomentIntegratorTest {

    /** Default target of the integrator; results must be at least this good relative to their size. */
    private static final double REL = 1e-10;
    /** Closed forms are exact up to rounding: a few hundred ulps of the quantity is generous. */
    private static final double CLOSED = 1e-13;

    private static Moments adaptive(org.linemass.geometry.Segment s) {
        return MomentIntegrator.integrate(s, LinearDensity.UNIT, 0, REL, MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                .moments();
    }

    @Test
    void ellipsePerimeter_matchesCompleteEllipticIntegral() {
        // FACTS.md §5.3: P = 4a E(m), a=2 b=1 -> 9.68844822055; a=3 b=1 -> 13.3648932206 (12 digits)
        Moments m21 = MomentIntegrator.lengthMoments(EllipticalArc.of(Vec3.ZERO, new Vec3(2, 0, 0),
                new Vec3(0, 1, 0), 0, 2 * Math.PI, TestCurves.SRC), REL);
        Moments m31 = MomentIntegrator.lengthMoments(EllipticalArc.of(Vec3.ZERO, new Vec3(3, 0, 0),
                new Vec3(0, 1, 0), 0, 2 * Math.PI, TestCurves.SRC), REL);
        // mpmath 40-digit values from FACTS.md §5.3: 9.6884482205476761984, 13.364893220555258230
        assertEquals(9.6884482205476761984, m21.mass(), 9.7 * REL);
        assertEquals(13.364893220555258230, m31.mass(), 13.4 * REL);
        // the reported bound must really bound the error
        assertTrue(Math.abs(m21.mass() - 9.6884482205476761984) <= m21.errorBound() + 1e-15 * 9.7);
        assertTrue(Math.abs(m31.mass() - 13.364893220555258230) <= m31.errorBound() + 1e-15 * 13.4);
        assertTrue(m21.errorBound() <= 9.7 * REL, "bound within target: " + m21.errorBound());
        // full ellipse centroid at the centre (symmetry)
        assertEquals(0, m31.centroid().norm(), 1e-12);
    }

    @Test
    void ellipseArc_quarterAndEighth_matchFacts() {
        // FACTS.md §5.3: t from 0 to pi/4 -> 0.965663744222 (a=2,b=1), 1.19127006325 (a=3,b=1)
        EllipticalArc e2 = EllipticalArc.of(Vec3.ZERO, new Vec3(2, 0, 0), new Vec3(0, 1, 0), 0, Math.PI / 4,
                TestCurves.SRC);
        EllipticalArc e3 = EllipticalArc.of(Vec3.ZERO, new Vec3(3, 0, 0), new Vec3(0, 1, 0), 0, Math.PI / 4,
                TestCurves.SRC);
        // published to 12 digits: compare at 1e-11 absolute
        assertEquals(0.965663744222, adaptive(e2).mass(), 1e-11);
        assertEquals(1.19127006325, adaptive(e3).mass(), 1e-11);
    }

    @Test
    void arcCentroid_rSinAlphaOverAlpha() {
        // FACTS.md §5.2 (holooly, Beer & Johnston Fig. 5.8B): r = 100, alpha = pi/4 -> 90.0316316157
        CircularArc arc = CircularArc.of(Vec3.ZERO, 100, Vec3.X, Vec3.Y, -Math.PI / 4, Math.PI / 4, TestCurves.SRC);
        Moments m = ArcMoments.of(arc);
        assertEquals(157.079632679, m.mass(), 1e-9);
        assertEquals(90.0316316157, m.centroid().x(), 1e-9);
        assertEquals(0, m.centroid().y(), 1e-12);
        // semicircle, FACTS.md §5.2 (infogalactic List of centroids): 2r/pi = 0.636619772368 for r=1
        Moments semi = ArcMoments.of(CircularArc.of(Vec3.ZERO, 1, Vec3.X, Vec3.Y, 0, Math.PI, TestCurves.SRC));
        assertEquals(0.636619772368, semi.centroid().y(), 1e-12);
        // semicircle about its own centroid, FACTS.md §5.2: I_xG = 0.297556782060, I_zG = 1.86835310885 (m = pi)
        assertEquals(0.297556782060, semi.inertia().xx(), 1e-11);
        assertEquals(1.86835310885, semi.inertia().zz(), 1e-10);
    }

    @Test
    void arcSecondMoments_matchFactsAboutCentre() {
        // FACTS.md §5.2: r=1, alpha=1 about the centre, x = bisector: Sx2 = 1.45464871341, Sy2 = 0.545351286587
        CircularArc arc = CircularArc.of(Vec3.ZERO, 1, Vec3.X, Vec3.Y, -1, 1, TestCurves.SRC);
        Moments m = ArcMoments.of(arc);
        double gx = m.centroid().x();
        // about the centre: Sx2 = Cxx + m gx^2 (parallel axis)
        assertEquals(1.45464871341, m.covariance().xx() + m.mass() * gx * gx, 1e-11);
        assertEquals(0.545351286587, m.covariance().yy(), 1e-12);
    }

    @Test
    void ring_inertia_mr2_and_halfMr2() {
        // FACTS.md §5.2: thin ring m r^2 about its axis (universaldenker), m r^2/2 about a diameter (wiredfaculty)
        double r = 0.35;
        CircularArc ring = CircularArc.of(new Vec3(1, 2, 3), r, Vec3.X, Vec3.Y, 0, 2 * Math.PI, TestCurves.SRC);
        Moments m = ArcMoments.of(ring);
        double mass = m.mass();
        assertEquals(mass * r * r, m.inertia().zz(), CLOSED * mass * r * r);
        assertEquals(mass * r * r / 2, m.inertia().xx(), CLOSED * mass * r * r);
        assertEquals(mass * r * r / 2, m.inertia().yy(), CLOSED * mass * r * r);
        // the same ring as an exact rational NURBS through the adaptive integrator
        Moments n = adaptive(TestCurves.nurbsCircle(r).transformed(org.linemass.geometry.Affine.translation(
                new Vec3(1, 2, 3))));
        assertEquals(2 * Math.PI * r, n.mass(), REL * 2 * Math.PI * r);
        assertEquals(mass * r * r, n.inertia().zz(), 10 * REL * mass * r * r);
        assertTrue(n.centroid().closeTo(new Vec3(1, 2, 3), 1e-10));
    }

    @Test
    void arcSeries_meetsClosedFormAtSwitch() {
        // f1 and f2 switch from Taylor series to the closed forms at SERIES_BELOW; both sides must agree
        // there to a few ulps (f1 ~ 1.43, f2 ~ 0.24 at a = 1.5: the closed forms lose at most a digit)
        double a = Tolerances.ARC_SERIES_BELOW_RAD;
        double below = Math.nextDown(a);
        assertEquals(ArcMoments.f1(a), ArcMoments.f1(below), 1e-14);
        assertEquals(ArcMoments.f2(a), ArcMoments.f2(below), 1e-14);
        // small arcs, first two Taylor terms of a - sin a cos a and a + sin a cos a - 2 sin^2 a / a (derived by
        // hand from the sine and cosine series): 2a^3/3 - 2a^5/15 (the chord's L^3/12 / R^3 first) and
        // 2a^5/45 - 2a^7/315; the next terms are 1e-16 relative at a = 1e-4
        double t = 1e-4;
        assertEquals(2 * t * t * t / 3 - 2 * Math.pow(t, 5) / 15, ArcMoments.f1(t), 1e-15 * t * t * t);
        assertEquals(2 * Math.pow(t, 5) / 45 - 2 * Math.pow(t, 7) / 315, ArcMoments.f2(t), 1e-15 * Math.pow(t, 5));
    }

    @Test
    void rod_inertia_mL2over12() {
        // FACTS.md §5.2 (tiingu, astarmathsandphysics): m = 1 kg, L = 1000 mm -> 83 333.333 kg mm^2
        Straight s = new Straight(new Vec3(0, 0, 0), new Vec3(1.0, 0, 0), TestCurves.SRC);
        Moments m = StraightMoments.of(s).scaledDensity(1.0);
        assertEquals(0.0833333333333, m.inertia().yy(), 1e-12);
        assertEquals(0.0833333333333, m.inertia().zz(), 1e-12);
        assertEquals(0, m.inertia().xx(), 0);
    }

    @Test
    void arcClosedForm_equalsAdaptiveOnSameArc() {
        // two independent computations of the same integrals: closed form vs adaptive quadrature under a
        // density of exactly 1 written as a field (forces the numerical path)
        LinearDensity one = new LinearDensity() {
            @Override
            public double kgPerM(Vec3 p, double s) {
                return 1;
            }

            @Override
            public boolean usesArcLength() {
                return false;
            }
        };
        for (double sweep : new double[] {1e-6, 0.01, 0.7, 2.9, 2 * Math.PI}) {
            CircularArc arc = CircularArc.of(new Vec3(5, -2, 1), 3, new Vec3(1, 1, 0), new Vec3(0, 0, 1), 0.3,
                    0.3 + sweep, TestCurves.SRC);
            Moments c = ArcMoments.of(arc);
            Moments a = MomentIntegrator.integrate(arc, one, 0, REL, MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                    .moments();
            assertEquals(c.mass(), a.mass(), REL * c.mass());
            assertTrue(c.centroid().closeTo(a.centroid(), 1e-12 * 6), "centroid at sweep " + sweep);
            double scale = c.mass() * Math.pow(Math.min(3, c.mass()), 2);
            assertEquals(0, c.covariance().minus(a.covariance()).maxAbs(), 1e-9 * scale, "covariance at " + sweep);
        }
    }

    @Test
    void rationalArc_equalsCircularArc() {
        // an arc written as a rational quadratic spline (The NURBS Book 7.3) has the arc's exact moments
        double r = 2.5;
        double sweep = 2.0;
        Nurbs n = TestCurves.rationalArc(r, sweep);
        Moments a = adaptive(n);
        Moments c = ArcMoments.of(CircularArc.of(Vec3.ZERO, r, Vec3.X, Vec3.Y, 0, sweep, TestCurves.SRC));
        assertEquals(c.mass(), a.mass(), REL * c.mass());
        assertTrue(c.centroid().closeTo(a.centroid(), REL * r));
        assertEquals(0, c.covariance().minus(a.covariance()).maxAbs(), REL * c.mass() * r * r);
    }

    @Test
    void helix_lengthPerTurn() {
        // FACTS.md §5.2 (sciencing.com): D = 20, p = 5 -> 63.0304827876 per turn, 630.304827876 for 10 turns
        double rad = 10;
        double pitch = 5;
        double k = pitch / (2 * Math.PI);
        Nurbs helix = TestCurves.hermite(t -> new Vec3(rad * Math.cos(t), rad * Math.sin(t), k * t),
                t -> new Vec3(-rad * Math.sin(t), rad * Math.cos(t), k), 0, 20 * Math.PI, 10 * 256);
        Moments m = adaptive(helix);
        // Hermite interpolation with 256 pieces per turn: shape error ~ h^4/384 * r = 6e-10 * r; measured
        // length difference stays below 1e-9 relative, so compare at 1e-8 relative
        assertEquals(630.304827876, m.mass(), 1e-8 * 630.3);
        // centroid on the axis at mid-height (FACTS.md §5.2, symmetry), inertia about axis m (D/2)^2
        assertEquals(0, Math.hypot(m.centroid().x(), m.centroid().y()), 1e-6);
        assertEquals(25 , m.centroid().z(), 1e-6);
        assertEquals(m.mass() * rad * rad, m.inertia().zz(), 1e-7 * m.mass() * rad * rad);
    }

    @Test
    void catenary_length2aSinh() {
        // FACTS.md §5.2 (LibreTexts 19.3): a = 2, x0 = 3 -> 8.51711782038; centroid height a=1,x0=1 -> 1.19699938153
        double a = 2;
        Nurbs cat = TestCurves.hermite(x -> new Vec3(x, a * Math.cosh(x / a), 0),
                x -> new Vec3(1, Math.sinh(x / a), 0), -3, 3, 512);
        // Hermite interpolant error O(h^4), h = 6/512: below 1e-10 relative here; compare at 1e-9
        assertEquals(8.51711782038, adaptive(cat).mass(), 1e-9 * 8.5);
        Nurbs cat1 = TestCurves.hermite(x -> new Vec3(x, Math.cosh(x), 0),
                x -> new Vec3(1, Math.sinh(x), 0), -1, 1, 512);
        assertEquals(1.19699938153, adaptive(cat1).centroid().y(), 1e-9);
    }

    /**
     * Complete elliptic integral of the second kind E(m) (parameter convention, FACTS.md §5.3) by the
     * arithmetic-geometric mean: E = K (1 - sum 2^(n-1) c_n^2), K = pi / (2 a_N) (Abramowitz and Stegun
     * 17.6, from memory); converges quadratically and needs no quadrature.
     */
    static double ellipticE(double ratio) {
        double a = 1;
        double b = ratio;
        double c = Math.sqrt((1 - ratio) * (1 + ratio));
        double sum = c * c / 2;
        double pow = 0.5;
        for (int n = 1; n < 40 && c > 1e-300; n++) {
            double an = (a + b) / 2;
            c = (a - b) / 2;
            b = Math.sqrt(a * b);
            a = an;
            pow *= 2;
            sum += pow * c * c;
        }
        return Math.PI / (2 * a) * (1 - sum);
    }

    @Test
    void agmReference_reproducesFactsValues() {
        // FACTS.md §5.3: E(0.75) = 1.21105602756846 (a=2, b=1), E(8/9) = 1.11374110171294 (a=3, b=1)
        assertEquals(1.21105602756846, ellipticE(0.5), 1e-14);
        assertEquals(1.11374110171294, ellipticE(1.0 / 3), 1e-14);
    }

    @Test
    void flatEllipses_boundCoversError() {
        for (double ratio : new double[] {0.5, 0.1, 1e-2, 1e-3, 1e-4, 1e-6}) {
            double a = 1000;
            EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(a, 0, 0), new Vec3(0, a * ratio, 0), 0,
                    2 * Math.PI, TestCurves.SRC);
            Moments m = MomentIntegrator.lengthMoments(e, REL);
            double exact = 4 * a * ellipticE(ratio);
            double err = Math.abs(m.mass() - exact);
            // the AGM reference is good to a few ulps of 4000
            assertTrue(err <= m.errorBound() + 1e-12 * exact, "b/a " + ratio + ": error " + err + " bound "
                    + m.errorBound());
            assertTrue(err <= REL * exact, "b/a " + ratio + ": error " + err);
        }
    }

    @Test
    void longSpline_getsBudgetInProportion() {
        // a helix of 100 turns written as 25,600 cubic pieces: every span must be integrated, so the budget
        // grows with the spline; length per turn from FACTS.md §5.2: D = 20, p = 5 -> 63.0304827876
        double k = 5 / (2 * Math.PI);
        Nurbs helix = TestCurves.hermite(t -> new Vec3(10 * Math.cos(t), 10 * Math.sin(t), k * t),
                t -> new Vec3(-10 * Math.sin(t), 10 * Math.cos(t), k), 0, 200 * Math.PI, 100 * 256);
        MomentIntegrator.Result r = MomentIntegrator.integrate(helix, LinearDensity.UNIT, 0, REL,
                MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
        assertTrue(r.converged());
        // cuts at every knot only (no angle-based cuts for splines): one rule application per span suffices
        assertTrue(r.evaluations() <= 2L * 21 * 25_600, "evaluations " + r.evaluations());
        // Hermite interpolation error (O(h^4), measured about 5e-10 relative) dominates: compare at 1e-8
        assertEquals(6303.04827876, r.moments().mass(), 1e-8 * 6303);
    }

    @Test
    void evaluationCap_isRespected() {
        // the cap applies once it exceeds the per-piece minimum (8 rule applications per initial piece)
        EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(1000, 0, 0), new Vec3(0, 0.001, 0), 0, 2 * Math.PI,
                TestCurves.SRC);
        MomentIntegrator.Result r = MomentIntegrator.integrate(e, LinearDensity.UNIT, 0, 1e-14, 1000);
        assertTrue(r.evaluations() <= 1000, "evaluations " + r.evaluations());
        // perimeter 4a E(m) by the AGM (see ellipticE)
        double err = Math.abs(r.moments().mass() - 4000 * ellipticE(1e-6));
        assertTrue(err <= r.moments().errorBound() + 1e-9, "error " + err + " bound " + r.moments().errorBound());
        // a kink the cuts do not know about (sqrt|t - 1/3|) cannot reach 1e-12 in 420 evaluations: the run
        // stops at the cap, says so, and its bound still covers the error; exact value by antiderivative:
        // (2/3) ((1/3)^1.5 + (2/3)^1.5)
        Integrand kink = new Integrand() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void evaluate(double a, double b, double t, double[] out) {
                out[0] = Math.sqrt(Math.abs(t - 1.0 / 3));
            }
        };
        AdaptiveGaussKronrod.Result k = AdaptiveGaussKronrod.integrate(kink, new double[] {0, 1}, 1e-12, 0, 420);
        assertTrue(k.evaluations() <= 420);
        assertTrue(!k.converged());
        double exact = 2.0 / 3 * (Math.pow(1.0 / 3, 1.5) + Math.pow(2.0 / 3, 1.5));
        assertTrue(Math.abs(k.value(0) - exact) <= k.reportedBound(1e-12), "bound " + k.reportedBound(1e-12));
    }

}
