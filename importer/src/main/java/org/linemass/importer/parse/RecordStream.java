package org.linemass.importer.parse;

import java.io.IOException;
import org.linemass.importer.read.GroupSource;
import org.linemass.importer.read.ReadException;
import org.linemass.importer.read.Record;
import org.linemass.importer.read.RecordReader;

/**
 * Records one at a time with a single push-back, over one reused {@link Record}: a record handed
 * out is valid until the next call to {@link #next()}.
 */
final class RecordStream {

    private final RecordReader reader;
    private final Record rec = new Record();
    private boolean pushedBack;
    private boolean hasRecord;

    RecordStream(RecordReader reader) {
        this.reader = reader;
    }

    GroupSource source() {
        return reader.source();
    }

    /** The next record, or null at the end of the input. */
    Record next() throws ReadException, IOException {
        if (pushedBack) {
            pushedBack = false;
            return rec;
        }
        hasRecord = reader.read(rec);
        return hasRecord ? rec : null;
    }

    /** Makes the next {@link #next()} return the current record again. */
    void pushBack() {
        if (!hasRecord) {
            throw new IllegalStateException("no record to push back");
        }
        pushedBack = true;
    }

    /** An input error located at {@code r}. */
    ReadException error(Record r, String problem) {
        return reader.source().error(r.position(), r.type(), r.handle(), problem);
    }
}
