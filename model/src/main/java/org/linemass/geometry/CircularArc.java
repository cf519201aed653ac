package org.linemass.geometry;

import java.util.Objects;
import org.linemass.tolerance.Tolerances;

/**
 * A circular arc in any plane: {@code C(t) = centre + radius (cos t u + sin t v)} for t in
 * [t0, t1], with {@code u}, {@code v} orthonormal and {@code 0 < t1 - t0 <= 2 pi}. The arc runs
 * from {@code u} towards {@code v}; its plane normal is {@code u x v}.
 *
 * <p>Stored as six doubles (centre, radius, t0, t1) and references to the {@code u} and
 * {@code v} vectors it was given: arcs of one plane (every arc of an entity's object coordinate
 * system) then share their axis objects, which keeps a large drawing's model small. The accessors
 * and the exact equality are those of a record with the components of the canonical constructor.
 */
public final class CircularArc implements Segment {

    private final double cx;
    private final double cy;
    private final double cz;
    private final double radius;
    private final double t0;
    private final double t1;
    private final Vec3 u;
    private final Vec3 v;
    private final Provenance source;

    /** Unvalidated constructor: {@code u}, {@code v} must already be orthonormal (see {@link #of}). */
    public CircularArc(Vec3 centre, double radius, Vec3 u, Vec3 v, double t0, double t1, Provenance source) {
        this.cx = centre.x();
        this.cy = centre.y();
        this.cz = centre.z();
        this.radius = radius;
        this.u = Objects.requireNonNull(u, "u");
        this.v = Objects.requireNonNull(v, "v");
        this.t0 = t0;
        this.t1 = t1;
        this.source = source;
    }

    /**
     * Validating factory: normalises u, makes v orthonormal to it, checks the range and radius.
     * When u or v is already exactly normalised the given object is kept (and so shared).
     */
    public static CircularArc of(Vec3 centre, double radius, Vec3 u, Vec3 v, double t0, double t1,
            Provenance source) {
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("arc radius must be positive and finite, got " + radius);
        }
        if (!(t1 > t0) || t1 - t0 > 2 * Math.PI * (1 + Tolerances.FULL_TURN_SLACK) || !Double.isFinite(t0) || !Double.isFinite(t1)) {
            throw new IllegalArgumentException("arc parameter range must satisfy 0 < t1 - t0 <= 2 pi, got "
                    + t0 + " .. " + t1);
        }
        Vec3 uu = u.norm() == 1 ? u : u.unit();
        // v minus its component along uu, normalised; v itself when that changes nothing
        double d = uu.dot(v);
        double wx = v.x() - uu.x() * d;
        double wy = v.y() - uu.y() * d;
        double wz = v.z() - uu.z() * d;
        double n = Math.sqrt(wx * wx + wy * wy + wz * wz);
        Vec3 vv;
        if (n == 1 && Double.compare(wx, v.x()) == 0 && Double.compare(wy, v.y()) == 0
                && Double.compare(wz, v.z()) == 0) {
            vv = v;
        } else {
            vv = new Vec3(wx, wy, wz).unit();
        }
        return new CircularArc(centre, radius, uu, vv, t0, t1, source);
    }

    public Vec3 centre() {
        return new Vec3(cx, cy, cz);
    }

    double cx() {
        return cx;
    }

    double cy() {
        return cy;
    }

    double cz() {
        return cz;
    }

    public double radius() {
        return radius;
    }

    public Vec3 u() {
        return u;
    }

    public Vec3 v() {
        return v;
    }

    public double t0() {
        return t0;
    }

    public double t1() {
        return t1;
    }

    @Override
    public Provenance source() {
        return source;
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
        double a = radius * Math.cos(t);
        double b = radius * Math.sin(t);
        return new Vec3(cx + a * u.x() + b * v.x(), cy + a * u.y() + b * v.y(), cz + a * u.z() + b * v.z());
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
        return ConicBounds.of(centre(), u.times(radius), v.times(radius), t0, t1);
    }

    @Override
    public Segment transformed(Affine map) {
        Vec3 au = map.applyLinear(u.times(radius));
        Vec3 av = map.applyLinear(v.times(radius));
        double nu = au.norm();
        double nv = av.norm();
        double scale = Math.max(nu, nv);
        if (Math.abs(nu - nv) <= Tolerances.CIRCLE_KEPT_RELATIVE * scale
                && Math.abs(au.dot(av)) <= Tolerances.CIRCLE_KEPT_RELATIVE * scale * scale) {
            return new CircularArc(map.apply(centre()), 0.5 * (nu + nv), au.times(1 / nu), av.times(1 / nv),
                    t0, t1, source);
        }
        return new EllipticalArc(map.apply(centre()), au, av, t0, t1, source);
    }

    @Override
    public CircularArc reversed() {
        return new CircularArc(centre(), radius, u, v.negate(), -t1, -t0, source);
    }

    @Override
    public CircularArc withSource(Provenance s) {
        return new CircularArc(centre(), radius, u, v, t0, t1, s);
    }

    @Override
    public String kind() {
        return "circular_arc";
    }

    /** Exact, component by component, with the double comparison records use. */
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof CircularArc c && Double.compare(cx, c.cx) == 0
                && Double.compare(cy, c.cy) == 0 && Double.compare(cz, c.cz) == 0
                && Double.compare(radius, c.radius) == 0 && Double.compare(t0, c.t0) == 0
                && Double.compare(t1, c.t1) == 0 && u.equals(c.u) && v.equals(c.v)
                && Objects.equals(source, c.source);
    }

    @Override
    public int hashCode() {
        return Objects.hash(centre(), radius, u, v, t0, t1, source);
    }

    @Override
    public String toString() {
        return "CircularArc[centre=" + centre() + ", radius=" + radius + ", u=" + u + ", v=" + v + ", t0=" + t0
                + ", t1=" + t1 + ", source=" + source + "]";
    }
}
