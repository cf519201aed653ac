package org.linemass.engine.error;

/**
 * Settings or data that make an analysis impossible (unknown section id, a density expression that
 * does not parse or goes negative along a wire). The message is one line naming the layer, file or
 * row involved.
 */
public final class AnalysisException extends Exception {

    private static final long serialVersionUID = 1L;

    public AnalysisException(String message) {
        super(message);
    }
}
