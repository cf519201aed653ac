package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * One polyline piece from OCS vertex (x1, y1) to (x2, y2) at elevation z with bulge b =
 * tan(theta / 4) (FACTS.md §7.5): b = 0 is straight, b > 0 an arc counter-clockwise about the
 * OCS z axis, b < 0 clockwise. Chord c, radius r = c (1 + b^2) / (4 |b|), centre on the left
 * normal at signed distance c (1 - b^2) / (4 b) from the chord midpoint. The piece is mapped to
 * the world by {@code ocs}; an arc's u and v are the frame's x axis and (b > 0) y axis or (b < 0)
 * negated y axis, so all arcs of one frame share them, and t0 is the start vertex's angle.
 */
final class Bulge {

    /**
     * Bulges smaller than this are straight: the sagitta is then below 1e-12 of the chord, under the
     * rounding of the coordinates themselves, while the radius would exceed 1e11 chords.
     */
    static final double STRAIGHT_BULGE = 2e-12;

    private Bulge() {
    }

    /** Appends the piece to {@code out}. */
    static void append(double x1, double y1, double x2, double y2, double z, double b, Ocs.Frame ocs,
            Provenance p, List<Segment> out) {
        if (Math.abs(b) < STRAIGHT_BULGE) {
            straight(x1, y1, x2, y2, z, ocs, p, out);
            return;
        }
        double dx = x2 - x1;
        double dy = y2 - y1;
        double c = Math.hypot(dx, dy);
        if (!(c > 0)) {
            straight(x1, y1, x2, y2, z, ocs, p, out);
            return;
        }
        double ux = dx / c;
        double uy = dy / c;
        double h = c * (1 - b * b) / (4 * b);
        double cx = 0.5 * (x1 + x2) - h * uy;
        double cy = 0.5 * (y1 + y2) + h * ux;
        double r = c * (1 + b * b) / (4 * Math.abs(b));
        double sweep = 4 * Math.atan(Math.abs(b));
        // u = OCS x and v = +-OCS y (shared axis objects); t0 is the start vertex's angle in that frame
        double t0 = b > 0 ? Math.atan2(y1 - cy, x1 - cx) : Math.atan2(cy - y1, x1 - cx);
        out.add(CircularArc.of(ocs.map().apply(new Vec3(cx, cy, z)), r, ocs.x(), b > 0 ? ocs.y() : ocs.minusY(), t0,
                t0 + sweep, p));
    }

    /**
     * The straight between two OCS points. For the identity frame the world coordinates are the
     * OCS ones plus 0.0, exactly what applying the identity map gives (it turns -0.0 into +0.0),
     * without the intermediate vectors.
     */
    private static void straight(double x1, double y1, double x2, double y2, double z, Ocs.Frame ocs,
            Provenance p, List<Segment> out) {
        Affine m = ocs.map();
        if (m == Affine.IDENTITY) {
            Straights.add(out, x1 + 0.0, y1 + 0.0, z + 0.0, x2 + 0.0, y2 + 0.0, z + 0.0, p);
            return;
        }
        Vec3 a = m.apply(new Vec3(x1, y1, z));
        Vec3 b = m.apply(new Vec3(x2, y2, z));
        Straights.add(out, a.x(), a.y(), a.z(), b.x(), b.y(), b.z(), p);
    }
}
