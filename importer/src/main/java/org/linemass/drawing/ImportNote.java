package org.linemass.drawing;

/**
 * Something the importer could not use or had to guess, kept so that reports can say so.
 * {@code severity} is one of {@code error} (an entity was skipped: totals are incomplete),
 * {@code warning} or {@code info}. {@code line} is the DXF line number (0 when not tied to one).
 */
public record ImportNote(String severity, String kind, String file, int line, String entityType,
        String handle, String layer, String message) {

    public boolean skippedGeometry() {
        return "error".equals(severity);
    }
}
