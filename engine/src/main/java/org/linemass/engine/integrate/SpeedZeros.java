package org.linemass.engine.integrate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.linemass.geometry.Segment;
import org.linemass.tolerance.Tolerances;

/**
 * Parameters where the speed {@code |C'(t)|} of a curve nearly vanishes (cusps of splines with
 * repeated control points): the integrand {@code |C'|} has a kink there, so the integrator cuts the
 * range at them. Contract: samples {@link #SAMPLES} points per span, takes every interior local
 * minimum below {@link Tolerances#NEAR_ZERO_SPEED} times the span's largest sampled speed, and refines it with a
 * golden-section search. Returns the minima in ascending order (may be empty). {@link #cuts} also
 * grades the cuts towards every such point (see {@code graded}).
 */
final class SpeedZeros {

    /** Samples per span. */
    static final int SAMPLES = 32;

    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    private SpeedZeros() {
    }

    static double[] find(Segment seg, double a, double b) {
        double[] t = new double[SAMPLES + 1];
        double[] v = new double[SAMPLES + 1];
        double max = 0;
        for (int i = 0; i <= SAMPLES; i++) {
            t[i] = i == SAMPLES ? b : a + (b - a) * i / SAMPLES;
            v[i] = seg.derivative(t[i]).norm();
            max = Math.max(max, v[i]);
        }
        List<Double> out = new ArrayList<>();
        for (int i = 1; i < SAMPLES; i++) {
            if (v[i] <= v[i - 1] && v[i] <= v[i + 1] && v[i] < Tolerances.NEAR_ZERO_SPEED * max) {
                double z = refine(seg, t[i - 1], t[i + 1]);
                if (z > a && z < b) {
                    out.add(z);
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).distinct().sorted().toArray();
    }

    private static double refine(Segment seg, double lo, double hi) {
        double x1 = hi - GOLDEN * (hi - lo);
        double x2 = lo + GOLDEN * (hi - lo);
        double f1 = seg.derivative(x1).norm();
        double f2 = seg.derivative(x2).norm();
        for (int it = 0; it < 80 && hi - lo > 4 * Math.ulp(Math.max(Math.abs(lo), Math.abs(hi))); it++) {
            if (f1 <= f2) {
                hi = x2;
                x2 = x1;
                f2 = f1;
                x1 = hi - GOLDEN * (hi - lo);
                f1 = seg.derivative(x1).norm();
            } else {
                lo = x1;
                x1 = x2;
                f1 = f2;
                x2 = lo + GOLDEN * (hi - lo);
                f2 = seg.derivative(x2).norm();
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The cuts for a segment: range ends, breakpoints, and near-zero-speed points of every span. */
    static double[] cuts(Segment seg, double maxSpan) {
        return cuts(seg, seg.tStart(), seg.tEnd(), maxSpan);
    }

    /** The cuts of the parameter range [t0, t1] of a segment (see {@link #cuts(Segment, double)}). */
    static double[] cuts(Segment seg, double t0, double t1, double maxSpan) {
        double[] bp = seg.breakpoints();
        List<Double> base = new ArrayList<>();
        base.add(t0);
        for (double k : bp) {
            if (k > t0 && k < t1) {
                base.add(k);
            }
        }
        base.add(t1);
        List<Double> all = new ArrayList<>();
        for (int i = 0; i + 1 < base.size(); i++) {
            double a = base.get(i);
            double b = base.get(i + 1);
            int parts = (int) Math.min(64, Math.max(1, Math.ceil((b - a) / maxSpan)));
            for (int p = 0; p < parts; p++) {
                double pa = a + (b - a) * p / parts;
                double pb = p == parts - 1 ? b : a + (b - a) * (p + 1) / parts;
                all.add(pa);
                for (double z : find(seg, pa, pb)) {
                    all.add(z);
                }
            }
        }
        all.add(t1);
        double[] c = all.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(c);
        return graded(seg, Arrays.stream(c).distinct().toArray());
    }

    /**
     * Adds cuts graded geometrically (ratio {@link #GRADING}) towards every cut where the speed is
     * nearly but not exactly zero. Near such a point the speed behaves like
     * {@code sqrt(v^2 + |C''|^2 (t - t0)^2)}, a kink rounded over a width {@code w = v / |C''|}; a rule
     * applied across it can agree with its embedded rule by luck (both miss the rounding), so the
     * pieces are made proportional to their distance from the point, down to {@code w}.
     */
    private static double[] graded(Segment seg, double[] c) {
        double max = 0;
        for (int i = 0; i < c.length; i++) {
            max = Math.max(max, seg.derivative(c[i]).norm());
            if (i + 1 < c.length) {
                max = Math.max(max, seg.derivative(0.5 * (c[i] + c[i + 1])).norm());
            }
        }
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < c.length; i++) {
            out.add(c[i]);
            double v = seg.derivative(c[i]).norm();
            double acc = seg.secondDerivative(c[i]).norm();
            if (!(v > 0) || !(v < Tolerances.NEAR_ZERO_SPEED * max) || !(acc > 0)) {
                continue;
            }
            double w = v / acc;
            if (i > 0) {
                double room = 0.5 * (c[i] - c[i - 1]);
                for (double d = Math.max(w, room * MIN_GRADED_FRACTION); d < room; d *= GRADING) {
                    out.add(c[i] - d);
                }
            }
            if (i + 1 < c.length) {
                double room = 0.5 * (c[i + 1] - c[i]);
                for (double d = Math.max(w, room * MIN_GRADED_FRACTION); d < room; d *= GRADING) {
                    out.add(c[i] + d);
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
    }

    /** Ratio of successive graded cuts towards a near-zero-speed point. */
    static final double GRADING = 4;

    /** Graded cuts stop at this fraction of the room beside the point (at most 30 cuts per side). */
    static final double MIN_GRADED_FRACTION = Math.pow(GRADING, -30);
}
