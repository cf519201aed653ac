package org.linemass.importer.entity;

import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * One polyline piece from OCS vertex (x1, y1) to (x2, y2) at elevation z with bulge b =
 * tan(theta / 4) (FACTS.md §7.5): b = 0 is straight, b > 0 an arc counter-clockwise about the
 * OCS z axis, b < 0 clockwise. Chord c, radius r = c (1 + b^2) / (4 |b|), centre on the left
 * normal at signed distance c (1 - b^2) / (4 b) from the chord midpoint. The piece is mapped to
 * the world by {@code ocs}.
 */
final class Bulge {

    /**
     * Bulges smaller than this are straight: the sagitta is then below 1e-12 of the chord, under the
     * rounding of the coordinates themselves, while the radius would exceed 1e11 chords.
     */
    static final double STRAIGHT_BULGE = 2e-12;

    private Bulge() {
    }

    static Segment piece(double x1, double y1, double x2, double y2, double z, double b, Affine ocs,
            Provenance p) {
        return piece(x1, y1, x2, y2, z, b, ocs, p, ocs.apply(new Vec3(x1, y1, z)), ocs.apply(new Vec3(x2, y2, z)));
    }

    /** As above with the world end points already computed (shared between neighbouring pieces). */
    static Segment piece(double x1, double y1, double x2, double y2, double z, double b, Affine ocs,
            Provenance p, Vec3 a, Vec3 e) {
        double dx = x2 - x1;
        double dy = y2 - y1;
        double c = Math.hypot(dx, dy);
        if (Math.abs(b) < STRAIGHT_BULGE || !(c > 0)) {
            return new Straight(a, e, p);
        }
        double ux = dx / c;
        double uy = dy / c;
        double h = c * (1 - b * b) / (4 * b);
        double cx = 0.5 * (x1 + x2) - h * uy;
        double cy = 0.5 * (y1 + y2) + h * ux;
        double r = c * (1 + b * b) / (4 * Math.abs(b));
        double sweep = 4 * Math.atan(Math.abs(b));
        Vec3 u = new Vec3(x1 - cx, y1 - cy, 0).unit();
        Vec3 v = b > 0 ? new Vec3(-u.y(), u.x(), 0) : new Vec3(u.y(), -u.x(), 0);
        return CircularArc.of(ocs.apply(new Vec3(cx, cy, z)), r, ocs.applyLinear(u), ocs.applyLinear(v), 0,
                sweep, p);
    }
}
