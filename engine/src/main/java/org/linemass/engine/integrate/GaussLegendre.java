package org.linemass.engine.integrate;

/**
 * The n-point Gauss-Legendre rule on [-1, 1] (exact for polynomials of degree 2n - 1): nodes are the
 * roots of the Legendre polynomial P_n, found by Newton's method from the asymptotic first guess
 * {@code cos(pi (i + 3/4) / (n + 1/2))} with the three-term recurrence, weights
 * {@code 2 / ((1 - x^2) P_n'(x)^2)} (Abramowitz and Stegun 25.4.29). Immutable.
 */
final class GaussLegendre {

    /** The rule the fixed span quadrature uses ({@link SpanQuadrature}). */
    static final GaussLegendre N20 = of(20);

    /** Nodes, ascending. */
    final double[] x;

    /** Weights matching {@link #x}. */
    final double[] w;

    private GaussLegendre(double[] x, double[] w) {
        this.x = x;
        this.w = w;
    }

    static GaussLegendre of(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("need at least one node, got " + n);
        }
        double[] x = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < (n + 1) / 2; i++) {
            double z = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            for (int it = 0; it < 100; it++) {
                double[] p = legendre(n, z);
                double step = p[0] / (n * (z * p[0] - p[1]) / (z * z - 1));
                z -= step;
                if (Math.abs(step) <= 1e-17) {
                    break;
                }
            }
            // the derivative at the converged root, for the weight
            double[] p = legendre(n, z);
            double dp = n == 1 ? 1 : n * (z * p[0] - p[1]) / (z * z - 1);
            double weight = 2 / ((1 - z * z) * dp * dp);
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = weight;
            w[n - 1 - i] = weight;
        }
        if (n % 2 == 1) {
            x[n / 2] = 0;
        }
        return new GaussLegendre(x, w);
    }

    /** P_n(z) and P_(n-1)(z) by the three-term recurrence (n >= 1). */
    private static double[] legendre(int n, double z) {
        double p0 = 1;
        double p1 = z;
        for (int k = 2; k <= n; k++) {
            double p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k;
            p0 = p1;
            p1 = p2;
        }
        return new double[] {p1, p0};
    }

    int points() {
        return x.length;
    }
}
