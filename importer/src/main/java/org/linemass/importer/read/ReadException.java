package org.linemass.importer.read;

/**
 * A file that cannot be read as a drawing, as the reading packages see it: where (a DXF line
 * number, or a byte offset in a binary file), the entity type and handle where known, and what
 * was expected. The importer's front door turns it into its public input-error type with the
 * same one-line message, so the reading packages need nothing from the front door.
 */
public final class ReadException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String file;
    private final boolean binary;
    private final long position;
    private final String entityType;
    private final String handle;
    private final String problem;

    /**
     * @param position the DXF line number (ASCII; 0 when not tied to a line) or byte offset (binary)
     */
    public ReadException(String file, boolean binary, long position, String entityType, String handle,
            String problem) {
        super(problem, null, false, false);
        this.file = file;
        this.binary = binary;
        this.position = position;
        this.entityType = entityType == null ? "" : entityType;
        this.handle = handle == null ? "" : handle;
        this.problem = problem;
    }

    public String file() {
        return file;
    }

    /** True when {@link #position()} is a byte offset of a binary file, false for a line number. */
    public boolean binary() {
        return binary;
    }

    public long position() {
        return position;
    }

    public String entityType() {
        return entityType;
    }

    public String handle() {
        return handle;
    }

    public String problem() {
        return problem;
    }

    /** {@code s} with line breaks replaced by blanks, other control characters by '?', cut to {@code max}. */
    public static String oneLine(String s, int max) {
        StringBuilder sb = new StringBuilder(Math.min(s.length(), max) + 3);
        for (int i = 0; i < s.length() && i < max; i++) {
            char c = s.charAt(i);
            sb.append(c == '\n' || c == '\r' ? ' ' : Character.isISOControl(c) ? '?' : c);
        }
        if (s.length() > max) {
            sb.append("...");
        }
        return sb.toString();
    }
}
