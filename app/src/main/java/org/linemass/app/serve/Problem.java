package org.linemass.app.serve;

/**
 * A request the server refuses, with the HTTP status and a one-line message for the page
 * (a bad upload, a limit reached, a missing token). Never a bug: those answer 500.
 */
final class Problem extends Exception {

    private final int status;

    Problem(int status, String message) {
        super(message);
        this.status = status;
    }

    int status() {
        return status;
    }
}
