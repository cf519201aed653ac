package org.linemass.engine.pieces.checks;

import java.util.List;
import java.util.Locale;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;

/**
 * A budget of candidates looked at by a check that searches around every free end
 * ({@link GapCheck}, {@link TeeGapCheck}, the T-junctions of {@link ContactCheck}). Each end costs
 * the segments whose boxes contain it (or the other ends within the gap limit): a few in a real
 * drawing, but thousands of long wires lying across the whole drawing (or thousands of ends crowded
 * into one spot) make every end meet most of them, so the work grows with the square of the
 * drawing. The check stops before the next end once the budget is spent and reports it with
 * {@link #finding}. Not thread-safe: one budget per check run.
 */
final class EndSearchBudget {

    /** Candidates looked at per check (each a closest-point test, well under a minute in all). */
    static final long MAX_CANDIDATES = 400_000_000L;

    private final long limit;
    private long spent;

    EndSearchBudget(long limit) {
        if (limit < 0) {
            throw new IllegalArgumentException("candidate budget must not be negative: " + limit);
        }
        this.limit = limit;
    }

    /** Counts one candidate looked at. */
    void spend() {
        spent++;
    }

    /** Counts {@code n} candidates looked at. */
    void spend(long n) {
        spent += n;
    }

    /** True once more than the limit was looked at. */
    boolean exhausted() {
        return spent > limit;
    }

    /**
     * The {@code limit_reached} warning for a check that stopped with {@code left} free ends not
     * searched, or an empty list when it did not stop.
     *
     * @param what what was looked for, e.g. "T-junctions"
     */
    List<Finding> finding(String what, long left, long ends) {
        if (left == 0) {
            return List.of();
        }
        return List.of(new Finding(FindingKind.LIMIT_REACHED, Severity.WARNING, null, null, null, List.of(), null,
                String.format(Locale.ROOT, "more than %d candidates looked at around wire ends (long wires lying"
                        + " across the whole drawing?): %s were looked for at the first %d of %d free ends"
                        + " only, so some may be missing", limit, what, ends - left, ends)));
    }
}
