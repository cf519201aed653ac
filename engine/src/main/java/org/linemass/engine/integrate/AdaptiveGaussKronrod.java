package org.linemass.engine.integrate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.PriorityQueue;
import org.linemass.tolerance.Tolerances;

/**
 * Globally adaptive vector quadrature with the G10-K21 pair ({@link KronrodRule}).
 *
 * <p>Contract: the range is first cut at the given parameters (knots, points of near-zero speed),
 * each piece is integrated with both rules, and the piece with the largest error (per
 * {@link Integrand#errorNorm}) is bisected until the sum of the errors is at most
 * {@code relative} times the integral of |component 0| (a relative target that also works when
 * component 0 changes sign), or the next bisection would exceed {@code maxEvaluations}, or no
 * piece can be bisected further in double precision. The error of each piece is
 * {@code |K21 - G10|} (the error of the Gauss rule, which overestimates the error of the
 * Kronrod result on smooth integrands) plus a rounding term of {@link Tolerances#QUADRATURE_ROUNDING_FACTOR} units of
 * double rounding times the integral of |f|. This is the scheme of QUADPACK's QAG without its
 * empirical error rescaling, so the estimate stays conservative; {@link Result#reportedBound} also
 * never claims less than the target itself.
 *
 * <p>Stateless and thread-safe; the integrand is called from the calling thread only.
 */
public final class AdaptiveGaussKronrod {

    private static final double EPS = Math.ulp(1.0);

    private AdaptiveGaussKronrod() {
    }

    /**
     * One piece of the final partition.
     *
     * @param a start parameter
     * @param b end parameter
     * @param kronrod the K21 estimate of every component
     * @param errors bound on the absolute error of every component of {@code kronrod}
     * @param norm the scalar error of the piece (see {@link Integrand#errorNorm})
     * @param absolute the K21 estimate of the integral of |component 0|
     */
    public record Piece(double a, double b, double[] kronrod, double[] errors, double norm, double absolute) {
    }

    /**
     * The result: the pieces (in parameter order), the number of integrand evaluations, and whether
     * the target was met.
     */
    public record Result(List<Piece> pieces, long evaluations, boolean converged) {

        public Result {
            pieces = List.copyOf(pieces);
        }

        /** Sum of the K21 estimates of one component. */
        public double value(int component) {
            double s = 0;
            double c = 0;
            for (Piece p : pieces) {
                double x = p.kronrod()[component];
                double t = s + x;
                c += Math.abs(s) >= Math.abs(x) ? (s - t) + x : (x - t) + s;
                s = t;
            }
            return s + c;
        }

        /** The integral of |component 0| (K21 estimates summed). */
        public double absoluteIntegral() {
            double sum = 0;
            for (Piece p : pieces) {
                sum += p.absolute();
            }
            return sum;
        }

        /**
         * The error bound to report for component 0: the estimated bound, but never less than the
         * relative target times the integral of |component 0| when the run converged. The embedded
         * rules can agree by luck on a feature narrower than a piece (e.g. the nearly-kinked speed at
         * the ends of a very flat ellipse); the target is what the integrator promises.
         */
        public double reportedBound(double relative) {
            double estimate = errorBound(0);
            return converged ? Math.max(estimate, relative * absoluteIntegral()) : estimate;
        }

        /** Sum of the error bounds of one component. */
        public double errorBound(int component) {
            double s = 0;
            for (Piece p : pieces) {
                s += p.errors()[component];
            }
            return s;
        }
    }

