package org.linemass.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.function.DoubleFunction;
import org.linemass.drawing.Drawing;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * ASCII DXF import throughput. Setup writes an invented welded-mesh storage-rack drawing of about
 * {@code sizeMb} megabytes (R2000 style with handles and subclass markers: LINE, ARC and bulged
 * LWPOLYLINE on a few layers) to a temporary folder; each operation imports it from disk with
 * {@link DxfImporter#read(Path, ImportOptions)}. The {@code megabytes} counter reports MB/s.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 3, time = 5)
@Fork(value = 1, jvmArgs = {"-Xmx4g", "-XX:+UseParallelGC"})
public class ImportBenchmark {

    @Param({"80"})
    public int sizeMb;

    private Path dir;
    private Path file;
    private long bytes;

    /** Reports the megabytes read per second next to the operation rate. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Counters {
        public double megabytes;
    }

    @Setup(Level.Trial)
    public void writeDrawing() throws IOException {
        dir = Files.createTempDirectory("linemass-bench");
        file = dir.resolve("rack.dxf");
        write(file, (long) sizeMb * 1_000_000L);
        bytes = Files.size(file);
    }

    @TearDown(Level.Trial)
    public void deleteDrawing() throws IOException {
        Files.deleteIfExists(file);
        Files.deleteIfExists(dir);
    }

    @Benchmark
    public Drawing importAscii(Counters c) throws DxfInputException {
        Drawing d = DxfImporter.read(file, ImportOptions.DEFAULTS);
        c.megabytes += bytes / 1e6;
        return d;
    }

    static void write(Path f, long targetBytes) throws IOException {
        write(f, targetBytes, false);
    }

    /**
     * Writes the rack drawing; coordinates with six decimals, or with {@code shortestText} in the
     * shortest text that reads back to the same double, as writers that keep full precision do.
     */
    static void write(Path f, long targetBytes, boolean shortestText) throws IOException {
        Random rnd = new Random(42);
        DoubleFunction<String> num = shortestText ? Double::toString : ImportBenchmark::num;
        String[] layers = {"RACK_WIRE_D4", "RACK_FRAME_D8", "RACK_HOOK_D5"};
        try (BufferedWriter w = Files.newBufferedWriter(f, StandardCharsets.US_ASCII)) {
            w.write("  0\nSECTION\n  2\nHEADER\n  9\n$ACADVER\n  1\nAC1015\n  9\n$INSUNITS\n 70\n4\n  0\nENDSEC\n");
            w.write("  0\nSECTION\n  2\nENTITIES\n");
            long written = 0;
            int handle = 0x100;
            while (written < targetBytes) {
                StringBuilder sb = new StringBuilder(4096);
                for (int k = 0; k < 20; k++) {
                    String layer = layers[rnd.nextInt(layers.length)];
                    String h = Integer.toHexString(handle++).toUpperCase(Locale.ROOT);
                    int kind = rnd.nextInt(10);
                    if (kind < 6) {
                        sb.append("  0\nLINE\n  5\n").append(h).append("\n330\n1F\n100\nAcDbEntity\n  8\n")
                                .append(layer).append("\n100\nAcDbLine\n");
                        point(sb, 10, rnd, num);
                        point(sb, 11, rnd, num);
                    } else if (kind < 8) {
                        sb.append("  0\nARC\n  5\n").append(h).append("\n330\n1F\n100\nAcDbEntity\n  8\n")
                                .append(layer).append("\n100\nAcDbCircle\n");
                        point(sb, 10, rnd, num);
                        sb.append(" 40\n").append(num.apply(5 + 50 * rnd.nextDouble())).append("\n100\nAcDbArc\n 50\n")
                                .append(num.apply(360 * rnd.nextDouble())).append("\n 51\n")
                                .append(num.apply(360 * rnd.nextDouble())).append('\n');
                    } else {
                        int n = 4 + rnd.nextInt(6);
                        sb.append("  0\nLWPOLYLINE\n  5\n").append(h).append("\n330\n1F\n100\nAcDbEntity\n  8\n")
                                .append(layer).append("\n100\nAcDbPolyline\n 90\n").append(n).append("\n 70\n")
                                .append(rnd.nextInt(2)).append("\n 43\n0.0\n");
                        for (int v = 0; v < n; v++) {
                            sb.append(" 10\n").append(num.apply(2000 * rnd.nextDouble())).append("\n 20\n")
                                    .append(num.apply(2000 * rnd.nextDouble())).append('\n');
                            if (rnd.nextInt(3) == 0) {
                                sb.append(" 42\n").append(num.apply(rnd.nextDouble() - 0.5)).append('\n');
                            }
                        }
                    }
                }
                w.append(sb);
                written += sb.length();
            }
            w.write("  0\nENDSEC\n  0\nEOF\n");
        }
    }

    private static void point(StringBuilder sb, int code, Random rnd, DoubleFunction<String> num) {
        sb.append(' ').append(code).append('\n').append(num.apply(3000 * rnd.nextDouble())).append('\n')
                .append(' ').append(code + 10).append('\n').append(num.apply(3000 * rnd.nextDouble())).append('\n')
                .append(' ').append(code + 20).append('\n').append("0.0").append('\n');
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.6f", v);
    }
}
