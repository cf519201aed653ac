package org.linemass.engine.pieces.index;

import java.util.Arrays;
import java.util.List;
import org.linemass.engine.parallel.IndexedWork;

/**
 * Every pair {@code i < j} of indexed segments whose grown boxes meet and which pass a cheap
 * filter (e.g. same layer), found with one query per segment and kept as packed longs, so later
 * stages can walk the pairs without querying the tree again. Memory: 8 bytes per pair. At most
 * {@link #MAX_PAIRS} pairs are kept: a drawing where millions of segments lie on top of each other
 * (an array of copies with no spacing) would otherwise need quadratic time and memory; then
 * {@link #truncated()} is true and the checks that use the pairs are incomplete.
 */
public final class CandidatePairs {

    /** Decides whether a pair is worth keeping. */
    @FunctionalInterface
    public interface Filter {
        boolean keep(int i, int j);
    }

    /** Receives one pair. */
    @FunctionalInterface
    public interface Visitor {
        void pair(int i, int j);
    }

    /** Most pairs kept (160 MB); real drawings of a million segments have a few million. */
    public static final int MAX_PAIRS = 20_000_000;

    /** Segments queried side by side before their pairs are taken in order. */
    static final int BLOCK = 1 << 14;

    private final long[] pairs;
    private final boolean truncated;

    private CandidatePairs(long[] pairs, boolean truncated) {
        this.pairs = pairs;
        this.truncated = truncated;
    }

    public static CandidatePairs of(BoxIndex index, int count, Filter filter) {
        return of(index, count, filter, MAX_PAIRS);
    }

    /**
     * As {@link #of(BoxIndex, int, Filter)}, querying on {@code threads} threads ({@code filter} must
     * then be safe to call from several threads); the pairs and their order are those of one query
     * after another.
     */
    public static CandidatePairs onThreads(BoxIndex index, int count, Filter filter, int threads) {
        long[] buf = new long[Math.max(16, Math.min(count, MAX_PAIRS))];
        int size = 0;
        for (int lo = 0; lo < count; lo += BLOCK) {
            final int base = lo;
            List<int[]> found = IndexedWork.map(threads, Math.min(count, lo + BLOCK) - lo, k -> {
                int i = base + k;
                int[][] js = {new int[8]};
                int[] n = {0};
                index.query(index.box(i), j -> {
                    if (j <= i || !filter.keep(i, j)) {
                        return;
                    }
                    if (n[0] == js[0].length) {
                        js[0] = Arrays.copyOf(js[0], 2 * n[0]);
                    }
                    js[0][n[0]++] = j;
                });
                return Arrays.copyOf(js[0], n[0]);
            });
            for (int k = 0; k < found.size(); k++) {
                long i = base + k;
                for (int j : found.get(k)) {
                    if (size == MAX_PAIRS) {
                        return new CandidatePairs(Arrays.copyOf(buf, size), true);
                    }
                    if (size == buf.length) {
                        buf = Arrays.copyOf(buf, (int) Math.min(MAX_PAIRS, 2L * buf.length));
                    }
                    buf[size++] = (i << 32) | j;
                }
            }
        }
        return new CandidatePairs(Arrays.copyOf(buf, size), false);
    }

    /** As {@link #of(BoxIndex, int, Filter)} keeping at most {@code maxPairs} pairs. */
    public static CandidatePairs of(BoxIndex index, int count, Filter filter, int maxPairs) {
        long[][] buf = {new long[Math.max(16, Math.min(count, maxPairs))]};
        int[] size = {0};
        boolean[] full = {false};
        for (int i = 0; i < count && !full[0]; i++) {
            final int ii = i;
            index.query(index.box(i), j -> {
                if (full[0] || j <= ii || !filter.keep(ii, j)) {
                    return;
                }
                if (size[0] == maxPairs) {
                    full[0] = true;
                    return;
                }
                if (size[0] == buf[0].length) {
                    buf[0] = Arrays.copyOf(buf[0], (int) Math.min(maxPairs, 2L * buf[0].length));
                }
                buf[0][size[0]++] = ((long) ii << 32) | j;
            });
        }
        return new CandidatePairs(Arrays.copyOf(buf[0], size[0]), full[0]);
    }

    /** True when the pair limit was reached and some pairs were not collected. */
    public boolean truncated() {
        return truncated;
    }

    public int size() {
        return pairs.length;
    }

    /** The smaller segment number of pair {@code p} (pairs in the order they were found). */
    public int first(int p) {
        return (int) (pairs[p] >>> 32);
    }

    /** The larger segment number of pair {@code p}. */
    public int second(int p) {
        return (int) pairs[p];
    }

    public void forEach(Visitor v) {
        for (long p : pairs) {
            v.pair((int) (p >>> 32), (int) p);
        }
    }
}
