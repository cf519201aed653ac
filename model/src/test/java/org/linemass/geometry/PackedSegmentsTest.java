package org.linemass.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Packed storage gives back exactly what was put in: every segment equal, component by component
 * with the records' double comparison (so -0.0 stays -0.0), in order, with its own provenance.
 * The segments are invented; the check is equality with the objects themselves, so no tolerance.
 */
class PackedSegmentsTest {

    private static final String[] HANDLES = {"", "1F", "2B0", "FFFFFFFFFFFFFFFF", "01F", "1f", "h-7"};
    private static final String[] LAYERS = {"TRELLIS_WIRE", "TRELLIS_POST", "0"};

    @Test
    void randomMixture_comesBackEqual() {
        Random rnd = new Random(20261202);
        for (int round = 0; round < 200; round++) {
            List<Segment> expected = randomSegments(rnd, rnd.nextInt(300));
            PackedSegments packed = PackedSegments.copyOf(expected);
            assertEqualLists(expected, packed);
            assertEquals(expected, packed);
            assertEquals(expected.hashCode(), packed.hashCode());
        }
    }

    @Test
    void chainedStraights_keepTheirEndsAndProvenances() {
        // a polyline drawn in plan and one in 3D, then a line that starts where the last ended but
        // on another layer, and the z = -0.0 corner case that must not be taken for +0.0
        Provenance plan = Provenance.of("shelf.dxf", "SHELF_WIRE", 10, "A1", "LWPOLYLINE");
        Provenance rise = Provenance.of("shelf.dxf", "SHELF_FRAME", 40, "A2", "POLYLINE");
        Provenance other = Provenance.of("shelf.dxf", "SHELF_FRAME", 60, "A3", "LINE");
        List<Segment> expected = List.of(
                new Straight(0, 0, 0, 0.4, 0, 0, plan),
                new Straight(0.4, 0, 0, 0.4, 0.3, 0, plan),
                new Straight(0.4, 0.3, 0, 0, 0.3, 0, plan),
                new Straight(0, 0.3, 0, 0, 0, 0, plan),
                new Straight(0, 0, 0, 0, 0, 1.2, rise),
                new Straight(0, 0, 1.2, 0.5, 0, 1.2, rise),
                new Straight(0.5, 0, 1.2, 0.5, 0, -0.0, other),
                new Straight(0.5, 0, -0.0, 0.9, 0, -0.0, other),
                new Straight(0.9, 0, -0.0, 0.9, 0, 0.0, other));
        PackedSegments packed = PackedSegments.copyOf(expected);
        assertEqualLists(expected, packed);
        assertEquals(-0.0, ((Straight) packed.get(7)).a().z());
        assertEquals(List.of(plan, plan, plan, plan, rise, rise, other, other, other),
                packed.stream().map(Segment::source).toList());
    }

    @Test
    void builderRollback_dropsExactlyTheTail() {
        Random rnd = new Random(7);
        for (int round = 0; round < 100; round++) {
            List<Segment> kept = randomSegments(rnd, 1 + rnd.nextInt(150));
            List<Segment> dropped = randomSegments(rnd, 1 + rnd.nextInt(40));
            List<Segment> after = randomSegments(rnd, rnd.nextInt(150));
            PackedSegments.Builder b = new PackedSegments.Builder();
            b.addAll(kept);
            b.addAll(dropped);
            b.subList(kept.size(), b.size()).clear();
            assertEqualLists(kept, b);
            b.addAll(after);
            List<Segment> expected = new ArrayList<>(kept);
            expected.addAll(after);
            assertEqualLists(expected, b.build());
        }
    }

    @Test
    void copyOf_keepsAPackedList_andRefusesChanges() {
        PackedSegments packed = PackedSegments.copyOf(randomSegments(new Random(3), 20));
        assertSame(packed, PackedSegments.copyOf(packed));
        assertThrows(UnsupportedOperationException.class, () -> packed.add(packed.get(0)));
        assertThrows(UnsupportedOperationException.class, () -> packed.remove(0));
        assertThrows(IndexOutOfBoundsException.class, () -> packed.get(20));
        PackedSegments.Builder b = new PackedSegments.Builder();
        b.addAll(packed);
        assertThrows(UnsupportedOperationException.class, () -> b.subList(0, 5).clear());
        assertThrows(NullPointerException.class, () -> b.add(null));
        PackedSegments built = b.build();
        assertEquals(packed, built);
        assertThrows(IllegalStateException.class, () -> b.add(packed.get(0)));
        assertThrows(IllegalStateException.class, b::build);
        assertEquals(0, PackedSegments.copyOf(List.of()).size());
    }

