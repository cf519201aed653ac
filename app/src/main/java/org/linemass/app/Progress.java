package org.linemass.app;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.function.LongSupplier;
import me.tongfei.progressbar.DelegatingProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;

/**
 * A progress bar on stderr that appears only when the work is still running after
 * {@value #DELAY_MS} ms and the session is interactive; otherwise it prints nothing. It counts
 * drawings done out of the total, each drawing in {@value #STAGES} steps (reading, then the engine's
 * stages: expanding blocks, joining and checking, grouping), so the bar moves during one long
 * drawing too; it names the drawing that has been running longest, for how long and at which stage
 * (refreshed every {@value #REFRESH_MS} ms). Within a stage the bar stands still: the engine tells
 * only when a stage starts. Thread-safe.
 */
final class Progress implements AutoCloseable {

    /** Work shorter than this shows no bar (about a second, as people notice a pause). */
    static final long DELAY_MS = 1000;
    /** How often the running time of the slowest drawing is brought up to date. */
    static final long REFRESH_MS = 1000;
    /** Steps of one drawing on the bar: reading and the engine's three stages ({@code Analyzer.StageWatch}). */
    static final int STAGES = 4;
    /** The first stage, told by the pipeline before the importer reads the file. */
    static final String READING = "reading the drawing";

    private final PrintWriter err;
    private final long total;
    private final LongSupplier clock;
    private final ScheduledExecutorService timer;
    /** Drawings running now by id, in the order they started (so the first is the slowest). */
    private final Map<Long, Running> running = new LinkedHashMap<>();
    private ProgressBar bar;
    private long done;
    private String last = "";

    /** A drawing running now: its name, start, the stages it has entered and the latest one. */
    private static final class Running {
        final String name;
        final long startNanos;
        int stages;
        String stage = "";

        Running(String name, long startNanos) {
            this.name = name;
            this.startNanos = startNanos;
        }
    }

    Progress(PrintWriter err, long total, boolean interactive) {
        this(err, total, interactive, System::nanoTime);
    }

    Progress(PrintWriter err, long total, boolean interactive, LongSupplier nanoClock) {
        this.err = err;
        this.total = total;
        this.clock = nanoClock;
        if (interactive) {
            timer = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "linemass-progress");
                t.setDaemon(true);
                return t;
            });
            timer.schedule(this::show, DELAY_MS, TimeUnit.MILLISECONDS);
            timer.scheduleAtFixedRate(this::refresh, DELAY_MS + REFRESH_MS, REFRESH_MS, TimeUnit.MILLISECONDS);
        } else {
            timer = null;
        }
    }

    private synchronized void show() {
        if (bar == null && done < total) {
            bar = new ProgressBarBuilder().setTaskName("weighing").setInitialMax(total * STAGES)
                    .setUnit(" drawings", STAGES)
                    .setConsumer(new DelegatingProgressBarConsumer(s -> {
                        err.print('\r' + s);
                        err.flush();
                    })).build();
            bar.stepTo(steps());
            bar.setExtraMessage(message());
        }
    }

    /** Steps done: {@value #STAGES} per finished drawing and one per stage entered by those running. */
    synchronized long steps() {
        long s = done * STAGES;
        for (Running r : running.values()) {
            s += Math.min(r.stages, STAGES);
        }
        return s;
    }

    /** Drawing {@code id} enters {@code stage} (a few words: "joining and checking pieces"). */
    synchronized void stage(long id, String stage) {
        Running r = running.get(id);
        if (r == null) {
            return;
        }
        r.stages++;
        r.stage = stage;
        if (bar != null) {
            bar.setExtraMessage(message());
            bar.stepTo(steps());
        }
    }

    private synchronized void refresh() {
        if (bar != null) {
            bar.setExtraMessage(message());
        }
    }

    /** Drawing {@code id} (unique in this run) named {@code name} starts. */
    synchronized void started(long id, String name) {
        running.put(id, new Running(name, clock.getAsLong()));
        refresh();
    }

    /** Drawing {@code id} is done (analysed or failed). */
    synchronized void finished(long id) {
        Running r = running.remove(id);
        step(r == null ? "" : r.name);
    }

    /** One more drawing done, {@code name} the last one. */
    synchronized void step(String name) {
        done++;
        last = name;
        if (bar != null) {
            bar.setExtraMessage(message());
            bar.stepTo(steps());
        }
    }

    /** What the bar says after the count: the longest-running drawing, or the last one done. */
    synchronized String message() {
        if (running.isEmpty()) {
            return last;
        }
        Running slowest = running.values().iterator().next();
        long s = Math.max(0, (clock.getAsLong() - slowest.startNanos) / 1_000_000_000L);
        return String.format(Locale.ROOT, "%d running, longest %s (%d s%s)", running.size(), slowest.name, s,
                slowest.stage.isEmpty() ? "" : ", " + slowest.stage);
    }

    @Override
    public synchronized void close() {
        if (timer != null) {
            timer.shutdownNow();
        }
        if (bar != null) {
            bar.close();
            err.print('\n');
            err.flush();
            bar = null;
        }
    }
}
