package org.linemass.engine.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Shape 77, a helix, on a coil drawn as a uniform cubic B-spline whose control points lie on a helix of
 * radius 50 mm rising 12 mm a turn, sixteen to the turn, for five turns. Such a spline is a helix of
 * the same pitch and axis whose radius is the control radius times (4 + 2 cos(2 pi / 16)) / 6 at the
 * knots (the uniform cubic B-spline's point is (P[i-1] + 4 P[i] + P[i+1]) / 6; worked by hand) and
 * wobbles between them by less than 1e-4 of it. BS 8666:2005 Table 3 as reproduced on suppliers'
 * shape-code pages: A the outside diameter, B the pitch, C the number of turns, L = C pi (A - d) while
 * B is at most A/5.
 */
class HelixShapeTest {

    private static final double D = 0.006;
    private static final double CONTROL_RADIUS = 0.05;
    private static final double PITCH = 0.012;
    private static final int PER_TURN = 16;
    private static final int TURNS = 5;
    /** The spline's radius wobbles by under 1e-4 relative between knots (worked by hand): 1e-5 m on A. */
    private static final double A_TOL = 1e-5;
    private static final Provenance SRC = Provenance.of("spring.dxf", "SPRING", 1, "1", "SPLINE");

    @Test
    void shape77_helixIsAHelixInEveryView() {
        double radius = CONTROL_RADIUS * (4 + 2 * Math.cos(2 * Math.PI / PER_TURN)) / 6;
        double a = 2 * radius + D;
        for (Affine view : List.of(Affine.IDENTITY, Affine.scale(-1, 1, 1),
                Affine.ofColumns(new Vec3(0, 0, 1), new Vec3(1, 0, 0), new Vec3(0, 1, 0), new Vec3(3, -1, 2)))) {
            List<Segment> coil = List.of(helix().transformed(view));
            ShapeResult r = ShapeClassifierTest.classify(coil, false, D);
            assertEquals(ShapeCode.S77, r.code(), r.notes().toString());
            assertEquals(a, r.aM(), A_TOL, "A, outside diameter");
            assertEquals(PITCH, r.bM(), 1e-6, "B, pitch: the spline rises exactly 12 mm a turn");
            assertEquals(TURNS, r.cM(), 1e-3, "C, turns: five whole turns of spans");
            // the standard's formula on the classifier's own dimensions, to rounding
            assertEquals(r.cM() * Math.PI * (r.aM() - D), r.formulaLengthM(), 1e-12);
            // and near the helix of that radius and pitch: C sqrt((2 pi radius)^2 + B^2), 1e-4 relative
            double helix = TURNS * Math.hypot(2 * Math.PI * radius, PITCH);
            assertEquals(helix, r.exactLengthM(), 1e-4 * helix, "exact length");
        }
    }

    private static Nurbs helix() {
        int spans = PER_TURN * TURNS;
        Vec3[] p = new Vec3[spans + 3];
        for (int i = 0; i < p.length; i++) {
            double t = 2 * Math.PI * (i - 1) / PER_TURN;
            p[i] = new Vec3(CONTROL_RADIUS * Math.cos(t), CONTROL_RADIUS * Math.sin(t), PITCH * t / (2 * Math.PI));
        }
        double[] knots = new double[p.length + 4];
        for (int i = 0; i < knots.length; i++) {
            knots[i] = i;
        }
        return Nurbs.of(3, knots, p, null, SRC);
    }
}
