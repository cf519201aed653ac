package org.linemass.engine.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.linemass.engine.shape.ShapeClassifierTest.check;
import static org.linemass.engine.shape.ShapeClassifierTest.filleted;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * One drawn bar for each of the shape codes 22, 25, 33, 34, 36, 41, 44, 47, 51, 52 and 63, classified in
 * every view of {@link ShapeClassifierTest} (rotated, mirrored, read from either end). Each bar is a
 * 10 mm bar (Table 2 radius r = 20 mm, BS 8666:2005 Table 2 in the team reference sheet, section 6.1)
 * drawn with centre-line radius r + d/2 = 25 mm at every bend, so out-to-out legs are the centre-line
 * corner distances plus d/2 for each 90 or 180 degree bend at their ends. The formulas are BS 8666:2005
 * Table 3 as reproduced on suppliers' shape-code pages (see {@link ShapeCode}; 52 from the 2020
 * edition, unverified); which leg is which follows the shape drawings described in {@link ShapeCode}
 * (not checked against the printed standard). Expected dimensions and lengths are worked by hand in
 * each test's comment; exact lengths are straights plus arcs. Compared to 1e-9 m: sums of a few exact
 * lengths.
 */
class MoreShapesTest {

    private static final double D = 0.010;
    private static final double R = 0.025;
    private static final double S = Math.sqrt(0.5);
    private static final Provenance SRC = Provenance.of("bar.dxf", "BAR", 1, "1", "LWPOLYLINE");

    /**
     * Legs 300 at 60 degrees, 500, 250 at 45 degrees, both bends the same way, to the intersection points:
     * A 300, B 250, C 300 sin 60, D 250 sin 45, E 500; L = A + B + E = 1050 mm.
     */
    @Test
    void shape25_twoAngledBendsTheSameWay() {
        Vec3 p0 = new Vec3(-0.15, 0.3 * Math.sqrt(3) / 2, 0);
        List<Segment> bar = filleted(R, p0, Vec3.ZERO, new Vec3(0.5, 0, 0), new Vec3(0.5 + 0.25 * S, 0.25 * S, 0));
        double exact = 1.05 - 2 * R * (Math.tan(Math.PI / 6) + Math.tan(Math.PI / 8)) + R * (Math.PI / 3 + Math.PI / 4);
        double c = 0.3 * Math.sin(Math.PI / 3);
        double d = 0.25 * S;
        check(bar, D, ShapeCode.S25, new Double[] {0.3, 0.25, c, d, 0.5}, new Double[] {0.25, 0.3, d, c, 0.5}, 1.05,
                exact);
    }

    /**
     * End leg 300 (centre-line corner), two 180 degree loops and the other end leg 300 the same way:
     * A 400 + d = 410, B 2(r + d) = 60, C 300 + d/2 = 305; L = 2A + 1.7B + 2C - 4d = 1492 mm.
     */
    @Test
    void shape33_doubleLoop() {
        List<Segment> bar = filleted(R, new Vec3(0.1, 0, 0), new Vec3(0.4, 0, 0), new Vec3(0.4, 0.05, 0),
                new Vec3(0, 0.05, 0), Vec3.ZERO, new Vec3(0.4, 0, 0), new Vec3(0.4, 0.05, 0), new Vec3(0.1, 0.05, 0));
        double exact = 2 * 0.275 + 2 * 0.35 + 3 * Math.PI * R;
        Double[] dims = {0.41, 0.06, 0.305, null, null};
        check(bar, D, ShapeCode.S33, dims, dims, 1.492, exact);
    }

    /**
     * A 300 to the first corner, up 30 degrees for B 200 (offset D = 200 sin 30 = 100), back parallel for
     * 250 to a 90 degree bend the way of the second, then 200 down: C 255, E 205 out-to-out;
     * L = A + B + C + E - 0.5r - d = 940 mm. Read from either end, the dimensions start at A.
     */
    @Test
    void shape34_crankThenRightAngle() {
        Vec3 p2 = new Vec3(0.3 + 0.2 * Math.cos(Math.PI / 6), 0.1, 0);
        Vec3 p3 = p2.plus(new Vec3(0.25, 0, 0));
        List<Segment> bar = filleted(R, Vec3.ZERO, new Vec3(0.3, 0, 0), p2, p3, new Vec3(p3.x(), -0.1, 0));
        double exact = 0.95 - 4 * R * Math.tan(Math.PI / 12) + 2 * R * Math.PI / 6 - 2 * R + R * Math.PI / 2;
        Double[] dims = {0.3, 0.2, 0.255, 0.1, 0.205};
        check(bar, D, ShapeCode.S34, dims, dims, 0.94, exact);
    }

