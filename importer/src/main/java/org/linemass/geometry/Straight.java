package org.linemass.geometry;

/** The straight segment from {@code a} ({@code t = 0}) to {@code b} ({@code t = 1}). */
public record Straight(Vec3 a, Vec3 b, Provenance source) implements Segment {

    @Override
    public Vec3 point(double t) {
        return a.plusScaled(b.minus(a), t);
    }

    @Override
    public Vec3 derivative(double t) {
        return b.minus(a);
    }

    @Override
    public Vec3 secondDerivative(double t) {
        return Vec3.ZERO;
    }

    @Override
    public double tStart() {
        return 0;
    }

    @Override
    public double tEnd() {
        return 1;
    }

    public double length() {
        return a.distance(b);
    }

    @Override
    public Box3 bounds() {
        return Box3.of(a, b);
    }

    @Override
    public Straight transformed(Affine map) {
        return new Straight(map.apply(a), map.apply(b), source);
    }

    @Override
    public Straight reversed() {
        return new Straight(b, a, source);
    }

    @Override
    public Straight withSource(Provenance s) {
        return new Straight(a, b, s);
    }

    @Override
    public Vec3 start() {
        return a;
    }

    @Override
    public Vec3 end() {
        return b;
    }

    @Override
    public String kind() {
        return "line";
    }
}
