package org.linemass.engine.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.api.Test;
import org.linemass.engine.moments.Moments;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Vec3;

/**
 * The fixed Gauss-Legendre rule and the pieces of its bound, each against something outside it:
 * Commons Math's Gauss-Legendre nodes, closed-form zeros, closed-form lengths.
 */
class SpanQuadratureTest {

    /** Nodes and weights: Commons Math computes them in high precision; a few units of 1e-16 apart. */
    private static final double NODE_TOL = 1e-15;

    @Test
    void nodes_twentyPoints_matchCommonsMath() {
        GaussIntegrator ref = new GaussIntegratorFactory().legendreHighPrecision(20, -1, 1);
        GaussLegendre rule = GaussLegendre.N20;
        assertEquals(20, ref.getNumberOfPoints());
        for (int i = 0; i < 20; i++) {
            assertEquals(ref.getPoint(i), rule.x[i], NODE_TOL, "node " + i);
            assertEquals(ref.getWeight(i), rule.w[i], NODE_TOL, "weight " + i);
        }
    }

    @Test
    void nodes_exactOnDegree39_notOn40() {
        // an n-point Gauss rule integrates x^(2n-1)-degree polynomials exactly (any numerical-analysis
        // text, e.g. Abramowitz and Stegun 25.4.29): int x^38 = 2/39, and x^40 is not exact
        GaussLegendre rule = GaussLegendre.N20;
        double s38 = 0;
        double s40 = 0;
        for (int i = 0; i < 20; i++) {
            s38 += rule.w[i] * Math.pow(rule.x[i], 38);
            s40 += rule.w[i] * Math.pow(rule.x[i], 40);
        }
        assertEquals(2.0 / 39, s38, 1e-15);
        assertTrue(Math.abs(s40 - 2.0 / 41) > 1e-12, "x^40: " + s40);
    }

    @Test
    void rho_ofImaginaryPoint_closedForm() {
        // z = i y lies on the Bernstein ellipse with semi-minor axis y: rho = y + sqrt(y^2 + 1)
        for (double y : new double[] {0.1, 1, 3}) {
            assertEquals(y + Math.sqrt(y * y + 1), PlanarZeros.rho(0, y), 1e-14, "y " + y);
        }
        // a real point beyond the interval: rho = x + sqrt(x^2 - 1)
        assertEquals(2 + Math.sqrt(3), PlanarZeros.rho(2, 0), 1e-14);
    }

    @Test
    void nearestRho_quadraticAndQuartic_closedFormRoots() {
        // g = z^2 + 4 (roots +-2i): rho = 2 + sqrt 5
        assertEquals(2 + Math.sqrt(5), PlanarZeros.nearestRho(new double[] {4, 0, 1}, new double[] {0, 0, 0}), 1e-12);
        // g = (z - 3i)(z - 2)(z + 5)(z - 4) expanded with complex coefficients: nearest is 2 (rho = 2 + sqrt 3)
        double[][] roots = {{0, 3}, {2, 0}, {-5, 0}, {4, 0}};
        double[] re = {1};
        double[] im = {0};
        for (double[] r : roots) {
            double[] nr = new double[re.length + 1];
            double[] ni = new double[re.length + 1];
            for (int k = 0; k < re.length; k++) {
                nr[k + 1] += re[k];
                ni[k + 1] += im[k];
                nr[k] -= re[k] * r[0] - im[k] * r[1];
                ni[k] -= re[k] * r[1] + im[k] * r[0];
            }
            re = nr;
            im = ni;
        }
        assertEquals(2 + Math.sqrt(3), PlanarZeros.nearestRho(re, im), 1e-9);
        assertEquals(Double.POSITIVE_INFINITY, PlanarZeros.nearestRho(new double[] {3}, new double[] {1}));
    }

