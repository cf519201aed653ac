package org.linemass.importer.parse;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.RandomAccess;

/**
 * An append-mostly list held in fixed-size chunks: growing it never copies what it already holds
 * (a block of a large drawing collects close to a million segments, and an array list's growth
 * copies would be garbage of the same order). Supports {@link #add}, {@link #get}, {@link #size},
 * {@link #toArray()} and removal of a tail range ({@code subList(from, size()).clear()}, which the
 * converters use to roll back a failed entity); other removals are unsupported. Not thread-safe.
 *
 * @param <E> element type (nulls are allowed but never stored by the importer)
 */
final class ChunkedList<E> extends AbstractList<E> implements RandomAccess {

    private static final int SHIFT = 12;
    private static final int CHUNK = 1 << SHIFT;
    private static final int MASK = CHUNK - 1;

    private Object[][] chunks = new Object[8][];
    private int size;

    @Override
    public boolean add(E e) {
        int c = size >>> SHIFT;
        if (c == chunks.length) {
            chunks = Arrays.copyOf(chunks, c * 2);
        }
        Object[] chunk = chunks[c];
        if (chunk == null) {
            chunk = new Object[CHUNK];
            chunks[c] = chunk;
        }
        chunk[size & MASK] = e;
        size++;
        modCount++;
        return true;
    }

    @Override
    @SuppressWarnings("unchecked")
    public E get(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException("index " + index + " of size " + size);
        }
        return (E) chunks[index >>> SHIFT][index & MASK];
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public Object[] toArray() {
        Object[] out = new Object[size];
        int done = 0;
        for (int c = 0; done < size; c++) {
            int n = Math.min(CHUNK, size - done);
            System.arraycopy(chunks[c], 0, out, done, n);
            done += n;
        }
        return out;
    }

    /** Only a tail range can be removed: that is all the converters' roll-back needs. */
    @Override
    protected void removeRange(int fromIndex, int toIndex) {
        if (toIndex != size || fromIndex < 0 || fromIndex > toIndex) {
            throw new UnsupportedOperationException("only a tail range can be removed, not " + fromIndex + ".."
                    + toIndex + " of " + size);
        }
        for (int i = fromIndex; i < toIndex; i++) {
            chunks[i >>> SHIFT][i & MASK] = null;
        }
        size = fromIndex;
        modCount++;
    }
}
