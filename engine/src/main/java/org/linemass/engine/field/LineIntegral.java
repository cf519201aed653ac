package org.linemass.engine.field;

import java.util.List;
import org.linemass.engine.integrate.AdaptiveGaussKronrod;
import org.linemass.engine.integrate.ArcLengthMap;
import org.linemass.engine.integrate.Integrand;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.geometry.Segment;

/**
 * The line integral {@code ∫ f(x, y, z, s) ds} of an expression along a piece (its segments in order,
 * each oriented from the previous end), with a bound on its absolute error: the sum of the adaptive
 * Gauss-Kronrod bounds of each segment (relative target against {@code ∫ |f| ds}, so sign changes are
 * fine). {@code s} runs from 0 at the piece's start. Not thread-safe (the expression is mutable).
 */
public final class LineIntegral {

    private LineIntegral() {
    }

    /**
     * The value of an integral with its error bound and the length it ran over.
     *
     * @param value the integral
     * @param errorBound bound on the absolute error of {@code value}
     * @param lengthM the length of the piece
     */
    public record Value(double value, double errorBound, double lengthM) {
    }

    public static Value along(List<Segment> piece, FieldExpression f, double relative) {
        double total = 0;
        double compensation = 0;
        double error = 0;
        double s0 = 0;
        boolean usesS = f.usesArcLength();
        for (Segment seg : piece) {
            ArcLengthMap arc = ArcLengthMap.of(seg, relative, MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
            double offset = s0;
            // the quadrature nodes never touch the ends: a value that fails there must be reported too
            f.at(seg.start(), offset);
            f.at(seg.end(), offset + arc.length());
            Integrand integrand = new Integrand() {
                @Override
                public int dimension() {
                    return 1;
                }

                @Override
                public void evaluate(double a, double b, double t, double[] out) {
                    double s = usesS ? offset + arc.at(t) : offset;
                    out[0] = f.at(seg.point(t), s) * seg.derivative(t).norm();
                }
            };
            double[] cuts = MomentIntegrator.cuts(seg);
            AdaptiveGaussKronrod.Result r = AdaptiveGaussKronrod.integrate(integrand, cuts, relative, 0,
                    Math.max(MomentIntegrator.DEFAULT_MAX_EVALUATIONS,
                            (long) MomentIntegrator.EVALUATIONS_PER_PIECE * (cuts.length - 1)));
            double v = r.value(0);
            double t = total + v;
            compensation += Math.abs(total) >= Math.abs(v) ? (total - t) + v : (v - t) + total;
            total = t;
            error += r.reportedBound(relative);
            s0 += arc.length();
        }
        return new Value(total + compensation, error, s0);
    }
}
