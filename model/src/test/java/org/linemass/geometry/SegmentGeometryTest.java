package org.linemass.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Exact evaluation of the segment family against closed-form geometry. Tolerance: 1e-12 relative
 * to unit-sized shapes, i.e. a few ulps of double arithmetic on O(1) values.
 */
class SegmentGeometryTest {

    private static final double TOL = 1e-12;
    private static final Provenance SRC = Provenance.of("test.dxf", "0", 1, "A", "TEST");

    @Test
    void nurbs_rationalQuadraticQuarterCircle_liesOnUnitCircle() {
        // The NURBS Book, section 7.2: a 90-degree arc is a rational quadratic with middle weight cos(45 deg).
        double w = Math.sqrt(0.5);
        Nurbs quarter = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {Vec3.of(1, 0, 0), Vec3.of(1, 1, 0), Vec3.of(0, 1, 0)}, new double[] {1, w, 1}, SRC);
        for (int i = 0; i <= 20; i++) {
            Vec3 p = quarter.point(i / 20.0);
            assertEquals(1.0, p.norm(), TOL, "radius at t=" + i / 20.0);
        }
        assertTrue(quarter.point(1).closeTo(Vec3.of(0, 1, 0), TOL));
    }

    @Test
    void nurbs_derivatives_matchCentralDifferences() {
        Nurbs s = Nurbs.of(3, new double[] {0, 0, 0, 0, 0.3, 0.7, 1, 1, 1, 1},
                new Vec3[] {Vec3.of(0, 0, 0), Vec3.of(1, 2, 0), Vec3.of(3, 3, 1), Vec3.of(4, 0, 2), Vec3.of(6, 1, 0),
                    Vec3.of(7, 3, 1)},
                new double[] {1, 0.8, 1.3, 1, 0.9, 1}, SRC);
        double h = 1e-5;
        // central difference error is O(h^2) times the third derivative: about 1e-9 for O(10) control values
        for (double t : new double[] {0.1, 0.25, 0.5, 0.69, 0.9}) {
            Vec3 fd = s.point(t + h).minus(s.point(t - h)).times(1 / (2 * h));
            assertTrue(fd.closeTo(s.derivative(t), 1e-6), "first derivative at " + t);
            Vec3 fd2 = s.derivative(t + h).minus(s.derivative(t - h)).times(1 / (2 * h));
            assertTrue(fd2.closeTo(s.secondDerivative(t), 1e-4), "second derivative at " + t);
        }
    }

    @Test
    void nurbs_reversed_tracesSamePointsBackwards() {
        Nurbs s = Nurbs.of(2, new double[] {0, 0, 0, 0.5, 1, 1, 1},
                new Vec3[] {Vec3.of(0, 0, 0), Vec3.of(1, 2, 0), Vec3.of(3, 3, 1), Vec3.of(4, 0, 2)},
                new double[] {1, 2, 1, 1}, SRC);
        Nurbs r = s.reversed();
        for (int i = 0; i <= 10; i++) {
            double t = i / 10.0;
            assertTrue(s.point(t).closeTo(r.point(-t), TOL), "point at " + t);
        }
    }

    @Test
    void nurbs_decreasingKnots_areRejectedWithIndex() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Nurbs.of(1,
                new double[] {0, 0, 1, 0.5}, new Vec3[] {Vec3.ZERO, Vec3.X}, null, SRC));
        assertTrue(e.getMessage().contains("decrease at index 3"), e.getMessage());
    }

    @Test
    void circularArc_nonUniformScale_becomesEllipticalArc() {
        CircularArc unit = CircularArc.of(Vec3.ZERO, 1, Vec3.X, Vec3.Y, 0, Math.PI / 2, SRC);
        Segment stretched = unit.transformed(Affine.scale(2, 1, 1));
        EllipticalArc e = assertInstanceOf(EllipticalArc.class, stretched);
        // x = 2 cos t, y = sin t: the point at t = pi/3 is (1, sqrt(3)/2)
        assertTrue(e.point(Math.PI / 3).closeTo(Vec3.of(1, Math.sqrt(3) / 2, 0), TOL));
    }

    @Test
    void circularArc_mirror_staysCircularAndKeepsLength() {
        CircularArc arc = CircularArc.of(Vec3.of(5, 0, 0), 1, Vec3.X, Vec3.Y, 0, Math.PI / 2, SRC);
        Segment m = arc.transformed(Affine.scale(-1, 1, 1));
        CircularArc c = assertInstanceOf(CircularArc.class, m);
        assertEquals(Math.PI / 2, c.length(), TOL);
        // FACTS.md §7.4 mirror test: centre (-5,0,0), start (-6,0,0), end (-5,1,0)
        assertTrue(c.start().closeTo(Vec3.of(-6, 0, 0), TOL));
        assertTrue(c.end().closeTo(Vec3.of(-5, 1, 0), TOL));
    }

    @Test
    void arcs_reversed_swapEnds() {
        CircularArc arc = CircularArc.of(Vec3.ZERO, 2, Vec3.X, Vec3.Y, 0.3, 2.0, SRC);
        CircularArc r = arc.reversed();
        assertTrue(arc.start().closeTo(r.end(), TOL));
        assertTrue(arc.end().closeTo(r.start(), TOL));
        assertEquals(arc.length(), r.length(), TOL);
    }

    @Test
    void circularArc_bounds_includeAxisExtremes() {
        // A half circle from 0 to pi reaches y = r at pi/2: box [-r, r] x [0, r]
        CircularArc half = CircularArc.of(Vec3.ZERO, 3, Vec3.X, Vec3.Y, 0, Math.PI, SRC);
        Box3 b = half.bounds();
        assertTrue(b.min().closeTo(Vec3.of(-3, 0, 0), 1e-12));
        assertTrue(b.max().closeTo(Vec3.of(3, 3, 0), 1e-12));
    }

    @Test
    void affine_similarityScale_acceptsRotationMirrorRejectsStretch() {
        Affine rotMirror = Affine.rotationZ(0.7).andThen(Affine.scale(-2, 2, 2));
        assertEquals(2.0, rotMirror.similarityScale(1e-12).orElseThrow(), 1e-12);
        assertTrue(rotMirror.determinant() < 0);
        assertTrue(Affine.scale(1, 1.2, 0.8).similarityScale(1e-12).isEmpty());
    }

    @Test
    void affine_andThen_appliesInOrder() {
        Affine move = Affine.translation(Vec3.of(1, 0, 0));
        Affine turn = Affine.rotationZ(Math.PI / 2);
        // first move (0,0,0) -> (1,0,0), then rotate 90 degrees -> (0,1,0)
        assertTrue(move.andThen(turn).apply(Vec3.ZERO).closeTo(Vec3.of(0, 1, 0), TOL));
    }
}
