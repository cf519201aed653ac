package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.tolerance.Tolerances;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Identical pieces. Expected groupings follow from the definition (congruent under rigid motion,
 * mirror only when asked, either direction of travel, same section); the shapes are in
 * {@link Shapes}. Pieces sit 0.5 m apart so nothing touches.
 */
class GroupingTest {

    private static final String RACK = "RACK";

    private static PieceAnalysis analyze(List<Segment> segs, Tolerances tol, boolean mirror) {
        return PieceAnalyzer.analyze(segs, tol, Fixtures.sections(RACK, Fixtures.WIRE_D4), mirror);
    }

    @Test
    void rackOfHooks_inAnyOrientationAndDirection_isOneMark() {
        List<Segment> all = new ArrayList<>();
        double[] angles = {0, 37, 90, 180, 233.5, 301};
        for (int k = 0; k < angles.length; k++) {
            List<Segment> h = Shapes.moved(Shapes.hook(RACK, 10 + k), Shapes.place(angles[k], 0.5 * k, 0.3 * k));
            all.addAll(k % 2 == 0 ? h : Shapes.traced(h));
        }
        // one more, with its long leg drawn as two collinear lines meeting exactly
        List<Segment> h = Shapes.moved(Shapes.hook(RACK, 20), Shapes.place(12, -0.5, 0.9));
        Straight leg = (Straight) h.get(0);
        Vec3 mid = leg.point(0.37);
        all.add(new Straight(leg.a(), mid, leg.source()));
        all.add(new Straight(mid, leg.b(), leg.source()));
        all.addAll(h.subList(1, 3));
        PieceAnalysis r = analyze(all, Fixtures.tol(), false);
        assertEquals(7, r.pieces().size());
        assertEquals(1, r.groups().size(), "groups: " + r.groups());
        assertEquals(7, r.groups().get(0).size());
        for (Piece p : r.pieces()) {
            assertEquals(1, p.bends().size(), "one arc bend per hook");
        }
    }

    @Test
    void mirrorImageFlatHooks_groupOnlyWithMirrorGrouping() {
        List<Segment> all = new ArrayList<>(Shapes.hook(RACK, 10));
        all.addAll(Shapes.moved(Shapes.hook(RACK, 11), Affine.scale(-1, 1, 1)
                .andThen(Affine.translation(new Vec3(0.6, 0.4, 0)))));
        assertEquals(2, analyze(all, Fixtures.tol(), false).groups().size());
        assertEquals(1, analyze(all, Fixtures.tol(), true).groups().size());
    }

    @Test
    void mirrorImageCranksInSpace_groupOnlyWithMirrorGrouping() {
        List<Segment> all = new ArrayList<>(Shapes.crank(RACK, 10));
        all.addAll(Shapes.moved(Shapes.crank(RACK, 11), Affine.scale(1, -1, 1)
                .andThen(Affine.translation(new Vec3(0.6, 0.4, 0)))));
        assertEquals(2, analyze(all, Fixtures.tol(), false).groups().size());
        assertEquals(1, analyze(all, Fixtures.tol(), true).groups().size());
    }

    /** Rotation about the x axis by {@code deg}, counter-clockwise seen from +x (closed form). */
    private static Affine rotationX(double deg) {
        double c = Math.cos(Math.toRadians(deg));
        double s = Math.sin(Math.toRadians(deg));
        return Affine.ofColumns(new Vec3(1, 0, 0), new Vec3(0, c, s), new Vec3(0, -s, c), Vec3.ZERO);
    }

    /**
     * Two right-hand hooks (one turned within its plane, one traced backwards) and one left-hand
     * hook, all drawn in the plane that {@code tilt} carries the x-y plane to.
     */
    private static List<Segment> handedHooks(Affine tilt) {
        List<Segment> all = new ArrayList<>(Shapes.moved(Shapes.hook(RACK, 10), tilt));
        all.addAll(Shapes.traced(Shapes.moved(Shapes.hook(RACK, 11), Shapes.place(70, 0.6, 0).andThen(tilt))));
        all.addAll(Shapes.moved(Shapes.hook(RACK, 12), Affine.scale(-1, 1, 1).andThen(Shapes.place(-25, 0, 0.6))
                .andThen(tilt)));
        return all;
    }

    @Test
    void mirrorImageHooksInTheXzPlane_groupOnlyWithMirrorGrouping() {
        // rotation by 90 degrees about x carries the x-y plane to the x-z plane; the two right-hand
        // hooks are congruent by a proper motion within that plane, the left-hand one only by a mirror
        List<Segment> all = handedHooks(rotationX(90));
        assertEquals(2, analyze(all, Fixtures.tol(), false).groups().size(), "right hand, left hand");
        assertEquals(1, analyze(all, Fixtures.tol(), true).groups().size());
    }

    @Test
    void mirrorImageHooksInATiltedPlane_groupOnlyWithMirrorGrouping() {
        // a plane tilted 35 degrees about x, then turned 20 degrees about z: normal has no zero component
        Affine tilt = rotationX(35).andThen(Affine.rotationZ(Math.toRadians(20)))
                .andThen(Affine.translation(new Vec3(0.3, -0.2, 0.1)));
        List<Segment> all = handedHooks(tilt);
        PieceAnalysis r = analyze(all, Fixtures.tol(), false);
        assertEquals(3, r.pieces().size());
        assertEquals(2, r.groups().size(), "right hand, left hand: " + r.groups());
        assertEquals(1, analyze(all, Fixtures.tol(), true).groups().size());
    }

