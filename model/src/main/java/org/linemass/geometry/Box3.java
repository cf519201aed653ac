package org.linemass.geometry;

/** An immutable axis-aligned bounding box; {@link #EMPTY} contains nothing. */
public record Box3(Vec3 min, Vec3 max) {

    public static final Box3 EMPTY = new Box3(
            new Vec3(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY),
            new Vec3(Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY));

    public static Box3 of(Vec3 a, Vec3 b) {
        return new Box3(new Vec3(Math.min(a.x(), b.x()), Math.min(a.y(), b.y()), Math.min(a.z(), b.z())),
                new Vec3(Math.max(a.x(), b.x()), Math.max(a.y(), b.y()), Math.max(a.z(), b.z())));
    }

    public boolean isEmpty() {
        return min.x() > max.x();
    }

    public Box3 including(Vec3 p) {
        if (isEmpty()) {
            return new Box3(p, p);
        }
        return new Box3(new Vec3(Math.min(min.x(), p.x()), Math.min(min.y(), p.y()), Math.min(min.z(), p.z())),
                new Vec3(Math.max(max.x(), p.x()), Math.max(max.y(), p.y()), Math.max(max.z(), p.z())));
    }

    public Box3 union(Box3 o) {
        if (o.isEmpty()) {
            return this;
        }
        return including(o.min).including(o.max);
    }

    public Box3 expandedBy(double d) {
        if (isEmpty()) {
            return this;
        }
        Vec3 e = new Vec3(d, d, d);
        return new Box3(min.minus(e), max.plus(e));
    }

    public boolean intersects(Box3 o) {
        return !isEmpty() && !o.isEmpty()
                && min.x() <= o.max.x() && o.min.x() <= max.x()
                && min.y() <= o.max.y() && o.min.y() <= max.y()
                && min.z() <= o.max.z() && o.min.z() <= max.z();
    }

    /** Length of the diagonal; 0 for an empty box. */
    public double diagonal() {
        return isEmpty() ? 0 : max.distance(min);
    }

    public Vec3 centre() {
        return min.plus(max).times(0.5);
    }
}
