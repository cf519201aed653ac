package org.linemass.engine.integrate;

/**
 * Small operations on polynomials in the power basis, coefficients {@code a[k]} of {@code x^k}
 * (or every {@code stride}-th element from {@code offset} for interleaved components). Stateless.
 */
final class Polynomials {

    private Polynomials() {
    }

    /**
     * Rewrites the coefficients in place as those of {@code P(centre + x)} (Taylor shift by repeated
     * synthetic division, Horner's scheme; Knuth, TAOCP vol. 2, 4.6.4).
     */
    static void shift(double[] a, int offset, int stride, int degree, double centre) {
        if (centre == 0) {
            return;
        }
        for (int i = 0; i < degree; i++) {
            for (int j = degree - 1; j >= i; j--) {
                a[offset + stride * j] += centre * a[offset + stride * (j + 1)];
            }
        }
    }

    /** The coefficients of {@code P(centre + x)} in a new array. */
    static double[] shifted(double[] a, double centre) {
        double[] out = a.clone();
        shift(out, 0, 1, a.length - 1, centre);
        return out;
    }

    /**
     * {@code sqrt(x^2 + y^2)} without {@link Math#hypot}'s care for overflow, which the values here
     * (drawing coordinates and their derivatives) never come near, at a fraction of its cost.
     */
    static double norm(double x, double y) {
        return Math.sqrt(x * x + y * y);
    }

    /** The product of two polynomials. */
    static double[] times(double[] p, double[] q) {
        double[] out = new double[p.length + q.length - 1];
        for (int i = 0; i < p.length; i++) {
            for (int j = 0; j < q.length; j++) {
                out[i + j] += p[i] * q[j];
            }
        }
        return out;
    }

    /** {@code p - q}, padded to the longer. */
    static double[] minus(double[] p, double[] q) {
        double[] out = new double[Math.max(p.length, q.length)];
        for (int i = 0; i < p.length; i++) {
            out[i] += p[i];
        }
        for (int i = 0; i < q.length; i++) {
            out[i] -= q[i];
        }
        return out;
    }

    /** {@code p + q}, padded to the longer. */
    static double[] plus(double[] p, double[] q) {
        double[] out = new double[Math.max(p.length, q.length)];
        for (int i = 0; i < p.length; i++) {
            out[i] += p[i];
        }
        for (int i = 0; i < q.length; i++) {
            out[i] += q[i];
        }
        return out;
    }

    /** The derivative (an array of at least one coefficient). */
    static double[] derivative(double[] p) {
        if (p.length <= 1) {
            return new double[] {0};
        }
        double[] out = new double[p.length - 1];
        for (int k = 1; k < p.length; k++) {
            out[k - 1] = k * p[k];
        }
        return out;
    }

    /** {@code sum |a_k| r^k}: no less than |P(z)| on the disc |z| <= r. */
    static double upper(double[] a, double r) {
        double s = 0;
        for (int k = a.length - 1; k >= 0; k--) {
            s = s * r + Math.abs(a[k]);
        }
        return s;
    }

    /** {@code |a_0| - sum_{k >= 1} |a_k| r^k}: no more than |P(z)| on the disc |z| <= r. */
    static double lower(double[] a, double r) {
        double tail = 0;
        for (int k = a.length - 1; k >= 1; k--) {
            tail = (tail + Math.abs(a[k])) * r;
        }
        return Math.abs(a[0]) - tail;
    }
}
