package org.linemass.engine.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.assemble.PieceForms;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * One drawn bar per shape code, classified in several orientations, mirrored and read from either
 * end. Expected lengths are worked by hand from the BS 8666:2005 Table 3 formulas (as reproduced on
 * reinforcement suppliers' shape-code pages, see {@link ShapeCode}) with the Table 2 radii (team
 * reference sheet, section 6.1); the exact centre-line length of each bar is worked by hand from its
 * straights and arcs, and for shape 11 checked against the reference sheet's closed form
 * A + B - 0.429204 r - 1.214602 d. Dimensions are compared to 1e-9 m (they are sums of a few exact
 * lengths); the formula lengths too.
 */
class ShapeClassifierTest {

    private static final double TOL = 1e-9;
    private static final Provenance SRC = Provenance.of("bar.dxf", "BAR", 1, "1", "LWPOLYLINE");

    private static final List<Affine> VIEWS = List.of(Affine.IDENTITY,
            rotation(new Vec3(1, 2, 3), 1.1, new Vec3(5, -2, 7)),
            Affine.scale(-1, 1, 1).andThen(rotation(new Vec3(0, 1, 1), -0.7, new Vec3(0, 0, 3))),
            Affine.scale(1, -1, 1).andThen(rotation(new Vec3(1, 0, 0), Math.PI / 2, Vec3.ZERO)));

    static ShapeResult classify(List<Segment> bar, boolean closed, double d) {
        BenderProgram p = PieceForms.of(bar, closed, d, 0, Math.toRadians(0.01), 1e-5).program();
        double len = bar.stream().mapToDouble(Curves::length).sum();
        return ShapeClassifier.classify(p, closed, d, len);
    }

    /** Every view, forwards and reversed: the code is the same; A..E as given forwards, reversed as given. */
    static void check(List<Segment> bar, double d, ShapeCode code, Double[] dims, Double[] reversedDims,
            double formula, double exact) {
        for (Affine m : VIEWS) {
            List<Segment> seen = bar.stream().map(s -> s.transformed(m)).toList();
            for (int dir = 0; dir < 2; dir++) {
                List<Segment> run = dir == 0 ? seen : reversed(seen);
                ShapeResult r = classify(run, false, d);
                assertEquals(code, r.code(), "view " + m + " dir " + dir + ": " + r.notes());
                Double[] want = dir == 0 ? dims : reversedDims;
                Double[] got = {r.aM(), r.bM(), r.cM(), r.dM(), r.eM()};
                for (int k = 0; k < want.length; k++) {
                    if (want[k] == null) {
                        assertEquals(null, got[k]);
                    } else {
                        assertEquals(want[k], got[k], TOL, "dimension " + "ABCDE".charAt(k));
                    }
                }
                assertEquals(formula, r.formulaLengthM(), TOL, "formula length");
                assertEquals(exact, r.exactLengthM(), TOL, "exact length");
            }
        }
    }

    @Test
    void shape00_straight() {
        List<Segment> bar = List.of(new Straight(Vec3.ZERO, new Vec3(1.2, 0, 0), SRC));
        check(bar, 0.012, ShapeCode.S00, new Double[] {1.2}, new Double[] {1.2}, 1.2, 1.2);
    }

    /** d 12, r 24 (Table 2), A 500, B 300 out-to-out: L = 500 + 300 - 12 - 12 = 776 mm. */
    @Test
    void shape11_oneRightAngleAtTheStandardRadius() {
        // centre-line: legs A - d/2 = 494 and B - d/2 = 294 to the corner, centre-line radius r + d/2 = 30
        List<Segment> bar = filleted(0.030, new Vec3(0.494, 0, 0), Vec3.ZERO, new Vec3(0, 0.294, 0));
        double exact = 0.494 + 0.294 - 2 * 0.030 + Math.PI / 2 * 0.030;
        // the reference sheet's closed form for the same bar
        assertEquals(0.8 - 0.429204 * 0.024 - 1.214602 * 0.012, exact, 1e-7);
        check(bar, 0.012, ShapeCode.S11, new Double[] {0.5, 0.3, null}, new Double[] {0.3, 0.5, null}, 0.776, exact);
    }

    /** d 12, R 60 (above r 24): A 500, B 300: L = 800 - 0.43 x 60 - 1.2 x 12 = 759.8 mm. */
    @Test
    void shape12_oneRightAngleAtALargerRadius() {
        List<Segment> bar = filleted(0.066, new Vec3(0.494, 0, 0), Vec3.ZERO, new Vec3(0, 0.294, 0));
        double exact = 0.494 + 0.294 - 2 * 0.066 + Math.PI / 2 * 0.066;
        check(bar, 0.012, ShapeCode.S12, new Double[] {0.5, 0.3}, new Double[] {0.3, 0.5}, 0.7598, exact);
    }

