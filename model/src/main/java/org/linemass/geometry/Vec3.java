package org.linemass.geometry;

/**
 * An immutable point or vector in three dimensions. {@code equals} is exact; use
 * {@link #closeTo(Vec3, double)} for comparison within a tolerance.
 */
public record Vec3(double x, double y, double z) {

    public static final Vec3 ZERO = new Vec3(0, 0, 0);
    public static final Vec3 X = new Vec3(1, 0, 0);
    public static final Vec3 Y = new Vec3(0, 1, 0);
    public static final Vec3 Z = new Vec3(0, 0, 1);

    public static Vec3 of(double x, double y, double z) {
        return new Vec3(x, y, z);
    }

    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    public Vec3 minus(Vec3 o) {
        return new Vec3(x - o.x, y - o.y, z - o.z);
    }

    public Vec3 times(double s) {
        return new Vec3(x * s, y * s, z * s);
    }

    /** {@code this + s * o}, without the intermediate object. */
    public Vec3 plusScaled(Vec3 o, double s) {
        return new Vec3(x + s * o.x, y + s * o.y, z + s * o.z);
    }

    public double dot(Vec3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    public Vec3 cross(Vec3 o) {
        return new Vec3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    public double norm() {
        return Math.sqrt(x * x + y * y + z * z);
    }

    public double normSq() {
        return x * x + y * y + z * z;
    }

    /** The largest of |x|, |y| and |z| (the magnitude rounding noise is judged from). */
    public double maxAbs() {
        return Math.max(Math.abs(x), Math.max(Math.abs(y), Math.abs(z)));
    }

    public double distance(Vec3 o) {
        double dx = x - o.x;
        double dy = y - o.y;
        double dz = z - o.z;
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    /** The unit vector in this direction; IllegalArgumentException for a zero or non-finite vector. */
    public Vec3 unit() {
        double n = norm();
        if (!(n > 0) || !Double.isFinite(n)) {
            throw new IllegalArgumentException("cannot normalise vector " + this);
        }
        return new Vec3(x / n, y / n, z / n);
    }

    public Vec3 negate() {
        return new Vec3(-x, -y, -z);
    }

    public boolean isFinite() {
        return Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z);
    }

    /** True when every coordinate differs by at most {@code tol}. */
    public boolean closeTo(Vec3 o, double tol) {
        return Math.abs(x - o.x) <= tol && Math.abs(y - o.y) <= tol && Math.abs(z - o.z) <= tol;
    }

    public double get(int axis) {
        return switch (axis) {
            case 0 -> x;
            case 1 -> y;
            case 2 -> z;
            default -> throw new IllegalArgumentException("axis " + axis + " not in 0..2");
        };
    }

    public double[] toArray() {
        return new double[] {x, y, z};
    }
}
