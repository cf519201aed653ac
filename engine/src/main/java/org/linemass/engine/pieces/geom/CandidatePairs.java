package org.linemass.engine.pieces.geom;

import java.util.Arrays;

/**
 * Every pair {@code i < j} of indexed segments whose grown boxes meet and which pass a cheap
 * filter (e.g. same layer), found with one query per segment and kept as packed longs, so later
 * stages can walk the pairs without querying the tree again. Memory: 8 bytes per pair.
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

    private final long[] pairs;

    private CandidatePairs(long[] pairs) {
        this.pairs = pairs;
    }

    public static CandidatePairs of(BoxIndex index, int count, Filter filter) {
        long[][] buf = {new long[Math.max(16, count)]};
        int[] size = {0};
        for (int i = 0; i < count; i++) {
            final int ii = i;
            index.query(index.box(i), j -> {
                if (j > ii && filter.keep(ii, j)) {
                    if (size[0] == buf[0].length) {
                        buf[0] = Arrays.copyOf(buf[0], 2 * buf[0].length);
                    }
                    buf[0][size[0]++] = ((long) ii << 32) | j;
                }
            });
        }
        return new CandidatePairs(Arrays.copyOf(buf[0], size[0]));
    }

    public int size() {
        return pairs.length;
    }

    public void forEach(Visitor v) {
        for (long p : pairs) {
            v.pair((int) (p >>> 32), (int) p);
        }
    }
}
