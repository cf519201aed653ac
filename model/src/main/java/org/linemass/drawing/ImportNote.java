package org.linemass.drawing;

/**
 * Something the importer could not use or had to guess, kept so that reports can say so.
 * {@code severity} is one of {@code error} (an entity was skipped: totals are incomplete),
 * {@code warning} or {@code info}. {@code line} is the DXF line number (0 when not tied to one).
 * {@code message} is one line: control characters in it (a CR or LF inside a name quoted from a
 * binary file, say) are replaced by spaces.
 */
public record ImportNote(String severity, String kind, String file, int line, String entityType,
        String handle, String layer, String message) {

    public ImportNote {
        message = oneLine(message);
    }

    private static String oneLine(String s) {
        if (s == null || s.chars().noneMatch(Character::isISOControl)) {
            return s;
        }
        StringBuilder sb = new StringBuilder(s);
        for (int i = 0; i < sb.length(); i++) {
            if (Character.isISOControl(sb.charAt(i))) {
                sb.setCharAt(i, ' ');
            }
        }
        return sb.toString();
    }

    public boolean skippedGeometry() {
        return "error".equals(severity);
    }
}
