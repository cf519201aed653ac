package org.linemass.engine.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.linemass.engine.moments.Moments;
import org.linemass.geometry.Affine;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Invariants of the moment integrals: the same point set traversed differently (reversed,
 * re-parametrised by knot insertion or degree elevation) has the same moments; moments of a
 * transformed curve are the transformed moments; splitting and recombining is exact.
 */
class InvariancePropertyTest {

    /** The bound for invariance: 1e-9 relative (the integrator aims at 1e-10 per integral). */
    private static final double REL = 1e-9;

    private static Moments moments(Segment s) {
        return MomentIntegrator.integrate(s, LinearDensity.UNIT, 0, 1e-10, MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                .moments();
    }

    static void assertSameMoments(Moments a, Moments b, double rel) {
        assertEquals(a.mass(), b.mass(), rel * a.mass(), "mass");
        double gyr = Math.sqrt(Math.max(a.covariance().trace(), 0) / a.mass());
        double size = gyr + 1e-300;
        assertTrue(a.centroid().closeTo(b.centroid(), rel * (size + a.centroid().norm())),
                "centroid " + a.centroid() + " vs " + b.centroid());
        double scale = a.mass() * size * size;
        assertEquals(0, a.covariance().minus(b.covariance()).maxAbs(), rel * scale * 10, "covariance");
    }

    @Provide
    Arbitrary<Nurbs> splines() {
        Arbitrary<Double> c = Arbitraries.doubles().between(-10, 10);
        Arbitrary<Vec3> point = Combinators.combine(c, c, c).as(Vec3::new);
        Arbitrary<Integer> degree = Arbitraries.integers().between(1, 4);
        return degree.flatMap(p -> point.list().ofMinSize(p + 1).ofMaxSize(p + 5).flatMap(pts ->
                Arbitraries.doubles().between(0.3, 3).list().ofSize(pts.size()).map(w -> {
                    int n = pts.size();
                    double[] k = new double[n + p + 1];
                    for (int i = 0; i < k.length; i++) {
                        k[i] = Math.min(Math.max(i - p, 0), n - p);
                    }
                    return Nurbs.of(p, k, pts.toArray(new Vec3[0]), w.stream().mapToDouble(Double::doubleValue).toArray(),
                            TestCurves.SRC);
                })));
    }

    @Provide
    Arbitrary<EllipticalArc> ellipses() {
        Arbitrary<Double> c = Arbitraries.doubles().between(-5, 5);
        Arbitrary<Vec3> v = Combinators.combine(c, c, c).as(Vec3::new).filter(x -> x.norm() > 0.1);
        return Combinators.combine(v, v, v, Arbitraries.doubles().between(-3, 3), Arbitraries.doubles().between(0.05, 6.28))
                .as((centre, u, w, t0, sweep) -> new EllipticalArc(centre, u, w, t0, t0 + sweep, TestCurves.SRC))
                .filter(e -> e.u().cross(e.v()).norm() > 0.05 * e.u().norm() * e.v().norm());
    }

    @Property(tries = 60)
    void reversing_keepsMoments(@ForAll("splines") Nurbs n) {
        Moments a = moments(n);
        if (a.mass() < 1e-6) {
            return;
        }
        assertSameMoments(a, moments(n.reversed()), REL);
    }

    @Property(tries = 60)
    void reversingEllipse_keepsMoments(@ForAll("ellipses") EllipticalArc e) {
        assertSameMoments(moments(e), moments(e.reversed()), REL);
    }

    @Property(tries = 60)
    void knotInsertion_keepsMoments(@ForAll("splines") Nurbs n, @ForAll @DoubleRange(min = 0.01, max = 0.99) double f) {
        Moments a = moments(n);
        if (a.mass() < 1e-6) {
            return;
        }
        double u = n.tStart() + f * (n.tEnd() - n.tStart());
        assertSameMoments(a, moments(NurbsOps.insertKnot(n, u)), REL);
    }

    @Property(tries = 60)
    void degreeElevation_keepsMoments(@ForAll("splines") Nurbs n) {
        int p = n.degree();
        Vec3[] pts = java.util.Arrays.copyOf(n.controlPoints(), p + 1);
        double[] w = java.util.Arrays.copyOf(n.weights(), p + 1);
        double[] k = new double[2 * p + 2];
        java.util.Arrays.fill(k, p + 1, k.length, 1.0);
        Nurbs bezier = Nurbs.of(p, k, pts, w, TestCurves.SRC);
        Moments a = moments(bezier);
        if (a.mass() < 1e-6) {
            return;
        }
        assertSameMoments(a, moments(NurbsOps.elevateBezier(bezier)), REL);
    }

    @Property(tries = 40)
    void rationalArc_matchesClosedForm(@ForAll @DoubleRange(min = 0.001, max = 1000) @net.jqwik.api.constraints.Scale(4) double r,
            @ForAll @DoubleRange(min = 0.01, max = 2.6) double sweep) {
        Moments n = moments(TestCurves.rationalArc(r, sweep));
        Moments c = ArcMoments.of(org.linemass.geometry.CircularArc.of(Vec3.ZERO, r, Vec3.X, Vec3.Y, 0, sweep,
                TestCurves.SRC));
        assertSameMoments(c, n, REL);
    }

    @Property(tries = 60)
    void similarity_transformsMoments(@ForAll("ellipses") EllipticalArc e,
            @ForAll @DoubleRange(min = -3.2, max = 3.2) double angle, @ForAll @DoubleRange(min = 0.01, max = 100) double s,
            @ForAll boolean mirror) {
        Affine map = Affine.rotationZ(angle).andThen(Affine.uniformScale(s))
                .andThen(mirror ? Affine.scale(1, -1, 1) : Affine.IDENTITY)
                .andThen(Affine.translation(new Vec3(3, -7, 11)));
        Moments transformed = moments(e).transformedBySimilarity(map, s);
        assertSameMoments(moments(e.transformed(map)), transformed, REL);
    }

    @Property(tries = 60)
    void splitting_combinesByParallelAxis(@ForAll("ellipses") EllipticalArc e,
            @ForAll @DoubleRange(min = 0.05, max = 0.95) double f) {
        double tm = e.t0() + f * (e.t1() - e.t0());
        Moments left = moments(EllipticalArc.of(e.centre(), e.u(), e.v(), e.t0(), tm, TestCurves.SRC));
        Moments right = moments(EllipticalArc.of(e.centre(), e.u(), e.v(), tm, e.t1(), TestCurves.SRC));
        Moments whole = moments(e);
        assertSameMoments(whole, left.plus(right), REL);
        // removing a part is the inverse of adding it
        assertSameMoments(left, whole.minus(right), 1e-8);
    }
}
