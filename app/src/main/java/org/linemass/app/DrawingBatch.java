package org.linemass.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.Report;

/**
 * Reads and analyses several drawings on a fixed number of worker threads, at most as many side
 * by side as their estimated heap allows ({@link MemoryGate}), and hands the outcomes over in input
 * order, each as soon as it and every drawing before it are done; so what is printed and written
 * does not depend on the number of workers. A drawing that cannot be read is an outcome with its
 * exception and does not stop the others; one that ran out of heap beside others is run again
 * alone before it counts as failed. Anything else thrown (a bug) stops the batch and is rethrown
 * on the calling thread. With one worker the drawings run one after another in input order.
 */
final class DrawingBatch {

    /** What became of one drawing: a report, or the input error that stopped it; and its wall-clock time. */
    record Done(Path file, Report report, Exception error, long nanos) {
    }

    private final DrawingPipeline pipeline;
    private final ImportOptions importOptions;
    private final AnalysisSettings settings;
    private final int workers;
    private final MemoryGate gate;
    private final boolean keepShapes;

    /**
     * @param keepShapes whether reports keep their piece shapes (only the HTML picture needs them;
     *        dropping them keeps the memory of a run over thousands of drawings down)
     */
    DrawingBatch(DrawingPipeline pipeline, ImportOptions importOptions, AnalysisSettings settings, int workers,
            MemoryGate gate, boolean keepShapes) {
        if (workers < 1) {
            throw new IllegalArgumentException("at least one worker is needed, got " + workers);
        }
        this.pipeline = pipeline;
        this.importOptions = importOptions;
        this.settings = settings;
        this.workers = workers;
        this.gate = gate;
        this.keepShapes = keepShapes;
    }

    /** Runs every file and gives each outcome to {@code inOrder} (on the calling thread) in input order. */
    List<Done> run(List<Path> files, Progress progress, Consumer<Done> inOrder) throws InterruptedException {
        AtomicInteger threadNo = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(workers, Math.max(1, files.size())), r -> {
            Thread t = new Thread(r, "linemass-drawing-" + threadNo.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Done>> futures = new ArrayList<>(files.size());
            for (int i = 0; i < files.size(); i++) {
                long ticket = i;
                Path f = files.get(i);
                futures.add(pool.submit(() -> one(ticket, f, progress)));
            }
            List<Done> all = new ArrayList<>(files.size());
            for (Future<Done> fu : futures) {
                Done d = get(fu);
                all.add(d);
                inOrder.accept(d);
            }
            return all;
        } finally {
            pool.shutdownNow();
        }
    }

    private Done one(long ticket, Path file, Progress progress) throws InterruptedException {
        long need = MemoryGate.estimate(size(file));
        boolean beside = gate.acquire(ticket, need);
        progress.started(ticket, file.getFileName().toString());
        long held = need;
        boolean admitted = true;
        try {
            Done d = attempt(ticket, file, System.nanoTime(), progress);
            if (beside && ranOutOfHeap(d.error())) {
                gate.release(held);
                admitted = false;
                gate.acquireAlone();
                admitted = true;
                held = gate.budgetBytes();
                d = attempt(ticket, file, System.nanoTime(), progress);
            }
            return d;
        } finally {
            if (admitted) {
                gate.release(held);
            }
            progress.finished(ticket);
        }
    }

    private Done attempt(long ticket, Path file, long t0, Progress progress) {
        try {
            Report r = pipeline.analyse(file, importOptions, settings, stage -> progress.stage(ticket, stage));
            if (!keepShapes) {
                r = Report.of(r.result());
            }
            return new Done(file, r, null, System.nanoTime() - t0);
        } catch (DxfInputException | AnalysisException e) {
            return new Done(file, null, e, System.nanoTime() - t0);
        }
    }

    private static boolean ranOutOfHeap(Exception e) {
        return e != null && e.getCause() instanceof OutOfMemoryError;
    }

    private static long size(Path file) {
        try {
            return Files.size(file);
        } catch (IOException e) {
            return 0; // the importer reports the file itself when it cannot open it
        }
    }

    private static Done get(Future<Done> f) throws InterruptedException {
        try {
            return f.get();
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException re) {
                throw re;
            }
            if (c instanceof Error er) {
                throw er;
            }
            throw new IllegalStateException("a drawing worker failed: " + c, c);
        }
    }
}
