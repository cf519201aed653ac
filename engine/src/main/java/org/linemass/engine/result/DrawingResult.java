package org.linemass.engine.result;

import java.util.List;

/**
 * Everything the analysis of one drawing produced. {@code incompleteReasons} is empty when every
 * entity was read and counted; otherwise each entry says what was left out, and every report must
 * show it beside the totals.
 */
public record DrawingResult(DrawingInfo drawing, EntityCounts entities, List<LayerResult> layers,
        List<PieceResult> pieces, List<MarkResult> groups, List<Finding> findings, Totals totals,
        List<SectionUse> sections, List<String> incompleteReasons) {

    public DrawingResult {
        layers = List.copyOf(layers);
        pieces = List.copyOf(pieces);
        groups = List.copyOf(groups);
        findings = List.copyOf(findings);
        sections = List.copyOf(sections);
        incompleteReasons = List.copyOf(incompleteReasons);
    }

    public boolean complete() {
        return incompleteReasons.isEmpty();
    }
}
