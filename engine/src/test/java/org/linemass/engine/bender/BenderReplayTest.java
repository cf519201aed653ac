package org.linemass.engine.bender;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Bender data rebuilt in closed form ({@link BenderReplay}) against the drawn bar: lengths equal to
 * 1e-9 relative, end point and every corner point within 1e-9 of the bar's size. The bars are drawn
 * in closed form by {@link Bars} (straights and exact tangent arcs), in 3D, rotated, mirrored and
 * scaled uniformly (a similarity keeps arcs circular, so the data is exact); the corner points are the
 * drawn corners mapped by the same motion. 1e-9 is the bound; double rounding through a few
 * rotations is about 1e-15 of the size.
 */
class BenderReplayTest {

    private static final double REL = 1e-9;

    /** A 3D bar: legs along x, then y, then up z, then back along -x (three 90 degree bends in different planes), then a bend out of all three planes. */
    private static final Vec3[] SPACE_BAR = {new Vec3(0, 0, 0), new Vec3(0.5, 0, 0), new Vec3(0.5, 0.3, 0),
        new Vec3(0.5, 0.3, 0.4), new Vec3(0.1, 0.3, 0.4), new Vec3(-0.1, 0.1, 0.6)};

    /** A U: two 90 degree fillets 2r apart, one 180 degree bend. */
    private static final Vec3[] U_BAR = {new Vec3(0, 0, 0), new Vec3(0.3, 0, 0), new Vec3(0.3, 0.06, 0),
        new Vec3(0, 0.06, 0)};

    private static final List<Affine> MOTIONS = List.of(Affine.IDENTITY,
            Bars.rotation(new Vec3(1, 2, 3), 1.1, new Vec3(5, -2, 7)),
            Affine.scale(-1, 1, 1).andThen(Bars.rotation(new Vec3(0, 1, 1), -0.7, new Vec3(0, 0, 3))),
            Affine.uniformScale(1.25).andThen(Bars.rotation(new Vec3(0, 0, 1), 2.5, Vec3.ZERO)));

    @Test
    void spaceBar_rebuildsFromItsBenderData() {
        check(SPACE_BAR, 0.03, 4);
    }

    @Test
    void sharpSpaceBar_rebuildsFromItsBenderData() {
        check(SPACE_BAR, 0, 4);
    }

    @Test
    void uBar_rebuildsWithOneHalfTurnBend() {
        for (Affine m : MOTIONS) {
            List<Segment> bar = Bars.map(Bars.of(0.03, U_BAR), m);
            BenderProgram prog = BenderPrograms.of(RunSplitter.split(bar, false, Math.toRadians(0.01), 1e-5));
            assertEquals(1, prog.steps().size());
            assertEquals(180.0, prog.steps().get(0).angleDeg(), 1e-9);
            BenderReplay.Rebuilt r = BenderReplay.replay(prog).orElseThrow();
            double size = 0.3 * 1.25;
            assertTrue(r.endM().distance(bar.get(bar.size() - 1).end()) <= REL * size);
        }
    }

    private static void check(Vec3[] corners, double radius, int bends) {
        for (Affine m : MOTIONS) {
            List<Segment> bar = Bars.map(Bars.of(radius, corners), m);
            BenderProgram prog = BenderPrograms.of(RunSplitter.split(bar, false, Math.toRadians(0.01), 1e-5));
            assertEquals(bends, prog.steps().size());
            assertTrue(prog.exact());
            assertEquals(0.0, prog.steps().get(0).rotationDeg());
            BenderReplay.Rebuilt r = BenderReplay.replay(prog).orElseThrow();
            double drawn = bar.stream().mapToDouble(Curves::length).sum();
            double size = 1.25;
            assertEquals(drawn, r.lengthM(), REL * drawn, "length under " + m);
            assertTrue(r.endM().distance(bar.get(bar.size() - 1).end()) <= REL * size, "end under " + m);
            assertEquals(corners.length, r.cornersM().size());
            for (int i = 0; i < corners.length; i++) {
                Vec3 expected = m.apply(corners[i]);
                assertTrue(r.cornersM().get(i).distance(expected) <= REL * size, "corner " + i + " under " + m
                        + ": " + r.cornersM().get(i) + " vs " + expected);
                assertTrue(prog.cornersM().get(i).distance(expected) <= REL * size, "program corner " + i);
            }
        }
    }
}
