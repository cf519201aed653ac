package org.linemass.engine.pieces.geom;

import org.linemass.geometry.Vec3;

/**
 * The closest approach of two curves (or of a point and a curve): the parameter and point on
 * each and their distance. For a point query {@code tb} is NaN and {@code pb} is the query point.
 */
public record Contact(double ta, Vec3 pa, double tb, Vec3 pb, double distance) {

    /** The midpoint of the two closest points. */
    public Vec3 middle() {
        return pa.plus(pb).times(0.5);
    }
}
