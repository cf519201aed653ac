package org.linemass.geometry;

import java.util.Arrays;

/**
 * The value column of {@link SegmentColumns}: doubles in chunks of 65,536, written as records that
 * never straddle two chunks, addressed by a 27-bit offset (chunk number and position). Growing it
 * never copies what it holds; the first chunk starts small so small blocks stay small. Not
 * thread-safe while growing; a {@link #trimmed()} copy is never changed again.
 */
final class DoubleChunks {

    static final int SHIFT = 16;
    private static final int CHUNK = 1 << SHIFT;
    private static final int MASK = CHUNK - 1;
    private static final int FIRST = 32;
    /** Bits of an offset (a descriptor keeps the other bits for the record kind). */
    static final int OFFSET_BITS = 27;
    /** Offsets must fit in {@link #OFFSET_BITS} bits: at most this many chunks. */
    private static final int MAX_CHUNKS = 1 << (OFFSET_BITS - SHIFT);

    private double[][] chunks;
    /** Offset of the next record. */
    private int end;

    DoubleChunks() {
        this(new double[][] {new double[FIRST]}, 0);
    }

    private DoubleChunks(double[][] chunks, int end) {
        this.chunks = chunks;
        this.end = end;
    }

    /** Offset just past the last record. */
    int end() {
        return end;
    }

    /** True when a record of {@code n} values can start at {@link #end()}, in the same chunk. */
    boolean fitsHere(int n) {
        return (end & MASK) + n <= CHUNK;
    }

    /** Room for a record of {@code n} values: its offset, or -1 when no more can be addressed. */
    int reserve(int n) {
        int at = fitsHere(n) ? end : ((end >>> SHIFT) + 1) << SHIFT;
        int c = at >>> SHIFT;
        if (c >= MAX_CHUNKS) {
            return -1;
        }
        if (c == chunks.length) {
            chunks = Arrays.copyOf(chunks, 2 * c);
        }
        double[] chunk = chunks[c];
        int k = at & MASK;
        if (chunk == null) {
            chunks[c] = new double[CHUNK];
        } else if (k + n > chunk.length) {
            chunks[c] = Arrays.copyOf(chunk, Math.min(CHUNK, Math.max(2 * chunk.length, k + n)));
        }
        end = at + n;
        return at;
    }

    /** The chunk that holds {@code offset}; index it with {@link #position}. */
    double[] chunk(int offset) {
        return chunks[offset >>> SHIFT];
    }

    static int position(int offset) {
        return offset & MASK;
    }

    double get(int offset) {
        return chunks[offset >>> SHIFT][offset & MASK];
    }

    /** Drops every record from offset {@code newEnd} on. */
    void truncate(int newEnd) {
        end = newEnd;
    }

    /** A copy that shares the full chunks and trims the last one, for reading only. */
    DoubleChunks trimmed() {
        int used = (end + MASK) >>> SHIFT;
        double[][] out = Arrays.copyOf(chunks, Math.max(1, used));
        if (used == 0) {
            out[0] = new double[0];
        } else if ((end & MASK) != 0) {
            out[used - 1] = Arrays.copyOf(out[used - 1], end & MASK);
        }
        return new DoubleChunks(out, end);
    }
}
