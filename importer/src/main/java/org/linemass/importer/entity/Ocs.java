package org.linemass.importer.entity;

import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Vec3;

/**
 * The object coordinate system of a planar entity from its extrusion direction N, by the
 * Arbitrary Axis Algorithm (DXF Reference; FACTS.md §7.4): if |Nx| and |Ny| are both below 1/64
 * the OCS x axis is Wy x N, otherwise Wz x N; the y axis is N x Ax. The result maps OCS points to
 * world points and is a proper rotation (determinant +1).
 */
public final class Ocs {

    /** The cap around world Z inside which Wy is used (exactly representable 1/64). */
    private static final double ARBITRARY_AXIS_CAP = 1.0 / 64.0;

    private Ocs() {
    }

    /**
     * The OCS of one extrusion direction with its world x axis, y axis and negated y axis, shared by
     * the arcs built in it (they keep references to their axis vectors).
     */
    record Frame(Vec3 extrusion, Affine map, Vec3 x, Vec3 y, Vec3 minusY) {
    }

    /**
     * The frame of the last extrusion asked for on this thread (an immutable value; drawings mostly
     * use one). Confined to the thread, so imports running side by side share nothing.
     */
    private static final ThreadLocal<Frame[]> LAST = ThreadLocal.withInitial(
            () -> new Frame[] {new Frame(Vec3.Z, Affine.IDENTITY, Vec3.X, Vec3.Y, new Vec3(0, -1, 0))});

    /** {@link #of(Vec3)} with its axes, reusing the previous frame's objects for an equal extrusion. */
    static Frame frame(Vec3 extrusion) throws EntitySkip {
        Frame[] last = LAST.get();
        Frame f = last[0];
        if (f.extrusion().equals(extrusion)) {
            return f;
        }
        Affine map = of(extrusion);
        // axes as the arc factory normalises them, so arcs built on them keep these very objects
        Vec3 x = map.applyLinear(Vec3.X);
        CircularArc plus = CircularArc.of(Vec3.ZERO, 1, x, map.applyLinear(Vec3.Y), 0, 1, null);
        CircularArc minus = CircularArc.of(Vec3.ZERO, 1, plus.u(), map.applyLinear(Vec3.Y).negate(), 0, 1, null);
        f = new Frame(extrusion, map, plus.u(), plus.v(), minus.v());
        last[0] = f;
        return f;
    }

    /** OCS-to-world map; {@link EntitySkip} for a zero or non-finite direction. */
    public static Affine of(Vec3 extrusion) throws EntitySkip {
        double len = extrusion.norm();
        if (!(len > 0) || !Double.isFinite(len)) {
            throw new EntitySkip("extrusion direction (210/220/230) is zero or not finite: " + extrusion);
        }
        if (extrusion.x() == 0 && extrusion.y() == 0 && extrusion.z() > 0) {
            return Affine.IDENTITY;
        }
        Vec3 n = extrusion.times(1 / len);
        Vec3 ax = Math.abs(n.x()) < ARBITRARY_AXIS_CAP && Math.abs(n.y()) < ARBITRARY_AXIS_CAP
                ? Vec3.Y.cross(n) : Vec3.Z.cross(n);
        ax = ax.unit();
        Vec3 ay = n.cross(ax).unit();
        return Affine.ofColumns(ax, ay, n, Vec3.ZERO);
    }
}
