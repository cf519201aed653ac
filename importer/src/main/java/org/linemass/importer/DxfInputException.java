package org.linemass.importer;

/**
 * A file that cannot be read as a drawing. The message is one line naming the file, the DXF line
 * number, the entity type and handle where known, and what was expected. This is the only
 * exception the importer lets escape for bad input.
 */
public final class DxfInputException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final String entityType;
    private final String handle;
    private final String problem;

    public DxfInputException(String file, int line, String entityType, String handle, String problem) {
        this(format(file, line, entityType, handle, problem), file, line, entityType, handle, problem);
    }

    private DxfInputException(String message, String file, int line, String entityType, String handle,
            String problem) {
        super(message);
        this.file = file;
        this.line = line;
        this.entityType = entityType == null ? "" : entityType;
        this.handle = handle == null ? "" : handle;
        this.problem = problem;
    }

    /**
     * An error in a binary DXF, located by byte offset instead of line number: the message reads
     * {@code file:byte N: ENTITY (handle H): problem}; {@link #line()} is 0.
     */
    public static DxfInputException atByte(String file, long byteOffset, String entityType, String handle,
            String problem) {
        String where = (file == null ? "<input>" : file) + ":byte " + byteOffset;
        return new DxfInputException(format(where, 0, entityType, handle, problem), file, 0, entityType, handle,
                problem);
    }

    static String format(String file, int line, String entityType, String handle, String problem) {
        StringBuilder sb = new StringBuilder(file == null ? "<input>" : oneLine(file));
        if (line > 0) {
            sb.append(':').append(line);
        }
        if (entityType != null && !entityType.isEmpty()) {
            sb.append(": ").append(oneLine(entityType));
            if (handle != null && !handle.isEmpty()) {
                sb.append(" (handle ").append(oneLine(handle)).append(')');
            }
        }
        sb.append(": ").append(oneLine(problem));
        return sb.toString();
    }

    /** Control characters (a CR inside an entity type read from the file, say) become spaces. */
    private static String oneLine(String s) {
        StringBuilder sb = null;
        for (int i = 0; i < s.length(); i++) {
            if (Character.isISOControl(s.charAt(i))) {
                if (sb == null) {
                    sb = new StringBuilder(s);
                }
                sb.setCharAt(i, ' ');
            }
        }
        return sb == null ? s : sb.toString();
    }

    public String file() {
        return file;
    }

    public int line() {
        return line;
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
}
