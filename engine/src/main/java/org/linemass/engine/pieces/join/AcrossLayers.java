package org.linemass.engine.pieces.join;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.section.LayerJoin;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;

/**
 * The {@code joined_across_layers} finding (info) of a piece whose segments lie on several layers:
 * at the piece's start, on the layer it is reported on, naming every layer it spans, the rule that
 * joined them and the first entity of each layer.
 */
public final class AcrossLayers {

    private AcrossLayers() {
    }

    /**
     * @param segments the piece's segments, on two or more layers
     * @param spanned the layers, alphabetical
     * @param lead the layer the piece is reported on
     * @param rule the layer join that put the layers together (null only for a caller's own joining)
     */
    public static Finding finding(List<Segment> segments, List<String> spanned, String lead, LayerJoin rule) {
        Map<String, Provenance> first = new LinkedHashMap<>();
        for (Segment s : segments) {
            first.putIfAbsent(s.source().layer(), s.source());
        }
        String how = rule == null ? "" : " (" + rule.origin() + ")";
        String why = rule != null && rule.leadLayer() != null && rule.leadLayer().equalsIgnoreCase(lead)
                ? "the layer the rule names" : "the layer with the longest run";
        return Findings.of(FindingKind.JOINED_ACROSS_LAYERS, Severity.INFO, segments.get(0).start(), null, lead,
                new ArrayList<>(first.values()), null, "piece joined across layers " + String.join(", ", spanned)
                        + how + "; it is reported on layer " + lead + ", " + why + ", and takes its section");
    }
}
