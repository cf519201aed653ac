package org.linemass.geometry;

import java.util.Objects;

/**
 * The straight segment from {@code a} ({@code t = 0}) to {@code b} ({@code t = 1}).
 *
 * <p>Stored as six doubles rather than two {@link Vec3} objects: straights are most of a large
 * drawing's segments, and this keeps the imported model well under the size of the file text.
 * Equality is exact on the end points and the provenance.
 */
public final class Straight implements Segment {

    private final double ax;
    private final double ay;
    private final double az;
    private final double bx;
    private final double by;
    private final double bz;
    private final Provenance source;

    public Straight(Vec3 a, Vec3 b, Provenance source) {
        this(a.x(), a.y(), a.z(), b.x(), b.y(), b.z(), source);
    }

    /** The straight from (ax, ay, az) to (bx, by, bz), without intermediate vectors. */
    public Straight(double ax, double ay, double az, double bx, double by, double bz, Provenance source) {
        this.ax = ax;
        this.ay = ay;
        this.az = az;
        this.bx = bx;
        this.by = by;
        this.bz = bz;
        this.source = source;
    }

    double ax() {
        return ax;
    }

    double ay() {
        return ay;
    }

    double az() {
        return az;
    }

    double bx() {
        return bx;
    }

    double by() {
        return by;
    }

    double bz() {
        return bz;
    }

    public Vec3 a() {
        return new Vec3(ax, ay, az);
    }

    public Vec3 b() {
        return new Vec3(bx, by, bz);
    }

    @Override
    public Provenance source() {
        return source;
    }

    @Override
    public Vec3 point(double t) {
        return new Vec3(ax + t * (bx - ax), ay + t * (by - ay), az + t * (bz - az));
    }

    @Override
    public Vec3 derivative(double t) {
        return new Vec3(bx - ax, by - ay, bz - az);
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
        double dx = bx - ax;
        double dy = by - ay;
        double dz = bz - az;
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    @Override
    public Box3 bounds() {
        return new Box3(new Vec3(Math.min(ax, bx), Math.min(ay, by), Math.min(az, bz)),
                new Vec3(Math.max(ax, bx), Math.max(ay, by), Math.max(az, bz)));
    }

    @Override
    public Straight transformed(Affine map) {
        return new Straight(map.apply(a()), map.apply(b()), source);
    }

    @Override
    public Straight reversed() {
        return new Straight(bx, by, bz, ax, ay, az, source);
    }

    @Override
    public Straight withSource(Provenance s) {
        return new Straight(ax, ay, az, bx, by, bz, s);
    }

    @Override
    public Vec3 start() {
        return a();
    }

    @Override
    public Vec3 end() {
        return b();
    }

    @Override
    public String kind() {
        return "line";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Straight s && a().equals(s.a()) && b().equals(s.b()) && source.equals(s.source);
    }

    @Override
    public int hashCode() {
        return Objects.hash(a(), b(), source);
    }

    @Override
    public String toString() {
        return "Straight[a=" + a() + ", b=" + b() + ", source=" + source + "]";
    }
}
