package org.linemass.engine.field;

/**
 * An expression could not be evaluated at some point of a wire (division by zero, NaN, a negative
 * density). Unchecked so that it can pass through the integrators; the engine's entry points turn it
 * into an {@link org.linemass.engine.error.AnalysisException} with the same one-line message.
 */
public final class FieldException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public FieldException(String message) {
        super(message);
    }
}
