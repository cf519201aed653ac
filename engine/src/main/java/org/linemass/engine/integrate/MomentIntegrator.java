package org.linemass.engine.integrate;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Moments (mass, centroid, central second moment, error bound) of one segment under a linear
 * density. Constant density on a straight or circular arc uses the closed forms
 * ({@link StraightMoments}, {@link ArcMoments}); everything else is integrated with
 * {@link AdaptiveGaussKronrod}: the range is cut at knots, at quarter turns ({@link #MAX_SPAN_RAD})
 * and where the speed nearly vanishes ({@link SpeedZeros}); every piece is integrated about its own
 * mid-point and turned into central moments there, and the pieces are combined by the
 * parallel-axis rule with compensated summation ({@link MomentsAccumulator}). The error of the
 * first and second moments is controlled too (scaled by the segment's extent and its square). The
 * error bound is {@link AdaptiveGaussKronrod.Result#reportedBound}: the estimate, and at least the
 * target once converged.
 *
 * <p>Stateless and thread-safe (the density must be too if shared across threads). A negative or
 * non-finite density is the caller's business: {@link LinearDensity} implementations reject them.
 */
public final class MomentIntegrator {

    /** Default cap on integrand evaluations per segment (about 9,500 pieces of 21 points). */
    public static final long DEFAULT_MAX_EVALUATIONS = 200_000;

    /** Initial pieces of conics span at most this many radians of parameter (a quarter turn). */
    public static final double MAX_SPAN_RAD = Math.PI / 2;

    private MomentIntegrator() {
    }

    /**
     * Where the integrators cut a segment before adapting: its ends, its breakpoints (knots), quarter
     * turns of conics and points where its speed nearly vanishes. Ascending.
     */
    public static double[] cuts(Segment seg) {
        // the span limit is an angle for conics; a spline's parameter has no such meaning
        if (seg instanceof Nurbs n) {
            return SplineParts.withGrading(n, SpeedZeros.cuts(seg, Double.POSITIVE_INFINITY));
        }
        return SpeedZeros.cuts(seg, MAX_SPAN_RAD);
    }

    /**
     * Whether the segment is a spline with a span whose weights differ by more than
     * {@link SplineParts#RATIO_TO_SPLIT}: such spans are integrated half by half on local copies, and
     * fixed-rule lengths elsewhere should ask this integrator instead.
     */
    public static boolean stronglyWeighted(Segment seg) {
        return seg instanceof Nurbs n && SplineParts.worstSpanRatio(n) > SplineParts.RATIO_TO_SPLIT;
    }

    /**
     * The evaluation budget for a segment cut into {@code pieces} initial pieces: the caller's cap, but
     * at least {@link #EVALUATIONS_PER_PIECE} per initial piece, so that a spline with many knot spans
     * gets a budget in proportion to its size.
     */
    static long budget(long maxEvaluations, int pieces) {
        return Math.max(maxEvaluations, (long) EVALUATIONS_PER_PIECE * pieces);
    }

    /** Minimum budget per initial piece: eight applications of the 21-point rule. */
    public static final int EVALUATIONS_PER_PIECE = 8 * 21;

    /** A result with the work it took. */
    public record Result(Moments moments, long evaluations, boolean converged) {
    }

    /** Length moments (unit density) of a segment. */
    public static Moments lengthMoments(Segment seg, double relative) {
        return integrate(seg, LinearDensity.UNIT, 0, relative, DEFAULT_MAX_EVALUATIONS).moments();
    }

    /**
     * Length moments of a segment by the adaptive rule alone, cut as {@link #cuts} says, without the
     * fixed rule of {@link SpanQuadrature}: the integrator as it was before the fixed rule, for
     * cross-checks and benchmarks.
     */
    public static Result integrateAdaptive(Segment seg, double relative, long maxEvaluations) {
        Sums sums = new Sums();
        double[] cuts = cuts(seg);
        sums.add(seg, cuts, LinearDensity.UNIT, null, relative, budget(maxEvaluations, cuts.length - 1));
        Moments m = sums.acc.result();
        double bound = sums.bound;
        if (seg instanceof Nurbs n) {
            bound = bracketed(m.mass(), bound, sums.chords, SplineParts.polygonLength(n));
        }
        return new Result(new Moments(m.mass(), m.centroid(), m.covariance(), bound), sums.evaluations,
                sums.converged);
    }

    /**
     * Moments of a segment under {@code density}. Under unit density a spline whose weights stay
     * within {@link SplineParts#RATIO_TO_SPLIT} on every span, and an elliptical arc, are integrated
     * by the fixed rule wherever its proved bound meets the target ({@link FixedPieces}), by the
     * adaptive rule elsewhere.
     *
     * @param sOffsetM arc length of the piece before this segment's start (metres), for densities in s
     * @param relative target relative error
     * @param maxEvaluations cap on integrand evaluations, raised to {@link #EVALUATIONS_PER_PIECE} per initial
     *     piece for long splines (the arc-length map of a curve in s may spend as much again)
     */
    public static Result integrate(Segment seg, LinearDensity density, double sOffsetM, double relative,
            long maxEvaluations) {
        if (density == LinearDensity.UNIT) {
            if (seg instanceof Straight s) {
                return new Result(StraightMoments.of(s), 0, true);
            }
            if (seg instanceof CircularArc c) {
                return new Result(ArcMoments.of(c), 0, true);
            }
        }
        List<SplineParts.Part> parts = seg instanceof Nurbs n ? SplineParts.of(n) : null;
        Sums sums = new Sums();
        double length;
        if (density == LinearDensity.UNIT && parts == null && (seg instanceof Nurbs || seg instanceof EllipticalArc)) {
            FixedPieces.integrate(seg, relative, maxEvaluations, sums);
        } else if (parts == null) {
            ArcLengthMap arc = density.usesArcLength() ? ArcLengthMap.of(seg, relative, maxEvaluations) : null;
            length = arc == null ? 0 : arc.length();
            checkEnds(seg, density, sOffsetM, length);
            double[] cuts = cuts(seg);
            sums.add(seg, cuts, density, arc == null ? null : t -> sOffsetM + arc.at(t), relative,
                    budget(maxEvaluations, cuts.length - 1));
        } else {
            length = integrateParts(parts, density, sOffsetM, relative, maxEvaluations, sums);
            checkEnds(seg, density, sOffsetM, length);
        }
        Moments m = sums.acc.result();
        double bound = sums.bound;
        if (density == LinearDensity.UNIT && seg instanceof Nurbs n) {
            bound = bracketed(m.mass(), bound, sums.chords, SplineParts.polygonLength(n));
        }
        m = m.mass() == 0 ? new Moments(0, seg.start(), Sym3.ZERO, bound)
                : new Moments(m.mass(), m.centroid(), m.covariance(), bound);
        return new Result(m, sums.evaluations, sums.converged);
    }

    /**
     * The length bound, widened so that it holds for sure when the integrated length {@code m} falls
     * outside [sum of chords between piece ends, length of the control polygon], which holds the true
     * length of any spline with positive weights (corner cutting never lengthens a polygon).
     */
    static double bracketed(double m, double bound, double chords, double polygon) {
        double lower = chords * (1 - Tolerances.LENGTH_BRACKET_ROUNDING);
        double upper = polygon * (1 + Tolerances.LENGTH_BRACKET_ROUNDING);
        if (m > upper) {
            return Math.max(bound, m - lower);
        }
        if (m < lower) {
            return Math.max(bound, upper - m);
        }
        return bound;
    }

    // the quadrature nodes never touch the ends: evaluate there too, so that a density that fails at
    // an end (1 / (x - x0) starting at x0) is reported instead of integrated towards infinity
    private static void checkEnds(Segment seg, LinearDensity density, double sOffsetM, double length) {
        density.kgPerM(seg.start(), sOffsetM);
        density.kgPerM(seg.end(), sOffsetM + length);
    }

    /**
     * Integrates the parts of a spline ({@link SplineParts}) in order; returns the length measured
     * along the way when the density needs arc length (else 0).
     */
    private static double integrateParts(List<SplineParts.Part> parts, LinearDensity density, double sOffsetM,
            double relative, long maxEvaluations, Sums sums) {
        long perPart = Math.max(1, maxEvaluations / parts.size());
        double base = sOffsetM;
        for (int i = 0; i + 1 < parts.size(); i += 2) {
            SplineParts.Part fwd = parts.get(i);
            SplineParts.Part back = parts.get(i + 1);
            DoubleUnaryOperator sFwd = null;
            DoubleUnaryOperator sBack = null;
            double spanLength = 0;
            if (density.usesArcLength()) {
                ArcLengthMap af = ArcLengthMap.of(fwd.curve(), relative, perPart);
                ArcLengthMap ab = ArcLengthMap.of(back.curve(), relative, perPart);
                double half = fwd.cuts()[fwd.cuts().length - 1];
                double halfBack = back.cuts()[back.cuts().length - 1];
                double span = af.at(half) + ab.at(halfBack);
                double from = base;
                sFwd = t -> from + af.at(t);
                sBack = t -> from + span - ab.at(t);
                spanLength = span;
            }
            sums.add(fwd.curve(), fwd.cuts(), density, sFwd, relative, budget(perPart, fwd.cuts().length - 1));
            sums.add(back.curve(), back.cuts(), density, sBack, relative, budget(perPart, back.cuts().length - 1));
            base += spanLength;
        }
        return base - sOffsetM;
    }

    /** Moments, bound, chord sum and work summed over the ranges integrated so far. Not thread-safe. */
    static final class Sums {
        final MomentsAccumulator acc = new MomentsAccumulator();
        double bound;
        double chords;
        long evaluations;
        boolean converged = true;

        /** Adds one piece integrated by the fixed rule. */
        void add(SpanQuadrature.Piece p, double relative) {
            acc.add(p.moments());
            chords += p.chord();
            bound += Math.max(p.moments().errorBound(), relative * p.moments().mass());
            evaluations += p.evaluations();
        }

        void add(Segment seg, double[] cuts, LinearDensity density, DoubleUnaryOperator sOf, double relative,
                long budget) {
            double extent = seg.bounds().diagonal();
            MomentIntegrand f = new MomentIntegrand(seg, density, sOf, extent > 0 ? extent : 1);
            AdaptiveGaussKronrod.Result r = AdaptiveGaussKronrod.integrate(f, cuts, relative, 0, budget);
            for (AdaptiveGaussKronrod.Piece p : r.pieces()) {
                acc.add(f.pieceMoments(p));
                chords += seg.point(p.b()).minus(seg.point(p.a())).norm();
            }
            bound += r.reportedBound(relative);
            evaluations += r.evaluations();
            converged &= r.converged();
        }
    }

    /** The integrand {@code lambda |C'| [1, d, d d^T]} with {@code d = C(t) - C(mid of piece)}. */
    private static final class MomentIntegrand implements Integrand {
        private final Segment seg;
        private final LinearDensity density;
        private final DoubleUnaryOperator sOf;
        private final double extent;
        private double lastA = Double.NaN;
        private double lastB = Double.NaN;
        private Vec3 reference;

        MomentIntegrand(Segment seg, LinearDensity density, DoubleUnaryOperator sOf, double extent) {
            this.seg = seg;
            this.density = density;
            this.sOf = sOf;
            this.extent = extent;
        }

        @Override
        public int dimension() {
            return 10;
        }

        private Vec3 referenceFor(double a, double b) {
            if (a != lastA || b != lastB) {
                lastA = a;
                lastB = b;
                reference = seg.point(0.5 * (a + b));
            }
            return reference;
        }

        @Override
        public void evaluate(double a, double b, double t, double[] out) {
            Vec3 ref = referenceFor(a, b);
            Vec3 p = seg.point(t);
            double lambda = density.kgPerM(p, sOf == null ? 0 : sOf.applyAsDouble(t));
            double w = lambda * seg.derivative(t).norm();
            double dx = p.x() - ref.x();
            double dy = p.y() - ref.y();
            double dz = p.z() - ref.z();
            out[0] = w;
            out[1] = w * dx;
            out[2] = w * dy;
            out[3] = w * dz;
            out[4] = w * dx * dx;
            out[5] = w * dx * dy;
            out[6] = w * dx * dz;
            out[7] = w * dy * dy;
            out[8] = w * dy * dz;
            out[9] = w * dz * dz;
        }

        @Override
        public double errorNorm(double[] d) {
            double first = Math.abs(d[1]) + Math.abs(d[2]) + Math.abs(d[3]);
            double second = 0;
            for (int i = 4; i < 10; i++) {
                second += Math.abs(d[i]);
            }
            return Math.abs(d[0]) + first / extent + second / (extent * extent);
        }

        Moments pieceMoments(AdaptiveGaussKronrod.Piece piece) {
            double[] k = piece.kronrod();
            Vec3 ref = seg.point(0.5 * (piece.a() + piece.b()));
            double m = k[0];
            double err = piece.errors()[0];
            if (!(m > 0)) {
                return new Moments(0, ref, Sym3.ZERO, err);
            }
            Vec3 d = new Vec3(k[1] / m, k[2] / m, k[3] / m);
            Sym3 raw = new Sym3(k[4], k[5], k[6], k[7], k[8], k[9]);
            return new Moments(m, ref.plus(d), raw.minus(Sym3.outer(d).times(m)), err);
        }
    }
}
