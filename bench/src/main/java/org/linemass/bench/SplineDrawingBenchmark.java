package org.linemass.bench;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.linemass.drawing.Drawing;
import org.linemass.engine.Analyzer;
import org.linemass.engine.pieces.PieceAnalyzer;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.ImportOptions;
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
 * A drawing of many one-span splines against the same drawing made of straight lines: {@code count}
 * cubic one-span SPLINEs (an S-shaped Bezier 10 mm long, as a laser-cutting outline traced into
 * splines is drawn) on a grid 20 mm apart, none touching, or {@code count} LINEs in the same
 * places. One measurement imports the generated DXF and runs the whole analysis with the piece
 * stage (integration, joining, checks, marks), as {@code check} does. The goal is a cost per
 * segment for splines within a small factor of the straight case.
 *
 * <p>Run: {@code bench/run SplineDrawingBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g", "-XX:+UseParallelGC"})
public class SplineDrawingBenchmark {

    /** Entities in the drawing (the size of the real one-span spline drawing that prompted this). */
    @Param({"7464"})
    public int count;

    /** "spline" for one-span cubic SPLINEs, "line" for LINEs in the same places. */
    @Param({"spline", "line"})
    public String kind;

    private byte[] dxf;
    private AnalysisSettings settings;

    private static final double PITCH_MM = 20;

    @Setup
    public void build() {
        StringBuilder sb = new StringBuilder(count * 400);
        sb.append("0\nSECTION\n2\nHEADER\n9\n$ACADVER\n1\nAC1015\n9\n$INSUNITS\n70\n4\n0\nENDSEC\n");
        sb.append("0\nSECTION\n2\nENTITIES\n");
        int side = (int) Math.ceil(Math.sqrt(count));
        for (int i = 0; i < count; i++) {
            double x = (i % side) * PITCH_MM;
            double y = (i / side) * PITCH_MM;
            if (kind.equals("spline")) {
                sb.append("0\nSPLINE\n8\nOUTLINE\n100\nAcDbSpline\n70\n8\n71\n3\n72\n8\n73\n4\n74\n0\n");
                for (int k = 0; k < 8; k++) {
                    sb.append("40\n").append(k < 4 ? 0 : 1).append('\n');
                }
                double[][] c = {{0, 0}, {3, 4}, {6, -4}, {9, 0}};
                for (double[] p : c) {
                    sb.append(String.format(Locale.ROOT, "10\n%.3f\n20\n%.3f\n30\n0\n", x + p[0], y + p[1]));
                }
            } else {
                sb.append(String.format(Locale.ROOT, "0\nLINE\n8\nOUTLINE\n10\n%.3f\n20\n%.3f\n30\n0\n11\n%.3f\n21\n%.3f\n"
                        + "31\n0\n", x, y, x + 9, y));
            }
        }
        sb.append("0\nENDSEC\n0\nEOF\n");
        dxf = sb.toString().getBytes(StandardCharsets.US_ASCII);
        settings = AnalysisSettings.defaults(BuiltInSections.table());
    }

    @Benchmark
    public DrawingResult importAndAnalyse() throws Exception {
        Drawing d = DxfImporter.read("splines.dxf", dxf, ImportOptions.DEFAULTS);
        return Analyzer.analyze(d, settings, PieceAnalyzer::analyze);
    }
}
