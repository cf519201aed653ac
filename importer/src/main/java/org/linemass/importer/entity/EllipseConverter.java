package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * ELLIPSE (world coordinates): centre 10/20/30, major semi-axis M = 11/21/31 relative to the
 * centre, ratio 40 of minor to major, parameters 41 and 42 in radians. The minor semi-axis is
 * ratio |M| unit(N x M) with N = 210/220/230 (FACTS.md §7.2); the curve runs from 41 to 42
 * counter-clockwise about N, adding 2 pi when 42 is not above 41.
 */
final class EllipseConverter {

    private static final double TWO_PI = 2 * Math.PI;

    private EllipseConverter() {
    }

    static void convert(Record r, Provenance p, List<Segment> out) throws EntitySkip {
        Vec3 c = Values.point(r, 10);
        Vec3 major = Values.point(r, 11);
        double ratio = Values.real(r, 40, 1, "axis ratio");
        Vec3 n = Values.extrusion(r);
        double m = major.norm();
        if (!(m > 0) || !(ratio > 0)) {
            throw new EntitySkip("ELLIPSE needs a non-zero major axis and a positive axis ratio, got " + major
                    + " and " + ratio);
        }
        Vec3 dir = n.cross(major);
        if (!(dir.norm() > 0)) {
            throw new EntitySkip("ELLIPSE major axis " + major + " is parallel to its normal " + n);
        }
        Vec3 minor = dir.unit().times(ratio * m);
        double t0 = Values.real(r, 41, 0, "start parameter");
        double t1 = Values.real(r, 42, TWO_PI, "end parameter");
        double sweep = t1 - t0;
        if (sweep > TWO_PI) {
            sweep = TWO_PI;
        } else if (sweep <= 0) {
            sweep = sweep % TWO_PI + TWO_PI;
        }
        t0 = t0 % TWO_PI;
        out.add(EllipticalArc.of(c, major, minor, t0, t0 + sweep, p));
    }
}
