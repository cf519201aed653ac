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
 * the same double, as full-precision writers emit), imports each, and measures the heap still in
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