    /**
     * Integrates {@code f} over [cuts[0], cuts[last]].
     *
     * @param cuts ascending parameters, at least two; the first and last are the range ends
     * @param relative target relative error (positive; raised to {@code 2 QUADRATURE_ROUNDING_FACTOR} units of double
     *     rounding if smaller, the accuracy the rounding allows)
     * @param absolute absolute error that is always good enough (zero or positive)
     * @param maxEvaluations cap on integrand evaluations (at least 21 per initial piece are spent anyway)
     */
    public static Result integrate(Integrand f, double[] cuts, double relative, double absolute,
            long maxEvaluations) {
        if (cuts.length < 2) {
            throw new IllegalArgumentException("need at least the two range ends, got " + cuts.length);
        }
        if (!(relative > 0) || !(absolute >= 0)) {
            throw new IllegalArgumentException("bad error targets: relative " + relative + ", absolute " + absolute);
        }
        // the rounding term charged to every piece sums to QUADRATURE_ROUNDING_FACTOR eps times the integral of |f|:
        // a target below twice that could never be met, so it is raised to it
        relative = Math.max(relative, 2 * Tolerances.QUADRATURE_ROUNDING_FACTOR * EPS);
        PriorityQueue<Work> queue = new PriorityQueue<>(Comparator.comparingDouble((Work w) -> -w.norm));
        List<Work> frozen = new ArrayList<>();
        double[] scratch = new double[f.dimension()];
        long evaluations = 0;
        double normSum = 0;
        double absSum = 0;
        for (int i = 0; i + 1 < cuts.length; i++) {
            if (!(cuts[i + 1] > cuts[i])) {
                continue;
            }
            Work w = apply(f, cuts[i], cuts[i + 1], scratch);
            evaluations += KronrodRule.POINTS;
            normSum += w.norm;
            absSum += w.abs0;
            queue.add(w);
        }
        boolean converged = true;
        while (!queue.isEmpty()) {
            double target = Math.max(relative * absSum, absolute);
            if (normSum <= target) {
                break;
            }
            if (evaluations + 2L * KronrodRule.POINTS > maxEvaluations) {
                converged = false;
                break;
            }
            Work worst = queue.poll();
            double mid = 0.5 * (worst.a + worst.b);
            if (!(mid > worst.a && mid < worst.b)) {
                frozen.add(worst);
                continue;
            }
            Work left = apply(f, worst.a, mid, scratch);
            Work right = apply(f, mid, worst.b, scratch);
            evaluations += 2L * KronrodRule.POINTS;
            normSum += left.norm + right.norm - worst.norm;
            absSum += left.abs0 + right.abs0 - worst.abs0;
            queue.add(left);
            queue.add(right);
        }
        if (queue.isEmpty() && !frozen.isEmpty()) {
            converged = normSum <= Math.max(relative * absSum, absolute);
        }
        List<Work> all = new ArrayList<>(queue);
        all.addAll(frozen);
        all.sort(Comparator.comparingDouble((Work w) -> w.a));
        List<Piece> pieces = new ArrayList<>(all.size());
        for (Work w : all) {
            pieces.add(new Piece(w.a, w.b, w.k, w.err, w.norm, w.abs0));
        }
        return new Result(pieces, evaluations, converged);
    }

    /** One application of the G10-K21 pair on [a, b]. */
    private static Work apply(Integrand f, double a, double b, double[] v) {
        int n = f.dimension();
        double centre = 0.5 * (a + b);
        double half = 0.5 * (b - a);
        double[] k = new double[n];
        double[] g = new double[n];
        double[] abs = new double[n];
        f.evaluate(a, b, centre, v);
        for (int c = 0; c < n; c++) {
            k[c] = KronrodRule.WK[10] * v[c];
            abs[c] = Math.abs(k[c]);
        }
        for (int j = 0; j < 10; j++) {
            double x = half * KronrodRule.XK[j];
            double wk = KronrodRule.WK[j];
            double wg = (j % 2 == 1) ? KronrodRule.WG[j / 2] : 0;
            for (int side = -1; side <= 1; side += 2) {
                f.evaluate(a, b, centre + side * x, v);
                for (int c = 0; c < n; c++) {
                    k[c] += wk * v[c];
                    g[c] += wg * v[c];
                    abs[c] += wk * Math.abs(v[c]);
                }
            }
        }
        double scale = Math.abs(half);
        double[] diff = new double[n];
        double[] err = new double[n];
        for (int c = 0; c < n; c++) {
            k[c] *= half;
            g[c] *= half;
            abs[c] *= scale;
            diff[c] = k[c] - g[c];
            err[c] = Math.abs(diff[c]) + Tolerances.QUADRATURE_ROUNDING_FACTOR * EPS * abs[c];
        }
        double norm = f.errorNorm(diff) + Tolerances.QUADRATURE_ROUNDING_FACTOR * EPS * abs[0];
        if (!Double.isFinite(norm)) {
            norm = Double.MAX_VALUE;
        }
        return new Work(a, b, k, err, norm, abs[0]);
    }

    private record Work(double a, double b, double[] k, double[] err, double norm, double abs0) {
    }
}
