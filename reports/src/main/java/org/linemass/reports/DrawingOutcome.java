package org.linemass.reports;

/**
 * What became of one drawing of a run over several: its report, or the one-line message saying why
 * it could not be read or analysed; and the wall-clock time it took. Exactly one of {@code report}
 * and {@code error} is set. {@link #status()} is what the combined outputs print in their status
 * column.
 *
 * @param file the drawing as named in the reports (for a report, its drawing's file)
 * @param elapsedNanos wall-clock time of reading and analysing, 0 or more
 */
public record DrawingOutcome(String file, Report report, String error, long elapsedNanos) {

    /** Status of a drawing that was read and analysed completely. */
    public static final String OK = "ok";
    /** Status of a drawing analysed with some of it left out (its reasons are in the reports). */
    public static final String INCOMPLETE = "incomplete";
    /** Status of a drawing that could not be read or analysed. */
    public static final String FAILED = "failed";

    public DrawingOutcome {
        if (file == null || (report == null) == (error == null) || elapsedNanos < 0) {
            throw new IllegalArgumentException("an outcome needs a file and either a report or an error, got file "
                    + file + ", report " + (report != null) + ", error " + error + ", time " + elapsedNanos);
        }
    }

    /** A drawing that was analysed. */
    public static DrawingOutcome of(Report report, long elapsedNanos) {
        return new DrawingOutcome(report.result().drawing().file(), report, null, elapsedNanos);
    }

    /** A drawing that failed with the one-line {@code message}. */
    public static DrawingOutcome failed(String file, String message, long elapsedNanos) {
        return new DrawingOutcome(file, null, message, elapsedNanos);
    }

    public boolean isFailed() {
        return error != null;
    }

    /** {@link #OK}, {@link #INCOMPLETE} or {@link #FAILED}. */
    public String status() {
        if (error != null) {
            return FAILED;
        }
        return report.result().complete() ? OK : INCOMPLETE;
    }
}