    @Test
    void hookSeenFromTheOtherSideOfItsPlane_isAMirrorImage() {
        // by the canonical-normal convention the x-z plane is seen from +y; turning the plan hook by
        // -90 degrees about x keeps +z on the +y side (same hand), by +90 degrees puts it on -y
        // (seen from +y it is the other hand)
        List<Segment> same = new ArrayList<>(Shapes.hook(RACK, 10));
        same.addAll(Shapes.moved(Shapes.hook(RACK, 11), rotationX(-90).andThen(Shapes.place(0, 0.6, 0))));
        assertEquals(1, analyze(same, Fixtures.tol(), false).groups().size());
        List<Segment> other = new ArrayList<>(Shapes.hook(RACK, 10));
        other.addAll(Shapes.moved(Shapes.hook(RACK, 11), rotationX(90).andThen(Shapes.place(0, 0.6, 0))));
        assertEquals(2, analyze(other, Fixtures.tol(), false).groups().size());
        assertEquals(1, analyze(other, Fixtures.tol(), true).groups().size());
    }

    @Test
    void crankAndItsMirrorImage_turnedInSpace_groupOnlyWithMirrorGrouping() {
        // a crank and a copy turned by proper rotations share a mark; its mirror image (x -> -x)
        // turned the same way does not, unless mirror grouping is on
        Affine turn = rotationX(50).andThen(Affine.rotationZ(Math.toRadians(110)));
        List<Segment> all = new ArrayList<>(Shapes.crank(RACK, 10));
        all.addAll(Shapes.moved(Shapes.crank(RACK, 11), turn.andThen(Affine.translation(new Vec3(0.6, 0, 0)))));
        all.addAll(Shapes.moved(Shapes.crank(RACK, 12), Affine.scale(-1, 1, 1).andThen(turn)
                .andThen(Affine.translation(new Vec3(0, 0.6, 0.3)))));
        assertEquals(2, analyze(all, Fixtures.tol(), false).groups().size());
        assertEquals(1, analyze(all, Fixtures.tol(), true).groups().size());
    }

    @Test
    void bendMovedOneMicrometre_groupsOnlyUnderALooserTolerance() {
        List<Segment> all = new ArrayList<>(Shapes.ell(RACK, 10, new Vec3(0.1, 0, 0)));
        // second copy: corner 0.001 mm off, then moved away
        all.addAll(Shapes.moved(Shapes.ell(RACK, 11, new Vec3(0.1, 1e-6, 0)), Shapes.place(0, 0, 0.5)));
        // group tolerance 0.01 mm: the shapes differ by at most 0.001 mm, so one mark
        assertEquals(1, analyze(all, Fixtures.tol().withGroup(1e-5), false).groups().size());
        // group tolerance 0.0001 mm: tighter than the difference, so two marks
        assertEquals(2, analyze(all, Fixtures.tol().withGroup(1e-7), false).groups().size());
    }

    @Test
    void sameLengthDifferentShape_isNotGrouped() {
        List<Segment> all = new ArrayList<>(Shapes.ell(RACK, 10, new Vec3(0.1, 0, 0)));
        // same total length (path through (0.1, 0) has legs 0.1 and 0.1414...); this L has the
        // corner elsewhere but its legs are chosen to give the same total length
        double total = 0.1 + Math.hypot(0.1, 0.1);
        double leg = 0.08;
        // corner on the circle of radius leg about the origin whose distance to (0.2, 0.1) is total - leg
        Vec3 corner = cornerFor(leg, total - leg);
        all.addAll(Shapes.moved(Shapes.ell(RACK, 11, corner), Shapes.place(0, 0, 0.5)));
        PieceAnalysis r = analyze(all, Fixtures.tol(), true);
        double l0 = length(r.pieces().get(0));
        double l1 = length(r.pieces().get(1));
        assertEquals(l0, l1, 1e-12, "built to the same length");
        assertEquals(2, r.groups().size());
    }

    @Test
    void sameShapeOnDifferentSections_isNotGrouped() {
        List<Segment> all = new ArrayList<>(Shapes.hook(RACK, 10));
        all.addAll(Shapes.moved(Shapes.hook("OTHER", 11), Shapes.place(0, 0.6, 0)));
        PieceAnalysis r = PieceAnalyzer.analyze(all, Fixtures.tol(), l -> l.equals(RACK)
                ? java.util.Optional.of(Fixtures.WIRE_D4) : java.util.Optional.of(Fixtures.BAR_B12), true);
        assertEquals(2, r.groups().size());
    }

    private static double length(Piece p) {
        return p.segments().stream().mapToDouble(org.linemass.engine.pieces.geom.Curves::length).sum();
    }

    /** A point at distance a from the origin and b from (0.2, 0.1): circle-circle intersection. */
    private static Vec3 cornerFor(double a, double b) {
        double dx = 0.2;
        double dy = 0.1;
        double d = Math.hypot(dx, dy);
        double x = (a * a - b * b + d * d) / (2 * d);
        double h = Math.sqrt(a * a - x * x);
        double ux = dx / d;
        double uy = dy / d;
        return new Vec3(x * ux - h * uy, x * uy + h * ux, 0);
    }
}
