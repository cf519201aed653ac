package org.linemass.app;

/** The exit codes of every command. */
public final class ExitCodes {

    /** Done; no finding at or above the chosen severity. */
    public static final int OK = 0;
    /** Done; some finding at or above the chosen severity. */
    public static final int FINDINGS = 1;
    /** Bad input or usage; a one-line message was printed. */
    public static final int BAD_INPUT = 2;
    /** A bug in linemass; a one-line message asks the user to report it. */
    public static final int INTERNAL = 3;

    private ExitCodes() {
    }
}
