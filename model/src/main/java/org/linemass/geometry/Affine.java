package org.linemass.geometry;

import java.util.OptionalDouble;

/**
 * An immutable affine map {@code p -> M p + t} in three dimensions. Block placements, OCS-to-world
 * maps and unit conversions are all instances. {@code equals} is exact.
 */
public final class Affine {

    public static final Affine IDENTITY = new Affine(1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0);

    private final double m00, m01, m02, m10, m11, m12, m20, m21, m22;
    private final double tx, ty, tz;

    private Affine(double m00, double m01, double m02, double m10, double m11, double m12,
            double m20, double m21, double m22, double tx, double ty, double tz) {
        this.m00 = m00; this.m01 = m01; this.m02 = m02;
        this.m10 = m10; this.m11 = m11; this.m12 = m12;
        this.m20 = m20; this.m21 = m21; this.m22 = m22;
        this.tx = tx; this.ty = ty; this.tz = tz;
    }

    /** A map whose linear part has the given columns and whose translation is {@code t}. */
    public static Affine ofColumns(Vec3 c0, Vec3 c1, Vec3 c2, Vec3 t) {
        return new Affine(c0.x(), c1.x(), c2.x(), c0.y(), c1.y(), c2.y(), c0.z(), c1.z(), c2.z(),
                t.x(), t.y(), t.z());
    }

    /** Row-major linear part (9 values) and translation. */
    public static Affine of(double[] rowMajor, Vec3 t) {
        if (rowMajor.length != 9) {
            throw new IllegalArgumentException("need 9 matrix entries, got " + rowMajor.length);
        }
        double[] m = rowMajor;
        return new Affine(m[0], m[1], m[2], m[3], m[4], m[5], m[6], m[7], m[8], t.x(), t.y(), t.z());
    }

    public static Affine translation(Vec3 t) {
        return new Affine(1, 0, 0, 0, 1, 0, 0, 0, 1, t.x(), t.y(), t.z());
    }

    public static Affine scale(double sx, double sy, double sz) {
        return new Affine(sx, 0, 0, 0, sy, 0, 0, 0, sz, 0, 0, 0);
    }

    public static Affine uniformScale(double s) {
        return scale(s, s, s);
    }

    /** Rotation about the z axis by {@code radians}, counter-clockwise seen from +z. */
    public static Affine rotationZ(double radians) {
        double c = Math.cos(radians);
        double s = Math.sin(radians);
        return new Affine(c, -s, 0, s, c, 0, 0, 0, 1, 0, 0, 0);
    }

    public Vec3 apply(Vec3 p) {
        return new Vec3(m00 * p.x() + m01 * p.y() + m02 * p.z() + tx,
                m10 * p.x() + m11 * p.y() + m12 * p.z() + ty,
                m20 * p.x() + m21 * p.y() + m22 * p.z() + tz);
    }

    /** The linear part applied to a direction (no translation). */
    public Vec3 applyLinear(Vec3 v) {
        return new Vec3(m00 * v.x() + m01 * v.y() + m02 * v.z(),
                m10 * v.x() + m11 * v.y() + m12 * v.z(),
                m20 * v.x() + m21 * v.y() + m22 * v.z());
    }

    /** {@code after ∘ this}: first this map, then {@code after}. */
    public Affine andThen(Affine after) {
        Affine a = after;
        return new Affine(
                a.m00 * m00 + a.m01 * m10 + a.m02 * m20, a.m00 * m01 + a.m01 * m11 + a.m02 * m21,
                a.m00 * m02 + a.m01 * m12 + a.m02 * m22,
                a.m10 * m00 + a.m11 * m10 + a.m12 * m20, a.m10 * m01 + a.m11 * m11 + a.m12 * m21,
                a.m10 * m02 + a.m11 * m12 + a.m12 * m22,
                a.m20 * m00 + a.m21 * m10 + a.m22 * m20, a.m20 * m01 + a.m21 * m11 + a.m22 * m21,
                a.m20 * m02 + a.m21 * m12 + a.m22 * m22,
                a.m00 * tx + a.m01 * ty + a.m02 * tz + a.tx,
                a.m10 * tx + a.m11 * ty + a.m12 * tz + a.ty,
                a.m20 * tx + a.m21 * ty + a.m22 * tz + a.tz);
    }

    public double determinant() {
        return m00 * (m11 * m22 - m12 * m21) - m01 * (m10 * m22 - m12 * m20) + m02 * (m10 * m21 - m11 * m20);
    }

    /** The translation column: where the map sends the origin. */
    public Vec3 translationPart() {
        return new Vec3(tx, ty, tz);
    }

    public Vec3 column(int j) {
        return switch (j) {
            case 0 -> new Vec3(m00, m10, m20);
            case 1 -> new Vec3(m01, m11, m21);
            case 2 -> new Vec3(m02, m12, m22);
            default -> throw new IllegalArgumentException("column " + j + " not in 0..2");
        };
    }

    /** Row-major copy of the linear part. */
    public double[] linearRowMajor() {
        return new double[] {m00, m01, m02, m10, m11, m12, m20, m21, m22};
    }

    /**
     * The scale {@code s} when this map is a similarity ({@code M = s Q} with Q orthogonal, mirrors
     * allowed) to within {@code relTol}; empty otherwise.
     */
    public OptionalDouble similarityScale(double relTol) {
        Vec3 c0 = column(0);
        Vec3 c1 = column(1);
        Vec3 c2 = column(2);
        double s2 = (c0.normSq() + c1.normSq() + c2.normSq()) / 3;
        if (!(s2 > 0) || !Double.isFinite(s2)) {
            return OptionalDouble.empty();
        }
        double tol = relTol * s2;
        if (Math.abs(c0.normSq() - s2) > tol || Math.abs(c1.normSq() - s2) > tol
                || Math.abs(c2.normSq() - s2) > tol || Math.abs(c0.dot(c1)) > tol
                || Math.abs(c0.dot(c2)) > tol || Math.abs(c1.dot(c2)) > tol) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(Math.sqrt(s2));
    }

    public boolean isFinite() {
        for (double d : new double[] {m00, m01, m02, m10, m11, m12, m20, m21, m22, tx, ty, tz}) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Affine a)) {
            return false;
        }
        return java.util.Arrays.equals(values(), a.values());
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(values());
    }

    private double[] values() {
        return new double[] {m00, m01, m02, m10, m11, m12, m20, m21, m22, tx, ty, tz};
    }

    @Override
    public String toString() {
        return "Affine[" + m00 + " " + m01 + " " + m02 + "; " + m10 + " " + m11 + " " + m12 + "; "
                + m20 + " " + m21 + " " + m22 + " | " + tx + " " + ty + " " + tz + "]";
    }
}
