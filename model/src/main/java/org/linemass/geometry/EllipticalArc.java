package org.linemass.geometry;

import org.linemass.tolerance.Tolerances;

/**
 * An elliptical arc in any plane written with two conjugate semi-diameters:
 * {@code C(t) = centre + cos t u + sin t v} for t in [t0, t1], {@code 0 < t1 - t0 <= 2 pi}.
 * {@code u} and {@code v} need not be perpendicular, which makes the family closed under every
 * affine map (a non-uniformly scaled circle or ellipse is exactly representable).
 */
public record EllipticalArc(Vec3 centre, Vec3 u, Vec3 v, double t0, double t1, Provenance source)
        implements Segment {

    public static EllipticalArc of(Vec3 centre, Vec3 u, Vec3 v, double t0, double t1, Provenance source) {
        if (!(t1 > t0) || t1 - t0 > 2 * Math.PI * (1 + Tolerances.FULL_TURN_SLACK) || !Double.isFinite(t0) || !Double.isFinite(t1)) {
            throw new IllegalArgumentException("ellipse parameter range must satisfy 0 < t1 - t0 <= 2 pi, got "
                    + t0 + " .. " + t1);
        }
        if (!(u.cross(v).norm() > 0) || !u.isFinite() || !v.isFinite()) {
            throw new IllegalArgumentException("ellipse axes must be finite and independent: " + u + ", " + v);
        }
        return new EllipticalArc(centre, u, v, t0, t1, source);
    }

    @Override
    public Vec3 point(double t) {
        return centre.plusScaled(u, Math.cos(t)).plusScaled(v, Math.sin(t));
    }

    @Override
    public Vec3 derivative(double t) {
        return u.times(-Math.sin(t)).plusScaled(v, Math.cos(t));
    }

    @Override
    public Vec3 secondDerivative(double t) {
        return u.times(-Math.cos(t)).plusScaled(v, -Math.sin(t));
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
        return ConicBounds.of(centre, u, v, t0, t1);
    }

    @Override
    public EllipticalArc transformed(Affine map) {
        return new EllipticalArc(map.apply(centre), map.applyLinear(u), map.applyLinear(v), t0, t1, source);
    }

    @Override
    public EllipticalArc reversed() {
        return new EllipticalArc(centre, u, v.negate(), -t1, -t0, source);
    }

    @Override
    public EllipticalArc withSource(Provenance s) {
        return new EllipticalArc(centre, u, v, t0, t1, s);
    }

    @Override
    public String kind() {
        return "ellipse_arc";
    }
}
