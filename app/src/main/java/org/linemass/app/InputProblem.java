package org.linemass.app;

/** A bad file or argument found by the command line itself (exit code 2, one-line message). */
public final class InputProblem extends Exception {

    private static final long serialVersionUID = 1L;

    public InputProblem(String message) {
        super(message);
    }
}
