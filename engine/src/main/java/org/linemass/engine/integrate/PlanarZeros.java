package org.linemass.engine.integrate;

/**
 * How far from [-1, 1] the speed of a plane spline piece may be continued analytically: the smallest
 * Bernstein-ellipse parameter {@code rho} of a zero of {@code q = N.N} ({@link SpanQuadrature}).
 *
 * <p>For a curve in a plane z = const, {@code q = N_x^2 + N_y^2 = g(z) conj(g)(z)} with
 * {@code g = N_x + i N_y} and {@code conj(g)} its conjugate-coefficient polynomial, whose zeros are the
 * mirror images of those of {@code g}; the Bernstein ellipses are symmetric about the real axis, so
 * the zeros of {@code g} alone decide. They are found in closed form up to degree 2 (a cubic span's
 * {@code g}), by the Durand-Kerner iteration above (Durand 1960, Kerner 1966: simultaneous Newton
 * steps on all roots), converged to a relative step of {@link #ROOT_STEP}; the caller stays
 * {@link SpanQuadrature#ROOT_MARGIN} inside the nearest, far more than the error of a computed root
 * that is not a near-multiple one. {@code rho} of a point {@code z} is {@code |z + sqrt(z^2 - 1)|}
 * with the branch giving at least 1. Stateless.
 */
final class PlanarZeros {

    /** Relative size of the last Durand-Kerner step that counts as converged (no source). */
    static final double ROOT_STEP = 1e-12;

    private static final int MAX_ITERATIONS = 200;

    private PlanarZeros() {
    }

    /**
     * The smallest {@code rho} of a zero of {@code g = re + i im} (coefficients of {@code z^k});
     * positive infinity when {@code g} has no zero (a constant); NaN when the iteration does not
     * settle.
     */
    static double nearestRho(double[] re, double[] im) {
        int m = Math.max(re.length, im.length) - 1;
        double scale = 0;
        for (int k = 0; k <= m; k++) {
            scale = Math.max(scale, Polynomials.norm(at(re, k), at(im, k)));
        }
        if (!(scale > 0)) {
            return Double.NaN;
        }
        // a leading coefficient at rounding level only puts a root out near scale / lead, far outside
        // any ellipse used here; drop it
        while (m > 0 && Polynomials.norm(at(re, m), at(im, m)) <= 1e-13 * scale) {
            m--;
        }
        if (m == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double[] zr = new double[m];
        double[] zi = new double[m];
        if (!roots(re, im, m, zr, zi)) {
            return Double.NaN;
        }
        double best = Double.POSITIVE_INFINITY;
        for (int j = 0; j < m; j++) {
            best = Math.min(best, rho(zr[j], zi[j]));
        }
        return best;
    }

    private static double at(double[] a, int k) {
        return k < a.length ? a[k] : 0;
    }

    /** {@code |z + sqrt(z^2 - 1)|} on the branch where it is at least 1. */
    static double rho(double x, double y) {
        // w = z^2 - 1
        double wr = x * x - y * y - 1;
        double wi = 2 * x * y;
        double mod = Polynomials.norm(wr, wi);
        double sr = Math.sqrt(0.5 * (mod + wr));
        double si = Math.copySign(Math.sqrt(0.5 * (mod - wr)), wi);
        double plus = Polynomials.norm(x + sr, y + si);
        double minus = Polynomials.norm(x - sr, y - si);
        return Math.max(plus, minus);
    }

    private static boolean roots(double[] re, double[] im, int m, double[] zr, double[] zi) {
        double ar = at(re, m);
        double ai = at(im, m);
        if (m == 1) {
            // z = -g0 / g1
            double[] q = divide(-at(re, 0), -at(im, 0), ar, ai);
            zr[0] = q[0];
            zi[0] = q[1];
            return true;
        }
        if (m == 2) {
            double br = at(re, 1);
            double bi = at(im, 1);
            double cr = at(re, 0);
            double ci = at(im, 0);
            // d = b^2 - 4ac
            double dr = br * br - bi * bi - 4 * (ar * cr - ai * ci);
            double di = 2 * br * bi - 4 * (ar * ci + ai * cr);
            double mod = Polynomials.norm(dr, di);
            double sr = Math.sqrt(0.5 * (mod + dr));
            double si = Math.copySign(Math.sqrt(0.5 * (mod - dr)), di);
            // the stable pair: t = -(b + sign s), z1 = t / 2a, z2 = 2c / t
            if (br * sr + bi * si < 0) {
                sr = -sr;
                si = -si;
            }
            double tr = -(br + sr);
            double ti = -(bi + si);
            if (tr == 0 && ti == 0) {
                zr[0] = 0;
                zi[0] = 0;
                zr[1] = 0;
                zi[1] = 0;
                return true;
            }
            double[] z1 = divide(tr, ti, 2 * ar, 2 * ai);
            double[] z2 = divide(2 * cr, 2 * ci, tr, ti);
            zr[0] = z1[0];
            zi[0] = z1[1];
            zr[1] = z2[0];
            zi[1] = z2[1];
            return true;
        }
        return durandKerner(re, im, m, zr, zi);
    }

    private static boolean durandKerner(double[] re, double[] im, int m, double[] zr, double[] zi) {
        double lr = at(re, m);
        double li = at(im, m);
        // monic coefficients
        double[] cr = new double[m + 1];
        double[] ci = new double[m + 1];
        double bound = 0;
        for (int k = 0; k <= m; k++) {
            double[] q = divide(at(re, k), at(im, k), lr, li);
            cr[k] = q[0];
            ci[k] = q[1];
            if (k < m) {
                bound = Math.max(bound, Polynomials.norm(q[0], q[1]));
            }
        }
        double radius = 1 + bound; // Cauchy's bound on the roots
        for (int j = 0; j < m; j++) {
            double angle = 2 * Math.PI * j / m + 0.4;
            zr[j] = 0.5 * radius * Math.cos(angle);
            zi[j] = 0.5 * radius * Math.sin(angle);
        }
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            double worst = 0;
            for (int j = 0; j < m; j++) {
                // p(z_j) by Horner
                double pr = 1;
                double pi = 0;
                for (int k = m - 1; k >= 0; k--) {
                    double nr = pr * zr[j] - pi * zi[j] + cr[k];
                    double ni = pr * zi[j] + pi * zr[j] + ci[k];
                    pr = nr;
                    pi = ni;
                }
                double dr = 1;
                double di = 0;
                for (int k = 0; k < m; k++) {
                    if (k != j) {
                        double er = zr[j] - zr[k];
                        double ei = zi[j] - zi[k];
                        double nr = dr * er - di * ei;
                        double ni = dr * ei + di * er;
                        dr = nr;
                        di = ni;
                    }
                }
                double[] step = divide(pr, pi, dr, di);
                if (!Double.isFinite(step[0]) || !Double.isFinite(step[1])) {
                    return false;
                }
                zr[j] -= step[0];
                zi[j] -= step[1];
                worst = Math.max(worst, Polynomials.norm(step[0], step[1]) / Math.max(1, Polynomials.norm(zr[j], zi[j])));
            }
            if (worst <= ROOT_STEP) {
                return true;
            }
        }
        return false;
    }

    private static double[] divide(double ar, double ai, double br, double bi) {
        double d = br * br + bi * bi;
        return new double[] {(ar * br + ai * bi) / d, (ai * br - ar * bi) / d};
    }
}
