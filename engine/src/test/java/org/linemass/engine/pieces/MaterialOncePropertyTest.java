package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Material is counted once: random collinear lines on one carrier (random direction in space)
 * keep exactly the length of the union of their intervals, and kept plus removed equals drawn.
 * The reference union is computed independently on the integer millimetre grid the intervals are
 * drawn on (sort and merge), so it is exact.
 */
class MaterialOncePropertyTest {

    /** Lengths are sums of up to 12 lines of at most 1 m: 1e-12 m covers their rounding. */
    private static final double LEN_TOL_M = 1e-12;

    @Property(tries = 200)
    void collinearLines_keepTheUnionOfTheirIntervals(@ForAll("seeds") long seed,
            @ForAll @IntRange(min = 1, max = 12) int count, @ForAll @DoubleRange(min = 0, max = 6.28) double yaw,
            @ForAll @DoubleRange(min = -1.5, max = 1.5) double pitch) {
        java.util.Random rnd = new java.util.Random(seed);
        Vec3 dir = new Vec3(Math.cos(yaw) * Math.cos(pitch), Math.sin(yaw) * Math.cos(pitch), Math.sin(pitch));
        Vec3 origin = new Vec3(0.3, -0.2, 0.1);
        List<Segment> segs = new ArrayList<>();
        List<int[]> intervals = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            int a = rnd.nextInt(1000);
            int b = rnd.nextInt(1000);
            if (Math.abs(a - b) < 1) {
                b = a + 1;
            }
            intervals.add(new int[] {Math.min(a, b), Math.max(a, b)});
            Provenance p = Provenance.of("t.dxf", "L", 10 + i, Integer.toHexString(10 + i), "LINE");
            segs.add(new Straight(origin.plusScaled(dir, a * 1e-3), origin.plusScaled(dir, b * 1e-3), p));
        }
        PieceAnalysis r = PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.none(), false);
        double kept = r.pieces().stream().flatMap(p -> p.segments().stream()).mapToDouble(Curves::length).sum();
        double removed = r.removed().stream().mapToDouble(Curves::length).sum();
        double drawn = segs.stream().mapToDouble(Curves::length).sum();
        assertEquals(union(intervals) * 1e-3, kept, LEN_TOL_M);
        assertEquals(drawn, kept + removed, LEN_TOL_M);
    }

    /**
     * A rigid copy of any bent wire shares its mark when mirror grouping is on. (Without it, a
     * planar wire turned over in space is seen from the other side of its plane and counts as the
     * other hand: see the Grouper contract and the next property.)
     */
    @Property(tries = 100)
    void rigidCopiesOfARandomBentWire_alwaysShareAMarkWithMirrorGrouping(@ForAll("seeds") long seed) {
        java.util.Random rnd = new java.util.Random(seed);
        List<Segment> wire = randomWire(rnd, Vec3.ZERO);
        assertCopyGroups(rnd, wire, true);
    }

    /**
     * A rigid copy of a wire that is not planar (it starts with 50 mm along x and 40 mm along y,
     * and ends with a rise of at least 15 mm in z, so it is out of any plane by far more than the
     * group tolerance) shares its mark without mirror grouping: proper motions keep handedness.
     */
    @Property(tries = 100)
    void rigidCopiesOfARandomCrankedWire_shareAMarkWithoutMirrorGrouping(@ForAll("seeds") long seed) {
        java.util.Random rnd = new java.util.Random(seed);
        Provenance src = Provenance.of("t.dxf", "W", 1, "1", "LINE");
        Vec3 a = new Vec3(0.05, 0, 0);
        Vec3 b = new Vec3(0.05, 0.04, 0);
        List<Segment> wire = new ArrayList<>(List.of(new Straight(Vec3.ZERO, a, src), new Straight(a, b, src)));
        wire.addAll(randomWire(rnd, b));
        Vec3 end = wire.get(wire.size() - 1).end();
        wire.add(new Straight(end, end.plus(new Vec3(0.01 * rnd.nextDouble(), 0.01 * rnd.nextDouble(),
                0.015 + 0.01 * rnd.nextDouble())), src));
        assertCopyGroups(rnd, wire, false);
    }

    /** Two to six legs from {@code p}, each 20-120 mm forward in x with some y and z. */
    private static List<Segment> randomWire(java.util.Random rnd, Vec3 from) {
        List<Segment> wire = new ArrayList<>();
        Vec3 p = from;
        Provenance src = Provenance.of("t.dxf", "W", 1, "1", "LINE");
        int legs = 2 + rnd.nextInt(5);
        for (int i = 0; i < legs; i++) {
            Vec3 q = p.plus(new Vec3(0.02 + 0.1 * rnd.nextDouble(), 0.1 * rnd.nextDouble() - 0.05,
                    0.05 * rnd.nextDouble() - 0.025));
            wire.add(new Straight(p, q, src));
            p = q;
        }
        return wire;
    }

    private static void assertCopyGroups(java.util.Random rnd, List<Segment> wire, boolean mirror) {
        Affine move = Affine.rotationZ(rnd.nextDouble() * 6.28)
                .andThen(Affine.of(rotationX(rnd.nextDouble() * 6.28), Vec3.ZERO))
                .andThen(Affine.translation(new Vec3(2 + rnd.nextDouble(), 2, 1)));
        List<Segment> all = new ArrayList<>(wire);
        List<Segment> copy = Shapes.moved(wire, move);
        all.addAll(rnd.nextBoolean() ? copy : Shapes.traced(copy));
        PieceAnalysis r = PieceAnalyzer.analyze(all, Fixtures.tol(), Fixtures.none(), mirror);
        assertEquals(2, r.pieces().size());
        assertEquals(1, r.groups().size(), "a rigid copy is the same piece");
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<Long> seeds() {
        return net.jqwik.api.Arbitraries.longs();
    }

    private static double[] rotationX(double a) {
        double c = Math.cos(a);
        double s = Math.sin(a);
        return new double[] {1, 0, 0, 0, c, -s, 0, s, c};
    }

    private static int union(List<int[]> intervals) {
        List<int[]> sorted = new ArrayList<>(intervals);
        sorted.sort((x, y) -> Integer.compare(x[0], y[0]));
        int total = 0;
        int lo = sorted.get(0)[0];
        int hi = sorted.get(0)[1];
        for (int[] iv : sorted) {
            if (iv[0] > hi) {
                total += hi - lo;
                lo = iv[0];
                hi = iv[1];
            } else {
                hi = Math.max(hi, iv[1]);
            }
        }
        return total + hi - lo;
    }
}