    @Test
    void fixedRule_straightCubic_exactLengthAndTinyBound() {
        // a cubic with collinear, evenly spaced control points is a straight line of length 30 at
        // constant speed: the rule is exact and q is constant, so the bound only holds rounding
        Nurbs n = Nurbs.of(3, new double[] {0, 0, 0, 0, 1, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(10, 0, 0), new Vec3(20, 0, 0), new Vec3(30, 0, 0)}, null,
                TestCurves.SRC);
        PolynomialPiece p = new PolynomialPiece(n.spanPolynomial(3), 3, false);
        SpanQuadrature.Piece r = SpanQuadrature.integrate(p, 30, 1e-10);
        assertTrue(r.accepted());
        assertEquals(30, r.moments().mass(), 1e-12);
        assertEquals(15, r.moments().centroid().x(), 1e-12);
        // second moment of a uniform bar about its middle: m L^2 / 12 (any statics text)
        assertEquals(30 * 900 / 12.0, r.moments().covariance().xx(), 1e-9);
        assertTrue(r.moments().errorBound() < 1e-11, "bound " + r.moments().errorBound());
    }

    @Test
    void fixedRule_cusp_refusedAndLeftToTheAdaptiveRule() {
        // control points 0, 1, 0 along x (degree 2): the speed 2|1 - 2t| vanishes at t = 1/2, so q has a
        // zero on the interval itself and no ellipse can be used; the whole path gives the length 1
        Nurbs n = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(1, 0, 0), new Vec3(0, 0, 0)}, null, TestCurves.SRC);
        PolynomialPiece p = new PolynomialPiece(n.spanPolynomial(2), 2, false);
        assertFalse(SpanQuadrature.integrate(p, 1, 1e-10).accepted());
        Moments m = MomentIntegrator.lengthMoments(n, 1e-10);
        assertEquals(1, m.mass(), 1e-9);
    }

    @Test
    void fixedRule_ellipse_perimeterWithinBound() {
        // perimeter of the ellipse a = 3, b = 2: 4 a E(m), m = 1 - b^2 / a^2 (Abramowitz and Stegun 17.3),
        // = 15.86543958929059 by mpmath.ellipe at 30 digits
        EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(3, 0, 0), new Vec3(0, 2, 0), 0, 2 * Math.PI,
                TestCurves.SRC);
        MomentIntegrator.Result r = MomentIntegrator.integrate(e, LinearDensity.UNIT, 0, 1e-10,
                MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
        double err = Math.abs(r.moments().mass() - 15.865439589290589);
        assertTrue(err <= r.moments().errorBound(), "error " + err + " bound " + r.moments().errorBound());
        // four quarter turns, each by one application of the 20-point rule
        assertEquals(4 * 20, r.evaluations());
    }

    @Test
    void restricted_halves_sumToWhole() {
        // whole = sum of parts (common practice, no source): a piece's halves integrate to the piece
        Nurbs n = Nurbs.of(3, new double[] {0, 0, 0, 0, 1, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(3, 4, 0), new Vec3(6, -4, 0), new Vec3(9, 0, 0)}, null,
                TestCurves.SRC);
        PolynomialPiece p = new PolynomialPiece(n.spanPolynomial(3), 3, false);
        double whole = MomentIntegrator.integrateAdaptive(n, 1e-13, 1_000_000).moments().mass();
        // the S-bend's speed has zeros near the span (rho about 1.6), so the rule is used on quarters
        double sum = 0;
        double bounds = 0;
        for (int k = 0; k < 4; k++) {
            SpanQuadrature.Piece q = SpanQuadrature.integrate(p.restricted(-1 + 0.5 * k, -0.5 + 0.5 * k), 12, 1e-10);
            assertTrue(q.accepted(), "quarter " + k);
            sum += q.moments().mass();
            bounds += q.moments().errorBound();
        }
        assertEquals(whole, sum, bounds + 1e-12 * whole);
        assertFalse(SpanQuadrature.integrate(p, 12, 1e-10).accepted(), "the whole span is beyond 20 points");
    }
}
