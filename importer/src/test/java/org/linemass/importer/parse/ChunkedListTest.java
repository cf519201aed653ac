package org.linemass.importer.parse;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The chunked segment list behaves like an array list for appends, reads and tail roll-back. */
class ChunkedListTest {

    @Test
    void behavesLikeAnArrayList_acrossChunkBoundaries() {
        ChunkedList<Integer> c = new ChunkedList<>();
        List<Integer> ref = new ArrayList<>();
        // 100,000 elements span 25 chunks of 4096 and force the chunk table to grow twice
        for (int i = 0; i < 100_000; i++) {
            c.add(i * 7);
            ref.add(i * 7);
        }
        assertEquals(ref, c);
        assertEquals(ref.hashCode(), c.hashCode());
        assertArrayEquals(ref.toArray(), c.toArray());
        assertEquals(ref, List.copyOf(c));
        // roll back a tail that crosses a chunk boundary, then keep appending
        c.subList(4000, c.size()).clear();
        ref.subList(4000, ref.size()).clear();
        c.add(-1);
        ref.add(-1);
        assertEquals(ref, c);
        assertEquals(4001, c.size());
        assertThrows(IndexOutOfBoundsException.class, () -> c.get(4001));
        assertThrows(UnsupportedOperationException.class, () -> c.subList(0, 2).clear());
    }
}
