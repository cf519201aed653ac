package org.linemass.bench;

import java.io.IOException;
import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/**
 * Prints how much heap the imported model of the benchmark drawing keeps, next to the file size:
 * the memory goal is a model well under the size of its DXF text. Writes the rack drawing of
 * {@link ImportBenchmark} twice (six-decimal coordinates, and the shortest text that reads back to
 * the same double, as full-precision writers emit) and two polyline drawings (closed 20-vertex
 * LWPOLYLINEs, straight or with every other piece bent), imports each, and measures the heap still in
 * use after full collections, with and without the drawing held (smallest of three tries).
 *
 * <p>Run through {@code bench/model-size [MEGABYTES]}; the numbers are approximate to about a
 * megabyte (what a full collection leaves behind varies that much).
 */
public final class ModelSize {

    private static final MemoryMXBean MEMORY = ManagementFactory.getMemoryMXBean();

    private ModelSize() {
    }

    public static void main(String[] args) throws IOException, DxfInputException, InterruptedException {
        long megabytes = args.length > 0 ? Long.parseLong(args[0]) : 80;
        PrintStream out = System.out;
        Path dir = Files.createTempDirectory("linemass-model-size");
        try {
            out.printf(Locale.ROOT, "%-26s %9s %10s %10s %7s %9s%n", "drawing", "file MB", "segments", "model MB",
                    "x file", "B/segment");
            for (boolean shortest : new boolean[] {false, true}) {
                Path file = dir.resolve(shortest ? "rack-full-precision.dxf" : "rack-six-decimals.dxf");
                ImportBenchmark.write(file, megabytes * 1_000_000L, shortest);
                measure(out, file, shortest ? "rack, full precision" : "rack, six decimals");
                Files.delete(file);
            }
            for (boolean bends : new boolean[] {false, true}) {
                Path file = dir.resolve(bends ? "stirrups.dxf" : "mesh-polylines.dxf");
                writePolylines(file, megabytes * 1_000_000L, bends);
                measure(out, file, bends ? "stirrups, bulged" : "polylines, straight");
                Files.delete(file);
            }
        } finally {
            Files.deleteIfExists(dir);
        }
    }

    private static void measure(PrintStream out, Path file, String name)
            throws DxfInputException, InterruptedException, IOException {
        long best = Long.MAX_VALUE;
        long segments = 0;
        for (int attempt = 0; attempt < 3; attempt++) {
            long before = settledHeap();
            Drawing d = DxfImporter.read(file, ImportOptions.DEFAULTS);
            long held = settledHeap() - before;
            segments = 0;
            for (Block b : d.blocks().values()) {
                segments += b.segments().size();
            }
            best = Math.min(best, held);
        }
        double fileMb = Files.size(file) / 1e6;
        out.printf(Locale.ROOT, "%-26s %9.1f %10d %10.1f %7.2f %9.0f%n", name, fileMb, segments, best / 1e6,
                best / 1e6 / fileMb, (double) best / segments);
    }

    /**
     * Writes closed 20-vertex LWPOLYLINEs with six-decimal coordinates, the densest text a plan
     * drawing has: straight pieces only, or (bends) every other piece a 90-degree bend, as bent bars
     * are drawn.
     */
    static void writePolylines(Path f, long targetBytes, boolean bends) throws IOException {
        java.util.Random rnd = new java.util.Random(7);
        try (java.io.BufferedWriter w = Files.newBufferedWriter(f, java.nio.charset.StandardCharsets.US_ASCII)) {
            w.write("  0\nSECTION\n  2\nHEADER\n  9\n$ACADVER\n  1\nAC1015\n  9\n$INSUNITS\n 70\n4\n  0\nENDSEC\n");
            w.write("  0\nSECTION\n  2\nENTITIES\n");
            long written = 0;
            int handle = 0x100;
            while (written < targetBytes) {
                StringBuilder sb = new StringBuilder(1024);
                sb.append("  0\nLWPOLYLINE\n  5\n").append(Integer.toHexString(handle++).toUpperCase(Locale.ROOT))
                        .append("\n330\n1F\n100\nAcDbEntity\n  8\nSTIRRUP_B12\n100\nAcDbPolyline\n 90\n20\n 70\n1\n"
                                + " 43\n0.0\n");
                double x = 3000 * rnd.nextDouble();
                double y = 3000 * rnd.nextDouble();
                for (int v = 0; v < 20; v++) {
                    sb.append(" 10\n").append(String.format(Locale.ROOT, "%.6f", x)).append("\n 20\n")
                            .append(String.format(Locale.ROOT, "%.6f", y)).append('\n');
                    if (bends && v % 2 == 1) {
                        sb.append(" 42\n0.414214\n");
                    }
                    x += 10 + 300 * rnd.nextDouble();
                    y += 10 + 300 * rnd.nextDouble();
                }
                w.append(sb);
                written += sb.length();
            }
            w.write("  0\nENDSEC\n  0\nEOF\n");
        }
    }

    /** Heap in use after full collections, once it stops shrinking. */
    private static long settledHeap() throws InterruptedException {
        long used = Long.MAX_VALUE;
        for (int i = 0; i < 5; i++) {
            System.gc();
            Thread.sleep(50);
            long now = MEMORY.getHeapMemoryUsage().getUsed();
            if (now >= used) {
                return now;
            }
            used = now;
        }
        return used;
    }
}
