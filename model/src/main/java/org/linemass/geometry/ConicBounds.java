package org.linemass.geometry;

/** Tight bounding box of {@code c + cos t u + sin t v} over [t0, t1]: ends plus per-axis extrema. */
final class ConicBounds {

    private ConicBounds() {
    }

    static Box3 of(Vec3 c, Vec3 u, Vec3 v, double t0, double t1) {
        Box3 box = Box3.EMPTY.including(at(c, u, v, t0)).including(at(c, u, v, t1));
        for (int axis = 0; axis < 3; axis++) {
            // d/dt (u_a cos t + v_a sin t) = 0  at  t = atan2(v_a, u_a) + k pi
            double base = Math.atan2(v.get(axis), u.get(axis));
            double k0 = Math.ceil((t0 - base) / Math.PI);
            for (double k = k0; base + k * Math.PI <= t1; k++) {
                box = box.including(at(c, u, v, base + k * Math.PI));
            }
        }
        return box;
    }

    private static Vec3 at(Vec3 c, Vec3 u, Vec3 v, double t) {
        return c.plusScaled(u, Math.cos(t)).plusScaled(v, Math.sin(t));
    }
}
