package org.linemass.importer;

import org.linemass.importer.read.ReadException;

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
        StringBuilder sb = new StringBuilder(oneLine(file == null ? "<input>" : file, Integer.MAX_VALUE));
        if (line > 0) {
            sb.append(':').append(line);
        }
        if (entityType != null && !entityType.isEmpty()) {
            sb.append(": ").append(oneLine(entityType, MAX_NAME));
            if (handle != null && !handle.isEmpty()) {
                sb.append(" (handle ").append(oneLine(handle, MAX_NAME)).append(')');
            }
        }
        sb.append(": ").append(oneLine(problem, Integer.MAX_VALUE));
        return sb.toString();
    }

    /** Longest entity type or handle quoted in a message (longer ones come from broken files). */
    private static final int MAX_NAME = 40;

    /** {@code s} with control characters replaced by '?' and cut to {@code max} characters. */
    public static String oneLine(String s, int max) {
        return ReadException.oneLine(s, max);
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
