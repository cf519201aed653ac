package org.linemass.geometry;

/**
 * The circular arc of one polyline piece from OCS vertex (x1, y1) to (x2, y2) at elevation z with
 * bulge b = tan(theta / 4), b != 0 (FACTS.md §7.5): chord c, radius r = c (1 + b^2) / (4 |b|),
 * centre on the left normal at signed distance c (1 - b^2) / (4 b) from the chord midpoint,
 * counter-clockwise about the OCS z axis for b > 0. The centre is mapped to the world by
 * {@code map}; u is the frame's x axis and v its y axis (b > 0) or negated y axis (b < 0), and t0
 * is the start vertex's angle. Deterministic ({@link StrictMath}), so the same inputs always give
 * an equal arc: the packed model rebuilds arcs from their vertices and bulge.
 */
public final class BulgeArc {

    private BulgeArc() {
    }

    /**
     * The arc; {@link IllegalArgumentException} when the vertices coincide or the values give no
     * finite arc.
     */
    public static CircularArc of(double x1, double y1, double x2, double y2, double z, double b, Affine map, Vec3 x,
            Vec3 y, Vec3 minusY, Provenance p) {
        double dx = x2 - x1;
        double dy = y2 - y1;
        double c = StrictMath.hypot(dx, dy);
        if (!(c > 0) || b == 0) {
            throw new IllegalArgumentException("a bulge arc needs two distinct vertices and a bulge, got (" + x1 + ", "
                    + y1 + ") to (" + x2 + ", " + y2 + ") with bulge " + b);
        }
        double ux = dx / c;
        double uy = dy / c;
        double h = c * (1 - b * b) / (4 * b);
        double cx = 0.5 * (x1 + x2) - h * uy;
        double cy = 0.5 * (y1 + y2) + h * ux;
        double r = c * (1 + b * b) / (4 * Math.abs(b));
        double sweep = 4 * StrictMath.atan(Math.abs(b));
        double t0 = b > 0 ? StrictMath.atan2(y1 - cy, x1 - cx) : StrictMath.atan2(cy - y1, x1 - cx);
        return CircularArc.of(map.apply(new Vec3(cx, cy, z)), r, x, b > 0 ? y : minusY, t0, t0 + sweep, p);
    }
}
