package org.linemass.importer.read;

import java.io.IOException;
import org.linemass.importer.DxfInputException;

/**
 * Groups the pair stream of a {@link GroupSource} into {@link Record}s. The reader keeps one pair
 * of look-ahead: after {@link #read(Record)} the source stands on the {@code 0} group that starts
 * the next record. Tokenizer errors are re-thrown naming the record being read.
 */
public final class RecordReader {

    private final GroupSource src;
    private final int maxGroups;
    private boolean started;
    private boolean atEnd;

    public RecordReader(GroupSource src, int maxGroups) {
        this.src = src;
        this.maxGroups = maxGroups;
    }

    public GroupSource source() {
        return src;
    }

    /**
     * Reads the next record into {@code rec}; false when the input has no more records. Groups
     * before the first {@code 0} group are an error (not a DXF).
     */
    public boolean read(Record rec) throws DxfInputException, IOException {
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
        rec.position = src.position();
        // subclass markers matter only where one record holds two subclasses with clashing codes
        rec.keepSubclassMarkers = rec.type.equals("HELIX");
        if (rec.type.equals("EOF")) {
            // nothing after EOF is read: trailing bytes may be anything
            atEnd = true;
            rec.endOfInput = true;
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
                if (rec.n >= maxGroups) {
                    throw src.error(src.position(), "", "", "record has more than " + maxGroups + " groups");
                }
                addGroup(rec, code);
            }
        } catch (DxfInputException e) {
            if (e.entityType().isEmpty() && !rec.type.isEmpty()) {
                throw withContext(e, rec);
            }
            throw e;
        }
    }

    private DxfInputException withContext(DxfInputException e, Record rec) {
        return src.error(src.lastErrorPosition(), rec.type, rec.handle, e.problem());
    }

    private void addGroup(Record rec, int code) {
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
                rec.add(code, v, null);
            }
            case STRING -> {
                String s = null;
                if (code == 8) {
                    s = src.pooledValue().trim();
                    rec.layer = s;
                } else if (code == 5) {
                    s = src.stringValue().trim();
                    rec.handle = s;
                } else if (code == 2 || code == 9 || (code == 100 && rec.keepSubclassMarkers)) {
                    s = src.pooledValue().trim();
                } else if (code >= 1 && code <= 7) {
                    s = src.stringValue();
                }
                rec.add(code, Double.NaN, s);
            }
            default -> rec.add(code, Double.NaN, null);
        }
    }
}