    /**
     * A 250 inclined at 30 degrees (rise E = 125), B 400, C 300, D 250 centre-line, all turning the same
     * way: B 405, C 310, D 255 out-to-out; L = A + B + C + D - r - 2d = 1180 mm.
     */
    @Test
    void shape36_angledEndThenTwoRightAngles() {
        Vec3 p0 = new Vec3(-0.25 * Math.cos(Math.PI / 6), 0.125, 0);
        List<Segment> bar = filleted(R, p0, Vec3.ZERO, new Vec3(0.4, 0, 0), new Vec3(0.4, 0.3, 0),
                new Vec3(0.15, 0.3, 0));
        double exact = 1.2 - 2 * R * Math.tan(Math.PI / 12) + R * Math.PI / 6 - 2 * (2 * R - R * Math.PI / 2);
        Double[] dims = {0.25, 0.405, 0.31, 0.255, 0.125};
        check(bar, D, ShapeCode.S36, dims, dims, 1.18, exact);
    }

    /**
     * Four 90 degree bends the same way, centre-line legs 250, 400, 300, 300, 200: out-to-out 255, 410,
     * 310, 310, 205; L = sum - 2r - 4d = 1410 mm.
     */
    @Test
    void shape41_fourRightAnglesTheSameWay() {
        List<Segment> bar = filleted(R, new Vec3(0.25, 0.4, 0), new Vec3(0, 0.4, 0), Vec3.ZERO, new Vec3(0.3, 0, 0),
                new Vec3(0.3, 0.3, 0), new Vec3(0.1, 0.3, 0));
        double exact = 1.25 + 2 * Math.PI * R;
        check(bar, D, ShapeCode.S41, new Double[] {0.255, 0.41, 0.31, 0.31, 0.205},
                new Double[] {0.205, 0.31, 0.31, 0.41, 0.255}, 1.41, exact);
    }

    /** A top hat, centre-line legs 200, 300, 300, 300, 200: 205, 310, 310, 310, 205; L = 1340 - 80 = 1260 mm. */
    @Test
    void shape44_topHat() {
        List<Segment> bar = filleted(R, new Vec3(0, 0.3, 0), new Vec3(0.2, 0.3, 0), new Vec3(0.2, 0, 0),
                new Vec3(0.5, 0, 0), new Vec3(0.5, 0.3, 0), new Vec3(0.7, 0.3, 0));
        double exact = 1.1 + 2 * Math.PI * R;
        Double[] dims = {0.205, 0.31, 0.31, 0.31, 0.205};
        check(bar, D, ShapeCode.S44, dims, dims, 1.26, exact);
    }

    /**
     * A U 400 by 300 (centre-line) with a 180 degree hook at each end turned in, hook legs 200: A 410,
     * B 310, C = D = 205; L = 2A + B + 2C + 1.5r - 3d = 1540 mm.
     */
    @Test
    void shape47_uWithHooks() {
        List<Segment> bar = filleted(R, new Vec3(0.05, 0.2, 0), new Vec3(0.05, 0.4, 0), new Vec3(0, 0.4, 0),
                Vec3.ZERO, new Vec3(0.3, 0, 0), new Vec3(0.3, 0.4, 0), new Vec3(0.25, 0.4, 0),
                new Vec3(0.25, 0.2, 0));
        double exact = 1.3 + 3 * Math.PI * R;
        Double[] dims = {0.41, 0.31, 0.205, 0.205, null};
        check(bar, D, ShapeCode.S47, dims, dims, 1.54, exact);
    }

    /**
     * A link 300 by 400 (centre-line) with five 90 degree bends, end legs 200 lapping: A 410, B 310,
     * C = D = 205; L = 2(A + B + C) - 2.5r - 5d = 1750 mm.
     */
    @Test
    void shape51_linkWithLappedEnds() {
        List<Segment> bar = filleted(R, new Vec3(0.3, 0.2, 0), new Vec3(0.3, 0.4, 0), new Vec3(0, 0.4, 0),
                Vec3.ZERO, new Vec3(0.3, 0, 0), new Vec3(0.3, 0.4, 0), new Vec3(0.1, 0.4, 0));
        double exact = 1.55 + 5 * Math.PI / 2 * R;
        // read from the other end the first lap runs along a 300 side, so A and B change places
        check(bar, D, ShapeCode.S51, new Double[] {0.41, 0.31, 0.205, 0.205, null},
                new Double[] {0.31, 0.41, 0.205, 0.205, null}, 1.75, exact);
    }

