package org.linemass.plan.cutting;

import java.util.List;

/**
 * One way of cutting a stock bar, used {@code bars} times: the pieces by mark (longest first), and
 * what is left, {@code offcutM} (bar length less pieces and kerfs), kept as stock when
 * {@code offcutReusable}.
 */
public record CutPattern(double stockLengthM, int bars, List<PatternPiece> pieces, double offcutM,
        boolean offcutReusable) {

    public CutPattern {
        pieces = List.copyOf(pieces);
    }

    /** Pieces cut from one bar. */
    public int piecesPerBar() {
        return pieces.stream().mapToInt(PatternPiece::count).sum();
    }

    /** Length of the pieces of one bar, kerf not included. */
    public double usedLengthM() {
        return pieces.stream().mapToDouble(p -> p.lengthM() * p.count()).sum();
    }
}
