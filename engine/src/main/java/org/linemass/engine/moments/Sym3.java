package org.linemass.engine.moments;

import org.linemass.geometry.Vec3;

/** An immutable symmetric 3x3 tensor. {@code equals} is exact. */
public record Sym3(double xx, double xy, double xz, double yy, double yz, double zz) {

    public static final Sym3 ZERO = new Sym3(0, 0, 0, 0, 0, 0);

    /** The outer product {@code a a^T}. */
    public static Sym3 outer(Vec3 a) {
        return new Sym3(a.x() * a.x(), a.x() * a.y(), a.x() * a.z(), a.y() * a.y(), a.y() * a.z(), a.z() * a.z());
    }

    public Sym3 plus(Sym3 o) {
        return new Sym3(xx + o.xx, xy + o.xy, xz + o.xz, yy + o.yy, yz + o.yz, zz + o.zz);
    }

    public Sym3 minus(Sym3 o) {
        return new Sym3(xx - o.xx, xy - o.xy, xz - o.xz, yy - o.yy, yz - o.yz, zz - o.zz);
    }

    public Sym3 times(double s) {
        return new Sym3(xx * s, xy * s, xz * s, yy * s, yz * s, zz * s);
    }

    public double trace() {
        return xx + yy + zz;
    }

    /**
     * The inertia-type tensor {@code trace(C) I - C} of a covariance-type tensor C; applied to a
     * length covariance it gives the second moment about the centroid J of the JSON report.
     */
    public Sym3 inertiaFromCovariance() {
        double t = trace();
        return new Sym3(t - xx, -xy, -xz, t - yy, -yz, t - zz);
    }

    /** {@code Q C Q^T} for a matrix Q given row-major. */
    public Sym3 rotated(double[] q) {
        double[][] c = toMatrix();
        double[][] qc = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                qc[i][j] = q[3 * i] * c[0][j] + q[3 * i + 1] * c[1][j] + q[3 * i + 2] * c[2][j];
            }
        }
        double[][] r = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                r[i][j] = qc[i][0] * q[3 * j] + qc[i][1] * q[3 * j + 1] + qc[i][2] * q[3 * j + 2];
            }
        }
        return new Sym3(r[0][0], 0.5 * (r[0][1] + r[1][0]), 0.5 * (r[0][2] + r[2][0]), r[1][1],
                0.5 * (r[1][2] + r[2][1]), r[2][2]);
    }

    public double[][] toMatrix() {
        return new double[][] {{xx, xy, xz}, {xy, yy, yz}, {xz, yz, zz}};
    }

    /** Largest absolute entry, for tolerance scaling. */
    public double maxAbs() {
        return Math.max(Math.max(Math.max(Math.abs(xx), Math.abs(xy)), Math.max(Math.abs(xz), Math.abs(yy))),
                Math.max(Math.abs(yz), Math.abs(zz)));
    }

    public boolean isFinite() {
        return Double.isFinite(xx) && Double.isFinite(xy) && Double.isFinite(xz) && Double.isFinite(yy)
                && Double.isFinite(yz) && Double.isFinite(zz);
    }
}
