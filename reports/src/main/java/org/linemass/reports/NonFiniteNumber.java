package org.linemass.reports;

/**
 * A NaN or an infinity reached a report writer. No report may hold one (a reader cannot tell it
 * from a measurement), so the writer stops instead of printing it: this is a bug upstream (the
 * engine let a non-finite value into the result), and the command line reports it as an internal
 * error (exit 3) asking for the drawing. Tests see it as a failure.
 */
public final class NonFiniteNumber extends IllegalStateException {

    private static final long serialVersionUID = 1L;

    public NonFiniteNumber(String where, double value) {
        super("a non-finite number (" + value + ") reached the " + where + "; no report holds one");
    }

    /** {@code v} when it is finite; otherwise throws naming {@code where}. */
    public static double check(double v, String where) {
        if (!Double.isFinite(v)) {
            throw new NonFiniteNumber(where, v);
        }
        return v;
    }
}
