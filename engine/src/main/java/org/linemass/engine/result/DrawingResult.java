package org.linemass.engine.result;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.geometry.Segment;

/**
 * Everything the analysis of one drawing produced, and the only thing that leaves the engine.
 * {@code incompleteReasons} is empty when every entity was read and counted; otherwise each entry
 * says what was left out, and every report must show it beside the totals.
 *
 * <p>{@code pieceSegments} holds each piece's exact segments (world metres, in order along the
 * piece) keyed by the id of its {@link PieceResult}, for writers that draw the true curves; it is
 * empty when no pieces were formed. Several drawings' totals combine with {@link #combinedTotals}.
 */
public record DrawingResult(DrawingInfo drawing, EntityCounts entities, List<LayerResult> layers,
        List<PieceResult> pieces, List<MarkResult> groups, List<Finding> findings, Totals totals,
        List<SectionUse> sections, List<String> incompleteReasons, Map<Integer, List<Segment>> pieceSegments) {

    public DrawingResult {
        layers = List.copyOf(layers);
        pieces = List.copyOf(pieces);
        groups = List.copyOf(groups);
        findings = List.copyOf(findings);
        sections = List.copyOf(sections);
        incompleteReasons = List.copyOf(incompleteReasons);
        Map<Integer, List<Segment>> copy = new TreeMap<>();
        pieceSegments.forEach((id, segs) -> copy.put(id, List.copyOf(segs)));
        pieceSegments = Collections.unmodifiableMap(copy);
    }

    /** A result without piece segments. */
    public DrawingResult(DrawingInfo drawing, EntityCounts entities, List<LayerResult> layers,
            List<PieceResult> pieces, List<MarkResult> groups, List<Finding> findings, Totals totals,
            List<SectionUse> sections, List<String> incompleteReasons) {
        this(drawing, entities, layers, pieces, groups, findings, totals, sections, incompleteReasons, Map.of());
    }

    public boolean complete() {
        return incompleteReasons.isEmpty();
    }

    /** The exact segments of piece {@code id}, or an empty list when none were kept. */
    public List<Segment> pieceSegments(int id) {
        return pieceSegments.getOrDefault(id, List.of());
    }

    /**
     * The totals of several drawings taken together, as one drawing in one world frame
     * ({@link CombinedTotals}).
     */
    public static Totals combinedTotals(List<DrawingResult> results) {
        List<Totals> parts = new ArrayList<>(results.size());
        for (DrawingResult r : results) {
            parts.add(r.totals());
        }
        return CombinedTotals.of(parts);
    }
}
