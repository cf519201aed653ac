package org.linemass.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;
import org.linemass.engine.integrate.LinearDensity;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.geometry.Segment;

/**
 * Spans per second of CPU time of this thread, for the samples of {@link SpanQuadratureBenchmark}
 * (both rules): on a machine shared with other work, CPU time says more than JMH's wall-clock
 * throughput. Warms up for {@code WARM_ROUNDS} rounds, then times {@code ROUNDS}; prints one line per
 * kind and rule.
 *
 * <p>Run: {@code java -cp bench/target/benchmarks.jar org.linemass.bench.SpanRate}.
 */
public final class SpanRate {

    private static final int WARM_ROUNDS = 40;
    private static final int ROUNDS = 40;

    private SpanRate() {
    }

    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        for (String kind : new String[] {"spline", "rational", "ellipse"}) {
            Segment[] curves = SpanQuadratureBenchmark.sample(kind);
            for (String rule : new String[] {"fixed", "adaptive"}) {
                double sink = 0;
                long evaluations = 0;
                for (int r = 0; r < WARM_ROUNDS; r++) {
                    sink += round(curves, rule)[0];
                }
                long t0 = mx.getCurrentThreadCpuTime();
                for (int r = 0; r < ROUNDS; r++) {
                    double[] out = round(curves, rule);
                    sink += out[0];
                    evaluations += (long) out[1];
                }
                double seconds = (mx.getCurrentThreadCpuTime() - t0) * 1e-9;
                double spans = (double) ROUNDS * SpanQuadratureBenchmark.SPANS;
                System.out.printf(Locale.ROOT, "%-8s %-8s %10.0f spans/s of CPU   %6.1f evaluations/span   (%.3g)%n",
                        kind, rule, spans / seconds, evaluations / spans, sink);
            }
        }
    }

    private static double[] round(Segment[] curves, String rule) {
        double length = 0;
        long evaluations = 0;
        for (Segment s : curves) {
            MomentIntegrator.Result r = rule.equals("fixed")
                    ? MomentIntegrator.integrate(s, LinearDensity.UNIT, 0, 1e-10, MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                    : MomentIntegrator.integrateAdaptive(s, 1e-10, MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
            length += r.moments().mass();
            evaluations += r.evaluations();
        }
        return new double[] {length, evaluations};
    }
}
