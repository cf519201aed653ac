package org.linemass.engine.integrate;

/**
 * One piece of a spline span as a polynomial curve in homogeneous coordinates of a local variable
 * {@code y} in [-1, 1]: {@code H(y) = (x w, y w, z w, w)}, coefficients {@code c[4k + d]} of
 * {@code y^k} ({@link org.linemass.geometry.Nurbs#spanPolynomial}). The curve is {@code C = A / w}
 * with {@code A} the first three components; for a non-rational spline {@code w} is taken as exactly
 * 1. Evaluation is Horner's rule, with no allocation. Immutable.
 */
final class PolynomialPiece {

    final double[] c;
    final int degree;
    final boolean rational;

    PolynomialPiece(double[] c, int degree, boolean rational) {
        this.c = c;
        this.degree = degree;
        this.rational = rational;
    }

    /** The part of this piece over [ya, yb] of its variable, as a piece of its own on [-1, 1]. */
    PolynomialPiece restricted(double ya, double yb) {
        double centre = 0.5 * (ya + yb);
        double half = 0.5 * (yb - ya);
        double[] out = c.clone();
        for (int d = 0; d < 4; d++) {
            Polynomials.shift(out, d, 4, degree, centre);
        }
        double scale = 1;
        for (int k = 0; k <= degree; k++) {
            for (int d = 0; d < 4; d++) {
                out[4 * k + d] *= scale;
            }
            scale *= half;
        }
        return new PolynomialPiece(out, degree, rational);
    }

    /**
     * Writes the point and its derivative d/dy at {@code y} into {@code out} (x, y, z, dx, dy, dz).
     */
    void evaluate(double y, double[] out) {
        int n = degree;
        double ax = c[4 * n];
        double ay = c[4 * n + 1];
        double az = c[4 * n + 2];
        double aw = c[4 * n + 3];
        double bx = 0;
        double by = 0;
        double bz = 0;
        double bw = 0;
        for (int k = n - 1; k >= 0; k--) {
            bx = bx * y + ax;
            by = by * y + ay;
            bz = bz * y + az;
            bw = bw * y + aw;
            ax = ax * y + c[4 * k];
            ay = ay * y + c[4 * k + 1];
            az = az * y + c[4 * k + 2];
            aw = aw * y + c[4 * k + 3];
        }
        if (!rational) {
            out[0] = ax;
            out[1] = ay;
            out[2] = az;
            out[3] = bx;
            out[4] = by;
            out[5] = bz;
            return;
        }
        double inv = 1 / aw;
        double px = ax * inv;
        double py = ay * inv;
        double pz = az * inv;
        out[0] = px;
        out[1] = py;
        out[2] = pz;
        out[3] = (bx - px * bw) * inv;
        out[4] = (by - py * bw) * inv;
        out[5] = (bz - pz * bw) * inv;
    }
}
