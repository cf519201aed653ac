package org.linemass.plan.cutting;

import java.util.List;

/**
 * The plan for one section: the patterns, the pieces that fit no stock ({@code uncut}, to be
 * joined or bought longer), the stock length bought and the piece length used, the lower bound on
 * the stock length any plan must buy (always a proven bound: the relaxation's optimum when
 * {@code boundProven}, i.e. the relaxation was solved to optimality, otherwise Farley's Lagrangian
 * bound from the last duals or the material bound), how the
 * plan was found, the wall time, and notes (stock counts exceeded, solver missing).
 */
public record CutPlan(String section, List<CutPattern> patterns, List<Demand> uncut, double boughtLengthM,
        double usedLengthM, double lowerBoundM, boolean boundProven, String method, long solveMillis,
        List<String> notes) {

    public CutPlan {
        patterns = List.copyOf(patterns);
        uncut = List.copyOf(uncut);
        notes = List.copyOf(notes);
    }

    /** (bought - lower bound) / bought; 0 for an empty plan. */
    public double gap() {
        return boughtLengthM > 0 ? Math.max(0, boughtLengthM - lowerBoundM) / boughtLengthM : 0;
    }

    /** Share of the bought length not in pieces (kerf and offcuts, reusable or not). */
    public double wasteShare() {
        return boughtLengthM > 0 ? (boughtLengthM - usedLengthM) / boughtLengthM : 0;
    }

    /** Number of bars bought. */
    public int bars() {
        return patterns.stream().mapToInt(CutPattern::bars).sum();
    }

    /** Number of pieces cut, by all patterns. */
    public int piecesCut() {
        return patterns.stream().mapToInt(p -> p.bars() * p.piecesPerBar()).sum();
    }

    /** Total length of reusable offcuts. */
    public double reusableOffcutM() {
        return patterns.stream().filter(CutPattern::offcutReusable).mapToDouble(p -> p.bars() * p.offcutM()).sum();
    }
}
