package org.linemass.engine.integrate;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;

/**
 * Length moments of a spline (weights within {@link SplineParts#RATIO_TO_SPLIT} on every span) or an
 * elliptical arc by the fixed rule of {@link SpanQuadrature} where its proved bound meets the
 * target, piece by piece: every knot span of a spline, every equal part of at most a quarter turn of
 * an ellipse. A piece whose bound fails is halved, down to {@link #MAX_DEPTH} halvings; when a half
 * still fails then, the whole span or part is integrated by the adaptive rule ({@link AdaptiveGaussKronrod} through
 * {@link MomentIntegrator.Sums}) with the cuts the adaptive path would use on that range
 * ({@link SpeedZeros}: near-zero speed, which also defeats the bound). Stateless.
 */
final class FixedPieces {

    /** Halvings of a span before the adaptive rule takes over (at most 2^3 = 8 pieces per span). */
    static final int MAX_DEPTH = 3;

    private FixedPieces() {
    }

    static void integrate(Segment seg, double relative, long maxEvaluations, MomentIntegrator.Sums sums) {
        double extent = seg.bounds().diagonal();
        if (!(extent > 0)) {
            extent = 1;
        }
        if (seg instanceof Nurbs n) {
            boolean rational = n.isRational();
            double[] k = n.knots();
            int[] spans = n.spans();
            long budget = MomentIntegrator.budget(maxEvaluations, spans.length);
            for (int s : spans) {
                PolynomialPiece whole = new PolynomialPiece(n.spanPolynomial(s), n.degree(), rational);
                spline(n, whole, k[s], k[s + 1], extent, relative, budget, sums);
            }
        } else if (seg instanceof EllipticalArc e) {
            double t0 = e.t0();
            double t1 = e.t1();
            int parts = (int) Math.max(1, Math.ceil((t1 - t0) / MomentIntegrator.MAX_SPAN_RAD));
            long budget = MomentIntegrator.budget(maxEvaluations, parts);
            for (int p = 0; p < parts; p++) {
                double a = t0 + (t1 - t0) * p / parts;
                double b = p == parts - 1 ? t1 : t0 + (t1 - t0) * (p + 1) / parts;
                ellipse(e, a, b, extent, relative, budget, sums);
            }
        } else {
            throw new IllegalArgumentException("no fixed rule for " + seg.kind());
        }
    }

    private static void spline(Nurbs n, PolynomialPiece whole, double ta, double tb, double extent,
            double relative, long budget, MomentIntegrator.Sums sums) {
        List<SpanQuadrature.Piece> done = new ArrayList<>();
        int[] spent = new int[1];
        if (spline(whole, ta, tb, 0, extent, relative, done, spent)) {
            for (SpanQuadrature.Piece p : done) {
                sums.add(p, relative);
            }
            return;
        }
        sums.evaluations += spent[0];
        adaptive(n, SpeedZeros.cuts(n, ta, tb, Double.POSITIVE_INFINITY), relative, budget, sums);
    }

    /** Whether the piece, halved as needed, met the bound everywhere; the pieces go to {@code done}. */
    private static boolean spline(PolynomialPiece piece, double ta, double tb, int depth, double extent,
            double relative, List<SpanQuadrature.Piece> done, int[] spent) {
        SpanQuadrature.Piece r = SpanQuadrature.integrate(piece, extent, relative);
        spent[0] += r.evaluations();
        if (r.accepted()) {
            done.add(r);
            return true;
        }
        double tm = 0.5 * (ta + tb);
        if (depth >= MAX_DEPTH || !(tm > ta && tm < tb)) {
            return false;
        }
        return spline(piece.restricted(-1, 0), ta, tm, depth + 1, extent, relative, done, spent)
                && spline(piece.restricted(0, 1), tm, tb, depth + 1, extent, relative, done, spent);
    }

    private static void ellipse(EllipticalArc e, double a, double b, double extent, double relative, long budget,
            MomentIntegrator.Sums sums) {
        List<SpanQuadrature.Piece> done = new ArrayList<>();
        int[] spent = new int[1];
        if (ellipse(e, a, b, 0, extent, relative, done, spent)) {
            for (SpanQuadrature.Piece p : done) {
                sums.add(p, relative);
            }
            return;
        }
        sums.evaluations += spent[0];
        adaptive(e, SpeedZeros.cuts(e, a, b, MomentIntegrator.MAX_SPAN_RAD), relative, budget, sums);
    }

    private static boolean ellipse(EllipticalArc e, double a, double b, int depth, double extent, double relative,
            List<SpanQuadrature.Piece> done, int[] spent) {
        double mid = 0.5 * (a + b);
        SpanQuadrature.Piece r = SpanQuadrature.integrateEllipse(e.centre(), e.u(), e.v(), mid, 0.5 * (b - a),
                extent, relative);
        spent[0] += r.evaluations();
        if (r.accepted()) {
            done.add(r);
            return true;
        }
        if (depth >= MAX_DEPTH || !(mid > a && mid < b)) {
            return false;
        }
        return ellipse(e, a, mid, depth + 1, extent, relative, done, spent)
                && ellipse(e, mid, b, depth + 1, extent, relative, done, spent);
    }

    private static void adaptive(Segment seg, double[] cuts, double relative, long budget,
            MomentIntegrator.Sums sums) {
        // the segment's budget is shared: what the fixed rule spent is not available again
        sums.add(seg, cuts, LinearDensity.UNIT, null, relative, Math.max(0, budget - sums.evaluations));
    }
}
