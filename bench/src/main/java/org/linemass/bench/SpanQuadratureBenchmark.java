package org.linemass.bench;

import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.linemass.engine.integrate.LinearDensity;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Length moments (mass, centroid, second moment, proved bound) of curves to the default relative
 * target 1e-10, reported as spans per second on one thread. {@code kind}: "spline" is the bench
 * drawings' cubic SPLINE as {@code bench/generate} writes it (6 to 12 control points, each 0.1 to 0.6 m
 * from the last, the heading turning by up to 1 radian each time, clamped uniform knots; a spline of
 * c points has c - 3 spans), "rational" the same
 * with weights drawn from [0.5, 2], "ellipse" an elliptical arc of a random ratio from 0.2 to 1 and
 * sweep from 0.5 to 2 pi (one span per started quarter turn). {@code rule}: "fixed" is
 * {@link MomentIntegrator#integrate} (the fixed Gauss-Legendre rule wherever its bound holds),
 * "adaptive" the adaptive Gauss-Kronrod rule alone ({@link MomentIntegrator#integrateAdaptive}, the
 * integrator before the fixed rule).
 *
 * <p>Run: {@code bench/run SpanQuadratureBenchmark}; spans/s = the ops/s JMH prints (one op is one
 * span).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms512m", "-Xmx512m", "-XX:+UseParallelGC"})
public class SpanQuadratureBenchmark {

    /** Spans in the sample (curves are drawn until their spans add up to this). */
    static final int SPANS = 4000;

    @Param({"spline", "rational", "ellipse"})
    public String kind;

    @Param({"fixed", "adaptive"})
    public String rule;

    private Segment[] curves;

    private static final double RELATIVE = 1e-10;
    private static final Provenance SRC = Provenance.of("bench.dxf", "BENCH", 1, "1", "SPLINE");

    @Setup
    public void build() {
        curves = sample(kind);
    }

    /** The sample of {@code kind}: curves drawn from a fixed seed until their spans add up to {@link #SPANS}. */
    static Segment[] sample(String kind) {
        Random rng = new Random(13);
        java.util.List<Segment> out = new java.util.ArrayList<>();
        int spans = 0;
        while (spans < SPANS) {
            int left = SPANS - spans;
            if (kind.equals("ellipse")) {
                double ratio = 0.2 + 0.8 * rng.nextDouble();
                double sweep = Math.min(0.5 + (2 * Math.PI - 0.5) * rng.nextDouble(), left * Math.PI / 2);
                double a = 0.1 + rng.nextDouble();
                double rot = 2 * Math.PI * rng.nextDouble();
                Vec3 u = new Vec3(a * Math.cos(rot), a * Math.sin(rot), 0);
                Vec3 v = new Vec3(-a * ratio * Math.sin(rot), a * ratio * Math.cos(rot), 0);
                double t0 = rng.nextDouble();
                out.add(EllipticalArc.of(new Vec3(rng.nextDouble(), rng.nextDouble(), 0), u, v, t0, t0 + sweep, SRC));
                spans += (int) Math.ceil(sweep / (Math.PI / 2));
            } else {
                int count = Math.min(6 + rng.nextInt(7), left + 3);
                Vec3[] pts = new Vec3[count];
                double[] w = new double[count];
                double px = 0;
                double py = 0;
                double heading = 2 * Math.PI * rng.nextDouble();
                for (int k = 0; k < count; k++) {
                    pts[k] = new Vec3(px, py, 0);
                    heading += 2 * rng.nextDouble() - 1;
                    double step = 0.1 + 0.5 * rng.nextDouble();
                    px += step * Math.cos(heading);
                    py += step * Math.sin(heading);
                    w[k] = kind.equals("rational") ? 0.5 + 1.5 * rng.nextDouble() : 1;
                }
                double[] knots = new double[count + 4];
                for (int k = 0; k < knots.length; k++) {
                    knots[k] = Math.min(Math.max(k - 3, 0), count - 3);
                }
                out.add(Nurbs.of(3, knots, pts, w, SRC));
                spans += count - 3;
            }
        }
        return out.toArray(new Segment[0]);
    }

    /** All the curves of the sample once; JMH divides by the spans. */
    @Benchmark
    @OperationsPerInvocation(SPANS)
    public void integrate(Blackhole bh) {
        for (Segment s : curves) {
            MomentIntegrator.Result r = rule.equals("fixed")
                    ? MomentIntegrator.integrate(s, LinearDensity.UNIT, 0, RELATIVE,
                            MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                    : MomentIntegrator.integrateAdaptive(s, RELATIVE, MomentIntegrator.DEFAULT_MAX_EVALUATIONS);
            bh.consume(r);
        }
    }
}
