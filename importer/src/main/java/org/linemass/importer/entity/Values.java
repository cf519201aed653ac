package org.linemass.importer.entity;

import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/** Validated reads of numbers, points and counts from a {@link Record}. */
final class Values {

    /**
     * Largest coordinate magnitude accepted, in drawing units: third powers of coordinates (second
     * moments times length) must stay far from double overflow (1.8e308).
     */
    static final double MAX_COORDINATE = 1e99;

    /**
     * Smallest radius accepted, in drawing units: the reciprocal of {@link #MAX_COORDINATE}. Below it a
     * radius converted to metres underflows (its square and cube, which the moments take, certainly do),
     * so no length, centroid or place could be computed from it.
     */
    static final double MIN_RADIUS = 1e-99;

    private Values() {
    }

    static double coordinate(double v, int code) throws EntitySkip {
        if (!Double.isFinite(v)) {
            throw new EntitySkip("coordinate (group code " + code + ") is not finite: " + v);
        }
        if (Math.abs(v) > MAX_COORDINATE) {
            throw new EntitySkip("coordinate (group code " + code + ") is out of range: " + v + " (limit "
                    + MAX_COORDINATE + ")");
        }
        return v;
    }

    /** A finite real of limited size that is not a coordinate (radius, scale, angle). */
    static double real(double v, int code, String what) throws EntitySkip {
        if (!Double.isFinite(v) || Math.abs(v) > MAX_COORDINATE) {
            throw new EntitySkip(what + " (group code " + code + ") is not a usable number: " + v);
        }
        return v;
    }

    static double real(Record r, int code, double dflt, String what) throws EntitySkip {
        return real(r.num(code, dflt), code, what);
    }

    /** The point (code, code + 10, code + 20), missing components 0; validated. */
    static Vec3 point(Record r, int code) throws EntitySkip {
        return new Vec3(coordinate(r.num(code, 0), code), coordinate(r.num(code + 10, 0), code + 10),
                coordinate(r.num(code + 20, 0), code + 20));
    }

    static int integer(Record r, int code, int dflt, String what) throws EntitySkip {
        double v = r.num(code, dflt);
        if (v != Math.rint(v) || Math.abs(v) > Integer.MAX_VALUE) {
            throw new EntitySkip(what + " (group code " + code + ") is not an integer: " + v);
        }
        return (int) v;
    }

    /** A count read from a group value (not looked up by code): a non-negative integer. */
    static int count(double v, int code, String what) throws EntitySkip {
        if (v != Math.rint(v) || v < 0 || v > Integer.MAX_VALUE) {
            throw new EntitySkip(what + " (group code " + code + ") is not a count: " + v);
        }
        return (int) v;
    }

    static int count(Record r, int code, String what) throws EntitySkip {
        int v = integer(r, code, 0, what);
        if (v < 0) {
            throw new EntitySkip("negative " + what + " (group code " + code + "): " + v);
        }
        return v;
    }

    /** The extrusion direction 210/220/230 (default +Z). */
    static Vec3 extrusion(Record r) throws EntitySkip {
        return new Vec3(real(r, 210, 0, "extrusion"), real(r, 220, 0, "extrusion"), real(r, 230, 1, "extrusion"));
    }
}
