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
        super(format(file, line, entityType, handle, problem));
        this.file = file;
        this.line = line;
        this.entityType = entityType == null ? "" : entityType;
        this.handle = handle == null ? "" : handle;
        this.problem = problem;
    }

    static String format(String file, int line, String entityType, String handle, String problem) {
        StringBuilder sb = new StringBuilder(file == null ? "<input>" : file);
        if (line > 0) {
            sb.append(':').append(line);
        }
        if (entityType != null && !entityType.isEmpty()) {
            sb.append(": ").append(entityType);
            if (handle != null && !handle.isEmpty()) {
                sb.append(" (handle ").append(handle).append(')');
            }
        }
        sb.append(": ").append(problem.replace('\n', ' ').replace('\r', ' '));
        return sb.toString();
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
