package org.linemass.app;

import java.io.PrintWriter;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import me.tongfei.progressbar.DelegatingProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;

/**
 * A progress bar on stderr that appears only when the work is still running after
 * {@value #DELAY_MS} ms and the session is interactive; otherwise it prints nothing. Thread-safe.
 */
final class Progress implements AutoCloseable {

    /** Work shorter than this shows no bar (about a second, as people notice a pause). */
    static final long DELAY_MS = 1000;

    private final PrintWriter err;
    private final long total;
    private final ScheduledExecutorService timer;
    private ProgressBar bar;
    private long done;

    Progress(PrintWriter err, long total, boolean interactive) {
        this.err = err;
        this.total = total;
        if (interactive) {
            timer = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "linemass-progress");
                t.setDaemon(true);
                return t;
            });
            timer.schedule(this::show, DELAY_MS, TimeUnit.MILLISECONDS);
        } else {
            timer = null;
        }
    }

    private synchronized void show() {
        if (bar == null && done < total) {
            bar = new ProgressBarBuilder().setTaskName("weighing").setInitialMax(total)
                    .setConsumer(new DelegatingProgressBarConsumer(s -> {
                        err.print('\r' + s);
                        err.flush();
                    })).build();
            bar.stepTo(done);
        }
    }

    synchronized void step(String name) {
        done++;
        if (bar != null) {
            bar.setExtraMessage(name);
            bar.stepTo(done);
        }
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
