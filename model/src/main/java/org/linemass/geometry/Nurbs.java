package org.linemass.geometry;

import java.util.Arrays;

/**
 * A rational B-spline curve of any degree: control points {@code P_i}, weights {@code w_i > 0} and
 * a non-decreasing knot vector with {@code knots = points + degree + 1}. The curve is defined on
 * [knot[degree], knot[points]]; this is narrower than the whole knot vector for unclamped
 * (periodic) splines. Evaluation follows Piegl and Tiller, The NURBS Book, algorithms A2.1 and A2.3,
 * in homogeneous coordinates. Arrays are copied in and out; instances are immutable.
 */
public final class Nurbs implements Segment {

    /**
     * Largest ratio of two weights of one spline. A span whose weights differ by a factor R moves
     * over parameter widths of about 1/R of the span near its ends; integrators grade their cuts
     * towards those ends in about log2(R) steps, so the ratio bounds that work. 1e100 is far beyond
     * any weight a drafting program writes (conic arcs need ratios of a few); no source.
     */
    public static final double MAX_WEIGHT_RATIO = 1e100;

    private final int degree;
    private final double[] knots;
    private final Vec3[] points;
    private final double[] weights;
    private final Provenance source;

    private Nurbs(int degree, double[] knots, Vec3[] points, double[] weights, Provenance source) {
        this.degree = degree;
        this.knots = knots;
        this.points = points;
        this.weights = weights;
        this.source = source;
    }

    /**
     * Validating factory. {@code weights} may be null for a non-rational spline.
     *
     * @throws IllegalArgumentException naming the inconsistency (counts, order of knots, weights)
     */
    public static Nurbs of(int degree, double[] knots, Vec3[] points, double[] weights, Provenance source) {
        if (degree < 1) {
            throw new IllegalArgumentException("spline degree must be at least 1, got " + degree);
        }
        if (points.length < degree + 1) {
            throw new IllegalArgumentException("spline of degree " + degree + " needs at least "
                    + (degree + 1) + " control points, got " + points.length);
        }
        if (knots.length != points.length + degree + 1) {
            throw new IllegalArgumentException("spline with " + points.length + " control points and degree "
                    + degree + " needs " + (points.length + degree + 1) + " knots, got " + knots.length);
        }
        for (int i = 0; i < knots.length; i++) {
            if (!Double.isFinite(knots[i])) {
                throw new IllegalArgumentException("spline knot " + i + " is not finite: " + knots[i]);
            }
            if (i > 0 && knots[i] < knots[i - 1]) {
                throw new IllegalArgumentException("spline knots decrease at index " + i + ": "
                        + knots[i - 1] + " then " + knots[i]);
            }
        }
        if (!(knots[points.length] > knots[degree])) {
            throw new IllegalArgumentException("spline parameter range is empty: knot[" + degree + "] = "
                    + knots[degree] + ", knot[" + points.length + "] = " + knots[points.length]);
        }
        if (weights != null && weights.length != points.length) {
            throw new IllegalArgumentException("spline has " + points.length + " control points but "
                    + weights.length + " weights");
        }
        double[] w = new double[points.length];
        for (int i = 0; i < points.length; i++) {
            w[i] = weights == null ? 1.0 : weights[i];
            if (!(w[i] > 0) || !Double.isFinite(w[i])) {
                throw new IllegalArgumentException("spline weight " + i + " must be positive, got " + w[i]);
            }
            if (!points[i].isFinite()) {
                throw new IllegalArgumentException("spline control point " + i + " is not finite: " + points[i]);
            }
        }
        double wLo = Arrays.stream(w).min().orElse(1);
        double wHi = Arrays.stream(w).max().orElse(1);
        if (wHi > MAX_WEIGHT_RATIO * wLo) {
            throw new IllegalArgumentException("spline weights differ by more than a factor "
                    + MAX_WEIGHT_RATIO + " (smallest " + wLo + ", largest " + wHi + ")");
        }
        return new Nurbs(degree, knots.clone(), points.clone(), w, source);
    }

    public int degree() {
        return degree;
    }

    public double[] knots() {
        return knots.clone();
    }

    public Vec3[] controlPoints() {
        return points.clone();
    }

    public double[] weights() {
        return weights.clone();
    }

    public boolean isRational() {
        for (double w : weights) {
            if (w != weights[0]) {
                return true;
            }
        }
        return false;
    }

    @Override
    public double tStart() {
        return knots[degree];
    }

    @Override
    public double tEnd() {
        return knots[points.length];
    }

    @Override
    public Provenance source() {
        return source;
    }

