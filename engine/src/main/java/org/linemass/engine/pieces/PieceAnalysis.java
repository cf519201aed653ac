package org.linemass.engine.pieces;

import java.util.List;
import org.linemass.engine.bender.FormRun;
import org.linemass.engine.bender.RunSplitter;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.result.Finding;
import org.linemass.geometry.Segment;

/**
 * The outcome of joining and checking: the pieces (built from the deduplicated segments), the
 * findings, the sub-curves that were drawn more than once and removed from the totals (each with
 * the provenance of the copy removed, so its layer is known), and groups of identical pieces as
 * lists of indices into {@code pieces} (each group one section, congruent shapes; every piece is in
 * exactly one group, singletons included). {@code runs} holds, per piece, the runs the bends were
 * found from ({@link RunSplitter#split} with the analysis's angle and join tolerances), so the
 * assembly's forms need not split the piece again; it is empty when the stage did not keep them.
 */
public record PieceAnalysis(List<Piece> pieces, List<Finding> findings, List<Segment> removed,
        List<List<Integer>> groups, List<List<FormRun>> runs) {

    public PieceAnalysis {
        pieces = List.copyOf(pieces);
        findings = List.copyOf(findings);
        removed = List.copyOf(removed);
        groups = groups.stream().map(List::copyOf).toList();
        runs = runs.stream().map(List::copyOf).toList();
        if (!runs.isEmpty() && runs.size() != pieces.size()) {
            throw new IllegalArgumentException("runs of " + runs.size() + " pieces for " + pieces.size() + " pieces");
        }
    }

    /** An analysis that kept no runs (the assembly splits each piece itself). */
    public PieceAnalysis(List<Piece> pieces, List<Finding> findings, List<Segment> removed,
            List<List<Integer>> groups) {
        this(pieces, findings, removed, groups, List.of());
    }
}
