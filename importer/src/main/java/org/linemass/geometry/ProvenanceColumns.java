package org.linemass.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Provenances held as columns, one row per entity: a scope index (into a table of the distinct
 * file / layer / type / block path scopes), the DXF line and the handle value. Sixteen bytes a row
 * instead of a provenance object and its reference. Handle texts that are not canonical
 * hexadecimal, which DXF writers do not emit, are kept in a side table; a missing handle is a flag.
 *
 * <p>Appending and truncating are for the owning builder; once {@link #trimmed()} the copy is
 * never changed again and may be read from any thread. {@link #get} returns a provenance equal to
 * the one added in that row.
 */
final class ProvenanceColumns {

    /** Flag in the scope column: the handle text is empty. */
    private static final int NO_HANDLE = 1 << 31;
    /** Flag in the scope column: the handle text is in {@link #texts}. */
    private static final int OWN_TEXT = 1 << 30;
    private static final int SCOPE_MASK = OWN_TEXT - 1;

    private int size;
    private int[] scopeFlags;
    private int[] lines;
    private long[] handles;
    private final Map<Integer, String> texts;
    private final List<Provenance.Scope> scopes;
    /** Scope to index; only the builder's copy has one. */
    private final Map<Provenance.Scope, Integer> scopeIndex;

    ProvenanceColumns() {
        this(0, new int[16], new int[16], new long[16], new HashMap<>(), new ArrayList<>(), new HashMap<>());
    }

    private ProvenanceColumns(int size, int[] scopeFlags, int[] lines, long[] handles, Map<Integer, String> texts,
            List<Provenance.Scope> scopes, Map<Provenance.Scope, Integer> scopeIndex) {
        this.size = size;
        this.scopeFlags = scopeFlags;
        this.lines = lines;
        this.handles = handles;
        this.texts = texts;
        this.scopes = scopes;
        this.scopeIndex = scopeIndex;
    }

    int size() {
        return size;
    }

    /** Appends a row for {@code p}. */
    void add(Provenance p) {
        if (size == lines.length) {
            int n = SegmentColumns.grownLength(size);
            scopeFlags = Arrays.copyOf(scopeFlags, n);
            lines = Arrays.copyOf(lines, n);
            handles = Arrays.copyOf(handles, n);
        }
        Integer s = scopeIndex.get(p.scope());
        if (s == null) {
            s = scopes.size();
            if (s > SCOPE_MASK) {
                throw new IllegalStateException("more than " + SCOPE_MASK + " distinct layer/type/block scopes");
            }
            scopes.add(p.scope());
            scopeIndex.put(p.scope(), s);
        }
        int flags = s;
        String text = p.handleText();
        if (text != null && text.isEmpty()) {
            flags |= NO_HANDLE;
        } else if (text != null) {
            flags |= OWN_TEXT;
            texts.put(size, text);
        }
        scopeFlags[size] = flags;
        lines[size] = p.line();
        handles[size] = p.handleBits();
        size++;
    }

    /** The provenance of row {@code row}. */
    Provenance get(int row) {
        int flags = scopeFlags[row];
        String text = (flags & NO_HANDLE) != 0 ? "" : (flags & OWN_TEXT) != 0 ? texts.get(row) : null;
        return new Provenance(scopes.get(flags & SCOPE_MASK), lines[row], text, handles[row]);
    }

    /** Drops the rows from {@code newSize} on. */
    void truncate(int newSize) {
        for (int row = newSize; row < size; row++) {
            if ((scopeFlags[row] & OWN_TEXT) != 0) {
                texts.remove(row);
            }
        }
        size = newSize;
    }

    /** A copy with arrays of exactly the used length and no scope index, for reading only. */
    ProvenanceColumns trimmed() {
        return new ProvenanceColumns(size, Arrays.copyOf(scopeFlags, size), Arrays.copyOf(lines, size),
                Arrays.copyOf(handles, size), Map.copyOf(texts), List.copyOf(scopes), Map.of());
    }
}
