package org.linemass.engine.integrate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.linemass.geometry.Segment;

/**
 * Parameters where the speed {@code |C'(t)|} of a curve nearly vanishes (cusps of splines with
 * repeated control points): the integrand {@code |C'|} has a kink there, so the integrator cuts the
 * range at them. Contract: samples {@link #SAMPLES} points per span, takes every interior local
 * minimum below {@link #NEAR_ZERO} times the span's largest sampled speed, and refines it with a
 * golden-section search. Returns the minima in ascending order (may be empty).
 */
final class SpeedZeros {

    /** Samples per span. */
    static final int SAMPLES = 32;

    /** A sampled speed below this fraction of the span's largest counts as nearly zero. */
    static final double NEAR_ZERO = 1e-3;

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
            if (v[i] <= v[i - 1] && v[i] <= v[i + 1] && v[i] < NEAR_ZERO * max) {
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
        double[] bp = seg.breakpoints();
        double t0 = seg.tStart();
        double t1 = seg.tEnd();
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
        return Arrays.stream(c).distinct().toArray();
    }
}