    /** d 10, r 20: straights 300 and 200, A 330, B 2(r + d) = 60, C 230: L = 330 + 34.2 + 230 - 16 = 578.2 mm. */
    @Test
    void shape13_oneHalfTurn() {
        List<Segment> bar = filleted(0.025, new Vec3(0.325, 0, 0), Vec3.ZERO, new Vec3(0, 0.05, 0),
                new Vec3(0.225, 0.05, 0));
        double exact = 0.3 + 0.2 + Math.PI * 0.025;
        check(bar, 0.010, ShapeCode.S13, new Double[] {0.33, 0.06, 0.23}, new Double[] {0.23, 0.06, 0.33}, 0.5782,
                exact);
    }

    /** One 45 degree bend, centre-line legs 400 and 300 to the corner: L = A + C = 700 mm. */
    @Test
    void shape15_oneBendOfAnotherAngle() {
        double s = Math.sqrt(0.5);
        List<Segment> bar = filleted(0.02, Vec3.ZERO, new Vec3(0.4, 0, 0), new Vec3(0.4 + 0.3 * s, 0.3 * s, 0));
        double back = 0.02 * Math.tan(Math.PI / 8);
        double exact = 0.7 - 2 * back + Math.PI / 4 * 0.02;
        check(bar, 0.010, ShapeCode.S15, new Double[] {0.4, null, 0.3}, new Double[] {0.3, null, 0.4}, 0.7, exact);
    }

    /** d 16, r 32: A 400, B 300, C 250 out-to-out: L = 950 - 32 - 32 = 886 mm. */
    @Test
    void shape21_channel() {
        List<Segment> bar = filleted(0.040, new Vec3(0, 0.242, 0), Vec3.ZERO, new Vec3(0.284, 0, 0),
                new Vec3(0.284, 0.392, 0));
        double exact = (0.242 - 0.04) + (0.284 - 0.08) + (0.392 - 0.04) + Math.PI * 0.04;
        // reference sheet's per-bend correction twice: 950 - 2 (0.429204 r + 1.214602 d)
        assertEquals(0.95 - 2 * (0.429204 * 0.032 + 1.214602 * 0.016), exact, 1e-7);
        check(bar, 0.016, ShapeCode.S21, new Double[] {0.25, 0.3, 0.4}, new Double[] {0.4, 0.3, 0.25}, 0.886, exact);
    }

    /** As 21 but the second bend the other way: L = 886 mm. */
    @Test
    void shape23_joggle() {
        List<Segment> bar = filleted(0.040, new Vec3(-0.242, 0, 0), Vec3.ZERO, new Vec3(0, 0.284, 0),
                new Vec3(0.392, 0.284, 0));
        double exact = (0.242 - 0.04) + (0.284 - 0.08) + (0.392 - 0.04) + Math.PI * 0.04;
        check(bar, 0.016, ShapeCode.S23, new Double[] {0.25, 0.3, 0.4}, new Double[] {0.4, 0.3, 0.25}, 0.886, exact);
    }

    /** A crank: two 30 degree bends opposite ways, centre-line legs 500, 200, 400: L = 1100 mm. */
    @Test
    void shape26_crank() {
        double c = Math.cos(Math.PI / 6);
        double s = Math.sin(Math.PI / 6);
        List<Segment> bar = filleted(0.03, Vec3.ZERO, new Vec3(0.5, 0, 0), new Vec3(0.5 + 0.2 * c, 0.2 * s, 0),
                new Vec3(0.9 + 0.2 * c, 0.2 * s, 0));
        double back = 0.03 * Math.tan(Math.PI / 12);
        double exact = 1.1 - 4 * back + 2 * Math.PI / 6 * 0.03;
        check(bar, 0.010, ShapeCode.S26, new Double[] {0.5, 0.2, 0.4}, new Double[] {0.4, 0.2, 0.5}, 1.1, exact);
    }

    /** d 8, r 16: A 200, B 300, C 300, D 150 out-to-out: L = 950 - 24 - 24 = 902 mm. */
    @Test
    void shape31_threeRightAngles() {
        List<Segment> bar = filleted(0.020, new Vec3(0.196, 0, 0), Vec3.ZERO, new Vec3(0, 0.292, 0),
                new Vec3(0.292, 0.292, 0), new Vec3(0.292, 0.146, 0));
        double exact = (0.196 - 0.02) + (0.292 - 0.04) + (0.292 - 0.04) + (0.146 - 0.02) + 1.5 * Math.PI * 0.02;
        check(bar, 0.008, ShapeCode.S31, new Double[] {0.2, 0.3, 0.3, 0.15}, new Double[] {0.15, 0.3, 0.3, 0.2},
                0.902, exact);
    }

