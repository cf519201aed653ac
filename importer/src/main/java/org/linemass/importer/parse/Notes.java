package org.linemass.importer.parse;

import org.linemass.drawing.ImportNote;
import org.linemass.importer.read.ReadException;

/** Builds {@link ImportNote}s whose message is one printable line, whatever names the file holds. */
final class Notes {

    /** Longest message kept; names quoted from broken files can be arbitrarily long. */
    private static final int MAX_MESSAGE = 500;

    private Notes() {
    }

    static ImportNote of(String severity, String kind, String file, int line, String entityType, String handle,
            String layer, String message) {
        return new ImportNote(severity, kind, file, line, entityType, handle, layer,
                ReadException.oneLine(message, MAX_MESSAGE));
    }
}
