package org.linemass.importer.read;

import java.io.IOException;

/**
 * Groups the pair stream of a {@link GroupSource} into {@link Record}s. The reader keeps one pair
 * of look-ahead: after {@link #read(Record)} the source stands on the {@code 0} group that starts
 * the next record. Tokenizer errors are re-thrown naming the record being read.
 */
public final class RecordReader {

    /** Record types whose values the importer never reads beyond their identity (counted only). */
    private static final java.util.Set<String> IDENTITY_ONLY = java.util.Set.of("TEXT", "MTEXT", "HATCH",
            "DIMENSION", "SOLID", "3DSOLID", "REGION", "BODY", "VIEWPORT", "POINT", "ATTRIB", "ATTDEF",
            "MLEADER", "MULTILEADER", "TOLERANCE", "IMAGE", "WIPEOUT", "OLE2FRAME", "TRACE", "MESH",
            "SURFACE", "PLANESURFACE", "ACAD_TABLE", "RAY", "XLINE", "SHAPE", "ARC_DIMENSION");

    /**
     * Groups kept for records whose values occur once (LINE, ARC, INSERT, VERTEX...): the converters
     * read first occurrences only, so a hostile record with millions of repeated groups costs no
     * memory. Only LWPOLYLINE, SPLINE, HELIX and section headers may hold up to the group limit.
     */
    private static final int SMALL_RECORD_GROUPS = 4096;

    private static final int SUBCLASS_MARKERS = 1;
    private static final int KEEP_ALL = 2;
    private static final int LWPOLYLINE = 4;
    private static final int MANY_GROUPS = 8;
    /** Slots of the type-flag cache (a power of two). */
    private static final int TYPE_SLOTS = 16;

    /** Recent record types (pooled strings, compared by identity) and their flags. */
    private final String[] cachedTypes = new String[TYPE_SLOTS];
    private final int[] cachedFlags = new int[TYPE_SLOTS];

    private final GroupSource src;
    private final int maxGroups;
    private boolean started;
    private boolean atEnd;

    /** The record being read, for {@link #unwanted}. */
    private Record current;

    public RecordReader(GroupSource src, int maxGroups) {
        this.src = src;
        this.maxGroups = maxGroups;
        src.unwanted(this::unwanted);
    }

    /**
     * True for a group of the record being read whose value will not be kept: the source then
     * steps over the value without holding it (so a long comment or extended-data string costs
     * nothing and hits no line limit).
     */
    private boolean unwanted(int code) {
        Record rec = current;
        return rec != null && (!keep(rec, code) || !(rec.n < SMALL_RECORD_GROUPS || rec.manyGroups));
    }

    public GroupSource source() {
        return src;
    }

    /**
     * Reads the next record into {@code rec}; false when the input has no more records. Groups
     * before the first {@code 0} group are an error (not a DXF).
     */
    public boolean read(Record rec) throws ReadException, IOException {
        if (!started) {
            started = true;
            if (!src.next()) {
                atEnd = true;
            } else if (src.code() != 0) {
                throw src.error(src.position(), "", "", "not a DXF file: expected group code 0 at the start, got "
                        + src.code());
            }
        }
        if (atEnd) {
            return false;
        }
        rec.clear();
        rec.type = src.pooledValue().trim();
        current = rec;
        rec.position = src.position();
        int flags = typeFlags(rec.type);
        rec.keepSubclassMarkers = (flags & SUBCLASS_MARKERS) != 0;
        rec.keepAll = (flags & KEEP_ALL) != 0;
        rec.lwpolyline = (flags & LWPOLYLINE) != 0;
        rec.manyGroups = (flags & MANY_GROUPS) != 0;
        if (rec.type.equals("EOF")) {
            // nothing after EOF is read: trailing bytes may be anything
            atEnd = true;
            return true;
        }
        try {
            while (true) {
                if (!src.next()) {
                    atEnd = true;
                    rec.endOfInput = true;
                    return true;
                }
                int code = src.code();
                if (code == 0) {
                    return true;
                }
                if (rec.n >= maxGroups && rec.manyGroups) {
                    throw src.error(src.position(), "", "", "record has more than " + maxGroups + " groups");
                }
                if (rec.n < SMALL_RECORD_GROUPS || rec.manyGroups) {
                    addGroup(rec, code);
                }
            }
        } catch (ReadException e) {
            if (e.entityType().isEmpty() && !rec.type.isEmpty()) {
                throw withContext(e, rec);
            }
            throw e;
        }
    }

