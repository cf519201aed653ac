package org.linemass.engine.parallel;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.linemass.errors.InternalException;

/**
 * Runs jobs {@code 0..n-1} on up to {@code threads} threads and returns their results in job order.
 * Jobs are handed out in contiguous chunks; each job must depend only on its number and on data
 * nobody writes meanwhile, so the results are the same as a plain loop's whatever the thread count.
 * When jobs fail, the failure of the lowest-numbered failing job is thrown (what the loop would have
 * thrown first), after every thread has stopped. With one thread, or few jobs, the jobs run in the
 * calling thread. Stateless; safe to call from several threads.
 */
public final class IndexedWork {

    /** One numbered job. */
    @FunctionalInterface
    public interface Job<T, E extends Exception> {
        T run(int index) throws E;
    }

    /** Fewest jobs worth a thread of their own (common practice, no source). */
    static final int MIN_JOBS_PER_THREAD = 8;

    /** Chunks per thread, so uneven jobs still spread over the threads (common practice, no source). */
    static final int CHUNKS_PER_THREAD = 16;

    private IndexedWork() {
    }

    /**
     * The results of jobs {@code 0..n-1}, in job order.
     *
     * @throws IllegalArgumentException when {@code threads < 1} or {@code n < 0}
     */
    public static <T, E extends Exception> List<T> map(int threads, int n, Job<T, E> job) throws E {
        if (threads < 1 || n < 0) {
            throw new IllegalArgumentException("need threads >= 1 and jobs >= 0, got " + threads + " and " + n);
        }
        int workers = (int) Math.min(threads, Math.max(1L, n / MIN_JOBS_PER_THREAD));
        if (workers == 1) {
            List<T> out = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                out.add(job.run(i));
            }
            return out;
        }
        Object[] results = new Object[n];
        int chunk = Math.max(1, n / (workers * CHUNKS_PER_THREAD));
        AtomicInteger next = new AtomicInteger();
        int[] failedAt = new int[workers];
        Throwable[] failure = new Throwable[workers];
        Arrays.fill(failedAt, Integer.MAX_VALUE);
        ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
            Thread t = new Thread(r, "linemass-work");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> running = new ArrayList<>(workers);
            for (int w = 0; w < workers; w++) {
                final int me = w;
                running.add(pool.submit(() -> {
                    while (true) {
                        int lo = next.getAndAdd(chunk);
                        if (lo >= n) {
                            return;
                        }
                        int hi = Math.min(n, lo + chunk);
                        for (int i = lo; i < hi; i++) {
                            try {
                                results[i] = job.run(i);
                            } catch (Exception | Error e) {
                                // keep the lowest failing job of this thread; later chunks are higher
                                if (i < failedAt[me]) {
                                    failedAt[me] = i;
                                    failure[me] = e;
                                }
                                return;
                            }
                        }
                    }
                }));
            }
            for (Future<?> f : running) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InternalException("interrupted while waiting for parallel work", e);
        } catch (ExecutionException e) {
            throw new InternalException("parallel work failed outside a job", e.getCause());
        } finally {
            pool.shutdownNow();
        }
        int worst = -1;
        for (int w = 0; w < workers; w++) {
            if (failure[w] != null && (worst < 0 || failedAt[w] < failedAt[worst])) {
                worst = w;
            }
        }
        if (worst >= 0) {
            throw IndexedWork.<E>rethrow(failure[worst]);
        }
        @SuppressWarnings("unchecked")
        List<T> out = (List<T>) Arrays.asList(results);
        return out;
    }

    /** Throws a job's own failure as it was (a job throws only E or unchecked ones). */
    @SuppressWarnings("unchecked")
    private static <E extends Exception> RuntimeException rethrow(Throwable t) throws E {
        if (t instanceof RuntimeException r) {
            throw r;
        }
        if (t instanceof Error e) {
            throw e;
        }
        throw (E) t;
    }
}
