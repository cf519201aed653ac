package org.linemass.engine.pieces.geom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.engine.pieces.index.PointGrid;

/** Lengths, tangents and closest points against closed forms and brute-force references. */
class CurvesAndClosestPointsTest {

    private static final Provenance P = Provenance.of("t.dxf", "0", 1, "1", "LINE");

    @Test
    void ellipsePerimeter_matchesTheFactsSheetValue() {
        // FACTS.md 5.3: a = 2, b = 1: perimeter 4 a E(e^2 = 3/4) = 9.688448220547675...
        // (complete elliptic integral of the second kind; value also in Abramowitz and Stegun 17.3)
        EllipticalArc e = EllipticalArc.of(Vec3.ZERO, new Vec3(2, 0, 0), new Vec3(0, 1, 0), 0, 2 * Math.PI, P);
        // composite 5-point Gauss-Legendre on 16 panels: measured error 1.1e-10 relative on this
        // eccentric ellipse; the stage needs lengths only for decisions at the join tolerance
        // (1e-5 m), so a 1e-9 relative bound is ample and still fails on any real mistake
        assertEquals(9.688448220547675, Curves.length(e), 9.7e-9);
    }

    @Test
    void rationalQuadraticQuarterCircle_hasLengthPiROverTwo() {
        // The NURBS Book, example 7.1: weights 1, sqrt(2)/2, 1 give an exact quarter circle
        double w = Math.sqrt(0.5);
        Nurbs q = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(1, 0, 0), new Vec3(1, 1, 0), new Vec3(0, 1, 0)}, new double[] {1, w, 1}, P);
        assertEquals(Math.PI / 2, Curves.length(q), 1e-9);
        Vec3 t0 = Curves.startTangent(q);
        assertTrue(t0.distance(Vec3.Y) < 1e-12, "tangent at (1, 0) is +y: " + t0);
    }

    @Test
    void pointToArc_isTheRadialDistance() {
        CircularArc a = CircularArc.of(Vec3.ZERO, 2, Vec3.X, Vec3.Y, 0, Math.PI, P);
        Contact c = ClosestPoints.toPoint(a, new Vec3(3, 3, 0));
        // closed form: |p| - r = 3 sqrt 2 - 2, foot at r p / |p|
        assertEquals(3 * Math.sqrt(2) - 2, c.distance(), 1e-14);
        // beyond the arc's end the nearest point is the end (-2, 0)
        Contact d = ClosestPoints.toPoint(a, new Vec3(-1, -5, 0));
        assertTrue(d.pa().distance(new Vec3(-2, 0, 0)) < 1e-14);
    }

    @Test
    void pointToEllipse_newtonAgreesWithDenseSampling() {
        EllipticalArc e = EllipticalArc.of(new Vec3(1, 2, 0), new Vec3(3, 1, 0), new Vec3(-0.5, 1.5, 0.2), 0.3, 4.0, P);
        Random rnd = new Random(7);
        for (int k = 0; k < 50; k++) {
            Vec3 p = new Vec3(rnd.nextDouble() * 8 - 3, rnd.nextDouble() * 8 - 2, rnd.nextDouble() - 0.5);
            double brute = Double.POSITIVE_INFINITY;
            int n = 200_000;
            for (int i = 0; i <= n; i++) {
                brute = Math.min(brute, e.point(0.3 + 3.7 * i / n).distance(p));
            }
            // dense sampling overestimates by at most half a step squared over the radius (~1e-9 here)
            double newton = ClosestPoints.toPoint(e, p).distance();
            assertTrue(newton <= brute + 1e-12, "never worse than sampling");
            assertEquals(brute, newton, 1e-8);
        }
    }

    @Test
    void arcAgainstLine_newtonFindsTheIntersection() {
        CircularArc a = CircularArc.of(Vec3.ZERO, 1, Vec3.X, Vec3.Y, 0, Math.PI, P);
        Straight s = new Straight(new Vec3(-2, 0.5, 0), new Vec3(2, 0.5, 0), P);
        Contact c = ClosestPoints.between(a, s);
        assertEquals(0, c.distance(), 1e-12);
        // y = 0.5 on the unit circle: x = +- sqrt(3)/2
        assertEquals(Math.sqrt(3) / 2, Math.abs(c.pa().x()), 1e-9);
    }

    @Test
    void segmentSegment_matchesBruteForceOnRandomSegments() {
        Random rnd = new Random(11);
        for (int k = 0; k < 200; k++) {
            Vec3[] v = new Vec3[4];
            for (int i = 0; i < 4; i++) {
                v[i] = new Vec3(rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian());
            }
            double[] st = ClosestPoints.segmentSegment(v[0], v[1], v[2], v[3]);
            double d = v[0].plusScaled(v[1].minus(v[0]), st[0]).distance(v[2].plusScaled(v[3].minus(v[2]), st[1]));
            double brute = Double.POSITIVE_INFINITY;
            int n = 400;
            for (int i = 0; i <= n; i++) {
                Vec3 p = v[0].plusScaled(v[1].minus(v[0]), (double) i / n);
                double t = ClosestPoints.projectClamped(v[2], v[3], p);
                brute = Math.min(brute, p.distance(v[2].plusScaled(v[3].minus(v[2]), t)));
            }
            assertTrue(d <= brute + 1e-12, "closed form is the minimum");
            // sampling one side in 400 steps leaves at most ~ (|d1| / 400) of slack
            assertEquals(brute, d, v[0].distance(v[1]) / 400 + 1e-12);
        }
    }

    @Test
    void pointGrid_findsExactlyThePointsWithinTheRadius() {
        Random rnd = new Random(3);
        int n = 5000;
        double r = 0.01;
        double[] xyz = new double[3 * n];
        int[] group = new int[n];
        for (int i = 0; i < 3 * n; i++) {
            xyz[i] = rnd.nextDouble() * 0.5 - 0.25;
        }
        for (int i = 0; i < n; i++) {
            group[i] = rnd.nextInt(2);
        }
        PointGrid grid = new PointGrid(xyz, group, r);
        for (int q = 0; q < 300; q++) {
            double x = rnd.nextDouble() * 0.5 - 0.25;
            double y = rnd.nextDouble() * 0.5 - 0.25;
            double z = rnd.nextDouble() * 0.5 - 0.25;
            int g = rnd.nextInt(2);
            List<Integer> expected = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                if (group[i] == g && grid.distanceSq(i, x, y, z) <= r * r) {
                    expected.add(i);
                }
            }
            List<Integer> got = new ArrayList<>();
            grid.near(x, y, z, g, i -> {
                if (grid.distanceSq(i, x, y, z) <= r * r) {
                    got.add(i);
                }
            });
            got.sort(null);
            assertEquals(expected, got);
        }
    }
}
