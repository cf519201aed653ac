package org.linemass.engine.bender;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Bends under every affine image of a drawn bar: a crank with bends of 90, 45 and 60 degrees (a
 * fillet of 30 mm at each corner, built in closed form by {@link Bars}). The count never changes; a
 * bend's angle is the angle between its two mapped legs, which the test works out from the mapped
 * corner points alone (an affine map keeps lines straight and tangents tangent), and under a
 * similarity (rotation, mirror, uniform scale) it is the drawn angle. A sharp version of the same
 * bar has corners with no radius.
 */
class TransformedBendsTest {

    /** Plane angles add exactly, so sampled turning is exact up to rounding (see CorpusBendsTest). */
    private static final double ANGLE_RAD = 1e-11;
    private static final double ANGLE_TOL = Math.toRadians(0.01);
    private static final double JOIN_M = 1e-5;

    private static final Vec3[] CORNERS = {new Vec3(0, 0, 0), new Vec3(0.4, 0, 0), new Vec3(0.4, 0.3, 0),
        new Vec3(0.4 - 0.2 / Math.sqrt(2), 0.3 + 0.2 / Math.sqrt(2), 0), new Vec3(0.4 - 0.2 / Math.sqrt(2)
                - 0.25 * Math.cos(Math.toRadians(15)), 0.3 + 0.2 / Math.sqrt(2) - 0.25 * Math.sin(Math.toRadians(15)), 0)};

    private static final List<Affine> MAPS = List.of(Affine.IDENTITY,
            Bars.rotation(new Vec3(1, 2, 3), 1.1, new Vec3(5, -2, 7)),
            Affine.scale(-1, 1, 1).andThen(Bars.rotation(new Vec3(0, 1, 1), -0.7, Vec3.ZERO)),
            Affine.uniformScale(1.25),
            Affine.scale(1, 1.2, 0.8),
            Affine.scale(2, 0.5, 1).andThen(Bars.rotation(new Vec3(1, 0, 0), Math.PI / 2, Vec3.ZERO)),
            Affine.of(new double[] {1, 0.3, 0, 0, 1, 0, 0.2, 0, 1}, new Vec3(1, 1, 1)));

    private static List<FormRun.Turn> turns(List<Segment> segs) {
        return RunSplitter.split(segs, false, ANGLE_TOL, JOIN_M).stream().filter(r -> r instanceof FormRun.Turn)
                .map(r -> (FormRun.Turn) r).toList();
    }

    @Test
    void filletedCrank_keepsItsBendsUnderEveryAffineMap() {
        List<Segment> bar = Bars.of(0.03, CORNERS);
        for (Affine m : MAPS) {
            List<FormRun.Turn> t = turns(Bars.map(bar, m));
            assertEquals(3, t.size(), "bends under " + m);
            for (int i = 0; i < 3; i++) {
                Vec3 a = m.applyLinear(CORNERS[i + 1].minus(CORNERS[i]));
                Vec3 b = m.applyLinear(CORNERS[i + 2].minus(CORNERS[i + 1]));
                double expected = Math.atan2(a.cross(b).norm(), a.dot(b));
                assertEquals(expected, t.get(i).angleRad(), ANGLE_RAD, "bend " + i + " under " + m);
                // the bend plane is the plane of the two mapped legs
                Vec3 normal = a.cross(b).unit();
                assertEquals(1.0, Math.abs(normal.dot(t.get(i).axis())), 1e-9);
            }
        }
    }

    @Test
    void similarities_keepTheDrawnAnglesAndRadius() {
        double[] drawn = {90, 45, 60};
        List<Segment> bar = Bars.of(0.03, CORNERS);
        for (Affine m : List.of(MAPS.get(1), MAPS.get(2))) {
            List<FormRun.Turn> t = turns(Bars.map(bar, m));
            for (int i = 0; i < 3; i++) {
                assertEquals(Math.toRadians(drawn[i]), t.get(i).angleRad(), ANGLE_RAD);
                assertEquals(0.03, t.get(i).circleRadiusM(), 1e-12);
            }
        }
    }

    @Test
    void reversedBar_hasTheSameBendsInReverseOrder() {
        List<Segment> bar = Bars.map(Bars.of(0.03, CORNERS), Affine.scale(1, 1.2, 0.8));
        List<FormRun.Turn> fwd = turns(bar);
        List<FormRun.Turn> back = turns(Bars.reversed(bar));
        for (int i = 0; i < 3; i++) {
            assertEquals(fwd.get(i).angleRad(), back.get(2 - i).angleRad(), ANGLE_RAD);
            assertEquals(fwd.get(i).minRadiusM(), back.get(2 - i).minRadiusM(), 1e-9 * 0.03);
        }
    }

    @Test
    void sharpCrank_hasCornersWithoutRadius() {
        List<FormRun.Turn> t = turns(Bars.map(Bars.of(0, CORNERS), MAPS.get(1)));
        assertEquals(3, t.size());
        for (FormRun.Turn turn : t) {
            assertNull(turn.minRadiusM());
            assertEquals(0.0, turn.lengthM());
        }
    }
}