    @Test
    void addStraight_equalsAddingTheStraightObject() {
        Random rnd = new Random(19);
        for (int round = 0; round < 50; round++) {
            List<Segment> expected = randomSegments(rnd, rnd.nextInt(200));
            PackedSegments.Builder b = new PackedSegments.Builder();
            for (Segment s : expected) {
                if (s instanceof Straight line) {
                    b.addStraight(line.a().x(), line.a().y(), line.a().z(), line.b().x(), line.b().y(), line.b().z(),
                            line.source());
                } else {
                    b.add(s);
                }
            }
            assertEqualLists(expected, b.build());
        }
    }

    @Test
    void addBulgeArc_equalsAddingTheArc() {
        // plan polylines with bulged pieces in the world frame (kept as vertices and bulge), and the
        // same in a tilted frame and at an elevation (kept as arcs); -0.0 and tiny bulges included
        Vec3 tiltX = new Vec3(0.6, 0.8, 0);
        Vec3 tiltY = new Vec3(0, 0, 1);
        Affine tilt = Affine.ofColumns(tiltX, tiltY, tiltX.cross(tiltY), Vec3.ZERO);
        Random rnd = new Random(23);
        for (int round = 0; round < 100; round++) {
            List<Segment> expected = new ArrayList<>();
            PackedSegments.Builder b = new PackedSegments.Builder();
            Provenance p = Provenance.of("stirrups.dxf", "B12", 30 + round, "7" + round, "LWPOLYLINE");
            boolean world = round % 3 != 0;
            double z = round % 5 == 0 ? 150 : 0.0;
            double x = rnd.nextDouble() * 100;
            double y = round % 7 == 0 ? -0.0 : rnd.nextDouble() * 100;
            for (int k = 0; k < 30; k++) {
                double nx = x + 1 + rnd.nextDouble() * 50;
                double ny = rnd.nextInt(9) == 0 ? -0.0 : y + rnd.nextDouble() * 50 - 25;
                if (rnd.nextBoolean()) {
                    double bulge = rnd.nextInt(8) == 0 ? 1e-9 : rnd.nextDouble() * 2 - 1;
                    Affine map = world ? Affine.IDENTITY : tilt;
                    Vec3 u = world ? Vec3.X : tiltX;
                    Vec3 v = world ? Vec3.Y : tiltY;
                    Vec3 minusV = world ? new Vec3(0, -1, 0) : tiltY.negate();
                    expected.add(BulgeArc.of(x, y, nx, ny, z, bulge, map, u, v, minusV, p));
                    b.addBulgeArc(x, y, nx, ny, z, bulge, map, u, v, minusV, p);
                } else {
                    expected.add(new Straight(x, y, z, nx, ny, z, p));
                    b.addStraight(x, y, z, nx, ny, z, p);
                }
                x = nx;
                y = ny;
            }
            assertEqualLists(expected, b.build());
        }
    }

    @Test
    void addBulgeArc_refusesCoincidentVertices_andAddsNothing() {
        PackedSegments.Builder b = new PackedSegments.Builder();
        Provenance p = Provenance.of("stirrups.dxf", "B12", 3, "A", "LWPOLYLINE");
        assertThrows(IllegalArgumentException.class, () -> b.addBulgeArc(1, 1, 1, 1, 0.0, 0.5, Affine.IDENTITY,
                Vec3.X, Vec3.Y, new Vec3(0, -1, 0), p));
        assertEquals(0, b.size());
    }