    @Override
    public Nurbs withSource(Provenance s) {
        return new Nurbs(degree, knots, points, weights, s);
    }

    @Override
    public String kind() {
        return "spline";
    }

    @Override
    public double[] breakpoints() {
        double a = tStart();
        double b = tEnd();
        return Arrays.stream(knots).filter(k -> k > a && k < b).distinct().toArray();
    }

    @Override
    public Vec3 point(double t) {
        return evaluate(t, 0)[0];
    }

    @Override
    public Vec3 derivative(double t) {
        return evaluate(t, 1)[1];
    }

    @Override
    public Vec3 secondDerivative(double t) {
        return evaluate(t, 2)[2];
    }

    /** Point and derivatives up to {@code order} (at most 2) at {@code t}, clamped to the domain. */
    public Vec3[] evaluate(double t, int order) {
        double tc = Math.min(Math.max(t, tStart()), tEnd());
        int span = findSpan(tc);
        double[][] ders = basisDerivatives(span, tc, order);
        double[][] a = new double[order + 1][3];
        double[] w = new double[order + 1];
        // the curve does not change when all weights are scaled: divide by the largest acting on
        // this span, so that extreme weights (1e50) neither overflow nor swamp the sums
        double wMax = 0;
        for (int j = 0; j <= degree; j++) {
            wMax = Math.max(wMax, weights[span - degree + j]);
        }
        for (int k = 0; k <= order; k++) {
            for (int j = 0; j <= degree; j++) {
                int i = span - degree + j;
                double nw = ders[k][j] * (weights[i] / wMax);
                Vec3 p = points[i];
                a[k][0] += nw * p.x();
                a[k][1] += nw * p.y();
                a[k][2] += nw * p.z();
                w[k] += nw;
            }
        }
        Vec3[] out = new Vec3[order + 1];
        Vec3 c = new Vec3(a[0][0] / w[0], a[0][1] / w[0], a[0][2] / w[0]);
        out[0] = c;
        if (order >= 1) {
            out[1] = new Vec3(a[1][0] - w[1] * c.x(), a[1][1] - w[1] * c.y(), a[1][2] - w[1] * c.z()).times(1 / w[0]);
        }
        if (order >= 2) {
            Vec3 d1 = out[1];
            out[2] = new Vec3(a[2][0] - 2 * w[1] * d1.x() - w[2] * c.x(),
                    a[2][1] - 2 * w[1] * d1.y() - w[2] * c.y(),
                    a[2][2] - 2 * w[1] * d1.z() - w[2] * c.z()).times(1 / w[0]);
        }
        return out;
    }

    /**
     * The indices {@code s} of the non-empty knot spans [knot[s], knot[s + 1]] inside the domain, in
     * ascending order: the pieces on which the curve is one rational polynomial.
     */
    public int[] spans() {
        int[] out = new int[points.length - degree];
        int n = 0;
        for (int s = degree; s < points.length; s++) {
            if (knots[s + 1] > knots[s]) {
                out[n++] = s;
            }
        }
        return Arrays.copyOf(out, n);
    }

    /**
     * The curve on knot span {@code s} (one of {@link #spans()}) as a polynomial in homogeneous
     * coordinates of the local variable {@code x} in [-1, 1], {@code u = mid + half x}: returns
     * {@code 4 (degree + 1)} coefficients, {@code c[4k + d]} the coefficient of {@code x^k} in
     * component {@code d} (x w, y w, z w, w). The weights are divided by the largest acting on the
     * span, as {@link #evaluate} does. The coefficients are the Taylor coefficients at the span's
     * middle, {@code H^(k)(mid) half^k / k!}, from all basis derivatives there (The NURBS Book,
     * A2.3), so they are exact up to rounding.
     */
    public double[] spanPolynomial(int s) {
        if (s < degree || s >= points.length || !(knots[s + 1] > knots[s])) {
            throw new IllegalArgumentException("not a non-empty span of this spline: " + s);
        }
        double half = 0.5 * (knots[s + 1] - knots[s]);
        double mid = knots[s] + half;
        double[][] ders = basisDerivatives(s, mid, degree);
        double wMax = 0;
        for (int j = 0; j <= degree; j++) {
            wMax = Math.max(wMax, weights[s - degree + j]);
        }
        double[] c = new double[4 * (degree + 1)];
        double scale = 1;
        for (int k = 0; k <= degree; k++) {
            double ax = 0;
            double ay = 0;
            double az = 0;
            double aw = 0;
            for (int j = 0; j <= degree; j++) {
                int i = s - degree + j;
                double nw = ders[k][j] * (weights[i] / wMax);
                Vec3 p = points[i];
                ax += nw * p.x();
                ay += nw * p.y();
                az += nw * p.z();
                aw += nw;
            }
            c[4 * k] = ax * scale;
            c[4 * k + 1] = ay * scale;
            c[4 * k + 2] = az * scale;
            c[4 * k + 3] = aw * scale;
            scale *= half / (k + 1);
        }
        return c;
    }

