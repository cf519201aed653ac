package org.linemass.app.mutate;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicReference;
import org.linemass.app.AppContext;
import org.linemass.app.Cli;
import org.linemass.app.EnginePipeline;

/**
 * Runs one drawing file through {@code linemass check} with every report, in this JVM, on a
 * worker thread with a time bound. A run over its bound is abandoned: its thread is interrupted,
 * then stopped, and the next run gets a fresh worker.
 */
final class MutantRun {

    /** What one run gave. */
    record Result(int code, String out, String err, long millis, boolean overBound, Path outDir) {
    }

    private final AppContext base;
    private ExecutorService worker = newWorker();
    private final AtomicReference<Thread> current = new AtomicReference<>();

    MutantRun() {
        this.base = AppContext.system();
    }

    /** The arguments of the run: every report into {@code outDir}; no marked-up copy for binary DXF. */
    static List<String> args(Path drawing, Path outDir, boolean binary, boolean withSections, boolean debug) {
        return args(drawing, outDir, binary, withSections, debug, List.of());
    }

    /** The same with {@code extra} arguments (such as layer rules) before the drawing's name. */
    static List<String> args(Path drawing, Path outDir, boolean binary, boolean withSections, boolean debug,
            List<String> extra) {
        List<String> a = new ArrayList<>(List.of("check", "--fail-at", "never"));
        if (debug) {
            a.add("--debug");
        }
        if (withSections) {
            a.addAll(List.of("--assign", "*=round:8:steel"));
        }
        a.addAll(List.of("--json", outDir.resolve("r.json").toString(), "--html", outDir.resolve("r.html").toString(),
                "--bom-csv", outDir.resolve("bom.csv").toString(), "--pieces-csv", outDir.resolve("pieces.csv").toString(),
                "--findings-csv", outDir.resolve("findings.csv").toString()));
        if (!binary) {
            a.addAll(List.of("--markup-dxf", outDir.resolve("marked.dxf").toString()));
        }
        a.addAll(extra);
        a.add(drawing.toString());
        return a;
    }

    Result run(List<String> args, Path outDir, long boundMillis) throws IOException {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), new EnginePipeline(),
                base.sections(), base.integrator(), false);
        long t0 = System.nanoTime();
        Future<Integer> f = worker.submit(() -> {
            current.set(Thread.currentThread());
            try {
                return Cli.run(ctx, args.toArray(new String[0]));
            } finally {
                current.set(null);
            }
        });
        int code;
        boolean over = false;
        try {
            code = f.get(boundMillis, TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            over = true;
            code = -1;
            abandon(f);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        } catch (ExecutionException e) {
            // Cli.run catches everything a command throws; what escapes it is itself a failure
            StringWriter sw = new StringWriter();
            e.getCause().printStackTrace(new PrintWriter(sw));
            err.write("escaped Cli.run: " + sw);
            code = 3;
        }
        long ms = (System.nanoTime() - t0) / 1_000_000;
        return new Result(code, out.toString(), err.toString(), ms, over, outDir);
    }

    @SuppressWarnings({"removal", "deprecation"})
    private void abandon(Future<Integer> f) {
        Thread t = current.get();
        f.cancel(true);
        try {
            Thread.sleep(2000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        if (t != null && t.isAlive()) {
            t.stop(); // a campaign tool: the run is past its bound and ignores interrupts
        }
        worker.shutdownNow();
        worker = newWorker();
    }

    private static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "mutant");
            t.setDaemon(true);
            return t;
        });
    }

    /** Deletes every file in {@code dir} (not recursive: the run writes only files there). */
    static void clear(Path dir) throws IOException {
        Files.createDirectories(dir);
        try (var s = Files.list(dir)) {
            for (Path p : (Iterable<Path>) s::iterator) {
                Files.deleteIfExists(p);
            }
        }
    }
}
