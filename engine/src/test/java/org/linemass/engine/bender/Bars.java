package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Test bars drawn the way a detailer draws them: the intersection points of the straight legs, each
 * inner corner rounded by a tangent arc of the given centre-line radius (closed-form fillet: tangent
 * points at r tan(theta/2) from the corner). A corner with radius 0 stays sharp. Legs shorter than
 * 1e-12 m are left out, so two 90 degree fillets 2r apart make one 180 degree bend on one circle.
 */
final class Bars {

    static final Provenance SOURCE = Provenance.of("bars.dxf", "BAR", 1, "1", "LWPOLYLINE");

    private Bars() {
    }

    static List<Segment> of(double radius, Vec3... corners) {
        List<Segment> out = new ArrayList<>();
        Vec3 from = corners[0];
        for (int i = 1; i + 1 < corners.length; i++) {
            Vec3 c = corners[i];
            Vec3 tin = c.minus(corners[i - 1]).unit();
            Vec3 tout = corners[i + 1].minus(c).unit();
            double theta = Math.atan2(tin.cross(tout).norm(), tin.dot(tout));
            if (radius == 0) {
                add(out, from, c);
                from = c;
                continue;
            }
            double back = radius * Math.tan(theta / 2);
            Vec3 p1 = c.minus(tin.times(back));
            Vec3 p2 = c.plus(tout.times(back));
            Vec3 n = tout.minus(tin.times(tout.dot(tin))).unit();
            Vec3 centre = p1.plus(n.times(radius));
            add(out, from, p1);
            out.add(CircularArc.of(centre, radius, n.negate(), tin, 0, theta, SOURCE));
            from = p2;
        }
        add(out, from, corners[corners.length - 1]);
        return out;
    }

    private static void add(List<Segment> out, Vec3 a, Vec3 b) {
        if (a.distance(b) > 1e-12) {
            out.add(new Straight(a, b, SOURCE));
        }
    }

    static List<Segment> map(List<Segment> segs, Affine m) {
        return segs.stream().map(s -> s.transformed(m)).toList();
    }

    static List<Segment> reversed(List<Segment> segs) {
        List<Segment> out = new ArrayList<>();
        for (int i = segs.size() - 1; i >= 0; i--) {
            out.add(segs.get(i).reversed());
        }
        return out;
    }

    /** A rotation by {@code angle} about the unit axis (Rodrigues' formula), then a translation. */
    static Affine rotation(Vec3 axis, double angle, Vec3 shift) {
        Vec3 k = axis.unit();
        Vec3[] cols = new Vec3[3];
        Vec3[] e = {Vec3.X, Vec3.Y, Vec3.Z};
        for (int i = 0; i < 3; i++) {
            Vec3 v = e[i];
            cols[i] = v.times(Math.cos(angle)).plus(k.cross(v).times(Math.sin(angle)))
                    .plus(k.times(k.dot(v) * (1 - Math.cos(angle))));
        }
        return Affine.ofColumns(cols[0], cols[1], cols[2], shift);
    }
}