    private int findSpan(double t) {
        int n = points.length - 1;
        if (t >= knots[n + 1]) {
            // last non-empty span
            int s = n;
            while (s > degree && knots[s] >= knots[n + 1]) {
                s--;
            }
            return s;
        }
        int low = degree;
        int high = n + 1;
        int mid = (low + high) >>> 1;
        while (t < knots[mid] || t >= knots[mid + 1]) {
            if (t < knots[mid]) {
                high = mid;
            } else {
                low = mid;
            }
            mid = (low + high) >>> 1;
        }
        return mid;
    }

    /** The NURBS Book A2.3: non-zero basis functions and their derivatives up to {@code n}. */
    private double[][] basisDerivatives(int span, double u, int n) {
        int p = degree;
        double[][] ndu = new double[p + 1][p + 1];
        double[] left = new double[p + 1];
        double[] right = new double[p + 1];
        ndu[0][0] = 1.0;
        for (int j = 1; j <= p; j++) {
            left[j] = u - knots[span + 1 - j];
            right[j] = knots[span + j] - u;
            double saved = 0.0;
            for (int r = 0; r < j; r++) {
                ndu[j][r] = right[r + 1] + left[j - r];
                double temp = ndu[r][j - 1] / ndu[j][r];
                ndu[r][j] = saved + right[r + 1] * temp;
                saved = left[j - r] * temp;
            }
            ndu[j][j] = saved;
        }
        double[][] ders = new double[n + 1][p + 1];
        for (int j = 0; j <= p; j++) {
            ders[0][j] = ndu[j][p];
        }
        double[][] a = new double[2][p + 1];
        for (int r = 0; r <= p; r++) {
            int s1 = 0;
            int s2 = 1;
            a[0][0] = 1.0;
            for (int k = 1; k <= n; k++) {
                double d = 0.0;
                int rk = r - k;
                int pk = p - k;
                if (r >= k) {
                    a[s2][0] = a[s1][0] / ndu[pk + 1][rk];
                    d = a[s2][0] * ndu[rk][pk];
                }
                int j1 = rk >= -1 ? 1 : -rk;
                int j2 = (r - 1 <= pk) ? k - 1 : p - r;
                for (int j = j1; j <= j2; j++) {
                    a[s2][j] = (a[s1][j] - a[s1][j - 1]) / ndu[pk + 1][rk + j];
                    d += a[s2][j] * ndu[rk + j][pk];
                }
                if (r <= pk) {
                    a[s2][k] = -a[s1][k - 1] / ndu[pk + 1][r];
                    d += a[s2][k] * ndu[r][pk];
                }
                ders[k][r] = d;
                int tmp = s1;
                s1 = s2;
                s2 = tmp;
            }
        }
        double factor = p; // p! / (p - k)!, which overflows an int for high degrees
        for (int k = 1; k <= n; k++) {
            for (int j = 0; j <= p; j++) {
                ders[k][j] *= factor;
            }
            factor *= p - k;
        }
        return ders;
    }

    @Override
    public Box3 bounds() {
        // The curve lies in the convex hull of the control points that act on its domain.
        Box3 box = Box3.EMPTY;
        for (Vec3 p : points) {
            box = box.including(p);
        }
        return box;
    }

    @Override
    public Nurbs transformed(Affine map) {
        Vec3[] q = new Vec3[points.length];
        for (int i = 0; i < q.length; i++) {
            q[i] = map.apply(points[i]);
        }
        return new Nurbs(degree, knots, q, weights, source);
    }

    @Override
    public Nurbs reversed() {
        int n = points.length;
        Vec3[] q = new Vec3[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            q[i] = points[n - 1 - i];
            w[i] = weights[n - 1 - i];
        }
        double[] k = new double[knots.length];
        for (int i = 0; i < knots.length; i++) {
            k[i] = -knots[knots.length - 1 - i];
        }
        return new Nurbs(degree, k, q, w, source);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Nurbs n && degree == n.degree && Arrays.equals(knots, n.knots)
                && Arrays.equals(points, n.points) && Arrays.equals(weights, n.weights)
                && source.equals(n.source);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(knots) + Arrays.hashCode(points);
    }

    @Override
    public String toString() {
        return "Nurbs[degree=" + degree + ", points=" + points.length + ", source=" + source + "]";
    }
}
