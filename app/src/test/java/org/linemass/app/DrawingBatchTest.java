package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.Report;

/** Outcomes in input order, failures kept, a drawing that ran out of heap beside others run again alone. */
class DrawingBatchTest {

    @TempDir
    Path dir;

    private List<Path> files(String... names) throws IOException {
        List<Path> out = new ArrayList<>();
        for (String n : names) {
            out.add(Files.writeString(dir.resolve(n), "0\nEOF\n"));
        }
        return out;
    }

    private static DrawingBatch batch(DrawingPipeline p, int workers) {
        return new DrawingBatch(p, ImportOptions.DEFAULTS, AnalysisSettings.defaults(BuiltInSections.table()), workers,
                new MemoryGate(1L << 30), false);
    }

    private static Progress quiet() {
        return new Progress(new PrintWriter(new StringWriter()), 0, false);
    }

    @Test
    void run_slowFirstDrawing_outcomesStillInInputOrder() throws Exception {
        // the first drawing takes longest, so with three workers it finishes last
        DrawingPipeline slowFirst = (file, io, s) -> {
            String n = file.getFileName().toString();
            sleep(n.startsWith("a") ? 600 : 10);
            if (n.startsWith("bad")) {
                throw new AnalysisException(n + ": unknown section");
            }
            return Report.of(AppFixtures.bar(n));
        };
        List<Path> in = files("a.dxf", "b.dxf", "bad.dxf", "d.dxf");
        List<String> seen = Collections.synchronizedList(new ArrayList<>());
        List<DrawingBatch.Done> done = batch(slowFirst, 3).run(in, quiet(), d -> seen.add(d.file().getFileName().toString()));
        assertEquals(List.of("a.dxf", "b.dxf", "bad.dxf", "d.dxf"), seen);
        assertEquals(4, done.size());
        assertNull(done.get(2).report());
        assertEquals("bad.dxf: unknown section", done.get(2).error().getMessage());
        assertNotNull(done.get(3).report());
    }

    @Test
    void run_outOfHeapBesideOthers_runAgainAloneAndSucceeds() throws Exception {
        AtomicInteger runningNow = new AtomicInteger();
        List<Integer> bigSawRunning = Collections.synchronizedList(new ArrayList<>());
        // a.dxf is admitted first and runs a second, so big.dxf starts beside it; its first attempt
        // runs out of heap, as a drawing that only fits alone would
        DrawingPipeline tight = (file, io, s) -> {
            int n = runningNow.incrementAndGet();
            try {
                String name = file.getFileName().toString();
                if (name.startsWith("big")) {
                    bigSawRunning.add(n);
                    if (bigSawRunning.size() == 1) {
                        throw OutOfResources.of(file, new OutOfMemoryError("Java heap space"));
                    }
                } else {
                    sleep(1000);
                }
                return Report.of(AppFixtures.bar(name));
            } finally {
                runningNow.decrementAndGet();
            }
        };
        List<Path> in = files("a.dxf", "big.dxf", "c.dxf");
        List<DrawingBatch.Done> done = batch(tight, 2).run(in, quiet(), d -> { });
        assertNotNull(done.get(1).report(), "second attempt, alone, worked: " + done.get(1).error());
        assertEquals(2, bigSawRunning.size(), "run twice");
        assertEquals(1, bigSawRunning.get(1), "the second attempt ran with nothing beside it");
    }

    @Test
    void run_outOfHeapAlone_isAFailedDrawing() throws Exception {
        DrawingPipeline never = (file, io, s) -> {
            throw OutOfResources.of(file, new OutOfMemoryError("Java heap space"));
        };
        List<DrawingBatch.Done> done = batch(never, 1).run(files("big.dxf"), quiet(), d -> { });
        assertTrue(done.get(0).error().getMessage().contains("out of memory"), done.get(0).error().getMessage());
    }

    @Test
    void run_bugInOneDrawing_stopsTheBatchWithThatException() throws Exception {
        DrawingPipeline buggy = (file, io, s) -> {
            if (file.getFileName().toString().startsWith("crash")) {
                throw new IllegalStateException("bug");
            }
            return Report.of(AppFixtures.bar(file.getFileName().toString()));
        };
        List<Path> in = files("a.dxf", "crash.dxf", "c.dxf");
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> batch(buggy, 2).run(in, quiet(), d -> { }));
        assertEquals("bug", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> batch(buggy, 0));
    }

    private static void sleep(long ms) {
        try {
            Thread.sleep(ms);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
