package org.linemass.engine.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class FieldIntegrationTest {

    private static final Provenance SRC = Provenance.of("t", "W", 0, "", "TEST");
    /** The integrators' default target. */
    private static final double REL = 1e-10;

    @Test
    void integralOfS_isHalfLengthSquared_onEllipse() throws AnalysisException {
        // for any curve, the integral of s ds from 0 to L is L^2 / 2 (closed form); L from FACTS.md §5.3
        double perimeter = 9.6884482205476761984;
        EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(2, 0, 0), new Vec3(0, 1, 0), 0, 2 * Math.PI, SRC);
        LineIntegral.Value v = LineIntegral.along(List.of(e), FieldExpression.parse("s", "W", false), REL);
        assertEquals(perimeter * perimeter / 2, v.value(), 10 * REL * perimeter * perimeter / 2);
        assertTrue(Math.abs(v.value() - perimeter * perimeter / 2) <= v.errorBound() + 1e-12 * perimeter * perimeter,
                "bound " + v.errorBound());
        assertEquals(perimeter, v.lengthM(), REL * perimeter);
    }

    @Test
    void integralOfS_continuesAcrossSegments() throws AnalysisException {
        // a piece of a 3 m straight, a quarter circle of radius 2 and a spline: integral of s = L^2 / 2
        Straight a = new Straight(Vec3.ZERO, new Vec3(3, 0, 0), SRC);
        CircularArc b = CircularArc.of(new Vec3(3, 2, 0), 2, new Vec3(0, -1, 0), Vec3.X, 0, Math.PI / 2, SRC);
        Nurbs c = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1}, new Vec3[] {new Vec3(5, 2, 0), new Vec3(5, 4, 0),
            new Vec3(7, 5, 1)}, null, SRC);
        double length = 3 + Math.PI + MomentIntegrator.lengthMoments(c, 1e-13).mass();
        LineIntegral.Value v = LineIntegral.along(List.<Segment>of(a, b, c), FieldExpression.parse("s", "W", false),
                REL);
        assertEquals(length * length / 2, v.value(), 10 * REL * length * length);
        // and as a density: the moment integrator under lambda = s gives the same mass
        FieldDensity d = new FieldDensity(FieldExpression.parse("s", "W", true));
        double mass = 0;
        double s0 = 0;
        for (Segment s : List.<Segment>of(a, b, c)) {
            mass += MomentIntegrator.integrate(s, d, s0, REL, MomentIntegrator.DEFAULT_MAX_EVALUATIONS).moments().mass();
            s0 += MomentIntegrator.lengthMoments(s, 1e-13).mass();
        }
        assertEquals(length * length / 2, mass, 10 * REL * length * length);
    }

    @Test
    void signChangingIntegrand_hasSmallAbsoluteError() throws AnalysisException {
        // odd function over a symmetric straight: exactly 0; the bound is relative to the integral of |x|
        Straight s = new Straight(new Vec3(-1, 0, 0), new Vec3(1, 0, 0), SRC);
        LineIntegral.Value v = LineIntegral.along(List.of(s), FieldExpression.parse("x^3", "W", false), REL);
        assertEquals(0, v.value(), 1e-15);
        // linear density gradient along x: integral of (2 + x) over [-1, 1] is 4, centroid at 1/6 (closed form)
        Moments m = MomentIntegrator.integrate(s, new FieldDensity(FieldExpression.parse("2 + x", "W", true)), 0, REL,
                MomentIntegrator.DEFAULT_MAX_EVALUATIONS).moments();
        assertEquals(4, m.mass(), 4 * REL);
        assertEquals(1.0 / 6, m.centroid().x(), REL);
    }

    @Test
    void failureAtAnEnd_isReported() throws AnalysisException {
        // 1 / x on a wire starting at x = 0 diverges; no quadrature node sits on the end, so the ends are probed
        Straight s = new Straight(Vec3.ZERO, new Vec3(1, 0, 0), SRC);
        FieldExpression f = FieldExpression.parse("1 / x", "W", true);
        FieldException e = assertThrows(FieldException.class, () -> MomentIntegrator.integrate(s, new FieldDensity(f),
                0, REL, MomentIntegrator.DEFAULT_MAX_EVALUATIONS));
        assertTrue(e.getMessage().contains("x=0"), e.getMessage());
        assertThrows(FieldException.class, () -> LineIntegral.along(List.of(s.reversed()),
                FieldExpression.parse("1 / x", "W", false), REL));
    }

    @Test
    void badExpressions_areReported() {
        assertThrows(AnalysisException.class, () -> FieldExpression.parse("x +", "W", true));
        assertThrows(AnalysisException.class, () -> FieldExpression.parse("foo(x)", "W", true));
        FieldExpression sqrt = assertDoesParse("sqrt(x)");
        FieldException e = assertThrows(FieldException.class, () -> sqrt.at(new Vec3(-1, 0, 0), 0));
        assertTrue(e.getMessage().contains("NaN") && e.getMessage().contains("x=-1"), e.getMessage());
    }

    private static FieldExpression assertDoesParse(String text) {
        try {
            return FieldExpression.parse(text, "W", true);
        } catch (AnalysisException e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }
}
