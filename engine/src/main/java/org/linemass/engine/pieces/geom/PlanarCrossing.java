package org.linemass.engine.pieces.geom;

import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.locationtech.jts.algorithm.LineIntersector;
import org.locationtech.jts.algorithm.RobustLineIntersector;
import org.locationtech.jts.geom.Coordinate;

/**
 * Exact decision whether two straights lying in one horizontal plane cross at a point interior to
 * both, using the JTS robust line intersector (robust orientation predicates, so the answer does
 * not flip with rounding). Straights off a common horizontal plane are not decided here.
 */
public final class PlanarCrossing {

    private PlanarCrossing() {
    }

    /** True when both straights have every z equal to the same value. */
    public static boolean applies(Straight a, Straight b) {
        double z = a.a().z();
        return a.b().z() == z && b.a().z() == z && b.b().z() == z;
    }

    /** The proper crossing point (interior to both), or null when they do not cross properly. */
    public static Vec3 properCrossing(Straight a, Straight b) {
        LineIntersector li = new RobustLineIntersector();
        li.computeIntersection(new Coordinate(a.a().x(), a.a().y()), new Coordinate(a.b().x(), a.b().y()),
                new Coordinate(b.a().x(), b.a().y()), new Coordinate(b.b().x(), b.b().y()));
        if (!li.isProper()) {
            return null;
        }
        Coordinate c = li.getIntersection(0);
        return new Vec3(c.x, c.y, a.a().z());
    }
}
