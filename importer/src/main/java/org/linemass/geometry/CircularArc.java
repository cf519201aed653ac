package org.linemass.geometry;

/**
 * A circular arc in any plane: {@code C(t) = centre + radius (cos t u + sin t v)} for t in
 * [t0, t1], with {@code u}, {@code v} orthonormal and {@code 0 < t1 - t0 <= 2 pi}. The arc runs
 * from {@code u} towards {@code v}; its plane normal is {@code u x v}.
 */
public record CircularArc(Vec3 centre, double radius, Vec3 u, Vec3 v, double t0, double t1,
        Provenance source) implements Segment {

    /** Validating factory: normalises u, makes v orthonormal to it, checks the range and radius. */
    public static CircularArc of(Vec3 centre, double radius, Vec3 u, Vec3 v, double t0, double t1,
            Provenance source) {
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("arc radius must be positive and finite, got " + radius);
        }
        if (!(t1 > t0) || t1 - t0 > 2 * Math.PI * (1 + 1e-12) || !Double.isFinite(t0) || !Double.isFinite(t1)) {
            throw new IllegalArgumentException("arc parameter range must satisfy 0 < t1 - t0 <= 2 pi, got "
                    + t0 + " .. " + t1);
        }
        Vec3 uu = u.unit();
        Vec3 vv = v.minus(uu.times(uu.dot(v))).unit();
        return new CircularArc(centre, radius, uu, vv, t0, t1, source);
    }

    public double sweep() {
        return t1 - t0;
    }

    public double length() {
        return radius * (t1 - t0);
    }

    public Vec3 normal() {
        return u.cross(v);
    }

    @Override
    public Vec3 point(double t) {
        double r = radius;
        return centre.plusScaled(u, r * Math.cos(t)).plusScaled(v, r * Math.sin(t));
    }

    @Override
    public Vec3 derivative(double t) {
        return u.times(-radius * Math.sin(t)).plusScaled(v, radius * Math.cos(t));
    }

    @Override
    public Vec3 secondDerivative(double t) {
        return u.times(-radius * Math.cos(t)).plusScaled(v, -radius * Math.sin(t));
    }

    @Override
    public double tStart() {
        return t0;
    }

    @Override
    public double tEnd() {
        return t1;
    }

    @Override
    public Box3 bounds() {
        return ConicBounds.of(centre, u.times(radius), v.times(radius), t0, t1);
    }

    @Override
    public Segment transformed(Affine map) {
        Vec3 au = map.applyLinear(u.times(radius));
        Vec3 av = map.applyLinear(v.times(radius));
        double nu = au.norm();
        double nv = av.norm();
        double scale = Math.max(nu, nv);
        if (Math.abs(nu - nv) <= 1e-12 * scale && Math.abs(au.dot(av)) <= 1e-12 * scale * scale) {
            return new CircularArc(map.apply(centre), 0.5 * (nu + nv), au.times(1 / nu), av.times(1 / nv),
                    t0, t1, source);
        }
        return new EllipticalArc(map.apply(centre), au, av, t0, t1, source);
    }

    @Override
    public CircularArc reversed() {
        return new CircularArc(centre, radius, u, v.negate(), -t1, -t0, source);
    }

    @Override
    public CircularArc withSource(Provenance s) {
        return new CircularArc(centre, radius, u, v, t0, t1, s);
    }

    @Override
    public String kind() {
        return "circular_arc";
    }
}
