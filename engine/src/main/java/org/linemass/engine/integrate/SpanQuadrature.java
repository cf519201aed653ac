package org.linemass.engine.integrate;

import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Length moments (unit density) of one smooth piece of a curve by the fixed 20-point Gauss-Legendre
 * rule ({@link GaussLegendre#N20}), with an a-priori bound on the error that is proved, not
 * estimated, or no result when that bound does not meet the target.
 *
 * <p>The bound: if an integrand {@code f} on [-1, 1] is analytic in the open Bernstein ellipse
 * {@code E_rho} (foci -1 and 1, semi-axes summing to {@code rho > 1}) and {@code |f| <= M} there,
 * the n-point Gauss rule errs by at most {@code 64 M / (15 (1 - rho^-2) rho^(2n))} (Trefethen, "Is
 * Gauss quadrature better than Clenshaw-Curtis?", SIAM Review 50 (2008), Theorem 4.5; the same in
 * his Approximation Theory and Approximation Practice, Theorem 19.3). The integrands are
 * {@code |C'| [1, d, d d^T]} with {@code d = C - C(0)}: for a piece of a polynomial or rational spline
 * {@code |C'| = sqrt(q) / w^2} with {@code q = N.N}, {@code N = P' w - P w'} and {@code P = A - C(0) w}
 * polynomials, so they are analytic wherever {@code q} and {@code w} have no zero (the square root
 * taking the branch that is positive on [-1, 1]; the ellipse is simply connected). The ellipse is
 * covered by discs centred on the real axis ({@link #discs}); on a disc of radius {@code r} about
 * {@code c} the Taylor coefficients {@code p_k} at {@code c} give {@code |p(z)| <= sum |p_k| r^k} and
 * {@code |p(z)| >= |p_0| - sum_{k>=1} |p_k| r^k} exactly (a polynomial is its Taylor sum). When the
 * lower bounds of {@code |q|} and {@code |w|} are positive on every disc, {@code M} for each component
 * follows, and with it the bound. An ellipse piece {@code c + u cos t + v sin t} uses the closed form
 * {@code q = h^2 (A + R cos(2t + phi))} and {@code |cos(x + iy)| <= cosh y} on the strip the mapped
 * ellipse lies in.
 *
 * <p>A piece is accepted when its bound, in the units of {@link MomentIntegrator}'s error norm (length,
 * first moments over the extent, second moments over its square), is at most half the relative
 * target times its length; the ladder {@link #RHOS} is tried from the largest ellipse down. The
 * length's bound adds {@link Tolerances#QUADRATURE_ROUNDING_FACTOR} units of double rounding times
 * the length, as the adaptive rule does. Stateless and thread-safe.
 */
final class SpanQuadrature {

    /** The Bernstein ellipses tried, largest first (more than 2.2 would not meet 1e-10 with 20 points). */
    static final double[] RHOS = {4.0, 2.8, 2.2};

    private static final GaussLegendre RULE = GaussLegendre.N20;

    private static final double EPS = Math.ulp(1.0);

    /** Padding of the computed bounds for the rounding of the bound's own arithmetic (no source). */
    private static final double BOUND_PADDING = 1 + 1e-9;

    private SpanQuadrature() {
    }

    /**
     * The result of one piece: its moments (the error bound on the length in {@link Moments#errorBound})
     * and the chord between its ends.
     */
    record Piece(Moments moments, double chord, int evaluations) {

        /** Whether the bound was met ({@link #moments} is null otherwise). */
        boolean accepted() {
            return moments != null;
        }
    }

    /** No ellipse in {@link #RHOS} keeps the integrand analytic: the rule was not applied. */
    private static final Piece FAILED = new Piece(null, 0, 0);

    /** The rule was applied but its bound does not meet the target. */
    private static final Piece FAILED_AFTER_RULE = new Piece(null, 0, GaussLegendre.N20.points());

    /** The Gauss-Legendre factor {@code 64 / (15 (1 - rho^-2) rho^(2n))}. */
    static double factor(double rho, int n) {
        return 64.0 / (15.0 * (1 - 1 / (rho * rho)) * Math.pow(rho, 2.0 * n));
    }

    /**
     * The moments of a spline piece, or a piece not {@link Piece#accepted} when the bound does not meet {@code relative}.
     *
     * @param extent the segment's extent (scale of the first and second moments in the error norm)
     */
    static Piece integrate(PolynomialPiece p, double extent, double relative) {
        double[] v = new double[6];
        p.evaluate(0, v);
        double rx = v[0];
        double ry = v[1];
        double rz = v[2];
        Centred cp = new Centred(p, rx, ry, rz);
        double limit = cp.planar() ? PlanarZeros.nearestRho(cp.n[0], cp.n[1]) : Double.NaN;
        double[] s = null;
        double[] rhos = Double.isNaN(limit) ? RHOS : new double[] {Math.min(RHOS[0], limit / ROOT_MARGIN)};
        for (double rho : rhos) {
            if (!(rho > MIN_RHO)) {
                continue;
            }
            double[] m = Double.isNaN(limit) ? coverBounds(cp, rho) : planarBounds(cp, rho);
            if (m == null) {
                continue;
            }
            if (s == null) {
                s = new double[10];
                double[] xs = RULE.x;
                double[] ws = RULE.w;
                for (int i = 0; i < xs.length; i++) {
                    p.evaluate(xs[i], v);
                    double speed = Math.sqrt(v[3] * v[3] + v[4] * v[4] + v[5] * v[5]);
                    accumulate(s, ws[i] * speed, v[0] - rx, v[1] - ry, v[2] - rz);
                }
                if (!(s[0] > 0) || !Double.isFinite(s[0])) {
                    return FAILED_AFTER_RULE;
                }
            }
            double length = s[0];
            double f = factor(rho, RULE.points()) * BOUND_PADDING;
            double e0 = f * m[0];
            double norm = e0 + f * (3 * m[1] / extent + 6 * m[2] / (extent * extent));
            if (norm <= 0.5 * relative * length) {
                p.evaluate(-1, v);
                double ax = v[0];
                double ay = v[1];
                double az = v[2];
                p.evaluate(1, v);
                double chord = Math.sqrt(sq(v[0] - ax) + sq(v[1] - ay) + sq(v[2] - az));
                double err = e0 + Tolerances.QUADRATURE_ROUNDING_FACTOR * EPS * length;
                return new Piece(moments(s, new Vec3(rx, ry, rz), err), chord, RULE.points());
            }
        }
        return s == null ? FAILED : FAILED_AFTER_RULE;
    }

    /**
     * The moments of the ellipse piece {@code centre + u cos t + v sin t}, t in [mid - half, mid + half],
     * or a piece not {@link Piece#accepted} when the bound does not meet {@code relative}.
     */
    static Piece integrateEllipse(Vec3 centre, Vec3 u, Vec3 w, double mid, double half, double extent,
            double relative) {
        double uu = u.dot(u);
        double vv = w.dot(w);
        double uv = u.dot(w);
        double meanQ = 0.5 * (uu + vv);
        double ampQ = Polynomials.norm(0.5 * (vv - uu), uv);
        double cm = Math.cos(mid);
        double sm = Math.sin(mid);
        double rx = centre.x() + u.x() * cm + w.x() * sm;
        double ry = centre.y() + u.y() * cm + w.y() * sm;
        double rz = centre.z() + u.z() * cm + w.z() * sm;
        double[] s = null;
        double reach = u.norm() + w.norm();
        for (double rho : RHOS) {
            double a = 0.5 * (rho + 1 / rho);
            double b = 0.5 * (rho - 1 / rho);
            double ch = Math.cosh(2 * half * b);
            double lowQ = meanQ - ampQ * ch;
            if (!(lowQ > EPS * meanQ * 64)) {
                continue;
            }
            if (s == null) {
                s = ellipseRule(centre, u, w, mid, half, rx, ry, rz);
                if (!(s[0] > 0) || !Double.isFinite(s[0])) {
                    return FAILED_AFTER_RULE;
                }
            }
            double length = s[0];
            double m0 = half * Math.sqrt(meanQ + ampQ * ch);
            double radius = reach * Math.expm1(half * a);
            double f = factor(rho, RULE.points()) * BOUND_PADDING;
            double e0 = f * m0;
            double norm = e0 + f * m0 * (3 * radius / extent + 6 * radius * radius / (extent * extent));
            if (norm <= 0.5 * relative * length) {
                Vec3 p0 = centre.plusScaled(u, Math.cos(mid - half)).plusScaled(w, Math.sin(mid - half));
                Vec3 p1 = centre.plusScaled(u, Math.cos(mid + half)).plusScaled(w, Math.sin(mid + half));
                double err = e0 + Tolerances.QUADRATURE_ROUNDING_FACTOR * EPS * length;
                return new Piece(moments(s, new Vec3(rx, ry, rz), err), p1.minus(p0).norm(), RULE.points());
            }
        }
        return s == null ? FAILED : FAILED_AFTER_RULE;
    }

    private static double[] ellipseRule(Vec3 centre, Vec3 u, Vec3 w, double mid, double half, double rx, double ry,
            double rz) {
        double[] s = new double[10];
        double[] xs = RULE.x;
        double[] ws = RULE.w;
        for (int i = 0; i < xs.length; i++) {
            double t = mid + half * xs[i];
            double ct = Math.cos(t);
            double st = Math.sin(t);
            double dx = half * (w.x() * ct - u.x() * st);
            double dy = half * (w.y() * ct - u.y() * st);
            double dz = half * (w.z() * ct - u.z() * st);
            double speed = Math.sqrt(dx * dx + dy * dy + dz * dz);
            accumulate(s, ws[i] * speed, centre.x() + u.x() * ct + w.x() * st - rx,
                    centre.y() + u.y() * ct + w.y() * st - ry, centre.z() + u.z() * ct + w.z() * st - rz);
        }
        return s;
    }

    private static void accumulate(double[] s, double w, double dx, double dy, double dz) {
        s[0] += w;
        s[1] += w * dx;
        s[2] += w * dy;
        s[3] += w * dz;
        s[4] += w * dx * dx;
        s[5] += w * dx * dy;
        s[6] += w * dx * dz;
        s[7] += w * dy * dy;
        s[8] += w * dy * dz;
        s[9] += w * dz * dz;
    }

    private static double sq(double x) {
        return x * x;
    }

    private static Moments moments(double[] k, Vec3 ref, double err) {
        double m = k[0];
        Vec3 d = new Vec3(k[1] / m, k[2] / m, k[3] / m);
        Sym3 raw = new Sym3(k[4], k[5], k[6], k[7], k[8], k[9]);
        return new Moments(m, ref.plus(d), raw.minus(Sym3.outer(d).times(m)), err);
    }

    /**
     * The centres of discs of equal radius, on the real axis, that together cover the Bernstein
     * ellipse {@code E_rho}: {@code [centres..., radius]}. The ellipse lies in the rectangle
     * {@code |Re z| <= a, |Im z| <= b}; each disc holds a slice of it {@code 2a / K} wide.
     */
    static double[] discs(double rho) {
        double a = 0.5 * (rho + 1 / rho);
        double b = 0.5 * (rho - 1 / rho);
        int k = (int) Math.min(16, Math.max(2, Math.ceil(2 * a / b)));
        double[] out = new double[k + 1];
        double hw = a / k;
        for (int j = 0; j < k; j++) {
            out[j] = -a + (2 * j + 1) * hw;
        }
        out[k] = Polynomials.norm(hw, b);
        return out;
    }

    /**
     * The polynomials of a spline piece about its middle point {@code r = C(0)}: {@code P = A - r w}
     * (three components), {@code w} (exactly 1 for a non-rational spline) and
     * {@code N = P' w - P w'} (just {@code P'} when non-rational), so that {@code C' = N / w^2} and
     * {@code C - r = P / w}.
     */
    static final class Centred {
        final double[][] pd = new double[3][];
        final double[] w;
        final double[][] n = new double[3][];
        final boolean rational;

        Centred(PolynomialPiece p, double rx, double ry, double rz) {
            int deg = p.degree;
            rational = p.rational;
            w = new double[deg + 1];
            double[] ref = {rx, ry, rz};
            for (int k = 0; k <= deg; k++) {
                w[k] = rational ? p.c[4 * k + 3] : (k == 0 ? 1 : 0);
            }
            for (int d = 0; d < 3; d++) {
                pd[d] = new double[deg + 1];
                for (int k = 0; k <= deg; k++) {
                    pd[d][k] = p.c[4 * k + d] - ref[d] * w[k];
                }
                n[d] = rational
                        ? Polynomials.minus(Polynomials.times(Polynomials.derivative(pd[d]), w),
                                Polynomials.times(pd[d], Polynomials.derivative(w)))
                        : Polynomials.derivative(pd[d]);
            }
        }

        /**
         * Whether the piece lies in a plane z = const (its z part at most {@link #PLANAR} of the others:
         * that part adds to {@code q} at that level squared, moving its zeros far less than
         * {@link #ROOT_MARGIN} allows).
         */
        boolean planar() {
            double xy = 0;
            double z = 0;
            for (int k = 0; k < pd[0].length; k++) {
                xy = Math.max(xy, Math.max(Math.abs(pd[0][k]), Math.abs(pd[1][k])));
                z = Math.max(z, Math.abs(pd[2][k]));
            }
            return z <= PLANAR * xy;
        }
    }

    /** Relative size of a z part that still counts as plane ({@link Centred#planar}; no source). */
    static final double PLANAR = 1e-13;

    /**
     * How far inside the nearest zero of {@code q} the ellipse stays ({@code rho = rho_zero / margin}):
     * covers the error of the computed zero many times over (no source).
     */
    static final double ROOT_MARGIN = 1.15;

    /** Ellipses thinner than this are not worth trying with 20 points (the bound cannot meet 1e-10). */
    static final double MIN_RHO = 1.5;

    /**
     * Bounds for a plane piece whose {@code q} has no zero in {@code E_rho} ({@link PlanarZeros}): on
     * the disc {@code |z| <= a} that holds the ellipse, {@code |q| <= (sum |g_k| a^k)^2} with
     * {@code g = N_x + i N_y}, {@code |P| <= sum |P_k| a^k} per component, and a rational piece's
     * {@code |w|} from below by the disc cover. Null when {@code w} may vanish.
     */
    static double[] planarBounds(Centred cp, double rho) {
        double a = 0.5 * (rho + 1 / rho);
        double g = 0;
        double[] nx = cp.n[0];
        double[] ny = cp.n[1];
        for (int k = Math.max(nx.length, ny.length) - 1; k >= 0; k--) {
            double gx = k < nx.length ? nx[k] : 0;
            double gy = k < ny.length ? ny[k] : 0;
            g = g * a + Polynomials.norm(gx, gy);
        }
        double reach2 = 0;
        for (int d = 0; d < 3; d++) {
            double u = Polynomials.upper(cp.pd[d], a);
            reach2 += u * u;
        }
        double wLow = 1;
        if (cp.rational) {
            wLow = Double.POSITIVE_INFINITY;
            double[] cover = discs(rho);
            double r = cover[cover.length - 1];
            for (int j = 0; j + 1 < cover.length; j++) {
                double[] wc = Polynomials.shifted(cp.w, cover[j]);
                wLow = Math.min(wLow, Polynomials.lower(wc, r) - 64 * EPS * Polynomials.upper(wc, r));
            }
            if (!(wLow > 0)) {
                return null;
            }
        }
        double speed = g * BOUND_PADDING / (wLow * wLow);
        double reach = Math.sqrt(reach2) * BOUND_PADDING / wLow;
        return new double[] {speed, speed * reach, speed * reach * reach};
    }

    /**
     * Bounds {@code M} of the length, first-moment and second-moment integrands (scaled as
     * {@code |C'|}, {@code |C'| |d|}, {@code |C'| |d|^2}) on {@code E_rho} by the disc cover, or null
     * when the cover cannot show that {@code q} and {@code w} have no zero there (any piece, plane or
     * not).
     */
    static double[] coverBounds(Centred cp, double rho) {
        double[] q = null;
        for (int d = 0; d < 3; d++) {
            double[] sq = Polynomials.times(cp.n[d], cp.n[d]);
            q = q == null ? sq : Polynomials.plus(q, sq);
        }
        double[] cover = discs(rho);
        double r = cover[cover.length - 1];
        double m0 = 0;
        double m1 = 0;
        double m2 = 0;
        for (int j = 0; j + 1 < cover.length; j++) {
            double c = cover[j];
            double[] qc = Polynomials.shifted(q, c);
            double qLow = Polynomials.lower(qc, r) - 64 * EPS * Polynomials.upper(qc, r);
            if (!(qLow > 0)) {
                return null;
            }
            double qHigh = Polynomials.upper(qc, r) * BOUND_PADDING;
            double wLow = 1;
            if (cp.rational) {
                double[] wc = Polynomials.shifted(cp.w, c);
                wLow = Polynomials.lower(wc, r) - 64 * EPS * Polynomials.upper(wc, r);
                if (!(wLow > 0)) {
                    return null;
                }
            }
            double reach2 = 0;
            for (int d = 0; d < 3; d++) {
                double u = Polynomials.upper(Polynomials.shifted(cp.pd[d], c), r) * BOUND_PADDING;
                reach2 += u * u;
            }
            double speed = Math.sqrt(qHigh) / (wLow * wLow);
            double reach = Math.sqrt(reach2) / wLow;
            m0 = Math.max(m0, speed);
            m1 = Math.max(m1, speed * reach);
            m2 = Math.max(m2, speed * reach * reach);
        }
        return new double[] {m0, m1, m2};
    }
}
