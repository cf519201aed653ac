package org.linemass.geometry;

import java.util.Arrays;

/**
 * A growing column of ints held in chunks, so growing it never copies what it holds (a large
 * block's columns reach millions of entries, and doubling arrays would copy them over and over).
 * The first chunk starts small and grows to full size, so the many small blocks of a drawing stay
 * small. Not thread-safe while growing; a {@link #trimmed()} copy is never changed again.
 */
final class IntChunks {

    private static final int SHIFT = 14;
    private static final int CHUNK = 1 << SHIFT;
    private static final int MASK = CHUNK - 1;
    private static final int FIRST = 8;

    private int[][] chunks;
    private int size;

    IntChunks() {
        this(new int[][] {new int[FIRST]}, 0);
    }

    private IntChunks(int[][] chunks, int size) {
        this.chunks = chunks;
        this.size = size;
    }

    int size() {
        return size;
    }

    void add(int value) {
        chunkWithRoom(1)[size & MASK] = value;
        size++;
    }

    /**
     * Adds four values that stay in one chunk (a row of a four-column table): the caller only ever
     * adds rows of four, so a row never straddles two chunks.
     */
    void addRow(int a, int b, int c, int d) {
        int[] chunk = chunkWithRoom(4);
        int k = size & MASK;
        chunk[k] = a;
        chunk[k + 1] = b;
        chunk[k + 2] = c;
        chunk[k + 3] = d;
        size += 4;
    }

    /** The chunk the next {@code n} values go to, grown or allocated so they fit. */
    private int[] chunkWithRoom(int n) {
        int c = size >>> SHIFT;
        int k = size & MASK;
        if (c == chunks.length) {
            chunks = Arrays.copyOf(chunks, 2 * c);
        }
        int[] chunk = chunks[c];
        if (chunk == null) {
            chunk = new int[CHUNK];
            chunks[c] = chunk;
        } else if (k + n > chunk.length) {
            chunk = Arrays.copyOf(chunk, Math.min(CHUNK, 2 * chunk.length));
            chunks[c] = chunk;
        }
        return chunk;
    }

    /** The value at {@code i}; the caller checks {@code 0 <= i < size()}. */
    int get(int i) {
        return chunks[i >>> SHIFT][i & MASK];
    }

    /** Keeps the first {@code newSize} values. */
    void truncate(int newSize) {
        size = newSize;
    }

    /** A copy that shares the full chunks and trims the last one, for reading only. */
    IntChunks trimmed() {
        int used = (size + MASK) >>> SHIFT;
        int[][] out = Arrays.copyOf(chunks, Math.max(1, used));
        if (used == 0) {
            out[0] = new int[0];
        } else if ((size & MASK) != 0) {
            out[used - 1] = Arrays.copyOf(out[used - 1], size & MASK);
        }
        return new IntChunks(out, size);
    }
}
