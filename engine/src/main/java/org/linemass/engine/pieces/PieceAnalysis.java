package org.linemass.engine.pieces;

import java.util.List;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.result.Finding;
import org.linemass.geometry.Segment;

/**
 * The outcome of joining and checking: the pieces (built from the deduplicated segments), the
 * findings, the sub-curves that were drawn more than once and removed from the totals (each with
 * the provenance of the copy removed, so its layer is known), and groups of identical pieces as
 * lists of indices into {@code pieces} (each group one section, congruent shapes; every piece is in
 * exactly one group, singletons included).
 */
public record PieceAnalysis(List<Piece> pieces, List<Finding> findings, List<Segment> removed,
        List<List<Integer>> groups) {

    public PieceAnalysis {
        pieces = List.copyOf(pieces);
        findings = List.copyOf(findings);
        removed = List.copyOf(removed);
        groups = groups.stream().map(List::copyOf).toList();
    }
}