    /** How a record of {@code type} is kept; cached, as the same few types repeat. */
    private int typeFlags(String type) {
        int slot = type.hashCode() & (TYPE_SLOTS - 1);
        if (cachedTypes[slot] == type) {
            return cachedFlags[slot];
        }
        // subclass markers matter only where one record holds two subclasses with clashing codes
        boolean helix = type.equals("HELIX");
        boolean lw = type.equals("LWPOLYLINE");
        int flags = (helix ? SUBCLASS_MARKERS : 0) | (IDENTITY_ONLY.contains(type) ? 0 : KEEP_ALL)
                | (lw ? LWPOLYLINE : 0)
                | (lw || helix || type.equals("SPLINE") || type.equals("SECTION")
                        || type.equals("ENDSEC") || type.equals("MLINE") || type.equals("LEADER") ? MANY_GROUPS : 0);
        cachedTypes[slot] = type;
        cachedFlags[slot] = flags;
        return flags;
    }

    private ReadException withContext(ReadException e, Record rec) {
        return src.error(src.lastErrorPosition(), rec.type, rec.handle(), e.problem());
    }

    /**
     * Whether a group is kept: application data, reactors, owner handles, binary chunks and
     * extended data never are; entity types without wire geometry keep only their identity
     * (2, 5, 8, 66, 67); LWPOLYLINE drops per-vertex widths and ids. This bounds memory on huge
     * records and keeps the common path short.
     */
    private static boolean keep(Record rec, int code) {
        if (code == 102 || code == 330 || code == 360 || code >= 1000 || (code >= 310 && code <= 319)) {
            return false;
        }
        if (code == 100) {
            return rec.keepSubclassMarkers;
        }
        if (!rec.keepAll) {
            return code == 2 || code == 5 || code == 8 || code == 66 || code == 67;
        }
        return !(rec.lwpolyline && (code == 40 || code == 41 || code == 91));
    }

    private void addGroup(Record rec, int code) {
        if (!keep(rec, code)) {
            return;
        }
        switch (GroupSource.kind(code)) {
            case DOUBLE, INT, BOOL -> {
                double v;
                try {
                    v = src.doubleValue();
                } catch (NumberFormatException ex) {
                    if (rec.badPosition < 0) {
                        rec.badPosition = src.position();
                        rec.badCode = code;
                        rec.badText = src.valueExcerpt();
                    }
                    v = Double.NaN;
                }
                rec.add(code, v);
            }
            case STRING -> {
                String s = null;
                if (code == 8) {
                    // layer names keep their blanks: ' 1' and '1' are different layers
                    s = src.pooledValue();
                    rec.layer = s;
                } else if (code == 5) {
                    long v = src.hexValue();
                    if (v != -1) {
                        // held as a number: no string per entity unless someone asks for it
                        rec.handleBits = v;
                        rec.handle = null;
                    } else {
                        s = src.stringValue().trim();
                        rec.handle = s;
                        rec.handleBits = -1;
                    }
                } else if (code == 2) {
                    // names (layers in the LAYER table, blocks) keep their blanks, as layer names in 8 do
                    s = src.pooledValue();
                } else if (code == 9 || code == 100) {
                    s = src.pooledValue().trim();
                } else if (code >= 1 && code <= 7) {
                    s = src.stringValue();
                }
                rec.addString(code, s);
            }
            default -> rec.add(code, Double.NaN);
        }
    }
}
