package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Pieces with splines: a hanger hook made of a straight shank and a rational quadratic quarter
 * circle (The NURBS Book, example 7.1: weights 1, sqrt(2)/2, 1), copied rigidly. The spline
 * joins the straight tangentially, so the piece has no sharp corner; the spline is one bend of 90
 * degrees with the circle's radius (a bend is a change of direction through any curved run).
 */
class SplinePiecesTest {

    private static List<Segment> hanger(int line) {
        Provenance p = Provenance.of("t.dxf", "HANGER", line, Integer.toHexString(line), "SPLINE");
        double r = 0.03;
        double w = Math.sqrt(0.5);
        Straight shank = new Straight(new Vec3(0, -0.2, 0), Vec3.ZERO, p);
        // quarter circle of radius r about (r, 0): from (0, 0) up and round to (r, r)
        Nurbs arc = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(0, r, 0), new Vec3(r, r, 0)}, new double[] {1, w, 1}, p);
        return List.of(shank, arc);
    }

    @Test
    void shankAndSplineHook_isOnePieceWithOneBend_andCopiesShareAMark() {
        List<Segment> all = new ArrayList<>(hanger(10));
        all.addAll(Shapes.traced(Shapes.moved(hanger(11), Affine.rotationZ(2.0)
                .andThen(Affine.translation(new Vec3(1, 1, 0))))));
        PieceAnalysis r = PieceAnalyzer.analyze(all, Fixtures.tol(), Fixtures.none(), false);
        assertEquals(2, r.pieces().size());
        for (Piece p : r.pieces()) {
            assertEquals(2, p.segments().size());
            // the exact rational quarter circle: 90 degrees and radius r; the angle is a sum of angles
            // between sampled tangents (exact in a plane up to rounding), the radius |C'|^3/|C' x C''|
            // at samples of an exact circle, so both agree to rounding (1e-9 relative is ample)
            assertEquals(1, p.bends().size());
            assertEquals(90.0, p.bends().get(0).angleDeg(), 1e-7);
            assertEquals(0.03, p.bends().get(0).centreRadiusM(), 0.03 * 1e-9);
        }
        assertEquals(List.of(), r.findings());
        assertEquals(1, r.groups().size());
        OrderInvariancePropertyTest.assertWellFormed(r, Fixtures.tol().joinM());
    }

    @Test
    void splineHookWithAWiderCurl_isNotTheSameMark() {
        List<Segment> all = new ArrayList<>(hanger(10));
        // same shank, curl scaled by 1.01 about its start: a different piece by 0.3 mm
        List<Segment> other = hanger(11);
        Affine grow = Affine.uniformScale(1.01);
        all.add(other.get(0).transformed(Affine.translation(new Vec3(1, 0, 0))));
        all.add(other.get(1).transformed(grow.andThen(Affine.translation(new Vec3(1, 0, 0)))));
        PieceAnalysis r = PieceAnalyzer.analyze(all, Fixtures.tol(), Fixtures.none(), false);
        assertEquals(2, r.pieces().size());
        assertEquals(2, r.groups().size());
    }
}