    /**
     * A link 300 by 400 (centre-line) whose ends turn 135 degrees round the same corner into 100 mm
     * straights: A 410, B 310, C = D = 100 + r + d = 130; L = 2(A + B + C) - 1.5r - 3d = 1640 mm.
     */
    @Test
    void shape52_linkWith135DegreeHooks() {
        Vec3 q = new Vec3(0.275, 0.375, 0);
        Vec3 t0 = q.plus(new Vec3(S, -S, 0).times(R));
        Vec3 t1 = q.plus(new Vec3(-S, S, 0).times(R));
        List<Segment> bar = new ArrayList<>();
        bar.add(new Straight(t0.minus(new Vec3(S, S, 0).times(0.1)), t0, SRC));
        bar.add(CircularArc.of(q, R, new Vec3(S, -S, 0), new Vec3(S, S, 0), 0, 3 * Math.PI / 4, SRC));
        bar.add(new Straight(new Vec3(0.275, 0.4, 0), new Vec3(0.025, 0.4, 0), SRC));
        bar.add(CircularArc.of(new Vec3(0.025, 0.375, 0), R, Vec3.Y, Vec3.X.negate(), 0, Math.PI / 2, SRC));
        bar.add(new Straight(new Vec3(0, 0.375, 0), new Vec3(0, 0.025, 0), SRC));
        bar.add(CircularArc.of(new Vec3(0.025, 0.025, 0), R, Vec3.X.negate(), Vec3.Y.negate(), 0, Math.PI / 2, SRC));
        bar.add(new Straight(new Vec3(0.025, 0, 0), new Vec3(0.275, 0, 0), SRC));
        bar.add(CircularArc.of(new Vec3(0.275, 0.025, 0), R, Vec3.Y.negate(), Vec3.X, 0, Math.PI / 2, SRC));
        bar.add(new Straight(new Vec3(0.3, 0.025, 0), new Vec3(0.3, 0.375, 0), SRC));
        bar.add(CircularArc.of(q, R, Vec3.X, Vec3.Y, 0, 3 * Math.PI / 4, SRC));
        bar.add(new Straight(t1, t1.plus(new Vec3(-S, -S, 0).times(0.1)), SRC));
        double exact = 1.4 + 3 * Math.PI * R;
        // read from the other end the first hook leads into a 400 side, so A and B change places
        check(bar, D, ShapeCode.S52, new Double[] {0.41, 0.31, 0.13, 0.13, null},
                new Double[] {0.31, 0.41, 0.13, 0.13, null}, 1.64, exact);
    }

    /**
     * A link 300 by 400 (centre-line) with six 90 degree bends, the top doubled, end legs 200: A 410,
     * B 310, C = D = 205; L = 2A + 3B + 2C - 3r - 6d = 2040 mm.
     */
    @Test
    void shape63_linkWithDoubledSide() {
        List<Segment> bar = filleted(R, new Vec3(0.3, 0.2, 0), new Vec3(0.3, 0.4, 0), new Vec3(0, 0.4, 0),
                Vec3.ZERO, new Vec3(0.3, 0, 0), new Vec3(0.3, 0.4, 0), new Vec3(0, 0.4, 0), new Vec3(0, 0.2, 0));
        double exact = 1.8 + 3 * Math.PI * R;
        Double[] dims = {0.41, 0.31, 0.205, 0.205, null};
        check(bar, D, ShapeCode.S63, dims, dims, 2.04, exact);
    }

    /**
     * Leg 300 down to a 90 degree corner, 400 along it, then a semicircular hook the same way whose tail runs
     * back 250 over the leg (centre-line corners 50 = 2 x 25 apart): A 300 + d/2 = 305, B 400 + d = 410,
     * C 2(r + d) = 60, D 250 + d/2 = 255 out-to-out; L = A + B + C + D - 1.5r - 3d = 1030 - 30 - 30 = 970 mm.
     * Exact: straights 275 + 350 + 225, arcs three quarter turns of 25: 850 + 1.5 pi 25.
     */
    @Test
    void shape22_rightAngleThenSemicircularHook() {
        List<Segment> bar = filleted(R, new Vec3(0, 0.3, 0), Vec3.ZERO, new Vec3(0.4, 0, 0), new Vec3(0.4, 0.05, 0),
                new Vec3(0.15, 0.05, 0));
        double exact = 0.85 + 1.5 * Math.PI * R;
        Double[] dims = {0.305, 0.41, 0.06, 0.255, null};
        check(bar, D, ShapeCode.S22, dims, dims, 0.97, exact);
    }

    /** Two right angles then a semicircular hook: four legs, which shape 22's A to D cannot describe. */
    @Test
    void twoRightAnglesThenAHook_isNotShape22() {
        List<Segment> bar = filleted(R, new Vec3(0, 0.3, 0), Vec3.ZERO, new Vec3(0.4, 0, 0), new Vec3(0.4, 0.3, 0),
                new Vec3(0.35, 0.3, 0), new Vec3(0.35, 0.1, 0));
        assertEquals(ShapeCode.OTHER, ShapeClassifierTest.classify(bar, false, D).code());
    }
}
