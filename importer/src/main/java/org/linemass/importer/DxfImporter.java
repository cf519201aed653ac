package org.linemass.importer;

import java.nio.file.Path;
import org.linemass.drawing.Drawing;

/** Reads one DXF file (ASCII or binary) into a {@link Drawing}. */
public final class DxfImporter {

    private DxfImporter() {
    }

    /**
     * Reads {@code file} read-only.
     *
     * @throws DxfInputException when the file cannot be read as a drawing (one-line message with location)
     */
    public static Drawing read(Path file, ImportOptions options) throws DxfInputException {
        throw new UnsupportedOperationException("importer not written yet");
    }
}
