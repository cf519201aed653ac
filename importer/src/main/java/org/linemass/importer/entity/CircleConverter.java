package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * CIRCLE and ARC: centre 10/20/30 in the OCS of 210/220/230, radius 40; an ARC runs
 * counter-clockwise about the extrusion direction from 50 to 51 (degrees), passing through 0
 * when 51 is below 50 (FACTS.md §7.2); equal angles give a zero-length piece, not a full circle
 * (a full turn is written as 0 and 360). The OCS x and y axes become the arc's u and v, so an
 * extrusion of (0, 0, -1) yields a clockwise arc seen from +Z.
 */
final class CircleConverter {

    private static final double FULL_TURN_DEGREES = 360.0;

    private CircleConverter() {
    }

    static void convert(Record r, Provenance p, boolean arc, List<Segment> out) throws EntitySkip {
        Vec3 c = Values.point(r, 10);
        double radius = Values.real(r, 40, 0, "radius");
        if (!(radius > 0)) {
            throw new EntitySkip((arc ? "ARC" : "CIRCLE") + " radius must be positive, got " + radius);
        }
        if (radius < Values.MIN_RADIUS) {
            throw new EntitySkip((arc ? "ARC" : "CIRCLE") + " radius " + radius + " is below " + Values.MIN_RADIUS
                    + " drawing units, too small to measure");
        }
        Ocs.Frame frame = Ocs.frame(Values.extrusion(r));
        Affine ocs = frame.map();
        double t0 = 0;
        double t1 = 2 * Math.PI;
        if (arc) {
            double start = Values.real(r, 50, 0, "start angle");
            double end = Values.real(r, 51, 0, "end angle");
            double s = start % FULL_TURN_DEGREES;
            if (s < 0) {
                s += FULL_TURN_DEGREES;
            }
            if (start == end) {
                // zero sweep: a degenerate arc of length 0, kept (like a zero-length LINE) for the checks
                Vec3 p0 = ocs.apply(c.plus(new Vec3(radius * Math.cos(Math.toRadians(start)),
                        radius * Math.sin(Math.toRadians(start)), 0)));
                out.add(new Straight(p0, p0, p));
                return;
            }
            double sweep = (end - start) % FULL_TURN_DEGREES;
            if (sweep <= 0) {
                sweep += FULL_TURN_DEGREES;
            }
            t0 = Math.toRadians(s);
            t1 = t0 + Math.toRadians(sweep);
        }
        out.add(CircularArc.of(ocs.apply(c), radius, frame.x(), frame.y(), t0, t1, p));
    }
}
