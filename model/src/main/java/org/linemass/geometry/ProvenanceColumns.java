package org.linemass.geometry;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Provenances held as columns, one row per entity: a scope index (into a table of the distinct
 * file / layer / type / block path scopes), the DXF line and the handle value. Sixteen bytes a row
 * (the handle as two ints) instead of a provenance object and its reference. Handle texts that are not canonical
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
    private static final int RECENT = 64;

    /** Four ints a row: scope index and flags, DXF line, handle high and low halves. */
    private final IntChunks table;
    private final Map<Integer, String> texts;
    private final List<Provenance.Scope> scopes;
    /** Scope to index; only the builder's copy has one. */
    private final Map<Provenance.Scope, Integer> scopeIndex;

    /**
     * Scope objects met and their indexes, direct-mapped by identity: provenances share scope
     * objects, so this answers nearly every lookup without hashing the scope's strings.
     */
    private final Provenance.Scope[] recentScopes = new Provenance.Scope[RECENT];
    private final int[] recentIndexes = new int[RECENT];

    ProvenanceColumns() {
        this(new IntChunks(), new HashMap<>(), new ArrayList<>(), new HashMap<>());
    }

    private ProvenanceColumns(IntChunks table, Map<Integer, String> texts, List<Provenance.Scope> scopes,
            Map<Provenance.Scope, Integer> scopeIndex) {
        this.table = table;
        this.texts = texts;
        this.scopes = scopes;
        this.scopeIndex = scopeIndex;
    }

    int size() {
        return table.size() >> 2;
    }

    /** Appends a row for {@code p}. */
    void add(Provenance p) {
        int flags = scopeIndex(p.scope());
        String text = p.handleText();
        if (text != null && text.isEmpty()) {
            flags |= NO_HANDLE;
        } else if (text != null) {
            flags |= OWN_TEXT;
            texts.put(size(), text);
        }
        long handle = p.handleBits();
        table.addRow(flags, p.line(), (int) (handle >>> 32), (int) handle);
    }

    private int scopeIndex(Provenance.Scope scope) {
        int slot = System.identityHashCode(scope) & (RECENT - 1);
        if (recentScopes[slot] == scope) {
            return recentIndexes[slot];
        }
        Integer s = scopeIndex.get(scope);
        if (s == null) {
            s = scopes.size();
            if (s > SCOPE_MASK) {
                throw new IllegalStateException("more than " + SCOPE_MASK + " distinct layer/type/block scopes");
            }
            scopes.add(scope);
            scopeIndex.put(scope, s);
        }
        recentScopes[slot] = scope;
        recentIndexes[slot] = s;
        return s;
    }

    /** The provenance of row {@code row}. */
    Provenance get(int row) {
        int at = row << 2;
        int flags = table.get(at);
        String text = (flags & NO_HANDLE) != 0 ? "" : (flags & OWN_TEXT) != 0 ? texts.get(row) : null;
        long handle = (long) table.get(at + 2) << 32 | (table.get(at + 3) & 0xFFFF_FFFFL);
        return new Provenance(scopes.get(flags & SCOPE_MASK), table.get(at + 1), text, handle);
    }

    /** Drops the rows from {@code newSize} on. */
    void truncate(int newSize) {
        for (int row = newSize; row < size(); row++) {
            if ((table.get(row << 2) & OWN_TEXT) != 0) {
                texts.remove(row);
            }
        }
        table.truncate(newSize << 2);
    }

    /** A copy that is never changed again and has no scope index, for reading only. */
    ProvenanceColumns trimmed() {
        return new ProvenanceColumns(table.trimmed(), Map.copyOf(texts), List.copyOf(scopes), Map.of());
    }
}
