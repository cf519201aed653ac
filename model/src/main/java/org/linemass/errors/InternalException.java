package org.linemass.errors;

/**
 * A bug in linemass: a state the code promises cannot happen (an invariant broken, a case a
 * switch says is impossible). Not for bad files (each module's input-error type, with a location)
 * nor bad arguments ({@link IllegalArgumentException} with the offending values). The command line
 * prints it as one line that asks the user to report it, and exits with code 3.
 */
public final class InternalException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public InternalException(String message) {
        super(message);
    }

    public InternalException(String message, Throwable cause) {
        super(message, cause);
    }
}
