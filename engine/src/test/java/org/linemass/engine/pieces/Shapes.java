package org.linemass.engine.pieces;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/** Small invented wire forms for grouping and bend tests (garden hooks, shelf wires). */
final class Shapes {

    private Shapes() {
    }

    /**
     * A J-hook drawn flat: straight 100 mm along +x from the origin, a 90 degree left turn on an
     * arc of centre-line radius 15 mm, straight 50 mm along +y. Tangent joins, so exactly one bend.
     */
    static List<Segment> hook(String layer, int line) {
        Provenance p = Provenance.of("test.dxf", layer, line, Integer.toHexString(line).toUpperCase(), "LINE");
        double r = 0.015;
        Straight a = new Straight(Vec3.ZERO, new Vec3(0.1, 0, 0), p);
        CircularArc b = CircularArc.of(new Vec3(0.1, r, 0), r, Vec3.X, Vec3.Y, -Math.PI / 2, 0, p);
        Straight c = new Straight(new Vec3(0.1 + r, r, 0), new Vec3(0.1 + r, r + 0.05, 0), p);
        return List.of(a, b, c);
    }

    /**
     * A crank bent in space: 100 mm along +x, sharp 90 degree turn to +y for 60 mm, sharp turn to
     * +z for 40 mm. Not planar, so it has a handedness.
     */
    static List<Segment> crank(String layer, int line) {
        Provenance p = Provenance.of("test.dxf", layer, line, Integer.toHexString(line).toUpperCase(), "LINE");
        Vec3 a = Vec3.ZERO;
        Vec3 b = new Vec3(0.1, 0, 0);
        Vec3 c = new Vec3(0.1, 0.06, 0);
        Vec3 d = new Vec3(0.1, 0.06, 0.04);
        return List.of(new Straight(a, b, p), new Straight(b, c, p), new Straight(c, d, p));
    }

    /** An L of two straights with the corner at {@code corner}: from (0,0) to corner to (0.2, 0.1). */
    static List<Segment> ell(String layer, int line, Vec3 corner) {
        Provenance p = Provenance.of("test.dxf", layer, line, Integer.toHexString(line).toUpperCase(), "LINE");
        return List.of(new Straight(Vec3.ZERO, corner, p), new Straight(corner, new Vec3(0.2, 0.1, 0), p));
    }

    /** Every segment mapped by {@code map}. */
    static List<Segment> moved(List<Segment> segs, Affine map) {
        List<Segment> out = new ArrayList<>();
        for (Segment s : segs) {
            out.add(s.transformed(map));
        }
        return out;
    }

    /** The same path traced the other way: order reversed and every segment reversed. */
    static List<Segment> traced(List<Segment> segs) {
        List<Segment> out = new ArrayList<>();
        for (Segment s : segs) {
            out.add(s.reversed());
        }
        Collections.reverse(out);
        return out;
    }

    /** A rigid motion: rotation about z by {@code deg}, then a shift. */
    static Affine place(double deg, double dx, double dy) {
        return Affine.rotationZ(Math.toRadians(deg)).andThen(Affine.translation(new Vec3(dx, dy, 0)));
    }
}