    @Test
    void longPlanPolyline_crossesValueChunks() {
        // more than one 65,536-value chunk of chained plan straights, with a 3D straight and an arc
        // now and then so records of every size meet the chunk ends
        Random rnd = new Random(5);
        List<Segment> expected = new ArrayList<>();
        Provenance p = Provenance.of("mesh.dxf", "MESH", 9, "5A", "LWPOLYLINE");
        Vec3 last = Vec3.ZERO;
        for (int i = 0; i < 200_000; i++) {
            Vec3 next = new Vec3(last.x() + rnd.nextDouble(), rnd.nextDouble(), i % 97 == 0 ? 1 : 0);
            if (i % 89 == 0) {
                expected.add(new CircularArc(next, 1, Vec3.X, Vec3.Y, 0, 1, p));
            }
            expected.add(new Straight(last, next, p));
            last = next;
        }
        PackedSegments.Builder b = new PackedSegments.Builder();
        b.addAll(expected);
        b.subList(150_000, b.size()).clear();
        b.addAll(expected.subList(150_000, expected.size()));
        assertEqualLists(expected, b.build());
    }

    @Test
    void arcsInManyPlanes_comeBackWithTheirAxes() {
        // more distinct planes than one would meet in a drawing, so some arcs take the object path
        Random rnd = new Random(11);
        List<Segment> expected = new ArrayList<>();
        Provenance p = Provenance.of("route.dxf", "TRAY", 5, "C0", "ARC");
        for (int i = 0; i < 70_000; i++) {
            Vec3 u = new Vec3(rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()).unit();
            Vec3 v = u.cross(new Vec3(rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian())).unit();
            expected.add(CircularArc.of(new Vec3(i, 0, 0), 1 + i, u, v, 0, 1, p));
        }
        assertEqualLists(expected, PackedSegments.copyOf(expected));
    }

    private static void assertEqualLists(List<Segment> expected, List<Segment> actual) {
        assertEquals(expected.size(), actual.size(), "size");
        for (int i = 0; i < expected.size(); i++) {
            Segment e = expected.get(i);
            Segment a = actual.get(i);
            assertEquals(e, a, "segment " + i);
            assertEquals(e.getClass(), a.getClass(), "kind of segment " + i);
            assertEquals(e.source().handle(), a.source().handle(), "handle of segment " + i);
        }
    }

    /** Straights (plan and 3D, chained and loose), arcs in a few planes, ellipses and splines. */
    static List<Segment> randomSegments(Random rnd, int n) {
        List<Segment> out = new ArrayList<>();
        Vec3[][] planes = {{Vec3.X, Vec3.Y}, {Vec3.X, Vec3.Y.negate()}, {Vec3.Y, Vec3.Z},
            {new Vec3(0.6, 0.8, 0), new Vec3(0, 0, 1)}};
        Provenance p = provenance(rnd, 0);
        Vec3 last = Vec3.ZERO;
        for (int i = 0; i < n; i++) {
            if (rnd.nextInt(4) == 0) {
                p = provenance(rnd, i);
            }
            int kind = rnd.nextInt(12);
            if (kind < 7) {
                boolean flat = rnd.nextBoolean();
                Vec3 a = rnd.nextInt(3) > 0 ? last : point(rnd, flat);
                Vec3 b = point(rnd, flat && a.z() == 0);
                out.add(new Straight(a, b, p));
                last = b;
            } else if (kind < 10) {
                Vec3[] uv = planes[rnd.nextInt(planes.length)];
                Vec3 c = point(rnd, rnd.nextBoolean());
                double t0 = rnd.nextDouble() * 6;
                out.add(new CircularArc(c, 0.1 + rnd.nextDouble(), uv[0], uv[1], t0, t0 + 0.1 + rnd.nextDouble(), p));
            } else if (kind == 10) {
                out.add(EllipticalArc.of(point(rnd, false), new Vec3(2, 0, 0), new Vec3(0, 1, 0), 0, 1.5, p));
            } else {
                out.add(Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                        new Vec3[] {point(rnd, true), point(rnd, true), point(rnd, true)}, null, p));
            }
        }
        return out;
    }

    private static Vec3 point(Random rnd, boolean flat) {
        double z = flat ? 0.0 : rnd.nextInt(5) == 0 ? -0.0 : rnd.nextDouble();
        return new Vec3(rnd.nextDouble() * 10 - 5, rnd.nextInt(6) == 0 ? -0.0 : rnd.nextDouble(), z);
    }

    private static Provenance provenance(Random rnd, int i) {
        List<String> path = rnd.nextBoolean() ? List.of() : List.of("BAY", "PANEL" + rnd.nextInt(3));
        return new Provenance("trellis.dxf", LAYERS[rnd.nextInt(LAYERS.length)], 10 + i,
                HANDLES[rnd.nextInt(HANDLES.length)], "LINE", path);
    }
}
