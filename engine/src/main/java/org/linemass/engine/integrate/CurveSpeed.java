package org.linemass.engine.integrate;

import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;

/**
 * The speed {@code |C'(t)|} of one segment, fast, and lengths between parameters by a fixed
 * composite Gauss-Legendre rule, for the drawing checks, the bender and the marks (which need
 * lengths of parts of curves many times, not error bounds). A spline's knot spans are turned into
 * polynomials ({@link Nurbs#spanPolynomial}, {@link PolynomialPiece}) the first time a parameter in
 * them is asked for, so a speed costs a Horner evaluation instead of a basis-function recursion;
 * other curves use their own derivative. Not thread-safe (the span cache); build one per use.
 */
public final class CurveSpeed {

    // 5-point Gauss-Legendre nodes and weights on [-1, 1] (Abramowitz and Stegun 25.4.30).
    private static final double[] GL_X = {0.0, -0.5384693101056831, 0.5384693101056831,
        -0.9061798459386640, 0.9061798459386640};
    private static final double[] GL_W = {0.5688888888888889, 0.4786286704993665, 0.4786286704993665,
        0.2369268850561891, 0.2369268850561891};

    private final Segment segment;
    private final Nurbs spline;
    /** Start parameters of the spline's spans, ascending, then the end of the last. */
    private final double[] spanStart;
    private final int[] spanIndex;
    private final PolynomialPiece[] pieces;
    private final double[] breakpoints;
    private final double[] scratch = new double[6];

    private CurveSpeed(Segment segment) {
        this.segment = segment;
        if (segment instanceof Nurbs n) {
            spline = n;
            spanIndex = n.spans();
            double[] k = n.knots();
            spanStart = new double[spanIndex.length + 1];
            for (int i = 0; i < spanIndex.length; i++) {
                spanStart[i] = k[spanIndex[i]];
            }
            spanStart[spanIndex.length] = n.tEnd();
            pieces = new PolynomialPiece[spanIndex.length];
            breakpoints = java.util.Arrays.copyOfRange(spanStart, 1, spanIndex.length);
        } else {
            breakpoints = segment.breakpoints();
            spline = null;
            spanIndex = null;
            spanStart = null;
            pieces = null;
        }
    }

    public static CurveSpeed of(Segment segment) {
        return new CurveSpeed(segment);
    }

    /** {@code |C'(t)|}, clamped to the domain as the segment's own derivative is. */
    public double at(double t) {
        if (spline == null) {
            return segment.derivative(t).norm();
        }
        int lo = 0;
        int hi = spanIndex.length - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (spanStart[mid] <= t) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        double a = spanStart[lo];
        double b = spanStart[lo + 1];
        double half = 0.5 * (b - a);
        double x = Math.min(1, Math.max(-1, (t - a - half) / half));
        PolynomialPiece p = pieces[lo];
        if (p == null) {
            p = new PolynomialPiece(spline.spanPolynomial(spanIndex[lo]), spline.degree(), spline.isRational());
            pieces[lo] = p;
        }
        p.evaluate(x, scratch);
        return Math.sqrt(scratch[3] * scratch[3] + scratch[4] * scratch[4] + scratch[5] * scratch[5]) / half;
    }

    /**
     * Arc length between parameters {@code a <= b}: the range is cut at the segment's breakpoints and
     * each smooth part into {@code subdivisions} equal pieces, each by the 5-point Gauss-Legendre rule.
     */
    public double lengthBetween(double a, double b, int subdivisions) {
        double sum = 0;
        double lo = a;
        double[] bp = breakpoints;
        int next = 0;
        while (next < bp.length && bp[next] <= a) {
            next++;
        }
        while (lo < b) {
            double hi = next < bp.length && bp[next] < b ? bp[next++] : b;
            for (int k = 0; k < subdivisions; k++) {
                double x0 = lo + (hi - lo) * k / subdivisions;
                double x1 = lo + (hi - lo) * (k + 1) / subdivisions;
                sum += gauss(x0, x1);
            }
            lo = hi;
        }
        return sum;
    }

    private double gauss(double x0, double x1) {
        double half = 0.5 * (x1 - x0);
        double mid = 0.5 * (x1 + x0);
        double acc = 0;
        for (int i = 0; i < GL_X.length; i++) {
            acc += GL_W[i] * at(mid + half * GL_X[i]);
        }
        return acc * half;
    }
}