    /** A bar curved to a radius of 2 m through 40 degrees: L = A, the arc length. */
    @Test
    void shape67_curvedBar() {
        double len = 2 * Math.toRadians(40);
        List<Segment> bar = List.of(CircularArc.of(Vec3.ZERO, 2, Vec3.X, Vec3.Y, 0, Math.toRadians(40), SRC));
        check(bar, 0.012, ShapeCode.S67, new Double[] {len}, new Double[] {len}, len, len);
    }

    @Test
    void spaceBar_isIsometric_andClosedLoop_isOther_andTightBendIsFlagged() {
        List<Segment> space = filleted(0.03, Vec3.ZERO, new Vec3(0.5, 0, 0), new Vec3(0.5, 0.3, 0),
                new Vec3(0.5, 0.3, 0.4));
        assertEquals(ShapeCode.ISOMETRIC, classify(space, false, 0.012).code());
        List<Segment> loop = new ArrayList<>(filleted(0.03, new Vec3(0.2, 0, 0), new Vec3(0.4, 0, 0),
                new Vec3(0.4, 0.3, 0), new Vec3(0, 0.3, 0), Vec3.ZERO, new Vec3(0.2, 0, 0)));
        ShapeResult closed = classify(loop, true, 0.012);
        assertEquals(ShapeCode.OTHER, closed.code());
        // d 12 at inside radius 10 mm, below Table 2's 24 mm
        ShapeResult tight = classify(filleted(0.016, new Vec3(0.494, 0, 0), Vec3.ZERO, new Vec3(0, 0.294, 0)),
                false, 0.012);
        assertTrue(tight.belowMinimumRadius());
        assertFalse(classify(filleted(0.030, new Vec3(0.494, 0, 0), Vec3.ZERO, new Vec3(0, 0.294, 0)), false, 0.012)
                .belowMinimumRadius());
    }

    @Test
    void tableTwo_radiiByBarSize() {
        // BS 8666:2005 Table 2 (team reference sheet 6.1, verified): d -> r
        double[][] rows = {{6, 12}, {8, 16}, {10, 20}, {12, 24}, {16, 32}, {20, 70}, {25, 87}, {32, 112}, {40, 140},
            {50, 175}};
        for (double[] row : rows) {
            assertEquals(row[1] / 1000, MinimumRadius.forDiameterM(row[0] / 1000).getAsDouble(), 1e-15);
        }
        assertTrue(MinimumRadius.forDiameterM(0.014).isEmpty());
    }

    static List<Segment> filleted(double radius, Vec3... corners) {
        List<Segment> out = new ArrayList<>();
        Vec3 from = corners[0];
        for (int i = 1; i + 1 < corners.length; i++) {
            Vec3 c = corners[i];
            Vec3 tin = c.minus(corners[i - 1]).unit();
            Vec3 tout = corners[i + 1].minus(c).unit();
            double theta = Math.atan2(tin.cross(tout).norm(), tin.dot(tout));
            double back = radius * Math.tan(theta / 2);
            Vec3 p1 = c.minus(tin.times(back));
            Vec3 n = tout.minus(tin.times(tout.dot(tin))).unit();
            if (from.distance(p1) > 1e-12) {
                out.add(new Straight(from, p1, SRC));
            }
            out.add(CircularArc.of(p1.plus(n.times(radius)), radius, n.negate(), tin, 0, theta, SRC));
            from = c.plus(tout.times(back));
        }
        Vec3 last = corners[corners.length - 1];
        if (from.distance(last) > 1e-12) {
            out.add(new Straight(from, last, SRC));
        }
        return out;
    }

    private static List<Segment> reversed(List<Segment> segs) {
        List<Segment> out = new ArrayList<>();
        for (int i = segs.size() - 1; i >= 0; i--) {
            out.add(segs.get(i).reversed());
        }
        return out;
    }

    private static Affine rotation(Vec3 axis, double angle, Vec3 shift) {
        Vec3 k = axis.unit();
        Vec3[] e = {Vec3.X, Vec3.Y, Vec3.Z};
        Vec3[] cols = new Vec3[3];
        for (int i = 0; i < 3; i++) {
            Vec3 v = e[i];
            cols[i] = v.times(Math.cos(angle)).plus(k.cross(v).times(Math.sin(angle)))
                    .plus(k.times(k.dot(v) * (1 - Math.cos(angle))));
        }
        return Affine.ofColumns(cols[0], cols[1], cols[2], shift);
    }
}
