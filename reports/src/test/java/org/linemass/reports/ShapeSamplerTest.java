package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class ShapeSamplerTest {

    private static final Provenance P = Provenance.of("t.dxf", "L", 1, "", "LINE");
    /** Points are evaluated on the exact circle: only rounding, 1e-12 m on a 0.1 m radius. */
    private static final double ON_CURVE = 1e-12;

    @Test
    void sample_straightsGiveTheirEnds_sharedEndsOnce() {
        List<Segment> piece = List.of(new Straight(Vec3.ZERO, Vec3.X, P), new Straight(Vec3.X, new Vec3(1, 1, 0), P));
        assertEquals(List.of(Vec3.ZERO, Vec3.X, new Vec3(1, 1, 0)), ShapeSampler.sample(piece, 1e-3));
    }

    @Test
    void sample_fullCircle_pointsOnCircleAndSagittaWithinTolerance() {
        double r = 0.1;
        double chord = 1e-4;
        CircularArc c = CircularArc.of(Vec3.ZERO, r, Vec3.X, Vec3.Y, 0, 2 * Math.PI, P);
        List<Vec3> pts = ShapeSampler.sample(List.of(c), chord);
        double maxStep = 0;
        for (int i = 0; i < pts.size(); i++) {
            assertEquals(r, pts.get(i).norm(), ON_CURVE);
            if (i > 0) {
                maxStep = Math.max(maxStep, pts.get(i).distance(pts.get(i - 1)));
            }
        }
        // closed form: a chord of length c on radius r has sagitta r - sqrt(r^2 - c^2/4)
        double sagitta = r - Math.sqrt(r * r - maxStep * maxStep / 4);
        assertTrue(sagitta <= chord, "sagitta " + sagitta);
        assertTrue(pts.get(0).closeTo(pts.get(pts.size() - 1), ON_CURVE), "closed circle returns to its start");
        assertTrue(pts.size() < 200, "no more points than needed: " + pts.size());
    }

    @Test
    void sample_badTolerance_rejected() {
        assertThrows(IllegalArgumentException.class, () -> ShapeSampler.sample(List.of(), 0));
    }
}
