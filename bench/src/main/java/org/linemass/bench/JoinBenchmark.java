package org.linemass.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.pieces.PieceAnalyzer;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Joining and checking a large welded-mesh drawing: {@code wires} x {@code wires} wires 50 mm
 * apart, each drawn as {@code segmentsPerWire} collinear lines (so about
 * {@code 2 * wires * segmentsPerWire} segments; the defaults give 1,000,000), with split points
 * placed off the crossings so every crossing is a true crossing. A fixed random sample of
 * segments is drawn twice, and of wires is broken by a 1 mm gap. One call of
 * {@link PieceAnalyzer#analyze} per measurement (single shot: the job is one big batch).
 *
 * <p>Run: {@code java -jar bench/target/benchmarks.jar JoinBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(value = 1, jvmArgs = {"-Xms2g", "-Xmx6g", "-XX:+UseParallelGC"})
public class JoinBenchmark {

    /** Wires in each direction. */
    @Param({"500"})
    public int wires;

    /** Lines each wire is drawn as. */
    @Param({"1000"})
    public int segmentsPerWire;

    private List<Segment> segments;
    private Tolerances tolerances;

    private static final double SPACING_M = 0.05;
    private static final String LAYER = "MESH";

    @Setup
    public void build() {
        Random rnd = new Random(20261201L);
        double length = wires * SPACING_M;
        double step = length / segmentsPerWire;
        // split points shifted by a third of a step so none falls on a crossing
        double shift = step / 3;
        segments = new ArrayList<>(2 * wires * segmentsPerWire + 2 * wires);
        for (int dir = 0; dir < 2; dir++) {
            for (int w = 0; w < wires; w++) {
                Provenance p = Provenance.of("mesh.dxf", LAYER, 1 + dir * wires + w, "", "LINE");
                double c = (w + 0.5) * SPACING_M;
                boolean broken = rnd.nextInt(50) == 0;
                int breakAt = 1 + rnd.nextInt(segmentsPerWire - 2);
                for (int k = 0; k < segmentsPerWire; k++) {
                    double a = k == 0 ? 0 : k * step - shift;
                    double b = k == segmentsPerWire - 1 ? length : (k + 1) * step - shift;
                    if (broken && k == breakAt) {
                        a += 0.001;
                    }
                    Vec3 pa = dir == 0 ? new Vec3(a, c, 0) : new Vec3(c, a, 0);
                    Vec3 pb = dir == 0 ? new Vec3(b, c, 0) : new Vec3(c, b, 0);
                    Straight s = new Straight(pa, pb, p);
                    segments.add(s);
                    if (rnd.nextInt(2000) == 0) {
                        segments.add(s.reversed());
                    }
                }
            }
        }
        tolerances = Tolerances.defaults();
    }

    @Benchmark
    public PieceAnalysis analyze() {
        Section wire = new Section("W4", "steel wire 4 mm", "steel", 0.0986, 0.004, null, "bench");
        return PieceAnalyzer.analyze(segments, tolerances, layer -> Optional.of(wire), false);
    }
}
